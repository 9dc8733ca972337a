import { describe, it, expect } from 'vitest';
import {
  nuCylinderChurchillBernstein,
  nuVerticalPlateChurchillChu,
  isSlenderVerticalCylinder,
  slenderCylinderFactorPopiel,
  nuMixedChurchill,
  outsideFilmCoefficient,
  type FilmAirProperties,
} from '../../../src/physics/correlations/external.ts';
import { airPressureAtElevation, airPropertiesAt } from '../../../src/physics/properties/air.ts';

// Air near 300 K (Incropera & DeWitt, Table A.4, from memory): k = 0.0263 W/(m K),
// ν = 15.89e-6 m²/s, Pr = 0.707; β = 1/T_f for an ideal gas.
const AIR_300K: FilmAirProperties = {
  conductivity: 0.0263,
  kinematicViscosity: 15.89e-6,
  prandtl: 0.707,
  expansion: 1 / 300,
};

describe('nuCylinderChurchillBernstein', () => {
  it('reproduces the cross-flow textbook example Re = 6071, Pr = 0.700 → Nu ≈ 40.6', () => {
    // Incropera & DeWitt, Fundamentals of Heat and Mass Transfer 6th ed., Example 7.4 (from memory).
    // Tolerance 0.05: the book rounds to three significant figures.
    expect(nuCylinderChurchillBernstein(6071, 0.7)).toBeCloseTo(40.6, 1);
  });

  it('matches the published formula worked by hand at Re = 1000, Pr = 0.71', () => {
    // Churchill & Bernstein (1977): √1000 = 31.6228, 0.71^⅓ = 0.892112,
    // 0.62·31.6228·0.892112 = 17.4909; (0.4/0.71)^⅔ = 0.682131, (1.682131)^¼ = 1.13885;
    // (1000/282000)^(5/8) = 0.0294167, (1.0294167)^(4/5) = 1.02346;
    // Nu = 0.3 + 17.4909/1.13885·1.02346 = 16.0188.
    // Tolerance 1e-3: hand arithmetic carried to six significant figures.
    expect(nuCylinderChurchillBernstein(1000, 0.71)).toBeCloseTo(16.0188, 3);
  });

  it('includes the high-Re factor [1 + (Re/282000)^(5/8)]^(4/5) at Re = 10⁶', () => {
    // By hand: 0.62·1000·0.887904 = 550.500; den (1.688612)^¼ = 1.13994;
    // (10⁶/282000)^(5/8) = 2.20594, (3.20594)^(4/5) = 2.53960; Nu = 0.3 + 550.5/1.13994·2.5396 = 1226.72.
    // Tolerance 0.05 (relative 4e-5): six-figure hand arithmetic.
    expect(nuCylinderChurchillBernstein(1e6, 0.7)).toBeCloseTo(1226.72, 1);
  });

  it('tends to its 0.3 floor at Re = 0 and is never NaN', () => {
    // Churchill & Bernstein (1977): the constant term 0.3 is the Re → 0 limit of the formula.
    expect(nuCylinderChurchillBernstein(0, 0.71)).toBe(0.3);
    expect(Number.isNaN(nuCylinderChurchillBernstein(1e-12, 0.71))).toBe(false);
  });
});

describe('nuVerticalPlateChurchillChu', () => {
  it('reproduces the vertical-plate textbook example Ra = 1.813·10⁹, Pr = 0.69 → Nu ≈ 147', () => {
    // Incropera & DeWitt, 6th ed., Example 9.2 (glass fire-screen, from memory).
    // Tolerance 0.5: the book gives three significant figures.
    expect(Math.abs(nuVerticalPlateChurchillChu(1.813e9, 0.69) - 147)).toBeLessThan(0.5);
  });

  it('matches the published formula worked by hand at Ra = 10⁹, Pr = 0.71', () => {
    // Churchill & Chu (1975): (0.492/0.71)^(9/16) = 0.813575, (1.813575)^(8/27) = 1.19290;
    // Ra^(1/6) = 31.6228; root = 0.825 + 0.387·31.6228/1.1929 = 11.0841; Nu = 11.0841² = 122.857.
    // Tolerance 0.005: six-figure hand arithmetic.
    expect(nuVerticalPlateChurchillChu(1e9, 0.71)).toBeCloseTo(122.857, 2);
  });

  it('gives its floor 0.825² = 0.680625 at Ra = 0, never NaN', () => {
    // Churchill & Chu (1975): the constant 0.825 is the Ra → 0 limit of the square root.
    expect(nuVerticalPlateChurchillChu(0, 0.71)).toBeCloseTo(0.680625, 12);
  });
});

