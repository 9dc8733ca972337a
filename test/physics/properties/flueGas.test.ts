import { describe, expect, it } from 'vitest';
import {
  airAsFlueGas,
  conductivityChung,
  conductivityWaterVapourIapws2011,
  cpMolarNasa7,
  gasPropertiesAt,
  makeGasPropertyTable,
  mixtureConductivityMasonSaxena,
  mixtureMolarMass,
  mixtureViscosityWilke,
  speciesViscosity,
  viscosityWaterVapourIapws2008,
  type GasComposition,
} from '../../../src/physics/properties/flueGas.ts';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('cp from the NASA 7-coefficient polynomials', () => {
  // JANAF Thermochemical Tables (Chase 1998, 4th ed.), cp° in J/(mol K) — from memory.
  // Tolerance 0.5 %: the polynomial fits reproduce JANAF to about 0.1–0.2 %; the rest covers
  // rounding in the recalled table values.
  const janaf: [species: 'N2' | 'O2' | 'CO2' | 'H2O', T: number, cp: number][] = [
    ['N2', 300, 29.125],
    ['N2', 1000, 32.697],
    ['O2', 300, 29.385],
    ['O2', 1000, 34.87],
    ['CO2', 300, 37.221],
    ['CO2', 1000, 54.308],
    ['H2O', 300, 33.596],
    ['H2O', 1000, 41.268],
  ];
  for (const [s, T, cp] of janaf) {
    it(`gives ${s} at ${T} K within 0.5 % of JANAF (${cp} J/(mol K))`, () => {
      expect(rel(cpMolarNasa7(s, T), cp)).toBeLessThan(0.005);
    });
  }

  it('has low and high ranges that meet at 1000 K', () => {
    // The published fits are constrained to join at the common temperature; 0.05 % covers the
    // 8-digit rounding of the coefficients.
    for (const s of ['N2', 'O2', 'CO2', 'H2O', 'SO2'] as const) {
      expect(rel(cpMolarNasa7(s, 999.9999), cpMolarNasa7(s, 1000))).toBeLessThan(5e-4);
    }
  });

  it('gives SO2 near 298 K within 0.5 % of JANAF (39.87 J/(mol K))', () => {
    // JANAF SO2 cp°(298.15 K) = 39.87 J/(mol K), from memory; tolerance as above.
    expect(rel(cpMolarNasa7('SO2', 298.15), 39.87)).toBeLessThan(0.005);
  });
});

describe('air-like gas (airAsFlueGas)', () => {
  it('sums to 1 and has molar mass 28.86 g/mol because argon is counted as N2', () => {
    const sum = Object.values(airAsFlueGas).reduce((a, b) => a + b, 0);
    expect(sum).toBeCloseTo(1, 12);
    // Hand calculation: 0.79018·28.014 + 0.20946·31.998 + 0.0004·44.009 = 28.855 g/mol (÷1.00004).
    expect(mixtureMolarMass(airAsFlueGas) * 1000).toBeCloseTo(28.854, 2);
  });

  const air300 = gasPropertiesAt(airAsFlueGas, 101325, 300);
  it('has viscosity near 1.85e-5 Pa s at 300 K', () => {
    // Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, Table A.4, air at 300 K:
    // μ = 184.6e-7 N s/m² (from memory). Tolerance 3 %: Chapman–Enskog with Lennard-Jones
    // parameters is good to about 1–3 % for N2 and O2.
    expect(rel(air300.dynamicViscosity, 1.846e-5)).toBeLessThan(0.03);
  });
  it('has conductivity near 0.0263 W/(m K) at 300 K and 0.0667 at 1000 K', () => {
    // Incropera & DeWitt Table A.4, air: k(300 K) = 26.3e-3, k(1000 K) = 66.7e-3 W/(m K) (from memory).
    // Tolerance 5 %: Chung et al.'s method is quoted at about ±5 % for non-polar gases.
    expect(rel(air300.conductivity, 0.0263)).toBeLessThan(0.05);
    expect(rel(gasPropertiesAt(airAsFlueGas, 101325, 1000).conductivity, 0.0667)).toBeLessThan(0.05);
  });
  it('has cp near 1007 J/(kg K) and Prandtl number near 0.707 at 300 K', () => {
    // Incropera & DeWitt Table A.4, air at 300 K: cp 1007 J/(kg K), Pr 0.707 (from memory).
    // cp tolerance 1 %: counting argon as N2 raises the mass cp of air by about 0.6 %.
    // Pr tolerance 3 %: combines the μ and k uncertainties above, which partly cancel.
    expect(rel(air300.specificHeat, 1007)).toBeLessThan(0.01);
    expect(rel(air300.prandtl, 0.707)).toBeLessThan(0.03);
  });
  it('has ideal-gas density close to 1.2922 kg/m³ at 0 °C and 1 atm', () => {
    // Normal density of dry air 1.2922 kg/m³ (DIN 1343 / ISO 2533 molar mass 28.9644 g/mol, ideal gas).
    // Tolerance 0.5 %: argon counted as N2 lowers the molar mass by 0.37 %.
    expect(rel(gasPropertiesAt(airAsFlueGas, 101325, 273.15).density, 1.2922)).toBeLessThan(0.005);
  });
});

