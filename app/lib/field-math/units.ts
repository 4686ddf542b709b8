/**
 * Unit factors, exact by definition (NIST SP 811 App. B; NIST Handbook 44), in one place.
 * Everything else in Tankside converts through these.
 */
export const FT_TO_M = 0.3048;
export const IN_TO_MM = 25.4;
export const LB_TO_KG = 0.45359237;
export const GAL_TO_L = 3.785411784;
export const SQFT_PER_ACRE = 43_560;
export const SQM_PER_HA = 10_000;
export const LBF_TO_N = 4.4482216152605;
export const FTLBF_TO_NM = LBF_TO_N * FT_TO_M; // 1.3558179483…
export const PSI_TO_KPA = LBF_TO_N / (0.0254 * 0.0254) / 1000; // 6.894757…
/**
 * Water near 60 °F weighs about 8.34 lb per US gal: 999.0 kg/m³ at 15.6 °C (CRC Handbook of
 * Chemistry and Physics, density of water table) × the exact gallon and pound → 8.337 lb/gal.
 */
export const WATER_KG_PER_M3_AT_60F = 999.0;
export const WATER_LB_PER_GAL = (WATER_KG_PER_M3_AT_60F * GAL_TO_L) / 1000 / LB_TO_KG;
/** ft of water head per psi: 2.31 (NDSU Extension AE1057, Table 1). */
export const FT_HEAD_PER_PSI = 2.31;

export const SQFT_TO_SQM = FT_TO_M * FT_TO_M;
export const ACRE_TO_HA = (SQFT_PER_ACRE * SQFT_TO_SQM) / SQM_PER_HA;
/** lb/acre → kg/ha, derived from the exact factors: 1.12085… */
export const LB_PER_ACRE_TO_KG_PER_HA = LB_TO_KG / ACRE_TO_HA;

export const ftToM = (ft: number) => ft * FT_TO_M;
export const mToFt = (m: number) => m / FT_TO_M;
export const inToMm = (inch: number) => inch * IN_TO_MM;
export const lbToKg = (lb: number) => lb * LB_TO_KG;
export const kgToLb = (kg: number) => kg / LB_TO_KG;
export const galToL = (gal: number) => gal * GAL_TO_L;
export const lToGal = (l: number) => l / GAL_TO_L;
export const acresToSqFt = (ac: number) => ac * SQFT_PER_ACRE;
export const sqFtToAcres = (sqft: number) => sqft / SQFT_PER_ACRE;
export const sqMToSqFt = (sqm: number) => sqm / SQFT_TO_SQM;
export const sqFtToSqM = (sqft: number) => sqft * SQFT_TO_SQM;
export const acresToHa = (ac: number) => ac * ACRE_TO_HA;
export const lbPerAcreToKgPerHa = (r: number) => r * LB_PER_ACRE_TO_KG_PER_HA;
export const ftLbToNm = (ftlb: number) => ftlb * FTLBF_TO_NM;
export const nmToFtLb = (nm: number) => nm / FTLBF_TO_NM;
export const psiToKpa = (psi: number) => psi * PSI_TO_KPA;
export const kpaToPsi = (kpa: number) => kpa / PSI_TO_KPA;
export const psiToFtHead = (psi: number) => psi * FT_HEAD_PER_PSI;
export const ftHeadToPsi = (ft: number) => ft / FT_HEAD_PER_PSI;
export const fToC = (f: number) => ((f - 32) * 5) / 9;
export const cToF = (c: number) => (c * 9) / 5 + 32;

/** A number for people: rounded to `digits` decimals, with thousands separators. */
export function fmt(value: number, digits = 0): string {
  return value.toLocaleString("en-US", { maximumFractionDigits: digits, minimumFractionDigits: 0 });
}
