/** The sun-facing side's figures from a wall cut into sectors. */
import { describe, it, expect } from 'vitest';
import { evaluated } from '../../../src/analysis/metrics/evaluated.ts';
import { sectorFigures } from '../../../src/analysis/metrics/sectors.ts';
import type { TimeSeries } from '../../../src/model/timeseries.ts';
import { SERIES_INSTANT_CHANNELS, SERIES_SEGMENT_CHANNELS } from '../../../src/model/timeseries.ts';
import { constantMaterial, layer } from '../../model/fixtures.ts';

/** A one-instant series: every node of sector j at T₀ + A cos(φ_j − φ₀), the same at every height. */
function series(sectors: number, segments: number, amplitude: number, towardDeg: number): TimeSeries {
  const nodes = 3;
  const temperatureK = new Float64Array(segments * sectors * nodes);
  for (let s = 0; s < segments; s++)
    for (let j = 0; j < sectors; j++)
      for (let i = 0; i < nodes; i++) temperatureK[(s * sectors + j) * nodes + i] = 300 + amplitude * Math.cos((2 * Math.PI * j) / sectors - (towardDeg * Math.PI) / 180);
  const perSegment = Object.fromEntries(SERIES_SEGMENT_CHANNELS.map((c) => [c, new Float64Array(segments)]));
  const perInstant = Object.fromEntries(SERIES_INSTANT_CHANNELS.map((c) => [c, new Float64Array(1)]));
  return {
    t: Float64Array.of(0),
    isoLocal: ['2026-07-15T12:00:00+00:00'],
    day: Int32Array.of(0),
    runDay: Int32Array.of(0),
    segments,
    sectors,
    nodes,
    heightM: Float64Array.from({ length: segments }, (_, s) => (s + 0.5) * (40 / segments)),
    nodeRadius: Float64Array.of(0.79, 0.795, 0.8),
    nodeLabel: ['inner_surface', 'node_1', 'outer_surface'],
    layers: [{ label: 'shell', material: 'steel', kind: 'solid', firstNode: 0, lastNode: 2, thickness: 0.01 }],
    waterDewPointK: 320,
    acidDewPointK: null,
    temperatureK,
    segment: perSegment,
    instant: { ...perInstant, firing: Uint8Array.of(0) },
  } as unknown as TimeSeries;
}

describe('sector figures', () => {
  it('give the side-to-side difference 2A of a cos φ distribution and the cantilever tip deflection κ H²/2 (beam theory)', () => {
    const steel = constantMaterial('steel', 50, 7850, 460, { thermalExpansion: 12e-6 });
    const ev = evaluated(series(16, 8, 5, 120), 'warmup');
    const figures = sectorFigures(ev, [layer(steel, 0.01, 2)], 1.6, 40, { value: 305, at: { instant: 0, segment: 0, sector: 5 } })!;
    // opposite sides differ by 2A = 10 K; κ = α·2A/D = 12e-6·10/1.6 = 7.5e-5 /m; tip = κ·40²/2 = 60 mm
    expect(figures.summary.largest_side_to_side_wall_k).toBeCloseTo(10, 9);
    expect(figures.summary.bow_largest_tip_deflection_mm).toBeCloseTo(60, 6);
    expect(figures.summary.bow_curvature_per_km_by_height[0]!.curvature_per_km).toBeCloseTo(0.075, 9);
    // the shell: hottest minus coldest sector, 2A cos(π/16)… at most 2A
    expect(figures.summary.largest_side_to_side_shell_k).toBeLessThanOrEqual(10);
    expect(figures.summary.largest_side_to_side_shell_k).toBeGreaterThan(9.8);
  });

  it('are absent for the averaged wall', () => {
    const ev = evaluated(series(1, 2, 0, 0), 'warmup');
    expect(sectorFigures(ev, [], 1.6, 40, { value: 300, at: { instant: 0, segment: 0 } })).toBeNull();
  });
});
