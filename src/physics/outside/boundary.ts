/**
 * The outer boundary of one axial segment: convection to the air, long-wave radiation to the
 * surroundings and absorbed sun, each per metre of stack height, with the derivative of the loss
 * for the Jacobian. The radiation model (sky and ground, fixed surroundings, none) and the sky model
 * are chosen here, in one place: `surroundingTemperatures` says what the surface sees,
 * `outerBoundaryOfSegment` what it exchanges with it.
 *
 * SI units: K, m/s, m, W/m, W/(m K). Pure apart from writing `out` (and the air-property scratch).
 */
import { airPropertiesInto, type AirProperties } from '../properties/air.ts';
import { outsideFilmCoefficientInto, type OutsideFilmCorrelations, type OutsideFilmResult } from '../correlations/external.ts';
import { radiationCoefficientToSkyAndGround, radiationToSkyAndGround, skyEmissivityBerdahlMartin } from '../correlations/radiation.ts';
import { skyEmissivityCloudy, skyEmissivitySwinbank, skyTemperatureVerticalSurface } from './sky.ts';
import type { AirState } from './weather.ts';

/**
 * Clear-sky models by name: the HEMISPHERICAL clear-sky emissivity from the outside air at one
 * instant. The scenario's list of sky models is read from this table. Cloud cover and the view of
 * a vertical wall are applied to every model alike (`skyTemperatureSeenByWall`).
 */
export const SKY_MODELS = {
  /** Berdahl & Martin (1984), from the dew point. */
  'berdahl-martin': (air: AirState): number => skyEmissivityBerdahlMartin(air.dewPointK),
  /** Swinbank (1963), from the air temperature alone (as an emissivity, (T_sky/T_air)⁴). */
  swinbank: (air: AirState): number => skyEmissivitySwinbank(air.airTemperatureK),
} as const satisfies Record<string, (air: AirState) => number>;

/**
 * The sky temperature a VERTICAL wall sees, K: the model's clear-sky emissivity, raised for cloud
 * cover (Clark & Allen 1978, capped at 1), then split between sky and near-horizon air by the
 * sky-view share of a vertical surface (McClellan & Pedersen 1997; physics/outside/sky.ts).
 */
export function skyTemperatureSeenByWall(model: SkyModelName, air: AirState): number {
  const cloudy = Math.min(1, skyEmissivityCloudy(SKY_MODELS[model](air), air.cloudCover));
  return skyTemperatureVerticalSurface(cloudy, air.airTemperatureK);
}

export type SkyModelName = keyof typeof SKY_MODELS;

/** What the outer surface radiates to. */
export type OutsideRadiation =
  /** Half sky (at the sky model's temperature), half ground (at `groundTemperatureK`, default the air temperature). */
  | { readonly kind: 'sky-ground'; readonly sky: SkyModelName; readonly groundTemperatureK?: number }
  /** Large surroundings at one temperature (sky and ground both at it). */
  | { readonly kind: 'surroundings'; readonly temperatureK: number }
  /** No long-wave exchange. */
  | { readonly kind: 'none' };

/** Temperatures the outer surface sees: sky and ground, K. */
export interface Surroundings {
  skyTemperatureK: number;
  groundTemperatureK: number;
}

/**
 * Sky and ground temperatures for the radiation model at the air state `air`. With no radiation,
 * both are the air temperature (nothing is exchanged; the values only appear in reports).
 */
export function surroundingTemperatures(radiation: OutsideRadiation, air: AirState, out: Surroundings): Surroundings {
  switch (radiation.kind) {
    case 'sky-ground':
      out.skyTemperatureK = skyTemperatureSeenByWall(radiation.sky, air);
      out.groundTemperatureK = radiation.groundTemperatureK ?? air.airTemperatureK;
      break;
    case 'surroundings':
      out.skyTemperatureK = radiation.temperatureK;
      out.groundTemperatureK = radiation.temperatureK;
      break;
    case 'none':
      out.skyTemperatureK = air.airTemperatureK;
      out.groundTemperatureK = air.airTemperatureK;
      break;
  }
  return out;
}

/** What stays fixed for the whole run at the outer surface. */
export interface OuterSurfaceSpec {
  /** Outer diameter, m. */
  readonly outerDiameter: number;
  /** Stack height, m (length of natural convection). */
  readonly height: number;
  /** Thermal emissivity of the outer surface, –. */
  readonly emissivity: number;
  /** Fixed outside film coefficient, W/(m² K); undefined: correlations (forced, natural, mixed). */
  readonly filmCoefficient: number | undefined;
  readonly radiation: OutsideRadiation;
  /** The film correlations (forced, natural, slender, mixed) the model selected. */
  readonly filmCorrelations: OutsideFilmCorrelations;
  /** Atmospheric pressure at the site, Pa (air properties of the film). */
  readonly pressurePa: number;
}

