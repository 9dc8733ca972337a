/**
 * The command line: bad input of every kind gets exit code 2, one clear line per problem (path,
 * value found, what was expected with units) and leaves nothing written; a good run writes its files.
 */
import { describe, it, expect, beforeAll } from 'vitest';
import { mkdtempSync, readFileSync, writeFileSync, existsSync, mkdirSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parse, stringify } from 'yaml';
import { runCli } from './helpers.ts';

const demo = parse(readFileSync('scenarios/demo.yaml', 'utf8'));
let dir: string;

/** A copy of the demo, changed by `edit`, with a short run so the tests stay fast. */
function scenarioFile(name: string, edit: (s: any) => void = () => {}): string {
  const s = structuredClone(demo);
  s.run.days = 1;
  s.run.output_interval = 30;
  s.stack.segments = 4;
  edit(s);
  const file = join(dir, `${name}.yaml`);
  writeFileSync(file, stringify(s));
  return file;
}

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'stackday-cli-'));
});

async function expectBadInput(args: string[], ...messages: (string | RegExp)[]) {
  const out = join(dir, `out-${Math.random().toString(36).slice(2)}`);
  const r = await runCli([...args, '--out', out]);
  expect(r.code).toBe(2);
  for (const m of messages) expect(r.stderr).toMatch(m);
  expect(r.stderr).not.toMatch(/\n\s+at .*\(.*:\d+:\d+\)/); // no stack trace
  expect(r.stderr).not.toMatch(/NaN/);
  expect(existsSync(out)).toBe(false); // nothing written
  return r;
}

describe('bad input', () => {
  it('a missing file', async () => {
    await expectBadInput(['run', join(dir, 'nope.yaml')], /cannot be read: no such file/);
  });

  it('an unreadable file (a folder)', async () => {
    const folder = join(dir, 'a-folder.yaml');
    mkdirSync(folder, { recursive: true });
    await expectBadInput(['run', folder], /cannot be read/);
  });

  it('a file that is not YAML', async () => {
    const file = join(dir, 'broken.yaml');
    writeFileSync(file, 'name: [unclosed\nsite: {');
    await expectBadInput(['run', file], /not valid YAML/);
  });

  it('a negative thickness names the path, the value and the unit expected', async () => {
    const file = scenarioFile('neg', (s) => (s.stack.layers[1].thickness = '-5 mm'));
    await expectBadInput(['run', file], /stack\.layers\[1\]\.thickness: found "-5 mm"; expected a positive length.*plain number in m/);
  });

  it('an emissivity above 1', async () => {
    const file = scenarioFile('eps', (s) => (s.surface.emissivity = 1.3));
    await expectBadInput(['run', file], /surface\.emissivity: found 1\.3; expected a fraction between 0 and 1/);
  });

  it('a latitude outside ±90', async () => {
    const file = scenarioFile('lat', (s) => (s.site.latitude = 123));
    await expectBadInput(['run', file], /site\.latitude: found 123; expected degrees north between -90 and 90/);
  });

  it('a wrong unit', async () => {
    const file = scenarioFile('unit', (s) => (s.stack.height = '45 kg'));
    await expectBadInput(['run', file], /stack\.height: found "45 kg"; expected .*length/);
  });

  it('a typo in a key is an error, not ignored', async () => {
    const file = scenarioFile('typo', (s) => {
      s.surface.emisivity = 0.9;
    });
    await expectBadInput(['run', file], /surface\.emisivity: unknown key/);
  });

  it('an unknown material gets a suggestion', async () => {
    const file = scenarioFile('mat', (s) => (s.stack.layers[2].material = 'carbon-steal'));
    await expectBadInput(['run', file], /stack\.layers\[2\]\.material: found "carbon-steal".*did you mean "carbon-steel"/);
  });

  it('several problems are all reported, one line each', async () => {
    const file = scenarioFile('many', (s) => {
      s.surface.emissivity = -1;
      s.site.latitude = 91;
      s.stack.layers[0].thickness = 0;
      s.site.time_zone = 'Europe/Copenhagn';
      s.stack.layers[1].material = 'calcium-silicat';
      s.flue.gas.fuel = 'heavy-oil';
    });
    const r = await expectBadInput(
      ['run', file],
      /surface\.emissivity/,
      /site\.latitude/,
      /stack\.layers\[0\]\.thickness/,
      /site\.time_zone: found "Europe\/Copenhagn"/,
      /stack\.layers\[1\]\.material: found "calcium-silicat".*did you mean "calcium-silicate"/,
      /flue\.gas\.fuel: found "heavy-oil"; expected one of/,
    );
    expect(r.stderr).toMatch(/6 problems/);
  });

  it('a schedule whose times go backwards', async () => {
    const file = scenarioFile('sched', (s) => (s.flue.schedule.daily[3].time = '04:00'));
    await expectBadInput(['run', file], /flue\.schedule\.daily\[3\]\.time: found "04:00"; expected a time not before/);
  });

  it('a bad time zone', async () => {
    const file = scenarioFile('tz', (s) => (s.site.time_zone = 'Mars/Olympus'));
    await expectBadInput(['run', file], /site\.time_zone: found "Mars\/Olympus"/);
  });

  it('a bad command-line option', async () => {
    const file = scenarioFile('opt');
    await expectBadInput(['run', file, '--chart-size', 'huge'], /--chart-size: found "huge"/);
  });
});

