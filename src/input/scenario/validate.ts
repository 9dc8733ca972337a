/**
 * The one validation path: a scenario object (from a file, from a library caller, or either with
 * command-line overrides applied) → the model's inputs (SI, kelvin), with every problem collected
 * and reported together, one line each, as a ScenarioError. The zod schema checks each value and
 * converts units; the cross-field rules below check what no single value can; the weather is read
 * and checked here, once.
 */
import { resolve } from 'node:path';
import { scenarioSchema, type Scenario, type ScenarioMaterial } from './schema.ts';
import { ScenarioError, formatIssues, formatPath, printable, type WrittenLookup } from './errors.ts';
import { LIMITS, grouped, sizeProblems } from './limits.ts';
import { flowPlausibility, type ScheduledFlow } from './flow.ts';
import { readTextFile } from '../text.ts';
import type { ModelInputs, LayerInput, WeatherInput, FiringPointInput, GasCompositionInput, FlueSchedule, AnnualInput, SeriesFileInput } from '../../model/inputs.ts';
import type { InitialWall } from '../../model/inputs.ts';
import { wallStateMismatch } from '../../model/wallState.ts';
import { readStateFile, StateFileError } from '../state.ts';
import type { Material, PropertyTable } from '../../physics/materials/types.ts';
import { findMaterial } from '../../physics/materials/index.ts';
import { validateTable } from '../../physics/properties/table.ts';
import { airPressureAtElevation } from '../../physics/properties/air.ts';
import { KELVIN_OFFSET, SECONDS_PER_DAY, MOLAR_MASS_AIR } from '../../physics/constants.ts';
import { makeSiteClock, CALENDAR_DATE_WORDING, type SiteClock } from '../../model/clock.ts';
import { assembleModel } from '../../model/assemble.ts';
import { estimateExplicitSteps } from '../../model/stiffness.ts';
import { TERRAIN_EXPONENTS } from '../../physics/outside/wind.ts';
import { WeatherFileError } from '../weather/csvFile.ts';
import { checkWeatherFileSite, readWeatherFile, typicalYearNotes } from '../weather/weatherFile.ts';
import { greatCircleDistanceKm } from '../weather/typicalYear.ts';
import { makeDesignDay } from '../weather/designDay.ts';
import { fuelByName, validateUltimateAnalysis } from '../../physics/flue/fuels.ts';
import { flueGasFromFuel, flueGasFromVolumeFractions, molarMass } from '../../physics/flue/combustion.ts';
import { validateFiringSchedule, massFlowFromNormalVolumeFlow } from '../../model/firing.ts';
import { addDays, validatePlantCalendar, type PlantCalendarSpec, type WeekPattern } from '../../model/calendar.ts';

export interface LoadedScenario {
  /** The validated scenario, as written (SI values). */
  readonly scenario: Scenario;
  /** What the model runs. */
  readonly inputs: ModelInputs;
  /** Absolute path of the file, when read from a file. */
  readonly path?: string;
  /** What validation found odd but not wrong (e.g. a gas velocity above usual practice), one line each. */
  readonly warnings: readonly string[];
}

/**
 * A value set in the scenario before validation, e.g. `--days 5` → `{ path: ['run', 'days'],
 * value: 5, option: '--days' }`. Messages about that key name the option as well as the path.
 * An undefined value removes the key.
 */
export interface ScenarioOverride {
  readonly path: readonly (string | number)[];
  readonly value: unknown;
  /** The command-line option that set it, for messages. */
  readonly option?: string;
  /**
   * Where the value was written, when not at the top of the scenario: a variant's
   * `['variants', 'thick-wool']`. Messages about the key, or anything under it, carry this prefix:
   * `variants.thick-wool.stack.layers[1].thickness: found …`.
   */
  readonly prefix?: readonly (string | number)[];
}

export interface ValidateOptions {
  /** Folder that relative paths in the scenario (the weather file) are relative to; default the working folder. */
  readonly baseDir?: string;
  /** The scenario file, for messages. */
  readonly file?: string;
  readonly overrides?: readonly ScenarioOverride[];
  /** The text each value was written as in the file (YAML), so that messages show values as written. */
  readonly written?: WrittenLookup;
}

/** A deep copy of `raw` with every override set (missing sections are created; an undefined value removes the key). */
export function withOverrides(raw: unknown, overrides: readonly ScenarioOverride[]): unknown {
  if (overrides.length === 0) return raw;
  const copy: unknown = raw !== null && typeof raw === 'object' ? structuredClone(raw) : raw;
  if (copy === null || typeof copy !== 'object') return copy;
  for (const o of overrides) {
    let node = copy as Record<string | number, unknown>;
    o.path.forEach((key, i) => {
      if (i === o.path.length - 1) {
        if (o.value === undefined) delete node[key];
        else node[key] = o.value;
      } else {
        const next = node[key];
        if (next === null || typeof next !== 'object') node[key] = {};
        node = node[key] as Record<string | number, unknown>;
      }
    });
  }
  return copy;
}

