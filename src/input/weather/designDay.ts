/**
 * Design-day weather: one idealised day (air temperature between a daily minimum and maximum, wind,
 * cloud, dew point) repeated day after day, as a {@link WeatherSource}.
 */
import type { SiteClock } from '../../model/clock.ts';
import { sunriseSunset, type SiteLocation } from '../../physics/sun/position.ts';
import type { AirState, WeatherSource } from '../../physics/outside/weather.ts';
import { STANDARD_WIND_HEIGHT_M } from '../../physics/outside/wind.ts';

/**
 * Fraction of the daily range below the daily maximum, by local hour 1…24 (index 0 is hour 1,
 * index 23 is hour 24 = midnight): `T = T_max − f · (T_max − T_min)`; minimum (f = 1) at 05:00,
 * maximum (f = 0) at 15:00. ASHRAE Handbook of Fundamentals (2009), ch. 14, Table 6 "Fraction of
 * daily temperature range". *From memory* (the table is widely reproduced).
 */
export const ASHRAE_DAILY_RANGE_FRACTION = [
  0.87, 0.92, 0.96, 0.99, 1.0, 0.98, 0.93, 0.84, 0.71, 0.56, 0.39, 0.23,
  0.11, 0.03, 0.0, 0.03, 0.1, 0.21, 0.34, 0.47, 0.58, 0.68, 0.76, 0.82,
] as const;

/**
 * ASHRAE (2009, ch. 14, Table 6) fraction of the daily range at local clock hour `hour` (0 ≤ hour < 24,
 * fractional), linear between the tabulated whole hours (hour 0 ≡ hour 24). Example: 15.5 h → 0.015.
 */
export function fractionOfDailyRangeAshrae(hour: number): number {
  const h = ((hour % 24) + 24) % 24;
  const lo = Math.floor(h);
  const at = (k: number) => ASHRAE_DAILY_RANGE_FRACTION[(((k - 1) % 24) + 24) % 24];
  return at(lo) + (at(lo + 1) - at(lo)) * (h - lo);
}

/**
 * Two half-cosines: rising from the minimum at sunrise `sunriseHour` to the maximum at `peakHour`,
 * falling from the maximum to the next sunrise (24 h later). Returns the fraction of the daily range
 * below the maximum (1 at sunrise, 0 at the peak), like {@link fractionOfDailyRangeAshrae}.
 * Common practice (the sinusoidal daytime course of e.g. Parton & Logan 1981, Agric. Meteorol. 23,
 * 205–216, with a cosine instead of their exponential night decay). Example: sunrise 6, peak 15, at
 * 10.5 h → (1 + cos(π·4.5/9))/2 = 0.5.
 */
export function fractionOfDailyRangeCosine(hour: number, sunriseHour: number, peakHour: number): number {
  let h = ((hour % 24) + 24) % 24;
  if (h < sunriseHour) h += 24;
  if (h <= peakHour) return (1 + Math.cos((Math.PI * (h - sunriseHour)) / (peakHour - sunriseHour))) / 2;
  return (1 - Math.cos((Math.PI * (h - peakHour)) / (sunriseHour + 24 - peakHour))) / 2;
}

/**
 * A pure sinusoid with its minimum at `minimumHour` (local clock hours) and its maximum 12 h later,
 * as the fraction of the daily range below the maximum: f = (1 + cos(2π (hour − minimumHour)/24))/2
 * (1 at the minimum, 0 at the maximum), the textbook periodic surface condition (Carslaw & Jaeger
 * 1959, §2.6). Example: minimum at 5 h, at 11 h → (1 + cos(π/2))/2 = 0.5; at 17 h → 0.
 */
export function fractionOfDailyRangeSinusoid(hour: number, minimumHour: number): number {
  return (1 + Math.cos((2 * Math.PI * (hour - minimumHour)) / 24)) / 2;
}

/** Shape of the daily air-temperature course. */
export type DesignDayShape = 'ashrae-2009' | 'cosine-sunrise' | 'sinusoid';

