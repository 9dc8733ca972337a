/**
 * Console sheets of the design questions: the sweep table, the sizing answer with its proof (one
 * step beyond fails), and the cases that did not run. Plain text in the style of the result sheet.
 */
import type { SweepTable } from '../analysis/sweep.ts';
import { axisHeading } from '../analysis/sweep.ts';
import type { SizingResult, SizingProbe } from '../analysis/sizing.ts';
import { table } from './console.ts';
import { decimals } from './format.ts';
import type { NotRun } from '../analysis/compare.ts';

const RULE = '─'.repeat(78);
const num = (v: number | null | undefined, digits = 1): string => decimals(v, digits);
const verdictWords = (pass: boolean, failed: readonly string[]) => (pass ? 'all pass' : `FAIL: ${failed.join(', ')}`);

/** Lines naming each case that did not run and why (empty when every case ran). */
export function notRunLines(notRun: readonly NotRun[]): string[] {
  if (notRun.length === 0) return [];
  const lines = ['', `NOT RUN (${notRun.length})`];
  for (const n of notRun) {
    lines.push(`  ${n.scenario}: ${n.status === 'invalid' ? 'not a valid scenario' : 'could not be computed'}`);
    for (const p of n.problems) lines.push(`    ${p}`);
  }
  return lines;
}

/** The sweep table as lines: one row per point, the recommended point marked. */
export function sweepSheet(t: SweepTable): string[] {
  const lines = [RULE, `SWEEP OF ${t.axes.map((a) => a.key).join(' × ')}: ${t.rows.length} points (choice: ${t.rule})`];
  lines.push(
    ...table(
      [
        ['', ...t.axes.map(axisHeading), 'limits', 'shell °C', 'lining °C', 'acid margin K', 'water margin K', 'σ MPa', 'loss kWh/day'],
        ...t.rows.map((r) => {
          const f = r.figures;
          return [
            r.name === t.recommended ? '→' : '',
            ...r.values,
            f ? verdictWords(f.all_limits_pass, f.failed_limits) : `not run (${r.status})`,
            num(f?.peak_shell_c),
            num(f?.peak_lining_c),
            num(f?.lowest_acid_dew_margin_k),
            num(f?.lowest_water_dew_margin_k),
            num(f?.max_stress_indicator_mpa, 2),
            num(f?.heat_loss_kwh_per_day),
          ];
        }),
      ],
      ['l', ...t.axes.map(() => 'r' as const), 'l', 'r', 'r', 'r', 'r', 'r', 'r'],
    ).map((l) => `  ${l}`),
  );
  lines.push('');
  const best = t.rows.find((r) => r.name === t.recommended);
  lines.push(best ? `Meets every limit at the least heat loss: ${best.values.join(', ')} (${best.name})` : 'No point of the sweep meets every limit that is set.');
  return lines;
}

const probeVerdict = (p: SizingProbe | null) =>
  p === null ? '—' : p.summary ? verdictWords(p.summary.all_limits_pass, p.summary.verdicts.filter((v) => v.status === 'fail').map((v) => v.limit)) : `not run: ${(p.problems ?? []).join('; ')}`;

/** The sizing answer as lines: the value, the governing limit and its margin, the step beyond that fails, and every probe. */
export function sizingSheet(r: SizingResult, key: string, resolution: string): string[] {
  const word = r.direction === 'smallest' ? 'smallest' : 'largest';
  const beyondWord = r.direction === 'smallest' ? 'one step smaller' : 'one step larger';
  const lines = [RULE, `SIZING ${key}: the ${word} value that meets every limit, to ${resolution}`];
  if (r.status === 'found') {
    lines.push(`  ${word} value meeting every limit: ${r.value!.text}`);
    for (const g of r.governing)
      lines.push(`  governed by ${g.title} (${g.limit}): margin ${num(g.margin, 2)} ${g.unit} at ${r.value!.text}; ${num(g.margin_one_step_beyond, 2)} ${g.unit} at ${r.beyond!.value.text}`);
    lines.push(`  ${beyondWord}, ${r.beyond!.value.text}: ${probeVerdict(r.beyond)}`);
  } else if (r.status === 'range-end-passes') {
    lines.push(`  the ${word === 'smallest' ? 'first' : 'last'} value of the range, ${r.value!.text}, already meets every limit: widen the range to find the ${word}`);
  } else if (r.status === 'none-passes') {
    lines.push(`  no value of the range meets every limit; at ${r.beyond!.value.text}: ${probeVerdict(r.beyond)}`);
    for (const g of r.governing) lines.push(`  ${g.title} (${g.limit}): margin ${num(g.margin_one_step_beyond, 2)} ${g.unit}`);
  } else lines.push('  the search stopped: a value was not a valid scenario or its run could not be computed (see the probes)');
  for (const c of r.contradictions) lines.push(`  ! ${c}`);
  lines.push('');
  lines.push(`PROBES (${r.probes.length} runs, in the order evaluated)`);
  lines.push(...table([['value', 'verdict'], ...r.probes.map((p) => [p.value.text, probeVerdict(p)])], ['r', 'l']).map((l) => `  ${l}`));
  lines.push(RULE);
  return lines;
}
