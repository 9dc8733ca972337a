/**
 * One typed table of the heat-transfer correlations: name → function, inputs, validity ranges,
 * description and source. Callers select a correlation by name here (never a hand-kept if/else
 * chain), and ask `checkValidity` for a warning when an input is outside the published range
 * (a warning for the run summary, not an exception).
 */

import {
  nuCylinderChurchillBernstein,
  nuMixedChurchill,
  nuVerticalPlateChurchillChu,
  POPIEL_MAX_RAYLEIGH,
  slenderCylinderFactorPopiel,
} from './external.ts';
import {
  frictionFactorPetukhov,
  NU_PIPE_LAMINAR_CONSTANT_WALL,
  nuPipeBlended,
  nuPipeGnielinski,
  RE_LAMINAR_LIMIT,
} from './internal.ts';
import {
  effectiveConductivityRatioAnnulusRaithbyHollands,
  rayleighAnnulusRaithbyHollands,
} from './enclosure.ts';

/** Closed interval [min, max] of an input. */
export type Range = readonly [min: number, max: number];

/** A validity condition that involves several inputs (e.g. Re·Pr > 0.2). */
export interface Constraint<K extends string> {
  /** Shown in the warning, e.g. "Re·Pr ≥ 0.2". */
  readonly label: string;
  readonly holds: (inputs: Readonly<Record<K, number>>) => boolean;
}

export interface CorrelationEntry<K extends string> {
  /** Names of the inputs, in the order of the underlying function's parameters. */
  readonly inputs: readonly K[];
  readonly fn: (inputs: Readonly<Record<K, number>>) => number;
  readonly description: string;
  readonly source: string;
  /** Published validity range of single inputs. */
  readonly ranges: Readonly<Partial<Record<K, Range>>>;
  /** Validity conditions on combinations of inputs. */
  readonly constraints: readonly Constraint<K>[];
}

/** Identity that lets TypeScript infer each entry's input names. */
function entry<const K extends string>(e: CorrelationEntry<K>): CorrelationEntry<K> {
  return e;
}

export const CORRELATIONS = {
  nuCylinderChurchillBernstein: entry({
    inputs: ['re', 'pr'],
    fn: ({ re, pr }) => nuCylinderChurchillBernstein(re, pr),
    description:
      'Average Nu_D of a circular cylinder in cross flow; Re and Nu on the outer diameter, film properties.',
    source:
      'Churchill & Bernstein, J. Heat Transfer 99 (1977) 300–306, doi:10.1115/1.3450685',
    // Upper Re: the data correlated reach about 10⁷ (from memory).
    ranges: { re: [0, 1e7], pr: [0, Infinity] },
    constraints: [{ label: 'Re·Pr ≥ 0.2', holds: ({ re, pr }) => re * pr >= 0.2 }],
  }),
  nuVerticalPlateChurchillChu: entry({
    inputs: ['ra', 'pr'],
    fn: ({ ra, pr }) => nuVerticalPlateChurchillChu(ra, pr),
    description:
      'Average Nu_L of an isothermal vertical plate, laminar and turbulent; Ra and Nu on the height, film properties.',
    source:
      'Churchill & Chu, Int. J. Heat Mass Transfer 18 (1975) 1323–1329, doi:10.1016/0017-9310(75)90243-4',
    // 10⁻¹ ≤ Ra_L ≤ 10¹² as quoted by Incropera & DeWitt (from memory).
    ranges: { ra: [0.1, 1e12], pr: [0, Infinity] },
    constraints: [],
  }),
  slenderCylinderFactorPopiel: entry({
    inputs: ['grashofHeight', 'pr', 'height', 'diameter'],
    fn: ({ grashofHeight, pr, height, diameter }) =>
      slenderCylinderFactorPopiel(grashofHeight, pr, height, diameter),
    description:
      'Ratio Nu_cylinder/Nu_plate for a slender vertical cylinder in laminar natural convection.',
    source:
      'Popiel, Wojtkowiak & Bober, Exp. Thermal Fluid Sci. 32 (2007) 607–613, doi:10.1016/j.expthermflusci.2007.07.003',
    ranges: { pr: [0.01, 100], grashofHeight: [0, Infinity] },
    constraints: [
      {
        label: `laminar: Ra_L = Gr_L·Pr ≤ ${POPIEL_MAX_RAYLEIGH.toExponential(0)}`,
        holds: ({ grashofHeight, pr }) => grashofHeight * pr <= POPIEL_MAX_RAYLEIGH,
      },
    ],
  }),
  nuMixedChurchill: entry({
    inputs: ['nuForced', 'nuNatural'],
    fn: ({ nuForced, nuNatural }) => nuMixedChurchill(nuForced, nuNatural, 3),
    description:
      'Mixed convection (Nu_F³ + Nu_N³)^(1/3); both Nusselt numbers on the same length.',
    source: 'Churchill, AIChE J. 23 (1977) 10–16; exponent 3 is common practice',
    ranges: { nuForced: [0, Infinity], nuNatural: [0, Infinity] },
    constraints: [],
  }),
  frictionFactorPetukhov: entry({
    inputs: ['re'],
    fn: ({ re }) => frictionFactorPetukhov(re),
    description: 'Darcy friction factor of a smooth tube, turbulent flow.',
    source: 'Petukhov, Advances in Heat Transfer 6 (1970) 503–564',
    ranges: { re: [3000, 5e6] },
    constraints: [],
  }),
  nuPipeGnielinski: entry({
    inputs: ['re', 'pr'],
    fn: ({ re, pr }) => nuPipeGnielinski(re, pr),
    description:
      'Average Nu_D of fully developed turbulent flow in a smooth tube; bulk properties.',
    source: 'Gnielinski, Int. Chem. Eng. 16 (1976) 359–368',
    ranges: { re: [3000, 5e6], pr: [0.5, 2000] },
    constraints: [],
  }),
  nuPipeLaminarConstantWall: entry({
    inputs: ['re'],
    fn: () => NU_PIPE_LAMINAR_CONSTANT_WALL,
    description: 'Fully developed laminar flow in a tube at uniform wall temperature, Nu = 3.66.',
    source: 'Graetz problem; e.g. Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, eq. 8.55',
    ranges: { re: [0, RE_LAMINAR_LIMIT] },
    constraints: [],
  }),
  nuPipeBlended: entry({
    inputs: ['re', 'pr'],
    fn: ({ re, pr }) => nuPipeBlended(re, pr),
    description:
      'Tube Nu over all Re: 3.66 laminar, linear in Re from 2300 to 10⁴, Gnielinski above; bulk properties.',
    source:
      'Gnielinski, Int. J. Heat Mass Transfer 63 (2013) 134–140, doi:10.1016/j.ijheatmasstransfer.2013.04.015',
    ranges: { re: [0, 5e6], pr: [0.5, 2000] },
    constraints: [],
  }),
  effectiveConductivityRatioAnnulusRaithbyHollands: entry({
    inputs: ['innerDiameter', 'outerDiameter', 'rayleighGap', 'pr'],
    fn: ({ innerDiameter, outerDiameter, rayleighGap, pr }) =>
      effectiveConductivityRatioAnnulusRaithbyHollands(innerDiameter, outerDiameter, rayleighGap, pr),
    description:
      'k_eff/k of a concentric-cylinder annulus (≥ 1); Ra on the gap width, properties at the mean gap temperature.',
    source:
      'Raithby & Hollands, Advances in Heat Transfer 11 (1975) 265–315; as in Incropera & DeWitt eqs. 9.58–9.60',
    // Pr range from memory. Below Ra_c = 100 the max(1, …) gives conduction, which is valid, so
    // only the upper end of 10² ≤ Ra_c ≤ 10⁷ is flagged.
    ranges: { pr: [0.7, 6000] },
    constraints: [
      {
        label: 'D_o > D_i > 0',
        holds: ({ innerDiameter, outerDiameter }) => outerDiameter > innerDiameter && innerDiameter > 0,
      },
      {
        label: 'Ra_c ≤ 1e7',
        holds: ({ innerDiameter, outerDiameter, rayleighGap }) =>
          rayleighAnnulusRaithbyHollands(innerDiameter, outerDiameter, Math.abs(rayleighGap)) <= 1e7,
      },
    ],
  }),
} as const;

