import { describe, expect, it } from 'vitest';
import {
  acidDewPointVerhoffBanchero,
  flueGasDewPoints,
  waterDewPointK,
  waterSaturationPressureIf97,
  waterSaturationTemperatureIf97,
} from '../../../src/physics/flue/dewPoint.ts';
import { flueGasFromVolumeFractions } from '../../../src/physics/flue/combustion.ts';

describe('water dew point', () => {
  it('is 60 °C at 19.946 kPa (steam tables)', () => {
    // IAPWS-IF97 / any steam table: p_sat(60 °C) = 19.946 kPa. Tolerance 0.01 K: the table value
    // is rounded to 5 figures (1 Pa ≈ 0.001 K here).
    expect(Math.abs(waterDewPointK(19946) - 333.15)).toBeLessThan(0.01);
  });

  it('matches the IAPWS-IF97 verification values of the saturation line to all nine printed digits', () => {
    // IAPWS-IF97 (R7-97(2012)), Table 35 (p_s at 300, 500, 600 K) and Table 36 (T_s at 0.1, 1, 10 MPa);
    // values from memory, and they agree with eqs. 30/31 evaluated at 30 digits with the Table 34
    // coefficients. The release prints 9 significant digits, so the check is that our value rounds
    // to the printed one. (With the earlier wrong trailing digits of n2, p_s(500 K), p_s(600 K) and
    // T_s(10 MPa) rounded to a different ninth digit.)
    const nine = (x: number) => Number(x.toPrecision(9));
    expect(nine(waterSaturationPressureIf97(300) / 1e6)).toBe(0.353658941e-2);
    expect(nine(waterSaturationPressureIf97(500) / 1e6)).toBe(0.263889776e1);
    expect(nine(waterSaturationPressureIf97(600) / 1e6)).toBe(0.123443146e2);
    expect(nine(waterSaturationTemperatureIf97(0.1e6))).toBe(0.372755919e3);
    expect(nine(waterSaturationTemperatureIf97(1e6))).toBe(0.453035632e3);
    expect(nine(waterSaturationTemperatureIf97(10e6))).toBe(0.584149488e3);
  });

  it('has saturation temperature and pressure as inverses of each other (IF97 eqs. 30 and 31)', () => {
    // The release constructs eq. 31 as the exact algebraic inverse of eq. 30. Tolerance 1e-12
    // relative: double-precision round-off through the square roots.
    for (const t of [280, 373.15, 450, 600, 640]) {
      expect(Math.abs(waterSaturationTemperatureIf97(waterSaturationPressureIf97(t)) / t - 1)).toBeLessThan(1e-12);
    }
  });

  it('is −10 °C over supercooled water at 286.5 Pa (Magnus branch)', () => {
    // Smithsonian Meteorological Tables / WMO: e_w(−10 °C) over water = 2.865 hPa (from memory).
    // Tolerance 0.05 K: Alduchov–Eskridge quote ±0.1 % in pressure in this range (≈ 0.015 K),
    // plus rounding of the recalled table value.
    expect(Math.abs(waterDewPointK(286.5) - 263.15)).toBeLessThan(0.05);
  });

  it('is continuous where the Magnus branch meets IF97 at the triple-point pressure', () => {
    // Continuity by construction; 1e-4 K covers the slope over 1e-4 Pa.
    expect(Math.abs(waterDewPointK(611.2129) - waterDewPointK(611.213))).toBeLessThan(1e-4);
  });

  it('is −Infinity for a gas without water vapour', () => {
    expect(waterDewPointK(0)).toBe(-Infinity);
    expect(() => waterDewPointK(NaN)).toThrow(RangeError);
  });
});

describe('acid dew point (Verhoff–Banchero)', () => {
  it('is about 137 °C for 10 % H2O and 10 ppm SO3 at 1 atm', () => {
    // Hand evaluation of the published equation: p_H2O = 76 mmHg (ln 4.33073), p_SO3 = 0.0076 mmHg
    // (ln −4.87961); 2.276 − 0.0294·4.33073 + 0.0858·4.87961 − 0.0062·4.33073·4.87961
    // = 2.276 − 0.127323 + 0.418670 − 0.131020 = 2.436327 → T = 410.45 K = 137.3 °C.
    // Tolerance 0.05 K: rounding of the hand arithmetic.
    const t = acidDewPointVerhoffBanchero(76, 0.0076);
    expect(Math.abs(t - 1000 / 2.436327)).toBeLessThan(0.05);
    // Handbook charts of acid dew point against SO3 (from memory): about 135–140 °C at 10 ppm SO3
    // and 10 % moisture. Tolerance 5 K for reading a chart from memory.
    expect(Math.abs(t - 273.15 - 138)).toBeLessThan(5);
  });

  it('rises with SO3 and with moisture', () => {
    // The correlation's partial derivatives are negative in 1000/T over the fitted range.
    expect(acidDewPointVerhoffBanchero(76, 0.076)).toBeGreaterThan(acidDewPointVerhoffBanchero(76, 0.0076));
    expect(acidDewPointVerhoffBanchero(114, 0.0076)).toBeGreaterThan(acidDewPointVerhoffBanchero(76, 0.0076));
  });

  it('rejects zero partial pressures', () => {
    expect(() => acidDewPointVerhoffBanchero(76, 0)).toThrow(RangeError);
  });
});

describe('flueGasDewPoints', () => {
  it('uses partial pressures from mole fractions and the total pressure', () => {
    // Analytic: p_H2O = 0.10 × 101325 Pa = 76.0 mmHg; p_SO3 = 10 ppm → 0.0076 mmHg.
    const g = flueGasFromVolumeFractions({ N2: 0.75, O2: 0.04, CO2: 0.11, H2O: 0.1, SO3Ppm: 10 });
    const d = flueGasDewPoints(g, 101325);
    const xH2O = g.H2O; // 0.1 × (1 − 1e-5)
    expect(d.waterDewPointK).toBeCloseTo(waterDewPointK(xH2O * 101325), 12);
    expect(d.acidDewPointK).toBeCloseTo(acidDewPointVerhoffBanchero(xH2O * 760, 10e-6 * 760), 9);
    // Steam tables: p_sat(46 °C) = 10.10 kPa and p_sat(45 °C) = 9.59 kPa, so 10.13 kPa → ≈ 46.1 °C
    // (from memory). Tolerance 0.2 K for the interpolation.
    expect(Math.abs(d.waterDewPointK - 273.15 - 46.1)).toBeLessThan(0.2);
  });

  it('reports no acid dew point without SO3', () => {
    const g = flueGasFromVolumeFractions({ N2: 0.75, O2: 0.04, CO2: 0.11, H2O: 0.1 });
    expect(flueGasDewPoints(g, 101325).acidDewPointK).toBeNull();
  });
});
