/**
 * Collects the reported instants of a run into typed, growable columns (one per channel), then
 * packs them into a TimeSeries. Per instant it stores the wall state, the boundary diagnostics of
 * every segment, the dew-point margins of the inner surface, the drivers and the draft; and it
 * range-checks every correlation evaluated at that instant.
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
import { SERIES_INSTANT_CHANNELS, SERIES_SEGMENT_CHANNELS, type SeriesInstantChannel, type SeriesSegmentChannel, type TimeSeries } from './timeseries.ts';
import type { SegmentDiagnostics, StackGeometry } from './system.ts';
import { checkCorrelationRanges } from './rangeChecks.ts';

/** The per-instant channels taken straight from the drivers. */
const DRIVER_CHANNELS = SERIES_INSTANT_CHANNELS.filter((c): c is Exclude<SeriesInstantChannel, 'gasExitK' | 'draftPa'> => c !== 'gasExitK' && c !== 'draftPa');

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
  /** The values so far, as a new array. */
  copy(): Float64Array {
    return this.data.slice(0, this.length);
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

export class Recorder {
  private t = new Column();
  private iso: string[] = [];
  private day: number[] = [];
  private temps = new Column();
  private seg = {} as Record<SeriesSegmentChannel, Column>;
  private inst = {} as Record<SeriesInstantChannel | 'firing', Column>;
  private readonly waterDew: number;
  private readonly acidDew: number | null;
  private readonly water: Float64Array;
  private readonly acid: Float64Array;
  private readonly airDensityPressurePa: number;
  /** Every correlation evaluated at a recorded instant, checked against its published range. */
  readonly ranges = new CorrelationRangeTally();

  constructor(private readonly ctx: RecorderContext) {
    const flue = ctx.inputs.flue;
    const dew = flueGasDewPoints(flue.composition, flue.pressurePa);
    this.waterDew = dew.waterDewPointK;
    this.acidDew = dew.acidDewPointK;
    this.water = new Float64Array(ctx.geometry.segments);
    this.acid = new Float64Array(ctx.geometry.segments);
    this.airDensityPressurePa = ctx.sitePressurePa;
    this.reset();
  }

  /** Forget every instant recorded so far (the range checks are kept). */
  reset(): void {
    this.t = new Column();
    this.iso = [];
    this.day = [];
    this.temps = new Column();
    for (const c of SERIES_SEGMENT_CHANNELS) this.seg[c] = new Column();
    for (const c of SERIES_INSTANT_CHANNELS) this.inst[c] = new Column();
    this.inst.firing = new Column();
  }

  /** Record the instant shown at run time `t` (day index `day`) with wall state `y`, boundary diagnostics `diag` and drivers `d`. */
  push(t: number, day: number, y: Float64Array, diag: SegmentDiagnostics, d: Drivers): void {
    const { inputs, mesh, geometry, clock, gas } = this.ctx;
    const n = mesh.nodeCount;
    const S = geometry.segments;
    this.t.push(t);
    this.iso.push(clock.isoLocal(t));
    this.day.push(day);
    this.temps.pushAll(y);
    let gasSum = 0;
    const ns = y.length / (S * n);
    for (let s = 0; s < S; s++) {
      // the coldest sector's inner surface governs the dew-point margins
      let inner = y[s * ns * n]!;
      for (let j = 1; j < ns; j++) inner = Math.min(inner, y[(s * ns + j) * n]!);
      this.water[s] = inner - this.waterDew;
      this.acid[s] = this.acidDew === null ? Number.NaN : inner - this.acidDew;
      gasSum += 0.5 * (diag.gasInK[s]! + diag.gasOutK[s]!);
    }
    checkCorrelationRanges(this.ctx, t, y, diag, this.ranges);
    for (const c of SERIES_SEGMENT_CHANNELS) {
      if (c === 'waterDewMarginK') this.seg[c].pushAll(this.water);
      else if (c === 'acidDewMarginK') this.seg[c].pushAll(this.acid);
      else this.seg[c].pushAll(diag[c]);
    }
    const airDensity = airDensityIdealGas(d.airTemperatureK, this.airDensityPressurePa);
    const draft = stackDraftPa(inputs.stack.height, airDensity, gas(gasSum / S).density);
    for (const c of DRIVER_CHANNELS) this.inst[c].push(d[c]);
    this.inst.gasExitK.push(diag.gasOutK[S - 1]!);
    this.inst.draftPa.push(draft);
    this.inst.firing.push(d.firing ? 1 : 0);
  }

  finish(): TimeSeries {
    const { mesh, geometry, inputs } = this.ctx;
    const segment = Object.fromEntries(SERIES_SEGMENT_CHANNELS.map((c) => [c, this.seg[c].copy()])) as Record<SeriesSegmentChannel, Float64Array>;
    const instant = Object.fromEntries(SERIES_INSTANT_CHANNELS.map((c) => [c, this.inst[c].copy()])) as Record<SeriesInstantChannel, Float64Array>;
    return {
      t: this.t.copy(),
      isoLocal: this.iso,
      day: Int32Array.from(this.day),
      segments: geometry.segments,
      sectors: this.temps.length / Math.max(1, this.t.length) / (geometry.segments * mesh.nodeCount) || 1,
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
      temperatureK: this.temps.copy(),
      segment,
      instant: { ...instant, firing: Uint8Array.from(this.inst.firing.copy()) },
      waterDewPointK: this.waterDew,
      acidDewPointK: this.acidDew,
    };
  }
}
