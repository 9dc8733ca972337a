/**
 * The console result sheet: verdicts first, then the figures behind them, then the cautions.
 * Plain text, fixed-width columns, readable in any terminal and in a CI log.
 */
import type { AnnualSummary, Summary, Verdict } from '../analysis/summary.ts';
import type { Comparison } from '../analysis/compare.ts';
import { decimals, isoMinute, MISSING, plusMinus } from './format.ts';

const STATUS_WORD: Record<Verdict['status'], string> = { pass: 'PASS', fail: 'FAIL', 'not-set': MISSING };

/** Lay out rows in columns padded to the widest cell. */
export function table(rows: readonly (readonly string[])[], align: readonly ('l' | 'r')[] = []): string[] {
  const widths: number[] = [];
  for (const r of rows) r.forEach((cell, i) => (widths[i] = Math.max(widths[i] ?? 0, [...cell].length)));
  return rows.map((r) => r.map((cell, i) => (align[i] === 'r' ? cell.padStart(widths[i]!) : cell.padEnd(widths[i]!))).join('  ').trimEnd());
}

const num = (v: number | null | undefined, digits = 1): string => decimals(v, digits);
const hhmm = isoMinute;

/** The whole sheet as lines; `timing.seconds`, the run's own time, is shown here only (no file carries it). */
export function resultSheet(s: Summary, outDir?: string, timing?: { readonly seconds: number }): string[] {
  const lines: string[] = [];
  const rule = '─'.repeat(78);
  lines.push(rule);
  lines.push(`stackday ${s.tool.version} · ${s.scenario.name} · ${s.scenario.site} · ${s.scenario.first_day} (${s.scenario.time_zone})`);
  lines.push(`${s.run.mode === 'warmup' ? 'Warm-up study' : 'Daily cycle'}; figures over ${s.run.evaluated_over}; ${s.run.days_simulated} day(s) simulated`);
  lines.push(rule);
  const over = s.run.verdicts_over === s.run.evaluated_over ? '' : ` (judged over ${s.run.verdicts_over})`;
  lines.push(`VERDICTS   ${s.all_limits_pass ? 'every limit that was set passes' : 'AT LEAST ONE LIMIT FAILS'}${over}`);
  lines.push(
    ...table(
      [
        ['', 'limit', 'found', 'allowed', 'unit', 'when', 'height m'],
        ...s.verdicts.map((v) => [STATUS_WORD[v.status], v.title, num(v.governing_value), num(v.limit_value), v.unit, hhmm(v.time_local), num(v.height_m)]),
      ],
      ['l', 'l', 'r', 'r', 'l', 'l', 'r'],
    ).map((l) => `  ${l}`),
  );
  lines.push('');
  lines.push('PEAKS AND MINIMA');
  lines.push(
    ...table(
      [
        ['hottest shell', `${num(s.peak_shell_c)} °C`, plusMinus(s.accuracy.peak_shell_k, 'K'), hhmm(s.peak_shell_time), `at ${num(s.peak_shell_height_m)} m`],
        ['hottest lining', `${num(s.peak_lining_c)} °C`, plusMinus(s.accuracy.peak_lining_k, 'K'), hhmm(s.peak_lining_time), `at ${num(s.peak_lining_height_m)} m`],
        ['coldest inner surface', `${num(s.min_inner_surface_c)} °C`, '', hhmm(s.min_inner_surface_time), `at ${num(s.min_inner_surface_height_m)} m`],
        ['largest through-wall ΔT', `${num(s.through_wall_max_delta_t_k)} K`, '', hhmm(s.through_wall_max_delta_t_time), `at ${num(s.through_wall_max_delta_t_height_m)} m`],
      ],
      ['l', 'r', 'l', 'l', 'l'],
    ).map((l) => `  ${l}`),
  );
  lines.push('');
  lines.push('LAYERS (daily range; ΔT across the layer; stress indicator E·α·ΔT/(2(1−ν)))');
  lines.push(
    ...table(
      [
        ['layer', 'material', 'mm', 'min °C', 'max °C', 'swing K', 'max ΔT K', 'σ MPa'],
        ...s.layers.map((l) => [l.label, l.material, num(l.thickness_mm, 0), num(l.min_c), num(l.max_c), num(l.swing_k), num(l.max_delta_t_k), num(l.stress_indicator_mpa, 2)]),
      ],
      ['l', 'l', 'r', 'r', 'r', 'r', 'r', 'r'],
    ).map((l) => `  ${l}`),
  );
  lines.push('');
  lines.push('SURFACES AND INTERFACES');
  lines.push(
    ...table(
      [['position', 'radius m', 'min °C', 'max °C', 'swing K'], ...s.positions.map((p) => [p.position, num(p.radius_m, 3), num(p.min_c), num(p.max_c), num(p.swing_k)])],
      ['l', 'r', 'r', 'r', 'r'],
    ).map((l) => `  ${l}`),
  );
  lines.push('');
  lines.push('FLUE GAS AND DEW POINTS');
  const pm = (v: number | null) => (plusMinus(v, 'K') ? ` ${plusMinus(v, 'K')}` : '');
  const acid =
    s.acid_dew_point_c === null
      ? 'none (no SO3)'
      : `${num(s.acid_dew_point_c)} °C, lowest margin ${num(s.lowest_acid_dew_margin_k)} K${pm(s.accuracy.lowest_acid_dew_margin_k)} at ${num(s.lowest_acid_dew_margin_height_m)} m, ${hhmm(s.lowest_acid_dew_margin_time)}`;
  lines.push(`  acid dew point   ${acid}`);
  lines.push(`  water dew point  ${num(s.water_dew_point_c)} °C, lowest margin ${num(s.lowest_water_dew_margin_k)} K${pm(s.accuracy.lowest_water_dew_margin_k)} at ${num(s.lowest_water_dew_margin_height_m)} m, ${hhmm(s.lowest_water_dew_margin_time)}`);
  const top = (arr: readonly { height_m: number; hours: number }[]) => (arr.length ? `${num(arr[arr.length - 1]!.hours)} h at the top, ${num(arr[0]!.hours)} h at the bottom` : MISSING);
  lines.push(`  hours below acid dew point   ${top(s.hours_below_acid_dew)}`);
  lines.push(`  hours below water dew point  ${top(s.hours_below_water_dew)}`);
  lines.push(`  gas exit ${num(s.gas_exit_min_c)} to ${num(s.gas_exit_max_c)} °C; draft ${num(s.draft_min_pa)} to ${num(s.draft_max_pa)} Pa`);
  if (s.warmup) {
    lines.push('');
    lines.push(`WARM-UP from firing at ${hhmm(s.warmup.firing_start_local)} (minutes; at the top of the stack)`);
    const w = s.warmup.top;
    const a = s.accuracy;
    const pmMin = (v: number | null) => (plusMinus(v, 'min') ? ` ${plusMinus(v, 'min')}` : '');
    lines.push(`  inner surface above water dew point + margin: ${num(w.minutes_to_water_dew, 0)} min${pmMin(a.warmup_minutes_to_water_dew)}`);
    lines.push(`  inner surface above acid dew point + margin:  ${num(w.minutes_to_acid_dew, 0)} min${pmMin(a.warmup_minutes_to_acid_dew)}`);
    lines.push(
      `  shell at 90 % of its rise: ${num(w.minutes_to_shell_90_percent, 0)} min${pmMin(a.warmup_minutes_to_shell_90_percent)}; shell past the touch limit: ${w.minutes_to_shell_touch === null ? 'never' : `${num(w.minutes_to_shell_touch, 0)} min${pmMin(a.warmup_minutes_to_shell_touch)}`}`,
    );
    lines.push(`  by height (minutes from firing; ${MISSING} = not within the run):`);
    lines.push(
      ...table(
        [
          ['height m', 'water dew', 'acid dew', 'shell 90 %', 'shell touch'],
          ...[...s.warmup.by_height].reverse().map((h) => [num(h.height_m), num(h.minutes_to_water_dew, 0), num(h.minutes_to_acid_dew, 0), num(h.minutes_to_shell_90_percent, 0), num(h.minutes_to_shell_touch, 0)]),
        ],
        ['r', 'r', 'r', 'r', 'r'],
      ).map((l) => `    ${l}`),
    );
  }
  if (s.sectors) {
    const x = s.sectors;
    lines.push('');
    lines.push(`SUN-FACING SIDE (${x.count} sectors round the circumference; azimuths clockwise from north)`);
    lines.push(`  hottest shell ${num(s.peak_shell_c)} °C on the side facing ${num(x.peak_shell_azimuth_deg, 1)}°; sunniest side ${num(x.sunniest_sector_azimuth_deg, 1)}°, shadiest ${num(x.shadiest_sector_azimuth_deg, 1)}°`);
    lines.push(`  largest side-to-side difference: shell ${num(x.largest_side_to_side_shell_k)} K (${hhmm(x.largest_side_to_side_shell_time)} at ${num(x.largest_side_to_side_shell_height_m)} m), mean wall ${num(x.largest_side_to_side_wall_k)} K (${hhmm(x.largest_side_to_side_wall_time)} at ${num(x.largest_side_to_side_wall_height_m)} m)`);
    lines.push(`  thermal bow: tip deflection up to ${num(x.bow_largest_tip_deflection_mm)} mm (${hhmm(x.bow_largest_tip_deflection_time)}; α ${x.bow_expansion_per_k} /K) — an indicator, not a structural check`);
  }
  lines.push('');
  lines.push('HEAT (per day)');
  lines.push(`  net loss to outside ${num(s.heat_loss_kwh_per_day)} kWh (convection ${num(s.convection_kwh_per_day)}, radiation ${num(s.radiation_kwh_per_day)}, sun absorbed ${num(s.sun_absorbed_kwh_per_day)}); from the gas ${num(s.gas_to_wall_kwh_per_day)} kWh`);
  lines.push(`  energy residual ${num(s.energy_residual_percent, 4)} % of the energy exchanged over the figures' period, ${num(s.energy_residual_run_percent, 4)} % over the run`);
  if (s.daily.length > 1) {
    const hottest = s.daily.reduce((a, d) => (d.shell_max_c > a.shell_max_c ? d : a));
    const heat = s.daily.reduce((sum, d) => sum + (d.heat_loss_kwh ?? 0), 0);
    lines.push(`  over ${s.daily.length} days: ${num(heat, 0)} kWh lost in all; hottest shell ${num(hottest.shell_max_c)} °C on day ${hottest.day} (every day in summary.json, daily)`);
  }
  if (s.annual) lines.push('', ...annualLines(s.annual));
  if (s.run.periodic_requested)
    lines.push(`  periodic state ${s.run.periodic_reached ? 'reached' : 'NOT reached'} after ${s.run.days_simulated} days (last change ${num(s.run.periodic_last_change_k, 3)} K, tolerance ${num(s.run.periodic_tolerance_k, 3)} K)`);
  lines.push('');
  lines.push(...accuracyLines(s));
  if (s.assumptions.length) {
    lines.push('');
    lines.push('ASSUMPTIONS OF THIS RUN');
    for (const a of s.assumptions) lines.push(`  · ${a}`);
  }
  if (s.warnings.length) {
    lines.push('');
    lines.push('WARNINGS');
    for (const w of s.warnings) lines.push(`  ! ${w}`);
  }
  lines.push('');
  lines.push('CAUTIONS');
  for (const c of s.cautions) lines.push(`  · ${c}`);
  if (outDir) {
    lines.push('');
    lines.push(`Results written to ${outDir}`);
  }
  if (timing) lines.push(`Computed and written in ${decimals(timing.seconds, 1)} s`);
  lines.push(rule);
  return lines;
}

