/**
 * The one validation path (validateModelInputs): defaults pass through the same unit conversion as
 * written values, every list the schema offers comes from its data table, and overrides are
 * validated with everything else.
 */
import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { validateModelInputs } from '../../../src/input/scenario/validate.ts';
import { ScenarioError } from '../../../src/input/scenario/errors.ts';
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
