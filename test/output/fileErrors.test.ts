/** File-system failures in words, from the real errors the system gives. */
import { describe, it, expect } from 'vitest';
import { mkdirSync, mkdtempSync, renameSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { checkOutputFolder, describeWriteFailure, OutputWriteError } from '../../src/output/fileErrors.ts';

const dir = mkdtempSync(join(tmpdir(), 'stackday-fileerrors-'));
/** The error `action` throws. */
const thrown = (action: () => void): unknown => {
  try {
    action();
  } catch (e) {
    return e;
  }
  return expect.unreachable();
};

describe('checkOutputFolder', () => {
  it('a folder to be made inside a writable one, or one that exists: no problem', () => {
    expect(checkOutputFolder(join(dir, 'new', 'deeper'))).toBeNull();
    expect(checkOutputFolder(dir)).toBeNull();
  });

  it('a file where the folder or a folder above it should be', () => {
    const file = join(dir, 'file');
    writeFileSync(file, '');
    expect(checkOutputFolder(file)?.message).toBe(`cannot write "${file}": it is a file, not a folder (ENOTDIR)`);
    expect(checkOutputFolder(join(file, 'a', 'b'))?.message).toBe(`cannot write "${file}": it is a file, where a folder is needed (ENOTDIR)`);
  });
});

describe('describeWriteFailure', () => {
  it('a rename onto a folder names the folder in the way (EISDIR)', () => {
    const target = join(dir, 'target');
    mkdirSync(join(target, 'inside'), { recursive: true });
    const source = join(dir, 'source');
    writeFileSync(source, '');
    const e = describeWriteFailure(thrown(() => renameSync(source, target)), dir);
    expect(e).toBeInstanceOf(OutputWriteError);
    expect((e as OutputWriteError).path).toBe(target);
    expect((e as OutputWriteError).code).toMatch(/EISDIR|ENOTEMPTY|EEXIST/); // rename(2) may give any of these for a non-empty folder
  });

  it('/dev/full gives the real ENOSPC: the output folder is named, since a write names no file', () => {
    const e = describeWriteFailure(thrown(() => writeFileSync('/dev/full', 'x'.repeat(1 << 16))), '/results');
    expect((e as Error).message).toBe('cannot write "/results": no space left on the disk (ENOSPC)');
  });

  it('an error that is not of the file system is passed on unchanged', () => {
    const bug = new TypeError('x is undefined');
    expect(describeWriteFailure(bug, dir)).toBe(bug);
  });
});
