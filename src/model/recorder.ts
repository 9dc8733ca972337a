/**
 * The reported instants of a run: `observe` works out an instant's channels from the wall state and
 * the boundary diagnostics (the dew-point margins of the inner surface, the drivers, the gas exit
 * temperature, the draft) as a view for the run's sinks, and range-checks every correlation
 * evaluated at that instant (at most one instant every RANGE_CHECK_SPACING_S); `keep` adds an observed instant to typed, growable columns (one per
 * channel), which `finish` packs into a TimeSeries. The simulation keeps only the instants its
 * summary and charts need (see simulate.ts); the sinks see them all.
 */
import type { ModelInputs } from './inputs.ts';
import type { SiteClock } from './clock.ts';
import type { Drivers } from './drivers.ts';
import type { WallMesh } from '../physics/wall/mesh.ts';
import type { GasPropertyLookup } from '../physics/properties/flueGas.ts';
import { CorrelationRangeTally } from '../physics/correlations/registry.ts';
import { flueGasDewPoints } from '../physics/flue/dewPoint.ts';
import { stackDraftPa } from '../physics/flue/draft.ts';
import { airDensityIdealGas } from '../physics/properties/air.ts';
import { SERIES_INSTANT_CHANNELS, SERIES_SEGMENT_CHANNELS, type SeriesInstantChannel, type SeriesLayout, type SeriesSegmentChannel, type TimeSeries } from './timeseries.ts';
import type { InstantView } from './sinks.ts';
import type { SegmentDiagnostics, StackGeometry } from './system.ts';
import { checkCorrelationRanges } from './rangeChecks.ts';

/** The per-instant channels taken straight from the drivers. */
const DRIVER_CHANNELS = SERIES_INSTANT_CHANNELS.filter((c): c is Exclude<SeriesInstantChannel, 'gasExitK' | 'draftPa'> => c !== 'gasExitK' && c !== 'draftPa');

/**
 * Least run time between two range-checked instants, s: every reported instant at the usual output
 * intervals (10 min and longer); at shorter intervals every few instants, since the groups the
 * correlations take (Re, Ra, Pr) move with the firing and the weather, not from minute to minute,
 * and checking every instant of a 1-minute output would cost a fifth of the run.
 */
export const RANGE_CHECK_SPACING_S = 600;

/** A Float64Array that grows by doubling. */
class Column {
  private data: Float64Array;
  length = 0;
  constructor(capacity = 64) {
    this.data = new Float64Array(capacity);
  }
  private reserve(extra: number): void {
    if (this.length + extra <= this.data.length) return;
    let cap = this.data.length;
    while (cap < this.length + extra) cap *= 2;
    const next = new Float64Array(cap);
    next.set(this.data.subarray(0, this.length));
    this.data = next;
  }
  push(v: number): void {
    this.reserve(1);
    this.data[this.length++] = v;
  }
  pushAll(values: Float64Array): void {
    this.reserve(values.length);
    this.data.set(values, this.length);
    this.length += values.length;
  }
  /** The values so far (a view on the column's storage: no copy). */
  values(): Float64Array {
    return this.data.subarray(0, this.length);
  }
}

/** What the recorder needs of the assembled model. */
export interface RecorderContext {
  readonly inputs: ModelInputs;
  readonly mesh: WallMesh;
  readonly geometry: StackGeometry;
  readonly clock: SiteClock;
  readonly gas: GasPropertyLookup;
  /** Atmospheric pressure at the site, Pa. */
  readonly sitePressurePa: number;
}

/** The instant being observed: the view handed to the sinks, its arrays reused from instant to instant. */
interface ObservedInstant {
  t: number;
  isoLocal: string;
  runDay: number;
  dayEnd: boolean;
  temperatureK: Float64Array;
  readonly segment: Record<SeriesSegmentChannel, Float64Array>;
  readonly instant: Record<SeriesInstantChannel, number>;
  firing: boolean;
}

export class Recorder {
  private t = new Column();
  private iso: string[] = [];
  private day: number[] = [];
  private runDay: number[] = [];
  private temps = new Column();
  private seg = {} as Record<SeriesSegmentChannel, Column>;
  private inst = {} as Record<SeriesInstantChannel | 'firing', Column>;
  private readonly waterDew: number;
  private readonly acidDew: number | null;
  private readonly airDensityPressurePa: number;
  private readonly current: ObservedInstant;
  /** What every instant shares. */
  readonly layout: SeriesLayout;
  /** Every correlation evaluated at a recorded instant (at most one every RANGE_CHECK_SPACING_S), checked against its published range. */
  readonly ranges = new CorrelationRangeTally();
  private nextRangeCheck = Number.NEGATIVE_INFINITY;

