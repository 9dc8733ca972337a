/**
 * The EPW reader against the hand-made fixture (one invented January day). Field order, ranges and
 * missing codes are those of the EnergyPlus "EPW Data Dictionary" (Auxiliary Programs
 * documentation): 35 fields Year … Liquid Precipitation Quantity; dry bulb and dew point
 * −70 < T < 70 °C, missing 99.9; wind 0–40 m/s, missing 999; radiation ≥ 0, missing 9999; total
 * sky cover 0–10, missing 99; hour 1–24 with "hour 1 = 00:01 to 01:00".
 */
import { describe, expect, it } from 'vitest';
import { EPW_FIELD_NAMES, parseEpw } from '../../../src/input/weather/epw.ts';
import { EPW_FIXTURE, EPW_INDEX, editRow, weatherFileErrorOf, epwYear } from './typicalYearFiles.ts';

const FILE = 'town.epw';

const errorOf = (text: string) => weatherFileErrorOf(() => parseEpw(text, FILE));
/** The fixture with data row `n` changed in field `name`. */
const withField = (n: number, name: string, value: string) =>
  editRow(EPW_FIXTURE, 8, n, (cells) => cells.map((c, i) => (i === EPW_INDEX[name] ? value : c)));
/** The fixture with header line `n` (1-based) replaced. */
const withHeader = (n: number, text: string) =>
  EPW_FIXTURE.split('\n')
    .map((l, i) => (i === n - 1 ? text : l))
    .join('\n');

describe('parseEpw: a good file', () => {
  it('names its 35 fields in the data-dictionary order, with the test positions matching', () => {
    expect(EPW_FIELD_NAMES).toHaveLength(35);
    for (const [name, i] of Object.entries(EPW_INDEX)) expect(EPW_FIELD_NAMES[i]).toBe(name);
  });

  it('reads a full year built from the fixture, with its site', () => {
    const src = parseEpw(epwYear(() => ({})), FILE, { year: 2026, referenceHeightM: 12 });
    expect(src.format).toBe('EPW');
    expect(src.site).toEqual({ name: 'Invented Test Town', stationId: '999002', latitudeDeg: 56.25, longitudeDeg: 10.5, elevationM: 42, utcOffsetHours: 1 });
    // Every row is the fixture's first row: −1.6 °C, dew point −3.6 °C, 6.4 m/s, 8/10 cloud.
    const a = src.at(Date.UTC(2026, 3, 1, 9, 10));
    expect(a.airTemperatureK).toBeCloseTo(273.15 - 1.6, 9);
    expect(a.dewPointK).toBeCloseTo(273.15 - 3.6, 9);
    expect(a.windSpeed).toBeCloseTo(6.4, 12);
    expect(a.cloudCover).toBeCloseTo(0.8, 12);
    expect(src.referenceHeightM).toBe(12);
  });

  it('takes values at and above the missing codes as missing', () => {
    // "if values in this field are >= the following number, it is considered missing"
    const src = parseEpw(epwYear((k) => (k === 7 ? { 'Dew Point Temperature': '150', 'Total Sky Cover': '99', 'Diffuse Horizontal Radiation': '10000' } : {})), FILE);
    expect(src.fallbacks).toEqual({ dewPoint: 1, cloudCover: 1, beamNormal: 0, diffuseHorizontal: 1 });
  });
});

