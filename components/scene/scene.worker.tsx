/**
 * The worker that draws the 3D view on an OffscreenCanvas, so three.js loads, compiles its shaders
 * and draws off the page's main thread. The page (worker-view.tsx) posts the drawing, the view's
 * size and its pointer events; this posts back what the view reports (worker-protocol.ts).
 */
import {
  _roots,
  addAfterEffect,
  addEffect,
  createRoot,
  events as createPointerEvents,
  extend,
  flushSync,
  type ReconcilerRoot,
} from "@react-three/fiber";
import { replaceEqualDeep } from "@tanstack/react-query";
import { Component, type ReactNode } from "react";
import * as THREE from "three";
import { Lifter } from "./lifter";
import type { SceneCallbacks, SceneDrawing } from "./types";
import { onViewCreated, VIEW_DPR, VIEW_GL_OPTIONS, viewCamera } from "./view-config";
import type { FromSceneWorker, ToSceneWorker } from "./worker-protocol";
import { WorkerSurface } from "./worker-surface";

interface WorkerScope {
  postMessage(message: FromSceneWorker): void;
  onmessage: ((event: MessageEvent<ToSceneWorker>) => void) | null;
}
const scope = self as unknown as WorkerScope;
const post = (message: FromSceneWorker) => scope.postMessage(message);

// What fiber's <Canvas> does for the page: every three class becomes a JSX element (<mesh>, <color>…).
extend(THREE as unknown as Parameters<typeof extend>[0]);

/** Once the view has drawn, a stray error is logged and the view carries on, as it would on the page. */
let viewUp = false;
self.addEventListener("error", (event) => {
  if (viewUp) event.preventDefault();
});
self.addEventListener("unhandledrejection", (event) => {
  if (viewUp) return;
  const reason: unknown = event.reason;
  post({ type: "failed", message: reason instanceof Error ? reason.message : String(reason) });
});

const surface = new WorkerSurface((cursor) => post({ type: "cursor", cursor }));
const callbacks: SceneCallbacks = {
  onReady: (ready) => {
    viewUp = ready;
    post({ type: "ready", ready });
  },
  onMountScreen: (x, y) => post({ type: "mount-screen", x, y }),
  onMountDrag: (positionXM) => post({ type: "mount-drag", positionXM, pointerAtMs: surface.lastEventAtMs }),
  onMountDragEnd: () => post({ type: "mount-drag-end" }),
  onMountDragFrame: (pointerId, frame) => post({ type: "mount-drag-frame", pointerId, frame }),
};

class ReportErrors extends Component<{ children: ReactNode }, { failed: boolean }> {
  state = { failed: false };
  static getDerivedStateFromError(): { failed: boolean } {
    return { failed: true };
  }
  componentDidCatch(error: Error): void {
    post({ type: "failed", message: error.message });
  }
  render(): ReactNode {
    return this.state.failed ? null : this.props.children;
  }
}

function canDrawWebGL(): boolean {
  const probe = new OffscreenCanvas(1, 1);
  const context = probe.getContext("webgl2") ?? probe.getContext("webgl");
  context?.getExtension("WEBGL_lose_context")?.loseContext();
  return context !== null;
}

let root: ReconcilerRoot<OffscreenCanvas> | null = null;
let offscreen: OffscreenCanvas | null = null;
let drawing: SceneDrawing | null = null;
/** The latest drawing's number, and the last one a frame was reported for. */
let drawingSeq = 0;
let reportedSeq = -1;
let configured: Promise<unknown> = Promise.resolve();
const fail = (error: unknown) => post({ type: "failed", message: error instanceof Error ? error.message : String(error) });

function configure(width: number, height: number, first: SceneDrawing): Promise<unknown> {
  surface.resize(width, height);
  if (!root) return Promise.resolve();
  return root.configure({
    frameloop: "demand",
    dpr: VIEW_DPR,
    gl: VIEW_GL_OPTIONS,
    camera: viewCamera(first),
    size: { width, height, top: 0, left: 0 },
    events: createPointerEvents,
    onCreated: onViewCreated,
  });
}

/** Before the first render: the orbit controls take the events' element when they mount. */
function connectEvents(canvas: OffscreenCanvas): void {
  const state = _roots.get(canvas)?.store.getState();
  if (state && state.events.connected !== surface) state.events.connect?.(surface);
}

function draw(): void {
  if (!root || !drawing) return;
  const target = root;
  const lifter = drawing;
  flushSync(() =>
    target.render(
      <ReportErrors>
        <Lifter {...lifter} {...callbacks} />
      </ReportErrors>,
    ),
  );
}

/**
 * During a drag drawings arrive faster than frames: only the latest is rendered, once, just before
 * the next frame draws it, so the worker never falls behind the pointer.
 */
let drawingPending = false;
function drawAtNextFrame(): void {
  drawingPending = true;
  if (offscreen) _roots.get(offscreen)?.store.getState().invalidate();
}
addEffect(() => {
  if (!drawingPending) return;
  drawingPending = false;
  draw();
});

scope.onmessage = (event) => {
  const message = event.data;
  switch (message.type) {
    case "init": {
      if (!canDrawWebGL()) return post({ type: "unsupported" });
      drawing = message.drawing;
      root = createRoot(message.canvas);
      // One report per drawing, on the first frame that shows it (the page times drags by them).
      addAfterEffect(() => {
        if (drawingSeq === reportedSeq) return;
        reportedSeq = drawingSeq;
        post({ type: "frame", seq: drawingSeq, atMs: performance.timeOrigin + performance.now() });
      });
      const { canvas } = message;
      offscreen = canvas;
      configured = configure(message.width, message.height, message.drawing)
        .then(() => {
          connectEvents(canvas);
          draw();
        })
        .catch(fail);
      return;
    }
    case "draw":
      // Parts that did not change keep their identity, as they do on the page, so the scene's
      // memoised parts (lines, payloads, markers) skip the drawings that leave them alone.
      drawing = replaceEqualDeep(drawing, message.drawing);
      drawingSeq = message.seq;
      void configured.then(drawAtNextFrame).catch(fail);
      return;
    case "size":
      if (drawing) {
        const current = drawing;
        configured = configured.then(() => configure(message.width, message.height, current)).catch(fail);
      }
      return;
    case "pointer":
      surface.dispatch(message.event);
      return;
  }
};
