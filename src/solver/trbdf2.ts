/**
 * TR-BDF2: an L-stable, stiffly accurate, second-order one-step method with a third-order embedded
 * error estimate, for the stiff wall-conduction system.
 *
 * Written as a three-stage ESDIRK (M. E. Hosea & L. F. Shampine 1996, "Analysis and implementation
 * of TR-BDF2", Appl. Numer. Math. 20:21–37; method of R. E. Bank et al. 1985, "Transient
 * simulation of silicon devices and circuits", IEEE Trans. Electron Devices 32:1992–2007; journal
 * details from memory), with γ = 2 − √2, d = γ/2, w = √2/4:
 *
 *   stage 1 (explicit):   f1 = f(t_n, y_n)                       (first same as last)
 *   stage 2 (trapezoid):  z2 = y_n + h (d f1 + d f2),  f2 = f(t_n + γh, z2)
 *   stage 3 (BDF2):       y_{n+1} = y_n + h (w f1 + w f2 + d f3),  f3 = f(t_n + h, y_{n+1})
 *
 *   b = [w, w, d]   b̂ = [(1 − w)/3, (3w + 1)/3, d/3]   (b̂ is third order)
 *
 * Error estimate: e = h Σ (b̂_i − b_i) f_i, filtered as (I − h d J)⁻¹ e so that stiff components,
 * which the L-stable method damps correctly, do not inflate it (Shampine's device; Hosea &
 * Shampine 1996, Sect. 3). Step control h_new = h · min(4, max(0.2, 0.9 · err^(−1/3))).
 *
 * Newton: each implicit stage solves z − h d f(t, z) = ψ with the simplified Newton matrix
 * M = I − h d J, J the tridiagonal Jacobian from `system.jacobian`. The first stage starts from the
 * previous step's dense output extrapolated to t + γh when the step has grown at most
 * PREDICTOR_MAX_GROWTH times (the usual starting values of implicit Runge–Kutta codes, Hairer &
 * Wanner, Solving ODEs II, 2nd ed. 1996, Sect. IV.8), else from explicit Euler (after a start or
 * a stop); the second from the integral of the line through f1 and f2. Policy: J is kept from step to
 * step while Newton converges quickly (at most two corrections per stage); it is re-evaluated at
 * the current state when a stage needed more, or when Newton fails with an old J (the step is then
 * retried with the same h). Newton failing with a fresh J cuts the step by 4. M is rebuilt for
 * every attempt (O(N)). Convergence: the correction δ computed from a fresh rhs evaluation has
 * ‖δ‖ · max(1, θ/(1 − θ)) ≤ 0.05 in the weighted RMS norm, θ the measured contraction rate (from
 * the previous stage for the first correction); θ > 0.9 or six evaluations without convergence
 * is a failure. The quadrature rates of that last evaluation, moved to the corrected state by the
 * system's `auxChange` where it has one (first order in the last correction), are used for the
 * stage: the integrated flows are those of the accepted state.
 *
 * Dense output: within an accepted step the solution is the cubic Hermite interpolant through
 * (y_n, f_n) and (y_{n+1}, f_{n+1}) in θ = (t − t_n)/h, with the consistent stage derivatives
 * (f_{n+1} = (y_{n+1} − ψ)/(hd)): error O(h⁴), one order above the step's own local error. In the
 * first step after a start or a stop, where f_n is a fresh evaluation that may sit on a stiff
 * transient (a step of the forcing), the derivative at the start is not used: the quadratic
 * through y_n and (y_{n+1}, f_{n+1}) instead (error O(h³)), so a transient the step damps is not
 * overshot. At θ = 1 both return y_{n+1} exactly. (The trapezoidal stage value is not used: the
 * trapezoidal rule is not L-stable and its stage carries stiff errors.)
 *
 * Stops: the step is shortened (or the remaining distance split in two equal steps) to land on
 * each stop exactly; f(t, y) is evaluated afresh after each stop, so the caller may change the
 * system's forcing in `onStop`. `lastStep` in the result is the last accepted step, or the step
 * the controller wanted when that one was shortened to land on the stop.
 *
 * No allocation per step: all work arrays are allocated once per call.
 */
import { IntegrationError } from './types.ts';
import type { Integrator } from './types.ts';
import { solveTridiagonal } from './tridiagonal.ts';
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

