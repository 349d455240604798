"use client";
/**
 * The view drawn by a worker (scene.worker.tsx) on a canvas handed over to it: three.js never
 * loads on the page's main thread, so the page answers input while the view loads and compiles.
 * This side only forwards: the drawing when it changes, the view's size, the pointer and wheel
 * events; and relays what the worker reports to the page's callbacks.
 */
import { useEffect, useRef } from "react";
import type { SceneCallbacks, SceneDrawing } from "./types";
import { MIN_DRAG_STEP_M, railXUnderPointer, type RailDragFrame } from "./rail-projection";
import { FORWARDED_EVENTS, toForwardedEvent, type FromSceneWorker, type ToSceneWorker } from "./worker-protocol";

/**
 * Marks for timing a drag (`npm run bench:planner`), one set per drawing, as the balance panel's
 * measures are one per edit: a drawing posted (detail: its number), the first frame that shows it
 * (detail: the number), and a measure from the pointer event to the drag position it caused.
 */
export const SCENE_DRAW_MARK = "trimrail:scene-draw";
export const SCENE_FRAME_MARK = "trimrail:scene-frame";
export const POINTER_TO_DRAG_MEASURE = "trimrail:pointer-to-drag";

/** Set once a worker has found no WebGL: later views go straight to the page. */
let workerLacksWebGL = false;

/**
 * True where a canvas can be handed to a worker; whether WebGL works there, the worker finds out.
 * Not under `next dev`: its Fast Refresh wraps every component module, and in a worker that wrapper
 * is missing, so the scene's modules do not load there. Production builds draw in the worker.
 */
export function canDrawInWorker(): boolean {
  if (process.env.NODE_ENV === "development" || workerLacksWebGL) return false;
  return (
    typeof Worker !== "undefined" && typeof HTMLCanvasElement !== "undefined" && "transferControlToOffscreen" in HTMLCanvasElement.prototype
  );
}

/** Runs `start` when the browser is idle (soon after the page's first work), or after a timeout. */
function whenIdle(start: () => void): { cancel: () => void } {
  if (typeof requestIdleCallback === "function") {
    const handle = requestIdleCallback(start, { timeout: 1500 });
    return { cancel: () => cancelIdleCallback(handle) };
  }
  const handle = setTimeout(start, 200);
  return { cancel: () => clearTimeout(handle) };
}

export interface WorkerViewProps extends SceneCallbacks {
  drawing: SceneDrawing;
  /** The worker cannot draw WebGL here: the page should draw on its own thread. */
  onUnsupported: () => void;
  onFailed: (message: string) => void;
}

