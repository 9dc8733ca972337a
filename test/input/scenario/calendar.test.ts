/**
 * The plant calendar in the scenario (`flue.calendar`, instead of `flue.schedule`): written with the
 * firing points of the daily schedule, validated like it with every problem named by its key path,
 * and applied by LOCAL date — checked across the spring-forward change of 2026 in Europe/Copenhagen
 * (the IANA tz database: clocks go from 02:00 to 03:00 on Sunday 29 March), where a run day of 24 h
 * no longer starts at local midnight. Calendar facts (Gregorian): 2026-03-28 is a Saturday,
 * 2026-03-30 a Monday.
 */
import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { validateModelInputs } from '../../../src/input/scenario/validate.ts';
import { problemsOf } from '../../support/scenarioProblems.ts';
import { assembleModel } from '../../../src/model/assemble.ts';

const DAY = 86400;

const point = (time: string, gas: number, flow: number) => ({ time, gas_temperature: gas, mass_flow: flow });
const allDay = (gas: number, flow: number) => [point('00:00', gas, flow), point('24:00', gas, flow)];

/** The demo scenario with a calendar: firing all day on weekdays, off at weekends, a shutdown week in summer. */
function withCalendar(edit: (cal: Record<string, any>) => void = () => {}) {
  const s = parse(readFileSync('scenarios/demo.yaml', 'utf8'));
  delete s.flue.schedule;
  s.flue.calendar = {
    days: { on: allDay(200, 3), off: allDay(40, 0), cold: allDay(15, 0) },
    week: { weekdays: 'on', weekend: 'off' },
    seasons: [{ name: 'summer', from: '06-01', to: '08-31', flow_scale: 0.5 }],
    shutdowns: [{ name: 'overhaul', from: '2026-07-13', to: '2026-07-19' }],
    shutdown_day: 'cold',
  };
  edit(s.flue.calendar);
  return s;
}


describe('a plant calendar in the scenario', () => {
  it('becomes the model\'s calendar, points in SI (kelvin, kg/s, seconds after midnight)', () => {
    const { inputs } = validateModelInputs(withCalendar());
    const sch = inputs.flue.schedule;
    expect('calendar' in sch).toBe(true);
    if (!('calendar' in sch)) return;
    expect(sch.calendar.days['on']).toEqual([
      { clockS: 0, inletTemperatureK: 473.15, massFlow: 3 },
      { clockS: DAY, inletTemperatureK: 473.15, massFlow: 3 },
    ]);
    expect(sch.calendar.seasons).toEqual([{ name: 'summer', from: '06-01', to: '08-31', flowScale: 0.5 }]);
    expect(sch.calendar.shutdownDay).toBe('cold');
    expect(sch.calendar.offMassFlow).toBeCloseTo(0.15, 12);
  });

  it('fires by date: a weekday, a weekend day, a summer weekday at half flow, a shutdown day', () => {
    const s = withCalendar();
    s.site.time_zone = 'UTC';
    s.site.first_day = '2026-07-10'; // a Friday
    s.run = { days: 10 };
    const { system } = assembleModel(validateModelInputs(s).inputs);
    const at = (day: number) => system.driversAt(day * DAY + 12 * 3600);
    expect([at(0).firing, at(0).massFlow]).toEqual([true, 1.5]); // Friday 10 July, summer: 3 kg/s × 0.5
    expect([at(1).firing, at(1).massFlow]).toEqual([false, 0.15]); // Saturday: off, the floor
    expect(at(3).firing).toBe(false); // Monday 13 July: the overhaul
    expect(at(3).inletTemperatureK).toBeCloseTo(288.15, 9); // the cold day's 15 °C
  });

  it('uses the local date after the clocks go forward: Monday 00:30 fires though the run day is still Sunday\'s', () => {
    const s = withCalendar();
    s.site.time_zone = 'Europe/Copenhagen';
    s.site.first_day = '2026-03-28'; // a Saturday; Sunday 29 March loses an hour
    s.run = { days: 3 };
    const { system, clock } = assembleModel(validateModelInputs(s).inputs);
    // Monday 00:30 CEST: Sunday had 23 hours, so Monday's midnight came at run time 2 · 86400 − 3600 s
    const t = 2 * DAY - 3600 + 1800;
    expect(clock.isoLocal(t)).toBe('2026-03-30T00:30:00+02:00');
    expect(clock.dayIndex(t)).toBe(1); // by run time, still the second run day (Sunday's)
    expect(system.driversAt(t).firing).toBe(true);
    expect(system.driversAt(t - 3600).firing).toBe(false); // Sunday 23:30
  });
});

