/**
 * Whole annual runs of a small wall (the demo's build-up cut to 2 segments and 2 + 2 + 1 cells, an
 * hourly output interval: a year in a few seconds; the figures checked do not depend on the mesh):
 *
 * - a year of identical days (a design day every day, the same firing every day, no sun, a zone
 *   without daylight saving) gives 365 times the periodic day's hours below the dew points and heat
 *   loss: the year's totals are sums of days that all equal the periodic day once the start has
 *   settled;
 * - a calendar with a shutdown week shows no firing in that week, and a wall that has cooled to the
 *   only steady state left without firing: the outside air (the idle flue holds gas at the air's
 *   temperature, and the surroundings radiate at it).
 */
import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { validateModelInputs } from '../../../src/input/scenario/validate.ts';
import { runScenario } from '../../../src/index.ts';
import type { InstantSink } from '../../../src/model/sinks.ts';

/** The demo scenario on a small mesh, no sun, UTC (days of equal length), hourly output. */
function smallDemo() {
  const s = parse(readFileSync('scenarios/demo.yaml', 'utf8'));
  s.stack.segments = 2;
  s.stack.layers.forEach((l: { cells?: number }, j: number) => (l.cells = [2, 2, 1][j]));
  s.site.time_zone = 'UTC';
  s.site.first_day = '2026-01-01';
  s.outside.sun = false;
  s.run = { output_interval: '1 h', initial: 'steady' };
  return s;
}

describe('a year of identical days', () => {
  const periodicRaw = smallDemo();
  periodicRaw.run.days = 'until-periodic';
  periodicRaw.run.periodic_tolerance = '0.001 K';
  periodicRaw.run.max_days = 60;
  const periodic = runScenario(validateModelInputs(periodicRaw)).summary;
  const yearRaw = smallDemo();
  yearRaw.run.days = 'year';
  const year = runScenario(validateModelInputs(yearRaw)).summary;
  const annual = year.annual!;

  it('settles: the periodic run reached its state, and the year ran 365 days', () => {
    expect(periodic.run.periodic_reached).toBe(true);
    expect(annual.days).toBe(365);
    expect(annual.full_year).toBe(true);
    // the demo's wall goes below the acid dew point at the top every day: the comparison has hours to compare
    expect(periodic.hours_below_acid_dew[1]!.hours).toBeGreaterThan(1);
  });

  // The periodic day's figures are rounded (hours to 0.01 h, heat to 0.01 kWh: src/analysis/rounding.ts),
  // so 365 of them carry up to 365 × half a unit; on top, the year starts from the steady state at
  // the day's mean conditions, not from the periodic state, and that difference dies out within the
  // wall's slowest time constants (hours to a day): 0.2 % of the year's hours, 0.1 % of its heat.
  const ROUNDING_H = 0.005;
  const ROUNDING_KWH = 0.005;

  it('has 365 times the periodic day\'s hours below each dew point at every height', () => {
    periodic.hours_below_acid_dew.forEach((h, seg) => {
      expect(Math.abs(annual.hours_below_acid_dew[seg]!.hours - 365 * h.hours)).toBeLessThanOrEqual(365 * ROUNDING_H + 0.002 * 365 * h.hours);
    });
    periodic.hours_below_water_dew.forEach((h, seg) => expect(Math.abs(annual.hours_below_water_dew[seg]!.hours - 365 * h.hours)).toBeLessThanOrEqual(365 * ROUNDING_H + 0.002 * 365 * h.hours));
  });

  it('has 365 times the periodic day\'s heat loss over the year, and a month of 31 days 31 times its figures', () => {
    const perDay = periodic.heat_loss_kwh_per_day;
    expect(Math.abs(annual.heat_loss_kwh - 365 * perDay)).toBeLessThanOrEqual(365 * ROUNDING_KWH + 0.001 * 365 * perDay);
    // December, long settled: the rounding, and 0.01 % for the periodic state's own tolerance (0.001 K)
    const december = annual.months.find((m) => m.month === '2026-12')!;
    expect(december.days).toBe(31);
    expect(Math.abs(december.heat_loss_kwh - 31 * perDay)).toBeLessThanOrEqual(31 * ROUNDING_KWH + 0.05 + 0.0001 * 31 * perDay); // + 0.05: December's own rounding to 0.1 kWh
    periodic.hours_below_acid_dew.forEach((h, seg) => expect(Math.abs(december.hours_below_acid_dew[seg]!.hours - 31 * h.hours)).toBeLessThanOrEqual(31 * ROUNDING_H + 0.005 + 0.0001 * 31 * h.hours));
  });
});

