"use client";
/**
 * Test hooks written straight to the wrapper's DOM attributes (no React state, so no re-render):
 * data-mount-screen = the centre of the mount's carriage in CSS pixels from the wrapper's top-left,
 * and data-ready = "true" once the envelope is loaded and a frame has been drawn.
 */
import { useFrame, useThree } from "@react-three/fiber";
import { useEffect, useRef, type RefObject } from "react";
import { Vector3, type Object3D } from "three";

const scratchWorld = new Vector3();

interface MountScreenProbeProps {
  wrapperRef: RefObject<HTMLElement | null>;
  mountRef: RefObject<Object3D | null>;
}

export function MountScreenProbe({ wrapperRef, mountRef }: MountScreenProbeProps) {
  const last = useRef({ x: Number.NaN, y: Number.NaN });
  // Runs after OrbitControls' update (priority −1) and before the frame is drawn, with the same
  // matrices the frame uses.
  useFrame(({ camera, size }) => {
    const wrapper = wrapperRef.current;
    const mount = mountRef.current;
    if (!wrapper || !mount) return;
    camera.updateMatrixWorld();
    mount.getWorldPosition(scratchWorld).project(camera);
    const x = Math.round(((scratchWorld.x + 1) / 2) * size.width * 10) / 10;
    const y = Math.round(((1 - scratchWorld.y) / 2) * size.height * 10) / 10;
    if (x === last.current.x && y === last.current.y) return;
    last.current.x = x;
    last.current.y = y;
    wrapper.setAttribute("data-mount-screen", `${x},${y}`);
  });
  return null;
}

/** Mounted inside the envelope's Suspense boundary, so it exists only once the GLB has loaded. */
export function ReadySignal({ wrapperRef }: { wrapperRef: RefObject<HTMLElement | null> }) {
  const invalidate = useThree((state) => state.invalidate);
  const done = useRef(false);
  useEffect(() => {
    invalidate();
    const wrapper = wrapperRef.current;
    return () => {
      done.current = false;
      wrapper?.removeAttribute("data-ready");
    };
  }, [invalidate, wrapperRef]);
  useFrame(() => {
    if (done.current) return;
    done.current = true;
    // useFrame runs just before the draw; the next animation frame comes after it.
    requestAnimationFrame(() => wrapperRef.current?.setAttribute("data-ready", "true"));
  });
  return null;
}
