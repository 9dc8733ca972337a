/**
 * Typical-meteorological-year weather (TMY3 and EPW files) as a WeatherSource: the parts
 * both readers share — the site, the hour-by-hour rows of one year, their placement on a calendar
 * year and the interpolation between them.
 *
 * Rows. A typical year has 8760 hourly rows, 1 January hour 1 to 31 December hour 24, in LOCAL
 * STANDARD TIME of the file's fixed UTC offset (no daylight saving). Each hour is named by its end
 * ("hour 1" is 00:00–01:00). The months come from different years; the year column is ignored and
 * the rows are placed on whatever calendar year the run uses.
 *
 * Placement in time, per quantity, as the two format descriptions define the values:
 * - irradiance (beam normal, diffuse horizontal) is the energy received during the hour that ends
 *   at the stamp (EnergyPlus EPW data dictionary: "during the number of minutes preceding the time
 *   indicated"; TMY3 likewise): an hourly mean, placed at the middle of its hour (stamp − 30 min);
 * - air temperature, dew point, wind speed and cloud cover are values "at the time indicated" (EPW
 *   data dictionary; TMY2/TMY3 manuals: observations made at the hour): placed at the stamp.
 * Between placed values the source interpolates linearly; across the year's end it interpolates from
 * 31 December's last values to 1 January's first (the typical year wraps). On 29 February of a leap
 * year the rows of 28 February are used again.
 *
 * Missing values. Air temperature and wind speed are needed: a missing value there is an error.
 * For the others the source falls back to a model and counts the rows it filled (`fallbacks`):
 * dew point → lowest air temperature within ±12 h (FAO-56, Allen et al. 1998, eq. 48, as in
 * csvFile.ts); cloud cover → linear interpolation between the nearest rows that have it (0 when no
 * row has it); beam normal / diffuse horizontal → left undefined for instants next to a missing row,
 * so that the model's clear-sky-with-cloud irradiance is used for that component (see solarAt).
 */
import { TZDate } from '@date-fns/tz';
import { celsiusToKelvin } from '../../physics/constants.ts';
import { STANDARD_WIND_HEIGHT_M } from '../../physics/outside/wind.ts';
import type { AirState } from '../../physics/outside/weather.ts';
import type { WeatherFileSite } from '../../model/inputs.ts';
import { DEW_POINT_TOLERANCE_K, WeatherFileError, type WeatherFileSource } from './csvFile.ts';

/** Rows of a typical year: 365 days × 24 hours (no 29 February). */
export const HOURS_PER_TYPICAL_YEAR = 8760;

/** The site a weather file describes, as its header gives it (the model's WeatherFileSite). */
export type TypicalYearSite = WeatherFileSite;

/** How many rows used a modelled value because the file's value was missing, per quantity. */
export interface TypicalYearFallbacks {
  readonly dewPoint: number;
  readonly cloudCover: number;
  readonly beamNormal: number;
  readonly diffuseHorizontal: number;
}

/** A typical year read from a file. */
export interface TypicalYearSource extends WeatherFileSource {
  readonly format: 'TMY3' | 'EPW';
  readonly site: TypicalYearSite;
  /** The calendar year the rows are placed on, or undefined when the year repeats for every year. */
  readonly calendarYear: number | undefined;
  readonly fallbacks: TypicalYearFallbacks;
}

/** Options of the typical-year readers. */
export interface TypicalYearOptions {
  /**
   * Calendar year to place the rows on: the source then covers 1 January 00:00 to 1 January of the
   * next year 00:00, local standard time. Without it the typical year repeats every year and
   * covers any instant.
   */
  readonly year?: number;
  /** Height above ground of the wind speed, m; default 10 (WMO standard). */
  readonly referenceHeightM?: number;
}

/** Hourly values in file units (°C, m/s, W/m², cloud fraction 0–1); NaN marks a missing value. */
export interface TypicalYearRows {
  readonly airTemperatureC: Float64Array;
  readonly dewPointC: Float64Array;
  readonly windSpeed: Float64Array;
  readonly beamNormal: Float64Array;
  readonly diffuseHorizontal: Float64Array;
  readonly cloudCover: Float64Array;
}

/** Empty rows for a full typical year. */
export function allocateRows(): TypicalYearRows {
  const a = () => new Float64Array(HOURS_PER_TYPICAL_YEAR).fill(NaN);
  return { airTemperatureC: a(), dewPointC: a(), windSpeed: a(), beamNormal: a(), diffuseHorizontal: a(), cloudCover: a() };
}

