/**
 * The inner surface's margin above the dew point at the top of the stack, as a grid of local date ×
 * local clock hour: each cell holds the lowest margin of the instants that fall in it (the instant
 * at HH:MM lies in hour HH of its local date), so a cell below the dew point means the top went
 * below it at some instant of that hour. The acid dew point when the gas has one, else the water
 * dew point. A cell no instant fell in holds NaN.
 */
import type { InstantView } from '../../model/sinks.ts';

/** Lowest margin per local date and clock hour, K: value of date index d (0 = the first date) and hour h at d · 24 + h. */
export class MarginGrid {
  readonly lowestK: Float64Array;

  constructor(
    /** Dates the grid holds, from the run's first. */
    readonly days: number,
    /** Segment whose margin is mapped (the top). */
    private readonly segment: number,
    /** Whether the acid dew point is mapped (else the water dew point). */
    readonly acid: boolean,
  ) {
    this.lowestK = new Float64Array(days * 24).fill(Number.NaN);
  }

  /** Add an instant on local date index `dateIndex` at local clock hour `hour` (0–23). */
  add(view: InstantView, dateIndex: number, hour: number): void {
    if (dateIndex < 0 || dateIndex >= this.days) return;
    const margin = (this.acid ? view.segment.acidDewMarginK : view.segment.waterDewMarginK)[this.segment]!;
    const cell = dateIndex * 24 + hour;
    const was = this.lowestK[cell]!;
    if (Number.isNaN(was) || margin < was) this.lowestK[cell] = margin;
  }
}
