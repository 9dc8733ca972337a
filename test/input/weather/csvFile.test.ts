import { describe, it, expect } from 'vitest';
import { makeSiteClock } from '../../../src/model/clock.ts';
import { MAX_GAP_HOURS, MAX_ROW_PROBLEMS, WeatherFileError, parseWeatherCsv } from '../../../src/input/weather/csvFile.ts';

const clock = makeSiteClock('Europe/Oslo', '2026-07-14');
const FILE = 'oslo.csv';
const HEADER = 'time,air_temperature_c,wind_speed_m_s,cloud_cover,dew_point_c';
const good = [
  HEADER,
  '2026-07-14T00:00,14.0,2.0,0.5,10.0',
  '2026-07-14T01:00,13.0,3.0,0.7,10.0',
  '2026-07-14T02:00:00+02:00,12.0,4.0,0.9,9.0',
  '2026-07-14T03:00,11.0,4.0,1.0,9.0',
].join('\n');

/** The WeatherFileError thrown by parsing `text`, or fail. */
function errorOf(text: string): WeatherFileError {
  try {
    parseWeatherCsv(text, clock, FILE);
  } catch (e) {
    expect(e).toBeInstanceOf(WeatherFileError);
    return e as WeatherFileError;
  }
  throw new Error('expected a WeatherFileError');
}

/** Replace data line `n` (1 = first data row) of the good file. */
const withRow = (n: number, row: string) => good.split('\n').map((l, i) => (i === n ? row : l)).join('\n');

describe('parseWeatherCsv: a good file', () => {
  it('interpolates linearly in time between rows', () => {
    const src = parseWeatherCsv(good, clock, FILE);
    // Linear interpolation (hand computation): 00:30 local is halfway between 14.0 and 13.0 °C, 2 and 3 m/s.
    const t = clock.utcMs(1800);
    const a = src.at(t);
    expect(a.airTemperatureK).toBeCloseTo(13.5 + 273.15, 9);
    expect(a.windSpeed).toBeCloseTo(2.5, 12);
    expect(a.cloudCover).toBeCloseTo(0.6, 12);
    expect(a.dewPointK).toBeCloseTo(283.15, 9);
    expect(a.beamNormal).toBeUndefined();
    // A quarter of the way through 01:00–02:00: 13 − 0.25 = 12.75 °C, dew point 10 − 0.25 = 9.75 °C.
    const b = src.at(clock.utcMs(3600 + 900));
    expect(b.airTemperatureK).toBeCloseTo(12.75 + 273.15, 9);
    expect(b.dewPointK).toBeCloseTo(9.75 + 273.15, 9);
    // Exactly on rows, including the last.
    expect(src.at(clock.utcMs(3 * 3600)).airTemperatureK).toBeCloseTo(284.15, 9);
    expect(src.referenceHeightM).toBe(10);
    expect(src.rowCount).toBe(4);
  });

  it('reads local times in the site zone and honours explicit offsets', () => {
    const src = parseWeatherCsv(good, clock, FILE);
    // Oslo is UTC+2 in July: 2026-07-14T00:00 local = 2026-07-13T22:00Z.
    expect(src.firstUtcMs).toBe(Date.UTC(2026, 6, 13, 22));
    expect(src.lastUtcMs).toBe(Date.UTC(2026, 6, 14, 1));
    const z = parseWeatherCsv([HEADER, '2026-07-13T22:00Z,1,1,0,0', '2026-07-13T23:00-0000,2,1,0,0'].join('\n'), clock, FILE);
    expect(z.firstUtcMs).toBe(Date.UTC(2026, 6, 13, 22));
    expect(z.lastUtcMs).toBe(Date.UTC(2026, 6, 13, 23));
  });

  it('gives measured irradiance when both columns are present and ignores comments and unknown columns', () => {
    const text = [
      '# station 18700',
      'time,wind_speed_m_s,air_temperature_c,beam_normal_w_m2,diffuse_horizontal_w_m2,remark',
      '2026-07-14T12:00,3,20,800,100,ok',
      '',
      '2026-07-14T13:00,3,20,600,140,ok',
    ].join('\n');
    const src = parseWeatherCsv(text, clock, FILE, { referenceHeightM: 25 });
    const a = src.at(clock.utcMs(12.5 * 3600));
    expect(a.beamNormal).toBeCloseTo(700, 9);
    expect(a.diffuseHorizontal).toBeCloseTo(120, 9);
    expect(a.cloudCover).toBe(0);
    expect(src.hasIrradiance).toBe(true);
    expect(src.referenceHeightM).toBe(25);
    // Without a dew point column: the lowest air temperature within ±12 h (FAO-56 eq. 48), here 20 °C.
    expect(a.dewPointK).toBeCloseTo(293.15, 9);
  });

  it('says clearly when a run reaches outside the file', () => {
    const src = parseWeatherCsv(good, clock, FILE);
    expect(src.coversRange(src.firstUtcMs, src.lastUtcMs)).toEqual({ covered: true });
    const r = src.coversRange(src.firstUtcMs, src.lastUtcMs + 3_600_000);
    expect(r.covered).toBe(false);
    if (!r.covered) expect(r.message).toMatch(/oslo\.csv covers 2026-07-14T00:00:00\.000\+02:00 to 2026-07-14T03:00:00\.000\+02:00/);
    expect(() => src.at(src.lastUtcMs + 1000)).toThrow(/oslo\.csv: no data at 2026-07-14T03:00:01/);
    expect(() => src.at(src.firstUtcMs - 1000)).toThrow(WeatherFileError);
  });
});