  constructor(private readonly ctx: RecorderContext) {
    const flue = ctx.inputs.flue;
    const dew = flueGasDewPoints(flue.composition, flue.pressurePa);
    this.waterDew = dew.waterDewPointK;
    this.acidDew = dew.acidDewPointK;
    this.airDensityPressurePa = ctx.sitePressurePa;
    const S = ctx.geometry.segments;
    this.current = {
      t: 0,
      isoLocal: '',
      runDay: 0,
      dayEnd: false,
      temperatureK: new Float64Array(0),
      segment: Object.fromEntries(SERIES_SEGMENT_CHANNELS.map((c) => [c, new Float64Array(S)])) as Record<SeriesSegmentChannel, Float64Array>,
      instant: Object.fromEntries(SERIES_INSTANT_CHANNELS.map((c) => [c, 0])) as Record<SeriesInstantChannel, number>,
      firing: false,
    };
    const { mesh, geometry, inputs } = ctx;
    this.layout = {
      segments: geometry.segments,
      sectors: inputs.stack.sectors ?? 1,
      nodes: mesh.nodeCount,
      heightM: geometry.midHeight,
      nodeRadius: mesh.radius,
      nodeLabel: mesh.label,
      layers: inputs.layers.map((l, j) => ({
        label: l.label,
        material: l.material.name,
        kind: l.material.kind,
        firstNode: mesh.layerNodes[j]![0],
        lastNode: mesh.layerNodes[j]![1],
        thickness: l.thickness,
      })),
      waterDewPointK: this.waterDew,
      acidDewPointK: this.acidDew,
    };
    this.reset();
  }

  /** Forget every instant kept so far (the range checks are kept). */
  reset(): void {
    this.t = new Column();
    this.iso = [];
    this.day = [];
    this.runDay = [];
    this.temps = new Column();
    for (const c of SERIES_SEGMENT_CHANNELS) this.seg[c] = new Column();
    for (const c of SERIES_INSTANT_CHANNELS) this.inst[c] = new Column();
    this.inst.firing = new Column();
  }

  /**
   * Work out the instant shown at run time `t` (day `runDay` of the run, `dayEnd` when it ends that
   * day) with wall state `y`, boundary diagnostics `diag` and drivers `d`, and range-check it. The
   * view returned is valid until the next call.
   */
  observe(t: number, runDay: number, dayEnd: boolean, y: Float64Array, diag: SegmentDiagnostics, d: Drivers): InstantView {
    const { inputs, mesh, geometry, clock, gas } = this.ctx;
    const n = mesh.nodeCount;
    const S = geometry.segments;
    const v = this.current;
    v.t = t;
    v.isoLocal = clock.isoLocal(t);
    v.runDay = runDay;
    v.dayEnd = dayEnd;
    v.temperatureK = y;
    const water = v.segment.waterDewMarginK;
    const acid = v.segment.acidDewMarginK;
    let gasSum = 0;
    const ns = this.layout.sectors;
    for (let s = 0; s < S; s++) {
      // the coldest sector's inner surface governs the dew-point margins
      let inner = y[s * ns * n]!;
      for (let j = 1; j < ns; j++) inner = Math.min(inner, y[(s * ns + j) * n]!);
      water[s] = inner - this.waterDew;
      acid[s] = this.acidDew === null ? Number.NaN : inner - this.acidDew;
      gasSum += 0.5 * (diag.gasInK[s]! + diag.gasOutK[s]!);
    }
    if (t >= this.nextRangeCheck) {
      checkCorrelationRanges(this.ctx, t, y, diag, this.ranges);
      this.nextRangeCheck = t + RANGE_CHECK_SPACING_S - 1e-6;
    }
    for (const c of SERIES_SEGMENT_CHANNELS) if (c !== 'waterDewMarginK' && c !== 'acidDewMarginK') v.segment[c].set(diag[c]);
    const airDensity = airDensityIdealGas(d.airTemperatureK, this.airDensityPressurePa);
    for (const c of DRIVER_CHANNELS) v.instant[c] = d[c];
    v.instant.gasExitK = diag.gasOutK[S - 1]!;
    v.instant.draftPa = stackDraftPa(inputs.stack.height, airDensity, gas(gasSum / S).density);
    v.firing = d.firing;
    return v;
  }

  /** Keep an observed instant in the series, with its day index `day` (see TimeSeries.day). */
  keep(view: InstantView, day: number): void {
    this.t.push(view.t);
    this.iso.push(view.isoLocal);
    this.day.push(day);
    this.runDay.push(view.runDay);
    this.temps.pushAll(view.temperatureK);
    for (const c of SERIES_SEGMENT_CHANNELS) this.seg[c].pushAll(view.segment[c]);
    for (const c of SERIES_INSTANT_CHANNELS) this.inst[c].push(view.instant[c]);
    this.inst.firing.push(view.firing ? 1 : 0);
  }

  /** Number of instants kept. */
  get kept(): number {
    return this.t.length;
  }

  finish(): TimeSeries {
    const segment = Object.fromEntries(SERIES_SEGMENT_CHANNELS.map((c) => [c, this.seg[c].values()])) as Record<SeriesSegmentChannel, Float64Array>;
    const instant = Object.fromEntries(SERIES_INSTANT_CHANNELS.map((c) => [c, this.inst[c].values()])) as Record<SeriesInstantChannel, Float64Array>;
    return {
      ...this.layout,
      t: this.t.values(),
      isoLocal: this.iso,
      day: Int32Array.from(this.day),
      runDay: Int32Array.from(this.runDay),
      temperatureK: this.temps.values(),
      segment,
      instant: { ...instant, firing: Uint8Array.from(this.inst.firing.values()) },
    };
  }
}
