/**
 * How far the reported figures may be off: the accuracy statement of every run (docs/model.md
 * "Accuracy statement").
 *
 * A second solve — the check — cuts every cell of the run's mesh in two and divides both
 * tolerances by CHECK_TOLERANCE_DIVISOR, over the instants the figures cover: the reported day,
 * started from the run's own state at the start of that day moved onto the finer mesh (a warm-up,
 * or a run whose first day is reported, is checked from its start). For a method of spatial order
 * p = 2 refined by r = 2, the error of the run's figure Q_h is about (Q_h − Q_{h/2}) r^p/(r^p − 1)
 * (Richardson extrapolation; Roache 1998, Verification and Validation in Computational Science
 * and Engineering, ch. 5), so each figure carries the estimate 4/3 |Q_h − Q_{h/2}|. The tighter
 * tolerance of the check makes the same difference take in the time-integration error.
 *
 * What it does not see: errors that were already in the state the check starts from (a periodic
 * run's slow drift over the days before the reported one), and the output interval's sampling of
 * peaks and crossing times (the check samples the same instants).
 *
 * `run.accuracy: <target K>` repeats run and check, each time on the check's finer settings, until
 * every estimate in K is within the target (at most MAX_TARGET_REFINEMENTS times).
 */
import type { ModelInputs } from '../../model/inputs.ts';
import type { RunResult } from '../../model/timeseries.ts';
import { simulate, NO_REFINEMENT, type SimulateOptions, type SolveRefinement } from '../../model/simulate.ts';
import type { Summary } from '../summary.ts';
import { round } from '../rounding.ts';
import { evaluated } from './evaluated.ts';
import { wallExtremes } from './extremes.ts';
import { lowestMargins } from './dewPoints.ts';
import { warmupSecondsAt } from './warmup.ts';

/** Mesh refinement of the check: every cell cut in two. */
export const CHECK_MESH_REFINEMENT = 2;
/** Both tolerances of the check are the run's divided by this. */
export const CHECK_TOLERANCE_DIVISOR = 4;
/** Spatial order of the finite-volume scheme. */
export const SPATIAL_ORDER = 2;
/** r^p / (r^p − 1): the Richardson factor from the difference of the two solves to the error of the coarser. */
export const RICHARDSON_FACTOR = CHECK_MESH_REFINEMENT ** SPATIAL_ORDER / (CHECK_MESH_REFINEMENT ** SPATIAL_ORDER - 1);
/** Most refinements a target may ask for (each halves the cells and divides the tolerances by CHECK_TOLERANCE_DIVISOR). */
export const MAX_TARGET_REFINEMENTS = 3;
/** Estimates above this, K, get a warning that suggests a target (the accuracy the defaults aim at). */
export const DEFAULT_AIM_K = 0.1;

/** The reported figures an accuracy estimate covers, in SI (K, and minutes for warm-up times). */
export interface AccuracyFigures {
  /** Any surface or interface temperature at any reported instant (the time series; for estimates only: the largest difference), K. */
  readonly temperaturesK: number;
  readonly peakShellK: number;
  readonly peakLiningK: number;
  readonly lowestWaterDewMarginK: number;
  readonly lowestAcidDewMarginK: number | null;
  /** Warm-up times at the top of the stack, min (null: not reached, or not a warm-up). */
  readonly minutesToWaterDew: number | null;
  readonly minutesToAcidDew: number | null;
  readonly minutesToShell90: number | null;
  readonly minutesToShellTouch: number | null;
}

/** The figures of a run (the same searches the summary makes). */
export function accuracyFigures(inputs: ModelInputs, result: RunResult): AccuracyFigures {
  const ev = evaluated(result.series, inputs.run.mode);
  const x = wallExtremes(ev);
  const m = lowestMargins(ev);
  const top = inputs.run.mode === 'warmup' && result.firingStartT !== null ? warmupSecondsAt(ev, ev.S - 1, result.firingStartT, inputs.limits) : null;
  const minutes = (s: number | null | undefined) => (s === null || s === undefined ? null : s / 60);
  return {
    temperaturesK: Number.NaN,
    peakShellK: x.peakShell.value,
    peakLiningK: x.peakLining.value,
    lowestWaterDewMarginK: m.water.value,
    lowestAcidDewMarginK: m.acid?.value ?? null,
    minutesToWaterDew: minutes(top?.toWaterDew),
    minutesToAcidDew: minutes(top?.toAcidDew),
    minutesToShell90: minutes(top?.toShell90Percent),
    minutesToShellTouch: minutes(top?.toShellTouch),
  };
}

/** Richardson estimate of the error of `run` from the finer `check`; null when either is missing. */
export function richardsonEstimate(run: number | null, check: number | null): number | null {
  if (run === null || check === null || !Number.isFinite(run) || !Number.isFinite(check)) return null;
  return RICHARDSON_FACTOR * Math.abs(run - check);
}

