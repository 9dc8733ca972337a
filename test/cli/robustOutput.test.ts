/**
 * The command's results hold up, run as separate processes of the compiled package (as a user
 * runs it): the same input gives byte-identical files under another locale and time zone; a run
 * killed while writing, or between the two renames that swap its folder in, leaves the old results
 * whole and the next run cleans up after it; two runs into one folder never mix.
 */
import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { spawn } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { parse, stringify } from 'yaml';

const ROOT = resolve(__dirname, '../..');
const BIN = join(ROOT, 'bin/stackday.js');
let dir: string;

/** The demo cut short: 4 segments, 1 day at an output interval of `intervalMin` minutes. */
function scenario(name: string, intervalMin: number): string {
  const s = parse(readFileSync(join(ROOT, 'scenarios/demo.yaml'), 'utf8'));
  s.stack.segments = 4;
  s.run.days = 1;
  s.run.output_interval = intervalMin;
  const file = join(dir, `${name}.yaml`);
  writeFileSync(file, stringify(s));
  return file;
}

interface Child {
  readonly done: Promise<{ code: number | null; signal: NodeJS.Signals | null; stderr: string }>;
  /** Resolves when the child says it paused (the test hook). */
  readonly paused: Promise<void>;
  kill(): void;
  readonly pid: number;
}

/** `stackday <args>` in a child process with extra environment. */
function stackday(args: string[], env: Record<string, string> = {}): Child {
  const child = spawn(process.execPath, [BIN, ...args], { cwd: ROOT, env: { ...process.env, ...env }, stdio: ['ignore', 'ignore', 'pipe'] });
  let stderr = '';
  let onPause: () => void = () => {};
  const paused = new Promise<void>((r) => (onPause = r));
  child.stderr.on('data', (d: Buffer) => {
    stderr += d.toString();
    if (/paused at/.test(stderr)) onPause();
  });
  const done = new Promise<{ code: number | null; signal: NodeJS.Signals | null; stderr: string }>((ok, fail) => {
    child.on('error', fail);
    child.on('close', (code, signal) => ok({ code, signal, stderr }));
  });
  return { done, paused, kill: () => child.kill('SIGKILL'), pid: child.pid! };
}

/** Every file of a folder with its bytes. */
function contents(folder: string): Map<string, Buffer> {
  return new Map(readdirSync(folder).sort().map((f) => [f, readFileSync(join(folder, f))]));
}

function expectSameFiles(a: Map<string, Buffer>, b: Map<string, Buffer>): void {
  expect([...a.keys()]).toEqual([...b.keys()]);
  for (const [f, bytes] of a) expect(bytes.equals(b.get(f)!), f).toBe(true);
}

/** Names beside the target left by runs: `<target>.stackday-tmp-…` and `<target>.stackday-old-…`. */
const leftovers = (parent: string) => readdirSync(parent).filter((f) => /\.stackday-(tmp|old)-/.test(f));

let fileA: string;
let fileB: string;
let referenceA: Map<string, Buffer>;
let referenceB: Map<string, Buffer>;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'stackday-robust-'));
  fileA = scenario('a', 20);
  fileB = scenario('b', 30);
  const [a, b] = [stackday(['run', fileA, '--no-charts', '--quiet', '--out', join(dir, 'ref-a')]), stackday(['run', fileB, '--no-charts', '--quiet', '--out', join(dir, 'ref-b')])];
  expect((await a.done).code).toBe(0);
  expect((await b.done).code).toBe(0);
  referenceA = contents(join(dir, 'ref-a'));
  referenceB = contents(join(dir, 'ref-b'));
}, 60_000);
afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('the same input gives the same bytes', () => {
  it('under a German locale in the São Paulo time zone as under C in UTC, charts and report included', async () => {
    const runs = [
      { out: join(dir, 'locale-c'), env: { LANG: 'C', LC_ALL: 'C', TZ: 'UTC' } },
      { out: join(dir, 'locale-de'), env: { LANG: 'de_DE.UTF-8', LC_ALL: 'de_DE.UTF-8', TZ: 'America/Sao_Paulo' } },
    ].map((r) => ({ ...r, child: stackday(['run', fileA, '--quiet', '--chart-size', '500x300', '--out', r.out], r.env) }));
    for (const r of runs) expect((await r.child.done).code).toBe(0);
    const [c, de] = runs.map((r) => contents(r.out));
    expect([...c!.keys()]).toContain('report.html');
    expect([...c!.keys()].filter((f) => f.endsWith('.png')).length).toBeGreaterThan(3);
    expectSameFiles(c!, de!);
    // and the CSVs are the reference run's (run earlier, at another time): no timing in any file
    for (const f of ['summary.json', 'timeseries.csv', 'segments.csv']) expect(c!.get(f)!.equals(referenceA.get(f)!), f).toBe(true);
  }, 120_000);
});

