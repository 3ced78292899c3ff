/**
 * Unit conversions used by the takeoff. The foot and the pound are defined exactly in metric
 * terms (international yard and pound agreement, 1959), so every factor here is exact.
 */

/** Metres in one foot (exact). */
export const METRES_PER_FOOT = 0.3048;
/** Kilograms in one pound (exact). */
export const KILOGRAMS_PER_POUND = 0.45359237;
/** Inches in one foot. */
export const INCHES_PER_FOOT = 12;
/** Square feet in one square yard. */
export const SQ_FT_PER_SQ_YD = 9;
/** Cubic feet in one cubic yard. */
export const CU_FT_PER_CU_YD = 27;
/** Pounds in one short (US) ton. */
export const POUNDS_PER_SHORT_TON = 2000;
/** Ounces in one pound. */
export const OUNCES_PER_POUND = 16;

/** Inches → feet. */
export const inchesToFeet = (inches: number): number => inches / INCHES_PER_FOOT;
/** Feet → inches. */
export const feetToInches = (feet: number): number => feet * INCHES_PER_FOOT;
/** Feet → metres. */
export const feetToMetres = (feet: number): number => feet * METRES_PER_FOOT;
/** Metres → feet. */
export const metresToFeet = (metres: number): number => metres / METRES_PER_FOOT;

/** Square feet → square yards. */
export const sqFtToSqYd = (sqFt: number): number => sqFt / SQ_FT_PER_SQ_YD;
/** Square yards → square feet. */
export const sqYdToSqFt = (sqYd: number): number => sqYd * SQ_FT_PER_SQ_YD;
/** Square feet → square metres. */
export const sqFtToSqM = (sqFt: number): number => sqFt * METRES_PER_FOOT ** 2;
/** Square metres → square feet. */
export const sqMToSqFt = (sqM: number): number => sqM / METRES_PER_FOOT ** 2;

/** Cubic feet → cubic yards. */
export const cuFtToCuYd = (cuFt: number): number => cuFt / CU_FT_PER_CU_YD;
/** Cubic yards → cubic feet. */
export const cuYdToCuFt = (cuYd: number): number => cuYd * CU_FT_PER_CU_YD;
/** Cubic yards → cubic metres. */
export const cuYdToCuM = (cuYd: number): number => cuYd * (3 * METRES_PER_FOOT) ** 3;
/** Cubic metres → cubic yards. */
export const cuMToCuYd = (cuM: number): number => cuM / (3 * METRES_PER_FOOT) ** 3;

/** Pounds → short (US) tons. */
export const poundsToShortTons = (lb: number): number => lb / POUNDS_PER_SHORT_TON;
/** Short (US) tons → pounds. */
export const shortTonsToPounds = (tons: number): number => tons * POUNDS_PER_SHORT_TON;
/** Pounds → kilograms. */
export const poundsToKilograms = (lb: number): number => lb * KILOGRAMS_PER_POUND;
/** Kilograms → pounds. */
export const kilogramsToPounds = (kg: number): number => kg / KILOGRAMS_PER_POUND;
/** Ounces → pounds. */
export const ouncesToPounds = (oz: number): number => oz / OUNCES_PER_POUND;

/**
 * Volume in cubic yards of a layer `depthIn` inches deep over `areaSqFt`.
 * sq ft × in ÷ 12 = cu ft, ÷ 27 = cu yd, so the divisor is 12 × 27 = 324.
 */
export const cubicYardsOfLayer = (areaSqFt: number, depthIn: number): number =>
  (areaSqFt * depthIn) / (INCHES_PER_FOOT * CU_FT_PER_CU_YD);
