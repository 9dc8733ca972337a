import type { WallState } from './wallState.ts';
import type { ForcingTimeScales } from './forcing.ts';

/**
 * The simulated time series: what the model hands to metrics and reports. SI units and kelvin.
 * Arrays are flat: temperature[(k · segments + s) · nodes + i] for output instant k, segment s,
 * node i; per-segment channels [k · segments + s]; per-instant channels [k].
 */
/** The boundary quantities of each segment that a time series reports (W per metre of height, K, W/(m² K), m/s). */
export const REPORTED_BOUNDARY_CHANNELS = [
  'gasInK',
  'gasOutK',
  'insideFilm',
  'gasToWallPerMetre',
  'windAtHeight',
  'outsideFilm',
  'convectionPerMetre',
  'radiationPerMetre',
  'sunPerMetre',
] as const;

/** Per-segment channels of a time series: the reported boundary quantities and the dew-point margins. */
export const SERIES_SEGMENT_CHANNELS = [
  ...REPORTED_BOUNDARY_CHANNELS,
  /** Inner surface minus the water dew point, K. */
  'waterDewMarginK',
  /** Inner surface minus the acid dew point, K (NaN without SO₃). */
  'acidDewMarginK',
] as const;
export type SeriesSegmentChannel = (typeof SERIES_SEGMENT_CHANNELS)[number];

/** Per-instant channels of a time series (besides `firing`). */
export const SERIES_INSTANT_CHANNELS = [
  'airTemperatureK',
  /** Wind speed at the weather's reference height, m/s. */
  'windSpeedRef',
  'skyTemperatureK',
  'sunAltitudeDeg',
  'sunAzimuthDeg',
  'beamNormal',
  'diffuseHorizontal',
  'inletTemperatureK',
  'massFlow',
  /** Gas temperature leaving the top segment, K. */
  'gasExitK',
  /** Theoretical natural draft, Pa. */
  'draftPa',
] as const;
export type SeriesInstantChannel = (typeof SERIES_INSTANT_CHANNELS)[number];

/** What every instant of a run shares: the mesh, the heights, the labels and the dew points. */
export interface SeriesLayout {
  readonly segments: number;
  /** Circumferential sectors: temperatures are then [((k · segments + s) · sectors + j) · nodes + i] (1: as above). */
  readonly sectors: number;
  readonly nodes: number;
  /** Mid-height of each segment, m. */
  readonly heightM: Float64Array;
  readonly nodeRadius: Float64Array;
  readonly nodeLabel: readonly string[];
  /** Labels and node ranges of the layers, inside → outside. */
  readonly layers: readonly { readonly label: string; readonly material: string; readonly kind: 'solid' | 'gap'; readonly firstNode: number; readonly lastNode: number; readonly thickness: number }[];
  readonly waterDewPointK: number;
  /** Null when the gas carries no SO₃. */
  readonly acidDewPointK: number | null;
}

export interface TimeSeries extends SeriesLayout {
  /** Run time of each output instant, s. */
  readonly t: Float64Array;
  /** ISO local time of each output instant. */
  readonly isoLocal: readonly string[];
  /** Day index (0-based, counted from the first simulated day) of each output instant. */
  readonly day: Int32Array;
  /** Day of the run (0-based) each output instant closes or lies in; the instant at a day's end belongs to that day. */
  readonly runDay: Int32Array;
  readonly temperatureK: Float64Array;
  /** Per-segment channels, [k · segments + s]. */
  readonly segment: Readonly<Record<SeriesSegmentChannel, Float64Array>>;
  /** Per-instant channels, [k]; `firing` is 1 while the burner fires. */
  readonly instant: Readonly<Record<SeriesInstantChannel, Float64Array>> & { readonly firing: Uint8Array };
}

export interface EnergyAccount {
  /** Heat from the gas into the wall, J. */
  readonly gasToWallJ: number;
  /** Heat lost by outside convection, J. */
  readonly convectionJ: number;
  /** Heat lost by outside radiation, J. */
  readonly radiationJ: number;
  /** Sun absorbed by the outer surface, J. */
  readonly sunJ: number;
  /** Change of heat stored in the wall, J. */
  readonly storedJ: number;
  /** Gross energy exchanged across the wall's surfaces, ∫ Σ |q| dt over every segment and flow (in plus out), J. */
  readonly grossJ: number;
  /** in − stored − out, J. */
  readonly residualJ: number;
  /** The residual relative to the gross energy exchanged, %. */
  readonly residualPercent: number;
  /** Length of the accounting period, s. */
  readonly periodS: number;
}

