/**
 * A sweep three ways: serially, on a pool of threads, and planned, run as ordinary `stackday run`
 * processes by xargs -P (the plan's run-xargs.sh, with the compiled command) and collected. All
 * three write the same files, byte for byte; the invalid point is named in each and the exit code
 * says some points did not run.
 */
import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { runCli } from '../cli/helpers.ts';
import { shortDemoFile } from '../support/shortScenario.ts';

let dir: string;
let file: string;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'stackday-plan-'));
  // per-instant files the user thinned or turned off: a plan's runs still write what collect reads back
  file = shortDemoFile(dir, 'plan-base', (s) => {
    s.name = 'plan-base';
    s.output = { timeseries: 'daily-extremes', segments: 'off' };
  });
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const VARY = 'stack.layers[1].thickness=-5 mm,30 mm,60 mm';
const CHARTS = ['--chart-size', '500x300'];

describe('serial, pooled and planned-then-collected sweeps', () => {
  it('write byte-identical tables and charts', async () => {
    const serialOut = join(dir, 'serial');
    const pooledOut = join(dir, 'pooled');
    const plan = join(dir, 'plan');
    const serial = await runCli(['sweep', file, '--vary', VARY, '--threads', '1', '--out', serialOut, ...CHARTS]);
    expect(serial.code).toBe(5); // ran, wrote, but one point is not a valid scenario
    expect(serial.stderr).toMatch(/1 of 3 cases did not run: thickness-minus5mm \(not a valid scenario\)/);
    expect(serial.stdout).toMatch(/thickness-minus5mm: not a valid scenario\n\s+--vary \(stack\.layers\[1\]\.thickness\): found "-5 mm"; expected a positive length/);
    const pooled = await runCli(['sweep', file, '--vary', VARY, '--threads', '2', '--out', pooledOut, ...CHARTS]);
    expect(pooled.code).toBe(5);

    const planned = await runCli(['sweep', file, '--vary', VARY, '--plan', plan]);
    expect(planned.code).toBe(5);
    expect(readdirSync(join(plan, 'scenarios')).sort()).toEqual(['thickness-30mm.yaml', 'thickness-60mm.yaml']);
    for (const script of ['run-parallel.sh', 'run-xargs.sh', 'slurm-array.sh']) expect(existsSync(join(plan, script)), script).toBe(true);
    expect(readFileSync(join(plan, 'slurm-array.sh'), 'utf8')).toMatch(/#SBATCH --array=1-2\n/);
    expect(readFileSync(join(plan, 'run-parallel.sh'), 'utf8')).toMatch(/parallel .* :::: scenarios\.txt/);
    // the plan's runs as a batch system would run them: separate processes of the compiled command
    const xargs = spawnSync('sh', [join(plan, 'run-xargs.sh')], { env: { ...process.env, STACKDAY: `${process.execPath} ${resolve('bin/stackday.js')}`, JOBS: '2' }, encoding: 'utf8' });
    expect(xargs.status, xargs.stderr).toBe(0);
    const collected = await runCli(['collect', plan, ...CHARTS]);
    expect(collected.code).toBe(5);
    expect(collected.stdout).toMatch(/thickness-minus5mm: not a valid scenario/);

    const files = readdirSync(serialOut).sort();
    expect(files).toEqual(expect.arrayContaining(['sweep.csv', 'sweep.json', 'sweep-peak-shell.png', 'overlay-shell.png', 'overlay-heat-loss.png']));
    for (const other of [pooledOut, join(plan, 'results')]) for (const f of files) expect(readFileSync(join(other, f)).equals(readFileSync(join(serialOut, f))), `${other}/${f}`).toBe(true);
    // the table holds both runs and the invalid point
    const csv = readFileSync(join(serialOut, 'sweep.csv'), 'utf8').trim().split('\n');
    expect(csv.map((l) => l.split(',').slice(0, 3).join(','))).toEqual(['stack.layers[1].thickness (mm),name,status', '-5,thickness-minus5mm,invalid', '30,thickness-30mm,ran', '60,thickness-60mm,ran']);
  });

  it('copies a weather file into the plan, so each planned file is valid where it stands', async () => {
    const plan = join(dir, 'plan-weather');
    expect((await runCli(['sweep', 'scenarios/kiln-warmup.yaml', '--vary', 'surface.emissivity=0.5,0.9', '--plan', plan, '--quiet'])).code).toBe(0);
    expect(readdirSync(join(plan, 'weather'))).toEqual(['ridgeport-2026-01.csv']);
    expect(readFileSync(join(plan, 'weather', 'ridgeport-2026-01.csv')).equals(readFileSync('scenarios/weather/ridgeport-2026-01.csv'))).toBe(true);
    // a warm-up plan keeps every instant for collect
    expect(readFileSync(join(plan, 'scenarios', 'emissivity-0.5.yaml'), 'utf8')).toMatch(/^output:\n {2}timeseries: all\n {2}segments: all$/m);
    const check = await runCli(['check', join(plan, 'scenarios', 'emissivity-0.5.yaml')]);
    expect(check.code, check.stderr).toBe(0);
    // a plan is written once: a second plan into the same folder is refused
    expect((await runCli(['sweep', 'scenarios/kiln-warmup.yaml', '--vary', 'surface.emissivity=0.5', '--plan', plan])).stderr).toMatch(/--plan: .* holds a plan already \(manifest\.json\); choose a new folder/);
  });

  it('collect names the points whose runs are missing, and refuses a folder without a plan', async () => {
    const plan = join(dir, 'plan-unrun');
    expect((await runCli(['sweep', file, '--vary', 'surface.emissivity=0.8,0.9', '--plan', plan])).code).toBe(0);
    const none = await runCli(['collect', plan, '--no-charts']);
    expect(none.code).toBe(2); // nothing ran, nothing written
    expect(none.stderr).toMatch(/emissivity-0\.8: could not be computed\n\s+no results in runs\/emissivity-0\.8\//);
    const notAPlan = await runCli(['collect', dir]);
    expect(notAPlan.code).toBe(2);
    expect(notAPlan.stderr).toMatch(/no manifest\.json; expected a folder written by `stackday sweep --plan`/);
  });
});
