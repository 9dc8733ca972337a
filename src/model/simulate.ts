/**
 * Run the wall model: validated inputs → assembled model → integrator, day by day → time series,
 * energy account and range checks. Nothing here reads files or knows the scenario format.
 */
import type { ModelInputs } from './inputs.ts';
import type { RunResult } from './timeseries.ts';
import { assembleModel, type AssembledModel } from './assemble.ts';
import { makeSegmentDiagnostics, AUX_SIZE } from './system.ts';
import { INTEGRATORS } from '../solver/index.ts';
import { IntegrationError } from '../solver/types.ts';
import { steadyState, averagedOverInstants } from './steady.ts';
import { SECONDS_PER_DAY } from '../physics/constants.ts';
import { Recorder } from './recorder.ts';
import { energyAccount } from './energy.ts';
import { SimulationError } from './errors.ts';

export { SimulationError } from './errors.ts';

export interface SimulateOptions {
  /** Called now and then with the fraction of the run done (0–1). */
  readonly onProgress?: (fraction: number) => void;
}

/** Build the mesh, the drivers and the ODE system for the inputs (see assemble.ts). */
export const prepareModel = assembleModel;

/**
 * The instants at which the integrator must stop on day `d` (run time from `t0`): every output
 * instant, and every schedule corner (a ramp's ends, a step) inside the day, without repeats.
 */
function dayStops(model: AssembledModel, t0: number, d: number): { stops: number[]; isOutput: Set<number> } {
  const { ctx, clock, inputs } = model;
  const interval = inputs.run.outputInterval;
  const start = t0 + d * SECONDS_PER_DAY;
  const end = start + SECONDS_PER_DAY;
  const out: number[] = [];
  for (let j = 1; start + j * interval <= end + 1e-6; j++) out.push(Math.min(end, start + j * interval));
  if (out.length === 0 || out[out.length - 1]! < end - 1e-6) out.push(end);
  const isOutput = new Set(out);
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
  const all = [...out, ...corners].sort((a, b) => a - b);
  const stops: number[] = [];
  for (const s of all) if (stops.length === 0 || s - stops[stops.length - 1]! > 1e-6) stops.push(s);
  else if (isOutput.has(s)) stops[stops.length - 1] = s;
  return { stops, isOutput };
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

/** Run the whole simulation. Throws SimulationError on solver failure. */
export function simulate(inputs: ModelInputs, options: SimulateOptions = {}): RunResult {
  const started = performance.now();
  const model = assembleModel(inputs);
  const { system, geometry, ctx, clock, mesh } = model;
  const run = inputs.run;
  const integrate = INTEGRATORS[run.integrator];
  const tolerances = { rtol: run.rtol, atol: run.atol, maxStep: Math.min(run.outputInterval, 3600) };

  const t0 = run.mode === 'warmup' ? clock.runTimeOfLocal(0, run.firingStartClockS ?? 0) : 0;
  const totalDays = run.length.kind === 'days' ? run.length.days : run.length.maxDays;

  // ---- initial state ----
  const initialStarted = performance.now();
  let y = initialState(model, t0);
  const initialStateMs = performance.now() - initialStarted;

  // ---- recording ----
  const rec = new Recorder(model);
  const diag = makeSegmentDiagnostics(geometry.segments);
  const record = (t: number, state: Float64Array, dayNumber: number) => {
    system.boundaries(t, state, diag);
    // a repeated first day is reported on that day's clock
    const tShown = ctx.repeatFirstDay ? t - dayNumber * SECONDS_PER_DAY : t;
    rec.push(tShown, ctx.repeatFirstDay ? 0 : clock.dayIndex(t - t0), state, diag, system.driversAt(t));
  };

  const auxRun = new Float64Array(AUX_SIZE);
  let auxDayStart = new Float64Array(AUX_SIZE);
  const yRunStart = y.slice();
  let yDayStart = y.slice();
  const stats = { steps: 0, rejected: 0, rhsEvaluations: 0 };
  let lastStep: number | undefined;
  let periodic: RunResult['periodic'] = null;
  const changeByDay: number[] = [];
  let previousDay: Float64Array[] | null = null;
  let daysDone = 0;
  const keepAllDays = run.length.kind === 'days';

  record(t0, y, 0);
  for (let d = 0; d < totalDays; d++) {
    const { stops, isOutput } = dayStops(model, t0, d);
    const dayStart = t0 + d * SECONDS_PER_DAY;
    yDayStart = y.slice();
    auxDayStart = auxRun.slice();
    if (!keepAllDays) {
      rec.reset();
      record(dayStart, y, d);
    }
    const dayStates: Float64Array[] = [y.slice()];
    let result;
    try {
      result = integrate(system, y, dayStart, stops, { ...tolerances, initialStep: lastStep }, (t, state) => {
        if (isOutput.has(t)) {
          record(t, state, d);
          if (!keepAllDays) dayStates.push(state.slice());
        }
        if (options.onProgress) options.onProgress((d + (t - dayStart) / SECONDS_PER_DAY) / totalDays);
      });
    } catch (e) {
      if (e instanceof IntegrationError) {
        throw new SimulationError(`the ${run.integrator} integrator failed on day ${d + 1} at ${clock.isoLocal(e.t)}: ${e.message}`);
      }
      throw e;
    }
    y = result.y.slice();
    lastStep = result.lastStep;
    for (let i = 0; i < AUX_SIZE; i++) auxRun[i] += result.auxIntegral[i]!;
    stats.steps += result.stats.steps;
    stats.rejected += result.stats.rejected;
    stats.rhsEvaluations += result.stats.rhsEvaluations;
    daysDone = d + 1;
    if (run.length.kind === 'until-periodic') {
      if (previousDay) {
        const change = largestDailyChange(dayStates, previousDay);
        changeByDay.push(change);
        if (change < run.length.toleranceK) break;
      }
      previousDay = dayStates;
    }
  }
  if (run.length.kind === 'until-periodic') {
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
  return {
    series,
    energy: { run: energyRun, lastDay: energyDay },
    daysSimulated: daysDone,
    periodic,
    firingStartT: run.mode === 'warmup' ? t0 : null,
    integrator: { name: run.integrator, ...stats, computeMs: performance.now() - started, initialStateMs },
    warnings: rec.ranges.warnings(),
  };
}

/** Initial wall state: uniform at air temperature (cold), or steady at the start or daily-mean conditions. */
function initialState(model: AssembledModel, t0: number): Float64Array {
  const { system, inputs } = model;
  const d = system.driversAt(t0);
  const y = new Float64Array(system.size).fill(d.airTemperatureK);
  if (inputs.run.initial === 'cold') return y;
  y.fill(0.5 * (d.airTemperatureK + d.inletTemperatureK));
  const instants = inputs.run.initial === 'steady-at-start' ? [t0] : Array.from({ length: 24 }, (_, k) => t0 + (k + 0.5) * 3600);
  try {
    return steadyState(averagedOverInstants(system, instants), y);
  } catch (e) {
    if (e instanceof IntegrationError) throw new SimulationError(`could not find the initial steady state: ${e.message}`);
    throw e;
  }
}
