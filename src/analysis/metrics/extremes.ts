/**
 * Extremes over the evaluated period: the hottest shell and lining, the coldest inner surface,
 * the range and largest swing of every surface and interface, and the ranges of the gas exit
 * temperature and the draft.
 */
import { kelvinToCelsius as c } from '../../physics/constants.ts';
import type { PositionRange, Summary } from '../summary.ts';
import { round } from '../rounding.ts';
import { locateLargest, nodeRange, rangeAt, timeAndHeight, type Evaluated, type Located } from './evaluated.ts';

/** Highest (sign 1) or lowest (sign −1) temperature, K, of a set of nodes at any evaluated instant and height; the first found wins a tie. */
export function extremeTemperature(ev: Evaluated, nodes: readonly number[], sign: 1 | -1): Located {
  const { T } = ev;
  const hottest = locateLargest(ev, (k, seg) => {
    let m = -Infinity;
    for (const i of nodes) {
      const v = sign * T(k, seg, i);
      if (v > m) m = v;
    }
    return m;
  });
  return { value: sign * hottest.value, at: hottest.at };
}

export interface WallExtremes {
  /** Hottest outer surface, K. */
  readonly peakShell: Located;
  /** Hottest temperature anywhere in the first (flue-side) layer, K. */
  readonly peakLining: Located;
  /** Coldest inner surface, K. */
  readonly minInnerSurface: Located;
}

export function wallExtremes(ev: Evaluated): WallExtremes {
  const lining = ev.series.layers[0]!;
  return {
    peakShell: extremeTemperature(ev, [ev.N - 1], 1),
    peakLining: extremeTemperature(ev, nodeRange(lining.firstNode, lining.lastNode), 1),
    minInnerSurface: extremeTemperature(ev, [0], -1),
  };
}

/** The peaks and the minimum as summary.json states them. */
export function wallExtremeFigures(ev: Evaluated, x: WallExtremes): Pick<Summary, 'peak_shell_c' | 'peak_shell_time' | 'peak_shell_height_m' | 'peak_lining_c' | 'peak_lining_time' | 'peak_lining_height_m' | 'min_inner_surface_c' | 'min_inner_surface_time' | 'min_inner_surface_height_m'> {
  const shell = timeAndHeight(ev.series, x.peakShell.at);
  const lining = timeAndHeight(ev.series, x.peakLining.at);
  const inner = timeAndHeight(ev.series, x.minInnerSurface.at);
  return {
    peak_shell_c: round(c(x.peakShell.value)),
    peak_shell_time: shell.time,
    peak_shell_height_m: shell.height,
    peak_lining_c: round(c(x.peakLining.value)),
    peak_lining_time: lining.time,
    peak_lining_height_m: lining.height,
    min_inner_surface_c: round(c(x.minInnerSurface.value)),
    min_inner_surface_time: inner.time,
    min_inner_surface_height_m: inner.height,
  };
}

/** A named position (surface or interface): its node and the segment where its swing is largest. */
export interface PositionSwingAt {
  readonly node: number;
  readonly segment: number;
}

/** Range and largest swing (max − min over the period at one height) of every surface and interface, inside → outside. */
export function positionRanges(ev: Evaluated): { positions: PositionRange[]; swingAt: PositionSwingAt[] } {
  const { series: s, C } = ev;
  const positions: PositionRange[] = [];
  const swingAt: PositionSwingAt[] = [];
  s.nodeLabel.forEach((label, i) => {
    if (label.startsWith('node_')) return;
    let min = Infinity;
    let max = -Infinity;
    let swing = -Infinity;
    let swingSeg = 0;
    for (let col = 0; col < C; col++) {
      const { lo, hi } = rangeAt(ev, col, i);
      min = Math.min(min, lo);
      max = Math.max(max, hi);
      if (hi - lo > swing) {
        swing = hi - lo;
        swingSeg = Math.floor(col / ev.sectors);
      }
    }
    positions.push({ position: label, radius_m: round(s.nodeRadius[i]!, 4), min_c: round(c(min)), max_c: round(c(max)), swing_k: round(swing), swing_height_m: round(s.heightM[swingSeg]!, 2) });
    swingAt.push({ node: i, segment: swingSeg });
  });
  return { positions, swingAt };
}

/** Ranges of the gas exit temperature and the draft over the evaluated instants. */
export function gasAndDraftRanges(ev: Evaluated): Pick<Summary, 'gas_exit_min_c' | 'gas_exit_max_c' | 'draft_min_pa' | 'draft_max_pa'> {
  const { series: s, ks } = ev;
  let exitMin = Infinity;
  let exitMax = -Infinity;
  let draftMin = Infinity;
  let draftMax = -Infinity;
  for (const k of ks) {
    exitMin = Math.min(exitMin, s.instant.gasExitK[k]!);
    exitMax = Math.max(exitMax, s.instant.gasExitK[k]!);
    draftMin = Math.min(draftMin, s.instant.draftPa[k]!);
    draftMax = Math.max(draftMax, s.instant.draftPa[k]!);
  }
  return { gas_exit_min_c: round(c(exitMin)), gas_exit_max_c: round(c(exitMax)), draft_min_pa: round(draftMin), draft_max_pa: round(draftMax) };
}
