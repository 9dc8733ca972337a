/** The sweep table: one row per point in order, the points that did not run kept with their problems, the choice among those that pass. */
import { describe, it, expect } from 'vitest';
import { sweepTable, sweepCsv, limitValues } from '../../src/analysis/sweep.ts';
import { parseVary, sweepPoints } from '../../src/input/scenario/sweep.ts';
import type { Summary } from '../../src/analysis/summary.ts';
import { demoStudy } from '../support/demoStudy.ts';

const base = demoStudy('cycle').summary;
/** The demo summary renamed, with an invented verdict and heat loss (for the rule). */
const invented = (name: string, pass: boolean, loss: number): Summary => ({ ...base, scenario: { ...base.scenario, name }, all_limits_pass: pass, heat_loss_kwh_per_day: loss });

describe('sweepTable', () => {
  const axes = [parseVary('stack.layers[1].thickness=20 mm,40 mm,60 mm,80 mm')];
  const points = sweepPoints(axes);
  const t = sweepTable(axes, [
    { name: points[0]!.name, values: points[0]!.values, status: 'invalid', problems: ['--vary (stack.layers[1].thickness): found "20 mm"; invented problem'] },
    { name: points[1]!.name, values: points[1]!.values, status: 'ran', summary: invented(points[1]!.name, false, 900) },
    { name: points[2]!.name, values: points[2]!.values, status: 'ran', summary: invented(points[2]!.name, true, 700) },
    { name: points[3]!.name, values: points[3]!.values, status: 'ran', summary: invented(points[3]!.name, true, 600) },
  ]);

  it('keeps every point in order, the invalid one with its problem and no figures, and picks the passing point with the least heat loss', () => {
    expect(t.rows.map((r) => [r.values[0], r.status, r.figures?.heat_loss_kwh_per_day ?? null])).toEqual([['20 mm', 'invalid', null], ['40 mm', 'ran', 900], ['60 mm', 'ran', 700], ['80 mm', 'ran', 600]]);
    expect(t.rows[0]!.problems).toHaveLength(1);
    expect(t.recommended).toBe('thickness-80mm');
    expect(t.rows[1]!.limits).toEqual(limitValues(base));
  });

  it('writes the swept values as numbers in the axis unit, one row per point, the choice and the problems', () => {
    const lines = sweepCsv(t).trimEnd().split('\n');
    expect(lines[0]).toBe('stack.layers[1].thickness (mm),name,status,all_limits_pass,failed_limits,peak_shell_c,peak_lining_c,lowest_acid_dew_margin_k,lowest_water_dew_margin_k,max_stress_indicator_mpa,heat_loss_kwh_per_day,recommended,problems');
    expect(lines[1]).toBe('20,thickness-20mm,invalid,,,,,,,,,false,"--vary (stack.layers[1].thickness): found ""20 mm""; invented problem"');
    expect(lines[4]).toMatch(/^80,thickness-80mm,ran,true,.*,600,true,$/);
  });

  it('takes the limits of a run from its verdicts, null where not set', () => {
    const l = limitValues(base);
    expect(l.shell_touch_c).toBe(60); // demo.yaml: shell_touch 60
    expect(l.allowable_stress_mpa).toBe(3); // demo.yaml: allowable_stress 3 MPa
    const unset = { ...base, verdicts: base.verdicts.map((v) => ({ ...v, status: 'not-set' as const, limit_value: null })) };
    expect(Object.values(limitValues(unset)).every((v) => v === null)).toBe(true);
  });
});
