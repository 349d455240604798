"use client";
/**
 * The envelope from its GLB (public/models, body frame). Materials are set here rather than taken
 * from the file so the look stays in one place (palette.ts) for every model.
 */
import { useGLTF } from "@react-three/drei";
import { memo } from "react";
import type { BufferGeometry, Object3D } from "three";
import { FABRIC, FIN_FABRIC, SEAM } from "./palette";

/** Body (x, y, z) → three (x, z, −y). */
const BODY_TO_THREE_ROTATION_X = -Math.PI / 2;

function geometryOf(node: Object3D | undefined): BufferGeometry | null {
  return node && "geometry" in node ? (node.geometry as BufferGeometry) : null;
}

export const Envelope = memo(function Envelope({ url }: { url: string }) {
  // No Draco or meshopt: our files are plain, and the default Draco decoder would be fetched from a CDN.
  const gltf = useGLTF(url, false, false);
  const hull = geometryOf(gltf.nodes.hull);
  const fins = geometryOf(gltf.nodes.fins);
  const seams = geometryOf(gltf.nodes.seams);
  if (!hull) return <primitive object={gltf.scene} rotation-x={BODY_TO_THREE_ROTATION_X} />;
  return (
    <group rotation-x={BODY_TO_THREE_ROTATION_X} name="envelope">
      <mesh geometry={hull} name="hull">
        <meshLambertMaterial color={FABRIC} />
      </mesh>
      {fins ? (
        <mesh geometry={fins} name="fins">
          <meshLambertMaterial color={FIN_FABRIC} />
        </mesh>
      ) : null}
      {seams ? (
        <lineSegments geometry={seams} name="seams">
          <lineBasicMaterial color={SEAM} transparent opacity={0.85} />
        </lineSegments>
      ) : null}
    </group>
  );
});
