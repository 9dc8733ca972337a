/**
 * The annual figures of a run as summary.json states them (`annual`): hours below each dew point
 * per height over the run and per month, heat per month and over the run (from the energy account
 * of each day, booked to the month of the day's local date), the wall's extremes per month and over
 * the run, the thermal cycles of each temperature difference (rainflow, ASTM E1049) with a histogram
 * of ranges at the governing height, and the verdicts on the annual limits.
 */
import type { LimitsInput, ModelInputs } from '../../model/inputs.ts';
import type { EnergyAccount, SeriesLayout } from '../../model/timeseries.ts';
import { kelvinToCelsius as c } from '../../physics/constants.ts';
import type { AnnualOutcome, CyclesAtHeight, HeightHours, MonthFigures, Verdict, WallCycles } from '../summary.ts';
import { round } from '../rounding.ts';
import { heatLossJ, J_PER_KWH } from '../metrics/energy.ts';
import type { AnnualParts } from './recorder.ts';
import type { SecondsBelow } from './dewHours.ts';
import { CYCLE_GATE_K, governs, regroup, reportBinWidth, type ColumnCycles } from './cycles.ts';


/** Months `YYYY-MM` from the month of `first` to that of `last` (dates `YYYY-MM-DD`). Example: 2026-11-20 … 2027-01-05 → 2026-11, 2026-12, 2027-01. */
export function monthsBetween(first: string, last: string): string[] {
  const out: string[] = [];
  let y = Number(first.slice(0, 4));
  let m = Number(first.slice(5, 7));
  const end = last.slice(0, 7);
  for (;;) {
    const key = `${String(y).padStart(4, '0')}-${String(m).padStart(2, '0')}`;
    out.push(key);
    if (key >= end) return out;
    m += 1;
    if (m > 12) {
      m = 1;
      y += 1;
    }
  }
}

/** Hours below per height, bottom → top, from seconds per segment. */
function heightHours(layout: SeriesLayout, seconds: Float64Array): HeightHours[] {
  return Array.from(seconds, (sec, s) => ({ height_m: round(layout.heightM[s]!, 2), hours: round(sec / 3600, 2) }));
}

function hoursOf(layout: SeriesLayout, below: SecondsBelow): { water: HeightHours[]; acid: HeightHours[] } {
  return { water: heightHours(layout, below.water), acid: layout.acidDewPointK === null ? [] : heightHours(layout, below.acid) };
}

/** The column that governs among `list` (see `governs`; the first of equals). */
const best = (list: readonly ColumnCycles[]) => list.reduce((a, b) => (governs(b, a) ? b : a));

/** Each temperature difference counted (the whole wall, then each layer) with its cycles at its governing column. */
export function governingCycles(parts: AnnualParts): { across: string; cycles: ColumnCycles }[] {
  return parts.cycles.differences.map((d, j) => ({ across: d.across, cycles: best(parts.cycles.of(j)) }));
}

/** The cycles of one difference: governing column, per height the governing sector, histogram at the governing column. */
function wallCycles(across: string, cols: readonly ColumnCycles[], layout: SeriesLayout): WallCycles {
  const governing = best(cols);
  const byHeight: CyclesAtHeight[] = Array.from({ length: layout.segments }, (_, seg) => {
    const at = best(cols.filter((x) => x.segment === seg));
    return { height_m: round(layout.heightM[seg]!, 2), cycles: round(at.histogram.total, 1), cycles_above_threshold: at.above, largest_range_k: round(at.histogram.largestRange, 2) };
  });
  const width = reportBinWidth(governing.histogram.largestRange);
  const histogram = regroup(governing.histogram, width).map((n, j) => ({ from_k: round(j * width, 3), to_k: round((j + 1) * width, 3), cycles: round(n, 1) }));
  return {
    across,
    governing_height_m: round(layout.heightM[governing.segment]!, 2),
    cycles: round(governing.histogram.total, 1),
    cycles_above_threshold: governing.above,
    largest_range_k: round(governing.histogram.largestRange, 2),
    bin_width_k: width,
    histogram,
    by_height: byHeight,
  };
}

/** Highest hours at any height: the value and its height. */
function mostHours(rows: readonly HeightHours[]): HeightHours | null {
  return rows.reduce<HeightHours | null>((a, b) => (a === null || b.hours > a.hours ? b : a), null);
}

