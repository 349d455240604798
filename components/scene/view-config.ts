/**
 * How a view's renderer and camera are set up, the same whether the page or a worker draws.
 * 1× pixels and no MSAA: on a software renderer that halves the first frame.
 */
import type { RootState } from "@react-three/fiber";
import { sceneScale } from "./frame";
import type { SceneDrawing } from "./types";

export const VIEW_DPR = 1;
export const VIEW_GL_OPTIONS = { antialias: false } as const;

export function viewCamera(drawing: SceneDrawing) {
  const scale = sceneScale(drawing.hullLengthM, drawing.hullMaxDiameterM, drawing.tetherPoint);
  return { position: scale.cameraPosition, fov: 35, near: 0.01, far: 40 * scale.lengthM };
}

export function onViewCreated({ gl }: RootState): void {
  gl.debug.checkShaderErrors = process.env.NODE_ENV !== "production";
}
