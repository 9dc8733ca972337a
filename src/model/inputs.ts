/**
 * Validated model inputs: everything the simulator needs, in SI units and kelvin, with no unit
 * strings and no optional ambiguity left. The scenario module produces this from a file; library
 * users may build it directly. Nothing in here refers back to the scenario file format.
 */
import type { WallLayer } from '../physics/wall/mesh.ts';
import type { WeatherSource } from '../physics/outside/weather.ts';
import type { OutsideRadiation } from '../physics/outside/boundary.ts';
import type { Terrain } from '../physics/outside/wind.ts';
import type { ClearSkyModel } from '../physics/sun/irradiance.ts';
import type { DaySchedules, FiringPoint } from './firing.ts';
import type { PlantCalendarSpec } from './calendar.ts';
import type { WallState } from './wallState.ts';

export interface SiteInput {
  readonly name: string;
  readonly latitudeDeg: number;
  readonly longitudeDeg: number;
  readonly elevationM: number;
  /** IANA time zone. */
  readonly timeZone: string;
  /** First day of the run, local date `YYYY-MM-DD`. */
  readonly startDate: string;
  /** Ground solar reflectance (albedo), 0–1. */
  readonly groundReflectance: number;
  /** Wind power-law exponent α for the site's terrain. */
  readonly windExponent: number;
  /**
   * Terrain classes of the site and of the weather station that measured the wind: with both, the
   * wind at height follows the two-terrain power law (capped at the site's boundary-layer height);
   * without them, `windExponent` is applied to the reading directly (a user-given exponent).
   */
  readonly siteTerrain?: Terrain;
  readonly stationTerrain?: Terrain;
  /** Atmospheric pressure at the site, Pa (air properties outside and in gaps; default flue pressure). Default: the standard atmosphere at the elevation. */
  readonly pressurePa?: number;
}

export interface StackInput {
  readonly height: number;
  readonly innerDiameter: number;
  readonly segments: number;
  /**
   * Circumferential sectors of the wall (default 1: the circumferentially averaged wall). With more,
   * each sector has its own radial nodes, its own share of the sun and its own outside exchange;
   * neighbouring sectors exchange heat round the circumference.
   */
  readonly sectors?: number;
}

/** One wall layer, inside → outside (the mesh's `WallLayer`). */
export type LayerInput = WallLayer;

export interface SurfaceInput {
  readonly emissivity: number;
  readonly solarAbsorptance: number;
}

export interface OutsideInput {
  /** Fixed outside film coefficient, W/(m² K); undefined = correlations (Churchill–Bernstein / Churchill–Chu, mixed). */
  readonly filmCoefficient?: number;
  /** Radiation exchange: to half sky and half ground, or to surroundings at a fixed temperature, or none. */
  readonly radiation: OutsideRadiation;
  /** Whether absorbed sun is applied. */
  readonly sun: boolean;
  /** Clear-sky irradiance model where the weather does not measure it; default ASHRAE 1985 with constants interpolated by day. */
  readonly clearSky?: ClearSkyModel;
}

/** The site a typical-year weather file describes, as its header gives it. */
export interface WeatherFileSite {
  /** Station or place name. */
  readonly name: string;
  /** Station identifier (USAF for TMY3, WMO for EPW), as written. */
  readonly stationId: string;
  /** Latitude, degrees north (south negative). */
  readonly latitudeDeg: number;
  /** Longitude, degrees east (west negative). */
  readonly longitudeDeg: number;
  /** Elevation above sea level, m. */
  readonly elevationM: number;
  /** Offset of the file's local standard time from UTC, hours (e.g. +1 for Central European Time). */
  readonly utcOffsetHours: number;
}

/**
 * The weather the run sees: a source that answers the outside-air state at any instant (parsed or
 * built once, when the inputs are validated), and what it is, for reports.
 */
export type WeatherInput =
  | {
      readonly kind: 'design-day';
      readonly minAirTemperatureK: number;
      readonly maxAirTemperatureK: number;
      readonly windSpeed: number;
      /** Fractional daily amplitude of the wind speed (0 = steady). */
      readonly windDailyAmplitude: number;
      readonly referenceHeightM: number;
      readonly cloudCover: number;
      readonly dewPointK: number;
      readonly source: WeatherSource;
    }
  | {
      readonly kind: 'file';
      readonly fileName: string;
      readonly referenceHeightM: number;
      readonly source: WeatherSource;
      /** The file's format (an hourly CSV of this tool's columns when absent). */
      readonly format?: 'csv' | 'EPW' | 'TMY3';
      /** A typical-year file's site, as its header gives it. */
      readonly site?: WeatherFileSite;
      /** What the reader should know about the file: its site against the scenario's, rows filled by a model (sentences). */
      readonly notes?: { readonly warnings: readonly string[]; readonly assumptions: readonly string[] };
    }
  /** Any weather source built in code (library use, tests). */
  | { readonly kind: 'source'; readonly source: WeatherSource };

/** One firing point: local clock time (s after midnight), inlet gas temperature (K), mass flow (kg/s). */
export type FiringPointInput = FiringPoint;

export interface GasCompositionInput {
  /** Mole (volume) fractions of the wet flue gas, summing to 1. */
  readonly N2: number;
  readonly O2: number;
  readonly CO2: number;
  readonly H2O: number;
  readonly SO2: number;
  readonly SO3: number;
}

/** Firing: points for every day (`daily`), in turn per day (`perDay`), or a plant calendar by local date. */
export type FlueSchedule = DaySchedules | { readonly calendar: PlantCalendarSpec };

