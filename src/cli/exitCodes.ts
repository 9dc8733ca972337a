/**
 * Exit codes of the command: 0 the run completed (whatever the verdicts); 2 bad input (scenario,
 * weather file, options) or a run that could not be computed — nothing is written; 3 the run
 * completed, a limit failed and --strict was given (for `size`: no value of the range meets every
 * limit); 4 a batch (compare, sweep, collect) ran and wrote its results, but some of its cases
 * did not run (not a valid scenario, or not computable), each named with its problem.
 */
export const EXIT_OK = 0;
export const EXIT_BAD_INPUT = 2;
export const EXIT_LIMIT_FAILED = 3;
export const EXIT_SOME_NOT_RUN = 4;
