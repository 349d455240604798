import type { BalanceResult } from "@/lib/balance";

// Part 101 applies to a moored balloon over 6 ft in diameter or 115 ft³ of gas (14 CFR 101.1(a)(1)).
const PART_101_GAS_M3 = 115 * 0.028316846592;
const PART_101_DIAMETER_M = 6 * 0.3048;
const FT_150_M = 150 * 0.3048;

interface CautionsProps {
  gasVolumeM3: number;
  maxDiameterM: number | null;
  tetherOutM: number | null;
  hasAntenna: boolean;
  result: BalanceResult;
}

/** The usual cautions, with the ones this setup triggers said first. */
export function Cautions({ gasVolumeM3, maxDiameterM, tetherOutM, hasAntenna, result }: CautionsProps) {
  const items: string[] = [];
  if (gasVolumeM3 > PART_101_GAS_M3 || (maxDiameterM !== null && maxDiameterM > PART_101_DIAMETER_M)) {
    items.push("This envelope is above the size at which US moored-balloon rules (14 CFR Part 101) apply; check your local equivalent before flying.");
  }
  if (tetherOutM !== null && tetherOutM > FT_150_M) {
    items.push("More than 150 ft (46 m) of line: in the US that needs notice to the nearest air traffic facility 24 h ahead and pennants on the tether (14 CFR 101.15, 101.17); many countries cap tethered flight lower (60 m in the UK without permission).");
  }
  if (hasAntenna) items.push("Antennas and conductive tethers can carry current from power lines or static: keep far from overhead lines and never fly near thunderstorms.");
  if (result.freeLiftKg <= 0) items.push("Without free lift it will not fly: do not release it to find out.");
  items.push("Helium cylinders are high-pressure vessels: secure them upright and use a proper regulator.");
  items.push("Never fly near power lines, roads or airports, or in thunderstorms; follow local aviation rules and licensed practice.");
  items.push("These are planning estimates: make a test flight on a safety line before trusting a payload to it.");
  return (
    <aside aria-label="Cautions" className="border-l-4 border-flag-caution bg-white p-3 text-xs" data-testid="cautions">
      <p className="font-medium">Cautions</p>
      <ul className="mt-1 list-disc space-y-1 pl-4 text-muted">
        {items.map((text) => (
          <li key={text}>{text}</li>
        ))}
      </ul>
    </aside>
  );
}
