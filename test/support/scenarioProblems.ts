/** Test support: the problems a scenario is refused with, one line each (fails the test when it is accepted). */
import { expect } from 'vitest';
import { validateModelInputs, type ValidateOptions } from '../../src/input/scenario/validate.ts';
import { ScenarioError } from '../../src/input/scenario/errors.ts';

export function problemsOf(raw: unknown, options: ValidateOptions = {}): string[] {
  try {
    validateModelInputs(raw, options);
  } catch (e) {
    expect(e).toBeInstanceOf(ScenarioError);
    return [...(e as ScenarioError).problems];
  }
  throw new Error('expected a ScenarioError');
}
