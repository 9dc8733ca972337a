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
import { CAUTIONS, type Summary } from '../summary.ts';
import { round } from '../rounding.ts';
import { evaluated, type Evaluated, type Location } from './evaluated.ts';
import { gasAndDraftRanges, positionRanges, wallExtremeFigures, wallExtremes, type PositionSwingAt } from './extremes.ts';
import { layerMaxDeltaT, layerSummaries, throughWallFigures, throughWallMaxDeltaT } from './layers.ts';
import { dewPointFigures, lowestMargins } from './dewPoints.ts';
import { evaluatedEnergy, heatPerDay, residualWarning } from './energy.ts';
import { warmupTimes } from './warmup.ts';
import { verdicts } from './verdicts.ts';
import { meshSummary } from './mesh.ts';
import { accuracyStatement, accuracyWarning, type AccuracyOutcome } from './accuracy.ts';

export { evaluationInstants, type Location } from './evaluated.ts';
export { fractionBelowZero } from './dewPoints.ts';
export { timeToReach, timeToStayAbove } from './warmup.ts';
export { simulateWithAccuracy, type AccuracyOutcome, type CheckedRun } from './accuracy.ts';
export type { PositionSwingAt } from './extremes.ts';

export interface SummaryContext {
  readonly inputs: ModelInputs;
  readonly result: RunResult;
  readonly version: string;
  readonly description?: string | null;
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
  };
}

/** The summary of a run (summary.json) and where each of its located figures occurs. */
export function summariseRun({ inputs, result, version, description, accuracy }: SummaryContext): SummarisedRun {
  const mode = inputs.run.mode;
  const ev = evaluated(result.series, mode);
  const extremes = wallExtremes(ev);
  const { positions, swingAt } = positionRanges(ev);
  const { layers, maxDeltaT } = layerSummaries(ev, inputs.layers);
  const throughWall = throughWallMaxDeltaT(ev);
  const margins = lowestMargins(ev);
  const energy = evaluatedEnergy(result, mode);
  const warmup = mode === 'warmup' && result.firingStartT !== null ? warmupTimes(ev, result.firingStartT, inputs.limits) : null;
  const verdictList = verdicts(ev, { mode, limits: inputs.limits, extremes, layers, margins, warmup });

  const warnings = [...result.warnings];
  if (result.periodic && !result.periodic.reached)
    warnings.push(`the periodic state was NOT reached in ${result.daysSimulated} days (last day-to-day change ${round(result.periodic.lastChangeK, 3)} K > tolerance ${result.periodic.toleranceK} K); figures are for the last simulated day`);
  const residual = residualWarning(energy);
  if (residual !== null) warnings.push(residual);
  const statement = accuracyStatement(inputs, accuracy);
  const accuracyNote = accuracyWarning(statement);
  if (accuracyNote !== null) warnings.push(accuracyNote);

  const summary: Summary = {
    tool: { name: 'stackday', version },
    scenario: { name: inputs.name, description: description ?? null, site: inputs.site.name, first_day: inputs.site.startDate, time_zone: inputs.site.timeZone },
    run: {
      mode,
      days_simulated: result.daysSimulated,
      evaluated_over: mode === 'warmup' ? 'the whole run from firing start' : result.periodic ? 'the settled (periodic) day' : 'the last simulated day',
      periodic_requested: result.periodic !== null,
      periodic_reached: result.periodic ? result.periodic.reached : null,
      periodic_last_change_k: result.periodic ? round(result.periodic.lastChangeK, 4) : null,
      periodic_tolerance_k: result.periodic ? result.periodic.toleranceK : null,
      periodic_change_by_day_k: result.periodic ? result.periodic.changeByDayK.map((v) => round(v, 4)) : [],
      integrator: result.integrator.name,
      steps: result.integrator.steps,
      compute_ms: round(result.integrator.computeMs, 1),
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
    assumptions: runAssumptions(inputs, result),
    warnings,
    cautions: CAUTIONS,
  };
  return {
    summary,
    locations: locations(ev, {
      extremes,
      throughWall: throughWall.at,
      layerMaxDeltaT: maxDeltaT.map((d) => d.at),
      positionSwing: swingAt,
      margins: { water: margins.water.at, acid: margins.acid?.at ?? null },
      warmup: warmup !== null,
    }),
  };
}

/** The summary of a run (summary.json). */
export function summarise(ctx: SummaryContext): Summary {
  return summariseRun(ctx).summary;
}
