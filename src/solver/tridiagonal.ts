/**
 * Solve the tridiagonal system A x = rhs by the Thomas algorithm (Gaussian elimination without
 * pivoting, specialised to three bands): one forward sweep, one back substitution, O(N) work.
 *
 * Row i of A is `lower[i] · x[i-1] + diag[i] · x[i] + upper[i] · x[i+1]`; `lower[0]` and
 * `upper[N-1]` are ignored (never read). All arrays have length N = `diag.length`.
 *
 * Stability: without pivoting the algorithm is safe when A is diagonally dominant
 * (|diag[i]| ≥ |lower[i]| + |upper[i]|, strictly in at least one row) or symmetric positive
 * definite. The matrices built by the integrators, I − γ h J with J the Jacobian of conduction
 * between neighbouring nodes (diag[i] = −(lower[i] + upper[i]) − losses, off-diagonals ≥ 0), are
 * strictly diagonally dominant for every h > 0, so no pivoting is needed. A zero pivot (only
 * possible for a matrix that is not dominant) yields non-finite values in `out`, which the
 * integrators treat as a failed Newton iteration.
 *
 * No allocation: `scratch` (length ≥ N) holds the modified upper band. `out` may be the same
 * array as `rhs` (each rhs[i] is read before out[i] is written); it must not alias the bands or
 * `scratch`.
 *
 * Source: L. H. Thomas (1949), "Elliptic problems in linear difference equations over a network",
 * Watson Sci. Comput. Lab. report, Columbia University; textbook form in G. H. Golub & C. F. Van
 * Loan, Matrix Computations (banded systems, LU without pivoting). References from memory.
 *
 * Example: diag = [2, 2, 2], lower = upper = [−1, −1, −1], rhs = [1, 0, 1] → x = [1, 1, 1].
 */
export function solveTridiagonal(
  lower: Float64Array,
  diag: Float64Array,
  upper: Float64Array,
  rhs: Float64Array,
  out: Float64Array,
  scratch: Float64Array,
): void {
  const n = diag.length;
  if (n === 0) return;
  // Forward sweep: scratch[i] = modified upper band c'_i, out[i] = modified right-hand side d'_i.
  let pivot = diag[0];
  let previous = rhs[0] / pivot;
  out[0] = previous;
  for (let i = 1; i < n; i++) {
    const cPrev = upper[i - 1] / pivot;
    scratch[i - 1] = cPrev;
    const a = lower[i];
    pivot = diag[i] - a * cPrev;
    previous = (rhs[i] - a * previous) / pivot;
    out[i] = previous;
  }
  // Back substitution: x[i] = d'_i − c'_i x[i+1].
  for (let i = n - 2; i >= 0; i--) {
    out[i] -= scratch[i] * out[i + 1];
  }
}