describe('calendar problems, each named by its key path', () => {
  it('a week naming a day-schedule that does not exist', () => {
    expect(problemsOf(withCalendar((c) => (c.week.weekend = 'of')))).toEqual([
      'flue.calendar.week.weekend: found "of"; expected the name of a day-schedule (flue.calendar.days has "on", "off", "cold")',
    ]);
  });

  it('a date that is not a calendar date (30 days hath April)', () => {
    expect(problemsOf(withCalendar((c) => (c.seasons[0].to = '04-31')))).toEqual(['flue.calendar.seasons[0].to: found "04-31"; expected a calendar date "YYYY-MM-DD" (once) or "MM-DD" (every year)']);
  });

  it('a period with one dated and one yearly end, and a one-off period that runs backwards', () => {
    const problems = problemsOf(
      withCalendar((c) => {
        c.shutdowns[0].from = '07-13';
        c.shutdowns.push({ name: 'late', from: '2026-09-02', to: '2026-09-01' });
      }),
    );
    expect(problems).toEqual([
      'flue.calendar.shutdowns[0]: found from "07-13" and to "2026-07-19"; expected both dates "YYYY-MM-DD" (once) or both "MM-DD" (every year)',
      'flue.calendar.shutdowns[1].to: found "2026-09-01", before from "2026-09-02"; expected a date on or after from (a one-off period runs forward)',
    ]);
  });

  it('times going backwards within a day-schedule, as in the daily schedule', () => {
    expect(problemsOf(withCalendar((c) => (c.days.on = [point('06:00', 200, 3), point('05:00', 200, 3)])))).toEqual([
      'flue.calendar.days.on[1].time: found "05:00"; expected a time not before the previous point\'s "06:00" (times must not go backwards)',
    ]);
  });

  it('a point with neither mass_flow nor volume_flow', () => {
    expect(problemsOf(withCalendar((c) => (c.days.on[1] = { time: '24:00', gas_temperature: 200 })))[0]).toMatch(/^flue\.calendar\.days\.on\[1\]: found neither mass_flow nor volume_flow/);
  });

  it('a week that leaves days out, overlapping yearly seasons, a shutdown day that fires, a flow scale of 0', () => {
    const problems = problemsOf(
      withCalendar((c) => {
        c.week = { weekdays: 'on' };
        c.seasons.push({ name: 'late summer', from: '08-15', to: '09-15', flow_scale: 0.8 });
        c.shutdown_day = 'on';
      }),
    );
    expect(problems).toEqual([
      'flue.calendar.week: says nothing for saturday, sunday (every day needs a day-schedule)',
      'flue.calendar.seasons[1] ("late summer") overlaps seasons[0] ("summer") on 08-15 (two yearly seasons may not overlap; a one-off season may lie inside a yearly one and then wins)',
      'flue.calendar.shutdown_day: day-schedule "on" has a mass flow other than 0, but a shutdown has no firing',
    ]);
    expect(problemsOf(withCalendar((c) => (c.seasons[0].flow_scale = 0)))).toEqual(['flue.calendar.seasons[0].flow_scale: found 0; expected a factor above 0 (for no firing use a shutdown)']);
  });

  it('both a schedule and a calendar, or neither', () => {
    const both = withCalendar();
    both.flue.schedule = { daily: allDay(200, 3) };
    expect(problemsOf(both)).toEqual(['flue: found both schedule and calendar; expected exactly one of them (a daily schedule, or a plant calendar by date)']);
    const neither = withCalendar();
    delete neither.flue.calendar;
    expect(problemsOf(neither)).toEqual(['flue: found neither schedule nor calendar; expected exactly one of them (a daily schedule, or a plant calendar by date)']);
  });
});
