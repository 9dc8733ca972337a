/**
 * The shipped demo typical year (scenarios/weather/brennholm-typical-year.epw): it reads cleanly,
 * describes the demo site, says it is invented, has the climate it was made for, and is exactly
 * what its committed generator writes.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseEpw } from '../../../src/input/weather/epw.ts';
import { checkWeatherFileSite } from '../../../src/input/weather/weatherFile.ts';
import { sunPosition } from '../../../src/physics/sun/position.ts';
import { DEMO_FILE, makeTypicalYearEpw } from '../../../scripts/make-typical-year.ts';

const text = readFileSync(DEMO_FILE, 'utf8');
const src = parseEpw(text, 'brennholm-typical-year.epw', { year: 2026 });
const H = 3_600_000;
/** UTC instant of hour-ending stamp `k` (0-based row) in 2026, local standard time UTC+1. */
const stampUtc = (k: number) => Date.UTC(2026, 0, 1) + (k + 1) * H - H;

describe('the demo typical year', () => {
  it('is what the generator writes (deterministic, seeded)', () => {
    expect(makeTypicalYearEpw()).toBe(text);
    expect(makeTypicalYearEpw(1)).not.toBe(text);
  });

  it('describes the invented demo site and says it is invented', () => {
    expect(src.site).toMatchObject({ name: 'Brennholm heating plant (invented)', latitudeDeg: 56.2, longitudeDeg: 10.1, elevationM: 35, utcOffsetHours: 1 });
    expect(checkWeatherFileSite(src.site, { latitudeDeg: 56.2, longitudeDeg: 10.1, elevationM: 35, timeZone: 'Europe/Copenhagen' }, 2026)).toEqual({ errors: [], warnings: [] });
    const comments = text.split('\n').filter((l) => l.startsWith('COMMENTS'));
    expect(comments).toHaveLength(2);
    for (const c of comments) expect(c).toMatch(/INVENTED DATA/);
    expect(src.fallbacks).toEqual({ dewPoint: 0, cloudCover: 0, beamNormal: 0, diffuseHorizontal: 0 });
  });

  it('has the climate it was made for: monthly means near 1 °C in January and 17 °C in July', () => {
    const monthMean = (month: number) => {
      const rows = text.split('\n').slice(8).filter((l) => l.split(',')[1] === String(month));
      return rows.reduce((s, l) => s + Number(l.split(',')[6]), 0) / rows.length;
    };
    // Targets are the generator's invented monthly means (1.0 and 17.0 °C). The generator takes the
    // monthly mean out of its synoptic anomaly, but interpolating the monthly means between
    // mid-months lifts a winter minimum (and lowers a summer maximum) by a few tenths, and the
    // correction is not exact at month ends: ±1.5 K.
    expect(Math.abs(monthMean(1) - 1.0)).toBeLessThan(1.5);
    expect(Math.abs(monthMean(7) - 17.0)).toBeLessThan(1.5);
    expect(monthMean(7) - monthMean(1)).toBeGreaterThan(12);
  });

  it('keeps dew points below the air, winds in a coastal range and cloud within 0–1', () => {
    let wind = 0;
    for (let k = 0; k < 8760; k++) {
      const a = src.at(stampUtc(k));
      expect(a.dewPointK).toBeLessThanOrEqual(a.airTemperatureK);
      expect(a.cloudCover).toBeGreaterThanOrEqual(0);
      expect(a.cloudCover).toBeLessThanOrEqual(1);
      wind += a.windSpeed / 8760;
    }
    expect(wind).toBeGreaterThan(3);
    expect(wind).toBeLessThan(7);
  });

  it('has sunlight only when the sun is up', () => {
    for (let k = 0; k < 8760; k++) {
      const mid = stampUtc(k) - H / 2;
      const a = src.at(mid);
      // Sun below the horizon through the whole hour (checked at its start, middle and end): no irradiance.
      const up = [mid - H / 2, mid, mid + H / 2].some((t) => sunPosition(t, 56.2, 10.1).altitudeDeg > 0);
      if (!up) {
        expect(a.beamNormal).toBe(0);
        expect(a.diffuseHorizontal).toBe(0);
      }
    }
    // Clear-sky beam at midsummer noon at 56° N is several hundred W/m² (ASHRAE June: ~870 W/m² at
    // 57° altitude); the year's largest hourly value must come near it, not above the solar constant.
    let largest = 0;
    for (let k = 0; k < 8760; k++) largest = Math.max(largest, src.at(stampUtc(k) - H / 2).beamNormal ?? 0);
    expect(largest).toBeGreaterThan(600);
    expect(largest).toBeLessThan(1000);
  });
});
