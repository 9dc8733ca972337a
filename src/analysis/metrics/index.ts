/**
 * From the time series to the figures an engineer acts on (docs/model.md, "Results"), one question per
 * module: extremes (peaks, minima, positions, gas and draft), layers (ranges, ΔT, stress
 * indicator), dew points (margins, hours below), energy (heat per day, residual), warm-up times,
 * and verdicts against every limit. This module composes them into the summary and records where
 * each located figure occurs, as indices, for the charts.
 */
import type { ModelInputs } from '../../model/inputs.ts';
import type { RunResult, TimeSeries } from '../../model/timeseries.ts';
import { runAssumptions } from '../assumptions.ts';
import { AVERAGED_SUN_CAUTION, CAUTIONS, type AnnualOutcome, type AnnualSummary, type Summary } from '../summary.ts';
import { sectorFigures } from './sectors.ts';
import { round } from '../rounding.ts';
import { evaluated, type Evaluated, type Location } from './evaluated.ts';
import { gasAndDraftRanges, positionRanges, wallExtremeFigures, wallExtremes, type PositionSwingAt } from './extremes.ts';
import { layerMaxDeltaT, layerSummaries, throughWallFigures, throughWallMaxDeltaT } from './layers.ts';
import { dewPointFigures, lowestMargins } from './dewPoints.ts';
import { evaluatedEnergy, heatPerDay, residualWarning } from './energy.ts';
import { warmupTimes } from './warmup.ts';
import { verdicts } from './verdicts.ts';
import { DailyExtremes } from './daily.ts';
import { replaySeries } from '../../model/sinks.ts';
import { meshSummary } from './mesh.ts';
import { accuracyStatement, accuracyWarning, type AccuracyOutcome } from './accuracy.ts';

export { evaluationInstants, type Location } from './evaluated.ts';
export { DailyExtremes } from './daily.ts';
export { fractionBelowZero } from './dewPoints.ts';
export { timeToReach, timeToStayAbove } from './warmup.ts';
export { simulateWithAccuracy, type AccuracyOutcome, type CheckedRun } from './accuracy.ts';
export type { PositionSwingAt } from './extremes.ts';

export interface SummaryContext {
  readonly inputs: ModelInputs;
  readonly result: RunResult;
  readonly version: string;
  readonly description?: string | null;
  /**
   * The per-day figures gathered while the run went (a sink passed to simulate); without it they
   * are found from the days the result's series holds.
   */
  readonly daily?: DailyExtremes;
  /** An annual run's figures (analysis/annual, from the statistics a sink gathered while the run went): the summary's `annual` section. */
  readonly annual?: AnnualOutcome;
  /** The accuracy check of the run (from `simulateWithAccuracy`); without it the summary states no estimate. */
  readonly accuracy?: AccuracyOutcome;
}

/**
 * Where each located figure of a summary occurs: output-instant index (into the series' times) and
 * segment index (0 = bottom). The summary states the same places as ISO local times and heights.
 */
export interface SummaryLocations {
  /** peak_shell_*. */
  readonly peakShell: Location;
  /** peak_lining_*. */
  readonly peakLining: Location;
  /** min_inner_surface_*. */
  readonly minInnerSurface: Location;
  /** through_wall_max_delta_t_*. */
  readonly throughWallMaxDeltaT: Location;
  /** layers[j].max_delta_t_*, inside → outside. */
  readonly layerMaxDeltaT: readonly Location[];
  /** positions[j]: its node and the segment of its largest swing (swing_height_m). */
  readonly positionSwing: readonly PositionSwingAt[];
  /** lowest_water_dew_margin_*. */
  readonly lowestWaterDewMargin: Location;
  /** lowest_acid_dew_margin_* (null when the gas has no acid dew point). */
  readonly lowestAcidDewMargin: Location | null;
  /** Warm-up studies: the output instant stated as warmup.firing_start_local; null for a cycle study. */
  readonly firingStart: number | null;
  /** Walls cut into sectors: the sunniest and shadiest sector (null with one sector). */
  readonly sectors?: { readonly sunniest: number; readonly shadiest: number } | null;
}

