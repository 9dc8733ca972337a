/** Scenario files in: every shipped scenario validates, JSON is accepted, the schema is exported. */
import { describe, it, expect } from 'vitest';
import { existsSync, readdirSync, readFileSync, writeFileSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parse, parseDocument, stringify } from 'yaml';
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

describe('what a file may be (limits.ts)', () => {
  const dir = mkdtempSync(join(tmpdir(), 'stackday-files-'));
  const demoText = readFileSync('scenarios/demo.yaml', 'utf8');
  const write = (name: string, content: string | Buffer) => {
    const file = join(dir, name);
    writeFileSync(file, content);
    return file;
  };
  /** The single problem line of reading `file`. */
  const problemOf = (file: string): string => {
    try {
      loadScenarioFile(file);
    } catch (e) {
      expect(e).toBeInstanceOf(ScenarioError);
      expect((e as ScenarioError).problems).toHaveLength(1);
      return (e as ScenarioError).problems[0]!;
    }
    return expect.unreachable() as never;
  };

  it('a JSON file with a byte-order mark is accepted, and so is a YAML one', () => {
    const raw = parse(demoText);
    expect(loadScenarioFile(write('bom.json', `\ufeff${JSON.stringify(raw)}`)).inputs.name).toBe('demo');
    expect(loadScenarioFile(write('bom.yaml', `\ufeff${demoText}`)).inputs.name).toBe('demo');
  });

  it('64 kB of random bytes are summarised, never echoed', () => {
    // a fixed pseudo-random sequence (a linear congruential generator, Numerical Recipes constants), so the test is repeatable
    const bytes = Buffer.alloc(65536);
    let x = 12345;
    for (let i = 0; i < bytes.length; i++) bytes[i] = (x = (Math.imul(x, 1664525) + 1013904223) >>> 0) >>> 24;
    const line = problemOf(write('random.yaml', bytes));
    expect(line).toMatch(/cannot be read: it is not text: 65536 bytes, \d+ of them not printable UTF-8 \(binary data\?\)/);
    expect(line).toMatch(/^[\x20-\x7e]*$/); // only printable ASCII: nothing of the file's bytes
  });

  it('a file in UTF-16 or with a stray Latin-1 byte is refused with what to do', () => {
    expect(problemOf(write('utf16.yaml', Buffer.from(`\ufeff${demoText}`, 'utf16le')))).toMatch(/it is UTF-16 text; .*save it as UTF-8/);
    const latin1 = Buffer.concat([Buffer.from(demoText.slice(0, 200)), Buffer.from([0xb0]), Buffer.from(demoText.slice(200))]);
    expect(problemOf(write('latin1.yaml', latin1))).toMatch(/1 character is not printable UTF-8 text \(the first on line \d+\)/);
  });

  it('an empty file, and a device that would be read forever, are refused', () => {
    expect(problemOf(write('empty.yaml', ' \n'))).toMatch(/^the file is empty; expected a scenario/);
    // /dev/zero exists on Linux and macOS, the systems stackday is run on
    if (existsSync('/dev/zero')) expect(problemOf('/dev/zero')).toBe('scenario file "/dev/zero" cannot be read: it is not a regular file; expected a scenario file');
  });

  it('a scenario file over 1 MB is refused before it is parsed', () => {
    const line = problemOf(write('huge.yaml', `${demoText}\n# ${'x'.repeat(1024 * 1024)}\n`));
    expect(line).toMatch(/it is 1\.\d MB; a scenario file may be at most 1\.0 MB \(a limit of stackday\)/);
  });

  it('a legitimate file naming one anchored day 150 times parses (the yaml default of 100 aliases would refuse it)', () => {
    const day = demoText.match(/ {4}daily:.*\n((?: {6}- .*\n)+)/)!;
    const perDay = `    per_day:\n      - &day\n${day[1]!.replace(/^ {6}- /gm, '        - ')}${'      - *day\n'.repeat(150)}`;
    const text = demoText.replace(day[0], perDay);
    expect(() => parseDocument(text).toJS()).toThrow(/alias/i); // the yaml package's default guard
    const loaded = loadScenarioFile(write('aliases.yaml', text));
    expect((loaded.inputs.flue.schedule as { perDay: unknown[] }).perDay).toHaveLength(151);
  });

  it('an alias bomb (nine levels of nine aliases) is refused with the limit', () => {
    let bomb = 'a: &a ["lol", "lol", "lol", "lol", "lol", "lol", "lol", "lol", "lol"]\n';
    for (const [name, prev] of [...'bcdefghi'].map((n, i) => [n, 'abcdefghi'[i]!])) bomb += `${name}: &${name} [${Array(9).fill(`*${prev}`).join(', ')}]\n`;
    expect(problemOf(write('bomb.yaml', bomb))).toMatch(/not a scenario: YAML aliases \(\*name\) expand beyond 10 000 uses \(a limit of stackday, against alias bombs/);
  });

  it('aliases that stay within the alias count but expand past a million values are refused', () => {
    // one anchored list of 1000 values used 1500 times: 1500 alias uses, 1.5 million values
    const text = `x: &x [${Array(1000).fill(1).join(',')}]\ny: [${Array(1500).fill('*x').join(',')}]\n`;
    expect(problemOf(write('wide.yaml', text))).toMatch(/more than 1 000 000 values once YAML aliases are expanded/);
  });

  it('deep nesting is refused up front: JSON and YAML brackets 100 000 deep, YAML indentation 40 deep', () => {
    const started = performance.now();
    expect(problemOf(write('deep.json', `${'['.repeat(100_000)}${']'.repeat(100_000)}`))).toMatch(/nest more than 32 levels deep/);
    expect(problemOf(write('deep.yaml', `a: ${'['.repeat(100_000)}${']'.repeat(100_000)}`))).toMatch(/brackets nest more than 32 levels deep/);
    expect(problemOf(write('indent.yaml', Array.from({ length: 40 }, (_, i) => `${'  '.repeat(i)}k:`).join('\n') + ' 1\n'))).toMatch(/nest more than 32 levels deep/);
    // the YAML parser alone runs out of memory on the bracket file (measured): refusing must be quick
    expect(performance.now() - started).toBeLessThan(5000); // generous for a shared 2-core machine
  });

  it('quoted brackets and apostrophes in plain text do not count as nesting', () => {
    const raw = parse(demoText);
    raw.description = `the plant's "[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[" stack`;
    raw.site.name = "Brennholm's ['{{{{{{{{{{{{{{{{{{{{{{{{{{{{{{{{{{{{{{{{{'] yard";
    const text = stringify(raw);
    expect(loadScenarioFile(write('quoted.yaml', text)).inputs.name).toBe('demo');
  });
});
