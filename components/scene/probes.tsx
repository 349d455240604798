"use client";
/**
 * What the view reports to the page without re-rendering anything: the mount carriage's place on
 * screen (the page writes it to data-mount-screen, for tests), and readiness once the envelope is
 * loaded and a frame has been drawn (data-ready).
 */
import { useFrame, useThree } from "@react-three/fiber";
import { useEffect, useRef, type RefObject } from "react";
import { Vector3, type Object3D } from "three";
import type { SceneCallbacks } from "./types";

const scratchWorld = new Vector3();

interface MountScreenProbeProps {
  mountRef: RefObject<Object3D | null>;
  onMountScreen: SceneCallbacks["onMountScreen"];
}

export function MountScreenProbe({ mountRef, onMountScreen }: MountScreenProbeProps) {
  const last = useRef({ x: Number.NaN, y: Number.NaN });
  // Runs after OrbitControls' update (priority −1) and before the frame is drawn, with the same
  // matrices the frame uses.
  useFrame(({ camera, size }) => {
    const mount = mountRef.current;
    if (!mount) return;
    camera.updateMatrixWorld();
    mount.getWorldPosition(scratchWorld).project(camera);
    const x = Math.round(((scratchWorld.x + 1) / 2) * size.width * 10) / 10;
    const y = Math.round(((1 - scratchWorld.y) / 2) * size.height * 10) / 10;
    if (x === last.current.x && y === last.current.y) return;
    last.current.x = x;
    last.current.y = y;
    onMountScreen(x, y);
  });
  return null;
}

/** Mounted inside the envelope's Suspense boundary, so it exists only once the GLB has loaded. */
export function ReadySignal({ onReady }: { onReady: SceneCallbacks["onReady"] }) {
  const invalidate = useThree((state) => state.invalidate);
  const done = useRef(false);
  useEffect(() => {
    invalidate();
    return () => {
      done.current = false;
      onReady(false);
    };
  }, [invalidate, onReady]);
  useFrame(() => {
    if (done.current) return;
    done.current = true;
    // useFrame runs just before the draw; the next animation frame comes after it.
    requestAnimationFrame(() => onReady(true));
  });
  return null;
}