describe('parseWeatherCsv: a sub-hourly file', () => {
  // every 10 minutes for two days, a sawtooth of the air temperature, no dew-point column
  const rows = [HEADER.replace(',dew_point_c', '')];
  const minutes = 2 * 24 * 60;
  const air = (m: number) => 10 + ((m * 7) % 23) - 0.002 * m;
  for (let m = 0; m <= minutes; m += 10) {
    const t = new Date(Date.UTC(2026, 6, 14, 0, m) - 2 * 3600_000).toISOString().slice(0, 16);
    rows.push(`${t}Z,${air(m).toFixed(3)},2.0,0.2`);
  }
  const src = parseWeatherCsv(rows.join('\n'), clock, FILE);

  it('is read like an hourly one, with its 10 min step as the time step', () => {
    expect(src.rowCount).toBe(minutes / 10 + 1);
    expect(src.timeStepS).toBe(600);
    // linear between rows (hand computation): 00:05 local is halfway between the 00:00 and 00:10 rows
    expect(src.at(clock.utcMs(300)).airTemperatureK).toBeCloseTo(273.15 + (Number(air(0).toFixed(3)) + Number(air(10).toFixed(3))) / 2, 9);
  });

  it('takes the dew point as the lowest air temperature within ±12 h, as a brute-force search does', () => {
    // FAO-56 eq. 48 (Allen et al. 1998) as the module applies it, against the direct search over the rows
    for (const m of [0, 355, 720, 1440, 2870]) {
      let lowest = Infinity;
      for (let j = Math.max(0, m - 720); j <= Math.min(minutes, m + 720); j += 10) lowest = Math.min(lowest, Number(air(j).toFixed(3)));
      const at = src.at(clock.utcMs(m * 60 - (m % 10) * 60));
      expect(at.dewPointK, `at ${m} min`).toBeCloseTo(Math.min(lowest + 273.15, at.airTemperatureK), 9);
    }
  });
});

