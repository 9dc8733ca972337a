/**
 * Weather from a CSV file, hourly or finer (any spacing of rows), as a {@link WeatherSource}.
 *
 * Header columns (any order; unknown columns are ignored; lines starting with `#` are comments):
 * - `time` — ISO 8601 local time `YYYY-MM-DDTHH:MM[:SS[.fff]]`, optionally with an offset (`Z`,
 *   `+02:00`, `-0700`). Without an offset the time is the site's local clock time in the site's
 *   time zone; in the repeated hour when clocks go back such times are ambiguous (they collide as
 *   duplicates) — give offsets there.
 * - `air_temperature_c` (−90…+60 °C), `wind_speed_m_s` (0…75 m/s) — required.
 * - `beam_normal_w_m2`, `diffuse_horizontal_w_m2` (0…1400 W/m²; both or neither),
 *   `cloud_cover` (0–1, default 0), `dew_point_c` (≤ air temperature + 0.5 K; without it the dew
 *   point is the lowest air temperature within ±12 h, after FAO-56, Allen et al. 1998, eq. 48) —
 *   optional.
 *
 * Values are instantaneous at their time stamps and interpolated linearly in time. Rows must be
 * strictly increasing in time with no gap longer than {@link MAX_GAP_HOURS} (nothing limits how
 * close they may be: sub-hourly files are read the same way, and the shortest spacing is the
 * source's `timeStepS`, which the automatic mesh resolves at the outer surface), and have no more
 * cells than the header has columns (a decimal comma splits a number into two cells: numbers use a
 * decimal point). Dates are calendar dates from 1900-01-01 to 2199-12-31. Every row with a problem
 * is reported (up to {@link MAX_ROW_PROBLEMS}); text from the file is shown printable.
 */
import { TZDate } from '@date-fns/tz';
import { parse } from 'csv-parse/sync';
import { calendarDate, EARLIEST_DATE, LATEST_DATE, type SiteClock } from '../../model/clock.ts';
import { printable } from '../text.ts';
import { celsiusToKelvin } from '../../physics/constants.ts';
import { STANDARD_WIND_HEIGHT_M } from '../../physics/outside/wind.ts';
import type { AirState, WeatherSource } from '../../physics/outside/weather.ts';

/** Longest allowed time between consecutive rows, h. Hourly data with up to two missing rows pass. */
export const MAX_GAP_HOURS = 3;

/** A problem in a weather file, located by file, line (1-based) and column where known. */
export class WeatherFileError extends Error {
  readonly fileName: string;
  readonly line?: number;
  readonly column?: string;
  constructor(fileName: string, problem: string, line?: number, column?: string) {
    const where = [fileName, line !== undefined ? `line ${line}` : undefined, column !== undefined ? `column "${column}"` : undefined]
      .filter((x) => x !== undefined)
      .join(', ');
    super(`${where}: ${problem}`);
    this.name = 'WeatherFileError';
    this.fileName = fileName;
    this.line = line;
    this.column = column;
  }

  /** The messages of further problems found in other rows (this error's message is the first). */
  more: readonly string[] = [];
}

/** Rows with problems reported before reading stops (a file with a systematic mistake has one in every row). */
export const MAX_ROW_PROBLEMS = 10;

/** Column names, what they hold and accepted ranges (in file units). */
const COLUMNS = {
  air_temperature_c: { what: 'the air temperature', min: -90, max: 60, unit: '°C', required: true },
  wind_speed_m_s: { what: 'the wind speed', min: 0, max: 75, unit: 'm/s', required: true },
  beam_normal_w_m2: { what: 'the beam normal irradiance', min: 0, max: 1400, unit: 'W/m²', required: false },
  diffuse_horizontal_w_m2: { what: 'the diffuse horizontal irradiance', min: 0, max: 1400, unit: 'W/m²', required: false },
  cloud_cover: { what: 'the cloud cover', min: 0, max: 1, unit: '(fraction)', required: false },
  dew_point_c: { what: 'the dew point', min: -100, max: 60.5, unit: '°C', required: false },
} as const;
type ColumnName = keyof typeof COLUMNS;

/** Dew point may exceed the air temperature by this much before a row is rejected (sensor noise), K. */
export const DEW_POINT_TOLERANCE_K = 0.5;

