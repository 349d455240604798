/**
 * `npx tsx scripts/tether-line-figures.ts [setup.json]`: the payload's height, blowdown and the
 * line's angle at the anchor for a setup's wind case, beside what a straight, weightless line at
 * the lifter's tether angle would give. Defaults to tests/fixtures/camera-line-setup.json: the
 * 1.1 m³ lifter with a 0.6 kg camera on 100 m of 2 mm, 2.5 g/m line in a uniform 5 m/s.
 */
import { readFileSync } from "node:fs";
import { balanceInputSchema, degreesToRadians, evaluateBalance } from "../lib/balance";

const file = process.argv[2] ?? new URL("../tests/fixtures/camera-line-setup.json", import.meta.url);
const input = balanceInputSchema.parse(JSON.parse(readFileSync(file, "utf8")));
const result = evaluateBalance(input);
const wind = result.wind;
if (!wind?.line || !input.tether) {
  process.stderr.write("that setup has no tether line in its wind case\n");
  process.exit(2);
}
const lineOutM = input.tether.lengthOutM;
const angleRad = degreesToRadians(wind.tetherAngleDeg);
const row = (label: string, straight: string, curved: string): string =>
  `${label.padEnd(34)}${straight.padStart(12)}${curved.padStart(12)}`;
console.log(`wind ${input.site?.windMS ?? 0} m/s (at the lifter ${wind.windAtLifterMS.toFixed(2)} m/s), ${lineOutM} m of line out`);
console.log(row("", "straight", "curved"));
console.log(
  row(
    "tether point height above ground",
    `${(lineOutM * Math.cos(angleRad)).toFixed(1)} m`,
    `${wind.line.heightAboveGroundM.toFixed(1)} m`,
  ),
);
console.log(
  row("blowdown (downwind of the anchor)", `${(lineOutM * Math.sin(angleRad)).toFixed(1)} m`, `${wind.line.blowdownM.toFixed(1)} m`),
);
console.log(row("line angle from vertical at anchor", `${wind.tetherAngleDeg.toFixed(1)}°`, `${wind.line.anchorAngleDeg.toFixed(1)}°`));
console.log(row("line angle from vertical at lifter", `${wind.tetherAngleDeg.toFixed(1)}°`, `${wind.tetherAngleDeg.toFixed(1)}°`));
console.log(row("tension at the anchor", `${wind.tensionN.toFixed(2)} N`, `${wind.line.anchorTensionN.toFixed(2)} N`));
console.log(row("line on the ground", "0 m", `${wind.line.lengthOnGroundM.toFixed(1)} m`));