export type CorrelationName = keyof typeof CORRELATIONS;

/** The inputs object a named correlation takes, e.g. `{ re: number; pr: number }`. */
export type CorrelationInputs<N extends CorrelationName> = Parameters<
  (typeof CORRELATIONS)[N]['fn']
>[0];

/** All names in the table. */
export const CORRELATION_NAMES = Object.keys(CORRELATIONS) as CorrelationName[];

/** The entry as a loosely keyed record, for code that walks every entry. */
function looseEntry(name: CorrelationName): CorrelationEntry<string> {
  return CORRELATIONS[name] as unknown as CorrelationEntry<string>;
}

/**
 * A warning when any input lies outside the correlation's published validity range, or a
 * multi-input condition fails; `null` when all inputs are within range. Never throws for
 * out-of-range values (the caller decides what to do: usually record it in the run summary).
 * A missing or non-numeric input (NaN) is also reported.
 */
export function checkValidity<N extends CorrelationName>(
  name: N,
  inputs: CorrelationInputs<N>,
): string | null {
  const e = looseEntry(name);
  const values = inputs as Readonly<Record<string, number>>;
  const problems: string[] = [];
  for (const key of e.inputs) {
    const v = values[key];
    if (typeof v !== 'number' || Number.isNaN(v)) {
      problems.push(`${key} is not a number`);
      continue;
    }
    const range = e.ranges[key];
    if (range && (v < range[0] || v > range[1])) {
      problems.push(`${key} = ${formatNumber(v)} outside [${formatNumber(range[0])}, ${formatNumber(range[1])}]`);
    }
  }
  if (problems.length === 0) {
    for (const c of e.constraints) {
      if (!c.holds(values)) problems.push(`violates ${c.label}`);
    }
  }
  return problems.length === 0
    ? null
    : `${name}: ${problems.join('; ')} (${e.source}); value extrapolated`;
}

/** Call a correlation by its table name with named inputs. */
export function callCorrelation<N extends CorrelationName>(
  name: N,
  inputs: CorrelationInputs<N>,
): number {
  return looseEntry(name).fn(inputs as Readonly<Record<string, number>>);
}

/** A number for messages: 3 significant figures, exponent form for very large or small values. */
function formatNumber(v: number): string {
  if (!Number.isFinite(v)) return String(v);
  return Math.abs(v) >= 1e5 || (v !== 0 && Math.abs(v) < 1e-3) ? v.toExponential(2) : String(Number(v.toPrecision(4)));
}
