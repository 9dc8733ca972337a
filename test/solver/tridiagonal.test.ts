import { describe, expect, it } from 'vitest';
import { solveTridiagonal } from '../../src/solver/index.ts';

/** Small seeded generator (mulberry32) so that the random systems are the same on every run. */
function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let r = Math.imul(a ^ (a >>> 15), 1 | a);
    r = (r + Math.imul(r ^ (r >>> 7), 61 | r)) ^ r;
    return ((r ^ (r >>> 14)) >>> 0) / 4294967296;
  };
}

/** Reference: dense Gaussian elimination with partial pivoting (textbook algorithm). */
function denseSolve(matrix: number[][], rhs: number[]): number[] {
  const n = rhs.length;
  const a = matrix.map((row, i) => [...row, rhs[i]]);
  for (let col = 0; col < n; col++) {
    let pivotRow = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(a[r][col]) > Math.abs(a[pivotRow][col])) pivotRow = r;
    [a[col], a[pivotRow]] = [a[pivotRow], a[col]];
    for (let r = col + 1; r < n; r++) {
      const factor = a[r][col] / a[col][col];
      for (let c = col; c <= n; c++) a[r][c] -= factor * a[col][c];
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    let sum = a[r][n];
    for (let c = r + 1; c < n; c++) sum -= a[r][c] * x[c];
    x[r] = sum / a[r][r];
  }
  return x;
}

/** A random strictly diagonally dominant tridiagonal system of size n (bands and dense copy). */
function randomDominantSystem(n: number, random: () => number) {
  const lower = new Float64Array(n);
  const diag = new Float64Array(n);
  const upper = new Float64Array(n);
  const rhs = new Float64Array(n);
  const dense = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let i = 0; i < n; i++) {
    lower[i] = i > 0 ? 2 * random() - 1 : 1e300; // lower[0] must be ignored: a huge value would show
    upper[i] = i < n - 1 ? 2 * random() - 1 : 1e300; // upper[n-1] likewise
    const offSum = (i > 0 ? Math.abs(lower[i]) : 0) + (i < n - 1 ? Math.abs(upper[i]) : 0);
    diag[i] = (random() < 0.5 ? -1 : 1) * (offSum + 0.1 + random());
    rhs[i] = 10 * (2 * random() - 1);
    dense[i][i] = diag[i];
    if (i > 0) dense[i][i - 1] = lower[i];
    if (i < n - 1) dense[i][i + 1] = upper[i];
  }
  return { lower, diag, upper, rhs, dense };
}

describe('solveTridiagonal (Thomas algorithm)', () => {
  it('matches dense Gaussian elimination on random diagonally dominant systems of size 1 to 60', () => {
    const random = seededRandom(20240611);
    for (const n of [1, 2, 3, 5, 17, 60]) {
      for (let trial = 0; trial < 20; trial++) {
        const { lower, diag, upper, rhs, dense } = randomDominantSystem(n, random);
        const out = new Float64Array(n);
        solveTridiagonal(lower, diag, upper, rhs, out, new Float64Array(n));
        const reference = denseSolve(dense, Array.from(rhs));
        for (let i = 0; i < n; i++) {
          // Both are backward stable on these well-conditioned (dominant) matrices: agreement to a
          // few hundred ulps of the solution's size.
          expect(Math.abs(out[i] - reference[i])).toBeLessThan(1e-12 * (1 + Math.abs(reference[i])));
        }
      }
    }
  });

  it('solves the worked example [2 −1 0; −1 2 −1; 0 −1 2] x = [1, 0, 1] to x = [1, 1, 1]', () => {
    // Exact by hand: row 1: 2 − 1 = 1, row 2: −1 + 2 − 1 = 0, row 3: −1 + 2 = 1.
    const band = new Float64Array([-1, -1, -1]);
    const out = new Float64Array(3);
    solveTridiagonal(band, new Float64Array([2, 2, 2]), band, new Float64Array([1, 0, 1]), out, new Float64Array(3));
    // Rounding only: a handful of operations on numbers of order 1.
    for (const v of out) expect(v).toBeCloseTo(1, 14);
  });

  it('may write the solution over the right-hand side (out === rhs)', () => {
    const random = seededRandom(7);
    const { lower, diag, upper, rhs, dense } = randomDominantSystem(25, random);
    const reference = denseSolve(dense, Array.from(rhs));
    solveTridiagonal(lower, diag, upper, rhs, rhs, new Float64Array(25));
    // Same reason as the random-system tolerance above.
    for (let i = 0; i < 25; i++) expect(Math.abs(rhs[i] - reference[i])).toBeLessThan(1e-12 * (1 + Math.abs(reference[i])));
  });
});