/**
 * Problem lines about an overridden key name the option too (`--days (run.days): found …`), and
 * lines about a key written under a prefix, or anything below it, carry the prefix
 * (`variants.thick-wool.stack.layers[1].thickness: found …`). The most specific override wins.
 */
function nameOverrides(problems: readonly string[], overrides: readonly ScenarioOverride[]): string[] {
  const named = overrides.filter((o) => o.option || o.prefix).sort((a, b) => b.path.length - a.path.length);
  return problems.map((line) => {
    for (const o of named) {
      const key = formatPath(o.path);
      if (!line.startsWith(key)) continue;
      const next = line.charAt(key.length);
      const shown = o.prefix ? formatPath([...o.prefix, ...o.path]) : key;
      if (o.option && next === ':') return `${o.option} (${shown})${line.slice(key.length)}`;
      if (o.prefix && (next === ':' || next === '.' || next === '[')) return `${shown}${line.slice(key.length)}`;
    }
    return line;
  });
}

/**
 * Validate a scenario object (as parsed from YAML or JSON, or built by a library caller) with the
 * overrides applied, and convert it to model inputs. Throws ScenarioError with every problem.
 */
export function validateModelInputs(raw: unknown, options: ValidateOptions = {}): LoadedScenario {
  const overrides = options.overrides ?? [];
  const value = withOverrides(raw, overrides);
  // an overridden value was not written in the file: show it as given
  const written = options.written;
  const writtenInFile: WrittenLookup | undefined = written && ((path) => (overrides.some((o) => o.path.every((k, i) => path[i] === k)) ? undefined : written(path)));
  const parsed = scenarioSchema.safeParse(value);
  if (!parsed.success) throw new ScenarioError(nameOverrides(formatIssues(parsed.error.issues, value, [], { written: writtenInFile }), overrides), options.file);
  const problems: string[] = [];
  const inputs = toModelInputs(parsed.data, options.baseDir ?? process.cwd(), problems);
  if (problems.length > 0 || !inputs) throw new ScenarioError(nameOverrides(problems, overrides), options.file);
  const warnings: string[] = [];
  problems.push(...runPlausibility(parsed.data, inputs, warnings));
  if (problems.length > 0) throw new ScenarioError(nameOverrides(problems, overrides), options.file);
  return { scenario: parsed.data, inputs, path: options.file ? resolve(options.file) : undefined, warnings };
}

/**
 * What no single value shows but the whole does: the size of the model (limits.ts), whether the
 * flue can carry the flow (flow.ts), and what the explicit reference integrator would cost.
 * Problems are returned; warnings are added to `warnings`.
 */
function runPlausibility(s: Scenario, inputs: ModelInputs, warnings: string[]): string[] {
  const size = sizeProblems(inputs);
  if (size.length > 0) return size;
  const flow = flowPlausibility(inputs, scheduledFlows(s, inputs));
  warnings.push(...flow.warnings);
  if (flow.problems.length > 0) return flow.problems;
  if (inputs.run.integrator === 'rk45') return explicitCostProblems(inputs);
  return [];
}

/** Every scheduled flow with the key it was written under, and the flow floor at the hottest point (a calendar's day-schedules at its largest season flow scale). */
function scheduledFlows(s: Scenario, inputs: ModelInputs): ScheduledFlow[] {
  const schedule = inputs.flue.schedule;
  const written: (readonly [string, readonly { mass_flow?: unknown }[]])[] = [];
  let modelDays: readonly (readonly FiringPointInput[])[];
  let scale = 1;
  if ('calendar' in schedule) {
    const days = s.flue.calendar?.days ?? {};
    for (const name of Object.keys(days)) written.push([`calendar.days.${name}`, days[name]!]);
    modelDays = Object.keys(days).map((name) => schedule.calendar.days[name] ?? []);
    for (const season of schedule.calendar.seasons ?? []) scale = Math.max(scale, season.flowScale ?? 1);
  } else {
    const sched = s.flue.schedule!;
    if (sched.daily) written.push(['schedule.daily', sched.daily]);
    else (sched.per_day ?? []).forEach((d, i) => written.push([`schedule.per_day[${i}]`, d]));
    modelDays = 'daily' in schedule ? [schedule.daily] : schedule.perDay;
  }
  const flows: ScheduledFlow[] = [];
  let hottest = 0;
  written.forEach(([where, points], d) =>
    points.forEach((p, i) => {
      const point = modelDays[d]?.[i];
      if (point === undefined) return;
      hottest = Math.max(hottest, point.inletTemperatureK);
      flows.push({ path: `flue.${where}[${i}].${p.mass_flow !== undefined ? 'mass_flow' : 'volume_flow'}${scale !== 1 ? ` (at the season flow scale ${scale})` : ''}`, massFlow: point.massFlow * scale, inletTemperatureK: point.inletTemperatureK });
    }),
  );
  if (inputs.flue.offMassFlow !== undefined) flows.push({ path: 'flue.off_mass_flow', massFlow: inputs.flue.offMassFlow, inletTemperatureK: hottest });
  return flows;
}

