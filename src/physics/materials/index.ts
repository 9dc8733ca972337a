/**
 * Public entry of the material library: look-up by name, typo suggestions for error messages, and
 * the rows of the `stackday materials` listing.
 */
import { interpolateTable } from '../properties/table.ts';
import { kelvinToCelsius } from '../constants.ts';
import { MATERIALS } from './library.ts';
import type { Material } from './types.ts';

export type { Material, PropertyTable } from './types.ts';
export { MATERIALS } from './library.ts';

/** Normalise a user-typed name: trimmed, lower case, spaces and underscores as hyphens. */
function normaliseName(name: string): string {
  return name.trim().toLowerCase().replace(/[\s_]+/g, '-');
}

/**
 * The built-in material called `name` (kebab-case key; case, surrounding blanks and `_`/space
 * instead of `-` are forgiven), or `undefined`.
 */
export function findMaterial(name: string): Material | undefined {
  const key = normaliseName(name);
  return Object.prototype.hasOwnProperty.call(MATERIALS, key) ? MATERIALS[key] : undefined;
}

/** Names of all built-in materials, in library order. */
export function materialNames(): string[] {
  return Object.keys(MATERIALS);
}

/** Levenshtein edit distance (insertions, deletions, substitutions each cost 1). */
export function levenshtein(a: string, b: string): number {
  if (a === b) return 0;
  if (a.length === 0) return b.length;
  if (b.length === 0) return a.length;
  let prev = new Array<number>(b.length + 1);
  let curr = new Array<number>(b.length + 1);
  for (let j = 0; j <= b.length; j++) prev[j] = j;
  for (let i = 1; i <= a.length; i++) {
    curr[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const cost = a.charCodeAt(i - 1) === b.charCodeAt(j - 1) ? 0 : 1;
      curr[j] = Math.min(prev[j] + 1, curr[j - 1] + 1, prev[j - 1] + cost);
    }
    [prev, curr] = [curr, prev];
  }
  return prev[b.length];
}

/**
 * The closest built-in material name to a mistyped `name`, for "did you mean …?" messages, or
 * `undefined` when nothing is close. Close means an edit distance of at most a third of the longer
 * name (at least 2), or one name containing the other (e.g. `steel` → the first steel found).
 */
export function suggestMaterial(name: string): string | undefined {
  const key = normaliseName(name);
  if (key.length === 0) return undefined;
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const candidate of materialNames()) {
    const d = levenshtein(key, candidate);
    if (d < bestDistance) {
      best = candidate;
      bestDistance = d;
    }
  }
  if (best !== undefined && bestDistance <= Math.max(2, Math.floor(Math.max(key.length, best.length) / 3))) return best;
  if (key.length >= 3) return materialNames().find((c) => c.includes(key) || key.includes(c));
  return undefined;
}

/** Column titles of `describeMaterialsTable`. */
export const MATERIALS_TABLE_HEADER: readonly string[] = [
  'name',
  'kind',
  'density kg/m³',
  'k@300K W/mK',
  'k@800K W/mK',
  'cp@300K J/kgK',
  'emissivity',
  'max service °C',
  'source',
];

/**
 * Rows for a console listing of the library: the header (`MATERIALS_TABLE_HEADER`) first, then one
 * row per material with name, kind, density, k at 300 K and 800 K, cp at 300 K, emissivity,
 * maximum service temperature in °C and source. Gap layers show `–` for density and cp and `air`
 * for k (air properties apply).
 */
export function describeMaterialsTable(): string[][] {
  const rows: string[][] = [[...MATERIALS_TABLE_HEADER]];
  for (const m of Object.values(MATERIALS)) {
    const isGap = m.kind === 'gap';
    rows.push([
      m.name,
      m.kind,
      isGap ? '–' : m.density.toFixed(0),
      isGap ? 'air' : formatSignificant(interpolateTable(m.conductivity, 300)),
      isGap ? 'air' : formatSignificant(interpolateTable(m.conductivity, 800)),
      isGap ? '–' : interpolateTable(m.specificHeat, 300).toFixed(0),
      m.emissivity.toFixed(2),
      isGap ? '–' : kelvinToCelsius(m.maxServiceTemperatureK).toFixed(0),
      m.source,
    ]);
  }
  return rows;
}

/** Three significant figures, without exponent notation for the values a material table holds. */
function formatSignificant(x: number): string {
  return Number(x.toPrecision(3)).toString();
}
