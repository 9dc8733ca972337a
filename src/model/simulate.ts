/**
 * Run the wall model: validated inputs → mesh → integrator → time series and energy account.
 * Nothing here reads files or knows the scenario format.
 */
import type { ModelInputs } from './inputs.ts';
import type { TimeSeries, RunResult, EnergyAccount } from './timeseries.ts';
import { makeSiteClock } from './clock.ts';
import { buildWallMesh, nodeEnthalpyChange, type WallMesh } from '../physics/wall/mesh.ts';
import { StackWallSystem, makeSegmentDiagnostics, AUX_SIZE, AUX_GAS_TO_WALL, AUX_CONVECTION, AUX_RADIATION, AUX_SUN, type StackGeometry } from './system.ts';
import type { DriverContext } from './drivers.ts';
import { INTEGRATORS } from '../solver/index.ts';
import { steadyState, averagedOverInstants } from './steady.ts';
import { IntegrationError } from '../solver/types.ts';
import { makeDesignDay } from '../input/weather/designDay.ts';
import { parseWeatherCsv } from '../input/weather/csvFile.ts';
import { windAtHeight } from '../physics/outside/wind.ts';
import type { WeatherSource } from '../physics/outside/weather.ts';
import { makeFiringSchedule, type FiringScheduleSpec } from './firing.ts';
import { makeGasPropertyTable, airAsFlueGas } from '../physics/properties/flueGas.ts';
import { flueGasDewPoints } from '../physics/flue/dewPoint.ts';
import { stackDraftPa } from '../physics/flue/draft.ts';
import { airDensityIdealGas, airPressureAtElevation } from '../physics/properties/air.ts';
import { SECONDS_PER_DAY } from '../physics/constants.ts';
import { checkValidity, type CorrelationName } from '../physics/correlations/registry.ts';

export interface SimulateOptions {
  /** Called now and then with the fraction of the run done (0–1). */
  readonly onProgress?: (fraction: number) => void;
}

/** Thrown for a run that cannot proceed (solver failure, inconsistent inputs found at run time). */
export class SimulationError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'SimulationError';
  }
}

interface Prepared {
  readonly inputs: ModelInputs;
  readonly mesh: WallMesh;
  readonly geometry: StackGeometry;
  readonly system: StackWallSystem;
  readonly ctx: DriverContext;
}

/** Build the mesh, the drivers and the ODE system for the inputs. */
export function prepareModel(inputs: ModelInputs): Prepared {
  const clock = makeSiteClock(inputs.site.timeZone, inputs.site.startDate);
  const mesh = buildWallMesh(inputs.layers, inputs.stack.innerDiameter / 2);
  const segments = inputs.stack.segments;
  const dz = inputs.stack.height / segments;
  const weather = makeWeather(inputs, clock);
  const midHeight = new Float64Array(segments);
  const windFactor = new Float64Array(segments);
  for (let s = 0; s < segments; s++) {
    midHeight[s] = (s + 0.5) * dz;
    windFactor[s] = windAtHeight(1, weather.referenceHeightM, midHeight[s]!, inputs.site.windExponent);
  }
  const geometry: StackGeometry = {
    segments,
    segmentLength: dz,
    midHeight,
    windFactor,
    innerDiameter: inputs.stack.innerDiameter,
    outerDiameter: 2 * mesh.outerRadius,
  };
  const schedule = makeFiringSchedule({ ...inputs.flue.schedule, minimumMassFlow: inputs.flue.offMassFlow } as FiringScheduleSpec);
  const composition = inputs.flue.properties === 'air' ? airAsFlueGas : inputs.flue.composition;
  const gas = makeGasPropertyTable(composition, inputs.flue.pressurePa);
  const ctx: DriverContext = {
    inputs,
    clock,
    weather,
    schedule,
    outerDiameter: geometry.outerDiameter,
    repeatFirstDay: inputs.run.length.kind === 'until-periodic',
  };
  const system = new StackWallSystem(inputs, mesh, geometry, ctx, gas);
  return { inputs, mesh, geometry, system, ctx };
}

