/**
 * Cases: the scenarios a design question runs — a file's base case and each of its variants, or
 * each point of a sweep — each as the file's raw object plus the overrides that make it. A case is
 * plain data (it crosses to worker threads) and is validated by the one validation path when run.
 */
import { dirname, resolve } from 'node:path';
import { readScenarioFile } from './load.ts';
import { validateModelInputs, type LoadedScenario, type ScenarioOverride } from './validate.ts';
import { ScenarioError } from './errors.ts';
import { scenarioVariants } from './variants.ts';

export interface ScenarioCase {
  /** The case's name: the scenario's name for a base case, the variant's name, or the sweep point's. */
  readonly name: string;
  /** The scenario object as read from the file (not yet validated). */
  readonly raw: unknown;
  /** Folder that relative paths in the scenario are relative to. */
  readonly baseDir: string;
  /** The scenario file, for messages. */
  readonly file?: string;
  readonly overrides: readonly ScenarioOverride[];
  /** Problems found before validation (they make the case invalid). */
  readonly problems: readonly string[];
}

/** The case validated: model inputs, or ScenarioError with every problem (those found before validation first). */
export function validateCase(c: ScenarioCase): LoadedScenario {
  let loaded: LoadedScenario | null = null;
  let problems = [...c.problems];
  try {
    loaded = validateModelInputs(c.raw, { baseDir: c.baseDir, file: c.file, overrides: c.overrides });
  } catch (e) {
    if (!(e instanceof ScenarioError)) throw e;
    problems = [...problems, ...e.problems];
  }
  if (problems.length > 0 || loaded === null) throw new ScenarioError(problems, c.file);
  return loaded;
}

/** The name of a raw scenario for reports (its `name`, or the file name when it has none). */
function nameOf(raw: unknown, file: string): string {
  const n = (raw as { name?: unknown } | null)?.name;
  return typeof n === 'string' && n !== '' ? n : file;
}

/**
 * The cases of a scenario file: its base case (validated here, so a file that cannot run at all is
 * bad input before anything runs: ScenarioError) and one case per variant (validated when run, so a
 * bad variant is reported on its own while the others run).
 */
export function fileCases(path: string, extra: readonly ScenarioOverride[] = []): ScenarioCase[] {
  const raw = readScenarioFile(path);
  const baseDir = dirname(resolve(path));
  // the base case keeps its variants section, so that the section's own form is checked with it
  const base: ScenarioCase = { name: nameOf(raw, path), raw, baseDir, file: path, overrides: [...extra], problems: [] };
  validateCase(base);
  return [base, ...scenarioVariants(raw).map((v) => ({ name: v.name, raw, baseDir, file: path, overrides: [...v.overrides, ...extra], problems: v.problems }))];
}
