/**
 * Turning validation issues into one line per problem: the path in the scenario file, the value
 * found (as written in the file where the file tells us) and what was expected (with unit and
 * range for a number, every allowed form for a choice). Text from the input is always shown
 * printable: control characters and other unprintable code points are escaped, long text is cut.
 *
 * Convention for messages made by the schema: a message that starts with `expected ` gets
 * `path: found <value>; ` (or `path: missing; `) put in front of it here; a message that starts
 * with `found ` is complete and used as it is.
 */
import type { z } from 'zod';
import { printable } from '../text.ts';

export { printable } from '../text.ts';

/** Problem lines shown in a ScenarioError's message; the rest are counted (all stay in `problems`). */
export const MAX_PROBLEM_LINES = 40;

/** A scenario that cannot be run: every problem found, one line each. */
export class ScenarioError extends Error {
  constructor(readonly problems: readonly string[], readonly file?: string) {
    const shown = problems.slice(0, MAX_PROBLEM_LINES).map((p) => `  ${p}`);
    if (problems.length > MAX_PROBLEM_LINES) shown.push(`  … and ${problems.length - MAX_PROBLEM_LINES} more (fix these first)`);
    super(`${file ? `${file}: ` : ''}${problems.length} problem${problems.length === 1 ? '' : 's'} in the scenario:\n${shown.join('\n')}`);
    this.name = 'ScenarioError';
  }
}

/** The text a value was written as in the file at a path (YAML source), when known. */
export type WrittenLookup = (path: readonly PropertyKey[]) => string | undefined;

/** `stack.layers[1].thickness` from a zod path. */
export function formatPath(path: readonly PropertyKey[]): string {
  let out = '';
  for (const p of path) {
    if (typeof p === 'number') out += `[${p}]`;
    else out += out ? `.${printable(String(p), 40)}` : printable(String(p), 40);
  }
  return out || '(top level)';
}

/** A number that is not finite, described: `.nan (not a number)`, `1e400 (too large: infinite)`. */
function nonFinite(v: number, written: string | undefined): string {
  if (Number.isNaN(v)) return `${written ?? 'NaN'} (not a number)`;
  if (written !== undefined && /\d/.test(written)) return `${written} (too large for a number: read as ${v > 0 ? '' : 'minus '}infinity)`;
  return `${written ?? (v > 0 ? 'Infinity' : '-Infinity')} (${v > 0 ? '' : 'minus '}infinity)`;
}

/**
 * A value for messages: text in quotes, printable and cut; numbers as written in the file when
 * known (`written`), non-finite ones said to be so; lists and sections summarised when long.
 */
export function showValue(v: unknown, written?: string): string {
  if (v === undefined) return 'nothing';
  if (typeof v === 'string') {
    const quoted = `"${printable(v).replace(/"/g, '\\"')}"`;
    return v.length > 60 ? `${quoted} (${v.length} characters)` : quoted;
  }
  if (typeof v === 'number') {
    if (!Number.isFinite(v)) return nonFinite(v, written);
    return written !== undefined && written.length <= 40 && !/[\s#]/.test(written) ? printable(written) : String(v);
  }
  if (v === null) return written?.trim() ? printable(written, 20) : 'an empty value (null)';
  let text: string;
  try {
    text = JSON.stringify(v, (_k, x) => (typeof x === 'number' && !Number.isFinite(x) ? String(x) : x)) ?? String(v);
  } catch {
    text = '';
  }
  if (text && text.length <= 60) return printable(text);
  if (Array.isArray(v)) return `a list of ${v.length} item${v.length === 1 ? '' : 's'}`;
  if (typeof v === 'object') return `a section of ${Object.keys(v).length} keys`;
  return printable(String(v));
}

function valueAt(root: unknown, path: readonly PropertyKey[]): unknown {
  let v: unknown = root;
  for (const p of path) {
    if (v === null || typeof v !== 'object') return undefined;
    v = (v as Record<PropertyKey, unknown>)[p as string];
  }
  return v;
}

type Issue = z.core.$ZodIssue;

/** Pick the union branch that explains the input best: the one whose problems go deepest and are fewest. */
function bestBranch(branches: readonly (readonly Issue[])[]): readonly Issue[] {
  let best = branches[0] ?? [];
  let bestScore = -Infinity;
  for (const b of branches) {
    const typeMismatchAtRoot = b.some((i) => i.code === 'invalid_type' && i.path.length === 0);
    const depth = Math.max(0, ...b.map((i) => i.path.length));
    const score = (typeMismatchAtRoot ? -1000 : 0) + depth * 10 - b.length;
    if (score > bestScore) {
      bestScore = score;
      best = b;
    }
  }
  return best;
}

/** Options of {@link formatIssues}. */
export interface FormatOptions {
  /** The text each value was written as, for showing values as written (YAML files). */
  readonly written?: WrittenLookup;
}

/** One line per problem: `path: found X; expected Y`. */
export function formatIssues(issues: readonly Issue[], input: unknown, prefix: readonly PropertyKey[] = [], options: FormatOptions = {}): string[] {
  const lines: string[] = [];
  const foundAt = (path: readonly PropertyKey[]): string => {
    const v = valueAt(input, path);
    return v === undefined ? 'missing' : `found ${showValue(v, options.written?.(path))}`;
  };
  for (const issue of issues) {
    const path = [...prefix, ...issue.path];
    const here = formatPath(path);
    if (issue.code === 'invalid_union' && 'errors' in issue && issue.errors.length > 0) {
      const branch = bestBranch(issue.errors as Issue[][]);
      const found = valueAt(input, path);
      // a section or list that one branch takes apart is reported inside; anything else against the union's forms
      const dig = found !== null && typeof found === 'object' && branch.some((i) => i.path.length > 0);
      if (!dig && issue.message.startsWith('expected ')) lines.push(`${here}: ${foundAt(path)}; ${issue.message}`);
      else if (!dig && branch.some((i) => i.code === 'invalid_type' && i.path.length === 0) && branch.length === issue.errors.flat().length)
        lines.push(`${here}: ${foundAt(path)}; expected one of the documented forms (see \`stackday schema\`)`);
      else lines.push(...formatIssues(branch, input, path, options));
      continue;
    }
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) lines.push(`${formatPath([...path, key])}: unknown key "${printable(key, 40)}"; expected only the keys documented for ${here} (see \`stackday schema\`)`);
      continue;
    }
    if (issue.message.startsWith('found ')) lines.push(`${here}: ${issue.message}`);
    else if (issue.message.startsWith('expected ')) lines.push(`${here}: ${foundAt(path)}; ${issue.message}`);
    else if (issue.code === 'invalid_type') lines.push(`${here}: ${foundAt(path)}; expected ${describeType(issue.expected)}`);
    else if (issue.code === 'invalid_value') lines.push(`${here}: ${foundAt(path)}; expected one of ${issue.values.map((v) => showValue(v)).join(', ')}`);
    else lines.push(`${here}: ${foundAt(path)}; ${issue.message.replace(/^Invalid input: /, '')}`);
  }
  return lines;
}

function describeType(expected: string): string {
  switch (expected) {
    case 'number':
      return 'a number';
    case 'string':
      return 'text';
    case 'array':
      return 'a list';
    case 'object':
      return 'a section of keys';
    case 'boolean':
      return 'true or false';
    default:
      return expected;
  }
}
