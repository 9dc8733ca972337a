/**
 * Hours the inner surface spends below each dew point, per height and per calendar month, counted
 * while the run goes: between two reported instants the margin (inner surface minus dew point) is
 * taken as linear in time (as the summary's hours below, metrics/dewPoints.ts), and the interval's
 * time below zero is booked to the month of its first instant (local date).
 */
import type { InstantView } from '../../model/sinks.ts';
import { fractionBelowZero } from '../metrics/dewPoints.ts';

/** Seconds below each dew point, per segment (bottom → top). */
export interface SecondsBelow {
  readonly water: Float64Array;
  /** All zero when the gas has no acid dew point. */
  readonly acid: Float64Array;
}

/** Seconds below the dew points per segment, month by month (`YYYY-MM`). */
export class MonthlyDewHours {
  private readonly months = new Map<string, SecondsBelow>();
  private readonly lastWater: Float64Array;
  private readonly lastAcid: Float64Array;
  private lastT = Number.NaN;
  private lastMonth = '';

  constructor(
    private readonly segments: number,
    private readonly hasAcid: boolean,
  ) {
    this.lastWater = new Float64Array(segments);
    this.lastAcid = new Float64Array(segments);
  }

  /** Add an instant whose local month is `month` (`YYYY-MM`). */
  add(view: InstantView, month: string): void {
    const water = view.segment.waterDewMarginK;
    const acid = view.segment.acidDewMarginK;
    if (!Number.isNaN(this.lastT)) {
      const dt = view.t - this.lastT;
      const into = this.month(this.lastMonth);
      for (let s = 0; s < this.segments; s++) {
        into.water[s] += fractionBelowZero(this.lastWater[s]!, water[s]!) * dt;
        if (this.hasAcid) into.acid[s] += fractionBelowZero(this.lastAcid[s]!, acid[s]!) * dt;
      }
    }
    this.lastWater.set(water);
    this.lastAcid.set(acid);
    this.lastT = view.t;
    this.lastMonth = month;
  }

  private month(key: string): SecondsBelow {
    let m = this.months.get(key);
    if (!m) {
      m = { water: new Float64Array(this.segments), acid: new Float64Array(this.segments) };
      this.months.set(key, m);
    }
    return m;
  }

  /** Seconds below in month `YYYY-MM` (zeros for a month without time). */
  of(month: string): SecondsBelow {
    return this.months.get(month) ?? { water: new Float64Array(this.segments), acid: new Float64Array(this.segments) };
  }

  /** Seconds below over every month. */
  total(): SecondsBelow {
    const out = { water: new Float64Array(this.segments), acid: new Float64Array(this.segments) };
    for (const m of this.months.values())
      for (let s = 0; s < this.segments; s++) {
        out.water[s] += m.water[s]!;
        out.acid[s] += m.acid[s]!;
      }
    return out;
  }
}