/** A weather source read from a file, with its span. */
export interface WeatherFileSource extends WeatherSource {
  readonly fileName: string;
  /** UTC instants (ms) of the first and last rows. */
  readonly firstUtcMs: number;
  readonly lastUtcMs: number;
  /** Number of data rows. */
  readonly rowCount: number;
  /** True when the file gives measured beam normal and diffuse horizontal irradiance. */
  readonly hasIrradiance: boolean;
  /** Whether [utcStartMs, utcEndMs] lies inside the file's span; if not, a message saying what is missing. */
  coversRange(utcStartMs: number, utcEndMs: number): { covered: true } | { covered: false; message: string };
}

/** Options of {@link parseWeatherCsv}. */
export interface WeatherCsvOptions {
  /** Height above ground of `wind_speed_m_s`, m; default 10 (WMO standard). */
  readonly referenceHeightM?: number;
}

const TIME_RE = /^(\d{4})-(\d{2})-(\d{2})[T ](\d{2}):(\d{2})(?::(\d{2})(?:\.(\d{1,3})\d*)?)?(Z|[+-]\d{2}(?::?\d{2})?)?$/;

/**
 * Parse an ISO 8601 time stamp to UTC ms; local times (no offset) are read in `timeZone`.
 * Returns an error text instead of throwing.
 */
function parseTime(text: string, timeZone: string): number | string {
  const m = TIME_RE.exec(text);
  if (!m) return `time "${printable(text, 40)}" is not ISO 8601; expected YYYY-MM-DDTHH:MM[:SS][offset], e.g. 2026-07-15T13:00`;
  const [y, mo, d, h, mi] = [1, 2, 3, 4, 5].map((i) => Number(m[i]));
  const s = m[6] ? Number(m[6]) : 0;
  const ms = m[7] ? Number(m[7].padEnd(3, '0')) : 0;
  if (!calendarDate(y, mo, d) || h > 23 || mi > 59 || s > 59)
    return `time "${text}" is not a valid date and time; expected a calendar date from ${EARLIEST_DATE} to ${LATEST_DATE} and a time from 00:00 to 23:59`;
  const off = m[8];
  if (off !== undefined) {
    let offsetMin = 0;
    if (off !== 'Z') {
      const digits = off.slice(1).replace(':', '');
      offsetMin = (off[0] === '-' ? -1 : 1) * (Number(digits.slice(0, 2)) * 60 + Number(digits.slice(2) || 0));
    }
    return Date.UTC(y, mo - 1, d, h, mi, s, ms) - offsetMin * 60_000;
  }
  const local = new TZDate(y, mo - 1, d, h, mi, s, ms, timeZone);
  if (local.getHours() !== h || local.getMinutes() !== mi) return `local time "${text}" does not exist in ${timeZone} (clocks move forward then); give an offset`;
  return local.getTime();
}

interface Row {
  utcMs: number;
  line: number;
  values: Partial<Record<ColumnName, number>>;
}

/**
 * Read a weather CSV (see the module comment for the columns). Throws
 * {@link WeatherFileError} naming the file, line and column of the first problem found.
 */
