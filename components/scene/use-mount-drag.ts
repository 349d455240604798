"use client";
/**
 * Dragging the mount along the belly rail. The pointer's ray is taken into the pitched lifter's
 * local frame and met with the rail line (closest point between two lines), so the drag follows
 * the rail whatever the trim or the view. Window-free: listeners live on the pointer surface (the
 * view's element, or its stand-in in the worker) with pointer capture. The projection itself is rail-projection.ts.
 */
import { useFrame, useThree, type ThreeEvent } from "@react-three/fiber";
import { useCallback, useEffect, useRef, type RefObject, useLayoutEffect } from "react";
import { Matrix4, type Object3D } from "three";
import type { OrbitControls as OrbitControlsImpl } from "three-stdlib";
import { usePointerSurface } from "./pointer-surface";
import { MIN_DRAG_STEP_M, railXUnderPointer, type RailDragFrame } from "./rail-projection";

const scratchWorldFromNdc = new Matrix4();
const scratchBodyFromWorld = new Matrix4();
export interface MountDragOptions {
  /** The group whose local frame is the body frame in three axes (x aft, y = body z). */
  bodyRef: RefObject<Object3D | null>;
  controlsRef: RefObject<OrbitControlsImpl | null>;
  railStartX: number;
  railEndX: number;
  railZ: number;
  onMountDrag?: (positionXM: number) => void;
  onMountDragEnd?: () => void;
  /**
   * Given when a worker draws: the page follows the drag's moves itself (no round trip through the
   * worker), from the matrices reported here at the press and after each frame that changes them.
   */
  onMountDragFrame?: (pointerId: number, frame: RailDragFrame) => void;
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

  /** This frame's matrices, for the rail projection (here, or on the page when a worker draws). */
  const dragFrame = useCallback((): RailDragFrame | null => {
    const body = latest.current.bodyRef.current;
    if (!body) return null;
    camera.updateMatrixWorld();
    body.updateWorldMatrix(true, false);
    return {
      worldFromNdc: scratchWorldFromNdc.multiplyMatrices(camera.matrixWorld, camera.projectionMatrixInverse).toArray(),
      bodyFromWorld: scratchBodyFromWorld.copy(body.matrixWorld).invert().toArray(),
      railZ: latest.current.railZ,
      railStartX: latest.current.railStartX,
      railEndX: latest.current.railEndX,
    };
  }, [camera]);

  const railXAt = useCallback(
    (offsetX: number, offsetY: number): number | null => {
      const frame = dragFrame();
      if (!frame || surface.clientWidth === 0 || surface.clientHeight === 0) return null;
      return railXUnderPointer((offsetX / surface.clientWidth) * 2 - 1, -(offsetY / surface.clientHeight) * 2 + 1, frame);
    },
    [dragFrame, surface],
  );

  const lastReported = useRef("");
  const reportFrame = useCallback(() => {
    const report = latest.current.onMountDragFrame;
    const frame = report && dragging.current && dragPointerId.current !== null ? dragFrame() : null;
    if (!report || !frame || dragPointerId.current === null) return;
    const key = JSON.stringify(frame);
    if (key === lastReported.current) return;
    lastReported.current = key;
    report(dragPointerId.current, frame);
  }, [dragFrame]);
  // The lifter pitches as the mount moves: the page needs each new body matrix during the drag.
  useFrame(reportFrame);

  const emit = useCallback(
    (offsetX: number, offsetY: number) => {
      const x = railXAt(offsetX, offsetY);
      if (x === null || Math.abs(x - lastX.current) < MIN_DRAG_STEP_M) return;
      lastX.current = x;
      latest.current.onMountDrag?.(x);
    },
    [railXAt],
  );

  const onMove = useCallback(
    (event: PointerEvent) => {
      if (latest.current.onMountDragFrame) return;
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
      lastReported.current = "";
      lastX.current = Number.NaN;
      const controls = latest.current.controlsRef.current;
      if (controls) controls.enabled = false;
      surface.setPointerCapture(event.pointerId);
      surface.style.setProperty("cursor", "grabbing");
      // A press on the rail moves the mount there at once.
      emit(event.nativeEvent.offsetX, event.nativeEvent.offsetY);
      reportFrame();
    },
    [emit, surface, reportFrame],
  );

  return { onPointerDown, dragging };
}
