/**
 * Rainflow cycle counting after ASTM E1049-85 (reapproved 2011), "Standard Practices for Cycle
 * Counting in Fatigue Analysis", § 5.4.4 "Rainflow Counting" — the three-point method that counts
 * the ranges containing the starting point as half cycles, and the residue at the end as half cycles.
 *
 * A history is first reduced to its turning points (peaks and valleys): the first and the last
 * values are kept, values that continue a rise or a fall are dropped, and a run of equal values
 * counts once (at its first sample). The counting rules of § 5.4.4, applied to turning points read
 * one at a time (X = the most recent range, Y = the range before it, S = the starting point):
 *   1. read the next turning point; at the end of the data go to 6;
 *   2. with fewer than three points go to 1; form X and Y from the three most recent points not
 *      yet discarded;
 *   3. if X < Y go to 1;
 *   4. if Y contains S go to 5; otherwise count Y as one cycle, discard both its points, go to 2;
 *   5. count Y as one-half cycle, discard its first point (S), move S to its second point, go to 2;
 *   6. count every range not yet counted as one-half cycle.
 *
 * Worked example (ASTM E1049 Fig. 6): −2, 1, −3, 5, −1, 3, −4, 4, −2 gives ranges 3 (½), 4 (1½),
 * 6 (½), 8 (1), 9 (½).
 *
 * Two forms: {@link rainflowCycles} counts a whole series held in memory; {@link makeRainflowCounter}
 * takes values one at a time and keeps only the open reversals (the residue) — its memory is bounded
 * by the number of open reversals, not by the length of the series — and hands each cycle to a
 * callback as soon as it closes. {@link makeRangeHistogram} bins cycles by range as they come.
 *
 * A gate (hysteresis filter, common practice in fatigue cycle counting; not part of E1049) may be
 * set on the streaming counter: a reversal is taken only once the history has moved back from the
 * pending extreme by at least the gate, so wiggles smaller than the gate (numerical noise, a
 * quantity that hardly moves) count as nothing instead of as many tiny cycles. The largest ranges
 * are unchanged by it; every range below the gate, and only those, can disappear. Gate 0 is the
 * plain E1049 counting.
 *
 * Units: whatever the values carry (e.g. K for a temperature difference); ranges and means in the
 * same unit. A histogram of ranges is an input to a fatigue judgement, not a judgement itself.
 */

/** One counted cycle or half cycle. */
export interface RainflowCycle {
  /** Range |a − b| between the two turning points, in the unit of the values. */
  readonly range: number;
  /** Mean (a + b)/2 of the two turning points. */
  readonly mean: number;
  /** 1 for a full cycle, 0.5 for a half cycle. */
  readonly count: 1 | 0.5;
  /** Sample index (0-based, in the input series) of the earlier turning point. */
  readonly startIndex: number;
  /** Sample index of the later turning point. */
  readonly endIndex: number;
}

/** Turning points of a series: the kept values and their sample indices. */
export interface TurningPoints {
  readonly values: Float64Array;
  readonly indices: Int32Array;
}

function checkFinite(v: number, index: number): void {
  if (!Number.isFinite(v)) throw new RangeError(`rainflow: value ${v} at sample ${index} is not a finite number`);
}

/**
 * Peaks and valleys of `series` (first and last samples included; a plateau counts once, at its
 * first sample). Example: [0, 1, 2, 2, 1, 1, 3] → values [0, 2, 1, 3] at indices [0, 2, 4, 6].
 * Throws a RangeError for a value that is not finite.
 */
export function turningPoints(series: ArrayLike<number>): TurningPoints {
  const n = series.length;
  // drop repeats (a plateau keeps its first sample)
  const v: number[] = [];
  const idx: number[] = [];
  for (let i = 0; i < n; i++) {
    checkFinite(series[i], i);
    if (v.length === 0 || series[i] !== v[v.length - 1]) {
      v.push(series[i]);
      idx.push(i);
    }
  }
  const keepV: number[] = [];
  const keepI: number[] = [];
  for (let k = 0; k < v.length; k++) {
    // a point is a reversal when the slopes on its two sides have opposite signs; the ends are kept
    const isEnd = k === 0 || k === v.length - 1;
    if (isEnd || (v[k] - v[k - 1]) * (v[k + 1] - v[k]) < 0) {
      keepV.push(v[k]);
      keepI.push(idx[k]);
    }
  }
  return { values: Float64Array.from(keepV), indices: Int32Array.from(keepI) };
}

