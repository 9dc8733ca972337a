/**
 * Step-control helpers shared by the integrators (trbdf2.ts, dormandPrince.ts): the error norm,
 * the step-size controller, landing on stops, the initial step, and the messages of failures.
 */
import { IntegrationError } from './types.ts';
import type { IntegratorOptions, IntegratorStats, OdeSystem } from './types.ts';

/** Safety factor of the step-size controller. */
export const SAFETY = 0.9;
/** Smallest step-size factor after a rejection. */
export const MIN_FACTOR = 0.2;


/** Fresh statistics record. */
export function emptyStats(): IntegratorStats {
  return { steps: 0, rejected: 0, rhsEvaluations: 0, jacobianEvaluations: 0, newtonIterations: 0, newtonFailures: 0 };
}

/**
 * Weighted RMS norm sqrt(mean_i (v_i / (atol + rtol · max(|a_i|, |b_i|)))²), the usual error
 * norm of adaptive ODE codes (Hairer, Nørsett & Wanner, Solving ODEs I, 2nd ed. 1993, Sect. II.4,
 * eq. 4.11). Returns 0 for an empty vector and NaN if any v_i is NaN.
 */
export function weightedRmsNorm(v: Float64Array, a: Float64Array, b: Float64Array, atol: number, rtol: number): number {
  const n = v.length;
  if (n === 0) return 0;
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const scale = atol + rtol * Math.max(Math.abs(a[i]), Math.abs(b[i]));
    const r = v[i] / scale;
    sum += r * r;
  }
  return Math.sqrt(sum / n);
}

/**
 * Step-size factor 0.9 · err^(−1/q), clipped to [0.2, ∞) (the caller clips the top); q is the
 * order of the error estimate plus one. A non-finite error gives the smallest factor.
 */
export function controllerFactor(err: number, q: number): number {
  if (!(err >= 0) || !Number.isFinite(err)) return MIN_FACTOR;
  if (err === 0) return Infinity;
  return Math.max(MIN_FACTOR, SAFETY * Math.pow(err, -1 / q));
}

/**
 * The step to take from t toward `stop` when the controller wants `h` (already ≤ hMax):
 * the whole remaining distance when it is within 5 % of h (and ≤ hMax, give or take rounding),
 * half of it when it is below 2h (no sliver step before the stop), h otherwise. The caller detects landing by
 * `result === stop − t` and then sets t = stop exactly.
 */
export function stepTowardStop(t: number, stop: number, h: number, hMax: number): number {
  const remaining = stop - t;
  if (remaining <= Math.min(1.05 * h, hMax * (1 + 1e-9))) return remaining;
  if (remaining < 2 * h) return remaining / 2;
  return h;
}

/**
 * Smallest step allowed at time t: max(1e-9 s, 1e-10 · |t|) (below it the step is lost in the
 * rounding of t, or the problem is not solvable at this tolerance).
 */
export function minimumStep(t: number): number {
  return Math.max(1e-9, 1e-10 * Math.abs(t));
}

/** Throw an IntegrationError when a cut step has fallen below `minimumStep(t)`. */
export function checkStepSize(method: string, h: number, t: number, reason: string): void {
  if (h < minimumStep(t)) {
    throw new IntegrationError(
      `${method}: step size underflow (h = ${h.toExponential(2)} s) at t = ${t} s because ${reason}; ` +
        'check the model for a discontinuity or non-physical state near this time, or loosen rtol/atol',
      t,
    );
  }
}

/** The error thrown when the attempted-step budget is spent. */
export function tooManySteps(method: string, maxSteps: number, t: number, stop: number): IntegrationError {
  return new IntegrationError(
    `${method}: more than maxSteps = ${maxSteps} step attempts, stuck at t = ${t} s on the way to ${stop} s; ` +
      'the problem may be too stiff for this integrator or the tolerances too tight; raise maxSteps or loosen rtol/atol',
    t,
  );
}

/**
 * '' if every value is finite, else a sentence naming the first non-finite value, for an error
 * message.
 */
