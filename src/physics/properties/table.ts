/**
 * Utilities on a `PropertyTable`: a property tabulated against temperature, linear between points
 * and constant beyond the ends ("clamped"). Used for k(T) and cp(T) of every wall material.
 *
 * The lookups sit on the integrator's hot path (every node, every right-hand-side evaluation), so
 * `interpolateTable` allocates nothing, and `makeTableLookup` precomputes slopes and remembers the
 * last interval it used (node temperatures change little between calls).
 */
/** A property tabulated against temperature; linear interpolation between points, constant beyond the ends. */
export interface PropertyTable {
  /** Strictly increasing temperatures, K. */
  readonly temperatureK: readonly number[];
  /** Property value at each temperature (unit given by the field that holds the table). */
  readonly values: readonly number[];
}

/**
 * Value of a clamped piecewise-linear table at `temperatureK`.
 *
 * f(T) = v₀ for T ≤ T₀, v_{n−1} for T ≥ T_{n−1}, otherwise linear between the two bracketing
 * points (binary search, O(log n), no allocation). A NaN temperature gives NaN.
 *
 * Example: table T = [300, 500], v = [10, 20] → f(400) = 15, f(250) = 10, f(900) = 20.
 */
export function interpolateTable(table: PropertyTable, temperatureK: number): number {
  const t = table.temperatureK;
  const v = table.values;
  const n = t.length;
  if (n === 1) return v[0];
  if (temperatureK <= t[0]) return v[0];
  if (temperatureK >= t[n - 1]) return v[n - 1];
  let lo = 0;
  let hi = n - 1;
  // Invariant: t[lo] <= T < t[hi] (NaN falls through every comparison and ends in NaN arithmetic).
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (t[mid] <= temperatureK) lo = mid;
    else hi = mid;
  }
  const t0 = t[lo];
  return v[lo] + ((v[hi] - v[lo]) * (temperatureK - t0)) / (t[hi] - t0);
}

/**
 * A fast lookup for one table: copies the points into typed arrays, precomputes each interval's
 * slope and starts each search from the interval used last (a short scan when temperatures move
 * slowly, as node temperatures do between integrator stages). Same result as `interpolateTable`.
 * The returned function allocates nothing.
 */
export function makeTableLookup(table: PropertyTable): (temperatureK: number) => number {
  const n = table.temperatureK.length;
  const t = Float64Array.from(table.temperatureK);
  const v = Float64Array.from(table.values);
  if (n === 1) {
    const only = v[0];
    return () => only;
  }
  const slope = new Float64Array(n - 1);
  for (let i = 0; i < n - 1; i++) slope[i] = (v[i + 1] - v[i]) / (t[i + 1] - t[i]);
  const tFirst = t[0];
  const tLast = t[n - 1];
  const vFirst = v[0];
  const vLast = v[n - 1];
  let last = 0; // index of the interval used last: t[last] <= T < t[last + 1]
  return (temperatureK: number): number => {
    if (temperatureK <= tFirst) return vFirst;
    if (temperatureK >= tLast) return vLast;
    // NaN fails every comparison: it keeps interval `last` and yields NaN arithmetic.
    let i = last;
    while (temperatureK < t[i]) i--;
    while (temperatureK >= t[i + 1]) i++;
    last = i;
    return v[i] + slope[i] * (temperatureK - t[i]);
  };
}

/**
 * Exact integral ∫_{t1K}^{t2K} f(T) dT of the clamped piecewise-linear table f, in
 * (unit of the values)·K — for cp(T) in J/(kg K) this is the specific enthalpy change in J/kg.
 *
 * Each piece is a trapezoid (exact for a linear function); beyond the ends f is constant, so
 * those parts are rectangles. Reversed limits (t2K < t1K) give the negative of the forward integral.
 * O(n), no allocation.
 *
 * Example: T = [300, 500], v = [10, 20]: ∫_{200}^{600} = 100·10 + 200·15 + 100·20 = 6000.
 */
export function integrateTable(table: PropertyTable, t1K: number, t2K: number): number {
  if (t2K < t1K) return -integrateTable(table, t2K, t1K);
  if (!(t2K > t1K)) return t1K === t2K ? 0 : NaN;
  const t = table.temperatureK;
  const v = table.values;
  const n = t.length;
  const a = t1K;
  const b = t2K;
  let sum = 0;
  // Below the first point: constant v[0].
  if (a < t[0]) sum += v[0] * (Math.min(b, t[0]) - a);
  // Above the last point: constant v[n-1].
  if (b > t[n - 1]) sum += v[n - 1] * (b - Math.max(a, t[n - 1]));
  // Interior intervals: trapezoid of the clipped part of each interval.
  for (let i = 0; i < n - 1; i++) {
    const ti = t[i];
    const tj = t[i + 1];
    if (tj <= a) continue;
    if (ti >= b) break;
    const lo = a > ti ? a : ti;
    const hi = b < tj ? b : tj;
    const s = (v[i + 1] - v[i]) / (tj - ti);
    const flo = v[i] + s * (lo - ti);
    const fhi = v[i] + s * (hi - ti);
    sum += 0.5 * (flo + fhi) * (hi - lo);
  }
  return sum;
}

/**
 * Problems with a table, as plain messages naming it (empty when the table is usable):
 * lengths differ, no points, temperatures not finite or not strictly increasing or not above 0 K,
 * values not finite or not positive. `name` says which table, e.g. `carbon-steel conductivity`.
 */
export function validateTable(table: PropertyTable, name: string): string[] {
  const problems: string[] = [];
  const t = table.temperatureK;
  const v = table.values;
  if (t.length !== v.length) {
    problems.push(`${name}: ${t.length} temperatures but ${v.length} values (they must pair up)`);
  }
  if (t.length < 1 || v.length < 1) {
    problems.push(`${name}: the table has no points (at least one is needed)`);
  }
  for (let i = 0; i < t.length; i++) {
    if (!Number.isFinite(t[i])) problems.push(`${name}: temperature #${i + 1} is not a finite number (${t[i]})`);
    else if (t[i] <= 0) problems.push(`${name}: temperature #${i + 1} is ${t[i]} K; temperatures are absolute (K) and must be above 0`);
    if (i > 0 && Number.isFinite(t[i]) && Number.isFinite(t[i - 1]) && !(t[i] > t[i - 1])) {
      problems.push(`${name}: temperatures must be strictly increasing, but #${i + 1} (${t[i]} K) is not above #${i} (${t[i - 1]} K)`);
    }
  }
  for (let i = 0; i < v.length; i++) {
    if (!Number.isFinite(v[i])) problems.push(`${name}: value #${i + 1} is not a finite number (${v[i]})`);
    else if (v[i] <= 0) problems.push(`${name}: value #${i + 1} is ${v[i]}; property values must be positive`);
  }
  return problems;
}