describe('a calendar with a shutdown week', () => {
  const AIR_C = 8;
  const raw = smallDemo();
  raw.weather.design_day = { min_air_temperature: AIR_C, max_air_temperature: AIR_C, wind_speed: '3 m/s', dew_point: 2 };
  raw.outside.radiation = { surroundings: AIR_C };
  delete raw.flue.schedule;
  raw.flue.calendar = {
    days: {
      work: [
        { time: '00:00', gas_temperature: AIR_C, mass_flow: 0 },
        { time: '06:00', gas_temperature: AIR_C, mass_flow: 0 },
        { time: '06:30', gas_temperature: 205, mass_flow: 3.2 },
        { time: '21:30', gas_temperature: 205, mass_flow: 3.2 },
        { time: '22:00', gas_temperature: AIR_C, mass_flow: 0 },
        { time: '24:00', gas_temperature: AIR_C, mass_flow: 0 },
      ],
      idle: [
        { time: '00:00', gas_temperature: AIR_C, mass_flow: 0 },
        { time: '24:00', gas_temperature: AIR_C, mass_flow: 0 },
      ],
    },
    week: { weekdays: 'work', weekend: 'work' },
    shutdowns: [{ name: 'overhaul', from: '2026-01-12', to: '2026-01-18' }], // Monday to Sunday
    shutdown_day: 'idle',
  };
  raw.run.last_day = '2026-01-21';
  // every instant's date, firing and hottest wall temperature
  const seen: { iso: string; firing: boolean; hottestC: number }[] = [];
  const sink: InstantSink = { instant: (v) => seen.push({ iso: v.isoLocal, firing: v.firing, hottestC: Math.max(...v.temperatureK) - 273.15 }) };
  const run = runScenario(validateModelInputs(raw), { sinks: [sink] });
  const inWeek = seen.filter((x) => x.iso.slice(0, 16) >= '2026-01-12T00:00' && x.iso.slice(0, 16) <= '2026-01-19T00:00');

  it('does not fire on any instant of the week, and fires on the days around it', () => {
    expect(inWeek).toHaveLength(7 * 24 + 1);
    expect(inWeek.every((x) => !x.firing)).toBe(true);
    expect(seen.find((x) => x.iso.startsWith('2026-01-09T12'))?.firing).toBe(true);
    expect(seen.find((x) => x.iso.startsWith('2026-01-19T12'))?.firing).toBe(true);
  });

  it('ends the week with the whole wall at the outside air temperature (cold)', () => {
    const end = inWeek[inWeek.length - 1]!;
    // 0.1 K: a week is well over ten of the wall's slowest time constants (the lining's heat
    // capacity over the idle flue's small film, about ten hours), so what is left of the firing's
    // 200 K is far below this
    expect(Math.abs(end.hottestC - AIR_C)).toBeLessThan(0.1);
    // the first fired day afterwards warms it again
    expect(seen.find((x) => x.iso.startsWith('2026-01-19T21'))!.hottestC).toBeGreaterThan(AIR_C + 50);
    // and the annual figures show the week: January's lowest inner surface is the air temperature
    expect(run.summary.annual!.months[0]!.inner_surface_min_c).toBeCloseTo(AIR_C, 1);
  });
});
