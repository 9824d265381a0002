/** Exact by definition (international inch and mile). */
export const MM_PER_INCH = 25.4;
export const KM_PER_MILE = 1.609344;
/** 1 psi = 6.894757293168 kPa (pound-force per square inch, exact from the pound and inch). */
export const KPA_PER_PSI = 6.894757293168361;
/** The pound factor used for tire load tables (kg × 2.20462, rounded). */
export const LB_PER_KG = 2.20462;

export const mmToIn = (mm: number): number => mm / MM_PER_INCH;
export const inToMm = (inches: number): number => inches * MM_PER_INCH;
export const kgToLb = (kg: number): number => kg * LB_PER_KG;
export const lbToKg = (lb: number): number => lb / LB_PER_KG;
export const kmhToMph = (kmh: number): number => kmh / KM_PER_MILE;
export const mphToKmh = (mph: number): number => mph * KM_PER_MILE;
export const kpaToPsi = (kPa: number): number => kPa / KPA_PER_PSI;
export const psiToKpa = (psi: number): number => psi * KPA_PER_PSI;
