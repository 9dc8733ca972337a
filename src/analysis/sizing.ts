/**
 * Sizing: the smallest (or largest) value of one scenario value, on a grid of a given resolution,
 * at which every limit is met. The search brackets the boundary between failing and passing
 * values and narrows it by bisection on the sign of the governing margin (pass: every margin ≥ 0);
 * with several threads it evaluates that many points per round (k-section: the bracket is cut into
 * k + 1 parts). It ends with two neighbours one resolution step apart, one passing and one failing,
 * which is the proof the answer offers.
 *
 * It assumes the verdict changes once over the range (more insulation: a cooler shell, a warmer
 * inner surface). A probe that contradicts that is reported, and the answer is then a boundary,
 * not necessarily the smallest value.
 */
import type { SweptValue } from '../input/scenario/sweep.ts';
import type { Summary } from './summary.ts';
import { verdictMargin } from './margins.ts';

/** One evaluated value. */
export interface SizingProbe {
  readonly value: SweptValue;
  readonly status: 'ran' | 'invalid' | 'failed';
  readonly summary?: Summary;
  readonly problems?: readonly string[];
}

/** Evaluate several values (in parallel where the caller can); probes in the order of the values. */
export type EvaluateValues = (values: readonly SweptValue[]) => Promise<SizingProbe[]>;

/** A limit that governs the answer: it fails one step beyond, and this is its margin at the answer. */
export interface GoverningLimit {
  readonly limit: string;
  readonly title: string;
  /** Unit of the margins: K for a temperature limit, MPa for the stress. */
  readonly unit: string;
  /** Margin at the sized value (positive: passes by this much). */
  readonly margin: number | null;
  /** Margin one step beyond (negative: fails by this much). */
  readonly margin_one_step_beyond: number | null;
}

export interface SizingResult {
  readonly direction: 'smallest' | 'largest';
  /**
   * found: the value passes and one step beyond fails; range-end-passes: the first value of the
   * range (in the search direction) already passes; none-passes: no value of the range passes;
   * not-run: a probe was not a valid scenario or could not be computed.
   */
  readonly status: 'found' | 'range-end-passes' | 'none-passes' | 'not-run';
  /** The sized value (null unless found or range-end-passes). */
  readonly value: SweptValue | null;
  readonly summary: Summary | null;
  /** One resolution step thinner (smallest) or thicker (largest) than the value: it fails. */
  readonly beyond: SizingProbe | null;
  readonly governing: readonly GoverningLimit[];
  /** Every probe in the order evaluated. */
  readonly probes: readonly SizingProbe[];
  /** Probes that contradict a single change of verdict over the range (empty when none do). */
  readonly contradictions: readonly string[];
}

const passes = (p: SizingProbe) => p.summary?.all_limits_pass === true;

/** Up to `k` distinct indices strictly inside (lo, hi), evenly spread. */
function interior(lo: number, hi: number, k: number): number[] {
  const out = new Set<number>();
  for (let j = 1; j <= k; j++) {
    const i = lo + Math.round(((hi - lo) * j) / (k + 1));
    if (i > lo && i < hi) out.add(i);
  }
  if (out.size === 0 && hi - lo > 1) out.add(lo + Math.floor((hi - lo) / 2));
  return [...out].sort((a, b) => a - b);
}

/** The unit of a margin: a difference of two °C temperatures is in K. */
const marginUnit = (unit: string) => (unit === '°C' ? 'K' : unit);

/** Limits that fail at `beyond`, with their margins there and at the answer. */
function governingLimits(at: Summary, beyond: Summary): GoverningLimit[] {
  return beyond.verdicts
    .filter((v) => v.status === 'fail')
    .map((v) => {
      const here = at.verdicts.find((w) => w.limit === v.limit);
      return { limit: v.limit, title: v.title, unit: marginUnit(v.unit), margin: here ? verdictMargin(here) : null, margin_one_step_beyond: verdictMargin(v) };
    });
}

/**
 * Search `grid` (values in increasing order, one resolution step apart) for the smallest value
 * that passes (or the largest, searching from the top), evaluating `threads` values per round.
 */