describe('isSlenderVerticalCylinder', () => {
  it('treats a 2 m × 50 m stack at Gr = 10¹⁴ as a plate', () => {
    // Criterion D/L ≥ 35/Gr^¼ (Incropera & DeWitt §9.6.1, after Cebeci 1974; from memory):
    // 35/10^3.5 = 0.01107 ≤ 2/50 = 0.04 → not slender.
    expect(isSlenderVerticalCylinder(2, 50, 1e14)).toBe(false);
  });

  it('flags a thin rod as slender', () => {
    // 35/(1.2946e9)^¼ = 0.1845 > 0.01/1 → slender.
    expect(isSlenderVerticalCylinder(0.01, 1, 1.2946e9)).toBe(true);
  });

  it('puts the boundary D/L = 35/Gr^¼ on the plate side', () => {
    // Gr = 10⁸ → Gr^¼ = 100 → threshold 0.35.
    expect(isSlenderVerticalCylinder(0.35, 1, 1e8)).toBe(false);
    expect(isSlenderVerticalCylinder(0.34, 1, 1e8)).toBe(true);
  });

  it('calls any cylinder slender when Gr = 0 (no boundary layer to compare), without NaN', () => {
    expect(isSlenderVerticalCylinder(2, 50, 0)).toBe(true);
  });
});

describe('slenderCylinderFactorPopiel', () => {
  it('agrees with the CalebBell/ht documented example Nu(Pr 0.7, Gr 10¹⁰, L 2.5, D 1) = 228.898', () => {
    // Reference library: CalebBell/ht, Nu_vertical_cylinder_Popiel_Churchill docstring example,
    // which multiplies Churchill–Chu (Ra = Pr·Gr) by the Popiel factor.
    // Tolerance 1e-6 relative: both are the same closed-form arithmetic in double precision.
    const nu = nuVerticalPlateChurchillChu(0.7 * 1e10, 0.7) * slenderCylinderFactorPopiel(1e10, 0.7, 2.5, 1);
    expect(nu / 228.89790055149896 - 1).toBeLessThan(1e-6);
    expect(nu / 228.89790055149896 - 1).toBeGreaterThan(-1e-6);
  });

  it('matches the formula worked by hand at Pr = 0.7, Gr = 10⁸, L/D = 100', () => {
    // Popiel et al. (2007): B = 0.0571322 + 0.20305·0.7^−0.43 = 0.293839;
    // C = 0.9165 − 0.0043·0.83666 + 0.01333·(−0.356675) + 0.0004809/0.7 = 0.908835;
    // x = √32·10⁻²·100 = 5.65685; factor = 1 + 0.293839·5.65685^0.908835 = 2.41931.
    // Tolerance 5e-5: six-figure hand arithmetic.
    expect(slenderCylinderFactorPopiel(1e8, 0.7, 100, 1)).toBeCloseTo(2.41931, 4);
  });

  it('tends to 1 for a short thick cylinder', () => {
    // As L/D → 0 the bracket → 0 and the plate value is recovered (Popiel et al. 2007).
    // Tolerance 1e-3: L/D = 10⁻⁴ leaves a residual B·x^C ≈ 5e-6, small against 1e-3.
    expect(slenderCylinderFactorPopiel(1e8, 0.7, 1e-4, 1)).toBeCloseTo(1, 3);
  });
});

describe('nuMixedChurchill', () => {
  it('combines as the cube root of the sum of cubes', () => {
    // Churchill (1977): (3³ + 4³)^(1/3) = 91^(1/3) = 4.497941.
    expect(nuMixedChurchill(3, 4)).toBeCloseTo(4.497941, 6);
  });

  it('returns the other value when one mechanism is absent', () => {
    expect(nuMixedChurchill(0, 7.5)).toBeCloseTo(7.5, 12);
    expect(nuMixedChurchill(7.5, 0)).toBeCloseTo(7.5, 12);
  });

  it('honours another exponent', () => {
    // n = 4: (3⁴ + 4⁴)^(1/4) = 337^(1/4) = √18.357560 = 4.284572.
    expect(nuMixedChurchill(3, 4, 4)).toBeCloseTo(4.284572, 6);
  });
});

