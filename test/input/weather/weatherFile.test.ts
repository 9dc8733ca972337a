/**
 * A weather file whatever its format: the format told by name and content (the EPW data
 * dictionary: an EPW file's first record is LOCATION; the TMY3 manual, Wilcox & Marion 2008: a TMY3
 * file's second line is the column header starting with "Date (MM/DD/YYYY)"), and the site check's
 * lines between a warning and an error, checked on places whose distances follow from spherical
 * geometry (one degree along a meridian is πR/180 = 111.195 km on the mean Earth radius
 * R = 6371.0088 km, IUGG).
 */
import { describe, expect, it } from 'vitest';
import { checkWeatherFileSite, detectWeatherFormat, readWeatherFile, SITE_LIMITS } from '../../../src/input/weather/weatherFile.ts';
import { makeSiteClock } from '../../../src/model/clock.ts';
import { EPW_FIXTURE, TMY3_FIXTURE, epwYear, tmy3Year } from './typicalYearFiles.ts';

const KM_PER_DEGREE = (Math.PI * 6371.0088) / 180; // 111.195 km: a degree of latitude on the mean sphere

describe('detectWeatherFormat', () => {
  it('reads a name ending in .epw as EPW whatever it holds (the EPW reader then says what is wrong)', () => {
    expect(detectWeatherFormat('site.EPW', 'time,air_temperature_c\n')).toBe('EPW');
  });

  it('tells EPW by its LOCATION record and TMY3 by its date header on line 2, whatever the name', () => {
    expect(detectWeatherFormat('site.txt', EPW_FIXTURE)).toBe('EPW');
    expect(detectWeatherFormat('site.csv', TMY3_FIXTURE)).toBe('TMY3');
    expect(detectWeatherFormat('site.csv', `\uFEFF${TMY3_FIXTURE}`)).toBe('TMY3');
  });

  it("takes anything else for the tool's own hourly CSV", () => {
    expect(detectWeatherFormat('hourly.csv', 'time,air_temperature_c,wind_speed_m_s\n2026-01-01T00:00,1,2\n')).toBe('csv');
  });
});

describe('readWeatherFile', () => {
  const clock = makeSiteClock('Europe/Copenhagen', '2026-01-01');

  it('reads a typical year with its site and repeats it on every calendar year (covers any span)', () => {
    const file = readWeatherFile(epwYear(() => ({})), 'town.epw', clock, { referenceHeightM: 10 });
    expect(file.format).toBe('EPW');
    expect(file.site?.name).toBe('Invented Test Town');
    expect(file.source.coversRange(Date.UTC(2025, 6, 1), Date.UTC(2027, 6, 1))).toEqual({ covered: true });
  });

  it('reads a TMY3 file given as .csv by its content', () => {
    const file = readWeatherFile(tmy3Year(() => ({})), 'station.csv', clock, { referenceHeightM: 10 });
    expect(file.format).toBe('TMY3');
    expect(file.site?.utcOffsetHours).toBe(-5);
  });
});

describe('checkWeatherFileSite', () => {
  const site = { name: 'station', stationId: '1', latitudeDeg: 56, longitudeDeg: 10, elevationM: 40, utcOffsetHours: 1 };
  const scenario = { latitudeDeg: 56, longitudeDeg: 10, elevationM: 40, timeZone: 'Europe/Copenhagen' };

  it('finds nothing to say about the same place in the same zone', () => {
    expect(checkWeatherFileSite(site, scenario, 2026)).toEqual({ errors: [], warnings: [] });
  });

  it('warns for a station 1° of latitude away (111 km: above 50 km, within 300 km)', () => {
    const r = checkWeatherFileSite({ ...site, latitudeDeg: 57 }, scenario, 2026);
    expect(r.errors).toEqual([]);
    expect(r.warnings).toHaveLength(1);
    expect(r.warnings[0]).toContain(`${KM_PER_DEGREE.toFixed(0)} km`);
  });

  it('refuses a station 3° of latitude away (334 km: clearly another place)', () => {
    expect(3 * KM_PER_DEGREE).toBeGreaterThan(SITE_LIMITS.errorDistanceKm);
    const r = checkWeatherFileSite({ ...site, latitudeDeg: 59 }, scenario, 2026);
    expect(r.errors).toHaveLength(1);
    expect(r.errors[0]).toContain('334 km');
  });

  it('warns for a UTC offset one hour off the zone (a site near a zone boundary) and refuses two hours off', () => {
    // Europe/Copenhagen keeps UTC+1 h as its standard time (IANA tz database)
    expect(checkWeatherFileSite({ ...site, utcOffsetHours: 0 }, scenario, 2026)).toMatchObject({ errors: [], warnings: [expect.stringContaining('UTC+0 h')] });
    expect(checkWeatherFileSite({ ...site, utcOffsetHours: -1 }, scenario, 2026).errors).toEqual([expect.stringContaining('UTC−1 h')]);
  });

  it('warns for a station 400 m above the site (about 2.6 K at the standard lapse rate of 6.5 K/km)', () => {
    const r = checkWeatherFileSite({ ...site, elevationM: 440 }, scenario, 2026);
    expect(r.errors).toEqual([]);
    expect(r.warnings).toEqual([expect.stringContaining('2.6 K')]);
  });
});
