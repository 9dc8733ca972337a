import { describe, expect, it } from 'vitest';
import {
  makeRainflowCounter,
  makeRangeHistogram,
  rainflowCycles,
  rangeHistogram,
  turningPoints,
  type RainflowCycle,
} from '../../src/analysis/rainflow.ts';
import { seededUniform } from '../../scripts/random.ts';

/** Cycles of `series` through the streaming counter, fed one value at a time. */
function streamed(series: ArrayLike<number>): { cycles: RainflowCycle[]; mostOpen: number } {
  const cycles: RainflowCycle[] = [];
  const counter = makeRainflowCounter((c) => cycles.push(c));
  let mostOpen = 0;
  for (let i = 0; i < series.length; i++) {
    counter.push(series[i]);
    mostOpen = Math.max(mostOpen, counter.openReversals);
  }
  counter.close();
  return { cycles, mostOpen };
}

/** Counts per range, sorted by range: [[range, count], …]. */
function table(cycles: RainflowCycle[]): [number, number][] {
  const m = new Map<number, number>();
  for (const c of cycles) m.set(c.range, (m.get(c.range) ?? 0) + c.count);
  return [...m].sort((a, b) => a[0] - b[0]);
}

/** Seeded uniform numbers, so that every run tests the same series. */
const random = seededUniform;

// ASTM E1049-85 (2011), Fig. 6 "Rainflow Counting Example": the load history A…I below and the
// counted table (f): range 3 → 0.5 (A-B), 4 → 1.5 (B-C, E-F), 6 → 0.5 (H-I), 8 → 1.0 (C-D, G-H),
// 9 → 0.5 (D-G); all other ranges 0. The history and the table are quoted from memory in the brief;
// checked here against the same example as quoted in an issue of the `rainflow` Python package
// (iamlikeme/rainflow#4, which reproduces the ASTM history and result table) and by hand, step by
// step through § 5.4.4 (see the ordered list below).
const ASTM_FIG6 = [-2, 1, -3, 5, -1, 3, -4, 4, -2];

describe('rainflow counting: ASTM E1049 worked example', () => {
  it('gives the counted table of Fig. 6', () => {
    expect(table(rainflowCycles(ASTM_FIG6))).toEqual([
      [3, 0.5],
      [4, 1.5],
      [6, 0.5],
      [8, 1.0],
      [9, 0.5],
    ]);
  });

  it('counts the cycles in the order of the standard\'s steps, with the right points', () => {
    // By hand through § 5.4.4: A-B half (contains S), B-C half (contains S), E-F full, C-D half
    // (contains S), then the residue D-G, G-H, H-I as halves.
    const got = rainflowCycles(ASTM_FIG6).map((c) => [c.startIndex, c.endIndex, c.count, c.mean]);
    expect(got).toEqual([
      [0, 1, 0.5, -0.5], // A-B: −2 → 1
      [1, 2, 0.5, -1], // B-C: 1 → −3
      [4, 5, 1, 1], // E-F: −1 → 3
      [2, 3, 0.5, 1], // C-D: −3 → 5
      [3, 6, 0.5, 0.5], // D-G: 5 → −4
      [6, 7, 0.5, 0], // G-H: −4 → 4
      [7, 8, 0.5, 1], // H-I: 4 → −2
    ]);
  });

  it('gives the same table from the streaming counter', () => {
    expect(table(streamed(ASTM_FIG6).cycles)).toEqual(table(rainflowCycles(ASTM_FIG6)));
  });

  it('bins the example into the table with the count above a threshold', () => {
    const h = rangeHistogram(rainflowCycles(ASTM_FIG6), { binWidth: 1, thresholds: [5, 8, 9] });
    expect(h.counts).toEqual([0, 0, 0, 0.5, 1.5, 0, 0.5, 0, 1, 0.5]);
    expect(h.total).toBe(4); // 7 entries: 6 halves + 1 full = 4 cycles
    // above 5: 6 (0.5) + 8 (1.0) + 9 (0.5); above 8: 9 only; above 9: none (strictly above)
    expect(h.countAbove).toEqual([
      { threshold: 5, count: 2 },
      { threshold: 8, count: 0.5 },
      { threshold: 9, count: 0 },
    ]);
    expect(h.largestRange).toBe(9);
  });
});

describe('turningPoints', () => {
  it('keeps peaks, valleys and both ends; a plateau once, at its first sample', () => {
    const tp = turningPoints([0, 1, 2, 2, 1, 1, 3]);
    expect([...tp.values]).toEqual([0, 2, 1, 3]);
    expect([...tp.indices]).toEqual([0, 2, 4, 6]);
  });

  it('reduces a constant or single-sample series to one point and counts nothing', () => {
    expect([...turningPoints([4, 4, 4]).values]).toEqual([4]);
    expect(rainflowCycles([4, 4, 4])).toEqual([]);
    expect(rainflowCycles([])).toEqual([]);
    expect(streamed([7]).cycles).toEqual([]);
  });

  it('rejects NaN and infinities, naming the sample', () => {
    expect(() => rainflowCycles([1, NaN, 2])).toThrow(/value NaN at sample 1/);
    const c = makeRainflowCounter(() => undefined);
    c.push(1);
    expect(() => c.push(Infinity)).toThrow(/sample 1/);
  });
});