/** γ = 2 − √2: the fraction of the step covered by the trapezoidal stage. */
const GAMMA = 2 - Math.SQRT2;
/** d = γ/2: the diagonal coefficient of both implicit stages. */
const D = GAMMA / 2;
/** w = √2/4: weight of f1 and f2 in the BDF2 stage. */
const W = Math.SQRT2 / 4;
/** b̂ − b, the error-estimate weights (they sum to zero). */
const E1 = (1 - 4 * W) / 3;
const E2 = 1 / 3;
const E3 = (-2 * D) / 3;
/**
 * Predictor for stage 3: y_n + h (P1 f1 + P2 f2), the integral over [0, 1] of the straight line
 * through f1 (at 0) and f2 (at γ).
 */
const P2 = 1 / (2 * GAMMA);
const P1 = 1 - P2;

/** A Newton correction at or below this weighted RMS norm ends the iteration. */
const NEWTON_TOLERANCE = 0.05;
/** Rhs evaluations allowed per implicit stage before Newton is declared failed. */
const NEWTON_MAX_EVALUATIONS = 6;
/** Contraction rate above which Newton is declared divergent. */
const NEWTON_MAX_RATE = 0.9;
/** More rhs evaluations than this in a stage → refresh J before the next step. */
const NEWTON_SLOW_EVALUATIONS = 2;

/**
 * Largest growth of the step over the previous one for which the first stage's predictor
 * extrapolates the previous step's interpolant (θ = 1 + γ h/h_prev ≤ 2); beyond it, explicit Euler.
 */
const PREDICTOR_MAX_GROWTH = 1 / GAMMA;

/** Largest step-size growth per step. */
const MAX_FACTOR = 4;
/** Step-size factor after a Newton failure with a fresh Jacobian. */
const NEWTON_FAILURE_FACTOR = 0.25;
const DEFAULT_MAX_STEPS = 1e6;

/** Outcome of one implicit stage. */
const Newton = { Converged: 0, Failed: 1, NonFinite: 2 } as const;
type NewtonOutcome = (typeof Newton)[keyof typeof Newton];

/**
 * The dense-output value at θ ∈ (0, 1) (or, for a predictor, θ up to 2) of a step of size h from (y0, f0) to (y1, f1) into `out`:
 * cubic Hermite, or (withoutStartSlope) the quadratic p = y0 + θ(y1 − y0) + θ(θ − 1)(h f1 − (y1 − y0)),
 * which matches y0, y1 and the end slope.
 */
function interpolate(theta: number, h: number, y0: Float64Array, f0: Float64Array, y1: Float64Array, f1: Float64Array, withoutStartSlope: boolean, out: Float64Array): void {
  const n = out.length;
  if (withoutStartSlope) {
    const c = theta * (theta - 1);
    for (let i = 0; i < n; i++) {
      const dy = y1[i] - y0[i];
      out[i] = y0[i] + theta * dy + c * (h * f1[i] - dy);
    }
    return;
  }
  const u = 1 - theta;
  const h00 = (1 + 2 * theta) * u * u;
  const h10 = theta * u * u * h;
  const h01 = theta * theta * (3 - 2 * theta);
  const h11 = theta * theta * (theta - 1) * h;
  for (let i = 0; i < n; i++) out[i] = h00 * y0[i] + h10 * f0[i] + h01 * y1[i] + h11 * f1[i];
}

