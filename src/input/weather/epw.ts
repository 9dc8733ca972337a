/**
 * Reader of EPW weather files (the EnergyPlus weather format; its data dictionary is in the
 * EnergyPlus Auxiliary Programs documentation, "EnergyPlus Weather File (EPW) Data Dictionary"):
 * - line 1 `LOCATION,city,state/province/region,country,source,WMO,latitude,longitude,time zone,elevation`
 *   (latitude ° N, longitude ° E with west negative, time zone = hours of local standard time from
 *   GMT, elevation m);
 * - lines 2–8, in this order: DESIGN CONDITIONS, TYPICAL/EXTREME PERIODS, GROUND TEMPERATURES,
 *   HOLIDAYS/DAYLIGHT SAVINGS, COMMENTS 1, COMMENTS 2, DATA PERIODS (one data period of one record
 *   per hour is required here);
 * - 8760 hourly rows of 35 fields (see {@link EPW_FIELD_NAMES}): year (ignored), month, day, hour
 *   1–24 ("hour 1 is 00:01 to 01:00"), minute (ignored for hourly data), source flags, then the
 *   values.
 * Read here: Dry Bulb Temperature and Wind Speed (needed), Dew Point Temperature, Direct Normal
 * Radiation, Diffuse Horizontal Radiation, Total Sky Cover (optional: a missing value makes the
 * source fall back to a model; see typicalYear.ts). The other fields are not read or checked.
 * Ranges and missing codes of the data dictionary ("missing" = at or above the code): dry bulb and
 * dew point above −70 and below 70 °C, missing 99.9; wind 0–40 m/s, missing 999; radiation ≥ 0
 * Wh/m² (an hourly sum, i.e. the hour's mean in W/m²), missing 9999, and here at most 1400 (the solar
 * constant is 1361 W/m²); total sky cover 0–10 tenths, missing 99.
 */
import { WeatherFileError } from './csvFile.ts';
import * as ty from './typicalYear.ts';
import type { FieldRule, TypicalYearOptions, TypicalYearSource } from './typicalYear.ts';

/** The 35 fields of an EPW data row, named as in the EPW data dictionary. */
export const EPW_FIELD_NAMES = [
  'Year',
  'Month',
  'Day',
  'Hour',
  'Minute',
  'Data Source and Uncertainty Flags',
  'Dry Bulb Temperature',
  'Dew Point Temperature',
  'Relative Humidity',
  'Atmospheric Station Pressure',
  'Extraterrestrial Horizontal Radiation',
  'Extraterrestrial Direct Normal Radiation',
  'Horizontal Infrared Radiation Intensity',
  'Global Horizontal Radiation',
  'Direct Normal Radiation',
  'Diffuse Horizontal Radiation',
  'Global Horizontal Illuminance',
  'Direct Normal Illuminance',
  'Diffuse Horizontal Illuminance',
  'Zenith Luminance',
  'Wind Direction',
  'Wind Speed',
  'Total Sky Cover',
  'Opaque Sky Cover',
  'Visibility',
  'Ceiling Height',
  'Present Weather Observation',
  'Present Weather Codes',
  'Precipitable Water',
  'Aerosol Optical Depth',
  'Snow Depth',
  'Days Since Last Snowfall',
  'Albedo',
  'Liquid Precipitation Depth',
  'Liquid Precipitation Quantity',
] as const;

/** The header records after LOCATION, in their order (HOLIDAYS/DAYLIGHT SAVING also without the final S). */
export const EPW_HEADER_RECORDS = ['DESIGN CONDITIONS', 'TYPICAL/EXTREME PERIODS', 'GROUND TEMPERATURES', 'HOLIDAYS/DAYLIGHT SAVING', 'COMMENTS 1', 'COMMENTS 2', 'DATA PERIODS'] as const;

const col = (name: (typeof EPW_FIELD_NAMES)[number]) => EPW_FIELD_NAMES.indexOf(name);
const atOrAbove = (code: number) => (_raw: string, v: number) => v >= code;

/** The fields read, with the data dictionary's ranges and missing codes. */
export const EPW_FIELDS = {
  airTemperatureC: { column: 'Dry Bulb Temperature', unit: '°C', min: -70, max: 70, exclusive: true, needed: true, isMissing: atOrAbove(99.9), missingCode: '99.9' },
  dewPointC: { column: 'Dew Point Temperature', unit: '°C', min: -70, max: 70, exclusive: true, needed: false, isMissing: atOrAbove(99.9), missingCode: '99.9' },
  beamNormal: { column: 'Direct Normal Radiation', unit: 'Wh/m²', min: 0, max: 1400, needed: false, isMissing: atOrAbove(9999), missingCode: '9999' },
  diffuseHorizontal: { column: 'Diffuse Horizontal Radiation', unit: 'Wh/m²', min: 0, max: 1400, needed: false, isMissing: atOrAbove(9999), missingCode: '9999' },
  windSpeed: { column: 'Wind Speed', unit: 'm/s', min: 0, max: 40, needed: true, isMissing: atOrAbove(999), missingCode: '999' },
  cloudTenths: { column: 'Total Sky Cover', unit: 'tenths', min: 0, max: 10, needed: false, isMissing: atOrAbove(99), missingCode: '99' },
} as const satisfies Record<string, FieldRule>;