describe('rainflow counting: properties on random series', () => {
  // Series of several kinds: continuous values, small integers (ties and plateaus), a drifting walk.
  const kinds: [string, (r: () => number, n: number) => number[]][] = [
    ['uniform values', (r, n) => Array.from({ length: n }, () => r() * 10 - 5)],
    ['small integers with ties and plateaus', (r, n) => Array.from({ length: n }, () => Math.floor(r() * 5))],
    [
      'a random walk',
      (r, n) => {
        let x = 0;
        return Array.from({ length: n }, () => (x += r() - 0.5));
      },
    ],
  ];
  for (const [name, make] of kinds) {
    it(`streaming and batch agree cycle by cycle (${name})`, () => {
      const r = random(1049);
      for (let trial = 0; trial < 200; trial++) {
        const series = make(r, 1 + Math.floor(r() * 60));
        expect(streamed(series).cycles).toEqual(rainflowCycles(series));
      }
    });

    it(`counts every reversal once: 2·full + half = turning points − 1 (${name})`, () => {
      // Each full cycle consumes two ranges between neighbouring turning points, each half cycle
      // one; the n − 1 ranges of n turning points are all used up by the end (ASTM steps 4–6).
      const r = random(85);
      for (let trial = 0; trial < 200; trial++) {
        const series = make(r, 2 + Math.floor(r() * 80));
        const cycles = rainflowCycles(series);
        const full = cycles.filter((c) => c.count === 1).length;
        const half = cycles.filter((c) => c.count === 0.5).length;
        expect(2 * full + half).toBe(turningPoints(series).values.length - 1);
      }
    });

    it(`counts the overall range max − min of the series (${name})`, () => {
      // The global extremes are never discarded before the pair spanning them is counted.
      const r = random(2011);
      for (let trial = 0; trial < 200; trial++) {
        const series = make(r, 2 + Math.floor(r() * 80));
        const largest = Math.max(...rainflowCycles(series).map((c) => c.range), 0);
        expect(largest).toBe(Math.max(...series) - Math.min(...series));
      }
    });
  }

  it('keeps the streaming memory bounded by the open reversals, not the series length', () => {
    // 200 000 samples of a bounded random signal: the residue of a stationary series holds only the
    // successively larger extremes (their number grows like the log of the length for independent
    // values), so a few dozen reversals at most. Bound 64: generous for log₂(2·10⁵) ≈ 18 records each way.
    const r = random(7);
    const cycles: RainflowCycle[] = [];
    const counter = makeRainflowCounter((c) => cycles.push(c));
    let mostOpen = 0;
    for (let i = 0; i < 200_000; i++) {
      counter.push(Math.sin(i / 5) + r());
      mostOpen = Math.max(mostOpen, counter.openReversals);
    }
    expect(counter.samples).toBe(200_000);
    expect(mostOpen).toBeLessThan(64);
    counter.close();
    expect(counter.openReversals).toBe(0);
    expect(cycles.length).toBeGreaterThan(1000);
  });

  it('a histogram built on the fly equals the one built from the list', () => {
    const r = random(3);
    const series = Array.from({ length: 5000 }, () => r() * 100);
    const builder = makeRangeHistogram({ binWidth: 10, thresholds: [50] });
    const counter = makeRainflowCounter((c) => builder.add(c));
    for (const v of series) counter.push(v);
    counter.close();
    const fromList = rangeHistogram(rainflowCycles(series), { binWidth: 10, thresholds: [50] });
    expect(builder.result()).toEqual(fromList);
    // every counted cycle is in some bin
    expect(fromList.counts.reduce((a, b) => a + b, 0)).toBe(fromList.total);
  });

  it('rejects a bin width that is not positive', () => {
    expect(() => makeRangeHistogram({ binWidth: 0 })).toThrow(/bin width 0/);
  });
});

describe('the hysteresis gate of the streaming counter (common practice in fatigue cycle counting)', () => {
  const count = (series: number[], gate: number) => {
    const cycles: RainflowCycle[] = [];
    const counter = makeRainflowCounter((c) => cycles.push(c), { gate });
    for (const v of series) counter.push(v);
    counter.close();
    return cycles;
  };

  it('gate 0 is the plain E1049 counting (ASTM E1049 Fig. 6 history)', () => {
    const fig6 = [-2, 1, -3, 5, -1, 3, -4, 4, -2];
    expect(count(fig6, 0)).toEqual(rainflowCycles(fig6));
  });

  it('drops wiggles under the gate and keeps the large cycles', () => {
    // five periods of a ±5 sine (steps of at most 0.031 per sample) with a ±0.02 alternating wiggle on every sample
    const clean = Array.from({ length: 5000 }, (_, i) => 5 * Math.sin((2 * Math.PI * i) / 1000));
    const noisy = clean.map((v, i) => v + (i % 2 ? 0.02 : -0.02));
    const plain = count(noisy, 0);
    const gated = count(noisy, 0.1);
    expect(plain.filter((c) => c.range < 0.1).length).toBeGreaterThan(100);
    expect(gated.every((c) => c.range >= 0.1)).toBe(true);
    // the large cycles: 4 full cycles of range ≈ 10 and the half cycles at the ends (as the clean sine gives)
    const big = (cs: RainflowCycle[]) => cs.filter((c) => c.range > 9).reduce((s, c) => s + c.count, 0);
    expect(big(gated)).toBe(big(count(clean, 0)));
    expect(big(gated)).toBe(big(plain));
  });

  it('a difference that never moves by the gate counts nothing', () => {
    const r = random(11);
    expect(count(Array.from({ length: 1000 }, () => 0.04 * r()), 0.1).reduce((s, c) => s + c.count, 0)).toBe(0);
  });

  it('rejects a negative or non-finite gate', () => {
    expect(() => makeRainflowCounter(() => undefined, { gate: -1 })).toThrow(/gate -1/);
    expect(() => makeRainflowCounter(() => undefined, { gate: Number.NaN })).toThrow(/gate NaN/);
  });
});
