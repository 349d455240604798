/**
 * Constants and unit conversions. The engine is SI inside; these helpers exist for inputs that
 * arrive in other units and for tests that check published figures given in lb, in, ft³, ksi.
 */

/** Standard acceleration of gravity, m/s² (ISO 2533; 3rd CGPM 1901). */
export const STANDARD_GRAVITY_MS2 = 9.80665;
/** Universal gas constant as used by ISO 2533 / US Standard Atmosphere 1976, J/(kmol·K). */
export const MOLAR_GAS_CONSTANT_ISA_J_PER_KMOL_K = 8314.32;
/** Molar mass of dry air, kg/kmol (ISO 2533). */
export const MOLAR_MASS_AIR_KG_PER_KMOL = 28.9644;
/** Specific gas constant of dry air, J/(kg·K), as tabulated by ISO 2533. */
export const SPECIFIC_GAS_CONSTANT_AIR_J_PER_KG_K = 287.05287;
/** Standard atomic weight of helium, kg/kmol (IUPAC/CIAAW). */
export const MOLAR_MASS_HELIUM_KG_PER_KMOL = 4.002602;
/**
 * Specific gas constant of helium, J/(kg·K). Uses the same R* as the atmosphere so that the ratio
 * ρ_He/ρ_air at equal p and T is exactly M_He/M_air.
 */
export const SPECIFIC_GAS_CONSTANT_HELIUM_J_PER_KG_K = MOLAR_GAS_CONSTANT_ISA_J_PER_KMOL_K / MOLAR_MASS_HELIUM_KG_PER_KMOL;

export const ZERO_CELSIUS_K = 273.15;
/** One standard atmosphere, Pa. */
export const STANDARD_ATMOSPHERE_PA = 101_325;

// Exact definitions (international yard and pound agreement, 1959).
export const FOOT_M = 0.3048;
export const INCH_M = 0.0254;
export const POUND_KG = 0.45359237;
export const CUBIC_FOOT_M3 = FOOT_M * FOOT_M * FOOT_M;
export const POUND_FORCE_N = POUND_KG * STANDARD_GRAVITY_MS2;
export const PSI_PA = POUND_FORCE_N / (INCH_M * INCH_M);
export const KSI_PA = 1000 * PSI_PA;
/** Inch of mercury at 0 °C: 13 595.1 kg/m³ × g0 × 0.0254 m. */
export const INCH_OF_MERCURY_PA = 13_595.1 * STANDARD_GRAVITY_MS2 * INCH_M;

export const feetToMetres = (feet: number): number => feet * FOOT_M;
export const metresToFeet = (metres: number): number => metres / FOOT_M;
export const inchesToMetres = (inches: number): number => inches * INCH_M;
export const metresToInches = (metres: number): number => metres / INCH_M;
export const poundsToKg = (pounds: number): number => pounds * POUND_KG;
export const kgToPounds = (kg: number): number => kg / POUND_KG;
export const cubicFeetToCubicMetres = (cubicFeet: number): number => cubicFeet * CUBIC_FOOT_M3;
export const cubicMetresToCubicFeet = (cubicMetres: number): number => cubicMetres / CUBIC_FOOT_M3;
export const squareInchesToSquareMetres = (squareInches: number): number => squareInches * INCH_M * INCH_M;
export const squareMetresToSquareInches = (squareMetres: number): number => squareMetres / (INCH_M * INCH_M);
export const ksiToPascals = (ksi: number): number => ksi * KSI_PA;
export const poundsForceToNewtons = (poundsForce: number): number => poundsForce * POUND_FORCE_N;
export const newtonsToPoundsForce = (newtons: number): number => newtons / POUND_FORCE_N;
export const inchesOfMercuryToPascals = (inchesHg: number): number => inchesHg * INCH_OF_MERCURY_PA;
export const celsiusToKelvin = (celsius: number): number => celsius + ZERO_CELSIUS_K;
export const kelvinToCelsius = (kelvin: number): number => kelvin - ZERO_CELSIUS_K;
export const fahrenheitToKelvin = (fahrenheit: number): number => ((fahrenheit - 32) * 5) / 9 + ZERO_CELSIUS_K;
export const degreesToRadians = (degrees: number): number => (degrees * Math.PI) / 180;
export const radiansToDegrees = (radians: number): number => (radians * 180) / Math.PI;
