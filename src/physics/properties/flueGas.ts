/**
 * Flue-gas (and air) properties against temperature: ideal-gas mixture of N2, O2, CO2, H2O, SO2 and
 * SO3, argon folded into N2.
 *
 * - Specific heat: NASA 7-coefficient polynomials per species, molar-averaged.
 * - Viscosity: Chapman–Enskog with Lennard-Jones parameters (Neufeld collision integral) for the
 *   non-polar species; the IAPWS 2008 dilute-gas formula for water vapour; mixture by Wilke (1950).
 * - Conductivity: Chung et al. (1988) for the non-polar species; the IAPWS 2011 dilute-gas formula for
 *   water vapour; mixture by Wassiljewa's equation with the Mason–Saxena (1958) factors.
 * - Density: ideal gas.
 *
 * Simplifications, stated once:
 * - Argon (0.93 % of dry air) is counted as N2. For air this makes the molar mass 28.86 g/mol instead
 *   of 28.96 (−0.37 %), density −0.37 % and mass-specific cp about +0.6 %.
 * - SO3 (a few ppm) takes the SO2 polynomials and transport data, with its own molar mass.
 *
 * `makeGasPropertyTable` precomputes all of this on a grid once; the model calls the returned
 * lookup for every segment at every step.
 */
import { GAS_CONSTANT } from '../constants.ts';

/** Species tracked in a flue gas. */
export const GAS_SPECIES = ['N2', 'O2', 'CO2', 'H2O', 'SO2', 'SO3'] as const;
export type GasSpecies = (typeof GAS_SPECIES)[number];

/** Wet flue-gas composition: mole (= volume) fractions, summing to 1. Argon is counted in N2. */
export type GasComposition = Readonly<Record<GasSpecies, number>>;

/** Molar masses, kg/mol, from IUPAC standard atomic weights (C 12.011, H 1.008, O 15.999, N 14.007, S 32.06). */
export const SPECIES_MOLAR_MASS: Readonly<Record<GasSpecies, number>> = {
  N2: 0.028014,
  O2: 0.031998,
  CO2: 0.044009,
  H2O: 0.018015,
  SO2: 0.064058,
  SO3: 0.080057,
};

/** Mean molar mass of a composition, kg/mol (fractions are normalised first). */
export function mixtureMolarMass(composition: GasComposition): number {
  let sum = 0;
  let m = 0;
  for (const s of GAS_SPECIES) {
    sum += composition[s];
    m += composition[s] * SPECIES_MOLAR_MASS[s];
  }
  return m / sum;
}

/**
 * Dry air as a flue gas: 78.084 % N2, 20.946 % O2, 0.934 % Ar counted as N2 (U.S. Standard Atmosphere
 * 1976, Table 3), 0.04 % CO2 (present-day value; 1976 table: 0.0314 %); normalised to sum to 1.
 * Use it when a scenario asks for air properties inside the flue.
 */
export const airAsFlueGas: GasComposition = normalise({ N2: 0.78084 + 0.00934, O2: 0.20946, CO2: 0.0004, H2O: 0, SO2: 0, SO3: 0 });

function normalise(c: Record<GasSpecies, number>): GasComposition {
  const sum = GAS_SPECIES.reduce((a, s) => a + c[s], 0);
  const out = {} as Record<GasSpecies, number>;
  for (const s of GAS_SPECIES) out[s] = c[s] / sum;
  return out;
}

// ───────────────────────────── specific heat ─────────────────────────────

/** NASA 7-coefficient set: cp/R = a1 + a2 T + a3 T² + a4 T³ + a5 T⁴ (a6, a7 are enthalpy/entropy constants). */
interface Nasa7 {
  readonly low: readonly number[]; // T < midK
  readonly high: readonly number[]; // T ≥ midK
  readonly midK: number;
  readonly rangeK: readonly [number, number];
}

