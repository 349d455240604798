/**
 * Wind that grows with height (design.md item 11): the power law V(z) = V_ref · (z / z_ref)^α
 * (e.g. Peterson & Hennessey, J. Appl. Meteor. 17, 1978). The reference height defaults to 10 m,
 * the standard exposure of a wind measurement over open ground (WMO-No. 8, CIMO Guide); the
 * exponent defaults to 1/7, neutral air over open ground (common practice). α = 0 is the same wind
 * at every height. The law says nothing at the ground itself, where it gives no wind at all.
 */

/** WMO-No. 8 (CIMO Guide): surface wind is measured 10 m above open ground. */
export const DEFAULT_WIND_MEASURED_AT_M = 10;
/** Common practice: α = 1/7 for neutral air over open, level ground. */
export const DEFAULT_WIND_SHEAR_EXPONENT = 1 / 7;

export interface WindProfile {
  /** The wind as measured, m/s. */
  readonly referenceMS: number;
  /** Where it was measured, m above the ground. */
  readonly referenceHeightM: number;
  /** α of the power law; 0 = uniform wind. */
  readonly exponent: number;
}

export interface WindProfileInput {
  readonly windMeasuredAtM?: number;
  readonly windShearExponent?: number;
}

export function windProfile(referenceMS: number, site: WindProfileInput | undefined): WindProfile {
  return {
    referenceMS,
    referenceHeightM: site?.windMeasuredAtM ?? DEFAULT_WIND_MEASURED_AT_M,
    exponent: site?.windShearExponent ?? DEFAULT_WIND_SHEAR_EXPONENT,
  };
}

/** V(z) = V_ref · (z / z_ref)^α for z > 0; no wind at or below the ground (z ≤ 0) unless α = 0. */
export function windAtHeightMS(profile: WindProfile, heightM: number): number {
  if (profile.exponent === 0) return profile.referenceMS;
  if (!(heightM > 0)) return 0;
  return profile.referenceMS * Math.pow(heightM / profile.referenceHeightM, profile.exponent);
}