describe('outsideFilmCoefficient', () => {
  const base = { outerDiameter: 2, height: 50, surfaceTemperatureK: 310, airTemperatureK: 290 };

  it('combines forced and natural film coefficients for a windy 2 m × 50 m stack', () => {
    // By hand: Re = 5·2/15.89e-6 = 629327; Churchill–Bernstein → Nu_F = 839.464,
    // h_F = 839.464·0.0263/2 = 11.0390; Gr_H = 9.80665·(1/300)·20·50³/(15.89e-6)² = 3.23662e14,
    // Ra = 2.28829e14, Churchill–Chu → Nu_N = 6566.48, h_N = 6566.48·0.0263/50 = 3.45397;
    // h = (11.0390³ + 3.45397³)^(1/3) = 11.1505 W/(m² K).
    // Tolerance 1e-3: six-figure hand arithmetic.
    const r = outsideFilmCoefficient({ ...base, windSpeed: 5 }, AIR_300K);
    expect(r.re).toBeCloseTo(629327, -1);
    expect(r.ra / 2.28829e14 - 1).toBeLessThan(1e-5);
    expect(r.h).toBeCloseTo(11.1505, 3);
    expect(r.nuMixed).toBeCloseTo((r.h * 2) / 0.0263, 9);
  });

  it('gives exactly the natural-convection value with zero wind', () => {
    const r = outsideFilmCoefficient({ ...base, windSpeed: 0 }, AIR_300K);
    expect(r.nuForced).toBe(0);
    expect(r.hForced).toBe(0);
    // h_N = Nu_CC(Ra_H) k / H, hand value 3.45397 (see above); tolerance 1e-4: six figures.
    expect(r.h).toBeCloseTo(3.45397, 4);
    expect(r.h).toBe(r.hNatural);
  });

  it('gives exactly the forced-convection value with equal surface and air temperature', () => {
    const r = outsideFilmCoefficient(
      { ...base, windSpeed: 5, surfaceTemperatureK: 290, airTemperatureK: 290 },
      AIR_300K,
    );
    expect(r.ra).toBe(0);
    expect(r.nuNatural).toBe(0);
    // h_F hand value 11.0390 (see above); tolerance 1e-3: six figures.
    expect(r.h).toBeCloseTo(11.039, 3);
    expect(r.h).toBe(r.hForced);
  });

  it('stays finite and positive with no wind and no temperature difference', () => {
    // Diffusive floors of both correlations: ((0.3·0.0263/2)³ + (0.680625·0.0263/50)³)^(1/3)
    // = (6.13966e-8 + 4.5887e-11)^(1/3) = 0.0039460. Tolerance 5e-7: hand arithmetic.
    const r = outsideFilmCoefficient(
      { ...base, windSpeed: 0, surfaceTemperatureK: 290, airTemperatureK: 290 },
      AIR_300K,
    );
    expect(Number.isFinite(r.h)).toBe(true);
    expect(r.h).toBeCloseTo(0.003946, 6);
  });

  it('is symmetric in the sign of the temperature difference', () => {
    const hot = outsideFilmCoefficient({ ...base, windSpeed: 1 }, AIR_300K);
    const cold = outsideFilmCoefficient(
      { ...base, windSpeed: 1, surfaceTemperatureK: 270, airTemperatureK: 290 },
      AIR_300K,
    );
    expect(cold.h).toBe(hot.h);
  });

  it('applies the Popiel factor to a slender cylinder in laminar natural convection', () => {
    // D = 0.01 m, H = 1 m, ΔT = 10 K: Gr = 9.80665·(1/300)·10/(15.89e-6)² = 1.29465e9,
    // Ra = 9.15316e8 ≤ 10⁹; 35/Gr^¼ = 0.1845 > 0.01 → slender.
    const r = outsideFilmCoefficient(
      { windSpeed: 0, outerDiameter: 0.01, height: 1, surfaceTemperatureK: 300, airTemperatureK: 290 },
      AIR_300K,
    );
    expect(r.slender).toBe(true);
    expect(r.slenderCorrected).toBe(true);
    const plate = nuVerticalPlateChurchillChu(r.ra, 0.707);
    const factor = slenderCylinderFactorPopiel(r.grashof, 0.707, 1, 0.01);
    expect(factor).toBeGreaterThan(1);
    // Tolerance 1e-12 relative: same arithmetic, composed in a different order.
    expect(r.nuNatural / (plate * factor) - 1).toBeLessThan(1e-12);
  });

  it('never returns NaN across zero and tiny inputs', () => {
    for (const windSpeed of [0, 1e-9, 0.1, 30]) {
      for (const surfaceTemperatureK of [290, 290 + 1e-9, 350]) {
        const r = outsideFilmCoefficient({ ...base, windSpeed, surfaceTemperatureK }, AIR_300K);
        for (const v of [r.h, r.nuForced, r.nuNatural, r.nuMixed, r.re, r.ra]) {
          expect(Number.isNaN(v)).toBe(false);
        }
      }
    }
  });
});