/**
 * NASA 7-coefficient polynomials (format of McBride, Gordon & Reno 1993, NASA TM-4513) as distributed
 * in the GRI-Mech 3.0 thermodynamic data file (Smith et al. 1999) for N2, O2, CO2, H2O; SO2 from the
 * Chemkin/NASA thermodynamic data base (NASA TM-4513 set). Recalled from memory and compared
 * digit by digit with several public copies of those data files. Upper limits: N2 5000 K, O2/CO2/H2O
 * 3500 K, SO2 5000 K; lower limits 200 K (N2 and SO2: 300 K, extrapolated smoothly to 200 K here).
 */
const NASA7_SO2: Nasa7 = {
  low: [3.2665338, 5.3237902e-3, 6.8437552e-7, -5.2810047e-9, 2.5590454e-12, -36908.148, 9.66465108],
  high: [5.2451364, 1.9704204e-3, -8.0375769e-7, 1.5149969e-10, -1.0558004e-14, -37558.227, -1.07404892],
  midK: 1000,
  rangeK: [300, 5000],
};

const NASA7: Readonly<Record<GasSpecies, Nasa7>> = {
  N2: {
    low: [3.298677, 1.4082404e-3, -3.963222e-6, 5.641515e-9, -2.444854e-12, -1020.8999, 3.950372],
    high: [2.92664, 1.4879768e-3, -5.68476e-7, 1.0097038e-10, -6.753351e-15, -922.7977, 5.980528],
    midK: 1000,
    rangeK: [300, 5000],
  },
  O2: {
    low: [3.78245636, -2.99673416e-3, 9.84730201e-6, -9.68129509e-9, 3.24372837e-12, -1063.94356, 3.65767573],
    high: [3.28253784, 1.48308754e-3, -7.57966669e-7, 2.09470555e-10, -2.16717794e-14, -1088.45772, 5.45323129],
    midK: 1000,
    rangeK: [200, 3500],
  },
  CO2: {
    low: [2.35677352, 8.98459677e-3, -7.12356269e-6, 2.45919022e-9, -1.43699548e-13, -48371.9697, 9.90105222],
    high: [3.85746029, 4.41437026e-3, -2.21481404e-6, 5.23490188e-10, -4.72084164e-14, -48759.166, 2.27163806],
    midK: 1000,
    rangeK: [200, 3500],
  },
  H2O: {
    low: [4.19864056, -2.0364341e-3, 6.52040211e-6, -5.48797062e-9, 1.77197817e-12, -30293.7267, -0.849032208],
    high: [3.03399249, 2.17691804e-3, -1.64072518e-7, -9.7041987e-11, 1.68200992e-14, -30004.2971, 4.9667701],
    midK: 1000,
    rangeK: [200, 3500],
  },
  SO2: NASA7_SO2,
  SO3: NASA7_SO2, // SO3 is present in ppm: the SO2 set stands in for it
};

/**
 * Molar isobaric heat capacity of one species from its NASA 7-coefficient polynomial, J/(mol K).
 * cp = R (a1 + a2 T + a3 T² + a4 T³ + a5 T⁴), low set below 1000 K, high set above.
 * Valid 200–3500 K (see NASA7). Example: N2 at 300 K → 29.12 J/(mol K) (JANAF: 29.125).
 */
export function cpMolarNasa7(species: GasSpecies, temperatureK: number): number {
  const p = NASA7[species];
  const a = temperatureK < p.midK ? p.low : p.high;
  const T = temperatureK;
  return GAS_CONSTANT * (a[0] + T * (a[1] + T * (a[2] + T * (a[3] + T * a[4]))));
}

// ───────────────────────────── viscosity ─────────────────────────────

/** Lennard-Jones parameters: collision diameter σ (Å) and well depth ε/k (K). */
interface LennardJones {
  readonly sigmaAngstrom: number;
  readonly epsilonOverK: number;
}

