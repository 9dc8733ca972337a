/**
 * The one validation path: a scenario object (from a file, from a library caller, or either with
 * command-line overrides applied) → the model's inputs (SI, kelvin), with every problem collected
 * and reported together, one line each, as a ScenarioError. The zod schema checks each value and
 * converts units; the cross-field rules below check what no single value can; the weather is read
 * and checked here, once.
 */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { scenarioSchema, type Scenario, type ScenarioMaterial } from './schema.ts';
import { ScenarioError, formatIssues, formatPath } from './errors.ts';
import type { ModelInputs, LayerInput, WeatherInput, FiringPointInput, GasCompositionInput } from '../../model/inputs.ts';
import type { Material, PropertyTable } from '../../physics/materials/types.ts';
import { findMaterial } from '../../physics/materials/index.ts';
import { validateTable } from '../../physics/properties/table.ts';
import { airPressureAtElevation } from '../../physics/properties/air.ts';
import { KELVIN_OFFSET, SECONDS_PER_DAY, MOLAR_MASS_AIR } from '../../physics/constants.ts';
import { makeSiteClock, type SiteClock } from '../../model/clock.ts';
import { TERRAIN_EXPONENTS } from '../../physics/outside/wind.ts';
import { parseWeatherCsv, WeatherFileError } from '../weather/csvFile.ts';
import { makeDesignDay } from '../weather/designDay.ts';
import { fuelByName, validateUltimateAnalysis } from '../../physics/flue/fuels.ts';
import { flueGasFromFuel, flueGasFromVolumeFractions, molarMass } from '../../physics/flue/combustion.ts';
import { validateFiringSchedule, massFlowFromNormalVolumeFlow, type DaySchedules } from '../../model/firing.ts';

export interface LoadedScenario {
  /** The validated scenario, as written (SI values). */
  readonly scenario: Scenario;
  /** What the model runs. */
  readonly inputs: ModelInputs;
  /** Absolute path of the file, when read from a file. */
  readonly path?: string;
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
  const parsed = scenarioSchema.safeParse(value);
  if (!parsed.success) throw new ScenarioError(nameOverrides(formatIssues(parsed.error.issues, value), overrides), options.file);
  const problems: string[] = [];
  const inputs = toModelInputs(parsed.data, options.baseDir ?? process.cwd(), problems);
  if (problems.length > 0 || !inputs) throw new ScenarioError(nameOverrides(problems, overrides), options.file);
  return { scenario: parsed.data, inputs, path: options.file ? resolve(options.file) : undefined };
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
    problems.push(`site.first_day: found "${s.site.first_day}"; expected a calendar date "YYYY-MM-DD"`);
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

  // ---- firing schedule ----
  // volume flows at normal conditions become mass flows with the flue gas's molar mass
  const gasMolarMass = composition ? molarMass(composition) : MOLAR_MASS_AIR;
  const massFlowOf = (p: { mass_flow?: number; volume_flow?: number }) => p.mass_flow ?? massFlowFromNormalVolumeFlow((p.volume_flow ?? 0) * 3600, gasMolarMass);
  const toPoints = (pts: readonly { time: number; gas_temperature: number; mass_flow?: number; volume_flow?: number }[]): FiringPointInput[] =>
    pts.map((p) => ({ clockS: p.time, inletTemperatureK: p.gas_temperature, massFlow: massFlowOf(p) }));
  const schedule: DaySchedules = s.flue.schedule.daily ? { daily: toPoints(s.flue.schedule.daily) } : { perDay: (s.flue.schedule.per_day ?? []).map(toPoints) };
  const dayLists = s.flue.schedule.daily ? [['daily', s.flue.schedule.daily] as const] : (s.flue.schedule.per_day ?? []).map((d, i) => [`per_day[${i}]`, d] as const);
  let largestFlow = 0;
  for (const [where, pts] of dayLists) {
    pts.forEach((p, i) => {
      largestFlow = Math.max(largestFlow, massFlowOf(p));
      if (i === 0) return;
      const prev = pts[i - 1]!.time;
      const hhmm = (x: number) => `${String(Math.floor(x / 3600)).padStart(2, '0')}:${String(Math.floor((x % 3600) / 60)).padStart(2, '0')}`;
      if (p.time < prev) problems.push(`flue.schedule.${where}[${i}].time: found "${hhmm(p.time)}"; expected a time not before the previous point's "${hhmm(prev)}" (times must not go backwards)`);
      else if (i > 1 && p.time === prev && pts[i - 2]!.time === prev)
        problems.push(`flue.schedule.${where}[${i}].time: found "${hhmm(p.time)}" for the third point in a row; expected at most two points at one time (a step)`);
    });
  }
  if (largestFlow === 0 && !(s.flue.off_mass_flow && s.flue.off_mass_flow > 0))
    problems.push('flue.schedule: found every flow 0; expected some flow, or flue.off_mass_flow for the natural draft with the burner off');
  if (problems.length === 0) for (const msg of validateFiringSchedule({ ...schedule, offMassFlow: s.flue.off_mass_flow })) problems.push(`flue.schedule: ${msg}`);

