/**
 * Stiffness and its cost to an explicit integrator: the Gershgorin bound against the known
 * eigenvalues of the discrete heat equation, the Dormand–Prince stability limit against the
 * integrator itself, and the step estimate against the steps the integrator really takes.
 */
import { describe, it, expect } from 'vitest';
import {
  gershgorinSpectralBound,
  stabilityLimitedSteps,
  DORMAND_PRINCE_REAL_STABILITY_LIMIT,
  integrateDormandPrince,
  type OdeSystem,
} from '../../src/solver/index.ts';
import { heatEquation } from './fixtures.ts';

// the heat equation's eigenvalues are −4c sin²(kπ/(2(N+1))), c = 1/Δx² (a standard result for the second-difference matrix)

describe('gershgorinSpectralBound', () => {
  it('bounds the heat-equation matrix by 4c, within 0.1 % of its largest eigenvalue for N = 50', () => {
    const n = 50;
    const sys = heatEquation(n);
    const [lower, diag, upper] = [new Float64Array(n), new Float64Array(n), new Float64Array(n)];
    sys.jacobian!(0, new Float64Array(n), lower, diag, upper);
    const { bound } = gershgorinSpectralBound(lower, diag, upper);
    const largest = 4 * sys.c * Math.sin((n * Math.PI) / (2 * (n + 1))) ** 2;
    expect(bound).toBe(4 * sys.c);
    expect(bound).toBeGreaterThanOrEqual(largest); // a bound: never below the true value
    expect(bound / largest - 1).toBeLessThan(1e-3); // 1 − sin²(50π/102) = 9.5e-4
  });

  it('names the row that sets the bound, and ignores lower[0] and upper[n−1]', () => {
    const lower = Float64Array.from([1e9, 1, 1]);
    const diag = Float64Array.from([-2, -9, -2]);
    const upper = Float64Array.from([1, 1, 1e9]);
    expect(gershgorinSpectralBound(lower, diag, upper)).toEqual({ bound: 11, row: 1 });
  });
});

describe('the Dormand–Prince real stability limit', () => {
  /** |y| after 200 fixed steps of size h on y' = λy, y(0) = 1 (tolerances so loose that every step is accepted). */
  function afterFixedSteps(hLambda: number): number {
    const lambda = -1;
    const h = hLambda / Math.abs(lambda);
    const decay: OdeSystem = { size: 1, auxSize: 0, rhs: (_t, y, dydt) => void (dydt[0] = lambda * y[0]!) };
    const r = integrateDormandPrince(decay, Float64Array.from([1]), 0, [200 * h], { rtol: 1e300, atol: 1e300, initialStep: h, maxStep: h });
    expect(r.stats.steps).toBe(200);
    return Math.abs(r.y[0]!);
  }

  it('steps with h|λ| just inside the limit decay, just outside they grow (the integrator as implemented)', () => {
    // 1 % either side of 3.3066: |R| = 0.94 inside, 1.06 outside (the stability polynomial of the module note), so
    // after 200 steps |y| is about 5e-6 and 2e5: the thresholds 0.1 and 10 leave orders of magnitude either way
    expect(afterFixedSteps(0.99 * DORMAND_PRINCE_REAL_STABILITY_LIMIT)).toBeLessThan(0.1);
    expect(afterFixedSteps(1.01 * DORMAND_PRINCE_REAL_STABILITY_LIMIT)).toBeGreaterThan(10);
  });
});

describe('stabilityLimitedSteps', () => {
  it('the worked example: radius 2 s⁻¹ over a day → 52 260 steps', () => {
    expect(stabilityLimitedSteps(2, 86_400)).toBe(52_260);
  });

  it('matches the steps Dormand–Prince takes on a stiff problem with loose tolerances, within 10 %', () => {
    // heat equation, N = 50, from a step profile over t = 0.5: once the fast modes have decayed the
    // accuracy-limited step would be far longer than the stability limit 3.3066/(4c), so the adaptive
    // step hovers at that limit (with rejected steps between); the first few steps, set by accuracy,
    // are a small part of the count
    const sys = heatEquation(50);
    const y0 = Float64Array.from({ length: 50 }, (_, i) => (i < 25 ? 1 : 0));
    const r = integrateDormandPrince(sys, y0, 0, [0.5], { rtol: 1e-3, atol: 1e-3 });
    const estimate = stabilityLimitedSteps(4 * sys.c, 0.5);
    expect(r.stats.steps / estimate).toBeGreaterThan(0.9);
    expect(r.stats.steps / estimate).toBeLessThan(1.1);
  });
});