export interface SummarisedRun {
  readonly summary: Summary;
  readonly locations: SummaryLocations;
}

/** Where every located figure of a run occurs, from its time series alone (the same search `summariseRun` makes). */
export function locateFigures(series: TimeSeries, mode: 'cycle' | 'warmup'): SummaryLocations {
  const ev = evaluated(series, mode);
  const x = wallExtremes(ev);
  const margins = lowestMargins(ev);
  return locations(ev, {
    extremes: x,
    throughWall: throughWallMaxDeltaT(ev).at,
    layerMaxDeltaT: series.layers.map((l) => layerMaxDeltaT(ev, l).at),
    positionSwing: positionRanges(ev).swingAt,
    margins: { water: margins.water.at, acid: margins.acid?.at ?? null },
    warmup: mode === 'warmup',
  });
}

function locations(
  ev: Evaluated,
  p: { extremes: ReturnType<typeof wallExtremes>; throughWall: Location; layerMaxDeltaT: readonly Location[]; positionSwing: readonly PositionSwingAt[]; margins: { water: Location; acid: Location | null }; warmup: boolean },
): SummaryLocations {
  return {
    peakShell: p.extremes.peakShell.at,
    peakLining: p.extremes.peakLining.at,
    minInnerSurface: p.extremes.minInnerSurface.at,
    throughWallMaxDeltaT: p.throughWall,
    layerMaxDeltaT: p.layerMaxDeltaT,
    positionSwing: p.positionSwing,
    lowestWaterDewMargin: p.margins.water,
    lowestAcidDewMargin: p.margins.acid,
    // warmupTimes states the first output instant as the firing start
    firingStart: p.warmup && ev.series.t.length > 0 ? 0 : null,
    sectors: null,
  };
}

