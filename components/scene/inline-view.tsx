"use client";
/**
 * The view drawn on the page's own thread, for browsers that cannot draw WebGL in a worker.
 * Loads three.js into the page, so it is only imported when it is needed.
 */
import { Canvas } from "@react-three/fiber";
import { useMemo } from "react";
import { Lifter } from "./lifter";
import type { SceneCallbacks, SceneDrawing } from "./types";
import { onViewCreated, VIEW_DPR, VIEW_GL_OPTIONS, viewCamera } from "./view-config";

function assertWebGL(): void {
  const canvas = document.createElement("canvas");
  const context = canvas.getContext("webgl2") ?? canvas.getContext("webgl");
  if (!context) throw new Error("WebGL is not available");
  context.getExtension("WEBGL_lose_context")?.loseContext();
}

export function InlineView({ drawing, ...callbacks }: { drawing: SceneDrawing } & SceneCallbacks) {
  useMemo(() => assertWebGL(), []);
  return (
    <Canvas frameloop="demand" dpr={VIEW_DPR} gl={VIEW_GL_OPTIONS} onCreated={onViewCreated} camera={viewCamera(drawing)}>
      <Lifter {...drawing} {...callbacks} />
    </Canvas>
  );
}

export default InlineView;
