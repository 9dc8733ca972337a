/**
 * Fuel library: representative compositions for the combustion calculation (combustion.ts).
 *
 * Solid and liquid fuels are given by their ultimate analysis, as fired: mass fractions of carbon,
 * hydrogen, oxygen, nitrogen, sulfur, moisture and ash, summing to 1. Gaseous fuels are given by
 * volume (= mole) fractions of their components and converted to an ultimate analysis.
 *
 * The numbers are representative of each fuel class, not of any one delivery: real fuels vary
 * (sulfur above all, which decides the acid dew point). Give the actual analysis when it is known.
 */

/** Ultimate analysis, as fired: mass fractions summing to 1. */
export interface UltimateAnalysis {
  readonly C: number;
  readonly H: number;
  readonly O: number;
  readonly N: number;
  readonly S: number;
  readonly moisture: number;
  readonly ash: number;
}

/** Components a gaseous fuel may contain (volume fractions; absent means 0). */
export const GAS_FUEL_COMPONENTS = ['CH4', 'C2H6', 'C3H8', 'C4H10', 'H2', 'CO', 'CO2', 'N2', 'O2', 'H2S', 'H2O'] as const;
export type GasFuelComponent = (typeof GAS_FUEL_COMPONENTS)[number];
export type GasFuelComposition = Readonly<Partial<Record<GasFuelComponent, number>>>;

export type Fuel =
  | {
      readonly name: string;
      readonly description: string;
      readonly kind: 'ultimate';
      readonly ultimate: UltimateAnalysis;
      readonly source: string;
    }
  | {
      readonly name: string;
      readonly description: string;
      readonly kind: 'gas';
      readonly volumeFractions: GasFuelComposition;
      readonly source: string;
    };

/** Standard atomic weights, g/mol (IUPAC, conventional values). */
export const ATOMIC_MASS = { C: 12.011, H: 1.008, O: 15.999, N: 14.007, S: 32.06 } as const;

/** Atoms per molecule of each gaseous fuel component. */
const GAS_COMPONENT_ATOMS: Readonly<Record<GasFuelComponent, { C?: number; H?: number; O?: number; N?: number; S?: number }>> = {
  CH4: { C: 1, H: 4 },
  C2H6: { C: 2, H: 6 },
  C3H8: { C: 3, H: 8 },
  C4H10: { C: 4, H: 10 },
  H2: { H: 2 },
  CO: { C: 1, O: 1 },
  CO2: { C: 1, O: 2 },
  N2: { N: 2 },
  O2: { O: 2 },
  H2S: { H: 2, S: 1 },
  H2O: { H: 2, O: 1 },
};

/**
 * Convert a gaseous fuel's volume fractions to an ultimate analysis (mass fractions). Fuel water
 * vapour is reported as moisture. Fractions are normalised to sum to 1 first.
 * Example: pure CH4 → C 0.7487, H 0.2513.
 */
export function ultimateAnalysisFromGas(volumeFractions: GasFuelComposition): UltimateAnalysis {
  const mass = { C: 0, H: 0, O: 0, N: 0, S: 0, moisture: 0 };
  for (const comp of GAS_FUEL_COMPONENTS) {
    const x = volumeFractions[comp] ?? 0;
    if (x === 0) continue;
    if (comp === 'H2O') {
      mass.moisture += x * (2 * ATOMIC_MASS.H + ATOMIC_MASS.O);
      continue;
    }
    const atoms = GAS_COMPONENT_ATOMS[comp];
    mass.C += x * (atoms.C ?? 0) * ATOMIC_MASS.C;
    mass.H += x * (atoms.H ?? 0) * ATOMIC_MASS.H;
    mass.O += x * (atoms.O ?? 0) * ATOMIC_MASS.O;
    mass.N += x * (atoms.N ?? 0) * ATOMIC_MASS.N;
    mass.S += x * (atoms.S ?? 0) * ATOMIC_MASS.S;
  }
  const total = mass.C + mass.H + mass.O + mass.N + mass.S + mass.moisture;
  if (!(total > 0)) throw new RangeError('gaseous fuel: all volume fractions are zero');
  return {
    C: mass.C / total,
    H: mass.H / total,
    O: mass.O / total,
    N: mass.N / total,
    S: mass.S / total,
    moisture: mass.moisture / total,
    ash: 0,
  };
}

