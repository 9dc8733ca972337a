/**
 * Per layer over the evaluated period: range, largest daily swing, largest temperature difference
 * across it (with when and where) and the thermal-stress indicator at that difference; and the
 * largest difference across the whole wall.
 */
import type { LayerInput } from '../../model/inputs.ts';
import type { TimeSeries } from '../../model/timeseries.ts';
import { kelvinToCelsius as c } from '../../physics/constants.ts';
import { thermalStressIndicator } from '../../physics/wall/stress.ts';
import type { LayerSummary, Summary } from '../summary.ts';
import { round } from '../rounding.ts';
import { locateLargest, nodeRange, rangeAt, timeAndHeight, type Evaluated, type Located } from './evaluated.ts';

type SeriesLayer = TimeSeries['layers'][number];

/** Lowest and highest temperature, K, anywhere in the layer, and the largest swing of any of its nodes at one height, K. */
export function layerRange(ev: Evaluated, layer: SeriesLayer): { minK: number; maxK: number; swingK: number } {
  const nodes = nodeRange(layer.firstNode, layer.lastNode);
  let min = Infinity;
  let max = -Infinity;
  let swing = 0;
  for (let col = 0; col < ev.C; col++)
    for (const i of nodes) {
      const { lo, hi } = rangeAt(ev, col, i);
      min = Math.min(min, lo);
      max = Math.max(max, hi);
      swing = Math.max(swing, hi - lo);
    }
  return { minK: min, maxK: max, swingK: swing };
}

/** Largest temperature difference across a layer (first node to last), K, searched height by height. */
export function layerMaxDeltaT(ev: Evaluated, layer: SeriesLayer): Located {
  const { T } = ev;
  return locateLargest(ev, (k, seg) => Math.abs(T(k, seg, layer.firstNode) - T(k, seg, layer.lastNode)), -1, true);
}

/** Largest temperature difference across the whole wall (inner to outer surface), K. */
export function throughWallMaxDeltaT(ev: Evaluated): Located {
  const { T, N } = ev;
  return locateLargest(ev, (k, seg) => Math.abs(T(k, seg, 0) - T(k, seg, N - 1)), -1);
}

/** The thermal-stress indicator of a layer at a difference `deltaK` across it, MPa; null for a layer without elastic data. */
export function layerStressMpa(material: LayerInput['material'], deltaK: number): number | null {
  return material.kind === 'solid' && material.youngsModulus > 0 && material.thermalExpansion > 0
    ? thermalStressIndicator(material.youngsModulus, material.thermalExpansion, material.poissonRatio, deltaK) / 1e6
    : null;
}

/** Every layer as summary.json states it, inside → outside, with where its largest difference occurs. */
export function layerSummaries(ev: Evaluated, layerInputs: readonly LayerInput[]): { layers: LayerSummary[]; maxDeltaT: Located[] } {
  const maxDeltaT = ev.series.layers.map((layer) => layerMaxDeltaT(ev, layer));
  const layers = ev.series.layers.map((layer, j): LayerSummary => {
    const { minK, maxK, swingK } = layerRange(ev, layer);
    const dMax = maxDeltaT[j]!.value;
    const m = layerInputs[j]!.material;
    const stress = layerStressMpa(m, dMax);
    const w = timeAndHeight(ev.series, maxDeltaT[j]!.at);
    return {
      label: layer.label,
      material: layer.material,
      kind: layer.kind,
      thickness_mm: round(layer.thickness * 1000, 1),
      min_c: round(c(minK)),
      max_c: round(c(maxK)),
      swing_k: round(swingK),
      max_delta_t_k: round(dMax, 3),
      max_delta_t_time: w.time,
      max_delta_t_height_m: w.height,
      stress_indicator_mpa: stress === null ? null : round(stress, 3),
      max_service_c: m.kind === 'solid' ? round(c(m.maxServiceTemperatureK), 1) : null,
    };
  });
  return { layers, maxDeltaT };
}

/** The through-wall difference as summary.json states it. */
export function throughWallFigures(ev: Evaluated, tw: Located): Pick<Summary, 'through_wall_max_delta_t_k' | 'through_wall_max_delta_t_time' | 'through_wall_max_delta_t_height_m'> {
  const w = timeAndHeight(ev.series, tw.at);
  return { through_wall_max_delta_t_k: round(tw.value), through_wall_max_delta_t_time: w.time, through_wall_max_delta_t_height_m: w.height };
}