export const integrateTrBdf2: Integrator = (system, y0, t0, stops, options, onStop, dense) => {
  validateProblem('TR-BDF2', system, y0, t0, stops, options);
  const jacobian = system.jacobian;
  if (!jacobian) {
    throw new IntegrationError(
      'TR-BDF2 needs the system\'s tridiagonal Jacobian (OdeSystem.jacobian); use the explicit integrator for systems without one',
      t0,
    );
  }
  const n = system.size;
  const nAux = system.auxSize;
  const { rtol, atol } = options;
  const hMax = options.maxStep ?? Infinity;
  const maxSteps = options.maxSteps ?? DEFAULT_MAX_STEPS;
  const stats = emptyStats();

  // Work arrays, allocated once per call.
  const y = Float64Array.from(y0);
  const f1 = new Float64Array(n);
  const f2 = new Float64Array(n);
  const f3 = new Float64Array(n);
  const z = new Float64Array(n);
  const psi = new Float64Array(n);
  const fz = new Float64Array(n);
  const delta = new Float64Array(n);
  const jLower = new Float64Array(n);
  const jDiag = new Float64Array(n);
  const jUpper = new Float64Array(n);
  const mLower = new Float64Array(n);
  const mDiag = new Float64Array(n);
  const mUpper = new Float64Array(n);
  const scratch = new Float64Array(n);
  const a1 = new Float64Array(nAux);
  const a2 = new Float64Array(nAux);
  const a3 = new Float64Array(nAux);
  const az = new Float64Array(nAux);
  const auxIntegral = new Float64Array(nAux);
  const yOut = new Float64Array(n);
  // the previous accepted step (start state, slope, size, whether it was the first after a start or stop), for the predictor
  const yPrev = new Float64Array(n);
  const fPrev = new Float64Array(n);
  let hPrev = 0;
  let prevFresh = false;
  let freshStart = true; // f1 is a fresh evaluation after a start or a stop (see the dense output)
  const outputs = dense?.instants ?? [];
  let nextOutput = 0;
  while (nextOutput < outputs.length && outputs[nextOutput]! <= t0) nextOutput++;

  let nonFinite = ''; // description of the last non-finite rhs value met in a trial stage
  let stageEvaluations = 0; // rhs evaluations used by the last stage
  let newtonRate = 0; // last measured contraction rate of Newton (carried into the next stage)

  const rhs = (t: number, state: Float64Array, dydt: Float64Array, aux: Float64Array): boolean => {
    system.rhs(t, state, dydt, aux);
    stats.rhsEvaluations++;
    const bad = describeNonFinite(t, dydt, aux);
    if (bad !== '') nonFinite = bad;
    return bad === '';
  };

  /**
   * Solve z − hd·f(tStage, z) = psi by simplified Newton from the predictor already in `z`.
   * On convergence `z` holds the stage value, `fStage` the consistent stage derivative
   * (z − psi)/hd and `aStage` the quadrature rates.
   */
  const solveStage = (tStage: number, hd: number, fStage: Float64Array, aStage: Float64Array): NewtonOutcome => {
    let previousNorm = 0;
    for (let k = 0; k < NEWTON_MAX_EVALUATIONS; k++) {
      stageEvaluations = k + 1;
      if (!rhs(tStage, z, fz, az)) return Newton.NonFinite;
      for (let i = 0; i < n; i++) delta[i] = psi[i] + hd * fz[i] - z[i];
      solveTridiagonal(mLower, mDiag, mUpper, delta, delta, scratch);
      stats.newtonIterations++;
      const norm = weightedRmsNorm(delta, y, y, atol, rtol);
      if (!Number.isFinite(norm)) {
        nonFinite = `the Newton correction became non-finite at t = ${tStage} s`;
        return Newton.NonFinite;
      }
      if (k > 0) {
        newtonRate = norm / previousNorm;
        if (newtonRate > NEWTON_MAX_RATE) return Newton.Failed;
      }
      for (let i = 0; i < n; i++) z[i] += delta[i];
      // Error left after this correction ≈ rate/(1 − rate) · norm for a linearly converging
      // iteration; never credited below the correction itself.
      if (norm * Math.max(1, newtonRate / (1 - newtonRate)) <= NEWTON_TOLERANCE) {
        const inverseHd = 1 / hd;
        for (let i = 0; i < n; i++) fStage[i] = (z[i] - psi[i]) * inverseHd;
        // the rates of the corrected (accepted) stage value, not of the iterate before the correction
        system.auxChange?.(delta, az);
        aStage.set(az);
        return Newton.Converged;
      }
      previousNorm = norm;
    }
    return Newton.Failed;
  };

  let t = t0;
  if (!rhs(t, y, f1, a1)) throw new IntegrationError(`TR-BDF2: ${nonFinite} (initial state)`, t);
  let h = Math.max(
    options.initialStep ?? guessInitialStep(system, t, y, f1, stops[0] - t, 2, atol, rtol, z, fz, az, stats),
    minimumStep(t),
  );
  let jacobianAtCurrentState = false;
  let refreshJacobian = true;
  let lastAccepted = h;

  for (let s = 0; s < stops.length; s++) {
    const stop = stops[s];
    if (s > 0) {
      if (!rhs(t, y, f1, a1)) throw new IntegrationError(`TR-BDF2: ${nonFinite}`, t);
      // a stop is where the forcing may turn a corner: start again from a step sized to the fresh
      // derivatives (Hairer, Nørsett & Wanner's starting step) rather than the one that came before
      h = Math.max(Math.min(h, 8 * guessInitialStep(system, t, y, f1, stop - t, 2, atol, rtol, z, fz, az, stats)), minimumStep(t));
    }
    freshStart = true;
    hPrev = 0;
    let previousRejected = false;
    while (t < stop) {
      if (stats.steps + stats.rejected + stats.newtonFailures >= maxSteps) {
        throw tooManySteps('TR-BDF2', maxSteps, t, stop);
      }
      const hWanted = Math.min(h, hMax);
      const hStep = stepTowardStop(t, stop, hWanted, hMax);
      const lands = hStep === stop - t;
      const tNew = lands ? stop : t + hStep;

      if (refreshJacobian && !jacobianAtCurrentState) {
        jacobian.call(system, t, y, jLower, jDiag, jUpper);
        stats.jacobianEvaluations++;
        jacobianAtCurrentState = true;
      }
      refreshJacobian = false;
      const hd = hStep * D;
      for (let i = 0; i < n; i++) {
        mLower[i] = -hd * jLower[i];
        mDiag[i] = 1 - hd * jDiag[i];
        mUpper[i] = -hd * jUpper[i];
      }

      // Stage 2: trapezoid to t + γh; predictor: the previous step's interpolant, or explicit Euler.
      for (let i = 0; i < n; i++) psi[i] = y[i] + hd * f1[i];
      if (hPrev > 0 && hStep <= PREDICTOR_MAX_GROWTH * hPrev) interpolate(1 + (GAMMA * hStep) / hPrev, hPrev, yPrev, fPrev, y, f1, prevFresh, z);
      else for (let i = 0; i < n; i++) z[i] = y[i] + GAMMA * hStep * f1[i];
      let outcome: NewtonOutcome = solveStage(t + GAMMA * hStep, hd, f2, a2);
      let slow = stageEvaluations > NEWTON_SLOW_EVALUATIONS;
      if (outcome === Newton.Converged) {
        // Stage 3: BDF2 to t + h; predictor: integral of the line through f1, f2.
        const hw = hStep * W;
        for (let i = 0; i < n; i++) {
          psi[i] = y[i] + hw * (f1[i] + f2[i]);
          z[i] = y[i] + hStep * (P1 * f1[i] + P2 * f2[i]);
        }
        outcome = solveStage(tNew, hd, f3, a3);
        slow ||= stageEvaluations > NEWTON_SLOW_EVALUATIONS;
      }
      if (slow) refreshJacobian = true;

      if (outcome !== Newton.Converged) {
        stats.newtonFailures++;
        if (!jacobianAtCurrentState) {
          refreshJacobian = true; // retry the same h with a fresh J
          continue;
        }
        h = hStep * NEWTON_FAILURE_FACTOR;
        checkStepSize('TR-BDF2', h, t, outcome === Newton.NonFinite ? nonFinite : 'Newton iteration does not converge');
        previousRejected = true;
        continue;
      }

      // Error estimate, filtered through M⁻¹ = (I − h d J)⁻¹. `delta` is free here.
      for (let i = 0; i < n; i++) delta[i] = hStep * (E1 * f1[i] + E2 * f2[i] + E3 * f3[i]);
      solveTridiagonal(mLower, mDiag, mUpper, delta, delta, scratch);
      const err = weightedRmsNorm(delta, y, z, atol, rtol);

      if (err <= 1) {
        for (let j = 0; j < nAux; j++) {
          auxIntegral[j] += hStep * (W * (a1[j] + a2[j]) + D * a3[j]);
        }
        // dense output for the instants inside (t, tNew]
        while (nextOutput < outputs.length && outputs[nextOutput]! <= tNew) {
          const tOut = outputs[nextOutput]!;
          if (tOut === tNew) dense!.onOutput(tOut, z);
          else {
            interpolate((tOut - t) / hStep, hStep, y, f1, z, f3, freshStart, yOut);
            dense!.onOutput(tOut, yOut);
          }
          nextOutput++;
        }
        t = tNew;
        yPrev.set(y);
        fPrev.set(f1);
        hPrev = hStep;
        prevFresh = freshStart;
        y.set(z);
        f1.set(f3);
        a1.set(a3);
        freshStart = false;
        stats.steps++;
        jacobianAtCurrentState = false;
        const factor = Math.min(previousRejected ? 1 : MAX_FACTOR, controllerFactor(err, 3));
        lastAccepted = hStep < hWanted && factor >= 1 ? hWanted : hStep;
        h = hStep < hWanted && factor >= 1 ? Math.max(hWanted, hStep * factor) : hStep * factor;
        previousRejected = false;
      } else {
        stats.rejected++;
        h = hStep * Math.min(1, controllerFactor(err, 3));
        checkStepSize('TR-BDF2', h, t, `the error estimate stays above the tolerance (weighted error ${err.toPrecision(3)})`);
        previousRejected = true;
      }
    }
    onStop?.(t, y, auxIntegral);
  }

  return { y: Float64Array.from(y), auxIntegral: Float64Array.from(auxIntegral), lastStep: lastAccepted, stats };
};
