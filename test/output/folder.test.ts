/**
 * A run's results folder is replaced whole: the run writes into its own folder beside the target
 * and swaps it in; a failure leaves the target as it was; what killed runs leave behind is put back
 * or removed by the next run into that target; a folder holding other files is never replaced.
 */
import { describe, it, expect, beforeEach } from 'vitest';
import { mkdtempSync, mkdirSync, readdirSync, readFileSync, writeFileSync, existsSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { StagedFolder, OutputFolderError, cleanLeftovers } from '../../src/output/folder.ts';
import { writeArtefactsAtomically } from '../../src/output/write.ts';

let parent: string;
let target: string;
beforeEach(() => {
  parent = mkdtempSync(join(tmpdir(), 'stackday-folder-'));
  target = join(parent, 'out');
});

/** The id of a process that has ended (a run that was killed). */
function deadPid(): number {
  return spawnSync(process.execPath, ['-e', '']).pid!;
}

/** Every file of a folder with its text. */
function contents(dir: string): Record<string, string> {
  return Object.fromEntries(readdirSync(dir).sort().map((f) => [f, readFileSync(join(dir, f), 'utf8')]));
}

function results(dir: string, files: Record<string, string>): void {
  mkdirSync(dir, { recursive: true });
  for (const [f, text] of Object.entries(files)) writeFileSync(join(dir, f), text);
}

describe('StagedFolder', () => {
  it('creates a target that did not exist and leaves nothing beside it', () => {
    writeArtefactsAtomically(target, [{ fileName: 'summary.json', content: '{}' }]);
    expect(contents(target)).toEqual({ 'summary.json': '{}' });
    expect(readdirSync(parent)).toEqual(['out']);
  });

  it('replaces earlier results whole: a file the new run does not write is gone', () => {
    results(target, { 'summary.json': 'old', 'wall-profile.png': 'old chart' });
    writeArtefactsAtomically(target, [{ fileName: 'summary.json', content: 'new' }]);
    expect(contents(target)).toEqual({ 'summary.json': 'new' });
    expect(readdirSync(parent)).toEqual(['out']);
  });

  it('writes into its own folder beside the target until it commits', () => {
    results(target, { 'summary.json': 'old' });
    const folder = StagedFolder.open(target);
    expect(folder.path.startsWith(`${target}.stackday-tmp-${process.pid}-`)).toBe(true);
    writeFileSync(join(folder.path, 'summary.json'), 'new');
    expect(contents(target)).toEqual({ 'summary.json': 'old' });
    folder.commit();
    expect(contents(target)).toEqual({ 'summary.json': 'new' });
  });

  it('leaves the target as it was when a file cannot be written', () => {
    results(target, { 'summary.json': 'old' });
    expect(() => writeArtefactsAtomically(target, [{ fileName: 'a.csv', content: 'one' }, { fileName: 'no/such/dir.csv', content: 'two' }])).toThrow();
    expect(contents(target)).toEqual({ 'summary.json': 'old' });
    expect(readdirSync(parent)).toEqual(['out']);
  });

  it('refuses a folder holding files stackday did not write, and a file, touching neither', () => {
    results(target, { 'summary.json': 'old', 'notes.txt': 'mine' });
    expect(() => StagedFolder.open(target)).toThrow(OutputFolderError);
    expect(() => StagedFolder.open(target)).toThrow(/"notes\.txt", which stackday did not write/);
    expect(contents(target)).toEqual({ 'notes.txt': 'mine', 'summary.json': 'old' });
    const file = join(parent, 'a-file');
    writeFileSync(file, 'x');
    expect(() => StagedFolder.open(file)).toThrow(/is not a folder/);
    expect(readdirSync(parent).sort()).toEqual(['a-file', 'out']);
  });
});

describe('leftovers of killed runs', () => {
  it('are removed by the next run into the target: temporary and old folders, and the temporary files of earlier versions', () => {
    const pid = deadPid();
    results(target, { 'summary.json': 'old', [`timeseries.csv.stackday-tmp-${pid}-1733000000000`]: 'half a fi' });
    results(`${target}.stackday-tmp-${pid}-a1b2c3`, { 'timeseries.csv': 'half' });
    results(`${target}.stackday-old-${pid}-d4e5f6`, { 'summary.json': 'older' });
    const removed = cleanLeftovers(target);
    expect(removed).toHaveLength(3);
    expect(readdirSync(parent)).toEqual(['out']);
    expect(contents(target)).toEqual({ 'summary.json': 'old' });
  });

  it('put back the old results when a run was killed between its two renames (no target, old results complete)', () => {
    const pid = deadPid();
    results(`${target}.stackday-old-${pid}-d4e5f6`, { 'summary.json': 'old', 'timeseries.csv': 'old rows' });
    results(`${target}.stackday-tmp-${pid}-a1b2c3`, { 'summary.json': 'new' });
    cleanLeftovers(target);
    expect(readdirSync(parent)).toEqual(['out']);
    expect(contents(target)).toEqual({ 'summary.json': 'old', 'timeseries.csv': 'old rows' });
  });

  it('of a run still alive are left alone (it may still be writing)', () => {
    const alive = process.ppid;
    results(`${target}.stackday-tmp-${alive}-a1b2c3`, { 'timeseries.csv': 'being written' });
    expect(cleanLeftovers(target)).toEqual([]);
    expect(existsSync(`${target}.stackday-tmp-${alive}-a1b2c3`)).toBe(true);
  });
});