/** The ultimate analysis of any fuel (gas fuels converted). */
export function ultimateAnalysisOf(fuel: Fuel | UltimateAnalysis): UltimateAnalysis {
  if ('kind' in fuel) return fuel.kind === 'gas' ? ultimateAnalysisFromGas(fuel.volumeFractions) : fuel.ultimate;
  return fuel;
}

/** Problems with an ultimate analysis (negative or non-finite fractions, sum not 1 within 0.5 %). */
export function validateUltimateAnalysis(u: UltimateAnalysis): string[] {
  const out: string[] = [];
  const keys = ['C', 'H', 'O', 'N', 'S', 'moisture', 'ash'] as const;
  for (const k of keys) if (!Number.isFinite(u[k]) || u[k] < 0) out.push(`ultimate analysis: ${k} = ${u[k]} must be a fraction ≥ 0`);
  const sum = keys.reduce((a, k) => a + u[k], 0);
  // 0.5 %: published analyses are rounded to 0.1 % per element, seven entries.
  if (Math.abs(sum - 1) > 0.005) out.push(`ultimate analysis: fractions sum to ${sum.toFixed(4)}, expected 1 (mass fractions, as fired)`);
  return out;
}

/** Library fuels, by key. */
export const FUELS = {
  'natural-gas': {
    name: 'natural-gas',
    description: 'Pipeline natural gas, about 93 % methane, sulfur-free (odorant neglected)',
    kind: 'gas',
    volumeFractions: { CH4: 0.93, C2H6: 0.04, C3H8: 0.01, C4H10: 0.004, N2: 0.01, CO2: 0.006 },
    source:
      'Representative pipeline gas within the usual ranges (CH4 87–97 %, C2H6 1.5–7 %, C3H8 0.1–1.5 %, N2 0.2–5.5 %, CO2 0.1–1 %); from memory, common practice',
  },
  'light-fuel-oil': {
    name: 'light-fuel-oil',
    description: 'Light fuel oil / No. 2 heating oil (gas oil), 0.2 % sulfur',
    kind: 'ultimate',
    ultimate: { C: 0.8695, H: 0.1270, O: 0.0010, N: 0.0002, S: 0.0020, moisture: 0.0002, ash: 0.0001 },
    source:
      'Typical No. 2 fuel oil analysis as tabulated in the Babcock & Wilcox "Steam: its generation and use" fuel-oil tables (C about 87 %, H 12.5–13 %, S 0.1–0.7 %); from memory',
  },
  'heavy-fuel-oil': {
    name: 'heavy-fuel-oil',
    description: 'Heavy fuel oil / No. 6 residual oil, 2.5 % sulfur',
    kind: 'ultimate',
    ultimate: { C: 0.8550, H: 0.1070, O: 0.0050, N: 0.0040, S: 0.0250, moisture: 0.0030, ash: 0.0010 },
    source:
      'Typical No. 6 fuel oil analysis as tabulated in the Babcock & Wilcox "Steam: its generation and use" fuel-oil tables (C 85–87 %, H 10–11 %, S 0.7–3.5 %); from memory',
  },
  'bituminous-coal': {
    name: 'bituminous-coal',
    description: 'High-volatile bituminous coal, as received, 2 % sulfur',
    kind: 'ultimate',
    ultimate: { C: 0.65, H: 0.045, O: 0.075, N: 0.013, S: 0.02, moisture: 0.08, ash: 0.117 },
    source:
      'Representative as-received ultimate analysis of a high-volatile bituminous coal, in the range of the coal tables of Perry\'s Chemical Engineers\' Handbook and of Babcock & Wilcox "Steam"; from memory',
  },
  wood: {
    name: 'wood',
    description: 'Wood chips / logs at 20 % moisture (as fired)',
    kind: 'ultimate',
    ultimate: { C: 0.4, H: 0.048, O: 0.3424, N: 0.0016, S: 0.00016, moisture: 0.2, ash: 0.00784 },
    source:
      'Dry wood about C 50 %, H 6 %, O 42.8 %, N 0.2 %, S 0.02 %, ash 1 % (values common to handbooks, e.g. Perry\'s fuel tables), scaled to 20 % moisture; from memory',
  },
} as const satisfies Record<string, Fuel>;

export type FuelName = keyof typeof FUELS;

/** Look a library fuel up by key; throws a RangeError naming the known keys. */
export function fuelByName(name: string): Fuel {
  const f = (FUELS as Record<string, Fuel>)[name];
  if (!f) throw new RangeError(`unknown fuel "${name}"; known fuels: ${Object.keys(FUELS).join(', ')}`);
  return f;
}