/** The annual section of the sheet: the year's hours below the dew points, heat, month by month, and the thermal cycles. */
function annualLines(a: AnnualSummary): string[] {
  const lines: string[] = [];
  const acid = a.hours_below_acid_dew.length > 0;
  const top = (rows: readonly { height_m: number; hours: number }[]) => (rows.length ? `${num(rows[rows.length - 1]!.hours, 0)} h at the top, ${num(rows[0]!.hours, 0)} h at the bottom` : MISSING);
  lines.push(`THE YEAR  ${a.first_day} to ${a.last_day}, ${a.days} days${a.full_year ? '' : ' (less than a year)'}`);
  if (acid) lines.push(`  hours below acid dew point   ${top(a.hours_below_acid_dew)}`);
  lines.push(`  hours below water dew point  ${top(a.hours_below_water_dew)}`);
  lines.push(`  heat lost to outside ${num(a.heat_loss_kwh / 1000, 1)} MWh (from the gas ${num(a.gas_to_wall_kwh / 1000, 1)} MWh)`);
  lines.push(`  hottest shell ${num(a.peak_shell_c)} °C (${hhmm(a.peak_shell_time)}, ${num(a.peak_shell_height_m)} m); hottest lining ${num(a.peak_lining_c)} °C (${hhmm(a.peak_lining_time)}); coldest inner surface ${num(a.min_inner_surface_c)} °C (${hhmm(a.min_inner_surface_time)})`);
  const month = (rows: readonly { hours: number }[]) => (rows.length ? num(rows[rows.length - 1]!.hours, 0) : MISSING);
  lines.push(
    ...table(
      [
        ['month', 'days', ...(acid ? ['h < acid dew (top)'] : []), 'h < water dew (top)', 'heat MWh', 'shell max °C', 'lining max °C', 'inner min °C'],
        ...a.months.map((m) => [m.month, String(m.days), ...(acid ? [month(m.hours_below_acid_dew)] : []), month(m.hours_below_water_dew), num(m.heat_loss_kwh / 1000, 1), num(m.shell_max_c), num(m.lining_max_c), num(m.inner_surface_min_c)]),
      ],
      ['l', 'r', 'r', 'r', 'r', 'r', 'r', 'r'],
    ).map((l) => `  ${l}`),
  );
  const t = a.cycles.threshold_k;
  lines.push(`  thermal cycles (rainflow, ASTM E1049; ΔT sampled every ${num(a.cycles.sampled_every_min, 0)} min, reversals under ${num(a.cycles.gate_k, 1)} K left out; at the height with the most${t === null ? ' (largest range)' : ''})`);
  lines.push(
    ...table(
      [
        ['across', 'height m', 'cycles', ...(t === null ? [] : [`above ${num(t, 0)} K`]), 'largest range K'],
        ...a.cycles.across.map((c) => [c.across, num(c.governing_height_m), num(c.cycles, 1), ...(t === null ? [] : [num(c.cycles_above_threshold, 1)]), num(c.largest_range_k)]),
      ],
      ['l', 'r', 'r', 'r', 'r'],
    ).map((l) => `    ${l}`),
  );
  lines.push('  (every month, height and range bin in summary.json annual, monthly.csv and cycles.csv)');
  return lines;
}

