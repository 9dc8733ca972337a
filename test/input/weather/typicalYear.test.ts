/**
 * Placement of typical-year rows in time, interpolation, wrap-around, leap years and fallbacks,
 * through both readers. The expected values are hand computations from the formulas that wrote
 * the rows (see `values` below).
 */
import { describe, expect, it } from 'vitest';
import { parseEpw } from '../../../src/input/weather/epw.ts';
import { parseTmy3 } from '../../../src/input/weather/tmy3.ts';
import { WeatherFileError } from '../../../src/input/weather/csvFile.ts';
import { greatCircleDistanceKm, standardUtcOffsetHours, stampOfRow } from '../../../src/input/weather/typicalYear.ts';
import { epwYear, tmy3Year } from './typicalYearFiles.ts';

const air = (k: number) => 10 + k / 1000; // °C, rises by 1 mK per row
const beam = (k: number) => (k % 24) * 10; // W/m²
const epwValues = (k: number) => ({
  'Dry Bulb Temperature': air(k).toFixed(3),
  'Dew Point Temperature': (air(k) - 2).toFixed(3),
  'Wind Speed': (2 + (k % 10) / 10).toFixed(1),
  'Direct Normal Radiation': String(beam(k)),
  'Diffuse Horizontal Radiation': String(5 + (k % 3)),
  'Total Sky Cover': String(k % 11),
});
const epw = parseEpw(epwYear(epwValues), 'year.epw', { year: 2026 });
const epwAny = parseEpw(epwYear(epwValues), 'year.epw');

const H = 3_600_000;
/** UTC ms of a local-standard-time reading in the EPW fixture's zone (UTC+1). */
const lstEpw = (y: number, month: number, day: number, hours: number) => Date.UTC(y, month - 1, day) + hours * H - 1 * H;
const K = 273.15;

