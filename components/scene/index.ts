export { LifterCanvas, SCENE_UNAVAILABLE_MESSAGE, type LifterCanvasProps } from "./lifter-canvas";
export type { LifterSceneProps, ScenePayload, SceneVec } from "./types";
