"use client";
/**
 * A line of constant on-screen width through given points (three-stdlib's Line2), for lines whose
 * points change while the person drags: the guides from B and M, the bridle, the tether.
 *
 * Not drei's <Line>: it builds a new geometry for new points and, when the old one goes, disposes
 * the material it keeps using, so three releases the shader program and compiles it again on the
 * next draw. During a drag that was a compile for every frame (most of a frame's time on a
 * software renderer). Here the line and its material live as long as the component; new points
 * get a new geometry and only the old geometry is disposed.
 */
import { useThree } from "@react-three/fiber";
import { useEffect, useLayoutEffect, useMemo } from "react";
import { Line2, LineGeometry, LineMaterial } from "three-stdlib";

export type LinePoint = readonly [number, number, number];

interface PolyLineProps {
  points: readonly LinePoint[];
  color: string;
  /** On-screen width in CSS pixels. */
  lineWidthPx?: number;
  dashed?: boolean;
  dashSize?: number;
  gapSize?: number;
  opacity?: number;
  /** Drawn over whatever is in front (the guides through the hull). */
  onTop?: boolean;
  renderOrder?: number;
  name?: string;
}

export function PolyLine({
  points,
  color,
  lineWidthPx = 1,
  dashed = false,
  dashSize = 1,
  gapSize = 1,
  opacity = 1,
  onTop = false,
  renderOrder = 0,
  name,
}: PolyLineProps) {
  const width = useThree((state) => state.size.width);
  const height = useThree((state) => state.size.height);
  const line = useMemo(() => new Line2(), []);
  const material = useMemo(() => new LineMaterial(), []);
  const geometry = useMemo(() => {
    const next = new LineGeometry();
    next.setPositions(points.flat());
    return next;
  }, [points]);

  // R3F never disposes a primitive: the old geometry goes when new points replace it, the
  // material only with the component.
  useEffect(() => () => geometry.dispose(), [geometry]);
  useEffect(() => () => material.dispose(), [material]);
  // Dashes are laid out along the line's length, once its geometry is attached.
  useLayoutEffect(() => {
    if (dashed) line.computeLineDistances();
  }, [line, geometry, dashed]);

  return (
    <primitive object={line} name={name} renderOrder={renderOrder}>
      <primitive object={geometry} attach="geometry" />
      <primitive
        object={material}
        attach="material"
        color={color}
        linewidth={lineWidthPx}
        resolution={[width, height]}
        dashed={dashed}
        dashSize={dashSize}
        gapSize={gapSize}
        opacity={opacity}
        transparent={opacity < 1}
        depthTest={!onTop}
      />
    </primitive>
  );
}
