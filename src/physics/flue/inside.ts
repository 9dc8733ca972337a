/**
 * The flue side of one axial segment: the inside film coefficient, the gas crossing the segment
 * and the heat it gives the inner surface, with the derivative the implicit integrator needs.
 *
 *   Re = 4 ṁ / (π D μ),  h_F = Nu(Re, Pr) k / D,  bulk properties at the segment's inlet gas
 *   temperature;
 *   natural convection on the lining, h_N (a vertical-surface correlation on the stack height at the
 *   gas–wall difference, film properties), combined with h_F as Churchill's aiding (wall warmer than
 *   the gas: its layer rises with the flow) or opposing sum; opposing only with laminar forced flow,
 *   since in turbulent pipe flow opposing buoyancy raises heat transfer rather than lowering it
 *   (Jackson, Cotton & Axcell 1989, from memory) — there the aiding sum is used;
 *   or a fixed h given by the user (then nothing else);
 *   gas radiation (optional): H2O–CO2 weighted-sum-of-grey-gases exchange with the grey lining,
 *   mean beam length 0.95 D, as a radiative film coefficient added to the convective one;
 *   gas cooling on:  the quasi-steady march of `marchThroughSegment` (T_out, Q = ṁ c_p (T_in − T_w) ε);
 *   gas cooling off: every segment sees the inlet temperature, q' = h π D (T_in − T_w).
 *
 * SI units: K, kg/s, m, W/m (per metre of stack height), W/(m K). Pure apart from writing `out`.
 */
import type { GasPropertyLookup, MutableGasProperties } from '../properties/flueGas.ts';
import { marchThroughSegment, type SegmentMarch } from './march.ts';
import { naturalConvectionLiningCoefficient } from '../correlations/internal.ts';
import type { GreyGasExchange } from '../correlations/gasRadiation.ts';
import { RE_LAMINAR_LIMIT } from '../correlations/internal.ts';

/** What stays fixed for the whole run on the flue side of a segment. */
export interface FlueSideSpec {
  /** Inner (flue) diameter, m. */
  readonly innerDiameter: number;
  /** Axial length of the segment, m. */
  readonly segmentLength: number;
  /** Fixed inside film coefficient, W/(m² K); undefined: from `nusselt`. */
  readonly filmCoefficient: number | undefined;
  /** Whether the gas cools as it rises. */
  readonly gasCooling: boolean;
  /** Tube Nusselt number on the inner diameter from (Re, Pr), bulk properties. */
  readonly nusselt: (re: number, pr: number) => number;
  /** Height of the lining, m (length of its natural convection). */
  readonly liningHeight: number;
  /** Vertical-surface Nusselt number on the height from (Ra, Pr), film properties. */
  readonly naturalNusselt: (ra: number, pr: number) => number;
  /** Combination of forced and natural film coefficients (aiding = 1, opposing = 0). */
  readonly mixed: (forced: number, natural: number, aiding: number) => number;
  /** Properties of the flue gas at a temperature. */
  readonly gas: GasPropertyLookup;
  /** Gas radiation to the lining (net flux from the gas at T_gas to the wall at T_wall, prepared for this gas and flue by `makeGreyGasExchange`), or null when it is off. */
  readonly radiation: ((gasK: number, wallK: number, out: GreyGasExchange) => GreyGasExchange) | null;
  /** p_H2O/p_CO2 and (p_H2O + p_CO2)·L in atm·m of the radiating gas (for range checks; NaN when off). */
  readonly radiationRatio: number;
  readonly radiationPathLengthAtmM: number;
}

/** The flue side of one segment at one instant. */
export interface FlueSideOfSegment {
  /** Gas temperature leaving the segment, K. */
  gasOutK: number;
  /** Heat from the gas into the inner surface, W per metre of height. */
  heatPerMetre: number;
  /** −∂(heatPerMetre)/∂T_inner, W/(m K) (≥ 0), for the Jacobian. */
  sinkPerMetre: number;
  /** Inside film coefficient (convection, forced and natural together), W/(m² K). */
  filmCoefficient: number;
  /** Forced and natural parts of it, W/(m² K), and whether buoyancy aids the flow (1) or opposes it (0). */
  forcedFilm: number;
  naturalFilm: number;
  aiding: number;
  /** Rayleigh number of the lining's natural convection on the height, –. */
  rayleighNatural: number;
  /** Gas radiation to the lining as a film coefficient on (T_gas − T_wall), W/(m² K) (0 when off). */
  radiationFilm: number;
  /** Gas emissivity, path length (p_H2O + p_CO2)·L in atm·m and p_H2O/p_CO2 (NaN when off). */
  gasEmissivity: number;
  pathLengthAtmM: number;
  waterToCarbonDioxide: number;
  /** Reynolds number on the inner diameter, –. */
  reynolds: number;
  /** Prandtl number of the gas, –. */
  prandtl: number;
}