/**
 * Which run days a result's series holds: the days the summary and the charts need (the last day of
 * a cycle study; the whole run, up to a memory budget, of a warm-up study), or every day when the
 * run was asked to keep them all. Every instant reaches the run's sinks either way.
 */
export interface RetainedDays {
  /** First run day held (0-based). */
  readonly firstDay: number;
  /** Number of run days held. */
  readonly days: number;
  /** True when a warm-up study held fewer days than it simulated (its memory budget ran out). */
  readonly truncated: boolean;
}

/** How a solve was set up: its mesh and tolerances, and where it started. */
export interface SolveSettings {
  /** Every cell of the scenario's mesh was cut into this many (1: the scenario's mesh). */
  readonly meshRefinement: number;
  /** Tolerances in use (the scenario's, or tightened for a check). */
  readonly rtol: number;
  readonly atol: number;
  /** Cells of each layer, inside → outside (0 for a gap). */
  readonly layerCells: readonly number[];
  /** Automatic layers whose cell count was capped. */
  readonly cappedLayers: readonly number[];
  /** The fastest forcing on each face, which the automatic cells resolve. */
  readonly forcing: ForcingTimeScales;
  /** Run day the solve started on (0 unless it resumed from a state). */
  readonly firstDay: number;
  /** Whether the solve resumed from a given state partway through the run (an accuracy check over the reported day). */
  readonly resumed: boolean;
}

export interface RunResult {
  readonly series: TimeSeries;
  /** The run days `series` holds. */
  readonly retained: RetainedDays;
  /** Energy over the whole run, over the last day, and over each simulated day in turn. */
  readonly energy: { readonly run: EnergyAccount; readonly lastDay: EnergyAccount; readonly byDay: readonly EnergyAccount[] };
  readonly daysSimulated: number;
  /** Null when the run was not asked to reach a periodic state. */
  readonly periodic: { readonly reached: boolean; readonly lastChangeK: number; readonly toleranceK: number; readonly changeByDayK: readonly number[] } | null;
  /** Run time of firing start (warm-up studies). */
  readonly firingStartT: number | null;
  /** Solver counts over the whole run (steps, rejections, evaluations, Newton) and compute time (for the console only: no file carries it). */
  readonly integrator: {
    readonly name: string;
    readonly steps: number;
    readonly rejected: number;
    readonly rhsEvaluations: number;
    readonly jacobianEvaluations: number;
    readonly newtonIterations: number;
    readonly newtonFailures: number;
    readonly computeMs: number;
    readonly initialStateMs: number;
  };
  /** The settings of this solve: mesh (cells per layer, the forcing the automatic cells resolve, any cap) and tolerances. */
  readonly solve: SolveSettings;
  /** The wall at the end of the run (state.json). */
  readonly finalState: WallState;
  /** The wall at the start of the reported day (the last simulated day), with that day's run-day index. */
  readonly reportedDayStart: { readonly day: number; readonly state: WallState };
  /** Warnings gathered during the run: geometry that weakens the model's assumptions, capped automatic cells, correlations used beyond their range without a justification (by how much and where). */
  readonly warnings: readonly string[];
  /** Correlations used beyond their published range where the literature accepts it, once each. */
  readonly assumptions: readonly string[];
}

/**
 * Temperature, K, of node i at instant k and segment seg: for a wall cut into sectors, that of
 * sector `sector` when given, else the mean round the circumference.
 */
export function nodeTemperatureK(series: TimeSeries, k: number, seg: number, i: number, sector?: number): number {
  const { segments: S, sectors: ns, nodes: N } = series;
  if (ns === 1) return series.temperatureK[(k * S + seg) * N + i]!;
  if (sector !== undefined) return series.temperatureK[((k * S + seg) * ns + sector) * N + i]!;
  let sum = 0;
  for (let j = 0; j < ns; j++) sum += series.temperatureK[((k * S + seg) * ns + j) * N + i]!;
  return sum / ns;
}
