/**
 * Sun position for a site and a UTC instant, through the `suncalc` package (v2).
 *
 * suncalc v2 follows Meeus, *Astronomical Algorithms* (2nd ed., 1998), ch. 25 (low-precision solar
 * coordinates, ~0.01°) with ΔT, ch. 12 (sidereal time) and ch. 16 (refraction, Sæmundsson's formula
 * for 1010 hPa and 10 °C). It returns the apparent (refraction-corrected) altitude and the azimuth
 * clockwise from north, both in degrees, for a UTC instant; it works geocentrically (the Sun's
 * parallax, 8.8″, is neglected).
 */
import { getPosition, getTimes } from 'suncalc';

/** Where a site is on the Earth. */
export interface SiteLocation {
  /** Geographic latitude, degrees north (south negative), −90…90. */
  readonly latitudeDeg: number;
  /** Geographic longitude, degrees east (west negative), −180…180. */
  readonly longitudeDeg: number;
}

/** Sun position seen from a site. */
export interface SunPosition {
  /** Apparent altitude above the horizon (with refraction), degrees; negative below the horizon. */
  readonly altitudeDeg: number;
  /** Azimuth clockwise from north (0 N, 90 E, 180 S, 270 W), degrees, 0 ≤ az < 360. */
  readonly azimuthDeg: number;
}

// One-entry cache: the model asks the same instant once per axial segment.
let cacheKey: [number, number, number] | undefined;
let cacheValue: SunPosition | undefined;

/**
 * Apparent sun altitude and azimuth at the UTC instant `utcMs` for a site.
 *
 * Example: 2003-10-17 19:30:30 UTC at 39.742476 N, 105.1786 W gives altitude 39.89°
 * (zenith 50.11°), azimuth 194.34° (the worked example of Reda & Andreas 2004, NREL/TP-560-34302).
 */
export function sunPosition(utcMs: number, latitudeDeg: number, longitudeDeg: number): SunPosition {
  if (cacheKey && cacheValue && cacheKey[0] === utcMs && cacheKey[1] === latitudeDeg && cacheKey[2] === longitudeDeg) {
    return cacheValue;
  }
  const p = getPosition(new Date(utcMs), latitudeDeg, longitudeDeg);
  const value: SunPosition = { altitudeDeg: p.altitude, azimuthDeg: p.azimuth };
  cacheKey = [utcMs, latitudeDeg, longitudeDeg];
  cacheValue = value;
  return value;
}

/** Sunrise, solar noon and sunset of one day at a site, UTC ms. */
export interface SunDay {
  /** UTC instant of sunrise (upper limb on the horizon, altitude −0.833°), or null on polar day/night. */
  readonly sunriseUtcMs: number | null;
  /** UTC instant of sunset, or null on polar day/night. */
  readonly sunsetUtcMs: number | null;
  /** UTC instant of solar noon (the Sun's transit). */
  readonly solarNoonUtcMs: number;
  /** `day` when the Sun stays up all day, `night` when it stays down, else undefined. */
  readonly polar?: 'day' | 'night';
}

/**
 * Sunrise, solar noon and sunset of the solar day whose transit is nearest `utcMsNearLocalNoon`
 * (pass the UTC instant of local clock noon of the wanted date). Rise/set altitude −0.833°
 * (refraction 34′ plus the solar semi-diameter 16′; Meeus 1998 ch. 15).
 */
export function sunriseSunset(utcMsNearLocalNoon: number, latitudeDeg: number, longitudeDeg: number): SunDay {
  const t = getTimes(new Date(utcMsNearLocalNoon), latitudeDeg, longitudeDeg);
  const polar = t.alwaysUp ? 'day' : t.alwaysDown ? 'night' : undefined;
  return {
    sunriseUtcMs: t.sunrise ? t.sunrise.getTime() : null,
    sunsetUtcMs: t.sunset ? t.sunset.getTime() : null,
    solarNoonUtcMs: t.solarNoon.getTime(),
    ...(polar ? { polar } : {}),
  };
}
