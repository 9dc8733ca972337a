/**
 * Where reported instants go while a run is computed: sinks. The simulation hands every reported
 * instant, as it is computed, to each sink in `SimulateOptions.sinks`, as a read-only view of the
 * instant's wall state and channels; a sink keeps what it needs (a running extreme, a row written
 * to a file) and drops the rest. Nothing here reads or writes files: the output layer's sinks do.
 *
 * Instants reach a sink in time order. For a fixed number of days that is every instant of the run
 * from its first; for a periodic study, the instants of the settled day only (the days before it
 * are not reported). `replaySeries` hands the instants of a time series already in memory to the
 * same sinks, so a file written while the run goes and one written afterwards from memory are made
 * by the same code.
 */
import type { SeriesInstantChannel, SeriesLayout, SeriesSegmentChannel, TimeSeries } from './timeseries.ts';
import { SERIES_INSTANT_CHANNELS, SERIES_SEGMENT_CHANNELS } from './timeseries.ts';
import { SECONDS_PER_DAY } from '../physics/constants.ts';

/**
 * One reported instant. Valid only during the call that receives it: its arrays are reused for the
 * next instant, so a sink copies what it keeps.
 */
export interface InstantView {
  /** Run time shown for the instant, s (a periodic study shows its settled day on the first day's clock). */
  readonly t: number;
  /** ISO local time of the instant. */
  readonly isoLocal: string;
  /** Day of the run the instant closes or lies in, 0-based; the first instant of the run belongs to day 0. */
  readonly runDay: number;
  /** True for the last instant of its run day (the day's end, which is also the next day's start). */
  readonly dayEnd: boolean;
  /** Wall temperatures, K, [s · nodes + i]. */
  readonly temperatureK: Float64Array;
  /** Per-segment channels, [s]. */
  readonly segment: Readonly<Record<SeriesSegmentChannel, Float64Array>>;
  /** Per-instant channels. */
  readonly instant: Readonly<Record<SeriesInstantChannel, number>>;
  readonly firing: boolean;
}

/** Receives the reported instants of a run. */
export interface InstantSink {
  /** Before the first instant: what every instant of the run shares (segments, nodes, heights, labels, dew points). */
  start?(layout: SeriesLayout): void;
  /** Each reported instant, in time order. */
  instant(view: InstantView): void;
  /** After the last instant of a run that completed (not called when the run fails). */
  finish?(): void;
}

/**
 * Splits a stream of instants into run days and hands each day's instants to an accumulator. A day
 * is the closed interval from its start to its end: the instant at a day's end also opens the next
 * day, so the figures of every day include both ends (as the summary's figures over the last day
 * do). A day is reported when its end arrives, with its local date (the date at the middle of the
 * day, so a day shifted an hour by a clock change keeps its date); a day that has only its opening
 * instant is never reported.
 *
 * Example: instants at 0, 12, 24, 36, 48 h, the day ends at 24 and 48 h → day 0 sees 0, 12, 24 h and
 * day 1 sees 24, 36, 48 h.
 */
export class DaySplitter<A> {
  private current: A | null = null;
  private currentDay = 0;
  /** Instants in the day in progress, its opening instant included. */
  private count = 0;
  private openingT = 0;
  private date = '';

  constructor(
    /** A fresh accumulator for run day `runDay`. */
    private readonly open: (runDay: number) => A,
    /** Add an instant to a day's accumulator. */
    private readonly add: (acc: A, view: InstantView) => void,
    /** A complete day: its accumulator, its run day and its local date `YYYY-MM-DD`. */
    private readonly close: (acc: A, runDay: number, date: string) => void,
  ) {}

  instant(view: InstantView): void {
    if (this.current === null) {
      // the first instant seen opens its day (or, when it ends a day, the next one)
      this.begin(view.dayEnd ? view.runDay + 1 : view.runDay, view);
      return;
    }
    this.add(this.current, view);
    this.count += 1;
    if (view.t - this.openingT <= SECONDS_PER_DAY / 2 + 1e-6) this.date = view.isoLocal.slice(0, 10);
    if (view.dayEnd) {
      this.close(this.current, this.currentDay, this.date);
      this.begin(view.runDay + 1, view);
    }
  }

  private begin(runDay: number, opening: InstantView): void {
    this.currentDay = runDay;
    this.current = this.open(runDay);
    this.add(this.current, opening);
    this.count = 1;
    this.openingT = opening.t;
    this.date = opening.isoLocal.slice(0, 10);
  }

  /** True while the day in progress has instants of its own (beyond the opening one). */
  get dayInProgress(): boolean {
    return this.count > 1;
  }
}

/** What every instant of a series shares, taken from a series. */
export function layoutOf(series: SeriesLayout): SeriesLayout {
  const { segments, sectors, nodes, heightM, nodeRadius, nodeLabel, layers, waterDewPointK, acidDewPointK } = series;
  return { segments, sectors, nodes, heightM, nodeRadius, nodeLabel, layers, waterDewPointK, acidDewPointK };
}

/**
 * Hand every instant of a series in memory to `sinks` (start, each instant, finish), as the run
 * that made the series would have.
 */
export function replaySeries(series: TimeSeries, sinks: readonly InstantSink[]): void {
  const { segments: S, nodes: N } = series;
  const perInstant = S * series.sectors * N;
  const K = series.t.length;
  const segment = Object.fromEntries(SERIES_SEGMENT_CHANNELS.map((c) => [c, new Float64Array(S)])) as Record<SeriesSegmentChannel, Float64Array>;
  const instant = Object.fromEntries(SERIES_INSTANT_CHANNELS.map((c) => [c, 0])) as Record<SeriesInstantChannel, number>;
  const layout = layoutOf(series);
  for (const sink of sinks) sink.start?.(layout);
  for (let k = 0; k < K; k++) {
    for (const c of SERIES_SEGMENT_CHANNELS) segment[c].set(series.segment[c].subarray(k * S, (k + 1) * S));
    for (const c of SERIES_INSTANT_CHANNELS) instant[c] = series.instant[c][k]!;
    const view: InstantView = {
      t: series.t[k]!,
      isoLocal: series.isoLocal[k]!,
      runDay: series.runDay[k]!,
      dayEnd: k === K - 1 || series.runDay[k + 1]! > series.runDay[k]!,
      temperatureK: series.temperatureK.subarray(k * perInstant, (k + 1) * perInstant),
      segment,
      instant,
      firing: series.instant.firing[k] === 1,
    };
    for (const sink of sinks) sink.instant(view);
  }
  for (const sink of sinks) sink.finish?.();
}
