/**
 * Reader of TMY3 typical-year files (the comma-separated format of NREL's Users Manual for TMY3
 * Data Sets, Wilcox & Marion 2008, NREL/TP-581-43156):
 * - line 1, the site: station id (USAF), "station name" (quoted), state, time zone (hours from
 *   UTC of local standard time, e.g. −5.0), latitude (° N), longitude (° E, west negative),
 *   elevation (m);
 * - line 2, the column headers, e.g. `Date (MM/DD/YYYY)`, `Time (HH:MM)`, … `Dry-bulb (C)`, …;
 * - 8760 hourly rows: date MM/DD/YYYY (the year is that of the month chosen as typical and is
 *   ignored), time HH:MM hour ending 01:00 … 24:00, local standard time, then the values, each
 *   followed by its source and uncertainty flags.
 * Columns are found by header name (order does not matter). Read here: `Dry-bulb (C)` and
 * `Wspd (m/s)` (needed), `Dew-point (C)`, `DNI (W/m^2)`, `DHI (W/m^2)`, `TotCld (tenths)`
 * (optional: without the column, or with a missing value, the source falls back to a model; see
 * typicalYear.ts). Other columns and the flags are not read or checked.
 * Missing values: an empty cell or −9900 (the code of the NSRDB/TMY3 files, from memory of the
 * manual; the 2015 revision of the files fills every gap).
 * Accepted ranges (those of the EPW format, which carries the same quantities): air and dew point
 * above −70 and below 70 °C, wind 0–40 m/s, irradiance 0–1400 W/m² (the solar constant is
 * 1361 W/m²), cloud 0–10 tenths.
 */
import { WeatherFileError } from './csvFile.ts';
import * as ty from './typicalYear.ts';
import type { FieldRule, TypicalYearOptions, TypicalYearSource } from './typicalYear.ts';

/** The missing-value code of TMY3 files (from memory of the TMY3 manual). */
export const TMY3_MISSING = -9900;

const DATE_COLUMN = 'Date (MM/DD/YYYY)';
const TIME_COLUMN = 'Time (HH:MM)';

const isMissing = (_raw: string, v: number) => v === TMY3_MISSING;
const rule = (column: string, unit: string, min: number, max: number, needed: boolean, exclusive = false): FieldRule => ({
  column,
  unit,
  min,
  max,
  exclusive,
  needed,
  isMissing,
  missingCode: `${TMY3_MISSING} or an empty cell`,
});

/** The columns read, by header name. */
export const TMY3_FIELDS = {
  airTemperatureC: rule('Dry-bulb (C)', '°C', -70, 70, true, true),
  windSpeed: rule('Wspd (m/s)', 'm/s', 0, 40, true),
  dewPointC: rule('Dew-point (C)', '°C', -70, 70, false, true),
  beamNormal: rule('DNI (W/m^2)', 'W/m²', 0, 1400, false),
  diffuseHorizontal: rule('DHI (W/m^2)', 'W/m²', 0, 1400, false),
  cloudTenths: rule('TotCld (tenths)', 'tenths', 0, 10, false),
} as const;

const SITE_COLUMNS = ['station id', 'station name', 'state', 'time zone', 'latitude', 'longitude', 'elevation'] as const;

/**
 * Read a TMY3 file (see the module note). Throws {@link WeatherFileError} naming the file, the line
 * and the column (by its header name) of the first problem.
 */