/** The explicit RK45 reference is refused up front when its stability-limited steps pass LIMITS.rk45Steps. */
function explicitCostProblems(inputs: ModelInputs): string[] {
  const model = assembleModel(inputs);
  const days = inputs.run.length.kind === 'days' ? inputs.run.length.days : inputs.run.length.maxDays;
  const t0 = inputs.run.mode === 'warmup' ? model.clock.runTimeOfLocal(0, inputs.run.firingStartClockS ?? 0) : 0;
  const e = estimateExplicitSteps(model, t0, days * SECONDS_PER_DAY);
  if (e.steps <= LIMITS.rk45Steps) return [];
  const height = ((e.segment + 0.5) * inputs.stack.height) / inputs.stack.segments;
  return [
    `run.integrator: found "rk45" for ${days} day${days === 1 ? '' : 's'}${inputs.run.length.kind === 'until-periodic' ? ' (run.max_days)' : ''}: the explicit reference would need about ${grouped(e.steps)} steps, its step being held to ${e.stableStepS.toPrecision(2)} s by stability at ${e.node} (${height.toFixed(1)} m); expected at most ${grouped(LIMITS.rk45Steps)} steps (a limit of stackday): use the implicit integrator (the default), fewer days, or thicker cells`,
  ];
}

/** Validate a scenario object and convert it to model inputs (`validateModelInputs` without overrides). */
export function validateScenario(raw: unknown, options: { baseDir?: string; file?: string } = {}): LoadedScenario {
  return validateModelInputs(raw, options);
}

const c = (k: number) => `${(k - KELVIN_OFFSET).toFixed(1)} °C`;

