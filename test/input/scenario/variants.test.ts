/**
 * Variants in one file: each becomes overrides of the base case for the one validation path;
 * sections merge, lists and values replace, key paths set one value, null removes a key, and every
 * message about a key a variant set carries the variant's own path.
 */
import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parse, stringify } from 'yaml';
import { scenarioVariants, variantNames } from '../../../src/input/scenario/variants.ts';
import { fileCases, validateCase } from '../../../src/input/scenario/cases.ts';
import { validateModelInputs, withOverrides } from '../../../src/input/scenario/validate.ts';
import { ScenarioError } from '../../../src/input/scenario/errors.ts';

const demo = parse(readFileSync('scenarios/demo.yaml', 'utf8'));
let dir: string;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'stackday-variants-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function withVariants(variants: unknown): Record<string, unknown> {
  return { ...structuredClone(demo), variants };
}

function problemsOf(fn: () => unknown): string[] {
  try {
    fn();
  } catch (e) {
    if (e instanceof ScenarioError) return [...e.problems];
    throw e;
  }
  return [];
}

describe('scenarioVariants', () => {
  it('merges a section key by key, replaces a list, sets one value by key path, removes a key with null', () => {
    const raw = withVariants({
      white: { surface: { solar_absorptance: 0.3 } },
      rebuilt: { stack: { layers: [{ material: 'dense-castable', thickness: '60 mm' }, { material: 'carbon-steel', thickness: '8 mm' }] } },
      thick: { 'stack.layers[1].thickness': '100 mm' },
      'no-acid-limit': { limits: { acid_dew_margin: null } },
    });
    expect(variantNames(raw)).toEqual(['white', 'rebuilt', 'thick', 'no-acid-limit']);
    const made = Object.fromEntries(scenarioVariants(raw).map((v) => [v.name, withOverrides(raw, v.overrides) as any]));
    expect(made.white.surface).toEqual({ emissivity: 0.9, solar_absorptance: 0.3 }); // merged: the emissivity stays
    expect(made.rebuilt.stack.layers).toHaveLength(2); // replaced: a list is never merged item by item
    expect(made.rebuilt.stack.height).toBe('45 m');
    expect(made.thick.stack.layers.map((l: any) => l.thickness)).toEqual(['50 mm', '100 mm', '8 mm']);
    expect('acid_dew_margin' in made['no-acid-limit'].limits).toBe(false);
    expect(made['no-acid-limit'].limits.shell_touch).toBe(60);
    for (const [name, s] of Object.entries(made)) {
      expect(s.name).toBe(name); // a variant is named by its key
      expect('variants' in s).toBe(false);
    }
    // the raw file object is not changed by making its variants
    expect(raw.surface).toEqual(demo.surface);
  });

  it('validates each variant on its own and names its path in every message about a key it set', () => {
    const raw = withVariants({
      'thick-wool': { 'stack.layers[1].thickness': '-5 mm', surface: { emissivity: 2 } },
      'gap-inside': { stack: { layers: [{ material: 'air-gap', thickness: '20 mm' }, { material: 'carbon-steel', thickness: '8 mm' }] } },
    });
    const [thick, gap] = scenarioVariants(raw);
    const thickProblems = problemsOf(() => validateModelInputs(raw, { overrides: thick!.overrides }));
    expect(thickProblems).toEqual([
      expect.stringMatching(/^variants\.thick-wool\.stack\.layers\[1\]\.thickness: found "-5 mm"; expected a positive length/),
      expect.stringMatching(/^variants\.thick-wool\.surface\.emissivity: found 2; expected a fraction between 0 and 1/),
    ]);
    // a cross-field rule about a list the variant replaced names the variant too
    expect(problemsOf(() => validateModelInputs(raw, { overrides: gap!.overrides }))).toEqual([expect.stringMatching(/^variants\.gap-inside\.stack\.layers\[0\]\.material: found an air gap as the innermost layer/)]);
  });

  it('reports a key that is neither a key nor a key path as a problem of that variant', () => {
    const [v] = scenarioVariants(withVariants({ odd: { 'stack.layers[x].thickness': '1 m' } }));
    expect(v!.problems).toEqual([expect.stringMatching(/^variants\.odd: found the key "stack\.layers\[x\]\.thickness"; expected a key or a key path/)]);
  });

  it('checks the variants section with the base case: names and the form of each variant', () => {
    const problems = problemsOf(() => validateModelInputs(withVariants({ 'bad name!': {}, other: 5 })));
    expect(problems).toEqual([expect.stringMatching(/^variants\.bad name!: found the name "bad name!"; expected a variant name/), expect.stringMatching(/^variants\.other: found 5; expected a mapping/)]);
  });
});

describe('fileCases', () => {
  it('gives the base case first, then one case per variant; a bad variant stays a case of its own', () => {
    const file = join(dir, 'with-variants.yaml');
    writeFileSync(file, stringify(withVariants({ same: {}, broken: { 'surface.emissivity': 7 } })));
    const cases = fileCases(file);
    expect(cases.map((c) => c.name)).toEqual(['demo', 'same', 'broken']);
    // an empty variant is the base case under another name (the weather's functions aside, which JSON leaves out)
    const plain = (x: unknown) => JSON.parse(JSON.stringify(x));
    expect(plain(validateCase(cases[1]!).inputs)).toEqual({ ...plain(validateCase(cases[0]!).inputs), name: 'same' });
    expect(problemsOf(() => validateCase(cases[2]!))).toEqual([expect.stringMatching(/^variants\.broken\.surface\.emissivity: found 7/)]);
  });

  it('a base case that cannot run makes the whole file bad input', () => {
    const file = join(dir, 'bad-base.yaml');
    writeFileSync(file, stringify({ ...withVariants({ fine: {} }), surface: { emissivity: 3, solar_absorptance: 0.5 } }));
    expect(problemsOf(() => fileCases(file))).toEqual([expect.stringMatching(/^surface\.emissivity: found 3/)]);
  });
});