export function WorkerView({ drawing, ...handlers }: WorkerViewProps) {
  const hostRef = useRef<HTMLDivElement>(null);
  const workerRef = useRef<Worker | null>(null);
  const lastPosted = useRef("");
  const drawingSeq = useRef(0);
  /** The mount drag under way: its pointer, the worker's latest frame for it, the last position sent. */
  const drag = useRef<{ pointerId: number; frame: RailDragFrame; lastX: number } | null>(null);
  const latest = useRef({ drawing, handlers });
  useEffect(() => {
    latest.current = { drawing, handlers };
  });

  useEffect(() => {
    const host = hostRef.current;
    if (!host) return;
    let stopView: (() => void) | null = null;
    /** Hands a fresh canvas to a new worker and wires the two together; returns how to stop it all. */
    const startView = (): (() => void) => {
      // Made here rather than rendered: a canvas can be handed over only once, and a remount (a new
      // model, or React's strict mode) needs a fresh one.
      const canvas = document.createElement("canvas");
      canvas.style.cssText = "display:block;width:100%;height:100%";
      host.appendChild(canvas);
      const offscreen = canvas.transferControlToOffscreen();
      const worker = new Worker(new URL("./scene.worker.tsx", import.meta.url), { type: "module", name: "trimrail-3d-view" });
      workerRef.current = worker;
      const send = (message: ToSceneWorker, transfer: Transferable[] = []) => worker.postMessage(message, transfer);

      worker.onmessage = (event: MessageEvent<FromSceneWorker>) => {
        const message = event.data;
        const on = latest.current.handlers;
        switch (message.type) {
          case "ready":
            return on.onReady(message.ready);
          case "mount-screen":
            return on.onMountScreen(message.x, message.y);
          case "mount-drag":
            // The press itself; the worker's clock starts elsewhere, both count from the same epoch.
            performance.measure(POINTER_TO_DRAG_MEASURE, { start: message.pointerAtMs - performance.timeOrigin, end: performance.now() });
            if (drag.current) drag.current.lastX = message.positionXM;
            return on.onMountDrag?.(message.positionXM);
          case "mount-drag-end":
            drag.current = null;
            return on.onMountDragEnd?.();
          case "mount-drag-frame": {
            const lastX = drag.current?.pointerId === message.pointerId ? drag.current.lastX : Number.NaN;
            drag.current = { pointerId: message.pointerId, frame: message.frame, lastX };
            return;
          }
          case "cursor":
            host.style.cursor = message.cursor;
            return;
          case "frame":
            performance.mark(SCENE_FRAME_MARK, { startTime: message.atMs - performance.timeOrigin, detail: message.seq });
            return;
          case "unsupported":
            workerLacksWebGL = true;
            return on.onUnsupported();
          case "failed":
            return on.onFailed(message.message);
        }
      };
      worker.onerror = (event) => latest.current.handlers.onFailed(event.message || "the 3D view's worker did not start");

      const { width, height } = host.getBoundingClientRect();
      lastPosted.current = JSON.stringify(latest.current.drawing);
      drawingSeq.current = 0;
      send({ type: "init", canvas: offscreen, width, height, drawing: latest.current.drawing }, [offscreen]);

      const resize = new ResizeObserver(([entry]) => {
        const box = entry.contentRect;
        send({ type: "size", width: box.width, height: box.height });
      });
      resize.observe(host);

      const forward = (event: PointerEvent | WheelEvent) => {
        // The page scrolls elsewhere; over the view, the wheel zooms it.
        if (event.type === "wheel") event.preventDefault();
        // Capture on a press, as the orbit controls and the mount drag expect: moves outside the
        // view keep coming here until the button is let go.
        if (event.type === "pointerdown" && "pointerId" in event) host.setPointerCapture(event.pointerId);
        const forwarded = toForwardedEvent(event, host.getBoundingClientRect());
        send({ type: "pointer", event: forwarded });
        const held = drag.current;
        if (!held || !("pointerId" in event) || event.pointerId !== held.pointerId) return;
        if (event.type === "pointerup" || event.type === "pointercancel") drag.current = null;
        else if (event.type === "pointermove") followDrag(held, forwarded.offsetX, forwarded.offsetY, event.timeStamp);
      };
      // The drag's moves are projected here, with the worker's frame: no round trip through it.
      const followDrag = (held: NonNullable<typeof drag.current>, offsetX: number, offsetY: number, pointerAtMs: number) => {
        const { width: w, height: h } = host.getBoundingClientRect();
        if (w === 0 || h === 0) return;
        const x = railXUnderPointer((offsetX / w) * 2 - 1, -(offsetY / h) * 2 + 1, held.frame);
        if (x === null || Math.abs(x - held.lastX) < MIN_DRAG_STEP_M) return;
        held.lastX = x;
        latest.current.handlers.onMountDrag?.(x);
        performance.measure(POINTER_TO_DRAG_MEASURE, { start: pointerAtMs, end: performance.now() });
      };
      const noMenu = (event: Event) => event.preventDefault();
      for (const type of FORWARDED_EVENTS) host.addEventListener(type, forward as EventListener, { passive: type !== "wheel" });
      host.addEventListener("contextmenu", noMenu);

      return () => {
        for (const type of FORWARDED_EVENTS) host.removeEventListener(type, forward as EventListener);
        host.removeEventListener("contextmenu", noMenu);
        resize.disconnect();
        worker.terminate();
        workerRef.current = null;
        canvas.remove();
        latest.current.handlers.onReady(false);
      };
    };
    // Started once the page is idle: the worker's start (three.js, the GPU process compiling its
    // shaders) then does not compete with the page's own first work for the device's cores.
    const idle = whenIdle(() => (stopView = startView()));
    return () => {
      idle.cancel();
      stopView?.();
    };
  }, []);

  // Only a drawing that differs from the last one is posted: the page re-renders for many reasons.
  useEffect(() => {
    const text = JSON.stringify(drawing);
    if (!workerRef.current || text === lastPosted.current) return;
    lastPosted.current = text;
    const seq = ++drawingSeq.current;
    performance.mark(SCENE_DRAW_MARK, { detail: seq });
    workerRef.current.postMessage({ type: "draw", drawing, seq } satisfies ToSceneWorker);
  }, [drawing]);

  return <div ref={hostRef} className="absolute inset-0" />;
}

export default WorkerView;
