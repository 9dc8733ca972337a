/**
 * The trace of a run that overlay charts draw (the shell and the top inner surface through the
 * evaluated day, the acid-dew-point margin at the top), taken either from a run in memory or read
 * back from the timeseries.csv and segments.csv it wrote. Both ways go through the CSV's own
 * figures (3 decimals of °C and K, 4 of hours), so a run collected from its files draws exactly
 * the chart the same run draws in memory.
 */
import { nodeTemperatureK, type TimeSeries } from '../model/timeseries.ts';
import { SECONDS_PER_DAY } from '../physics/constants.ts';
import { celsius, clockHours, decimals, round } from './format.ts';

export interface RunTrace {
  /** Hours of the local day of each evaluated instant: clock time of the first, then elapsed time (4 decimals). */
  readonly hours: readonly number[];
  /** Hottest outer-surface temperature over all heights (and sectors) at each instant, °C. */
  readonly shellC: readonly number[];
  /** Inner-surface temperature of the top segment (its coldest sector, which the dew points govern), °C. */
  readonly innerTopC: readonly number[];
  /** Inner surface minus the acid dew point in the top segment, K (null when the gas has no acid dew point). */
  readonly acidMarginTopK: readonly (number | null)[];
  /** Mid-height of the top segment, m (3 decimals). */
  readonly topHeightM: number;
}

/** A figure as the CSV files write it and read back: `digits` decimals; null for a missing value. */
const asWritten = (v: number, digits: number): number | null => {
  const text = decimals(v, digits, '');
  return text === '' ? null : Number(text);
};

/** Indices of the evaluated instants from the hours column: the last day (cycle) or all (warm-up), as the summary takes them. */
function evaluatedFromHours(hours: readonly number[], mode: 'cycle' | 'warmup'): number[] {
  const all = hours.map((_, k) => k);
  if (mode === 'warmup' || hours.length === 0) return all;
  // the hours column has 4 decimals; instants are at least a minute (0.0167 h) apart
  const from = hours[hours.length - 1]! - SECONDS_PER_DAY / 3600 - 1e-3;
  return all.filter((k) => hours[k]! >= from);
}

/** The trace from per-instant columns as written in the CSV files. */
function traceFromColumns(iso: readonly string[], hours: readonly number[], shell: readonly number[], inner: readonly number[], acid: readonly (number | null)[], topHeightM: number, mode: 'cycle' | 'warmup'): RunTrace {
  const ks = evaluatedFromHours(hours, mode);
  const k0 = ks[0] ?? 0;
  const start = clockHours(iso[k0] ?? '');
  return {
    hours: ks.map((k) => round(start + hours[k]! - hours[k0]!, 4)),
    shellC: ks.map((k) => shell[k]!),
    innerTopC: ks.map((k) => inner[k]!),
    acidMarginTopK: ks.map((k) => acid[k] ?? null),
    topHeightM,
  };
}

/** The trace of a run in memory. */
export function traceOfSeries(series: TimeSeries, mode: 'cycle' | 'warmup'): RunTrace {
  const { segments: S, nodes: N, sectors } = series;
  const K = series.t.length;
  const t0 = series.t[0] ?? 0;
  const top = S - 1;
  const hours: number[] = [];
  const shell: number[] = [];
  const inner: number[] = [];
  const acid: (number | null)[] = [];
  for (let k = 0; k < K; k++) {
    hours.push(asWritten((series.t[k]! - t0) / 3600, 4)!);
    let hottest = -Infinity;
    let coldestInner = Infinity;
    for (let j = 0; j < sectors; j++) {
      for (let s = 0; s < S; s++) hottest = Math.max(hottest, asWritten(celsius(nodeTemperatureK(series, k, s, N - 1, j)), 3)!);
      coldestInner = Math.min(coldestInner, asWritten(celsius(nodeTemperatureK(series, k, top, 0, j)), 3)!);
    }
    shell.push(hottest);
    inner.push(coldestInner);
    acid.push(asWritten(series.segment.acidDewMarginK[k * S + top]!, 3));
  }
  return traceFromColumns(series.isoLocal, hours, shell, inner, acid, asWritten(series.heightM[top]!, 3)!, mode);
}

/** Columns of a CSV header: name → index; throws when one is missing. */
function columns(header: string, names: readonly string[], file: string): number[] {
  const cols = header.trim().split(',');
  return names.map((n) => {
    const i = cols.indexOf(n);
    if (i < 0) throw new Error(`${file}: no column "${n}"`);
    return i;
  });
}

/** The trace read back from a run's timeseries.csv and segments.csv (as written by write.ts). */
export function traceOfCsv(timeseriesCsv: string, segmentsCsv: string, mode: 'cycle' | 'warmup'): RunTrace {
  const tsLines = timeseriesCsv.split('\n').filter((l) => l !== '');
  const [cTime, cHours, cHeight, cPos, cTemp] = columns(tsLines[0] ?? '', ['time', 'hours', 'height_m', 'position', 'temperature_c'], 'timeseries.csv');
  const iso: string[] = [];
  const hours: number[] = [];
  const shell: number[] = [];
  const innerAt = new Map<string, { height: number; value: number }>();
  let topHeight = -Infinity;
  for (let n = 1; n < tsLines.length; n++) {
    const cells = tsLines[n]!.split(',');
    const time = cells[cTime]!;
    if (iso[iso.length - 1] !== time) {
      iso.push(time);
      hours.push(Number(cells[cHours]));
      shell.push(-Infinity);
    }
    const k = iso.length - 1;
    const height = Number(cells[cHeight]);
    topHeight = Math.max(topHeight, height);
    const position = cells[cPos];
    if (position === 'outer_surface') shell[k] = Math.max(shell[k]!, Number(cells[cTemp]));
    else if (position === 'inner_surface') {
      // the top height's coldest sector (one row per sector)
      const best = innerAt.get(time);
      if (!best || height > best.height) innerAt.set(time, { height, value: Number(cells[cTemp]) });
      else if (height === best.height) best.value = Math.min(best.value, Number(cells[cTemp]));
    }
  }
  const segLines = segmentsCsv.split('\n').filter((l) => l !== '');
  const [sTime, sHeight, sAcid] = columns(segLines[0] ?? '', ['time', 'height_m', 'acid_dew_margin_k'], 'segments.csv');
  const acidAt = new Map<string, number | null>();
  for (let n = 1; n < segLines.length; n++) {
    const cells = segLines[n]!.split(',');
    if (Number(cells[sHeight]) === topHeight) acidAt.set(cells[sTime]!, cells[sAcid] === '' ? null : Number(cells[sAcid]));
  }
  const inner = iso.map((t) => innerAt.get(t)!.value);
  const acid = iso.map((t) => acidAt.get(t) ?? null);
  return traceFromColumns(iso, hours, shell, inner, acid, topHeight, mode);
}
