/**
 * The limits of what stackday takes in, all in one place (the README lists them): inputs beyond
 * them are refused up front with exit code 2 and a message saying the limit, never run into a
 * crash, a memory exhaustion or a run of hours. Each limit is set well above any real stack and
 * well below what the machine or the integrators can bear; the reason is beside each.
 */
import type { ModelInputs } from '../../model/inputs.ts';
import { buildWallMesh } from '../../physics/wall/mesh.ts';
import { SECONDS_PER_DAY } from '../../physics/constants.ts';
import { SERIES_INSTANT_CHANNELS, SERIES_SEGMENT_CHANNELS } from '../../model/timeseries.ts';

export const LIMITS = {
  /** Scenario file size, bytes. A year of per-day schedules with 24 points a day is about 0.5 MB; parsing 1 MB of YAML takes about 2 s and 150 MB. */
  scenarioFileBytes: 1024 * 1024,
  /** Weather file size, bytes. A year of 5-minute rows is 5–8 MB; reading 14 MB of CSV took 9 s and 500 MB (measured). */
  weatherFileBytes: 16 * 1024 * 1024,
  /**
   * The yaml package's guard against alias bombs (`maxAliasCount`: uses of an anchor × the aliases
   * inside it). Its default, 100, refuses a legitimate file that names one anchored layer 150 times.
   */
  yamlAliasCount: 10_000,
  /** Values in the document after aliases are expanded (a guard against alias bombs; a large real scenario has a few thousand). */
  documentValues: 1_000_000,
  /** Nesting depth of sections and lists. The deepest real path is 6 (stack.layers[i].material.conductivity[j][k]); the YAML parser fails near 1000. */
  nestingDepth: 32,
  /** Characters of the scenario name, which names the output folder (most file systems allow 255 bytes per name, and a temporary suffix is added while writing). */
  nameLength: 100,
  /** Wall layers. A real wall has 2 to 6. */
  layers: 20,
  /** Cells across one layer (`cells`). */
  cellsPerLayer: 200,
  /** Axial segments. */
  segments: 200,
  /** Days of one run (a leap year). */
  days: 366,
  /** Nodes through the wall of one segment (all layers). `auto` gives at most 24 cells a layer. */
  nodesPerSegment: 1000,
  /** Unknowns of the ODE system, segments × nodes. 200 × 151 = 30 200 took 7 s a simulated day with the implicit integrator (measured). */
  unknowns: 40_000,
  /**
   * Values a run records, output instants × (unknowns + the boundary quantities of every segment and
   * instant): 320 MB as 8-byte numbers. The 365-day demo at 10-minute output records 1.5e7, a year
   * of a 12-segment, 28-node wall 2.5e7.
   */
  recordedValues: 40_000_000,
  /** Steps the explicit RK45 reference may need (estimated from the stiffness); about a minute on the demo. */
  rk45Steps: 200_000,
} as const;

/** `40 000` for messages (a space between thousands, the same in every locale). */
export const grouped = (n: number): string => String(Math.round(n)).replace(/\B(?=(\d{3})+(?!\d))/g, ' ');

/** Output instants the run records: every output interval of each recorded day, plus the start. */
export function recordedInstants(inputs: ModelInputs): number {
  const days = inputs.run.length.kind === 'days' ? inputs.run.length.days : 1; // a periodic study records its settled day
  return days * Math.ceil(SECONDS_PER_DAY / inputs.run.outputInterval) + 1;
}

/** Values recorded at each output instant: every node's temperature, the boundary quantities of each segment, the instant's drivers and firing flag. */
export function recordedValuesPerInstant(inputs: ModelInputs, nodesPerSegment: number): number {
  const segments = inputs.stack.segments;
  return segments * nodesPerSegment + segments * SERIES_SEGMENT_CHANNELS.length + SERIES_INSTANT_CHANNELS.length + 1;
}

/**
 * Problems with the size of the model: nodes through the wall, unknowns, and recorded values
 * (estimated before anything runs). Empty when the run fits.
 */
export function sizeProblems(inputs: ModelInputs): string[] {
  const nodes = buildWallMesh(inputs.layers, inputs.stack.innerDiameter / 2).nodeCount;
  const segments = inputs.stack.segments;
  const unknowns = nodes * segments;
  if (nodes > LIMITS.nodesPerSegment)
    return [`stack.layers: found ${grouped(nodes)} nodes through the wall (the cells of every layer); expected at most ${grouped(LIMITS.nodesPerSegment)} (a limit of stackday): use fewer cells`];
  if (unknowns > LIMITS.unknowns)
    return [
      `stack.segments: found ${segments} segments × ${nodes} nodes through the wall = ${grouped(unknowns)} unknowns; expected at most ${grouped(LIMITS.unknowns)} (a limit of stackday): use fewer segments or cells`,
    ];
  const instants = recordedInstants(inputs);
  const perInstant = recordedValuesPerInstant(inputs, nodes);
  const values = perInstant * instants;
  if (values > LIMITS.recordedValues)
    return [
      `run.days: found a run recording ${grouped(instants)} output instants × ${grouped(perInstant)} values (${grouped(unknowns)} temperatures and the boundary quantities of ${segments} segments) = ${grouped(values)} values; expected at most ${grouped(LIMITS.recordedValues)} (a limit of stackday, about ${Math.round((LIMITS.recordedValues * 8) / 1e6)} MB): use fewer days, segments or cells, or a longer run.output_interval`,
    ];
  return [];
}
