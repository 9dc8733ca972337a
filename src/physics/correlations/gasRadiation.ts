/**
 * Radiation from the flue gas (H2O and CO2) to the lining: weighted-sum-of-grey-gases emissivity
 * and absorptivity, the mean beam length of a long round flue, and the exchange with a grey wall
 * together with its derivative for a Jacobian.
 *
 * Weighted sum of grey gases (Hottel & Sarofim): ε = Σᵢ aᵢ(T) [1 − exp(−kᵢ p_a L)], with
 * p_a = p_H2O + p_CO2 in atm, L the mean beam length in m, kᵢ in 1/(atm m) and the weights aᵢ
 * polynomials in T (K); the remainder 1 − Σ aᵢ is the transparent window. The fits are for fixed
 * ratios p_H2O/p_CO2 of 1 (oil-like) and 2 (natural-gas-like); between them the emissivity is
 * interpolated linearly in the ratio, outside them the nearer fit is used (flagged by the range data).
 */
import { STANDARD_PRESSURE, STEFAN_BOLTZMANN } from '../constants.ts';

/** One weighted-sum-of-grey-gases fit at a fixed H2O/CO2 ratio. */
export interface WsggFit {
  /** Pressure absorption coefficients kᵢ of the grey gases, 1/(atm m). */
  readonly absorptionCoefficients: readonly number[];
  /** Weight polynomial of each grey gas, coefficients of T⁰, T¹, … (T in K). */
  readonly weightPolynomials: readonly (readonly number[])[];
}

/** A pair of fits for p_H2O/p_CO2 = 1 and 2, with their published ranges. */
export interface WsggModel {
  readonly ratio1: WsggFit;
  readonly ratio2: WsggFit;
  readonly range: {
    readonly temperatureK: readonly [number, number];
    readonly pathLengthAtmM: readonly [number, number];
    readonly ratio: readonly [number, number];
  };
  readonly source: string;
  readonly extrapolation: string;
}

/**
 * Smith, Shen & Friedman (1982), three grey gases plus a clear gas, fitted to the exponential
 * wide-band model. Coefficients b₁…b₄ as published (recalled, and identical to a secondary
 * source's table, compared digit by digit).
 */
export const WSGG_SMITH_1982: WsggModel = {
  ratio1: {
    absorptionCoefficients: [0.4303, 7.055, 178.1],
    weightPolynomials: [
      [5.15e-1, -2.303e-4, 9.779e-8, -1.494e-11],
      [7.749e-2, 3.399e-4, -2.297e-7, 3.77e-11],
      [1.907e-1, -1.824e-4, 5.608e-8, -5.122e-12],
    ],
  },
  ratio2: {
    absorptionCoefficients: [0.4201, 6.516, 131.9],
    weightPolynomials: [
      [6.508e-1, -5.551e-4, 3.029e-7, -5.353e-11],
      [-2.504e-2, 6.112e-4, -3.882e-7, 6.528e-11],
      [2.718e-1, -3.118e-4, 1.221e-7, -1.612e-11],
    ],
  },
  range: { temperatureK: [600, 2400], pathLengthAtmM: [0.001, 10], ratio: [1, 2] },
  source:
    'T. F. Smith, Z. F. Shen, J. N. Friedman, "Evaluation of coefficients for the weighted sum of gray gases ' +
    'model", J. Heat Transfer 104 (1982) 602–608, doi:10.1115/1.3245174 (ranges from memory)',
  extrapolation:
    'Below 600 K (most stack flues, and every lining temperature used for the absorptivity): common practice to ' +
    'extrapolate the weight polynomials; they stay positive and sum below 1 down to 300 K, and the emissivity ' +
    'stays within 10 % of the Dorigon et al. (2013) fit, which covers 400 K, for p_a L ≥ 0.1 atm m. ' +
    'p_a L below about 0.03 atm m: the three-gas fit overstates ε (by up to 40 % at 0.01 atm m and 400 K), flagged. ' +
    'Ratio outside 1–2: the nearer fit is used, flagged.',
};

/**
 * Dorigon, Duciak, Brittes, Cassol, Galarça, França (2013), four grey gases plus a clear gas,
 * fitted to line-by-line integration of the HITEMP 2010 database. Coefficients from a secondary
 * source's table (not checked against the paper here): use as a cross-check of
 * {@link WSGG_SMITH_1982}, or where the gas is colder than 600 K.
 */