describe('a good run', () => {
  it('writes summary.json, timeseries.csv, segments.csv and state.json and exits 0', async () => {
    const file = scenarioFile('good');
    const out = join(dir, 'good-out');
    const r = await runCli(['run', file, '--out', out, '--no-charts', '--quiet']);
    expect(r.code).toBe(0);
    expect(readdirSync(out).sort()).toEqual(['segments.csv', 'state.json', 'summary.json', 'timeseries.csv']);
    const summary = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
    expect(summary.peak_shell_c).toBeTypeOf('number');
    expect(JSON.stringify(summary)).not.toMatch(/NaN/);
    const csv = readFileSync(join(out, 'timeseries.csv'), 'utf8').split('\n');
    expect(csv[0]).toBe('time,hours,height_m,position,radius_m,temperature_c');
    // tidy form: instants × segments × nodes rows (+ header, + final newline)
    expect(csv.length - 2).toBe(summary.run.segments * summary.run.nodes_per_segment * (24 * 2 + 1));
  });

  it('--strict exits 3 when a limit fails, 0 without it', async () => {
    const file = scenarioFile('strict', (s) => (s.limits.shell_touch = 25));
    const out = join(dir, 'strict-out');
    expect((await runCli(['run', file, '--out', out, '--no-charts', '--quiet'])).code).toBe(0);
    const r = await runCli(['run', file, '--out', out, '--no-charts', '--quiet', '--strict']);
    expect(r.code).toBe(3);
    expect(r.stderr).toMatch(/shell_touch/);
  });

  it('prints the JSON Schema and the material list', async () => {
    const schema = await runCli(['schema']);
    expect(schema.code).toBe(0);
    const parsed = JSON.parse(schema.stdout);
    expect(parsed.properties.stack.properties.layers.type).toBe('array');
    const mats = await runCli(['materials']);
    expect(mats.code).toBe(0);
    for (const name of ['carbon-steel', 'fireclay-brick', 'mineral-wool', 'air-gap']) expect(mats.stdout).toContain(name);
  });

  it('--version and --help exit 0', async () => {
    expect((await runCli(['--version'])).code).toBe(0);
    expect((await runCli(['run', '--help'])).code).toBe(0);
  });
});

describe('the installed command (a real process)', () => {
  it('prints its version once and exits 0; exits 2 on a missing file', async () => {
    const { spawnSync } = await import('node:child_process');
    const v = spawnSync(process.execPath, ['bin/stackday.js', '--version'], { encoding: 'utf8' });
    expect(v.status).toBe(0);
    expect(v.stdout).toBe(`${JSON.parse(readFileSync('package.json', 'utf8')).version}\n`);
    const bad = spawnSync(process.execPath, ['bin/stackday.js', 'run', join(dir, 'missing.yaml')], { encoding: 'utf8' });
    expect(bad.status).toBe(2);
    expect(bad.stderr).toMatch(/cannot be read: no such file/);
  });
});

describe('compare', () => {
  it('runs several build-ups and writes comparison.json and comparison.csv', async () => {
    const a = scenarioFile('cmp-a', (s) => (s.name = 'cmp-a'));
    const b = scenarioFile('cmp-b', (s) => {
      s.name = 'cmp-b';
      s.stack.layers[1].thickness = '100 mm';
    });
    const out = join(dir, 'cmp-out');
    const r = await runCli(['compare', a, b, '--out', out]);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/COMPARISON OF 2 BUILD-UPS/);
    const c = JSON.parse(readFileSync(join(out, 'comparison.json'), 'utf8'));
    expect(c.rows.map((x: { scenario: string }) => x.scenario)).toEqual(['cmp-a', 'cmp-b']);
    // more insulation loses less heat (physics, not a regression value)
    expect(c.rows[1].heat_loss_kwh_per_day).toBeLessThan(c.rows[0].heat_loss_kwh_per_day);
  });

  it('runs nothing and writes nothing when any scenario is bad', async () => {
    const a = scenarioFile('cmp-ok');
    const bad = scenarioFile('cmp-bad', (s) => (s.surface.emissivity = 2));
    await expectBadInput(['compare', a, bad], /surface\.emissivity/);
  });
});