/**
 * Lennard-Jones parameters from viscosity data: Bird, Stewart & Lightfoot, Transport Phenomena, 2nd
 * ed. (2002), Table E.1 for N2, O2, CO2 (from memory); SO2 from Svehla (1962), NASA TR R-132 (from
 * memory). Water is not described by Lennard-Jones (it is polar): it uses the IAPWS formulas.
 */
const LJ: Readonly<Record<'N2' | 'O2' | 'CO2' | 'SO2', LennardJones>> = {
  N2: { sigmaAngstrom: 3.667, epsilonOverK: 99.8 },
  O2: { sigmaAngstrom: 3.433, epsilonOverK: 113 },
  CO2: { sigmaAngstrom: 3.996, epsilonOverK: 190 },
  SO2: { sigmaAngstrom: 4.112, epsilonOverK: 335.4 },
};

/**
 * Reduced collision integral for viscosity Ω(2,2)*(T*) of the Lennard-Jones 12-6 potential,
 * Neufeld, Janzen & Aziz (1972), J. Chem. Phys. 57:1100, doi:10.1063/1.1678363:
 * Ω = 1.16145 T*^−0.14874 + 0.52487 e^(−0.77320 T*) + 2.16178 e^(−2.43787 T*).
 * Valid 0.3 ≤ T* ≤ 100 (error < 0.064 %). Example: T* = 3.0 → 1.039.
 */
export function collisionIntegralViscosityNeufeld(reducedTemperature: number): number {
  const t = reducedTemperature;
  return 1.16145 * Math.pow(t, -0.14874) + 0.52487 * Math.exp(-0.7732 * t) + 2.16178 * Math.exp(-2.43787 * t);
}

/**
 * Dilute-gas viscosity by Chapman–Enskog theory, Pa s:
 * μ = 2.6693·10⁻⁶ √(M T) / (σ² Ω(2,2)*(T/(ε/k))), M in g/mol, σ in Å, T in K
 * (Bird, Stewart & Lightfoot 2002, eq. 1.4-14). Non-polar gases, low density; typically within
 * 1–3 %. Example: N2 (σ 3.667 Å, ε/k 99.8 K) at 300 K → 1.75·10⁻⁵ Pa s (handbooks: 1.78·10⁻⁵).
 */
export function viscosityChapmanEnskog(molarMass: number, lj: LennardJones, temperatureK: number): number {
  const mGramPerMol = molarMass * 1000;
  const omega = collisionIntegralViscosityNeufeld(temperatureK / lj.epsilonOverK);
  return (2.6693e-6 * Math.sqrt(mGramPerMol * temperatureK)) / (lj.sigmaAngstrom * lj.sigmaAngstrom * omega);
}

const WATER_CRITICAL_TEMPERATURE_K = 647.096;

/**
 * Viscosity of water vapour in the dilute-gas limit, Pa s (IAPWS 2008 formulation, Huber et al. 2009,
 * J. Phys. Chem. Ref. Data 38:101, eq. 11): μ0 = 100 √T̄ / Σ_{i=0..3} H_i / T̄^i μPa s, T̄ = T/647.096,
 * H = 1.67752, 2.20462, 0.6366564, −0.241605. Formulation range to 1173 K; extrapolates smoothly.
 * Example: 373.15 K → 12.34 μPa s.
 */
export function viscosityWaterVapourIapws2008(temperatureK: number): number {
  const t = temperatureK / WATER_CRITICAL_TEMPERATURE_K;
  const sum = 1.67752 + 2.20462 / t + 0.6366564 / (t * t) - 0.241605 / (t * t * t);
  return (100 * Math.sqrt(t)) / sum * 1e-6;
}

/**
 * Thermal conductivity of water vapour in the dilute-gas limit, W/(m K) (IAPWS 2011 formulation,
 * Huber et al. 2012, J. Phys. Chem. Ref. Data 41:033102, eq. 16): λ0 = √T̄ / Σ_{k=0..4} L_k / T̄^k mW/(m K),
 * L = 2.443221e−3, 1.323095e−2, 6.770357e−3, −3.454586e−3, 4.096266e−4. Example: 373.15 K → 0.0242 W/(m K).
 */
