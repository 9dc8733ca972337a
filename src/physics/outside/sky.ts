/**
 * The sky a VERTICAL wall sees, and cloud cover for every clear-sky model.
 *
 * Sky-emissivity correlations (Swinbank, Berdahl–Martin) give the HEMISPHERICAL emissivity: the
 * flux on a horizontal surface. A vertical wall sees only half the sky, and mostly its lower
 * part, whose long path through the warm, moist air near the ground makes it nearly black at air
 * temperature. Two published ways to account for that are here:
 *
 * - {@link skyEmissivityVerticalSplit}: the sky view of a tilted surface split into a part at the
 *   sky temperature and a part at air temperature, β = √(½(1 + cos tilt)) (McClellan & Pedersen
 *   1997, as used in building heat-balance methods). Closed form; the one to use by default.
 * - {@link skyEmissivityVerticalMartinBerdahl}: the angular sky emissivity of Martin & Berdahl
 *   (1984) integrated over the half-sky the wall sees. A cross-check; within 2 % of the split.
 *
 * Order: correct the hemispherical clear-sky emissivity for cloud first
 * ({@link skyEmissivityCloudy}), then convert it to what the vertical wall sees, then to a
 * temperature with `skyTemperatureFromEmissivity` (radiation.ts). The wall's exchange is then
 * q = ε σ [½ (T_s⁴ − T_sky,v⁴) + ½ (T_s⁴ − T_ground⁴)] with T_sky,v the vertical wall's sky
 * temperature (`radiationToSkyAndGround`).
 */
import {
  skyEmissivityCloudCorrection,
  skyTemperatureFromEmissivity,
  skyTemperatureSwinbank,
} from '../correlations/radiation.ts';

const HALF_PI = Math.PI / 2;

/**
 * Clear-sky emissivity implied by Swinbank's (1963) sky temperature, so that cloud cover can be
 * applied to it like to any other emissivity model:
 *
 *   ε = (T_sky / T_air)⁴ = (0.0552 T_air^0.5)⁴ = 9.2843·10⁻⁶ T_air²      (T in K)
 *
 * Source: W. C. Swinbank, Q. J. R. Meteorol. Soc. 89 (1963) 339–348, doi:10.1002/qj.49708938105
 * (his flux form L = 5.31·10⁻¹³ T⁶ W/m² gives 9.36·10⁻⁶ T², 0.9 % higher; the 0.0552 form is the
 * one stackday uses for the sky temperature, and this function stays consistent with it).
 * Validity: clear skies, T_air ≈ 260–310 K.
 *
 * Example: T_air = 293.15 K → 0.0552⁴ · 293.15² = 0.79788.
 */
export function skyEmissivitySwinbank(airTemperatureK: number): number {
  const ratio = skyTemperatureSwinbank(airTemperatureK) / airTemperatureK;
  const r2 = ratio * ratio;
  return r2 * r2;
}

/**
 * Hemispherical sky emissivity under cloud from ANY clear-sky emissivity (Swinbank's through
 * {@link skyEmissivitySwinbank}, Berdahl–Martin's, a measured one), with the cloud correction
 * stackday uses (Clark & Allen 1978, `skyEmissivityCloudClarkAllen`; capped at 1).
 * `cloudCover` is the fraction 0–1.
 *
 * Example: Swinbank at 293.15 K (0.79788), half cloud: factor 1.0595 → 0.84535 (T_sky 281.09 K
 * instead of 277.06 K clear).
 */
export function skyEmissivityCloudy(clearEmissivity: number, cloudCover: number): number {
  return skyEmissivityCloudCorrection(clearEmissivity, cloudCover);
}

/**
 * Share of a tilted surface's sky view that sees the sky at the sky temperature; the rest (1 − β)
 * sees air at air temperature (the near-horizon sky):
 *
 *   β = √(½ (1 + cos tilt)) = cos(tilt/2),   tilt from horizontal (0 up, π/2 vertical)
 *
 * Source: T. M. McClellan, C. O. Pedersen, "Investigation of outside heat balance models for use
 * in a heat balance cooling load calculation procedure", ASHRAE Transactions 103(2) (1997)
 * 469–484 (from memory), as used in the EnergyPlus Engineering Reference, outside surface heat
 * balance, external long-wave radiation.
 * Example: vertical wall → √½ = 0.70711.
 */
export function skyViewSkyShare(tiltRad: number): number {
  return Math.sqrt(0.5 * (1 + Math.cos(tiltRad)));
}

/**
 * Effective emissivity of the half-sky a vertical wall sees, from the sky-view split: a share β
 * of it at the hemispherical sky emissivity, the rest black at air temperature:
 *
 *   ε_v = β ε_h + (1 − β),   β = √½
 *
 * so that ε_v σ T_air⁴ is the flux the wall receives per unit sky view. Source and range as
 * {@link skyViewSkyShare} and {@link SKY_VERTICAL_RANGE}.
 * Example: ε_h = 0.75 → 0.70711·0.75 + 0.29289 = 0.82322 (T_air = 290 K: T_sky,v = 276.23 K
 * against 269.9 K for the horizontal-surface value).
 */
export function skyEmissivityVerticalSplit(hemisphericalEmissivity: number): number {
  const beta = Math.SQRT1_2;
  return beta * hemisphericalEmissivity + (1 - beta);
}

/** Default b of the angular sky emissivity, Martin & Berdahl (1984) (from memory). */
export const MARTIN_BERDAHL_B = 1.8;

