"use client";
/**
 * Dragging the mount along the belly rail. The pointer's ray is taken into the pitched lifter's
 * local frame and met with the rail line (closest point between two lines), so the drag follows
 * the rail whatever the trim or the view. Window-free: listeners live on the pointer surface (the
 * view's element, or its stand-in in the worker) with pointer capture. Scratch objects are module-level: nothing is allocated per pointer move.
 */
import { useThree, type ThreeEvent } from "@react-three/fiber";
import { useCallback, useEffect, useRef, type RefObject, useLayoutEffect } from "react";
import { Matrix4, Ray, Raycaster, Vector2, type Object3D } from "three";
import type { OrbitControls as OrbitControlsImpl } from "three-stdlib";
import { usePointerSurface } from "./pointer-surface";

const scratchNdc = new Vector2();
const scratchRaycaster = new Raycaster();
const scratchRay = new Ray();
const scratchInverse = new Matrix4();
/** Below this, the view looks (almost) straight along the rail and the projection is ill-posed. */
const PARALLEL_EPSILON = 1e-6;
/** Changes smaller than this (m) are not worth a store update. */
const MIN_STEP_M = 1e-5;

export interface MountDragOptions {
  /** The group whose local frame is the body frame in three axes (x aft, y = body z). */
  bodyRef: RefObject<Object3D | null>;
  controlsRef: RefObject<OrbitControlsImpl | null>;
  railStartX: number;
  railEndX: number;
  railZ: number;
  onMountDrag?: (positionXM: number) => void;
  onMountDragEnd?: () => void;
}

export interface MountDragHandlers {
  onPointerDown: (event: ThreeEvent<PointerEvent>) => void;
  dragging: RefObject<boolean>;
}

export function useMountDrag(options: MountDragOptions): MountDragHandlers {
  const camera = useThree((state) => state.camera);
  const surface = usePointerSurface();
  // Latest options without re-binding listeners on every render.
  const latest = useRef(options);
  useLayoutEffect(() => {
    latest.current = options;
  });
  const dragging = useRef(false);
  /** The pointer that holds the mount: a second finger neither moves it nor lets it go. */
  const dragPointerId = useRef<number | null>(null);
  const lastX = useRef(Number.NaN);

  const railXUnderPointer = useCallback(
    (offsetX: number, offsetY: number): number | null => {
      const body = latest.current.bodyRef.current;
      if (!body || surface.clientWidth === 0 || surface.clientHeight === 0) return null;
      scratchNdc.set((offsetX / surface.clientWidth) * 2 - 1, -(offsetY / surface.clientHeight) * 2 + 1);
      scratchRaycaster.setFromCamera(scratchNdc, camera);
      body.updateWorldMatrix(true, false);
      scratchRay.copy(scratchRaycaster.ray).applyMatrix4(scratchInverse.copy(body.matrixWorld).invert());
      // Rail line: P(s) = (s, railZ, 0); ray: Q(t) = o + t·d with |d| = 1. Closest points solve
      // s = (b·e − w_x) / (1 − b²), with w = P(0) − o, b = d_x, e = d·w.
      const { origin: o, direction: d } = scratchRay;
      const wx = -o.x;
      const wy = latest.current.railZ - o.y;
      const wz = -o.z;
      const b = d.x;
      const denom = 1 - b * b;
      if (denom < PARALLEL_EPSILON) return null;
      const e = d.x * wx + d.y * wy + d.z * wz;
      const s = (b * e - wx) / denom;
      const { railStartX, railEndX } = latest.current;
      return Math.min(Math.max(s, Math.min(railStartX, railEndX)), Math.max(railStartX, railEndX));
    },
    [camera, surface],
  );

  const emit = useCallback(
    (offsetX: number, offsetY: number) => {
      const x = railXUnderPointer(offsetX, offsetY);
      if (x === null || Math.abs(x - lastX.current) < MIN_STEP_M) return;
      lastX.current = x;
      latest.current.onMountDrag?.(x);
    },
    [railXUnderPointer],
  );

  const onMove = useCallback(
    (event: PointerEvent) => {
      if (dragging.current && event.pointerId === dragPointerId.current) emit(event.offsetX, event.offsetY);
    },
    [emit],
  );

  const finish = useCallback(
    (event: PointerEvent) => {
      if (!dragging.current || event.pointerId !== dragPointerId.current) return;
      dragging.current = false;
      dragPointerId.current = null;
      if (surface.hasPointerCapture(event.pointerId)) surface.releasePointerCapture(event.pointerId);
      surface.style.setProperty("cursor", "");
      const controls = latest.current.controlsRef.current;
      if (controls) controls.enabled = true;
      latest.current.onMountDragEnd?.();
    },
    [surface],
  );

  useEffect(() => {
    surface.addEventListener("pointermove", onMove);
    surface.addEventListener("pointerup", finish);
    surface.addEventListener("pointercancel", finish);
    return () => {
      surface.removeEventListener("pointermove", onMove);
      surface.removeEventListener("pointerup", finish);
      surface.removeEventListener("pointercancel", finish);
    };
  }, [surface, onMove, finish]);

  const onPointerDown = useCallback(
    (event: ThreeEvent<PointerEvent>) => {
      if (!latest.current.onMountDrag || event.button !== 0) return;
      if (dragging.current) return;
      event.stopPropagation();
      dragging.current = true;
      dragPointerId.current = event.pointerId;
      lastX.current = Number.NaN;
      const controls = latest.current.controlsRef.current;
      if (controls) controls.enabled = false;
      surface.setPointerCapture(event.pointerId);
      surface.style.setProperty("cursor", "grabbing");
      // A press on the rail moves the mount there at once.
      emit(event.nativeEvent.offsetX, event.nativeEvent.offsetY);
    },
    [emit, surface],
  );

  return { onPointerDown, dragging };
}
