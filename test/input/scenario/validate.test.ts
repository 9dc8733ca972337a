/**
 * The one validation path (validateModelInputs): defaults pass through the same unit conversion as
 * written values, every list the schema offers comes from its data table, and overrides are
 * validated with everything else.
 */
import { describe, it, expect } from 'vitest';
import { mkdtempSync, readFileSync, truncateSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parse } from 'yaml';
import { validateModelInputs } from '../../../src/input/scenario/validate.ts';
import { ScenarioError } from '../../../src/input/scenario/errors.ts';
import { problemsOf } from './helpers.ts';
import { TERRAIN_EXPONENTS } from '../../../src/physics/outside/wind.ts';
import { SKY_MODELS } from '../../../src/physics/outside/boundary.ts';
import { scenarioJsonSchema } from '../../../src/input/scenario/schema.ts';

const demo = () => parse(readFileSync('scenarios/demo.yaml', 'utf8'));

describe('defaults', () => {
  it('an omitted run.output_interval is 10 minutes (600 s), not 10 seconds', () => {
    const s = demo();
    delete s.run.output_interval;
    expect(validateModelInputs(s).inputs.run.outputInterval).toBe(600);
  });

  it('an omitted run section gets every run default', () => {
    const s = demo();
    delete s.run;
    const { run } = validateModelInputs(s).inputs;
    expect(run.mode).toBe('cycle');
    expect(run.outputInterval).toBe(600);
    expect(run.integrator).toBe('implicit');
    expect(run.length).toEqual({ kind: 'days', days: 1 });
  });
});

describe('lists from their data tables', () => {
  it.each(Object.keys(TERRAIN_EXPONENTS))('terrain "%s" from the wind table is accepted, with its exponent', (terrain) => {
    const s = demo();
    s.site.terrain = terrain;
    expect(validateModelInputs(s).inputs.site.windExponent).toBe(TERRAIN_EXPONENTS[terrain as keyof typeof TERRAIN_EXPONENTS]);
  });

  it('the JSON Schema offers exactly the sky models of the sky-model table', () => {
    const schema = scenarioJsonSchema() as any;
    expect(schema.properties.outside.properties.sky.enum).toEqual(Object.keys(SKY_MODELS));
  });
});

describe('overrides', () => {
  it('are applied before validation and named in messages by option and key', () => {
    try {
      validateModelInputs(demo(), { overrides: [{ path: ['run', 'days'], value: 0, option: '--days' }] });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(ScenarioError);
      expect((e as ScenarioError).problems.join('\n')).toMatch(/^--days \(run\.days\): found 0; expected a whole number from 1 to 366/m);
    }
  });

  it('leave the caller\'s object unchanged', () => {
    const s = demo();
    validateModelInputs(s, { overrides: [{ path: ['run', 'days'], value: 3 }] });
    expect(s.run.days).toBe('until-periodic');
  });
});

describe('the weather file is read only when it is text of a reasonable size', () => {
  const dir = mkdtempSync(join(tmpdir(), 'stackday-weather-'));
  const withWeatherFile = (name: string) => {
    const s = demo();
    delete s.weather.design_day;
    s.weather.file = name;
    s.run.days = 1;
    return s;
  };

  it('a weather file over 16 MiB is refused before it is read', () => {
    const big = join(dir, 'big.csv');
    writeFileSync(big, '');
    truncateSync(big, 17 * 1024 * 1024); // a sparse file: its size, without writing 17 MB
    expect(problemsOf(withWeatherFile('big.csv'), { baseDir: dir })).toEqual(['weather.file: found "big.csv"; expected a readable weather file: an hourly CSV, an EPW or a TMY3 file (it is 17.8 MB; a weather file may be at most 16.8 MB (a limit of stackday))']);
  });

  it('a weather file of binary data is summarised', () => {
    writeFileSync(join(dir, 'binary.csv'), Buffer.from([0x74, 0x69, 0x6d, 0x65, 0, 0, 0xff, 0x01]));
    expect(problemsOf(withWeatherFile('binary.csv'), { baseDir: dir })[0]).toMatch(/^weather\.file: found "binary\.csv"; expected a readable weather file: an hourly CSV, an EPW or a TMY3 file \(it is not text: 8 bytes, 4 of them not printable UTF-8/);
  });
});

describe('issue 10: geometry, design-day shape, initial wall and accuracy', () => {
  it('accepts any positive inner diameter, 40 m windshields included (no arbitrary cap)', () => {
    const s = demo();
    s.stack.inner_diameter = '40 m';
    expect(validateModelInputs(s).inputs.stack.innerDiameter).toBe(40);
    s.stack.inner_diameter = 0;
    expect(() => validateModelInputs(s)).toThrow(/stack\.inner_diameter: found 0; expected a length: a positive diameter/);
  });

  it('takes a sinusoidal design day with its minimum at a given time, and refuses minimum_at with the published profile', () => {
    const s = demo();
    s.weather.design_day.shape = 'sinusoid';
    s.weather.design_day.minimum_at = '04:00';
    const { inputs } = validateModelInputs(s);
    const clockAt = (h: number) => Date.parse(`2026-07-15T${String(h).padStart(2, '0')}:00:00+02:00`);
    // minimum 12 °C at 04:00, maximum 26 °C at 16:00 (the demo's range)
    expect(inputs.weather.source.at(clockAt(4)).airTemperatureK).toBeCloseTo(285.15, 9);
    expect(inputs.weather.source.at(clockAt(16)).airTemperatureK).toBeCloseTo(299.15, 9);
    const t = demo();
    t.weather.design_day.minimum_at = '04:00';
    expect(() => validateModelInputs(t)).toThrow(/weather\.design_day\.minimum_at: found it with shape ashrae-2009; expected it only with shape: sinusoid/);
  });

  it('reads run.accuracy as estimate (default), off, or a target in K', () => {
    const s = demo();
    expect(validateModelInputs(s).inputs.run.accuracy).toEqual({ kind: 'estimate' });
    s.run.accuracy = 'off';
    expect(validateModelInputs(s).inputs.run.accuracy).toEqual({ kind: 'off' });
    s.run.accuracy = '0.05 K';
    expect(validateModelInputs(s).inputs.run.accuracy).toEqual({ kind: 'target', targetK: 0.05 });
    s.run.accuracy = 0;
    expect(() => validateModelInputs(s)).toThrow(/run\.accuracy/);
  });

  it('reads a uniform initial wall in °C', () => {
    const s = demo();
    s.run.initial = { temperature: 12 };
    expect(validateModelInputs(s).inputs.run.initial).toEqual({ kind: 'uniform', temperatureK: 285.15 });
  });
});
