import { describe, expect, it } from "vitest";
import {
  DEFAULT_ENVELOPE_LINE_COUNT,
  DEFAULT_ENVELOPE_WIND_COUNT,
  ENVELOPE_MIN_LINE_OUT_M,
  evaluateBalance,
  operatingEnvelope,
  operatingEnvelopeTable,
  worstLevel,
  type BalanceInput,
} from "@/lib/balance";
import { demoSetup } from "./setups";

/** The demo with its whip under the mount (clear of the line) and a 2 mm line. */
function clearDemo(): BalanceInput {
  const demo = demoSetup();
  return {
    ...demo,
    payloads: [{ ...demo.payloads[0], offset: { ...demo.payloads[0].offset, x: 0 } }, demo.payloads[1]],
    tether: { ...demo.tether!, diameterM: 0.002 },
  };
}

describe("operatingEnvelope", () => {
  const setup = clearDemo();
  const envelope = operatingEnvelope(setup, { targetHeightM: 30 });

  it("returns a grid of 16 winds from 0 to 15 m/s by 20 line-outs from 10 m to the most it lifts in calm air", () => {
    expect(envelope.reason).toBeNull();
    expect(envelope.windsMS).toHaveLength(DEFAULT_ENVELOPE_WIND_COUNT);
    expect(envelope.windsMS[0]).toBe(0);
    expect(envelope.windsMS[15]).toBe(15);
    expect(envelope.linesOutM).toHaveLength(DEFAULT_ENVELOPE_LINE_COUNT);
    expect(envelope.linesOutM[0]).toBe(ENVELOPE_MIN_LINE_OUT_M);
    expect(envelope.linesOutM[19]).toBeCloseTo(evaluateBalance(setup).maxTetherOutM!, 9);
    expect(envelope.points).toHaveLength(16);
    for (const column of envelope.points) expect(column).toHaveLength(20);
    // The demo's gust is 7/4 of its wind: every point keeps that factor.
    expect(envelope.gustFactor).toBeCloseTo(7 / 4, 12);
  });

  it("returns at each point the evaluation's own height, blowdown and worst flag", () => {
    for (const [i, j] of [
      [0, 0],
      [4, 6],
      [15, 19],
      [9, 12],
    ]) {
      const point = envelope.points[i][j];
      const result = evaluateBalance({
        ...setup,
        site: { ...setup.site, windMS: point.windMS, gustMS: (7 / 4) * point.windMS },
        tether: { ...setup.tether!, lengthOutM: point.lineOutM },
      });
      expect(point.heightAboveGroundM).toBe(result.wind!.line!.heightAboveGroundM);
      expect(point.blowdownM).toBe(result.wind!.line!.blowdownM);
      expect(point.worstLevel).toBe(worstLevel(result.flags));
      expect(point.worstCode === null).toBe(point.worstLevel === "ok");
    }
    // In calm air the line hangs straight: height = line out.
    for (const point of envelope.points[0]) expect(point.heightAboveGroundM).toBeCloseTo(point.lineOutM, 9);
  });

  it("returns the wind up to which every flag stays ok at the setup's line out, with a flag past it", () => {
    const highest = envelope.highestAllOkWindMS;
    expect(highest).not.toBeNull();
    const at = (windMS: number) =>
      worstLevel(evaluateBalance({ ...setup, site: { ...setup.site, windMS, gustMS: (7 / 4) * windMS } }).flags);
    expect(at(highest!)).toBe("ok");
    expect(at(highest! + 0.01)).not.toBe("ok");
    expect(envelope.highestWithoutStopWindMS!).toBeGreaterThanOrEqual(highest!);
  });

  it("returns the line out that puts the tether point at the target height in the setup's wind", () => {
    const target = envelope.target!;
    expect(target.windMS).toBe(setup.site!.windMS);
    expect(target.lineOutM).not.toBeNull();
    const reached = evaluateBalance({ ...setup, tether: { ...setup.tether!, lengthOutM: target.lineOutM! } }).wind!.line!
      .heightAboveGroundM;
    expect(reached).toBeCloseTo(30, 2);
    expect(target.lineOutM!).toBeGreaterThan(30); // the line leans and sags: more line than height
    // Out of reach: no line it can lift puts it that high.
    expect(operatingEnvelope(setup, { targetHeightM: 5000 }).target?.lineOutM).toBeNull();
  });

  it("returns no grid, and says why, without a tether, without free lift, or with too little lift for 10 m", () => {
    expect(operatingEnvelope({ ...setup, tether: undefined }).reason).toBe("no-tether");
    expect(operatingEnvelope({ ...setup, mount: { ...setup.mount, massKg: 1 } }).reason).toBe("no-free-lift");
    expect(operatingEnvelope({ ...setup, tether: { ...setup.tether!, massPerMetreKg: 0.05 } }).reason).toBe("too-little-line");
    expect(operatingEnvelope({ ...setup, tether: undefined }).points).toEqual([]);
  });
});

describe("operatingEnvelopeTable", () => {
  it("returns one row per line out with one cell per wind, for printing", () => {
    const envelope = operatingEnvelope(clearDemo(), { windCount: 4, lineCount: 3 });
    const table = operatingEnvelopeTable(envelope);
    expect(table.windsMS).toEqual([0, 5, 10, 15]);
    expect(table.rows.map((r) => r.lineOutM)).toEqual(envelope.linesOutM);
    expect(table.rows[2].cells[1]).toBe(envelope.points[1][2]);
  });
});
