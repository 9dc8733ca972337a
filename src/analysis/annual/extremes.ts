/**
 * Extremes of the wall over each calendar month and over the whole run, gathered while the run
 * goes: the outer surface (shell), every node of the flue-side layer (lining) and the inner surface,
 * over every column of the wall (each segment and, with sectors, each sector), and the lowest
 * margins above the dew points (per segment: the coldest sector's). The run-wide extremes keep when
 * and where they occur.
 */
import type { InstantView } from '../../model/sinks.ts';
import type { SeriesLayout } from '../../model/timeseries.ts';

/** Running extremes of one period, K. */
export interface PeriodExtremes {
  shellMin: number;
  shellMax: number;
  liningMin: number;
  liningMax: number;
  innerMin: number;
  waterMargin: number;
  acidMargin: number;
}

/** A run-wide extreme: its value, K, its ISO local time and its segment. */
export interface PlacedExtreme {
  value: number;
  time: string;
  segment: number;
}

const emptyPeriod = (): PeriodExtremes => ({ shellMin: Infinity, shellMax: -Infinity, liningMin: Infinity, liningMax: -Infinity, innerMin: Infinity, waterMargin: Infinity, acidMargin: Infinity });

/** Month-by-month and run-wide extremes of the wall. */
export class WallExtremesByMonth {
  private readonly months = new Map<string, PeriodExtremes>();
  readonly peakShell: PlacedExtreme = { value: -Infinity, time: '', segment: 0 };
  readonly peakLining: PlacedExtreme = { value: -Infinity, time: '', segment: 0 };
  readonly minInner: PlacedExtreme = { value: Infinity, time: '', segment: 0 };

  constructor(private readonly layout: SeriesLayout) {}

  /** Add an instant whose local month is `month` (`YYYY-MM`). */
  add(view: InstantView, month: string): void {
    let x = this.months.get(month);
    if (!x) {
      x = emptyPeriod();
      this.months.set(month, x);
    }
    const L = this.layout;
    const N = L.nodes;
    const sectors = L.sectors;
    const lining = L.layers[0]!;
    const T = view.temperatureK;
    for (let col = 0; col < L.segments * sectors; col++) {
      const base = col * N;
      const seg = Math.floor(col / sectors);
      const inner = T[base]!;
      const shell = T[base + N - 1]!;
      x.shellMin = Math.min(x.shellMin, shell);
      x.shellMax = Math.max(x.shellMax, shell);
      x.innerMin = Math.min(x.innerMin, inner);
      let liningHot = -Infinity;
      for (let i = lining.firstNode; i <= lining.lastNode; i++) {
        const v = T[base + i]!;
        x.liningMin = Math.min(x.liningMin, v);
        liningHot = Math.max(liningHot, v);
      }
      x.liningMax = Math.max(x.liningMax, liningHot);
      place(this.peakShell, shell, shell > this.peakShell.value, view, seg);
      place(this.peakLining, liningHot, liningHot > this.peakLining.value, view, seg);
      place(this.minInner, inner, inner < this.minInner.value, view, seg);
    }
    for (let s = 0; s < L.segments; s++) {
      x.waterMargin = Math.min(x.waterMargin, view.segment.waterDewMarginK[s]!);
      if (L.acidDewPointK !== null) x.acidMargin = Math.min(x.acidMargin, view.segment.acidDewMarginK[s]!);
    }
  }

  /** The extremes of month `YYYY-MM` (undefined when no instant fell in it). */
  of(month: string): PeriodExtremes | undefined {
    return this.months.get(month);
  }
}

/** Move a run-wide extreme to `value` at this instant and segment when `better` (the first found wins a tie). */
function place(x: PlacedExtreme, value: number, better: boolean, view: InstantView, segment: number): void {
  if (!better) return;
  x.value = value;
  x.time = view.isoLocal;
  x.segment = segment;
}
