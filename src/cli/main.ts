#!/usr/bin/env node
/**
 * The `stackday` command: a thin layer over the library (no physics here).
 *
 * Exit codes: 0 the run completed (whatever the verdicts); 2 bad input (scenario, weather file,
 * options) or a run that could not be computed — nothing is written; 3 the run completed, a limit
 * failed and --strict was given.
 */
import { Command, CommanderError, Option } from 'commander';
import { resolve, join, dirname } from 'node:path';
import { ScenarioError } from '../input/scenario/errors.ts';
import { VERSION } from './version.ts';
import type { ScenarioOverride } from '../input/scenario/load.ts';

// Everything else is imported inside the command that needs it (`await import(...)`), so `--version`
// and `--help` load neither the scenario schema (zod), the model nor the charts (chart.js, canvas).

export const EXIT_OK = 0;
export const EXIT_BAD_INPUT = 2;
export const EXIT_LIMIT_FAILED = 3;

class BadInput extends Error {}

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

function parseChartSize(text: string): { width: number; height: number } {
  const m = /^(\d{3,4})x(\d{3,4})$/.exec(text);
  if (!m) throw new BadInput(`--chart-size: found "${text}"; expected WIDTHxHEIGHT in pixels, e.g. 1200x700 (100 to 9999)`);
  return { width: Number(m[1]), height: Number(m[2]) };
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
  program
    .command('compare')
    .argument('<scenarios...>', 'two or more scenario files, one per wall build-up')
    .description('run several scenarios (wall build-ups) and compare them: which meets every limit, at what heat loss')
    .option('-o, --out <dir>', 'also write comparison.json and comparison.csv into this folder')
    .option('--strict', 'exit with code 3 when no build-up meets every limit')
    .option('--json', 'print the comparison as JSON')
    .action(async (files: string[], opts: { out?: string; strict?: boolean; json?: boolean }) => {
      const [{ loadScenarioFile }, { runScenario }, { compareBuildUps, comparisonCsv }, { writeArtefactsAtomically }, { comparisonSheet }] = await Promise.all([
        import('../input/scenario/load.ts'),
        import('../index.ts'),
        import('../analysis/compare.ts'),
        import('../output/write.ts'),
        import('../output/console.ts'),
      ]);
      // validate every file before running any: bad input anywhere means nothing runs and nothing is written
      const loaded = files.map((f) => loadScenarioFile(f));
      const runs = loaded.map((l) => runScenario(l));
      const comparison = compareBuildUps(runs.map((r) => r.summary));
      if (opts.out) {
        writeArtefactsAtomically(resolve(opts.out), [
          { fileName: 'comparison.json', content: `${JSON.stringify(comparison, null, 2)}\n` },
          { fileName: 'comparison.csv', content: comparisonCsv(comparison) },
        ]);
      }
      if (opts.json) process.stdout.write(`${JSON.stringify(comparison, null, 2)}\n`);
      else process.stdout.write(`${comparisonSheet(comparison, runs[0]!.summary.cautions).join('\n')}\n`);
      process.exitCode = opts.strict && comparison.recommended === null ? EXIT_LIMIT_FAILED : EXIT_OK;
    });
  program
    .command('check')
    .argument('<scenario>', 'scenario file (YAML or JSON)')
    .description('validate a scenario file and report every problem, without running it')
    .action(async (file: string) => {
      const { loadScenarioFile } = await import('../input/scenario/load.ts');
      const loaded = loadScenarioFile(file);
      process.stdout.write(`${file}: valid scenario "${loaded.inputs.name}" (${loaded.inputs.layers.length} layers, ${loaded.inputs.stack.segments} segments)\n`);
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
