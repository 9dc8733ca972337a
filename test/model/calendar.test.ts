import { describe, expect, it } from 'vitest';
import { makeSiteClock } from '../../src/model/clock.ts';
import type { FiringPoint } from '../../src/model/firing.ts';
import {
  addDays,
  localDayIndex,
  makePlantCalendar,
  validatePlantCalendar,
  weekdayOf,
  type PlantCalendarSpec,
} from '../../src/model/calendar.ts';

const h = (hours: number) => hours * 3600;
const flat = (inletTemperatureK: number, massFlow: number): FiringPoint[] => [
  { clockS: 0, inletTemperatureK, massFlow },
  { clockS: h(24), inletTemperatureK, massFlow },
];
// Full fire 06:00–22:00 with one-hour ramps; a cold, unfired day; a round-the-clock winter day.
const days = {
  workday: [
    { clockS: 0, inletTemperatureK: 300, massFlow: 0 },
    { clockS: h(6), inletTemperatureK: 300, massFlow: 0 },
    { clockS: h(7), inletTemperatureK: 480, massFlow: 8 },
    { clockS: h(21), inletTemperatureK: 480, massFlow: 8 },
    { clockS: h(22), inletTemperatureK: 300, massFlow: 0 },
  ],
  idle: flat(300, 0),
  winter: flat(470, 10),
  cold: flat(290, 0),
};
const spec: PlantCalendarSpec = {
  days,
  week: { weekdays: 'workday', weekend: 'idle' },
  seasons: [
    { name: 'heating', from: '10-01', to: '04-30', week: { weekdays: 'winter', weekend: 'winter' } },
    { name: 'low load', from: '2026-06-01', to: '2026-06-30', flowScale: 0.5 },
    { name: 'cold snap', from: '2026-01-12', to: '2026-01-16', flowScale: 1.2 },
  ],
  shutdowns: [
    { name: 'summer overhaul', from: '2026-07-06', to: '2026-07-12' },
    { name: 'christmas', from: '12-24', to: '12-26' },
  ],
  shutdownDay: 'cold',
};
const cal = makePlantCalendar(spec);

describe('calendar dates', () => {
  it('adds days across month and year ends and knows the weekday', () => {
    // Calendar facts (Gregorian): 2026-03-29 is a Sunday; 2026 is not a leap year; 2024 is.
    expect(weekdayOf('2026-03-29')).toBe('sunday');
    expect(weekdayOf('1970-01-01')).toBe('thursday');
    expect(addDays('2026-02-27', 2)).toBe('2026-03-01');
    expect(addDays('2024-02-28', 1)).toBe('2024-02-29');
    expect(addDays('2026-12-31', 1)).toBe('2027-01-01');
    expect(addDays('2026-01-01', -1)).toBe('2025-12-31');
    expect(() => weekdayOf('2026-02-30')).toThrow(/not a calendar date/);
  });
});

describe('makePlantCalendar: the usual week across a daylight-saving change', () => {
  // Europe/Copenhagen: clocks go forward on Sunday 29 March 2026 at 01:00 UTC (EU rule, Directive
  // 2000/84/EC — common practice knowledge). The run starts on Monday 23 March; a calendar with the
  // usual week only (weekdays and Saturday fire, Sunday idle).
  const plain = makePlantCalendar({ days, week: { weekdays: 'workday', weekend: 'idle', saturday: 'workday' } });
  const clock = makeSiteClock('Europe/Copenhagen', '2026-03-23');
  const schedule = plain.firingSchedule(clock.startDate);

  it('selects weekday, Saturday and Sunday schedules by local date through the week', () => {
    const expected = [true, true, true, true, true, true, false, true]; // Mon … Sat fire (Saturday override), Sun idle, Mon fires
    expected.forEach((fires, n) => {
      const t = clock.runTimeOfLocal(n, h(12)); // local noon of date n
      expect(clock.dayIndex(t)).toBe(n);
      expect(localDayIndex(clock, t)).toBe(n);
      const s = schedule.at(clock.dayIndex(t), clock.localSecondsOfDay(t));
      expect(s.firing).toBe(fires);
    });
    expect(plain.dayOf('2026-03-28')).toMatchObject({ weekday: 'saturday', dayName: 'workday', rule: { kind: 'week' } });
    expect(plain.dayOf('2026-03-29')).toMatchObject({ weekday: 'sunday', dayName: 'idle' });
  });

  it('gives the local date index after the 23-hour day, where the run day index lags', () => {
    // Monday 30 March 00:30 CEST is run time 7 d − 30 min: run day 6, but local date 7.
    const t = clock.runTimeOfLocal(7, 1800);
    expect(t).toBe(7 * 86400 - 1800);
    expect(clock.dayIndex(t)).toBe(6);
    expect(localDayIndex(clock, t)).toBe(7);
    expect(clock.localSecondsOfDay(t)).toBe(1800);
  });
});

