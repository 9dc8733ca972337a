/**
 * The inner surface against the dew points of the flue gas: the lowest margin above each dew point
 * (with when and where) and the hours below it at every height.
 */
import { kelvinToCelsius as c } from '../../physics/constants.ts';
import type { HeightHours, Summary } from '../summary.ts';
import { round } from '../rounding.ts';
import { locateLargest, timeAndHeight, type Evaluated, type Located } from './evaluated.ts';

/** Fraction of a straight segment from a to b that lies below zero. */
export function fractionBelowZero(a: number, b: number): number {
  if (a >= 0 && b >= 0) return 0;
  if (a < 0 && b < 0) return 1;
  const f = a / (a - b); // where the line crosses zero, as a fraction from a
  return a < 0 ? f : 1 - f;
}

/** Lowest value of a per-instant-per-segment array (index k · S + seg) over the evaluated instants; the first found wins a tie. */
export function lowestMargin(ev: Evaluated, marginK: Float64Array): Located {
  const { S } = ev;
  const lowest = locateLargest(ev, (k, seg) => -marginK[k * S + seg]!, -Infinity, false, 'segments');
  return { value: -lowest.value, at: lowest.at };
}

/** Hours the margin is below zero at each height, bottom → top, the margin taken as linear between output instants. */
export function hoursBelow(ev: Evaluated, marginK: Float64Array): HeightHours[] {
  const { series: s, ks, S } = ev;
  const out: HeightHours[] = [];
  for (let seg = 0; seg < S; seg++) {
    let seconds = 0;
    for (let q = 1; q < ks.length; q++) {
      const k0 = ks[q - 1]!;
      const k1 = ks[q]!;
      seconds += fractionBelowZero(marginK[k0 * S + seg]!, marginK[k1 * S + seg]!) * (s.t[k1]! - s.t[k0]!);
    }
    out.push({ height_m: round(s.heightM[seg]!, 2), hours: round(seconds / 3600, 2) });
  }
  return out;
}

export interface LowestMargins {
  readonly water: Located;
  /** Null when the gas carries no SO₃ (no acid dew point). */
  readonly acid: Located | null;
}

export function lowestMargins(ev: Evaluated): LowestMargins {
  const s = ev.series;
  return { water: lowestMargin(ev, s.segment.waterDewMarginK), acid: s.acidDewPointK === null ? null : lowestMargin(ev, s.segment.acidDewMarginK) };
}

/** The dew points, lowest margins and hours below as summary.json states them. */
export function dewPointFigures(
  ev: Evaluated,
  m: LowestMargins,
): Pick<
  Summary,
  | 'water_dew_point_c'
  | 'acid_dew_point_c'
  | 'lowest_water_dew_margin_k'
  | 'lowest_water_dew_margin_time'
  | 'lowest_water_dew_margin_height_m'
  | 'lowest_acid_dew_margin_k'
  | 'lowest_acid_dew_margin_time'
  | 'lowest_acid_dew_margin_height_m'
  | 'hours_below_water_dew'
  | 'hours_below_acid_dew'
> {
  const s = ev.series;
  const water = timeAndHeight(s, m.water.at);
  const acid = m.acid ? timeAndHeight(s, m.acid.at) : null;
  return {
    water_dew_point_c: round(c(s.waterDewPointK)),
    acid_dew_point_c: s.acidDewPointK === null ? null : round(c(s.acidDewPointK)),
    lowest_water_dew_margin_k: round(m.water.value),
    lowest_water_dew_margin_time: water.time,
    lowest_water_dew_margin_height_m: water.height,
    lowest_acid_dew_margin_k: m.acid ? round(m.acid.value) : null,
    lowest_acid_dew_margin_time: acid ? acid.time : null,
    lowest_acid_dew_margin_height_m: acid ? acid.height : null,
    hours_below_water_dew: hoursBelow(ev, s.segment.waterDewMarginK),
    hours_below_acid_dew: s.acidDewPointK === null ? [] : hoursBelow(ev, s.segment.acidDewMarginK),
  };
}
