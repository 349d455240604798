"use client";
/**
 * The belly rail with its tabs, and the sliding mount (carriage + camera screw) with its
 * payloads. Both the rail and the mount start a drag. Drawn in body coordinates, three axes.
 */
import type { ThreeEvent } from "@react-three/fiber";
import { memo, useCallback, useMemo, type RefObject } from "react";
import type { Mesh } from "three";
import { ACCENT, ACCENT_DARK, RAIL, RAIL_TAB } from "./palette";
import { Payloads } from "./payloads";
import { usePointerSurface } from "./pointer-surface";
import type { ScenePayload } from "./types";

/** Proportions of the hardware relative to the hull length (drawing only). */
const RAIL_HEIGHT = 0.008;
const RAIL_WIDTH = 0.02;
const TAB_LENGTH = 0.018;
const TAB_HEIGHT = 0.02;
const CARRIAGE_LENGTH = 0.06;
const CARRIAGE_HEIGHT = 0.022;
const CARRIAGE_WIDTH = 0.04;
const SCREW_RADIUS = 0.0035;
const SCREW_LENGTH = 0.028;
/** Invisible, fatter rail used only for picking so the rail is easy to grab. */
const RAIL_PICK_SCALE = 3;

/** A grab cursor over what can be dragged. */
function useHoverCursor(draggable: boolean): (cursor: string) => void {
  const surface = usePointerSurface();
  return useCallback(
    (cursor: string) => {
      if (draggable) surface.style.setProperty("cursor", cursor);
    },
    [draggable, surface],
  );
}

interface RailProps {
  startX: number;
  endX: number;
  z: number;
  tabCount: number;
  unitM: number;
  onPointerDown: (event: ThreeEvent<PointerEvent>) => void;
  draggable: boolean;
}

export const Rail = memo(function Rail({ startX, endX, z, tabCount, unitM, onPointerDown, draggable }: RailProps) {
  const lengthM = Math.max(1e-3, Math.abs(endX - startX));
  const centreX = 0.5 * (startX + endX);
  const tabXs = useMemo(() => {
    const count = Math.max(0, Math.floor(tabCount));
    if (count === 1) return [centreX];
    return Array.from({ length: count }, (_, i) => startX + ((endX - startX) * i) / (count - 1));
  }, [tabCount, startX, endX, centreX]);
  const setCursor = useHoverCursor(draggable);
  return (
    <group name="rail" position={[centreX, z, 0]}>
      <mesh>
        <boxGeometry args={[lengthM, RAIL_HEIGHT * unitM, RAIL_WIDTH * unitM]} />
        <meshLambertMaterial color={RAIL} />
      </mesh>
      <mesh onPointerDown={onPointerDown} onPointerOver={() => setCursor("grab")} onPointerOut={() => setCursor("")}>
        <boxGeometry args={[lengthM, RAIL_PICK_SCALE * CARRIAGE_HEIGHT * unitM, RAIL_PICK_SCALE * RAIL_WIDTH * unitM]} />
        {/* Drawn but writes nothing: a hidden mesh would not be picked. */}
        <meshBasicMaterial colorWrite={false} depthWrite={false} />
      </mesh>
      {tabXs.map((x, i) => (
        <mesh key={i} position={[x - centreX, 0.5 * TAB_HEIGHT * unitM, 0]}>
          <boxGeometry args={[TAB_LENGTH * unitM, TAB_HEIGHT * unitM, 1.3 * RAIL_WIDTH * unitM]} />
          <meshLambertMaterial color={RAIL_TAB} />
        </mesh>
      ))}
    </group>
  );
});

interface MountProps {
  x: number;
  z: number;
  unitM: number;
  payloads: ScenePayload[];
  selected: boolean;
  /** On the carriage: the scene reports its screen position for tests. */
  mountRef: RefObject<Mesh | null>;
  onPointerDown: (event: ThreeEvent<PointerEvent>) => void;
  draggable: boolean;
}

/** The group's origin is the attachment point (mountX, rail z); payload offsets start there. */
export const Mount = memo(function Mount({ x, z, unitM, payloads, selected, mountRef, onPointerDown, draggable }: MountProps) {
  const carriageY = -0.5 * (RAIL_HEIGHT + CARRIAGE_HEIGHT) * unitM;
  const screwY = carriageY - 0.5 * (CARRIAGE_HEIGHT + SCREW_LENGTH) * unitM;
  const setCursor = useHoverCursor(draggable);
  return (
    <group name="mount" position={[x, z, 0]}>
      <group onPointerDown={onPointerDown} onPointerOver={() => setCursor("grab")} onPointerOut={() => setCursor("")}>
        <mesh ref={mountRef} position-y={carriageY} name="mount-carriage">
          <boxGeometry args={[CARRIAGE_LENGTH * unitM, CARRIAGE_HEIGHT * unitM, CARRIAGE_WIDTH * unitM]} />
          <meshLambertMaterial color={ACCENT} emissive={selected ? ACCENT : "#000000"} emissiveIntensity={selected ? 0.35 : 0} />
        </mesh>
        <mesh position-y={screwY}>
          <cylinderGeometry args={[SCREW_RADIUS * unitM, SCREW_RADIUS * unitM, SCREW_LENGTH * unitM, 12]} />
          <meshLambertMaterial color={ACCENT_DARK} />
        </mesh>
      </group>
      <Payloads payloads={payloads} />
    </group>
  );
});
