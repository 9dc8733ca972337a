/**
 * The contract between the wall model and the time integrators.
 *
 * The model is an ODE system dy/dt = g(t, y) of `size` unknowns (node temperatures, K), plus
 * `auxSize` quadrature channels (energy flows, W) whose rates are computed together with g and
 * integrated with the same stage weights, but never enter the Newton iteration.
 */
export interface OdeSystem {
  /** Number of unknowns. */
  readonly size: number;
  /** Number of quadrature channels (0 if none). */
  readonly auxSize: number;
  /**
   * Evaluate dy/dt into `dydt` (length `size`) and the quadrature rates into `aux` (length
   * `auxSize`). Must not allocate on the hot path and must not keep references to the arrays.
   */
  rhs(t: number, y: Float64Array, dydt: Float64Array, aux: Float64Array): void;
  /**
   * A tridiagonal approximation of the Jacobian ∂g/∂y at (t, y): row i has `lower[i]` (∂g_i/∂y_{i-1}),
   * `diag[i]` and `upper[i]` (∂g_i/∂y_{i+1}). `lower[0]` and `upper[size-1]` are ignored. Coupling
   * that is not tridiagonal is left out (it only slows the Newton iteration, never changes the answer).
   * Required by the implicit integrator; ignored by explicit ones.
   */
  jacobian?(t: number, y: Float64Array, lower: Float64Array, diag: Float64Array, upper: Float64Array): void;
  /**
   * Optional: add to `aux` the first-order change of the quadrature rates for a state change `delta`
   * about the state of the last `rhs` call. The implicit integrator uses it after the last Newton
   * correction of a stage, so that the rates it integrates are those of the accepted state (not of
   * the iterate before the correction) without another rhs evaluation.
   */
  auxChange?(delta: Float64Array, aux: Float64Array): void;
}

/** Values of the solution wanted between steps, filled by the integrator's own interpolant. */
export interface DenseOutput {
  /** Instants, strictly increasing, each after t0 and not after the last stop. */
  readonly instants: readonly number[];
  /** Called once per instant, in order, with a view valid only during the call (copy what you keep). */
  readonly onOutput: (t: number, y: Float64Array) => void;
}

export interface IntegratorOptions {
  /** Relative tolerance on each unknown. */
  readonly rtol: number;
  /** Absolute tolerance on each unknown (K for temperatures). */
  readonly atol: number;
  /** First trial step, s (optional; a safe guess is made otherwise). */
  readonly initialStep?: number;
  /** Largest step allowed, s. */
  readonly maxStep?: number;
  /** Hard cap on the number of attempted steps (guards against runaway); default 1e6. */
  readonly maxSteps?: number;
}

export interface IntegratorStats {
  steps: number;
  rejected: number;
  rhsEvaluations: number;
  jacobianEvaluations: number;
  newtonIterations: number;
  newtonFailures: number;
}

export interface IntegrationResult {
  /** State at the last stop. */
  readonly y: Float64Array;
  /** Integrated quadrature channels from t0 to the last stop (∫ aux dt). */
  readonly auxIntegral: Float64Array;
  /** Size of the last accepted step, s (to start the next call with). */
  readonly lastStep: number;
  readonly stats: IntegratorStats;
}

/**
 * Integrate from t0 through each of `stops` (strictly increasing, all > t0), landing exactly on
 * every stop. At each stop `onStop(t, y, auxIntegral)` is called with views valid only during the
 * call (copy what you keep). Stops are for discontinuities of the forcing (and for where the caller
 * must have the exact state); values at other instants come from `dense`, by interpolation within
 * the accepted steps, so they do not shorten the steps. Throws `IntegrationError` on failure (step size underflow, NaN, too
 * many steps) with a message a user can act on.
 */
export type Integrator = (
  system: OdeSystem,
  y0: Float64Array,
  t0: number,
  stops: readonly number[],
  options: IntegratorOptions,
  onStop?: (t: number, y: Float64Array, auxIntegral: Float64Array) => void,
  dense?: DenseOutput,
) => IntegrationResult;

export class IntegrationError extends Error {
  constructor(message: string, readonly t: number) {
    super(message);
    this.name = 'IntegrationError';
  }
}
