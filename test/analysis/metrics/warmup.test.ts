/** Warm-up times: against the lumped-capacitance closed form, and the crossing helpers they rest on. */
import { describe, it, expect } from 'vitest';
import { simulate } from '../../../src/model/simulate.ts';
import { summarise, timeToStayAbove, timeToReach } from '../../../src/analysis/metrics/index.ts';
import { flueGasDewPoints } from '../../../src/physics/flue/dewPoint.ts';
import type { ModelInputs } from '../../../src/model/inputs.ts';
import { constantMaterial, layer, fixedFilmInputs } from '../../model/fixtures.ts';

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

describe('time helpers', () => {
  it('interpolate crossings linearly', () => {
    expect(timeToReach([0, 10, 20], [0, 10, 20], 15)).toBe(15);
    expect(timeToReach([0, 10], [0, 1], 5)).toBeNull();
    // stays above only from the last upward crossing on
    expect(timeToStayAbove([0, 10, 20, 30], [0, 10, 0, 10], 5)).toBe(25);
  });
});
