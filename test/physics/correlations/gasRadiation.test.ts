import { describe, it, expect } from 'vitest';
import {
  flueGasRadiation,
  makeGreyGasExchange,
  gasEmissivityWsgg,
  meanBeamLengthLongCylinder,
  WSGG_DORIGON_2013,
  WSGG_SMITH_1982,
  wsggWeightSum,
  type FlueGasRadiationInput,
} from '../../../src/physics/correlations/gasRadiation.ts';

const rel = (a: number, b: number) => Math.abs(a / b - 1);

// Natural-gas flue gas at 1 atm (invented plant): 17 % H2O, 8.5 % CO2; 1.4 m flue.
const FLUE: FlueGasRadiationInput = {
  gasTemperatureK: 473.15,
  wallTemperatureK: 423.15,
  waterPartialPressurePa: 0.17 * 101325,
  carbonDioxidePartialPressurePa: 0.085 * 101325,
  beamLengthM: meanBeamLengthLongCylinder(1.4),
  wallEmissivity: 0.85,
};

describe('weighted-sum-of-grey-gases emissivity (Smith, Shen & Friedman 1982)', () => {
  it('matches the published formula worked by hand at 1000 K, 0.3 atm m, ratio 2', () => {
    // Weights at 1000 K: 0.6508 − 0.5551 + 0.3029 − 0.05353 = 0.34507; −0.02504 + 0.6112 − 0.3882 +
    // 0.06528 = 0.26324; 0.2718 − 0.3118 + 0.1221 − 0.01612 = 0.06598.
    // ε = 0.34507(1 − e^−0.12603) + 0.26324(1 − e^−1.9548) + 0.06598(1 − e^−39.57) = 0.332807.
    // Tolerance 1e-6: hand arithmetic.
    expect(gasEmissivityWsgg(1000, 0.3, 2)).toBeCloseTo(0.332807, 6);
  });

  it('agrees within 10 % with the line-by-line-based fit of Dorigon et al. (2013) inside both ranges', () => {
    // Independent fit (HITEMP 2010 line-by-line) against the 1982 fit (exponential wide-band model).
    // No Hottel-chart values were at hand to test against; modern line-by-line results differ from
    // Hottel's charts by up to about 25 % for CO2 (Alberti, Weber & Mancini, Combust. Flame 162
    // (2015) 597). Largest gap here 8.5 % (1000 K, 1 atm m); tolerance 10 %.
    for (const ratio of [1, 2]) {
      for (const t of [600, 1000, 1500]) {
        for (const pl of [0.03, 0.1, 0.3, 1, 3]) {
          expect(rel(gasEmissivityWsgg(t, pl, ratio), gasEmissivityWsgg(t, pl, ratio, WSGG_DORIGON_2013))).toBeLessThan(0.1);
        }
      }
    }
  });

  it('stays within 10 % of Dorigon et al. at stack temperatures (400–600 K) for p_a L ≥ 0.1 atm m', () => {
    // Below the 1982 fit's 600 K: extrapolated weights. Largest gap 7.4 % (600 K, 1 atm m).
    for (const t of [400, 473, 600]) {
      for (const pl of [0.1, 0.3, 1]) {
        expect(rel(gasEmissivityWsgg(t, pl, 2), gasEmissivityWsgg(t, pl, 2, WSGG_DORIGON_2013))).toBeLessThan(0.1);
      }
    }
  });

  it('has positive weights summing below 1 from 300 to 2400 K (window left open)', () => {
    for (const fit of [WSGG_SMITH_1982.ratio1, WSGG_SMITH_1982.ratio2]) {
      for (let t = 300; t <= 2400; t += 100) {
        const sum = wsggWeightSum(fit, t);
        expect(sum).toBeGreaterThan(0);
        expect(sum).toBeLessThan(1);
        // The optically thick limit is that sum.
        expect(rel(gasEmissivityWsgg(t, 1e6, fit === WSGG_SMITH_1982.ratio1 ? 1 : 2), sum)).toBeLessThan(1e-12);
      }
    }
  });

  it('is zero without radiating gas and rises with path length', () => {
    expect(gasEmissivityWsgg(800, 0, 2)).toBe(0);
    let previous = 0;
    for (const pl of [0.001, 0.01, 0.1, 1, 10]) {
      const e = gasEmissivityWsgg(800, pl, 1.5);
      expect(e).toBeGreaterThan(previous);
      previous = e;
    }
  });

  it('interpolates linearly in the H2O/CO2 ratio between the two fits and holds outside them', () => {
    const one = gasEmissivityWsgg(900, 0.2, 1);
    const two = gasEmissivityWsgg(900, 0.2, 2);
    // Linear in the ratio: exact midpoint at 1.5 (round-off tolerance).
    expect(gasEmissivityWsgg(900, 0.2, 1.5)).toBeCloseTo((one + two) / 2, 14);
    expect(gasEmissivityWsgg(900, 0.2, 0.3)).toBe(one);
    expect(gasEmissivityWsgg(900, 0.2, 7)).toBe(two);
  });
});

