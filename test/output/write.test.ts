/** Files out: tidy CSVs, summary.json without NaN (atomic folders: folder.test.ts). */
import { describe, it, expect } from 'vitest';
import { timeseriesCsv, segmentsCsv, summaryJson } from '../../src/output/write.ts';
import { resultSheet } from '../../src/output/console.ts';
import { plusMinus } from '../../src/output/format.ts';
import { simulateWithAccuracy, summariseRun } from '../../src/analysis/metrics/index.ts';
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

  it('states the estimated error beside the peaks and margins, and the mesh and tolerances, when the run was checked', () => {
    const checked = simulateWithAccuracy(study.inputs);
    const summary = summariseRun({ inputs: study.inputs, result: checked.result, version: 'test', accuracy: checked.accuracy }).summary;
    const text = resultSheet(summary).join('\n');
    expect(text).toContain(`hottest lining`);
    expect(text).toMatch(/hottest lining +[\d.]+ °C +± [\d.<]+/);
    expect(text).toMatch(/lowest margin -?[\d.]+ K ± /);
    expect(text).toMatch(/ACCURACY\n  estimated error: temperatures through the day ± [\d.]+ K/);
    expect(text).toMatch(/mesh: lining \d+ \([\d.]+–[\d.]+ mm\), insulation \d+ .*graded to the 30 min ramp from 05:00/);
    // the demo study above was not checked: its sheet says so
    expect(resultSheet(study.summary).join('\n')).toMatch(/ACCURACY\n  not estimated/);
  });

  it('writes an estimate with two significant digits, and very small ones as below a thousandth', () => {
    expect(plusMinus(0.06549, 'K')).toBe('± 0.065 K');
    expect(plusMinus(1.26, 'min')).toBe('± 1.3 min');
    expect(plusMinus(0.0002, 'K')).toBe('± < 0.001 K');
    expect(plusMinus(null, 'K')).toBe('');
  });
});