describe('typical year: placement in local standard time', () => {
  it('places temperature and wind at the hour-ending stamp, in the file\'s own UTC offset', () => {
    // Row 0 is 1 January hour ending 01:00 LST = 00:00 UTC; row 30 is 2 January 07:00 LST.
    expect(epw.at(lstEpw(2026, 1, 1, 1)).airTemperatureK).toBeCloseTo(K + air(0), 9);
    expect(epw.at(lstEpw(2026, 1, 2, 7)).airTemperatureK).toBeCloseTo(K + air(30), 9);
    expect(epw.at(lstEpw(2026, 1, 2, 7)).windSpeed).toBeCloseTo(2 + 0 / 10, 12);
    expect(epw.at(lstEpw(2026, 1, 2, 7)).cloudCover).toBeCloseTo((30 % 11) / 10, 12); // tenths / 10
    // Half way between stamps of rows 30 and 31: the mean (linear interpolation).
    expect(epw.at(lstEpw(2026, 1, 2, 7.5)).airTemperatureK).toBeCloseTo(K + (air(30) + air(31)) / 2, 9);
    expect(epw.at(lstEpw(2026, 1, 2, 7.25)).windSpeed).toBeCloseTo(2 + 0.025, 12);
  });

  it('places irradiance (an hourly mean) at the middle of its hour', () => {
    // Row 30 (06:00–07:00 on 2 January) at 06:30; at its stamp 07:00 the mean of rows 30 and 31.
    expect(epw.at(lstEpw(2026, 1, 2, 6.5)).beamNormal).toBeCloseTo(beam(30), 12);
    expect(epw.at(lstEpw(2026, 1, 2, 7)).beamNormal).toBeCloseTo((beam(30) + beam(31)) / 2, 12);
    expect(epw.at(lstEpw(2026, 1, 2, 6.5)).diffuseHorizontal).toBeCloseTo(5 + (30 % 3), 12);
  });

  it('wraps from 31 December to 1 January', () => {
    // 1 Jan 00:30 LST: between the stamp of the last row (31 Dec 24:00 = 1 Jan 00:00) and row 0 (01:00).
    expect(epw.at(lstEpw(2026, 1, 1, 0.5)).airTemperatureK).toBeCloseTo(K + (air(8759) + air(0)) / 2, 9);
    // 1 Jan 00:00 LST: irradiance between the mid-hours of row 8759 (23:30) and row 0 (00:30).
    expect(epw.at(lstEpw(2026, 1, 1, 0)).beamNormal).toBeCloseTo((beam(8759) + beam(0)) / 2, 12);
    // The end of the year is the last stamp.
    expect(epw.at(lstEpw(2027, 1, 1, 0)).airTemperatureK).toBeCloseTo(K + air(8759), 9);
  });

  it('covers exactly the calendar year asked for, in local standard time', () => {
    expect(epw.calendarYear).toBe(2026);
    expect(epw.firstUtcMs).toBe(Date.UTC(2025, 11, 31, 23));
    expect(epw.lastUtcMs).toBe(Date.UTC(2026, 11, 31, 23));
    expect(epw.coversRange(epw.firstUtcMs, epw.lastUtcMs)).toEqual({ covered: true });
    const r = epw.coversRange(epw.firstUtcMs, epw.lastUtcMs + H);
    expect(r.covered).toBe(false);
    if (!r.covered) expect(r.message).toMatch(/year\.epw \(typical year placed on 2026\) covers 2026-01-01T00:00:00\+01:00 to 2027-01-01T00:00:00\+01:00/);
    expect(() => epw.at(epw.lastUtcMs + 1000)).toThrow(WeatherFileError);
    expect(() => epw.at(epw.firstUtcMs - 1000)).toThrow(/no data at 2025-12-31T23:59:59\+01:00/);
  });

  it('repeats for every year when no year is given, using 28 February again on 29 February', () => {
    expect(epwAny.calendarYear).toBeUndefined();
    expect(epwAny.coversRange(Date.UTC(1990, 0, 1), Date.UTC(2090, 0, 1))).toEqual({ covered: true });
    const a = epwAny.at(lstEpw(2030, 7, 14, 13.25));
    const b = epw.at(lstEpw(2026, 7, 14, 13.25));
    expect(a).toEqual(b);
    // 2028 is a leap year: 29 Feb 12:00 = 28 Feb 12:00 (row 58·24 + 11); 1 Mar 12:00 = 1 Mar of any year.
    expect(epwAny.at(lstEpw(2028, 2, 29, 12)).airTemperatureK).toBeCloseTo(K + air(58 * 24 + 11), 9);
    expect(epwAny.at(lstEpw(2028, 3, 1, 12)).airTemperatureK).toBeCloseTo(K + air(59 * 24 + 11), 9);
    expect(epwAny.at(lstEpw(2028, 12, 31, 24)).airTemperatureK).toBeCloseTo(K + air(8759), 9);
  });

  it('reads the same year from a TMY3 file in its own zone (UTC−5)', () => {
    const tmy = parseTmy3(
      tmy3Year((k) => ({ 'Dry-bulb (C)': air(k).toFixed(3), 'Dew-point (C)': (air(k) - 3).toFixed(3), 'DNI (W/m^2)': String(beam(k)) })),
      'year.csv',
      { year: 2026 },
    );
    // Row 30 stamp: 2 January 07:00 LST (UTC−5) = 12:00 UTC.
    expect(tmy.at(Date.UTC(2026, 0, 2, 12)).airTemperatureK).toBeCloseTo(K + air(30), 9);
    expect(tmy.at(Date.UTC(2026, 0, 2, 11, 30)).beamNormal).toBeCloseTo(beam(30), 12);
    expect(tmy.firstUtcMs).toBe(Date.UTC(2026, 0, 1, 5));
    expect(tmy.site).toMatchObject({ name: 'INVENTED TEST STATION, HILLTOP', stationId: '999001', utcOffsetHours: -5, latitudeDeg: 40.25, longitudeDeg: -80.5, elevationM: 312 });
    expect(tmy.format).toBe('TMY3');
  });

  it('numbers rows hour by hour through the year', () => {
    expect(stampOfRow(0)).toEqual({ month: 1, day: 1, hour: 1 });
    expect(stampOfRow(24)).toEqual({ month: 1, day: 2, hour: 1 });
    expect(stampOfRow(59 * 24)).toEqual({ month: 3, day: 1, hour: 1 }); // no 29 February
    expect(stampOfRow(8759)).toEqual({ month: 12, day: 31, hour: 24 });
  });
});

