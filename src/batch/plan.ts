/**
 * A sweep planned for any batch system, without a scheduler of our own: one ordinary scenario file
 * per point (each runs with `stackday run`), a manifest, a list of the files, and three ways to run
 * them — GNU parallel, xargs -P (always present) and a Slurm job array. `stackday collect` (collect.ts)
 * gathers the runs' results into the sweep's table and charts.
 *
 * The planned files are the points' scenarios as the one validation path sees them (the overrides
 * applied), with their weather files copied into the plan, so the plan folder can be moved as a whole.
 */
import { copyFileSync, mkdirSync, writeFileSync, chmodSync, existsSync } from 'node:fs';
import { basename, join, resolve } from 'node:path';
import { stringify } from 'yaml';
import { withOverrides } from '../input/scenario/validate.ts';
import { validateCase, type ScenarioCase } from '../input/scenario/cases.ts';
import { ScenarioError } from '../input/scenario/errors.ts';
import { formatPath } from '../input/scenario/errors.ts';
import type { SweepAxis, SweepPoint } from '../input/scenario/sweep.ts';

/** The manifest of a plan (manifest.json). Paths are relative to the plan folder. */
export interface PlanManifest {
  readonly tool: 'stackday';
  readonly version: string;
  readonly kind: 'sweep';
  /** The scenario file the plan was made from, as given. */
  readonly source: string;
  readonly axes: readonly SweepAxis[];
  readonly points: readonly PlannedPoint[];
}

export interface PlannedPoint {
  readonly name: string;
  readonly values: SweepPoint['values'];
  /** planned: its scenario file is written; invalid: it is not a valid scenario (not written). */
  readonly status: 'planned' | 'invalid';
  /** The scenario file, e.g. `scenarios/thickness-40mm.yaml`. */
  readonly file: string | null;
  /** The folder its run writes, e.g. `runs/thickness-40mm`. */
  readonly out: string;
  readonly problems: readonly string[];
}

export const MANIFEST = 'manifest.json';

/** Whether `dir` holds a plan already. */
export const holdsPlan = (dir: string): boolean => existsSync(join(resolve(dir), MANIFEST));
export const SCENARIO_LIST = 'scenarios.txt';

/**
 * The raw scenario of a case as a planned file holds it: the overrides applied; its per-instant
 * files as `collect` reads them back (every instant of a warm-up, the last day of a cycle, with no
 * thinning: the scenario's own `output` section is replaced); and its weather file (if any) copied
 * into the plan's weather/ folder once (`copies`: source path → name there) and named relative to
 * the planned file.
 */
function plannedScenario(c: ScenarioCase, root: string, copies: Map<string, string>): unknown {
  const s = withOverrides(c.raw, c.overrides) as { weather?: { file?: unknown }; run?: { mode?: unknown }; output?: unknown };
  const form = s.run?.mode === 'warmup' ? 'all' : 'last-day';
  s.output = { timeseries: form, segments: form };
  const file = s.weather?.file;
  if (typeof file !== 'string') return s;
  const source = resolve(c.baseDir, file);
  let name = copies.get(source);
  if (name === undefined) {
    const taken = new Set(copies.values());
    name = basename(source);
    for (let n = 2; taken.has(name); n++) name = `${n}-${basename(source)}`;
    mkdirSync(join(root, 'weather'), { recursive: true });
    copyFileSync(source, join(root, 'weather', name));
    copies.set(source, name);
  }
  s.weather!.file = `../weather/${name}`;
  return s;
}

const RUN_ARGS = '--no-charts --quiet';

