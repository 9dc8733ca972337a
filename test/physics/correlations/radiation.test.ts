import { describe, it, expect } from 'vitest';
import {
  skyTemperatureSwinbank,
  skyEmissivityBerdahlMartin,
  skyEmissivityCloudClarkAllen,
  skyEmissivityCloudCorrection,
  skyTemperatureFromEmissivity,
  radiationToSkyAndGround,
  radiationCoefficientToSkyAndGround,
  radiationConcentricCylinders,
  radiationCoefficientConcentricCylinders,
} from '../../../src/physics/correlations/radiation.ts';
import { STEFAN_BOLTZMANN } from '../../../src/physics/constants.ts';

describe('skyTemperatureSwinbank', () => {
  it('gives 277.06 K for 20 °C air', () => {
    // Swinbank (1963) as T_sky = 0.0552 T^1.5: 293.15^1.5 = 5019.21, ×0.0552 = 277.060 K.
    // Tolerance 5e-3 K: six-figure hand arithmetic.
    expect(skyTemperatureSwinbank(293.15)).toBeCloseTo(277.06, 2);
  });

  it('is consistent with Swinbank’s original flux form R = 5.31·10⁻¹³ T⁶ W/m²', () => {
    // Swinbank (1963) gives the downward clear-sky flux as 5.31e-13 T⁶ W/m² (from memory);
    // σ(0.0552 T^1.5)⁴ = 5.2646e-13 T⁶. Tolerance 1.5 %: 0.0552 is a rounded coefficient.
    const t = 288;
    const flux = STEFAN_BOLTZMANN * skyTemperatureSwinbank(t) ** 4;
    expect(Math.abs(flux / (5.31e-13 * t ** 6) - 1)).toBeLessThan(0.015);
  });
});

describe('skyEmissivityBerdahlMartin', () => {
  it('gives 0.711 at a 0 °C dew point and 0.7743 at 10 °C', () => {
    // Berdahl & Martin (1984): 0.711 + 0.56·0.1 + 0.73·0.01 = 0.7743.
    // Tolerance 1e-12: exact decimal arithmetic up to round-off.
    expect(skyEmissivityBerdahlMartin(273.15)).toBeCloseTo(0.711, 12);
    expect(skyEmissivityBerdahlMartin(283.15)).toBeCloseTo(0.7743, 12);
  });

  it('handles a dew point below freezing with the quadratic term', () => {
    // −20 °C: 0.711 − 0.112 + 0.73·0.04 = 0.6282.
    expect(skyEmissivityBerdahlMartin(253.15)).toBeCloseTo(0.6282, 12);
  });

  it('adds the diurnal term +0.013 at midnight and none at 6 h', () => {
    // Berdahl & Martin (1984) hourly correction 0.013 cos(2π t/24) (from memory).
    // Tolerance 1e-12: round-off only (cos(π/2) ≈ 6e-17).
    expect(skyEmissivityBerdahlMartin(283.15, { hourOfDay: 0 })).toBeCloseTo(0.7873, 12);
    expect(skyEmissivityBerdahlMartin(283.15, { hourOfDay: 6 })).toBeCloseTo(0.7743, 12);
  });

  it('adds the pressure term 0.00012 (P − 1000 hPa)', () => {
    // 900 hPa → −0.012 (Berdahl & Martin 1984, from memory).
    expect(skyEmissivityBerdahlMartin(283.15, { pressurePa: 90000 })).toBeCloseTo(0.7623, 12);
  });
});

describe('skyEmissivityCloudClarkAllen', () => {
  it('leaves a clear sky unchanged', () => {
    expect(skyEmissivityCloudClarkAllen(0.75, 0)).toBe(0.75);
  });

  it('raises an overcast sky by the factor 1.154', () => {
    // Clark & Allen (1978) as quoted in Duffie & Beckman: N = 10 →
    // 1 + 0.224 − 0.35 + 0.28 = 1.154; 0.75·1.154 = 0.8655.
    expect(skyEmissivityCloudClarkAllen(0.75, 1)).toBeCloseTo(0.8655, 12);
  });

  it('uses tenths for partial cover', () => {
    // N = 5: 1 + 0.112 − 0.0875 + 0.035 = 1.0595; 0.8·1.0595 = 0.8476.
    expect(skyEmissivityCloudClarkAllen(0.8, 0.5)).toBeCloseTo(0.8476, 12);
  });

  it('caps the emissivity at 1 and clamps cover outside 0–1', () => {
    expect(skyEmissivityCloudClarkAllen(0.9, 1)).toBe(1); // 0.9·1.154 = 1.0386 → 1
    expect(skyEmissivityCloudClarkAllen(0.75, 1.5)).toBe(skyEmissivityCloudClarkAllen(0.75, 1));
    expect(skyEmissivityCloudClarkAllen(0.75, -0.2)).toBe(0.75);
  });

  it('is the default cloud correction', () => {
    expect(skyEmissivityCloudCorrection).toBe(skyEmissivityCloudClarkAllen);
  });
});

