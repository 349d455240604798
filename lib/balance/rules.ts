/**
 * Moored-balloon rules as cautions (design.md "Cautions to show"). Trimrail defers to local law;
 * these flags only say when a well-known threshold is crossed:
 *  - 14 CFR 101.1(a)(1) (US): Part 101 applies to a moored balloon over 6 ft in diameter or with
 *    more than 115 ft³ of gas;
 *  - 14 CFR 101.15 (US): above 150 ft, notify the nearest ATC facility at least 24 h before;
 *  - UK Air Navigation Order 2016, art. 92: no tethered balloon or kite above 60 m without permission.
 */
import { fixed, makeFlag, type Flag } from "./flags";
import { cubicFeetToCubicMetres, feetToMetres } from "./units-si";

export const PART_101_GAS_VOLUME_M3 = cubicFeetToCubicMetres(115);
export const PART_101_DIAMETER_M = feetToMetres(6);
export const PART_101_NOTIFY_HEIGHT_M = feetToMetres(150);
export const UK_ANO_TETHERED_HEIGHT_M = 60;

export function rulesFlags(
  gasVolumeM3: number,
  maxDiameterM: number | null,
  tetherOutM: number | null,
  out: Flag[],
): void {
  const overVolume = gasVolumeM3 > PART_101_GAS_VOLUME_M3;
  const overDiameter = maxDiameterM !== null && maxDiameterM > PART_101_DIAMETER_M;
  out.push(overVolume || overDiameter
    ? makeFlag("moored-balloon-rules", "caution",
      `${overVolume ? `Gas volume ${fixed(gasVolumeM3, 2)} m³ is over 115 ft³ (${fixed(PART_101_GAS_VOLUME_M3, 2)} m³)` : `Diameter ${fixed(maxDiameterM ?? 0, 2)} m is over 6 ft (${fixed(PART_101_DIAMETER_M, 2)} m)`}: ` +
      "in the US 14 CFR Part 101 applies (distance from airports, cloud, 500 ft ceiling); check your local rules.",
      overVolume ? gasVolumeM3 : maxDiameterM ?? undefined, overVolume ? PART_101_GAS_VOLUME_M3 : PART_101_DIAMETER_M)
    : makeFlag("moored-balloon-rules", "ok",
      `Gas volume ${fixed(gasVolumeM3, 2)} m³ is under 115 ft³ (${fixed(PART_101_GAS_VOLUME_M3, 2)} m³)` +
      `${maxDiameterM === null ? "" : ` and ${fixed(maxDiameterM, 2)} m across is under 6 ft`}` +
      " (14 CFR 101.1); local rules still apply.", gasVolumeM3, PART_101_GAS_VOLUME_M3));
  if (tetherOutM !== null && tetherOutM > PART_101_NOTIFY_HEIGHT_M) {
    out.push(makeFlag("tether-height", "caution",
      `With ${fixed(tetherOutM, 0)} m of tether out it can fly above 150 ft (${fixed(PART_101_NOTIFY_HEIGHT_M, 1)} m): ` +
      "in the US a Part 101 balloon needs ATC notice 24 h before (14 CFR 101.15) and pennants or lights " +
      `(101.17); in the UK above ${UK_ANO_TETHERED_HEIGHT_M} m needs permission (ANO 2016 art. 92).`,
      tetherOutM, PART_101_NOTIFY_HEIGHT_M));
  }
}