describe('typical year: fallbacks for missing values in fields the model can do without', () => {
  const withGaps = parseEpw(
    epwYear((k) => ({
      ...epwValues(k),
      ...(k >= 100 && k <= 102 ? { 'Dew Point Temperature': '99.9' } : {}),
      ...(k === 200 ? { 'Direct Normal Radiation': '9999' } : {}),
      ...(k === 300 || k === 301 ? { 'Total Sky Cover': '99' } : {}),
    })),
    'gaps.epw',
    { year: 2026 },
  );
  const stampOf = (k: number) => lstEpw(2026, 1, 1, k + 1);

  it('counts the rows that fell back, per quantity', () => {
    expect(withGaps.fallbacks).toEqual({ dewPoint: 3, cloudCover: 2, beamNormal: 1, diffuseHorizontal: 0 });
    expect(withGaps.hasIrradiance).toBe(true);
    expect(epw.fallbacks).toEqual({ dewPoint: 0, cloudCover: 0, beamNormal: 0, diffuseHorizontal: 0 });
  });

  it('models a missing dew point as the lowest air temperature within ±12 h (FAO-56 eq. 48)', () => {
    // Air rises with the row, so the lowest within ±12 rows of row 101 is row 89.
    expect(withGaps.at(stampOf(101)).dewPointK).toBeCloseTo(K + air(89), 9);
    expect(withGaps.at(stampOf(99)).dewPointK).toBeCloseTo(K + air(99) - 2, 9);
  });

  it('interpolates a missing cloud cover between the nearest rows that have it', () => {
    // Rows 299 (2/10) and 302 (5/10): row 300 → 3/10, row 301 → 4/10.
    expect(withGaps.at(stampOf(300)).cloudCover).toBeCloseTo(0.3, 12);
    expect(withGaps.at(stampOf(301)).cloudCover).toBeCloseTo(0.4, 12);
  });

  it('leaves a missing beam irradiance to the clear-sky model next to the missing hour only', () => {
    // Row 200 is centred at 200.5 h: instants between the centres of rows 199 and 201 touch it.
    const mid = (k: number) => lstEpw(2026, 1, 1, k + 0.5);
    expect(withGaps.at(mid(199) + 1000).beamNormal).toBeUndefined();
    expect(withGaps.at(mid(200)).beamNormal).toBeUndefined();
    expect(withGaps.at(mid(200)).diffuseHorizontal).toBeCloseTo(5 + (200 % 3), 12);
    expect(withGaps.at(mid(199)).beamNormal).toBeCloseTo(beam(199), 12);
    expect(withGaps.at(mid(201)).beamNormal).toBeCloseTo(beam(201), 12);
  });
});

describe('site checks against the scenario', () => {
  it('computes great-circle distances', () => {
    // One degree along a meridian on a sphere of radius 6371.0088 km: π·R/180 = 111.1951 km (analytic).
    expect(greatCircleDistanceKm(56, 10, 57, 10)).toBeCloseTo(111.1951, 3);
    // Quarter of the equator: π·R/2 = 10 007.54 km.
    expect(greatCircleDistanceKm(0, 0, 0, 90)).toBeCloseTo(10007.54, 1);
  });

  it('knows the standard offset of a zone in either hemisphere', () => {
    // Time-zone database (common knowledge): CET = UTC+1, AEST = UTC+10, EST = UTC−5, IST = UTC+5:30.
    expect(standardUtcOffsetHours('Europe/Copenhagen', 2026)).toBe(1);
    expect(standardUtcOffsetHours('Australia/Sydney', 2026)).toBe(10);
    expect(standardUtcOffsetHours('America/New_York', 2026)).toBe(-5);
    expect(standardUtcOffsetHours('Asia/Kolkata', 2026)).toBe(5.5);
  });

  // (whether a file's site and time zone match the scenario: checkWeatherFileSite, weatherFile.test.ts)
});
