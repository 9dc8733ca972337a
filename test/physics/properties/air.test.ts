import { describe, it, expect } from 'vitest';
import {
  AIR_TABLE_INCROPERA_A4,
  AIR_TABLE_RANGE_K,
  airDensityIdealGas,
  airPressureAtElevation,
  airPropertiesAt,
  airPropertiesInto,
  type AirProperties,
} from '../../../src/physics/properties/air.ts';
import { interpolateTable } from '../../../src/physics/properties/table.ts';

const relErr = (a: number, b: number): number => Math.abs(a / b - 1);

/** Sutherland (1893), Phil. Mag. 36, 507–531; constants for air from F. M. White, Viscous Fluid
 *  Flow (3rd ed., 2006), Table 1-2: μ₀ = 1.716e-5 Pa s, T₀ = 273 K, S = 111 K, quoted as ±2 %
 *  over 170–1900 K (from memory). */
const sutherlandAir = (T: number): number => 1.716e-5 * Math.pow(T / 273, 1.5) * ((273 + 111) / (T + 111));

describe('airPropertiesAt against Incropera & DeWitt Table A.4 (air at atmospheric pressure; values from memory)', () => {
  it('gives cp, k, μ and Pr of the table at 300 K', () => {
    // Incropera Table A.4 at 300 K (from memory): cp 1.007 kJ/kg K, k 26.3e-3 W/m K,
    // μ 184.6e-7 N s/m², Pr 0.707. Tolerances: 1e-9 relative for the tabulated columns (exact
    // hit of a table point); 0.1 % for Pr, computed as μ cp / k rather than read (3-figure rounding).
    const p = airPropertiesAt(300);
    expect(relErr(p.specificHeat, 1007)).toBeLessThan(1e-9);
    expect(relErr(p.conductivity, 0.0263)).toBeLessThan(1e-9);
    expect(relErr(p.dynamicViscosity, 184.6e-7)).toBeLessThan(1e-9);
    expect(relErr(p.prandtl, 0.707)).toBeLessThan(1e-3);
  });

  it('gives the table values at 600 K and 1000 K', () => {
    // Incropera Table A.4 (from memory): 600 K: cp 1.051, k 46.9e-3, μ 305.8e-7, Pr 0.685;
    // 1000 K: cp 1.141, k 66.7e-3, μ 424.4e-7, Pr 0.726. Tolerance as above.
    const a = airPropertiesAt(600);
    expect(relErr(a.specificHeat, 1051)).toBeLessThan(1e-9);
    expect(relErr(a.conductivity, 0.0469)).toBeLessThan(1e-9);
    expect(relErr(a.dynamicViscosity, 305.8e-7)).toBeLessThan(1e-9);
    expect(relErr(a.prandtl, 0.685)).toBeLessThan(1e-3);
    const b = airPropertiesAt(1000);
    expect(relErr(b.specificHeat, 1141)).toBeLessThan(1e-9);
    expect(relErr(b.conductivity, 0.0667)).toBeLessThan(1e-9);
    expect(relErr(b.dynamicViscosity, 424.4e-7)).toBeLessThan(1e-9);
    expect(relErr(b.prandtl, 0.726)).toBeLessThan(1e-3);
  });

  it('interpolates linearly between table rows', () => {
    // Hand, from the 300 K and 350 K rows (from memory): k(325) = (26.3 + 30.0)/2 · 1e-3 = 0.02815;
    // μ(325) = (184.6 + 208.2)/2 · 1e-7 = 196.4e-7. Tolerance: rounding only.
    const p = airPropertiesAt(325);
    expect(p.conductivity).toBeCloseTo(0.02815, 10);
    expect(p.dynamicViscosity).toBeCloseTo(196.4e-7, 14);
  });

  it('has a Prandtl column consistent with μ cp / k in every row (cross-check of the recalled table)', () => {
    // Pr is printed in the book beside μ, cp, k; a correct row agrees with μ cp / k to within the
    // 3-figure rounding of Pr (≤ 0.08 %) and of k (≤ 0.2 % from 150 K up). Tolerance 0.3 %: a
    // mis-recalled μ, cp or k digit would show as a larger deviation.
    const A = AIR_TABLE_INCROPERA_A4;
    for (let i = 0; i < A.temperatureK.length; i++) {
      const pr = (A.viscosityE7[i] * 1e-7 * A.specificHeatKJ[i] * 1e3) / (A.conductivityE3[i] * 1e-3);
      expect(relErr(pr, A.prandtl[i]), `row ${A.temperatureK[i]} K`).toBeLessThan(3e-3);
    }
  });

  it('holds the end rows constant outside 100–2000 K', () => {
    expect(AIR_TABLE_RANGE_K).toEqual([100, 2000]);
    expect(airPropertiesAt(50).conductivity).toBe(airPropertiesAt(100).conductivity);
    expect(airPropertiesAt(3000).dynamicViscosity).toBe(airPropertiesAt(2000).dynamicViscosity);
  });
});