export function parseWeatherCsv(text: string, clock: SiteClock, fileName: string, options: WeatherCsvOptions = {}): WeatherFileSource {
  const referenceHeightM = options.referenceHeightM ?? STANDARD_WIND_HEIGHT_M;
  let records: { record: string[]; info: { lines: number } }[];
  try {
    records = parse(text, { info: true, skip_empty_lines: true, trim: true, comment: '#', relax_column_count: true, bom: true }) as unknown as typeof records;
  } catch (e) {
    const err = e as { message: string; lines?: number };
    throw new WeatherFileError(fileName, `not readable as CSV: ${printable(err.message, 160)}`, err.lines);
  }
  if (records.length === 0) throw new WeatherFileError(fileName, 'the file is empty (expected a header line with time, air_temperature_c, wind_speed_m_s)');
  const header = records[0].record;
  const headerLine = records[0].info.lines;
  const index = new Map<string, number>();
  header.forEach((name, i) => {
    if (index.has(name)) throw new WeatherFileError(fileName, `column "${printable(name, 40)}" appears twice in the header`, headerLine, printable(name, 40));
    index.set(name, i);
  });
  for (const name of ['time', 'air_temperature_c', 'wind_speed_m_s']) {
    if (!index.has(name)) {
      const found = printable(header.join(', '), 120);
      const hint = header.length === 1 && /[;\t]/.test(header[0]!) ? '; the cells seem to be separated by ";" or tabs, expected commas (and decimal points)' : '';
      throw new WeatherFileError(fileName, `required column "${name}" is missing from the header (found: ${found})${hint}`, headerLine, name);
    }
  }
  if (index.has('beam_normal_w_m2') !== index.has('diffuse_horizontal_w_m2')) {
    const missing = index.has('beam_normal_w_m2') ? 'diffuse_horizontal_w_m2' : 'beam_normal_w_m2';
    throw new WeatherFileError(fileName, `measured irradiance needs both beam_normal_w_m2 and diffuse_horizontal_w_m2; "${missing}" is missing`, headerLine, missing);
  }
  const present = (Object.keys(COLUMNS) as ColumnName[]).filter((c) => index.has(c));
  const timeCol = index.get('time') as number;

  const rows: Row[] = [];
  const problems: WeatherFileError[] = [];
  // every row is read; a row with a problem is left out of the checks of time order
  const readRow = (record: string[], line: number): Row => {
    if (record.length > header.length) throw new WeatherFileError(fileName, extraCells(record, header.length), line);
    const cell = (name: string): string => {
      const i = index.get(name) as number;
      const v = i < record.length ? record[i] : '';
      if (v === '') throw new WeatherFileError(fileName, 'empty cell', line, name);
      return v;
    };
    const utc = parseTime(cell('time'), clock.timeZone);
    if (typeof utc === 'string') throw new WeatherFileError(fileName, utc, line, header[timeCol]);
    const values: Row['values'] = {};
    for (const name of present) {
      const raw = cell(name);
      const v = Number(raw);
      const c = COLUMNS[name];
      const expected = `expected ${c.what} in ${c.unit} from ${c.min} to ${c.max}`;
      if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(raw) || !Number.isFinite(v)) {
        const comma = /^[+-]?\d+,\d+$/.test(raw) ? ` (a decimal comma? write ${raw.replace(',', '.')})` : '';
        throw new WeatherFileError(fileName, `"${printable(raw, 40)}" is not a number${comma}; ${expected}`, line, name);
      }
      if (v < c.min || v > c.max) throw new WeatherFileError(fileName, `${v} ${c.unit} is outside the accepted range ${c.min}…${c.max} ${c.unit}; ${expected}`, line, name);
      values[name] = v;
    }
    if (values.dew_point_c !== undefined && values.dew_point_c > (values.air_temperature_c as number) + DEW_POINT_TOLERANCE_K) {
      throw new WeatherFileError(fileName, `dew point ${values.dew_point_c} °C is above the air temperature ${values.air_temperature_c} °C (+${DEW_POINT_TOLERANCE_K} K allowed)`, line, 'dew_point_c');
    }
    const prev = rows[rows.length - 1];
    if (prev) {
      if (utc === prev.utcMs) throw new WeatherFileError(fileName, `time repeats the instant of line ${prev.line} (duplicate; in the hour when clocks go back give offsets)`, line, 'time');
      if (utc < prev.utcMs) throw new WeatherFileError(fileName, `time is earlier than on line ${prev.line}: rows must be sorted by time`, line, 'time');
      const gapH = (utc - prev.utcMs) / 3_600_000;
      if (gapH > MAX_GAP_HOURS) throw new WeatherFileError(fileName, `gap of ${gapH.toFixed(2)} h after line ${prev.line} exceeds the ${MAX_GAP_HOURS} h allowed`, line, 'time');
    }
    return { utcMs: utc, line, values };
  };
  for (let r = 1; r < records.length && problems.length < MAX_ROW_PROBLEMS; r++) {
    try {
      rows.push(readRow(records[r].record, records[r].info.lines));
    } catch (e) {
      if (!(e instanceof WeatherFileError)) throw e;
      problems.push(e);
    }
  }
  if (problems.length > 0) {
    const first = problems[0];
    first.more = problems.slice(1).map((p) => p.message);
    if (problems.length === MAX_ROW_PROBLEMS) first.more = [...first.more, `${fileName}: reading stopped after ${MAX_ROW_PROBLEMS} rows with problems`];
    throw first;
  }
  if (rows.length < 2) throw new WeatherFileError(fileName, `needs at least two data rows, found ${rows.length}`);
  return makeSource(rows, fileName, referenceHeightM, present, clock.timeZone);
}

/**
 * The message for a row with more cells than the header has columns. Decimal commas are the usual
 * cause (`12,5` is read as two cells): said so when the row's cells are all numbers or times.
 */
