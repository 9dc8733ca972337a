/**
 * The compiled package (dist/, built by `npm run build`; `npm test` builds it first) behaves as the
 * TypeScript sources run through tsx (`npm run stackday`, the development run): on the demo both
 * write byte-identical files (summary.json carries no timing, so all of them). A difference means the build changed the program (an import left unrewritten,
 * a language feature emitted differently, a file missing from dist/).
 */
import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { dirname, join, relative, resolve } from 'node:path';

const ROOT = resolve(__dirname, '../..');
const SRC = join(ROOT, 'src');
const DIST = join(ROOT, 'dist');

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((f) => {
    const p = join(dir, f);
    return statSync(p).isDirectory() ? sourceFiles(p) : p.endsWith('.ts') ? [p] : [];
  });
}

/** Run `node <args>` in the package folder; resolves with the exit code and what it printed on stderr. */
function runNode(args: string[]): Promise<{ code: number | null; stderr: string }> {
  return new Promise((done, fail) => {
    const child = spawn(process.execPath, args, { cwd: ROOT, stdio: ['ignore', 'ignore', 'pipe'] });
    let stderr = '';
    child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
    child.on('error', fail);
    child.on('close', (code) => done({ code, stderr }));
  });
}

/** The tsx command-line entry, as `npm run stackday` runs it. */
function tsxCli(): string {
  const require = createRequire(import.meta.url);
  const pkgFile = require.resolve('tsx/package.json');
  const { bin } = JSON.parse(readFileSync(pkgFile, 'utf8')) as { bin: string | Record<string, string> };
  return join(dirname(pkgFile), typeof bin === 'string' ? bin : bin['tsx']!);
}

let dir: string;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'stackday-compiled-'));
});
afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('the compiled package', () => {
  it('is built from the current sources (dist/ holds a newer .js for every src/*.ts)', () => {
    const stale = sourceFiles(SRC)
      .map((ts) => ({ ts, js: join(DIST, relative(SRC, ts)).replace(/\.ts$/, '.js') }))
      .filter(({ ts, js }) => !existsSync(js) || statSync(js).mtimeMs < statSync(ts).mtimeMs)
      .map(({ ts }) => relative(ROOT, ts));
    expect(stale, 'dist/ is missing or older than these sources: run `npm run build` (npm test does)').toEqual([]);
  });

  it('writes the same files as the tsx development run on the demo, byte for byte', async () => {
    const compiledOut = join(dir, 'compiled');
    const tsxOut = join(dir, 'tsx');
    const args = ['run', 'scenarios/demo.yaml', '--no-charts', '--quiet'];
    const [compiled, dev] = await Promise.all([runNode(['bin/stackday.js', ...args, '--out', compiledOut]), runNode([tsxCli(), 'src/cli/main.ts', ...args, '--out', tsxOut])]);
    expect(compiled, compiled.stderr).toEqual({ code: 0, stderr: '' });
    expect(dev, dev.stderr).toEqual({ code: 0, stderr: '' });

    const files = readdirSync(compiledOut).sort();
    expect(files).toEqual(['segments.csv', 'state.json', 'summary.json', 'timeseries.csv']);
    expect(readdirSync(tsxOut).sort()).toEqual(files);
    for (const f of files) expect(readFileSync(join(compiledOut, f)).equals(readFileSync(join(tsxOut, f))), f).toBe(true);
  });
});
