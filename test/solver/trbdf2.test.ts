import { describe, expect, it } from 'vitest';
import { IntegrationError, integrateTrBdf2, type OdeSystem } from '../../src/solver/index.ts';
import { heatEquation } from './fixtures.ts';

/**
 * Prothero–Robinson problem y' = −λ (y − cos t) − sin t, y(0) = 1, exact solution y = cos t for
 * every λ (A. Prothero & A. Robinson 1974, Math. Comp. 28:145–162).
 */
function protheroRobinson(lambda: number): OdeSystem {
  return {
    size: 1,
    auxSize: 0,
    rhs(t, y, dydt) {
      dydt[0] = -lambda * (y[0] - Math.cos(t)) - Math.sin(t);
    },
    jacobian(_t, _y, _lower, diag) {
      diag[0] = -lambda;
    },
  };
}

/**
 * Discrete sine mode k of the N-node heat equation and its decay rate
 * λ_k = (4/Δx²) sin²(kπ / (2(N + 1))): the eigenpairs of the second-difference matrix
 * (e.g. R. J. LeVeque 2007, Finite Difference Methods for ODEs and PDEs, SIAM, Sect. 2.10; from
 * memory, and re-checked numerically in the test below), so y(t) = mode · exp(−λ_k t) exactly.
 */
function sineMode(nodes: number, k: number): { mode: Float64Array; rate: number } {
  const dx = 1 / (nodes + 1);
  const mode = new Float64Array(nodes).map((_, i) => Math.sin(k * Math.PI * (i + 1) * dx));
  const rate = (4 / (dx * dx)) * Math.sin((k * Math.PI) / (2 * (nodes + 1))) ** 2;
  return { mode, rate };
}

function maxAbsDifference(a: Float64Array, b: Float64Array): number {
  let m = 0;
  for (let i = 0; i < a.length; i++) m = Math.max(m, Math.abs(a[i] - b[i]));
  return m;
}

/** Options that force fixed steps h: tolerances so loose that every step is accepted. */
function fixedStep(h: number) {
  return { rtol: 1e3, atol: 1e3, initialStep: h, maxStep: h };
}

/** Scalar y' = −y with the quadrature rate aux = y (so ∫₀ᵗ y dt = 1 − e^{−t} for y(0) = 1). */
const decayWithQuadrature: OdeSystem = {
  size: 1,
  auxSize: 1,
  rhs(_t, y, dydt, aux) {
    dydt[0] = -y[0];
    aux[0] = y[0];
  },
  jacobian(_t, _y, _lower, diag) {
    diag[0] = -1;
  },
};

describe('integrateTrBdf2 on the Prothero–Robinson problem', () => {
  const stops = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10];

  function run(lambda: number, tol: number) {
    let maxError = 0;
    const result = integrateTrBdf2(protheroRobinson(lambda), new Float64Array([1]), 0, stops, { rtol: tol, atol: tol }, (t, y) => {
      maxError = Math.max(maxError, Math.abs(y[0] - Math.cos(t)));
    });
    return { maxError, stats: result.stats };
  }

  it('meets the tolerance in the stiff case λ = 1e6 with a step count independent of λ', () => {
    const stiff = run(1e6, 1e-6);
    const mild = run(1, 1e-6);
    // Stiff limit: the method is stiffly accurate, so the error is O(1/λ) plus the damped local
    // errors; a global error of 10 × tol is the usual allowance for local-error control.
    expect(stiff.maxError).toBeLessThan(1e-5);
    // Stability is not the bound: an explicit method would need h < ~3/λ, i.e. ~3e6 steps here
    // (Dormand–Prince stability interval ≈ 3.3, Hairer & Wanner, Solving ODEs II); the implicit
    // method needs no more steps than for the nonstiff λ = 1.
    expect(stiff.stats.steps).toBeLessThan(100);
    expect(stiff.stats.steps).toBeLessThanOrEqual(mild.stats.steps);
  });

  it('meets the tolerance in the nonstiff case λ = 1 and its error shrinks like tol^(2/3)', () => {
    const loose = run(1, 1e-4);
    const tight = run(1, 1e-6);
    // Local-error control does not bound the global error on a nonstiff problem over 10 time
    // units (errors add up over ~300 steps without damping); 100 × tol is the allowance.
    expect(tight.maxError).toBeLessThan(1e-4);
    // A second-order method with error-per-step control gives global error ∝ tol^(p/(p+1)) = tol^(2/3):
    // 100× tighter tolerance → ~21.5× smaller error; the band allows the controller's granularity.
    const ratio = loose.maxError / tight.maxError;
    expect(ratio).toBeGreaterThan(10);
    expect(ratio).toBeLessThan(45);
  });
});