export const WSGG_DORIGON_2013: WsggModel = {
  ratio1: {
    absorptionCoefficients: [0.1873, 1.723, 12.48, 144.9],
    weightPolynomials: [
      [7.197e-2, 8.724e-4, -9.69e-7, 4.651e-10, -7.917e-14],
      [1.107e-1, 3.397e-4, -2.467e-7, 4.647e-11, -1.039e-15],
      [2.091e-1, -6.423e-5, -3.2e-8, 1.718e-11, -2.105e-15],
      [7.092e-2, 6.586e-5, -1.278e-7, 5.577e-11, -7.709e-15],
    ],
  },
  ratio2: {
    absorptionCoefficients: [0.1921, 1.719, 11.37, 111.0],
    weightPolynomials: [
      [5.617e-2, 7.844e-4, -8.563e-7, 4.246e-10, -7.44e-14],
      [1.426e-1, 1.795e-4, -1.077e-8, -6.971e-11, 1.774e-14],
      [1.362e-1, 2.574e-4, -3.711e-7, 1.575e-10, -2.267e-14],
      [1.222e-1, -2.327e-5, -7.492e-8, 4.275e-11, -6.608e-15],
    ],
  },
  range: { temperatureK: [400, 2500], pathLengthAtmM: [0.001, 10], ratio: [1, 2] },
  source:
    'L. J. Dorigon et al., "WSGG correlations based on HITEMP2010 for computation of thermal radiation in ' +
    'non-isothermal, non-homogeneous H2O/CO2 mixtures", Int. J. Heat Mass Transfer 64 (2013) 863–873, ' +
    'doi:10.1016/j.ijheatmasstransfer.2013.05.010 (ranges from memory; coefficients from a secondary source)',
  extrapolation: 'Outside 400–2500 K, 0.001–10 atm m or ratios 1–2: flagged.',
};

/** Σᵢ aᵢ(T) [1 − exp(−kᵢ p_a L)] and its derivative with respect to T (weights differentiated). */
function wsggSum(fit: WsggFit, weightTemperatureK: number, pathLengthAtmM: number): { value: number; dT: number } {
  let value = 0;
  let dT = 0;
  const t = weightTemperatureK;
  for (let i = 0; i < fit.absorptionCoefficients.length; i++) {
    const b = fit.weightPolynomials[i];
    let a = 0;
    let da = 0;
    for (let j = b.length - 1; j >= 0; j--) {
      da = da * t + a; // Horner for the derivative
      a = a * t + b[j];
    }
    const grey = 1 - Math.exp(-fit.absorptionCoefficients[i] * pathLengthAtmM);
    value += a * grey;
    dT += da * grey;
  }
  return { value, dT };
}

/** Linear interpolation of the ratio-1 and ratio-2 fits in the ratio, clamped to 1–2. */
function wsggMixture(model: WsggModel, weightTemperatureK: number, pathLengthAtmM: number, ratio: number): { value: number; dT: number } {
  const f = Math.min(1, Math.max(0, ratio - 1));
  const one = wsggSum(model.ratio1, weightTemperatureK, pathLengthAtmM);
  if (f === 0) return one;
  const two = wsggSum(model.ratio2, weightTemperatureK, pathLengthAtmM);
  return { value: one.value + f * (two.value - one.value), dT: one.dT + f * (two.dT - one.dT) };
}

/**
 * Mean beam length of a long circular cylinder radiating to its whole curved surface:
 * L_e = 0.95 D (Hottel; e.g. Incropera & DeWitt, Fundamentals of Heat and Mass Transfer,
 * Table 13.4, "infinite circular cylinder, radiating to the curved surface"; from memory).
 * The optically thin limit is 4V/A = D; 0.95 corrects for moderate optical thickness.
 * Example: D = 1.4 m → 1.33 m.
 */
export function meanBeamLengthLongCylinder(diameter: number): number {
  return 0.95 * diameter;
}

/** Inputs of {@link flueGasRadiation}. */
export interface FlueGasRadiationInput {
  /** Bulk gas temperature, K. */
  readonly gasTemperatureK: number;
  /** Lining (inner surface) temperature, K. */
  readonly wallTemperatureK: number;
  /** Water-vapour partial pressure, Pa. */
  readonly waterPartialPressurePa: number;
  /** Carbon-dioxide partial pressure, Pa. */
  readonly carbonDioxidePartialPressurePa: number;
  /** Mean beam length, m (see {@link meanBeamLengthLongCylinder}). */
  readonly beamLengthM: number;
  /** Emissivity of the lining, 0–1. */
  readonly wallEmissivity: number;
}

