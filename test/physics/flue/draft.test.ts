import { describe, expect, it } from 'vitest';
import { stackDraftPa } from '../../../src/physics/flue/draft.ts';

describe('stackDraftPa', () => {
  it('is g H (ρ_air − ρ_gas)', () => {
    // Hand calculation: 9.80665 × 50 × (1.20 − 0.70) = 245.166 Pa.
    expect(stackDraftPa(50, 1.2, 0.7)).toBeCloseTo(245.16625, 9);
  });

  it('matches the handbook draft formula 0.0342 · p · H · (1/T_air − 1/T_gas)', () => {
    // Draft formula for ideal gases of the molar mass of air, Δp = C p H (1/T_o − 1/T_i) with
    // C = g M_air / R = 0.0342 K/m (as quoted from Perry's Chemical Engineers' Handbook; from memory).
    // Densities here: ideal-gas air at 288.15 K and at 473.15 K, 101 325 Pa, 40 m.
    // Tolerance 0.2 %: the handbook constant is rounded to 3 figures (exact 0.03416).
    const rho = (T: number) => (101325 * 0.0289644) / (8.314462618 * T);
    const expected = 0.0342 * 101325 * 40 * (1 / 288.15 - 1 / 473.15);
    expect(Math.abs(stackDraftPa(40, rho(288.15), rho(473.15)) / expected - 1)).toBeLessThan(0.002);
  });

  it('is negative when the gas is denser than the air', () => {
    expect(stackDraftPa(10, 1.0, 1.2)).toBeLessThan(0);
  });
});