export async function sizeOnGrid(grid: readonly SweptValue[], direction: 'smallest' | 'largest', evaluate: EvaluateValues, threads = 1): Promise<SizingResult> {
  // search from the end that fails towards the end that passes: index 0 is the "thinnest"
  const ordered = direction === 'smallest' ? grid : [...grid].reverse();
  const probes: SizingProbe[] = [];
  const at = new Map<number, SizingProbe>();
  const result = (r: Omit<SizingResult, 'direction' | 'probes' | 'contradictions'>): SizingResult => ({ direction, ...r, probes, contradictions: contradictions(at, ordered) });
  const probe = async (indices: number[]): Promise<boolean> => {
    const got = await evaluate(indices.map((i) => ordered[i]!));
    got.forEach((p, j) => {
      probes.push(p);
      at.set(indices[j]!, p);
    });
    return got.every((p) => p.status === 'ran');
  };
  const last = ordered.length - 1;
  if (!(await probe(last === 0 ? [0] : [0, last]))) return result({ status: 'not-run', value: null, summary: null, beyond: null, governing: [] });
  if (passes(at.get(0)!)) return result({ status: 'range-end-passes', value: ordered[0]!, summary: at.get(0)!.summary!, beyond: null, governing: [] });
  if (!passes(at.get(last)!)) {
    const s = at.get(last)!.summary!;
    const failing = s.verdicts.filter((v) => v.status === 'fail').map((v) => ({ limit: v.limit, title: v.title, unit: marginUnit(v.unit), margin: null, margin_one_step_beyond: verdictMargin(v) }));
    return result({ status: 'none-passes', value: null, summary: null, beyond: at.get(last)!, governing: failing });
  }
  let lo = 0;
  let hi = last;
  while (hi - lo > 1) {
    const inside = interior(lo, hi, Math.max(1, threads));
    if (!(await probe(inside))) return result({ status: 'not-run', value: null, summary: null, beyond: null, governing: [] });
    const passing = inside.filter((i) => passes(at.get(i)!));
    hi = Math.min(hi, ...passing);
    lo = Math.max(lo, ...inside.filter((i) => i < hi && !passes(at.get(i)!)));
  }
  const answer = at.get(hi)!;
  const beyond = at.get(lo)!;
  return result({ status: 'found', value: ordered[hi]!, summary: answer.summary!, beyond, governing: governingLimits(answer.summary!, beyond.summary!) });
}

/** Probes that pass on the failing side of a probe that fails (in the search order). */
function contradictions(at: ReadonlyMap<number, SizingProbe>, ordered: readonly SweptValue[]): string[] {
  const seen = [...at.entries()].filter(([, p]) => p.status === 'ran').sort((a, b) => a[0] - b[0]);
  const out: string[] = [];
  seen.forEach(([i, p]) => {
    if (!passes(p)) return;
    const laterFail = seen.find(([j, q]) => j > i && !passes(q));
    if (laterFail) out.push(`${ordered[i]!.text} passes but ${ordered[laterFail[0]]!.text} fails: the verdict changes more than once over the range`);
  });
  return out;
}

/** A probe in a report: the value, whether it ran and passed, and the limits that fail. */
function probeReport(p: SizingProbe) {
  return {
    value: p.value.text,
    status: p.status,
    all_limits_pass: p.summary ? p.summary.all_limits_pass : null,
    failed_limits: p.summary ? p.summary.verdicts.filter((v) => v.status === 'fail').map((v) => v.limit) : [],
    problems: p.problems ?? [],
  };
}

/** The sizing result as plain data for sizing.json: the answer, its proof and every probe (no summaries). */
export function sizingReport(r: SizingResult, key: string, resolution: string) {
  return {
    key,
    direction: r.direction,
    resolution,
    status: r.status,
    value: r.value?.text ?? null,
    governing: r.governing,
    one_step_beyond: r.beyond ? probeReport(r.beyond) : null,
    probes: r.probes.map(probeReport),
    contradictions: r.contradictions,
  };
}