const cycle = (a: number, b: number, ia: number, ib: number, count: 1 | 0.5): RainflowCycle => ({
  range: Math.abs(b - a),
  mean: (a + b) / 2,
  count,
  startIndex: ia,
  endIndex: ib,
});

/**
 * All cycles and half cycles of `series` by the ASTM E1049 § 5.4.4 rules (see the module note), in
 * the order they are counted. This batch form follows the standard's steps literally on the list
 * of turning points; {@link makeRainflowCounter} gives the same cycles from a stream.
 */
export function rainflowCycles(series: ArrayLike<number>): RainflowCycle[] {
  const tp = turningPoints(series);
  const out: RainflowCycle[] = [];
  // points not yet discarded, as positions into tp; the starting point S is always kept[0]
  const kept: number[] = [];
  for (let next = 0; next < tp.values.length; next++) {
    kept.push(next); // step 1
    for (;;) {
      const m = kept.length;
      if (m < 3) break; // step 2
      const [p0, p1, p2] = [kept[m - 3], kept[m - 2], kept[m - 1]];
      const x = Math.abs(tp.values[p2] - tp.values[p1]);
      const y = Math.abs(tp.values[p1] - tp.values[p0]);
      if (x < y) break; // step 3
      if (m - 3 === 0) {
        // step 5: Y contains S
        out.push(cycle(tp.values[p0], tp.values[p1], tp.indices[p0], tp.indices[p1], 0.5));
        kept.splice(0, 1);
      } else {
        // step 4
        out.push(cycle(tp.values[p0], tp.values[p1], tp.indices[p0], tp.indices[p1], 1));
        kept.splice(m - 3, 2);
      }
    }
  }
  for (let k = 0; k + 1 < kept.length; k++) {
    // step 6: the residue
    const [a, b] = [kept[k], kept[k + 1]];
    out.push(cycle(tp.values[a], tp.values[b], tp.indices[a], tp.indices[b], 0.5));
  }
  return out;
}

/** A rainflow counter fed one value at a time. */
export interface RainflowCounter {
  /** Add the next sample of the history. Throws a RangeError for a value that is not finite. */
  push(value: number): void;
  /**
   * End of the history: the last pending extreme becomes a turning point and the residue is counted
   * as half cycles (ASTM step 6). The counter accepts no values after this.
   */
  close(): void;
  /** Reversals held now (residue on the stack plus a pending extreme): the counter's memory. */
  readonly openReversals: number;
  /** Samples pushed so far. */
  readonly samples: number;
}

/**
 * A streaming rainflow counter: the same counting as {@link rainflowCycles}, with the turning-point
 * filter run on the fly and the residue kept on a stack; `onCycle` receives each cycle when it is
 * counted (half cycles of the residue on `close`). Memory: the stack of open reversals only.
 * `options.gate` (≥ 0, unit of the values; default 0): the hysteresis gate of the module note.
 */
