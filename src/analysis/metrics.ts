/**
 * From the time series to the figures an engineer acts on: peaks, daily ranges and swings,
 * through-wall differences and the thermal-stress indicator, dew-point margins and hours below,
 * warm-up times, heat per day, and a verdict against every limit (docs/model.md "Results").
 */
import type { ModelInputs } from '../model/inputs.ts';
import type { RunResult, TimeSeries, EnergyAccount } from '../model/timeseries.ts';
import { KELVIN_OFFSET, SECONDS_PER_DAY } from '../physics/constants.ts';
import { CAUTIONS, type Summary, type Verdict, type LayerSummary, type PositionRange, type HeightHours, type WarmupAtHeight } from './summary.ts';

const J_PER_KWH = 3.6e6;
const c = (k: number) => k - KELVIN_OFFSET;
const round = (v: number, digits = 2) => Math.round(v * 10 ** digits) / 10 ** digits;

/**
 * Thermal-stress indicator for a cylinder wall with a linear temperature difference ΔT across it:
 * σ ≈ E α ΔT / (2 (1 − ν)), Pa (Timoshenko & Goodier, Theory of Elasticity, thin-walled cylinder
 * with a logarithmic/linear through-wall gradient; the surface hoop and axial stresses).
 * Inputs: Young's modulus E (Pa), expansion α (1/K), Poisson's ratio ν, ΔT (K).
 * Example: E = 200 GPa, α = 12e-6 /K, ν = 0.3, ΔT = 10 K → σ = 17.1 MPa.
 */
export function thermalStressIndicator(youngsModulus: number, thermalExpansion: number, poissonRatio: number, deltaTK: number): number {
  return (youngsModulus * thermalExpansion * Math.abs(deltaTK)) / (2 * (1 - poissonRatio));
}

/** Indices of the output instants the figures cover: the last simulated day (cycle) or the whole run (warm-up). */
export function evaluationInstants(series: TimeSeries, mode: 'cycle' | 'warmup'): number[] {
  const K = series.t.length;
  if (mode === 'warmup' || K === 0) return Array.from({ length: K }, (_, k) => k);
  const tEnd = series.t[K - 1]!;
  const out: number[] = [];
  for (let k = 0; k < K; k++) if (series.t[k]! >= tEnd - SECONDS_PER_DAY - 1e-6) out.push(k);
  return out;
}

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

export interface SummaryContext {
  readonly inputs: ModelInputs;
  readonly result: RunResult;
  readonly version: string;
  readonly description?: string | null;
}

