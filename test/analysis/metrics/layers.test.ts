/** Per-layer figures: the temperature difference across a steady wall and its stress indicator. */
import { describe, it, expect } from 'vitest';
import { simulate } from '../../../src/model/simulate.ts';
import { summarise } from '../../../src/analysis/metrics/index.ts';
import { thermalStressIndicator } from '../../../src/physics/wall/stress.ts';
import { constantMaterial, layer, fixedFilmInputs } from '../../model/fixtures.ts';

describe('thermal-stress indicator', () => {
  it('uses the layer temperature difference of a steady wall (series resistances, Incropera §3.3.1)', () => {
    const liner = constantMaterial('liner', 1.0, 2000, 900, { youngsModulus: 25e9, thermalExpansion: 6e-6, poissonRatio: 0.2 });
    const ins = constantMaterial('ins', 0.1, 300, 900);
    const ri = 1;
    const tGas = 573.15;
    const tAir = 293.15;
    const hIn = 25;
    const hOut = 15;
    const inputs = fixedFilmInputs({ layers: [layer(liner, 0.1, 6), layer(ins, 0.1, 6)], hIn, hOut, gasK: tGas, airK: tAir });
    const result = simulate(inputs);
    const summary = summarise({ inputs, result, version: 'test' });
    const R = [1 / (2 * Math.PI * ri * hIn), Math.log(1.1) / (2 * Math.PI * 1.0), Math.log(1.2 / 1.1) / (2 * Math.PI * 0.1), 1 / (2 * Math.PI * 1.2 * hOut)];
    const q = (tGas - tAir) / R.reduce((a, b) => a + b);
    const deltaLiner = q * R[1]!;
    expect(summary.layers[0]!.max_delta_t_k).toBeCloseTo(deltaLiner, 2);
    // relative 1e-4: the summary rounds the stress to 1 kPa
    expect(Math.abs(summary.layers[0]!.stress_indicator_mpa! - thermalStressIndicator(25e9, 6e-6, 0.2, deltaLiner) / 1e6)).toBeLessThan(2e-3);
    expect(summary.layers[1]!.stress_indicator_mpa).toBeNull(); // no elastic data
  });
});