describe('makePlantCalendar: seasons and shutdowns', () => {
  it('switches to the heating season on its first date and back after its last (wrapping New Year)', () => {
    // 2026-09-30 is a Wednesday, 2026-10-01 a Thursday; 2026-04-30 a Thursday, 2026-05-01 a Friday.
    expect(cal.dayOf('2026-09-30')).toMatchObject({ dayName: 'workday', rule: { kind: 'week' } });
    expect(cal.dayOf('2026-10-01')).toMatchObject({ dayName: 'winter', rule: { kind: 'season', name: 'heating' } });
    expect(cal.dayOf('2027-01-02')).toMatchObject({ weekday: 'saturday', dayName: 'winter' });
    expect(cal.dayOf('2026-04-30')).toMatchObject({ dayName: 'winter' });
    expect(cal.dayOf('2026-05-01')).toMatchObject({ dayName: 'workday', rule: { kind: 'week' } });
    const schedule = cal.firingSchedule('2026-09-28'); // Monday; day 3 is 1 October
    expect(schedule.at(2, h(3)).firing).toBe(false); // Wednesday 30 Sep, 03:00: workday not yet firing
    expect(schedule.at(3, h(3))).toEqual({ inletTemperatureK: 470, massFlow: 10, firing: true });
  });

  it('scales the flows of a flow-scale season and keeps the usual week in it', () => {
    const june = cal.dayOf('2026-06-10'); // a Wednesday
    expect(june).toMatchObject({ dayName: 'workday', flowScale: 0.5, rule: { kind: 'season', name: 'low load' } });
    const s = cal.firingSchedule('2026-06-10');
    expect(s.at(0, h(12)).massFlow).toBe(4); // 0.5 × 8 kg/s
    expect(s.at(0, h(6.5)).massFlow).toBe(2); // half way up the ramp, scaled
    expect(s.at(0, h(12)).inletTemperatureK).toBe(480); // temperatures are not scaled
  });

  it('lays a one-off season on top of a yearly one: its scale on the yearly week', () => {
    // Cold snap 12–16 Jan 2026 inside the heating season: winter days × 1.2.
    expect(cal.dayOf('2026-01-14')).toMatchObject({ dayName: 'winter', flowScale: 1.2, rule: { kind: 'season', name: 'cold snap' } });
    expect(cal.firingSchedule('2026-01-14').at(0, h(2)).massFlow).toBeCloseTo(12, 12);
  });

  it('keeps the yearly season\'s days where a one-off season gives only some days', () => {
    const c = makePlantCalendar({ ...spec, seasons: [spec.seasons![0], { name: 'short weeks', from: '2026-02-01', to: '2026-02-28', week: { weekend: 'idle' } }] });
    expect(c.dayOf('2026-02-07')).toMatchObject({ weekday: 'saturday', dayName: 'idle', rule: { kind: 'season', name: 'short weeks' } });
    expect(c.dayOf('2026-02-09')).toMatchObject({ weekday: 'monday', dayName: 'winter', flowScale: 1 });
  });

  it('shows no firing through a shutdown week, and fires again after it', () => {
    const s = cal.firingSchedule('2026-07-06');
    for (let d = 0; d < 7; d++) {
      expect(cal.dayOf(addDays('2026-07-06', d)).rule).toEqual({ kind: 'shutdown', name: 'summer overhaul' });
      for (let hour = 0; hour <= 24; hour += 0.5) {
        const st = s.at(d, h(hour));
        expect(st.firing).toBe(false);
        expect(st.massFlow).toBe(s.offMassFlow);
        expect(st.inletTemperatureK).toBe(290);
      }
    }
    expect(s.at(7, h(12)).firing).toBe(true); // Monday 13 July
  });

  it('lets a yearly shutdown win over the heating season', () => {
    expect(cal.dayOf('2026-12-25')).toMatchObject({ dayName: 'cold', rule: { kind: 'shutdown', name: 'christmas' } });
    expect(cal.dayOf('2026-12-27')).toMatchObject({ dayName: 'winter' });
  });

  it('sets the default floor from the largest flow any day can have', () => {
    // Largest: winter 10 kg/s × 1.2 (cold snap) = 12 kg/s; 2 % of it (firing.ts convention, common practice).
    expect(cal.offMassFlow).toBeCloseTo(0.24, 12);
  });

  it('gives corners of the day that applies (with floor crossings of the scaled ramps)', () => {
    const s = cal.firingSchedule('2026-06-10');
    // June workday × 0.5: ramp 0 → 4 kg/s over 06:00–07:00 crosses the 0.24 kg/s floor at 06:00 + 0.24/4 h.
    const expected = [0, h(6), h(6) + 0.06 * 3600, h(7), h(21), h(22) - 0.06 * 3600, h(22)];
    const got = s.corners(0);
    expect(got.length).toBe(expected.length);
    // 1e-6 s: the crossing time carries the rounding of 0.02 × 12 kg/s / 4 kg/s
    got.forEach((c, i) => expect(Math.abs(c - expected[i])).toBeLessThan(1e-6));
  });
});

