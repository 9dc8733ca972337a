/**
 * A weather file named by the scenario (`weather.file`), whatever its format: the hourly CSV of this
 * tool's own columns (csvFile.ts), or a typical year in the EPW text format (epw.ts) or the TMY3
 * CSV format (tmy3.ts). The format is told by the file's extension and content; a typical year's
 * site and time zone are checked against the scenario's.
 *
 * Format. A name ending in `.epw` is read as EPW (its reader says what is wrong when the content is
 * not). Any other name is read by its content: a first line `LOCATION,…` is EPW; a second line that
 * starts with the TMY3 date column `Date (MM/DD/YYYY)` is TMY3; anything else is the hourly CSV.
 *
 * Placement. A typical year's rows are placed on every calendar year the run touches (the year
 * repeats: a run over New Year continues from 31 December into the same file's 1 January; on
 * 29 February the rows of 28 February are used again; see typicalYear.ts).
 *
 * Site check, where the line is drawn (SITE_LIMITS):
 * - distance from the scenario's site above 300 km: an ERROR. That is clearly another place: at
 *   mid latitudes another climate (a typical year is chosen from the nearest long-record station,
 *   which national archives place within about 100 km of most sites), and a sun shifted by up to
 *   3° of latitude and 20 minutes of solar time or more against the file's irradiance;
 * - distance above 50 km: a WARNING (a regional station; check that it shares the site's climate:
 *   coast or inland, valley or hill);
 * - the file's UTC offset against the standard offset of the scenario's time zone: more than 1 h
 *   apart an ERROR (no zone boundary explains more than an hour between near neighbours, so the
 *   file is for another region or its header is wrong); 1 h or less apart a WARNING (a site near a
 *   zone boundary; the rows are placed in time by the file's own offset, so they are not shifted);
 * - elevation more than 300 m from the scenario's: a WARNING (the standard atmosphere's lapse rate
 *   of 6.5 K/km makes that about 2 K on the air temperature).
 */
import type { SiteClock } from '../../model/clock.ts';
import type { WeatherFileSite } from '../../model/inputs.ts';
import { parseWeatherCsv, type WeatherFileSource } from './csvFile.ts';
import { parseEpw } from './epw.ts';
import { parseTmy3 } from './tmy3.ts';
import { greatCircleDistanceKm, standardUtcOffsetHours, type TypicalYearFallbacks, type TypicalYearSource } from './typicalYear.ts';

export type WeatherFileFormat = 'csv' | 'EPW' | 'TMY3';

/** Where the site check draws its lines (see the module note). */
export const SITE_LIMITS = {
  /** Above this distance, km, a warning. */
  warningDistanceKm: 50,
  /** Above this distance, km, an error. */
  errorDistanceKm: 300,
  /** A UTC offset further than this from the zone's standard offset, h, is an error (closer but different: a warning). */
  errorOffsetHours: 1,
  /** An elevation further than this from the scenario's, m, is a warning. */
  warningElevationM: 300,
} as const;

/** The TMY3 date column, the first header of a TMY3 file's second line. */
const TMY3_FIRST_HEADER = 'Date (MM/DD/YYYY)';

