/**
 * The per-instant CSV files: written row by row while the run goes, they are the same bytes as the
 * files made afterwards from the whole series in memory; and each thinning form writes what it
 * says, checked against the full file (every instant) as the reference.
 */
import { describe, it, expect, beforeAll } from 'vitest';
import { mkdtempSync, readFileSync, existsSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { loadScenarioFile } from '../../src/input/scenario/load.ts';
import { simulate } from '../../src/model/simulate.ts';
import { runToFolder } from '../../src/index.ts';
import { summarise } from '../../src/analysis/metrics/index.ts';
import { timeseriesCsv, segmentsCsv, seriesFileArtefacts, sizeNotice } from '../../src/output/csv.ts';
import { layoutOf } from '../../src/model/sinks.ts';
import type { ModelInputs, OutputInput } from '../../src/model/inputs.ts';
import type { TimeSeries } from '../../src/model/timeseries.ts';

/** The demo cut to 4 segments, 2 days of cycling at a 30-minute output interval (keeps the test fast). */
function smallDemo(output?: OutputInput): ModelInputs {
  const base = loadScenarioFile('scenarios/demo.yaml').inputs;
  return { ...base, stack: { ...base.stack, segments: 4 }, run: { ...base.run, length: { kind: 'days', days: 2 }, outputInterval: 1800 }, output };
}

let dir: string;
let full: TimeSeries;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'stackday-csv-'));
  full = simulate(smallDemo(), { retainAll: true }).series;
});

const lines = (text: string) => text.trimEnd().split('\n');

async function written(name: string, output: OutputInput): Promise<Record<string, string>> {
  const out = join(dir, name);
  await runToFolder(smallDemo(output), out, { charts: false });
  return Object.fromEntries(readdirSync(out).map((f) => [f, readFileSync(join(out, f), 'utf8')]));
}

describe('files written while the run goes', () => {
  it('are byte for byte the files made afterwards from the whole series in memory', async () => {
    const files = await written('streamed', { timeseries: { content: 'all' }, segments: { content: 'all' } });
    expect(files['timeseries.csv']).toBe(timeseriesCsv(full));
    expect(files['segments.csv']).toBe(segmentsCsv(full));
    // every instant of both days: 2 days × 48 half-hours + the first instant, × segments × nodes
    expect(lines(files['timeseries.csv']!).length - 1).toBe((2 * 48 + 1) * full.segments * full.nodes);
  });

  it('keep only the last day in memory, yet the summary covers the same day as a run that kept everything', () => {
    const kept = simulate(smallDemo());
    expect(kept.series.t.length).toBe(49); // the last day's 48 half-hours and the instant that opens it
    expect(kept.retained).toEqual({ firstDay: 1, days: 1, truncated: false });
    expect(Array.from(kept.series.t)).toEqual(Array.from(full.t.subarray(48)));
    // the reference: the summary of the same run keeping every instant (its daily figures aside, which cover every day kept)
    const inputs = smallDemo();
    const everything = simulate(inputs, { retainAll: true });
    const { daily: a, ...fromKept } = summarise({ inputs, result: kept, version: 'test' });
    const { daily: b, ...fromAll } = summarise({ inputs, result: everything, version: 'test' });
    expect(fromKept).toEqual(fromAll);
    expect(a).toEqual(b.slice(-1));
  });
});

