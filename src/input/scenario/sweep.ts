/**
 * Sweeps: one or two scalars of a scenario, each addressed by its key path, varied over a list or
 * a range of values written as in the file (`40 mm`, `0.9`, `"05:30"`). Each point of the sweep is
 * a set of overrides for the one validation path, so a value the schema rejects is reported with
 * the option and the key (`--vary (stack.layers[1].thickness): found "-5 mm"; expected …`).
 *
 * Grammar of one `--vary` text: `KEY.PATH=VALUES` where VALUES is
 * - a list: `40 mm,60 mm,80 mm` (numbers, text, true/false);
 * - a range: `20 mm..120 mm step 10 mm` (a number with an optional unit at each end; the step in
 *   the same unit, or without one). A range without a step is for `stackday size`, which takes its
 *   resolution separately.
 */
import type { ScenarioOverride } from './validate.ts';
import { parseKeyPath, type KeyPath } from './keyPath.ts';
import { formatPath } from './errors.ts';
import { WITHOUT_VARIANTS } from './variants.ts';

/** A sweep that cannot be set up as written (bad input). */
export class SweepSpecError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'SweepSpecError';
  }
}

/** One value of a swept key: as written, as set in the scenario, and as a number for charts. */
export interface SweptValue {
  /** As written, e.g. `40 mm`. */
  readonly text: string;
  /** As set in the scenario: a plain number, true/false, or the text (with its unit). */
  readonly value: string | number | boolean;
  /** The number in the axis unit (null when the value is not a number in that unit). */
  readonly x: number | null;
}

export interface SweepAxis {
  /** The key path as written, e.g. `stack.layers[1].thickness`. */
  readonly key: string;
  readonly path: KeyPath;
  /** Unit of every value's number (empty for plain numbers; as written, e.g. `mm`). */
  readonly unit: string;
  /** Whether every value is a number in `unit` (else the axis is a list of categories). */
  readonly numeric: boolean;
  readonly values: readonly SweptValue[];
}

/** A range as written: two ends and an optional step, numbers in one unit. */
export interface ValueRange {
  readonly from: number;
  readonly to: number;
  readonly step: number | null;
  readonly unit: string;
}

/** Most points one axis may have (a guard against a step typed too small). */
export const MAX_AXIS_POINTS = 2000;

