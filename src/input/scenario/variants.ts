/**
 * Variants in one file: `variants:` maps a name to the changes that make it from the scenario in
 * the same file (the base case). Each variant becomes a list of overrides for the one validation
 * path (validate.ts), written under the prefix `variants.<name>` so that every message about a key
 * the variant set names the variant: `variants.thick-wool.stack.layers[1].thickness: found …`.
 *
 * How a variant's keys apply to the base:
 * - a section (mapping) whose base is a section too is merged key by key;
 * - a list, a value, or a section where the base has none replaces what is there;
 * - a key holding a dot or a bracket is a key path and sets that one value
 *   (`stack.layers[1].thickness: 100 mm` changes one layer and keeps the others);
 * - null removes the key (`limits: { acid_dew_margin: null }` unsets that limit).
 * The variant's name is its key; the `variants` section itself is not part of any variant.
 */
import type { ScenarioOverride } from './validate.ts';
import { looksLikeKeyPath, parseKeyPath, valueAtPath, type KeyPath } from './keyPath.ts';
import { formatPath } from './errors.ts';

export interface ScenarioVariant {
  readonly name: string;
  /** The overrides that make the variant from the raw file: its changes, the name, the variants section removed. */
  readonly overrides: readonly ScenarioOverride[];
  /** Problems found before validation (a key that is neither a key nor a key path). */
  readonly problems: readonly string[];
}

/** The override that leaves the variants section out of a scenario (the base case, or a variant). */
export const WITHOUT_VARIANTS: ScenarioOverride = { path: ['variants'], value: undefined };

const isSection = (v: unknown): v is Record<string, unknown> => v !== null && typeof v === 'object' && !Array.isArray(v);

/** Names of the variants in a raw scenario (as parsed from the file), in file order. */
export function variantNames(raw: unknown): string[] {
  const v = isSection(raw) ? raw['variants'] : undefined;
  return isSection(v) ? Object.keys(v) : [];
}

/** Each variant of a raw scenario (as parsed from the file) as overrides of the base, in file order. */
export function scenarioVariants(raw: unknown): ScenarioVariant[] {
  const all = isSection(raw) && isSection(raw['variants']) ? raw['variants'] : {};
  return Object.entries(all).map(([name, changes]) => {
    const prefix = ['variants', name];
    const overrides: ScenarioOverride[] = [WITHOUT_VARIANTS];
    const problems: string[] = [];
    if (isSection(changes)) flatten(changes, raw, [], prefix, overrides, problems);
    else problems.push(`${formatPath(prefix)}: expected a mapping of the keys the variant changes`);
    overrides.push({ path: ['name'], value: name });
    return { name, overrides, problems };
  });
}

/** The variant's changes under `at` as overrides: sections merged into base sections, everything else set. */
function flatten(changes: Record<string, unknown>, base: unknown, at: KeyPath, prefix: KeyPath, out: ScenarioOverride[], problems: string[]): void {
  for (const [key, value] of Object.entries(changes)) {
    const keys = looksLikeKeyPath(key) ? parseKeyPath(key) : [key];
    if (keys === null) {
      problems.push(`${formatPath([...prefix, ...at])}: found the key "${key}"; expected a key or a key path such as stack.layers[1].thickness`);
      continue;
    }
    const path = [...at, ...keys];
    if (isSection(value) && isSection(valueAtPath(base, path))) flatten(value, base, path, prefix, out, problems);
    else out.push({ path, value: value === null ? undefined : value, prefix });
  }
}
