/**
 * state.json (written by src/output/state.ts, read back by src/input/state.ts) and the initial
 * wall a scenario may give: a uniform temperature, or where an earlier run ended. A warm restart
 * continues a run: split in two at a midnight, it gives the answer of the continuous run.
 */
import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parse } from 'yaml';
import { validateModelInputs } from '../../src/input/scenario/validate.ts';
import { ScenarioError } from '../../src/input/scenario/errors.ts';
import { parseStateJson, StateFileError } from '../../src/input/state.ts';
import { stateJson } from '../../src/output/state.ts';
import { simulate } from '../../src/model/simulate.ts';
import type { RunResult } from '../../src/model/timeseries.ts';

let dir: string;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'stackday-state-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** The demo cut to three segments, a 30 min output interval and no accuracy check (keeps the test quick). */
function demo(days: number, firstDay = '2026-07-15'): any {
  const s = parse(readFileSync('scenarios/demo.yaml', 'utf8'));
  s.stack.segments = 3;
  s.site.first_day = firstDay;
  s.run = { ...s.run, days, output_interval: '30 min', accuracy: 'off' };
  return s;
}

/** Largest difference between the instants of `b` and the same instants of `a`, K. */
function largestDifferenceAtSameTimes(a: RunResult, b: RunResult, shiftS: number): number {
  let worst = 0;
  const n = a.series.segments * a.series.nodes;
  b.series.t.forEach((t, kb) => {
    const ka = a.series.t.findIndex((ta) => Math.abs(ta - (t + shiftS)) < 1e-6);
    expect(ka, `instant ${t}`).toBeGreaterThanOrEqual(0);
    for (let j = 0; j < n; j++) worst = Math.max(worst, Math.abs(a.series.temperatureK[ka * n + j]! - b.series.temperatureK[kb * n + j]!));
  });
  return worst;
}

describe('state.json', () => {
  it('reads back exactly what a run wrote', () => {
    const r = simulate(validateModelInputs(demo(1)).inputs);
    const back = parseStateJson(stateJson(r.finalState, 'demo', 'test'), 'state.json');
    expect(back).toEqual(r.finalState);
  });

  it('names the file and the field for a file that is not a state', () => {
    expect(() => parseStateJson('{"format": "something else"}', 'x.json')).toThrow(/x\.json: not a stackday state file/);
    expect(() => parseStateJson('not json', 'x.json')).toThrow(StateFileError);
    const r = simulate(validateModelInputs(demo(1)).inputs);
    const doc = JSON.parse(stateJson(r.finalState, 'demo', 'test'));
    doc.temperature_k[1] = doc.temperature_k[1].slice(1);
    expect(() => parseStateJson(JSON.stringify(doc), 'x.json')).toThrow(/"temperature_k"\[1\] must hold \d+ positive temperatures/);
  });
});

describe('the initial wall', () => {
  it('may be uniform at a given temperature', () => {
    const s = demo(1);
    s.run.initial = { temperature: 12 };
    const { inputs } = validateModelInputs(s);
    expect(inputs.run.initial).toEqual({ kind: 'uniform', temperatureK: 285.15 });
    const r = simulate(inputs);
    expect(r.series.temperatureK.slice(0, r.series.nodes * r.series.segments).every((t) => Math.abs(t - 285.15) < 1e-9)).toBe(true);
  });

  it('continues where an earlier run ended: a warm restart gives the answer of one continuous run', () => {
    const continuous = simulate(validateModelInputs(demo(2)).inputs);
    const first = simulate(validateModelInputs(demo(1)).inputs);
    const path = join(dir, 'day1-state.json');
    writeFileSync(path, stateJson(first.finalState, 'demo', 'test'));
    const s = demo(1, '2026-07-16');
    s.run.initial = { from: 'day1-state.json' };
    const restart = simulate(validateModelInputs(s, { baseDir: dir }).inputs);
    expect(restart.series.nodes).toBe(continuous.series.nodes);
    // the second day of the continuous run against the restarted day, instant by instant: the
    // state carries every node at full precision and the integrator's last step, so the restart
    // takes the steps the continuous run took (measured 9e-8 K: the runs' time axes differ in the last bits)
    expect(largestDifferenceAtSameTimes(continuous, restart, 86400)).toBeLessThan(1e-6);
    // without the step it starts afresh and agrees to about the integrator's tolerance (0.005 K by default)
    const { lastStepS: _step, ...withoutStep } = first.finalState;
    writeFileSync(path, stateJson(withoutStep, 'demo', 'test'));
    const afresh = simulate(validateModelInputs(s, { baseDir: dir }).inputs);
    expect(largestDifferenceAtSameTimes(continuous, afresh, 86400)).toBeLessThan(0.02);
  });

  it('moves a state onto another mesh of the same wall, and says so', () => {
    const first = simulate(validateModelInputs(demo(1)).inputs);
    writeFileSync(join(dir, 'auto.json'), stateJson(first.finalState, 'demo', 'test'));
    const s = demo(1, '2026-07-16');
    s.stack.layers = s.stack.layers.map((l: any) => ({ ...l, cells: 6 }));
    s.run.initial = { from: 'auto.json' };
    const r = simulate(validateModelInputs(s, { baseDir: dir }).inputs);
    expect(r.assumptions.some((a) => /moved from its \d+ nodes to this run's 19 by interpolation in ln r/.test(a))).toBe(true);
  });

  it('refuses the state of another wall with a message that says what differs', () => {
    const first = simulate(validateModelInputs(demo(1)).inputs);
    writeFileSync(join(dir, 'other.json'), stateJson(first.finalState, 'demo', 'test'));
    const s = demo(1);
    s.stack.layers[1].thickness = '60 mm';
    s.run.initial = { from: 'other.json' };
    try {
      validateModelInputs(s, { baseDir: dir });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(ScenarioError);
      expect((e as ScenarioError).problems.join('\n')).toMatch(/run\.initial\.from: found a state of a different wall in "other\.json" \(layer 2 is calcium-silicate 40 mm there and calcium-silicate 60 mm here\)/);
    }
  });

  it('reports a missing state file as bad input', () => {
    const s = demo(1);
    s.run.initial = { from: 'nowhere.json' };
    expect(() => validateModelInputs(s, { baseDir: dir })).toThrow(/run\.initial\.from: nowhere\.json: no such file/);
  });
});