const NUMBER = /^([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*(.*)$/;

/** A number and the unit written after it (`40 mm` → 40, "mm"); null when the text does not start with a number. */
export function splitNumber(text: string): { n: number; unit: string } | null {
  const m = NUMBER.exec(text.trim());
  return m ? { n: Number(m[1]), unit: m[2]!.trim() } : null;
}

/** Split `KEY.PATH=VALUES`. */
export function splitAssignment(text: string, option: string): { key: string; path: KeyPath; rest: string } {
  const eq = text.indexOf('=');
  if (eq < 0) throw new SweepSpecError(`${option}: found "${text}"; expected KEY.PATH=VALUES, e.g. "stack.layers[1].thickness=20 mm..120 mm step 10 mm" or "surface.emissivity=0.3,0.6,0.9"`);
  const key = text.slice(0, eq).trim();
  const path = parseKeyPath(key);
  if (path === null || path.length === 0) throw new SweepSpecError(`${option}: found the key path "${key}"; expected keys and list indices such as stack.layers[1].thickness`);
  return { key: formatPath(path), path, rest: text.slice(eq + 1).trim() };
}

/** Parse `20 mm..120 mm step 10 mm` (the step optional); null when the text is not a range. */
export function parseRange(text: string, option: string): ValueRange | null {
  const m = /^(.+?)\.\.(.+?)(?:\s+step\s+(.+))?$/.exec(text.trim());
  if (!m) return null;
  const ends = [m[1]!, m[2]!, m[3]].map((t) => (t === undefined ? null : { t, p: splitNumber(t) }));
  for (const e of ends) if (e && (e.p === null || !Number.isFinite(e.p.n) || !/^(?:$|[A-Za-z°µ%])/.test(e.p.unit))) throw new SweepSpecError(`${option}: found "${e.t.trim()}" in the range "${text}"; expected a number with an optional unit, e.g. 20 mm`);
  const units = [...new Set(ends.flatMap((e) => (e && e.p!.unit !== '' ? [e.p!.unit] : [])))];
  if (units.length > 1) throw new SweepSpecError(`${option}: found the units ${units.map((u) => `"${u}"`).join(', ')} in the range "${text}"; expected one unit for both ends and the step`);
  const [from, to, step] = ends.map((e) => (e ? e.p!.n : null));
  if (!(to! > from!)) throw new SweepSpecError(`${option}: found the range "${text}"; expected the second end above the first`);
  if (step !== null && !(step! > 0)) throw new SweepSpecError(`${option}: found the step "${ends[2]!.t.trim()}"; expected a positive step`);
  return { from: from!, to: to!, step: step ?? null, unit: units[0] ?? '' };
}

/** A number as short text without binary noise (0.1 + 0.2 → "0.3"). */
export function cleanNumber(n: number): number {
  return Number(n.toPrecision(12));
}

/** The value of a swept number in its unit, as set in the scenario: a plain number, or text with the unit. */
export function sweptNumber(n: number, unit: string): SweptValue {
  const x = cleanNumber(n);
  return unit === '' ? { text: String(x), value: x, x } : { text: `${x} ${unit}`, value: `${x} ${unit}`, x };
}

/** Points of a range from `from` by `step` up to `to` (the last point is the last whole step not beyond `to`). */
export function rangePoints(r: ValueRange, step: number, option: string): SweptValue[] {
  const count = Math.floor((r.to - r.from) / step + 1e-9) + 1;
  if (count > MAX_AXIS_POINTS) throw new SweepSpecError(`${option}: the range ${r.from}..${r.to} by ${step} has ${count} points; expected at most ${MAX_AXIS_POINTS}`);
  return Array.from({ length: count }, (_, i) => sweptNumber(r.from + i * step, r.unit));
}

/** One list item: a number (with or without a unit), true/false, or text. */
function listValue(text: string): SweptValue {
  const t = text.trim();
  if (t === 'true' || t === 'false') return { text: t, value: t === 'true', x: null };
  const p = splitNumber(t);
  if (p && p.unit === '') return { text: t, value: p.n, x: p.n };
  return { text: t, value: t, x: p ? p.n : null };
}

/** Parse one `--vary` text into an axis of values. */
export function parseVary(text: string, option = '--vary'): SweepAxis {
  const { key, path, rest } = splitAssignment(text, option);
  const range = parseRange(rest, option);
  if (range) {
    if (range.step === null) throw new SweepSpecError(`${option}: found the range "${rest}" without a step; expected e.g. "${rest} step ${range.unit ? `10 ${range.unit}` : '0.1'}"`);
    return { key, path, unit: range.unit, numeric: true, values: rangePoints(range, range.step, option) };
  }
  const items = rest.split(',').map((s) => s.trim());
  if (items.some((s) => s === '')) throw new SweepSpecError(`${option}: found "${rest}"; expected a list of values separated by commas, or a range FROM..TO step STEP`);
  const values = items.map(listValue);
  const units = new Set(values.map((v) => (v.x === null ? null : (splitNumber(v.text)?.unit ?? ''))));
  const numeric = !units.has(null) && units.size === 1;
  return { key, path, unit: numeric ? ([...units][0] ?? '') : '', numeric, values };
}

export interface SweepPoint {
  /** A name for the point, usable as a scenario name and a folder name: `thickness-40mm`, `thickness-40mm_emissivity-0.9`. */
  readonly name: string;
  /** One value per axis. */
  readonly values: readonly SweptValue[];
  /** The overrides that make the point from the raw file (the variants section left out). */
  readonly overrides: readonly ScenarioOverride[];
}

/** The last key of an axis's path, e.g. `thickness` for `stack.layers[1].thickness`. */
export function axisLeaf(axis: Pick<SweepAxis, 'path'>): string {
  return [...axis.path].reverse().find((p): p is string => typeof p === 'string') ?? 'value';
}

/** `thickness-40mm` from the axis's last key and the value's text. */
function pointLabel(axis: SweepAxis, v: SweptValue): string {
  const value = v.text.replace(/\s+/g, '').replace(/^-/, 'minus').replace(/[^A-Za-z0-9._-]/g, '_');
  return `${axisLeaf(axis)}-${value}`;
}

/** Every combination of the axes' values (the first axis outermost), with names made unique. */
export function sweepPoints(axes: readonly SweepAxis[], option = '--vary'): SweepPoint[] {
  if (axes.length === 0 || axes.length > 2) throw new SweepSpecError(`${option}: found ${axes.length} keys to vary; expected one or two`);
  if (axes.length === 2 && axes[0]!.key === axes[1]!.key) throw new SweepSpecError(`${option}: found ${axes[0]!.key} twice; expected two different keys`);
  const combos: SweptValue[][] = axes.length === 1 ? axes[0]!.values.map((v) => [v]) : axes[0]!.values.flatMap((a) => axes[1]!.values.map((b) => [a, b]));
  const seen = new Map<string, number>();
  return combos.map((values) => {
    let name = values.map((v, i) => pointLabel(axes[i]!, v)).join('_');
    const n = (seen.get(name) ?? 0) + 1;
    seen.set(name, n);
    if (n > 1) name = `${name}-${n}`;
    const overrides: ScenarioOverride[] = [WITHOUT_VARIANTS, ...values.map((v, i) => ({ path: axes[i]!.path, value: v.value, option })), { path: ['name'], value: name }];
    return { name, values, overrides };
  });
}
