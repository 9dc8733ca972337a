/**
 * One typed table of the heat-transfer correlations: name → function, inputs, validity ranges,
 * description and source. The model selects the correlation for each of its roles by name here
 * (model/correlations.ts; never a hand-kept if/else chain), and every evaluation at a reported
 * instant (at most one every 10 min, model/recorder.ts) is range-checked through `CorrelationRangeTally` (a warning for the run summary, not an
 * exception). The model descriptions in the README and the report are generated from the entries
 * (`describeCorrelation`).
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
import { nuVerticalCavityElSherbiny, VERTICAL_CAVITY_ELSHERBINY_RANGE } from './cavity.ts';
import { mixedConvectionChurchill, MIXED_CONVECTION_RANGE } from './internal.ts';
import { gasEmissivityWsgg, WSGG_SMITH_1982 } from './gasRadiation.ts';

/** Closed interval [min, max] of an input. */
export type Range = readonly [min: number, max: number];

/** A validity condition that involves several inputs (e.g. Re·Pr > 0.2). */
export interface Constraint<K extends string> {
  /** Shown in the warning, e.g. "Re·Pr ≥ 0.2". */
  readonly label: string;
  readonly holds: (inputs: Readonly<Record<K, number>>) => boolean;
}

export interface CorrelationEntry<K extends string> {
  /** Short name with author and year, e.g. "Churchill–Bernstein (1977)". */
  readonly title: string;
  /** Names of the inputs, in the order of the underlying function's parameters. */
  readonly inputs: readonly K[];
  /** The function itself, inputs positional in the order of `inputs` (what the model evaluates). */
  readonly compute: (...inputs: number[]) => number;
  /** The same with named inputs (derived from `compute`; for calls by name). */
  readonly fn: (inputs: Readonly<Record<K, number>>) => number;
  readonly description: string;
  readonly source: string;
  /** Published validity range of single inputs. */
  readonly ranges: Readonly<Partial<Record<K, Range>>>;
  /** Validity conditions on combinations of inputs. */
  readonly constraints: readonly Constraint<K>[];
  /**
   * Sides of the published range beyond which the literature accepts the extrapolation: such use is
   * listed once in the run's assumptions, not warned about. Any other use beyond the range is a
   * warning saying by how much and where.
   */
  readonly accepted?: readonly AcceptedExtrapolation<K>[];
}

/** An accepted extrapolation: beyond which bound of which input, and why it is accepted. */
export interface AcceptedExtrapolation<K extends string> {
  readonly input: K;
  readonly side: 'above' | 'below';
  readonly reason: string;
}

/** Builds an entry (its named-input `fn` from `compute`) and lets TypeScript infer the input names. */
function entry<const K extends string>(e: Omit<CorrelationEntry<K>, 'fn'>): CorrelationEntry<K> {
  return { ...e, fn: (inputs) => e.compute(...e.inputs.map((k) => inputs[k])) };
}

