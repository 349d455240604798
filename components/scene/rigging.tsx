"use client";
/**
 * Lines and world furniture: bridle (in the pitched lifter), tether (fixed in the world, running
 * from the tether point to its anchor upwind), ground, wind arrow.
 */
import { memo, useMemo } from "react";
import { DEG } from "./frame";
import { textTexture } from "./label-texture";
import { PolyLine } from "./polyline";
import { ACCENT_DARK, GRID_MAJOR, GRID_MINOR, GROUND, INK, LINE } from "./palette";
import type { SceneVec } from "./types";

type Point3 = [number, number, number];

interface BridleProps {
  tetherPoint: SceneVec;
  railStartX: number;
  railEndX: number;
  railZ: number;
}

/** Bridle lines from the rail's ends to the tether point, in body coordinates (three axes). */
export const Bridle = memo(function Bridle({ tetherPoint, railStartX, railEndX, railZ }: BridleProps) {
  const fore = useMemo<Point3[]>(
    () => [
      [railStartX, railZ, 0],
      [tetherPoint.x, tetherPoint.z, 0],
    ],
    [railStartX, railZ, tetherPoint.x, tetherPoint.z],
  );
  const aft = useMemo<Point3[]>(
    () => [
      [railEndX, railZ, 0],
      [tetherPoint.x, tetherPoint.z, 0],
    ],
    [railEndX, railZ, tetherPoint.x, tetherPoint.z],
  );
  return (
    <group name="bridle">
      <PolyLine points={fore} color={LINE} lineWidthPx={1.2} />
      <PolyLine points={aft} color={LINE} lineWidthPx={1.2} />
    </group>
  );
});

/** Drawing limit only: a tether nearer horizontal than this would run off the ground plane. */
const MAX_DRAWN_TETHER_DEG = 80;

interface TetherProps {
  top: Point3;
  tetherAngleDeg: number;
  groundY: number;
  /** The computed line (metres from the tether point, x downwind, z up), tether point to anchor. */
  shape?: readonly SceneVec[] | null;
}

/**
 * The line's computed shape, scaled so its anchor lands on the drawn ground: one factor for both
 * axes, so its angles (at the lifter and at the anchor) and its sag are drawn true.
 */
export function scaledTetherPoints(top: Point3, groundY: number, shape: readonly SceneVec[]): Point3[] | null {
  const last = shape[shape.length - 1];
  const heightM = last ? -last.z : 0;
  const drop = top[1] - groundY;
  if (shape.length < 2 || !(heightM > 1e-6) || !(drop > 0)) return null;
  const scale = drop / heightM;
  return shape.map((p) => [top[0] + scale * p.x, top[1] + scale * p.z, 0]);
}

/** The tether runs from the tether point down to its anchor, upwind (−x) of the lifter: its curve, or straight. */
export const Tether = memo(function Tether({ top, tetherAngleDeg, groundY, shape = null }: TetherProps) {
  const points = useMemo<Point3[]>(() => {
    const curve = shape ? scaledTetherPoints(top, groundY, shape) : null;
    if (curve) return curve;
    const angle = Math.min(MAX_DRAWN_TETHER_DEG, Math.max(-MAX_DRAWN_TETHER_DEG, tetherAngleDeg)) * DEG;
    const drop = Math.max(0, top[1] - groundY);
    return [top, [top[0] - drop * Math.tan(angle), groundY, 0]];
  }, [top, tetherAngleDeg, groundY, shape]);
  return <PolyLine name="tether" points={points} color={INK} lineWidthPx={1.6} />;
});

interface GroundLabelProps {
  text: string;
  position: Point3;
  heightM: number;
}

/** A short label lying by the lifter when it is on the ground. */
export const GroundLabel = memo(function GroundLabel({ text, position, heightM }: GroundLabelProps) {
  const { texture, aspect } = useMemo(() => textTexture(text), [text]);
  return (
    <sprite position={position} scale={[aspect * heightM, heightM, 1]} name="grounded-label">
      <spriteMaterial map={texture} transparent depthWrite={false} toneMapped={false} />
    </sprite>
  );
});

export const Ground = memo(function Ground({ y, sizeM, centreX }: { y: number; sizeM: number; centreX: number }) {
  return (
    <group position={[centreX, y, 0]} name="ground">
      {/* Unlit, so the ground reads as paper rather than as a grey slab. */}
      <mesh rotation-x={-Math.PI / 2} position-y={-0.001}>
        <planeGeometry args={[sizeM, sizeM]} />
        <meshBasicMaterial color={GROUND} toneMapped={false} />
      </mesh>
      <gridHelper args={[sizeM, 24, GRID_MAJOR, GRID_MINOR]} />
    </group>
  );
});

interface WindArrowProps {
  windMS: number;
  label?: string;
  tail: Point3;
  lengthUnitM: number;
}

/** Wind from the nose towards the tail (+x); the arrow grows gently with speed, capped. */
export const WindArrow = memo(function WindArrow({ windMS, label, tail, lengthUnitM }: WindArrowProps) {
  const lengthM = lengthUnitM * Math.min(0.6, 0.18 + 0.025 * windMS);
  const shaftRadiusM = 0.012 * lengthUnitM;
  const headLengthM = 0.08 * lengthUnitM;
  const text = label ?? "wind";
  const { texture, aspect } = useMemo(() => textTexture(text), [text]);
  const labelHeightM = 0.07 * lengthUnitM;
  return (
    <group position={tail} name="wind">
      <mesh rotation-z={-Math.PI / 2} position-x={(lengthM - headLengthM) / 2}>
        <cylinderGeometry args={[shaftRadiusM, shaftRadiusM, lengthM - headLengthM, 12]} />
        <meshLambertMaterial color={ACCENT_DARK} />
      </mesh>
      <mesh rotation-z={-Math.PI / 2} position-x={lengthM - headLengthM / 2}>
        <coneGeometry args={[3 * shaftRadiusM, headLengthM, 16]} />
        <meshLambertMaterial color={ACCENT_DARK} />
      </mesh>
      <sprite position={[lengthM / 2, 1.2 * labelHeightM, 0]} scale={[aspect * labelHeightM, labelHeightM, 1]}>
        <spriteMaterial map={texture} transparent depthWrite={false} toneMapped={false} />
      </sprite>
    </group>
  );
});
