/** How figures read: °C from K, the two ways of fixing decimals, times, and the one missing mark. */
import { describe, it, expect } from 'vitest';
import { celsius, clockFromSeconds, decimals, fixed, isoClock, isoMinute, MISSING, toFixedQuick } from '../../src/output/format.ts';
import { seededUniform } from '../../scripts/random.ts';

describe('format', () => {
  it('converts kelvin to degrees Celsius', () => {
    // T[°C] = T[K] − 273.15 (SI brochure, 9th ed., §2.3.1); 273.15 K is 0 °C, 373.15 K is 100 °C
    expect(celsius(273.15)).toBe(0);
    expect(celsius(373.15)).toBeCloseTo(100, 12); // binary subtraction: exact to ~1e-13
  });

  it('fixes decimals after rounding halves up, and never shows a negative zero', () => {
    // Math.round rounds x.5 towards +∞ (ECMA-262, Math.round); 12.35 · 10 = 123.5 in binary → 124
    expect(fixed(12.35)).toBe('12.4');
    expect(fixed(-1.25)).toBe('-1.2');
    expect(fixed(-0.04)).toBe('0.0');
    expect(fixed(1234.5678, 2)).toBe('1234.57');
  });

  it('fixes decimals as toFixed does for the console and CSV files', () => {
    // Number.prototype.toFixed works on the exact binary value (ECMA-262): 12.35 is 12.3499… → "12.3"
    expect(decimals(12.35, 1)).toBe('12.3');
    expect(decimals(-0.04, 1)).toBe('-0.0');
    expect(decimals(Number.NaN, 2, '')).toBe('');
  });

  it('writes the CSV cells quickly with exactly the string toFixed gives (the reference: the engine\'s own toFixed, ECMA-262)', () => {
    const u = seededUniform(12);
    const values: number[] = [4.35, 0, -0, 0.5, 1.5, 2.5, -2.5, 1.005, 2.675, 1.0005, -0.0004, 0.0005, 12.35, 999.9995, 1e8 + 0.5, 5e8, 2e9, -1234.56785, 273.15 - 273.15];
    for (let i = 0; i < 200_000; i++) {
      const magnitude = 10 ** (Math.floor(u() * 14) - 5); // 1e-5 … 1e8, the range of the files' numbers and beyond
      values.push((u() - 0.5) * 2 * magnitude);
      values.push(Math.round(u() * 1e6) / 1e3 + 0.0005); // ties and near-ties at three decimals
    }
    for (const v of values) for (let d = 0; d <= 5; d++) if (toFixedQuick(v, d) !== v.toFixed(d)) expect(`${v} at ${d}: ${toFixedQuick(v, d)}`).toBe(v.toFixed(d));
  });

  it('shows one mark for every missing value', () => {
    for (const v of [null, undefined, Number.NaN, Infinity]) {
      expect(fixed(v)).toBe(MISSING);
      expect(decimals(v, 1)).toBe(MISSING);
    }
    expect(isoMinute(null)).toBe(MISSING);
  });

  it('writes ISO 8601 local times as date and clock time to the minute', () => {
    expect(isoMinute('2026-07-15T16:10:00+02:00')).toBe('2026-07-15 16:10');
    expect(isoClock('2026-07-15T05:05:59+02:00')).toBe('05:05');
  });

  it('writes seconds after midnight as a 24-hour clock time, to the nearest minute', () => {
    // 5.5 h = 19 800 s → 05:30; 86 340 s = 23 h 59 min; under half a minute rounds down, half a minute up
    expect(clockFromSeconds(19800)).toBe('05:30');
    expect(clockFromSeconds(86340)).toBe('23:59');
    expect(clockFromSeconds(29.6)).toBe('00:00');
    expect(clockFromSeconds(30)).toBe('00:01');
  });
});