  // ---- run ----
  if (s.run.mode === 'warmup' && s.run.firing_start === undefined)
    problems.push('run.firing_start: missing; expected the local clock time "HH:MM" at which firing starts, for a warm-up study');
  if (s.run.mode === 'warmup' && s.run.days === 'until-periodic')
    problems.push('run.days: found "until-periodic" with run.mode warmup; expected a whole number of days (a warm-up from a cold wall is not a periodic study)');
  if (s.run.output_interval > SECONDS_PER_DAY / 2) problems.push(`run.output_interval: found ${s.run.output_interval / 60} min; expected at most 12 h`);

  if (problems.length > 0 || !weather || !composition) return null;

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
    stack: { height: s.stack.height, innerDiameter: s.stack.inner_diameter, segments: s.stack.segments },
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
      length: s.run.days === 'until-periodic' ? { kind: 'until-periodic', toleranceK: s.run.periodic_tolerance, maxDays: s.run.max_days } : { kind: 'days', days: s.run.days },
      outputInterval: s.run.output_interval,
      initial: s.run.mode === 'warmup' ? 'cold' : s.run.initial === 'steady' ? 'steady-daily-mean' : s.run.initial,
      integrator: s.run.integrator,
      rtol: s.run.relative_tolerance,
      atol: s.run.absolute_tolerance,
      firingStartClockS: s.run.firing_start,
    },
    limits: {
      shellTouchK: s.limits.shell_touch,
      liningServiceK: s.limits.lining_service ?? (lining.kind === 'solid' ? lining.maxServiceTemperatureK : undefined),
      allowableStressPa: s.limits.allowable_stress,
      acidDewMarginK: s.limits.acid_dew_margin,
      waterDewMarginK: s.limits.water_dew_margin,
    },
  };
}

/**
 * The weather file read and checked once: every row, and that it covers the whole run (after any
 * override of the run's length). Null (with the problems noted) when it cannot be used.
 */
function weatherFromFile(s: Scenario, baseDir: string, clock: SiteClock | null, problems: string[]): WeatherInput | null {
  const fileName = s.weather.file!;
  const refHeight = s.weather.wind_reference_height;
  let text: string;
  try {
    text = readFileSync(resolve(baseDir, fileName), 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    problems.push(`weather.file: found "${fileName}"; expected a readable CSV file (${code === 'ENOENT' ? 'no such file' : (e as Error).message})`);
    return null;
  }
  if (!clock) return null;
  try {
    const source = parseWeatherCsv(text, clock, fileName, { referenceHeightM: refHeight });
    // a periodic study repeats the first day, so only that day must be covered
    const days = s.run.days === 'until-periodic' ? 1 : s.run.days;
    const startT = s.run.mode === 'warmup' && s.run.firing_start !== undefined ? clock.runTimeOfLocal(0, s.run.firing_start) : 0;
    const cover = source.coversRange(clock.utcMs(startT), clock.utcMs(startT + days * SECONDS_PER_DAY));
    if (!cover.covered) {
      problems.push(`weather.file: ${cover.message}`);
      return null;
    }
    return { kind: 'file', fileName, referenceHeightM: refHeight, source };
  } catch (e) {
    if (e instanceof WeatherFileError || e instanceof RangeError) {
      problems.push(`weather.file: ${e.message}`);
      return null;
    }
    throw e;
  }
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
