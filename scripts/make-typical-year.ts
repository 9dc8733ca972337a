/**
 * Writes scenarios/weather/brennholm-typical-year.epw: an INVENTED typical year of hourly weather
 * for the invented demo site "Brennholm heating plant" (56.2° N, 10.1° E, 35 m, local standard
 * time UTC+1), in the EPW format read by src/input/weather/epw.ts.
 *
 *   npx tsx scripts/make-typical-year.ts
 *
 * Nothing here is measured. The climate is a plausible Danish-coast one made from a few monthly
 * numbers (below) and seeded random weather, so that the same seed always gives the same bytes:
 * - air temperature: the monthly means interpolated to each day, a synoptic anomaly (an hourly
 *   first-order autoregressive process with a ~3-day memory, less its own monthly means so that
 *   each month stays typical), and a daily cycle peaking at 14:30 whose range shrinks under cloud;
 * - cloud: a logistic transform of a ~30-hour autoregressive process about the monthly mean cover;
 * - wind: a log-normal ~36-hour autoregressive process about the monthly mean, a little stronger in
 *   the afternoon; direction wandering about west-south-west;
 * - dew point: the air temperature less a depression that is larger in sunny afternoons;
 * - irradiance: hourly means of the ASHRAE clear-sky model reduced for the hour's cloud by Kasten &
 *   Czeplak (the model's own functions in src/physics/sun), sampled every 10 minutes with the sun
 *   position from suncalc (reference year 2025), so it is zero when the sun is down;
 * - horizontal infrared from the sky emissivity formula of the EPW data dictionary (Walton 1983;
 *   Clark & Allen 1978), relative humidity from the Magnus formula (Sonntag 1990 coefficients);
 * - every field the demo does not model carries the EPW missing-value code.
 */
import { writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { SOLAR_CONSTANT, STEFAN_BOLTZMANN } from '../src/physics/constants.ts';
import { clearSkyAshrae, cloudReducedIrradiance } from '../src/physics/sun/irradiance.ts';
import { sunPosition } from '../src/physics/sun/position.ts';
import { seededNormal, seededUniform } from './random.ts';

export const DEMO_SEED = 56201;
export const DEMO_FILE = join(dirname(fileURLToPath(import.meta.url)), '..', 'scenarios', 'weather', 'brennholm-typical-year.epw');

const SITE = { name: 'Brennholm heating plant (invented)', latitudeDeg: 56.2, longitudeDeg: 10.1, elevationM: 35, utcOffsetHours: 1 };

// Invented monthly climate, January first (plausible for a Danish coast; not any station's normals).
const MEAN_AIR_C = [1.0, 0.8, 2.8, 6.6, 11.0, 14.4, 17.0, 16.8, 13.6, 9.6, 5.4, 2.4];
const DAILY_RANGE_K = [3.5, 4.0, 5.5, 7.5, 8.5, 8.5, 8.0, 7.5, 6.5, 5.0, 3.8, 3.3];
const MEAN_CLOUD = [0.78, 0.74, 0.68, 0.62, 0.58, 0.6, 0.6, 0.6, 0.64, 0.7, 0.78, 0.8];
const MEAN_WIND_M_S = [6.6, 6.3, 6.0, 5.2, 4.7, 4.4, 4.3, 4.4, 5.0, 5.7, 6.1, 6.4];
const DEW_DEPRESSION_K = [1.6, 1.9, 2.6, 3.8, 4.6, 4.8, 4.6, 4.2, 3.4, 2.5, 1.8, 1.6];
const ANOMALY_SD_K = [2.8, 2.8, 2.4, 2.0, 1.8, 1.7, 1.7, 1.7, 1.8, 2.0, 2.4, 2.8];
const MONTH_DAYS = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
const REFERENCE_YEAR = 2025; // for the sun's position only (not a leap year)

/** First-order autoregressive process with unit variance and memory `hours` (e-folding). */
function ar1(n: () => number, hours: number): () => number {
  const phi = Math.exp(-1 / hours);
  const s = Math.sqrt(1 - phi * phi);
  let x = n();
  return () => (x = phi * x + s * n());
}

/** A monthly value at day-of-year `doy` (0-based, fractional), interpolated linearly between mid-months, wrapping. */
function daily(monthly: readonly number[], doy: number): number {
  const mids: number[] = [];
  let start = 0;
  for (const d of MONTH_DAYS) {
    mids.push(start + d / 2);
    start += d;
  }
  let i = mids.findIndex((m) => m > doy) - 1;
  if (i === -2) i = 11; // after mid-December
  const j = (i + 12) % 12;
  const k = (j + 1) % 12;
  const a = i === -1 ? mids[11] - 365 : mids[j];
  const b = k === 0 && j === 11 ? mids[0] + 365 : mids[k];
  return monthly[j] + ((monthly[k] - monthly[j]) * (doy - a)) / (b - a);
}

/** Saturation vapour pressure over water, hPa (Magnus form, Sonntag 1990: 6.112 exp(17.62 t/(243.12 + t))). */
const saturationHpa = (c: number) => 6.112 * Math.exp((17.62 * c) / (243.12 + c));

/** The EPW text of the invented typical year for `seed`. */
export function makeTypicalYearEpw(seed = DEMO_SEED): string {
  const u = seededUniform(seed);
  const n = seededNormal(u);
  const anomaly = ar1(n, 72);
  const cloudZ = ar1(n, 30);
  const windZ = ar1(n, 36);
  const dirZ = ar1(n, 24);
  const pressureZ = ar1(n, 48);
  const monthYear = MONTH_DAYS.map(() => 1996 + Math.floor(u() * 20)); // a typical year mixes years

  // the random weather, hour by hour
  const hours = 8760;
  const draw = (next: () => number) => Float64Array.from({ length: hours }, next);
  const zAnomaly = draw(anomaly);
  const zCloud = draw(cloudZ);
  const zWind = draw(windZ);
  const zDirection = draw(dirZ);
  const zPressure = draw(pressureZ);
  const zDew = draw(n);
  // A typical year is made of typical months: take out each month's mean anomaly, interpolated
  // between mid-months like the climate numbers, so that monthly means stay near their targets.
  const monthOf = (k: number) => new Date(Date.UTC(2001, 0, 1 + Math.floor(k / 24))).getUTCMonth();
  const monthlyMeans = (z: Float64Array) =>
    MONTH_DAYS.map((_, m) => {
      let sum = 0;
      let count = 0;
      for (let k = 0; k < hours; k++) if (monthOf(k) === m) (sum += z[k]), count++;
      return sum / count;
    });
  // the interpolated correction of one pass leaves a little of each month's mean: a few passes remove it
  for (let pass = 0; pass < 8; pass++) {
    const means = monthlyMeans(zAnomaly);
    for (let k = 0; k < hours; k++) zAnomaly[k] -= daily(means, (k + 1) / 24);
  }

  const lines = [
    `LOCATION,${SITE.name},-,DNK,INVENTED demo data,000000,${SITE.latitudeDeg.toFixed(2)},${SITE.longitudeDeg.toFixed(2)},${SITE.utcOffsetHours.toFixed(1)},${SITE.elevationM.toFixed(1)}`,
    'DESIGN CONDITIONS,0',
    'TYPICAL/EXTREME PERIODS,0',
    'GROUND TEMPERATURES,0',
    'HOLIDAYS/DAYLIGHT SAVINGS,No,0,0,0',
    `COMMENTS 1,INVENTED DATA FOR A DEMO - not measured - made by scripts/make-typical-year.ts (seed ${seed}) - a plausible Danish-coast climate for the invented Brennholm heating plant`,
    'COMMENTS 2,INVENTED DATA - not for design or for any real site - irradiance from the ASHRAE clear-sky model with Kasten-Czeplak cloud reduction - fields not modelled carry the EPW missing codes',
    'DATA PERIODS,1,1,Data,Thursday, 1/ 1,12/31',
  ];

  let doy = 0;
  let k = 0;
  for (let month = 1; month <= 12; month++) {
    for (let day = 1; day <= MONTH_DAYS[month - 1]; day++, doy++) {
      for (let hour = 1; hour <= 24; hour++, k++) {
        const m = month - 1;
        const t = doy + hour / 24; // the stamp, days since 1 January 00:00 LST
        const zc = zCloud[k];
        const zw = zWind[k];
        const cloud = 1 / (1 + Math.exp(-(Math.log(daily(MEAN_CLOUD, t) / (1 - daily(MEAN_CLOUD, t))) + 1.6 * zc + 0.4 * zw)));
        const totalTenths = Math.round(cloud * 10);
        const opaqueTenths = Math.max(0, totalTenths - 1);
        const cover = totalTenths / 10;

        const dayPhase = Math.cos((2 * Math.PI * (hour - 14.5)) / 24);
        const range = daily(DAILY_RANGE_K, t) * (1.35 - 0.7 * cover);
        const air = daily(MEAN_AIR_C, t) + daily(ANOMALY_SD_K, t) * zAnomaly[k] + (range / 2) * dayPhase;
        const depression = Math.max(0.3, daily(DEW_DEPRESSION_K, t) * (1.2 - 0.6 * cover) * (1 + 0.4 * dayPhase) + 0.3 * zDew[k]);
        const airText = air.toFixed(1);
        const dewText = Math.min(Number(airText), Number((air - depression).toFixed(1))).toFixed(1);
        const rh = Math.min(100, Math.round((100 * saturationHpa(Number(dewText))) / saturationHpa(Number(airText))));
        const wind = Math.min(25, Math.max(0.3, daily(MEAN_WIND_M_S, t) * Math.exp(0.35 * zw - 0.35 ** 2 / 2) * (1 + 0.12 * Math.sin((2 * Math.PI * (hour - 9)) / 24))));
        const windText = wind.toFixed(1);
        const direction = Number(windText) < 0.5 ? 0 : Math.round((((250 + 70 * zDirection[k]) % 360) + 360) % 360);
        const pressure = Math.round(100900 + 1100 * zPressure[k]);

        // hourly means over the hour ending at the stamp, sampled at 10-minute mid-points
        const lstHourStart = Date.UTC(REFERENCE_YEAR, 0, 1 + doy, hour - 1);
        let beam = 0;
        let diffuse = 0;
        let global = 0;
        let extraHorizontal = 0;
        let extraNormal = 0;
        const eccentricity = 1 + 0.033 * Math.cos((2 * Math.PI * (doy + 1)) / 365);
        for (let s = 0; s < 6; s++) {
          const utc = lstHourStart + (s * 10 + 5) * 60_000 - SITE.utcOffsetHours * 3_600_000;
          const alt = sunPosition(utc, SITE.latitudeDeg, SITE.longitudeDeg).altitudeDeg;
          if (!(alt > 0)) continue;
          const sinAlt = Math.sin((alt * Math.PI) / 180);
          const irr = cloudReducedIrradiance(clearSkyAshrae(month, alt), alt, cover);
          beam += irr.beamNormal / 6;
          diffuse += irr.diffuseHorizontal / 6;
          global += (irr.beamNormal * sinAlt + irr.diffuseHorizontal) / 6;
          extraHorizontal += (SOLAR_CONSTANT * eccentricity * sinAlt) / 6;
          extraNormal += (SOLAR_CONSTANT * eccentricity) / 6;
        }
        const dewK = Number(dewText) + 273.15;
        const emissivity = (0.787 + 0.764 * Math.log(dewK / 273)) * (1 + 0.0224 * opaqueTenths - 0.0035 * opaqueTenths ** 2 + 0.00028 * opaqueTenths ** 3);
        const infrared = emissivity * STEFAN_BOLTZMANN * (Number(airText) + 273.15) ** 4;

        lines.push(
          [
            monthYear[m], month, day, hour, 0, '?9?9?9?9E0?9?9?9?9?9?9?9?9?9?9?9?9?9*9*9?9?9?9',
            airText, dewText, rh, pressure,
            Math.round(extraHorizontal), Math.round(extraNormal), Math.round(infrared),
            Math.round(global), Math.round(beam), Math.round(diffuse),
            999999, 999999, 999999, 9999,
            direction, windText, totalTenths, opaqueTenths,
            9999, 99999, 9, 999999999, 999, 0.999, 999, 99, 999, 999, 99,
          ].join(','),
        );
      }
    }
  }
  return lines.join('\n') + '\n';
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  writeFileSync(DEMO_FILE, makeTypicalYearEpw());
  console.log(`wrote ${DEMO_FILE}`);
}
