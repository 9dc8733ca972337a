/**
 * Where the radial cells of one wall layer go: the automatic mesh rule (docs/model.md "Automatic
 * mesh").
 *
 * A disturbance that has acted on a face for a time t reaches about ℓ(t) = √(α t) into the solid
 * (the length of the error-function solution, Carslaw & Jaeger 1959, §2.4), with an amplitude that
 * falls off over that length. The second-order finite-volume scheme resolves such a profile to a
 * fixed fraction of its amplitude with cells a fixed fraction of ℓ, and the error a cell makes
 * scales with h² times the local amplitude, so a cell at distance d from the face may grow as the
 * amplitude decays: h ≤ (ℓ/M) e^{d/(2ℓ)}. A forcing of time scale τ (a ramp's duration, a step
 * seen at the first output instant) is felt on every scale from ℓ(τ) up to a day's ℓ(P) (the
 * reported day; a daily wave reaches δ = √(αP/π) < ℓ(P)); the smallest limit over those scales is
 *
 *   h(d) = (λ/M) e^{d/(2λ)},   λ = min(max(d/2, ℓ(τ)), ℓ(P)),   M = CELLS_PER_FORCING_LENGTH,
 *
 * i.e. ℓ(τ)/M at the face growing exponentially over the first 2ℓ(τ), then growing linearly as
 * (e/2M)·d (a step's profile is self-similar in d/√t), then exponentially again beyond 2ℓ(P).
 * h(x) is the smallest of these over the layer's forced faces, and never more than half the layer.
 * Cells are spaced evenly in the stretched coordinate ξ(x) = ∫₀ˣ dx′/h(x′): the layer gets
 * n = max(2, ⌈ξ(L)⌉) cells with faces at ξ = i ξ(L)/n, so successive cells grow by a factor of
 * about e^{h/(2λ)} ≤ 1.3 where it matters. A refinement by r puts r·n cells on the same ξ, so every
 * cell is cut into r (the meshes nest). Above MAX_AUTO_CELLS the count is capped (the faces keep
 * their grading) and the cap is reported, never silent.
 *
 * M = 20 is measured, not derived: with it the default run stays within 0.1 K of converged and
 * analytic references on a 300 K step and a one-hour 310 K ramp (test/model/accuracy.test.ts); a
 * larger swing scales the error in proportion, which the run's accuracy estimate reports.
 *
 * Worked example: α = 5e-7 m²/s, L = 0.1 m, inner face forced by a 30 min ramp (τ = 1800 s),
 * outer face not forced: ℓ(τ) = 30 mm, ℓ(P) = 208 mm; h = 1.5 mm at the face, 4.1 mm at 60 mm,
 * 6.8 mm at the outer face; 33 cells, from 1.51 mm to 6.53 mm (the daily rule of earlier
 * versions gave 7 equal cells).
 */
import { SECONDS_PER_DAY } from '../constants.ts';

/** Cells per penetration length at a forced face (M in the module note). */
export const CELLS_PER_FORCING_LENGTH = 20;
/** Time scale of the daily wave, s: P/π, so that √(α P/π) is the daily penetration depth δ. */
export const DAILY_TIME_SCALE_S = SECONDS_PER_DAY / Math.PI;
/** Most cells an automatic layer gets (before any refinement); a layer that needs more is capped and reported. */
export const MAX_AUTO_CELLS = 200;
/** Fewest cells a layer gets (a node inside every layer). */
export const MIN_CELLS = 2;

/** The forcing that acts on each face of one layer: its time scale, s (Infinity: the face is not forced). */
export interface FaceForcing {
  readonly innerTimeScaleS: number;
  readonly outerTimeScaleS: number;
}

export interface LayerCells {
  /** Cell faces as distances from the layer's inner face, m: n + 1 values from 0 to the thickness. */
  readonly faces: Float64Array;
  /** Whether MAX_AUTO_CELLS capped the count. */
  readonly capped: boolean;
}

/** Penetration length √(α τ) of a disturbance of time scale τ (s) into a solid of diffusivity α (m²/s), m. */
export function forcingLength(diffusivity: number, timeScaleS: number): number {
  return Math.sqrt(diffusivity * timeScaleS);
}

/**
 * The largest cell size, m, at distance d (m) from a face whose fastest forcing reaches
 * `fastestLength` = ℓ(τ) and whose slowest relevant one `longestLength` = ℓ(P) (module note).
 * Example: ℓ(τ) = 0.03 m, ℓ(P) = 0.208 m: d = 0 → 1.5 mm; d = 0.06 m → 4.08 mm.
 */
export function cellSizeFromFace(distance: number, fastestLength: number, longestLength: number): number {
  // the penetration length, between the forcing's and a day's, that limits the cell most here
  const l = Math.min(Math.max(distance / 2, fastestLength), longestLength);
  return (l / CELLS_PER_FORCING_LENGTH) * Math.exp(distance / (2 * l));
}

/** Sub-intervals of the numerical stretched coordinate (trapezoidal rule on 1/h, then inverted piecewise linearly). */
const QUADRATURE_INTERVALS = 1024;

/**
 * Cell faces of a layer of thickness L (m) and diffusivity α (m²/s) by the automatic rule (module
 * note), with `refinement` times the cells on the same stretched coordinate. Example: α = 5e-7 m²/s,
 * L = 0.1 m, inner τ = 1800 s, outer not forced → 33 cells, the first 1.51 mm thick.
 */
export function autoLayerCells(thickness: number, diffusivity: number, forcing: FaceForcing, refinement = 1): LayerCells {
  const longest = forcingLength(diffusivity, SECONDS_PER_DAY);
  const fastest = (timeScaleS: number) => (Number.isFinite(timeScaleS) ? forcingLength(diffusivity, Math.min(timeScaleS, SECONDS_PER_DAY)) : Infinity);
  const inner = fastest(forcing.innerTimeScaleS);
  const outer = fastest(forcing.outerTimeScaleS);
  const sizeAt = (x: number): number =>
    Math.min(
      thickness / MIN_CELLS,
      Number.isFinite(inner) ? cellSizeFromFace(x, inner, longest) : Infinity,
      Number.isFinite(outer) ? cellSizeFromFace(thickness - x, outer, longest) : Infinity,
    );
  const m = QUADRATURE_INTERVALS;
  const dx = thickness / m;
  const xi = new Float64Array(m + 1);
  let previous = 1 / sizeAt(0);
  for (let k = 1; k <= m; k++) {
    const next = 1 / sizeAt(k * dx);
    xi[k] = xi[k - 1]! + 0.5 * (previous + next) * dx;
    previous = next;
  }
  const total = xi[m]!;
  // a hair below the integer so that rounding in the quadrature does not add a cell
  const wanted = Math.max(MIN_CELLS, Math.ceil(total - 1e-9));
  const capped = wanted > MAX_AUTO_CELLS;
  const n = Math.min(wanted, MAX_AUTO_CELLS) * refinement;
  const faces = new Float64Array(n + 1);
  let k = 0;
  for (let i = 1; i < n; i++) {
    const target = (i * total) / n;
    while (xi[k + 1]! < target) k++;
    faces[i] = (k + (target - xi[k]!) / (xi[k + 1]! - xi[k]!)) * dx;
  }
  faces[n] = thickness;
  return { faces, capped };
}

/** Faces of `cells` equal cells across a layer of thickness L, m (a user-given cell count). */
export function uniformLayerCells(thickness: number, cells: number): LayerCells {
  return { faces: Float64Array.from({ length: cells + 1 }, (_, i) => (i === cells ? thickness : (i * thickness) / cells)), capped: false };
}
