import { describe, it, expect } from 'vitest';
import {
  absorbedSunPerMetre, clearSkyAshrae, cloudFactorKastenCzeplak, cloudReducedIrradiance,
  diffuseFractionKastenCzeplak, solarAt, solarMonth,
} from '../../../src/physics/sun/irradiance.ts';
import { sunriseSunset } from '../../../src/physics/sun/position.ts';
import type { AirState } from '../../../src/physics/outside/weather.ts';

const DEG = Math.PI / 180;
const clearAir: AirState = { airTemperatureK: 293.15, windSpeed: 3, cloudCover: 0, dewPointK: 283.15 };

describe('clearSkyAshrae', () => {
  it('follows G_bn = A exp(−B / sin h), G_dh = C G_bn with the June constants', () => {
    // ASHRAE HOF 1985 ch. 27 Table 1, June 21: A = 1088 W/m², B = 0.205, C = 0.134 (from memory).
    // Hand computation: 1088·exp(−0.205/sin 60°) = 1088·exp(−0.23671) = 858.67 W/m².
    const g = clearSkyAshrae(6, 60);
    expect(g.beamNormal).toBeCloseTo(858.67, 1); // 0.05 W/m²: rounding of the hand computation
    expect(g.diffuseHorizontal).toBeCloseTo(0.134 * 858.67, 1);
  });

  it('gives a noon beam normal irradiance of 800–1000 W/m² on a clear summer day at mid-latitude', () => {
    // Common practice: clear-sky direct normal irradiance at midday in summer at sea level is typically
    // 800–1000 W/m² (the band is the check's tolerance).
    for (const lat of [35, 45, 52]) {
      const day = sunriseSunset(Date.UTC(2026, 6, 15, 12), lat, 0);
      const s = solarAt(day.solarNoonUtcMs, { latitudeDeg: lat, longitudeDeg: 0 }, clearAir);
      expect(s.beamNormal).toBeGreaterThan(800);
      expect(s.beamNormal).toBeLessThan(1000);
    }
  });

  it('is zero with the sun at or below the horizon', () => {
    expect(clearSkyAshrae(1, 0)).toEqual({ beamNormal: 0, diffuseHorizontal: 0 });
    expect(clearSkyAshrae(1, -20)).toEqual({ beamNormal: 0, diffuseHorizontal: 0 });
  });

  it('rejects a month outside 1–12', () => {
    expect(() => clearSkyAshrae(13, 30)).toThrow(/month/);
  });
});

describe('cloud reduction (Kasten & Czeplak 1980)', () => {
  it('scales global horizontal by 1 − 0.75 N^3.4', () => {
    // Kasten & Czeplak (1980), Solar Energy 24:177: hand computation 1 − 0.75·0.5^3.4 = 1 − 0.75·0.094732 = 0.928951.
    expect(cloudFactorKastenCzeplak(0.5)).toBeCloseTo(0.928951, 5);
    expect(cloudFactorKastenCzeplak(1)).toBeCloseTo(0.25, 12); // overcast: a quarter of the clear-sky global
    // With their clear-sky diffuse fraction 0.3 the form is exactly theirs: 0.3 + 0.7·0.5² = 0.475.
    expect(diffuseFractionKastenCzeplak(0.3, 0.5)).toBeCloseTo(0.475, 12);
  });

  it('leaves the clear sky unchanged at N = 0, keeps G_h = G_bn sin h + G_dh, and is all diffuse at N = 1', () => {
    const h = 45;
    const clear = clearSkyAshrae(4, h);
    const gClear = clear.beamNormal * Math.sin(h * DEG) + clear.diffuseHorizontal;
    const c0 = cloudReducedIrradiance(clear, h, 0);
    expect(c0.beamNormal).toBeCloseTo(clear.beamNormal, 9);
    expect(c0.diffuseHorizontal).toBeCloseTo(clear.diffuseHorizontal, 9);
    for (const n of [0.2, 0.6, 0.9]) {
      const c = cloudReducedIrradiance(clear, h, n);
      expect(c.beamNormal * Math.sin(h * DEG) + c.diffuseHorizontal).toBeCloseTo(gClear * (1 - 0.75 * n ** 3.4), 9);
    }
    const c1 = cloudReducedIrradiance(clear, h, 1);
    expect(c1.beamNormal).toBeCloseTo(0, 9);
    expect(c1.diffuseHorizontal).toBeCloseTo(0.25 * gClear, 9);
  });

  it('reduces beam and global irradiance monotonically as cloud cover rises', () => {
    const h = 50;
    const clear = clearSkyAshrae(7, h);
    let prevBeam = Infinity;
    let prevGlobal = Infinity;
    for (let n = 0; n <= 1.0001; n += 0.05) {
      const c = cloudReducedIrradiance(clear, h, Math.min(n, 1));
      const g = c.beamNormal * Math.sin(h * DEG) + c.diffuseHorizontal;
      expect(c.beamNormal).toBeLessThanOrEqual(prevBeam);
      expect(g).toBeLessThanOrEqual(prevGlobal);
      expect(c.beamNormal).toBeGreaterThanOrEqual(0);
      prevBeam = c.beamNormal;
      prevGlobal = g;
    }
  });

  it('rejects cloud cover outside 0–1', () => {
    expect(() => cloudFactorKastenCzeplak(1.2)).toThrow(/cloud cover/);
    expect(() => cloudReducedIrradiance({ beamNormal: 1, diffuseHorizontal: 1 }, 30, -0.1)).toThrow(/cloud cover/);
  });
});

