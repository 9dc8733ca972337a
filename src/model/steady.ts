/**
 * Steady state of the wall model: the state where dT/dt = 0, found by damped Newton iteration with
 * the tridiagonal Jacobian (the weak coupling of each segment's inlet gas temperature to the walls
 * below is left out of the Jacobian, so convergence is fast-linear rather than quadratic), with a
 * pseudo-transient fallback on the implicit integrator if Newton stalls.
 */
import type { OdeSystem } from '../solver/types.ts';
import { solveTridiagonal } from '../solver/tridiagonal.ts';
import { INTEGRATORS } from '../solver/index.ts';

export interface SteadyOptions {
  /** Converged when every Newton update is below this, K. */
  readonly toleranceK: number;
  readonly maxIterations: number;
}

/** Largest |x_i|. */
function maxAbs(x: Float64Array): number {
  let m = 0;
  for (let i = 0; i < x.length; i++) m = Math.max(m, Math.abs(x[i]!));
  return m;
}

/** Solve f(y) = 0 for the system's rhs, starting at `guess`. Returns the steady state. */
export function steadyState(system: OdeSystem, guess: Float64Array, options: SteadyOptions = { toleranceK: 1e-6, maxIterations: 200 }): Float64Array {
  if (!system.jacobian) throw new Error('steadyState needs a system with a Jacobian');
  const n = system.size;
  const y = Float64Array.from(guess);
  const trial = new Float64Array(n);
  const f = new Float64Array(n);
  const fTrial = new Float64Array(n);
  const aux = new Float64Array(system.auxSize);
  const lower = new Float64Array(n);
  const diag = new Float64Array(n);
  const upper = new Float64Array(n);
  const delta = new Float64Array(n);
  const scratch = new Float64Array(n);
  const rhs = new Float64Array(n);
  system.rhs(0, y, f, aux);
  let residual = maxAbs(f);
  for (let it = 0; it < options.maxIterations; it++) {
    system.jacobian(0, y, lower, diag, upper);
    for (let i = 0; i < n; i++) rhs[i] = -f[i]!;
    solveTridiagonal(lower, diag, upper, rhs, delta, scratch);
    // damp: no node moves more than 200 K in one iteration; halve while the residual grows
    let lambda = Math.min(1, 200 / Math.max(1e-300, maxAbs(delta)));
    let accepted = false;
    for (let k = 0; k < 12; k++) {
      for (let i = 0; i < n; i++) trial[i] = y[i]! + lambda * delta[i]!;
      system.rhs(0, trial, fTrial, aux);
      const r = maxAbs(fTrial);
      if (Number.isFinite(r) && (r < residual || k === 11)) {
        accepted = Number.isFinite(r);
        residual = r;
        break;
      }
      lambda /= 2;
    }
    if (!accepted) break;
    y.set(trial);
    f.set(fTrial);
    if (lambda * maxAbs(delta) < options.toleranceK) return y;
  }
  // fallback: march the frozen-time problem to steady state with the L-stable integrator
  const res = INTEGRATORS.implicit(system, y, 0, [1e5, 1e6, 1e7, 1e8, 1e9], { rtol: 1e-7, atol: 1e-5 });
  return Float64Array.from(res.y);
}

/**
 * The system with its drivers frozen: dy/dt at any t is the mean of dy/dt at `instants` (one
 * instant: the conditions of that instant; 24 hourly instants: the day's mean conditions), and its
 * Jacobian the mean of theirs. Its steady state is what `steadyState` finds.
 */
export function averagedOverInstants(system: OdeSystem, instants: readonly number[]): OdeSystem {
  const one = new Float64Array(system.size);
  const oneAux = new Float64Array(system.auxSize);
  const m = instants.length;
  const jl = new Float64Array(system.size);
  const jd = new Float64Array(system.size);
  const ju = new Float64Array(system.size);
  return {
    size: system.size,
    auxSize: system.auxSize,
    rhs(_t, y, dydt, aux) {
      dydt.fill(0);
      aux.fill(0);
      for (const tk of instants) {
        system.rhs(tk, y, one, oneAux);
        for (let i = 0; i < one.length; i++) dydt[i] += one[i]! / m;
        for (let i = 0; i < oneAux.length; i++) aux[i] += oneAux[i]! / m;
      }
    },
    // the mean of the instants' Jacobians (the middle instant's alone misjudges the sinks of hours
    // with other sun, wind and firing, and Newton then crawls)
    jacobian: system.jacobian
      ? (_t, y, lower, diag, upper) => {
          lower.fill(0);
          diag.fill(0);
          upper.fill(0);
          for (const tk of instants) {
            system.jacobian!(tk, y, jl, jd, ju);
            for (let i = 0; i < jd.length; i++) {
              lower[i] += jl[i]! / m;
              diag[i] += jd[i]! / m;
              upper[i] += ju[i]! / m;
            }
          }
        }
      : undefined,
  };
}
