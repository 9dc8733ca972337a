/**
 * A run's results folder, replaced whole. A run writes into a fresh folder beside the target,
 * `<target>.stackday-tmp-<pid>-<random>`, and only when every file there is complete swaps it in:
 *
 *   1. rename the target (if any) to `<target>.stackday-old-<pid>-<random>`;
 *   2. rename the new folder to the target;
 *   3. remove the old folder.
 *
 * So the target always holds one run's complete results, old or new, never a mix. A run killed
 * before step 1 leaves the old results in place and a temporary folder beside them; killed between
 * steps 1 and 2, it leaves no target and the old results complete under their `-old-` name. The next
 * run into that target puts such old results back and removes what runs that are no longer alive
 * left behind (their temporary and old folders, and the `<file>.stackday-tmp-<pid>-<ms>` files that
 * earlier versions wrote into the target itself). Two runs into one target each write their own
 * folder; the last to swap wins, whole.
 *
 * The target must be new, empty, or hold only files that stackday writes (a results folder): a
 * folder holding anything else is refused, never replaced.
 */
import { existsSync, lstatSync, mkdirSync, readdirSync, renameSync, rmSync, statSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { randomBytes } from 'node:crypto';
import { checkOutputFolder } from './fileErrors.ts';

/** The output folder cannot be used (it is a file, or it holds files stackday did not write). */
export class OutputFolderError extends Error {
  constructor(
    readonly path: string,
    why: string,
  ) {
    super(`output folder "${path}" ${why}`);
    this.name = 'OutputFolderError';
  }
}

/** Names of the files stackday writes into a results folder (its own temporary files included). */
const RESULT_FILE = /^[a-z][a-z0-9_-]*\.(json|csv|png|html|log)$/;
const OLD_STYLE_TEMP_FILE = /\.stackday-tmp-(\d+)-\d+$/;

/** `<base>.stackday-tmp-<pid>-<random>` or `<base>.stackday-old-<pid>-<random>` beside the target. */
function leftoverPattern(base: string): RegExp {
  const escaped = base.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  return new RegExp(`^${escaped}\\.stackday-(tmp|old)-(\\d+)-[0-9a-f]+$`);
}

/** True when a process with this id is running (a run that may still be writing). */
function isAlive(pid: number): boolean {
  if (pid === process.pid) return true;
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/**
 * A test hook: with STACKDAY_TEST_PAUSE=<point> in the environment, the run stops at that point
 * (`between-files`: after the per-instant files, before the others; `between-renames`: after the
 * old results are moved aside) for STACKDAY_TEST_PAUSE_MS milliseconds (default a minute), after
 * saying so on stderr, so a test can kill it there or let another run overtake it.
 */
export function pauseForTest(point: string): void {
  if (process.env['STACKDAY_TEST_PAUSE'] !== point) return;
  process.stderr.write(`stackday: paused at ${point}\n`);
  const ms = Number(process.env['STACKDAY_TEST_PAUSE_MS'] ?? 60_000);
  Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, ms);
}

/** What is in a target that stackday may not replace; null when it may. */
function foreignContent(target: string): string | null {
  const stat = lstatSync(target, { throwIfNoEntry: false });
  if (!stat) return null;
  if (!stat.isDirectory()) return 'is not a folder';
  const foreign = readdirSync(target, { withFileTypes: true }).filter((e) => !(e.isFile() && (RESULT_FILE.test(e.name) || OLD_STYLE_TEMP_FILE.test(e.name))));
  if (foreign.length === 0) return null;
  const names = foreign.slice(0, 3).map((e) => `"${e.name}"${e.isDirectory() ? ' (a folder)' : ''}`);
  return `holds ${names.join(', ')}${foreign.length > 3 ? ` and ${foreign.length - 3} more` : ''}, which stackday did not write; give a new or empty folder, or one a previous run wrote`;
}

/**
 * Whether results may be written to `target` now: it can be made and written (checkOutputFolder),
 * and what it holds stackday may replace. Returns the problem, or null. For commands that compute
 * long before they write (a batch): the same refusal a run meets when it opens its folder, at once.
 */
export function checkReplaceable(target: string): Error | null {
  const obstacle = checkOutputFolder(target);
  if (obstacle) return obstacle;
  const why = foreignContent(target);
  return why === null ? null : new OutputFolderError(target, why);
}

/**
 * Clean up after runs into `target` that are no longer alive: put complete old results back when
 * a run was killed between its two renames, then remove their temporary and old folders and the
 * temporary files of earlier versions inside the target. Returns the paths removed or restored.
 */
export function cleanLeftovers(target: string): string[] {
  const parent = dirname(target);
  const pattern = leftoverPattern(basename(target));
  const dead = (existsSync(parent) ? readdirSync(parent) : [])
    .map((name) => ({ name, m: pattern.exec(name) }))
    .filter((e): e is { name: string; m: RegExpExecArray } => e.m !== null && !isAlive(Number(e.m[2])))
    .map((e) => ({ path: join(parent, e.name), kind: e.m[1] as 'tmp' | 'old' }));
  const touched: string[] = [];
  if (!existsSync(target)) {
    // killed between the renames: the old results are complete (a temporary folder may not be)
    const old = dead.filter((e) => e.kind === 'old').sort((a, b) => statSync(b.path).mtimeMs - statSync(a.path).mtimeMs)[0];
    if (old) {
      renameSync(old.path, target);
      touched.push(old.path);
      dead.splice(dead.indexOf(old), 1);
    }
  }
  for (const e of dead) {
    rmSync(e.path, { recursive: true, force: true });
    touched.push(e.path);
  }
  if (lstatSync(target, { throwIfNoEntry: false })?.isDirectory()) {
    for (const name of readdirSync(target)) {
      const m = OLD_STYLE_TEMP_FILE.exec(name);
      if (m && !isAlive(Number(m[1]))) {
        rmSync(join(target, name), { recursive: true, force: true });
        touched.push(join(target, name));
      }
    }
  }
  return touched;
}

/** A run's own folder beside the target, swapped in whole by `commit`. */
export class StagedFolder {
  private done = false;

  private constructor(
    /** The results folder the run replaces. */
    readonly target: string,
    /** Where the run writes its files. */
    readonly path: string,
  ) {}

  /**
   * Open a run's folder for `target`: clean up after dead runs, check that the target may be
   * replaced, and create the run's own temporary folder beside it. Throws OutputFolderError when the
   * target may not be replaced, and the file system's error when the folder cannot be made.
   */
  static open(target: string): StagedFolder {
    mkdirSync(dirname(target), { recursive: true });
    cleanLeftovers(target);
    const why = foreignContent(target);
    if (why !== null) throw new OutputFolderError(target, why);
    const path = `${target}.stackday-tmp-${process.pid}-${randomBytes(6).toString('hex')}`;
    mkdirSync(path);
    return new StagedFolder(target, path);
  }

  /** Swap the run's folder in for the target (see the module comment); the old results are removed. */
  commit(): void {
    if (this.done) return;
    const parent = dirname(this.target);
    const base = basename(this.target);
    const olds: string[] = [];
    // another run may swap its folder in between our renames: move that aside too (the last swap wins)
    for (let attempt = 0; ; attempt++) {
      if (lstatSync(this.target, { throwIfNoEntry: false })) {
        const why = foreignContent(this.target);
        if (why !== null) throw new OutputFolderError(this.target, why);
        const old = join(parent, `${base}.stackday-old-${process.pid}-${randomBytes(6).toString('hex')}`);
        try {
          renameSync(this.target, old);
          olds.push(old);
        } catch (e) {
          if ((e as NodeJS.ErrnoException).code !== 'ENOENT') throw e; // gone already: another run moved it
        }
        pauseForTest('between-renames');
      }
      try {
        renameSync(this.path, this.target);
        break;
      } catch (e) {
        const code = (e as NodeJS.ErrnoException).code;
        if ((code !== 'ENOTEMPTY' && code !== 'EEXIST') || attempt >= 20) throw e;
      }
    }
    this.done = true;
    for (const old of olds) rmSync(old, { recursive: true, force: true });
  }

  /** Remove the run's folder (after a failure); the target is untouched. */
  abandon(): void {
    if (this.done) return;
    this.done = true;
    rmSync(this.path, { recursive: true, force: true });
  }
}
