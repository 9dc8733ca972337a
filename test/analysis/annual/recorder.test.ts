/**
 * The annual statistics fed hand-made instants: hours below a dew point with the margin linear
 * between instants (a margin from +1 K to −1 K over an hour is below zero for half of it: the
 * crossing of a straight line), booked to the month the interval starts in; heat per month from
 * each day's account; rainflow cycles of a sampled sine counted by hand after ASTM E1049 § 5.4.4;
 * and the top's margin grid by local date and hour.
 */
import { describe, it, expect } from 'vitest';
import { AnnualRecorder, annualSummary, monthsBetween } from '../../../src/analysis/annual/index.ts';
import type { InstantView } from '../../../src/model/sinks.ts';
import type { SeriesLayout, EnergyAccount } from '../../../src/model/timeseries.ts';
import type { ModelInputs } from '../../../src/model/inputs.ts';
import { SERIES_INSTANT_CHANNELS, SERIES_SEGMENT_CHANNELS } from '../../../src/model/timeseries.ts';

const HOUR = 3600;
/** One segment at 10 m, two nodes (one layer): T[0] − T[1] is the difference across it. */
const layout: SeriesLayout = {
  segments: 1,
  sectors: 1,
  nodes: 2,
  heightM: Float64Array.of(10),
  nodeRadius: Float64Array.of(1, 1.1),
  nodeLabel: ['inner_surface', 'outer_surface'],
  layers: [{ label: 'brick', material: 'test', kind: 'solid', firstNode: 0, lastNode: 1, thickness: 0.1 }],
  waterDewPointK: 320,
  acidDewPointK: 400,
};

/** Feed instants to a recorder: `at(k)` gives the hour since the start, the ISO local time, the difference across the wall and the acid margin. */
function feed(rec: AnnualRecorder, count: number, at: (k: number) => { hours: number; iso: string; deltaK: number; acidMarginK: number }) {
  rec.start(layout);
  const segment = Object.fromEntries(SERIES_SEGMENT_CHANNELS.map((c) => [c, new Float64Array(1)])) as InstantView['segment'];
  const instant = Object.fromEntries(SERIES_INSTANT_CHANNELS.map((c) => [c, 0])) as InstantView['instant'];
  for (let k = 0; k < count; k++) {
    const x = at(k);
    (segment.acidDewMarginK as Float64Array)[0] = x.acidMarginK;
    (segment.waterDewMarginK as Float64Array)[0] = x.acidMarginK + 80;
    const view: InstantView = {
      t: x.hours * HOUR,
      isoLocal: x.iso,
      runDay: Math.max(0, Math.ceil(x.hours / 24) - 1),
      dayEnd: x.hours > 0 && x.hours % 24 === 0,
      temperatureK: Float64Array.of(500 + x.deltaK, 500),
      segment,
      instant,
      firing: true,
    };
    rec.instant(view);
  }
  rec.finish();
}

const iso = (day: number, hour: number, month = 1) => `2026-${String(month).padStart(2, '0')}-${String(day).padStart(2, '0')}T${String(hour).padStart(2, '0')}:00:00+00:00`;

describe('hours below the dew point', () => {
  it('are the time the linear margin spends below zero, booked to the month each interval starts in', () => {
    const rec = new AnnualRecorder({ annual: { firstDay: '2026-01-31', lastDay: '2026-02-01', given: 'last-day' }, cycleThresholdK: null });
    // 31 January 22:00 +1 K, 23:00 −1 K, 1 February 00:00 −1 K, 01:00 +1 K
    const margins = [1, -1, -1, 1];
    feed(rec, 4, (k) => ({ hours: 22 + k, iso: k < 2 ? iso(31, 22 + k) : iso(k - 2 + 1, k - 2, 2), deltaK: 0, acidMarginK: margins[k]! }));
    const p = rec.parts();
    // January: half of 22–23 h (crossing at the middle) and all of 23–24 h; February: half of 00–01 h
    expect(p.dewHours.of('2026-01').acid[0]! / HOUR).toBeCloseTo(1.5, 12);
    expect(p.dewHours.of('2026-02').acid[0]! / HOUR).toBeCloseTo(0.5, 12);
    expect(p.dewHours.total().acid[0]! / HOUR).toBeCloseTo(2, 12);
    // the water margin is 80 K higher: never below
    expect(p.dewHours.total().water[0]).toBe(0);
  });

  it('are mapped by local date and hour at the top, each cell the lowest margin in it', () => {
    const rec = new AnnualRecorder({ annual: { firstDay: '2026-01-01', lastDay: '2026-01-02', given: 'last-day' }, cycleThresholdK: null });
    const margins = [5, -3, 2, 4];
    // 1 January 10:00, 10:30, 11:00; 2 January 10:00
    const stamps = [iso(1, 10), '2026-01-01T10:30:00+00:00', iso(1, 11), iso(2, 10)];
    feed(rec, 4, (k) => ({ hours: [10, 10.5, 11, 34][k]!, iso: stamps[k]!, deltaK: 0, acidMarginK: margins[k]! }));
    const g = rec.parts().grid;
    expect(g.acid).toBe(true);
    expect(g.lowestK[0 * 24 + 10]).toBe(-3);
    expect(g.lowestK[0 * 24 + 11]).toBe(2);
    expect(g.lowestK[1 * 24 + 10]).toBe(4);
    expect(Number.isNaN(g.lowestK[0 * 24 + 9]!)).toBe(true);
  });
});

