#!/usr/bin/env node
/**
 * The `stackday` command: a thin layer over the library (no physics here).
 *
 * Exit codes (exitCodes.ts): 0 the run completed (whatever the verdicts); 2 bad input (scenario,
 * weather file, options) or a run that could not be computed — nothing is written; 3 the run
 * completed, a limit failed and --strict was given; 4 a batch ran but some of its cases did not.
 */
import { Command, CommanderError, Option } from 'commander';
import { resolve, join, dirname } from 'node:path';
import { ScenarioError } from '../input/scenario/errors.ts';
import { VERSION } from './version.ts';
import { BadInput, parseChartSize } from './options.ts';
import type { ScenarioOverride } from '../input/scenario/load.ts';

// Everything else is imported inside the command that needs it (`await import(...)`), so `--version`
// and `--help` load neither the scenario schema (zod), the model nor the charts (chart.js, canvas).

import { EXIT_OK, EXIT_BAD_INPUT, EXIT_LIMIT_FAILED } from './exitCodes.ts';
export { EXIT_OK, EXIT_BAD_INPUT, EXIT_LIMIT_FAILED, EXIT_SOME_NOT_RUN } from './exitCodes.ts';


interface RunOptions {
  out?: string;
  integrator?: 'implicit' | 'rk45';
  charts: boolean;
  chartSize: string;
  chartHeights?: string;
  strict?: boolean;
  quiet?: boolean;
  json?: boolean;
  firingStart?: string;
  days?: string;
}

function parseHeights(text: string): number[] {
  const values = text.split(',').map((v) => Number(v.trim()));
  if (values.some((v) => !Number.isFinite(v) || v < 0))
    throw new BadInput(`--chart-heights: found "${text}"; expected heights in m separated by commas, e.g. 5,20,40`);
  return values;
}

/**
 * The command-line options that set scenario values, as overrides for the one validation path (so
 * every rule, such as the weather file covering the run, applies after them).
 */
function overridesFrom(raw: unknown, opts: RunOptions, mode: 'cycle' | 'warmup' | null): ScenarioOverride[] {
  const overrides: ScenarioOverride[] = [];
  if (opts.integrator) overrides.push({ path: ['run', 'integrator'], value: opts.integrator, option: '--integrator' });
  if (opts.days !== undefined) overrides.push({ path: ['run', 'days'], value: /^\s*\d+\s*$/.test(opts.days) ? Number(opts.days) : opts.days, option: '--days' });
  if (mode === 'warmup') {
    overrides.push({ path: ['run', 'mode'], value: 'warmup', option: 'warmup' });
    if (opts.firingStart !== undefined) overrides.push({ path: ['run', 'firing_start'], value: opts.firingStart, option: '--firing-start' });
    // a warm-up study of a file written for periodic cycling runs one day unless --days says otherwise
    const days = (raw as { run?: { days?: unknown } } | null)?.run?.days;
    if (opts.days === undefined && (days === undefined || days === 'until-periodic')) overrides.push({ path: ['run', 'days'], value: 1, option: 'warmup' });
  }
  return overrides;
}

async function runCommand(file: string, opts: RunOptions, mode: 'cycle' | 'warmup' | null): Promise<number> {
  const [{ readScenarioFile, validateModelInputs }, { runScenario, writeRun }, { resultSheet }, { SingleBar, Presets }] = await Promise.all([
    import('../input/scenario/load.ts'),
    import('../index.ts'),
    import('../output/console.ts'),
    import('cli-progress'),
  ]);
  const chartSize = parseChartSize(opts.chartSize);
  const chartHeights = opts.chartHeights === undefined ? undefined : parseHeights(opts.chartHeights);
  const raw = readScenarioFile(file);
  const loaded = validateModelInputs(raw, { baseDir: dirname(resolve(file)), file, overrides: overridesFrom(raw, opts, mode) });
  const outDir = resolve(opts.out ?? join('out', loaded.inputs.name));
  const showProgress = !opts.quiet && process.stderr.isTTY;
  const bar = showProgress ? new SingleBar({ format: 'simulating |{bar}| {percentage}% ', stream: process.stderr, hideCursor: true }, Presets.shades_classic) : null;
  bar?.start(100, 0);
  let lastPct = -1;
  let run;
  try {
    run = runScenario(loaded, {
      onProgress: (f) => {
        const pct = Math.floor(f * 100);
        if (pct !== lastPct) {
          lastPct = pct;
          bar?.update(pct);
        }
      },
    });
  } finally {
    bar?.stop();
  }
  await writeRun(run, outDir, { charts: opts.charts, chartWidth: chartSize.width, chartHeight: chartSize.height, chartHeightsM: chartHeights });
  if (opts.json) process.stdout.write(`${JSON.stringify(run.summary, null, 2)}\n`);
  else if (!opts.quiet) process.stdout.write(`${resultSheet(run.summary, outDir).join('\n')}\n`);
  if (opts.strict && !run.summary.all_limits_pass) {
    const failed = run.summary.verdicts.filter((v) => v.status === 'fail').map((v) => v.limit);
    process.stderr.write(`stackday: --strict: limit(s) failed: ${failed.join(', ')}\n`);
    return EXIT_LIMIT_FAILED;
  }
  return EXIT_OK;
}