describe('mean beam length and gas–wall exchange', () => {
  it('uses 0.95 D for a long cylinder radiating to its wall (Hottel)', () => {
    // Incropera & DeWitt Table 13.4 (from memory): infinite circular cylinder, L_e = 0.95 D.
    expect(meanBeamLengthLongCylinder(1.4)).toBeCloseTo(1.33, 12);
  });

  it('matches a hand computation for a natural-gas flue at 200 °C over a 150 °C lining', () => {
    // p_a L = 0.255·1.33 = 0.33915 atm m; ε_g(473.15 K) = 0.373648, α_g (weights at 423.15 K) = 0.372878;
    // q = 5.670374e-8·0.925·(0.373648·473.15⁴ − 0.372878·423.15⁴) = 355.18 W/m².
    // Tolerance 1e-4 relative: double-precision hand script of the published formulas.
    const r = flueGasRadiation(FLUE);
    expect(r.pathLengthAtmM).toBeCloseTo(0.33915, 12);
    expect(rel(r.emissivity, 0.373648)).toBeLessThan(1e-5);
    expect(rel(r.absorptivity, 0.372878)).toBeLessThan(1e-5);
    expect(rel(r.flux, 355.182)).toBeLessThan(1e-4);
    expect(r.ratio).toBeCloseTo(2, 12);
  });

  it('gives zero exchange when wall and gas are at one temperature (Kirchhoff)', () => {
    for (const t of [400, 700, 1200]) {
      const r = flueGasRadiation({ ...FLUE, gasTemperatureK: t, wallTemperatureK: t });
      // Tolerance: round-off relative to σ T⁴ terms.
      expect(Math.abs(r.flux)).toBeLessThan(1e-10 * 5.67e-8 * t ** 4);
    }
  });

  it('returns derivatives that match central differences', () => {
    // Central difference with step 1e-3 K: truncation error ~ (1e-3)²·q''' ≪ 1e-7 relative.
    const h = 1e-3;
    for (const model of [WSGG_SMITH_1982, WSGG_DORIGON_2013]) {
      for (const [tg, tw] of [[473.15, 423.15], [1100, 700], [500, 560]]) {
        const at = (g: number, w: number) => flueGasRadiation({ ...FLUE, gasTemperatureK: g, wallTemperatureK: w }, model).flux;
        const r = flueGasRadiation({ ...FLUE, gasTemperatureK: tg, wallTemperatureK: tw }, model);
        const dWall = (at(tg, tw + h) - at(tg, tw - h)) / (2 * h);
        const dGas = (at(tg + h, tw) - at(tg - h, tw)) / (2 * h);
        expect(rel(r.dFluxdWallK, dWall)).toBeLessThan(1e-6);
        expect(rel(r.dFluxdGasK, dGas)).toBeLessThan(1e-6);
        expect(r.dFluxdWallK).toBeLessThan(0);
      }
    }
  });

  it('vanishes for air (no H2O, no CO2) and never gives NaN', () => {
    const r = flueGasRadiation({ ...FLUE, waterPartialPressurePa: 0, carbonDioxidePartialPressurePa: 0 });
    expect(r.flux).toBe(0);
    expect(Math.abs(r.dFluxdWallK)).toBe(0);
    const dry = flueGasRadiation({ ...FLUE, carbonDioxidePartialPressurePa: 0 });
    expect(Number.isFinite(dry.flux)).toBe(true);
  });
});

describe('makeGreyGasExchange (prepared once per flue)', () => {
  it('gives the same flux, wall derivative and emissivity as flueGasRadiation', () => {
    // same formulas, the grey factors computed once: equal to rounding
    for (const [pw, pc] of [[0.17 * 101325, 0.085 * 101325], [0.1 * 101325, 0.1 * 101325], [0.2 * 101325, 0.05 * 101325]] as const) {
      const prepared = makeGreyGasExchange(pw, pc, 1.33, 0.85);
      for (const [tg, tw] of [[473.15, 423.15], [1200, 700], [500, 600]]) {
        const a = flueGasRadiation({ gasTemperatureK: tg, wallTemperatureK: tw, waterPartialPressurePa: pw, carbonDioxidePartialPressurePa: pc, beamLengthM: 1.33, wallEmissivity: 0.85 });
        const b = prepared(tg, tw, { flux: 0, dFluxdWallK: 0, emissivity: 0 });
        expect(b.flux).toBeCloseTo(a.flux, 9);
        expect(b.dFluxdWallK).toBeCloseTo(a.dFluxdWallK, 9);
        expect(b.emissivity).toBeCloseTo(a.emissivity, 12);
      }
    }
  });
});