/** Gas–wall radiation of one segment. */
export interface FlueGasRadiation {
  /** Net flux from the gas into the wall, W per m² of wall (negative when the wall is hotter). */
  readonly flux: number;
  /** ∂flux/∂T_wall, W/(m² K) (for the Jacobian; negative). */
  readonly dFluxdWallK: number;
  /** ∂flux/∂T_gas, W/(m² K). */
  readonly dFluxdGasK: number;
  /** Gas emissivity at the gas temperature, –. */
  readonly emissivity: number;
  /** Gas absorptivity for radiation from the wall, –. */
  readonly absorptivity: number;
  /** p_a L = (p_H2O + p_CO2) L, atm m. */
  readonly pathLengthAtmM: number;
  /** p_H2O/p_CO2 (Infinity without CO2). */
  readonly ratio: number;
}

/**
 * Radiative exchange between the flue gas and a grey lining (the engineering form of Hottel):
 *
 *   q = σ (ε_w + 1)/2 · (ε_g T_g⁴ − α_g T_w⁴)
 *   ε_g = Σ aᵢ(T_g) [1 − exp(−kᵢ p_a L)],   α_g = Σ aᵢ(T_w) [1 − exp(−kᵢ p_a L)]
 *
 * - The absorptivity uses the weights at the WALL temperature with the gas's grey-gas
 *   coefficients (the usual weighted-sum treatment of radiation from a wall: M. F. Modest,
 *   Radiative Heat Transfer, ch. on gas properties; from memory). At T_w = T_g, α_g = ε_g and
 *   q = 0 exactly (Kirchhoff).
 * - (ε_w + 1)/2 is the effective emissivity of a grey enclosure wall, valid for ε_w ≳ 0.7
 *   (Hottel; e.g. Incropera & DeWitt §13.6, from memory).
 * - Derivatives: ∂q/∂T_w = −σ (ε_w + 1)/2 · (α_g′ T_w⁴ + 4 α_g T_w³) with α_g′ from the weight
 *   polynomials; ∂q/∂T_g = σ (ε_w + 1)/2 · (ε_g′ T_g⁴ + 4 ε_g T_g³).
 * - Units: temperatures K, partial pressures Pa (converted to atm), L m; q W/m².
 * - `model`: {@link WSGG_SMITH_1982} by default, or {@link WSGG_DORIGON_2013}.
 *
 * Example (natural-gas flue, 1 atm: H2O 17 %, CO2 8.5 %; D = 1.4 m, L = 1.33 m; gas 200 °C, lining
 * 150 °C, ε_w = 0.85; Smith et al.): p_a L = 0.33915 atm m, ε_g = 0.37365, α_g = 0.37288,
 * q = 355.2 W/m² (as much as forced convection at full fire, 5.35 W/(m² K) × 50 K = 267 W/m²),
 * ∂q/∂T_w = −5.965 W/(m² K).
 */
export function flueGasRadiation(input: FlueGasRadiationInput, model: WsggModel = WSGG_SMITH_1982): FlueGasRadiation {
  const { gasTemperatureK: tg, wallTemperatureK: tw, beamLengthM, wallEmissivity } = input;
  const pw = input.waterPartialPressurePa / STANDARD_PRESSURE;
  const pc = input.carbonDioxidePartialPressurePa / STANDARD_PRESSURE;
  const pathLengthAtmM = (pw + pc) * beamLengthM;
  const ratio = pc > 0 ? pw / pc : pw > 0 ? Infinity : 1;
  const eps = wsggMixture(model, tg, pathLengthAtmM, ratio);
  const alpha = wsggMixture(model, tw, pathLengthAtmM, ratio);
  const factor = STEFAN_BOLTZMANN * 0.5 * (wallEmissivity + 1);
  const tg3 = tg * tg * tg;
  const tw3 = tw * tw * tw;
  return {
    flux: factor * (eps.value * tg3 * tg - alpha.value * tw3 * tw),
    dFluxdWallK: -factor * (alpha.dT * tw3 * tw + 4 * alpha.value * tw3),
    dFluxdGasK: factor * (eps.dT * tg3 * tg + 4 * eps.value * tg3),
    emissivity: eps.value,
    absorptivity: alpha.value,
    pathLengthAtmM,
    ratio,
  };
}