function addRunOptions(cmd: Command): Command {
  return cmd
    .option('-o, --out <dir>', 'output folder (default: out/<scenario name>/)')
    .addOption(new Option('--integrator <name>', 'time integrator: implicit (TR-BDF2, default) or rk45 (Dormand–Prince reference)').choices(['implicit', 'rk45']))
    .option('--days <n>', 'simulate this many days (overrides run.days)')
    .option('--no-charts', 'skip the PNG charts and report.html')
    .option('--chart-size <WxH>', 'chart size in pixels', '1000x600')
    .option('--chart-heights <m,...>', 'heights in m for the temperature-through-the-day charts (default: top and bottom)')
    .option('--strict', 'exit with code 3 when any limit fails')
    .option('-q, --quiet', 'print nothing but errors')
    .option('--json', 'print summary.json to standard output instead of the result sheet');
}

export function buildProgram(): Command {
  const program = new Command();
  program
    .name('stackday')
    .description('Simulate the layered wall of a tall stack through the day: temperatures of every layer, dew-point margins, peaks and verdicts.')
    .version(VERSION, '-V, --version')
    .showHelpAfterError('(run with --help for usage)')
    .exitOverride();

  addRunOptions(program.command('run').argument('<scenario>', 'scenario file (YAML or JSON)').description('run a scenario (daily cycle or warm-up, as the file says) and write the results')).action(
    async (file: string, opts: RunOptions) => {
      process.exitCode = await runCommand(file, opts, null);
    },
  );
  addRunOptions(
    program
      .command('warmup')
      .argument('<scenario>', 'scenario file (YAML or JSON)')
      .description('warm-up study: the wall starts cold at air temperature and firing starts at run.firing_start (or --firing-start)')
      .option('--firing-start <HH:MM>', 'local clock time at which firing starts'),
  ).action(async (file: string, opts: RunOptions) => {
    process.exitCode = await runCommand(file, opts, 'warmup');
  });
  const threadsOption = () => new Option('--threads <n>', 'threads: auto (a pool of worker threads when the batch is long enough to pay for it), or a number (1: one after another)').default('auto');
  const addTableOptions = (cmd: Command) =>
    cmd
      .option('--no-charts', 'skip the PNG charts')
      .option('--chart-size <WxH>', 'chart size in pixels', '1000x600')
      .option('--strict', 'exit with code 3 when no case meets every limit')
      .option('-q, --quiet', 'print nothing but errors')
      .option('--json', 'print the table as JSON');
  const addBatchOptions = (cmd: Command) => addTableOptions(cmd.addOption(threadsOption()));
  addBatchOptions(
    program
      .command('compare')
      .argument('<scenarios...>', 'scenario files, one per wall build-up; a file with `variants:` adds each variant next to its base case')
      .description('run several scenarios or variants (wall build-ups) and compare them: which meets every limit, at what heat loss')
      .option('-o, --out <dir>', 'also write comparison.json, comparison.csv and the overlay charts into this folder'),
  ).action(async (files: string[], opts) => {
    const { compareCommand } = await import('./design.ts');
    process.exitCode = await compareCommand(files, opts);
  });
  addBatchOptions(
    program
      .command('sweep')
      .argument('<scenario>', 'scenario file (YAML or JSON)')
      .description('vary one or two values of a scenario over a list or a range: the key figures against the values, with every limit')
      .requiredOption('--vary <key=values>', 'a key path and its values: "stack.layers[1].thickness=20 mm..120 mm step 10 mm" or "surface.emissivity=0.3,0.6,0.9" (twice for a map)', (v: string, prev: string[] = []) => [...prev, v])
      .option('-o, --out <dir>', 'output folder (default: out/<scenario name>-sweep/)')
      .option('--plan <dir>', 'run nothing: write one scenario file per point, a manifest and scripts for GNU parallel, xargs and Slurm into this folder (then `stackday collect`)'),
  ).action(async (file: string, opts) => {
    const { sweepCommand } = await import('./design.ts');
    process.exitCode = await sweepCommand(file, opts);
  });
  program
    .command('size')
    .argument('<scenario>', 'scenario file (YAML or JSON)')
    .description('the smallest (or largest) value of one key that meets every limit, by bisection, with the run one step beyond that fails')
    .requiredOption('--vary <key=range>', 'a key path and the range to search: "stack.layers[1].thickness=20 mm..200 mm"')
    .option('--resolution <step>', 'step of the answer in the range\'s unit, e.g. "5 mm"')
    .option('--largest', 'find the largest value that meets every limit (default: the smallest)')
    .addOption(threadsOption())
    .option('-o, --out <dir>', 'also write sizing.json into this folder')
    .option('-q, --quiet', 'print nothing but errors')
    .option('--json', 'print the answer as JSON')
    .action(async (file: string, opts) => {
      const { sizeCommand } = await import('./design.ts');
      process.exitCode = await sizeCommand(file, opts);
    });
  addTableOptions(
    program
      .command('collect')
      .argument('<plan>', 'a folder written by `stackday sweep --plan`, after its runs')
      .description("gather a plan's runs into the sweep's table and charts")
      .option('-o, --out <dir>', 'output folder (default: the plan folder)'),
  ).action(async (dir: string, opts) => {
    const { collectCommand } = await import('./design.ts');
    process.exitCode = await collectCommand(dir, opts);
  });
  program
    .command('check')
    .argument('<scenario>', 'scenario file (YAML or JSON)')
    .description('validate a scenario file (and each of its variants) and report every problem, without running it')
    .action(async (file: string) => {
      const [{ loadScenarioFile }, { fileCases, validateCase }] = await Promise.all([import('../input/scenario/load.ts'), import('../input/scenario/cases.ts')]);
      const loaded = loadScenarioFile(file);
      process.stdout.write(`${file}: valid scenario "${loaded.inputs.name}" (${loaded.inputs.layers.length} layers, ${loaded.inputs.stack.segments} segments)\n`);
      const problems = fileCases(file)
        .slice(1)
        .flatMap((c) => {
          try {
            validateCase(c);
            process.stdout.write(`  variant "${c.name}": valid\n`);
            return [];
          } catch (e) {
            if (!(e instanceof ScenarioError)) throw e;
            return e.problems;
          }
        });
      if (problems.length > 0) throw new ScenarioError(problems, file);
    });
  program
    .command('schema')
    .description('print the JSON Schema of scenario files (for editor completion and checking)')
    .action(async () => {
      const { scenarioJsonSchema } = await import('../input/scenario/schema.ts');
      process.stdout.write(`${JSON.stringify(scenarioJsonSchema(), null, 2)}\n`);
    });
  program
    .command('materials')
    .description('list the wall materials in the library')
    .option('--json', 'print the library as JSON')
    .action(async (opts: { json?: boolean }) => {
      if (opts.json) {
        const { MATERIALS } = await import('../physics/materials/index.ts');
        process.stdout.write(`${JSON.stringify(MATERIALS, null, 2)}\n`);
        return;
      }
      const [{ describeMaterialsTable }, { table }] = await Promise.all([import('../physics/materials/index.ts'), import('../output/console.ts')]);
      const rows = describeMaterialsTable();
      process.stdout.write(`${table(rows).join('\n')}\n`);
    });
  return program;
}