/** Month (1–12), day and hour ending (1–24) of row `k` of a typical year. Example: row 24 → 2 January, hour 1; row 8759 → 31 December, hour 24. */
export function stampOfRow(k: number): { month: number; day: number; hour: number } {
  const d = new Date(Date.UTC(2001, 0, 1 + Math.floor(k / 24))); // 2001: any year without 29 February
  return { month: d.getUTCMonth() + 1, day: d.getUTCDate(), hour: (k % 24) + 1 };
}

const p2 = (n: number) => String(n).padStart(2, '0');

/** "MM/DD hour HH" of a stamp, for messages. */
export function describeStamp(s: { month: number; day: number; hour: number }): string {
  return `${p2(s.month)}/${p2(s.day)} hour ending ${p2(s.hour)}:00`;
}

/**
 * Check that data row `k` carries the stamp a typical year expects there; throw a WeatherFileError
 * otherwise, on the column that is wrong (month, day or date, hour).
 */
export function checkStamp(
  k: number,
  got: { month: number; day: number; hour: number },
  where: { fileName: string; line: number; monthColumn?: string; dateColumn: string; hourColumn: string },
): void {
  if (k >= HOURS_PER_TYPICAL_YEAR) {
    throw new WeatherFileError(where.fileName, `more than ${HOURS_PER_TYPICAL_YEAR} data rows: a typical year ends with 12/31 hour ending 24:00`, where.line);
  }
  const want = stampOfRow(k);
  if (got.month === want.month && got.day === want.day && got.hour === want.hour) return;
  const column = got.month !== want.month ? (where.monthColumn ?? where.dateColumn) : got.day !== want.day ? where.dateColumn : where.hourColumn;
  const hint = got.month === 2 && got.day === 29 ? ' (a typical year has no 29 February)' : '';
  throw new WeatherFileError(
    where.fileName,
    `expected ${describeStamp(want)} as data row ${k + 1} (rows run hour by hour from 01/01 hour 1 to 12/31 hour 24), found ${describeStamp(got)}${hint}`,
    where.line,
    column,
  );
}

/** The error for a file that ends before the year is complete. */
export function shortFileError(fileName: string, rowsRead: number, lastLine: number): WeatherFileError {
  const next = rowsRead < HOURS_PER_TYPICAL_YEAR ? `; the next expected is ${describeStamp(stampOfRow(rowsRead))}` : '';
  return new WeatherFileError(fileName, `the file ends after ${rowsRead} data rows (line ${lastLine}); a typical year has ${HOURS_PER_TYPICAL_YEAR}${next}`);
}

const NUMBER_RE = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** How a numeric field is read. */
export interface FieldRule {
  /** Column (TMY3 header name or EPW field name) for messages. */
  readonly column: string;
  readonly unit: string;
  /** Accepted range, in file units (inclusive unless `exclusive`). */
  readonly min: number;
  readonly max: number;
  readonly exclusive?: boolean;
  /** Whether a raw text or value is the format's missing-value code. */
  readonly isMissing: (raw: string, value: number) => boolean;
  /** True for fields the model cannot do without (a missing value is an error). */
  readonly needed: boolean;
  /** How the missing code reads in messages, e.g. "99.9 or more". */
  readonly missingCode: string;
}

/**
 * Read one numeric field: its value, NaN for a missing value in a field that is not needed; throws
 * a WeatherFileError naming file, line and column for text that is not a number, a value out of
 * range, or a missing value in a needed field.
 */
export function readField(raw: string, rule: FieldRule, fileName: string, line: number): number {
  const text = raw.trim();
  const v = text === '' ? NaN : Number(text);
  if (text === '' || rule.isMissing(text, v)) {
    if (rule.needed) {
      const what = text === '' ? 'empty field' : `missing-value code ${text} (the format's code for no data is ${rule.missingCode})`;
      throw new WeatherFileError(fileName, `${what}, but the model needs this quantity at every hour`, line, rule.column);
    }
    return NaN;
  }
  if (!NUMBER_RE.test(text) || !Number.isFinite(v)) throw new WeatherFileError(fileName, `"${text}" is not a number`, line, rule.column);
  const below = rule.exclusive ? v <= rule.min : v < rule.min;
  const above = rule.exclusive ? v >= rule.max : v > rule.max;
  if (below || above) {
    const range = rule.exclusive ? `above ${rule.min} and below ${rule.max}` : `${rule.min}…${rule.max}`;
    throw new WeatherFileError(fileName, `${v} ${rule.unit} is outside the accepted range (${range} ${rule.unit})`, line, rule.column);
  }
  return v;
}