/** The summary of a run (summary.json) and where each of its located figures occurs. */
export function summariseRun({ inputs, result, version, description, daily, annual, accuracy }: SummaryContext): SummarisedRun {
  const mode = inputs.run.mode;
  const ev = evaluated(result.series, mode);
  const extremes = wallExtremes(ev);
  const { positions, swingAt } = positionRanges(ev);
  const { layers, maxDeltaT } = layerSummaries(ev, inputs.layers);
  const throughWall = throughWallMaxDeltaT(ev);
  const margins = lowestMargins(ev);
  const energy = evaluatedEnergy(result, mode);
  const warmup = mode === 'warmup' && result.firingStartT !== null ? warmupTimes(ev, result.firingStartT, inputs.limits) : null;
  // a cycle run of several days that is not periodic is judged on every day (when the daily sink saw them all)
  const worst = mode === 'cycle' && result.periodic === null && result.daysSimulated > 1 ? (daily?.runWorst() ?? null) : null;
  const runWide = worst ? { worst, days: result.daysSimulated, layers: inputs.layers } : null;
  // one list of every verdict: the limits of any run, then an annual run's (hours a year, cycles)
  const verdictList = [...verdicts(ev, { mode, limits: inputs.limits, extremes, layers, margins, warmup, runWide }), ...(annual?.verdicts ?? [])];

  const weatherNotes = inputs.weather.kind === 'file' ? inputs.weather.notes : undefined;
  const warnings = [...(weatherNotes?.warnings ?? []), ...result.warnings];
  if (result.periodic && !result.periodic.reached)
    warnings.push(`the periodic state was NOT reached in ${result.daysSimulated} days (last day-to-day change ${round(result.periodic.lastChangeK, 3)} K > tolerance ${result.periodic.toleranceK} K); figures are for the last simulated day`);
  if (result.retained.truncated)
    warnings.push(`the warm-up figures and charts cover the first ${result.retained.days} of ${result.daysSimulated} simulated days (the days the run keeps in memory); the files and the daily figures cover every day`);
  const residual = residualWarning(energy);
  if (residual !== null) warnings.push(residual);
  const outerDiameter = 2 * result.series.nodeRadius[result.series.nodes - 1]!;
  const sectors = sectorFigures(ev, inputs.layers, outerDiameter, inputs.stack.height, extremes.peakShell);
  const statement = accuracyStatement(inputs, accuracy);
  const accuracyNote = accuracyWarning(statement);
  if (accuracyNote !== null) warnings.push(accuracyNote);

  const summary: Summary = {
    tool: { name: 'stackday', version },
    scenario: { name: inputs.name, description: description ?? null, site: inputs.site.name, first_day: inputs.site.startDate, time_zone: inputs.site.timeZone },
    run: {
      mode,
      days_simulated: result.daysSimulated,
      evaluated_over: evaluatedOver(result, mode),
      verdicts_over: runWide ? `all ${runWide.days} simulated days` : evaluatedOver(result, mode),
      periodic_requested: result.periodic !== null,
      periodic_reached: result.periodic ? result.periodic.reached : null,
      periodic_last_change_k: result.periodic ? round(result.periodic.lastChangeK, 4) : null,
      periodic_tolerance_k: result.periodic ? result.periodic.toleranceK : null,
      periodic_change_by_day_k: result.periodic ? result.periodic.changeByDayK.map((v) => round(v, 4)) : [],
      integrator: result.integrator.name,
      steps: result.integrator.steps,
      rejected_steps: result.integrator.rejected,
      rhs_evaluations: result.integrator.rhsEvaluations,
      jacobian_evaluations: result.integrator.jacobianEvaluations,
      newton_iterations: result.integrator.newtonIterations,
      newton_failures: result.integrator.newtonFailures,
      output_interval_min: round(inputs.run.outputInterval / 60, 2),
      segments: ev.S,
      nodes_per_segment: ev.N,
      relative_tolerance: result.solve.rtol,
      absolute_tolerance_k: result.solve.atol,
      mesh: meshSummary(result),
    },
    accuracy: statement,
    verdicts: verdictList,
    all_limits_pass: verdictList.every((v) => v.status !== 'fail'),
    ...wallExtremeFigures(ev, extremes),
    positions,
    layers,
    ...throughWallFigures(ev, throughWall),
    ...dewPointFigures(ev, margins),
    ...gasAndDraftRanges(ev),
    ...heatPerDay(energy),
    energy_residual_run_percent: round(result.energy.run.residualPercent, 6),
    warmup,
    daily: dailyFigures(result, daily),
    ...(annual ? { annual: annualFigures(annual) } : {}),
    assumptions: runAssumptions(inputs, result),
    warnings,
    cautions: sectors ? CAUTIONS.filter((x) => x !== AVERAGED_SUN_CAUTION) : CAUTIONS,
    ...(sectors ? { sectors: sectors.summary } : {}),
  };
  return {
    summary,
    locations: {
      ...locations(ev, {
        extremes,
        throughWall: throughWall.at,
        layerMaxDeltaT: maxDeltaT.map((d) => d.at),
        positionSwing: swingAt,
        margins: { water: margins.water.at, acid: margins.acid?.at ?? null },
        warmup: warmup !== null,
      }),
      sectors: sectors ? { sunniest: sectors.at.sunniest, shadiest: sectors.at.shadiest } : null,
    },
  };
}

/** The summary's annual section: the annual figures without their verdicts (listed with the others). */
function annualFigures({ verdicts: _listedWithTheOthers, ...figures }: AnnualOutcome): AnnualSummary {
  return figures;
}

/** Which instants the figures cover, in words. */
function evaluatedOver(result: RunResult, mode: 'cycle' | 'warmup'): string {
  if (mode === 'warmup') return result.retained.truncated ? `the first ${result.retained.days === 1 ? 'day' : `${result.retained.days} days`} from firing start` : 'the whole run from firing start';
  return result.periodic ? 'the settled (periodic) day' : 'the last simulated day';
}

/** Figures of every day: from the sink that saw the run, or else from the days the series holds. */
function dailyFigures(result: RunResult, daily: DailyExtremes | undefined) {
  let sink = daily;
  if (!sink) {
    sink = new DailyExtremes();
    replaySeries(result.series, [sink]);
  }
  return sink.figures(result.energy.byDay);
}

/** The summary of a run (summary.json). */
export function summarise(ctx: SummaryContext): Summary {
  return summariseRun(ctx).summary;
}
