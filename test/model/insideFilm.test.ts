/**
 * The inside film in the running model: with no forced flow to speak of, the lining's natural
 * convection sets it (the published vertical-surface correlation at the gas–wall difference); at
 * full fire the forced flow dominates.
 */
import { describe, it, expect } from 'vitest';
import { simulate } from '../../src/model/simulate.ts';
import { makeGasPropertyTable } from '../../src/physics/properties/flueGas.ts';
import { naturalConvectionLiningCoefficient, nuPipeBlended } from '../../src/physics/correlations/internal.ts';
import { baseInputs, constantMaterial, layer } from './fixtures.ts';

const castable = constantMaterial('castable', 1.2, 2100, 950);
const composition = { N2: 0.72, O2: 0.03, CO2: 0.1, H2O: 0.15, SO2: 0, SO3: 0 };
const gas = makeGasPropertyTable(composition, 101325);

function run(massFlow: number) {
  const base = baseInputs({ layers: [layer(castable, 0.1, 6)] });
  const inputs = baseInputs({
    layers: base.layers,
    stack: { height: 40, innerDiameter: 1.4, segments: 1 },
    flue: {
      ...base.flue,
      composition,
      filmCoefficient: undefined,
      gasCooling: false, // every height sees the inlet gas: the film is evaluated at a known gas temperature
      schedule: { daily: [{ clockS: 0, inletTemperatureK: 473.15, massFlow }] },
    },
    run: { ...base.run, outputInterval: 6 * 3600 },
  });
  const r = simulate(inputs);
  const k = r.series.t.length - 1;
  return { film: r.series.segment.insideFilm[k]!, wallK: r.series.temperatureK[k * r.series.nodes]! };
}

describe('inside film of the flue', () => {
  it('equals the natural-convection correlation when the forced flow is negligible', () => {
    const { film, wallK } = run(1e-6);
    // Independent: Churchill–Chu on the 40 m lining at the gas–wall difference, properties at the film
    // temperature (the correlation as published; its own tests check it against hand computations).
    const natural = naturalConvectionLiningCoefficient(wallK, 473.15, 40, gas(0.5 * (wallK + 473.15))).h;
    expect(natural).toBeGreaterThan(1); // a few W/(m² K): ten times a laminar forced film in a wide duct
    // the forced part is the laminar tube value, Nu = 3.66 whatever the flow: h_F ≈ 0.1 W/(m² K), whose cube
    // adds (h_F/h_N)³/3 ≈ 1e-5 relative to the aiding sum
    expect(Math.abs(film / natural - 1)).toBeLessThan(2e-5);
  });

  it('is set by the forced flow at full fire (within 15 % of the forced value alone)', () => {
    const { film } = run(5);
    const props = gas(473.15);
    const re = (4 * 5) / (Math.PI * 1.4 * props.dynamicViscosity);
    const forced = (nuPipeBlended(re, props.prandtl) * props.conductivity) / 1.4;
    // aiding or turbulent: (h_F³ + h_N³)^(1/3) with h_N ≈ 3–4 and h_F ≈ 10 W/(m² K) adds under 15 %
    expect(film).toBeGreaterThanOrEqual(forced);
    expect(film / forced).toBeLessThan(1.15);
  });
});
