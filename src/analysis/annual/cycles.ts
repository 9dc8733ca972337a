/**
 * Thermal cycles of the wall, counted while the run goes: at every column of the wall (each segment
 * and, with sectors, each sector) the temperature difference across the whole wall (inner minus
 * outer surface) and across each layer (its first node minus its last) is fed, instant by instant,
 * to a streaming rainflow counter (ASTM E1049, analysis/rainflow.ts), whose cycles are binned by
 * range as they close. Memory: per column and difference, the counter's open reversals and one
 * number per range bin.
 *
 * The differences are sampled at the reported instants (every output interval): a peak between two
 * instants is missed, so a range can be under-counted by what the difference changes within one
 * interval. The residue left at the end of the run is counted as half cycles (ASTM step 6).
 * Reversals smaller than CYCLE_GATE_K are filtered out before counting (the rainflow counter's
 * hysteresis gate): a difference that hardly moves (across a thin steel shell, a few hundredths of
 * a kelvin) would otherwise count thousands of cycles made of integrator noise.
 */
import type { InstantView } from '../../model/sinks.ts';
import type { SeriesLayout } from '../../model/timeseries.ts';
import { makeRainflowCounter, makeRangeHistogram, type RainflowCounter, type RangeHistogram, type RangeHistogramBuilder } from '../rainflow.ts';

/** Width of the bins ranges are counted into while the run goes, K (the reported bins are whole multiples of it). */
export const STREAM_BIN_K = 0.1;

/**
 * Hysteresis gate of the cycle counting, K: reversals smaller than this are not cycles. One bin,
 * and about twice the accuracy a default run states (± 0.05 K), so what it drops is below what the
 * run resolves.
 */
export const CYCLE_GATE_K = 0.1;

/** A temperature difference across part of the wall: from node `first` to node `last`. */
export interface Difference {
  /** `whole wall` or a layer's label. */
  readonly across: string;
  readonly first: number;
  readonly last: number;
}

/** The differences counted: the whole wall, then each layer inside → outside. */
export function differencesOf(layout: SeriesLayout): Difference[] {
  return [{ across: 'whole wall', first: 0, last: layout.nodes - 1 }, ...layout.layers.map((l) => ({ across: l.label, first: l.firstNode, last: l.lastNode }))];
}

/** Cycles of one difference at one column. */
export interface ColumnCycles {
  readonly segment: number;
  readonly sector: number;
  readonly histogram: RangeHistogram;
  /** Cycles above the threshold (null without one). */
  readonly above: number | null;
}

/** Rainflow counters of every difference at every column. */
export class ThermalCycles {
  readonly differences: readonly Difference[];
  private readonly counters: RainflowCounter[] = [];
  private readonly histograms: RangeHistogramBuilder[] = [];
  private readonly columns: number;
  private finished = false;

  constructor(
    private readonly layout: SeriesLayout,
    /** Range above which cycles are counted separately, K (null: none). */
    readonly thresholdK: number | null,
  ) {
    this.differences = differencesOf(layout);
    this.columns = layout.segments * layout.sectors;
    const thresholds = thresholdK === null ? [] : [thresholdK];
    for (let d = 0; d < this.differences.length; d++)
      for (let col = 0; col < this.columns; col++) {
        const h = makeRangeHistogram({ binWidth: STREAM_BIN_K, thresholds });
        this.histograms.push(h);
        this.counters.push(makeRainflowCounter((c) => h.add(c), { gate: CYCLE_GATE_K }));
      }
  }

  add(view: InstantView): void {
    const N = this.layout.nodes;
    const T = view.temperatureK;
    const { counters, columns } = this;
    for (let d = 0; d < this.differences.length; d++) {
      const { first, last } = this.differences[d]!;
      for (let col = 0, base = 0; col < columns; col++, base += N) counters[d * columns + col]!.push(T[base + first]! - T[base + last]!);
    }
  }

  /** Close every counter: the residue becomes half cycles. */
  finish(): void {
    if (this.finished) return;
    this.finished = true;
    for (const c of this.counters) c.close();
  }

  /** The cycles of difference `d` at every column, bottom segment first. */
  of(d: number): ColumnCycles[] {
    const sectors = this.layout.sectors;
    return Array.from({ length: this.columns }, (_, col) => {
      const histogram = this.histograms[d * this.columns + col]!.result();
      return { segment: Math.floor(col / sectors), sector: col % sectors, histogram, above: this.thresholdK === null ? null : histogram.countAbove[0]!.count };
    });
  }
}

/** Whether column cycles `a` govern over `b`: more cycles above the threshold, else the larger largest range, else more cycles. */
export function governs(a: ColumnCycles, b: ColumnCycles): boolean {
  if (a.above !== null && b.above !== null && a.above !== b.above) return a.above > b.above;
  if (a.histogram.largestRange !== b.histogram.largestRange) return a.histogram.largestRange > b.histogram.largestRange;
  return a.histogram.total > b.histogram.total;
}

/** Bin widths offered for a reported histogram, K (whole multiples of STREAM_BIN_K). */
const REPORT_BIN_WIDTHS_K = [0.1, 0.2, 0.5, 1, 2, 5, 10, 20, 50, 100, 200];

/** The narrowest offered bin width that puts ranges up to `largestK` into at most `maxBins` bins. Example: 87 K, 25 bins → 5 K. */
export function reportBinWidth(largestK: number, maxBins = 25): number {
  for (const w of REPORT_BIN_WIDTHS_K) if (largestK / w < maxBins) return w;
  return REPORT_BIN_WIDTHS_K[REPORT_BIN_WIDTHS_K.length - 1]!;
}

/**
 * Counts of a histogram of STREAM_BIN_K bins regrouped into bins of `widthK` (a whole multiple of
 * it) from 0 to the largest range: bin j holds ranges in [j·w, (j+1)·w).
 */
export function regroup(h: RangeHistogram, widthK: number): number[] {
  const per = Math.round(widthK / STREAM_BIN_K);
  const bins = Math.max(1, Math.floor(h.largestRange / widthK + 1e-9) + 1);
  const out = new Array<number>(bins).fill(0);
  h.counts.forEach((n, k) => {
    const j = Math.min(bins - 1, Math.floor(k / per));
    out[j] += n;
  });
  return out;
}