function makeWeather(inputs: ModelInputs, clock: ReturnType<typeof makeSiteClock>): WeatherSource {
  const w = inputs.weather;
  if (w.kind === 'source') return w.source;
  if (w.kind === 'file') return parseWeatherCsv(w.text, clock, w.fileName, { referenceHeightM: w.referenceHeightM });
  return makeDesignDay(
    {
      minAirTemperatureK: w.minAirTemperatureK,
      maxAirTemperatureK: w.maxAirTemperatureK,
      windSpeed: w.windSpeed,
      windAmplitude: w.windDailyAmplitude * w.windSpeed,
      referenceHeightM: w.referenceHeightM,
      cloudCover: w.cloudCover,
      dewPointK: w.dewPointK,
    },
    clock,
    { latitudeDeg: inputs.site.latitudeDeg, longitudeDeg: inputs.site.longitudeDeg },
  );
}

/** Run the whole simulation. Throws SimulationError on solver failure. */
export function simulate(inputs: ModelInputs, options: SimulateOptions = {}): RunResult {
  const started = performance.now();
  const prep = prepareModel(inputs);
  const { system, geometry, ctx } = prep;
  const { clock } = ctx;
  const run = inputs.run;
  const S = geometry.segments;
  const integrate = INTEGRATORS[run.integrator];
  const tolerances = { rtol: run.rtol, atol: run.atol, maxStep: Math.min(run.outputInterval, 3600) };

  const t0 = run.mode === 'warmup' ? clock.runTimeOfLocal(0, run.firingStartClockS ?? 0) : 0;
  const totalDays = run.length.kind === 'days' ? run.length.days : run.length.maxDays;

  // ---- initial state ----
  const initialStarted = performance.now();
  let y = initialState(prep, t0);
  const initialStateMs = performance.now() - initialStarted;

  // ---- stops ----
  const dayStops = (d: number): { stops: number[]; isOutput: Set<number> } => {
    const start = t0 + d * SECONDS_PER_DAY;
    const end = start + SECONDS_PER_DAY;
    const out: number[] = [];
    for (let k = 1; start + k * run.outputInterval <= end + 1e-6; k++) out.push(Math.min(end, start + k * run.outputInterval));
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
  };

  // ---- recording ----
  const rec = new Recorder(prep);
  const diag = makeSegmentDiagnostics(S);
  const record = (t: number, state: Float64Array, dayNumber: number) => {
    system.boundaries(t, state, diag);
    // a repeated first day is reported on that day's clock
    const tShown = ctx.repeatFirstDay ? t - dayNumber * SECONDS_PER_DAY : t;
    rec.push(tShown, clock.isoLocal(tShown), ctx.repeatFirstDay ? 0 : clock.dayIndex(t - t0), state, diag, system.driversAt(t));
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
    const { stops, isOutput } = dayStops(d);
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
        let change = 0;
        for (let k = 0; k < dayStates.length && k < previousDay.length; k++) {
          const a = dayStates[k]!;
          const b = previousDay[k]!;
          for (let i = 0; i < a.length; i++) change = Math.max(change, Math.abs(a[i]! - b[i]!));
        }
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
  const energyRun = energyAccount(prep, auxRun, yRunStart, y, daysDone * SECONDS_PER_DAY);
  const energyDay = energyAccount(prep, dayAux, yDayStart, y, SECONDS_PER_DAY);

  const series = rec.finish();
  return {
    series,
    energy: { run: energyRun, lastDay: energyDay },
    daysSimulated: daysDone,
    periodic,
    firingStartT: run.mode === 'warmup' ? t0 : null,
    integrator: { name: run.integrator, ...stats, computeMs: performance.now() - started, initialStateMs },
    warnings: rec.validityWarnings(),
  };
}

function energyAccount(prep: Prepared, aux: Float64Array, yStart: Float64Array, yEnd: Float64Array, periodS: number): EnergyAccount {
  const { mesh, geometry } = prep;
  const n = mesh.nodeCount;
  let stored = 0;
  for (let s = 0; s < geometry.segments; s++)
    for (let i = 0; i < n; i++) stored += nodeEnthalpyChange(mesh, i, yStart[s * n + i]!, yEnd[s * n + i]!) * geometry.segmentLength;
  const gas = aux[AUX_GAS_TO_WALL]!;
  const conv = aux[AUX_CONVECTION]!;
  const rad = aux[AUX_RADIATION]!;
  const sun = aux[AUX_SUN]!;
  const residual = gas + sun - stored - conv - rad;
  const scale = Math.max(Math.abs(gas), Math.abs(sun), Math.abs(conv) + Math.abs(rad), Math.abs(stored), 1e-30);
  return { gasToWallJ: gas, convectionJ: conv, radiationJ: rad, sunJ: sun, storedJ: stored, residualPercent: (100 * residual) / scale, periodS };
}

/** Initial wall state: uniform at air temperature (cold), or steady at the start or daily-mean conditions. */
function initialState(prep: Prepared, t0: number): Float64Array {
  const { system, inputs } = prep;
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

/** Collects output instants into growable arrays, then packs them into a TimeSeries. */
class Recorder {
  private t: number[] = [];
  private iso: string[] = [];
  private day: number[] = [];
  private temps: Float64Array[] = [];
  private seg: Record<string, Float64Array[]> = {};
  private inst: Record<string, number[]> = {};
  private readonly waterDew: number;
  private readonly acidDew: number | null;
  /** Per correlation: output points checked, points outside the published range, and the first warning. */
  private readonly validity = new Map<CorrelationName, { checked: number; outside: number; example: string }>();

  constructor(private readonly prep: Prepared) {
    const inputs = prep.inputs;
    const dew = flueGasDewPoints(inputs.flue.composition, inputs.flue.pressurePa);
    this.waterDew = dew.waterDewPointK;
    this.acidDew = dew.acidDewPointK;
    this.reset();
  }

  reset() {
    this.t = [];
    this.iso = [];
    this.day = [];
    this.temps = [];
    this.seg = {};
    this.inst = {};
  }

  push(t: number, iso: string, day: number, y: Float64Array, diag: ReturnType<typeof makeSegmentDiagnostics>, d: ReturnType<StackWallSystem['driversAt']>) {
    const { mesh, geometry, inputs, system } = this.prep;
    const n = mesh.nodeCount;
    const S = geometry.segments;
    this.t.push(t);
    this.iso.push(iso);
    this.day.push(day);
    this.temps.push(y.slice());
    const add = (name: string, arr: Float64Array) => (this.seg[name] ??= []).push(arr.slice());
    for (const [k, v] of Object.entries(diag)) add(k, v as Float64Array);
    const water = new Float64Array(S);
    const acid = new Float64Array(S);
    let gasSum = 0;
    for (let s = 0; s < S; s++) {
      water[s] = y[s * n]! - this.waterDew;
      acid[s] = this.acidDew === null ? Number.NaN : y[s * n]! - this.acidDew;
      gasSum += 0.5 * (diag.gasInK[s]! + diag.gasOutK[s]!);
    }
    this.checkRanges(diag, S);
    add('waterDewMarginK', water);
    add('acidDewMarginK', acid);
    const put = (name: string, v: number) => (this.inst[name] ??= []).push(v);
    put('airTemperatureK', d.airTemperatureK);
    put('windSpeedRef', d.windSpeedRef);
    put('skyTemperatureK', d.skyTemperatureK);
    put('sunAltitudeDeg', d.sunAltitudeDeg);
    put('sunAzimuthDeg', d.sunAzimuthDeg);
    put('beamNormal', d.beamNormal);
    put('diffuseHorizontal', d.diffuseHorizontal);
    put('inletTemperatureK', d.inletTemperatureK);
    put('massFlow', d.massFlow);
    put('firing', d.firing ? 1 : 0);
    put('gasExitK', diag.gasOutK[S - 1]!);
    const gasMean = gasSum / S;
    const gasDensity = system.gas(gasMean).density;
    const airDensity = airDensityIdealGas(d.airTemperatureK, airPressureAtElevation(inputs.site.elevationM));
    put('draftPa', stackDraftPa(inputs.stack.height, airDensity, gasDensity));
  }

  private note(name: CorrelationName, warning: string | null) {
    const v = this.validity.get(name) ?? { checked: 0, outside: 0, example: '' };
    v.checked++;
    if (warning) {
      v.outside++;
      if (!v.example) v.example = warning;
    }
    this.validity.set(name, v);
  }

  /** Check the correlations' inputs at this output instant against their published ranges. */
  private checkRanges(diag: ReturnType<typeof makeSegmentDiagnostics>, S: number) {
    const { inputs } = this.prep;
    for (let s = 0; s < S; s++) {
      if (inputs.outside.filmCoefficient === undefined) {
        const pr = diag.prandtlOutside[s]!;
        const re = diag.reynoldsOutside[s]!;
        const ra = diag.rayleighOutside[s]!;
        if (re > 0) this.note('nuCylinderChurchillBernstein', checkValidity('nuCylinderChurchillBernstein', { re, pr }));
        if (ra > 0) this.note('nuVerticalPlateChurchillChu', checkValidity('nuVerticalPlateChurchillChu', { ra, pr }));
      }
      if (inputs.flue.filmCoefficient === undefined)
        this.note('nuPipeBlended', checkValidity('nuPipeBlended', { re: diag.reynoldsInside[s]!, pr: diag.prandtlInside[s]! }));
    }
  }

  /** One warning per correlation used outside its published range, with how often. */
  validityWarnings(): string[] {
    const out: string[] = [];
    for (const [, v] of this.validity) {
      if (v.outside === 0) continue;
      const pct = (100 * v.outside) / v.checked;
      out.push(`correlation outside its published range at ${pct < 1 ? pct.toFixed(2) : pct.toFixed(0)} % of the output points (first: ${v.example})`);
    }
    return out;
  }

  finish(): TimeSeries {
    const { mesh, geometry, inputs } = this.prep;
    const n = mesh.nodeCount;
    const S = geometry.segments;
    const K = this.t.length;
    const temperatureK = new Float64Array(K * S * n);
    this.temps.forEach((a, k) => temperatureK.set(a, k * S * n));
    const flat = (name: string) => {
      const out = new Float64Array(K * S);
      (this.seg[name] ?? []).forEach((a, k) => out.set(a, k * S));
      return out;
    };
    const inst = (name: string) => Float64Array.from(this.inst[name] ?? []);
    return {
      t: Float64Array.from(this.t),
      isoLocal: this.iso,
      day: Int32Array.from(this.day),
      segments: S,
      nodes: n,
      heightM: geometry.midHeight,
      nodeRadius: mesh.radius,
      nodeLabel: mesh.label,
      layers: inputs.layers.map((l, j) => ({
        label: l.label,
        material: l.material.name,
        kind: l.material.kind,
        firstNode: mesh.layerNodes[j]![0],
        lastNode: mesh.layerNodes[j]![1],
        thickness: l.thickness,
      })),
      temperatureK,
      segment: {
        gasInK: flat('gasInK'),
        gasOutK: flat('gasOutK'),
        insideFilm: flat('insideFilm'),
        gasToWallPerMetre: flat('gasToWallPerMetre'),
        windAtHeight: flat('windAtHeight'),
        outsideFilm: flat('outsideFilm'),
        convectionPerMetre: flat('convectionPerMetre'),
        radiationPerMetre: flat('radiationPerMetre'),
        sunPerMetre: flat('sunPerMetre'),
        waterDewMarginK: flat('waterDewMarginK'),
        acidDewMarginK: flat('acidDewMarginK'),
      },
      instant: {
        airTemperatureK: inst('airTemperatureK'),
        windSpeedRef: inst('windSpeedRef'),
        skyTemperatureK: inst('skyTemperatureK'),
        sunAltitudeDeg: inst('sunAltitudeDeg'),
        sunAzimuthDeg: inst('sunAzimuthDeg'),
        beamNormal: inst('beamNormal'),
        diffuseHorizontal: inst('diffuseHorizontal'),
        inletTemperatureK: inst('inletTemperatureK'),
        massFlow: inst('massFlow'),
        firing: Uint8Array.from(this.inst['firing'] ?? []),
        gasExitK: inst('gasExitK'),
        draftPa: inst('draftPa'),
      },
      waterDewPointK: this.waterDew,
      acidDewPointK: this.acidDew,
    };
  }
}
