/** Files out: tidy CSVs, summary.json without NaN (atomic folders: folder.test.ts). */
import { describe, it, expect } from 'vitest';
import { timeseriesCsv, segmentsCsv, summaryJson } from '../../src/output/write.ts';
import { resultSheet } from '../../src/output/console.ts';
import { demoStudy } from '../support/demoStudy.ts';

const study = demoStudy('cycle');

describe('CSV files', () => {
  it('timeseries.csv has one row per time × height × position, in °C', () => {
    const s = study.result.series;
    const lines = timeseriesCsv(s).trimEnd().split('\n');
    expect(lines[0]).toBe('time,hours,height_m,position,radius_m,temperature_c');
    expect(lines.length - 1).toBe(s.t.length * s.segments * s.nodes);
    const first = lines[1]!.split(',');
    expect(first[3]).toBe('inner_surface');
    expect(Number(first[5])).toBeCloseTo(s.temperatureK[0]! - 273.15, 2);
  });

  it('segments.csv writes an empty cell, never NaN, where a value does not exist', () => {
    const csv = segmentsCsv(study.result.series);
    expect(csv).not.toMatch(/NaN/);
    expect(csv.split('\n')[0]).toMatch(/^time,hours,height_m,air_temperature_c,/);
  });

  it('summary.json has no NaN and states units in field names', () => {
    const text = summaryJson(study.summary);
    expect(text).not.toMatch(/NaN/);
    const j = JSON.parse(text);
    for (const key of ['peak_shell_c', 'peak_lining_c', 'heat_loss_kwh_per_day', 'energy_residual_percent', 'through_wall_max_delta_t_k']) expect(j).toHaveProperty(key);
  });
});

describe('result sheet', () => {
  it('puts the verdicts first and the cautions last', () => {
    const text = resultSheet(study.summary).join('\n');
    const v = text.indexOf('VERDICTS');
    const p = text.indexOf('PEAKS AND MINIMA');
    const c = text.indexOf('CAUTIONS');
    expect(v).toBeGreaterThan(0);
    expect(v).toBeLessThan(p);
    expect(p).toBeLessThan(c);
    expect(text).toMatch(/licensed engineer/);
    expect(text).toMatch(/FAIL {2}Margin above the acid dew point/); // the demo's acid margin fails (regression check of the demo)
  });
});
