/**
 * The sun-facing side, for a wall cut into circumferential sectors: where round the circumference
 * the shell peaks, how far one side of the stack runs from the other (the shell, and the mean wall
 * temperature across the wall), and the bow that side-to-side difference gives a tall stack,
 * reported as an indicator — not a structural check.
 *
 * Bow: plane sections stay plane, so only the first circumferential harmonic of the wall's mean
 * temperature bends the stack. With T(φ) = T₀ + A cos(φ − φ₀) the difference between opposite
 * sides is ΔT_side = 2A, the curvature κ = α ΔT_side / D towards the cool side
 * (physics/wall/circumferential.ts), and the tip deflection of the stack as a cantilever fixed at
 * its base is the moment-area sum of the segments' curvature vectors (beam theory, common
 * practice). α is that of the outermost layer with expansion data (the shell that carries a steel
 * stack; for a masonry stack, the masonry).
 */
import type { LayerInput } from '../../model/inputs.ts';
import { kelvinToCelsius as c } from '../../physics/constants.ts';
import { beamOnSector, sectorAzimuthDeg } from '../../physics/sun/sectors.ts';
import { cantileverTipDeflection, thermalBowCurvature } from '../../physics/wall/circumferential.ts';
import type { SectorSummary } from '../summary.ts';
import { round } from '../rounding.ts';
import { timeAndHeight, type Evaluated, type Located } from './evaluated.ts';

/** Mean temperature across the wall of column col at instant k, weighted by each node's radial share, K. */
function meanWallK(ev: Evaluated, k: number, col: number, weights: Float64Array): number {
  let sum = 0;
  for (let i = 0; i < ev.N; i++) sum += weights[i]! * ev.T(k, col, i);
  return sum;
}

/** First circumferential harmonic of `value(j)` over n sectors: amplitude and the azimuth of its maximum (degrees). */
function firstHarmonic(n: number, value: (j: number) => number): { amplitude: number; azimuthDeg: number } {
  let a = 0;
  let b = 0;
  for (let j = 0; j < n; j++) {
    const phi = (2 * Math.PI * j) / n;
    const v = value(j);
    a += v * Math.cos(phi);
    b += v * Math.sin(phi);
  }
  a *= 2 / n;
  b *= 2 / n;
  const azimuth = (Math.atan2(b, a) * 180) / Math.PI;
  return { amplitude: Math.hypot(a, b), azimuthDeg: (azimuth + 360) % 360 };
}

/** Where the sectors' figures occur (as indices), for charts. */
export interface SectorLocations {
  /** The instant and segment of the largest side-to-side shell difference. */
  readonly sideToSideShell: Located;
  /** Sectors with the most and the least beam over the evaluated period. */
  readonly sunniest: number;
  readonly shadiest: number;
}

