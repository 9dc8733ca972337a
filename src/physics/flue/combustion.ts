/**
 * Flue-gas composition from a fuel and its excess air, by stoichiometry, or from a measured
 * composition.
 *
 * Complete combustion is assumed: C + O2 → CO2, H2 + ½ O2 → H2O, S + O2 → SO2 (a fraction of the
 * sulfur goes on to SO3: S + 1½ O2 → SO3). Fuel oxygen reduces the air needed, fuel nitrogen leaves
 * as N2 (NOx neglected), fuel moisture and the humidity of the combustion air leave as H2O, ash
 * leaves the gas. Air is dry air of `airAsFlueGas` (argon counted as N2) plus its humidity.
 * No CO or unburnt fuel: excess air must be ≥ 0.
 */
import { MOLAR_MASS_AIR } from '../constants.ts';
import {
  airAsFlueGas,
  GAS_SPECIES,
  mixtureMolarMass,
  SPECIES_MOLAR_MASS,
  type GasComposition,
  type GasSpecies,
} from '../properties/flueGas.ts';
import { ATOMIC_MASS, ultimateAnalysisOf, validateUltimateAnalysis, type Fuel, type UltimateAnalysis } from './fuels.ts';

export type { GasComposition } from '../properties/flueGas.ts';

export interface CombustionOptions {
  /**
   * Fraction of the fuel sulfur converted to SO3, default 0.02. Common practice: 1–5 % in boilers
   * (more with vanadium-bearing oil ash or over catalysts), 2 % is a usual design figure.
   */
  readonly sulfurToSO3?: number;
  /**
   * Humidity of the combustion air, kg water per kg dry air, default 0.01 (about 20 °C at 70 %
   * relative humidity; common practice: design calculations often take 0.013 for 27 °C / 60 %).
   */
  readonly combustionAirHumidity?: number;
}

/** Amounts per kilogram of fuel, mol/kg. */
export interface CombustionProducts {
  /** Flue gas, mol of each species per kg fuel (argon counted in N2). */
  readonly molesPerKgFuel: Readonly<Record<GasSpecies, number>>;
  /** O2 for complete combustion to CO2, H2O, SO2, net of fuel oxygen, mol/kg fuel. */
  readonly stoichiometricO2: number;
  /** Dry combustion air supplied, mol/kg fuel (composition `airAsFlueGas`). */
  readonly dryAirMoles: number;
  /** Water vapour carried in with the air, mol/kg fuel. */
  readonly airWaterMoles: number;
}

const DEFAULT_SULFUR_TO_SO3 = 0.02;
const DEFAULT_AIR_HUMIDITY = 0.01;

/**
 * Moles of flue gas per kg of fuel for a given excess air (fraction, e.g. 0.15 for 15 %).
 * Per kg fuel: n_C = C/12.011, n_H2 = H/2.016, n_S = S/32.06, n_O2,fuel = O/31.998;
 * O2,stoich = n_C + n_H2/2 + n_S − n_O2,fuel; O2 supplied = (1 + excessAir)·O2,stoich;
 * flue O2 = excessAir·O2,stoich − ½ n_SO3.
 * Example: CH4 (0.0623 kmol/kg), excessAir 0 → CO2 62.3, H2O 124.7, N2 470 mol/kg (humidity 0).
 */
