/**
 * Moored-balloon rules as cautions (design.md "Cautions to show"). Trimrail defers to local law;
 * these flags only say when a well-known threshold is crossed:
 *  - 14 CFR 101.1(a)(1) (US): Part 101 applies to a moored balloon over 6 ft in diameter or with
 *    more than 115 ft³ of gas;
 *  - 14 CFR 101.15 (US): above 150 ft, notify the nearest ATC facility at least 24 h before;
 *  - UK Air Navigation Order 2016, art. 92: no tethered balloon or kite above 60 m without permission.
 */
import { figure, makeFlag, type Flag } from "./flags";
import { cubicFeetToCubicMetres, feetToMetres } from "./units-si";

export const PART_101_GAS_VOLUME_M3 = cubicFeetToCubicMetres(115);
export const PART_101_DIAMETER_M = feetToMetres(6);
export const PART_101_NOTIFY_HEIGHT_M = feetToMetres(150);
export const UK_ANO_TETHERED_HEIGHT_M = 60;

export function rulesFlags(gasVolumeM3: number, maxDiameterM: number | null, tetherOutM: number | null, out: Flag[]): void {
  const gasVolume = figure("volume", gasVolumeM3, PART_101_GAS_VOLUME_M3);
  const diameter = maxDiameterM === null ? undefined : figure("length", maxDiameterM, PART_101_DIAMETER_M);
  const over = gasVolumeM3 > PART_101_GAS_VOLUME_M3 || (maxDiameterM !== null && maxDiameterM > PART_101_DIAMETER_M);
  out.push(
    makeFlag("moored-balloon-rules", over ? "caution" : "ok", {
      figures: diameter ? { gasVolume, diameter } : { gasVolume },
      params: {},
    }),
  );
  if (tetherOutM !== null && tetherOutM > PART_101_NOTIFY_HEIGHT_M) {
    out.push(
      makeFlag("tether-height", "caution", {
        figures: {
          usNotice: figure("distance", tetherOutM, PART_101_NOTIFY_HEIGHT_M),
          ukPermission: figure("distance", tetherOutM, UK_ANO_TETHERED_HEIGHT_M),
        },
        params: {},
      }),
    );
  }
}