/** The sector figures of summary.json, or null for a wall with one sector. */
export function sectorFigures(ev: Evaluated, layers: readonly LayerInput[], outerDiameter: number, height: number, peakShell: Located): { summary: SectorSummary; at: SectorLocations } | null {
  const ns = ev.sectors;
  if (ns === 1) return null;
  const s = ev.series;
  const N = ev.N;
  // radial weights of the nodes (half cells at surfaces and interfaces, area-weighted)
  const weights = new Float64Array(N);
  for (let i = 0; i < N; i++) {
    const rIn = i > 0 ? 0.5 * (s.nodeRadius[i - 1]! + s.nodeRadius[i]!) : s.nodeRadius[0]!;
    const rOut = i < N - 1 ? 0.5 * (s.nodeRadius[i]! + s.nodeRadius[i + 1]!) : s.nodeRadius[N - 1]!;
    weights[i] = rOut * rOut - rIn * rIn;
  }
  const total = weights.reduce((a, b) => a + b, 0);
  for (let i = 0; i < N; i++) weights[i]! /= total;
  const expanding = [...layers].reverse().find((l) => l.material.kind === 'solid' && l.material.thermalExpansion > 0);
  const alpha = expanding?.material.thermalExpansion ?? 0;

  let shell: Located = { value: -1, at: { instant: ev.ks[0]!, segment: 0 } };
  let wall: Located = { value: -1, at: { instant: ev.ks[0]!, segment: 0 } };
  let tip = { value: -1, instant: ev.ks[0]!, curvatures: new Float64Array(ev.S) };
  const kx = new Float64Array(ev.S);
  const ky = new Float64Array(ev.S);
  for (const k of ev.ks) {
    for (let seg = 0; seg < ev.S; seg++) {
      let lo = Infinity;
      let hi = -Infinity;
      for (let j = 0; j < ns; j++) {
        const t = ev.T(k, seg * ns + j, N - 1);
        lo = Math.min(lo, t);
        hi = Math.max(hi, t);
      }
      if (hi - lo > shell.value) shell = { value: hi - lo, at: { instant: k, segment: seg } };
      const h = firstHarmonic(ns, (j) => meanWallK(ev, k, seg * ns + j, weights));
      const side = 2 * h.amplitude;
      if (side > wall.value) wall = { value: side, at: { instant: k, segment: seg } };
      // curvature vector, pointing from the warm side to the cool one (the stack bows away from the sun)
      const kappa = thermalBowCurvature(alpha, side, outerDiameter);
      const toward = ((h.azimuthDeg + 180) * Math.PI) / 180;
      kx[seg] = kappa * Math.sin(toward);
      ky[seg] = kappa * Math.cos(toward);
    }
    const tipX = cantileverTipDeflection(kx, height);
    const tipY = cantileverTipDeflection(ky, height);
    const d = Math.hypot(tipX, tipY);
    if (d > tip.value) tip = { value: d, instant: k, curvatures: Float64Array.from(kx, (x, i) => Math.hypot(x, ky[i]!)) };
  }

  // beam energy on each sector over the evaluated period (W/m² · s), from the sun's path
  const beam = new Float64Array(ns);
  for (let q = 1; q < ev.ks.length; q++) {
    const k0 = ev.ks[q - 1]!;
    const k1 = ev.ks[q]!;
    const dt = s.t[k1]! - s.t[k0]!;
    for (let j = 0; j < ns; j++) {
      const at = (k: number) => beamOnSector(s.instant.beamNormal[k]!, s.instant.sunAltitudeDeg[k]!, s.instant.sunAzimuthDeg[k]!, j, ns);
      beam[j]! += 0.5 * (at(k0) + at(k1)) * dt;
    }
  }
  let sunniest = 0;
  let shadiest = 0;
  for (let j = 1; j < ns; j++) {
    if (beam[j]! > beam[sunniest]!) sunniest = j;
    if (beam[j]! < beam[shadiest]!) shadiest = j;
  }
  const shellAt = timeAndHeight(s, shell.at);
  const wallAt = timeAndHeight(s, wall.at);
  return {
    summary: {
      count: ns,
      peak_shell_azimuth_deg: round(sectorAzimuthDeg(peakShell.at.sector ?? 0, ns), 1),
      largest_side_to_side_shell_k: round(shell.value),
      largest_side_to_side_shell_time: shellAt.time,
      largest_side_to_side_shell_height_m: shellAt.height,
      largest_side_to_side_wall_k: round(wall.value),
      largest_side_to_side_wall_time: wallAt.time,
      largest_side_to_side_wall_height_m: wallAt.height,
      bow_expansion_per_k: alpha,
      bow_largest_tip_deflection_mm: round(tip.value * 1000, 1),
      bow_largest_tip_deflection_time: s.isoLocal[tip.instant]!,
      bow_curvature_per_km_by_height: Array.from(tip.curvatures, (kappa, seg) => ({ height_m: round(s.heightM[seg]!, 2), curvature_per_km: round(kappa * 1000, 4) })),
      sunniest_sector_azimuth_deg: round(sectorAzimuthDeg(sunniest, ns), 1),
      shadiest_sector_azimuth_deg: round(sectorAzimuthDeg(shadiest, ns), 1),
      shell_by_sector_at_peak_c: shellRoundTheCircumference(ev, peakShell.at.instant, peakShell.at.segment),
    },
    at: { sideToSideShell: shell, sunniest, shadiest },
  };
}

/** Shell temperature, °C, round the circumference at one instant and segment, sector by sector. */
export function shellRoundTheCircumference(ev: Evaluated, k: number, seg: number): number[] {
  return Array.from({ length: ev.sectors }, (_, j) => round(c(ev.T(k, seg * ev.sectors + j, ev.N - 1))));
}