const LOCATION_FIELDS = ['LOCATION', 'City', 'State Province Region', 'Country', 'Source', 'WMO', 'Latitude', 'Longitude', 'TimeZone', 'Elevation'] as const;
const HEADER_LINES = 1 + EPW_HEADER_RECORDS.length;

/**
 * Read an EPW file (see the module note). Throws {@link WeatherFileError} naming the file, the line
 * and the field (by its EPW data-dictionary name) of the first problem.
 */
export function parseEpw(text: string, fileName: string, options: TypicalYearOptions = {}): TypicalYearSource {
  const lines = ty.linesOf(text);
  if (lines.length === 0) throw new WeatherFileError(fileName, 'the file is empty (expected the LOCATION line, seven header lines and 8760 hourly rows)');

  const loc = lines[0].split(',');
  if (loc[0].trim().toUpperCase() !== 'LOCATION') throw new WeatherFileError(fileName, `the first line starts with "${loc[0].slice(0, 30)}", but an EPW file starts with LOCATION`, 1, 'LOCATION');
  if (loc.length < LOCATION_FIELDS.length) {
    throw new WeatherFileError(fileName, `the LOCATION line has ${loc.length} fields; EPW gives ${LOCATION_FIELDS.length}: ${LOCATION_FIELDS.join(', ')}`, 1);
  }
  const site = {
    name: loc[1].trim(),
    stationId: loc[5].trim(),
    latitudeDeg: ty.readSiteNumber(loc[6], 'latitudeDeg', 'Latitude', fileName, 1),
    longitudeDeg: ty.readSiteNumber(loc[7], 'longitudeDeg', 'Longitude', fileName, 1),
    utcOffsetHours: ty.readSiteNumber(loc[8], 'utcOffsetHours', 'TimeZone', fileName, 1),
    elevationM: ty.readSiteNumber(loc[9], 'elevationM', 'Elevation', fileName, 1),
  };

  EPW_HEADER_RECORDS.forEach((record, i) => {
    const line = i + 2;
    const text = lines[i + 1];
    if (text === undefined) throw new WeatherFileError(fileName, `the file ends before the ${record} header line`, line - 1);
    if (!text.trim().toUpperCase().startsWith(record)) {
      throw new WeatherFileError(fileName, `expected the ${record} header line here, found "${text.slice(0, 40)}"`, line, record);
    }
  });
  const periods = lines[HEADER_LINES - 1].split(',');
  // one data period of hourly records: the only layout a typical year has
  ty.readInteger(periods[1] ?? '', 'Number of Data Periods', 1, 1, fileName, HEADER_LINES);
  ty.readInteger(periods[2] ?? '', 'Number of Records per hour', 1, 1, fileName, HEADER_LINES);

  const rows = ty.allocateRows();
  let k = 0;
  for (let li = HEADER_LINES; li < lines.length; li++) {
    const line = li + 1;
    const cells = lines[li].split(',');
    if (cells.length !== EPW_FIELD_NAMES.length) {
      throw new WeatherFileError(fileName, `row has ${cells.length} fields; an EPW data row has ${EPW_FIELD_NAMES.length} (Year … Liquid Precipitation Quantity)`, line);
    }
    const int = (name: (typeof EPW_FIELD_NAMES)[number], min: number, max: number) => ty.readInteger(cells[col(name)], name, min, max, fileName, line);
    int('Year', 0, 9999);
    const month = int('Month', 1, 12);
    const day = int('Day', 1, 31);
    if (new Date(Date.UTC(2024, month - 1, day)).getUTCDate() !== day) throw new WeatherFileError(fileName, `day ${day} does not exist in month ${month}`, line, 'Day');
    const hour = int('Hour', 1, 24);
    int('Minute', 0, 60);
    ty.checkStamp(k, { month, day, hour }, { fileName, line, monthColumn: 'Month', dateColumn: 'Day', hourColumn: 'Hour' });
    ty.readRowValues(rows, k, EPW_FIELDS, (f) => cells[col(f.column as (typeof EPW_FIELD_NAMES)[number])], fileName, line);
    k++;
  }
  if (k < ty.HOURS_PER_TYPICAL_YEAR) throw ty.shortFileError(fileName, k, lines.length);
  return ty.makeTypicalYearSource(rows, site, fileName, 'EPW', options);
}