describe('air density and the ideal-gas law', () => {
  it('reproduces the ISO 2533 sea-level density 1.2250 kg/m³ at 288.15 K and 101 325 Pa', () => {
    // ISO 2533:1975 standard atmosphere, sea level: ρ₀ = 1.2250 kg/m³ (from memory).
    // Tolerance 5e-5 relative: the standard's 5-figure rounding (±0.00005 / 1.225 = 4e-5).
    expect(relErr(airDensityIdealGas(288.15, 101325), 1.225)).toBeLessThan(5e-5);
  });

  it('finds the table density column equal to the ideal gas at 1 bar from 200 to 2000 K', () => {
    // Independent check of the recalled density column: ρ = p M / (R T) with p = 100 kPa,
    // M = 28.9644 g/mol (ISO 2533), R = 8.314 J/mol K (CODATA). Tolerance 0.3 %: 4-figure
    // rounding (≤ 0.06 % at 2000 K) plus the real-gas deviation of air at 200 K (Z ≈ 0.998, from memory).
    const A = AIR_TABLE_INCROPERA_A4;
    for (let i = 0; i < A.temperatureK.length; i++) {
      const T = A.temperatureK[i];
      if (T < 200) continue; // at 100–150 K air departs from the ideal gas by 0.6–2 %
      expect(relErr(A.density1Bar[i], airDensityIdealGas(T, 1e5)), `row ${T} K`).toBeLessThan(3e-3);
    }
  });

  it('returns the ideal-gas density at 1 atm by default and scales ρ and ν with pressure', () => {
    // ρ = 101325 · 0.0289644 / (8.314462618 · 300) = 1.17659 kg/m³ (hand); ν = μ/ρ.
    // Tolerances: 1e-5 relative (hand arithmetic to 6 figures); 1e-12 for exact identities.
    const p = airPropertiesAt(300);
    expect(relErr(p.density, 1.17659)).toBeLessThan(1e-5);
    expect(relErr(p.kinematicViscosity, p.dynamicViscosity / p.density)).toBeLessThan(1e-12);
    const half = airPropertiesAt(300, 101325 / 2);
    expect(relErr(half.density, p.density / 2)).toBeLessThan(1e-12);
    expect(relErr(half.kinematicViscosity, 2 * p.kinematicViscosity)).toBeLessThan(1e-12);
    expect(half.conductivity).toBe(p.conductivity);
  });

  it('gives the ideal-gas expansion coefficient 1/T', () => {
    // Ideal gas: β = −(1/ρ)(∂ρ/∂T)_p = 1/T exactly.
    expect(airPropertiesAt(400).expansion).toBeCloseTo(1 / 400, 15);
  });
});

describe('viscosity against Sutherland’s law', () => {
  it('agrees with Sutherland (White’s constants) within 2.5 % from 200 to 1300 K', () => {
    // White states ±2 % for Sutherland's fit of air over 170–1900 K (from memory); 2.5 % allows
    // for the table's own spread around the fit (largest seen: 2.2 % at 1300 K).
    for (let T = 200; T <= 1300; T += 25) {
      expect(relErr(airPropertiesAt(T).dynamicViscosity, sutherlandAir(T)), `${T} K`).toBeLessThan(0.025);
    }
  });
});

describe('airPropertiesInto', () => {
  it('writes into the caller-given object, returns it, and agrees with an independent table interpolation', () => {
    const out: AirProperties = { density: 0, specificHeat: 0, conductivity: 0, dynamicViscosity: 0, kinematicViscosity: 0, prandtl: 0, expansion: 0 };
    const k = { temperatureK: AIR_TABLE_INCROPERA_A4.temperatureK, values: AIR_TABLE_INCROPERA_A4.conductivityE3.map((x) => x * 1e-3) };
    // Jumps up and down the table exercise the remembered-interval search.
    for (const T of [310, 1950, 120, 777, 776, 2000, 100, 1234.5, 299.99, 305]) {
      const r = airPropertiesInto(out, T);
      expect(r).toBe(out);
      // Tolerance 1e-12 relative: same linear interpolation, different rounding order.
      expect(relErr(out.conductivity, interpolateTable(k, T)), `${T} K`).toBeLessThan(1e-12);
      expect(out).toEqual(airPropertiesAt(T));
    }
  });

  it('propagates NaN instead of inventing a value', () => {
    expect(airPropertiesAt(NaN).conductivity).toBeNaN();
    expect(airPropertiesAt(300).conductivity).toBeCloseTo(0.0263, 12); // and recovers afterwards
  });
});

describe('airPressureAtElevation (ISO 2533 / US Standard Atmosphere 1976, troposphere)', () => {
  it('is 101 325 Pa at sea level', () => {
    expect(airPressureAtElevation(0)).toBe(101325);
  });

  it('matches the US Standard Atmosphere 1976 table at geometric altitudes 1, 2, 5 and 11 km', () => {
    // US Standard Atmosphere 1976, tabulated by geometric altitude (from memory):
    // 1000 m 8.9876e4, 2000 m 7.9501e4, 5000 m 5.4048e4, 11 000 m 2.2700e4 Pa.
    // Tolerance 1e-4 relative: 5-figure rounding of the table (≤ 2.2e-5) plus R = CODATA 2018
    // instead of the standard's 8.31432 (≤ 3e-5), with margin.
    for (const [z, p] of [[1000, 89876], [2000, 79501], [5000, 54048], [11000, 22700]]) {
      expect(relErr(airPressureAtElevation(z), p), `${z} m`).toBeLessThan(1e-4);
    }
  });

  it('reaches the tropopause pressure 22 632 Pa at 11 000 m geopotential', () => {
    // ISO 2533: p = 22 632 Pa at H = 11 000 m geopotential (from memory); geometric
    // z = r₀ H / (r₀ − H) with r₀ = 6 356 766 m. Tolerance 1e-4 as above.
    const r0 = 6356766;
    const z = (r0 * 11000) / (r0 - 11000);
    expect(relErr(airPressureAtElevation(z), 22632)).toBeLessThan(1e-4);
  });

  it('rises above 1 atm below sea level and falls monotonically with height', () => {
    expect(airPressureAtElevation(-400)).toBeGreaterThan(101325);
    let prev = Infinity;
    for (let z = -500; z <= 11000; z += 500) {
      const p = airPressureAtElevation(z);
      expect(p).toBeLessThan(prev);
      prev = p;
    }
  });
});