function toModelInputs(s: Scenario, baseDir: string, problems: string[]): ModelInputs | null {
  // ---- site and clock (the schema has checked the time zone) ----
  let clock: ReturnType<typeof makeSiteClock> | null = null;
  try {
    clock = makeSiteClock(s.site.time_zone, s.site.first_day);
  } catch {
    problems.push(`site.first_day: found "${s.site.first_day}"; expected ${CALENDAR_DATE_WORDING}`);
  }
  const windExponent = typeof s.site.terrain === 'number' ? s.site.terrain : TERRAIN_EXPONENTS[s.site.terrain];

  // ---- layers ----
  const layers: LayerInput[] = [];
  s.stack.layers.forEach((l, j) => {
    // a library name has been checked by the schema
    const material = typeof l.material === 'string' ? findMaterial(l.material)! : inlineMaterial(l.material, `stack.layers[${j}].material`, problems);
    if (!material) return;
    if (material.kind === 'gap' && (j === 0 || j === s.stack.layers.length - 1))
      problems.push(`stack.layers[${j}].material: found an air gap as the ${j === 0 ? 'innermost' : 'outermost'} layer; expected a gap only between two solid layers`);
    if (l.contact_resistance > 0 && j === s.stack.layers.length - 1)
      problems.push(`stack.layers[${j}].contact_resistance: found ${l.contact_resistance} m²·K/W on the outermost layer; expected 0 (there is no next layer)`);
    layers.push({ label: l.label ?? material.name, material, thickness: l.thickness, cells: l.cells, contactResistanceToNext: l.contact_resistance });
  });

  // ---- weather ----
  let weather: WeatherInput | null = null;
  const refHeight = s.weather.wind_reference_height;
  if (s.weather.design_day) {
    const d = s.weather.design_day;
    if (d.max_air_temperature < d.min_air_temperature)
      problems.push(`weather.design_day.max_air_temperature: found ${c(d.max_air_temperature)}; expected at least the minimum, ${c(d.min_air_temperature)}`);
    const dew = d.dew_point ?? d.min_air_temperature;
    if (dew > d.max_air_temperature + 0.01) problems.push(`weather.design_day.dew_point: found ${c(dew)}; expected at most the maximum air temperature, ${c(d.max_air_temperature)}`);
    if (d.minimum_at !== undefined && d.shape !== 'sinusoid')
      problems.push(`weather.design_day.minimum_at: found it with shape ${d.shape}; expected it only with shape: sinusoid (the published profile has its minimum at 05:00)`);
    if (clock && problems.length === 0) {
      const source = makeDesignDay(
        {
          minAirTemperatureK: d.min_air_temperature,
          maxAirTemperatureK: d.max_air_temperature,
          windSpeed: d.wind_speed,
          windAmplitude: d.wind_daily_amplitude * d.wind_speed,
          referenceHeightM: refHeight,
          cloudCover: d.cloud_cover,
          dewPointK: dew,
          temperatureShape: d.shape,
          minimumHour: (d.minimum_at ?? 5 * 3600) / 3600,
        },
        clock,
        { latitudeDeg: s.site.latitude, longitudeDeg: s.site.longitude },
      );
      weather = {
        kind: 'design-day',
        minAirTemperatureK: d.min_air_temperature,
        maxAirTemperatureK: d.max_air_temperature,
        windSpeed: d.wind_speed,
        windDailyAmplitude: d.wind_daily_amplitude,
        referenceHeightM: refHeight,
        cloudCover: d.cloud_cover,
        dewPointK: dew,
        source,
      };
    }
  } else if (s.weather.file) {
    weather = weatherFromFile(s, baseDir, clock, problems);
  }

  // ---- flue gas ----
  // a library fuel name has been checked by the schema
  let composition: GasCompositionInput | null = null;
  const g = s.flue.gas;
  const fuelIssues = g.fuel_analysis ? validateUltimateAnalysis(g.fuel_analysis) : [];
  problems.push(...fuelIssues.map((i) => `flue.gas.fuel_analysis: ${i}`));
  const fuel = g.fuel !== undefined ? fuelByName(g.fuel) : fuelIssues.length === 0 ? g.fuel_analysis : undefined;
  if (fuel) {
    composition = flueGasFromFuel(fuel, g.excess_air ?? 0, { sulfurToSO3: g.sulfur_to_so3, combustionAirHumidity: g.air_humidity });
  } else if (g.composition) {
    const k = g.composition;
    const sum = k.N2 + k.O2 + k.CO2 + k.H2O;
    if (Math.abs(sum - 1) > 0.02) problems.push(`flue.gas.composition: found fractions summing to ${sum.toFixed(3)}; expected N2 + O2 + CO2 + H2O = 1 (within 0.02)`);
    else composition = flueGasFromVolumeFractions({ N2: k.N2, O2: k.O2, CO2: k.CO2, H2O: k.H2O, SO2: k.SO2_ppm * 1e-6, SO3Ppm: k.SO3_ppm });
  }

  // ---- firing schedule or plant calendar ----
  // volume flows at normal conditions become mass flows with the flue gas's molar mass
  const gasMolarMass = composition ? molarMass(composition) : MOLAR_MASS_AIR;
  const schedule = firingFrom(s, gasMolarMass, problems);

  // ---- run length: a number of days, until periodic, or an annual run of local dates ----
  const span = runSpan(s, problems);

  // ---- run ----
  if (s.run.mode === 'warmup' && s.run.firing_start === undefined)
    problems.push('run.firing_start: missing; expected the local clock time "HH:MM" at which firing starts, for a warm-up study');
  if (span.annual && s.run.mode === 'warmup')
    problems.push(`run.${span.annual.given === 'year' ? 'days' : 'last_day'}: found an annual run with run.mode warmup; expected run.mode cycle (an annual run follows the plant through its year from a settled start)`);
  problems.push(...annualLimitProblems(s, span.annual !== undefined));
  if (s.run.mode === 'warmup' && s.run.days === 'until-periodic')
    problems.push('run.days: found "until-periodic" with run.mode warmup; expected a whole number of days (a warm-up from a cold wall is not a periodic study)');
  if (s.run.output_interval > SECONDS_PER_DAY / 2) problems.push(`run.output_interval: found ${s.run.output_interval / 60} min; expected at most 12 h`);
  const output = outputFiles(s, span.annual !== undefined);
  problems.push(...outputProblems(s, output));
  const initial = initialWall(s, layers, baseDir, problems);

  if (problems.length > 0 || !weather || !composition || !schedule || !span.length) return null;

  const lining = layers[0]!.material;
  const sitePressure = s.site.pressure ?? airPressureAtElevation(s.site.elevation);
  return {
    name: s.name,
    site: {
      name: s.site.name,
      latitudeDeg: s.site.latitude,
      longitudeDeg: s.site.longitude,
      elevationM: s.site.elevation,
      timeZone: s.site.time_zone,
      startDate: s.site.first_day,
      groundReflectance: s.site.ground_reflectance,
      windExponent,
      ...(typeof s.site.terrain === 'string' ? { siteTerrain: s.site.terrain, stationTerrain: s.weather.wind_station_terrain } : {}),
      pressurePa: sitePressure,
    },
    stack: { height: s.stack.height, innerDiameter: s.stack.inner_diameter, segments: s.stack.segments, ...(s.stack.sectors > 1 ? { sectors: s.stack.sectors } : {}) },
    layers,
    surface: { emissivity: s.surface.emissivity, solarAbsorptance: s.surface.solar_absorptance },
    outside: {
      filmCoefficient: s.outside.film_coefficient === 'auto' ? undefined : s.outside.film_coefficient,
      radiation:
        s.outside.radiation === 'sky-ground'
          ? { kind: 'sky-ground', sky: s.outside.sky, groundTemperatureK: s.outside.ground_temperature }
          : s.outside.radiation === 'none'
            ? { kind: 'none' }
            : { kind: 'surroundings', temperatureK: s.outside.radiation.surroundings },
      sun: s.outside.sun,
      clearSky: s.outside.clear_sky === 'ashrae-1985' ? { kind: 'ashrae-1985' } : { kind: 'ashrae-2009', tauBeam: s.outside.clear_sky.ashrae_2009.tau_b, tauDiffuse: s.outside.clear_sky.ashrae_2009.tau_d },
    },
    weather,
    flue: {
      schedule,
      offMassFlow: s.flue.off_mass_flow,
      composition,
      properties: s.flue.properties,
      filmCoefficient: s.flue.film_coefficient === 'auto' ? undefined : s.flue.film_coefficient,
      gasCooling: s.flue.gas_cooling,
      pressurePa: s.flue.pressure ?? sitePressure,
      gasRadiation: s.flue.gas_radiation,
    },
    run: {
      mode: s.run.mode,
      length: span.length,
      outputInterval: s.run.output_interval,
      initial: initial!,
      integrator: s.run.integrator,
      rtol: s.run.relative_tolerance,
      atol: s.run.absolute_tolerance,
      firingStartClockS: s.run.firing_start,
      accuracy: s.run.accuracy === 'estimate' || s.run.accuracy === 'off' ? { kind: s.run.accuracy } : { kind: 'target', targetK: s.run.accuracy },
    },
    output,
    limits: {
      shellTouchK: s.limits.shell_touch,
      liningServiceK: s.limits.lining_service ?? (lining.kind === 'solid' ? lining.maxServiceTemperatureK : undefined),
      allowableStressPa: s.limits.allowable_stress,
      acidDewMarginK: s.limits.acid_dew_margin,
      waterDewMarginK: s.limits.water_dew_margin,
      acidDewHoursPerYear: s.limits.acid_dew_hours_per_year,
      waterDewHoursPerYear: s.limits.water_dew_hours_per_year,
      cyclesAbove: s.limits.cycles_above === undefined ? undefined : { rangeK: s.limits.cycles_above.range, count: s.limits.cycles_above.count },
    },
    ...(span.annual ? { annual: span.annual } : {}),
  };
}

