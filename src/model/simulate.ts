/**
 * Run the wall model: validated inputs → assembled model → integrator, day by day → reported
 * instants (to the run's sinks as they are computed, and kept in memory as far as the summary and
 * charts need them), energy account and range checks. Nothing here reads or writes files or knows
 * the scenario format.
 *
 * Memory stays flat in the number of days: the result's series holds the last day of a cycle study
 * (the day its figures cover) and, of a warm-up study, the whole run up to WARMUP_SERIES_BUDGET_BYTES
 * (its first days, when the run is longer); sinks see every instant. `retainAll` keeps every instant
 * instead (memory then grows with the run).
 */
import type { ModelInputs } from './inputs.ts';
import type { EnergyAccount, RunResult } from './timeseries.ts';
import { assembleModel, type AssembledModel } from './assemble.ts';
import { makeSegmentDiagnostics, AUX_SIZE } from './system.ts';
import { INTEGRATORS } from '../solver/index.ts';
import { IntegrationError, type IntegratorStats } from '../solver/types.ts';
import { emptyStats } from '../solver/stepping.ts';
import { steadyState, averagedOverInstants } from './steady.ts';
import { SECONDS_PER_DAY } from '../physics/constants.ts';
import { Recorder } from './recorder.ts';
import { energyAccount } from './energy.ts';
import { SimulationError } from './errors.ts';
import type { InstantSink, InstantView } from './sinks.ts';
import { SERIES_INSTANT_CHANNELS, SERIES_SEGMENT_CHANNELS } from './timeseries.ts';
import { sameNodes, stateOnMesh, wallStateOf, type WallState } from './wallState.ts';
import { geometryWarnings } from './geometryChecks.ts';

export { SimulationError } from './errors.ts';

export interface SimulateOptions {
  /** Called now and then with the fraction of the run done (0–1). */
  readonly onProgress?: (fraction: number) => void;
  /** Receive every reported instant as it is computed (files written as the run goes, running figures). */
  readonly sinks?: readonly InstantSink[];
  /** Keep every reported instant in the result's series, not only those the summary needs (memory grows with the run). */
  readonly retainAll?: boolean;
  /** Memory, bytes, a warm-up study's series may take (default WARMUP_SERIES_BUDGET_BYTES). */
  readonly warmupSeriesBudgetBytes?: number;
  /** The settings of this solve when they are not the scenario's (an accuracy check, a refined run). */
  readonly refinement?: SolveRefinement;
  /**
   * Start from `state` (moved onto this solve's mesh) at the start of run day `day` and simulate
   * `days` days, recording them as the whole run would (the accuracy check over the reported day).
   */
  readonly resume?: { readonly state: WallState; readonly day: number; readonly days: number };
}

/**
 * Most memory, bytes, that the series of a warm-up study may take: the study keeps its whole run
 * for the figures (times to reach the dew points, from firing start) up to this, and its first
 * days beyond it (about 230 days of the demo at a 10-minute output interval, 23 days at 1 minute).
 */
export const WARMUP_SERIES_BUDGET_BYTES = 128 * 1024 * 1024;

/** Approximate memory of one kept instant, bytes: its numbers and its ISO time string. */
function bytesPerInstant(segments: number, nodes: number): number {
  return 8 * (segments * (nodes + SERIES_SEGMENT_CHANNELS.length) + SERIES_INSTANT_CHANNELS.length + 4) + 96;
}

/** A solve finer than the scenario's: every cell cut into `mesh`, both tolerances divided by `tolerance`. */
export interface SolveRefinement {
  readonly mesh: number;
  readonly tolerance: number;
}

/** The scenario's own mesh and tolerances. */
export const NO_REFINEMENT: SolveRefinement = { mesh: 1, tolerance: 1 };

/** Steps never exceed this, s: it bounds the dense output's interpolation error (O(h⁴)) on the daily wave. */
const MAX_STEP_S = 3600;

/**
 * Day `d` of the run (run time from `t0`): the instants the integrator must stop at — every
 * schedule corner inside the day (a ramp's ends, a step: the forcing is not smooth there) and the
 * day's end — and the output instants, which the integrator fills by interpolation.
 */
