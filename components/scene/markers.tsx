"use client";
/**
 * Centre of buoyancy (hollow ring, "B"), centre of mass (quartered disc, "M") and tether point
 * (diamond, "T"), each with a thin vertical guide so fore/aft reads at a glance. Drawn in the
 * world (after pitch) so the guides stay truly vertical; always on top of the envelope because
 * B sits inside the hull.
 */
import { memo, useMemo } from "react";
import { markerTexture, type MarkerKind } from "./label-texture";
import { BUOYANCY, INK } from "./palette";
import { PolyLine, type LinePoint } from "./polyline";

const ON_TOP = 20;

interface MarkerProps {
  kind: MarkerKind;
  position: [number, number, number];
  sizeM: number;
  guide?: { fromY: number; toY: number; colour: string; dashed: boolean };
}

export const Marker = memo(function Marker({ kind, position, sizeM, guide }: MarkerProps) {
  const map = useMemo(() => markerTexture(kind), [kind]);
  const guidePoints = useMemo<LinePoint[] | null>(
    () =>
      guide
        ? [
            [position[0], guide.fromY, 0],
            [position[0], guide.toY, 0],
          ]
        : null,
    [guide, position],
  );
  return (
    <group>
      <sprite position={position} scale={[2 * sizeM, sizeM, 1]} center={[0.25, 0.5]} renderOrder={ON_TOP}>
        <spriteMaterial map={map} transparent depthTest={false} depthWrite={false} toneMapped={false} />
      </sprite>
      {guide && guidePoints ? (
        <PolyLine
          points={guidePoints}
          color={guide.colour}
          dashed={guide.dashed}
          dashSize={0.3 * sizeM}
          gapSize={0.2 * sizeM}
          opacity={0.8}
          onTop
          renderOrder={ON_TOP - 1}
        />
      ) : null}
    </group>
  );
});

interface MarkersProps {
  buoyancy: [number, number, number];
  mass: [number, number, number] | null;
  tether: [number, number, number];
  sizeM: number;
  guideFromY: number;
  guideToY: number;
}

export const Markers = memo(function Markers({ buoyancy, mass, tether, sizeM, guideFromY, guideToY }: MarkersProps) {
  const buoyancyGuide = useMemo(() => ({ fromY: guideFromY, toY: guideToY, colour: BUOYANCY, dashed: true }), [guideFromY, guideToY]);
  const massGuide = useMemo(() => ({ fromY: guideFromY, toY: guideToY, colour: INK, dashed: false }), [guideFromY, guideToY]);
  return (
    <group>
      <Marker kind="buoyancy" position={buoyancy} sizeM={sizeM} guide={buoyancyGuide} />
      {mass ? <Marker kind="mass" position={mass} sizeM={sizeM} guide={massGuide} /> : null}
      <Marker kind="tether" position={tether} sizeM={0.8 * sizeM} />
    </group>
  );
});