export function conductivityWaterVapourIapws2011(temperatureK: number): number {
  const t = temperatureK / WATER_CRITICAL_TEMPERATURE_K;
  const u = 1 / t;
  const sum = 2.443221e-3 + u * (1.323095e-2 + u * (6.770357e-3 + u * (-3.454586e-3 + u * 4.096266e-4)));
  return (Math.sqrt(t) / sum) * 1e-3;
}

/**
 * Critical temperature (K) and acentric factor of the non-polar species, for Chung's conductivity
 * method: Poling, Prausnitz & O'Connell, The Properties of Gases and Liquids, 5th ed. (2001),
 * Appendix A (from memory): N2 126.2 K / 0.037, O2 154.58 K / 0.022, CO2 304.12 K / 0.225,
 * SO2 430.8 K / 0.245.
 */
const CRITICAL: Readonly<Record<'N2' | 'O2' | 'CO2' | 'SO2', { temperatureK: number; acentric: number }>> = {
  N2: { temperatureK: 126.2, acentric: 0.037 },
  O2: { temperatureK: 154.58, acentric: 0.022 },
  CO2: { temperatureK: 304.12, acentric: 0.225 },
  SO2: { temperatureK: 430.8, acentric: 0.245 },
};

/**
 * Low-pressure thermal conductivity of a polyatomic gas by the method of Chung, Lee & Starling
 * (1984, Fluid Phase Equilib. 17:39) / Chung et al. (1988, Ind. Eng. Chem. Res. 27:671,
 * doi:10.1021/ie00076a024), as given by Poling et al. (2001), eqs. 10-3.14/10-3.15:
 * k M/(μ C_v) = 3.75 Ψ/(C_v/R),  Ψ = 1 + α (0.215 + 0.28288 α − 1.061 β + 0.26665 Z)/(0.6366 + β Z + 1.061 α β),
 * α = C_v/R − 3/2,  β = 0.7862 − 0.7109 ω + 1.3168 ω²,  Z = 2.0 + 10.5 T_r².
 * Units: μ Pa s, C_v J/(mol K), M kg/mol → W/(m K). Non-polar gases, typical error ±5 %.
 * Example: N2 at 300 K (μ 1.752e−5 Pa s, C_v 20.76 J/(mol K), T_c 126.2 K, ω 0.037) → 0.0260 W/(m K)
 * (handbooks: 0.0259).
 */
export function conductivityChung(
  dynamicViscosity: number,
  cvMolar: number,
  molarMass: number,
  temperatureK: number,
  criticalTemperatureK: number,
  acentricFactor: number,
): number {
  const alpha = cvMolar / GAS_CONSTANT - 1.5;
  const w = acentricFactor;
  const beta = 0.7862 - 0.7109 * w + 1.3168 * w * w;
  const tr = temperatureK / criticalTemperatureK;
  const z = 2.0 + 10.5 * tr * tr;
  const psi = 1 + (alpha * (0.215 + 0.28288 * alpha - 1.061 * beta + 0.26665 * z)) / (0.6366 + beta * z + 1.061 * alpha * beta);
  return (3.75 * psi * GAS_CONSTANT * dynamicViscosity) / molarMass;
}

/**
 * Wilke's (1950) interaction factor φ_ij = [1 + (μ_i/μ_j)^½ (M_j/M_i)^¼]² / [8 (1 + M_i/M_j)]^½
 * (J. Chem. Phys. 18:517, doi:10.1063/1.1747673). Mason & Saxena (1958, Phys. Fluids 1:361,
 * doi:10.1063/1.1724352) use the same form times ε for conductivity.
 */
function wilkePhi(muI: number, muJ: number, mI: number, mJ: number): number {
  const a = 1 + Math.sqrt(muI / muJ) * Math.pow(mJ / mI, 0.25);
  return (a * a) / Math.sqrt(8 * (1 + mI / mJ));
}

