import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import {
  INTEGRATORS,
  IntegrationError,
  integrateDormandPrince,
  integrateTrBdf2,
  type OdeSystem,
} from '../../src/solver/index.ts';
import { heatEquation } from './fixtures.ts';

/**
 * The odex reference solver (devDependency). Loaded through `require` with the small typed surface
 * used here, because `import 'odex'` makes tsc type-check the package's own TypeScript source,
 * which does not compile under this project's strict settings.
 */
interface OdexSolver {
  absoluteTolerance: number;
  relativeTolerance: number;
  maxSteps: number;
  solve(f: (x: number, y: number[]) => number[], x0: number, y0: number[], xEnd: number): { y: number[]; outcome: number };
}
const { Solver } = createRequire(import.meta.url)('odex') as { Solver: new (n: number) => OdexSolver };

/** Van der Pol oscillator y1' = y2, y2' = μ (1 − y1²) y2 − y1 (nonstiff for μ = 1). */
const MU = 1;
const vanDerPol: OdeSystem = {
  size: 2,
  auxSize: 0,
  rhs(_t, y, dydt) {
    dydt[0] = y[1];
    dydt[1] = MU * (1 - y[0] * y[0]) * y[1] - y[0];
  },
};

/** Scalar y' = −y with the quadrature rate aux = y (∫₀ᵗ y dt = 1 − e^{−t} for y(0) = 1). */
const decayWithQuadrature: OdeSystem = {
  size: 1,
  auxSize: 1,
  rhs(_t, y, dydt, aux) {
    dydt[0] = -y[0];
    aux[0] = y[0];
  },
};

function maxAbsDifference(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let m = 0;
  for (let i = 0; i < a.length; i++) m = Math.max(m, Math.abs(a[i] - b[i]));
  return m;
}

describe('integrateDormandPrince against the odex extrapolation solver', () => {
  it('agrees with odex on Van der Pol (μ = 1) at every stop up to t = 20', () => {
    const stops = [1, 2, 5, 10, 20];
    // Reference: odex (Hairer & Wanner's ODEX, Gragg–Bulirsch–Stoer extrapolation) at 1e-13.
    const reference = new Solver(2);
    reference.absoluteTolerance = 1e-13;
    reference.relativeTolerance = 1e-13;
    reference.maxSteps = 100_000;
    const expected = stops.map((T) => {
      const r = reference.solve((_x, y) => [y[1], MU * (1 - y[0] ** 2) * y[1] - y[0]], 0, [2, 0], T);
      expect(r.outcome).toBe(0); // Outcome.Converged
      return r.y;
    });
    for (const [tol, allowance] of [
      // A neutrally stable limit cycle lets local errors add up (phase drift) over ~10 periods'
      // worth of steps: allowance 100 × tol.
      [1e-6, 1e-4],
      [1e-9, 1e-7],
    ]) {
      let k = 0;
      integrateDormandPrince(vanDerPol, new Float64Array([2, 0]), 0, stops, { rtol: tol, atol: tol }, (t, y) => {
        expect(t).toBe(stops[k]);
        expect(maxAbsDifference(y, expected[k])).toBeLessThan(allowance);
        k++;
      });
      expect(k).toBe(stops.length);
    }
  });
});

describe('integrateDormandPrince accuracy', () => {
  it('converges with order 5 under fixed steps on y\' = y cos t (exact y = exp(sin t))', () => {
    const system: OdeSystem = { size: 1, auxSize: 0, rhs: (t, y, dydt) => void (dydt[0] = y[0] * Math.cos(t)) };
    const T = 2;
    const errors = [10, 20, 40].map((steps) => {
      const h = T / steps;
      // Tolerances so loose that every step is accepted: fixed steps of h.
      const result = integrateDormandPrince(system, new Float64Array([1]), 0, [T], { rtol: 1e3, atol: 1e3, initialStep: h, maxStep: h });
      expect(result.stats.steps).toBe(steps);
      return Math.abs(result.y[0] - Math.exp(Math.sin(T)));
    });
    for (let j = 1; j < errors.length; j++) {
      // Dormand & Prince (1980): fifth-order solution; pre-asymptotic terms at h = 0.2 still add
      // a few tenths to the observed order.
      const observedOrder = Math.log2(errors[j - 1] / errors[j]);
      expect(observedOrder).toBeGreaterThan(4.7);
      expect(observedOrder).toBeLessThan(5.5);
    }
  });
});