/** The scripts written beside the manifest: GNU parallel, xargs -P and a Slurm job array. */
function scripts(count: number, name: string): { fileName: string; text: string }[] {
  const head = (what: string) =>
    `#!/bin/sh\n# ${what}\n# Each line of ${SCENARIO_LIST} is an ordinary \`stackday run\`; afterwards: stackday collect <this folder>.\n# STACKDAY names the command (default: stackday), e.g. STACKDAY="npx stackday" or "node /path/to/bin/stackday.js".\nset -u\ncd "$(dirname "$0")"\nSTACKDAY="\${STACKDAY:-stackday}"\n`;
  return [
    {
      fileName: 'run-parallel.sh',
      text: `${head(`Run the ${count} planned scenarios with GNU parallel, one job per core (JOBS to change).`)}exec parallel --jobs "\${JOBS:-100%}" --joblog runs/joblog.txt $STACKDAY run {} --out runs/{/.} ${RUN_ARGS} :::: ${SCENARIO_LIST}\n`,
    },
    {
      fileName: 'run-xargs.sh',
      text: `${head(`Run the ${count} planned scenarios with xargs -P, one job per core (JOBS to change).`)}export STACKDAY\nJOBS="\${JOBS:-$(getconf _NPROCESSORS_ONLN 2>/dev/null || echo 2)}"\nxargs -P "$JOBS" -I{} sh -c '$STACKDAY run "$1" --out "runs/$(basename "$1" .yaml)" ${RUN_ARGS}' sh {} < ${SCENARIO_LIST}\n`,
    },
    {
      fileName: 'slurm-array.sh',
      text:
        `#!/bin/bash\n# Run the ${count} planned scenarios as a Slurm job array: from this folder, \`sbatch slurm-array.sh\`.\n# Each task is an ordinary \`stackday run\`; afterwards: stackday collect <this folder>.\n` +
        `#SBATCH --job-name=stackday-${name}\n#SBATCH --array=1-${count}\n#SBATCH --ntasks=1\n#SBATCH --cpus-per-task=1\n#SBATCH --time=00:15:00\n#SBATCH --output=runs/slurm-%A_%a.log\n` +
        `set -u\ncd "\${SLURM_SUBMIT_DIR:-.}"\nSTACKDAY="\${STACKDAY:-stackday}"\nfile=$(sed -n "\${SLURM_ARRAY_TASK_ID}p" ${SCENARIO_LIST})\nexec $STACKDAY run "$file" --out "runs/$(basename "$file" .yaml)" ${RUN_ARGS}\n`,
    },
  ];
}

/**
 * Write a plan for the sweep into `dir`: scenarios/<point>.yaml for every valid point, the
 * manifest (with the tool's `version`), the list of scenario files and the scripts. Returns the
 * manifest. A folder that holds a plan already is refused (the caller checks with `holdsPlan`).
 */
export function writePlan(dir: string, source: string, axes: readonly SweepAxis[], points: readonly SweepPoint[], cases: readonly ScenarioCase[], version: string): PlanManifest {
  const root = resolve(dir);
  if (holdsPlan(root)) throw new Error(`${dir} holds a plan already (${MANIFEST})`);
  mkdirSync(join(root, 'scenarios'), { recursive: true });
  mkdirSync(join(root, 'runs'), { recursive: true });
  const copies = new Map<string, string>();
  const planned: PlannedPoint[] = points.map((p, i) => {
    const c = cases[i]!;
    const out = `runs/${p.name}`;
    try {
      validateCase(c);
    } catch (e) {
      if (!(e instanceof ScenarioError)) throw e;
      return { name: p.name, values: p.values, status: 'invalid', file: null, out, problems: e.problems };
    }
    const file = `scenarios/${p.name}.yaml`;
    const what = p.values.map((v, j) => `${formatPath(axes[j]!.path)} = ${v.text}`).join(', ');
    writeFileSync(join(root, file), `# Planned by stackday sweep from ${basename(source)}: ${what}\n${stringify(plannedScenario(c, root, copies), { lineWidth: 0 })}`);
    return { name: p.name, values: p.values, status: 'planned', file, out, problems: [] };
  });
  const manifest: PlanManifest = { tool: 'stackday', version, kind: 'sweep', source, axes, points: planned };
  writeFileSync(join(root, MANIFEST), `${JSON.stringify(manifest, null, 2)}\n`);
  const files = planned.flatMap((p) => (p.file ? [p.file] : []));
  writeFileSync(join(root, SCENARIO_LIST), files.map((f) => `${f}\n`).join(''));
  const baseName = basename(source).replace(/\.[^.]*$/, '');
  for (const s of scripts(files.length, baseName)) {
    writeFileSync(join(root, s.fileName), s.text);
    chmodSync(join(root, s.fileName), 0o755);
  }
  return manifest;
}