/**
 * Mixture viscosity by Wilke (1950): μ = Σ_i x_i μ_i / Σ_j x_j φ_ij, Pa s.
 * Accuracy a few per cent for non-polar mixtures (Poling et al. 2001, §9-5).
 * Example: 79 % N2 (1.75e−5) / 21 % O2 (2.06e−5) → 1.81e−5 Pa s.
 */
export function mixtureViscosityWilke(x: readonly number[], mu: readonly number[], molarMass: readonly number[]): number {
  let out = 0;
  for (let i = 0; i < x.length; i++) {
    if (x[i] <= 0) continue;
    let den = 0;
    for (let j = 0; j < x.length; j++) if (x[j] > 0) den += x[j] * wilkePhi(mu[i], mu[j], molarMass[i], molarMass[j]);
    out += (x[i] * mu[i]) / den;
  }
  return out;
}

/**
 * Mixture conductivity by Wassiljewa's equation k = Σ_i x_i k_i / Σ_j x_j A_ij with the Mason & Saxena
 * (1958) form A_ij = ε φ_ij (φ from Wilke). ε = 1.0 as recommended by Poling et al. (2001, §10-6);
 * Mason & Saxena's original value was 1.065. W/(m K).
 */
export function mixtureConductivityMasonSaxena(
  x: readonly number[],
  k: readonly number[],
  mu: readonly number[],
  molarMass: readonly number[],
  epsilon = 1.0,
): number {
  let out = 0;
  for (let i = 0; i < x.length; i++) {
    if (x[i] <= 0) continue;
    let den = 0;
    for (let j = 0; j < x.length; j++) {
      if (x[j] <= 0) continue;
      den += x[j] * (i === j ? 1 : epsilon * wilkePhi(mu[i], mu[j], molarMass[i], molarMass[j]));
    }
    out += (x[i] * k[i]) / den;
  }
  return out;
}

// ───────────────────────────── mixture ─────────────────────────────

/** Properties of a gas at one temperature and pressure (SI). */
export interface GasProperties {
  /** kg/m³ */
  readonly density: number;
  /** J/(kg K) */
  readonly specificHeat: number;
  /** W/(m K) */
  readonly conductivity: number;
  /** Pa s */
  readonly dynamicViscosity: number;
  /** – */
  readonly prandtl: number;
}

/** Dynamic viscosity of one species, Pa s. */
export function speciesViscosity(species: GasSpecies, temperatureK: number): number {
  if (species === 'H2O') return viscosityWaterVapourIapws2008(temperatureK);
  const lj = species === 'SO3' ? LJ.SO2 : LJ[species];
  return viscosityChapmanEnskog(SPECIES_MOLAR_MASS[species === 'SO3' ? 'SO2' : species], lj, temperatureK);
}

/** Thermal conductivity of one species, W/(m K). */
export function speciesConductivity(species: GasSpecies, temperatureK: number): number {
  if (species === 'H2O') return conductivityWaterVapourIapws2011(temperatureK);
  const s = species === 'SO3' ? 'SO2' : species;
  const c = CRITICAL[s];
  const cv = cpMolarNasa7(s, temperatureK) - GAS_CONSTANT;
  return conductivityChung(speciesViscosity(s, temperatureK), cv, SPECIES_MOLAR_MASS[s], temperatureK, c.temperatureK, c.acentric);
}

/**
 * All mixture properties at one temperature, computed directly (slow path; the table uses it).
 * Fractions are normalised. Valid about 250–2000 K (the ranges of the parts above).
 */