/**
 * Total emissivity of an H2O–CO2 mixture by a weighted-sum-of-grey-gases model, –: the ε_g of
 * {@link flueGasRadiation} on its own. `pathLengthAtmM` = (p_H2O + p_CO2) L in atm m, `ratio` =
 * p_H2O/p_CO2. Example (Smith et al., ratio 2): T = 1000 K, 0.3 atm m → weights 0.34507, 0.26324,
 * 0.06598 → ε = 0.33281.
 */
export function gasEmissivityWsgg(temperatureK: number, pathLengthAtmM: number, ratio: number, model: WsggModel = WSGG_SMITH_1982): number {
  return wsggMixture(model, temperatureK, pathLengthAtmM, ratio).value;
}

/** Sum of the grey-gas weights Σ aᵢ(T) of one fit (the emissivity of an optically thick gas), –. */
export function wsggWeightSum(fit: WsggFit, temperatureK: number): number {
  return wsggSum(fit, temperatureK, Infinity).value;
}

/** Net gas-to-wall flux and its wall derivative (see {@link flueGasRadiation}), W/m² and W/(m² K). */
export interface GreyGasExchange {
  flux: number;
  dFluxdWallK: number;
  emissivity: number;
}

/**
 * {@link flueGasRadiation} prepared for one gas and one flue: the grey-gas transmissions
 * exp(−kᵢ p_a L) and the ratio interpolation depend only on the composition, the pressure and the
 * beam length, so they are computed once; each call evaluates the weight polynomials at the gas and
 * the wall temperature and fills `out` (no allocation: the model's hot path). Same results as
 * flueGasRadiation (to rounding).
 */
export function makeGreyGasExchange(
  waterPartialPressurePa: number,
  carbonDioxidePartialPressurePa: number,
  beamLengthM: number,
  wallEmissivity: number,
  model: WsggModel = WSGG_SMITH_1982,
): (gasK: number, wallK: number, out: GreyGasExchange) => GreyGasExchange {
  const pw = waterPartialPressurePa / STANDARD_PRESSURE;
  const pc = carbonDioxidePartialPressurePa / STANDARD_PRESSURE;
  const pathLengthAtmM = (pw + pc) * beamLengthM;
  const ratio = pc > 0 ? pw / pc : pw > 0 ? Infinity : 1;
  const f = Math.min(1, Math.max(0, ratio - 1));
  // each grey gas of each fit with its share of the interpolation and its grey factor
  const polynomials: (readonly number[])[] = [];
  const factors: number[] = [];
  for (const [fit, share] of [[model.ratio1, 1 - f], [model.ratio2, f]] as const) {
    if (share === 0) continue;
    fit.absorptionCoefficients.forEach((k, i) => {
      polynomials.push(fit.weightPolynomials[i]!);
      factors.push(share * (1 - Math.exp(-k * pathLengthAtmM)));
    });
  }
  const factor = STEFAN_BOLTZMANN * 0.5 * (wallEmissivity + 1);
  /** Σ share·grey·a(T) and its T-derivative, into `sum`. */
  const weighted = (t: number, sum: { value: number; dT: number }) => {
    let value = 0;
    let dT = 0;
    for (let i = 0; i < polynomials.length; i++) {
      const b = polynomials[i]!;
      let a = 0;
      let da = 0;
      for (let j = b.length - 1; j >= 0; j--) {
        da = da * t + a;
        a = a * t + b[j]!;
      }
      value += a * factors[i]!;
      dT += da * factors[i]!;
    }
    sum.value = value;
    sum.dT = dT;
  };
  const eps = { value: 0, dT: 0 };
  const alpha = { value: 0, dT: 0 };
  return (tg, tw, out) => {
    weighted(tg, eps);
    weighted(tw, alpha);
    const tg3 = tg * tg * tg;
    const tw3 = tw * tw * tw;
    out.flux = factor * (eps.value * tg3 * tg - alpha.value * tw3 * tw);
    out.dFluxdWallK = -factor * (alpha.dT * tw3 * tw + 4 * alpha.value * tw3);
    out.emissivity = eps.value;
    return out;
  };
}
