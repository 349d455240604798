"use client";
/**
 * What pages use: the 3D view loaded on the client only, with a visible loading state, inside an
 * error boundary so a browser without WebGL (or a failed model) keeps the rest of the page. The
 * view itself is drawn by a worker where the browser allows (lifter-scene.tsx).
 */
import dynamic from "next/dynamic";
import { Component, type ErrorInfo, type ReactNode } from "react";
import type { LifterSceneProps } from "./types";

export const SCENE_UNAVAILABLE_MESSAGE = "The 3D view is not available in this browser; the balance panel and the forms still work.";

function LoadingView() {
  return (
    <div role="status" className="flex h-full min-h-[inherit] w-full items-center justify-center text-sm text-muted">
      Loading the 3D view…
    </div>
  );
}

const LifterScene = dynamic(() => import("./lifter-scene").then((module) => module.LifterScene), {
  ssr: false,
  loading: () => <LoadingView />,
});

interface SceneErrorBoundaryProps {
  summary: string;
  children: ReactNode;
}

class SceneErrorBoundary extends Component<SceneErrorBoundaryProps, { failed: boolean }> {
  state = { failed: false };

  static getDerivedStateFromError(): { failed: boolean } {
    return { failed: true };
  }

  componentDidCatch(error: Error, info: ErrorInfo): void {
    console.warn("3D view failed; showing the text fallback", error, info.componentStack);
  }

  render(): ReactNode {
    if (!this.state.failed) return this.props.children;
    return (
      <div
        data-testid="lifter-canvas-fallback"
        className="flex h-full min-h-[inherit] w-full flex-col items-center justify-center gap-2 p-6 text-center"
      >
        <p className="text-sm text-ink">{SCENE_UNAVAILABLE_MESSAGE}</p>
        <p className="text-sm text-muted">{this.props.summary}</p>
      </div>
    );
  }
}

export interface LifterCanvasProps extends LifterSceneProps {
  /** Text alternative of the view, e.g. "Trims 2.1° nose up; mount 0.84 m from the nose". */
  summary: string;
  className?: string;
  /** Drawn over the view (legend, hints), outside the role="img" region. */
  children?: ReactNode;
}

export function LifterCanvas({ summary, className = "h-[28rem] w-full", children, ...sceneProps }: LifterCanvasProps) {
  return (
    <div className={`relative min-h-[16rem] overflow-hidden rounded border border-hairline bg-paper ${className}`}>
      {/* A new model gets a fresh boundary, so one failed load does not stick. */}
      <SceneErrorBoundary key={sceneProps.glbUrl} summary={summary}>
        <LifterScene {...sceneProps} summary={summary} />
      </SceneErrorBoundary>
      {children}
    </div>
  );
}