function dayPlan(model: AssembledModel, t0: number, d: number): { stops: number[]; outputs: number[] } {
  const { ctx, clock, inputs } = model;
  const interval = inputs.run.outputInterval;
  const start = t0 + d * SECONDS_PER_DAY;
  const end = start + SECONDS_PER_DAY;
  const outputs: number[] = [];
  for (let j = 1; start + j * interval <= end + 1e-6; j++) outputs.push(Math.min(end, start + j * interval));
  if (outputs.length === 0 || outputs[outputs.length - 1]! < end - 1e-6) outputs.push(end);
  const corners: number[] = [];
  // schedule corners of the days that overlap [start, end] (with a repeated first day: day 0's, shifted)
  const repeat = ctx.repeatFirstDay;
  const dayIdx = repeat ? 0 : clock.dayIndex(start);
  const shift = repeat ? start - t0 : 0;
  for (const dd of [dayIdx - 1, dayIdx, dayIdx + 1]) {
    if (dd < 0) continue;
    for (const c of ctx.schedule.corners(dd)) {
      const tc = clock.runTimeOfLocal(dd, c) + shift;
      if (tc > start + 1e-6 && tc < end - 1e-6) corners.push(tc);
    }
  }
  corners.sort((a, b) => a - b);
  const stops: number[] = [];
  for (const c of corners) if (stops.length === 0 || c - stops[stops.length - 1]! > 1e-6) stops.push(c);
  // an output within a microsecond of a corner is taken at the corner (the exact state)
  for (let j = 0; j < outputs.length; j++) {
    const near = stops.find((c) => Math.abs(c - outputs[j]!) <= 1e-6);
    if (near !== undefined) outputs[j] = near;
  }
  stops.push(end);
  return { stops, outputs };
}

/** Add the counts of one integration to a running total. */
function addStats(total: IntegratorStats, part: IntegratorStats): void {
  for (const key of Object.keys(total) as (keyof IntegratorStats)[]) total[key] += part[key];
}

/** Largest change of any node between two days' states at the same clock instants, K. */
function largestDailyChange(today: readonly Float64Array[], yesterday: readonly Float64Array[]): number {
  let change = 0;
  for (let instant = 0; instant < today.length && instant < yesterday.length; instant++) {
    const a = today[instant]!;
    const b = yesterday[instant]!;
    for (let i = 0; i < a.length; i++) change = Math.max(change, Math.abs(a[i]! - b[i]!));
  }
  return change;
}

