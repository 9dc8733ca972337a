/**
 * Explicit Dormand–Prince 5(4) pair with first-same-as-last, local extrapolation (the fifth-order
 * solution is propagated) and adaptive steps: the reference integrator for tests and benchmarks.
 * On the stiff wall model its step is bounded by stability, not accuracy (see docs/model.md, "Time integration");
 * use TR-BDF2 there. Ignores `system.jacobian`.
 *
 * Source: J. R. Dormand & P. J. Prince (1980), "A family of embedded Runge–Kutta formulae",
 * J. Comput. Appl. Math. 6:19–26 (the coefficients, as also printed in Hairer, Nørsett & Wanner,
 * Solving ODEs I, 2nd ed. 1993, Sect. II.5; written from memory and verified by the
 * order-of-accuracy and reference-solver tests).
 *
 * Step control: h_new = h · min(5, max(0.2, 0.9 · err^(−1/5))), no growth right after a rejection;
 * error norm as in TR-BDF2 (weighted RMS with atol + rtol · max(|y_n|, |y_{n+1}|)). Quadrature
 * channels use the fifth-order weights b. Stops and `lastStep` are handled as in TR-BDF2 (land
 * exactly, fresh f after each stop). Work arrays are allocated once per call.
 *
 * Dense output: the cubic Hermite interpolant through (y_n, f_n) and (y_{n+1}, f_{n+1}) (both
 * derivatives are at hand: first same as last), error O(h⁴) — fine for this non-stiff reference.
 */
import { IntegrationError } from './types.ts';
import type { Integrator } from './types.ts';
import {
  checkStepSize,
  controllerFactor,
  describeNonFinite,
  emptyStats,
  guessInitialStep,
  minimumStep,
  stepTowardStop,
  tooManySteps,
  validateProblem,
  weightedRmsNorm,
} from './stepping.ts';

// Nodes c_i.
const C2 = 1 / 5;
const C3 = 3 / 10;
const C4 = 4 / 5;
const C5 = 8 / 9;
// Coupling coefficients a_ij.
const A21 = 1 / 5;
const A31 = 3 / 40;
const A32 = 9 / 40;
const A41 = 44 / 45;
const A42 = -56 / 15;
const A43 = 32 / 9;
const A51 = 19372 / 6561;
const A52 = -25360 / 2187;
const A53 = 64448 / 6561;
const A54 = -212 / 729;
const A61 = 9017 / 3168;
const A62 = -355 / 33;
const A63 = 46732 / 5247;
const A64 = 49 / 176;
const A65 = -5103 / 18656;
// Fifth-order weights b (= row 7 of A: first same as last; b2 = b7 = 0).
const B1 = 35 / 384;
const B3 = 500 / 1113;
const B4 = 125 / 192;
const B5 = -2187 / 6784;
const B6 = 11 / 84;
// Error weights b − b̂ (b̂ the fourth-order weights 5179/57600, 0, 7571/16695, 393/640,
// −92097/339200, 187/2100, 1/40).
const E1 = 71 / 57600;
const E3 = -71 / 16695;
const E4 = 71 / 1920;
const E5 = -17253 / 339200;
const E6 = 22 / 525;
const E7 = -1 / 40;

const MAX_FACTOR = 5;
const DEFAULT_MAX_STEPS = 1e6;

