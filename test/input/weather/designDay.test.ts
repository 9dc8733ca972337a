import { describe, it, expect } from 'vitest';
import * as Astronomy from 'astronomy-engine';
import { makeSiteClock } from '../../../src/model/clock.ts';
import { ASHRAE_DAILY_RANGE_FRACTION, fractionOfDailyRangeAshrae, fractionOfDailyRangeCosine, fractionOfDailyRangeSinusoid, makeDesignDay } from '../../../src/input/weather/designDay.ts';

const site = { latitudeDeg: 59.91, longitudeDeg: 10.75 };
const clock = makeSiteClock('Europe/Oslo', '2026-07-14');
const base = { minAirTemperatureK: 285.15, maxAirTemperatureK: 297.15, windSpeed: 4 };

/** Air temperature at local clock time `hour` on run day `day`. */
const sample = (src: ReturnType<typeof makeDesignDay>, day: number, hour: number) =>
  src.at(clock.utcMs(clock.runTimeOfLocal(day, hour * 3600)));

describe('ASHRAE daily temperature course', () => {
  it('has its minimum at 05:00 and maximum at 15:00 (ASHRAE HOF 2009 ch. 14 Table 6, from memory)', () => {
    expect(ASHRAE_DAILY_RANGE_FRACTION[4]).toBe(1); // hour 5
    expect(ASHRAE_DAILY_RANGE_FRACTION[14]).toBe(0); // hour 15
    expect(Math.max(...ASHRAE_DAILY_RANGE_FRACTION)).toBe(1);
    expect(Math.min(...ASHRAE_DAILY_RANGE_FRACTION)).toBe(0);
  });

  it('interpolates linearly between whole hours and wraps at midnight', () => {
    // Table 6 (from memory): hour 15 → 0.00, hour 16 → 0.03; hour 24 → 0.82, hour 1 → 0.87.
    expect(fractionOfDailyRangeAshrae(15.5)).toBeCloseTo(0.015, 12);
    expect(fractionOfDailyRangeAshrae(0)).toBeCloseTo(0.82, 12);
    expect(fractionOfDailyRangeAshrae(0.5)).toBeCloseTo(0.845, 12);
    expect(fractionOfDailyRangeAshrae(23.999999)).toBeCloseTo(0.82, 5);
  });
});

describe('makeDesignDay', () => {
  it('reproduces the daily minimum at 05:00 and maximum at 15:00 local time, day after day', () => {
    const src = makeDesignDay(base, clock, site);
    for (const day of [0, 1, 5]) {
      const temps = Array.from({ length: 24 * 4 }, (_, i) => sample(src, day, i / 4).airTemperatureK);
      const iMin = temps.indexOf(Math.min(...temps));
      const iMax = temps.indexOf(Math.max(...temps));
      expect(iMin / 4).toBe(5);
      expect(iMax / 4).toBe(15);
      expect(temps[iMin]).toBeCloseTo(285.15, 9);
      expect(temps[iMax]).toBeCloseTo(297.15, 9);
    }
    // Table 6 at 10:00: fraction 0.56 → 297.15 − 0.56·12 = 290.43 K (hand computation).
    expect(sample(src, 0, 10).airTemperatureK).toBeCloseTo(290.43, 9);
  });

  it('with the cosine shape, has its minimum at sunrise and its maximum at the peak hour', () => {
    const src = makeDesignDay({ ...base, temperatureShape: 'cosine-sunrise' }, clock, site);
    // Sunrise from astronomy-engine (independent of suncalc), expressed in local clock hours.
    const observer = new Astronomy.Observer(site.latitudeDeg, site.longitudeDeg, 0);
    const rise = Astronomy.SearchRiseSet(Astronomy.Body.Sun, observer, +1, new Date(clock.startUtcMs), 1)!;
    const riseHour = clock.localSecondsOfDay((rise.date.getTime() - clock.startUtcMs) / 1000) / 3600;
    const atRise = sample(src, 0, riseHour).airTemperatureK;
    // 0.01 K: the two libraries' sunrise times differ by seconds; near the minimum T varies as (Δt)², so tiny.
    expect(atRise).toBeCloseTo(285.15, 2);
    expect(sample(src, 0, 15).airTemperatureK).toBeCloseTo(297.15, 9);
    expect(sample(src, 0, riseHour - 1).airTemperatureK).toBeGreaterThan(atRise);
    expect(sample(src, 0, riseHour + 1).airTemperatureK).toBeGreaterThan(atRise);
    // Analytic: halfway between sunrise and the peak the half-cosine is at mid-range.
    expect(fractionOfDailyRangeCosine(10.5, 6, 15)).toBeCloseTo(0.5, 12);
  });

  it('cycles the wind about its mean with the peak at the given hour', () => {
    const src = makeDesignDay({ ...base, windAmplitude: 1.5, windPeakHour: 14 }, clock, site);
    expect(sample(src, 0, 14).windSpeed).toBeCloseTo(5.5, 9);
    expect(sample(src, 0, 2).windSpeed).toBeCloseTo(2.5, 9);
    expect(sample(src, 0, 8).windSpeed).toBeCloseTo(4, 9); // quarter period: cos(−π/2) = 0
    expect(src.referenceHeightM).toBe(10);
  });

  it('takes the dew point as the daily minimum unless given, never above the air temperature', () => {
    // FAO-56 (Allen et al. 1998) eq. 48: T_dew ≈ T_min.
    const src = makeDesignDay({ ...base, cloudCover: 0.4 }, clock, site);
    expect(sample(src, 0, 12).dewPointK).toBe(285.15);
    expect(sample(src, 0, 12).cloudCover).toBe(0.4);
    const humid = makeDesignDay({ ...base, dewPointK: 290 }, clock, site);
    expect(sample(humid, 0, 5).dewPointK).toBeCloseTo(285.15, 9);
    expect(sample(humid, 0, 15).dewPointK).toBe(290);
  });

  it('rejects inconsistent options with a plain message', () => {
    expect(() => makeDesignDay({ ...base, maxAirTemperatureK: 280 }, clock, site)).toThrow(/minimum/);
    expect(() => makeDesignDay({ ...base, windAmplitude: 5 }, clock, site)).toThrow(/amplitude/);
    expect(() => makeDesignDay({ ...base, cloudCover: 2 }, clock, site)).toThrow(/cloud/);
  });
});

describe('sinusoidal design day', () => {
  it('is a pure cosine with its minimum at the given hour and its maximum 12 h later', () => {
    // T = T_mean − A cos(2π (hour − hour_min)/24) (the periodic surface condition of Carslaw & Jaeger 1959, §2.6)
    const src = makeDesignDay({ ...base, temperatureShape: 'sinusoid', minimumHour: 4 }, clock, site);
    const mean = (285.15 + 297.15) / 2;
    const amplitude = (297.15 - 285.15) / 2;
    for (const hour of [0, 4, 7, 10, 13, 16, 22.5]) {
      expect(sample(src, 1, hour).airTemperatureK, `${hour} h`).toBeCloseTo(mean - amplitude * Math.cos((2 * Math.PI * (hour - 4)) / 24), 9);
    }
    expect(fractionOfDailyRangeSinusoid(4, 4)).toBe(1);
    expect(fractionOfDailyRangeSinusoid(16, 4)).toBeCloseTo(0, 15);
  });
});