export function gasPropertiesAt(composition: GasComposition, pressurePa: number, temperatureK: number): GasProperties {
  const sum = GAS_SPECIES.reduce((a, s) => a + composition[s], 0);
  const x = GAS_SPECIES.map((s) => composition[s] / sum);
  const m = GAS_SPECIES.map((s) => SPECIES_MOLAR_MASS[s]);
  const mu = GAS_SPECIES.map((s) => speciesViscosity(s, temperatureK));
  const k = GAS_SPECIES.map((s) => speciesConductivity(s, temperatureK));
  let molarMass = 0;
  let cpMolar = 0;
  for (let i = 0; i < x.length; i++) {
    molarMass += x[i] * m[i];
    cpMolar += x[i] * cpMolarNasa7(GAS_SPECIES[i], temperatureK);
  }
  const specificHeat = cpMolar / molarMass;
  const dynamicViscosity = mixtureViscosityWilke(x, mu, m);
  const conductivity = mixtureConductivityMasonSaxena(x, k, mu, m);
  return {
    density: (pressurePa * molarMass) / (GAS_CONSTANT * temperatureK),
    specificHeat,
    conductivity,
    dynamicViscosity,
    prandtl: (specificHeat * dynamicViscosity) / conductivity,
  };
}

export interface GasTableRange {
  readonly fromK: number;
  readonly toK: number;
  readonly stepK: number;
}

/** A fast property lookup: linear interpolation in a precomputed table. */
/** Gas properties with writable fields (a scratch object for `GasPropertyLookup`). */
export type MutableGasProperties = { -readonly [K in keyof GasProperties]: GasProperties[K] };

/**
 * Gas properties at a temperature: a new object, or `into` filled and returned (no allocation, for
 * the model's hot path).
 */
export type GasPropertyLookup = (temperatureK: number, into?: MutableGasProperties) => GasProperties;

/**
 * Precompute the mixture properties on a temperature grid and return a fast lookup.
 * Between grid points: linear interpolation (cp, μ, k, Pr); density as p M/(R T) exactly.
 * Outside the grid: computed directly (slower; the parts stay valid roughly 200–3500 K).
 * Default grid 250–2000 K every 10 K; interpolation error there is below 0.01 % (curvature of the
 * smooth fits over 10 K).
 */
export function makeGasPropertyTable(
  composition: GasComposition,
  pressurePa: number,
  range: GasTableRange = { fromK: 250, toK: 2000, stepK: 10 },
): GasPropertyLookup {
  const { fromK, toK, stepK } = range;
  if (!(stepK > 0) || !(toK > fromK)) throw new RangeError(`gas property table: need toK > fromK and stepK > 0 (got ${fromK}…${toK} step ${stepK})`);
  const n = Math.ceil((toK - fromK) / stepK) + 1;
  const cp = new Float64Array(n);
  const mu = new Float64Array(n);
  const k = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const p = gasPropertiesAt(composition, pressurePa, fromK + i * stepK);
    cp[i] = p.specificHeat;
    mu[i] = p.dynamicViscosity;
    k[i] = p.conductivity;
  }
  const rhoT = (pressurePa * mixtureMolarMass(composition)) / GAS_CONSTANT; // density × T
  const lastK = fromK + (n - 1) * stepK;
  return (temperatureK: number, into?: MutableGasProperties): GasProperties => {
    if (!(temperatureK >= fromK && temperatureK <= lastK)) return gasPropertiesAt(composition, pressurePa, temperatureK);
    const u = (temperatureK - fromK) / stepK;
    const i = Math.min(Math.floor(u), n - 2);
    const f = u - i;
    const specificHeat = cp[i] + f * (cp[i + 1] - cp[i]);
    const dynamicViscosity = mu[i] + f * (mu[i + 1] - mu[i]);
    const conductivity = k[i] + f * (k[i + 1] - k[i]);
    const out = into ?? { density: 0, specificHeat: 0, conductivity: 0, dynamicViscosity: 0, prandtl: 0 };
    out.density = rhoT / temperatureK;
    out.specificHeat = specificHeat;
    out.conductivity = conductivity;
    out.dynamicViscosity = dynamicViscosity;
    out.prandtl = (specificHeat * dynamicViscosity) / conductivity;
    return out;
  };
}