/** Conditions outside one segment at one instant. */
export interface OutsideConditions {
  readonly airTemperatureK: number;
  /** Wind speed at the segment's height, m/s. */
  readonly windSpeed: number;
  readonly skyTemperatureK: number;
  readonly groundTemperatureK: number;
  /** Absorbed sun, W per metre of height. */
  readonly sunPerMetre: number;
}

/** The outer boundary of one segment at one instant. */
export interface OuterBoundaryOfSegment {
  /** Convection to the air, W/m (positive: heat leaves). */
  convectionPerMetre: number;
  /** Net long-wave radiation, W/m (positive: heat leaves). */
  radiationPerMetre: number;
  /** Absorbed sun, W/m. */
  sunPerMetre: number;
  /**
   * ∂(convection + radiation)/∂T_surface, W/(m K), in its two parts (their sum is the surface's
   * sink, for the Jacobian): h P with the growth of natural convection with ΔT, and 4 ε σ T_s³ P
   * (with its view factors).
   */
  convectionSinkPerMetre: number;
  radiationSinkPerMetre: number;
  /** Outside film coefficient, W/(m² K). */
  filmCoefficient: number;
  /** Reynolds number on the outer diameter, Rayleigh number on the height, Grashof number on the height and film Prandtl number (NaN with a fixed film coefficient). */
  reynolds: number;
  rayleigh: number;
  grashof: number;
  prandtl: number;
  /** Whether the slender-cylinder factor was applied to natural convection. */
  slenderCorrected: boolean;
}

const filmResult: { -readonly [K in keyof OutsideFilmResult]: OutsideFilmResult[K] } = {
  h: 0, nuForced: 0, nuNatural: 0, nuMixed: 0, re: 0, ra: 0, grashof: 0, hForced: 0, hNatural: 0, slender: false, slenderCorrected: false,
};

export function emptyOuterBoundary(): OuterBoundaryOfSegment {
  return { convectionPerMetre: 0, radiationPerMetre: 0, sunPerMetre: 0, convectionSinkPerMetre: 0, radiationSinkPerMetre: 0, filmCoefficient: 0, reynolds: Number.NaN, rayleigh: Number.NaN, grashof: Number.NaN, prandtl: Number.NaN, slenderCorrected: false };
}

/**
 * Outer boundary of one segment with its surface at `surfaceK`: convection h P (T_s − T_air) with
 * h fixed or from the film correlations at the film temperature (T_s + T_air)/2 (air properties
 * written into `film`), radiation ε σ [½(T_s⁴ − T_sky⁴) + ½(T_s⁴ − T_ground⁴)] P, absorbed sun as
 * given; P = π D_o. Fills and returns `out`.
 * Example: h fixed 10, D_o 2 m, T_s 300 K, T_air 290 K, no radiation → convection 10·2π·10 = 628.3 W/m.
 */
export function outerBoundaryOfSegment(spec: OuterSurfaceSpec, surfaceK: number, c: OutsideConditions, film: AirProperties, out: OuterBoundaryOfSegment): OuterBoundaryOfSegment {
  const perimeter = Math.PI * spec.outerDiameter;
  let h: number;
  // ∂(h ΔT)/∂ΔT: natural convection grows with ΔT (h_N ∝ ΔT^(1/3) on the turbulent branch), so
  // with h = (h_F³ + h_N³)^(1/3) the slope is h + h_N³/(3 h²) (0 extra for a fixed h)
  let slopeExtra = 0;
  if (spec.filmCoefficient !== undefined) {
    h = spec.filmCoefficient;
    out.reynolds = Number.NaN;
    out.rayleigh = Number.NaN;
    out.grashof = Number.NaN;
    out.prandtl = Number.NaN;
    out.slenderCorrected = false;
  } else {
    const air = airPropertiesInto(film, 0.5 * (surfaceK + c.airTemperatureK), spec.pressurePa);
    const f = outsideFilmCoefficientInto(c.windSpeed, spec.outerDiameter, spec.height, surfaceK, c.airTemperatureK, air, spec.filmCorrelations, filmResult);
    h = f.h;
    if (h > 0) slopeExtra = (f.hNatural * f.hNatural * f.hNatural) / (3 * h * h);
    out.reynolds = f.re;
    out.rayleigh = f.ra;
    out.grashof = f.grashof;
    out.prandtl = air.prandtl;
    out.slenderCorrected = f.slenderCorrected;
  }
  let radiation = 0;
  let radiationSink = 0;
  if (spec.radiation.kind !== 'none') {
    radiation = radiationToSkyAndGround(surfaceK, spec.emissivity, c.skyTemperatureK, c.groundTemperatureK) * perimeter;
    radiationSink = radiationCoefficientToSkyAndGround(surfaceK, spec.emissivity) * perimeter;
  }
  out.convectionPerMetre = h * perimeter * (surfaceK - c.airTemperatureK);
  out.radiationPerMetre = radiation;
  out.sunPerMetre = c.sunPerMetre;
  out.convectionSinkPerMetre = (h + slopeExtra) * perimeter;
  out.radiationSinkPerMetre = radiationSink;
  out.filmCoefficient = h;
  return out;
}
