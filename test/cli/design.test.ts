/**
 * The design commands end to end: compare a file's variants, sweep one or two values, size the
 * thinnest insulation that passes (checked by separate runs of the answer and of one step thinner),
 * with bad input and partial failures reported as such.
 */
import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCli } from './helpers.ts';
import { shortDemoFile } from '../support/shortScenario.ts';

let dir: string;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'stackday-design-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** The short demo without the acid-dew-point limit (which no insulation meets on this day), so that the shell touch limit governs. */
const shellGoverned = (name: string, edit: (s: any) => void = () => {}) =>
  shortDemoFile(dir, name, (s) => {
    s.name = name;
    delete s.limits.acid_dew_margin;
    edit(s);
  });

describe('compare', () => {
  it('compares the base case and the variants of one file; a bad variant is named with its problem, the others run (exit 5)', async () => {
    const file = shortDemoFile(dir, 'with-variants', (s) => {
      s.variants = { 'thick-wool': { 'stack.layers[1].thickness': '100 mm' }, broken: { surface: { emissivity: 1.5 } } };
    });
    const out = join(dir, 'cmp');
    const r = await runCli(['compare', file, '--out', out, '--chart-size', '500x300', '--threads', '1']);
    expect(r.code).toBe(5);
    expect(r.stderr).toMatch(/1 of 3 cases did not run: broken \(not a valid scenario\)/);
    expect(r.stdout).toMatch(/COMPARISON OF 2 BUILD-UPS/);
    expect(r.stdout).toMatch(/broken: not a valid scenario\n\s+variants\.broken\.surface\.emissivity: found 1\.5; expected a fraction between 0 and 1/);
    const c = JSON.parse(readFileSync(join(out, 'comparison.json'), 'utf8'));
    expect(c.rows.map((x: { scenario: string }) => x.scenario)).toEqual(['demo', 'thick-wool']);
    expect(c.not_run).toEqual([{ scenario: 'broken', status: 'invalid', problems: [expect.stringMatching(/^variants\.broken\.surface\.emissivity/)] }]);
    expect(readdirSync(out).sort()).toEqual(['comparison.csv', 'comparison.json', 'overlay-acid-margin-top.png', 'overlay-heat-loss.png', 'overlay-inner-surface-top.png', 'overlay-shell.png']);
  });

  it('mixes files and files with variants, as before: every file a build-up', async () => {
    const a = shellGoverned('mix-a');
    const b = shortDemoFile(dir, 'mix-b', (s) => {
      s.name = 'mix-b';
      s.variants = { 'mix-b-white': { 'surface.solar_absorptance': 0.3 } };
    });
    const r = await runCli(['compare', a, b, '--json', '--threads', '1']);
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout).rows.map((x: { scenario: string }) => x.scenario)).toEqual(['mix-a', 'mix-b', 'mix-b-white']);
  });
});

describe('check', () => {
  it('validates every variant of a file and reports each bad one with its path (exit 2)', async () => {
    const file = shortDemoFile(dir, 'check-variants', (s) => {
      s.variants = { fine: { 'surface.emissivity': 0.8 }, broken: { 'stack.layers[2].thickness': '0 mm' } };
    });
    const r = await runCli(['check', file]);
    expect(r.code).toBe(2);
    expect(r.stdout).toMatch(/variant "fine": valid/);
    expect(r.stderr).toMatch(/variants\.broken\.stack\.layers\[2\]\.thickness: found "0 mm"; expected a positive length/);
  });
});

