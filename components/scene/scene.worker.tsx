/**
 * The worker that draws the 3D view on an OffscreenCanvas, so three.js loads, compiles its shaders
 * and draws off the page's main thread. The page (worker-view.tsx) posts the drawing, the view's
 * size and its pointer events; this posts back what the view reports (worker-protocol.ts).
 */
import {
  _roots,
  addAfterEffect,
  createRoot,
  events as createPointerEvents,
  extend,
  flushSync,
  type ReconcilerRoot,
} from "@react-three/fiber";
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

const surface = new WorkerSurface((cursor) => post({ type: "cursor", cursor }));
const callbacks: SceneCallbacks = {
  onReady: (ready) => post({ type: "ready", ready }),
  onMountScreen: (x, y) => post({ type: "mount-screen", x, y }),
  onMountDrag: (positionXM) => post({ type: "mount-drag", positionXM }),
  onMountDragEnd: () => post({ type: "mount-drag-end" }),
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
let drawing: SceneDrawing | null = null;
let configured: Promise<unknown> = Promise.resolve();

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

/**
 * Renders the drawing at once rather than when React's scheduler gets to it; the frame follows at
 * the next animation frame, so a burst of drawings during a drag costs one frame.
 */
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

scope.onmessage = (event) => {
  const message = event.data;
  switch (message.type) {
    case "init": {
      if (!canDrawWebGL()) return post({ type: "unsupported" });
      drawing = message.drawing;
      root = createRoot(message.canvas);
      addAfterEffect(() => post({ type: "frame", atMs: performance.timeOrigin + performance.now() }));
      const { canvas } = message;
      configured = configure(message.width, message.height, message.drawing).then(
        () => {
          connectEvents(canvas);
          draw();
        },
        (error: Error) => post({ type: "failed", message: error.message }),
      );
      return;
    }
    case "draw":
      drawing = message.drawing;
      void configured.then(draw);
      return;
    case "size":
      if (drawing) {
        const current = drawing;
        configured = configured.then(() => configure(message.width, message.height, current));
      }
      return;
    case "pointer":
      surface.dispatch(message.event);
      return;
  }
};