describe('absorbedSunPerMetre', () => {
  it('matches a hand computation of the projected-area formula', () => {
    // Hand computation (docs/model.md "Outside" formula): G_bn 800, G_dh 100 W/m², h 30°, D 2 m, α 0.9, ρ_g 0.2:
    // beam 0.9·800·2·cos30° = 1247.077; diffuse 0.9·100·π·2/2 = 282.743; G_h = 800·0.5 + 100 = 500,
    // reflected 0.9·0.2·500·π·2/2 = 282.743; total 1812.563 W/m.
    const q = absorbedSunPerMetre({ beamNormal: 800, diffuseHorizontal: 100, altitudeDeg: 30, outerDiameter: 2, solarAbsorptance: 0.9, groundReflectance: 0.2 });
    expect(q.beam).toBeCloseTo(1247.077, 2); // 0.005 W/m: rounding of the hand computation
    expect(q.diffuse).toBeCloseTo(282.743, 2);
    expect(q.reflected).toBeCloseTo(282.743, 2);
    expect(q.total).toBeCloseTo(1812.563, 2);
  });

  it('equals the beam integrated over the sunlit half of the circumference (analytic check of D cos h)', () => {
    // Analytic: a horizontal beam component G_bn cos h falls on the wall element R dφ at incidence cos φ for
    // |φ| < π/2, so ∫ G_bn cos h cos φ R dφ = 2R G_bn cos h = D G_bn cos h. Checked by midpoint quadrature.
    const D = 3.2, G = 700, h = 25, a = 0.8;
    const n = 20000;
    let sum = 0;
    for (let i = 0; i < n; i++) {
      const phi = -Math.PI / 2 + ((i + 0.5) * Math.PI) / n;
      sum += a * G * Math.cos(h * DEG) * Math.cos(phi) * (D / 2) * (Math.PI / n);
    }
    const q = absorbedSunPerMetre({ beamNormal: G, diffuseHorizontal: 0, altitudeDeg: h, outerDiameter: D, solarAbsorptance: a, groundReflectance: 0 });
    expect(q.beam / sum).toBeCloseTo(1, 6); // midpoint rule error ∝ 1/n² ≈ 1e-9 relative
  });

  it('is zero at night', () => {
    const site = { latitudeDeg: 48.1, longitudeDeg: 11.6 };
    const midnight = Date.UTC(2026, 6, 1, 23); // 01:00 local summer time in Munich, sun well below the horizon
    const s = solarAt(midnight, site, clearAir);
    expect(s.altitudeDeg).toBeLessThan(-10);
    const q = absorbedSunPerMetre({ ...s, outerDiameter: 2, solarAbsorptance: 0.9, groundReflectance: 0.2 });
    expect(q).toEqual({ beam: 0, diffuse: 0, reflected: 0, total: 0 });
  });

  it('ignores beam irradiance with the sun below the horizon', () => {
    const q = absorbedSunPerMetre({ beamNormal: 500, diffuseHorizontal: 0, altitudeDeg: -1, outerDiameter: 2, solarAbsorptance: 0.9, groundReflectance: 0.2 });
    expect(q.total).toBe(0);
  });
});

describe('solarAt', () => {
  const site = { latitudeDeg: 45, longitudeDeg: 7.7 };
  const noon = sunriseSunset(Date.UTC(2026, 3, 10, 11), 45, 7.7).solarNoonUtcMs;

  it('uses measured beam and diffuse irradiance when the weather gives them', () => {
    const s = solarAt(noon, site, { ...clearAir, beamNormal: 612, diffuseHorizontal: 155 });
    expect(s.beamNormal).toBe(612);
    expect(s.diffuseHorizontal).toBe(155);
    expect(s.measured).toEqual({ beamNormal: true, diffuseHorizontal: true });
    expect(s.globalHorizontal).toBeCloseTo(612 * Math.sin(s.altitudeDeg * DEG) + 155, 9);
  });

  it('falls back on the clear-sky model reduced for cloud', () => {
    const clear = solarAt(noon, site, clearAir);
    const cloudy = solarAt(noon, site, { ...clearAir, cloudCover: 0.7 });
    expect(clear.measured).toEqual({ beamNormal: false, diffuseHorizontal: false });
    expect(clear.beamNormal).toBeCloseTo(clearSkyAshrae(4, clear.altitudeDeg).beamNormal, 9);
    expect(cloudy.globalHorizontal).toBeCloseTo(clear.globalHorizontal * cloudFactorKastenCzeplak(0.7), 9);
  });

  it('picks the month by local mean solar time', () => {
    // 31 Jan 23:00 UTC is already 1 Feb by local mean time at 150° E (UTC + 10 h).
    expect(solarMonth(Date.UTC(2026, 0, 31, 23), 150)).toBe(2);
    expect(solarMonth(Date.UTC(2026, 0, 31, 23), 0)).toBe(1);
  });
});
