import { describe, expect, it } from 'vitest';
import {
  makeFiringSchedule,
  massFlowFromNormalVolumeFlow,
  validateFiringSchedule,
  type FiringPoint,
  type FiringScheduleSpec,
} from '../../src/model/firing.ts';

const h = (hours: number) => hours * 3600;
// Off until 06:00, ramp to full fire 06:00–07:00, full fire until 22:00, ramp down to 23:00.
const day: FiringPoint[] = [
  { clockS: 0, inletTemperatureK: 300, massFlow: 0 },
  { clockS: h(6), inletTemperatureK: 300, massFlow: 0 },
  { clockS: h(7), inletTemperatureK: 500, massFlow: 10 },
  { clockS: h(22), inletTemperatureK: 500, massFlow: 10 },
  { clockS: h(23), inletTemperatureK: 300, massFlow: 0 },
];

describe('makeFiringSchedule', () => {
  const s = makeFiringSchedule({ daily: day });

  it('produces the ramp at the stated times', () => {
    // Analytic: linear interpolation between (6 h, 300 K, 0) and (7 h, 500 K, 10 kg/s).
    expect(s.at(0, h(6.5))).toEqual({ inletTemperatureK: 400, massFlow: 5, firing: true });
    expect(s.at(0, h(6.25)).inletTemperatureK).toBeCloseTo(350, 12);
    expect(s.at(0, h(7))).toEqual({ inletTemperatureK: 500, massFlow: 10, firing: true });
    expect(s.at(0, h(22.5)).massFlow).toBeCloseTo(5, 12);
  });

  it('raises an off flow to the default floor of 2 % of the largest flow', () => {
    // Module convention (common practice): floor = 0.02 × 10 kg/s = 0.2 kg/s.
    expect(s.offMassFlow).toBeCloseTo(0.2, 15);
    expect(s.at(0, h(3))).toEqual({ inletTemperatureK: 300, massFlow: 0.2, firing: false });
    // 06:00 + 0.02 h: the ramp reaches the floor exactly there
    expect(s.at(0, h(6.01)).firing).toBe(false);
    expect(s.at(0, h(6.01)).massFlow).toBeCloseTo(0.2, 12);
  });

  it('holds the last values after the last point (also on a 25-hour clock day)', () => {
    expect(s.at(0, h(23.5))).toEqual({ inletTemperatureK: 300, massFlow: 0.2, firing: false });
    expect(s.at(3, 90000).inletTemperatureK).toBe(300);
  });

  it('holds the first values before the first point', () => {
    const late = makeFiringSchedule({ daily: [{ clockS: h(8), inletTemperatureK: 450, massFlow: 3 }, { clockS: h(9), inletTemperatureK: 470, massFlow: 4 }] });
    expect(late.at(0, h(1))).toEqual({ inletTemperatureK: 450, massFlow: 3, firing: true });
  });

  it('uses a user floor when given', () => {
    const f = makeFiringSchedule({ daily: day, offMassFlow: 0.5 });
    expect(f.at(0, 0).massFlow).toBe(0.5);
  });

  it('lists every point and the floor crossings as corners', () => {
    // Floor crossings: 6 h + (0.2/10) h = 21 672 s and 23 h − 0.02 h = 82 728 s.
    expect(s.corners(0)).toEqual([0, h(6), h(6) + 72, h(7), h(22), h(23) - 72, h(23)]);
  });

  it('makes a step where two points share a time, taking the later one at that instant', () => {
    const step = makeFiringSchedule({
      daily: [
        { clockS: 0, inletTemperatureK: 300, massFlow: 1 },
        { clockS: h(12), inletTemperatureK: 300, massFlow: 1 },
        { clockS: h(12), inletTemperatureK: 600, massFlow: 8 },
        { clockS: h(24), inletTemperatureK: 600, massFlow: 8 },
      ],
    });
    expect(step.at(0, h(12) - 1e-6).inletTemperatureK).toBe(300);
    expect(step.at(0, h(12)).inletTemperatureK).toBe(600);
    expect(step.corners(0)).toEqual([0, h(12), h(24)]);
  });

  it('cycles through per-day schedules (day i uses perDay[i mod n])', () => {
    const weekdays = [{ clockS: 0, inletTemperatureK: 500, massFlow: 10 }];
    const sunday = [{ clockS: 0, inletTemperatureK: 300, massFlow: 0 }];
    const w = makeFiringSchedule({ perDay: [weekdays, sunday] });
    expect(w.at(0, 100).firing).toBe(true);
    expect(w.at(1, 100).firing).toBe(false);
    expect(w.at(4, 100).firing).toBe(true);
    expect(w.at(5, 100).massFlow).toBeCloseTo(0.2, 15); // floor from the largest flow of any day
    expect(w.at(-1, 100).firing).toBe(false);
  });
});

