import { describe, it, expect } from 'vitest';
import {
  TERRAIN_BOUNDARY_LAYERS,
  TERRAIN_EXPONENTS,
  WIND_FLOOR_HEIGHT_M,
  windAtHeight,
  windAtHeightFromStation,
} from '../../../src/physics/outside/wind.ts';

describe('windAtHeight', () => {
  it('follows the power law U(z) = U_ref (z / z_ref)^α', () => {
    // Hand computation: 5 m/s at 10 m, α = 0.22, at 80 m: 5·8^0.22 = 5·1.58007 = 7.9004 m/s.
    expect(windAtHeight(5, 10, 80, 0.22)).toBeCloseTo(7.9004, 3); // 5e-4 m/s: rounding of the hand value
    // 1/7 law (open country, common practice): doubling the height raises the speed by 2^(1/7) = 1.10409.
    expect(windAtHeight(10, 20, 40, 1 / 7) / 10).toBeCloseTo(1.10409, 5);
  });

  it('returns the reference speed at the reference height', () => {
    expect(windAtHeight(6.3, 10, 10, 0.33)).toBe(6.3);
  });

  it('stays finite and non-zero as the height goes to zero (floor height)', () => {
    const atFloor = windAtHeight(5, 10, WIND_FLOOR_HEIGHT_M, 0.14);
    expect(windAtHeight(5, 10, 0, 0.14)).toBe(atFloor);
    expect(atFloor).toBeGreaterThan(0);
    // Hand computation: 5·(1/10)^0.14 = 5·0.72444 = 3.6222 m/s.
    expect(atFloor).toBeCloseTo(3.6222, 3);
  });

  it('increases with height, faster over rougher terrain', () => {
    const z = 100;
    expect(windAtHeight(5, 10, z, TERRAIN_EXPONENTS.city)).toBeGreaterThan(windAtHeight(5, 10, z, TERRAIN_EXPONENTS.suburban));
    expect(windAtHeight(5, 10, z, TERRAIN_EXPONENTS.suburban)).toBeGreaterThan(windAtHeight(5, 10, z, TERRAIN_EXPONENTS.open));
  });

  it('uses the ASHRAE terrain exponents', () => {
    // ASHRAE HOF 2009 ch. 24 Table 1 (from memory): 0.10 flat/water, 0.14 open, 0.22 suburban, 0.33 city centre.
    expect(TERRAIN_EXPONENTS).toEqual({ flat: 0.1, open: 0.14, suburban: 0.22, city: 0.33 });
  });
});

describe('windAtHeightFromStation (two-terrain power law, ASHRAE Fundamentals 2009 ch. 24 eq. 4)', () => {
  const { open, suburban, city, flat } = TERRAIN_BOUNDARY_LAYERS;

  it('uses the ASHRAE (a, δ) pairs', () => {
    // ASHRAE HOF 2009 ch. 24 Table 1 (from memory; the same pairs appear in a journal reproduction
    // of the table): 0.10/210, 0.14/270, 0.22/370, 0.33/460 m.
    expect(TERRAIN_BOUNDARY_LAYERS).toEqual({
      flat: { exponent: 0.1, thicknessM: 210 },
      open: { exponent: 0.14, thicknessM: 270 },
      suburban: { exponent: 0.22, thicknessM: 370 },
      city: { exponent: 0.33, thicknessM: 460 },
    });
  });

  it('matches a hand computation: open-country station at 10 m → suburban site at 45 m', () => {
    // 5·(270/10)^0.14·(45/370)^0.22: ln 27 = 3.295837, ×0.14 → e^0.461417 = 1.586320;
    // ln(45/370) = −2.106841, ×0.22 → e^−0.463505 = 0.629075; U = 5·1.586320·0.629075 = 4.98957 m/s.
    // Tolerance 1e-4 m/s: six-figure hand arithmetic.
    expect(windAtHeightFromStation(5, 10, open, 45, suburban)).toBeCloseTo(4.98957, 4);
  });

  it('matches a hand computation: open-country station at 10 m → city-centre site at 45 m', () => {
    // 5·1.586320·(45/460)^0.33: ln(45/460) = −2.324564, ×0.33 → e^−0.767106 = 0.464355;
    // U = 5·1.586320·0.464355 = 3.68308 m/s. Tolerance 1e-4 m/s: hand arithmetic.
    expect(windAtHeightFromStation(5, 10, open, 45, city)).toBeCloseTo(3.68308, 4);
  });

  it('reduces to the single power law when station and site share the terrain', () => {
    // (δ/z_met)^a (z/δ)^a = (z/z_met)^a identically. Tolerance 1e-12 relative: round-off.
    for (const t of [flat, open, suburban, city]) {
      const two = windAtHeightFromStation(4, 10, t, 80, t);
      expect(Math.abs(two / windAtHeight(4, 10, 80, t.exponent) - 1)).toBeLessThan(1e-12);
    }
  });

  it('gives the same gradient wind at and above δ over every terrain, and holds it constant above δ', () => {
    // At z = δ the site factor is 1: U(δ) = U_met (δ_met/z_met)^a_met = 5·1.586320 = 7.93160 m/s.
    // Tolerance 1e-4 m/s: hand arithmetic.
    for (const t of [flat, open, suburban, city]) {
      expect(windAtHeightFromStation(5, 10, open, t.thicknessM, t)).toBeCloseTo(7.9316, 4);
      expect(windAtHeightFromStation(5, 10, open, t.thicknessM + 500, t)).toBe(windAtHeightFromStation(5, 10, open, t.thicknessM, t));
    }
  });

  it('gives less wind at stack heights over rougher terrain than the single law applied to the reading', () => {
    // The objection that started this: applying the city exponent straight to an open-country
    // reading overstates the wind below δ (5·4.5^0.33 = 8.21 m/s against 3.68 m/s at 45 m).
    expect(windAtHeightFromStation(5, 10, open, 45, city)).toBeLessThan(windAtHeight(5, 10, 45, city.exponent) / 2);
  });

  it('stays finite and positive at zero height (floor height)', () => {
    const atZero = windAtHeightFromStation(5, 10, open, 0, suburban);
    expect(atZero).toBe(windAtHeightFromStation(5, 10, open, WIND_FLOOR_HEIGHT_M, suburban));
    expect(atZero).toBeGreaterThan(0);
  });
});
