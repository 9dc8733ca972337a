/**
 * Failures of the file system while writing results, in words: the path and the cause, from the
 * error code Node gives (EACCES, EROFS, ENOSPC, EFBIG, ENOTDIR, EISDIR, …). Also a check of the
 * output folder before a run, so that a folder that cannot be written is reported up front, not
 * after minutes of computing. Nothing here writes.
 */
import { accessSync, statSync, constants } from 'node:fs';
import { dirname, resolve } from 'node:path';

/** The cause of each file-system error code, in words. */
const CAUSES: Readonly<Record<string, string>> = {
  EACCES: 'permission denied',
  EPERM: 'operation not permitted',
  EROFS: 'the file system is read-only',
  ENOSPC: 'no space left on the disk',
  EDQUOT: 'the disk quota is used up',
  EFBIG: "a file would pass the largest size allowed (the file-size limit, see `ulimit -f`, or the file system's)",
  ENOTDIR: 'a part of the path is a file, not a folder',
  EISDIR: 'a folder is in the way where a file is to be written',
  EEXIST: 'a file is in the way where a folder is to be made',
  ENOTEMPTY: 'a folder that is not empty is in the way',
  ENAMETOOLONG: 'a name in the path is too long for the file system',
  ENOENT: 'a folder on the path does not exist (removed while running?)',
  EMFILE: 'too many files open',
  ENFILE: 'too many files open on the system',
  EIO: 'an input/output error of the disk',
  EBUSY: 'the file or folder is in use',
  ELOOP: 'too many symbolic links on the path',
  EXDEV: 'the temporary and final places are on different file systems',
};

/** A path for messages: control characters escaped, a long path shortened in the middle. */
function shown(path: string): string {
  const safe = path.replace(/[\u0000-\u001f\u007f-\u009f]/g, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
  return safe.length > 200 ? `${safe.slice(0, 100)}…${safe.slice(-99)}` : safe;
}

/** The results could not be written: where, why, and the system's error code. */
export class OutputWriteError extends Error {
  constructor(
    readonly path: string,
    readonly cause: string,
    readonly code?: string,
  ) {
    super(`cannot write "${shown(path)}": ${cause}${code ? ` (${code})` : ''}`);
    this.name = 'OutputWriteError';
  }
}

/** True for an error of a file-system call with a code this module can name. */
export function isFileSystemError(e: unknown): e is NodeJS.ErrnoException {
  return e instanceof Error && typeof (e as NodeJS.ErrnoException).code === 'string' && Object.hasOwn(CAUSES, (e as NodeJS.ErrnoException).code!);
}

/** The nearest part of `path` (itself or a parent) that exists, or null; throws what stat throws but "does not exist". */
function nearestExisting(path: string): { path: string; isFolder: boolean } | null {
  for (let p = resolve(path); ; p = dirname(p)) {
    try {
      return { path: p, isFolder: statSync(p).isDirectory() };
    } catch (e) {
      const code = (e as NodeJS.ErrnoException).code;
      if (code !== 'ENOENT' && code !== 'ENOTDIR') throw e;
    }
    if (dirname(p) === p) return null;
  }
}

/**
 * A file-system error while writing results under `outDir` as an OutputWriteError naming the path
 * (the error's own, or the file in the way, or `outDir` when the system names none, as for EFBIG
 * and ENOSPC on a write) and the cause. Other errors are returned unchanged.
 */
export function describeWriteFailure(e: unknown, outDir: string): unknown {
  if (!isFileSystemError(e)) return e;
  const code = e.code!;
  // a rename names its target as `dest`: that is where the obstacle is
  const path = (e as { dest?: string }).dest ?? e.path ?? outDir;
  if (code === 'ENOTDIR' || code === 'EEXIST') {
    let existing: { path: string; isFolder: boolean } | null = null;
    try {
      existing = nearestExisting(path);
    } catch {
      // the error's own cause is said below
    }
    if (existing && !existing.isFolder) return new OutputWriteError(existing.path, 'it is a file, where a folder is needed', code);
  }
  return new OutputWriteError(path, CAUSES[code]!, code);
}

/**
 * Whether results can be written to `dir` (made if missing): the nearest existing part of the path
 * must be a folder that can be written. Returns the problem, or null. Run before computing, so that
 * an obstacle is reported at once; the write itself may still fail (a full disk).
 */
export function checkOutputFolder(dir: string): OutputWriteError | null {
  const target = resolve(dir);
  let existing: { path: string; isFolder: boolean } | null;
  try {
    existing = nearestExisting(target);
  } catch (e) {
    const failure = describeWriteFailure(e, target);
    return failure instanceof OutputWriteError ? failure : null;
  }
  if (!existing) return null;
  if (!existing.isFolder) return new OutputWriteError(existing.path, existing.path === target ? 'it is a file, not a folder' : 'it is a file, where a folder is needed', 'ENOTDIR');
  try {
    accessSync(existing.path, constants.W_OK | constants.X_OK);
  } catch (e) {
    const failure = describeWriteFailure(e, existing.path);
    return failure instanceof OutputWriteError ? failure : null;
  }
  return null;
}