/** Run the whole simulation (or, with `options.resume`, part of it). Throws SimulationError on solver failure. */
export function simulate(inputs: ModelInputs, options: SimulateOptions = {}): RunResult {
  const started = performance.now();
  const refinement = options.refinement ?? NO_REFINEMENT;
  const model = assembleModel(inputs, refinement.mesh);
  const { system, geometry, ctx, clock, mesh } = model;
  const run = inputs.run;
  const integrate = INTEGRATORS[run.integrator];
  const rtol = run.rtol / refinement.tolerance;
  const atol = run.atol / refinement.tolerance;
  const tolerances = { rtol, atol, maxStep: MAX_STEP_S };

  const t0 = run.mode === 'warmup' ? clock.runTimeOfLocal(0, run.firingStartClockS ?? 0) : 0;
  const resume = options.resume;
  const firstDay = resume?.day ?? 0;
  const totalDays = resume ? resume.days : run.length.kind === 'days' ? run.length.days : run.length.maxDays;
  const notes: string[] = [];

  // ---- initial state ----
  const initialStarted = performance.now();
  let y = resume ? movedState(resume.state, model) : initialState(model, t0, notes);
  const initialStateMs = performance.now() - initialStarted;

  // ---- reporting: every instant to the sinks; the series keeps the days the figures need ----
  const rec = new Recorder(model);
  const sinks = options.sinks ?? [];
  for (const sink of sinks) sink.start?.(rec.layout);
  const diag = makeSegmentDiagnostics(geometry.segments, system.sectors);
  const keepDay = retentionRule(run, firstDay, totalDays, geometry.segments, mesh.nodeCount * system.sectors, options.retainAll === true, options.warmupSeriesBudgetBytes ?? WARMUP_SERIES_BUDGET_BYTES);
  let firstKeptDay = Number.POSITIVE_INFINITY;
  let lastKeptDay = -1;
  const record = (t: number, state: Float64Array, dayNumber: number, dayEnd: boolean) => {
    system.boundaries(t, state, diag);
    // a repeated first day is reported on that day's clock
    const tShown = ctx.repeatFirstDay ? t - dayNumber * SECONDS_PER_DAY : t;
    const view = rec.observe(tShown, dayNumber, dayEnd, state, diag, system.driversAt(t));
    for (const sink of sinks) sink.instant(view);
    if (keepDay(view)) {
      rec.keep(view, ctx.repeatFirstDay ? 0 : clock.dayIndex(t - t0));
      firstKeptDay = Math.min(firstKeptDay, dayEnd ? dayNumber + 1 : dayNumber);
      lastKeptDay = Math.max(lastKeptDay, dayNumber);
    }
  };

  const auxRun = new Float64Array(AUX_SIZE);
  let auxDayStart = new Float64Array(AUX_SIZE);
  const yRunStart = y.slice();
  let yDayStart = y.slice();
  let lastDayNumber = firstDay;
  const stats = emptyStats();
  // a run continuing from an earlier run's state starts with that run's last step (it then goes on as that run would have)
  let lastStep: number | undefined = !resume && typeof run.initial === 'object' && run.initial.kind === 'state' ? run.initial.state.lastStepS : undefined;
  let periodic: RunResult['periodic'] = null;
  const changeByDay: number[] = [];
  const energyByDay: EnergyAccount[] = [];
  let previousDay: { t: number[]; states: Float64Array[] } | null = null;
  let daysDone = 0;
  // a fixed number of days reports every day as it is computed; a periodic study reports only its
  // settled day, recorded (with the boundary diagnostics) once it is known
  const reportAsComputed = run.length.kind === 'days';

  if (reportAsComputed) record(t0 + firstDay * SECONDS_PER_DAY, y, firstDay, false);
  for (let d = firstDay; d < firstDay + totalDays; d++) {
    const { stops, outputs } = dayPlan(model, t0, d);
    const dayStart = t0 + d * SECONDS_PER_DAY;
    const dayEnd = dayStart + SECONDS_PER_DAY;
    yDayStart = y.slice();
    auxDayStart = auxRun.slice();
    lastDayNumber = d;
    const day = { t: [dayStart], states: [y.slice()] };
    let result;
    try {
      result = integrate(
        system,
        y,
        dayStart,
        stops,
        { ...tolerances, initialStep: lastStep },
        (t) => options.onProgress?.((d - firstDay + (t - dayStart) / SECONDS_PER_DAY) / totalDays),
        {
          instants: outputs,
          onOutput: (t, state) => {
            if (reportAsComputed) record(t, state, d, Math.abs(t - dayEnd) <= 1e-6);
            else {
              day.t.push(t);
              day.states.push(state.slice());
            }
          },
        },
      );
    } catch (e) {
      if (e instanceof IntegrationError) {
        throw new SimulationError(`the ${run.integrator} integrator failed on day ${d + 1} at ${clock.isoLocal(e.t)}: ${e.message}`);
      }
      throw e;
    }
    y = result.y.slice();
    lastStep = result.lastStep;
    for (let i = 0; i < AUX_SIZE; i++) auxRun[i] += result.auxIntegral[i]!;
    energyByDay.push(energyAccount(mesh, geometry, result.auxIntegral, yDayStart, y, SECONDS_PER_DAY));
    addStats(stats, result.stats);
    daysDone = d - firstDay + 1;
    if (!reportAsComputed) {
      const change = previousDay ? largestDailyChange(day.states, previousDay.states) : Number.POSITIVE_INFINITY;
      if (previousDay) changeByDay.push(change);
      previousDay = day;
      if (!resume && run.length.kind === 'until-periodic' && change < run.length.toleranceK) break;
    }
  }
  if (!reportAsComputed && previousDay) {
    const settled = previousDay;
    settled.t.forEach((t, k) => record(t, settled.states[k]!, lastDayNumber, k === settled.t.length - 1));
  }
  for (const sink of sinks) sink.finish?.();
  if (run.length.kind === 'until-periodic' && !resume) {
    const last = changeByDay.length ? changeByDay[changeByDay.length - 1]! : Number.POSITIVE_INFINITY;
    periodic = {
      reached: last < run.length.toleranceK,
      lastChangeK: Number.isFinite(last) ? last : -1,
      toleranceK: run.length.toleranceK,
      changeByDayK: changeByDay,
    };
  }

  const dayAux = auxRun.map((v, i) => v - auxDayStart[i]!);
  const energyRun = energyAccount(mesh, geometry, auxRun, yRunStart, y, daysDone * SECONDS_PER_DAY);
  const energyDay = energyAccount(mesh, geometry, dayAux, yDayStart, y, SECONDS_PER_DAY);

  const series = rec.finish();
  const keptDays = lastKeptDay >= firstKeptDay ? lastKeptDay - firstKeptDay + 1 : 0;
  const dayStartT = t0 + lastDayNumber * SECONDS_PER_DAY;
  const shown = (t: number) => clock.isoLocal(ctx.repeatFirstDay ? t - lastDayNumber * SECONDS_PER_DAY : t);
  const stateAt = (state: Float64Array, t: number, step?: number) => wallStateOf(mesh, inputs.layers, geometry.segments, system.sectors, state, shown(t), step);
  const capped = mesh.cappedLayers.map(
    (j) => `layer ${inputs.layers[j]!.label} needs more than its ${mesh.layerCells[j]} automatic cells (the most a layer gets) to resolve ${model.forcing.flueSide.setBy}; give it a cell count, or expect a larger error there`,
  );
  return {
    series,
    retained: { firstDay: Number.isFinite(firstKeptDay) ? firstKeptDay : 0, days: keptDays, truncated: run.mode === 'warmup' && keptDays < daysDone },
    energy: { run: energyRun, lastDay: energyDay, byDay: energyByDay },
    daysSimulated: daysDone,
    periodic,
    firingStartT: run.mode === 'warmup' ? t0 : null,
    integrator: { name: run.integrator, ...stats, computeMs: performance.now() - started, initialStateMs },
    solve: {
      meshRefinement: refinement.mesh,
      rtol,
      atol,
      layerCells: mesh.layerCells,
      cappedLayers: mesh.cappedLayers,
      forcing: model.forcing,
      firstDay,
      resumed: resume !== undefined,
    },
    finalState: stateAt(y, dayStartT + SECONDS_PER_DAY, lastStep),
    reportedDayStart: { day: lastDayNumber, state: stateAt(yDayStart, dayStartT) },
    warnings: [...geometryWarnings(inputs, geometry.outerDiameter), ...capped, ...rec.ranges.warnings((p) => `${p.heightM.toFixed(1)} m, ${clock.isoLocal(p.t)}`)],
    assumptions: [...notes, ...rec.ranges.assumptions()],
  };
}

