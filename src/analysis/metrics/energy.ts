/**
 * Heat per day: what the wall loses to the outside net of sun, what the gas gives it, the sun it
 * absorbs, its convection and radiation losses, and the residual of the energy balance.
 */
import type { RunResult, EnergyAccount } from '../../model/timeseries.ts';
import { SECONDS_PER_DAY } from '../../physics/constants.ts';
import type { Summary } from '../summary.ts';
import { round } from '../rounding.ts';

/** Joules in a kilowatt-hour. */
export const J_PER_KWH = 3.6e6;

/** Net heat lost to the outside over an account (convection and radiation out, sun absorbed in), J. */
export const heatLossJ = (e: EnergyAccount): number => e.convectionJ + e.radiationJ - e.sunJ;

/** Residual of the energy balance, %, above which a run is flagged. */
const RESIDUAL_WARNING_PERCENT = 0.1;

/** The energy account the figures cover: the whole run (warm-up) or the last simulated day (cycle). */
export function evaluatedEnergy(result: RunResult, mode: 'cycle' | 'warmup'): EnergyAccount {
  return mode === 'warmup' ? result.energy.run : result.energy.lastDay;
}

/** Heat figures scaled to one day, kWh/day, and the residual, %, as summary.json states them. */
export function heatPerDay(e: EnergyAccount): Pick<Summary, 'heat_loss_kwh_per_day' | 'gas_to_wall_kwh_per_day' | 'sun_absorbed_kwh_per_day' | 'convection_kwh_per_day' | 'radiation_kwh_per_day' | 'energy_residual_percent'> {
  const perDay = (j: number) => round((j / J_PER_KWH) * (SECONDS_PER_DAY / e.periodS), 2);
  return {
    heat_loss_kwh_per_day: perDay(heatLossJ(e)),
    gas_to_wall_kwh_per_day: perDay(e.gasToWallJ),
    sun_absorbed_kwh_per_day: perDay(e.sunJ),
    convection_kwh_per_day: perDay(e.convectionJ),
    radiation_kwh_per_day: perDay(e.radiationJ),
    energy_residual_percent: round(e.residualPercent, 6),
  };
}

/** A warning when the energy balance does not close well enough; null when it does. */
export function residualWarning(e: EnergyAccount): string | null {
  return Math.abs(e.residualPercent) > RESIDUAL_WARNING_PERCENT ? `energy residual ${round(e.residualPercent, 3)} % exceeds ${RESIDUAL_WARNING_PERCENT} %: tighten the integrator tolerances` : null;
}