describe('sweep', () => {
  it('a sweep of two values writes the table, a chart per key figure with its limit and the pass/fail map', async () => {
    const file = shellGoverned('map');
    const out = join(dir, 'map-out');
    const r = await runCli(['sweep', file, '--vary', 'stack.layers[1].thickness=20 mm,60 mm', '--vary', 'surface.solar_absorptance=0.3,0.9', '--out', out, '--chart-size', '500x300']);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/SWEEP OF stack\.layers\[1\]\.thickness × surface\.solar_absorptance: 4 points/);
    const files = readdirSync(out);
    for (const f of ['sweep.csv', 'sweep.json', 'sweep-pass-map.png', 'sweep-peak-shell.png', 'sweep-peak-lining.png', 'sweep-water-margin.png', 'sweep-stress.png', 'sweep-heat-loss.png']) expect(files, f).toContain(f);
    const table = JSON.parse(readFileSync(join(out, 'sweep.json'), 'utf8'));
    expect(table.rows.map((x: { values: string[] }) => x.values.join(' '))).toEqual(['20 mm 0.3', '20 mm 0.9', '60 mm 0.3', '60 mm 0.9']);
    // a darker shell in the sun runs hotter, with either insulation (physics sanity)
    const shell = table.rows.map((x: { figures: { peak_shell_c: number } }) => x.figures.peak_shell_c);
    expect(shell[1]).toBeGreaterThan(shell[0]);
    expect(shell[3]).toBeGreaterThan(shell[2]);
  });

  it('bad --vary text is bad input (exit 2), and nothing is written', async () => {
    const file = shellGoverned('bad-vary');
    for (const [vary, message] of [
      ['stack.layers[1].thickness', /--vary: found "stack\.layers\[1\]\.thickness"; expected KEY\.PATH=VALUES/],
      ['stack.layers[1].thickness=20 mm..60 mm', /without a step/],
    ] as const) {
      const out = join(dir, `bad-${Math.random().toString(36).slice(2)}`);
      const r = await runCli(['sweep', file, '--vary', vary, '--out', out]);
      expect(r.code).toBe(2);
      expect(r.stderr).toMatch(message);
      expect(existsSync(out)).toBe(false);
    }
    expect((await runCli(['sweep', file, '--vary', 'surface.emissivity=0.5,0.6', '--threads', 'many'])).stderr).toMatch(/--threads: found "many"/);
  });

  it('every value invalid: nothing ran, nothing written (exit 2)', async () => {
    const out = join(dir, 'all-bad');
    const r = await runCli(['sweep', shellGoverned('all-bad'), '--vary', 'surface.emissivity=1.5,2', '--out', out]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/Nothing ran; nothing was written/);
    expect(existsSync(out)).toBe(false);
  });
});

describe('size', () => {
  it('finds the thinnest insulation that meets every limit; separate runs confirm it passes and one step thinner fails', async () => {
    const file = shellGoverned('size');
    const r = await runCli(['size', file, '--vary', 'stack.layers[1].thickness=5 mm..100 mm', '--resolution', '5 mm', '--json', '--threads', '1']);
    expect(r.code).toBe(0);
    const answer = JSON.parse(r.stdout);
    expect(answer.status).toBe('found');
    expect(answer.governing.map((g: { limit: string }) => g.limit)).toContain('shell_touch');
    const mm = Number(/^(\d+) mm$/.exec(answer.value)![1]);
    expect(answer.one_step_beyond.value).toBe(`${mm - 5} mm`);
    // independent check: ordinary runs of the answer and of one step thinner
    const verdict = async (thickness: string) => {
      const f = shellGoverned(`size-${thickness.replace(' ', '')}`, (s) => (s.stack.layers[1].thickness = thickness));
      const run = await runCli(['run', f, '--json', '--no-charts', '--out', join(dir, `run-${thickness.replace(' ', '')}`)]);
      return JSON.parse(run.stdout).all_limits_pass as boolean;
    };
    expect(await verdict(`${mm} mm`)).toBe(true);
    expect(await verdict(`${mm - 5} mm`)).toBe(false);
  });

  it('says so when no value of the range passes (exit 3), and refuses a range it cannot read (exit 2)', async () => {
    const file = shellGoverned('size-none', (s) => (s.limits.shell_touch = 20));
    const none = await runCli(['size', file, '--vary', 'stack.layers[1].thickness=20 mm..40 mm', '--resolution', '10 mm', '--threads', '1']);
    expect(none.code).toBe(3);
    expect(none.stdout).toMatch(/no value of the range meets every limit/);
    const bad = await runCli(['size', file, '--vary', 'stack.layers[1].thickness=20 mm,40 mm', '--resolution', '10 mm']);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/expected a range FROM\.\.TO/);
    const unit = await runCli(['size', file, '--vary', 'stack.layers[1].thickness=20 mm..40 mm', '--resolution', '1 in']);
    expect(unit.code).toBe(2);
    expect(unit.stderr).toMatch(/--resolution: found "1 in"; expected a positive step in the range's unit \(mm\)/);
  });

  it('every probe invalid: nothing ran, nothing written (exit 2)', async () => {
    const out = join(dir, 'size-all-bad');
    const r = await runCli(['size', shellGoverned('size-all-bad'), '--vary', 'surface.emissivity=1.5..2', '--resolution', '0.5', '--threads', '1', '--out', out]);
    expect(r.code).toBe(2);
    expect(existsSync(out)).toBe(false);
  });
});