export function parseTmy3(text: string, fileName: string, options: TypicalYearOptions = {}): TypicalYearSource {
  const lines = ty.linesOf(text);
  if (lines.length === 0) throw new WeatherFileError(fileName, 'the file is empty (expected a TMY3 site line, a header line and 8760 hourly rows)');

  // line 1: the site
  const siteFields = ty.splitCsvLine(lines[0]);
  if (siteFields[0].trim().startsWith('Date')) throw new WeatherFileError(fileName, 'line 1 is a column header, but a TMY3 file starts with its site line (station id, "name", state, time zone, latitude, longitude, elevation)', 1);
  if (siteFields.length !== SITE_COLUMNS.length) {
    throw new WeatherFileError(fileName, `the site line has ${siteFields.length} fields; TMY3 gives ${SITE_COLUMNS.length}: ${SITE_COLUMNS.join(', ')}`, 1);
  }
  const site = {
    stationId: siteFields[0].trim(),
    name: siteFields[1].trim(),
    utcOffsetHours: ty.readSiteNumber(siteFields[3], 'utcOffsetHours', 'time zone', fileName, 1),
    latitudeDeg: ty.readSiteNumber(siteFields[4], 'latitudeDeg', 'latitude', fileName, 1),
    longitudeDeg: ty.readSiteNumber(siteFields[5], 'longitudeDeg', 'longitude', fileName, 1),
    elevationM: ty.readSiteNumber(siteFields[6], 'elevationM', 'elevation', fileName, 1),
  };

  // line 2: the headers
  if (lines.length < 2) throw new WeatherFileError(fileName, 'the file ends after the site line (expected the column header line)', 1);
  const header = ty.splitCsvLine(lines[1]).map((h) => h.trim());
  const index = new Map<string, number>();
  header.forEach((name, i) => {
    if (index.has(name)) throw new WeatherFileError(fileName, `column "${name}" appears twice in the header`, 2, name);
    index.set(name, i);
  });
  for (const name of [DATE_COLUMN, TIME_COLUMN, TMY3_FIELDS.airTemperatureC.column, TMY3_FIELDS.windSpeed.column]) {
    if (!index.has(name)) throw new WeatherFileError(fileName, `required column "${name}" is missing from the header line (is this a TMY3 file?)`, 2, name);
  }
  const rows = ty.allocateRows();
  let k = 0;
  for (let li = 2; li < lines.length; li++) {
    const line = li + 1;
    const cells = lines[li].split(',');
    if (cells.length !== header.length) {
      throw new WeatherFileError(fileName, `row has ${cells.length} fields, the header line has ${header.length}`, line);
    }
    const dateText = cells[index.get(DATE_COLUMN) as number].trim();
    const dm = /^(\d{1,2})\/(\d{1,2})\/(\d{4})$/.exec(dateText);
    if (!dm) throw new WeatherFileError(fileName, `"${dateText}" is not a date MM/DD/YYYY`, line, DATE_COLUMN);
    const [month, day, yr] = [Number(dm[1]), Number(dm[2]), Number(dm[3])];
    const check = new Date(Date.UTC(yr, month - 1, day));
    if (check.getUTCMonth() !== month - 1 || check.getUTCDate() !== day) throw new WeatherFileError(fileName, `"${dateText}" is not a calendar date`, line, DATE_COLUMN);
    const timeText = cells[index.get(TIME_COLUMN) as number].trim();
    const tm = /^(\d{1,2}):(\d{2})$/.exec(timeText);
    if (!tm) throw new WeatherFileError(fileName, `"${timeText}" is not a time HH:MM`, line, TIME_COLUMN);
    const hour = ty.readInteger(tm[1], TIME_COLUMN, 1, 24, fileName, line);
    if (tm[2] !== '00') throw new WeatherFileError(fileName, `time ${timeText}: hourly rows end on the full hour (HH:00, 01:00 … 24:00)`, line, TIME_COLUMN);
    ty.checkStamp(k, { month, day, hour }, { fileName, line, dateColumn: DATE_COLUMN, hourColumn: TIME_COLUMN });

    ty.readRowValues(rows, k, TMY3_FIELDS, (f) => (index.has(f.column) ? cells[index.get(f.column) as number] : undefined), fileName, line);
    k++;
  }
  if (k < ty.HOURS_PER_TYPICAL_YEAR) throw ty.shortFileError(fileName, k, lines.length);
  return ty.makeTypicalYearSource(rows, site, fileName, 'TMY3', options);
}
