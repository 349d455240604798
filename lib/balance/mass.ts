/**
 * Mass and centre of mass (design.md item 4): moment = mass × arm, summed in x and z; centre =
 * total moment / total mass (the method of FAA-H-8083-1B, Aircraft Weight and Balance Handbook).
 */
import type { BalanceInput, DeepReadonly } from "./schema";
import type { Vec } from "./vec";

export interface PointMass {
  readonly massKg: number;
  readonly x: number;
  readonly z: number;
}

export interface MassSummary {
  readonly totalMassKg: number;
  /** With no mass at all, the first item's position (the envelope's mass centre in a setup). */
  readonly centreOfMass: Vec;
}

export function centreOfMass(items: readonly PointMass[]): MassSummary {
  let massKg = 0;
  let momentX = 0;
  let momentZ = 0;
  for (const item of items) {
    massKg += item.massKg;
    momentX += item.massKg * item.x;
    momentZ += item.massKg * item.z;
  }
  if (massKg > 0) return { totalMassKg: massKg, centreOfMass: { x: momentX / massKg, z: momentZ / massKg } };
  const first = items[0];
  return { totalMassKg: 0, centreOfMass: first ? { x: first.x, z: first.z } : { x: 0, z: 0 } };
}

type Input = DeepReadonly<BalanceInput>;

/** Where the mount takes its payloads: the mount's position on the rail's line. */
export function mountAttachmentPoint(input: Input): Vec {
  return { x: input.mount.positionX, z: input.envelope.rail.z };
}

/** A payload's centre of mass in the body frame: the attachment point plus its offset. */
export function payloadCentre(input: Input, index: number): Vec {
  const offset = input.payloads[index].offset;
  return { x: input.mount.positionX + offset.x, z: input.envelope.rail.z + offset.z };
}

export interface SetupMass extends MassSummary {
  /** Payloads and their adapters: what hangs from the mount's screw. */
  readonly hangingMassKg: number;
}

/** Envelope + mount + adapters + payloads (the tether is carried at the tether point). */
export function setupMass(input: Input): SetupMass {
  const { envelope, mount, payloads } = input;
  const items: PointMass[] = [
    { massKg: envelope.massKg, x: envelope.massCentre.x, z: envelope.massCentre.z },
    { massKg: mount.massKg, x: mount.positionX, z: envelope.rail.z },
  ];
  let hangingMassKg = 0;
  for (let i = 0; i < payloads.length; i++) {
    const payload = payloads[i];
    const adapterKg = payload.adapter?.massKg ?? 0;
    if (adapterKg > 0) items.push({ massKg: adapterKg, x: mount.positionX, z: envelope.rail.z });
    const centre = payloadCentre(input, i);
    items.push({ massKg: payload.massKg, x: centre.x, z: centre.z });
    hangingMassKg += payload.massKg + adapterKg;
  }
  return { ...centreOfMass(items), hangingMassKg };
}