/** Build the summary of a run. */
export function summarise({ inputs, result, version, description }: SummaryContext): Summary {
  const s = result.series;
  const S = s.segments;
  const N = s.nodes;
  const ks = evaluationInstants(s, inputs.run.mode);
  const T = (k: number, seg: number, i: number) => s.temperatureK[(k * S + seg) * N + i]!;
  const where = (k: number, seg: number) => ({ time: s.isoLocal[k]!, height: round(s.heightM[seg]!, 2) });

  // ---- extremes of a node set ----
  const extreme = (nodes: readonly number[], sign: 1 | -1) => {
    let best = -Infinity;
    let at = { k: ks[0]!, seg: 0 };
    for (const k of ks) for (let seg = 0; seg < S; seg++) for (const i of nodes) {
      const v = sign * T(k, seg, i);
      if (v > best) {
        best = v;
        at = { k, seg };
      }
    }
    return { valueK: sign * best, ...where(at.k, at.seg) };
  };
  const lining = s.layers[0]!;
  const liningNodes = range(lining.firstNode, lining.lastNode);
  const peakShell = extreme([N - 1], 1);
  const peakLining = extreme(liningNodes, 1);
  const minInner = extreme([0], -1);

  // ---- positions (surfaces and interfaces) ----
  const positions: PositionRange[] = [];
  s.nodeLabel.forEach((label, i) => {
    if (label.startsWith('node_')) return;
    let min = Infinity;
    let max = -Infinity;
    let swing = -Infinity;
    let swingSeg = 0;
    for (let seg = 0; seg < S; seg++) {
      let lo = Infinity;
      let hi = -Infinity;
      for (const k of ks) {
        const v = T(k, seg, i);
        lo = Math.min(lo, v);
        hi = Math.max(hi, v);
      }
      min = Math.min(min, lo);
      max = Math.max(max, hi);
      if (hi - lo > swing) {
        swing = hi - lo;
        swingSeg = seg;
      }
    }
    positions.push({ position: label, radius_m: round(s.nodeRadius[i]!, 4), min_c: round(c(min)), max_c: round(c(max)), swing_k: round(swing), swing_height_m: round(s.heightM[swingSeg]!, 2) });
  });

  // ---- layers ----
  const layers: LayerSummary[] = s.layers.map((layer, j) => {
    const nodes = range(layer.firstNode, layer.lastNode);
    let min = Infinity;
    let max = -Infinity;
    let swing = 0;
    let dMax = -1;
    let dAt = { k: ks[0]!, seg: 0 };
    for (let seg = 0; seg < S; seg++) {
      let lo = Infinity;
      let hi = -Infinity;
      for (const k of ks) {
        for (const i of nodes) {
          const v = T(k, seg, i);
          lo = Math.min(lo, v);
          hi = Math.max(hi, v);
        }
        const d = Math.abs(T(k, seg, layer.firstNode) - T(k, seg, layer.lastNode));
        if (d > dMax) {
          dMax = d;
          dAt = { k, seg };
        }
      }
      min = Math.min(min, lo);
      max = Math.max(max, hi);
      // swing of the layer: the largest daily swing of any of its nodes at this height
      for (const i of nodes) {
        let l2 = Infinity;
        let h2 = -Infinity;
        for (const k of ks) {
          const v = T(k, seg, i);
          l2 = Math.min(l2, v);
          h2 = Math.max(h2, v);
        }
        swing = Math.max(swing, h2 - l2);
      }
    }
    const m = inputs.layers[j]!.material;
    const stress = m.kind === 'solid' && m.youngsModulus > 0 && m.thermalExpansion > 0 ? thermalStressIndicator(m.youngsModulus, m.thermalExpansion, m.poissonRatio, dMax) / 1e6 : null;
    const w = where(dAt.k, dAt.seg);
    return {
      label: layer.label,
      material: layer.material,
      kind: layer.kind,
      thickness_mm: round(layer.thickness * 1000, 1),
      min_c: round(c(min)),
      max_c: round(c(max)),
      swing_k: round(swing),
      max_delta_t_k: round(dMax, 3),
      max_delta_t_time: w.time,
      max_delta_t_height_m: w.height,
      stress_indicator_mpa: stress === null ? null : round(stress, 3),
      max_service_c: m.kind === 'solid' ? round(c(m.maxServiceTemperatureK), 1) : null,
    };
  });

  // ---- through-wall difference ----
  let twMax = -1;
  let twAt = { k: ks[0]!, seg: 0 };
  for (const k of ks) for (let seg = 0; seg < S; seg++) {
    const d = Math.abs(T(k, seg, 0) - T(k, seg, N - 1));
    if (d > twMax) {
      twMax = d;
      twAt = { k, seg };
    }
  }
  const tw = where(twAt.k, twAt.seg);

  // ---- dew points ----
  const marginMin = (arr: Float64Array) => {
    let best = Infinity;
    let at = { k: ks[0]!, seg: 0 };
    for (const k of ks) for (let seg = 0; seg < S; seg++) {
      const v = arr[k * S + seg]!;
      if (v < best) {
        best = v;
        at = { k, seg };
      }
    }
    return { value: best, ...where(at.k, at.seg) };
  };
  const waterMargin = marginMin(s.segment.waterDewMarginK);
  const acidMargin = s.acidDewPointK === null ? null : marginMin(s.segment.acidDewMarginK);
  const hoursBelow = (arr: Float64Array): HeightHours[] => {
    const out: HeightHours[] = [];
    for (let seg = 0; seg < S; seg++) {
      let seconds = 0;
      for (let q = 1; q < ks.length; q++) {
        const k0 = ks[q - 1]!;
        const k1 = ks[q]!;
        seconds += fractionBelowZero(arr[k0 * S + seg]!, arr[k1 * S + seg]!) * (s.t[k1]! - s.t[k0]!);
      }
      out.push({ height_m: round(s.heightM[seg]!, 2), hours: round(seconds / 3600, 2) });
    }
    return out;
  };

  // ---- gas and draft ----
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

  // ---- energy per day ----
  const e: EnergyAccount = inputs.run.mode === 'warmup' ? result.energy.run : result.energy.lastDay;
  const perDay = (j: number) => round((j / J_PER_KWH) * (SECONDS_PER_DAY / e.periodS), 2);

  // ---- warm-up ----
  const limits = inputs.limits;
  let warmup: Summary['warmup'] = null;
  if (inputs.run.mode === 'warmup' && result.firingStartT !== null) {
    const t0 = result.firingStartT;
    const times = Array.from(s.t, (t) => t - t0);
    const atHeight = (seg: number): WarmupAtHeight => {
      const inner = ks.map((k) => T(k, seg, 0));
      const shell = ks.map((k) => T(k, seg, N - 1));
      const tt = ks.map((k) => times[k]!);
      const min = (x: number | null) => (x === null ? null : round(x / 60, 1));
      const shellRise = shell[shell.length - 1]! - shell[0]!;
      return {
        height_m: round(s.heightM[seg]!, 2),
        minutes_to_water_dew: min(timeToStayAbove(tt, inner, s.waterDewPointK + (limits.waterDewMarginK ?? 0))),
        minutes_to_acid_dew: s.acidDewPointK === null ? null : min(timeToStayAbove(tt, inner, s.acidDewPointK + (limits.acidDewMarginK ?? 0))),
        minutes_to_shell_90_percent: shellRise > 0.1 ? min(timeToReach(tt, shell, shell[0]! + 0.9 * shellRise)) : null,
        minutes_to_shell_touch: limits.shellTouchK === undefined ? null : min(timeToReach(tt, shell, limits.shellTouchK)),
      };
    };
    const byHeight = Array.from({ length: S }, (_, seg) => atHeight(seg));
    warmup = { firing_start_local: s.isoLocal[0]!, top: byHeight[S - 1]!, by_height: byHeight };
  }

  // ---- verdicts ----
  const verdicts: Verdict[] = [];
  const setVerdict = (v: Omit<Verdict, 'status'> & { pass: boolean | null }) => {
    const { pass, ...rest } = v;
    verdicts.push({ ...rest, status: pass === null ? 'not-set' : pass ? 'pass' : 'fail' });
  };
  setVerdict({
    limit: 'shell_touch',
    title: 'Outer shell touch limit',
    pass: limits.shellTouchK === undefined ? null : peakShell.valueK <= limits.shellTouchK,
    limit_value: limits.shellTouchK === undefined ? null : round(c(limits.shellTouchK), 1),
    governing_value: round(c(peakShell.valueK)),
    unit: '°C',
    time_local: peakShell.time,
    height_m: peakShell.height,
    detail: 'hottest outer-surface temperature against the touch limit',
  });
  setVerdict({
    limit: 'lining_service',
    title: 'Lining service temperature',
    pass: limits.liningServiceK === undefined ? null : peakLining.valueK <= limits.liningServiceK,
    limit_value: limits.liningServiceK === undefined ? null : round(c(limits.liningServiceK), 1),
    governing_value: round(c(peakLining.valueK)),
    unit: '°C',
    time_local: peakLining.time,
    height_m: peakLining.height,
    detail: `hottest temperature anywhere in the ${lining.label} layer against its service limit`,
  });
  const stressed = layers.map((l, j) => ({ l, j })).filter(({ l }) => l.stress_indicator_mpa !== null);
  const worst = stressed.reduce<{ l: LayerSummary; j: number } | null>((a, b) => (a === null || b.l.stress_indicator_mpa! > a.l.stress_indicator_mpa! ? b : a), null);
  setVerdict({
    limit: 'allowable_stress',
    title: 'Thermal-stress indicator',
    pass: limits.allowableStressPa === undefined || worst === null ? null : worst.l.stress_indicator_mpa! <= limits.allowableStressPa / 1e6,
    limit_value: limits.allowableStressPa === undefined ? null : round(limits.allowableStressPa / 1e6, 3),
    governing_value: worst ? worst.l.stress_indicator_mpa : null,
    unit: 'MPa',
    time_local: worst ? worst.l.max_delta_t_time : null,
    height_m: worst ? worst.l.max_delta_t_height_m : null,
    detail: worst ? `E·α·ΔT/(2(1−ν)) of the ${worst.l.label} layer at its largest temperature difference (${worst.l.max_delta_t_k} K)` : 'no layer has elastic data',
  });
  const dewVerdict = (limit: 'acid_dew_margin' | 'water_dew_margin', marginK: number | undefined, m: { value: number; time: string; height: number } | null, dewK: number | null, title: string) => {
    if (m === null || dewK === null) {
      setVerdict({ limit, title, pass: null, limit_value: marginK ?? null, governing_value: null, unit: 'K', time_local: null, height_m: null, detail: 'the flue gas carries no SO3: no acid dew point' });
      return;
    }
    if (inputs.run.mode === 'warmup') {
      const key = limit === 'acid_dew_margin' ? 'minutes_to_acid_dew' : 'minutes_to_water_dew';
      const slowest = warmup!.by_height.reduce((a, b) => ((b[key] ?? Infinity) > (a[key] ?? Infinity) ? b : a));
      const minutes = slowest[key];
      setVerdict({
        limit,
        title: `${limit === 'acid_dew_margin' ? 'Acid' : 'Water'} dew point + ${round(marginK ?? 0, 1)} K reached (warm-up)`,
        pass: marginK === undefined ? null : minutes !== null,
        limit_value: null,
        governing_value: minutes,
        unit: 'min',
        time_local: null,
        height_m: slowest.height_m,
        detail: minutes === null ? `the inner surface does not reach ${round(c(dewK) + (marginK ?? 0), 1)} °C everywhere within the run` : `slowest height reaches the dew point plus margin after ${minutes} min of firing`,
      });
      return;
    }
    setVerdict({
      limit,
      title,
      pass: marginK === undefined ? null : m.value >= marginK,
      limit_value: marginK === undefined ? null : round(marginK, 2),
      governing_value: round(m.value),
      unit: 'K',
      time_local: m.time,
      height_m: m.height,
      detail: `lowest margin of the inner surface above the ${limit === 'acid_dew_margin' ? 'acid' : 'water'} dew point (${round(c(dewK), 1)} °C)`,
    });
  };
  dewVerdict('acid_dew_margin', limits.acidDewMarginK, acidMargin, s.acidDewPointK, 'Margin above the acid dew point');
  dewVerdict('water_dew_margin', limits.waterDewMarginK, waterMargin, s.waterDewPointK, 'Margin above the water dew point');

  const warnings = [...result.warnings];
  if (result.periodic && !result.periodic.reached)
    warnings.push(`the periodic state was NOT reached in ${result.daysSimulated} days (last day-to-day change ${round(result.periodic.lastChangeK, 3)} K > tolerance ${result.periodic.toleranceK} K); figures are for the last simulated day`);
  if (Math.abs(e.residualPercent) > 0.1) warnings.push(`energy residual ${round(e.residualPercent, 3)} % exceeds 0.1 %: tighten the integrator tolerances`);

  const mode = inputs.run.mode;
  return {
    tool: { name: 'stackday', version },
    scenario: { name: inputs.name, description: description ?? null, site: inputs.site.name, first_day: inputs.site.startDate, time_zone: inputs.site.timeZone },
    run: {
      mode,
      days_simulated: result.daysSimulated,
      evaluated_over: mode === 'warmup' ? 'the whole run from firing start' : result.periodic ? 'the settled (periodic) day' : 'the last simulated day',
      periodic_requested: result.periodic !== null,
      periodic_reached: result.periodic ? result.periodic.reached : null,
      periodic_last_change_k: result.periodic ? round(result.periodic.lastChangeK, 4) : null,
      periodic_tolerance_k: result.periodic ? result.periodic.toleranceK : null,
      periodic_change_by_day_k: result.periodic ? result.periodic.changeByDayK.map((v) => round(v, 4)) : [],
      integrator: result.integrator.name,
      steps: result.integrator.steps,
      compute_ms: round(result.integrator.computeMs, 1),
      output_interval_min: round(inputs.run.outputInterval / 60, 2),
      segments: S,
      nodes_per_segment: N,
    },
    verdicts,
    all_limits_pass: verdicts.every((v) => v.status !== 'fail'),
    peak_shell_c: round(c(peakShell.valueK)),
    peak_shell_time: peakShell.time,
    peak_shell_height_m: peakShell.height,
    peak_lining_c: round(c(peakLining.valueK)),
    peak_lining_time: peakLining.time,
    peak_lining_height_m: peakLining.height,
    min_inner_surface_c: round(c(minInner.valueK)),
    min_inner_surface_time: minInner.time,
    min_inner_surface_height_m: minInner.height,
    positions,
    layers,
    through_wall_max_delta_t_k: round(twMax),
    through_wall_max_delta_t_time: tw.time,
    through_wall_max_delta_t_height_m: tw.height,
    water_dew_point_c: round(c(s.waterDewPointK)),
    acid_dew_point_c: s.acidDewPointK === null ? null : round(c(s.acidDewPointK)),
    lowest_water_dew_margin_k: round(waterMargin.value),
    lowest_water_dew_margin_time: waterMargin.time,
    lowest_water_dew_margin_height_m: waterMargin.height,
    lowest_acid_dew_margin_k: acidMargin ? round(acidMargin.value) : null,
    lowest_acid_dew_margin_time: acidMargin ? acidMargin.time : null,
    lowest_acid_dew_margin_height_m: acidMargin ? acidMargin.height : null,
    hours_below_water_dew: hoursBelow(s.segment.waterDewMarginK),
    hours_below_acid_dew: s.acidDewPointK === null ? [] : hoursBelow(s.segment.acidDewMarginK),
    gas_exit_min_c: round(c(exitMin)),
    gas_exit_max_c: round(c(exitMax)),
    draft_min_pa: round(draftMin),
    draft_max_pa: round(draftMax),
    heat_loss_kwh_per_day: perDay(e.convectionJ + e.radiationJ - e.sunJ),
    gas_to_wall_kwh_per_day: perDay(e.gasToWallJ),
    sun_absorbed_kwh_per_day: perDay(e.sunJ),
    convection_kwh_per_day: perDay(e.convectionJ),
    radiation_kwh_per_day: perDay(e.radiationJ),
    energy_residual_percent: round(e.residualPercent, 5),
    warmup,
    warnings,
    cautions: CAUTIONS,
  };
}

/** Fraction of a straight segment from a to b that lies below zero. */
export function fractionBelowZero(a: number, b: number): number {
  if (a >= 0 && b >= 0) return 0;
  if (a < 0 && b < 0) return 1;
  const f = a / (a - b); // where the line crosses zero, as a fraction from a
  return a < 0 ? f : 1 - f;
}

function range(a: number, b: number): number[] {
  const out: number[] = [];
  for (let i = a; i <= b; i++) out.push(i);
  return out;
}
