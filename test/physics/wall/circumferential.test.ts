/** Circumferential conduction and the thermal bow of a stack. */
import { describe, it, expect } from 'vitest';
import { circumferentialConductancePerMetre, thermalBowCurvature, cantileverTipDeflection } from '../../../src/physics/wall/circumferential.ts';

describe('circumferential conductance', () => {
  it('makes the first harmonic of a thin ring decay at α/r², as the heat equation on a circle does', () => {
    // Carslaw & Jaeger, Conduction of Heat in Solids (1959): on a ring of radius r, T = cos φ · e^(−α t/r²).
    // A ring of n sector cells (capacity ρ c r Δφ Δr per metre, conductance from the formula) has the
    // discrete rate (G/C)·2(1 − cos Δφ), which must approach α/r² as n grows (second order in Δφ).
    const k = 50;
    const rho = 7850;
    const cp = 460;
    const r = 0.8;
    const dr = 0.008;
    const alpha = k / (rho * cp);
    for (const n of [16, 36, 72]) {
      const dphi = (2 * Math.PI) / n;
      const g = circumferentialConductancePerMetre(k, dr, r, dphi);
      const c = rho * cp * r * dphi * dr;
      const rate = (g / c) * 2 * (1 - Math.cos(dphi));
      // error of the second difference of cos: Δφ²/12 relative
      expect(Math.abs(rate / (alpha / (r * r)) - 1)).toBeLessThan((dphi * dphi) / 12 + 1e-12);
    }
    // worked example of the doc comment
    expect(circumferentialConductancePerMetre(50, 0.008, 0.8, (2 * Math.PI) / 16)).toBeCloseTo(1.2732, 4);
  });
});

describe('thermal bow', () => {
  it('gives κ H²/2 at the tip of a uniformly curved cantilever (beam theory, common practice)', () => {
    const kappa = thermalBowCurvature(12e-6, 20, 1.6);
    expect(kappa).toBeCloseTo(1.5e-4, 12);
    for (const n of [1, 5, 12]) expect(cantileverTipDeflection(new Array(n).fill(kappa), 45)).toBeCloseTo((kappa * 45 * 45) / 2, 12);
  });

  it('weighs curvature near the base more than near the top (moment-area: lever arm H − z)', () => {
    // curvature only in the bottom half of a 40 m stack: δ = κ ∫₀²⁰ (40 − z) dz = κ (800 − 200) = 600 κ
    expect(cantileverTipDeflection([1e-4, 0], 40)).toBeCloseTo(600 * 1e-4, 12);
    expect(cantileverTipDeflection([0, 1e-4], 40)).toBeCloseTo(200 * 1e-4, 12);
  });
});