describe('thinning', () => {
  let all: string[];
  beforeAll(() => {
    all = lines(timeseriesCsv(full));
  });

  it('last-day writes the rows of the last day (with the instant that opens it) and nothing before', async () => {
    const files = await written('last-day', { timeseries: { content: 'last-day' }, segments: { content: 'last-day' } });
    const perInstant = full.segments * full.nodes;
    expect(lines(files['timeseries.csv']!)).toEqual([all[0], ...all.slice(1 + 48 * perInstant)]);
    expect(lines(files['segments.csv']!).length - 1).toBe(49 * full.segments);
  });

  it('an interval writes only the instants a whole multiple of it after the start', async () => {
    const files = await written('hourly', { timeseries: { content: 'all', intervalS: 3600 }, segments: { content: 'off' } });
    const hourly = all.filter((l, j) => j === 0 || Number(l.split(',')[1]) % 1 === 0);
    expect(lines(files['timeseries.csv']!)).toEqual(hourly);
    expect(hourly.length - 1).toBe(49 * full.segments * full.nodes);
  });

  it('off writes no file', async () => {
    const files = await written('off', { timeseries: { content: 'off' }, segments: { content: 'off' } });
    expect(Object.keys(files).sort()).toEqual(['state.json', 'summary.json']);
  });

  it('daily-extremes writes per day and position the lowest and highest temperature of that day, both ends included', async () => {
    const files = await written('daily', { timeseries: { content: 'daily-extremes' }, segments: { content: 'daily-extremes' } });
    const rows = lines(files['timeseries.csv']!);
    expect(rows[0]).toBe('day,date,height_m,position,radius_m,min_temperature_c,max_temperature_c');
    expect(rows.length - 1).toBe(2 * full.segments * full.nodes);
    // reference: the full file's rows grouped by day, hours 0–24 for day 1 and 24–48 for day 2
    const ref = new Map<string, { lo: number; hi: number }>();
    for (const row of all.slice(1)) {
      const [, hours, height, position, radius, temp] = row.split(',');
      const h = Number(hours);
      for (const day of [1, 2]) {
        if (h < 24 * (day - 1) || h > 24 * day) continue;
        const key = `${day},${height},${position},${radius}`;
        const r = ref.get(key) ?? { lo: Infinity, hi: -Infinity };
        ref.set(key, { lo: Math.min(r.lo, Number(temp)), hi: Math.max(r.hi, Number(temp)) });
      }
    }
    for (const row of rows.slice(1)) {
      const [day, date, height, position, radius, lo, hi] = row.split(',');
      expect(date).toBe(day === '1' ? '2026-07-15' : '2026-07-16');
      const r = ref.get(`${day},${height},${position},${radius}`)!;
      // both sides are the same temperatures rounded to 3 decimals (toFixed is monotone, so the extreme of the rounded values is the rounded extreme)
      expect(Number(lo)).toBeCloseTo(r.lo, 3);
      expect(Number(hi)).toBeCloseTo(r.hi, 3);
    }
    const seg = lines(files['segments.csv']!);
    expect(seg[0]).toMatch(/^day,date,height_m,min_air_temperature_c,max_air_temperature_c,min_wind_speed_at_height_m_s,/);
    expect(seg.length - 1).toBe(2 * full.segments);
    expect(seg.join('\n')).not.toMatch(/NaN|Infinity/);
  });

  it('a file left out is not in the folder and the summary still covers the run', async () => {
    const out = join(dir, 'no-series');
    const { run } = await runToFolder(smallDemo({ timeseries: { content: 'off' }, segments: { content: 'daily-extremes' } }), out, { charts: false });
    expect(existsSync(join(out, 'timeseries.csv'))).toBe(false);
    expect(run.summary.daily.map((d) => d.day)).toEqual([1, 2]);
  });
});

describe('the size of the files, said before the run', () => {
  it('is estimated within 15 % of what the run writes', async () => {
    const out = join(dir, 'sized');
    await runToFolder(smallDemo(), out, { charts: false });
    for (const a of seriesFileArtefacts(smallDemo())) {
      const actual = readFileSync(join(out, a.fileName)).length;
      // the estimate takes every value as three digits before the point: the demo's temperatures and flows are mostly so
      expect(Math.abs(a.estimateBytes(layoutOf(full)) / actual - 1), a.fileName).toBeLessThan(0.15);
    }
  });

  it('is said (on the console, never in a file) when a run will write more than 200 MB: a year of the demo', () => {
    const demo = loadScenarioFile('scenarios/demo.yaml').inputs;
    const year: ModelInputs = { ...demo, run: { ...demo.run, length: { kind: 'days', days: 365 } } };
    const oneDay: ModelInputs = { ...demo, run: { ...demo.run, length: { kind: 'days', days: 1 } } };
    const layout = layoutOf(simulate(oneDay).series);
    expect(sizeNotice(seriesFileArtefacts(year), layout)).toMatch(/^this run will write about \d+ MB \(timeseries\.csv \d+ MB, segments\.csv \d+ MB\); to write less/);
    expect(sizeNotice(seriesFileArtefacts(oneDay), layout)).toBeNull();
    expect(sizeNotice(seriesFileArtefacts({ ...year, output: { timeseries: { content: 'daily-extremes' }, segments: { content: 'last-day' } } }), layout)).toBeNull();
  });
});