export function emptyFlueSide(): FlueSideOfSegment {
  return {
    gasOutK: 0, heatPerMetre: 0, sinkPerMetre: 0, filmCoefficient: 0, forcedFilm: 0, naturalFilm: 0, aiding: 0, rayleighNatural: 0,
    radiationFilm: 0, gasEmissivity: Number.NaN, pathLengthAtmM: Number.NaN, waterToCarbonDioxide: Number.NaN, reynolds: 0, prandtl: 0,
  };
}

const march: SegmentMarch = { gasOutK: 0, heatW: 0, conductanceWPerK: 0 };
const natural = { h: 0, rayleigh: 0, nusselt: 0 };
const exchange: GreyGasExchange = { flux: 0, dFluxdWallK: 0, emissivity: 0 };
const bulk: MutableGasProperties = { density: 0, specificHeat: 0, conductivity: 0, dynamicViscosity: 0, prandtl: 0 };
const film: MutableGasProperties = { density: 0, specificHeat: 0, conductivity: 0, dynamicViscosity: 0, prandtl: 0 };
const mean: MutableGasProperties = { density: 0, specificHeat: 0, conductivity: 0, dynamicViscosity: 0, prandtl: 0 };

/**
 * Flue side of one segment: gas entering at `gasInK` with mass flow `massFlow` (kg/s), inner
 * surface at `wallK`. Transport properties at the inlet (bulk) and at the mean of gas and wall
 * (film); the heat the gas gives is ṁ c_p (T_in − T_out) with c_p at the segment's mean gas
 * temperature (the midpoint rule for the enthalpy change, so that the wall gets what the gas loses
 * to second order in the segment's temperature drop). Fills and returns `out`.
 * Example: D 1.4 m, Δz 3.75 m, ṁ 3.2 kg/s, μ 2.5e-5 Pa s → Re = 4·3.2/(π·1.4·2.5e-5) = 116 410.
 */
export function flueSideOfSegment(spec: FlueSideSpec, gasInK: number, wallK: number, massFlow: number, out: FlueSideOfSegment): FlueSideOfSegment {
  const di = spec.innerDiameter;
  const dz = spec.segmentLength;
  const gas = spec.gas(gasInK, bulk);
  insideFilmOfWall(spec, gas, gasInK, wallK, massFlow, out);
  const hTotal = out.filmCoefficient + out.radiationFilm;
  if (spec.gasCooling) {
    marchThroughSegment(gasInK, wallK, hTotal * Math.PI * di * dz, massFlow * gas.specificHeat, march);
    const cpMean = spec.gas(0.5 * (gasInK + march.gasOutK), mean).specificHeat;
    out.gasOutK = march.gasOutK;
    out.heatPerMetre = (massFlow * cpMean * (gasInK - march.gasOutK)) / dz;
    out.sinkPerMetre = march.conductanceWPerK / dz;
  } else {
    out.gasOutK = gasInK;
    out.heatPerMetre = hTotal * Math.PI * di * (gasInK - wallK);
    out.sinkPerMetre = hTotal * Math.PI * di;
  }
  return out;
}

/**
 * The inside film at one wall temperature: convection (fixed, or forced and natural together) and
 * gas radiation as a film coefficient, with their diagnostics, written into `out`; `gas` holds the
 * bulk properties at `gasInK` (looked up once by the caller, whatever the number of wall temperatures).
 */
function insideFilmOfWall(spec: FlueSideSpec, gas: Readonly<MutableGasProperties>, gasInK: number, wallK: number, massFlow: number, out: FlueSideOfSegment): void {
  const di = spec.innerDiameter;
  const reynolds = (4 * massFlow) / (Math.PI * di * gas.dynamicViscosity);
  let h: number;
  if (spec.filmCoefficient !== undefined) {
    h = spec.filmCoefficient;
    out.forcedFilm = h;
    out.naturalFilm = 0;
    out.aiding = 1;
    out.rayleighNatural = Number.NaN;
  } else {
    const forced = (spec.nusselt(reynolds, gas.prandtl) * gas.conductivity) / di;
    naturalConvectionLiningCoefficient(wallK, gasInK, spec.liningHeight, spec.gas(0.5 * (gasInK + wallK), film), spec.naturalNusselt, natural);
    // opposing buoyancy lowers the film only in laminar forced flow (see the module comment)
    const aiding = wallK > gasInK || reynolds > RE_LAMINAR_LIMIT ? 1 : 0;
    h = spec.mixed(forced, natural.h, aiding);
    out.forcedFilm = forced;
    out.naturalFilm = natural.h;
    out.aiding = aiding;
    out.rayleighNatural = natural.rayleigh;
  }
  let hRadiation = 0;
  if (spec.radiation) {
    const r = spec.radiation(gasInK, wallK, exchange);
    // as a film coefficient on the gas–wall difference (its slope where the two are equal); never
    // negative (the grey-gas weights at two temperatures can leave a tiny wrong-signed residue there)
    const dT = gasInK - wallK;
    hRadiation = Math.max(0, Math.abs(dT) > 0.01 ? r.flux / dT : -r.dFluxdWallK);
    out.gasEmissivity = r.emissivity;
    out.pathLengthAtmM = spec.radiationPathLengthAtmM;
    out.waterToCarbonDioxide = spec.radiationRatio;
  }
  out.filmCoefficient = h;
  out.radiationFilm = hRadiation;
  out.reynolds = reynolds;
  out.prandtl = gas.prandtl;
}

