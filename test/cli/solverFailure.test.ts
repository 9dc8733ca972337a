/** A solver failure is reported plainly, exits 2 and writes nothing. */
import { describe, it, expect, vi } from 'vitest';
import { mkdtempSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCli } from './helpers.ts';

vi.mock('../../src/solver/index.ts', async (original) => {
  const real = (await original()) as typeof import('../../src/solver/index.ts');
  const failing = () => {
    throw new real.IntegrationError('step size fell below 1e-9 s', 3600);
  };
  return { ...real, INTEGRATORS: { implicit: failing, rk45: failing } };
});

describe('solver failure', () => {
  it('gets a clear message, exit code 2 and no output', async () => {
    const out = join(mkdtempSync(join(tmpdir(), 'stackday-fail-')), 'out');
    const r = await runCli(['run', 'scenarios/demo.yaml', '--out', out, '--no-charts', '--quiet']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/could not be computed/);
    expect(r.stderr).toMatch(/step size fell below/);
    expect(existsSync(out)).toBe(false);
  });
});
