/**
 * Rounding of reported figures: one rule for summary.json and for every figure shown to a reader
 * (src/output/format.ts re-exports it), so a number reads the same in every file.
 */

/**
 * `v` rounded to `digits` decimals: Math.round on v · 10^digits, so halves round towards +∞ on the
 * scaled binary value (1.25 → 1.3, −1.25 → −1.2; 1.005 → 1 because 1.005 · 100 = 100.4999… in binary).
 */
export const round = (v: number, digits = 2): number => Math.round(v * 10 ** digits) / 10 ** digits;