/** The verdicts on the annual limits, in a fixed order: acid dew hours, water dew hours, cycles above a range. */
export function annualVerdicts(limits: LimitsInput, figures: { hoursWater: readonly HeightHours[]; hoursAcid: readonly HeightHours[]; acidDewC: number | null; waterDewC: number; cycles: readonly WallCycles[]; days: number; fullYear: boolean }): Verdict[] {
  const span = figures.fullYear ? `over the ${figures.days} days of the run` : `over the ${figures.days} days of the run (less than a year: a whole year can only have more)`;
  const hoursVerdict = (limit: string, title: string, limitH: number | undefined, rows: readonly HeightHours[], dewC: number | null): Verdict => {
    const worst = mostHours(rows);
    if (dewC === null || worst === null)
      return { limit, title, status: 'not-set', limit_value: limitH ?? null, governing_value: null, unit: 'h', time_local: null, height_m: null, detail: 'the flue gas carries no SO3: no acid dew point' };
    return {
      limit,
      title,
      status: limitH === undefined ? 'not-set' : worst.hours <= limitH ? 'pass' : 'fail',
      limit_value: limitH ?? null,
      governing_value: worst.hours,
      unit: 'h',
      time_local: null,
      height_m: worst.height_m,
      detail: `most hours of the inner surface below the ${limit.startsWith('acid') ? 'acid' : 'water'} dew point (${round(dewC, 1)} °C) at any height, ${span}`,
    };
  };
  const cyc = limits.cyclesAbove;
  const worst = figures.cycles.reduce<WallCycles | null>((a, b) => (a === null || (b.cycles_above_threshold ?? -1) > (a.cycles_above_threshold ?? -1) ? b : a), null);
  const cycleVerdict: Verdict = {
    limit: 'cycles_above',
    title: cyc ? `Thermal cycles above ${round(cyc.rangeK, 1)} K` : 'Thermal cycles above a range',
    status: cyc?.count === undefined || worst === null ? 'not-set' : (worst.cycles_above_threshold ?? 0) <= cyc.count ? 'pass' : 'fail',
    limit_value: cyc?.count ?? null,
    governing_value: cyc && worst ? worst.cycles_above_threshold : null,
    unit: 'cycles',
    time_local: null,
    height_m: cyc && worst ? worst.governing_height_m : null,
    detail: cyc && worst ? `most rainflow cycles (ASTM E1049) of the temperature difference with a range above ${round(cyc.rangeK, 1)} K: across the ${worst.across} at ${worst.governing_height_m} m, ${span}` : 'no range given (limits.cycles_above)',
  };
  return [
    hoursVerdict('acid_dew_hours_per_year', 'Hours a year below the acid dew point', limits.acidDewHoursPerYear, figures.hoursAcid, figures.acidDewC),
    hoursVerdict('water_dew_hours_per_year', 'Hours a year below the water dew point', limits.waterDewHoursPerYear, figures.hoursWater, figures.waterDewC),
    cycleVerdict,
  ];
}

/** The figures of one month. */
function monthFigures(month: string, parts: AnnualParts, energyByDay: readonly EnergyAccount[]): MonthFigures {
  const { layout } = parts;
  let days = 0;
  let lossJ = 0;
  let gasJ = 0;
  parts.dayDates.forEach((date, runDay) => {
    if (!date.startsWith(month)) return;
    days += 1;
    const e = energyByDay[runDay];
    if (e) {
      lossJ += heatLossJ(e);
      gasJ += e.gasToWallJ;
    }
  });
  const x = parts.extremes.of(month);
  const hours = hoursOf(layout, parts.dewHours.of(month));
  const cOr = (k: number | undefined) => (k === undefined || !Number.isFinite(k) ? Number.NaN : round(c(k)));
  return {
    month,
    days,
    heat_loss_kwh: round(lossJ / J_PER_KWH, 1),
    gas_to_wall_kwh: round(gasJ / J_PER_KWH, 1),
    shell_min_c: cOr(x?.shellMin),
    shell_max_c: cOr(x?.shellMax),
    lining_min_c: cOr(x?.liningMin),
    lining_max_c: cOr(x?.liningMax),
    inner_surface_min_c: cOr(x?.innerMin),
    lowest_water_dew_margin_k: x ? round(x.waterMargin) : Number.NaN,
    lowest_acid_dew_margin_k: layout.acidDewPointK === null || !x ? null : round(x.acidMargin),
    hours_below_water_dew: hours.water,
    hours_below_acid_dew: hours.acid,
  };
}

/** The `annual` section of summary.json from the statistics gathered and each day's energy account. */
export function annualSummary(parts: AnnualParts, energyByDay: readonly EnergyAccount[], inputs: ModelInputs): AnnualOutcome {
  const annual = inputs.annual!;
  const { layout } = parts;
  const days = parts.dayDates.length;
  const total = hoursOf(layout, parts.dewHours.total());
  const lossJ = energyByDay.reduce((sum, e) => sum + heatLossJ(e), 0);
  const gasJ = energyByDay.reduce((sum, e) => sum + e.gasToWallJ, 0);
  const threshold = inputs.limits.cyclesAbove?.rangeK ?? null;
  const across = parts.cycles.differences.map((d, j) => wallCycles(d.across, parts.cycles.of(j), layout));
  const x = parts.extremes;
  const at = (seg: number) => round(layout.heightM[seg]!, 2);
  const fullYear = days >= 365;
  return {
    first_day: annual.firstDay,
    last_day: annual.lastDay,
    days,
    full_year: fullYear,
    hours_below_water_dew: total.water,
    hours_below_acid_dew: total.acid,
    heat_loss_kwh: round(lossJ / J_PER_KWH, 1),
    gas_to_wall_kwh: round(gasJ / J_PER_KWH, 1),
    peak_shell_c: round(c(x.peakShell.value)),
    peak_shell_time: x.peakShell.time,
    peak_shell_height_m: at(x.peakShell.segment),
    peak_lining_c: round(c(x.peakLining.value)),
    peak_lining_time: x.peakLining.time,
    peak_lining_height_m: at(x.peakLining.segment),
    min_inner_surface_c: round(c(x.minInner.value)),
    min_inner_surface_time: x.minInner.time,
    min_inner_surface_height_m: at(x.minInner.segment),
    months: monthsBetween(annual.firstDay, annual.lastDay).map((m) => monthFigures(m, parts, energyByDay)),
    cycles: {
      method: `rainflow counting after ASTM E1049-85 (2011) § 5.4.4, the residue as half cycles; full cycles count 1, half cycles ½; reversals under ${CYCLE_GATE_K} K filtered out first (hysteresis gate)`,
      sampled_every_min: round(inputs.run.outputInterval / 60, 2),
      gate_k: CYCLE_GATE_K,
      threshold_k: threshold === null ? null : round(threshold, 2),
      across,
    },
    verdicts: annualVerdicts(inputs.limits, {
      hoursWater: total.water,
      hoursAcid: total.acid,
      acidDewC: layout.acidDewPointK === null ? null : c(layout.acidDewPointK),
      waterDewC: c(layout.waterDewPointK),
      cycles: across,
      days,
      fullYear,
    }),
  };
}
