/**
 * Public entry of the time integrators: pick one by name from `INTEGRATORS`.
 *
 * - `implicit`: TR-BDF2 (L-stable, tridiagonal Newton) for the stiff wall model — the default.
 * - `rk45`: explicit Dormand–Prince 5(4), a reference for tests and benchmarks.
 */
import { integrateDormandPrince } from './dormandPrince.ts';
import { integrateTrBdf2 } from './trbdf2.ts';

export { integrateDormandPrince } from './dormandPrince.ts';
export { integrateTrBdf2 } from './trbdf2.ts';
export { solveTridiagonal } from './tridiagonal.ts';
export { gershgorinSpectralBound, stabilityLimitedSteps, DORMAND_PRINCE_REAL_STABILITY_LIMIT } from './stiffness.ts';
export { IntegrationError } from './types.ts';
export type {
  DenseOutput,
  IntegrationResult,
  Integrator,
  IntegratorOptions,
  IntegratorStats,
  OdeSystem,
} from './types.ts';

/** The integrators selectable by name (scenario files, command line). */
export const INTEGRATORS = {
  implicit: integrateTrBdf2,
  rk45: integrateDormandPrince,
} as const;

/** Name of a selectable integrator. */
export type IntegratorName = keyof typeof INTEGRATORS;