/** The solve settings one refinement finer than `level`. */
export function finerLevel(level: SolveRefinement): SolveRefinement {
  return { mesh: level.mesh * CHECK_MESH_REFINEMENT, tolerance: level.tolerance * CHECK_TOLERANCE_DIVISOR };
}

/** Whether the instants the figures cover start where the run starts (a warm-up, or a reported first day). */
function reportedFromStart(inputs: ModelInputs, run: RunResult): boolean {
  return inputs.run.mode === 'warmup' || run.reportedDayStart.day === run.solve.firstDay;
}

/**
 * The check of a run solved at `level`: one refinement finer, over the instants the figures cover
 * (module note). It feeds none of the run's sinks (its instants are not the run's).
 */
export function checkSolve(inputs: ModelInputs, run: RunResult, level: SolveRefinement, options: SimulateOptions = {}): RunResult {
  const refinement = finerLevel(level);
  options = withoutSinks(options);
  if (reportedFromStart(inputs, run)) return simulate(inputs, { ...options, refinement });
  return simulate(inputs, { ...options, refinement, resume: { state: run.reportedDayStart.state, day: run.reportedDayStart.day, days: 1 } });
}

/** The options without the run's sinks (for solves whose instants are not the reported run's). */
function withoutSinks(options: SimulateOptions): SimulateOptions {
  const { sinks: _sinks, ...rest } = options;
  return rest;
}

/** A run with its accuracy statement. */
export interface CheckedRun {
  readonly result: RunResult;
  readonly accuracy: AccuracyOutcome;
}

/** What the accuracy statement of a summary is made from. */
export interface AccuracyOutcome {
  readonly request: NonNullable<ModelInputs['run']['accuracy']>;
  /** The check solve (null when off). */
  readonly check: RunResult | null;
  /** The estimates (null when off). */
  readonly estimates: AccuracyFigures | null;
  /** How many times the run was refined to meet a target. */
  readonly refinements: number;
}

/**
 * Largest difference, K, of any surface or interface temperature (the positions both meshes share)
 * between two solves at the output instants the figures of `run` cover and `other` also has.
 */
export function largestSurfaceDifference(inputs: ModelInputs, run: RunResult, other: RunResult): number {
  const a = run.series;
  const b = other.series;
  const S = a.segments * a.sectors; // node columns: segment × sector
  const instantOf = new Map<number, number>();
  b.t.forEach((t, k) => instantOf.set(Math.round(t * 1000), k));
  const pairs: [number, number][] = [];
  a.nodeLabel.forEach((label, i) => {
    const j = label.startsWith('node_') ? -1 : b.nodeLabel.indexOf(label);
    if (j >= 0) pairs.push([i, j]);
  });
  let largest = 0;
  for (const k of evaluated(a, inputs.run.mode).ks) {
    const kb = instantOf.get(Math.round(a.t[k]! * 1000));
    if (kb === undefined) continue;
    for (let s = 0; s < S; s++)
      for (const [i, j] of pairs) largest = Math.max(largest, Math.abs(a.temperatureK[(k * S + s) * a.nodes + i]! - b.temperatureK[(kb * S + s) * b.nodes + j]!));
  }
  return largest;
}

/** Estimated error of each figure of `run` from `check`. */
function estimates(inputs: ModelInputs, run: RunResult, check: RunResult): AccuracyFigures {
  const a = accuracyFigures(inputs, run);
  const b = accuracyFigures(inputs, check);
  return {
    temperaturesK: RICHARDSON_FACTOR * largestSurfaceDifference(inputs, run, check),
    peakShellK: richardsonEstimate(a.peakShellK, b.peakShellK)!,
    peakLiningK: richardsonEstimate(a.peakLiningK, b.peakLiningK)!,
    lowestWaterDewMarginK: richardsonEstimate(a.lowestWaterDewMarginK, b.lowestWaterDewMarginK)!,
    lowestAcidDewMarginK: richardsonEstimate(a.lowestAcidDewMarginK, b.lowestAcidDewMarginK),
    minutesToWaterDew: richardsonEstimate(a.minutesToWaterDew, b.minutesToWaterDew),
    minutesToAcidDew: richardsonEstimate(a.minutesToAcidDew, b.minutesToAcidDew),
    minutesToShell90: richardsonEstimate(a.minutesToShell90, b.minutesToShell90),
    minutesToShellTouch: richardsonEstimate(a.minutesToShellTouch, b.minutesToShellTouch),
  };
}

/** The largest estimate in K. */
export function largestKelvinEstimate(e: AccuracyFigures): number {
  return Math.max(e.temperaturesK, e.peakShellK, e.peakLiningK, e.lowestWaterDewMarginK, e.lowestAcidDewMarginK ?? 0);
}

/**
 * Run the inputs with the accuracy statement they ask for (`run.accuracy`, default `estimate`):
 * the run, its check, and for a target the refinements. Progress runs 0 → 1 over the whole.
 * The run's sinks see exactly one run, the reported one: the first run feeds them; when a target
 * refines the run, the refined solves feed none, and the final one is solved once more for them
 * (its instants then reach the files as the reported run's).
 */