describe('validatePlantCalendar', () => {
  const base: PlantCalendarSpec = { days, week: { weekdays: 'workday', weekend: 'idle' } };
  const bad: [string, PlantCalendarSpec, RegExp][] = [
    ['a date that is not a calendar date', { ...base, seasons: [{ name: 'x', from: '2026-02-30', to: '2026-03-10', flowScale: 2 }] }, /seasons\[0\] \("x"\): from "2026-02-30" is not a calendar date/],
    ['a yearly date that is not a date', { ...base, seasons: [{ name: 'x', from: '04-31', to: '05-10', flowScale: 2 }] }, /seasons\[0\] \("x"\): from "04-31" is not a calendar date/],
    ['a reversed one-off range', { ...base, shutdowns: [{ name: 'rev', from: '2026-08-10', to: '2026-08-01' }], shutdownDay: 'cold' }, /shutdowns\[0\] \("rev"\): from 2026-08-10 is after to 2026-08-01 \(the range is reversed\)/],
    ['mixed date forms', { ...base, seasons: [{ name: 'm', from: '2026-01-01', to: '03-01', flowScale: 2 }] }, /seasons\[0\] \("m"\): from "2026-01-01" and to "03-01" must both be/],
    [
      'two overlapping yearly seasons',
      { ...base, seasons: [{ name: 'a', from: '11-01', to: '02-28', flowScale: 2 }, { name: 'b', from: '02-01', to: '03-31', flowScale: 3 }] },
      /seasons\[1\] \("b"\) overlaps seasons\[0\] \("a"\) on 02-01/,
    ],
    [
      'two overlapping one-off seasons',
      { ...base, seasons: [{ name: 'a', from: '2026-05-01', to: '2026-05-20', flowScale: 2 }, { name: 'b', from: '2026-05-15', to: '2026-06-01', flowScale: 3 }] },
      /seasons\[1\] \("b"\) overlaps seasons\[0\] \("a"\) on 2026-05-15/,
    ],
    ['an unknown day-schedule in the week', { ...base, week: { weekdays: 'workday', weekend: 'holiday' } }, /week\.weekend: no day-schedule named "holiday"/],
    ['a week that leaves days out', { ...base, week: { weekdays: 'workday' } }, /week: says nothing for saturday, sunday/],
    ['a misspelt weekday', { ...base, week: { weekdays: 'workday', weekend: 'idle', wensday: 'idle' } as never }, /week\.wensday: not a day of the week/],
    ['a season that changes nothing', { ...base, seasons: [{ name: 'n', from: '01-01', to: '01-31' }] }, /seasons\[0\] \("n"\): give a week, a flowScale, or both/],
    ['a flow scale of zero', { ...base, seasons: [{ name: 'z', from: '01-01', to: '01-31', flowScale: 0 }] }, /flowScale 0 must be a number > 0 \(for no firing use a shutdown\)/],
    ['shutdowns without a shutdown day', { ...base, shutdowns: [{ name: 's', from: '08-01', to: '08-07' }] }, /shutdownDay: name the day-schedule/],
    ['a shutdown day that fires', { ...base, shutdowns: [{ name: 's', from: '08-01', to: '08-07' }], shutdownDay: 'winter' }, /shutdownDay: day-schedule "winter" has a mass flow other than 0/],
    ['a bad point in a day-schedule', { ...base, days: { ...days, idle: [{ clockS: 0, inletTemperatureK: 20, massFlow: 0 }] } }, /days\.idle\[0\]: inletTemperatureK 20 K is below 200 K/],
    ['no flow at all', { days: { idle: flat(300, 0) }, week: { weekdays: 'idle', weekend: 'idle' } }, /every scheduled flow is 0: give offMassFlow/],
  ];
  for (const [title, s, message] of bad) {
    it(`reports ${title}`, () => {
      const msgs = validatePlantCalendar(s);
      expect(msgs.some((m) => message.test(m)), msgs.join('\n')).toBe(true);
      expect(() => makePlantCalendar(s)).toThrow(RangeError);
    });
  }

  it('accepts the full example, a one-off season inside a yearly one, and 02-29', () => {
    expect(validatePlantCalendar(spec)).toEqual([]);
    expect(validatePlantCalendar({ ...base, seasons: [{ name: 'leap', from: '02-29', to: '02-29', flowScale: 2 }] })).toEqual([]);
  });
});