/** Read an integer field of a date or hour (no missing value allowed). */
export function readInteger(raw: string, column: string, min: number, max: number, fileName: string, line: number): number {
  const text = raw.trim();
  if (!/^[+-]?\d+$/.test(text)) throw new WeatherFileError(fileName, `"${text}" is not a whole number`, line, column);
  const v = Number(text);
  if (v < min || v > max) throw new WeatherFileError(fileName, `${v} is outside ${min}…${max}`, line, column);
  return v;
}

/** Throw when the dew point of a row is above its air temperature by more than the sensor tolerance. */
export function checkDewPoint(dewPointC: number, airTemperatureC: number, fileName: string, line: number, column: string): void {
  if (dewPointC > airTemperatureC + DEW_POINT_TOLERANCE_K) {
    throw new WeatherFileError(fileName, `dew point ${dewPointC} °C is above the air temperature ${airTemperatureC} °C (+${DEW_POINT_TOLERANCE_K} K allowed)`, line, column);
  }
}

/** The quantities a typical-year reader takes from each row (cloud in tenths, as both formats give it). */
export type TypicalYearField = 'airTemperatureC' | 'dewPointC' | 'windSpeed' | 'beamNormal' | 'diffuseHorizontal' | 'cloudTenths';

/**
 * Read the values of data row `k` into `rows`: each field through `readField` (its raw text from
 * `cellOf`, undefined for a column the file does not have), cloud tenths to a fraction, and the dew
 * point checked against the air temperature.
 */
export function readRowValues(
  rows: TypicalYearRows,
  k: number,
  fields: Readonly<Record<TypicalYearField, FieldRule>>,
  cellOf: (rule: FieldRule) => string | undefined,
  fileName: string,
  line: number,
): void {
  const target: Record<TypicalYearField, Float64Array> = {
    airTemperatureC: rows.airTemperatureC,
    dewPointC: rows.dewPointC,
    windSpeed: rows.windSpeed,
    beamNormal: rows.beamNormal,
    diffuseHorizontal: rows.diffuseHorizontal,
    cloudTenths: rows.cloudCover,
  };
  for (const key of Object.keys(target) as TypicalYearField[]) {
    const raw = cellOf(fields[key]);
    if (raw !== undefined) target[key][k] = readField(raw, fields[key], fileName, line);
  }
  rows.cloudCover[k] /= 10; // tenths → fraction
  if (!Number.isNaN(rows.dewPointC[k])) checkDewPoint(rows.dewPointC[k], rows.airTemperatureC[k], fileName, line, fields.dewPointC.column);
}

/** Split one line of comma-separated values; double-quoted fields may hold commas ("" is a quote). */
export function splitCsvLine(line: string): string[] {
  const out: string[] = [];
  let cur = '';
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i];
    if (quoted) {
      if (ch === '"' && line[i + 1] === '"') {
        cur += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else cur += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') {
      out.push(cur);
      cur = '';
    } else cur += ch;
  }
  out.push(cur);
  return out;
}

/** Lines of a text file (BOM and a final line break removed). */
export function linesOf(text: string): string[] {
  const lines = text.replace(/^\uFEFF/, '').split(/\r?\n/);
  while (lines.length > 0 && lines[lines.length - 1].trim() === '') lines.pop();
  return lines;
}

/** Rules for the site numbers of a header, in degrees, hours and metres. */
export const SITE_RANGES = {
  latitudeDeg: { min: -90, max: 90, unit: '°' },
  longitudeDeg: { min: -180, max: 180, unit: '°' },
  // UTC offsets of the world's zones run from −12 h to +14 h
  utcOffsetHours: { min: -12, max: 14, unit: 'h' },
  elevationM: { min: -1000, max: 9999, unit: 'm' },
} as const;

/** Read a site number with the range of {@link SITE_RANGES}; errors name `column` on `line`. */
export function readSiteNumber(raw: string, key: keyof typeof SITE_RANGES, column: string, fileName: string, line: number): number {
  const r = SITE_RANGES[key];
  return readField(raw ?? '', { column, unit: r.unit, min: r.min, max: r.max, isMissing: () => false, needed: true, missingCode: '(none)' }, fileName, line);
}

