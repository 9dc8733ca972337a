import { describe, it, expect } from 'vitest';
import {
  frictionFactorPetukhov,
  nuPipeGnielinski,
  nuPipeBlended,
  NU_PIPE_LAMINAR_CONSTANT_WALL,
} from '../../../src/physics/correlations/internal.ts';

describe('frictionFactorPetukhov', () => {
  it('matches the formula worked by hand at Re = 10⁴', () => {
    // Petukhov (1970): ln 10⁴ = 9.210340, 0.790·9.210340 − 1.64 = 5.636169, f = 1/5.636169² = 0.0314798.
    // Tolerance 5e-7: seven-figure hand arithmetic.
    expect(frictionFactorPetukhov(1e4)).toBeCloseTo(0.0314798, 6);
  });

  it('agrees with the Blasius smooth-pipe law within 1 % at Re = 10⁴', () => {
    // Blasius (1913): f = 0.316 Re^−¼ = 0.0316 at Re = 10⁴ (independent correlation, valid to 10⁵).
    // Tolerance 1 %: the two fits to smooth-pipe data differ by about 0.4 % here.
    expect(Math.abs(frictionFactorPetukhov(1e4) / 0.0316 - 1)).toBeLessThan(0.01);
  });
});

describe('nuPipeGnielinski', () => {
  it('matches the formula worked by hand at Re = 10⁵, Pr = 0.7', () => {
    // Gnielinski (1976) with Petukhov f: ln 10⁵ = 11.512925, bracket = 7.455211, f = 0.0179920,
    // f/8 = 0.00224900; numerator = 0.002249·99000·0.7 = 155.8559;
    // 0.7^⅔ − 1 = −0.2116265; denominator = 1 + 12.7·√0.002249·(−0.2116265) = 0.8725415;
    // Nu = 155.8559/0.8725415 = 178.6230. Tolerance 1e-3: seven-figure hand arithmetic.
    expect(nuPipeGnielinski(1e5, 0.7)).toBeCloseTo(178.623, 3);
  });

  it('agrees with Dittus–Boelter within 15 % for heated gas at Re = 10⁵', () => {
    // Dittus–Boelter (heating, n = 0.4): 0.023·10⁵^0.8·0.7^0.4 = 199.42 (Incropera eq. 8.60).
    // Tolerance 15 %: the textbooks quote errors up to 25 % for Dittus–Boelter and about 10 % for
    // Gnielinski; they differ by about 10 % here.
    expect(Math.abs(nuPipeGnielinski(1e5, 0.7) / 199.42 - 1)).toBeLessThan(0.15);
  });

  it('uses a supplied friction factor instead of Petukhov', () => {
    // With f = 0.02 at Re = 10⁵, Pr = 1: Pr^⅔ − 1 = 0 → Nu = (0.02/8)·99000·1 = 247.5 exactly.
    expect(nuPipeGnielinski(1e5, 1, 0.02)).toBeCloseTo(247.5, 9);
    expect(nuPipeGnielinski(1e5, 0.7, frictionFactorPetukhov(1e5))).toBe(nuPipeGnielinski(1e5, 0.7));
  });
});

describe('nuPipeBlended', () => {
  it('gives the laminar constant-wall value 3.66 up to Re = 2300', () => {
    // Graetz solution, Nu = 3.66 (Incropera eq. 8.55).
    expect(NU_PIPE_LAMINAR_CONSTANT_WALL).toBe(3.66);
    for (const re of [0, 1, 7.98, 100, 2000, 2300]) expect(nuPipeBlended(re, 0.7)).toBe(3.66);
  });

  it('equals Gnielinski from Re = 10⁴ upward', () => {
    for (const re of [1e4, 5e4, 1e6]) expect(nuPipeBlended(re, 0.7)).toBe(nuPipeGnielinski(re, 0.7));
  });

  it('interpolates linearly in Re between 2300 and 10⁴ (Gnielinski 2013)', () => {
    // Midpoint Re = 6150 (γ = ½): (3.66 + Nu_G(10⁴, 0.7))/2; Nu_G(10⁴, 0.7) by hand = 29.8174
    // (f = 0.0314798, f/8 = 0.00393497, num = 24.7903, den = 1 + 12.7·0.0627294·(−0.2116265) = 0.831404),
    // → 16.7387. Tolerance 1e-3: hand arithmetic.
    expect(nuPipeBlended(6150, 0.7)).toBeCloseTo(16.7387, 3);
  });

  it('is continuous across both ends of the transition', () => {
    // A jump would show as a difference not shrinking with ε; with ε = 10⁻⁶ in Re the slope
    // (≤ 0.004 per unit Re here) allows at most ~1e-8.
    const eps = 1e-6;
    for (const pr of [0.7, 1, 5]) {
      expect(Math.abs(nuPipeBlended(2300 + eps, pr) - nuPipeBlended(2300 - eps, pr))).toBeLessThan(1e-7);
      expect(Math.abs(nuPipeBlended(1e4 + eps, pr) - nuPipeBlended(1e4 - eps, pr))).toBeLessThan(1e-7);
    }
  });

  it('never decreases with Re through the transition for gases', () => {
    let previous = 0;
    for (let re = 0; re <= 2e4; re += 50) {
      const nu = nuPipeBlended(re, 0.7);
      expect(nu).toBeGreaterThanOrEqual(previous);
      previous = nu;
    }
  });

  it('never returns NaN for Re ≥ 0', () => {
    for (const re of [0, 1e-9, 7.98, 2300, 2300.0001, 3000, 9999.999, 1e4, 5e6, 1e8]) {
      expect(Number.isNaN(nuPipeBlended(re, 0.7))).toBe(false);
    }
  });
});
