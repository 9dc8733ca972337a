/**
 * Scenario files in: read a YAML or JSON file into a plain object and hand it to the one
 * validation path (validate.ts), with the overrides a caller applies (command-line options).
 *
 * What a file may be (limits.ts; the README lists them): UTF-8 text (a byte-order mark is
 * dropped) of at most LIMITS.scenarioFileBytes, nested at most LIMITS.nestingDepth deep, with
 * at most LIMITS.documentValues values once YAML aliases are expanded. Anything else is refused
 * with one clear line, before the parser or the schema can run out of stack or memory.
 */
import { dirname, resolve, extname } from 'node:path';
import { parseDocument, isScalar, type Document } from 'yaml';
import { ScenarioError, type WrittenLookup } from './errors.ts';
import { validateModelInputs, type LoadedScenario, type ScenarioOverride } from './validate.ts';
import { LIMITS, grouped } from './limits.ts';
import { printable, readTextFile } from '../text.ts';

export { validateModelInputs, validateScenario, type LoadedScenario, type ScenarioOverride } from './validate.ts';

/** A scenario file read: the plain object, and the text each value was written as (YAML), for messages. */
export interface ScenarioSource {
  readonly raw: unknown;
  readonly written?: WrittenLookup;
}

/** YAML errors listed before the rest are only counted. */
const MAX_PARSE_ERRORS = 10;

/**
 * Deepest nesting of YAML flow collections (`[`, `{`) in `text`, outside quoted text and comments,
 * stopping as soon as it passes `limit` (the YAML parser itself runs out of memory on a few
 * thousand levels, before any of its own checks).
 */
function flowDepthBeyond(text: string, limit: number): boolean {
  let depth = 0;
  // a quote opens quoted text only where a value starts (after a line start, a space or an indicator); "plant's" does not
  const valueStarts = (i: number) => i === 0 || /[\s:,[{?-]/.test(text[i - 1]!);
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if ((c === '"' || c === "'") && !valueStarts(i)) continue;
    if (c === '"') {
      for (i++; i < text.length && text[i] !== '"'; i++) if (text[i] === '\\') i++;
    } else if (c === "'") {
      for (i++; i < text.length; i++) if (text[i] === "'" && text[++i] !== "'") break;
      i--;
    } else if (c === '#' && (i === 0 || /\s/.test(text[i - 1]!))) {
      while (i < text.length && text[i] !== '\n') i++;
    } else if (c === '[' || c === '{') {
      if (++depth > limit) return true;
    } else if ((c === ']' || c === '}') && depth > 0) depth--;
  }
  return false;
}

/**
 * Why a parsed document is too big or too deep, or null: values counted as they will be walked
 * (an alias counts again at every use), depth of sections and lists. Iterative, and stops at the
 * first limit passed, so neither a deep nor an exploding document can hurt it.
 */
function documentShapeProblem(root: unknown): string | null {
  const stack: [unknown, number][] = [[root, 0]];
  let values = 0;
  while (stack.length > 0) {
    const [v, depth] = stack.pop()!;
    if (++values > LIMITS.documentValues)
      return `the document holds more than ${grouped(LIMITS.documentValues)} values once YAML aliases are expanded (a limit of stackday, against alias bombs); expected a scenario`;
    if (v === null || typeof v !== 'object') continue;
    if (depth >= LIMITS.nestingDepth) return `sections and lists nest more than ${LIMITS.nestingDepth} levels deep (a limit of stackday; a scenario needs 6); expected a scenario`;
    for (const child of Array.isArray(v) ? v : Object.values(v)) stack.push([child, depth + 1]);
  }
  return null;
}

/** The text of the scalar at `path` in a YAML document, as written (`.nan`, `1e400`, `0x1F`). */
function writtenInYaml(doc: Document, text: string): WrittenLookup {
  return (path) => {
    try {
      const node = doc.getIn(path as unknown[], true);
      return isScalar(node) && node.range ? text.slice(node.range[0], node.range[1]) : undefined;
    } catch {
      return undefined;
    }
  };
}

/** Parse YAML text into a plain object, refusing what the limits refuse. Throws ScenarioError. */
function parseYaml(text: string, path: string): ScenarioSource {
  if (flowDepthBeyond(text, LIMITS.nestingDepth))
    throw new ScenarioError([`not a scenario: brackets nest more than ${LIMITS.nestingDepth} levels deep (a limit of stackday; a scenario needs 6)`], path);
  const doc = parseDocument(text, { prettyErrors: false, uniqueKeys: true });
  if (doc.errors.length > 0) {
    const lines = doc.errors.slice(0, MAX_PARSE_ERRORS).map((e) => `not valid YAML: ${printable(e.message.split('\n')[0]!, 160)}`);
    if (doc.errors.length > MAX_PARSE_ERRORS) lines.push(`… and ${doc.errors.length - MAX_PARSE_ERRORS} more YAML errors`);
    throw new ScenarioError(lines, path);
  }
  let raw: unknown;
  try {
    raw = doc.toJS({ maxAliasCount: LIMITS.yamlAliasCount });
  } catch (e) {
    if (e instanceof ReferenceError && /alias/i.test(e.message))
      throw new ScenarioError([`not a scenario: YAML aliases (*name) expand beyond ${grouped(LIMITS.yamlAliasCount)} uses (a limit of stackday, against alias bombs; ${printable(e.message, 80)})`], path);
    if (e instanceof RangeError) throw new ScenarioError([`not a scenario: the YAML document is too deeply nested or too large to read (${printable(e.message, 80)})`], path);
    throw e;
  }
  return { raw, written: writtenInYaml(doc, text) };
}

/**
 * A scenario file as a plain object (not yet validated) with the text of each value as written.
 * Throws ScenarioError when it cannot be read or parsed, or passes a limit of LIMITS.
 */
export function readScenarioSource(path: string): ScenarioSource {
  const read = readTextFile(path, 'a scenario file', LIMITS.scenarioFileBytes);
  if (!read.ok) throw new ScenarioError([`scenario file "${printable(path, 200)}" cannot be read: ${read.problem}`]);
  if (read.text.trim() === '') throw new ScenarioError(['the file is empty; expected a scenario (scenarios/demo.yaml shows one)'], path);
  let source: ScenarioSource;
  if (extname(path).toLowerCase() === '.json') {
    try {
      source = { raw: JSON.parse(read.text) };
    } catch (e) {
      throw new ScenarioError([`not valid JSON: ${printable((e as Error).message, 160)}`], path);
    }
  } else source = parseYaml(read.text, path);
  const shape = documentShapeProblem(source.raw);
  if (shape) throw new ScenarioError([`not a scenario: ${shape}`], path);
  return source;
}

/** The plain object a scenario file holds (not yet validated). Throws ScenarioError when it cannot be read or parsed. */
export function readScenarioFile(path: string): unknown {
  return readScenarioSource(path).raw;
}

/**
 * Read and validate a scenario file, with `overrides` applied before validation. Throws
 * ScenarioError (bad input) with every problem.
 */
export function loadScenarioFile(path: string, overrides: readonly ScenarioOverride[] = []): LoadedScenario {
  const { raw, written } = readScenarioSource(path);
  return validateModelInputs(raw, { baseDir: dirname(resolve(path)), file: path, overrides, written });
}