describe('weather files through the command', () => {
  /** The demo scenario reading its weather from a CSV file with the given text. */
  function withWeatherFile(name: string, csvText: string): string {
    const csv = join(dir, `${name}.csv`);
    writeFileSync(csv, csvText);
    return scenarioFile(name, (s) => {
      delete s.weather.design_day;
      s.weather.file = csv;
    });
  }

  it('a weather file with a repeated time is bad input naming the line', async () => {
    const file = withWeatherFile('dup', 'time,air_temperature_c,wind_speed_m_s\n2026-07-15T00:00,15,3\n2026-07-15T01:00,14,3\n2026-07-15T01:00,14,3\n2026-07-16T01:00,14,3\n');
    await expectBadInput(['run', file], /weather\.file: .*line 4/);
  });

  it('a weather file that does not cover the run is bad input', async () => {
    const file = withWeatherFile('short', 'time,air_temperature_c,wind_speed_m_s\n2026-07-15T00:00,15,3\n2026-07-15T06:00,14,3\n');
    await expectBadInput(['run', file], /weather\.file: /);
  });
});

describe('command-line overrides go through the one validation path', () => {
  it('--days past the end of the weather file is bad input (exit 2) naming the option, not an unexpected error', async () => {
    // kiln-warmup.yaml's weather file covers a few days of January; 5 days from firing start run past it
    await expectBadInput(['run', 'scenarios/kiln-warmup.yaml', '--days', '5'], /weather\.file: .*covers .* but the run needs/);
  });

  it('--days that is not a whole number names the option, the key and the range', async () => {
    await expectBadInput(['run', scenarioFile('days-bad'), '--days', 'forever'], /--days \(run\.days\): found "forever"/);
  });
});

describe('bad options and odd files (exit 2, nothing written)', () => {
  it('--chart-heights "" is not 0 m', async () => {
    await expectBadInput(['run', scenarioFile('heights-empty'), '--chart-heights', ''], /--chart-heights: found ""; expected heights in m from 0 to the stack height \(45 m\), separated by commas/);
  });

  it('--chart-heights above the stack, or not numbers', async () => {
    await expectBadInput(['run', scenarioFile('heights-high'), '--chart-heights', '5,500'], /--chart-heights: found "5,500"/);
    await expectBadInput(['run', scenarioFile('heights-text'), '--chart-heights', '5,,20'], /--chart-heights: found "5,,20"/);
  });

  it('--chart-size beyond 4000 pixels a side', async () => {
    await expectBadInput(['run', scenarioFile('size-big'), '--chart-size', '9999x9999'], /--chart-size: found "9999x9999"; expected WIDTHxHEIGHT in pixels, each from 100 to 4000/);
  });

  it('an impossible first day', async () => {
    await expectBadInput(['run', scenarioFile('date-13', (s) => (s.site.first_day = '2026-13-01'))], /site\.first_day: found "2026-13-01"; expected a calendar date "YYYY-MM-DD" from 1900-01-01 to 2199-12-31/);
  });

  it('a scenario name too long to name a folder', async () => {
    await expectBadInput(['run', scenarioFile('long-name', (s) => (s.name = 'n'.repeat(300)))], /^\s+name: found "n+…" \(300 characters\); expected a name of 1 to 100/m);
  });

  it('64 kB of random bytes as a scenario: a short, printable summary', async () => {
    const file = join(dir, 'random.yaml');
    const bytes = Buffer.alloc(65536);
    let x = 1;
    for (let i = 0; i < bytes.length; i++) bytes[i] = (x = (Math.imul(x, 1664525) + 1013904223) >>> 0) >>> 24; // repeatable LCG (Numerical Recipes constants)
    writeFileSync(file, bytes);
    const r = await expectBadInput(['run', file], /it is not text: 65536 bytes/);
    expect(r.stderr.length).toBeLessThan(400);
    expect(r.stderr).toMatch(/^[\x20-\x7e\n]*$/);
  });

  it('a JSON scenario with a byte-order mark and terrain "flat" checks out', async () => {
    const file = join(dir, 'bom-flat.json');
    writeFileSync(file, `\ufeff${JSON.stringify({ ...demo, site: { ...demo.site, terrain: 'flat' } })}`);
    const r = await runCli(['check', file]);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/valid scenario "demo"/);
  });
});