export interface FlueInput {
  /** Firing points for every day (`daily`), in turn per day (`perDay`), or a plant calendar (`calendar`). */
  readonly schedule: FlueSchedule;
  /** Mass flow floor while off (natural draft), kg/s. */
  readonly offMassFlow?: number;
  readonly composition: GasCompositionInput;
  /** Gas properties: the mixture's, or air's. */
  readonly properties: 'mixture' | 'air';
  /** Fixed inside film coefficient, W/(m² K); undefined = Gnielinski / laminar blend. */
  readonly filmCoefficient?: number;
  /** Whether the gas cools as it rises (false: every segment sees the inlet temperature). */
  readonly gasCooling: boolean;
  /** Absolute pressure in the flue, Pa. */
  readonly pressurePa: number;
  /** Whether the H2O–CO2 gas radiates to the lining (weighted-sum-of-grey-gases); default false for inputs built in code, true from scenario files. */
  readonly gasRadiation?: boolean;
}

export interface RunInput {
  /** `cycle`: daily cycling study; `warmup`: cold wall, firing starts at `firingStartClockS`. */
  readonly mode: 'cycle' | 'warmup';
  /** Fixed number of days, or repeat until periodic. */
  readonly length: { readonly kind: 'days'; readonly days: number } | { readonly kind: 'until-periodic'; readonly toleranceK: number; readonly maxDays: number };
  /** Output interval, s. */
  readonly outputInterval: number;
  /**
   * Initial wall state: steady at the daily-mean or first instant's conditions, cold (at the air
   * temperature), uniform at a given temperature, or a state written by an earlier run.
   */
  readonly initial: InitialWall;
  readonly integrator: 'implicit' | 'rk45';
  readonly rtol: number;
  readonly atol: number;
  /**
   * The accuracy statement (run by the library entry, not by `simulate`): `estimate` (a second
   * solve on a refined mesh at a tighter tolerance), `off`, or a target in K that the run refines
   * toward. Undefined for inputs built in code: `estimate`.
   */
  readonly accuracy?: AccuracyRequest;
  /** Warm-up: local clock time at which firing starts on day 0, s. */
  readonly firingStartClockS?: number;
}

export type InitialWall =
  | 'steady-daily-mean'
  | 'steady-at-start'
  | 'cold'
  /** Every node at one temperature, K. */
  | { readonly kind: 'uniform'; readonly temperatureK: number }
  /** The state an earlier run ended with (state.json), and the file it came from. */
  | { readonly kind: 'state'; readonly state: WallState; readonly fileName: string };

export type AccuracyRequest = { readonly kind: 'estimate' } | { readonly kind: 'off' } | { readonly kind: 'target'; readonly targetK: number };

export interface LimitsInput {
  /** Shell (outer surface) touch limit, K. */
  readonly shellTouchK?: number;
  /** Lining (innermost layer) service limit, K; default: the lining material's maximum service temperature. */
  readonly liningServiceK?: number;
  /** Allowable thermal stress, Pa. */
  readonly allowableStressPa?: number;
  /** Required margin of the inner surface above the acid dew point, K. */
  readonly acidDewMarginK?: number;
  /** Required margin of the inner surface above the water dew point, K. */
  readonly waterDewMarginK?: number;
  /** Annual runs: most hours a year the inner surface may spend below the acid dew point at any height, h. */
  readonly acidDewHoursPerYear?: number;
  /** Annual runs: most hours a year below the water dew point at any height, h. */
  readonly waterDewHoursPerYear?: number;
  /**
   * Annual runs: thermal cycles (rainflow) of the temperature difference across a layer or the whole
   * wall with a range above `rangeK`; counted per layer and height, and, with `count`, at most that
   * many a year allowed.
   */
  readonly cyclesAbove?: { readonly rangeK: number; readonly count?: number };
}

/**
 * An annual run: a year (or a range of dates) of local days from `firstDay` to `lastDay`,
 * inclusive, with annual statistics (monthly and yearly figures, thermal cycles). Read by the
 * analysis and output layers; the model runs `run.length` days and ignores it.
 */
export interface AnnualInput {
  /** First local date, `YYYY-MM-DD` (the site's start date). */
  readonly firstDay: string;
  /** Last local date, `YYYY-MM-DD`, inclusive. */
  readonly lastDay: string;
  /** How the span was asked for: `run.days: year`, or `run.last_day`. */
  readonly given: 'year' | 'last-day';
}

/**
 * What a run writes of one per-instant file (timeseries.csv, segments.csv); read by the output
 * layer, the model ignores it. `all`: every output instant of the run; `last-day`: the last
 * simulated day; `daily-extremes`: per day, the lowest and highest value of every column;
 * `off`: no file.
 */
export interface SeriesFileInput {
  readonly content: 'all' | 'last-day' | 'daily-extremes' | 'off';
  /** Only instants a whole multiple of this after the run's first, s (with all and last-day); undefined: every output instant. */
  readonly intervalS?: number;
}

/** The run's per-instant files. */
export interface OutputInput {
  readonly timeseries: SeriesFileInput;
  readonly segments: SeriesFileInput;
}

export interface ModelInputs {
  readonly name: string;
  readonly site: SiteInput;
  readonly stack: StackInput;
  readonly layers: readonly LayerInput[];
  readonly surface: SurfaceInput;
  readonly outside: OutsideInput;
  readonly weather: WeatherInput;
  readonly flue: FlueInput;
  readonly run: RunInput;
  readonly limits: LimitsInput;
  /** What the run's per-instant files hold (default: every instant in both). */
  readonly output?: OutputInput;
  /** Present for an annual run (see AnnualInput). */
  readonly annual?: AnnualInput;
}