/** The format of a weather file, by its name and its first two lines (see the module note). */
export function detectWeatherFormat(fileName: string, text: string): WeatherFileFormat {
  if (/\.epw$/i.test(fileName)) return 'EPW';
  const [first = '', second = ''] = text.replace(/^\uFEFF/, '').split(/\r?\n/, 2);
  if (/^\s*LOCATION\s*,/i.test(first)) return 'EPW';
  if (second.trim().replace(/^"/, '').startsWith(TMY3_FIRST_HEADER)) return 'TMY3';
  return 'csv';
}

/** What the scenario says of its site, for the check. */
export interface ScenarioSite {
  readonly latitudeDeg: number;
  readonly longitudeDeg: number;
  readonly elevationM: number;
  readonly timeZone: string;
}

/** Problems of a weather file's site against the scenario's: errors stop the run, warnings go into its summary. */
export interface SiteCheck {
  readonly errors: string[];
  readonly warnings: string[];
}

const signedHours = (h: number) => `UTC${h >= 0 ? '+' : '−'}${Math.abs(h)} h`;

/**
 * Check a weather file's site against the scenario's (see the module note for the lines drawn).
 * `year` is the calendar year whose standard offset of the scenario's zone is compared.
 * Example: a file 164 km from the site, same offset → one warning; 900 km → one error.
 */
export function checkWeatherFileSite(site: WeatherFileSite, scenario: ScenarioSite, year: number): SiteCheck {
  const errors: string[] = [];
  const warnings: string[] = [];
  const km = greatCircleDistanceKm(site.latitudeDeg, site.longitudeDeg, scenario.latitudeDeg, scenario.longitudeDeg);
  const where = `the weather file's site "${site.name}" (${site.latitudeDeg}°, ${site.longitudeDeg}°) is ${km.toFixed(0)} km from the scenario's site (${scenario.latitudeDeg}°, ${scenario.longitudeDeg}°)`;
  if (km > SITE_LIMITS.errorDistanceKm) errors.push(`${where}: more than ${SITE_LIMITS.errorDistanceKm} km is another place (another climate, another sun); use a file for this site`);
  else if (km > SITE_LIMITS.warningDistanceKm) warnings.push(`${where} (more than ${SITE_LIMITS.warningDistanceKm} km): check that the station shares the site's climate`);
  const std = standardUtcOffsetHours(scenario.timeZone, year);
  const offBy = Math.abs(std - site.utcOffsetHours);
  if (offBy > 1e-9) {
    const text = `the weather file's hours are in ${signedHours(site.utcOffsetHours)}, but the standard time of ${scenario.timeZone} is ${signedHours(std)}`;
    if (offBy > SITE_LIMITS.errorOffsetHours + 1e-9) errors.push(`${text}: more than ${SITE_LIMITS.errorOffsetHours} h apart, the file is for another region (or its header is wrong)`);
    else warnings.push(`${text} (the rows are placed in time by the file's own offset; check the file is for this site)`);
  }
  const dz = site.elevationM - scenario.elevationM;
  if (Math.abs(dz) > SITE_LIMITS.warningElevationM)
    warnings.push(`the weather file's station lies ${Math.abs(dz).toFixed(0)} m ${dz > 0 ? 'above' : 'below'} the scenario's site (more than ${SITE_LIMITS.warningElevationM} m: about ${((6.5 * Math.abs(dz)) / 1000).toFixed(1)} K of air temperature at the standard lapse rate of 6.5 K/km)`);
  return { errors, warnings };
}

/** A weather file read: its source and what is known of it. */
export interface ReadWeatherFile {
  readonly format: WeatherFileFormat;
  readonly source: WeatherFileSource;
  /** A typical year's site (EPW, TMY3). */
  readonly site?: WeatherFileSite;
  /** A typical year's rows filled by a model, per quantity. */
  readonly fallbacks?: TypicalYearFallbacks;
}

/**
 * Read a weather file in whichever format it is (see {@link detectWeatherFormat}). Throws the
 * readers' WeatherFileError (file, line, column) on the first bad field.
 */
export function readWeatherFile(text: string, fileName: string, clock: SiteClock, options: { readonly referenceHeightM: number }): ReadWeatherFile {
  const format = detectWeatherFormat(fileName, text);
  if (format === 'csv') return { format, source: parseWeatherCsv(text, clock, fileName, options) };
  // no calendar year: the typical year repeats on every year the run touches
  const source: TypicalYearSource = format === 'EPW' ? parseEpw(text, fileName, options) : parseTmy3(text, fileName, options);
  return { format, source, site: source.site, fallbacks: source.fallbacks };
}

/** Sentences for the run's assumptions: how a typical year is placed and which of its rows were filled by a model. */
export function typicalYearNotes(file: ReadWeatherFile, distanceKm: number): string[] {
  if (!file.site || !file.fallbacks) return [];
  const s = file.site;
  const notes = [
    `Weather: a typical year in the ${file.format} format (station "${s.name}"${s.stationId ? ` ${s.stationId}` : ''}, ${distanceKm.toFixed(0)} km from the site, hours in ${signedHours(s.utcOffsetHours)}), its rows repeated on every calendar year of the run (29 February uses 28 February's rows); air temperature, dew point, wind and cloud at the hour's end, irradiance as the hour's mean at its middle, linear in between.`,
  ];
  const f = file.fallbacks;
  const filled = [
    f.dewPoint > 0 ? `dew point in ${f.dewPoint} hours from the lowest air temperature within ±12 h (FAO-56 eq. 48)` : '',
    f.cloudCover > 0 ? `cloud cover in ${f.cloudCover} hours by interpolation between the hours that give it (0 when none does)` : '',
    f.beamNormal > 0 || f.diffuseHorizontal > 0 ? `irradiance next to ${Math.max(f.beamNormal, f.diffuseHorizontal)} hours without it from the clear-sky model reduced for cloud` : '',
  ].filter((x) => x !== '');
  if (filled.length > 0) notes.push(`Weather file values missing and modelled: ${filled.join('; ')}.`);
  return notes;
}