export function describeNonFinite(t: number, dydt: Float64Array, aux: Float64Array): string {
  for (let i = 0; i < dydt.length; i++) {
    if (!Number.isFinite(dydt[i])) return `rhs returned a non-finite value (${dydt[i]}) for unknown ${i} at t = ${t} s`;
  }
  for (let j = 0; j < aux.length; j++) {
    if (!Number.isFinite(aux[j])) return `rhs returned a non-finite value (${aux[j]}) for quadrature channel ${j} at t = ${t} s`;
  }
  return '';
}

/** Check the arguments of an integrator call; throws IntegrationError with what is wrong. */
export function validateProblem(
  method: string,
  system: OdeSystem,
  y0: Float64Array,
  t0: number,
  stops: readonly number[],
  options: IntegratorOptions,
): void {
  const fail = (what: string): never => {
    throw new IntegrationError(`${method}: ${what}`, t0);
  };
  if (y0.length !== system.size) fail(`y0 has ${y0.length} values but the system has ${system.size} unknowns`);
  for (let i = 0; i < y0.length; i++) if (!Number.isFinite(y0[i])) fail(`initial value ${i} is ${y0[i]}`);
  if (!Number.isFinite(t0)) fail(`t0 is ${t0}`);
  if (stops.length === 0) fail('no stops given');
  for (let s = 0; s < stops.length; s++) {
    const previous = s === 0 ? t0 : stops[s - 1];
    if (!(stops[s] > previous) || !Number.isFinite(stops[s])) {
      fail(`stops must be finite, strictly increasing and after t0 = ${t0} s (stop ${s} is ${stops[s]} s)`);
    }
  }
  if (!(options.rtol >= 0) || !(options.atol >= 0) || options.rtol + options.atol <= 0) {
    fail(`tolerances must be ≥ 0 and not both 0 (rtol = ${options.rtol}, atol = ${options.atol})`);
  }
  if (options.initialStep !== undefined && !(options.initialStep > 0)) fail(`initialStep must be > 0 (got ${options.initialStep})`);
  if (options.maxStep !== undefined && !(options.maxStep > 0)) fail(`maxStep must be > 0 (got ${options.maxStep})`);
}

/**
 * Starting step size after Hairer, Nørsett & Wanner (Solving ODEs I, 2nd ed. 1993, Sect. II.4,
 * "Starting step size"): h0 = 0.01 ‖y0‖/‖f0‖, one explicit Euler step to estimate ‖y''‖, then
 * h1 = (0.01 / max(‖f0‖, ‖y''‖))^(1/(p+1)) and h = min(100 h0, h1), further limited to `span`.
 * `p` is the order of the method's error estimate. Uses one rhs evaluation (counted in stats)
 * and the scratch arrays yTry, fTry, auxTry (length size, size, auxSize).
 */
export function guessInitialStep(
  system: OdeSystem,
  t0: number,
  y0: Float64Array,
  f0: Float64Array,
  span: number,
  p: number,
  atol: number,
  rtol: number,
  yTry: Float64Array,
  fTry: Float64Array,
  auxTry: Float64Array,
  stats: IntegratorStats,
): number {
  const n = y0.length;
  const fallback = 1e-6 * Math.max(1, span);
  const d0 = weightedRmsNorm(y0, y0, y0, atol, rtol);
  const d1 = weightedRmsNorm(f0, y0, y0, atol, rtol);
  let h0 = d0 < 1e-5 || d1 < 1e-5 ? fallback : 0.01 * (d0 / d1);
  h0 = Math.min(h0, span);
  for (let i = 0; i < n; i++) yTry[i] = y0[i] + h0 * f0[i];
  system.rhs(t0 + h0, yTry, fTry, auxTry);
  stats.rhsEvaluations++;
  for (let i = 0; i < n; i++) fTry[i] -= f0[i];
  const d2 = weightedRmsNorm(fTry, y0, y0, atol, rtol) / h0;
  const dMax = Math.max(d1, d2);
  const h1 = !Number.isFinite(dMax) ? h0 * 1e-3 : dMax <= 1e-15 ? Math.max(fallback, h0 * 1e-3) : Math.pow(0.01 / dMax, 1 / (p + 1));
  return Math.max(Math.min(100 * h0, h1, span), minimumStep(t0));
}
