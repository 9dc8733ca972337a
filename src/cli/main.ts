#!/usr/bin/env node
/**
 * The `stackday` command: a thin layer over the library (no physics here).
 *
 * Exit codes: errors.ts defines them, EXIT_CODES_HELP below says them in every command's --help.
 */
import { Command, Option } from 'commander';
import { resolve, join, dirname } from 'node:path';
import { VERSION } from './version.ts';
import { BadInput, EXIT_OK, EXIT_LIMIT_FAILED, describeFailure } from './errors.ts';
import { parseChartSize, parseHeights } from './options.ts';
import { checkOutputFolder, describeWriteFailure } from '../output/fileErrors.ts';
import type { ScenarioOverride } from '../input/scenario/load.ts';

// Everything else is imported inside the command that needs it (`await import(...)`), so `--version`
// and `--help` load neither the scenario schema (zod), the model nor the charts (chart.js, canvas).

export { EXIT_OK, EXIT_INTERNAL_ERROR, EXIT_BAD_INPUT, EXIT_LIMIT_FAILED, EXIT_ENVIRONMENT, EXIT_SOME_NOT_RUN } from './errors.ts';

const EXIT_CODES_HELP = `
Exit codes:
  0  the run completed (whatever the verdicts)
  1  internal error: a bug in stackday (please report it)
  2  bad input (scenario, weather file, option) or a run that could not be computed; nothing written
  3  the run completed, a limit failed and --strict was given (size: no value of the range passes)
  4  the environment failed: the output folder cannot be made or written (a file in the way, no
     permission, read-only), the disk is full, a file-size limit, or memory ran out
  5  a batch (compare, sweep, collect) wrote its results, but some of its cases did not run`;

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
  accuracy?: string;
}

/**
 * The command-line options that set scenario values, as overrides for the one validation path (so
 * every rule, such as the weather file covering the run, applies after them).
 */
function overridesFrom(raw: unknown, opts: RunOptions, mode: 'cycle' | 'warmup' | null): ScenarioOverride[] {
  const overrides: ScenarioOverride[] = [];
  if (opts.integrator) overrides.push({ path: ['run', 'integrator'], value: opts.integrator, option: '--integrator' });
  if (opts.days !== undefined) overrides.push({ path: ['run', 'days'], value: /^\s*\d+\s*$/.test(opts.days) ? Number(opts.days) : opts.days, option: '--days' });
  if (opts.accuracy !== undefined)
    overrides.push({ path: ['run', 'accuracy'], value: /^\s*[\d.]+(e-?\d+)?\s*$/i.test(opts.accuracy) ? Number(opts.accuracy) : opts.accuracy, option: '--accuracy' });
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
  const [{ readScenarioSource, validateModelInputs }, { runToFolder }, { resultSheet }, { SingleBar, Presets }] = await Promise.all([
    import('../input/scenario/load.ts'),
    import('../index.ts'),
    import('../output/console.ts'),
    import('cli-progress'),
  ]);
  const chartSize = parseChartSize(opts.chartSize);
  const { raw, written } = readScenarioSource(file);
  const loaded = validateModelInputs(raw, { baseDir: dirname(resolve(file)), file, overrides: overridesFrom(raw, opts, mode), written });
  const chartHeights = opts.chartHeights === undefined ? undefined : parseHeights(opts.chartHeights, loaded.inputs.stack.height);
  if (opts.out !== undefined && opts.out.trim() === '') throw new BadInput('--out: found ""; expected the path of a folder for the results');
  const outDir = resolve(opts.out ?? join('out', loaded.inputs.name));
  // an output folder that cannot be written is reported now, not after the run
  const obstacle = checkOutputFolder(outDir);
  if (obstacle) throw obstacle;
  const showProgress = !opts.quiet && process.stderr.isTTY;
  // the bar starts with the first progress report, after any notice about the size of the files
  const bar = showProgress ? new SingleBar({ format: 'simulating |{bar}| {percentage}% ', stream: process.stderr, hideCursor: true }, Presets.shades_classic) : null;
  let barStarted = false;
  let lastPct = -1;
  const started = performance.now();
  let run;
  try {
    ({ run } = await runToFolder(loaded, outDir, {
      charts: opts.charts,
      chartWidth: chartSize.width,
      chartHeight: chartSize.height,
      chartHeightsM: chartHeights,
      onNotice: (message) => {
        if (!opts.quiet) process.stderr.write(`stackday: ${message}\n`);
      },
      onProgress: (f) => {
        const pct = Math.floor(f * 100);
        if (pct === lastPct) return;
        lastPct = pct;
        if (bar && !barStarted) {
          bar.start(100, pct);
          barStarted = true;
        } else bar?.update(pct);
      },
    }));
  } catch (e) {
    // a file-system failure while writing the results names the path and the cause (exit 4)
    throw describeWriteFailure(e, outDir);
  } finally {
    if (barStarted) bar?.stop();
  }
  const seconds = (performance.now() - started) / 1000;
  if (opts.json) process.stdout.write(`${JSON.stringify(run.summary, null, 2)}\n`);
  else if (!opts.quiet) process.stdout.write(`${resultSheet(run.summary, outDir, { seconds }).join('\n')}\n`);
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
    .option('--days <n>', 'simulate this many days, or "year" for an annual run (overrides run.days)')
    .option('--accuracy <mode>', 'accuracy statement: estimate (default), off, or a target in K the run is refined toward (overrides run.accuracy)')
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
    .addHelpText('after', EXIT_CODES_HELP)
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
      .option('-o, --out <dir>', 'output folder (default: DIR/results; the plan folder itself is never replaced)'),
  ).action(async (dir: string, opts) => {
    const { collectCommand } = await import('./design.ts');
    process.exitCode = await collectCommand(dir, opts);
  });
  program
    .command('check')
    .argument('<scenario>', 'scenario file (YAML or JSON)')
    .description('validate a scenario file (and each of its variants) and report every problem, without running it')
    .action(async (file: string) => {
      const [{ loadScenarioFile }, { fileCases, validateCase }, { ScenarioError }] = await Promise.all([
        import('../input/scenario/load.ts'),
        import('../input/scenario/cases.ts'),
        import('../input/scenario/errors.ts'),
      ]);
      const loaded = loadScenarioFile(file);
      process.stdout.write(`${file}: valid scenario "${loaded.inputs.name}" (${loaded.inputs.layers.length} layers, ${loaded.inputs.stack.segments} segments)\n`);
      for (const w of loaded.warnings) process.stdout.write(`  warning: ${w}\n`);
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
  for (const command of program.commands) command.addHelpText('after', EXIT_CODES_HELP);
  return program;
}

/** Run the command line; returns the exit code. Errors become one clear message each (errors.ts), never a stack trace but for a bug. */
export async function main(argv: readonly string[]): Promise<number> {
  const program = buildProgram();
  try {
    await program.parseAsync(argv as string[], { from: 'user' });
    return typeof process.exitCode === 'number' ? process.exitCode : EXIT_OK;
  } catch (e) {
    const failure = describeFailure(e);
    if (failure.message !== null) process.stderr.write(`stackday: ${failure.message}\n`);
    return failure.code;
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