describe('warnings of validation', () => {
  it('check prints them and still exits 0 (a flow of 45 m/s in the demo flue, above the usual 30 m/s)', async () => {
    // 45 m/s × ρ 0.726 kg/m³ (hand figure for the demo's flue gas at 205 °C) × A 1.5394 m² ≈ 50 kg/s
    const file = scenarioFile('fast-gas', (s) => (s.flue.schedule.daily[2].mass_flow = s.flue.schedule.daily[3].mass_flow = 50));
    const r = await runCli(['check', file]);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^  warning: flue\.schedule\.daily\[2\]\.mass_flow: 50\.0 kg\/s at 205 °C .* above the usual 30 m\/s of stacks/m);
  });
});

describe('the output folder cannot be written (exit 4, a one-line message naming the path and the cause)', () => {
  async function expectEnvironmentFailure(args: string[], message: RegExp) {
    const r = await runCli(args);
    expect(r.code).toBe(4);
    expect(r.stderr).toMatch(message);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).not.toMatch(/unexpected|internal error|\n\s+at /);
    return r;
  }

  it('a file in the way of the folder, reported before the run', async () => {
    const file = join(dir, 'a-file');
    writeFileSync(file, 'keep me');
    const started = performance.now();
    await expectEnvironmentFailure(['run', scenarioFile('obstacle-file'), '--out', file, '--no-charts', '--quiet'], new RegExp(`cannot write "${file}": it is a file, not a folder \\(ENOTDIR\\); the results were not written`));
    expect(performance.now() - started).toBeLessThan(3000); // up front: the run itself takes longer (generous for a shared machine)
    expect(readFileSync(file, 'utf8')).toBe('keep me');
  });

  it('a folder asked for under a file', async () => {
    const file = join(dir, 'another-file');
    writeFileSync(file, 'keep me');
    await expectEnvironmentFailure(['run', scenarioFile('obstacle-under'), '--out', join(file, 'sub', 'out'), '--no-charts', '--quiet'], new RegExp(`cannot write "${file}": it is a file, where a folder is needed`));
  });

  it('a target file that is a folder', async () => {
    // the results folder is swapped in whole, so a folder that holds anything stackday did not write
    // (here a folder where summary.json goes) is refused before the run, and left as it was
    const out = join(dir, 'target-folder');
    mkdirSync(join(out, 'summary.json'), { recursive: true });
    await expectEnvironmentFailure(['run', scenarioFile('obstacle-target'), '--out', out, '--no-charts', '--quiet'], new RegExp(`output folder "${out}" .*summary\\.json`));
    expect(readdirSync(join(out, 'summary.json'))).toEqual([]); // the folder in the way is left as it was
  });

  it('a folder name too long for the file system (255 bytes on common file systems)', async () => {
    await expectEnvironmentFailure(['run', scenarioFile('obstacle-long'), '--out', join(dir, 'x'.repeat(300)), '--no-charts', '--quiet'], /a name in the path is too long for the file system \(ENAMETOOLONG\)/);
  });

  it('compare --out a file', async () => {
    const file = join(dir, 'cmp-file');
    writeFileSync(file, 'keep me');
    const a = scenarioFile('cmp-env-a', (s) => (s.name = 'cmp-env-a'));
    const b = scenarioFile('cmp-env-b', (s) => (s.name = 'cmp-env-b'));
    await expectEnvironmentFailure(['compare', a, b, '--out', file], /it is a file, not a folder \(ENOTDIR\)/);
  });

  it('a sweep into a folder holding files stackday did not write: refused before any case runs', async () => {
    const out = join(dir, 'sweep-foreign');
    mkdirSync(out, { recursive: true });
    writeFileSync(join(out, 'notes.txt'), 'keep me');
    // eight cases of two weeks each take well over 5 s serially; the refusal comes before the first
    const week = scenarioFile('sweep-foreign', (x) => Object.assign(x.run, { days: 14, output_interval: 10 }));
    const started = performance.now();
    await expectEnvironmentFailure(['sweep', week, '--vary', 'surface.emissivity=0.2,0.3,0.4,0.5,0.6,0.7,0.8,0.9', '--threads', '1', '--out', out, '--quiet'], new RegExp(`output folder "${out}" .*notes\\.txt`));
    expect(performance.now() - started).toBeLessThan(5000);
    expect(readdirSync(out)).toEqual(['notes.txt']);
  });
});
