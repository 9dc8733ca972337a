/**
 * Turning validation issues into one line per problem: the path in the scenario file, the value
 * found and what was expected (with units).
 */
import type { z } from 'zod';

/** A scenario that cannot be run: every problem found, one line each. */
export class ScenarioError extends Error {
  constructor(readonly problems: readonly string[], readonly file?: string) {
    super(`${file ? `${file}: ` : ''}${problems.length} problem${problems.length === 1 ? '' : 's'} in the scenario:\n${problems.map((p) => `  ${p}`).join('\n')}`);
    this.name = 'ScenarioError';
  }
}

/** `stack.layers[1].thickness` from a zod path. */
export function formatPath(path: readonly PropertyKey[]): string {
  let out = '';
  for (const p of path) {
    if (typeof p === 'number') out += `[${p}]`;
    else out += out ? `.${String(p)}` : String(p);
  }
  return out || '(top level)';
}

const show = (v: unknown): string => {
  if (v === undefined) return 'nothing';
  if (typeof v === 'string') return `"${v}"`;
  const text = JSON.stringify(v);
  return text.length > 60 ? `${text.slice(0, 57)}...` : text;
};

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

/** One line per problem: `path: found X; expected Y`. */
export function formatIssues(issues: readonly Issue[], input: unknown, prefix: readonly PropertyKey[] = []): string[] {
  const lines: string[] = [];
  for (const issue of issues) {
    const path = [...prefix, ...issue.path];
    if (issue.code === 'invalid_union' && 'errors' in issue && issue.errors.length > 0) {
      const branch = bestBranch(issue.errors as Issue[][]);
      if (branch.some((i) => i.code === 'invalid_type' && i.path.length === 0) && branch.length === issue.errors.flat().length) {
        lines.push(`${formatPath(path)}: found ${show(valueAt(input, path))}; expected one of the documented forms (see \`stackday schema\`)`);
      } else lines.push(...formatIssues(branch, input, path));
      continue;
    }
    const here = formatPath(path);
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) lines.push(`${formatPath([...path, key])}: unknown key "${key}"; expected only the keys documented for ${here} (see \`stackday schema\`)`);
      continue;
    }
    const found = valueAt(input, path);
    if (issue.code === 'custom' && issue.message.startsWith('found ')) {
      lines.push(`${here}: ${issue.message}`);
    } else if (issue.code === 'invalid_type') {
      lines.push(found === undefined ? `${here}: missing; expected ${describeType(issue.expected)}` : `${here}: found ${show(found)}; expected ${describeType(issue.expected)}`);
    } else if (issue.code === 'invalid_value') {
      lines.push(`${here}: found ${show(found)}; expected one of ${issue.values.map((v) => show(v)).join(', ')}`);
    } else {
      lines.push(`${here}: found ${show(found)}; ${issue.message.replace(/^Invalid input: /, '')}`);
    }
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