describe('parseEpw: bad files name file, line and field', () => {
  it('a short file', () => {
    expect(errorOf(EPW_FIXTURE).message).toBe('town.epw: the file ends after 24 data rows (line 32); a typical year has 8760; the next expected is 01/02 hour ending 01:00');
  });

  it('a value that is not a number', () => {
    const e = errorOf(withField(2, 'Dry Bulb Temperature', '1;5'));
    expect(e.message).toBe('town.epw, line 10, column "Dry Bulb Temperature": "1;5" is not a number');
    expect([e.line, e.column]).toEqual([10, 'Dry Bulb Temperature']);
  });

  it('values out of range', () => {
    expect(errorOf(withField(1, 'Wind Speed', '45')).message).toMatch(/line 9, column "Wind Speed": 45 m\/s is outside the accepted range \(0…40 m\/s\)/);
    expect(errorOf(withField(1, 'Dry Bulb Temperature', '-70')).message).toMatch(/column "Dry Bulb Temperature": -70 °C is outside the accepted range \(above -70 and below 70 °C\)/);
    expect(errorOf(withField(1, 'Dry Bulb Temperature', '80')).message).toMatch(/80 °C is outside/); // not missing (< 99.9), not valid
    expect(errorOf(withField(1, 'Direct Normal Radiation', '2000')).message).toMatch(/column "Direct Normal Radiation": 2000 Wh\/m² is outside the accepted range \(0…1400/);
    expect(errorOf(withField(1, 'Total Sky Cover', '12')).message).toMatch(/column "Total Sky Cover": 12 tenths is outside/);
  });

  it('a missing value in a field the model needs', () => {
    expect(errorOf(withField(3, 'Dry Bulb Temperature', '99.9')).message).toMatch(/line 11, column "Dry Bulb Temperature": missing-value code 99.9 \(the format's code for no data is 99.9\), but the model needs/);
    expect(errorOf(withField(3, 'Wind Speed', '999')).message).toMatch(/column "Wind Speed": missing-value code 999/);
    expect(errorOf(withField(3, 'Wind Speed', '')).message).toMatch(/column "Wind Speed": empty field/);
  });

  it('a dew point above the air temperature', () => {
    expect(errorOf(withField(1, 'Dew Point Temperature', '5')).message).toMatch(/line 9, column "Dew Point Temperature": dew point 5 °C is above the air temperature -1.6 °C/);
  });

  it('a row with the wrong number of fields', () => {
    const e = errorOf(editRow(EPW_FIXTURE, 8, 5, (cells) => cells.slice(0, 32)));
    expect(e.message).toBe('town.epw, line 13: row has 32 fields; an EPW data row has 35 (Year … Liquid Precipitation Quantity)');
  });

  it('bad dates and hours', () => {
    expect(errorOf(withField(1, 'Month', '13')).message).toMatch(/line 9, column "Month": 13 is outside 1…12/);
    expect(errorOf(withField(1, 'Month', '2')).message).toMatch(/line 9, column "Month": expected 01\/01 hour ending 01:00 as data row 1/);
    expect(errorOf(withField(1, 'Day', '32')).message).toMatch(/column "Day": 32 is outside 1…31/);
    expect(errorOf(editRow(withField(1, 'Month', '4'), 8, 1, (c) => c.map((v, i) => (i === 2 ? '31' : v)))).message).toMatch(/column "Day": day 31 does not exist in month 4/);
    expect(errorOf(withField(1, 'Hour', '0')).message).toMatch(/column "Hour": 0 is outside 1…24/);
    expect(errorOf(withField(1, 'Hour', '1.5')).message).toMatch(/column "Hour": "1.5" is not a whole number/);
    expect(errorOf(withField(2, 'Hour', '3')).message).toMatch(/line 10, column "Hour": expected 01\/01 hour ending 02:00 as data row 2 .* found 01\/01 hour ending 03:00/);
    expect(errorOf(withField(2, 'Day', '2')).message).toMatch(/line 10, column "Day": expected 01\/01 hour ending 02:00/);
    expect(errorOf(withField(1, 'Minute', '75')).message).toMatch(/column "Minute": 75 is outside 0…60/);
    expect(errorOf(withField(1, 'Year', 'TMY')).message).toMatch(/column "Year": "TMY" is not a whole number/);
  });

  it('a wrong header', () => {
    expect(errorOf(withHeader(1, 'SITE,Invented Test Town,XX,XXX,x,999002,56.25,10.50,1.0,42.0')).message).toMatch(/^town\.epw, line 1, column "LOCATION": the first line starts with "SITE", but an EPW file starts with LOCATION/);
    expect(errorOf(withHeader(3, 'GROUND TEMPERATURES,0')).message).toMatch(/^town\.epw, line 3, column "TYPICAL\/EXTREME PERIODS": expected the TYPICAL\/EXTREME PERIODS header line here/);
    expect(errorOf(withHeader(8, 'DATA PERIODS,1,4,Data,Thursday, 1/ 1,12/31')).message).toMatch(/line 8, column "Number of Records per hour": 4 is outside 1…1/);
    expect(errorOf(withHeader(1, 'LOCATION,Invented Test Town,XX,XXX,x,999002,56.25,10.50,15,42.0')).message).toMatch(/line 1, column "TimeZone": 15 h is outside the accepted range \(-12…14 h\)/);
    expect(errorOf(withHeader(1, 'LOCATION,Invented Test Town,XX,XXX,x,999002,north,10.50,1,42.0')).message).toMatch(/line 1, column "Latitude": "north" is not a number/);
    expect(errorOf(withHeader(1, 'LOCATION,Town,56.25,10.50,1,42.0')).message).toMatch(/line 1: the LOCATION line has 6 fields; EPW gives 10/);
    expect(errorOf(EPW_FIXTURE.split('\n').slice(0, 4).join('\n')).message).toMatch(/the file ends before the HOLIDAYS\/DAYLIGHT SAVING header line/);
  });
});