describe('rational powers written as roots and products', () => {
  // The published formulas with Math.pow, as the reference the faster forms must reproduce.
  const cbRef = (re: number, pr: number) =>
    0.3 +
    ((0.62 * Math.pow(re, 0.5) * Math.pow(pr, 1 / 3)) / Math.pow(1 + Math.pow(0.4 / pr, 2 / 3), 0.25)) *
      Math.pow(1 + Math.pow(re / 282000, 5 / 8), 4 / 5);
  const ccRef = (ra: number, pr: number) =>
    Math.pow(0.825 + (0.387 * Math.pow(ra, 1 / 6)) / Math.pow(1 + Math.pow(0.492 / pr, 9 / 16), 8 / 27), 2);
  const rel = (a: number, b: number) => Math.abs(a / b - 1);

  it('give Churchill–Bernstein and Churchill–Chu within 1e-12 of the Math.pow forms', () => {
    // Tolerance 1e-12 relative: the roots are correctly rounded or within 1 ulp, and the chains
    // multiply at most a few such errors (about 1e-15); 1e-12 is the stated requirement.
    for (const pr of [0.01, 0.3, 0.7, 0.72, 1, 7, 100, 1000]) {
      for (const re of [1e-3, 0.2, 1, 47, 1e3, 6071, 1e5, 282000, 3e6, 1e7]) {
        expect(rel(nuCylinderChurchillBernstein(re, pr), cbRef(re, pr))).toBeLessThan(1e-12);
      }
      for (const ra of [0, 0.1, 1, 1e4, 1.813e9, 1e12, 3e14, 1e16]) {
        expect(rel(nuVerticalPlateChurchillChu(ra, pr), ccRef(ra, pr))).toBeLessThan(1e-12);
      }
    }
  });

  it('give the n = 3 Churchill combination within 1e-12 of the Math.pow form', () => {
    for (const [f, n] of [[3, 4], [1e-3, 250], [6566, 40.6], [0.3, 0.680625]]) {
      expect(rel(nuMixedChurchill(f, n), Math.pow(f ** 3 + n ** 3, 1 / 3))).toBeLessThan(1e-12);
    }
  });

  it('give the Popiel factor within 1e-12 of the Math.pow form', () => {
    const ref = (gr: number, pr: number, l: number, d: number) => {
      const b = 0.0571322 + 0.20305 * Math.pow(pr, -0.43);
      const c = 0.9165 - 0.0043 * Math.pow(pr, 0.5) + 0.01333 * Math.log(pr) + 0.0004809 / pr;
      return 1 + b * Math.pow((Math.pow(32, 0.5) * Math.pow(gr, -0.25) * l) / d, c);
    };
    for (const [gr, pr, l, d] of [[1e8, 0.7, 100, 1], [1e6, 0.72, 20, 0.5], [3e9, 5, 30, 2]]) {
      expect(rel(slenderCylinderFactorPopiel(gr, pr, l, d), ref(gr, pr, l, d))).toBeLessThan(1e-12);
    }
  });
});

describe('outside film coefficient at a high site (site pressure)', () => {
  it('is about 17 % lower at 2000 m than at sea level, as a hand computation gives', () => {
    // Hand computation (independent script of the published formulas) with Incropera Table A.4 air
    // at T_f = 300 K (k 0.0263, μ 184.6e-7, cp 1007 → Pr 0.706814; from memory) and the standard
    // atmosphere: p(2000 m) = 101325·(1 − 0.0065·1999.371/288.15)^5.255786 = 79 501.8 Pa
    // (US Standard Atmosphere 1976 lists 7.95·10⁴ Pa; from memory). U = 3 m/s, D = 2 m, H = 50 m,
    // T_s = 310 K, T_air = 290 K.
    //   sea level: ρ 1.176592, ν 1.568939e-5, Re 382 424, Ra_H 2.34657e14 → Nu_F 565.635,
    //              Nu_N 6620.93 → h_F 7.43810, h_N 3.48261, h = 7.68434 W/(m² K)
    //   2000 m:    ρ 0.923179, ν 1.999613e-5, Re 300 058, Ra_H 1.44462e14 → Nu_F 469.971,
    //              Nu_N 5642.01 → h_F 6.18013, h_N 2.96770, h = 6.40030 W/(m² K)
    // Ratio 0.8329: ν ∝ 1/p lowers Re by p and Gr by p². Tolerance 1e-5 relative: the script's
    // arithmetic is double precision; the film properties hit a table row exactly.
    const input = { windSpeed: 3, outerDiameter: 2, height: 50, surfaceTemperatureK: 310, airTemperatureK: 290 };
    const pHigh = airPressureAtElevation(2000);
    expect(Math.abs(pHigh / 79501.76 - 1)).toBeLessThan(1e-6);
    const sea = outsideFilmCoefficient(input, airPropertiesAt(300, 101325));
    const high = outsideFilmCoefficient(input, airPropertiesAt(300, pHigh));
    expect(Math.abs(sea.h / 7.684344 - 1)).toBeLessThan(1e-5);
    expect(Math.abs(high.h / 6.400298 - 1)).toBeLessThan(1e-5);
    expect(Math.abs(high.hForced / 6.180125 - 1)).toBeLessThan(1e-5);
    expect(Math.abs(high.hNatural / 2.967698 - 1)).toBeLessThan(1e-5);
    expect(Math.abs(high.h / sea.h - 0.832901)).toBeLessThan(1e-5);
  });
});
