/** Scenario files in: every shipped scenario validates, JSON is accepted, the schema is exported. */
import { describe, it, expect } from 'vitest';
import { readdirSync, readFileSync, writeFileSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parse } from 'yaml';
import { loadScenarioFile, validateScenario } from '../../../src/input/scenario/load.ts';
import { ScenarioError } from '../../../src/input/scenario/errors.ts';
import { scenarioJsonSchema } from '../../../src/input/scenario/schema.ts';
import { KELVIN_OFFSET } from '../../../src/physics/constants.ts';

describe('shipped scenarios', () => {
  const files = readdirSync('scenarios', { recursive: true, encoding: 'utf8' }).filter((f) => f.endsWith('.yaml'));
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

describe('flue gas inputs', () => {
  const raw = () => parse(readFileSync('scenarios/demo.yaml', 'utf8'));

  it('turns a volume flow at normal conditions into a mass flow with the gas molar mass (ideal gas at 0 °C, 101.325 kPa)', () => {
    const s = raw();
    s.flue.gas = { composition: { N2: 0.75, O2: 0.05, CO2: 0.1, H2O: 0.1 } };
    s.flue.schedule.daily = [{ time: '00:00', gas_temperature: 200, volume_flow: '10000 Nm^3/h' }];
    const { inputs } = validateScenario(s);
    // molar mass by hand: 0.75·28.0134 + 0.05·31.9988 + 0.10·44.0095 + 0.10·18.0153 g/mol (IUPAC atomic weights)
    const m = (0.75 * 28.0134 + 0.05 * 31.9988 + 0.1 * 44.0095 + 0.1 * 18.0153) / 1000;
    const rhoN = (101325 * m) / (8.314462618 * 273.15);
    const points = 'daily' in inputs.flue.schedule ? inputs.flue.schedule.daily : [];
    // 0.1 %: the program's molar masses may differ from these in the fourth figure
    expect(points[0]!.massFlow / ((10000 / 3600) * rhoN)).toBeCloseTo(1, 3);
  });

  it('accepts a user fuel analysis and rejects one that does not sum to 1', () => {
    const s = raw();
    s.flue.gas = { fuel_analysis: { C: 0.5, H: 0.06, O: 0.38, N: 0.005, S: 0.0005, moisture: 0.05, ash: 0.0045 }, excess_air: 0.4 };
    const { inputs } = validateScenario(s);
    expect(inputs.flue.composition.CO2).toBeGreaterThan(0.05);
    s.flue.gas.fuel_analysis.C = 0.7;
    expect(() => validateScenario(s)).toThrow(/flue\.gas\.fuel_analysis: .*sum to/);
  });

  it('asks for exactly one of fuel, fuel_analysis and composition', () => {
    const s = raw();
    s.flue.gas = { excess_air: 0.2 };
    expect(() => validateScenario(s)).toThrow(/flue\.gas: found none of fuel, fuel_analysis and composition/);
  });
});
