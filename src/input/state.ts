/**
 * Reading back a state.json written by an earlier run (src/output/state.ts) as a wall state, with
 * a located message for anything that is not such a file.
 */
import { readFileSync } from 'node:fs';
import { STATE_FORMAT, STATE_FORMAT_VERSION, type WallState, type WallStateLayer } from '../model/wallState.ts';

/** A state file that cannot be used, with the file and the field at fault. */
export class StateFileError extends Error {
  constructor(readonly fileName: string, problem: string) {
    super(`${fileName}: ${problem}`);
    this.name = 'StateFileError';
  }
}

const isObject = (v: unknown): v is Record<string, unknown> => v !== null && typeof v === 'object' && !Array.isArray(v);
const isNumberArray = (v: unknown, test: (x: number) => boolean): v is number[] => Array.isArray(v) && v.every((x) => typeof x === 'number' && test(x));

/** The wall state in a state.json text; throws StateFileError naming what is wrong. */
export function parseStateJson(text: string, fileName: string): WallState {
  const fail = (problem: string): never => {
    throw new StateFileError(fileName, problem);
  };
  let doc: unknown;
  try {
    doc = JSON.parse(text);
  } catch (e) {
    return fail(`not readable as JSON (${(e as Error).message})`);
  }
  if (!isObject(doc) || doc.format !== STATE_FORMAT) return fail(`not a stackday state file (expected "format": "${STATE_FORMAT}", as the state.json a run writes)`);
  if (doc.format_version !== STATE_FORMAT_VERSION) return fail(`format_version ${JSON.stringify(doc.format_version)} is not ${STATE_FORMAT_VERSION}, the version this stackday reads`);
  const segments = doc.segments;
  if (typeof segments !== 'number' || !Number.isInteger(segments) || segments < 1) return fail('"segments" must be a whole number of at least 1');
  const sectors = doc.sectors ?? 1;
  if (typeof sectors !== 'number' || !Number.isInteger(sectors) || sectors < 1) return fail('"sectors" must be a whole number of at least 1');
  const columns = segments * sectors;
  if (typeof doc.inner_radius_m !== 'number' || !(doc.inner_radius_m > 0)) return fail('"inner_radius_m" must be a positive number');
  const radius = doc.node_radius_m;
  if (!isNumberArray(radius, (x) => x > 0) || radius.length < 1) return fail('"node_radius_m" must list the positive node radii');
  for (let i = 1; i < radius.length; i++) if (!(radius[i]! >= radius[i - 1]!)) return fail(`"node_radius_m" must not decrease (entry ${i})`);
  const n = radius.length;
  const labels = doc.node_label;
  if (!Array.isArray(labels) || labels.length !== n || !labels.every((l) => typeof l === 'string')) return fail(`"node_label" must list ${n} names, one per node`);
  if (!Array.isArray(doc.layers) || doc.layers.length < 1) return fail('"layers" must list the wall layers');
  const layers: WallStateLayer[] = doc.layers.map((l: unknown, j: number) => {
    const where = `"layers"[${j}]`;
    if (!isObject(l)) return fail(`${where} must be an object`);
    const { label, material, kind, thickness_m: thickness, first_node: first, last_node: last } = l;
    if (typeof label !== 'string' || typeof material !== 'string') return fail(`${where} needs "label" and "material" names`);
    if (kind !== 'solid' && kind !== 'gap') return fail(`${where}.kind must be "solid" or "gap"`);
    if (typeof thickness !== 'number' || !(thickness > 0)) return fail(`${where}.thickness_m must be a positive number`);
    if (!Number.isInteger(first) || !Number.isInteger(last) || (first as number) < 0 || (last as number) >= n || (last as number) <= (first as number))
      return fail(`${where} must name its first and last node within the ${n} nodes`);
    return { label, material, kind, thickness, firstNode: first as number, lastNode: last as number };
  });
  const rows = doc.temperature_k;
  if (!Array.isArray(rows) || rows.length !== columns)
    return fail(`"temperature_k" must hold one row per segment${sectors > 1 ? ` and sector, segment by segment (${segments} × ${sectors} = ${columns})` : ` (${segments})`}`);
  const temperatureK = new Float64Array(columns * n);
  rows.forEach((row: unknown, s: number) => {
    if (!isNumberArray(row, (x) => Number.isFinite(x) && x > 0) || row.length !== n) fail(`"temperature_k"[${s}] must hold ${n} positive temperatures in kelvin`);
    temperatureK.set(row as number[], s * n);
  });
  return {
    segments,
    sectors,
    innerRadius: doc.inner_radius_m,
    nodeRadius: Float64Array.from(radius),
    nodeLabel: labels as string[],
    layers,
    temperatureK,
    timeLocal: typeof doc.time_local === 'string' ? doc.time_local : 'an unknown instant',
    ...(typeof doc.last_step_s === 'number' && doc.last_step_s > 0 && Number.isFinite(doc.last_step_s) ? { lastStepS: doc.last_step_s } : {}),
  };
}

/** Read a state.json file; throws StateFileError for an unreadable or malformed file. */
export function readStateFile(path: string, fileName = path): WallState {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    throw new StateFileError(fileName, code === 'ENOENT' ? 'no such file (a run writes state.json into its output folder)' : (e as Error).message);
  }
  return parseStateJson(text, fileName);
}
