/**
 * Warm-up studies: how long after firing starts the inner surface stays above each dew point
 * (plus its required margin), and how long the shell takes to reach 90 % of its rise and the touch
 * limit, at every height.
 */
import type { LimitsInput } from '../../model/inputs.ts';
import type { Summary, WarmupAtHeight } from '../summary.ts';
import { round } from '../rounding.ts';
import type { Evaluated } from './evaluated.ts';

/** First time (s after tStart) from which `values` stays at or above `threshold`, by linear interpolation; null if never. */
export function timeToStayAbove(times: readonly number[], values: readonly number[], threshold: number): number | null {
  const n = values.length;
  if (n === 0 || values[n - 1]! < threshold) return null;
  let k = n - 1;
  while (k > 0 && values[k - 1]! >= threshold) k--;
  if (k === 0) return times[0]!;
  const t0 = times[k - 1]!;
  const t1 = times[k]!;
  const v0 = values[k - 1]!;
  const v1 = values[k]!;
  return t0 + ((threshold - v0) / (v1 - v0)) * (t1 - t0);
}

/** First time at which `values` reaches `threshold` (crossing upward), linear interpolation; null if never. */
export function timeToReach(times: readonly number[], values: readonly number[], threshold: number): number | null {
  if (values.length === 0) return null;
  if (values[0]! >= threshold) return times[0]!;
  for (let k = 1; k < values.length; k++) {
    if (values[k]! >= threshold) {
      const v0 = values[k - 1]!;
      const v1 = values[k]!;
      return times[k - 1]! + ((threshold - v0) / (v1 - v0)) * (times[k]! - times[k - 1]!);
    }
  }
  return null;
}

/** Shell rise, K, below which the time to 90 % of it is not reported (the shell barely warms). */
const MIN_SHELL_RISE_K = 0.1;

/** Warm-up times at one height, s from firing start (null: not within the run, or not asked for), unrounded. */
export interface WarmupSeconds {
  readonly toWaterDew: number | null;
  readonly toAcidDew: number | null;
  readonly toShell90Percent: number | null;
  readonly toShellTouch: number | null;
}

/**
 * Warm-up times of segment `seg`, in seconds from `firingStartT` (s, on the series' time axis).
 * With sectors: the coldest inner surface round the height (the dew points) and the hottest shell
 * (the touch limit, 90 % of the rise).
 */
export function warmupSecondsAt(ev: Evaluated, seg: number, firingStartT: number, limits: LimitsInput): WarmupSeconds {
  const { series: s, ks, N, T, sectors } = ev;
  const acrossSectors = (k: number, i: number, pick: (a: number, b: number) => number) => {
    let v = T(k, seg * sectors, i);
    for (let j = 1; j < sectors; j++) v = pick(v, T(k, seg * sectors + j, i));
    return v;
  };
  const inner = ks.map((k) => acrossSectors(k, 0, Math.min));
  const shell = ks.map((k) => acrossSectors(k, N - 1, Math.max));
  const tt = ks.map((k) => s.t[k]! - firingStartT);
  const shellRise = shell[shell.length - 1]! - shell[0]!;
  return {
    toWaterDew: timeToStayAbove(tt, inner, s.waterDewPointK + (limits.waterDewMarginK ?? 0)),
    toAcidDew: s.acidDewPointK === null ? null : timeToStayAbove(tt, inner, s.acidDewPointK + (limits.acidDewMarginK ?? 0)),
    toShell90Percent: shellRise > MIN_SHELL_RISE_K ? timeToReach(tt, shell, shell[0]! + 0.9 * shellRise) : null,
    toShellTouch: limits.shellTouchK === undefined ? null : timeToReach(tt, shell, limits.shellTouchK),
  };
}

/**
 * Warm-up times at every height, bottom → top, in minutes from `firingStartT` (s, on the series'
 * time axis); the firing start is stated as the first output instant.
 */
export function warmupTimes(ev: Evaluated, firingStartT: number, limits: LimitsInput): NonNullable<Summary['warmup']> {
  const { series: s, S } = ev;
  const atHeight = (seg: number): WarmupAtHeight => {
    const w = warmupSecondsAt(ev, seg, firingStartT, limits);
    const min = (x: number | null) => (x === null ? null : round(x / 60, 1));
    return {
      height_m: round(s.heightM[seg]!, 2),
      minutes_to_water_dew: min(w.toWaterDew),
      minutes_to_acid_dew: min(w.toAcidDew),
      minutes_to_shell_90_percent: min(w.toShell90Percent),
      minutes_to_shell_touch: min(w.toShellTouch),
    };
  };
  const byHeight = Array.from({ length: S }, (_, seg) => atHeight(seg));
  return { firing_start_local: s.isoLocal[0]!, top: byHeight[S - 1]!, by_height: byHeight };
}
