/**
 * What a problem line says: the key path as written in the file, the value as written, and what is
 * expected — for a number the quantity, its unit and its range; for a choice every allowed form.
 * Values that are not finite are called so (never "null"); unprintable text is escaped.
 * (The wording is the program's own; these checks pin down that each part is there.)
 */
import { describe, it, expect } from 'vitest';
import { writeFileSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { stringify } from 'yaml';
import { validateModelInputs } from '../../../src/input/scenario/validate.ts';
import { readScenarioSource } from '../../../src/input/scenario/load.ts';
import { ScenarioError } from '../../../src/input/scenario/errors.ts';
import { demoScenario, problemsOf } from './helpers.ts';
import { TERRAIN_EXPONENTS } from '../../../src/physics/outside/wind.ts';
import { SKY_MODELS } from '../../../src/physics/outside/boundary.ts';

const demo = demoScenario;
const dir = mkdtempSync(join(tmpdir(), 'stackday-messages-'));

/** The problem lines of a YAML text read as a file (values shown as written). */
function problemsOfYaml(name: string, text: string): string[] {
  const file = join(dir, name);
  writeFileSync(file, text);
  const { raw, written } = readScenarioSource(file);
  return problemsOf(raw, { file, written });
}
const edited = (edit: (s: any) => void) => {
  const s = demo();
  edit(s);
  return problemsOf(s);
};

describe('dates are real calendar dates', () => {
  it.each(['2026-13-01', '2026-00-10', '0000-01-10', '2026-02-30', '2200-01-01', '1899-12-31', '2026-7-15'])('site.first_day "%s" is refused, naming the key and the range', (date) => {
    const lines = edited((s) => (s.site.first_day = date));
    expect(lines).toEqual([`site.first_day: found "${date}"; expected a calendar date "YYYY-MM-DD" from 1900-01-01 to 2199-12-31`]);
  });

  it.each(['1900-01-01', '2199-12-31', '2028-02-29'])('site.first_day "%s" (in range, a real date) is accepted', (date) => {
    expect(edited((s) => (s.site.first_day = date))).toEqual([]);
  });
});

describe('numbers: the quantity, its unit and its range', () => {
  it('a missing thickness', () => {
    const lines = edited((s) => delete s.stack.layers[0].thickness);
    expect(lines).toEqual(['stack.layers[0].thickness: missing; expected a positive length (a plain number in m, or a string with a unit such as "115 mm")']);
  });

  it('a thickness of the wrong type', () => {
    const lines = edited((s) => (s.stack.layers[0].thickness = true));
    expect(lines[0]).toMatch(/^stack\.layers\[0\]\.thickness: found true; expected a positive length \(a plain number in m/);
  });

  it('a wrong unit names the quantity as well as the range', () => {
    const lines = edited((s) => (s.stack.height = '45 kg'));
    expect(lines[0]).toMatch(/^stack\.height: found "45 kg"; expected a length: a positive height \(a plain number in m/);
  });

  it('a 5000 °C gas is reported by the key in the file, in °C, with the accepted range', () => {
    const lines = edited((s) => (s.flue.schedule.daily[2].gas_temperature = 5000));
    expect(lines).toEqual([
      'flue.schedule.daily[2].gas_temperature: found 5000; expected a gas temperature from -50 °C to 1700 °C (a plain number in °C, or a string with a unit such as "480 degF")',
    ]);
    expect(lines[0]).not.toMatch(/kelvin|K\b|inletTemperature/);
  });

  it('a temperature with a unit is checked after conversion: 3000 degF (1649 °C) passes, 3200 degF (1760 °C) does not', () => {
    // °F → °C: (F − 32) / 1.8 (definition of the scale)
    expect(edited((s) => (s.flue.schedule.daily[2].gas_temperature = '3000 degF'))).toEqual([]);
    expect(edited((s) => (s.flue.schedule.daily[2].gas_temperature = '3200 degF'))[0]).toMatch(/gas_temperature: found "3200 degF"; expected a gas temperature from -50 °C to 1700 °C/);
  });

  it('a design-day air temperature takes the range of weather files (-90 to 60 °C)', () => {
    expect(edited((s) => (s.weather.design_day.max_air_temperature = 75))[0]).toMatch(/max_air_temperature: found 75; expected an air temperature from -90 °C to 60 °C/);
  });

  it('a dimensionless number names what it is and its range, also when the type is wrong', () => {
    expect(edited((s) => (s.surface.emissivity = 'shiny'))).toEqual(['surface.emissivity: found "shiny"; expected a fraction between 0 and 1']);
    expect(edited((s) => (s.run.relative_tolerance = 1))[0]).toMatch(/run\.relative_tolerance: found 1; expected a relative tolerance between 1e-9 and 0\.01/);
  });
});

describe('choices: every allowed form', () => {
  it('cells: 1000 names "auto" and the whole numbers 1 to 200', () => {
    expect(edited((s) => (s.stack.layers[0].cells = 1000))).toEqual(['stack.layers[0].cells: found 1000; expected "auto" or a whole number from 1 to 200 (cells across the layer)']);
  });

  it('days: forever names the whole numbers of days , "until-periodic" and "year"', () => {
    const [line] = edited((s) => (s.run.days = 'forever'));
    expect(line).toMatch(/^run\.days: found "forever"; expected a whole number from 1 to 366 \(days to simulate\), "until-periodic" .* or "year"/);
  });

  it('a terrain lists every terrain of the wind table and the exponent range', () => {
    const [line] = edited((s) => (s.site.terrain = 'forest'));
    for (const t of Object.keys(TERRAIN_EXPONENTS)) expect(line).toContain(`"${t}"`);
    expect(line).toMatch(/power-law exponent between 0\.05 and 0\.6/);
  });

  it.each(Object.keys(TERRAIN_EXPONENTS))('terrain "%s" (including flat) is accepted', (t) => {
    expect(edited((s) => (s.site.terrain = t))).toEqual([]);
  });

  it('a sky model lists every model of the sky table', () => {
    const [line] = edited((s) => (s.outside.sky = 'clear'));
    for (const m of Object.keys(SKY_MODELS)) expect(line).toContain(`"${m}"`);
  });

  it('an unknown material keeps its suggestion; a number for a material names both forms', () => {
    expect(edited((s) => (s.stack.layers[2].material = 'carbon-steal'))[0]).toMatch(/did you mean "carbon-steel"/);
    expect(edited((s) => (s.stack.layers[2].material = 7))[0]).toMatch(/material: found 7; expected the name of a material from the library .* or an inline material section/);
  });
});

describe('values that are not finite are called what they are', () => {
  const yaml = (value: string) => stringify(demo()).replace(/^(\s+)latitude: .*$/m, `$1latitude: ${value}`);
  it.each([
    ['.nan', /site\.latitude: found \.nan \(not a number\); expected degrees north between -90 and 90/],
    ['.inf', /site\.latitude: found \.inf \(infinity\); expected degrees north between -90 and 90/],
    ['-.inf', /site\.latitude: found -\.inf \(minus infinity\)/],
    ['1e400', /site\.latitude: found 1e400 \(too large for a number: read as infinity\)/],
  ])('YAML %s', (value, message) => {
    const lines = problemsOfYaml(`nonfinite-${value}.yaml`, yaml(value));
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(message);
    expect(lines[0]).not.toMatch(/null/);
  });

  it('a number is shown as written in the file (0x100, not 256)', () => {
    const lines = problemsOfYaml('hex.yaml', yaml('0x100'));
    expect(lines[0]).toMatch(/site\.latitude: found 0x100; expected degrees north/);
  });

  it('an overridden value is shown as given, not as the file wrote the key', () => {
    const file = join(dir, 'override.yaml');
    writeFileSync(file, stringify(demo()));
    const { raw, written } = readScenarioSource(file);
    expect(() => validateModelInputs(raw, { written, overrides: [{ path: ['run', 'days'], value: Number.NaN, option: '--days' }] })).toThrow(/--days \(run\.days\): found NaN \(not a number\)/);
  });
});

describe('text from the input is never echoed raw', () => {
  it('control characters in a value are escaped in the message', () => {
    const [line] = edited((s) => (s.outside.sky = 'bad\u001b[31mred'));
    expect(line).toContain('"bad\\u001b[31mred"');
    expect(line).not.toContain('\u001b');
  });

  it('an unknown key with unprintable characters is escaped', () => {
    const lines = edited((s) => (s.surface['emi\u0007ssivity'] = 1));
    expect(lines.join('\n')).toContain('emi\\u0007ssivity');
    expect(lines.join('\n')).not.toContain('\u0007');
  });

  it('a site name with control characters is refused (it would be printed in the reports)', () => {
    expect(edited((s) => (s.site.name = 'plant\u001b[2J'))[0]).toMatch(/^site\.name: found "plant\\u001b\[2J"; expected the name of the site \(text without control characters\)/);
  });

  it('a long value is cut and its length said', () => {
    const [line] = edited((s) => (s.outside.sky = 'x'.repeat(5000)));
    expect(line!.length).toBeLessThan(400);
    expect(line).toMatch(/\(5000 characters\)/);
  });
});

describe('resource-shaped values have limits', () => {
  it('a scenario name longer than 100 characters (a folder name) is refused', () => {
    expect(edited((s) => (s.name = 'x'.repeat(101)))[0]).toMatch(/^name: found "x+…" \(101 characters\); expected a name of 1 to 100 letters, digits/);
    expect(edited((s) => (s.name = 'x'.repeat(100)))).toEqual([]);
  });

  it('10 000 thin layers: one line about the limit of 20 layers', () => {
    const lines = edited((s) => (s.stack.layers = Array.from({ length: 10_000 }, () => ({ material: 'carbon-steel', thickness: '0.01 mm' }))));
    expect(lines).toEqual(['stack.layers: found a list of 10000 items; expected at most 20 wall layers (a limit of stackday)']);
  });

  it('a ScenarioError message shows at most 40 problem lines, and counts the rest', () => {
    const e = new ScenarioError(Array.from({ length: 45 }, (_, i) => `problem ${i}`));
    expect(e.message.split('\n')).toHaveLength(1 + 40 + 1);
    expect(e.message).toMatch(/45 problems/);
    expect(e.message).toMatch(/… and 5 more/);
  });
});
