"use client";
/**
 * The 3D view's frame on the page: the element tests and screen readers see (role="img" with the
 * summary, data-ready, data-mount-screen), the "Reset view" button, and the view inside it. A
 * worker draws the view where the browser allows it (worker-view.tsx); otherwise the page does
 * (inline-view.tsx, loaded only then). Neither this file nor the worker view loads three.js.
 */
import dynamic from "next/dynamic";
import { useCallback, useRef, useState } from "react";
import type { LifterSceneProps, SceneDrawing } from "./types";
import { canDrawInWorker, WorkerView } from "./worker-view";

const InlineView = dynamic(() => import("./inline-view"), { ssr: false });

export interface LifterSceneComponentProps extends LifterSceneProps {
  className?: string;
}

export function LifterScene({
  summary = "3D view of the lifter",
  className = "",
  onMountDrag,
  onMountDragEnd,
  ...drawn
}: LifterSceneComponentProps) {
  const wrapperRef = useRef<HTMLDivElement>(null);
  const [viewResetCount, setViewResetCount] = useState(0);
  const [thread, setThread] = useState<"worker" | "page">(() => (canDrawInWorker() ? "worker" : "page"));
  const [failure, setFailure] = useState<Error | null>(null);

  const onReady = useCallback((ready: boolean) => {
    if (ready) wrapperRef.current?.setAttribute("data-ready", "true");
    else wrapperRef.current?.removeAttribute("data-ready");
  }, []);
  const onMountScreen = useCallback((x: number, y: number) => wrapperRef.current?.setAttribute("data-mount-screen", `${x},${y}`), []);
  const onUnsupported = useCallback(() => setThread("page"), []);
  const onFailed = useCallback((message: string) => setFailure(new Error(message)), []);

  const drawing: SceneDrawing = { ...drawn, draggable: onMountDrag !== undefined, viewResetCount };
  const callbacks = { onMountDrag, onMountDragEnd, onReady, onMountScreen };
  // The worker could not draw: the error boundary around the view shows its text fallback.
  if (failure) throw failure;

  return (
    <div className={`relative h-full w-full ${className}`}>
      <div
        ref={wrapperRef}
        data-testid="lifter-canvas"
        data-thread={thread}
        data-tether={drawn.grounded ? "slack" : drawn.tetherLine && drawn.tetherLine.length >= 2 ? "curve" : "straight"}
        data-grounded={drawn.grounded ? "true" : "false"}
        role="img"
        aria-label={summary}
        className="peer absolute inset-0 touch-none select-none"
      >
        {thread === "worker" ? (
          <WorkerView drawing={drawing} {...callbacks} onUnsupported={onUnsupported} onFailed={onFailed} />
        ) : (
          <InlineView drawing={drawing} {...callbacks} />
        )}
      </div>
      {/* Hidden by CSS once the view reports ready, so readiness re-renders nothing. */}
      <p
        role="status"
        className="pointer-events-none absolute inset-0 flex items-center justify-center text-sm text-muted peer-data-[ready=true]:hidden"
      >
        Loading the 3D view…
      </p>
      <button
        type="button"
        onClick={() => setViewResetCount((count) => count + 1)}
        className="absolute right-3 top-3 rounded border border-hairline bg-white/90 px-3 py-1.5 text-sm text-ink shadow-sm hover:border-accent focus-visible:outline-2 focus-visible:outline-accent"
      >
        Reset view
      </button>
    </div>
  );
}

export default LifterScene;