/** Run the command line; returns the exit code. Errors become one clear message each, never a stack trace. */
export async function main(argv: readonly string[]): Promise<number> {
  const program = buildProgram();
  try {
    await program.parseAsync(argv as string[], { from: 'user' });
    return typeof process.exitCode === 'number' ? process.exitCode : EXIT_OK;
  } catch (e) {
    if (e instanceof CommanderError) {
      if (e.code === 'commander.helpDisplayed' || e.code === 'commander.version' || e.code === 'commander.help') return EXIT_OK;
      return EXIT_BAD_INPUT; // commander has printed its message
    }
    if (e instanceof ScenarioError) {
      process.stderr.write(`stackday: ${e.message}\n`);
      return EXIT_BAD_INPUT;
    }
    if (e instanceof BadInput) {
      process.stderr.write(`stackday: ${e.message}\n`);
      return EXIT_BAD_INPUT;
    }
    const { SimulationError } = await import('../model/simulate.ts');
    if (e instanceof SimulationError) {
      process.stderr.write(`stackday: the run could not be computed: ${e.message}\nNothing was written. Check the scenario for extreme values, or tighten run.relative_tolerance.\n`);
      return EXIT_BAD_INPUT;
    }
    process.stderr.write(`stackday: unexpected error: ${(e as Error).message ?? String(e)}\n`);
    return 1;
  }
}

/** A reader that stops early (`stackday materials | head`) closes the pipe: end quietly, as Unix tools do. */
function quietOnClosedPipe(): void {
  for (const stream of [process.stdout, process.stderr]) {
    stream.on('error', (e: NodeJS.ErrnoException) => {
      if (e.code === 'EPIPE') process.exit(process.exitCode ?? 0);
      throw e;
    });
  }
}

/** Entry point for launchers (bin/stackday.js, `tsx src/cli/main.ts`). */
export async function runFromCommandLine(): Promise<void> {
  quietOnClosedPipe();
  process.exitCode = await main(process.argv.slice(2));
}

const invokedDirectly = process.argv[1] !== undefined && /cli[\\/]main\.ts$/.test(process.argv[1]);
if (invokedDirectly) void runFromCommandLine();
