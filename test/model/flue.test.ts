/**
 * The flue side inside the running model: the gas energy balance, the firing schedule's ramps at
 * their stated times, and the stack draft.
 */
import { describe, it, expect } from 'vitest';
import { simulate } from '../../src/model/simulate.ts';
import { makeGasPropertyTable } from '../../src/physics/properties/flueGas.ts';
import { airDensityIdealGas } from '../../src/physics/properties/air.ts';
import { STANDARD_GRAVITY } from '../../src/physics/constants.ts';
import { baseInputs, constantMaterial, layer, airSource } from './fixtures.ts';

const brick = constantMaterial('brick', 0.9, 2000, 850);
const wool = constantMaterial('wool', 0.05, 120, 840);
const composition = { N2: 0.72, O2: 0.03, CO2: 0.1, H2O: 0.15, SO2: 0, SO3: 0 };

const inputs = baseInputs({
  layers: [layer(brick, 0.1, 5), layer(wool, 0.08, 4)],
  stack: { height: 50, innerDiameter: 1.2, segments: 10 },
  weather: { kind: 'source', source: airSource(() => 283.15) },
  outside: { filmCoefficient: 12, radiation: { kind: 'none' }, sun: false },
  flue: {
    ...baseInputs({ layers: [] }).flue,
    composition,
    filmCoefficient: undefined, // Gnielinski
    gasCooling: true,
    schedule: {
      daily: [
        { clockS: 0, inletTemperatureK: 373.15, massFlow: 0.3 },
        { clockS: 6 * 3600, inletTemperatureK: 373.15, massFlow: 0.3 },
        { clockS: 7 * 3600, inletTemperatureK: 573.15, massFlow: 2.5 }, // one-hour ramp
        { clockS: 20 * 3600, inletTemperatureK: 573.15, massFlow: 2.5 },
        { clockS: 20 * 3600 + 1800, inletTemperatureK: 373.15, massFlow: 0.3 },
      ],
    },
  },
  run: { mode: 'cycle', length: { kind: 'days', days: 1 }, outputInterval: 900, initial: 'steady-at-start', integrator: 'implicit', rtol: 1e-6, atol: 1e-4 },
});
const result = simulate(inputs);
const s = result.series;
const gas = makeGasPropertyTable(composition, 101325);

describe('gas cooling up the stack', () => {
  it('loses exactly the heat the wall takes up: ṁ ∫c_p dT from exit to inlet = Σ q′Δz within 0.1 %', () => {
    // energy conservation of the quasi-steady gas (docs/model.md "Flue side"); c_p(T) of the mixture
    // integrated independently here by the trapezoid rule on a 0.1 K grid
    const dz = inputs.stack.height / inputs.stack.segments;
    let checked = 0;
    for (let k = 0; k < s.t.length; k++) {
      const mdot = s.instant.massFlow[k]!;
      const tin = s.instant.inletTemperatureK[k]!;
      const tout = s.instant.gasExitK[k]!;
      if (Math.abs(tin - tout) < 1) continue;
      let enthalpy = 0;
      const n = Math.ceil(Math.abs(tin - tout) / 0.1);
      for (let j = 0; j < n; j++) {
        const a = tout + ((tin - tout) * j) / n;
        const b = tout + ((tin - tout) * (j + 1)) / n;
        enthalpy += 0.5 * (gas(a).specificHeat + gas(b).specificHeat) * (b - a);
      }
      let wall = 0;
      for (let seg = 0; seg < s.segments; seg++) wall += s.segment.gasToWallPerMetre[k * s.segments + seg]! * dz;
      expect(Math.abs(wall - mdot * enthalpy) / Math.abs(mdot * enthalpy), s.isoLocal[k]).toBeLessThan(1e-3);
      checked++;
    }
    expect(checked).toBeGreaterThan(50);
  });

  it('cools monotonically from inlet to exit while the wall is colder than the gas', () => {
    const k = s.t.findIndex((t) => t === 14 * 3600);
    for (let seg = 1; seg < s.segments; seg++) expect(s.segment.gasInK[k * s.segments + seg]!).toBeLessThan(s.segment.gasInK[k * s.segments + seg - 1]!);
  });
});

describe('firing schedule in the run', () => {
  it('produces the ramp in the inlet temperature and flow at the stated times', () => {
    // the schedule itself is the reference: linear between 06:00 (100 °C, 0.3 kg/s) and 07:00 (300 °C, 2.5 kg/s)
    for (const [clock, temperature, flow] of [
      [6 * 3600, 373.15, 0.3],
      [6.25 * 3600, 423.15, 0.85],
      [6.5 * 3600, 473.15, 1.4],
      [7 * 3600, 573.15, 2.5],
      [20.25 * 3600, 473.15, 1.4],
    ] as const) {
      const k = s.t.findIndex((t) => Math.abs(t - clock) < 1e-6);
      expect(k, `output at ${clock / 3600} h`).toBeGreaterThanOrEqual(0);
      expect(s.instant.inletTemperatureK[k]!).toBeCloseTo(temperature, 6);
      expect(s.instant.massFlow[k]!).toBeCloseTo(flow, 9);
    }
  });
});

describe('stack draft', () => {
  it('is g·H·(ρ_air − ρ_gas,mean) (Perry’s Chemical Engineers’ Handbook, stack-effect draft)', () => {
    const k = s.t.findIndex((t) => t === 12 * 3600);
    let mean = 0;
    for (let seg = 0; seg < s.segments; seg++) mean += 0.5 * (s.segment.gasInK[k * s.segments + seg]! + s.segment.gasOutK[k * s.segments + seg]!);
    mean /= s.segments;
    const expected = STANDARD_GRAVITY * 50 * (airDensityIdealGas(283.15, 101325) - gas(mean).density);
    expect(s.instant.draftPa[k]!).toBeCloseTo(expected, 6);
    expect(expected).toBeGreaterThan(100); // a 50 m stack at 300 °C draws a few hundred Pa (common practice)
  });
});