describe('validateFiringSchedule', () => {
  const ok = (points: FiringPoint[]): FiringScheduleSpec => ({ daily: points });
  const p = (clockS: number, inletTemperatureK = 500, massFlow = 5): FiringPoint => ({ clockS, inletTemperatureK, massFlow });

  it('accepts a good schedule', () => {
    expect(validateFiringSchedule({ daily: day })).toEqual([]);
  });

  const bad: [title: string, spec: FiringScheduleSpec, message: RegExp][] = [
    ['times going backwards', ok([p(0), p(7200), p(3600)]), /daily\[2\]: clockS 3600 goes back before the previous point's 7200/],
    ['three points at one time', ok([p(0), p(3600), p(3600), p(3600)]), /daily\[3\]: clockS 3600 is the third point at the same time/],
    ['a time after 24 h', ok([p(0), p(90000)]), /daily\[1\]: clockS 90000 is outside 0…86400/],
    ['a negative time', ok([p(-60), p(600)]), /daily\[0\]: clockS -60 is outside/],
    ['a negative flow', ok([p(0), p(600, 500, -1)]), /daily\[1\]: massFlow -1 kg\/s must be ≥ 0/],
    ['a negative temperature', ok([p(0, -5)]), /daily\[0\]: inletTemperatureK -5 is not a physical temperature/],
    ['a NaN temperature', ok([p(0, NaN)]), /daily\[0\]: inletTemperatureK NaN is not a physical temperature/],
    ['a temperature that looks like °C', ok([p(0, 180)]), /daily\[0\]: inletTemperatureK 180 K is below 200 K — was °C given/],
    ['an absurdly hot inlet', ok([p(0, 5000)]), /daily\[0\]: inletTemperatureK 5000 K is above 3000 K/],
    ['an empty day', { perDay: [[p(0)], []] }, /perDay\[1\]: needs at least one point/],
    ['a bad point on a later day', { perDay: [[p(0)], [p(0), p(100, 500, -2)]] }, /perDay\[1\]\[1\]: massFlow -2/],
    ['no flow at all and no floor', ok([p(0, 300, 0)]), /every scheduled flow is 0: give offMassFlow/],
    ['a negative floor', { daily: [p(0)], offMassFlow: -1 }, /offMassFlow -1/],
    ['both daily and perDay', { daily: [p(0)], perDay: [[p(0)]] } as unknown as FiringScheduleSpec, /either daily or perDay, not both/],
    ['neither daily nor perDay', {} as FiringScheduleSpec, /give daily/],
  ];
  for (const [title, spec, message] of bad) {
    it(`reports ${title}`, () => {
      const msgs = validateFiringSchedule(spec);
      expect(msgs.some((m) => message.test(m))).toBe(true);
      expect(() => makeFiringSchedule(spec)).toThrow(RangeError);
    });
  }
});

describe('massFlowFromNormalVolumeFlow', () => {
  it('converts 10 000 Nm³/h of air to 3.59 kg/s', () => {
    // Normal density of dry air at 0 °C, 101 325 Pa: 1.2922 kg/m³ (DIN 1343 reference state, ideal gas,
    // M = 28.9644 g/mol; handbooks: 1.293). 10 000/3600 × 1.2922 = 3.5894 kg/s. Tolerance 1e-4 relative
    // for the 5-figure density.
    expect(Math.abs(massFlowFromNormalVolumeFlow(10000, 0.0289644) / 3.5894 - 1)).toBeLessThan(1e-4);
  });
});
