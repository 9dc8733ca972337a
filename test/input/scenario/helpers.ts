/** Shared by the scenario tests: the demo scenario as an object, and the problem lines of validating one. */
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { validateModelInputs, type ValidateOptions } from '../../../src/input/scenario/validate.ts';
import { ScenarioError } from '../../../src/input/scenario/errors.ts';

/** scenarios/demo.yaml as an object, for one day (the file's until-periodic study takes many). */
export function demoScenario(): any {
  const s = parse(readFileSync('scenarios/demo.yaml', 'utf8'));
  s.run.days = 1;
  return s;
}

/** The problem lines of validating `s` (none when it is valid); other errors are thrown. */
export function problemsOf(s: unknown, options: ValidateOptions = {}): string[] {
  try {
    validateModelInputs(s, options);
  } catch (e) {
    if (e instanceof ScenarioError) return [...e.problems];
    throw e;
  }
  return [];
}