export function simulateWithAccuracy(inputs: ModelInputs, options: SimulateOptions = {}): CheckedRun {
  const request = inputs.run.accuracy ?? { kind: 'estimate' as const };
  if (request.kind === 'off') return { result: simulate(inputs, options), accuracy: { request, check: null, estimates: null, refinements: 0 } };
  const rounds = request.kind === 'target' ? MAX_TARGET_REFINEMENTS + 1 : 1;
  const progress = (from: number, to: number): SimulateOptions => ({ ...options, onProgress: (f) => options.onProgress?.(from + f * (to - from)) });
  let level = NO_REFINEMENT;
  let result: RunResult | null = null;
  for (let refinements = 0; ; refinements++) {
    const share = 1 / rounds;
    const start = refinements * share;
    result ??= simulate(inputs, { ...(refinements === 0 ? progress(start, start + 0.6 * share) : withoutSinks(progress(start, start + 0.6 * share))), refinement: level });
    const check = checkSolve(inputs, result, level, progress(start + 0.6 * share, start + share));
    const e = estimates(inputs, result, check);
    const done = request.kind !== 'target' || largestKelvinEstimate(e) <= request.targetK || refinements === MAX_TARGET_REFINEMENTS;
    if (done) {
      // a refined run has fed no sink: solve it once more for them (same settings, the same numbers)
      if (refinements > 0 && (options.sinks?.length ?? 0) > 0) result = simulate(inputs, { ...options, onProgress: undefined, refinement: level });
      return { result, accuracy: { request, check, estimates: e, refinements } };
    }
    // the next run is the check's settings; a check that covered the whole run is that run already
    result = reportedFromStart(inputs, result) ? check : null;
    level = finerLevel(level);
  }
}

/** The instants a check covered, in words. */
function checkSpan(inputs: ModelInputs, check: RunResult): string {
  if (check.solve.resumed) return "the reported day, from the run's state at its start";
  return inputs.run.mode === 'warmup' ? 'the whole warm-up' : 'the whole run';
}

/** The accuracy statement of summary.json. */
export function accuracyStatement(inputs: ModelInputs, outcome: AccuracyOutcome | undefined): Summary['accuracy'] {
  const request = outcome?.request ?? inputs.run.accuracy ?? { kind: 'estimate' as const };
  const e = outcome?.estimates ?? null;
  const check = outcome?.check ?? null;
  const r4 = (v: number | null | undefined) => (v === null || v === undefined ? null : round(v, 4));
  const r1 = (v: number | null | undefined) => (v === null || v === undefined ? null : round(v, 2));
  const largest = e ? largestKelvinEstimate(e) : null;
  return {
    mode: outcome === undefined ? 'off' : request.kind,
    target_k: request.kind === 'target' ? request.targetK : null,
    target_met: request.kind === 'target' && largest !== null ? largest <= request.targetK : null,
    refinements: outcome?.refinements ?? 0,
    method:
      check === null
        ? 'not estimated (run.accuracy: off)'
        : `Richardson estimate ${round(RICHARDSON_FACTOR, 3)} × |run − check|, the check a second solve on a ${CHECK_MESH_REFINEMENT}× finer mesh at tolerances ÷ ${CHECK_TOLERANCE_DIVISOR} over ${checkSpan(inputs, check)}`,
    check:
      check === null
        ? null
        : {
            mesh_refinement: check.solve.meshRefinement,
            relative_tolerance: check.solve.rtol,
            absolute_tolerance_k: check.solve.atol,
            nodes_per_segment: check.series.nodes,
            days: check.daysSimulated,
          },
    temperatures_k: r4(e?.temperaturesK),
    peak_shell_k: r4(e?.peakShellK),
    peak_lining_k: r4(e?.peakLiningK),
    lowest_water_dew_margin_k: r4(e?.lowestWaterDewMarginK),
    lowest_acid_dew_margin_k: r4(e?.lowestAcidDewMarginK),
    warmup_minutes_to_water_dew: r1(e?.minutesToWaterDew),
    warmup_minutes_to_acid_dew: r1(e?.minutesToAcidDew),
    warmup_minutes_to_shell_90_percent: r1(e?.minutesToShell90),
    warmup_minutes_to_shell_touch: r1(e?.minutesToShellTouch),
    largest_k: r4(largest),
  };
}

/** A warning when an estimate exceeds the target or, without one, the defaults' aim; null otherwise. */
export function accuracyWarning(statement: Summary['accuracy']): string | null {
  const largest = statement.largest_k;
  if (largest === null) return null;
  if (statement.target_k !== null)
    return statement.target_met
      ? null
      : `the accuracy target ${statement.target_k} K was NOT met after ${statement.refinements} refinements (largest estimated error ± ${largest} K); give the layers cell counts or tighten the tolerances`;
  return largest > DEFAULT_AIM_K ? `the estimated error of a reported temperature is ± ${largest} K, above ${DEFAULT_AIM_K} K: set run.accuracy to a target in K (e.g. ${DEFAULT_AIM_K}) to refine the run until it is met` : null;
}
