/** Sweeps written on the command line: lists and ranges of values as in the file, their points, names and overrides. */
import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { parseVary, parseRange, sweepPoints, rangePoints, SweepSpecError } from '../../../src/input/scenario/sweep.ts';
import { validateModelInputs } from '../../../src/input/scenario/validate.ts';
import { ScenarioError } from '../../../src/input/scenario/errors.ts';

const demo = parse(readFileSync('scenarios/demo.yaml', 'utf8'));

describe('parseVary', () => {
  it('reads a range with a step, the unit on every value, the numbers free of binary noise', () => {
    const a = parseVary('stack.layers[1].thickness=20 mm..120 mm step 20 mm');
    expect(a.path).toEqual(['stack', 'layers', 1, 'thickness']);
    expect(a.unit).toBe('mm');
    expect(a.values.map((v) => v.text)).toEqual(['20 mm', '40 mm', '60 mm', '80 mm', '100 mm', '120 mm']);
    expect(a.values[1]!.value).toBe('40 mm');
    // 0.1 steps: 0.1 · 3 = 0.30000000000000004 in binary; the value written is 0.3
    expect(parseVary('surface.emissivity=0.1..0.5 step 0.1').values.map((v) => v.value)).toEqual([0.1, 0.2, 0.3, 0.4, 0.5]);
    // one unit written once applies to the whole range
    expect(parseVary('stack.layers[1].thickness=20..60 mm step 20').values.map((v) => v.text)).toEqual(['20 mm', '40 mm', '60 mm']);
  });

  it('stops a range at the last whole step not beyond its end', () => {
    expect(rangePoints(parseRange('20..55 step 10', '--vary')!, 10, '--vary').map((v) => v.x)).toEqual([20, 30, 40, 50]);
  });

  it('reads a list of numbers, numbers with units, text and true/false; a list of one unit is a numeric axis', () => {
    const thick = parseVary('stack.layers[1].thickness=40 mm, 60 mm,100 mm');
    expect(thick.numeric).toBe(true);
    expect(thick.values.map((v) => [v.value, v.x])).toEqual([['40 mm', 40], ['60 mm', 60], ['100 mm', 100]]);
    const sun = parseVary('outside.sun=true,false');
    expect(sun.numeric).toBe(false);
    expect(sun.values.map((v) => v.value)).toEqual([true, false]);
    const mixed = parseVary('stack.layers[1].thickness=40 mm,2 in');
    expect(mixed.numeric).toBe(false); // different units are not one axis of numbers
    expect(parseVary('outside.sky=berdahl-martin,swinbank').values.map((v) => v.value)).toEqual(['berdahl-martin', 'swinbank']);
  });

  it('refuses what it cannot read, saying what was expected', () => {
    const bad: [string, RegExp][] = [
      ['stack.layers[1].thickness', /expected KEY\.PATH=VALUES/],
      ['stack..layers=1,2', /expected keys and list indices/],
      ['stack.layers[1].thickness=20 mm..120 mm', /without a step/],
      ['stack.layers[1].thickness=20 mm..120 in step 10 mm', /one unit/],
      ['stack.layers[1].thickness=120 mm..20 mm step 10 mm', /second end above the first/],
      ['stack.layers[1].thickness=20 mm..120 mm step -5 mm', /expected a positive step|expected a number/],
      ['stack.layers[1].thickness=0..1 step 0.00001', /at most 2000/],
      ['surface.emissivity=0.3,,0.9', /separated by commas/],
    ];
    for (const [text, message] of bad) expect(() => parseVary(text), text).toThrow(message);
    expect(() => parseVary('x')).toThrow(SweepSpecError);
  });
});

describe('sweepPoints', () => {
  it('makes every combination of two axes, the first outermost, with names usable as scenario and folder names', () => {
    const points = sweepPoints([parseVary('stack.layers[1].thickness=40 mm,60 mm'), parseVary('surface.solar_absorptance=0.3,0.9')]);
    expect(points.map((p) => p.name)).toEqual(['thickness-40mm_solar_absorptance-0.3', 'thickness-40mm_solar_absorptance-0.9', 'thickness-60mm_solar_absorptance-0.3', 'thickness-60mm_solar_absorptance-0.9']);
    for (const p of points) expect(p.name).toMatch(/^[A-Za-z0-9][A-Za-z0-9._-]*$/);
    const s = validateModelInputs(demo, { overrides: points[3]!.overrides }).scenario;
    expect(s.name).toBe(points[3]!.name);
    expect(s.stack.layers[1]!.thickness).toBeCloseTo(0.06, 12); // 60 mm in m (unit conversion only)
    expect(s.surface.solar_absorptance).toBe(0.9);
  });

  it('keeps names unique when a value repeats, and names a negative value without a leading dash', () => {
    expect(sweepPoints([parseVary('surface.emissivity=0.5,0.5')]).map((p) => p.name)).toEqual(['emissivity-0.5', 'emissivity-0.5-2']);
    expect(sweepPoints([parseVary('site.elevation=-20 m,0 m')])[0]!.name).toBe('elevation-minus20m');
  });

  it('a value the schema refuses is reported with the option and the key path', () => {
    const [p] = sweepPoints([parseVary('stack.layers[1].thickness=-5 mm')]);
    try {
      validateModelInputs(demo, { overrides: p!.overrides });
      expect.unreachable();
    } catch (e) {
      expect((e as ScenarioError).problems).toEqual([expect.stringMatching(/^--vary \(stack\.layers\[1\]\.thickness\): found "-5 mm"; expected a positive length/)]);
    }
  });

  it('takes one or two axes, never the same key twice', () => {
    const a = parseVary('surface.emissivity=0.5,0.6');
    expect(() => sweepPoints([])).toThrow(/one or two/);
    expect(() => sweepPoints([a, a])).toThrow(/twice/);
    expect(() => sweepPoints([a, a, a])).toThrow(/one or two/);
  });
});