/** Options of {@link makeDesignDay}. SI units, temperatures in K. */
export interface DesignDayOptions {
  /** Daily minimum air temperature, K. */
  readonly minAirTemperatureK: number;
  /** Daily maximum air temperature, K. */
  readonly maxAirTemperatureK: number;
  /**
   * Daily course: `ashrae-2009` (default; ASHRAE 2009 Table 6, minimum 05:00, maximum 15:00 local
   * clock time), `cosine-sunrise` (minimum at the day's sunrise, maximum at `peakHour`) or
   * `sinusoid` (minimum at `minimumHour`, maximum 12 h later).
   */
  readonly temperatureShape?: DesignDayShape;
  /** Local clock hour of the maximum for `cosine-sunrise`, default 15. */
  readonly peakHour?: number;
  /** Local clock hour of the minimum for `sinusoid`, default 5 (as in the ASHRAE profile). */
  readonly minimumHour?: number;
  /** Daily mean wind speed at the reference height, m/s. */
  readonly windSpeed: number;
  /** Amplitude of the daily wind cycle, m/s (0 ≤ amplitude ≤ windSpeed), default 0. */
  readonly windAmplitude?: number;
  /** Local clock hour of the strongest wind, default 15. */
  readonly windPeakHour?: number;
  /** Height of the wind speed above ground, m, default 10 (WMO standard anemometer height). */
  readonly referenceHeightM?: number;
  /** Cloud cover fraction 0–1, constant, default 0. */
  readonly cloudCover?: number;
  /**
   * Dew point, K, constant; default the daily minimum air temperature (FAO-56, Allen et al. 1998,
   * eq. 48: e_a ≈ e°(T_min)). Never reported above the air temperature of the instant.
   */
  readonly dewPointK?: number;
}

/**
 * Build a design-day weather source. Wind: `U = U_mean + U_amp cos(2π (hour − hour_peak)/24)` —
 * the daytime maximum of surface wind from convective mixing (common practice, from memory).
 * Throws RangeError for inconsistent options.
 */
export function makeDesignDay(options: DesignDayOptions, clock: SiteClock, site: SiteLocation): WeatherSource {
  const {
    minAirTemperatureK: tMin, maxAirTemperatureK: tMax, windSpeed,
    temperatureShape = 'ashrae-2009', peakHour = 15, minimumHour = 5, windAmplitude = 0, windPeakHour = 15,
    referenceHeightM = STANDARD_WIND_HEIGHT_M, cloudCover = 0,
  } = options;
  const dewPointK = options.dewPointK ?? tMin;
  if (!(tMin > 0 && tMax >= tMin)) throw new RangeError(`design day: need 0 K < minimum (${tMin} K) ≤ maximum (${tMax} K) air temperature`);
  if (!(windSpeed >= 0)) throw new RangeError(`design day: wind speed ${windSpeed} m/s must be ≥ 0`);
  if (!(windAmplitude >= 0 && windAmplitude <= windSpeed)) throw new RangeError(`design day: wind amplitude ${windAmplitude} m/s must lie within 0…wind speed (${windSpeed} m/s)`);
  if (!(cloudCover >= 0 && cloudCover <= 1)) throw new RangeError(`design day: cloud cover ${cloudCover} must lie within 0–1`);
  if (!(referenceHeightM > 0)) throw new RangeError(`design day: reference height ${referenceHeightM} m must be > 0`);
  if (!(peakHour > 0 && peakHour < 24)) throw new RangeError(`design day: peak hour ${peakHour} must lie within 0–24`);
  if (!(minimumHour >= 0 && minimumHour <= 24)) throw new RangeError(`design day: minimum hour ${minimumHour} must lie within 0–24`);
  if (!(dewPointK > 0)) throw new RangeError(`design day: dew point ${dewPointK} K must be > 0 K`);

  const sunriseCache = new Map<number, number>();
  /** Local clock hour of sunrise on run day `day`; 5 h (the ASHRAE minimum) when the day has none. */
  const sunriseHour = (day: number): number => {
    let r = sunriseCache.get(day);
    if (r === undefined) {
      const noonUtc = clock.utcMs(clock.runTimeOfLocal(day, 12 * 3600));
      const sd = sunriseSunset(noonUtc, site.latitudeDeg, site.longitudeDeg);
      r = sd.sunriseUtcMs === null ? 5 : clock.localSecondsOfDay((sd.sunriseUtcMs - clock.startUtcMs) / 1000) / 3600;
      if (!(r < peakHour)) r = 5;
      sunriseCache.set(day, r);
    }
    return r;
  };

  return {
    referenceHeightM,
    at(utcMs: number): AirState {
      const t = (utcMs - clock.startUtcMs) / 1000;
      const hour = clock.localSecondsOfDay(t) / 3600;
      const f = temperatureShape === 'ashrae-2009'
        ? fractionOfDailyRangeAshrae(hour)
        : temperatureShape === 'sinusoid'
          ? fractionOfDailyRangeSinusoid(hour, minimumHour)
          : fractionOfDailyRangeCosine(hour, sunriseHour(clock.dayIndex(t)), peakHour);
      const airTemperatureK = tMax - f * (tMax - tMin);
      return {
        airTemperatureK,
        windSpeed: windSpeed + windAmplitude * Math.cos((2 * Math.PI * (hour - windPeakHour)) / 24),
        cloudCover,
        dewPointK: Math.min(dewPointK, airTemperatureK),
      };
    },
  };
}
