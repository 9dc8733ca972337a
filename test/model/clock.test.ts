/** The site clock across daylight-saving changes (EU rule: clocks go forward at 01:00 UTC on the last Sunday of March; common practice, Directive 2000/84/EC). */
import { describe, it, expect } from 'vitest';
import { makeSiteClock, isValidTimeZone } from '../../src/model/clock.ts';

describe('makeSiteClock', () => {
  const c = makeSiteClock('Europe/Oslo', '2026-03-28');

  it('starts at local midnight of the first day', () => {
    expect(new Date(c.startUtcMs).toISOString()).toBe('2026-03-27T23:00:00.000Z');
    expect(c.isoLocal(0)).toBe('2026-03-28T00:00:00+01:00');
  });

  it('reads local clock time through the spring change (29 March 2026)', () => {
    expect(c.localSecondsOfDay(86400 + 2 * 3600) / 3600).toBe(3); // 02:00 CET does not exist: 01:00 UTC is 03:00 CEST
    expect(c.isoLocal(86400 + 3 * 3600)).toBe('2026-03-29T04:00:00+02:00');
    expect(c.runTimeOfLocal(1, 12 * 3600) / 3600).toBe(35); // noon on the 23-hour day
  });

  it('rejects unknown zones and impossible dates', () => {
    expect(isValidTimeZone('Mars/Olympus')).toBe(false);
    expect(() => makeSiteClock('UTC', '2026-02-30')).toThrow(/not a calendar date/);
    expect(() => makeSiteClock('UTC', '30.02.2026')).toThrow(/YYYY-MM-DD/);
  });
});

describe('start dates are real calendar dates', () => {
  it.each(['2026-13-01', '2026-00-10', '0000-01-01', '0001-01-01', '2026-02-30', '2025-02-29', '2026-04-31'])('%s is refused', (date) => {
    expect(() => makeSiteClock('UTC', date)).toThrow(/not a calendar date/);
  });

  it.each(['2024-02-29', '2026-12-31', '1900-01-01'])('%s is accepted', (date) => {
    expect(makeSiteClock('UTC', date).startDate).toBe(date);
  });
});
