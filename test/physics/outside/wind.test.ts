import { describe, it, expect } from 'vitest';
import { TERRAIN_EXPONENTS, WIND_FLOOR_HEIGHT_M, windAtHeight } from '../../../src/physics/outside/wind.ts';

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
