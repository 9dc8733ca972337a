/**
 * The simulated time series: what the model hands to metrics and reports. SI units and kelvin.
 * Arrays are flat: temperature[(k · segments + s) · nodes + i] for output instant k, segment s,
 * node i; per-segment channels [k · segments + s]; per-instant channels [k].
 */
export interface TimeSeries {
  /** Run time of each output instant, s. */
  readonly t: Float64Array;
  /** ISO local time of each output instant. */
  readonly isoLocal: readonly string[];
  /** Day index (0-based, counted from the first simulated day) of each output instant. */
  readonly day: Int32Array;
  readonly segments: number;
  readonly nodes: number;
  /** Mid-height of each segment, m. */
  readonly heightM: Float64Array;
  readonly nodeRadius: Float64Array;
  readonly nodeLabel: readonly string[];
  /** Labels and node ranges of the layers, inside → outside. */
  readonly layers: readonly { readonly label: string; readonly material: string; readonly kind: 'solid' | 'gap'; readonly firstNode: number; readonly lastNode: number; readonly thickness: number }[];
  readonly temperatureK: Float64Array;
  readonly segment: {
    readonly gasInK: Float64Array;
    readonly gasOutK: Float64Array;
    readonly insideFilm: Float64Array;
    readonly gasToWallPerMetre: Float64Array;
    readonly windAtHeight: Float64Array;
    readonly outsideFilm: Float64Array;
    readonly convectionPerMetre: Float64Array;
    readonly radiationPerMetre: Float64Array;
    readonly sunPerMetre: Float64Array;
    readonly waterDewMarginK: Float64Array;
    readonly acidDewMarginK: Float64Array;
  };
  readonly instant: {
    readonly airTemperatureK: Float64Array;
    readonly windSpeedRef: Float64Array;
    readonly skyTemperatureK: Float64Array;
    readonly sunAltitudeDeg: Float64Array;
    readonly sunAzimuthDeg: Float64Array;
    readonly beamNormal: Float64Array;
    readonly diffuseHorizontal: Float64Array;
    readonly inletTemperatureK: Float64Array;
    readonly massFlow: Float64Array;
    readonly firing: Uint8Array;
    readonly gasExitK: Float64Array;
    readonly draftPa: Float64Array;
  };
  readonly waterDewPointK: number;
  /** Null when the gas carries no SO₃. */
  readonly acidDewPointK: number | null;
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
  /** (in − stored − out) relative to the largest flow, %. */
  readonly residualPercent: number;
  /** Length of the accounting period, s. */
  readonly periodS: number;
}

export interface RunResult {
  readonly series: TimeSeries;
  /** Energy over the whole run and over the last day. */
  readonly energy: { readonly run: EnergyAccount; readonly lastDay: EnergyAccount };
  readonly daysSimulated: number;
  /** Null when the run was not asked to reach a periodic state. */
  readonly periodic: { readonly reached: boolean; readonly lastChangeK: number; readonly toleranceK: number; readonly changeByDayK: readonly number[] } | null;
  /** Run time of firing start (warm-up studies). */
  readonly firingStartT: number | null;
  readonly integrator: { readonly name: string; readonly steps: number; readonly rejected: number; readonly rhsEvaluations: number; readonly computeMs: number; readonly initialStateMs: number };
  /** Warnings gathered during the run (validity ranges, clamped values). */
  readonly warnings: readonly string[];
}