/** The ACCURACY block: the estimate (or that there is none), the mesh and the tolerances. */
function accuracyLines(s: Summary): string[] {
  const a = s.accuracy;
  const m = s.run.mesh;
  const lines = ['ACCURACY'];
  if (a.check === null) lines.push('  not estimated (run.accuracy: off)');
  else {
    lines.push(`  estimated error: temperatures through the day ${plusMinus(a.temperatures_k, 'K')}, peaks and lowest margins as shown beside them`);
    lines.push(`  (${a.method})`);
    if (a.target_k !== null) lines.push(`  target ${a.target_k} K ${a.target_met ? 'met' : 'NOT met'} after ${a.refinements} refinement(s)`);
  }
  const cells = m.layers.filter((l) => l.cells > 0).map((l) => `${l.label} ${l.cells} (${num(l.smallest_cell_mm, 1)}–${num(l.largest_cell_mm, 1)} mm)`);
  lines.push(`  mesh: ${cells.join(', ')} cells${m.refinement > 1 ? `, ${m.refinement}× the scenario's` : ''}; graded to ${m.flue_side_set_by} inside, ${m.outside_set_by} outside`);
  const tolerance = (v: number) => (v < 1e-3 ? v.toExponential() : String(v));
  lines.push(`  tolerances: relative ${tolerance(s.run.relative_tolerance)}, absolute ${tolerance(s.run.absolute_tolerance_k)} K`);
  return lines;
}

/** The comparison of several build-ups as lines. */
export function comparisonSheet(c: Comparison, cautions: readonly string[]): string[] {
  const lines: string[] = [];
  const rule = '─'.repeat(78);
  lines.push(rule);
  lines.push(`COMPARISON OF ${c.rows.length} BUILD-UPS (choice: ${c.rule})`);
  lines.push(
    ...table(
      [
        ['', 'scenario', 'limits', 'shell °C', 'lining °C', 'acid margin K', 'σ MPa', 'loss kWh/day'],
        ...c.rows.map((r) => [
          r.scenario === c.recommended ? '→' : '',
          r.scenario,
          r.all_limits_pass ? 'all pass' : `FAIL: ${r.failed_limits.join(', ')}`,
          num(r.peak_shell_c),
          num(r.peak_lining_c),
          num(r.lowest_acid_dew_margin_k),
          num(r.max_stress_indicator_mpa, 2),
          num(r.heat_loss_kwh_per_day),
        ]),
      ],
      ['l', 'l', 'l', 'r', 'r', 'r', 'r', 'r'],
    ).map((l) => `  ${l}`),
  );
  lines.push('');
  for (const r of c.rows) lines.push(`  ${r.scenario}: ${r.build_up}`);
  lines.push('');
  lines.push(c.recommended ? `Meets every limit at the least heat loss: ${c.recommended}` : 'No build-up meets every limit that is set.');
  lines.push('');
  lines.push('CAUTIONS');
  for (const x of cautions) lines.push(`  · ${x}`);
  lines.push(rule);
  return lines;
}
