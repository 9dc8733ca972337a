/**
 * Files out: summary.json, the per-instant CSV files (csv.ts) and any other artefacts (charts,
 * report), written into the run's own folder and swapped in whole (folder.ts), so a failure or a
 * killed run never leaves a half-written result or a mix of two runs.
 */
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Summary } from '../analysis/summary.ts';
import { StagedFolder, pauseForTest } from './folder.ts';

export { timeseriesCsv, segmentsCsv, seriesFileArtefacts, type StreamedArtefact } from './csv.ts';
export { StagedFolder, OutputFolderError, cleanLeftovers } from './folder.ts';

/** A file made whole: its name in the output folder and its content. */
export interface Artefact {
  readonly fileName: string;
  readonly content: string | Buffer;
}

/**
 * summary.json text (stable key order, 2-space indent; non-finite numbers become null). It holds
 * nothing that changes from run to run of the same input (no timings, no dates of the run).
 */
export function summaryJson(summary: Summary): string {
  return `${JSON.stringify(summary, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? null : v), 2)}\n`;
}

/** Write artefacts into the run's folder, one file after another. */
export function writeArtefacts(folder: StagedFolder, artefacts: readonly Artefact[]): string[] {
  return artefacts.map((a, i) => {
    if (i > 0) pauseForTest('between-files');
    writeFileSync(join(folder.path, a.fileName), a.content, { flag: 'wx' });
    return join(folder.target, a.fileName);
  });
}

/**
 * Make `dir` hold exactly these artefacts: they are written into a fresh folder beside it, which
 * then replaces it whole. On any failure the fresh folder is removed and `dir` is left as it was.
 * Returns the paths of the files in `dir`.
 */
export function writeArtefactsAtomically(dir: string, artefacts: readonly Artefact[]): string[] {
  const folder = StagedFolder.open(dir);
  try {
    const written = writeArtefacts(folder, artefacts);
    folder.commit();
    return written;
  } catch (e) {
    folder.abandon();
    throw e;
  }
}
