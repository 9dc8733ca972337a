/**
 * Which published correlation the model uses for each of its roles, chosen by name from the
 * correlation registry (physics/correlations/registry.ts). The functions the model evaluates are
 * taken from the registry entries named here, and the same names drive the range checks at every
 * reported instant and the model description in the README and the report.
 */
import { CORRELATIONS, describeCorrelation, type CorrelationName } from '../physics/correlations/registry.ts';
import type { OutsideFilmCorrelations } from '../physics/correlations/external.ts';
import type { GapConvectionInputs, GapConvectionRatio } from '../physics/wall/gap.ts';

/** The model's roles and the registry entry that fills each. */
export const CORRELATIONS_IN_USE = {
  /** Inside the flue: tube Nusselt number over all Reynolds numbers (bulk properties). */
  insideTube: 'nuPipeBlended',
  /** Inside the flue: natural convection on the lining (film properties, stack height). */
  insideNatural: 'nuVerticalPlateChurchillChu',
  /** Inside the flue: forced and natural together, aiding or opposing. */
  insideMixed: 'mixedConvectionChurchillSigned',
  /** Inside the flue: radiation of the H2O–CO2 gas to the lining (when switched on). */
  gasRadiation: 'gasEmissivityWsggSmith',
  /** Outside: forced convection of a cylinder in cross flow (film properties, outer diameter). */
  outsideCrossFlow: 'nuCylinderChurchillBernstein',
  /** Outside: natural convection on the vertical surface (film properties, stack height). */
  outsideNatural: 'nuVerticalPlateChurchillChu',
  /** Outside: laminar slender-cylinder correction of natural convection. */
  outsideSlender: 'slenderCylinderFactorPopiel',
  /** Outside: combination of forced and natural convection. */
  outsideMixed: 'nuMixedChurchill',
  /** Air gaps: natural convection across the vertical layer, as an effective conductivity. */
  gapConvection: 'nuVerticalCavityElSherbiny',
} as const satisfies Record<string, CorrelationName>;

export type CorrelationRole = keyof typeof CORRELATIONS_IN_USE;

/** The inside tube Nusselt function (Re, Pr) → Nu of the registry entry in use. */
export const insideTubeNusselt = CORRELATIONS[CORRELATIONS_IN_USE.insideTube].compute as (re: number, pr: number) => number;

/** The outside film correlations of the registry entries in use, as the outer boundary takes them. */
export const outsideFilmCorrelations: OutsideFilmCorrelations = {
  forced: CORRELATIONS[CORRELATIONS_IN_USE.outsideCrossFlow].compute as OutsideFilmCorrelations['forced'],
  natural: CORRELATIONS[CORRELATIONS_IN_USE.outsideNatural].compute as OutsideFilmCorrelations['natural'],
  slender: CORRELATIONS[CORRELATIONS_IN_USE.outsideSlender].compute as OutsideFilmCorrelations['slender'],
  mixed: CORRELATIONS[CORRELATIONS_IN_USE.outsideMixed].compute as OutsideFilmCorrelations['mixed'],
};

/** The lining's natural-convection Nusselt function (Ra, Pr) → Nu of the registry entry in use. */
export const insideNaturalNusselt = CORRELATIONS[CORRELATIONS_IN_USE.insideNatural].compute as (ra: number, pr: number) => number;

/** The inside mixed-convection combination (forced, natural, aiding 1/0) of the registry entry in use. */
export const insideMixed = CORRELATIONS[CORRELATIONS_IN_USE.insideMixed].compute as (forced: number, natural: number, aiding: number) => number;

/** The gap convection ratio k_eff/k from the gap's groups, with the registry entry in use (a vertical air layer: Nu on the width from Ra and the aspect ratio). */
export const gapConvectionRatio: GapConvectionRatio = (g) => (CORRELATIONS[CORRELATIONS_IN_USE.gapConvection].compute as (ra: number, aspectRatio: number) => number)(g.rayleighGap, g.aspectRatio);

/** The registry inputs of the gap role for range checks. */
export function gapConvectionRangeInputs(g: GapConvectionInputs): { ra: number; aspectRatio: number } {
  return { ra: g.rayleighGap, aspectRatio: g.aspectRatio };
}

/** One line per role for model descriptions (README, report): "role: entry description, source". */
export function describeCorrelationsInUse(): { role: CorrelationRole; name: CorrelationName; text: string }[] {
  return (Object.keys(CORRELATIONS_IN_USE) as CorrelationRole[]).map((role) => ({ role, name: CORRELATIONS_IN_USE[role], text: describeCorrelation(CORRELATIONS_IN_USE[role]) }));
}
