/** The flow in a round flue as a whole: velocity, Reynolds number, speed of sound. */
import { describe, it, expect } from 'vitest';
import { meanGasVelocity, pipeReynolds, speedOfSoundIdealGas } from '../../../src/physics/flue/flow.ts';
import { MOLAR_MASS_AIR } from '../../../src/physics/constants.ts';

describe('speedOfSoundIdealGas', () => {
  it('dry air at 20 °C: 343.2 m/s', () => {
    // 343.2 m/s at 20 °C is the handbook value for dry air (from memory; ISO 9613-1 uses it as its
    // reference); c_p of air near 300 K is 1006–1007 J/(kg K) (Incropera & DeWitt Table A.4, from memory).
    // Tolerance 0.1 %: c_p uncertain by ±1 J/(kg K) moves γ, and a, by under 0.02 %.
    expect(speedOfSoundIdealGas(293.15, MOLAR_MASS_AIR, 1006)).toBeCloseTo(343.2, 0);
    expect(Math.abs(speedOfSoundIdealGas(293.15, MOLAR_MASS_AIR, 1006) / 343.2 - 1)).toBeLessThan(1e-3);
  });

  it('dry air at 0 °C: 331.3 m/s, and a ∝ √T at fixed γ', () => {
    // 331.3 m/s at 0 °C (textbook value, from memory); tolerance 0.1 % as above
    expect(Math.abs(speedOfSoundIdealGas(273.15, MOLAR_MASS_AIR, 1006) / 331.3 - 1)).toBeLessThan(1e-3);
    // same γ, four times the temperature: twice the speed (exact for the formula's ideal gas)
    expect(speedOfSoundIdealGas(4 * 300, MOLAR_MASS_AIR, 1006)).toBeCloseTo(2 * speedOfSoundIdealGas(300, MOLAR_MASS_AIR, 1006), 9);
  });
});

describe('meanGasVelocity and pipeReynolds', () => {
  it('the worked example: 3.2 kg/s of gas at 0.74 kg/m³ in a 1.4 m flue moves at 2.81 m/s', () => {
    // hand computation: A = π 1.4² / 4 = 1.5394 m², v = 3.2 / (0.74 · 1.5394) = 2.809 m/s
    expect(meanGasVelocity(3.2, 0.74, 1.4)).toBeCloseTo(2.809, 3);
  });

  it('Re from the mass flow equals ρ v D / μ from the velocity (two routes, one number)', () => {
    const [m, rho, d, mu] = [3.2, 0.74, 1.4, 2.5e-5];
    const v = meanGasVelocity(m, rho, d);
    expect(pipeReynolds(m, d, mu)).toBeCloseTo((rho * v * d) / mu, 6);
    // the flue side's own worked example (physics/flue/inside.ts): Re = 116 410
    expect(pipeReynolds(m, d, mu)).toBeCloseTo(116_410, -1);
  });
});
