/**
 * What the explicit RK45 reference would cost on a model: its step is bounded by stability on the
 * stiffest mode of the wall (a thin, conductive cell: a few seconds), so the steps it needs are the
 * run's length over that bound, whatever the tolerance. Estimated before anything runs, from the
 * Gershgorin bound on the tridiagonal Jacobian at a uniform wall between air and inlet gas
 * temperature (conductivities change little with temperature; the estimate is meant to a factor
 * of about 2, enough to refuse a run of hours up front).
 */
import type { AssembledModel } from './assemble.ts';
import { gershgorinSpectralBound, stabilityLimitedSteps, DORMAND_PRINCE_REAL_STABILITY_LIMIT } from '../solver/stiffness.ts';

export interface ExplicitStepEstimate {
  /** Steps Dormand–Prince needs over the run, stability-limited. */
  readonly steps: number;
  /** Bound on the largest |eigenvalue| of the Jacobian, 1/s. */
  readonly spectralRadius: number;
  /** The largest stable step, s. */
  readonly stableStepS: number;
  /** The node that sets it: its segment, its position label (e.g. `node_3`, `outer_surface`). */
  readonly segment: number;
  readonly node: string;
}

/** Steps the explicit RK45 reference needs for `durationS` seconds of the assembled model from run time `t0`. */
export function estimateExplicitSteps(model: AssembledModel, t0: number, durationS: number): ExplicitStepEstimate {
  const { system, mesh } = model;
  const d = system.driversAt(t0);
  const y = new Float64Array(system.size).fill(0.5 * (d.airTemperatureK + d.inletTemperatureK));
  const lower = new Float64Array(system.size);
  const diag = new Float64Array(system.size);
  const upper = new Float64Array(system.size);
  system.jacobian(t0, y, lower, diag, upper);
  const { bound, row } = gershgorinSpectralBound(lower, diag, upper);
  return { steps: stabilityLimitedSteps(bound, durationS), spectralRadius: bound, stableStepS: DORMAND_PRINCE_REAL_STABILITY_LIMIT / bound, segment: Math.floor(row / system.n), node: mesh.label[row % system.n] ?? `node ${row % system.n}` };
}
