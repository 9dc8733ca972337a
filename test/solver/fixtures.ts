/** Test problems shared by the integrator tests. */
import type { OdeSystem } from '../../src/solver/index.ts';

/**
 * 1-D heat equation u_t = u_xx on (0, 1), u = 0 at both ends, N interior nodes, second-order
 * central differences: y_i' = (y_{i−1} − 2 y_i + y_{i+1}) / Δx², Δx = 1/(N + 1), c = 1/Δx²;
 * stiff for large N (largest eigenvalue ≈ 4c). `offDiagonalInJacobian = false` hands the integrator
 * a Jacobian with the coupling left out.
 */
export function heatEquation(nodes: number, offDiagonalInJacobian = true): OdeSystem & { readonly c: number } {
  const dx = 1 / (nodes + 1);
  const c = 1 / (dx * dx);
  return {
    c,
    size: nodes,
    auxSize: 0,
    rhs(_t, y, dydt) {
      for (let i = 0; i < nodes; i++) {
        dydt[i] = c * ((i > 0 ? y[i - 1]! : 0) - 2 * y[i]! + (i < nodes - 1 ? y[i + 1]! : 0));
      }
    },
    jacobian(_t, _y, lower, diag, upper) {
      lower.fill(offDiagonalInJacobian ? c : 0);
      upper.fill(offDiagonalInJacobian ? c : 0);
      diag.fill(-2 * c);
    },
  };
}
