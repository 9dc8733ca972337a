/**
 * How numbers and times read in every output file and sheet: kelvin to °C for display, rounding
 * and decimals, ISO local times as "YYYY-MM-DD HH:MM", clock times, and the one mark for a value
 * that is missing (not set, not applicable, not reached). Inside the program temperatures are
 * kelvin; the conversion to °C for a reader happens here, at the edge.
 */
import { kelvinToCelsius } from '../physics/constants.ts';
import { round } from '../analysis/rounding.ts';

/** Rounding to a number of decimals: the same rule summary.json uses (src/analysis/rounding.ts). */
export { round };

/** The mark shown for a missing value, in the console sheet, the report and the charts alike. */
export const MISSING = '—';

/** °C for display, from K: T[°C] = T[K] − 273.15. */
export const celsius = (kelvin: number): number => kelvinToCelsius(kelvin);

/**
 * `v` with exactly `digits` decimals after rounding by `round` (halves up on the scaled value;
 * −0.04 → "0.0", never "-0.0"); MISSING for null, undefined, NaN and ±∞. For the report and charts.
 */
export function fixed(v: number | null | undefined, digits = 1): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return MISSING;
  return round(v, digits).toFixed(digits);
}

/**
 * `v` with exactly `digits` decimals by JavaScript's own `toFixed` (the nearest decimal to the
 * stored binary value, so 12.35 → "12.3", and −0.04 → "-0.0"); `missing` for null, undefined, NaN
 * and ±∞. For the console sheet and the CSV files, which have always been written this way.
 */
export function decimals(v: number | null | undefined, digits: number, missing = MISSING): string {
  return v === null || v === undefined || !Number.isFinite(v) ? missing : toFixedQuick(v, digits);
}

const POWERS_OF_TEN = [1, 10, 100, 1e3, 1e4, 1e5, 1e6];

/**
 * The same string as `x.toFixed(digits)` (digits 0–6, finite x), made about twice as fast for the
 * millions of cells of a long run's CSV files: the scaled value is rounded with Math.round and the
 * decimal point put in, except near a tie (within 1e-6 of a half) or for |x| · 10^digits ≥ 1e9,
 * where toFixed itself decides. Away from a tie both give the nearest integer to x · 10^digits: the
 * product's rounding error (half an ulp, below 1.2e-7 under 1e9) cannot cross a half that is more
 * than 1e-6 away. Example: toFixedQuick(-0.0004, 3) = "-0.000", as (-0.0004).toFixed(3).
 */
export function toFixedQuick(x: number, digits: number): string {
  const scale = POWERS_OF_TEN[digits];
  const scaled = Math.abs(x) * (scale ?? Number.NaN);
  if (!(scaled < 1e9) || Math.abs(scaled - Math.floor(scaled) - 0.5) < 1e-6) return x.toFixed(digits);
  let s = String(Math.round(scaled));
  if (digits > 0) {
    if (s.length <= digits) s = '0'.repeat(digits - s.length + 1) + s;
    s = `${s.slice(0, s.length - digits)}.${s.slice(s.length - digits)}`;
  }
  return x < 0 ? `-${s}` : s;
}

/** "2026-07-15T16:10:00+02:00" → "2026-07-15 16:10"; MISSING for null, undefined or an empty string. */
export function isoMinute(iso: string | null | undefined): string {
  return iso ? iso.slice(0, 16).replace('T', ' ') : MISSING;
}

/** "2026-07-15T16:10:00+02:00" → "16:10". */
export function isoClock(iso: string): string {
  return iso.slice(11, 16);
}

/** Seconds after local midnight → "HH:MM", to the nearest minute (e.g. 19 800 s → "05:30"). */
export function clockFromSeconds(seconds: number): string {
  const m = Math.round(seconds / 60);
  return `${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;
}

/** Clock hours (0–24) of an ISO local time string `YYYY-MM-DDTHH:MM[:SS]…`; 0 when it has no time. */
export function clockHours(isoLocal: string): number {
  const m = /T(\d{2}):(\d{2})(?::(\d{2}(?:\.\d+)?))?/.exec(isoLocal);
  if (!m) return 0;
  return Number(m[1]) + Number(m[2]) / 60 + Number(m[3] ?? 0) / 3600;
}

/**
 * An estimated error as read beside a figure: "± 0.066 K" (two significant digits; "± < 0.001 K"
 * below half a thousandth of the unit); '' for null, undefined or a non-finite value.
 */
export function plusMinus(v: number | null | undefined, unit: string): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '';
  return v < 0.0005 ? `± < 0.001 ${unit}` : `± ${Number(v.toPrecision(2))} ${unit}`;
}
