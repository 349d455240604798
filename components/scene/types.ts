import type { RailDragFrame } from "./rail-projection";

/**
 * The scene's contract: it draws exactly these values and computes no physics. A container maps
 * the planner store (and lib/balance's results) onto these props.
 */
export interface SceneVec {
  x: number;
  z: number;
} // body frame, metres: x aft from the nose tip, z up
export interface ScenePayload {
  key: string;
  label: string;
  shape: "box" | "cylinder" | "rod"; // rod = thin whip antenna
  lengthM: number;
  widthM: number;
  heightM: number; // box along x, y, z; cylinder: diameter = lengthM, height = heightM; rod: length = heightM, thickness = widthM
  offset: SceneVec; // its centre from the mount's attachment point (mountX, rail.z)
  level?: "ok" | "caution" | "stop"; // worst flag touching it (optional tint/outline)
}
export interface LifterSceneProps {
  glbUrl: string;
  hullLengthM: number;
  hullMaxDiameterM: number;
  rail: { startX: number; endX: number; z: number };
  railTabCount: number;
  mountX: number;
  payloads: ScenePayload[];
  buoyancyCentre: SceneVec;
  centreOfMass: SceneVec | null;
  tetherPoint: SceneVec;
  trimDeg: number; // pitch to draw, nose up positive, rotating the whole lifter about the tether point
  tetherAngleDeg: number; // tether from vertical, leaning downwind (wind blows from the nose towards the tail, i.e. +x)
  windMS: number; // 0 hides the wind arrow
  onMountDrag?: (positionXM: number) => void; // body-frame x under the pointer, clamped to [rail.startX, rail.endX]
  onMountDragEnd?: () => void;
  /** Text alternative of the view (the container summarises the trim); the canvas is role="img". */
  summary?: string;
  /** Text beside the wind arrow in the user's units, e.g. "Gust 8.0 m/s" (default "wind"); the scene does no units. */
  windLabel?: string;
  /** Highlights the mount as selected (accent outline). */
  mountSelected?: boolean;
  /**
   * The tether line's computed shape (lib/balance's tetherLinePoints): metres from the tether point,
   * x downwind (+x, as the wind blows), z up, not pitched with the lifter, from the tether point to
   * the anchor. Drawn to the scale that puts its anchor on the drawn ground; absent or fewer than
   * two points: a straight line at tetherAngleDeg.
   */
  tetherLine?: readonly SceneVec[] | null;
  /** The lifter does not fly: it is drawn resting on the ground, level, with its line slack. */
  grounded?: boolean;
  /** Short text (22 characters at most) on the ground beside a grounded lifter, e.g. "it does not fly". */
  groundedLabel?: string;
}

/**
 * What a view draws: the scene's props without its callbacks and text, so they can be posted to
 * the worker that draws in most browsers. `viewResetCount` puts the camera back each time it grows.
 */
export type SceneDrawing = Omit<LifterSceneProps, "onMountDrag" | "onMountDragEnd" | "summary"> & {
  draggable: boolean;
  viewResetCount: number;
};

/** What a view reports back to the page, from whichever thread draws. */
export interface SceneCallbacks {
  onMountDrag?: (positionXM: number) => void;
  onMountDragEnd?: () => void;
  /** True once the envelope has loaded and a frame is drawn; false when the view starts over. */
  onReady: (ready: boolean) => void;
  /** The mount carriage's centre in CSS pixels from the view's top-left, when it moves on screen. */
  onMountScreen: (x: number, y: number) => void;
  /** A worker draws: the page follows the drag's moves itself (see use-mount-drag.ts). */
  onMountDragFrame?: (pointerId: number, frame: RailDragFrame) => void;
}
