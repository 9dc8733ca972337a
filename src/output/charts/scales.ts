/**
 * Axis scales: "nice" tick steps and bounds, steps for time axes in hours and minutes, the range
 * of the data, and the time axis of the evaluated period in hours of the local day.
 */
import type { TimeSeries } from '../../model/timeseries.ts';
import { clockHours, round } from '../format.ts';

/** Hours of the local day for each evaluated instant: clock time of the first, then elapsed time (so a day runs 0 → 24). */
export function localHours(series: TimeSeries, ks: readonly number[]): number[] {
  if (ks.length === 0) return [];
  const k0 = ks[0]!;
  const h0 = clockHours(series.isoLocal[k0]!);
  return ks.map((k) => round(h0 + (series.t[k]! - series.t[k0]!) / 3600, 6));
}

/** A "nice" tick step (1, 2, 2.5, 5 × 10ⁿ) giving about `target` intervals over `span`. */
export function niceStep(span: number, target = 6): number {
  if (!(span > 0)) return 1;
  const raw = span / target;
  const p = 10 ** Math.floor(Math.log10(raw));
  const m = raw / p;
  return (m <= 1 ? 1 : m <= 2 ? 2 : m <= 2.5 ? 2.5 : m <= 5 ? 5 : 10) * p;
}

/** Axis bounds on whole steps enclosing [lo, hi] with a little room. */
export function niceBounds(lo: number, hi: number, target = 6): { min: number; max: number; step: number } {
  if (!(hi > lo)) {
    lo -= 1;
    hi += 1;
  }
  const step = niceStep(hi - lo, target);
  return { min: Math.floor(lo / step - 1e-9) * step, max: Math.ceil(hi / step + 1e-9) * step, step };
}

/** Step for a time axis in hours (1, 2, 3, 6, 12 h or whole days). */
export function hourStep(spanH: number): number {
  for (const s of [1, 2, 3, 6, 12, 24, 48]) if (spanH / s <= 12) return s;
  return niceStep(spanH, 10);
}

/** Step for a time axis in minutes (10, 15, 30, 60, 120, 180, 240, 360 min …). */
export function minuteStep(spanMin: number): number {
  for (const s of [5, 10, 15, 30, 60, 120, 180, 240, 360, 720]) if (spanMin / s <= 12) return s;
  return niceStep(spanMin, 10);
}

/** Lowest and highest finite value (lo = +∞, hi = −∞ when there is none). */
export function minMax(values: Iterable<number>): { lo: number; hi: number } {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (!Number.isFinite(v)) continue;
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  return { lo, hi };
}