type Scenarioflue = Scenario['flue'];
type ScenarioPoint = NonNullable<Scenarioflue['schedule']>['daily'] extends (infer P)[] | undefined ? P : never;

const hhmm = (x: number) => `${String(Math.floor(x / 3600)).padStart(2, '0')}:${String(Math.floor((x % 3600) / 60)).padStart(2, '0')}`;

/**
 * Times of each day's points must not go back, and at most two points may share a time (a step):
 * messages name the point's key, e.g. `flue.calendar.days.weekday[3].time`. Returns the largest
 * mass flow of the days.
 */
function checkDayTimes(dayLists: readonly (readonly [string, readonly ScenarioPoint[]])[], massFlowOf: (p: ScenarioPoint) => number, problems: string[]): number {
  let largestFlow = 0;
  for (const [where, pts] of dayLists) {
    pts.forEach((p, i) => {
      largestFlow = Math.max(largestFlow, massFlowOf(p));
      if (i === 0) return;
      const prev = pts[i - 1]!.time;
      if (p.time < prev) problems.push(`${where}[${i}].time: found "${hhmm(p.time)}"; expected a time not before the previous point's "${hhmm(prev)}" (times must not go backwards)`);
      else if (i > 1 && p.time === prev && pts[i - 2]!.time === prev)
        problems.push(`${where}[${i}].time: found "${hhmm(p.time)}" for the third point in a row; expected at most two points at one time (a step)`);
    });
  }
  return largestFlow;
}

/** The firing of the scenario: its daily or per-day schedule, or its plant calendar; null (with the problems noted) when unusable. */
function firingFrom(s: Scenario, gasMolarMass: number, problems: string[]): FlueSchedule | null {
  const massFlowOf = (p: { mass_flow?: number; volume_flow?: number }) => p.mass_flow ?? massFlowFromNormalVolumeFlow((p.volume_flow ?? 0) * 3600, gasMolarMass);
  const toPoints = (pts: readonly ScenarioPoint[]): FiringPointInput[] => pts.map((p) => ({ clockS: p.time, inletTemperatureK: p.gas_temperature, massFlow: massFlowOf(p) }));
  const before = problems.length;
  const noFlow = 'found every flow 0; expected some flow, or flue.off_mass_flow for the natural draft with the burner off';
  const floorGiven = s.flue.off_mass_flow !== undefined && s.flue.off_mass_flow > 0;
  if (s.flue.calendar) return calendarFrom(s.flue.calendar, toPoints, (lists) => checkDayTimes(lists, massFlowOf, problems), s.flue.off_mass_flow, problems);
  const sch = s.flue.schedule!;
  const schedule: FlueSchedule = sch.daily ? { daily: toPoints(sch.daily) } : { perDay: (sch.per_day ?? []).map(toPoints) };
  const dayLists = sch.daily ? [['flue.schedule.daily', sch.daily] as const] : (sch.per_day ?? []).map((d, i) => [`flue.schedule.per_day[${i}]`, d] as const);
  const largestFlow = checkDayTimes(dayLists, massFlowOf, problems);
  if (largestFlow === 0 && !floorGiven) problems.push(`flue.schedule: ${noFlow}`);
  if (problems.length === 0) for (const msg of validateFiringSchedule({ ...(schedule as Exclude<FlueSchedule, { calendar: unknown }>), offMassFlow: s.flue.off_mass_flow })) problems.push(`flue.schedule: ${msg}`);
  return problems.length === before ? schedule : null;
}

