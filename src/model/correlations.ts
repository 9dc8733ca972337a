/**
 * Which published correlation the model uses for each of its roles, chosen by name from the
 * correlation registry (physics/correlations/registry.ts). The functions the model evaluates are
 * taken from the registry entries named here, and the same names drive the range checks at every
 * reported instant and the model description in the README and the report.
 */
import { CORRELATIONS, describeCorrelation, type CorrelationName } from '../physics/correlations/registry.ts';
import type { OutsideFilmCorrelations } from '../physics/correlations/external.ts';

/** The model's roles and the registry entry that fills each. */
export const CORRELATIONS_IN_USE = {
  /** Inside the flue: tube Nusselt number over all Reynolds numbers (bulk properties). */
  insideTube: 'nuPipeBlended',
  /** Outside: forced convection of a cylinder in cross flow (film properties, outer diameter). */
  outsideCrossFlow: 'nuCylinderChurchillBernstein',
  /** Outside: natural convection on the vertical surface (film properties, stack height). */
  outsideNatural: 'nuVerticalPlateChurchillChu',
  /** Outside: laminar slender-cylinder correction of natural convection. */
  outsideSlender: 'slenderCylinderFactorPopiel',
  /** Outside: combination of forced and natural convection. */
  outsideMixed: 'nuMixedChurchill',
  /** Air gaps: natural convection as an effective conductivity. */
  gapConvection: 'effectiveConductivityRatioAnnulusRaithbyHollands',
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

/** The gap convection function (D_i, D_o, Ra_gap, Pr) → k_eff/k of the registry entry in use. */
export const gapConvectionRatio = CORRELATIONS[CORRELATIONS_IN_USE.gapConvection].compute as (innerDiameter: number, outerDiameter: number, rayleighGap: number, pr: number) => number;

/** One line per role for model descriptions (README, report): "role: entry description, source". */
export function describeCorrelationsInUse(): { role: CorrelationRole; name: CorrelationName; text: string }[] {
  return (Object.keys(CORRELATIONS_IN_USE) as CorrelationRole[]).map((role) => ({ role, name: CORRELATIONS_IN_USE[role], text: describeCorrelation(CORRELATIONS_IN_USE[role]) }));
}
