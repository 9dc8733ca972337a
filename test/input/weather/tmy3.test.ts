/**
 * The TMY3 reader against the hand-made fixture (one invented January day, in the layout of the
 * TMY3 manual: site line, header line, hourly rows with source and uncertainty flags). The header
 * line and the site-line layout were checked against a TMY3 file published with pvlib-python's
 * test data (723170TYA.CSV): same 71 column names, `USAF,"NAME",ST,TZ,lat,lon,elev`.
 */
import { describe, expect, it } from 'vitest';
import { parseTmy3 } from '../../../src/input/weather/tmy3.ts';
import { TMY3_FIXTURE, editRow, weatherFileErrorOf, tmy3Year } from './typicalYearFiles.ts';

const FILE = 'site.csv';
const header = TMY3_FIXTURE.split('\n')[1].split(',');
const col = (name: string) => header.indexOf(name);

const errorOf = (text: string) => weatherFileErrorOf(() => parseTmy3(text, FILE));
/** The fixture with data row `n` changed in column `name`. */
const withCell = (n: number, name: string, value: string) =>
  editRow(TMY3_FIXTURE, 2, n, (cells) => cells.map((c, i) => (i === col(name) ? value : c)));

describe('parseTmy3: a good file', () => {
  it('reads a full year built from the fixture, with its site', () => {
    const src = parseTmy3(tmy3Year(() => ({})), FILE, { year: 2026 });
    expect(src.rowCount).toBe(8760);
    expect(src.site.name).toBe('INVENTED TEST STATION, HILLTOP');
    // Every row is the fixture's first row: −5.5 °C, dew point −9.0 °C, 4.9 m/s, 10/10 cloud, night.
    const a = src.at(Date.UTC(2026, 6, 1, 17, 20));
    expect(a.airTemperatureK).toBeCloseTo(273.15 - 5.5, 9);
    expect(a.dewPointK).toBeCloseTo(273.15 - 9.0, 9);
    expect(a.windSpeed).toBeCloseTo(4.9, 12);
    expect(a.cloudCover).toBe(1);
    expect(a.beamNormal).toBe(0);
    expect(src.referenceHeightM).toBe(10);
  });

  it('accepts −9900 in an optional column and falls back there', () => {
    const src = parseTmy3(tmy3Year((k) => (k === 5 ? { 'DNI (W/m^2)': '-9900', 'Dew-point (C)': '-9900' } : {})), FILE);
    expect(src.fallbacks).toEqual({ dewPoint: 1, cloudCover: 0, beamNormal: 1, diffuseHorizontal: 0 });
  });
});