describe('species transport properties', () => {
  it('gives water-vapour viscosity and conductivity near 100 °C as in the steam tables', () => {
    // Incropera & DeWitt Table A.6, saturated water vapour at 373.15 K: μ = 12.02e-6 N s/m²,
    // k = 24.8e-3 W/(m K) (from memory). Tolerance 3 %: the formulas are the dilute-gas limit;
    // saturated vapour at 1 atm is slightly denser.
    expect(rel(viscosityWaterVapourIapws2008(373.15), 12.02e-6)).toBeLessThan(0.03);
    expect(rel(conductivityWaterVapourIapws2011(373.15), 0.0248)).toBeLessThan(0.03);
  });

  it('gives N2 viscosity at 300 K and 1000 K near the handbook values', () => {
    // Incropera & DeWitt Table A.4, nitrogen: μ(300 K) = 178.2e-7, μ(1000 K) = 402e-7 N s/m²
    // (from memory). Tolerance 3 % (Chapman–Enskog accuracy, as above).
    expect(rel(speciesViscosity('N2', 300), 178.2e-7)).toBeLessThan(0.03);
    expect(rel(speciesViscosity('N2', 1000), 402e-7)).toBeLessThan(0.03);
  });

  it("reproduces Chung's worked value for N2 at 300 K", () => {
    // N2, 300 K: handbook k = 0.0259 W/(m K) (Incropera Table A.4, from memory) with the handbook
    // μ 178.2e-7 and Cv = 29.125 − 8.314 J/(mol K) (JANAF). Tolerance 5 % (method accuracy).
    expect(rel(conductivityChung(178.2e-7, 29.125 - 8.314462618, 0.028014, 300, 126.2, 0.037), 0.0259)).toBeLessThan(0.05);
  });
});

describe('mixing rules', () => {
  it("reproduces Bird, Stewart & Lightfoot's Wilke example (CO2/O2/N2 at 293 K)", () => {
    // Bird, Stewart & Lightfoot, Transport Phenomena, Example 1.4-2 (from memory): x = 0.133 CO2,
    // 0.039 O2, 0.828 N2; μ = 1462, 2031, 1754 ×10⁻⁷ g/(cm s); Wilke gives 1714 ×10⁻⁷ g/(cm s).
    // Tolerance 0.3 %: the book rounds the φ_ij to three figures.
    const mu = mixtureViscosityWilke([0.133, 0.039, 0.828], [1462e-8, 2031e-8, 1754e-8], [44.01, 32.0, 28.02]);
    expect(rel(mu, 1714e-8)).toBeLessThan(0.003);
  });

  it('returns the pure value when a gas is "mixed" with itself', () => {
    // Analytic: for identical species φ_ij = 1 and both rules collapse to the pure value.
    expect(mixtureViscosityWilke([0.3, 0.7], [1.8e-5, 1.8e-5], [28, 28])).toBeCloseTo(1.8e-5, 15);
    expect(mixtureConductivityMasonSaxena([0.3, 0.7], [0.026, 0.026], [1.8e-5, 1.8e-5], [28, 28])).toBeCloseTo(0.026, 14);
  });

  it('ignores species with zero fraction', () => {
    // Analytic: a zero mole fraction removes a species from both sums.
    expect(mixtureViscosityWilke([1, 0], [1.8e-5, 1e-5], [28, 44])).toBeCloseTo(1.8e-5, 15);
  });
});

describe('makeGasPropertyTable', () => {
  const flue: GasComposition = { N2: 0.72, O2: 0.03, CO2: 0.09, H2O: 0.16, SO2: 0, SO3: 0 };
  const table = makeGasPropertyTable(flue, 101325);

  it('interpolates to within 0.01 % of the direct calculation between grid points', () => {
    // Regression check against the slow path of this module (not an outside reference): 0.01 % is
    // the size of the second-order interpolation error of smooth fits over 10 K.
    for (const T of [253.3, 305, 477.7, 999.5, 1000.5, 1555.5, 1995]) {
      const a = table(T);
      const b = gasPropertiesAt(flue, 101325, T);
      expect(rel(a.specificHeat, b.specificHeat)).toBeLessThan(1e-4);
      expect(rel(a.dynamicViscosity, b.dynamicViscosity)).toBeLessThan(1e-4);
      expect(rel(a.conductivity, b.conductivity)).toBeLessThan(1e-4);
      expect(rel(a.density, b.density)).toBeLessThan(1e-12);
    }
  });

  it('gives ideal-gas density p M / (R T)', () => {
    // Analytic: ideal gas law with this composition's molar mass.
    const M = 0.72 * 0.028014 + 0.03 * 0.031998 + 0.09 * 0.044009 + 0.16 * 0.018015;
    expect(rel(table(450).density, (101325 * M) / (8.314462618 * 450))).toBeLessThan(1e-12);
  });

  it('still answers outside the table, by direct calculation', () => {
    // Regression: beyond 2000 K the lookup falls back to the direct calculation.
    const p = table(2400);
    expect(p).toEqual(gasPropertiesAt(flue, 101325, 2400));
    expect(Number.isFinite(p.prandtl)).toBe(true);
  });

  it('rejects an empty range', () => {
    expect(() => makeGasPropertyTable(flue, 101325, { fromK: 500, toK: 400, stepK: 10 })).toThrow(RangeError);
  });
});
