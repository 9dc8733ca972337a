/**
 * How far each verdict is from failing, in the limit's own unit: a positive margin passes, a
 * negative one fails. Upper limits (shell touch, lining service, allowable stress): limit − figure;
 * required dew-point margins: found margin − required margin.
 */
import type { Verdict } from './summary.ts';

/** Limits whose figure must stay at or below the limit (temperatures, stress, hours a year below a dew point, cycles a year); the others (the dew-point margins) must stay at or above it. */
const UPPER_LIMITS = new Set(['shell_touch', 'lining_service', 'allowable_stress', 'acid_dew_hours_per_year', 'water_dew_hours_per_year', 'cycles_above']);

/**
 * The margin of a verdict in its unit (°C and K differences, MPa), null when the limit is not set
 * or the verdict has no figure to compare (a warm-up study's dew-point verdicts count minutes).
 * E.g. a shell at 55.0 °C against a 60 °C touch limit → 5.0; a lowest acid margin of 4 K against a
 * required 10 K → −6.
 */
export function verdictMargin(v: Verdict): number | null {
  if (v.status === 'not-set' || v.limit_value === null || v.governing_value === null || v.unit === 'min') return null;
  const m = UPPER_LIMITS.has(v.limit) ? v.limit_value - v.governing_value : v.governing_value - v.limit_value;
  return Math.round(m * 1e6) / 1e6;
}
