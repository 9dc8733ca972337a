/** Values with units at the edge: conversions by definition of the units (NIST SP 811, Appendix B). */
import { describe, it, expect } from 'vitest';
import { parseQuantity, parseClockTime, normaliseUnitText } from '../../../src/input/scenario/units.ts';

const si = (v: unknown, kind: Parameters<typeof parseQuantity>[1]) => {
  const r = parseQuantity(v, kind);
  if (!r.ok) throw new Error(`not parsed: ${String(v)}`);
  return r.value;
};

describe('parseQuantity', () => {
  it('reads plain numbers in the unit the key documents', () => {
    expect(si(0.115, 'length')).toBe(0.115);
    expect(si(20, 'temperature')).toBeCloseTo(293.15, 12); // °C → K by definition
    expect(si(10, 'duration')).toBe(600); // minutes
    expect(si(3, 'stress')).toBe(3e6); // MPa
  });

  it('converts strings with units (exact definitions: 1 in = 25.4 mm, °F = 5/9 K)', () => {
    expect(si('115 mm', 'length')).toBeCloseTo(0.115, 12);
    expect(si('4.5 in', 'length')).toBeCloseTo(0.1143, 12);
    expect(si('480 degF', 'temperature')).toBeCloseTo(((480 - 32) * 5) / 9 + 273.15, 9);
    expect(si('480 °F', 'temperature')).toBeCloseTo(((480 - 32) * 5) / 9 + 273.15, 9);
    expect(si('300 K', 'temperature')).toBeCloseTo(300, 12);
    expect(si('9 degF', 'temperatureDifference')).toBeCloseTo(5, 12); // a difference: no offset
    expect(si('9000 kg/h', 'massFlow')).toBeCloseTo(2.5, 12);
    expect(si('36 km/h', 'speed')).toBeCloseTo(10, 12);
    expect(si('25 W/(m^2 K)', 'filmCoefficient')).toBeCloseTo(25, 12);
    expect(si('25 W/m^2/K', 'filmCoefficient')).toBeCloseTo(25, 12);
    expect(si('0.002 m^2 K/W', 'contactResistance')).toBeCloseTo(0.002, 12);
    expect(si('101.3 kPa', 'pressure')).toBeCloseTo(101300, 9);
  });

  it('refuses a value of the wrong kind, or not a value at all', () => {
    for (const [v, kind] of [['3 kg', 'length'], ['hot', 'temperature'], [null, 'length'], [Number.NaN, 'speed'], ['12 m/s', 'temperature']] as const) {
      const r = parseQuantity(v, kind);
      expect(r.ok, String(v)).toBe(false);
    }
  });

  it('normalises common spellings to the grammar js-quantities reads', () => {
    expect(normaliseUnitText('25 W/(m2 K)', false)).toBe('25 W/m^2*degK');
    expect(normaliseUnitText('20 °C', true)).toBe('20 tempC');
    expect(normaliseUnitText('5 K', false)).toBe('5 degK');
  });
});

describe('parseClockTime', () => {
  it('reads HH:MM and HH:MM:SS from 00:00 to 24:00', () => {
    expect(parseClockTime('05:30')).toBe(5.5 * 3600);
    expect(parseClockTime('24:00')).toBe(86400);
    expect(parseClockTime('7:05:09')).toBe(7 * 3600 + 5 * 60 + 9);
    expect(parseClockTime('24:01')).toBeNull();
    expect(parseClockTime('12:60')).toBeNull();
    expect(parseClockTime(730)).toBeNull();
  });
});