describe('skyTemperatureFromEmissivity', () => {
  it('returns the air temperature for a black sky and ε^¼ T otherwise', () => {
    expect(skyTemperatureFromEmissivity(1, 290)).toBe(290);
    // 0.8^¼ = 0.945742, ×290 = 274.265 K. Tolerance 5e-4 K: six figures.
    expect(skyTemperatureFromEmissivity(0.8, 290)).toBeCloseTo(274.265, 3);
  });

  it('emits ε σ T_air⁴ at the returned temperature (definition)', () => {
    const tSky = skyTemperatureFromEmissivity(0.77, 285);
    // Tolerance 1e-12 relative: round-off only.
    expect((tSky ** 4 / (0.77 * 285 ** 4)) - 1).toBeCloseTo(0, 12);
  });
});

describe('radiationToSkyAndGround', () => {
  it('matches the half-sky half-ground grey balance worked by hand', () => {
    // q = εσ[½(T_s⁴ − T_sky⁴) + ½(T_s⁴ − T_g⁴)] (docs/model.md "Outside"): 300⁴ = 8.1e9, 280⁴ = 6.14656e9,
    // 0.9·5.670374419e-8·½·1.95344e9 = 49.8453 W/m². Tolerance 5e-4: six figures.
    expect(radiationToSkyAndGround(300, 0.9, 280, 300)).toBeCloseTo(49.8453, 3);
  });

  it('is zero when surface, sky and ground share one temperature', () => {
    expect(radiationToSkyAndGround(290, 0.9, 290, 290)).toBe(0);
  });

  it('is negative when the surroundings are warmer than the surface', () => {
    expect(radiationToSkyAndGround(280, 0.9, 285, 300)).toBeLessThan(0);
  });

  it('has the derivative 4εσT_s³ used for Jacobians', () => {
    // Central difference with δ = 10⁻³ K: truncation error ∝ δ² ≈ 1e-6 relative, plus round-off
    // of q/δ ≈ 1e-13·50/1e-3 — tolerance 1e-6 relative covers both.
    const d = 1e-3;
    const fd = (radiationToSkyAndGround(320 + d, 0.85, 270, 290) - radiationToSkyAndGround(320 - d, 0.85, 270, 290)) / (2 * d);
    const h = radiationCoefficientToSkyAndGround(320, 0.85);
    expect(Math.abs(fd / h - 1)).toBeLessThan(1e-6);
    // Hand: 4·0.9·5.670374419e-8·300³ = 5.51160 W/(m² K). Tolerance 5e-5: six figures.
    expect(radiationCoefficientToSkyAndGround(300, 0.9)).toBeCloseTo(5.5116, 4);
  });
});

describe('radiationConcentricCylinders', () => {
  it('matches the grey two-surface enclosure formula worked by hand', () => {
    // σ(T₁⁴ − T₂⁴)/(1/ε₁ + (r₁/r₂)(1/ε₂ − 1)) (Incropera Table 13.3):
    // 400⁴ − 300⁴ = 1.75e10; den = 1.25 + 0.909091·0.25 = 1.477273;
    // q = 5.670374419e-8·1.75e10/1.477273 = 671.721 W/m². Tolerance 5e-3: six figures.
    expect(radiationConcentricCylinders(400, 300, 0.8, 0.8, 1, 1.1)).toBeCloseTo(671.721, 2);
  });

  it('reduces to black-body exchange when both surfaces are black', () => {
    // ε₁ = ε₂ = 1 → σ(T₁⁴ − T₂⁴) (Stefan–Boltzmann law).
    const q = radiationConcentricCylinders(500, 300, 1, 1, 0.5, 0.6);
    expect(q / (STEFAN_BOLTZMANN * (500 ** 4 - 300 ** 4)) - 1).toBeCloseTo(0, 12);
  });

  it('reduces to a small body in a large enclosure when r₁/r₂ → 0', () => {
    // ε₁σ(T₁⁴ − T₂⁴) (Incropera eq. 1.7). Tolerance 1e-8 relative: r₁/r₂ = 1e-9 residue.
    const q = radiationConcentricCylinders(500, 300, 0.6, 0.3, 1e-9, 1);
    expect(Math.abs(q / (0.6 * STEFAN_BOLTZMANN * (500 ** 4 - 300 ** 4)) - 1)).toBeLessThan(1e-8);
  });

  it('has a linearized coefficient with q = h_r (T₁ − T₂), finite at equal temperatures', () => {
    const hr = radiationCoefficientConcentricCylinders(400, 300, 0.8, 0.8, 1, 1.1);
    // Hand: 5.670374419e-8·(1.6e5 + 9e4)·700/1.477273 = 6.71721. Tolerance 5e-5: six figures.
    expect(hr).toBeCloseTo(6.71721, 4);
    // Factorization identity T₁⁴ − T₂⁴ = (T₁² + T₂²)(T₁ + T₂)(T₁ − T₂); tolerance: round-off.
    expect(hr * 100 / radiationConcentricCylinders(400, 300, 0.8, 0.8, 1, 1.1) - 1).toBeCloseTo(0, 12);
    expect(radiationConcentricCylinders(350, 350, 0.8, 0.8, 1, 1.1)).toBe(0);
    const hrEqual = radiationCoefficientConcentricCylinders(350, 350, 0.8, 0.8, 1, 1.1);
    // 4σT³/den at T₁ = T₂ = 350 K.
    expect(hrEqual / ((4 * STEFAN_BOLTZMANN * 350 ** 3) / 1.4772727272727273) - 1).toBeCloseTo(0, 12);
  });
});