describe('integrateTrBdf2 on the semi-discrete heat equation', () => {
  it('uses a sine mode that is an exact eigenvector of the discretisation (check of the reference)', () => {
    const nodes = 20;
    const { mode, rate } = sineMode(nodes, 3);
    const dydt = new Float64Array(nodes);
    heatEquation(nodes).rhs(0, mode, dydt, new Float64Array(0));
    // Exact identity up to rounding of sums of terms of size 1/Δx² ≈ 441.
    for (let i = 0; i < nodes; i++) expect(Math.abs(dydt[i] + rate * mode[i])).toBeLessThan(1e-10);
  });

  it('follows the exact decay exp(−λ_k t) of a mix of modes within the tolerance', () => {
    const nodes = 40;
    const m1 = sineMode(nodes, 1);
    const m7 = sineMode(nodes, 7);
    const y0 = new Float64Array(nodes).map((_, i) => m1.mode[i] + 0.5 * m7.mode[i]);
    const stops = [0.01, 0.05, 0.1, 0.2, 0.3];
    let maxError = 0;
    integrateTrBdf2(heatEquation(nodes), y0, 0, stops, { rtol: 1e-5, atol: 1e-7 }, (t, y) => {
      const exact = new Float64Array(nodes).map(
        (_, i) => m1.mode[i] * Math.exp(-m1.rate * t) + 0.5 * m7.mode[i] * Math.exp(-m7.rate * t),
      );
      maxError = Math.max(maxError, maxAbsDifference(y, exact));
    });
    // Local error per step ≤ atol + rtol·|y| ≈ 1e-5 for |y| ≤ 1; the decaying problem damps
    // earlier errors, so 10 × that is a safe bound on the global error.
    expect(maxError).toBeLessThan(1e-4);
  });

  it('converges with order 2 under fixed steps (error falls by ~4 when h halves)', () => {
    const nodes = 20;
    const { mode, rate } = sineMode(nodes, 1);
    const T = 0.2;
    const errors = [10, 20, 40].map((steps) => {
      const result = integrateTrBdf2(heatEquation(nodes), mode, 0, [T], fixedStep(T / steps));
      expect(result.stats.steps).toBe(steps); // really fixed steps, no splitting before the stop
      return maxAbsDifference(result.y, mode.map((v) => v * Math.exp(-rate * T)));
    });
    for (let j = 1; j < errors.length; j++) {
      const observedOrder = Math.log2(errors[j - 1] / errors[j]);
      // TR-BDF2 is second order (Bank et al. 1985); at λ_1 h ≤ 0.2 the asymptotic regime holds to
      // a few per cent.
      expect(observedOrder).toBeGreaterThan(1.85);
      expect(observedOrder).toBeLessThan(2.15);
    }
  });

  it('reaches the same answer when the Jacobian leaves out the coupling (only Newton slows down)', () => {
    const nodes = 20;
    const { mode, rate } = sineMode(nodes, 1);
    const T = 0.1;
    const exact = mode.map((v) => v * Math.exp(-rate * T));
    const options = { rtol: 1e-6, atol: 1e-8 };
    const full = integrateTrBdf2(heatEquation(nodes, true), mode, 0, [T], options);
    const diagonalOnly = integrateTrBdf2(heatEquation(nodes, false), mode, 0, [T], options);
    // The global error is at most the sum of the local errors (each ≤ atol + rtol·|y| ≈ 1e-6),
    // weakly damped here (λ_1 T ≈ 1) over a few dozen steps: allowance 30 × the local tolerance.
    expect(maxAbsDifference(full.y, exact)).toBeLessThan(3e-5);
    expect(maxAbsDifference(diagonalOnly.y, exact)).toBeLessThan(3e-5);
    expect(diagonalOnly.stats.newtonIterations / diagonalOnly.stats.steps).toBeGreaterThan(
      full.stats.newtonIterations / full.stats.steps,
    );
  });
});