/** Heat into each sector's inner surface, W per metre of height, and −∂/∂T of each, W/(m K). */
export interface FlueSideOfSectors {
  readonly heatPerMetre: Float64Array;
  readonly sinkPerMetre: Float64Array;
}

const sectorFilm = emptyFlueSide();

/**
 * The flue side of one segment whose inner surface is cut into `n` equal sectors at wall
 * temperatures `walls[offset + j·stride]` (j = 0…n−1): the gas stays one well-mixed stream. Each
 * sector's film (h_j, convection and radiation, at its own wall temperature) gives UA_j = h_j π D Δz / n;
 * the gas crosses the segment against the combined UA = Σ UA_j at the UA-weighted wall temperature
 * T_w = Σ UA_j T_j / UA (the exact march for a well-mixed gas over walls at several temperatures with
 * one mean gas temperature), giving T_out and Q; the mean gas temperature T_m = T_w + Q/UA sets each
 * sector's share Q_j = UA_j (T_m − T_j), which sum to Q exactly.
 * `out` (the gas leaving, the segment's heat and sink; with `diagnostics`, also the film's
 * diagnostics at the mean wall, which only reports need) and `sectors` are filled.
 */
export function flueSideOfSectors(
  spec: FlueSideSpec,
  gasInK: number,
  walls: Float64Array,
  offset: number,
  stride: number,
  n: number,
  massFlow: number,
  out: FlueSideOfSegment,
  sectors: FlueSideOfSectors,
  diagnostics = true,
): FlueSideOfSegment {
  const di = spec.innerDiameter;
  const dz = spec.segmentLength;
  let ua = 0;
  let uaWall = 0;
  let film = 0;
  let radiationFilm = 0;
  const gas = spec.gas(gasInK, bulk); // the bulk gas is the same for every sector
  for (let j = 0; j < n; j++) {
    const tj = walls[offset + j * stride]!;
    insideFilmOfWall(spec, gas, gasInK, tj, massFlow, sectorFilm);
    const uaj = ((sectorFilm.filmCoefficient + sectorFilm.radiationFilm) * Math.PI * di * dz) / n;
    sectors.sinkPerMetre[j] = uaj; // UA_j for now
    ua += uaj;
    uaWall += uaj * tj;
    film += sectorFilm.filmCoefficient / n;
    radiationFilm += sectorFilm.radiationFilm / n;
  }
  const wallK = ua > 0 ? uaWall / ua : walls[offset]!;
  if (diagnostics) insideFilmOfWall(spec, gas, gasInK, wallK, massFlow, out); // the diagnostics of the mean wall
  let total: number; // Q, W
  let sink: number; // −∂Q/∂T_w, W/K
  if (spec.gasCooling) {
    marchThroughSegment(gasInK, wallK, ua, massFlow * gas.specificHeat, march);
    const cpMean = spec.gas(0.5 * (gasInK + march.gasOutK), mean).specificHeat;
    out.gasOutK = march.gasOutK;
    total = massFlow * cpMean * (gasInK - march.gasOutK);
    sink = march.conductanceWPerK;
  } else {
    out.gasOutK = gasInK;
    total = ua * (gasInK - wallK);
    sink = ua;
  }
  const gasMean = ua > 0 ? wallK + total / ua : gasInK;
  for (let j = 0; j < n; j++) {
    const uaj = sectors.sinkPerMetre[j]!;
    const w = ua > 0 ? uaj / ua : 1 / n;
    sectors.heatPerMetre[j] = (uaj * (gasMean - walls[offset + j * stride]!)) / dz;
    // −∂Q_j/∂T_j = UA_j (1 − w_j) + w_j² (−∂Q/∂T_w), w_j = UA_j/UA: its own conductance plus its share of the gas
    sectors.sinkPerMetre[j] = (uaj * (1 - w) + w * w * sink) / dz;
  }
  out.heatPerMetre = total / dz;
  out.sinkPerMetre = sink / dz;
  out.filmCoefficient = film;
  out.radiationFilm = radiationFilm;
  return out;
}