/** Results of scenario A in `name`, then a run of B into it killed where the test hook pauses it. */
async function killedOver(name: string, point: string): Promise<{ target: string; pid: number; left: () => string[] }> {
  const target = join(dir, name);
  expect((await stackday(['run', fileA, '--no-charts', '--quiet', '--out', target]).done).code).toBe(0);
  const killed = stackday(['run', fileB, '--no-charts', '--quiet', '--out', target], { STACKDAY_TEST_PAUSE: point });
  await killed.paused;
  killed.kill();
  expect((await killed.done).signal).toBe('SIGKILL');
  return { target, pid: killed.pid, left: () => leftovers(dir).filter((f) => f.startsWith(`${name}.`)) };
}

/** The next run of B into the target completes, holds B's results whole and leaves nothing beside. */
async function nextRunCleansUp(k: { target: string; left: () => string[] }): Promise<void> {
  expect((await stackday(['run', fileB, '--no-charts', '--quiet', '--out', k.target]).done).code).toBe(0);
  expectSameFiles(contents(k.target), referenceB);
  expect(k.left()).toEqual([]);
}

describe('a killed run', () => {
  it('killed while writing its files leaves the old results whole; the next run removes what it left', async () => {
    const k = await killedOver('killed-writing', 'between-files');
    expectSameFiles(contents(k.target), referenceA);
    expect(k.left()).toHaveLength(1);
    expect(k.left()[0]).toMatch(new RegExp(`^killed-writing\\.stackday-tmp-${k.pid}-[0-9a-f]+$`));
    await nextRunCleansUp(k);
  }, 60_000);

  it('killed between its two renames leaves the old results complete under their old name; the next run cleans up and swaps in whole', async () => {
    const k = await killedOver('killed-swapping', 'between-renames');
    expect(readdirSync(dir)).not.toContain('killed-swapping');
    const old = k.left().find((f) => f.includes('.stackday-old-'))!;
    expectSameFiles(contents(join(dir, old)), referenceA);
    await nextRunCleansUp(k);
  }, 60_000);
});

describe('two runs into one folder', () => {
  it('never mix: the run that swaps last wins whole, even when the other swaps in between its two renames', async () => {
    const target = join(dir, 'concurrent');
    const first = stackday(['run', fileB, '--no-charts', '--quiet', '--out', target]);
    expect((await first.done).code).toBe(0);
    // A moves the old results aside, then waits 3 s; B runs whole and swaps in meanwhile; then A finds
    // B's folder at the target, moves it aside too and swaps in its own
    const a = stackday(['run', fileA, '--no-charts', '--quiet', '--out', target], { STACKDAY_TEST_PAUSE: 'between-renames', STACKDAY_TEST_PAUSE_MS: '3000' });
    await a.paused;
    const b = stackday(['run', fileB, '--no-charts', '--quiet', '--out', target]);
    expect((await b.done).code).toBe(0);
    expectSameFiles(contents(target), referenceB);
    expect((await a.done).code).toBe(0);
    expectSameFiles(contents(target), referenceA);
    expect(leftovers(dir).filter((f) => f.startsWith('concurrent.'))).toEqual([]);
  }, 60_000);

  it('started together, leave one run whole', async () => {
    const target = join(dir, 'together');
    const runs = [fileA, fileB, fileA, fileB].map((f) => stackday(['run', f, '--no-charts', '--quiet', '--out', target]));
    for (const r of runs) expect((await r.done).code).toBe(0);
    const got = contents(target);
    const matches = (ref: Map<string, Buffer>) => [...ref.keys()].join() === [...got.keys()].join() && [...ref].every(([f, b]) => b.equals(got.get(f)!));
    expect(matches(referenceA) || matches(referenceB)).toBe(true);
    expect(leftovers(dir).filter((f) => f.startsWith('together.'))).toEqual([]);
  }, 120_000);
});
