"use client";
/**
 * The Planner's 3D view: envelope, belly rail, mount and payloads, bridle and tether, markers,
 * wind. Draws exactly its props (see types.ts); the only fetch is the envelope's GLB.
 */
import { OrbitControls } from "@react-three/drei";
import { memo, Suspense, useEffect, useMemo, useRef, type RefObject } from "react";
import type { Group, Mesh } from "three";
import type { OrbitControls as OrbitControlsImpl } from "three-stdlib";
import { Envelope } from "./envelope";
import { pitchedWorldPoint, sceneScale, DEG, type SceneScale } from "./frame";
import { Markers } from "./markers";
import { PAPER } from "./palette";
import { MountScreenProbe, ReadySignal } from "./probes";
import { Mount, Rail } from "./rail-mount";
import { Bridle, Ground, GroundLabel, Tether, WindArrow } from "./rigging";
import type { SceneCallbacks, SceneDrawing } from "./types";
import { useMountDrag } from "./use-mount-drag";

/** Keeps the camera above the ground: the target is above it, so stop just short of level. */
const MAX_POLAR_RAD = Math.PI / 2 - 0.06;

type LifterProps = SceneDrawing & SceneCallbacks;

/** Everything the view draws, on whichever thread draws it (inline-view.tsx or scene.worker.tsx). */
export const Lifter = memo(function Lifter(props: LifterProps) {
  const {
    glbUrl,
    hullLengthM,
    hullMaxDiameterM,
    rail,
    railTabCount,
    mountX,
    payloads,
    buoyancyCentre,
    centreOfMass,
    tetherPoint,
    trimDeg: flyingTrimDeg,
    tetherAngleDeg,
    windMS,
    windLabel,
    draggable,
    viewResetCount,
    onMountDrag,
    onMountDragEnd,
    onReady,
    onMountScreen,
    onMountDragFrame,
    mountSelected = false,
    tetherLine = null,
    grounded = false,
    groundedLabel,
  } = props;
  // A lifter that does not fly rests level on the ground.
  const trimDeg = grounded ? 0 : flyingTrimDeg;
  const bodyRef = useRef<Group>(null);
  const controlsRef = useRef<OrbitControlsImpl>(null);
  const mountRef = useRef<Mesh>(null);
  const scale = useMemo(() => sceneScale(hullLengthM, hullMaxDiameterM, tetherPoint), [hullLengthM, hullMaxDiameterM, tetherPoint]);
  const unitM = scale.lengthM;
  // On the ground, the ground comes up to the lowest thing hung under it (drawing only).
  const lowestZ = useMemo(
    () => Math.min(-0.5 * hullMaxDiameterM, tetherPoint.z, ...payloads.map((p) => rail.z + p.offset.z - 0.5 * p.heightM)),
    [hullMaxDiameterM, tetherPoint.z, payloads, rail.z],
  );
  const groundY = grounded ? lowestZ - 0.01 * unitM : scale.groundY;
  const { onPointerDown } = useMountDrag({
    bodyRef,
    controlsRef,
    railStartX: rail.startX,
    railEndX: rail.endX,
    railZ: rail.z,
    onMountDrag: draggable ? onMountDrag : undefined,
    onMountDragEnd,
    onMountDragFrame,
  });
  useViewReset(controlsRef, viewResetCount, scale);

  // Memoised on the numbers, not the objects: the Planner hands new objects on every drag.
  const { x: tx, z: tz } = tetherPoint;
  const { x: bx, z: bz } = buoyancyCentre;
  const mx = centreOfMass?.x;
  const mz = centreOfMass?.z;
  const tetherWorld = useMemo(() => [tx, tz, 0] as [number, number, number], [tx, tz]);
  const buoyancyWorld = useMemo(() => pitchedWorldPoint({ x: bx, z: bz }, { x: tx, z: tz }, trimDeg), [bx, bz, tx, tz, trimDeg]);
  const massWorld = useMemo(
    () => (mx === undefined || mz === undefined ? null : pitchedWorldPoint({ x: mx, z: mz }, { x: tx, z: tz }, trimDeg)),
    [mx, mz, tx, tz, trimDeg],
  );
  const guideToY = tetherPoint.z - 0.12 * unitM;
  const guideFromY = 0.5 * hullMaxDiameterM + 0.12 * unitM;
  const windTail = useMemo<[number, number, number]>(
    () => [-0.75 * unitM, 0.5 * hullMaxDiameterM + 0.05 * unitM, 0],
    [unitM, hullMaxDiameterM],
  );

  return (
    <>
      <color attach="background" args={[PAPER]} />
      {/* Fog into the paper colour hides the ground's edge at any zoom. */}
      <fog attach="fog" args={[PAPER, 5 * unitM, 14 * unitM]} />
      <hemisphereLight args={["#ffffff", "#d8d2c4", 1.4]} />
      <directionalLight position={[2 * unitM, 4 * unitM, 3 * unitM]} intensity={1.6} />
      <directionalLight position={[-2 * unitM, 1 * unitM, -3 * unitM]} intensity={0.5} />
      <Ground y={groundY} sizeM={40 * unitM} centreX={scale.target[0]} />

      {/* Pitch about the tether point: nose up (+) is a clockwise turn with the nose on the left. */}
      <group position={tetherWorld} rotation-z={-trimDeg * DEG}>
        <group ref={bodyRef} position={[-tetherPoint.x, -tetherPoint.z, 0]} name="lifter-body">
          <Suspense fallback={null}>
            <Envelope url={glbUrl} />
            <ReadySignal onReady={onReady} />
          </Suspense>
          <Rail
            startX={rail.startX}
            endX={rail.endX}
            z={rail.z}
            tabCount={railTabCount}
            unitM={unitM}
            onPointerDown={onPointerDown}
            draggable={draggable}
          />
          <Mount
            x={mountX}
            z={rail.z}
            unitM={unitM}
            payloads={payloads}
            selected={mountSelected}
            mountRef={mountRef}
            onPointerDown={onPointerDown}
            draggable={draggable}
          />
          <Bridle tetherPoint={tetherPoint} railStartX={rail.startX} railEndX={rail.endX} railZ={rail.z} />
        </group>
      </group>

      <Tether top={tetherWorld} tetherAngleDeg={grounded ? 0 : tetherAngleDeg} groundY={groundY} shape={grounded ? null : tetherLine} />
      {grounded && groundedLabel ? (
        <GroundLabel
          text={groundedLabel}
          position={[0.5 * hullLengthM, groundY + 0.04 * unitM, 1.2 * hullMaxDiameterM]}
          heightM={0.07 * unitM}
        />
      ) : null}
      <Markers
        buoyancy={buoyancyWorld}
        mass={massWorld}
        tether={tetherWorld}
        sizeM={0.07 * unitM}
        guideFromY={guideFromY}
        guideToY={guideToY}
      />
      {windMS > 0 && !grounded ? <WindArrow windMS={windMS} label={windLabel} tail={windTail} lengthUnitM={unitM} /> : null}

      <OrbitControls
        ref={controlsRef}
        makeDefault
        target={scale.target}
        enablePan={false}
        enableDamping={false}
        minDistance={scale.minDistanceM}
        maxDistance={scale.maxDistanceM}
        maxPolarAngle={MAX_POLAR_RAD}
      />
      <MountScreenProbe mountRef={mountRef} onMountScreen={onMountScreen} />
    </>
  );
});

/** Puts the camera back where it started each time the count grows (the page's "Reset view"). */
function useViewReset(controlsRef: RefObject<OrbitControlsImpl | null>, viewResetCount: number, scale: SceneScale): void {
  const handled = useRef(viewResetCount);
  useEffect(() => {
    const controls = controlsRef.current;
    if (!controls || viewResetCount === handled.current) return;
    handled.current = viewResetCount;
    controls.object.position.set(...scale.cameraPosition);
    controls.target.set(...scale.target);
    controls.update(); // dispatches "change", which asks the demand loop for a frame
  }, [controlsRef, viewResetCount, scale]);
}