/** The calendar's own names for keys, as the scenario spells them. */
const CALENDAR_KEY_NAMES: readonly [RegExp, string][] = [
  [/\bshutdownDay\b/g, 'shutdown_day'],
  [/\bflowScale\b/g, 'flow_scale'],
  [/\boffMassFlow\b/g, 'flue.off_mass_flow'],
];

/**
 * The plant calendar of the scenario: every week and season names day-schedules that exist, each
 * day's times in order, then the calendar's own rules (every day of the week covered, seasons that
 * change something and do not overlap, a shutdown day without flow), with messages that name the
 * key under flue.calendar.
 */
function calendarFrom(
  c: NonNullable<Scenarioflue['calendar']>,
  toPoints: (pts: readonly ScenarioPoint[]) => FiringPointInput[],
  checkTimes: (lists: readonly (readonly [string, readonly ScenarioPoint[]])[]) => number,
  offMassFlow: number | undefined,
  problems: string[],
): FlueSchedule | null {
  const before = problems.length;
  const names = Object.keys(c.days);
  const known = `flue.calendar.days has ${names.length ? names.map((n) => `"${n}"`).join(', ') : 'none'}`;
  const checkWeek = (week: WeekPattern | undefined, where: string) => {
    for (const [key, name] of Object.entries(week ?? {})) if (name !== undefined && !Object.hasOwn(c.days, name)) problems.push(`${where}.${key}: found "${name}"; expected the name of a day-schedule (${known})`);
  };
  checkWeek(c.week, 'flue.calendar.week');
  (c.seasons ?? []).forEach((season, i) => {
    checkWeek(season.week, `flue.calendar.seasons[${i}].week`);
    if (season.flow_scale !== undefined && !(season.flow_scale > 0)) problems.push(`flue.calendar.seasons[${i}].flow_scale: found ${season.flow_scale}; expected a factor above 0 (for no firing use a shutdown)`);
  });
  if (c.shutdown_day !== undefined && !Object.hasOwn(c.days, c.shutdown_day)) problems.push(`flue.calendar.shutdown_day: found "${c.shutdown_day}"; expected the name of a day-schedule (${known})`);
  const periods = [...(c.seasons ?? []).map((p, i) => [`seasons[${i}]`, p] as const), ...(c.shutdowns ?? []).map((p, i) => [`shutdowns[${i}]`, p] as const)];
  for (const [where, p] of periods) {
    if (p.from.length !== p.to.length) problems.push(`flue.calendar.${where}: found from "${p.from}" and to "${p.to}"; expected both dates "YYYY-MM-DD" (once) or both "MM-DD" (every year)`);
    else if (p.from.length === 10 && p.from > p.to) problems.push(`flue.calendar.${where}.to: found "${p.to}", before from "${p.from}"; expected a date on or after from (a one-off period runs forward)`);
  }
  checkTimes(names.map((n) => [`flue.calendar.days.${n}`, c.days[n]!] as const));
  if (problems.length > before) return null;
  const spec: PlantCalendarSpec = {
    days: Object.fromEntries(names.map((n) => [n, toPoints(c.days[n]!)])),
    week: c.week,
    seasons: (c.seasons ?? []).map((p) => ({ name: p.name, from: p.from, to: p.to, ...(p.week ? { week: p.week } : {}), ...(p.flow_scale !== undefined ? { flowScale: p.flow_scale } : {}) })),
    shutdowns: (c.shutdowns ?? []).map((p) => ({ name: p.name, from: p.from, to: p.to })),
    ...(c.shutdown_day !== undefined ? { shutdownDay: c.shutdown_day } : {}),
    ...(offMassFlow !== undefined ? { offMassFlow } : {}),
  };
  for (const msg of validatePlantCalendar(spec)) {
    const text = CALENDAR_KEY_NAMES.reduce((t, [re, name]) => t.replace(re, name), msg);
    problems.push(text.startsWith('flue.') ? text : `flue.calendar.${text}`);
  }
  return problems.length > before ? null : { calendar: spec };
}

/** Most days an annual run given by its last day may span. */
const MOST_ANNUAL_DAYS = 366;

/**
 * The run's length, and for an annual run its span of local dates: `run.days` a number (default 1),
 * `until-periodic`, or `year` (a year of local days from site.first_day: 365, or 366 when the span
 * holds a 29 February); or `run.last_day` (from site.first_day to that day, inclusive).
 */
