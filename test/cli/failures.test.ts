/**
 * What the command says when the run itself meets a failure: a full disk while writing (a real
 * ENOSPC from /dev/full), memory running out, and a bug. The library entry is replaced by one that
 * fails in the way each case needs; everything else is the real command.
 */
import { describe, it, expect, vi } from 'vitest';
import { existsSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCli } from './helpers.ts';

const failure = vi.hoisted(() => ({ kind: 'none' as 'none' | 'disk-full' | 'memory' | 'bug' }));

vi.mock('../../src/index.ts', async (original) => {
  const real = (await original()) as typeof import('../../src/index.ts');
  return {
    ...real,
    runToFolder: async (...args: Parameters<typeof real.runToFolder>) => {
      if (failure.kind === 'memory') throw new RangeError('Invalid string length');
      if (failure.kind === 'bug') throw new TypeError("Cannot read properties of undefined (reading 'peak')");
      // the error a full disk gives, from the system itself (/dev/full always reports no space)
      if (failure.kind === 'disk-full') writeFileSync('/dev/full', 'x'.repeat(1 << 16));
      return real.runToFolder(...args);
    },
  };
});

const run = (kind: typeof failure.kind) => {
  failure.kind = kind;
  const out = join(mkdtempSync(join(tmpdir(), 'stackday-failures-')), 'out');
  return runCli(['run', 'scenarios/demo.yaml', '--out', out, '--no-charts', '--quiet', '--days', '1']).then((r) => ({ ...r, out }));
};

describe('failures met while running', () => {
  it.skipIf(!existsSync('/dev/full'))('a full disk while writing: exit 4, the output folder and the cause, no stack trace', async () => {
    const r = await run('disk-full');
    expect(r.code).toBe(4);
    // the system names no file for a failed write: the message names the output folder
    expect(r.stderr).toBe(`stackday: cannot write "${r.out}": no space left on the disk (ENOSPC); the results were not written\n`);
  });

  it('memory running out: exit 4 with what to do', async () => {
    const r = await run('memory');
    expect(r.code).toBe(4);
    expect(r.stderr).toMatch(/^stackday: out of memory \(Invalid string length\); nothing was written\. Use fewer days, segments or cells/);
    expect(existsSync(r.out)).toBe(false);
  });

  it('a bug: exit 1, said to be an internal error, asking for a report, with the trace for it', async () => {
    const r = await run('bug');
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/^stackday: internal error in stackday \d+\.\d+\.\d+ \(a bug, not a problem with your input\)\. Please report it, with the scenario file and the command line/);
    expect(r.stderr).toMatch(/TypeError: Cannot read properties of undefined/);
    expect(r.stderr).not.toMatch(/unexpected error/);
  });
});