const HOUR_MS = 3_600_000;
const isLeap = (y: number) => (y % 4 === 0 && y % 100 !== 0) || y % 400 === 0;
const hoursIn = (y: number) => (isLeap(y) ? 8784 : 8760);

/** Typical-year row used for hour slot `s` (0 = 00:00–01:00 on 1 January) of calendar year `y`. */
function rowOfSlot(y: number, s: number): number {
  if (s < 0) return rowOfSlot(y - 1, s + hoursIn(y - 1));
  if (s >= hoursIn(y)) return rowOfSlot(y + 1, s - hoursIn(y));
  let day = Math.floor(s / 24);
  if (isLeap(y) && day >= 59) day = day === 59 ? 58 : day - 1; // 29 February repeats 28 February
  return day * 24 + (s % 24);
}

/**
 * Bracketing rows and weight for local standard time `lstMs` (ms, UTC-like epoch of local clock
 * readings) when row k is placed `phaseHours` after the start of its hour slot k.
 */
function bracket(lstMs: number, phaseHours: number): { a: number; b: number; w: number } {
  const y = new Date(lstMs).getUTCFullYear();
  const p = (lstMs - Date.UTC(y, 0, 1)) / HOUR_MS - phaseHours;
  const s = Math.floor(p);
  return { a: rowOfSlot(y, s), b: rowOfSlot(y, s + 1), w: p - s };
}

/** Lowest air temperature within ±12 rows (hours), wrapping round the year (FAO-56 eq. 48). */
function dewPointFromMinimum(air: Float64Array, k: number): number {
  const n = air.length;
  let m = Infinity;
  for (let d = -12; d <= 12; d++) m = Math.min(m, air[(k + d + n) % n]);
  return m;
}

/** Fill NaN entries by linear interpolation between the nearest valid entries, wrapping round the year; all NaN → `whenNone`. */
function fillLinearPeriodic(values: Float64Array, whenNone: number): number {
  const n = values.length;
  const valid: number[] = [];
  for (let k = 0; k < n; k++) if (!Number.isNaN(values[k])) valid.push(k);
  if (valid.length === 0) {
    values.fill(whenNone);
    return n;
  }
  let filled = 0;
  for (let j = 0; j < valid.length; j++) {
    const a = valid[j];
    const b = valid[(j + 1) % valid.length];
    const gap = (b - a + n) % n || n;
    for (let d = 1; d < gap; d++) {
      values[(a + d) % n] = values[a] + ((values[b] - values[a]) * d) / gap;
      filled++;
    }
  }
  return filled;
}

/** ISO 8601 text of `utcMs` in the file's local standard time, e.g. 2026-01-01T00:00:00+01:00. */
function isoStandard(utcMs: number, offsetHours: number): string {
  if (!Number.isFinite(utcMs)) return String(utcMs);
  const d = new Date(utcMs + offsetHours * HOUR_MS);
  const offMin = Math.round(offsetHours * 60);
  const sign = offMin >= 0 ? '+' : '-';
  return `${d.toISOString().slice(0, 19)}${sign}${p2(Math.floor(Math.abs(offMin) / 60))}:${p2(Math.abs(offMin) % 60)}`;
}

/**
 * Build the weather source of a typical year from complete rows (see the module note for the
 * placement, interpolation and fallbacks). `rows` is modified: missing dew points and cloud covers
 * are filled in.
 */
