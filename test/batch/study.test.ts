/**
 * Batches of cases: the variants of one file run serially, on a pool of worker threads from the
 * TypeScript sources (through tsx) and on a pool of the compiled workers in dist/, with the same
 * outcomes and byte-identical files; and the figures make physical sense.
 */
import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { fileCases } from '../../src/input/scenario/cases.ts';
import { runCasesSerially, runCases, chooseThreads, POOL_BREAK_EVEN_CASES } from '../../src/batch/pool.ts';
import { comparisonStudy } from '../../src/batch/study.ts';
import { comparisonArtefacts } from '../../src/batch/artefacts.ts';
import type { CaseOutcome, RanOutcome } from '../../src/batch/outcome.ts';
import { shortDemoFile } from '../support/shortScenario.ts';

let dir: string;
let file: string;
let serial: CaseOutcome[];
beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'stackday-batch-'));
  file = shortDemoFile(dir, 'variants', (s) => {
    s.variants = {
      same: {},
      'thick-wool': { 'stack.layers[1].thickness': '100 mm' },
      broken: { 'stack.layers[1].thickness': '-5 mm' },
    };
  });
  serial = await runCasesSerially(fileCases(file));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const ran = (name: string) => serial.find((o) => o.name === name) as RanOutcome;

describe('a batch of variants', () => {
  it('runs every valid case and reports the invalid one with its name and problem', () => {
    expect(serial.map((o) => [o.name, o.status])).toEqual([['demo', 'ran'], ['same', 'ran'], ['thick-wool', 'ran'], ['broken', 'invalid']]);
    const broken = serial[3]!;
    expect(broken.status === 'invalid' && broken.problems).toEqual([expect.stringMatching(/^variants\.broken\.stack\.layers\[1\]\.thickness: found "-5 mm"/)]);
  });

  it('two identical variants give identical figures (the base case and an empty variant)', () => {
    const { summary: a, trace: ta } = ran('demo');
    const { summary: b, trace: tb } = ran('same');
    const figures = (s: typeof a) => ({ ...s, scenario: null, run: { ...s.run, compute_ms: 0 } });
    expect(figures(b)).toEqual(figures(a));
    expect(tb).toEqual(ta);
  });

  it('thicker insulation: a cooler shell, a warmer inner surface, a larger acid margin, less heat lost (physics sanity, common practice)', () => {
    const thin = ran('demo');
    const thick = ran('thick-wool');
    expect(thick.summary.peak_shell_c).toBeLessThan(thin.summary.peak_shell_c);
    expect(thick.summary.min_inner_surface_c).toBeGreaterThan(thin.summary.min_inner_surface_c);
    expect(thick.summary.lowest_acid_dew_margin_k!).toBeGreaterThan(thin.summary.lowest_acid_dew_margin_k!);
    expect(thick.summary.heat_loss_kwh_per_day).toBeLessThan(thin.summary.heat_loss_kwh_per_day);
    // through the day: the thick wall's shell is cooler and its top inner surface warmer at every instant
    thick.trace.shellC.forEach((v, k) => expect(v).toBeLessThan(thin.trace.shellC[k]!));
    thick.trace.innerTopC.forEach((v, k) => expect(v).toBeGreaterThan(thin.trace.innerTopC[k]!));
  });

  it('gives the same outcomes and byte-identical files on a pool of threads from the TypeScript sources', async () => {
    const pooled = await runCases(fileCases(file), 2);
    expect(timeless(pooled)).toEqual(timeless(serial));
    await expectSameFiles(serial, pooled);
  });

  it('gives the same outcomes on a pool of the compiled workers (dist/)', async () => {
    const compiled = resolve('dist/batch/pool.js');
    expect(existsSync(compiled), 'dist/ is built by npm test (npm run build)').toBe(true);
    const dist = (await import(pathToFileURL(compiled).href)) as typeof import('../../src/batch/pool.ts');
    const pooled = await dist.runCases(fileCases(file), 2);
    expect(timeless(pooled)).toEqual(timeless(serial));
  });
});

/** Outcomes without the runs' own wall-clock times (summary.run.compute_ms), the one figure allowed to differ. */
function timeless(outcomes: readonly CaseOutcome[]): CaseOutcome[] {
  return outcomes.map((o) => (o.status === 'ran' ? { ...o, summary: { ...o.summary, run: { ...o.summary.run, compute_ms: 0 } } } : o));
}

async function expectSameFiles(a: readonly CaseOutcome[], b: readonly CaseOutcome[]) {
  const [fa, fb] = await Promise.all([a, b].map((o) => {
    const s = comparisonStudy(o);
    return comparisonArtefacts(s.comparison, s.notRun, s.overlay, { width: 500, height: 300 });
  }));
  expect(fb!.map((x) => x.fileName)).toEqual(fa!.map((x) => x.fileName));
  fa!.forEach((x, i) => expect(Buffer.from(fb![i]!.content).equals(Buffer.from(x.content)), x.fileName).toBe(true));
}

describe('chooseThreads', () => {
  it('runs a short batch in this thread, a long one on every core of a machine with a core to spare, and a count asked for as asked', () => {
    expect(chooseThreads(3, 'auto', 2, 0)).toBe(1);
    expect(chooseThreads(POOL_BREAK_EVEN_CASES, 'auto', 2, 0.5)).toBe(2);
    expect(chooseThreads(100, 'auto', 1, 0)).toBe(1); // one core: nothing to gain
    expect(chooseThreads(100, 'auto', 2, 2.5)).toBe(1); // the cores are busy with other work
    expect(chooseThreads(5, 3, 2, 9)).toBe(3); // asked for: as asked, whatever the load
    expect(chooseThreads(2, 8, 2, 0)).toBe(2); // never more threads than cases
  });
});
