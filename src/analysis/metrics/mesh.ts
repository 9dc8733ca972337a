/**
 * The mesh a run was solved on, as summary.json states it: cells per layer with their thinnest and
 * thickest cell, and the fastest forcing on each face that the automatic cells resolve.
 */
import type { RunResult } from '../../model/timeseries.ts';
import type { MeshSummary } from '../summary.ts';
import { round } from '../rounding.ts';

export function meshSummary(result: RunResult): MeshSummary {
  const s = result.series;
  const { forcing, layerCells, cappedLayers, meshRefinement } = result.solve;
  const layers = s.layers.map((l, j) => {
    if (l.kind === 'gap') return { label: l.label, cells: 0, smallest_cell_mm: null, largest_cell_mm: null };
    let smallest = Infinity;
    let largest = 0;
    for (let i = l.firstNode; i < l.lastNode; i++) {
      const dr = s.nodeRadius[i + 1]! - s.nodeRadius[i]!;
      smallest = Math.min(smallest, dr);
      largest = Math.max(largest, dr);
    }
    return { label: l.label, cells: layerCells[j] ?? l.lastNode - l.firstNode, smallest_cell_mm: round(smallest * 1000, 2), largest_cell_mm: round(largest * 1000, 2) };
  });
  return {
    layers,
    flue_side_time_scale_min: round(forcing.flueSide.timeScaleS / 60, 1),
    flue_side_set_by: forcing.flueSide.setBy,
    outside_time_scale_min: round(forcing.outside.timeScaleS / 60, 1),
    outside_set_by: forcing.outside.setBy,
    capped_layers: cappedLayers.map((j) => s.layers[j]!.label),
    refinement: meshRefinement,
  };
}