describe('parseWeatherCsv: bad files name file, line and column', () => {
  it('missing required column', () => {
    const e = errorOf(['time,air_temperature_c', '2026-07-14T00:00,14', '2026-07-14T01:00,13'].join('\n'));
    expect(e.message).toMatch(/^oslo\.csv, line 1, column "wind_speed_m_s": required column "wind_speed_m_s" is missing/);
    expect([e.line, e.column]).toEqual([1, 'wind_speed_m_s']);
  });

  it('only one of the two irradiance columns', () => {
    const e = errorOf(['time,air_temperature_c,wind_speed_m_s,beam_normal_w_m2', '2026-07-14T00:00,14,1,0', '2026-07-14T01:00,13,1,0'].join('\n'));
    expect(e.message).toMatch(/line 1, column "diffuse_horizontal_w_m2"/);
  });

  it('empty cell', () => {
    const e = errorOf(withRow(2, '2026-07-14T01:00,,3.0,0.7,10.0'));
    expect(e.message).toBe('oslo.csv, line 3, column "air_temperature_c": empty cell');
  });

  it('short row (missing cell)', () => {
    const e = errorOf(withRow(2, '2026-07-14T01:00,13.0,3.0'));
    expect(e.message).toMatch(/line 3, column "cloud_cover": empty cell/);
  });

  it('not a number, NaN and Infinity', () => {
    expect(errorOf(withRow(1, '2026-07-14T00:00,14.0,fast,0.5,10.0')).message).toMatch(/line 2, column "wind_speed_m_s": "fast" is not a number/);
    expect(errorOf(withRow(1, '2026-07-14T00:00,NaN,2,0.5,10.0')).message).toMatch(/line 2, column "air_temperature_c": "NaN" is not a number/);
    expect(errorOf(withRow(1, '2026-07-14T00:00,14,Infinity,0.5,10.0')).message).toMatch(/line 2, column "wind_speed_m_s"/);
    expect(errorOf(withRow(1, '2026-07-14T00:00,14 C,2,0.5,10.0')).message).toMatch(/"14 C" is not a number/);
  });

  it('bad time stamp', () => {
    expect(errorOf(withRow(1, '14/07/2026 00:00,14.0,2.0,0.5,10.0')).message).toMatch(/line 2, column "time": time "14\/07\/2026 00:00" is not ISO 8601/);
    expect(errorOf(withRow(1, '2026-02-30T00:00,14.0,2.0,0.5,10.0')).message).toMatch(/line 2, column "time": .*not a valid date/);
  });

  it('unsorted times', () => {
    const e = errorOf(withRow(3, '2026-07-14T00:30,12.0,4.0,0.9,9.0'));
    expect(e.message).toMatch(/^oslo\.csv, line 4, column "time": time is earlier than on line 3/);
  });

  it('duplicate times (also the same instant written with and without offset)', () => {
    expect(errorOf(withRow(2, '2026-07-14T00:00,13.0,3.0,0.7,10.0')).message).toMatch(/line 3, column "time": time repeats the instant of line 2/);
    expect(errorOf(withRow(2, '2026-07-13T22:00Z,13.0,3.0,0.7,10.0')).message).toMatch(/line 3, column "time": time repeats/);
  });

  it(`gap longer than ${MAX_GAP_HOURS} h`, () => {
    const text = [HEADER, '2026-07-14T00:00,14,2,0.5,10', '2026-07-14T03:00,13,2,0.5,10', '2026-07-14T06:30,12,2,0.5,10'].join('\n');
    const e = errorOf(text);
    expect(e.message).toMatch(/line 4, column "time": gap of 3\.50 h after line 3 exceeds the 3 h allowed/);
  });

  it('values out of range', () => {
    expect(errorOf(withRow(1, '2026-07-14T00:00,61,2,0.5,10')).message).toMatch(/line 2, column "air_temperature_c": 61 °C is outside the accepted range -90…60/);
    expect(errorOf(withRow(1, '2026-07-14T00:00,-91,2,0.5,-95')).message).toMatch(/line 2, column "air_temperature_c"/);
    expect(errorOf(withRow(2, '2026-07-14T01:00,13,-0.1,0.5,10')).message).toMatch(/line 3, column "wind_speed_m_s".*0…75/);
    expect(errorOf(withRow(2, '2026-07-14T01:00,13,76,0.5,10')).message).toMatch(/line 3, column "wind_speed_m_s"/);
    expect(errorOf(withRow(3, '2026-07-14T02:00,13,3,1.2,10')).message).toMatch(/line 4, column "cloud_cover".*0…1/);
    const irr = ['time,air_temperature_c,wind_speed_m_s,beam_normal_w_m2,diffuse_horizontal_w_m2', '2026-07-14T12:00,20,3,800,100', '2026-07-14T13:00,20,3,1500,100'].join('\n');
    expect(errorOf(irr).message).toMatch(/line 3, column "beam_normal_w_m2": 1500 W\/m² is outside the accepted range 0…1400/);
  });

  it('dew point above the air temperature by more than 0.5 K', () => {
    expect(errorOf(withRow(4, '2026-07-14T03:00,11.0,4.0,1.0,11.6')).message).toMatch(/line 5, column "dew_point_c": dew point 11\.6 °C is above the air temperature 11 °C/);
    // 0.5 K of sensor noise is accepted, and the reported dew point is capped at the air temperature.
    const src = parseWeatherCsv(withRow(4, '2026-07-14T03:00,11.0,4.0,1.0,11.4'), clock, FILE);
    expect(src.at(src.lastUtcMs).dewPointK).toBeCloseTo(284.15, 9);
  });

  it('a local time skipped by the spring clock change', () => {
    // Europe/Oslo moved from 02:00 to 03:00 on 2026-03-29 (EU rule: last Sunday of March, 01:00 UTC).
    const text = [HEADER, '2026-03-29T01:00,1,2,0.5,0', '2026-03-29T02:30,1,2,0.5,0'].join('\n');
    expect(errorOf(text).message).toMatch(/line 3, column "time": local time "2026-03-29T02:30" does not exist in Europe\/Oslo/);
  });

  it('an empty file or a header alone', () => {
    expect(errorOf('').message).toMatch(/^oslo\.csv: the file is empty/);
    expect(errorOf(HEADER).message).toMatch(/^oslo\.csv: needs at least two data rows, found 0/);
  });
});

