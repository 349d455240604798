"use client";
/**
 * Payloads hung from the mount's attachment point, each at its own size. A flag level adds a
 * coloured outline (second cue; the balance panel carries the words).
 */
import { Edges } from "@react-three/drei";
import { memo, useMemo } from "react";
import { FLAG_COLOURS, LINE, PAYLOAD } from "./palette";
import { PolyLine } from "./polyline";
import type { ScenePayload } from "./types";

/** Keeps a zero-size input drawable (and pickable) rather than a degenerate geometry. */
const MIN_SIZE_M = 0.004;
const size = (valueM: number): number => Math.max(MIN_SIZE_M, valueM);

function PayloadShape({ payload }: { payload: ScenePayload }) {
  const outline = payload.level && payload.level !== "ok" ? FLAG_COLOURS[payload.level] : null;
  const edges = outline ? <Edges color={outline} lineWidth={2} threshold={20} /> : null;
  const material = <meshLambertMaterial color={PAYLOAD} />;
  if (payload.shape === "box") {
    return (
      <mesh name={`payload:${payload.key}`}>
        {/* three is y-up: body (length x, width y, height z) → (x, z, y) */}
        <boxGeometry args={[size(payload.lengthM), size(payload.heightM), size(payload.widthM)]} />
        {material}
        {edges}
      </mesh>
    );
  }
  if (payload.shape === "cylinder") {
    const radiusM = size(payload.lengthM) / 2;
    return (
      <mesh name={`payload:${payload.key}`}>
        <cylinderGeometry args={[radiusM, radiusM, size(payload.heightM), 24]} />
        {material}
        {edges}
      </mesh>
    );
  }
  const radiusM = size(payload.widthM) / 2;
  return (
    <mesh name={`payload:${payload.key}`}>
      <cylinderGeometry args={[radiusM, radiusM, size(payload.heightM), 8]} />
      <meshLambertMaterial color={outline ?? PAYLOAD} />
    </mesh>
  );
}

function samePayload(a: ScenePayload, b: ScenePayload): boolean {
  return (
    a.key === b.key &&
    a.label === b.label &&
    a.shape === b.shape &&
    a.lengthM === b.lengthM &&
    a.widthM === b.widthM &&
    a.heightM === b.heightM &&
    a.offset.x === b.offset.x &&
    a.offset.z === b.offset.z &&
    a.level === b.level
  );
}

/** One payload with a hang line from the attachment point (local origin) to its top. */
const Payload = memo(
  function Payload({ payload }: { payload: ScenePayload }) {
    const topZ = payload.offset.z + size(payload.heightM) / 2;
    const hangPoints = useMemo<[number, number, number][]>(
      () => [
        [0, 0, 0],
        [payload.offset.x, Math.min(0, topZ), 0],
      ],
      [payload.offset.x, topZ],
    );
    // A payload above the attachment (rare) needs no hang line.
    const showHang = topZ < 0 && Math.hypot(payload.offset.x, topZ) > 1e-3;
    return (
      <group>
        {showHang ? <PolyLine points={hangPoints} color={LINE} /> : null}
        <group position={[payload.offset.x, payload.offset.z, 0]}>
          <PayloadShape payload={payload} />
        </group>
      </group>
    );
  },
  (previous, next) => samePayload(previous.payload, next.payload),
);

export const Payloads = memo(function Payloads({ payloads }: { payloads: ScenePayload[] }) {
  return (
    <group name="payloads">
      {payloads.map((payload) => (
        <Payload key={payload.key} payload={payload} />
      ))}
    </group>
  );
});