describe('integrateTrBdf2 step mechanics', () => {
  it('reproduces the TR-BDF2 stability function R(z) = (1 + (2w − d) z) / (1 − d z)² in one step', () => {
    // R(z) follows from the tableau (Hosea & Shampine 1996): z2 = (1 + dz)/(1 − dz) y0 and
    // (1 − dz) y1 = y0 + wz (y0 + z2); R(z) → 0 as z → −∞ (L-stability).
    const d = (2 - Math.SQRT2) / 2;
    const w = Math.SQRT2 / 4;
    const stability = (z: number) => (1 + (2 * w - d) * z) / (1 - d * z) ** 2;
    for (const lambdaH of [0.5, 10, 1e6]) {
      const lambda = lambdaH; // h = 1
      const system: OdeSystem = {
        size: 1,
        auxSize: 0,
        rhs: (_t, y, dydt) => void (dydt[0] = -lambda * y[0]),
        jacobian: (_t, _y, _l, diag) => void (diag[0] = -lambda),
      };
      const result = integrateTrBdf2(system, new Float64Array([1]), 0, [1], fixedStep(1));
      expect(result.stats.steps).toBe(1);
      // Linear problem with the exact Jacobian: Newton is exact up to rounding.
      expect(Math.abs(result.y[0] - stability(-lambdaH))).toBeLessThan(1e-13);
    }
    // L-stability in numbers: one step of λh = 1e6 leaves less than 1e-5 of the initial value.
    expect(Math.abs(stability(-1e6))).toBeLessThan(1e-5);
  });

  it('lands on every stop bit for bit and reports the state there', () => {
    const stops = [0.1, 1 / 3, Math.PI / 4, 1.7, 2.0000000001, 5];
    const seen: number[] = [];
    const result = integrateTrBdf2(decayWithQuadrature, new Float64Array([1]), 0, stops, { rtol: 1e-8, atol: 1e-10 }, (t, y) => {
      seen.push(t);
      // Exact solution e^{−t}; allowance 100 × rtol for the global error (local control only).
      expect(Math.abs(y[0] - Math.exp(-t))).toBeLessThan(1e-6);
    });
    expect(seen).toEqual(stops);
    for (let s = 0; s < stops.length; s++) expect(Object.is(seen[s], stops[s])).toBe(true);
    expect(result.lastStep).toBeGreaterThan(0);
  });

  it('integrates the quadrature channel: ∫₀ᵗ e^{−s} ds = 1 − e^{−t}, consistent with y', () => {
    const stops = [0.5, 1, 2, 4];
    const rtol = 1e-7;
    const atol = 1e-9;
    integrateTrBdf2(decayWithQuadrature, new Float64Array([1]), 0, stops, { rtol, atol }, (t, y, auxIntegral) => {
      // Analytic integral; allowance 100 × rtol as above.
      expect(Math.abs(auxIntegral[0] - (1 - Math.exp(-t)))).toBeLessThan(1e-5);
      // y' = −(aux rate), integrated with the same weights, so y + ∫aux = y0 except that the aux
      // rates are taken one Newton correction (weighted norm ≤ 0.05, trbdf2.ts) before the final
      // stage value: mismatch ≤ 0.05 · (atol + rtol·|y|) per unit time.
      expect(Math.abs(y[0] + auxIntegral[0] - 1)).toBeLessThan(0.05 * (atol + rtol) * t);
    });
  });

  it('evaluates the Jacobian only once on a linear system (J is kept while Newton converges fast)', () => {
    const { mode } = sineMode(30, 2);
    const result = integrateTrBdf2(heatEquation(30), mode, 0, [0.05, 0.1], { rtol: 1e-6, atol: 1e-8 });
    // Documented policy of trbdf2.ts: J is refreshed only after slow or failed Newton iterations,
    // which cannot happen on a linear problem with the exact constant Jacobian.
    expect(result.stats.jacobianEvaluations).toBe(1);
    expect(result.stats.newtonFailures).toBe(0);
  });

  it('throws an IntegrationError naming the non-finite value when rhs returns NaN', () => {
    const nanLater: OdeSystem = {
      size: 1,
      auxSize: 0,
      rhs: (t, y, dydt) => void (dydt[0] = t > 0.5 ? NaN : -y[0]),
      jacobian: (_t, _y, _l, diag) => void (diag[0] = -1),
    };
    let error: unknown;
    try {
      integrateTrBdf2(nanLater, new Float64Array([1]), 0, [1], { rtol: 1e-6, atol: 1e-8 });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(IntegrationError);
    expect((error as IntegrationError).message).toMatch(/non-finite/);
    // The step is cut until it underflows just before the poisoned region.
    expect((error as IntegrationError).t).toBeGreaterThan(0.49);
    expect((error as IntegrationError).t).toBeLessThanOrEqual(0.5);

    const nanAtStart: OdeSystem = { ...nanLater, rhs: (_t, _y, dydt) => void (dydt[0] = NaN) };
    expect(() => integrateTrBdf2(nanAtStart, new Float64Array([1]), 0, [1], { rtol: 1e-6, atol: 1e-8 })).toThrow(
      /non-finite value \(NaN\) for unknown 0 at t = 0/,
    );
  });

  it('throws an IntegrationError when more than maxSteps attempts are needed', () => {
    expect(() =>
      integrateTrBdf2(protheroRobinson(1), new Float64Array([1]), 0, [10], { rtol: 1e-8, atol: 1e-8, maxSteps: 5 }),
    ).toThrow(IntegrationError);
    expect(() =>
      integrateTrBdf2(protheroRobinson(1), new Float64Array([1]), 0, [10], { rtol: 1e-8, atol: 1e-8, maxSteps: 5 }),
    ).toThrow(/maxSteps = 5/);
  });

  it('refuses a system without a Jacobian and stops that do not increase', () => {
    const { jacobian: _unused, ...withoutJacobian } = protheroRobinson(1);
    expect(() => integrateTrBdf2(withoutJacobian, new Float64Array([1]), 0, [1], { rtol: 1e-6, atol: 1e-6 })).toThrow(
      /Jacobian/,
    );
    expect(() => integrateTrBdf2(protheroRobinson(1), new Float64Array([1]), 0, [1, 1], { rtol: 1e-6, atol: 1e-6 })).toThrow(
      IntegrationError,
    );
  });
});

describe('dense output', () => {
  it('fills instants inside a step by a cubic Hermite interpolant: error O(h⁴)', () => {
    // y' = −y, y(0) = 1: two fixed steps of h (the second interpolates with the consistent start
    // slope); the error at θ = 0.3 of the second step against the exact e^{−t} is the Hermite
    // interpolation error (h⁴/384 · max|y⁗|, ratio 2⁴ = 16 on halving h) plus the method's own
    // O(h³) error at the step's ends (ratio 8): the observed ratio lies between the two.
    const errorAt = (h: number) => {
      let got = Number.NaN;
      integrateTrBdf2(decayWithQuadrature, Float64Array.of(1), 0, [2 * h], fixedStep(h), undefined, {
        instants: [1.3 * h],
        onOutput: (_t, y) => (got = y[0]),
      });
      return Math.abs(got - Math.exp(-1.3 * h));
    };
    const ratio = errorAt(0.2) / errorAt(0.1);
    expect(ratio).toBeGreaterThan(7);
    expect(ratio).toBeLessThan(17);
  });

  it('agrees with exact stops at the same instants to within the tolerance (Prothero–Robinson, stiff)', () => {
    // exact solution cos t for every λ (Prothero & Robinson 1974); outputs every 0.05 over [0, 5]
    const system = protheroRobinson(1e4);
    const instants = Array.from({ length: 100 }, (_, i) => 0.05 * (i + 1));
    const opts = { rtol: 1e-6, atol: 1e-8 };
    const byStops: number[] = [];
    integrateTrBdf2(system, Float64Array.of(1), 0, instants, opts, (_t, y) => byStops.push(y[0]));
    const byDense: number[] = [];
    // The step-error estimate does not bound the interpolation error (O(h⁴) in the step length):
    // on this stiff problem the filtered estimate lets steps grow to ~0.5 while the solution (cos t)
    // curves, so the dense run caps steps at 0.1 (the model caps them at 1 h against a daily wave).
    const res = integrateTrBdf2(system, Float64Array.of(1), 0, [5], { ...opts, maxStep: 0.1 }, undefined, { instants, onOutput: (_t, y) => byDense.push(y[0]) });
    expect(byDense).toHaveLength(instants.length);
    for (let i = 0; i < instants.length; i++) {
      // both within a few tolerance units (rtol·|y| + atol ≈ 1e-6) of each other and of cos t
      expect(Math.abs(byDense[i]! - byStops[i]!)).toBeLessThan(2e-5);
      expect(Math.abs(byDense[i]! - Math.cos(instants[i]!))).toBeLessThan(2e-5);
    }
    // and it took fewer steps than stopping at every instant would force
    expect(res.stats.steps).toBeLessThan(instants.length * 0.6);
  });
});
