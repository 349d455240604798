/**
 * Messages between the page and the worker that draws the 3D view (scene.worker.tsx). Plain data
 * only: everything here crosses postMessage by structured clone.
 */
import type { RailDragFrame } from "./rail-projection";
import type { SceneDrawing } from "./types";

/** The fields of a DOM pointer or wheel event that fiber's picking and the orbit controls read. */
export interface ForwardedPointerEvent {
  type: string;
  /** When it happened, in ms since the epoch (performance.timeOrigin + event.timeStamp). */
  atMs: number;
  pointerId: number;
  pointerType: string;
  isPrimary: boolean;
  button: number;
  buttons: number;
  clientX: number;
  clientY: number;
  pageX: number;
  pageY: number;
  /** From the view's top-left corner, in CSS pixels. */
  offsetX: number;
  offsetY: number;
  deltaX: number;
  deltaY: number;
  deltaMode: number;
  altKey: boolean;
  ctrlKey: boolean;
  metaKey: boolean;
  shiftKey: boolean;
}

export type ToSceneWorker =
  | { type: "init"; canvas: OffscreenCanvas; width: number; height: number; drawing: SceneDrawing }
  /** `seq` counts the drawings posted, so a frame can say which one it shows. */
  | { type: "draw"; drawing: SceneDrawing; seq: number }
  | { type: "size"; width: number; height: number }
  | { type: "pointer"; event: ForwardedPointerEvent };

export type FromSceneWorker =
  | { type: "ready"; ready: boolean }
  | { type: "mount-screen"; x: number; y: number }
  /** `pointerAtMs`: when the pointer event that moved it happened (ForwardedPointerEvent.atMs). */
  | { type: "mount-drag"; positionXM: number; pointerAtMs: number }
  | { type: "mount-drag-end" }
  /** A mount drag holds `pointerId`: the page projects its moves onto the rail with this frame. */
  | { type: "mount-drag-frame"; pointerId: number; frame: RailDragFrame }
  | { type: "cursor"; cursor: string }
  /** The first frame that shows drawing `seq`, drawn at `atMs` (ms since the epoch). */
  | { type: "frame"; seq: number; atMs: number }
  /** This browser cannot draw WebGL in a worker: the page draws on its own thread instead. */
  | { type: "unsupported" }
  | { type: "failed"; message: string };

/** The pointer and wheel events the page forwards to the worker. */
export const FORWARDED_EVENTS = [
  "pointerdown",
  "pointermove",
  "pointerup",
  "pointercancel",
  "pointerleave",
  "lostpointercapture",
  "wheel",
] as const;

export function toForwardedEvent(event: PointerEvent | WheelEvent, viewRect: DOMRect): ForwardedPointerEvent {
  const pointer = "pointerId" in event ? event : null;
  const wheel = "deltaY" in event ? event : null;
  return {
    type: event.type,
    atMs: performance.timeOrigin + event.timeStamp,
    pointerId: pointer?.pointerId ?? 1,
    pointerType: pointer?.pointerType ?? "mouse",
    isPrimary: pointer?.isPrimary ?? true,
    button: event.button,
    buttons: event.buttons,
    clientX: event.clientX,
    clientY: event.clientY,
    pageX: event.pageX,
    pageY: event.pageY,
    offsetX: event.clientX - viewRect.left,
    offsetY: event.clientY - viewRect.top,
    deltaX: wheel?.deltaX ?? 0,
    deltaY: wheel?.deltaY ?? 0,
    deltaMode: wheel?.deltaMode ?? 0,
    altKey: event.altKey,
    ctrlKey: event.ctrlKey,
    metaKey: event.metaKey,
    shiftKey: event.shiftKey,
  };
}
