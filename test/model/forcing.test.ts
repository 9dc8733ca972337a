/** The forcing time scales the automatic mesh resolves (src/model/forcing.ts), read off invented schedules. */
import { describe, it, expect } from 'vitest';
import { forcingTimeScales } from '../../src/model/forcing.ts';
import { DAILY_TIME_SCALE_S } from '../../src/physics/wall/cells.ts';
import type { ModelInputs } from '../../src/model/inputs.ts';
import type { FiringPoint } from '../../src/model/firing.ts';
import { baseInputs, constantMaterial, layer, airSource } from './fixtures.ts';

const wall = [layer(constantMaterial('w', 1, 2000, 900), 0.1)];
const base = baseInputs({ layers: wall });
const h = (hours: number) => hours * 3600;
const p = (hours: number, celsius: number, flow: number): FiringPoint => ({ clockS: h(hours), inletTemperatureK: celsius + 273.15, massFlow: flow });

function withSchedule(daily: FiringPoint[] | FiringPoint[][], run: Partial<ModelInputs['run']> = {}): ModelInputs {
  const schedule = Array.isArray(daily[0]) ? { perDay: daily as FiringPoint[][] } : { daily: daily as FiringPoint[] };
  return { ...base, flue: { ...base.flue, schedule }, run: { ...base.run, ...run } };
}

describe('forcingTimeScales', () => {
  it('takes the shortest ramp of the schedule on the flue side', () => {
    const f = forcingTimeScales(withSchedule([p(0, 60, 0), p(5, 60, 0), p(5.5, 205, 3), p(21.5, 205, 3), p(22.5, 60, 0), p(24, 60, 0)], { outputInterval: 600 }));
    expect(f.flueSide.timeScaleS).toBe(1800);
    expect(f.flueSide.setBy).toBe('the 30 min ramp from 05:00');
  });

  it('sees a step, or a ramp shorter than the output interval, at the output interval', () => {
    const step = forcingTimeScales(withSchedule([p(0, 60, 0), p(6, 60, 0), p(6, 300, 2), p(24, 300, 2), p(24, 60, 0)], { outputInterval: 900 }));
    expect(step.flueSide.timeScaleS).toBe(900);
    expect(step.flueSide.setBy).toBe('the step at 06:00, seen at the 15 min output interval');
    const quick = forcingTimeScales(withSchedule([p(0, 60, 0), p(6, 60, 0), p(6 + 2 / 60, 300, 2), p(24, 300, 2)], { outputInterval: 600 }));
    expect(quick.flueSide.timeScaleS).toBe(600);
  });

  it('counts a day that ends on other conditions than the next one starts with as a step at midnight, if the run goes on past it', () => {
    const points = [p(0, 60, 0), p(6, 60, 0), p(8, 300, 2), p(24, 300, 2)];
    const f = forcingTimeScales(withSchedule(points, { outputInterval: 1200, length: { kind: 'days', days: 2 } }));
    expect(f.flueSide.timeScaleS).toBe(1200);
    expect(f.flueSide.setBy).toMatch(/midnight/);
    expect(forcingTimeScales(withSchedule(points, { outputInterval: 1200, length: { kind: 'days', days: 1 } })).flueSide.timeScaleS).toBe(h(2));
    const week = forcingTimeScales(withSchedule([[p(0, 60, 0)], [p(0, 60, 0), p(9, 60, 0), p(12, 250, 1), p(24, 60, 0)]], { outputInterval: 600, length: { kind: 'days', days: 7 } }));
    expect(week.flueSide.timeScaleS).toBe(h(3));
    expect(week.flueSide.setBy).toBe('the 180 min ramp from 09:00 of day-schedule 2');
  });

  it('treats a warm-up firing as a step, and a steady schedule as the daily wave', () => {
    const steady = withSchedule([p(0, 200, 1)]);
    expect(forcingTimeScales(steady).flueSide.timeScaleS).toBe(DAILY_TIME_SCALE_S);
    const warm = forcingTimeScales({ ...steady, run: { ...steady.run, mode: 'warmup', firingStartClockS: h(6), initial: 'cold', outputInterval: 300 } });
    expect(warm.flueSide.timeScaleS).toBe(300);
    expect(warm.flueSide.setBy).toMatch(/warm-up firing/);
  });

  it('takes a weather file’s time step outside, not below the output interval, and a smooth source as daily', () => {
    expect(forcingTimeScales(base).outside.timeScaleS).toBe(DAILY_TIME_SCALE_S);
    const tenMinutes = { ...airSource(() => 280), timeStepS: 600 };
    const f = forcingTimeScales({ ...base, weather: { kind: 'source', source: tenMinutes }, run: { ...base.run, outputInterval: 300 } });
    expect(f.outside.timeScaleS).toBe(600);
    expect(f.outside.setBy).toBe("the weather's 10 min time step");
    expect(forcingTimeScales({ ...base, weather: { kind: 'source', source: tenMinutes }, run: { ...base.run, outputInterval: 1800 } }).outside.timeScaleS).toBe(1800);
  });
});
