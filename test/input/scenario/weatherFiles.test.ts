/**
 * Typical-year weather files named by a scenario (`weather.file`): the format told by name and
 * content, the values the run sees equal to the hand-made file's rows (hours ending at the stamp in
 * the file's standard time, as the EPW data dictionary and the TMY3 manual define them), a bad field
 * reported through the scenario's one validation path with its file, line and column, and the
 * file's site and zone checked against the scenario's (an error for another place, a warning for a
 * nearby station, which then reaches the run's summary). Hand-made files: the fixtures of
 * test/input/weather/ made into whole years.
 */
import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parse } from 'yaml';
import { validateModelInputs } from '../../../src/input/scenario/validate.ts';
import { problemsOf } from '../../support/scenarioProblems.ts';
import { runScenario } from '../../../src/index.ts';
import { editRow, epwYear, tmy3Year, EPW_INDEX } from '../weather/typicalYearFiles.ts';

let dir: string;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'stackday-weather-files-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** Air temperature written into row k of the hand-made years, °C: a saw tooth through the day. */
const airAt = (k: number) => (k % 24) / 2 - 4;

/** The demo scenario with its weather from `file` and its site moved to (lat, lon) in `zone`. */
function scenarioWith(file: string, text: string, site: { latitude: number; longitude: number; time_zone: string; elevation?: number }) {
  writeFileSync(join(dir, file), text);
  const s = parse(readFileSync('scenarios/demo.yaml', 'utf8'));
  s.site = { ...s.site, ...site, first_day: '2026-03-10' };
  s.weather = { file, wind_reference_height: '10 m' };
  return s;
}


// the EPW fixture's site: 56.25° N, 10.50° E, 42 m, UTC+1 h (Europe/Copenhagen's standard time)
const NEAR_EPW = { latitude: 56.2, longitude: 10.4, time_zone: 'Europe/Copenhagen', elevation: 35 };

describe('an EPW file in the scenario', () => {
  const epw = () => epwYear((k) => ({ 'Dry Bulb Temperature': airAt(k).toFixed(1) }));

  it('is read as a typical year, and the run sees the file\'s row at its stamp', () => {
    const { inputs } = validateModelInputs(scenarioWith('town.epw', epw(), NEAR_EPW), { baseDir: dir });
    expect(inputs.weather.kind).toBe('file');
    if (inputs.weather.kind !== 'file') return;
    expect(inputs.weather.format).toBe('EPW');
    expect(inputs.weather.notes?.warnings).toEqual([]);
    // 10 March, hour ending 14:00 local standard time (UTC+1) is row (31 + 28 + 9) · 24 + 13
    const k = (31 + 28 + 9) * 24 + 13;
    const a = inputs.weather.source.at(Date.UTC(2026, 2, 10, 13, 0));
    expect(a.airTemperatureK - 273.15).toBeCloseTo(airAt(k), 9);
  });

  it('reports a bad field with the file, line and column through the scenario\'s problems', () => {
    // data row 100 is line 108 (eight header lines before the data)
    const bad = editRow(epw(), 8, 100, (cells) => cells.map((c, i) => (i === EPW_INDEX['Dry Bulb Temperature'] ? 'warm' : c)));
    expect(problemsOf(scenarioWith('bad.epw', bad, NEAR_EPW), { baseDir: dir })).toEqual(['weather.file: bad.epw, line 108, column "Dry Bulb Temperature": "warm" is not a number']);
  });

  it('is refused for a site clearly elsewhere (more than 300 km)', () => {
    const problems = problemsOf(scenarioWith('far.epw', epw(), { latitude: 52.0, longitude: 10.5, time_zone: 'Europe/Berlin' }), { baseDir: dir });
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatch(/^weather\.file: the weather file's site "Invented Test Town" .* is 473 km from the scenario's site/);
  });

  it('is accepted with a warning for a station 100 km off, and the warning and the file reach the run\'s summary', () => {
    const raw = scenarioWith('regional.epw', epw(), { latitude: 55.35, longitude: 10.5, time_zone: 'Europe/Copenhagen', elevation: 35 });
    raw.stack.segments = 2;
    raw.run = { days: 1, output_interval: '1 h', initial: 'steady' };
    const run = runScenario(validateModelInputs(raw, { baseDir: dir }));
    // 0.9° of latitude on the mean sphere: 0.9 · 111.195 km = 100 km
    expect(run.summary.warnings[0]).toMatch(/^weather file regional\.epw: .* is 100 km from the scenario's site/);
    expect(run.summary.assumptions.some((a) => a.startsWith('Weather: a typical year in the EPW format'))).toBe(true);
  });

  it('names the hours it filled by a model (dew point missing: the EPW code 99.9)', () => {
    const text = epwYear((k) => ({ 'Dry Bulb Temperature': airAt(k).toFixed(1), 'Dew Point Temperature': k < 48 ? '99.9' : undefined }));
    const { inputs } = validateModelInputs(scenarioWith('gaps.epw', text, NEAR_EPW), { baseDir: dir });
    if (inputs.weather.kind !== 'file') throw new Error('expected a file');
    expect(inputs.weather.notes?.assumptions.join(' ')).toContain('dew point in 48 hours from the lowest air temperature within ±12 h');
  });
});

describe('a TMY3 file in the scenario', () => {
  // the TMY3 fixture's site: 40.25° N, 80.5° W, 312 m, UTC−5 h (America/New_York's standard time)
  const NEAR_TMY3 = { latitude: 40.3, longitude: -80.4, time_zone: 'America/New_York', elevation: 300 };

  it('is told by its content under a .csv name and read as a typical year', () => {
    const text = tmy3Year((k) => ({ 'Dry-bulb (C)': airAt(k).toFixed(1) }));
    const { inputs } = validateModelInputs(scenarioWith('station.csv', text, NEAR_TMY3), { baseDir: dir });
    if (inputs.weather.kind !== 'file') throw new Error('expected a file');
    expect(inputs.weather.format).toBe('TMY3');
    // 10 March, hour ending 07:00 local standard time (UTC−5) is row 68 · 24 + 6, at 12:00 UTC
    expect(inputs.weather.source.at(Date.UTC(2026, 2, 10, 12, 0)).airTemperatureK - 273.15).toBeCloseTo(airAt(68 * 24 + 6), 9);
  });

  it('is refused when its UTC offset is two hours off the scenario zone\'s standard time', () => {
    const problems = problemsOf(scenarioWith('station2.csv', tmy3Year(() => ({})), { ...NEAR_TMY3, time_zone: 'America/Denver' }), { baseDir: dir });
    expect(problems).toEqual([expect.stringMatching(/^weather\.file: the weather file's hours are in UTC−5 h, but the standard time of America\/Denver is UTC−7 h/)]);
  });
});
