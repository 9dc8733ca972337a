/**
 * The period the figures cover and the bookkeeping every figure shares: which output instants
 * count, the temperature of a node at an instant and height, and where a figure occurs.
 */
import type { TimeSeries } from '../../model/timeseries.ts';
import { SECONDS_PER_DAY } from '../../physics/constants.ts';
import { round } from '../rounding.ts';

/** Indices of the output instants the figures cover: the last simulated day (cycle) or the whole run (warm-up). */
export function evaluationInstants(series: TimeSeries, mode: 'cycle' | 'warmup'): number[] {
  const K = series.t.length;
  if (mode === 'warmup' || K === 0) return Array.from({ length: K }, (_, k) => k);
  const tEnd = series.t[K - 1]!;
  const out: number[] = [];
  for (let k = 0; k < K; k++) if (series.t[k]! >= tEnd - SECONDS_PER_DAY - 1e-6) out.push(k);
  return out;
}

/** Where a figure occurs: an output instant (index into the series' times) and an axial segment (0 = bottom). */
export interface Location {
  readonly instant: number;
  readonly segment: number;
}

/** A figure in SI units (K, K, Pa …) and where it occurs. */
export interface Located {
  readonly value: number;
  readonly at: Location;
}

/** A run's time series seen over its evaluated instants. */
export interface Evaluated {
  readonly series: TimeSeries;
  /** Evaluated output instants, in time order. */
  readonly ks: readonly number[];
  /** Segments and nodes per segment. */
  readonly S: number;
  readonly N: number;
  /** Temperature, K, of node i of segment seg at output instant k. */
  readonly T: (k: number, seg: number, i: number) => number;
}

export function evaluated(series: TimeSeries, mode: 'cycle' | 'warmup'): Evaluated {
  const S = series.segments;
  const N = series.nodes;
  const temperatureK = series.temperatureK;
  return { series, ks: evaluationInstants(series, mode), S, N, T: (k, seg, i) => temperatureK[(k * S + seg) * N + i]! };
}

/** Lowest and highest temperature, K, of node i of segment seg over the evaluated instants. */
export function rangeAt(ev: Evaluated, seg: number, i: number): { lo: number; hi: number } {
  let lo = Infinity;
  let hi = -Infinity;
  for (const k of ev.ks) {
    const v = ev.T(k, seg, i);
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  return { lo, hi };
}

/** A location as the summary states it: ISO local time and height (m, to 1 cm). */
export function timeAndHeight(series: TimeSeries, at: Location): { time: string; height: number } {
  return { time: series.isoLocal[at.instant]!, height: round(series.heightM[at.segment]!, 2) };
}

/** Node indices a … b, inclusive. */
export function nodeRange(a: number, b: number): number[] {
  const out: number[] = [];
  for (let i = a; i <= b; i++) out.push(i);
  return out;
}

/**
 * Largest `score(k, seg)` over the evaluated instants and all segments, with where it occurs. The
 * search runs instant by instant (or, with `heightFirst`, height by height); the first location
 * found wins a tie, and scores not above `floor` are never chosen (the result is then `floor` at
 * the first instant of the bottom segment).
 */
export function locateLargest(ev: Evaluated, score: (k: number, seg: number) => number, floor = -Infinity, heightFirst = false): Located {
  const { ks, S } = ev;
  let best = floor;
  let at: Location = { instant: ks[0]!, segment: 0 };
  const visit = (k: number, seg: number) => {
    const v = score(k, seg);
    if (v > best) {
      best = v;
      at = { instant: k, segment: seg };
    }
  };
  if (heightFirst) {
    for (let seg = 0; seg < S; seg++) for (const k of ks) visit(k, seg);
  } else {
    for (const k of ks) for (let seg = 0; seg < S; seg++) visit(k, seg);
  }
  return { value: best, at };
}
