/**
 * What the command says and which exit code it returns when something goes wrong: one line (or one
 * per problem) that names the cause, never a stack trace for anything a user can cause.
 *
 * Exit codes: 0 the run completed (whatever the verdicts); 1 an internal error (a bug: reported as
 * such, with a request to report it); 2 bad input — a scenario, a weather file, an option — or a
 * run that could not be computed, nothing written; 3 the run completed, a limit failed and
 * --strict was given; 4 the environment failed — the output folder cannot be made or written (a
 * file in the way, no permission, read-only), the disk is full, a file-size limit — or memory ran
 * out; the results are not written; 5 a batch (compare, sweep, collect) ran and wrote its results,
 * but some of its cases did not run (not a valid scenario, or not computable), each named with its
 * problem.
 */
import { CommanderError } from 'commander';
import { ScenarioError } from '../input/scenario/errors.ts';
import { OutputWriteError, isFileSystemError, describeWriteFailure } from '../output/fileErrors.ts';
import { VERSION } from './version.ts';

export const EXIT_OK = 0;
export const EXIT_INTERNAL_ERROR = 1;
export const EXIT_BAD_INPUT = 2;
export const EXIT_LIMIT_FAILED = 3;
export const EXIT_ENVIRONMENT = 4;
export const EXIT_SOME_NOT_RUN = 5;

/** A bad command-line option (its message says which, the value found and what is expected). */
export class BadInput extends Error {}

/** What to print (without the `stackday: ` prefix) and the exit code. */
export interface Failure {
  readonly code: number;
  readonly message: string | null;
}

/** Messages of V8 when memory runs out in a way it can still report. */
const OUT_OF_MEMORY = /^(Invalid string length|Array buffer allocation failed|Invalid typed array length|Invalid array length)/;

/** The exit code and message for an error that ended a command (`SimulationError` is told apart by name, so the model need not be loaded). */
export function describeFailure(e: unknown): Failure {
  if (e instanceof CommanderError) {
    const quiet = e.code === 'commander.helpDisplayed' || e.code === 'commander.version' || e.code === 'commander.help';
    return { code: quiet ? EXIT_OK : EXIT_BAD_INPUT, message: null }; // commander has printed its message
  }
  if (e instanceof ScenarioError || e instanceof BadInput) return { code: EXIT_BAD_INPUT, message: e.message };
  // an output folder that cannot be used as one (it holds files stackday did not write): the environment, exit 4
  if (e instanceof Error && e.name === 'OutputFolderError') return { code: EXIT_ENVIRONMENT, message: `${e.message}; the results were not written` };
  if (e instanceof Error && e.name === 'SimulationError')
    return {
      code: EXIT_BAD_INPUT,
      message: `the run could not be computed: ${e.message}\nNothing was written. Check the scenario for extreme values, or tighten run.relative_tolerance.`,
    };
  if (e instanceof OutputWriteError) return { code: EXIT_ENVIRONMENT, message: `${e.message}; the results were not written` };
  if (isFileSystemError(e)) {
    const described = describeWriteFailure(e, e.path ?? '(unknown path)');
    return { code: EXIT_ENVIRONMENT, message: (described as Error).message };
  }
  if (e instanceof RangeError && OUT_OF_MEMORY.test(e.message))
    return {
      code: EXIT_ENVIRONMENT,
      message: `out of memory (${e.message}); nothing was written. Use fewer days, segments or cells, a longer run.output_interval, or a machine with more memory`,
    };
  const text = e instanceof Error ? (e.stack ?? `${e.name}: ${e.message}`) : String(e);
  return {
    code: EXIT_INTERNAL_ERROR,
    message: `internal error in stackday ${VERSION} (a bug, not a problem with your input). Please report it, with the scenario file and the command line that caused it:\n${text}`,
  };
}
