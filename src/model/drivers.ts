/**
 * Boundary drivers at one instant: outside air, wind, sky, sun and firing. Everything here depends
 * on time only (not on the wall state), so it is evaluated once per instant and shared by every
 * segment and every Newton iteration at that instant.
 */
import type { ModelInputs } from './inputs.ts';
import type { SiteClock } from './clock.ts';
import type { WeatherSource } from '../physics/outside/weather.ts';
import type { FiringSchedule } from './firing.ts';
import { solarAt, absorbedSunPerMetre } from '../physics/sun/irradiance.ts';
import { SECONDS_PER_DAY } from '../physics/constants.ts';
import { surroundingTemperatures } from '../physics/outside/boundary.ts';

export interface Drivers {
  t: number;
  airTemperatureK: number;
  /** Wind speed at the weather's reference height, m/s. */
  windSpeedRef: number;
  cloudCover: number;
  skyTemperatureK: number;
  groundTemperatureK: number;
  sunAltitudeDeg: number;
  sunAzimuthDeg: number;
  beamNormal: number;
  diffuseHorizontal: number;
  /** Absorbed sun per metre of height, W/m (round the whole circumference; same at every height). */
  sunPerMetre: number;
  /** Its sky-diffuse and ground-reflected part, W/m (the same on every side; the rest is beam). */
  sunDiffusePerMetre: number;
  inletTemperatureK: number;
  massFlow: number;
  firing: boolean;
}

export interface DriverContext {
  readonly inputs: ModelInputs;
  readonly clock: SiteClock;
  readonly weather: WeatherSource;
  readonly schedule: FiringSchedule;
  readonly outerDiameter: number;
  /** Repeat the first day's drivers every day (periodic studies): drivers at t are those at t mod 1 day. */
  readonly repeatFirstDay: boolean;
}

/** The instant whose drivers apply at run time t (t itself, or its time of day on the first day). */
export function driverTime(ctx: DriverContext, t: number): number {
  return ctx.repeatFirstDay ? t - Math.floor(t / SECONDS_PER_DAY + 1e-12) * SECONDS_PER_DAY : t;
}

/** Fill `out` with the drivers at run time t. */
export function evaluateDrivers(ctx: DriverContext, tRun: number, out: Drivers): Drivers {
  const { inputs, clock } = ctx;
  const t = driverTime(ctx, tRun);
  const utcMs = clock.utcMs(t);
  const air = ctx.weather.at(utcMs);
  out.t = tRun;
  out.airTemperatureK = air.airTemperatureK;
  out.windSpeedRef = air.windSpeed;
  out.cloudCover = air.cloudCover;

  surroundingTemperatures(inputs.outside.radiation, air, out);

  const sun = solarAt(utcMs, inputs.site, air, inputs.outside.clearSky);
  out.sunAltitudeDeg = sun.altitudeDeg;
  out.sunAzimuthDeg = sun.azimuthDeg;
  out.beamNormal = sun.beamNormal;
  out.diffuseHorizontal = sun.diffuseHorizontal;
  if (inputs.outside.sun) {
    const absorbed = absorbedSunPerMetre({
      beamNormal: sun.beamNormal,
      diffuseHorizontal: sun.diffuseHorizontal,
      altitudeDeg: sun.altitudeDeg,
      outerDiameter: ctx.outerDiameter,
      solarAbsorptance: inputs.surface.solarAbsorptance,
      groundReflectance: inputs.site.groundReflectance,
    });
    out.sunPerMetre = absorbed.total;
    out.sunDiffusePerMetre = absorbed.diffuse + absorbed.reflected;
  } else {
    out.sunPerMetre = 0;
    out.sunDiffusePerMetre = 0;
  }

  // (a warm-up run starts at firing start, so the schedule applies from its first instant)
  const clockS = clock.localSecondsOfDay(t);
  const f = ctx.schedule.at(localDateIndex(t, clockS), clockS);
  out.inletTemperatureK = f.inletTemperatureK;
  out.massFlow = f.massFlow;
  out.firing = f.firing;
  return out;
}

/**
 * Index of the LOCAL date at run time `t` (0 on the run's first date) from the local clock reading
 * `clockS` there: run time minus the clock reading is local midnight of that date, give or take the
 * daylight-saving shifts since the start (an hour or two, never half a day), so rounding to whole
 * days gives the date. It differs from the run-day index (⌊t / 86 400 s⌋) in the hour after local
 * midnight once the clocks have gone forward (a run day is 24 h of run time; see calendar.ts,
 * localDayIndex, which gives the same index by way of the ISO local time).
 */
export function localDateIndex(t: number, clockS: number): number {
  return Math.round((t - clockS) / SECONDS_PER_DAY);
}

export function emptyDrivers(): Drivers {
  return {
    t: Number.NaN,
    airTemperatureK: 0,
    windSpeedRef: 0,
    cloudCover: 0,
    skyTemperatureK: 0,
    groundTemperatureK: 0,
    sunAltitudeDeg: 0,
    sunAzimuthDeg: 0,
    beamNormal: 0,
    diffuseHorizontal: 0,
    sunPerMetre: 0,
    sunDiffusePerMetre: 0,
    inletTemperatureK: 0,
    massFlow: 0,
    firing: false,
  };
}