describe('parseWeatherCsv: rows that do not fit the header', () => {
  it('a row with more cells than the header is refused, naming the line and both counts', () => {
    expect(errorOf(withRow(2, '2026-07-14T01:00,13.0,3.0,0.7,10.0,extra')).message).toBe('oslo.csv, line 3: found 6 cells; expected 5, one per column of the header');
  });

  it('decimal commas are caught and said so, not split silently into other columns', () => {
    // "13,5" is read as the two cells 13 and 5: the row has one cell too many
    expect(errorOf(withRow(2, '2026-07-14T01:00,13,5,3.0,0.7,10.0')).message).toMatch(/^oslo\.csv, line 3: found 6 cells; expected 5, one per column of the header \(decimal commas\? numbers must use a decimal point, e\.g\. 12\.5/);
    // quoted, "13,5" stays one cell: a number with a decimal comma
    expect(errorOf(withRow(2, '2026-07-14T01:00,"13,5",3.0,0.7,10.0')).message).toMatch(/line 3, column "air_temperature_c": "13,5" is not a number \(a decimal comma\? write 13\.5\); expected the air temperature in °C from -90 to 60/);
  });

  it('a file separated by semicolons is said to be so', () => {
    const text = ['time;air_temperature_c;wind_speed_m_s', '2026-07-14T00:00;14,0;2,0', '2026-07-14T01:00;13,0;3,0'].join('\n');
    expect(errorOf(text).message).toMatch(/required column "time" is missing from the header .*separated by ";" or tabs, expected commas \(and decimal points\)/);
  });

  it('a value out of range says the quantity, the unit and the range', () => {
    expect(errorOf(withRow(2, '2026-07-14T01:00,13,76,0.5,10')).message).toMatch(/76 m\/s is outside the accepted range 0…75 m\/s; expected the wind speed in m\/s from 0 to 75/);
  });
});

describe('parseWeatherCsv: times are real calendar dates', () => {
  it.each(['2026-13-01T00:00', '2026-00-10T00:00', '0000-07-14T00:00', '2026-02-30T00:00', '2200-01-01T00:00'])('%s is refused with the accepted dates', (time) => {
    expect(errorOf(withRow(1, `${time},14.0,2.0,0.5,10.0`)).message).toBe(
      `oslo.csv, line 2, column "time": time "${time}" is not a valid date and time; expected a calendar date from 1900-01-01 to 2199-12-31 and a time from 00:00 to 23:59`,
    );
  });
});

describe('parseWeatherCsv: text from the file is never echoed raw', () => {
  it('a cell with control characters is escaped in the message', () => {
    const message = errorOf(withRow(1, '2026-07-14T00:00,1\u001b[2J4,2.0,0.5,10.0')).message;
    expect(message).toContain('"1\\u001b[2J4" is not a number');
    expect(message).not.toContain('\u001b');
  });
});

describe('parseWeatherCsv: one line per problem', () => {
  it('every row with a problem is reported, not only the first', () => {
    const text = [HEADER, '2026-07-14T00:00,14.0,fast,0.5,10.0', '2026-07-14T01:00,13,5,3.0,0.7,10.0', '2026-07-14T02:00,12.0,4.0,0.9,9.0', '2026-07-14T03:00,99,4.0,1.0,9.0'].join('\n');
    const e = errorOf(text);
    expect(e.message).toMatch(/^oslo\.csv, line 2, column "wind_speed_m_s": "fast" is not a number/);
    expect(e.more).toHaveLength(2);
    expect(e.more[0]).toMatch(/^oslo\.csv, line 3: found 6 cells; expected 5/);
    expect(e.more[1]).toMatch(/^oslo\.csv, line 5, column "air_temperature_c": 99 °C is outside the accepted range/);
  });

  it(`reading stops after ${MAX_ROW_PROBLEMS} rows with problems, and says so`, () => {
    const rows = Array.from({ length: 30 }, (_, h) => `2026-07-14T${String(h % 24).padStart(2, '0')}:00,1${h},5,2,0.5,10`); // decimal commas throughout
    const e = errorOf([HEADER, ...rows].join('\n'));
    expect(e.more).toHaveLength(MAX_ROW_PROBLEMS);
    expect(e.more.at(-1)).toBe(`oslo.csv: reading stopped after ${MAX_ROW_PROBLEMS} rows with problems`);
  });
});
