/** Scenario files in: every shipped scenario validates, JSON is accepted, the schema is exported. */
import { describe, it, expect } from 'vitest';
import { readdirSync, readFileSync, writeFileSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parse } from 'yaml';
import { loadScenarioFile, validateScenario } from '../../src/scenario/load.ts';
import { ScenarioError } from '../../src/scenario/errors.ts';
import { scenarioJsonSchema } from '../../src/scenario/schema.ts';
import { KELVIN_OFFSET } from '../../src/properties/constants.ts';

describe('shipped scenarios', () => {
  const files = readdirSync('scenarios').filter((f) => f.endsWith('.yaml'));
  it.each(files)('%s validates', (file) => {
    const loaded = loadScenarioFile(join('scenarios', file));
    expect(loaded.inputs.layers.length).toBeGreaterThan(0);
  });
});

describe('loading', () => {
  it('accepts JSON as well as YAML, with the same result', () => {
    const raw = parse(readFileSync('scenarios/demo.yaml', 'utf8'));
    const file = join(mkdtempSync(join(tmpdir(), 'stackday-json-')), 'demo.json');
    writeFileSync(file, JSON.stringify(raw));
    const fromJson = loadScenarioFile(file).inputs;
    const fromYaml = loadScenarioFile('scenarios/demo.yaml').inputs;
    expect(fromJson.stack).toEqual(fromYaml.stack);
    expect(fromJson.flue.composition).toEqual(fromYaml.flue.composition);
  });

  it('converts to SI inside (temperatures in kelvin, thickness in metres)', () => {
    const { inputs } = loadScenarioFile('scenarios/demo.yaml');
    expect(inputs.layers[0]!.thickness).toBeCloseTo(0.05, 12); // "50 mm"
    expect(inputs.limits.shellTouchK).toBeCloseTo(60 + KELVIN_OFFSET, 9); // plain number in °C
    expect(inputs.run.outputInterval).toBe(600); // "10 min"
  });

  it('reports an inline material with a bad table, and a gap as the outer layer', () => {
    const raw = parse(readFileSync('scenarios/demo.yaml', 'utf8'));
    raw.stack.layers[0].material = { name: 'my castable', density: 2200, conductivity: [[20, 1.2], [10, 1.3]], specific_heat: 950, max_service_temperature: 1300 };
    raw.stack.layers.push({ material: 'air-gap', thickness: '20 mm' });
    try {
      validateScenario(raw);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(ScenarioError);
      const problems = (e as ScenarioError).problems.join('\n');
      expect(problems).toMatch(/stack\.layers\[0\]\.material\.conductivity/);
      expect(problems).toMatch(/stack\.layers\[3\]\.material: found an air gap as the outermost layer/);
    }
  });

  it('exports a JSON Schema that documents units and forbids unknown keys', () => {
    const schema = scenarioJsonSchema() as any;
    expect(schema.$schema).toMatch(/json-schema\.org/);
    expect(schema.additionalProperties).toBe(false);
    expect(schema.properties.site.additionalProperties).toBe(false);
    expect(JSON.stringify(schema.properties.stack.properties.height)).toMatch(/plain number in m/);
  });
});
