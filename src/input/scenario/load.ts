/**
 * Scenario files in: read a YAML or JSON file into a plain object and hand it to the one
 * validation path (validate.ts), with the overrides a caller applies (command-line options).
 */
import { readFileSync } from 'node:fs';
import { dirname, resolve, extname } from 'node:path';
import { parseDocument } from 'yaml';
import { ScenarioError } from './errors.ts';
import { validateModelInputs, type LoadedScenario, type ScenarioOverride } from './validate.ts';

export { validateModelInputs, validateScenario, type LoadedScenario, type ScenarioOverride } from './validate.ts';

/** The plain object a scenario file holds (not yet validated). Throws ScenarioError when it cannot be read or parsed. */
export function readScenarioFile(path: string): unknown {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder' : code === 'EACCES' ? 'permission denied' : (e as Error).message;
    throw new ScenarioError([`scenario file "${path}" cannot be read: ${why}`]);
  }
  if (extname(path).toLowerCase() === '.json') {
    try {
      return JSON.parse(text);
    } catch (e) {
      throw new ScenarioError([`not valid JSON: ${(e as Error).message}`], path);
    }
  }
  const doc = parseDocument(text, { prettyErrors: true, uniqueKeys: true });
  if (doc.errors.length > 0) throw new ScenarioError(doc.errors.map((e) => `not valid YAML: ${e.message.split('\n')[0]}`), path);
  return doc.toJS();
}

/**
 * Read and validate a scenario file, with `overrides` applied before validation. Throws
 * ScenarioError (bad input) with every problem.
 */
export function loadScenarioFile(path: string, overrides: readonly ScenarioOverride[] = []): LoadedScenario {
  const raw = readScenarioFile(path);
  return validateModelInputs(raw, { baseDir: dirname(resolve(path)), file: path, overrides });
}
