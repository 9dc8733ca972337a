/**
 * The automatic cell rule (src/physics/wall/cells.ts): the sizes it documents, grading away from
 * the forced faces, nesting under refinement, the cap. The rule's accuracy is checked against
 * analytic and converged references in test/model/accuracy.test.ts.
 */
import { describe, it, expect } from 'vitest';
import { autoLayerCells, cellSizeFromFace, forcingLength, uniformLayerCells, CELLS_PER_FORCING_LENGTH, MAX_AUTO_CELLS, MIN_CELLS } from '../../../src/physics/wall/cells.ts';
import { buildWallMesh, diffusionTimeBefore } from '../../../src/physics/wall/mesh.ts';
import { constantMaterial, layer } from '../../model/fixtures.ts';

const widths = (faces: Float64Array) => Array.from(faces.subarray(1), (x, i) => x - faces[i]!);
const DAY = 86400;

describe('cellSizeFromFace', () => {
  it('is an M-th of the forcing length at the face, then grows as the module note says', () => {
    // penetration length √(α τ) (Carslaw & Jaeger 1959, §2.4): α = 5e-7 m²/s, τ = 1800 s → 30 mm
    const fast = forcingLength(5e-7, 1800);
    const day = forcingLength(5e-7, DAY);
    expect(fast).toBeCloseTo(0.03, 12);
    const m = CELLS_PER_FORCING_LENGTH;
    expect(cellSizeFromFace(0, fast, day)).toBeCloseTo(fast / m, 12);
    // first 2ℓ(τ): (ℓ/M) e^{d/(2ℓ)}; then (e/2M)·d; beyond 2ℓ(P): (ℓ(P)/M) e^{d/(2ℓ(P))}
    expect(cellSizeFromFace(0.03, fast, day)).toBeCloseTo((fast / m) * Math.exp(0.5), 12);
    expect(cellSizeFromFace(0.2, fast, day)).toBeCloseTo((Math.E / (2 * m)) * 0.2, 12);
    expect(cellSizeFromFace(1, fast, day)).toBeCloseTo((day / m) * Math.exp(1 / (2 * day)), 12);
  });
});

describe('autoLayerCells', () => {
  const alpha = 5e-7;

  it('grades the cells from the forced face: finest there, growing by at most 1.3 per cell', () => {
    const { faces, capped } = autoLayerCells(0.1, alpha, { innerTimeScaleS: 1800, outerTimeScaleS: Infinity });
    const w = widths(faces);
    expect(capped).toBe(false);
    expect(faces[faces.length - 1]).toBe(0.1);
    // the worked example of the module note: 33 cells, the first about ℓ/M = 1.5 mm (within 5 %:
    // a cell spans one unit of ξ, over which the limit itself grows by about 3 %)
    expect(w.length).toBe(33);
    expect(Math.abs(w[0]! / 0.0015 - 1)).toBeLessThan(0.05);
    for (let i = 1; i < w.length; i++) {
      expect(w[i]!).toBeGreaterThan(w[i - 1]!);
      expect(w[i]! / w[i - 1]!).toBeLessThan(1.3);
    }
  });

  it('grades from both faces when both are forced (a single layer under flue and weather)', () => {
    const w = widths(autoLayerCells(0.3, alpha, { innerTimeScaleS: 600, outerTimeScaleS: 3600 }).faces);
    const mid = w.indexOf(Math.max(...w));
    expect(mid).toBeGreaterThan(0);
    expect(mid).toBeLessThan(w.length - 1);
    // the faster forcing inside gets the finer first cell: √(600/3600) of the outer one, within the rounding of the count
    expect(w[0]! / w[w.length - 1]!).toBeCloseTo(Math.sqrt(600 / 3600), 1);
  });

  it('nests under refinement: every face of the mesh is a face of the twice finer one', () => {
    const f = { innerTimeScaleS: 1200, outerTimeScaleS: Infinity };
    const coarse = autoLayerCells(0.12, alpha, f).faces;
    const fine = autoLayerCells(0.12, alpha, f, 2).faces;
    expect(fine.length - 1).toBe(2 * (coarse.length - 1));
    // the same stretched coordinate; its numerical inverse is exact to far below a micrometre
    coarse.forEach((x, i) => expect(Math.abs(fine[2 * i]! - x)).toBeLessThan(1e-9));
  });

  it('gives a layer at least two cells, and caps and reports a layer that would need too many', () => {
    expect(autoLayerCells(0.001, alpha, { innerTimeScaleS: 1800, outerTimeScaleS: Infinity }).faces.length - 1).toBe(MIN_CELLS);
    // a forcing of one second on both faces of a 5 m layer asks for about 250 cells
    const capped = autoLayerCells(5, 1e-7, { innerTimeScaleS: 1, outerTimeScaleS: 1 });
    expect(capped.capped).toBe(true);
    expect(capped.faces.length - 1).toBe(MAX_AUTO_CELLS);
  });

  it('spaces a given cell count evenly', () => {
    expect(widths(uniformLayerCells(0.1, 4).faces).map((x) => Number(x.toFixed(12)))).toEqual([0.025, 0.025, 0.025, 0.025]);
  });
});

describe('the automatic mesh of a wall', () => {
  const lining = constantMaterial('lining', 1.2, 2000, 900);
  const wool = constantMaterial('wool', 0.05, 100, 900);

  it('grades each later layer to the forcing smoothed by the diffusion time L²/α of the layers before it', () => {
    const layers = [layer(lining, 0.1), layer(wool, 0.1)];
    const lag = diffusionTimeBefore(layers, 1);
    expect(lag).toBeCloseTo(0.1 ** 2 / (1.2 / (2000 * 900)), 6);
    const mesh = buildWallMesh(layers, 1, { flueSideTimeScaleS: 1800, outsideTimeScaleS: 86400 / Math.PI });
    const [a0, a1] = mesh.layerNodes[1]!;
    const firstWoolCell = mesh.radius[a0 + 1]! - mesh.radius[a0]!;
    // the wool's first cell: ℓ(1800 s + lag)/M, within 5 % (as in the worked example)
    const limit = forcingLength(0.05 / (100 * 900), 1800 + lag) / CELLS_PER_FORCING_LENGTH;
    expect(Math.abs(firstWoolCell / limit - 1)).toBeLessThan(0.05);
    expect(a1).toBe(mesh.nodeCount - 1);
    expect(mesh.layerCells).toEqual([mesh.layerNodes[0]![1] - mesh.layerNodes[0]![0], a1 - a0]);
  });

  it('keeps a given cell count and multiplies it under refinement', () => {
    const mesh = buildWallMesh([layer(lining, 0.1, 5), layer(wool, 0.1, 3)], 1, { flueSideTimeScaleS: 600, outsideTimeScaleS: 600, refinement: 2 });
    expect(mesh.layerCells).toEqual([10, 6]);
    expect(mesh.cappedLayers).toEqual([]);
  });
});