export const integrateDormandPrince: Integrator = (system, y0, t0, stops, options, onStop, dense) => {
  validateProblem('Dormand–Prince', system, y0, t0, stops, options);
  const n = system.size;
  const nAux = system.auxSize;
  const { rtol, atol } = options;
  const hMax = options.maxStep ?? Infinity;
  const maxSteps = options.maxSteps ?? DEFAULT_MAX_STEPS;
  const stats = emptyStats();

  const y = Float64Array.from(y0);
  const yStage = new Float64Array(n);
  const k1 = new Float64Array(n);
  const k2 = new Float64Array(n);
  const k3 = new Float64Array(n);
  const k4 = new Float64Array(n);
  const k5 = new Float64Array(n);
  const k6 = new Float64Array(n);
  const k7 = new Float64Array(n);
  const yNew = new Float64Array(n);
  const errVec = new Float64Array(n);
  const q1 = new Float64Array(nAux);
  const q2 = new Float64Array(nAux);
  const q3 = new Float64Array(nAux);
  const q4 = new Float64Array(nAux);
  const q5 = new Float64Array(nAux);
  const q6 = new Float64Array(nAux);
  const q7 = new Float64Array(nAux);
  const auxIntegral = new Float64Array(nAux);
  const yOut = new Float64Array(n);
  const outputs = dense?.instants ?? [];
  let nextOutput = 0;
  while (nextOutput < outputs.length && outputs[nextOutput]! <= t0) nextOutput++;

  let nonFinite = '';
  const rhs = (t: number, state: Float64Array, dydt: Float64Array, aux: Float64Array): boolean => {
    system.rhs(t, state, dydt, aux);
    stats.rhsEvaluations++;
    const bad = describeNonFinite(t, dydt, aux);
    if (bad !== '') nonFinite = bad;
    return bad === '';
  };

  /** Stages 2–7 of a step of size h from (t, y) with k1 known; false on a non-finite rhs. */
  const stages = (t: number, h: number, tNew: number): boolean => {
    for (let i = 0; i < n; i++) yStage[i] = y[i] + h * A21 * k1[i];
    if (!rhs(t + C2 * h, yStage, k2, q2)) return false;
    for (let i = 0; i < n; i++) yStage[i] = y[i] + h * (A31 * k1[i] + A32 * k2[i]);
    if (!rhs(t + C3 * h, yStage, k3, q3)) return false;
    for (let i = 0; i < n; i++) yStage[i] = y[i] + h * (A41 * k1[i] + A42 * k2[i] + A43 * k3[i]);
    if (!rhs(t + C4 * h, yStage, k4, q4)) return false;
    for (let i = 0; i < n; i++) {
      yStage[i] = y[i] + h * (A51 * k1[i] + A52 * k2[i] + A53 * k3[i] + A54 * k4[i]);
    }
    if (!rhs(t + C5 * h, yStage, k5, q5)) return false;
    for (let i = 0; i < n; i++) {
      yStage[i] = y[i] + h * (A61 * k1[i] + A62 * k2[i] + A63 * k3[i] + A64 * k4[i] + A65 * k5[i]);
    }
    if (!rhs(tNew, yStage, k6, q6)) return false;
    for (let i = 0; i < n; i++) {
      yNew[i] = y[i] + h * (B1 * k1[i] + B3 * k3[i] + B4 * k4[i] + B5 * k5[i] + B6 * k6[i]);
    }
    return rhs(tNew, yNew, k7, q7);
  };

  let t = t0;
  if (!rhs(t, y, k1, q1)) throw new IntegrationError(`Dormand–Prince: ${nonFinite} (initial state)`, t);
  let h = Math.max(
    options.initialStep ?? guessInitialStep(system, t, y, k1, stops[0] - t, 4, atol, rtol, yStage, k2, q2, stats),
    minimumStep(t),
  );
  let lastAccepted = h;

  for (let s = 0; s < stops.length; s++) {
    const stop = stops[s];
    if (s > 0 && !rhs(t, y, k1, q1)) throw new IntegrationError(`Dormand–Prince: ${nonFinite}`, t);
    let previousRejected = false;
    while (t < stop) {
      if (stats.steps + stats.rejected >= maxSteps) throw tooManySteps('Dormand–Prince', maxSteps, t, stop);
      const hWanted = Math.min(h, hMax);
      const hStep = stepTowardStop(t, stop, hWanted, hMax);
      const lands = hStep === stop - t;
      const tNew = lands ? stop : t + hStep;

      let err: number;
      if (stages(t, hStep, tNew)) {
        for (let i = 0; i < n; i++) {
          errVec[i] = hStep * (E1 * k1[i] + E3 * k3[i] + E4 * k4[i] + E5 * k5[i] + E6 * k6[i] + E7 * k7[i]);
        }
        err = weightedRmsNorm(errVec, y, yNew, atol, rtol);
      } else {
        err = NaN;
      }

      if (err <= 1) {
        for (let j = 0; j < nAux; j++) {
          auxIntegral[j] += hStep * (B1 * q1[j] + B3 * q3[j] + B4 * q4[j] + B5 * q5[j] + B6 * q6[j]);
        }
        // dense output for the instants inside (t, tNew]: cubic Hermite in θ = (t_out − t)/h
        while (nextOutput < outputs.length && outputs[nextOutput]! <= tNew) {
          const tOut = outputs[nextOutput]!;
          if (tOut === tNew) dense!.onOutput(tOut, yNew);
          else {
            const th = (tOut - t) / hStep;
            const h00 = (1 + 2 * th) * (1 - th) * (1 - th);
            const h10 = th * (1 - th) * (1 - th);
            const h01 = th * th * (3 - 2 * th);
            const h11 = th * th * (th - 1);
            for (let i = 0; i < n; i++) yOut[i] = h00 * y[i] + hStep * h10 * k1[i] + h01 * yNew[i] + hStep * h11 * k7[i];
            dense!.onOutput(tOut, yOut);
          }
          nextOutput++;
        }
        t = tNew;
        y.set(yNew);
        k1.set(k7);
        q1.set(q7);
        stats.steps++;
        const factor = Math.min(previousRejected ? 1 : MAX_FACTOR, controllerFactor(err, 5));
        lastAccepted = hStep < hWanted && factor >= 1 ? hWanted : hStep;
        h = hStep < hWanted && factor >= 1 ? Math.max(hWanted, hStep * factor) : hStep * factor;
        previousRejected = false;
      } else {
        stats.rejected++;
        h = hStep * Math.min(1, controllerFactor(err, 5));
        const reason = Number.isNaN(err)
          ? nonFinite || 'the solution became non-finite'
          : `the error estimate stays above the tolerance (weighted error ${err.toPrecision(3)})`;
        checkStepSize('Dormand–Prince', h, t, reason);
        previousRejected = true;
      }
    }
    onStop?.(t, y, auxIntegral);
  }

  return { y: Float64Array.from(y), auxIntegral: Float64Array.from(auxIntegral), lastStep: lastAccepted, stats };
};