describe('parseTmy3: bad files name file, line and column', () => {
  it('a short file', () => {
    const e = errorOf(TMY3_FIXTURE);
    expect(e.message).toBe('site.csv: the file ends after 24 data rows (line 26); a typical year has 8760; the next expected is 01/02 hour ending 01:00');
  });

  it('a value that is not a number', () => {
    const e = errorOf(withCell(3, 'Dry-bulb (C)', 'mild'));
    expect(e.message).toBe('site.csv, line 5, column "Dry-bulb (C)": "mild" is not a number');
    expect([e.line, e.column]).toEqual([5, 'Dry-bulb (C)']);
  });

  it('values out of range', () => {
    expect(errorOf(withCell(1, 'Wspd (m/s)', '55')).message).toMatch(/line 3, column "Wspd \(m\/s\)": 55 m\/s is outside the accepted range \(0…40 m\/s\)/);
    expect(errorOf(withCell(1, 'Dry-bulb (C)', '70')).message).toMatch(/column "Dry-bulb \(C\)": 70 °C is outside the accepted range \(above -70 and below 70 °C\)/);
    expect(errorOf(withCell(1, 'TotCld (tenths)', '11')).message).toMatch(/column "TotCld \(tenths\)": 11 tenths is outside/);
    expect(errorOf(withCell(1, 'DNI (W/m^2)', '-3')).message).toMatch(/column "DNI \(W\/m\^2\)": -3 W\/m² is outside/);
  });

  it('a missing value in a field the model needs', () => {
    expect(errorOf(withCell(2, 'Dry-bulb (C)', '-9900')).message).toMatch(/line 4, column "Dry-bulb \(C\)": missing-value code -9900 .* but the model needs this quantity/);
    expect(errorOf(withCell(2, 'Wspd (m/s)', '')).message).toMatch(/line 4, column "Wspd \(m\/s\)": empty field, but the model needs/);
  });

  it('a dew point above the air temperature', () => {
    expect(errorOf(withCell(1, 'Dew-point (C)', '0.0')).message).toMatch(/line 3, column "Dew-point \(C\)": dew point 0 °C is above the air temperature -5.5 °C/);
  });

  it('a row with the wrong number of fields', () => {
    const e = errorOf(editRow(TMY3_FIXTURE, 2, 4, (cells) => cells.slice(0, -1)));
    expect(e.message).toBe('site.csv, line 6: row has 70 fields, the header line has 71');
  });

  it('bad dates and hours', () => {
    expect(errorOf(withCell(1, 'Date (MM/DD/YYYY)', '1999-01-01')).message).toMatch(/line 3, column "Date \(MM\/DD\/YYYY\)": "1999-01-01" is not a date MM\/DD\/YYYY/);
    expect(errorOf(withCell(1, 'Date (MM/DD/YYYY)', '02/30/1999')).message).toMatch(/"02\/30\/1999" is not a calendar date/);
    expect(errorOf(withCell(1, 'Time (HH:MM)', '25:00')).message).toMatch(/line 3, column "Time \(HH:MM\)": 25 is outside 1…24/);
    expect(errorOf(withCell(1, 'Time (HH:MM)', '01:30')).message).toMatch(/column "Time \(HH:MM\)": time 01:30: hourly rows end on the full hour/);
    expect(errorOf(withCell(1, 'Time (HH:MM)', '00:00')).message).toMatch(/0 is outside 1…24/);
    // a skipped hour: row 2 says 03:00
    expect(errorOf(withCell(2, 'Time (HH:MM)', '03:00')).message).toBe(
      'site.csv, line 4, column "Time (HH:MM)": expected 01/01 hour ending 02:00 as data row 2 (rows run hour by hour from 01/01 hour 1 to 12/31 hour 24), found 01/01 hour ending 03:00',
    );
    expect(errorOf(withCell(2, 'Date (MM/DD/YYYY)', '01/02/1999')).message).toMatch(/line 4, column "Date \(MM\/DD\/YYYY\)": expected 01\/01 hour ending 02:00/);
  });

  it('a 29 February row', () => {
    const text = tmy3Year((k) => (k === 59 * 24 ? { 'Date (MM/DD/YYYY)': '02/29/2000', 'Time (HH:MM)': '01:00' } : {}));
    expect(errorOf(text).message).toMatch(/expected 03\/01 hour ending 01:00 as data row 1417 .* found 02\/29 hour ending 01:00 \(a typical year has no 29 February\)/);
  });

  it('more rows than a year', () => {
    expect(errorOf(tmy3Year(() => ({}), 8761)).message).toMatch(/line 8763: more than 8760 data rows/);
  });

  it('a wrong header line', () => {
    const lines = TMY3_FIXTURE.split('\n');
    const noWind = [lines[0], lines[1].replace('Wspd (m/s)', 'Wind (m/s)'), ...lines.slice(2)].join('\n');
    expect(errorOf(noWind).message).toMatch(/^site\.csv, line 2, column "Wspd \(m\/s\)": required column "Wspd \(m\/s\)" is missing from the header line/);
    expect(errorOf(lines.slice(1).join('\n')).message).toMatch(/^site\.csv, line 1: line 1 is a column header, but a TMY3 file starts with its site line/);
    expect(errorOf(lines[0]).message).toMatch(/the file ends after the site line/);
    expect(errorOf('').message).toMatch(/the file is empty/);
  });

  it('a bad site line', () => {
    const lines = TMY3_FIXTURE.split('\n');
    const site = (s: string) => [s, ...lines.slice(1)].join('\n');
    expect(errorOf(site('999001,"X",XX,-5.0,95.0,-80.5,312')).message).toMatch(/^site\.csv, line 1, column "latitude": 95 ° is outside the accepted range \(-90…90 °\)/);
    expect(errorOf(site('999001,"X",XX,EST,40,-80.5,312')).message).toMatch(/line 1, column "time zone": "EST" is not a number/);
    expect(errorOf(site('999001,"X",XX,-5.0,40,-80.5')).message).toMatch(/line 1: the site line has 6 fields; TMY3 gives 7/);
  });
});