function extraCells(record: readonly string[], columns: number): string {
  const numeric = record.slice(1).every((c) => /^[+-]?\d*\.?\d*$/.test(c.trim()));
  const hint = numeric ? ' (decimal commas? numbers must use a decimal point, e.g. 12.5, since commas separate the cells)' : '';
  return `found ${record.length} cells; expected ${columns}, one per column of the header${hint}`;
}

function makeSource(rows: Row[], fileName: string, referenceHeightM: number, present: ColumnName[], timeZone: string): WeatherFileSource {
  const n = rows.length;
  const times = Float64Array.from(rows, (r) => r.utcMs);
  const col = (name: ColumnName): Float64Array | undefined =>
    present.includes(name) ? Float64Array.from(rows, (r) => r.values[name] as number) : undefined;
  const air = col('air_temperature_c') as Float64Array;
  const wind = col('wind_speed_m_s') as Float64Array;
  const beam = col('beam_normal_w_m2');
  const diffuse = col('diffuse_horizontal_w_m2');
  const cloud = col('cloud_cover');
  let dew = col('dew_point_c');
  if (!dew) {
    // FAO-56 (Allen et al. 1998) eq. 48: actual vapour pressure ≈ saturation pressure at the daily
    // minimum temperature, i.e. dew point ≈ lowest air temperature of the surrounding 24 h
    // (a sliding-window minimum over a queue of row indices with increasing temperatures, so that
    // a sub-hourly file costs no more per row than an hourly one).
    dew = new Float64Array(n);
    const window: number[] = [];
    let head = 0;
    for (let i = 0, hi = -1; i < n; i++) {
      while (hi + 1 < n && times[hi + 1] <= times[i] + 12 * 3_600_000) {
        hi++;
        while (window.length > head && air[window[window.length - 1]!] >= air[hi]) window.pop();
        window.push(hi);
      }
      while (times[window[head]!] < times[i] - 12 * 3_600_000) head++;
      dew[i] = air[window[head]!];
    }
  }
  let timeStepS = Infinity;
  for (let i = 1; i < n; i++) timeStepS = Math.min(timeStepS, (times[i] - times[i - 1]) / 1000);
  const firstUtcMs = times[0];
  const lastUtcMs = times[n - 1];
  const iso = (utcMs: number) => new TZDate(utcMs, timeZone).toISOString();

  let last = 0; // index of the last interval used: successive calls are usually close in time
  const interval = (utcMs: number): number => {
    if (times[last] <= utcMs && utcMs <= times[last + 1]) return last;
    let lo = 0, hi = n - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (times[mid] <= utcMs) lo = mid; else hi = mid;
    }
    last = lo;
    return lo;
  };

  return {
    fileName,
    referenceHeightM,
    timeStepS,
    firstUtcMs,
    lastUtcMs,
    rowCount: n,
    hasIrradiance: beam !== undefined,
    coversRange(utcStartMs, utcEndMs) {
      if (utcStartMs >= firstUtcMs && utcEndMs <= lastUtcMs) return { covered: true };
      return {
        covered: false,
        message: `${fileName} covers ${iso(firstUtcMs)} to ${iso(lastUtcMs)}, but the run needs ${iso(utcStartMs)} to ${iso(utcEndMs)}`,
      };
    },
    at(utcMs: number): AirState {
      if (!(utcMs >= firstUtcMs && utcMs <= lastUtcMs)) {
        throw new WeatherFileError(fileName, `no data at ${Number.isFinite(utcMs) ? iso(utcMs) : String(utcMs)}: the file covers ${iso(firstUtcMs)} to ${iso(lastUtcMs)}`);
      }
      const i = interval(utcMs);
      const j = Math.min(i + 1, n - 1);
      const w = j === i ? 0 : (utcMs - times[i]) / (times[j] - times[i]);
      const lerp = (a: Float64Array) => a[i] + (a[j] - a[i]) * w;
      const airTemperatureK = celsiusToKelvin(lerp(air));
      const state: AirState = {
        airTemperatureK,
        windSpeed: lerp(wind),
        cloudCover: cloud ? lerp(cloud) : 0,
        dewPointK: Math.min(celsiusToKelvin(lerp(dew)), airTemperatureK),
        ...(beam && diffuse ? { beamNormal: lerp(beam), diffuseHorizontal: lerp(diffuse) } : {}),
      };
      return state;
    },
  };
}