export function makeRainflowCounter(onCycle: (c: RainflowCycle) => void, options: { readonly gate?: number } = {}): RainflowCounter {
  const gate = options.gate ?? 0;
  if (!(gate >= 0 && Number.isFinite(gate))) throw new RangeError(`rainflow: gate ${gate} must be a finite number ≥ 0`);
  // a move of `d` away from the reference counts as a move (plain counting: any change)
  const moves = (d: number): boolean => (gate > 0 ? d >= gate : d > 0);
  const stackV: number[] = [];
  const stackI: number[] = [];
  let samples = 0;
  let closed = false;
  // turning-point filter state: the pending extreme (not yet known to be a reversal)
  let pendingV = NaN;
  let pendingI = -1;
  let direction = 0; // +1 rising towards the pending extreme, −1 falling, 0 none pending

  const count = (): void => {
    for (;;) {
      const m = stackV.length;
      if (m < 3) return;
      const x = Math.abs(stackV[m - 1] - stackV[m - 2]);
      const y = Math.abs(stackV[m - 2] - stackV[m - 3]);
      if (x < y) return;
      if (m === 3) {
        onCycle(cycle(stackV[0], stackV[1], stackI[0], stackI[1], 0.5));
        stackV.shift();
        stackI.shift();
      } else {
        onCycle(cycle(stackV[m - 3], stackV[m - 2], stackI[m - 3], stackI[m - 2], 1));
        stackV.splice(m - 3, 2);
        stackI.splice(m - 3, 2);
      }
    }
  };
  const reversal = (v: number, i: number): void => {
    stackV.push(v);
    stackI.push(i);
    count();
  };

  return {
    push(value) {
      if (closed) throw new Error('rainflow: the counter is closed');
      checkFinite(value, samples);
      const i = samples++;
      if (i === 0) {
        reversal(value, i); // the first sample is always a turning point
        return;
      }
      if (direction === 0) {
        const last = stackV[stackV.length - 1];
        if (!moves(Math.abs(value - last))) return;
        pendingV = value;
        pendingI = i;
        direction = value > last ? 1 : -1;
        return;
      }
      if ((value - pendingV) * direction > 0) {
        pendingV = value; // the rise (or fall) goes on
        pendingI = i;
      } else if (moves((pendingV - value) * direction)) {
        reversal(pendingV, pendingI); // the pending extreme was a peak (valley)
        pendingV = value;
        pendingI = i;
        direction = -direction;
      }
    },
    close() {
      if (closed) return;
      closed = true;
      if (direction !== 0) reversal(pendingV, pendingI);
      direction = 0;
      for (let k = 0; k + 1 < stackV.length; k++) onCycle(cycle(stackV[k], stackV[k + 1], stackI[k], stackI[k + 1], 0.5));
      stackV.length = 0;
      stackI.length = 0;
    },
    get openReversals() {
      return stackV.length + (direction !== 0 ? 1 : 0);
    },
    get samples() {
      return samples;
    },
  };
}

/** Counts of cycles per range bin. */
export interface RangeHistogram {
  /** Width of each bin; bin k holds ranges in [k·binWidth, (k+1)·binWidth). */
  readonly binWidth: number;
  /** Cycle counts per bin (full = 1, half = 0.5); as many bins as the largest range needs. */
  readonly counts: number[];
  /** Sum of all counts. */
  readonly total: number;
  /** For each threshold asked for: the count of cycles whose range is strictly above it (exact, not binned). */
  readonly countAbove: ReadonlyArray<{ readonly threshold: number; readonly count: number }>;
  /** Largest range seen (0 when none). */
  readonly largestRange: number;
}

/** Accumulates a {@link RangeHistogram} from cycles as they come (memory: one number per bin). */
export interface RangeHistogramBuilder {
  add(c: RainflowCycle): void;
  result(): RangeHistogram;
}

/** Start a histogram of ranges with bins of `binWidth` (> 0) and the given thresholds. */
export function makeRangeHistogram(options: { binWidth: number; thresholds?: readonly number[] }): RangeHistogramBuilder {
  const { binWidth } = options;
  const thresholds = [...(options.thresholds ?? [])];
  if (!(binWidth > 0 && Number.isFinite(binWidth))) throw new RangeError(`histogram bin width ${binWidth} must be a positive number`);
  for (const t of thresholds) if (!Number.isFinite(t)) throw new RangeError(`histogram threshold ${t} is not a number`);
  const counts: number[] = [];
  const above = thresholds.map(() => 0);
  let total = 0;
  let largestRange = 0;
  return {
    add(c) {
      const k = Math.floor(c.range / binWidth);
      while (counts.length <= k) counts.push(0);
      counts[k] += c.count;
      total += c.count;
      largestRange = Math.max(largestRange, c.range);
      thresholds.forEach((t, j) => {
        if (c.range > t) above[j] += c.count;
      });
    },
    result() {
      return { binWidth, counts: [...counts], total, countAbove: thresholds.map((threshold, j) => ({ threshold, count: above[j] })), largestRange };
    },
  };
}

/** Histogram of the ranges of `cycles` (see {@link makeRangeHistogram}). */
export function rangeHistogram(cycles: Iterable<RainflowCycle>, options: { binWidth: number; thresholds?: readonly number[] }): RangeHistogram {
  const h = makeRangeHistogram(options);
  for (const c of cycles) h.add(c);
  return h.result();
}