describe('thermal cycles', () => {
  it('of a sine of amplitude A sampled at its peaks over 10 periods: 9.5 cycles of 2A and 1 of A (ASTM E1049 § 5.4.4 by hand)', () => {
    // Turning points 0, A, −A, … (ten peaks, ten valleys), 0. Counted by hand with the standard's
    // steps: the third point closes ½ cycle of range A (S moves on), every later extreme ½ cycle of
    // 2A (18 of them), and the residue A, −A, 0 gives ½ of 2A and ½ of A: 19 halves of 2A, 2 of A.
    const A = 30;
    const rec = new AnnualRecorder({ annual: { firstDay: '2026-01-01', lastDay: '2026-01-10', given: 'last-day' }, cycleThresholdK: 1.5 * A });
    const samples = 10 * 4 + 1; // every 6 h: 0, A, 0, −A, …
    feed(rec, samples, (k) => ({ hours: 6 * k, iso: iso(1 + Math.floor((6 * k) / 24), (6 * k) % 24), deltaK: Math.round(A * Math.sin((Math.PI / 2) * k)), acidMarginK: 10 }));
    const [whole] = rec.parts().cycles.of(0);
    expect(whole!.histogram.total).toBe(10.5);
    expect(whole!.histogram.largestRange).toBe(2 * A);
    expect(whole!.above).toBe(9.5); // ranges above 1.5 A: the 2A ones
    const inputs = { annual: { firstDay: '2026-01-01', lastDay: '2026-01-10', given: 'last-day' }, limits: { cyclesAbove: { rangeK: 1.5 * A, count: 9 } }, run: { outputInterval: 6 * HOUR } } as unknown as ModelInputs;
    const summary = annualSummary(rec.parts(), [], inputs);
    const wall = summary.cycles.across[0]!;
    expect(wall.across).toBe('whole wall');
    // bins of 5 K (60 K / 5 K < 25 bins): A = 30 K in [30, 35), 2A = 60 K in [60, 65)
    expect(wall.bin_width_k).toBe(5);
    expect(wall.histogram.find((b) => b.from_k === 30)?.cycles).toBe(1);
    expect(wall.histogram.find((b) => b.from_k === 60)?.cycles).toBe(9.5);
    expect(summary.verdicts.find((v) => v.limit === 'cycles_above')).toMatchObject({ status: 'fail', governing_value: 9.5, limit_value: 9 });
  });
});

describe('the annual summary', () => {
  it('books each day\'s heat to the month of its date and lists every month of the span', () => {
    expect(monthsBetween('2026-11-20', '2027-01-05')).toEqual(['2026-11', '2026-12', '2027-01']);
    const rec = new AnnualRecorder({ annual: { firstDay: '2026-01-30', lastDay: '2026-02-01', given: 'last-day' }, cycleThresholdK: null });
    // three days at hourly instants: 30 and 31 January, 1 February
    feed(rec, 3 * 24 + 1, (k) => {
      const d = new Date(Date.UTC(2026, 0, 30, k));
      return { hours: k, iso: `${d.toISOString().slice(0, 19)}+00:00`, deltaK: 0, acidMarginK: 10 };
    });
    const day = (lossKwh: number): EnergyAccount => ({ gasToWallJ: 2 * lossKwh * 3.6e6, convectionJ: lossKwh * 3.6e6, radiationJ: 0, sunJ: 0, storedJ: 0, grossJ: 3 * lossKwh * 3.6e6, residualJ: 0, residualPercent: 0, periodS: 86400 });
    const inputs = { annual: { firstDay: '2026-01-30', lastDay: '2026-02-01', given: 'last-day' }, limits: {}, run: { outputInterval: HOUR } } as unknown as ModelInputs;
    const s = annualSummary(rec.parts(), [day(10), day(20), day(40)], inputs);
    expect(s.days).toBe(3);
    expect(s.full_year).toBe(false);
    expect(s.months.map((m) => [m.month, m.days, m.heat_loss_kwh, m.gas_to_wall_kwh])).toEqual([
      ['2026-01', 2, 30, 60],
      ['2026-02', 1, 40, 80],
    ]);
    expect(s.heat_loss_kwh).toBe(70);
    // no limits set: every annual verdict is listed, not set
    expect(s.verdicts.map((v) => [v.limit, v.status])).toEqual([
      ['acid_dew_hours_per_year', 'not-set'],
      ['water_dew_hours_per_year', 'not-set'],
      ['cycles_above', 'not-set'],
    ]);
  });
});
