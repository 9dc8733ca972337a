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

/**
 * Where a figure occurs: an output instant (index into the series' times), an axial segment
 * (0 = bottom) and, for a wall cut into sectors, the circumferential sector (absent otherwise).
 */
export interface Location {
  readonly instant: number;
  readonly segment: number;
  readonly sector?: number;
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
  /** Segments, sectors, columns (segment × sector: the wall's node columns) and nodes per column. */
  readonly S: number;
  readonly sectors: number;
  readonly C: number;
  readonly N: number;
  /** Temperature, K, of node i of column col (segment ⌊col/sectors⌋, sector col mod sectors) at output instant k. */
  readonly T: (k: number, col: number, i: number) => number;
}

export function evaluated(series: TimeSeries, mode: 'cycle' | 'warmup'): Evaluated {
  const S = series.segments;
  const sectors = series.sectors;
  const C = S * sectors;
  const N = series.nodes;
  const temperatureK = series.temperatureK;
  return { series, ks: evaluationInstants(series, mode), S, sectors, C, N, T: (k, col, i) => temperatureK[(k * C + col) * N + i]! };
}

/** The location of column `col` at instant k: its segment and (with sectors) its sector. */
export function columnLocation(ev: Evaluated, k: number, col: number): Location {
  return ev.sectors === 1 ? { instant: k, segment: col } : { instant: k, segment: Math.floor(col / ev.sectors), sector: col % ev.sectors };
}

/** Lowest and highest temperature, K, of node i of column col over the evaluated instants. */
export function rangeAt(ev: Evaluated, col: number, i: number): { lo: number; hi: number } {
  let lo = Infinity;
  let hi = -Infinity;
  for (const k of ev.ks) {
    const v = ev.T(k, col, i);
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
 * Largest `score(k, col)` over the evaluated instants and all columns of the wall (with `over:
 * 'segments'`, all segments: for per-segment channels), with where it occurs. The search runs
 * instant by instant (or, with `heightFirst`, column by column); the first location found wins a
 * tie, and scores not above `floor` are never chosen (the result is then `floor` at the first
 * instant of the bottom column).
 */
export function locateLargest(ev: Evaluated, score: (k: number, col: number) => number, floor = -Infinity, heightFirst = false, over: 'columns' | 'segments' = 'columns'): Located {
  const { ks } = ev;
  const count = over === 'columns' ? ev.C : ev.S;
  let best = floor;
  let bestK = ks[0]!;
  let bestCol = 0;
  const visit = (k: number, col: number) => {
    const v = score(k, col);
    if (v > best) {
      best = v;
      bestK = k;
      bestCol = col;
    }
  };
  if (heightFirst) {
    for (let col = 0; col < count; col++) for (const k of ks) visit(k, col);
  } else {
    for (const k of ks) for (let col = 0; col < count; col++) visit(k, col);
  }
  return { value: best, at: over === 'columns' ? columnLocation(ev, bestK, bestCol) : { instant: bestK, segment: bestCol } };
}