/**
 * Which observed instants the series keeps: all of them (`retainAll`, or a periodic study, which
 * reports only its settled day); the last day of a fixed number of days of cycling, with the instant
 * that opens it; a warm-up study's first days, as many as its budget holds (at least one).
 */
function retentionRule(run: ModelInputs['run'], firstDay: number, totalDays: number, segments: number, nodes: number, retainAll: boolean, warmupBudgetBytes: number): (view: InstantView) => boolean {
  if (retainAll || run.length.kind === 'until-periodic') return () => true;
  if (run.mode === 'warmup') {
    const instantsPerDay = Math.ceil(SECONDS_PER_DAY / run.outputInterval) + 8; // + schedule corners
    const budgetDays = Math.max(1, Math.floor(warmupBudgetBytes / (instantsPerDay * bytesPerInstant(segments, nodes))));
    return (v) => v.runDay < firstDay + budgetDays;
  }
  const lastDay = firstDay + totalDays - 1;
  return (v) => v.runDay >= lastDay || (v.dayEnd && v.runDay === lastDay - 1);
}

/** A given state on this model's mesh (interpolated where the cells differ); SimulationError for a different wall. */
function movedState(state: WallState, model: AssembledModel): Float64Array {
  try {
    return stateOnMesh(state, model.mesh, model.inputs.layers, model.geometry.segments, model.system.sectors);
  } catch (e) {
    if (e instanceof RangeError) throw new SimulationError(e.message);
    throw e;
  }
}

/**
 * Initial wall state: uniform at air temperature (cold) or at a given temperature, a state from an
 * earlier run (interpolated onto this mesh where its cells differ, with a note), or steady at the
 * start or daily-mean conditions.
 */
function initialState(model: AssembledModel, t0: number, notes: string[]): Float64Array {
  const { system, inputs } = model;
  const initial = inputs.run.initial;
  const d = system.driversAt(t0);
  const y = new Float64Array(system.size).fill(d.airTemperatureK);
  if (initial === 'cold') return y;
  if (typeof initial === 'object') {
    if (initial.kind === 'uniform') return y.fill(initial.temperatureK);
    if (!sameNodes(initial.state, model.mesh))
      notes.push(
        `The initial wall is the state of ${initial.state.timeLocal} from ${initial.fileName}, moved from its ${initial.state.nodeRadius.length} nodes to this run's ${model.mesh.nodeCount} by interpolation in ln r within each layer (the same wall; the cells differ).`,
      );
    return movedState(initial.state, model);
  }
  y.fill(0.5 * (d.airTemperatureK + d.inletTemperatureK));
  const instants = initial === 'steady-at-start' ? [t0] : Array.from({ length: 24 }, (_, k) => t0 + (k + 0.5) * 3600);
  try {
    return steadyState(averagedOverInstants(system, instants), y);
  } catch (e) {
    if (e instanceof IntegrationError) throw new SimulationError(`could not find the initial steady state: ${e.message}`);
    throw e;
  }
}