function runSpan(s: Scenario, problems: string[]): { length: ModelInputs['run']['length'] | null; annual?: AnnualInput } {
  const first = s.site.first_day;
  const { days, last_day: lastDay } = s.run;
  if (days !== undefined && lastDay !== undefined) {
    problems.push(`run.last_day: found "${lastDay}" with run.days ${JSON.stringify(days)}; expected one of them (the last day sets the number of days)`);
    return { length: null };
  }
  if (days === 'until-periodic') return { length: { kind: 'until-periodic', toleranceK: s.run.periodic_tolerance, maxDays: s.run.max_days } };
  if (days !== 'year' && lastDay === undefined) return { length: { kind: 'days', days: days ?? 1 } };
  if (!Number.isFinite(dayNumber(first))) return { length: null }; // a bad first day is reported with the site
  const last = lastDay ?? addDays(sameDateNextYear(first), -1);
  const count = dayNumber(last) - dayNumber(first) + 1;
  if (!Number.isFinite(count)) {
    problems.push(`run.last_day: found "${lastDay}"; expected a calendar date "YYYY-MM-DD"`);
    return { length: null };
  }
  if (count < 1 || count > MOST_ANNUAL_DAYS) {
    problems.push(`run.last_day: found "${last}", ${count < 1 ? 'before site.first_day' : `${count} days after`} "${first}"; expected a day from site.first_day to ${MOST_ANNUAL_DAYS} days on (an annual run covers at most a year)`);
    return { length: null };
  }
  return { length: { kind: 'days', days: count }, annual: { firstDay: first, lastDay: last, given: lastDay === undefined ? 'year' : 'last-day' } };
}

/** The same month and day a year after a real date `YYYY-MM-DD` (29 February → 1 March). Example: 2026-07-15 → 2027-07-15. */
function sameDateNextYear(date: string): string {
  const next = `${String(Number(date.slice(0, 4)) + 1).padStart(4, '0')}${date.slice(4)}`;
  return Number.isFinite(dayNumber(next)) ? next : addDays(`${next.slice(0, 8)}28`, 1);
}

/** Days since 1970-01-01 of a real date `YYYY-MM-DD` (NaN otherwise). */
function dayNumber(date: string): number {
  try {
    return Date.parse(`${addDays(date, 0)}T00:00:00Z`) / 86_400_000;
  } catch {
    return Number.NaN;
  }
}

/** The annual limits belong to annual runs: given for any other run they are reported. */
function annualLimitProblems(s: Scenario, annual: boolean): string[] {
  if (annual) return [];
  const keys = (['acid_dew_hours_per_year', 'water_dew_hours_per_year', 'cycles_above'] as const).filter((k) => s.limits[k] !== undefined);
  return keys.map((k) => `limits.${k}: found a limit per year in a run that is not annual; expected run.days: year or run.last_day (or remove the limit)`);
}

/** The per-instant files: as the output section says, or by default every instant (an annual run: daily extremes). */
function outputFiles(s: Scenario, annual: boolean): { timeseries: SeriesFileInput; segments: SeriesFileInput } {
  const fallback = annual ? 'daily-extremes' : 'all';
  return {
    timeseries: { content: s.output.timeseries ?? fallback, intervalS: s.output.timeseries_interval },
    segments: { content: s.output.segments ?? fallback, intervalS: s.output.segments_interval },
  };
}

/** An output interval must be a whole multiple of the run's output interval, and apply to a form that has rows per instant. */
function outputProblems(s: Scenario, files: { timeseries: SeriesFileInput; segments: SeriesFileInput }): string[] {
  const problems: string[] = [];
  for (const file of ['timeseries', 'segments'] as const) {
    const interval = s.output[`${file}_interval`];
    if (interval === undefined) continue;
    const key = `output.${file}_interval`;
    const ratio = interval / s.run.output_interval;
    if (Math.abs(ratio - Math.round(ratio)) > 1e-9) problems.push(`${key}: found ${interval / 60} min; expected a whole multiple of run.output_interval (${s.run.output_interval / 60} min)`);
    const content = files[file].content;
    if (content !== 'all' && content !== 'last-day') problems.push(`${key}: found an interval with output.${file} ${content}${s.output[file] === undefined ? ' (the default of an annual run)' : ''}; expected output.${file} all or last-day (the interval thins their rows)`);
  }
  return problems;
}

/**
 * The initial wall: a warm-up starts cold unless a temperature or a state is given; a state file is
 * read here and must belong to the same wall (layers, thicknesses, flue diameter, segments). Null
 * (with the problems noted) when it cannot be used.
 */
function initialWall(s: Scenario, layers: readonly LayerInput[], baseDir: string, problems: string[]): InitialWall | null {
  const given = s.run.initial;
  if (given === 'steady' || given === 'steady-at-start' || given === 'cold') return s.run.mode === 'warmup' ? 'cold' : given === 'steady' ? 'steady-daily-mean' : given;
  if ('temperature' in given) return { kind: 'uniform', temperatureK: given.temperature };
  let state;
  try {
    state = readStateFile(resolve(baseDir, given.from), given.from);
  } catch (e) {
    if (e instanceof StateFileError) {
      problems.push(`run.initial.from: ${e.message}`);
      return null;
    }
    throw e;
  }
  if (layers.length !== s.stack.layers.length) return null; // a layer problem is already reported
  const mismatch = wallStateMismatch(state, layers, s.stack.inner_diameter / 2, s.stack.segments, s.stack.sectors);
  if (mismatch !== null) {
    problems.push(`run.initial.from: found a state of a different wall in "${given.from}" (${mismatch}); expected the state.json of a run of this wall (same layers, thicknesses, inner diameter and segments)`);
    return null;
  }
  return { kind: 'state', state, fileName: given.from };
}

