import { describe, it, expect } from 'vitest';
import {
  absorbedSunPerMetre, clearSkyAshrae, cloudFactorKastenCzeplak, cloudReducedIrradiance,
  diffuseFractionKastenCzeplak, solarAt, solarMonth,
  airMassKastenYoung, ASHRAE_CLEAR_SKY, ASHRAE_REFERENCE_DAYS, ashraeClearSkyConstantsOnDay,
  clearSkyAshrae2009, clearSkyAshraeOnDay, extraterrestrialIrradianceAshrae2009, solarDayOfYear,
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
    // the ASHRAE constants interpolated to the day (issue: no steps on the 1st of each month)
    expect(clear.beamNormal).toBeCloseTo(clearSkyAshraeOnDay(solarDayOfYear(noon, site.longitudeDeg), clear.altitudeDeg).beamNormal, 9);
    expect(cloudy.globalHorizontal).toBeCloseTo(clear.globalHorizontal * cloudFactorKastenCzeplak(0.7), 9);
  });

  it('picks the month by local mean solar time', () => {
    // 31 Jan 23:00 UTC is already 1 Feb by local mean time at 150° E (UTC + 10 h).
    expect(solarMonth(Date.UTC(2026, 0, 31, 23), 150)).toBe(2);
    expect(solarMonth(Date.UTC(2026, 0, 31, 23), 0)).toBe(1);
  });
});

describe('ASHRAE clear-sky constants interpolated by day of year', () => {
  it('returns the published constants on each 21st (ASHRAE 1985 Table 1, from memory)', () => {
    ASHRAE_REFERENCE_DAYS.forEach((day, i) => {
      const c = ashraeClearSkyConstantsOnDay(day);
      // Exact table values on the reference days (f = 0).
      expect(c.A).toBe(ASHRAE_CLEAR_SKY.A[i]);
      expect(c.B).toBe(ASHRAE_CLEAR_SKY.B[i]);
      expect(c.C).toBe(ASHRAE_CLEAR_SKY.C[i]);
      expect(clearSkyAshraeOnDay(day, 60).beamNormal).toBeCloseTo(clearSkyAshrae(i + 1, 60).beamNormal, 9);
    });
  });

  it('interpolates linearly between 21 March and 21 April (hand computation)', () => {
    // Day 90.5: f = 10.5/31; A = 1186 − 50 f = 1169.0645, B = 0.156 + 0.024 f = 0.1641290,
    // C = 0.071 + 0.026 f = 0.0798065. Tolerance 1e-4 / 1e-7: hand arithmetic.
    const c = ashraeClearSkyConstantsOnDay(90.5);
    expect(c.A).toBeCloseTo(1169.0645, 4);
    expect(c.B).toBeCloseTo(0.164129, 6);
    expect(c.C).toBeCloseTo(0.0798065, 7);
  });

  it('is continuous across every month end, where the monthly model jumped', () => {
    // Monthly model: beam at 30° from 31 March to 1 April: 1136 e^(−0.36)/(1186 e^(−0.312)) − 1 = −8.70 %.
    const stepMonthly = clearSkyAshrae(4, 30).beamNormal / clearSkyAshrae(3, 30).beamNormal - 1;
    expect(stepMonthly).toBeCloseTo(-0.08705, 4);
    // Interpolated: the change over one day is one day's share of a monthly change (8.7 % over
    // 31 days is 0.28 % per day; bound 0.6 %, twice that); across midnight of a month end it is continuous.
    const lastDays = [31, 59, 90, 120, 151, 181, 212, 243, 273, 304, 334, 365];
    for (const d of lastDays) {
      const before = clearSkyAshraeOnDay(d + 0.999999, 30).beamNormal;
      const after = clearSkyAshraeOnDay(d + 1, 30).beamNormal;
      // Tolerance 1e-4 relative: 1e-6 day of a change of < 1 % per day.
      expect(Math.abs(after / before - 1)).toBeLessThan(1e-4);
      const dayStep = clearSkyAshraeOnDay(d + 1, 30).beamNormal / clearSkyAshraeOnDay(d, 30).beamNormal - 1;
      expect(Math.abs(dayStep)).toBeLessThan(0.006);
    }
  });

  it('wraps from 21 December to 21 January across the new year', () => {
    // 1 January (day 1) lies 11/31 of the way from Dec 21 (A 1233) to Jan 21 (A 1230):
    // A = 1233 − 3·11/31 = 1231.93548. Tolerance 1e-5: hand arithmetic.
    expect(ashraeClearSkyConstantsOnDay(1).A).toBeCloseTo(1231.93548, 5);
    // Day 366 (leap-year 31 Dec) reads as day 1; day 365.999 and day 1 meet.
    expect(ashraeClearSkyConstantsOnDay(366).A).toBe(ashraeClearSkyConstantsOnDay(1).A);
    expect(Math.abs(ashraeClearSkyConstantsOnDay(365.9999).A - ashraeClearSkyConstantsOnDay(1).A)).toBeLessThan(1e-3);
  });

  it('counts the day of the year by local solar time', () => {
    // 2024-03-21 12:00 UTC at 0° longitude → day 81.5 (2024 is a leap year). At 90° E the local
    // solar time is 6 h later: day 81.75.
    const t = Date.UTC(2024, 2, 21, 12);
    expect(solarDayOfYear(t, 0)).toBeCloseTo(81.5, 9);
    expect(solarDayOfYear(t, 90)).toBeCloseTo(81.75, 9);
  });
});

