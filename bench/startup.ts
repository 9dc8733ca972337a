/**
 * Start-up as a person meets it: the end-to-end wall time of a whole process, from spawn to exit,
 * of the compiled command (bin/stackday.js → dist/; `npm run bench` builds it first):
 *   - `stackday --version` (loads commander and the CLI's skeleton only),
 *   - the demo without charts (scenario, model, simulation, three text files),
 *   - `npm start` (the demo with its PNG charts and report.html, through npm).
 * Each is a median of interleaved rounds after one untimed round (so every command meets the same
 * file cache and machine load), and is also given as a ratio to a bare `node -e ''` measured in the
 * same rounds, which makes the figures comparable across machines. A benchmark: it prints and
 * returns figures and never fails on them.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

export interface StartupTimes {
  /** Median wall times, ms. */
  readonly nodeMs: number;
  readonly versionMs: number;
  readonly demoNoChartsMs: number;
  readonly npmStartMs: number;
  readonly rounds: number;
}

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const middle = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

/** Wall time of one process, ms; throws with its stderr when it fails. */
function wallMs(command: string, args: string[]): number {
  const t0 = performance.now();
  const r = spawnSync(command, args, { cwd: ROOT, stdio: ['ignore', 'ignore', 'pipe'], encoding: 'utf8' });
  const ms = performance.now() - t0;
  if (r.status !== 0) throw new Error(`${command} ${args.join(' ')} exited with ${r.status ?? r.signal}: ${r.stderr ?? r.error?.message ?? ''}`.trim());
  return ms;
}

/** Measure start-up times (median of `rounds` interleaved rounds), print them as section 5 of the benchmark, and return them. */
export function benchStartup(rounds = 5): StartupTimes | null {
  console.log('');
  if (!existsSync(join(ROOT, 'dist', 'cli', 'main.js'))) {
    console.log('6. start-up: not measured (dist/ is missing: run `npm run build`)');
    return null;
  }
  const out = mkdtempSync(join(tmpdir(), 'stackday-bench-'));
  const commands = {
    node: () => wallMs(process.execPath, ['-e', '']),
    version: () => wallMs(process.execPath, ['bin/stackday.js', '--version']),
    demoNoCharts: () => wallMs(process.execPath, ['bin/stackday.js', 'run', 'scenarios/demo.yaml', '--no-charts', '--quiet', '--out', out]),
    npmStart: () => wallMs(process.platform === 'win32' ? 'npm.cmd' : 'npm', ['start']),
  };
  const times: Record<keyof typeof commands, number[]> = { node: [], version: [], demoNoCharts: [], npmStart: [] };
  try {
    for (const run of Object.values(commands)) run(); // untimed: file cache, npm's own start
    for (let i = 0; i < rounds; i++) for (const [name, run] of Object.entries(commands) as [keyof typeof commands, () => number][]) times[name].push(run());
  } finally {
    rmSync(out, { recursive: true, force: true });
  }
  const result: StartupTimes = { nodeMs: middle(times.node), versionMs: middle(times.version), demoNoChartsMs: middle(times.demoNoCharts), npmStartMs: middle(times.npmStart), rounds };
  const row = (label: string, ms: number, note = '') => console.log(`   ${label.padEnd(34)} ${ms.toFixed(0).padStart(6)} ms  ${(ms / result.nodeMs).toFixed(1).padStart(5)}× node${note}`);
  console.log(`6. start-up: end-to-end wall time of the compiled command (median of ${rounds} interleaved rounds after an untimed one)`);
  console.log(`   ${"node -e ''".padEnd(34)} ${result.nodeMs.toFixed(0).padStart(6)} ms`);
  row('stackday --version', result.versionMs, '  (target ≤ 4×)');
  row('stackday run demo --no-charts', result.demoNoChartsMs);
  row('npm start (demo with charts)', result.npmStartMs, '  (target ≤ 1200 ms)');
  return result;
}