/**
 * The weather file read and checked once: every row; a typical year's site and time zone against
 * the scenario's (weatherFile.ts draws the lines between error and warning); and that it covers
 * the whole run (after any override of the run's length). Null (with the problems noted) when it
 * cannot be used.
 */
function weatherFromFile(s: Scenario, baseDir: string, clock: SiteClock | null, problems: string[]): WeatherInput | null {
  const fileName = s.weather.file!;
  const refHeight = s.weather.wind_reference_height;
  const read = readTextFile(resolve(baseDir, fileName), 'a weather file', LIMITS.weatherFileBytes);
  if (!read.ok) {
    problems.push(`weather.file: found "${printable(fileName, 200)}"; expected a readable weather file: an hourly CSV, an EPW or a TMY3 file (${read.problem})`);
    return null;
  }
  const text = read.text;
  if (!clock) return null;
  try {
    const file = readWeatherFile(text, fileName, clock, { referenceHeightM: refHeight });
    const notes = { warnings: [] as string[], assumptions: [] as string[] };
    if (file.site) {
      const scenarioSite = { latitudeDeg: s.site.latitude, longitudeDeg: s.site.longitude, elevationM: s.site.elevation, timeZone: s.site.time_zone };
      const check = checkWeatherFileSite(file.site, scenarioSite, Number(s.site.first_day.slice(0, 4)));
      problems.push(...check.errors.map((e) => `weather.file: ${e}`));
      notes.warnings.push(...check.warnings.map((w) => `weather file ${fileName}: ${w}`));
      notes.assumptions.push(...typicalYearNotes(file, greatCircleDistanceKm(file.site.latitudeDeg, file.site.longitudeDeg, s.site.latitude, s.site.longitude)));
      if (check.errors.length > 0) return null;
    }
    // a periodic study repeats the first day, so only that day must be covered
    const days = typeof s.run.days === 'number' ? s.run.days : s.run.days === 'until-periodic' ? 1 : runDaysOf(s);
    const startT = s.run.mode === 'warmup' && s.run.firing_start !== undefined ? clock.runTimeOfLocal(0, s.run.firing_start) : 0;
    const cover = file.source.coversRange(clock.utcMs(startT), clock.utcMs(startT + days * SECONDS_PER_DAY));
    if (!cover.covered) {
      problems.push(`weather.file: ${cover.message}`);
      return null;
    }
    return { kind: 'file', fileName, referenceHeightM: refHeight, source: file.source, ...(file.format === 'csv' ? {} : { format: file.format, site: file.site, notes }) };
  } catch (e) {
    if (e instanceof WeatherFileError || e instanceof RangeError) {
      problems.push(`weather.file: ${e.message}`, ...(e instanceof WeatherFileError ? e.more.map((m) => `weather.file: ${m}`) : []));
      return null;
    }
    throw e;
  }
}

/** Days of a run given as a year or by its last day (1 when the span is unusable: that is reported elsewhere). */
function runDaysOf(s: Scenario): number {
  const span = runSpan(s, []);
  return span.length?.kind === 'days' ? span.length.days : 1;
}

/** An inline material from the scenario, with tables in kelvin. */
function inlineMaterial(m: ScenarioMaterial, path: string, problems: string[]): Material | undefined {
  const table = (v: number | [number, number][], field: string): PropertyTable | null => {
    const t: PropertyTable = typeof v === 'number' ? { temperatureK: [300], values: [v] } : { temperatureK: v.map((p) => p[0] + KELVIN_OFFSET), values: v.map((p) => p[1]) };
    const issues = validateTable(t, field);
    if (issues.length > 0) {
      problems.push(...issues.map((i) => `${path}.${field}: found ${JSON.stringify(v)}; expected [temperature °C, value] pairs with increasing temperatures and positive values (${i})`));
      return null;
    }
    return t;
  };
  const k = table(m.conductivity, 'conductivity');
  const cp = table(m.specific_heat, 'specific_heat');
  if (!k || !cp) return undefined;
  return {
    name: m.name,
    description: 'inline material from the scenario',
    kind: 'solid',
    density: m.density,
    conductivity: k,
    specificHeat: cp,
    emissivity: m.emissivity,
    maxServiceTemperatureK: m.max_service_temperature,
    youngsModulus: m.youngs_modulus ?? 0,
    thermalExpansion: m.thermal_expansion ?? 0,
    poissonRatio: m.poisson_ratio ?? 0.2,
    source: m.source,
  };
}