describe('TR-BDF2 and Dormand–Prince on the stiff heat equation', () => {
  it('agree with each other and with the exact mode decay, TR-BDF2 with ≥ 20× fewer rhs evaluations', () => {
    const nodes = 100;
    const dx = 1 / (nodes + 1);
    const mode = new Float64Array(nodes).map((_, i) => Math.sin(Math.PI * (i + 1) * dx));
    // Exact decay rate of the discrete first mode, (4/Δx²) sin²(π/(2(N + 1))) (eigenvalues of the
    // second-difference matrix; checked numerically in trbdf2.test.ts).
    const rate = (4 / (dx * dx)) * Math.sin(Math.PI / (2 * (nodes + 1))) ** 2;
    const T = 0.3;
    const exact = mode.map((v) => v * Math.exp(-rate * T));
    const options = { rtol: 1e-5, atol: 1e-7 };
    const implicit = integrateTrBdf2(heatEquation(nodes), mode, 0, [T], options);
    const explicit = integrateDormandPrince(heatEquation(nodes), mode, 0, [T], options);
    // Local tolerance ≈ 1e-5 for |y| ≤ 1; decaying problem: 10 × that bounds the global error.
    expect(maxAbsDifference(implicit.y, exact)).toBeLessThan(1e-4);
    expect(maxAbsDifference(explicit.y, exact)).toBeLessThan(1e-4);
    expect(maxAbsDifference(implicit.y, explicit.y)).toBeLessThan(1e-4);
    // Stiffness: λ_max ≈ 4/Δx² ≈ 4e4 caps the explicit step near 3.3/λ_max (stability), while the
    // L-stable method steps by accuracy on the slow mode alone (docs/model.md, "Time integration").
    expect(explicit.stats.rhsEvaluations).toBeGreaterThanOrEqual(20 * implicit.stats.rhsEvaluations);
  });
});

describe('integrateDormandPrince step mechanics', () => {
  it('lands on every stop bit for bit', () => {
    const stops = [0.1, 1 / 3, Math.PI / 4, 1.7, 2.0000000001, 5];
    const seen: number[] = [];
    integrateDormandPrince(decayWithQuadrature, new Float64Array([1]), 0, stops, { rtol: 1e-9, atol: 1e-12 }, (t, y) => {
      seen.push(t);
      // Exact solution e^{−t}; allowance 100 × rtol (local-error control only).
      expect(Math.abs(y[0] - Math.exp(-t))).toBeLessThan(1e-7);
    });
    expect(seen.length).toBe(stops.length);
    for (let s = 0; s < stops.length; s++) expect(Object.is(seen[s], stops[s])).toBe(true);
  });

  it('integrates the quadrature channel: ∫₀ᵗ e^{−s} ds = 1 − e^{−t}, exactly consistent with y', () => {
    const result = integrateDormandPrince(decayWithQuadrature, new Float64Array([1]), 0, [0.5, 1, 2, 4], { rtol: 1e-9, atol: 1e-12 }, (t, y, auxIntegral) => {
      // Analytic integral; allowance 100 × rtol.
      expect(Math.abs(auxIntegral[0] - (1 - Math.exp(-t)))).toBeLessThan(1e-7);
      // Same stages, same weights: y + ∫aux = y0 up to rounding only.
      expect(Math.abs(y[0] + auxIntegral[0] - 1)).toBeLessThan(1e-13);
    });
    expect(result.auxIntegral[0]).toBeCloseTo(1 - Math.exp(-4), 7); // same allowance as above
  });

  it('throws an IntegrationError naming the non-finite value when rhs returns NaN', () => {
    const nanLater: OdeSystem = { size: 1, auxSize: 0, rhs: (t, y, dydt) => void (dydt[0] = t > 0.5 ? NaN : -y[0]) };
    let error: unknown;
    try {
      integrateDormandPrince(nanLater, new Float64Array([1]), 0, [1], { rtol: 1e-6, atol: 1e-8 });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(IntegrationError);
    expect((error as IntegrationError).message).toMatch(/non-finite/);
    expect((error as IntegrationError).t).toBeLessThanOrEqual(0.5);
  });

  it('throws an IntegrationError when more than maxSteps attempts are needed', () => {
    expect(() =>
      integrateDormandPrince(vanDerPol, new Float64Array([2, 0]), 0, [20], { rtol: 1e-10, atol: 1e-10, maxSteps: 10 }),
    ).toThrow(/maxSteps = 10/);
  });

  it('is selectable by name next to the implicit integrator', () => {
    expect(INTEGRATORS.rk45).toBe(integrateDormandPrince);
    expect(INTEGRATORS.implicit).toBe(integrateTrBdf2);
  });
});

describe('dense output', () => {
  it('fills instants inside steps by cubic Hermite to within the tolerance (y′ = −y, exact e^{−t})', () => {
    const decay: OdeSystem = { size: 1, auxSize: 0, rhs: (_t, y, d) => void (d[0] = -y[0]) };
    const instants = Array.from({ length: 50 }, (_, i) => 0.1 * (i + 1));
    const got: number[] = [];
    const res = integrateDormandPrince(decay, Float64Array.of(1), 0, [5], { rtol: 1e-6, atol: 1e-8 }, undefined, { instants, onOutput: (_t, y) => got.push(y[0]) });
    expect(got).toHaveLength(50);
    // Hermite error h⁴/384·max|y⁗| with the steps this tolerance gives (≈0.2–0.4) is below 1e-5
    for (let i = 0; i < 50; i++) expect(Math.abs(got[i]! - Math.exp(-instants[i]!))).toBeLessThan(1e-5);
    expect(res.stats.steps).toBeLessThan(50);
  });
});
