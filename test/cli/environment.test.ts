/**
 * Failures of the environment, met by the real command in a real process: a file-size limit
 * (ulimit -f), a read-only file system and a full disk (a small tmpfs in a private mount namespace),
 * no permission (a folder the user may not write). Each gives exit code 4 and one line naming the
 * path and the cause. The mount and permission cases need rights the machine may not give (mount
 * namespaces; a second user when running as root): they are skipped, saying why, where it does not.
 */
import { describe, it, expect, beforeAll } from 'vitest';
import { spawnSync } from 'node:child_process';
import { chmodSync, existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { parse, stringify } from 'yaml';

const ROOT = resolve(__dirname, '../..');
const BIN = join(ROOT, 'bin/stackday.js');
let dir: string;
let scenario: string;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'stackday-env-'));
  chmodSync(dir, 0o755); // readable by the second user of the permission test
  const s = parse(readFileSync(join(ROOT, 'scenarios/demo.yaml'), 'utf8'));
  s.run.days = 1;
  s.run.output_interval = 30;
  s.stack.segments = 4; // timeseries.csv of about 230 kB: more than the small limits below
  scenario = join(dir, 'env.yaml');
  writeFileSync(scenario, stringify(s));
});

/** A shell command line running the compiled command on the test scenario, writing to `out`. */
const command = (out: string) => `"${process.execPath}" "${BIN}" run "${scenario}" --out "${out}" --no-charts --quiet`;
const sh = (script: string) => spawnSync('sh', ['-c', script], { encoding: 'utf8', cwd: ROOT });

function expectEnvironmentFailure(r: { status: number | null; stderr: string }, message: RegExp) {
  expect(r.status, r.stderr).toBe(4);
  expect(r.stderr).toMatch(message);
  expect(r.stderr.trim().split('\n')).toHaveLength(1);
  expect(r.stderr).not.toMatch(/internal error|\n\s+at /);
}

/** Whether this process may make a private mount namespace with a tmpfs (root in a container that allows it). */
const canMount = (() => {
  const probe = mkdtempSync(join(tmpdir(), 'stackday-mount-'));
  return spawnSync('unshare', ['-m', 'sh', '-c', `mount -t tmpfs -o size=16k tmpfs "${probe}"`], { encoding: 'utf8' }).status === 0;
})();
const isRoot = process.getuid?.() === 0;
const hasSetpriv = spawnSync('setpriv', ['--version']).status === 0;

describe('failures of the environment: exit 4', () => {
  it('a file-size limit (ulimit -f 64, 64 kB): EFBIG, naming the output folder', () => {
    const out = join(dir, 'efbig');
    const r = sh(`ulimit -f 64 && ${command(out)}`);
    expectEnvironmentFailure(r, new RegExp(`^stackday: cannot write "${out}": a file would pass the largest size allowed .*\\(EFBIG\\); the results were not written`));
    // the results are staged in a folder beside the target: it is removed, and the target never made
    expect(existsSync(out)).toBe(false);
    expect(readdirSync(dir).filter((f) => f.startsWith('efbig'))).toEqual([]);
  });

  it.skipIf(!canMount)('a read-only file system: EROFS, naming the folder found read-only', () => {
    const mnt = join(dir, 'readonly');
    mkdirSync(mnt);
    const r = sh(`unshare -m sh -c 'mount -t tmpfs -o ro tmpfs "${mnt}" && ${command(join(mnt, 'out')).replace(/'/g, "'\\''")}'`);
    expectEnvironmentFailure(r, new RegExp(`^stackday: cannot write "${mnt}": the file system is read-only \\(EROFS\\)`));
  });

  it.skipIf(!canMount)('a full disk (a 64 kB tmpfs): ENOSPC, and the file cut short is removed', () => {
    const mnt = join(dir, 'full');
    mkdirSync(mnt);
    const r = sh(`unshare -m sh -c 'mount -t tmpfs -o size=64k tmpfs "${mnt}" && ${command(join(mnt, 'out')).replace(/'/g, "'\\''")}; s=$?; ls -A "${mnt}"; exit $s'`);
    expectEnvironmentFailure(r, new RegExp(`^stackday: cannot write "${join(mnt, 'out')}": no space left on the disk \\(ENOSPC\\)`));
    expect(r.stdout).toBe(''); // nothing left on the disk: the staged folder is removed, the target never made
  });

  it.skipIf(isRoot && !hasSetpriv)('no permission to write the folder: EACCES, naming the folder', () => {
    const locked = join(dir, 'locked');
    mkdirSync(locked);
    chmodSync(locked, 0o555);
    // root may write anywhere: run as the unprivileged user "nobody" (65534) then
    const asUser = isRoot ? `setpriv --reuid=65534 --regid=65534 --clear-groups ${command(join(locked, 'out'))}` : command(join(locked, 'out'));
    const r = sh(asUser);
    expectEnvironmentFailure(r, new RegExp(`^stackday: cannot write "${locked}": permission denied \\(EACCES\\)`));
    expect(existsSync(join(locked, 'out'))).toBe(false);
  });
});