export function combustionProducts(fuel: Fuel | UltimateAnalysis, excessAir: number, options: CombustionOptions = {}): CombustionProducts {
  const u = ultimateAnalysisOf(fuel);
  const problems = validateUltimateAnalysis(u);
  if (problems.length) throw new RangeError(problems.join('; '));
  if (!Number.isFinite(excessAir) || excessAir < 0)
    throw new RangeError(`excess air ${excessAir} must be a fraction ≥ 0 (e.g. 0.15 for 15 %); sub-stoichiometric combustion is not modelled`);
  const sulfurToSO3 = options.sulfurToSO3 ?? DEFAULT_SULFUR_TO_SO3;
  if (!(sulfurToSO3 >= 0 && sulfurToSO3 <= 1)) throw new RangeError(`sulfurToSO3 ${sulfurToSO3} must be a fraction between 0 and 1`);
  const humidity = options.combustionAirHumidity ?? DEFAULT_AIR_HUMIDITY;
  if (!(humidity >= 0 && Number.isFinite(humidity))) throw new RangeError(`combustionAirHumidity ${humidity} must be ≥ 0 (kg water per kg dry air)`);

  // mol per kg fuel (mass fraction in kg/kg divided by kg/mol)
  const nC = u.C / (ATOMIC_MASS.C / 1000);
  const nH2 = u.H / ((2 * ATOMIC_MASS.H) / 1000);
  const nS = u.S / (ATOMIC_MASS.S / 1000);
  const nO2Fuel = u.O / ((2 * ATOMIC_MASS.O) / 1000);
  const nN2Fuel = u.N / ((2 * ATOMIC_MASS.N) / 1000);
  const nH2OFuel = u.moisture / SPECIES_MOLAR_MASS.H2O;

  const stoichiometricO2 = nC + nH2 / 2 + nS - nO2Fuel;
  if (!(stoichiometricO2 > 0)) throw new RangeError('fuel needs no oxygen (its own oxygen covers C, H and S): not a fuel');
  const dryAirMoles = ((1 + excessAir) * stoichiometricO2) / airAsFlueGas.O2;
  // Humidity is per kg of real dry air (28.96 g/mol, argon included).
  const airWaterMoles = (humidity * dryAirMoles * MOLAR_MASS_AIR) / SPECIES_MOLAR_MASS.H2O;
  const nSO3 = sulfurToSO3 * nS;

  const molesPerKgFuel: Record<GasSpecies, number> = {
    N2: dryAirMoles * airAsFlueGas.N2 + nN2Fuel,
    O2: excessAir * stoichiometricO2 - 0.5 * nSO3,
    CO2: nC + dryAirMoles * airAsFlueGas.CO2,
    H2O: nH2 + nH2OFuel + airWaterMoles,
    SO2: nS - nSO3,
    SO3: nSO3,
  };
  // At zero excess air the extra ½ O2 per SO3 has nowhere to come from: take it as zero (it is ppm).
  if (molesPerKgFuel.O2 < 0) molesPerKgFuel.O2 = 0;
  return { molesPerKgFuel, stoichiometricO2, dryAirMoles, airWaterMoles };
}

/**
 * Wet flue-gas mole fractions { N2, O2, CO2, H2O, SO2, SO3 } (sum 1; argon counted as N2) from a fuel
 * burnt completely with `excessAir` (fraction, e.g. 0.15).
 * Example: methane, excessAir 0, dry air → CO2 9.5 %, H2O 19 %, N2 71.5 %.
 */
export function flueGasFromFuel(fuel: Fuel | UltimateAnalysis, excessAir: number, options: CombustionOptions = {}): GasComposition {
  return normaliseComposition(combustionProducts(fuel, excessAir, options).molesPerKgFuel);
}

/** A measured or given flue-gas composition (mole/volume fractions, wet basis; SO3 in ppm by volume). */
export interface VolumeFractionInput {
  readonly N2: number;
  readonly O2: number;
  readonly CO2: number;
  readonly H2O: number;
  readonly SO2?: number;
  /** SO3, parts per million by volume (wet). */
  readonly SO3Ppm?: number;
}

/**
 * Normalise a user composition: SO3 is fixed at its ppm value, the other fractions are scaled to
 * make up the rest (so an analysis summing to 0.98 or 100.5 % is accepted as given in proportion).
 * Throws a RangeError for negative or non-finite entries or an all-zero composition.
 */
export function flueGasFromVolumeFractions(input: VolumeFractionInput): GasComposition {
  const so3 = (input.SO3Ppm ?? 0) * 1e-6;
  const main = { N2: input.N2, O2: input.O2, CO2: input.CO2, H2O: input.H2O, SO2: input.SO2 ?? 0 };
  for (const [k, v] of Object.entries({ ...main, SO3Ppm: input.SO3Ppm ?? 0 }))
    if (!Number.isFinite(v) || v < 0) throw new RangeError(`flue gas composition: ${k} = ${v} must be ≥ 0`);
  if (so3 >= 1) throw new RangeError(`flue gas composition: SO3 ${input.SO3Ppm} ppm is not a trace amount`);
  const sum = main.N2 + main.O2 + main.CO2 + main.H2O + main.SO2;
  if (!(sum > 0)) throw new RangeError('flue gas composition: all fractions are zero');
  const scale = (1 - so3) / sum;
  return {
    N2: main.N2 * scale,
    O2: main.O2 * scale,
    CO2: main.CO2 * scale,
    H2O: main.H2O * scale,
    SO2: main.SO2 * scale,
    SO3: so3,
  };
}

/** Mean molar mass of a flue gas, kg/mol. Example: air (Ar as N2) → 0.02886. */
export function molarMass(composition: GasComposition): number {
  return mixtureMolarMass(composition);
}

/** Dry-basis fraction of a species (what a flue-gas analyser reports after drying the sample). */
export function dryBasisFraction(composition: GasComposition, species: Exclude<GasSpecies, 'H2O'>): number {
  return composition[species] / (1 - composition.H2O);
}

function normaliseComposition(moles: Readonly<Record<GasSpecies, number>>): GasComposition {
  const total = GAS_SPECIES.reduce((a, s) => a + moles[s], 0);
  const out = {} as Record<GasSpecies, number>;
  for (const s of GAS_SPECIES) out[s] = moles[s] / total;
  return out;
}