/**
 * Angular sky emissivity at zenith angle θ, Martin & Berdahl (1984):
 *
 *   ε(θ) = 1 − (1 − ε_h)^(1 / (b cos θ)),   b ≈ 1.8
 *
 * ε_h the hemispherical sky emissivity; 1 at and below the horizon (θ ≥ π/2).
 * Source: M. Martin, P. Berdahl, "Characteristics of infrared sky radiation in the United States",
 * Solar Energy 33 (1984) 321–336, doi:10.1016/0038-092X(84)90162-2 (form and b from memory).
 * Example: ε_h = 0.75, zenith → 1 − 0.25^(1/1.8) = 0.53705; θ = 80° → 1 − 0.25^3.1993 = 0.98815.
 */
export function skyEmissivityAtZenithAngle(hemisphericalEmissivity: number, zenithRad: number, b = MARTIN_BERDAHL_B): number {
  if (!(zenithRad < HALF_PI)) return 1;
  return 1 - Math.pow(1 - hemisphericalEmissivity, 1 / (b * Math.cos(zenithRad)));
}

/** Gauss–Legendre nodes and weights on [−1, 1] (Newton on P_n; e.g. Press et al., Numerical Recipes, gauleg). */
function gaussLegendre(n: number): { x: Float64Array; w: Float64Array } {
  const x = new Float64Array(n);
  const w = new Float64Array(n);
  for (let i = 0; i < (n + 1) >> 1; i++) {
    let z = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 0;
    for (let iter = 0; iter < 100; iter++) {
      let p1 = 1;
      let p2 = 0;
      for (let j = 1; j <= n; j++) {
        const p3 = p2;
        p2 = p1;
        p1 = ((2 * j - 1) * z * p2 - (j - 1) * p3) / j;
      }
      dp = (n * (z * p1 - p2)) / (z * z - 1);
      const dz = p1 / dp;
      z -= dz;
      if (Math.abs(dz) < 1e-15) break;
    }
    x[i] = -z;
    x[n - 1 - i] = z;
    w[i] = w[n - 1 - i] = 2 / ((1 - z * z) * dp * dp);
  }
  return { x, w };
}

const GL = gaussLegendre(64);

/**
 * Effective emissivity of the half-sky a vertical wall sees, from the angular sky emissivity of
 * Martin & Berdahl ({@link skyEmissivityAtZenithAngle}) integrated over the wall's view with the
 * cosine to the wall normal:
 *
 *   ε_v = (4/π) ∫₀^{π/2} ε(θ) sin²θ dθ
 *
 * (flux per unit sky view ½: ∫ L(θ) sinθ cosφ dΩ over the half-sky in front of the wall, with
 * L = ε(θ) σT⁴/π; a constant ε gives ε back). 64-point Gauss–Legendre quadrature, error below
 * 1e-9 against an adaptive quadrature.
 * - Caution: with b = 1.8 the same angular law integrated over a HORIZONTAL surface returns
 *   0.699, not 0.75, for ε_h = 0.75 (b ≈ 1.53 would be self-consistent): the law and b are
 *   recalled, not read; the result agrees within 2 % with {@link skyEmissivityVerticalSplit}
 *   for ε_h 0.6–0.99 and is kept as the cross-check. Near overcast it even falls just below ε_h
 *   (0.9881 for 0.99), another sign of that inconsistency.
 * Example: ε_h = 0.75 → 0.83067.
 */
export function skyEmissivityVerticalMartinBerdahl(hemisphericalEmissivity: number, b = MARTIN_BERDAHL_B): number {
  let sum = 0;
  for (let i = 0; i < GL.x.length; i++) {
    const theta = (HALF_PI / 2) * (GL.x[i] + 1);
    const s = Math.sin(theta);
    sum += GL.w[i] * skyEmissivityAtZenithAngle(hemisphericalEmissivity, theta, b) * s * s;
  }
  return (4 / Math.PI) * (HALF_PI / 2) * sum;
}

/**
 * Validity of the vertical-wall sky models, for the correlation table.
 */
export const SKY_VERTICAL_RANGE = {
  hemisphericalEmissivity: [0.5, 1],
  source:
    'McClellan & Pedersen, ASHRAE Trans. 103(2) (1997) 469–484 (sky/air split); Martin & Berdahl, Solar Energy ' +
    '33 (1984) 321–336 (angular emissivity, b = 1.8); both from memory',
  extrapolation:
    'The split is a geometric rule and holds for any ε_h in 0–1. The angular law was fitted to clear and ' +
    'partly cloudy US skies (hemispherical ε about 0.6–0.95); outside that it is an extrapolation, flagged. ' +
    'Neither accounts for horizon obstructions (buildings, hills), which raise the effective value further.',
} as const;

/**
 * Effective sky temperature seen by a vertical wall, K, from the hemispherical sky emissivity
 * (already corrected for cloud) and the air temperature, by the sky-view split:
 *   T_sky,v = (β ε_h + 1 − β)^(1/4) T_air.
 * Example: ε_h = 0.75, T_air = 290 K → 0.82322^(1/4)·290 = 276.23 K.
 */
export function skyTemperatureVerticalSurface(hemisphericalEmissivity: number, airTemperatureK: number): number {
  return skyTemperatureFromEmissivity(skyEmissivityVerticalSplit(hemisphericalEmissivity), airTemperatureK);
}
