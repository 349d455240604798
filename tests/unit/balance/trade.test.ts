import { describe, expect, it } from "vitest";
import { evaluateBalance, type BalanceInput } from "@/lib/balance";
import { symmetricSetup } from "./setups";

// references.md, "Facts of the trade" — common practice, no published source.
describe("evaluateBalance against the trade's experience (common practice)", () => {
  it("lets a ~1.1 m³ envelope of ~0.47 kg carry ~0.6 kg near sea level with a few percent of free lift", () => {
    const base = symmetricSetup();
    for (const purity of [0.98, 0.99, 1]) {
      for (const altitudeM of [0, 100]) {
        const setup: BalanceInput = {
          ...base,
          envelope: { ...base.envelope, gasVolumeM3: 1.1, massKg: 0.47 },
          gas: { purity },
          site: { altitudeM },
          // the 0.6 kg includes the mount
          mount: { ...base.mount, massKg: 0.04 },
          payloads: [{ ...base.payloads[0], massKg: 0.56 }],
        };
        const result = evaluateBalance(setup);
        expect(result.freeLiftKg).toBeGreaterThan(0);
        expect(result.freeLiftRatio).toBeLessThan(0.1);
      }
    }
  });
});