describe('ASHRAE 2009 clear-sky model with optical depths', () => {
  it('uses the Kasten–Young air mass (37.92 at the horizon, 1 at the zenith)', () => {
    // Kasten & Young (1989) give m(90° zenith) = 37.92 (from memory); the formula at the zenith
    // gives 0.99971 (hand). Tolerances: 1e-3 relative for the quoted figure; 1e-5 hand arithmetic.
    expect(Math.abs(airMassKastenYoung(0) / 37.92 - 1)).toBeLessThan(1e-3);
    expect(airMassKastenYoung(90)).toBeCloseTo(0.99971, 5);
    // Plane-parallel limit 1/sin h is within 0.3 % at 30° (hand: 1.99429 against 2).
    expect(airMassKastenYoung(30)).toBeCloseTo(1.99429, 5);
  });

  it('gives the extraterrestrial irradiance of the published formula', () => {
    // 1367·(1 + 0.033 cos(2π·169/365)) = 1323.1017 W/m² on day 172; 1367·1.033 = 1412.111 on day 3.
    // Tolerance 1e-3 W/m²: hand arithmetic.
    expect(extraterrestrialIrradianceAshrae2009(172)).toBeCloseTo(1323.1017, 3);
    expect(extraterrestrialIrradianceAshrae2009(3)).toBeCloseTo(1412.111, 3);
  });

  it('matches a hand computation from the published formulas', () => {
    // Day 172, h = 60°, τ_b = 0.556, τ_d = 1.779 (a typical July pair, invented site):
    // m = 1/(sin 60° + 0.50572·66.07995^−1.6364) = 1.153992; ab = 1.219 − 0.043·0.556 − 0.151·1.779
    // − 0.204·0.556·1.779 = 0.724682; ad = 0.202 + 0.852·0.556 − 0.007·1.779 − 0.357·0.556·1.779
    // = 0.310142; E_b = 1323.1017·exp(−0.556·1.153992^0.724682) = 714.029;
    // E_d = 1323.1017·exp(−1.779·1.153992^0.310142) = 206.011 W/m². Formulas from memory.
    // Tolerance 1e-3 W/m²: double-precision hand script.
    const e = clearSkyAshrae2009(172, 60, 0.556, 1.779);
    expect(e.beamNormal).toBeCloseTo(714.0286, 3);
    expect(e.diffuseHorizontal).toBeCloseTo(206.0107, 3);
    // Second point: day 21, h = 30°, τ_b = 0.33, τ_d = 2.2 → E_b 818.256, E_d 111.122.
    const w = clearSkyAshrae2009(21, 30, 0.33, 2.2);
    expect(w.beamNormal).toBeCloseTo(818.2565, 3);
    expect(w.diffuseHorizontal).toBeCloseTo(111.1217, 3);
  });

  it('is zero with the sun at or below the horizon and falls towards it', () => {
    expect(clearSkyAshrae2009(172, 0, 0.4, 2)).toEqual({ beamNormal: 0, diffuseHorizontal: 0 });
    expect(clearSkyAshrae2009(172, -5, 0.4, 2)).toEqual({ beamNormal: 0, diffuseHorizontal: 0 });
    expect(clearSkyAshrae2009(172, 5, 0.4, 2).beamNormal).toBeLessThan(clearSkyAshrae2009(172, 30, 0.4, 2).beamNormal);
  });
});