export const CORRELATIONS = {
  nuCylinderChurchillBernstein: entry({
    title: 'Churchill–Bernstein (1977)',
    inputs: ['re', 'pr'],
    compute: nuCylinderChurchillBernstein,
    description:
      'Average Nu_D of a circular cylinder in cross flow; Re and Nu on the outer diameter, film properties.',
    source:
      'Churchill & Bernstein, J. Heat Transfer 99 (1977) 300–306, doi:10.1115/1.3450685',
    // Upper Re: the data correlated reach about 10⁷ (from memory).
    ranges: { re: [0, 1e7], pr: [0, Infinity] },
    constraints: [{ label: 'Re·Pr ≥ 0.2', holds: ({ re, pr }) => re * pr >= 0.2 }],
  }),
  nuVerticalPlateChurchillChu: entry({
    title: 'Churchill–Chu (1975)',
    inputs: ['ra', 'pr'],
    compute: nuVerticalPlateChurchillChu,
    description:
      'Average Nu_L of an isothermal vertical plate, laminar and turbulent; Ra and Nu on the height, film properties.',
    source:
      'Churchill & Chu, Int. J. Heat Mass Transfer 18 (1975) 1323–1329, doi:10.1016/0017-9310(75)90243-4',
    // 10⁻¹ ≤ Ra_L ≤ 10¹² as quoted by Incropera & DeWitt (from memory).
    ranges: { ra: [0.1, 1e12], pr: [0, Infinity] },
    constraints: [],
    accepted: [
      {
        input: 'ra',
        side: 'above',
        reason:
          'the turbulent branch tends to Nu ∝ Ra^(1/3), which makes h independent of the height, as turbulent free-convection data on tall surfaces show; the accepted extrapolation for tall stacks (common practice)',
      },
    ],
  }),
  slenderCylinderFactorPopiel: entry({
    title: 'Popiel, Wojtkowiak & Bober (2007)',
    inputs: ['grashofHeight', 'pr', 'height', 'diameter'],
    compute: slenderCylinderFactorPopiel,
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
    title: 'Churchill (1977) mixed convection',
    inputs: ['nuForced', 'nuNatural'],
    compute: (nuForced, nuNatural) => nuMixedChurchill(nuForced, nuNatural, 3),
    description:
      'Mixed convection (Nu_F³ + Nu_N³)^(1/3); both Nusselt numbers on the same length.',
    source: 'Churchill, AIChE J. 23 (1977) 10–16; exponent 3 is common practice',
    ranges: { nuForced: [0, Infinity], nuNatural: [0, Infinity] },
    constraints: [],
  }),
  frictionFactorPetukhov: entry({
    title: 'Petukhov (1970)',
    inputs: ['re'],
    compute: frictionFactorPetukhov,
    description: 'Darcy friction factor of a smooth tube, turbulent flow.',
    source: 'Petukhov, Advances in Heat Transfer 6 (1970) 503–564',
    ranges: { re: [3000, 5e6] },
    constraints: [],
  }),
  nuPipeGnielinski: entry({
    title: 'Gnielinski (1976)',
    inputs: ['re', 'pr'],
    compute: (re, pr) => nuPipeGnielinski(re, pr),
    description:
      'Average Nu_D of fully developed turbulent flow in a smooth tube; bulk properties.',
    source: 'Gnielinski, Int. Chem. Eng. 16 (1976) 359–368',
    ranges: { re: [3000, 5e6], pr: [0.5, 2000] },
    constraints: [],
  }),
  nuPipeLaminarConstantWall: entry({
    title: 'Laminar tube flow, Nu = 3.66',
    inputs: ['re'],
    compute: () => NU_PIPE_LAMINAR_CONSTANT_WALL,
    description: 'Fully developed laminar flow in a tube at uniform wall temperature, Nu = 3.66.',
    source: 'Graetz problem; e.g. Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, eq. 8.55',
    ranges: { re: [0, RE_LAMINAR_LIMIT] },
    constraints: [],
  }),
  nuPipeBlended: entry({
    title: 'Gnielinski (1976/2013) with laminar blend',
    inputs: ['re', 'pr'],
    compute: nuPipeBlended,
    description:
      'Tube Nu over all Re: 3.66 laminar, linear in Re from 2300 to 10⁴, Gnielinski above; bulk properties.',
    source:
      'Gnielinski, Int. J. Heat Mass Transfer 63 (2013) 134–140, doi:10.1016/j.ijheatmasstransfer.2013.04.015',
    ranges: { re: [0, 5e6], pr: [0.5, 2000] },
    constraints: [],
  }),
  effectiveConductivityRatioAnnulusRaithbyHollands: entry({
    title: 'Raithby–Hollands (1975) annulus',
    inputs: ['innerDiameter', 'outerDiameter', 'rayleighGap', 'pr'],
    compute: effectiveConductivityRatioAnnulusRaithbyHollands,
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
  nuVerticalCavityElSherbiny: entry({
    title: 'ElSherbiny, Raithby & Hollands (1982) vertical air layer',
    inputs: ['ra', 'aspectRatio'],
    compute: nuVerticalCavityElSherbiny,
    description:
      'Nu across a vertical air layer, k_eff/k of the gap; Ra on the gap width, aspect ratio = segment height / gap width, properties at the mean gap temperature (air).',
    source: VERTICAL_CAVITY_ELSHERBINY_RANGE.source,
    ranges: { ra: VERTICAL_CAVITY_ELSHERBINY_RANGE.rayleigh, aspectRatio: VERTICAL_CAVITY_ELSHERBINY_RANGE.aspectRatio },
    constraints: [],
    accepted: [
      { input: 'ra', side: 'below', reason: 'below the range the layer conducts (Nu → 1, exact)' },
      { input: 'aspectRatio', side: 'above', reason: 'in taller layers only the aspect-independent terms remain, as expected for very tall slots' },
    ],
  }),
  mixedConvectionChurchillSigned: entry({
    title: 'Churchill (1977) mixed convection, aiding or opposing',
    inputs: ['forced', 'natural', 'aiding'],
    compute: (forced, natural, aiding) => mixedConvectionChurchill(forced, natural, aiding === 1),
    description:
      'Inside film of the forced flow and the natural convection on the lining together: (h_F³ + h_N³)^(1/3) where buoyancy aids the flow (a wall warmer than the gas), |h_F³ − h_N³|^(1/3) where it opposes a laminar flow; opposing a turbulent flow, the aiding sum (opposing buoyancy raises turbulent heat transfer: Jackson, Cotton & Axcell 1989, from memory).',
    source: MIXED_CONVECTION_RANGE.source,
    ranges: {},
    constraints: [],
  }),
  gasEmissivityWsggSmith: entry({
    title: 'Smith, Shen & Friedman (1982) weighted sum of grey gases',
    inputs: ['temperature', 'pathLength', 'ratio'],
    compute: (temperature, pathLength, ratio) => gasEmissivityWsgg(temperature, pathLength, ratio, WSGG_SMITH_1982),
    description:
      'Total emissivity of the H2O–CO2 flue gas (absorptivity with the weights at the wall temperature), mean beam length 0.95 D; exchange with the grey lining σ(ε_w + 1)/2 (ε_g T_g⁴ − α_g T_w⁴). Temperature in K, path length (p_H2O + p_CO2)·L in atm·m, ratio p_H2O/p_CO2.',
    source: WSGG_SMITH_1982.source,
    ranges: { temperature: WSGG_SMITH_1982.range.temperatureK, pathLength: WSGG_SMITH_1982.range.pathLengthAtmM, ratio: WSGG_SMITH_1982.range.ratio },
    constraints: [],
    accepted: [
      {
        input: 'temperature',
        side: 'below',
        reason: 'below 600 K the fit agrees with the line-by-line based fit of Dorigon et al. (2013, valid from 400 K) within 7.4 % (checked in this project)',
      },
      { input: 'ratio', side: 'above', reason: 'the nearer fit (ratio 2) is used; water-rich gas radiates more, not less' },
      { input: 'ratio', side: 'below', reason: 'the nearer fit (ratio 1) is used' },
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

/** One line for model descriptions: "title: description Source: …". */
export function describeCorrelation(name: CorrelationName): string {
  const e = looseEntry(name);
  const ranges = e.inputs
    .filter((k) => e.ranges[k] && Number.isFinite(e.ranges[k]![1]) && e.ranges[k]![0] !== e.ranges[k]![1])
    .map((k) => `${formatNumber(e.ranges[k]![0])} ≤ ${k} ≤ ${formatNumber(e.ranges[k]![1])}`);
  const validity = [...ranges, ...e.constraints.map((c) => c.label)];
  return `${e.title}: ${e.description}${validity.length ? ` Published range: ${validity.join(', ')}.` : ''} Source: ${e.source}.`;
}

/** How one evaluation relates to its correlation's published range. */
export type RangeStatus =
  | { readonly kind: 'inside' }
  /** Beyond the range only where the literature accepts the extrapolation. */
  | { readonly kind: 'accepted'; readonly input: string; readonly side: 'above' | 'below'; readonly value: number; readonly bound: number; readonly reason: string }
  /** Beyond the range (or a condition) where the extrapolation is not justified; `excess` is how far beyond, relative to the bound. */
  | { readonly kind: 'outside'; readonly what: string; readonly excess: number };

const INSIDE: RangeStatus = { kind: 'inside' };

/** Where an evaluation was: run time and height, for messages. */
export interface EvaluationPlace {
  readonly t: number;
  readonly heightM: number;
}

/**
 * One evaluation's classification, without messages (the tally sees every instant checked and
 * builds a message only for the case it keeps): 0 inside, 1 accepted, 2 outside.
 */
interface Classification {
  kind: 0 | 1 | 2;
  /** The input concerned (accepted or outside a range), or the failed condition's label. */
  key: string;
  side: 'above' | 'below';
  value: number;
  bound: number;
  /** The bounds of the range the input left (NaN for a condition or a missing number). */
  lo: number;
  hi: number;
  reason: string;
  /** How far beyond, relative to the bound (Infinity for a condition or a missing number). */
  excess: number;
  /** 'range', 'nan' or 'condition' (for the outside message). */
  cause: 'range' | 'nan' | 'condition';
}

function classifyInto(e: CorrelationEntry<string>, values: Readonly<Record<string, number>>, c: Classification): Classification {
  c.kind = 0;
  let acceptedSeen = false;
  for (const key of e.inputs) {
    const v = values[key];
    if (typeof v !== 'number' || Number.isNaN(v)) {
      c.kind = 2;
      c.key = key;
      c.cause = 'nan';
      c.excess = Infinity;
      return c;
    }
    const range = e.ranges[key];
    if (!range || (v >= range[0] && v <= range[1])) continue;
    const side = v < range[0] ? 'below' : 'above';
    const bound = side === 'below' ? range[0] : range[1];
    const ok = e.accepted?.find((a) => a.input === key && a.side === side);
    if (ok) {
      if (!acceptedSeen) {
        acceptedSeen = true;
        c.key = key;
        c.side = side;
        c.value = v;
        c.bound = bound;
        c.reason = ok.reason;
      }
      continue;
    }
    c.kind = 2;
    c.key = key;
    c.side = side;
    c.value = v;
    c.lo = range[0];
    c.hi = range[1];
    c.cause = 'range';
    c.excess = bound === 0 ? Math.abs(v) : Math.abs(v - bound) / Math.abs(bound);
    return c;
  }
  for (const k of e.constraints)
    if (!k.holds(values)) {
      c.kind = 2;
      c.key = k.label;
      c.cause = 'condition';
      c.excess = Infinity;
      return c;
    }
  if (acceptedSeen) c.kind = 1;
  return c;
}

function emptyClassification(): Classification {
  return { kind: 0, key: '', side: 'above', value: Number.NaN, bound: Number.NaN, lo: Number.NaN, hi: Number.NaN, reason: '', excess: 0, cause: 'range' };
}

/** The message of an outside classification. */
function outsideWhat(c: Classification): string {
  if (c.cause === 'nan') return `${c.key} is not a number`;
  if (c.cause === 'condition') return `violates ${c.key}`;
  return `${c.key} = ${formatNumber(c.value)} ${c.side} its published range [${formatNumber(c.lo)}, ${formatNumber(c.hi)}]`;
}

function acceptedStatus(c: Classification): Extract<RangeStatus, { kind: 'accepted' }> {
  return { kind: 'accepted', input: c.key, side: c.side, value: c.value, bound: c.bound, reason: c.reason };
}

/** Classify one evaluation of `name` against its published range and its accepted extrapolations. */
export function rangeStatus<N extends CorrelationName>(name: N, inputs: CorrelationInputs<N>): RangeStatus {
  const c = classifyInto(looseEntry(name), inputs as Readonly<Record<string, number>>, emptyClassification());
  if (c.kind === 0) return INSIDE;
  if (c.kind === 1) return acceptedStatus(c);
  return { kind: 'outside', what: outsideWhat(c), excess: c.excess };
}

interface TallyEntry {
  checked: number;
  accepted: number;
  outside: number;
  /** The accepted extrapolation seen (first), with the farthest value. */
  acceptedExample: Extract<RangeStatus, { kind: 'accepted' }> | null;
  farthestAccepted: number;
  /** The worst unjustified extrapolation and where it was. */
  worst: { what: string; excess: number; place: EvaluationPlace } | null;
}

/**
 * Counts, per correlation, the evaluations checked, those beyond the range where the extrapolation
 * is accepted, and those where it is not (keeping the worst and where it was): `assumptions()` lists
 * each accepted extrapolation once, `warnings()` says for each unjustified one by how much and where.
 */
export class CorrelationRangeTally {
  private readonly seen = new Map<CorrelationName, TallyEntry>();
  private readonly scratch = emptyClassification();

  /** Check one evaluation of `name` with these inputs, made at `place`. */
  note<N extends CorrelationName>(name: N, inputs: CorrelationInputs<N>, place: EvaluationPlace = { t: Number.NaN, heightM: Number.NaN }): void {
    // (every checked instant of every segment comes here: messages are built only for what is kept)
    const status = classifyInto(looseEntry(name), inputs as Readonly<Record<string, number>>, this.scratch);
    let v = this.seen.get(name);
    if (!v) {
      v = { checked: 0, accepted: 0, outside: 0, acceptedExample: null, farthestAccepted: Number.NaN, worst: null };
      this.seen.set(name, v);
    }
    v.checked++;
    if (status.kind === 1) {
      v.accepted++;
      if (!v.acceptedExample) {
        v.acceptedExample = acceptedStatus(status);
        v.farthestAccepted = status.value;
      } else if (status.key === v.acceptedExample.input && status.side === v.acceptedExample.side) {
        v.farthestAccepted = status.side === 'above' ? Math.max(v.farthestAccepted, status.value) : Math.min(v.farthestAccepted, status.value);
      }
    } else if (status.kind === 2) {
      v.outside++;
      if (!v.worst || status.excess > v.worst.excess) v.worst = { what: outsideWhat(status), excess: status.excess, place: { t: place.t, heightM: place.heightM } };
    }
  }

  /** How many evaluations of `name` were checked, accepted beyond the range, and outside it. */
  counts(name: CorrelationName): { checked: number; accepted: number; outside: number } {
    const v = this.seen.get(name);
    return { checked: v?.checked ?? 0, accepted: v?.accepted ?? 0, outside: v?.outside ?? 0 };
  }

  /** One line per correlation used beyond its range where the literature accepts it (for the report's assumptions). */
  assumptions(): string[] {
    const out: string[] = [];
    for (const [name, v] of this.seen) {
      const a = v.acceptedExample;
      if (v.accepted === 0 || !a) continue;
      const e = looseEntry(name);
      out.push(
        `${e.title} is used ${a.side} its published range (${a.input} ${a.side === 'above' ? '>' : '<'} ${formatNumber(a.bound)}, up to ${formatNumber(v.farthestAccepted)}) at ${share(v.accepted, v.checked)} of the points checked: accepted because ${a.reason}.`,
      );
    }
    return out;
  }

  /** One warning per correlation used beyond its range without a justification: the worst case, by how much, where and how often. */
  warnings(describePlace: (place: EvaluationPlace) => string = defaultPlace): string[] {
    const out: string[] = [];
    for (const [name, v] of this.seen) {
      if (v.outside === 0 || !v.worst) continue;
      const e = looseEntry(name);
      const by = Number.isFinite(v.worst.excess) ? ` (by ${formatPercent(v.worst.excess)})` : '';
      out.push(`${e.title}: ${v.worst.what}${by} at ${describePlace(v.worst.place)}; beyond its range at ${share(v.outside, v.checked)} of the points checked, value extrapolated (${e.source})`);
    }
    return out;
  }
}

function defaultPlace(place: EvaluationPlace): string {
  return Number.isFinite(place.heightM) ? `${formatNumber(place.heightM)} m` : 'an unrecorded place';
}

function share(part: number, whole: number): string {
  const pct = (100 * part) / whole;
  return `${pct < 1 ? pct.toFixed(2) : pct.toFixed(0)} %`;
}

function formatPercent(fraction: number): string {
  const pct = 100 * fraction;
  return pct >= 100 ? `${formatNumber(fraction + 1)}×` : `${pct < 1 ? pct.toFixed(2) : pct.toFixed(0)} %`;
}
