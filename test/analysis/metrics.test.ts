/**
 * Answers an engineer acts on: warm-up times against the lumped-capacitance closed form, the
 * thermal-stress indicator against its formula, and verdicts that fail exactly the limit a
 * scenario was built to fail.
 */
import { describe, it, expect } from 'vitest';
import { simulate } from '../../src/model/simulate.ts';
import { summarise, thermalStressIndicator, timeToStayAbove, timeToReach, fractionBelowZero } from '../../src/analysis/metrics.ts';
import { flueGasDewPoints } from '../../src/physics/flue/dewPoint.ts';
import type { ModelInputs, LimitsInput } from '../../src/model/inputs.ts';
import { constantMaterial, layer, fixedFilmInputs } from '../model/fixtures.ts';
import { loadScenarioFile } from '../../src/input/scenario/load.ts';

describe('thermal-stress indicator', () => {
  it('is E·α·ΔT / (2(1 − ν)) (Timoshenko & Goodier, Theory of Elasticity, §§150–151: thin cylinder, linear gradient)', () => {
    // 200 GPa · 12e-6 /K · 10 K / (2 · 0.7) = 17.142857 MPa, by hand
    expect(thermalStressIndicator(200e9, 12e-6, 0.3, 10)).toBeCloseTo(17.142857e6, 0);
    expect(thermalStressIndicator(30e9, 6e-6, 0.2, -40)).toBeCloseTo((30e9 * 6e-6 * 40) / 1.6, 0); // sign of ΔT does not matter
  });

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

describe('warm-up of a thin steel stack', () => {
  // Lumped capacitance (Incropera & DeWitt §5.2, eq. 5.6): T = T_g − (T_g − T_i) e^{−t/τ},
  // τ = ρ c (r_o² − r_i²) / (2 r_i h); the time to reach T* is τ ln((T_g − T_i)/(T_g − T*)).
  const steel = constantMaterial('steel', 45, 7850, 480);
  const ri = 1;
  const thickness = 0.003;
  const hIn = 20;
  const tGas = 473.15;
  const tAir = 293.15;
  const composition = { N2: 0.73, O2: 0.03, CO2: 0.09, H2O: 0.15, SO2: 0, SO3: 20e-6 };
  const inputs: ModelInputs = fixedFilmInputs({
    layers: [layer(steel, thickness, 2)],
    hIn,
    hOut: 1e-9, // outside practically adiabatic
    gasK: tGas,
    airK: tAir,
    composition,
    run: { mode: 'warmup', length: { kind: 'days', days: 1 }, outputInterval: 60, initial: 'cold', integrator: 'implicit', rtol: 1e-7, atol: 1e-5, firingStartClockS: 6 * 3600 },
    limits: { acidDewMarginK: 5, waterDewMarginK: 0, shellTouchK: 333.15 },
  });
  const tau = (7850 * 480 * ((ri + thickness) ** 2 - ri * ri)) / (2 * ri * hIn);
  const crossing = (target: number) => (tau * Math.log((tGas - tAir) / (tGas - target))) / 60;

  it('reaches each dew point (plus margin), 90 % of the shell rise and the touch limit when the closed form says', () => {
    const result = simulate(inputs);
    const summary = summarise({ inputs, result, version: 'test' });
    const dew = flueGasDewPoints(composition, 101325);
    const w = summary.warmup!.top;
    // tolerance 0.1 min: outputs every minute, linearly interpolated (error ≈ Δt²/(8τ) ≈ 1 s), and the
    // inner surface runs ≈ 0.1 K above the wall mean (Bi ≈ 1e-3)
    expect(Math.abs(w.minutes_to_water_dew! - crossing(dew.waterDewPointK))).toBeLessThan(0.1);
    expect(Math.abs(w.minutes_to_acid_dew! - crossing(dew.acidDewPointK! + 5))).toBeLessThan(0.1);
    expect(Math.abs(w.minutes_to_shell_touch! - crossing(333.15))).toBeLessThan(0.1);
    // 90 % of the rise over the run: the run ends at T_g to within e^{−1440/9.4}
    expect(Math.abs(w.minutes_to_shell_90_percent! - (tau * Math.log(10)) / 60)).toBeLessThan(0.1);
    // the verdicts of a warm-up: the dew points are reached within the run
    expect(summary.verdicts.find((v) => v.limit === 'acid_dew_margin')!.status).toBe('pass');
    expect(Math.abs(result.energy.run.residualPercent)).toBeLessThan(0.1);
  });
});

describe('verdicts', () => {
  // Invented demo plant, run hot and clean so that every limit passes; then each limit in turn is
  // set just beyond the governing figure of that run, and exactly that limit must fail.
  const loaded = loadScenarioFile('scenarios/demo.yaml').inputs;
  const inputs: ModelInputs = {
    ...loaded,
    stack: { ...loaded.stack, segments: 4 },
    flue: {
      ...loaded.flue,
      composition: { N2: 0.74, O2: 0.04, CO2: 0.1, H2O: 0.12 - 2e-6, SO2: 0, SO3: 2e-6 },
      schedule: { daily: [{ clockS: 0, inletTemperatureK: 593.15, massFlow: 3 }] },
    },
    run: { ...loaded.run, length: { kind: 'days', days: 1 }, outputInterval: 1800 },
    limits: { shellTouchK: 400, liningServiceK: 1000, allowableStressPa: 100e6, acidDewMarginK: 5, waterDewMarginK: 5 },
  };
  const result = simulate(inputs);
  const verdictsWith = (limits: LimitsInput) => summarise({ inputs: { ...inputs, limits }, result, version: 'test' }).verdicts;

  it('a scenario built to pass them all passes', () => {
    const v = verdictsWith(inputs.limits);
    expect(v.map((x) => x.status)).toEqual(['pass', 'pass', 'pass', 'pass', 'pass']);
  });

  it.each([
    ['shell_touch', (g: number) => ({ shellTouchK: g + 273.15 - 0.5 })],
    ['lining_service', (g: number) => ({ liningServiceK: g + 273.15 - 0.5 })],
    ['allowable_stress', (g: number) => ({ allowableStressPa: g * 1e6 * 0.9 })],
    ['acid_dew_margin', (g: number) => ({ acidDewMarginK: g + 0.5 })],
    ['water_dew_margin', (g: number) => ({ waterDewMarginK: g + 0.5 })],
  ] as const)('a scenario built to fail %s fails exactly that limit', (limit, failing) => {
    const governing = verdictsWith(inputs.limits).find((v) => v.limit === limit)!.governing_value!;
    const v = verdictsWith({ ...inputs.limits, ...failing(governing) });
    for (const x of v) expect(x.status, x.limit).toBe(x.limit === limit ? 'fail' : 'pass');
  });

  it('a limit that is not set is reported as not set, never as a pass', () => {
    const v = verdictsWith({});
    expect(v.find((x) => x.limit === 'shell_touch')!.status).toBe('not-set');
  });
});

describe('time and fraction helpers', () => {
  it('interpolate crossings linearly', () => {
    expect(timeToReach([0, 10, 20], [0, 10, 20], 15)).toBe(15);
    expect(timeToReach([0, 10], [0, 1], 5)).toBeNull();
    // stays above only from the last upward crossing on
    expect(timeToStayAbove([0, 10, 20, 30], [0, 10, 0, 10], 5)).toBe(25);
    expect(fractionBelowZero(-1, 1)).toBe(0.5);
    expect(fractionBelowZero(1, -3)).toBe(0.75);
  });
});

describe('run warnings', () => {
  const loaded = loadScenarioFile('scenarios/demo.yaml').inputs;

  it('flag a correlation used outside its published range (Churchill–Chu on a tall stack, Ra_H > 1e12)', () => {
    const inputs: ModelInputs = { ...loaded, stack: { ...loaded.stack, segments: 2 }, run: { ...loaded.run, length: { kind: 'days', days: 1 }, outputInterval: 3600 } };
    const result = simulate(inputs);
    expect(result.warnings.some((w) => /nuVerticalPlateChurchillChu: ra = .* outside \[0\.1, 1\.00e\+12\]/.test(w))).toBe(true);
    const summary = summarise({ inputs, result, version: 'test' });
    expect(summary.warnings).toEqual(expect.arrayContaining([...result.warnings]));
  });

  it('say plainly when the periodic state was not reached, and still give every figure', () => {
    const inputs: ModelInputs = {
      ...loaded,
      stack: { ...loaded.stack, segments: 2 },
      run: { ...loaded.run, length: { kind: 'until-periodic', toleranceK: 1e-6, maxDays: 2 }, outputInterval: 3600 },
    };
    const result = simulate(inputs);
    expect(result.daysSimulated).toBe(2);
    expect(result.periodic?.reached).toBe(false);
    const summary = summarise({ inputs, result, version: 'test' });
    expect(summary.run.periodic_reached).toBe(false);
    expect(summary.warnings.some((w) => /periodic state was NOT reached in 2 days/.test(w))).toBe(true);
    expect(Number.isFinite(summary.peak_shell_c)).toBe(true);
  });
});
