/**
 * The wall cut into circumferential sectors: one sector is the averaged wall; with the sun off every
 * sector is the averaged wall; heat spreads round the circumference as conduction on a ring does;
 * the sun-facing side runs hotter than the average, facing the sun.
 */
import { describe, it, expect } from 'vitest';
import { simulate } from '../../src/model/simulate.ts';
import { assembleModel } from '../../src/model/assemble.ts';
import { integrateTrBdf2 } from '../../src/solver/index.ts';
import { validateModelInputs } from '../../src/input/scenario/validate.ts';
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { baseInputs, constantMaterial, layer } from './fixtures.ts';

const steel = constantMaterial('steel', 50, 7850, 460);

describe('circumferential sectors', () => {
  it('a single sector gives exactly the averaged model (the key omitted)', () => {
    const base = baseInputs({ layers: [layer(constantMaterial('brick', 1, 2000, 900), 0.1, 5), layer(steel, 0.006, 2)] });
    const a = simulate(base);
    const b = simulate({ ...base, stack: { ...base.stack, sectors: 1 } });
    expect(Array.from(b.series.temperatureK)).toEqual(Array.from(a.series.temperatureK));
  });

  it('with the sun off, every sector follows the averaged wall (within the integrator tolerance)', () => {
    const raw = parse(readFileSync('scenarios/demo.yaml', 'utf8'));
    raw.run = { days: 1, output_interval: 60, initial: 'steady-at-start' };
    raw.stack.segments = 3;
    raw.outside.sun = false;
    const one = simulate(validateModelInputs(raw).inputs);
    raw.stack.sectors = 8;
    const eight = simulate(validateModelInputs(raw).inputs);
    const n = one.series.nodes;
    const S = one.series.segments;
    let worst = 0;
    for (let k = 0; k < one.series.t.length; k++)
      for (let s = 0; s < S; s++)
        for (let j = 0; j < 8; j++)
          for (let i = 0; i < n; i++) worst = Math.max(worst, Math.abs(eight.series.temperatureK[((k * S + s) * 8 + j) * n + i]! - one.series.temperatureK[(k * S + s) * n + i]!));
    // symmetric problem: the sectors differ from the averaged wall only by integrator error; the two
    // runs choose their own steps (the sectors' Newton matrix carries the circumferential links on
    // its diagonal), each within the time error of the default tolerances, about 0.05 K (measured
    // 0.02 K)
    expect(worst).toBeLessThan(0.05);
  });

  it('spreads a circumferential wave at the rate of conduction on a ring, α/r² (Carslaw & Jaeger)', () => {
    // a thin steel ring, films ~0: T = T₀ + A cos φ decays as exp(−λ t) with the discrete rate
    // λ = (α/r²)(2(1 − cos Δφ)/Δφ²) of the sectors' finite volumes (→ α/r² as Δφ → 0)
    const sectors = 24;
    const inputs = baseInputs({
      layers: [layer(steel, 0.01, 1)],
      stack: { height: 10, innerDiameter: 2, segments: 1, sectors },
      outside: { filmCoefficient: 1e-9, radiation: { kind: 'none' }, sun: false },
    });
    const flue = { ...inputs.flue, filmCoefficient: 1e-9 };
    const model = assembleModel({ ...inputs, flue });
    const n = model.mesh.nodeCount;
    const y0 = new Float64Array(model.system.size);
    for (let j = 0; j < sectors; j++) for (let i = 0; i < n; i++) y0[j * n + i] = 400 + 10 * Math.cos((2 * Math.PI * j) / sectors);
    const t = 20000;
    const res = integrateTrBdf2(model.system, y0, 0, [t], { rtol: 1e-9, atol: 1e-9 });
    // amplitude of the first harmonic at the end
    let c = 0;
    for (let j = 0; j < sectors; j++) c += (res.y[j * n]! - 400) * Math.cos((2 * Math.PI * j) / sectors);
    const amplitude = (2 * c) / sectors;
    const alpha = 50 / (7850 * 460);
    const r = 1.005; // mid-radius of the ring (1.0 to 1.01 m)
    const dphi = (2 * Math.PI) / sectors;
    const rate = (alpha / (r * r)) * ((2 * (1 - Math.cos(dphi))) / (dphi * dphi));
    // 0.5 %: the ring's two nodes sit at 1.0 and 1.01 m, not at the mid-radius (curvature of the cell)
    expect(Math.abs(amplitude / (10 * Math.exp(-rate * t)) - 1)).toBeLessThan(5e-3);
  });

  it('puts the hottest shell on the sun-facing side, hotter than the averaged wall, facing the sun', () => {
    const raw = parse(readFileSync('scenarios/demo.yaml', 'utf8'));
    raw.run = { days: 1, output_interval: 30, initial: 'steady-at-start' };
    raw.stack.segments = 2;
    const averaged = simulate(validateModelInputs(raw).inputs);
    raw.stack.sectors = 16;
    const sectored = simulate(validateModelInputs(raw).inputs);
    const n = averaged.series.nodes;
    const S = averaged.series.segments;
    const shell = (series: typeof averaged.series, ns: number, k: number, s: number, j: number) => series.temperatureK[((k * S + s) * ns + j) * n + n - 1]!;
    let peakAveraged = -Infinity;
    let peakSectored = -Infinity;
    for (let k = 0; k < averaged.series.t.length; k++) {
      peakAveraged = Math.max(peakAveraged, shell(averaged.series, 1, k, 1, 0));
      for (let j = 0; j < 16; j++) peakSectored = Math.max(peakSectored, shell(sectored.series, 16, k, 1, j));
    }
    expect(peakSectored).toBeGreaterThan(peakAveraged + 1);
    // at each afternoon instant, the hottest sector faces within one sector width of the sun's azimuth
    for (let k = 0; k < sectored.series.t.length; k++) {
      if (sectored.series.instant.sunAltitudeDeg[k]! < 20) continue;
      let best = 0;
      for (let j = 1; j < 16; j++) if (shell(sectored.series, 16, k, 1, j) > shell(sectored.series, 16, k, 1, best)) best = j;
      const az = sectored.series.instant.sunAzimuthDeg[k]!;
      const diff = Math.abs(((best * 22.5 - az + 540) % 360) - 180);
      // the shell lags the sun (thermal inertia): within 2 sector widths (45°)
      expect(diff).toBeLessThan(45);
    }
  });
});