export function makeTypicalYearSource(
  rows: TypicalYearRows,
  site: TypicalYearSite,
  fileName: string,
  format: TypicalYearSource['format'],
  options: TypicalYearOptions = {},
): TypicalYearSource {
  const { year } = options;
  if (year !== undefined && !(Number.isInteger(year) && year >= 1 && year <= 9999)) throw new RangeError(`year ${year} is not a calendar year (1…9999)`);
  const referenceHeightM = options.referenceHeightM ?? STANDARD_WIND_HEIGHT_M;
  const n = HOURS_PER_TYPICAL_YEAR;
  const air = rows.airTemperatureC;

  let dewFilled = 0;
  for (let k = 0; k < n; k++) {
    if (Number.isNaN(rows.dewPointC[k])) {
      rows.dewPointC[k] = dewPointFromMinimum(air, k);
      dewFilled++;
    }
  }
  const cloudFilled = fillLinearPeriodic(rows.cloudCover, 0);
  const countMissing = (a: Float64Array) => a.reduce((c, v) => c + (Number.isNaN(v) ? 1 : 0), 0);
  const fallbacks: TypicalYearFallbacks = {
    dewPoint: dewFilled,
    cloudCover: cloudFilled,
    beamNormal: countMissing(rows.beamNormal),
    diffuseHorizontal: countMissing(rows.diffuseHorizontal),
  };

  const offsetMs = site.utcOffsetHours * HOUR_MS;
  const firstUtcMs = year === undefined ? -Infinity : Date.UTC(year, 0, 1) - offsetMs;
  const lastUtcMs = year === undefined ? Infinity : Date.UTC(year + 1, 0, 1) - offsetMs;
  const iso = (utcMs: number) => isoStandard(utcMs, site.utcOffsetHours);
  const spanText = year === undefined ? 'every year' : `${iso(firstUtcMs)} to ${iso(lastUtcMs)}`;

  return {
    format,
    site,
    fileName,
    referenceHeightM,
    // hourly rows, interpolated linearly: the automatic mesh resolves the hour at the outer surface
    timeStepS: HOUR_MS / 1000,
    calendarYear: year,
    firstUtcMs,
    lastUtcMs,
    rowCount: n,
    hasIrradiance: fallbacks.beamNormal < n && fallbacks.diffuseHorizontal < n,
    fallbacks,
    coversRange(utcStartMs, utcEndMs) {
      if (utcStartMs >= firstUtcMs && utcEndMs <= lastUtcMs) return { covered: true };
      return { covered: false, message: `${fileName} (typical year placed on ${year}) covers ${spanText}, but the run needs ${iso(utcStartMs)} to ${iso(utcEndMs)}` };
    },
    at(utcMs: number): AirState {
      if (!(utcMs >= firstUtcMs && utcMs <= lastUtcMs)) {
        throw new WeatherFileError(fileName, `no data at ${iso(utcMs)}: the typical year is placed on ${spanText}`);
      }
      const lst = utcMs + offsetMs;
      const met = bracket(lst, 1); // values at the stamp (hour end)
      // exactly on a placed value, that value alone (a missing neighbour does not matter there)
      const lerp = (v: Float64Array, x: { a: number; b: number; w: number }) => (x.w === 0 ? v[x.a] : v[x.a] + (v[x.b] - v[x.a]) * x.w);
      const airTemperatureK = celsiusToKelvin(lerp(air, met));
      const sun = bracket(lst, 0.5); // hourly means at mid-hour
      const beam = lerp(rows.beamNormal, sun);
      const diffuse = lerp(rows.diffuseHorizontal, sun);
      return {
        airTemperatureK,
        windSpeed: lerp(rows.windSpeed, met),
        cloudCover: Math.min(1, Math.max(0, lerp(rows.cloudCover, met))),
        dewPointK: Math.min(celsiusToKelvin(lerp(rows.dewPointC, met)), airTemperatureK),
        ...(Number.isNaN(beam) ? {} : { beamNormal: beam }),
        ...(Number.isNaN(diffuse) ? {} : { diffuseHorizontal: diffuse }),
      };
    },
  };
}

/**
 * The standard (winter-time) UTC offset of an IANA zone in `year`, hours: the smaller of its
 * offsets on 1 January and 1 July (daylight saving only ever adds). Example: Europe/Copenhagen → 1.
 */
export function standardUtcOffsetHours(timeZone: string, year: number): number {
  const off = (month: number) => -new TZDate(Date.UTC(year, month, 1, 12), timeZone).getTimezoneOffset() / 60;
  return Math.min(off(0), off(6));
}

/** Mean Earth radius, km (IUGG mean radius R1 = 6371.0088 km). */
const EARTH_RADIUS_KM = 6371.0088;

/**
 * Great-circle distance between two points, km (haversine formula on a sphere of the mean Earth
 * radius; error below 0.5 % against the ellipsoid). Example: 56.2 N 10.1 E to 55.6761 N 12.5683 E
 * (central Copenhagen) ≈ 164 km; one degree along a meridian = πR/180 = 111.195 km.
 */
export function greatCircleDistanceKm(latADeg: number, lonADeg: number, latBDeg: number, lonBDeg: number): number {
  const r = Math.PI / 180;
  const dLat = (latBDeg - latADeg) * r;
  const dLon = (lonBDeg - lonADeg) * r;
  const h = Math.sin(dLat / 2) ** 2 + Math.cos(latADeg * r) * Math.cos(latBDeg * r) * Math.sin(dLon / 2) ** 2;
  return 2 * EARTH_RADIUS_KM * Math.asin(Math.min(1, Math.sqrt(h)));
}
