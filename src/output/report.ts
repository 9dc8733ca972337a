/**
 * report.html: one self-contained page an engineer can open, print or mail. No network and no
 * external files: the CSS is inline and the charts are embedded as data:image/png;base64 URIs.
 * Every text taken from the scenario is HTML-escaped. Status is spelled out (PASS / FAIL /
 * NOT SET), never shown by colour alone. Inputs are SI/kelvin; this edge converts for display.
 */
import type { ModelInputs, FiringPointInput, LayerInput } from '../model/inputs.ts';
import type { PlantCalendarSpec, WeekPattern } from '../model/calendar.ts';
import type { Summary, Verdict, WarmupAtHeight } from '../analysis/summary.ts';
import { correlationsInUse } from './modelDescription.ts';
import { celsius as toC, clockFromSeconds as clock, fixed as num, isoMinute as when, MISSING, plusMinus } from './format.ts';

export interface ReportChart {
  readonly fileName: string;
  readonly title: string;
  readonly png: Buffer | Uint8Array;
}

/** Escape text for HTML element content and double-quoted attribute values. */
export function escapeHtml(value: unknown): string {
  return String(value ?? '')
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&#39;');
}

const esc = escapeHtml;

const STATUS_WORD: Record<Verdict['status'], string> = { pass: 'PASS', fail: 'FAIL', 'not-set': 'NOT SET' };
const STATUS_MARK: Record<Verdict['status'], string> = { pass: '✓', fail: '✗', 'not-set': MISSING };

function table(head: readonly string[], rows: readonly string[], cls = ''): string {
  return `<table${cls ? ` class="${cls}"` : ''}><thead><tr>${head.map((h) => `<th scope="col">${h}</th>`).join('')}</tr></thead><tbody>${rows.join('')}</tbody></table>`;
}

const td = (v: string, cls = '') => `<td${cls ? ` class="${cls}"` : ''}>${v}</td>`;

// ---------------------------------------------------------------- sections

function jobSection(): string {
  return `<section id="job"><h2>What this report is</h2>
<p>stackday is for plant, boiler, kiln and incinerator engineers and for the designers and inspectors of
industrial and masonry stacks. It follows the layered wall of a tall cylindrical stack through whole days:
heat flows radially through each layer in every axial segment while the flue gas, the firing schedule, the sun,
the wind and the sky change through the day. From that it reports the peak shell and lining temperatures, the
daily swing of every layer, the largest through-wall temperature difference and a thermal-stress indicator, the
margins of the inner surface above the acid and water dew points of the flue gas, warm-up times after firing,
and the heat lost per day &mdash; each compared with the limits set in the scenario.</p></section>`;
}

function layerRow(l: LayerInput, j: number): string {
  const m = l.material;
  const k = m.kind === 'solid' && m.conductivity.values.length > 0 ? `${num(Math.min(...m.conductivity.values), 3)}–${num(Math.max(...m.conductivity.values), 3)}` : 'still air';
  return `<tr>${td(String(j + 1))}${td(esc(l.label))}${td(`${esc(m.name)}<div class="note">${esc(m.description)}</div>`)}${td(esc(m.kind))}${td(num(l.thickness * 1000, 1), 'n')}${td(k, 'n')}${td(m.kind === 'solid' ? num(m.density, 0) : MISSING, 'n')}${td(m.kind === 'solid' ? num(toC(m.maxServiceTemperatureK), 0) : MISSING, 'n')}${td(l.contactResistanceToNext > 0 ? num(l.contactResistanceToNext, 4) : '0', 'n')}</tr>`;
}

function weatherText(inputs: ModelInputs): string {
  const w = inputs.weather;
  if (w.kind === 'design-day')
    return `Design day: air ${num(toC(w.minAirTemperatureK))}–${num(toC(w.maxAirTemperatureK))} °C, mean wind ${num(w.windSpeed)} m/s at ${num(w.referenceHeightM, 0)} m (daily amplitude ±${num(w.windDailyAmplitude * 100, 0)} %), cloud cover ${num(w.cloudCover * 100, 0)} %, dew point ${num(toC(w.dewPointK))} °C.`;
  if (w.kind === 'file') return `Weather file <code>${esc(w.fileName)}</code>, wind measured at ${num(w.referenceHeightM, 0)} m.`;
  return 'Weather supplied in code (library use).';
}

function scheduleRows(inputs: ModelInputs): { caption: string; dayHeader: string | null; rows: string[] } {
  const sch = inputs.flue.schedule;
  const row = (p: FiringPointInput, day?: string) => `<tr>${day === undefined ? '' : td(esc(day))}${td(clock(p.clockS))}${td(num(toC(p.inletTemperatureK)), 'n')}${td(num(p.massFlow, 3), 'n')}</tr>`;
  if ('daily' in sch) return { caption: 'The same schedule every day; linear between points.', dayHeader: null, rows: sch.daily.map((p) => row(p)) };
  if ('perDay' in sch) return { caption: 'One schedule per day, in turn; linear between points.', dayHeader: 'Day', rows: sch.perDay.flatMap((pts, d) => pts.map((p) => row(p, String(d + 1)))) };
  const c = sch.calendar;
  return { caption: `A plant calendar by local date; linear between points. ${calendarWords(c)}`, dayHeader: 'Day-schedule', rows: Object.entries(c.days).flatMap(([name, pts]) => pts.map((p) => row(p, name))) };
}

/** The rules of a plant calendar in words: the week, the seasons and the shutdowns. */
function calendarWords(c: PlantCalendarSpec): string {
  const week = (w: WeekPattern) => Object.entries(w).map(([days, name]) => `${days} ${name}`).join(', ');
  const parts = [`Week: ${week(c.week)}.`];
  for (const s of c.seasons ?? []) parts.push(`Season ${s.name} (${s.from} to ${s.to}): ${[s.week ? week(s.week) : '', s.flowScale !== undefined ? `flows × ${num(s.flowScale, 2)}` : ''].filter((x) => x).join('; ')}.`);
  for (const s of c.shutdowns ?? []) parts.push(`Shutdown ${s.name} (${s.from} to ${s.to}): ${c.shutdownDay ?? ''}.`);
  return esc(parts.join(' '));
}

function scenarioSection(summary: Summary, inputs: ModelInputs): string {
  const s = inputs.site;
  const st = inputs.stack;
  const outerDiameter = st.innerDiameter + 2 * inputs.layers.reduce((a, l) => a + l.thickness, 0);
  const comp = inputs.flue.composition;
  const compText = (['N2', 'O2', 'CO2', 'H2O', 'SO2', 'SO3'] as const).map((g) => `${g} ${num(comp[g] * 100, g === 'SO3' || g === 'SO2' ? 4 : 2)} %`).join(', ');
  const sched = scheduleRows(inputs);
  const rad = inputs.outside.radiation;
  const radText = rad.kind === 'sky-ground' ? `half to the sky (${rad.sky === 'swinbank' ? 'Swinbank' : 'Berdahl–Martin'} sky temperature), half to the ground` : rad.kind === 'surroundings' ? `to surroundings at ${num(toC(rad.temperatureK))} °C` : 'none';
  const run = inputs.run;
  const length = run.length.kind === 'days' ? `${run.length.days} day(s)` : `repeat the day until periodic (tolerance ${run.length.toleranceK} K, at most ${run.length.maxDays} days)`;
  const lim = inputs.limits;
  const limitText = [
    `shell touch ${lim.shellTouchK === undefined ? 'not set' : `${num(toC(lim.shellTouchK))} °C`}`,
    `lining service ${lim.liningServiceK === undefined ? 'not set' : `${num(toC(lim.liningServiceK))} °C`}`,
    `allowable stress ${lim.allowableStressPa === undefined ? 'not set' : `${num(lim.allowableStressPa / 1e6, 2)} MPa`}`,
    `acid dew margin ${lim.acidDewMarginK === undefined ? 'not set' : `${num(lim.acidDewMarginK)} K`}`,
    `water dew margin ${lim.waterDewMarginK === undefined ? 'not set' : `${num(lim.waterDewMarginK)} K`}`,
  ].join('; ');
  return `<section id="scenario"><h2>The scenario in brief</h2>
${summary.scenario.description ? `<p class="description">${esc(summary.scenario.description)}</p>` : ''}
<dl class="facts">
<dt>Site</dt><dd>${esc(s.name)}: ${num(Math.abs(s.latitudeDeg), 3)}° ${s.latitudeDeg >= 0 ? 'N' : 'S'}, ${num(Math.abs(s.longitudeDeg), 3)}° ${s.longitudeDeg >= 0 ? 'E' : 'W'}, ${num(s.elevationM, 0)} m above sea level; time zone ${esc(s.timeZone)}; first day ${esc(s.startDate)}; ground reflectance ${num(s.groundReflectance, 2)}; wind exponent ${num(s.windExponent, 2)}.</dd>
<dt>Stack</dt><dd>Height ${num(st.height, 1)} m, inner diameter ${num(st.innerDiameter, 3)} m, outer diameter ${num(outerDiameter, 3)} m, ${st.segments} axial segments.</dd>
<dt>Outer surface</dt><dd>Emissivity ${num(inputs.surface.emissivity, 2)}, solar absorptance ${num(inputs.surface.solarAbsorptance, 2)}; outside film ${inputs.outside.filmCoefficient === undefined ? 'from correlations (Churchill–Bernstein forced, Churchill–Chu natural, combined)' : `fixed at ${num(inputs.outside.filmCoefficient)} W/(m² K)`}; radiation ${radText}; sun ${inputs.outside.sun ? 'applied' : 'not applied'}.</dd>
<dt>Weather</dt><dd>${weatherText(inputs)}</dd>
<dt>Flue gas</dt><dd>${compText} (mole fractions of the wet gas); properties of the ${inputs.flue.properties === 'mixture' ? 'gas mixture' : 'air'}; inside film ${inputs.flue.filmCoefficient === undefined ? 'from the correlations in use (below)' : `fixed at ${num(inputs.flue.filmCoefficient)} W/(m² K)`}; gas ${inputs.flue.gasCooling ? 'cools as it rises' : 'at inlet temperature at every height'}; pressure ${num(inputs.flue.pressurePa / 1000, 2)} kPa${inputs.flue.offMassFlow !== undefined ? `; natural-draft flow while off at least ${num(inputs.flue.offMassFlow, 3)} kg/s` : ''}.</dd>
<dt>Run</dt><dd>${run.mode === 'warmup' ? `Warm-up from ${esc(initialWords(run.initial))}, firing from ${clock(run.firingStartClockS ?? 0)}` : `Daily cycle from ${esc(initialWords(run.initial))}`}; ${length}; output every ${num(run.outputInterval / 60, 1)} min; ${esc(run.integrator)} integrator (rtol ${run.rtol}, atol ${run.atol} K).</dd>
<dt>Limits</dt><dd>${limitText}.</dd>
</dl>
<h3>Wall build-up, flue side outward</h3>
${table(['#', 'Layer', 'Material', 'Kind', 'Thickness (mm)', 'k (W/(m K))', 'Density (kg/m³)', 'Max service (°C)', 'Contact resistance to next (m² K/W)'], inputs.layers.map(layerRow))}
<h3>Firing schedule</h3>
<p class="note">${sched.caption}</p>
${table([...(sched.dayHeader ? [sched.dayHeader] : []), 'Local time', 'Inlet gas (°C)', 'Mass flow (kg/s)'], sched.rows, 'narrow')}
</section>`;
}

/** The initial wall in words. */
function initialWords(initial: ModelInputs['run']['initial']): string {
  if (typeof initial === 'string') return { 'steady-daily-mean': 'the steady state at the daily-mean conditions', 'steady-at-start': 'the steady state at the first instant', cold: 'a cold wall (at air temperature)' }[initial];
  return initial.kind === 'uniform' ? `a uniform wall at ${num(toC(initial.temperatureK))} °C` : `the state of ${initial.state.timeLocal} in ${initial.fileName}`;
}

function verdictSection(summary: Summary): string {
  const all = summary.verdicts;
  const rows = all.map((v) => {
    const limit = v.limit_value === null ? 'not set' : `${num(v.limit_value, 2)} ${esc(v.unit)}`;
    const gov = v.governing_value === null ? MISSING : `${num(v.governing_value, 2)} ${esc(v.unit)}`;
    return `<tr class="verdict status-${v.status}" data-limit="${esc(v.limit)}" data-status="${esc(v.status)}">${td(`<span class="badge">${STATUS_MARK[v.status]} ${STATUS_WORD[v.status]}</span>`, 'status')}${td(`${esc(v.title)}<div class="note">${esc(v.detail)}</div>`)}${td(gov, 'n')}${td(limit, 'n')}${td(esc(when(v.time_local)))}${td(v.height_m === null ? MISSING : num(v.height_m, 1), 'n')}</tr>`;
  });
  const fails = all.filter((v) => v.status === 'fail').length;
  const overall = fails === 0 ? `<p class="overall ok"><strong>ALL SET LIMITS PASS.</strong></p>` : `<p class="overall bad"><strong>${fails === 1 ? 'ONE LIMIT FAILS' : `${fails} LIMITS FAIL`}.</strong></p>`;
  return `<section id="verdicts"><h2>Verdicts</h2>
${overall}
${table(['Status', 'Limit', 'Governing figure', 'Limit value', 'When (local)', 'Height (m)'], rows, 'verdicts')}
<p class="note">Verdicts judge ${esc(summary.run.verdicts_over)}; the figures below cover ${esc(summary.run.evaluated_over)}${summary.annual ? `; the annual limits (hours a year, cycles) cover every day from ${esc(summary.annual.first_day)} to ${esc(summary.annual.last_day)}` : ''}. For warm-up studies the dew-point rows give the minutes from firing until the slowest height stays above the dew point plus its margin.</p>
</section>`;
}

/** The sun-facing side: walls cut into sectors only. */
function sectorsSection(summary: Summary): string {
  const x = summary.sectors;
  if (!x) return '';
  const rows = [
    ['Hottest shell', `${num(summary.peak_shell_c)} °C facing ${num(x.peak_shell_azimuth_deg, 1)}°`, when(summary.peak_shell_time), num(summary.peak_shell_height_m, 1)],
    ['Largest side-to-side difference of the shell', `${num(x.largest_side_to_side_shell_k)} K`, when(x.largest_side_to_side_shell_time), num(x.largest_side_to_side_shell_height_m, 1)],
    ['Largest side-to-side difference of the mean wall temperature', `${num(x.largest_side_to_side_wall_k)} K`, when(x.largest_side_to_side_wall_time), num(x.largest_side_to_side_wall_height_m, 1)],
    ['Largest tip deflection (thermal bow, indicator)', `${num(x.bow_largest_tip_deflection_mm)} mm`, when(x.bow_largest_tip_deflection_time), '–'],
  ].map((r) => `<tr>${td(esc(r[0]!))}${td(esc(r[1]!), 'n')}${td(esc(r[2]!))}${td(esc(r[3]!), 'n')}</tr>`);
  return `<section id="sectors"><h2>The sun-facing side</h2>
<p>The wall is cut into ${x.count} sectors round the circumference (outward azimuths clockwise from north): sunniest side ${num(x.sunniest_sector_azimuth_deg, 1)}°, shadiest ${num(x.shadiest_sector_azimuth_deg, 1)}°. The bow is the curvature α·ΔT/D of each segment from the difference between opposite sides (α = ${x.bow_expansion_per_k} /K) summed as a cantilever fixed at its base: an indicator of the movement the sun causes, not a structural check.</p>
${table(['figure', 'value', 'when', 'height m'], rows, 'narrow')}</section>`;
}

function keyFiguresSection(summary: Summary): string {
  const r = summary.run;
  const periodic = !r.periodic_requested ? `not requested (${r.days_simulated} day(s) simulated)` : r.periodic_reached ? `reached after ${r.days_simulated} days (last day-to-day change ${num(r.periodic_last_change_k, 4)} K ≤ ${r.periodic_tolerance_k} K)` : `<strong>NOT reached</strong> in ${r.days_simulated} days (last change ${num(r.periodic_last_change_k, 4)} K &gt; ${r.periodic_tolerance_k} K)`;
  const acc = summary.accuracy;
  const pm = (v: number | null) => (plusMinus(v, 'K') ? ` ${plusMinus(v, 'K')}` : '');
  const peaks = [
    ['Hottest outer shell', `${num(summary.peak_shell_c)} °C${pm(acc.peak_shell_k)}`, when(summary.peak_shell_time), num(summary.peak_shell_height_m, 1)],
    ['Hottest lining', `${num(summary.peak_lining_c)} °C${pm(acc.peak_lining_k)}`, when(summary.peak_lining_time), num(summary.peak_lining_height_m, 1)],
    ['Coldest inner surface', `${num(summary.min_inner_surface_c)} °C`, when(summary.min_inner_surface_time), num(summary.min_inner_surface_height_m, 1)],
    ['Largest through-wall difference', `${num(summary.through_wall_max_delta_t_k)} K`, when(summary.through_wall_max_delta_t_time), num(summary.through_wall_max_delta_t_height_m, 1)],
    ['Lowest margin above the water dew point', `${num(summary.lowest_water_dew_margin_k)} K${pm(acc.lowest_water_dew_margin_k)}`, when(summary.lowest_water_dew_margin_time), num(summary.lowest_water_dew_margin_height_m, 1)],
    ...(summary.lowest_acid_dew_margin_k === null
      ? []
      : [['Lowest margin above the acid dew point', `${num(summary.lowest_acid_dew_margin_k)} K${pm(acc.lowest_acid_dew_margin_k)}`, when(summary.lowest_acid_dew_margin_time), num(summary.lowest_acid_dew_margin_height_m, 1)]]),
  ].map(([a, b, c, d]) => `<tr>${td(esc(a))}${td(esc(b), 'n')}${td(esc(c))}${td(esc(d), 'n')}</tr>`);
  const mesh = r.mesh.layers.filter((l) => l.cells > 0).map((l) => `${l.label} ${l.cells} cells (${num(l.smallest_cell_mm, 1)}–${num(l.largest_cell_mm, 1)} mm)`).join(', ');
  const accuracy =
    acc.check === null
      ? 'Accuracy not estimated (run.accuracy: off).'
      : `Estimated discretisation error (mesh and time integration): temperatures through the day${pm(acc.temperatures_k)}; peaks and margins as shown beside them. ${acc.method}.${acc.target_k === null ? '' : ` Target ${acc.target_k} K ${acc.target_met ? 'met' : 'NOT met'} after ${acc.refinements} refinement(s).`}`;
  const positions = summary.positions.map((p) => `<tr>${td(esc(p.position.replace(/_/g, ' ')))}${td(num(p.radius_m, 3), 'n')}${td(num(p.min_c), 'n')}${td(num(p.max_c), 'n')}${td(num(p.swing_k), 'n')}${td(num(p.swing_height_m, 1), 'n')}</tr>`);
  const layers = summary.layers.map((l) => `<tr>${td(esc(l.label))}${td(esc(l.material))}${td(num(l.thickness_mm, 1), 'n')}${td(num(l.min_c), 'n')}${td(num(l.max_c), 'n')}${td(num(l.swing_k), 'n')}${td(num(l.max_delta_t_k, 2), 'n')}${td(l.stress_indicator_mpa === null ? MISSING : num(l.stress_indicator_mpa, 3), 'n')}${td(l.max_service_c === null ? MISSING : num(l.max_service_c, 0), 'n')}</tr>`);
  const acid = summary.acid_dew_point_c !== null;
  const hours = summary.hours_below_water_dew.map((h, j) => `<tr>${td(num(h.height_m, 1), 'n')}${td(num(h.hours, 2), 'n')}${acid ? td(num(summary.hours_below_acid_dew[j]?.hours ?? null, 2), 'n') : ''}</tr>`);
  return `<section id="figures"><h2>Key figures</h2>
<p>Over ${esc(summary.run.evaluated_over)}. Periodic state: ${periodic}.</p>
<h3>Peaks and lowest margins</h3>
${table(['Figure', 'Value', 'When (local)', 'Height (m)'], peaks)}
<h3>Surfaces and interfaces</h3>
${table(['Position', 'Radius (m)', 'Min (°C)', 'Max (°C)', 'Largest daily swing (K)', 'at height (m)'], positions)}
<h3>Layers</h3>
${table(['Layer', 'Material', 'Thickness (mm)', 'Min (°C)', 'Max (°C)', 'Swing (K)', 'Max ΔT across (K)', 'Stress indicator (MPa)', 'Max service (°C)'], layers)}
<h3>Dew points</h3>
<p>Water dew point ${num(summary.water_dew_point_c)} °C; acid dew point ${acid ? `${num(summary.acid_dew_point_c)} °C` : 'none (the gas carries no SO₃)'}.</p>
${table(['Height (m)', 'Hours below water dew point (h)', ...(acid ? ['Hours below acid dew point (h)'] : [])], hours, 'narrow')}
<h3>Heat and gas</h3>
${table(['Figure', 'Value'], [
    ['Heat lost to the outside, net of sun', `${num(summary.heat_loss_kwh_per_day)} kWh/day`],
    ['Heat from the gas into the wall', `${num(summary.gas_to_wall_kwh_per_day)} kWh/day`],
    ['Sun absorbed', `${num(summary.sun_absorbed_kwh_per_day)} kWh/day`],
    ['Convection', `${num(summary.convection_kwh_per_day)} kWh/day`],
    ['Radiation', `${num(summary.radiation_kwh_per_day)} kWh/day`],
    ['Energy residual (in − stored − out) over the figures\' period, of the energy exchanged', `${num(summary.energy_residual_percent, 5)} %`],
    ['Energy residual over the whole run', `${num(summary.energy_residual_run_percent, 5)} %`],
    ['Gas exit temperature', `${num(summary.gas_exit_min_c)}–${num(summary.gas_exit_max_c)} °C`],
    ['Draft', `${num(summary.draft_min_pa)}–${num(summary.draft_max_pa)} Pa`],
  ].map(([a, b]) => `<tr>${td(esc(a))}${td(esc(b), 'n')}</tr>`), 'narrow')}
<p class="note">Run: ${esc(r.integrator)} integrator, ${r.steps} steps; ${r.segments} segments × ${r.nodes_per_segment} nodes (${esc(mesh)}, graded to ${esc(r.mesh.flue_side_set_by)} inside and ${esc(r.mesh.outside_set_by)} outside); output every ${num(r.output_interval_min, 1)} min.</p>
<p class="note" id="accuracy">${esc(accuracy)}</p>
</section>`;
}

function warmupSection(summary: Summary): string {
  const w = summary.warmup;
  if (w === null) return '';
  const mins = (v: number | null) => (v === null ? 'not within the run' : `${num(v, 1)} min`);
  const acc = summary.accuracy;
  const pmMin = (v: number | null) => (plusMinus(v, 'min') ? ` ${plusMinus(v, 'min')}` : '');
  const row = (h: WarmupAtHeight, top: boolean) => `<tr${top ? ' class="top"' : ''}>${td(`${num(h.height_m, 1)}${top ? ' (top)' : ''}`, 'n')}${td(mins(h.minutes_to_water_dew), 'n')}${td(summary.acid_dew_point_c === null ? 'no acid dew point' : mins(h.minutes_to_acid_dew), 'n')}${td(mins(h.minutes_to_shell_90_percent), 'n')}${td(h.minutes_to_shell_touch === null ? 'never / not set' : `${num(h.minutes_to_shell_touch, 1)} min`, 'n')}</tr>`;
  const rows = [...w.by_height].reverse().map((h) => row(h, h.height_m === w.top.height_m));
  return `<section id="warmup"><h2>Warm-up after firing</h2>
<p>Firing started ${esc(when(w.firing_start_local))}. At the top (${num(w.top.height_m, 1)} m), the inner surface stays above the water dew point plus margin after <strong>${mins(w.top.minutes_to_water_dew)}</strong>${pmMin(acc.warmup_minutes_to_water_dew)}${summary.acid_dew_point_c === null ? '' : ` and above the acid dew point plus margin after <strong>${mins(w.top.minutes_to_acid_dew)}</strong>${pmMin(acc.warmup_minutes_to_acid_dew)}`}.</p>
${table(['Height (m)', 'To water dew point + margin', 'To acid dew point + margin', 'Shell to 90 % of its rise', 'Shell to touch limit'], rows)}
</section>`;
}

/** Days shown row by row in the report; a longer run's days are in summary.json only. */
const MAX_DAY_ROWS = 62;

/** A multi-day run: the extremes over all its days, and each day's figures when there are few. */
function daysSection(summary: Summary): string {
  const days = summary.daily;
  if (days.length < 2) return '';
  const hottest = days.reduce((a, d) => (d.shell_max_c > a.shell_max_c ? d : a));
  const acid = summary.acid_dew_point_c !== null;
  const lowest = days.reduce((a, d) => ((d.lowest_acid_dew_margin_k ?? d.lowest_water_dew_margin_k) < (a.lowest_acid_dew_margin_k ?? a.lowest_water_dew_margin_k) ? d : a));
  const heat = days.reduce((sum, d) => sum + (d.heat_loss_kwh ?? 0), 0);
  const rows = days.map(
    (d) =>
      `<tr>${td(String(d.day), 'n')}${td(esc(d.date))}${td(`${num(d.shell_min_c)}–${num(d.shell_max_c)}`, 'n')}${td(`${num(d.lining_min_c)}–${num(d.lining_max_c)}`, 'n')}${td(`${num(d.inner_surface_min_c)}–${num(d.inner_surface_max_c)}`, 'n')}${td(num(acid ? d.lowest_acid_dew_margin_k : d.lowest_water_dew_margin_k), 'n')}${td(num(d.heat_loss_kwh), 'n')}</tr>`,
  );
  return `<section id="days"><h2>Day by day</h2>
<p>Over the ${days.length} days reported: the shell reaches ${num(hottest.shell_max_c)} °C (day ${hottest.day}); the lowest margin above the ${acid ? 'acid' : 'water'} dew point is ${num(acid ? lowest.lowest_acid_dew_margin_k : lowest.lowest_water_dew_margin_k)} K (day ${lowest.day}); ${num(heat, 0)} kWh are lost to the outside in all. Every day's figures are in summary.json (<code>daily</code>).</p>
${days.length <= MAX_DAY_ROWS ? table(['Day', 'Date', 'Shell (°C)', 'Lining (°C)', 'Inner surface (°C)', `Lowest ${acid ? 'acid' : 'water'} dew margin (K)`, 'Heat lost (kWh)'], rows) : ''}
</section>`;
}

/** An annual run: the year's hours below the dew points, heat, months, and thermal cycles. */
function yearSection(summary: Summary): string {
  const a = summary.annual;
  if (!a) return '';
  const acid = a.hours_below_acid_dew.length > 0;
  const heights = a.hours_below_water_dew.map((w, j) => `<tr>${td(num(w.height_m, 1), 'n')}${acid ? td(num(a.hours_below_acid_dew[j]!.hours, 1), 'n') : ''}${td(num(w.hours, 1), 'n')}</tr>`);
  const topOf = (rows: readonly { hours: number }[]) => (rows.length ? num(rows[rows.length - 1]!.hours, 1) : MISSING);
  const months = a.months.map(
    (m) =>
      `<tr>${td(esc(m.month))}${td(String(m.days), 'n')}${acid ? td(topOf(m.hours_below_acid_dew), 'n') : ''}${td(topOf(m.hours_below_water_dew), 'n')}${td(num(m.heat_loss_kwh / 1000, 2), 'n')}${td(`${num(m.shell_min_c)}–${num(m.shell_max_c)}`, 'n')}${td(`${num(m.lining_min_c)}–${num(m.lining_max_c)}`, 'n')}${td(num(m.inner_surface_min_c), 'n')}</tr>`,
  );
  const t = a.cycles.threshold_k;
  const cycles = a.cycles.across.map(
    (c) =>
      `<tr>${td(esc(c.across))}${td(num(c.governing_height_m, 1), 'n')}${td(num(c.cycles, 1), 'n')}${t === null ? '' : td(num(c.cycles_above_threshold, 1), 'n')}${td(num(c.largest_range_k, 1), 'n')}${td(`${esc(c.histogram.filter((b) => b.cycles > 0).map((b) => `${num(b.from_k, c.bin_width_k < 1 ? 1 : 0)}–${num(b.to_k, c.bin_width_k < 1 ? 1 : 0)} K: ${num(b.cycles, 1)}`).join('; '))}`)}</tr>`,
  );
  // (starts with a line break: it follows the days section on its line, so other runs' reports keep their bytes)
  return `
<section id="year"><h2>The year</h2>
<p>From ${esc(a.first_day)} to ${esc(a.last_day)}, ${a.days} days${a.full_year ? '' : ' (less than a year: yearly figures cover these days only)'}. Heat lost to the outside, net of sun: <strong>${num(a.heat_loss_kwh / 1000, 1)} MWh</strong> (from the gas ${num(a.gas_to_wall_kwh / 1000, 1)} MWh). Hottest shell ${num(a.peak_shell_c)} °C (${esc(when(a.peak_shell_time))}, ${num(a.peak_shell_height_m, 1)} m); hottest lining ${num(a.peak_lining_c)} °C (${esc(when(a.peak_lining_time))}); coldest inner surface ${num(a.min_inner_surface_c)} °C (${esc(when(a.min_inner_surface_time))}).</p>
<h3>Hours below the dew points over the run, by height</h3>
${table(['Height (m)', ...(acid ? ['Below the acid dew point (h)'] : []), 'Below the water dew point (h)'], heights, 'narrow')}
<h3>Month by month (hours at the top)</h3>
${table(['Month', 'Days', ...(acid ? ['Below acid dew (h)'] : []), 'Below water dew (h)', 'Heat lost (MWh)', 'Shell (°C)', 'Lining (°C)', 'Inner surface min (°C)'], months)}
<h3>Thermal cycles</h3>
<p class="note">Rainflow counting (ASTM E1049) of the temperature difference across the whole wall and across each layer, sampled every ${num(a.cycles.sampled_every_min, 0)} min (peaks between instants are missed), reversals under ${num(a.cycles.gate_k, 1)} K left out; each row at the height with the most cycles${t === null ? ' (the largest range)' : ` above ${num(t, 0)} K`}. A histogram of ranges is the input to a fatigue judgement, not a judgement itself. Every height and bin: cycles.csv.</p>
${table(['Across', 'Height (m)', 'Cycles', ...(t === null ? [] : [`Above ${num(t, 0)} K`]), 'Largest range (K)', 'Ranges (cycles)'], cycles)}
</section>`;
}

function chartsSection(charts: readonly ReportChart[]): string {
  if (charts.length === 0) return '';
  const figs = charts.map((c, j) => {
    const b64 = Buffer.from(c.png).toString('base64');
    return `<figure><img src="data:image/png;base64,${b64}" alt="${esc(`Chart: ${c.title}`)}"><figcaption>Figure ${j + 1}. ${esc(c.title)} <span class="note">(${esc(c.fileName)})</span></figcaption></figure>`;
  });
  return `<section id="charts"><h2>Charts</h2>
<p class="note">Temperatures in °C, heights above the stack base in m, times in local time. Lines differ in dash pattern and marker as well as colour; in the margin map, cells below the dew point are cross-hatched and outlined.</p>
${figs.join('\n')}
</section>`;
}

function assumptionsSection(summary: Summary): string {
  const items = [
    'Heat flows radially through the wall only: axial conduction along the height is neglected (small next to radial conduction for a slender wall); each axial segment is independent apart from the gas passing through it.',
    'The flue gas is quasi-steady: it crosses the stack in seconds while the wall changes over minutes, so each segment sees the gas leaving the segment below, cooled exponentially towards the wall.',
    'Sun is averaged around the circumference: the beam strikes the projected width, diffuse sky and ground-reflected light reach the wall with view factor ½. The sun-facing side runs hotter than these figures.',
    'Radiation outside: to half sky and half ground (or as set); the sky a vertical wall sees is split between the sky and the near-horizon air, after cloud cover is applied.',
    'Material properties (conductivity and specific heat against temperature, density, emissivity, service limits, elastic data) are as stated in the material library or the scenario; their sources are listed there.',
    'Dew points: water from the water-vapour partial pressure; sulfuric acid from Verhoff &amp; Banchero (1974). The acid dew point depends strongly on the SO₃ fraction, which is rarely known well.',
    'The thermal-stress figure E·α·ΔT / (2(1 − ν)) is an indicator for a thin cylinder with a linear gradient, not a stress analysis.',
  ];
  const correlations = correlationsInUse().map((c) => `<li><strong>${esc(c.role)}</strong>: ${esc(c.text)}</li>`);
  return `<section id="assumptions"><h2>Assumptions and limits of the model</h2><ul>${items.map((i) => `<li>${i}</li>`).join('')}</ul>
<h3>Correlations in use</h3><ul>${correlations.join('')}</ul>
<h3>This run</h3><ul>${summary.assumptions.map((a) => `<li>${esc(a)}</li>`).join('')}</ul></section>`;
}

function listSection(id: string, title: string, items: readonly string[], emptyText: string | null): string {
  if (items.length === 0 && emptyText === null) return '';
  return `<section id="${id}"><h2>${title}</h2>${items.length === 0 ? `<p>${emptyText}</p>` : `<ul>${items.map((i) => `<li>${esc(i)}</li>`).join('')}</ul>`}</section>`;
}

const CSS = `
:root { --ink: #1f2328; --muted: #5b6168; --rule: #c9ced4; --band: #f3f1ec; --pass: #1c5e2f; --pass-bg: #e3f1e6; --fail: #8c1b1b; --fail-bg: #f9e0dc; --unset: #4a4f55; --unset-bg: #ececec; --accent: #7a3b12; }
* { box-sizing: border-box; }
html { font-family: 'DejaVu Sans', 'Liberation Sans', 'Helvetica Neue', Arial, sans-serif; color: var(--ink); background: #fff; line-height: 1.45; }
body { max-width: 1060px; margin: 0 auto; padding: 24px 28px 48px; font-size: 15px; }
header { border-bottom: 3px solid var(--accent); margin-bottom: 18px; padding-bottom: 10px; }
h1 { font-size: 26px; margin: 0 0 4px; }
h2 { font-size: 20px; margin: 30px 0 10px; border-bottom: 1px solid var(--rule); padding-bottom: 4px; color: var(--accent); }
h3 { font-size: 16px; margin: 20px 0 6px; }
.sub { color: var(--muted); margin: 0; }
.note { color: var(--muted); font-size: 13px; }
table { border-collapse: collapse; width: 100%; margin: 6px 0 12px; font-size: 14px; }
table.narrow { width: auto; min-width: 50%; }
th, td { border: 1px solid var(--rule); padding: 5px 8px; text-align: left; vertical-align: top; }
th { background: var(--band); font-weight: 600; }
td.n { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
tbody tr:nth-child(even) td { background: #fafafa; }
.badge { display: inline-block; font-weight: 700; padding: 1px 8px; border-radius: 3px; border: 2px solid currentColor; white-space: nowrap; letter-spacing: 0.03em; }
tr.status-pass .badge { color: var(--pass); background: var(--pass-bg); }
tr.status-fail .badge { color: var(--fail); background: var(--fail-bg); border-style: double; border-width: 3px; }
tr.status-not-set .badge { color: var(--unset); background: var(--unset-bg); border-style: dashed; }
tr.status-fail td { font-weight: 600; }
.overall { font-size: 17px; padding: 8px 12px; border-left: 6px solid; }
.overall.ok { border-color: var(--pass); background: var(--pass-bg); }
.overall.bad { border-color: var(--fail); background: var(--fail-bg); border-left-style: double; border-left-width: 9px; }
dl.facts { display: grid; grid-template-columns: 9em 1fr; gap: 4px 14px; margin: 8px 0; }
dl.facts dt { font-weight: 600; }
dl.facts dd { margin: 0; }
.description { font-style: italic; }
figure { margin: 18px 0 26px; }
figure img { display: block; max-width: 100%; height: auto; border: 1px solid var(--rule); }
figcaption { font-size: 14px; margin-top: 6px; }
section#cautions { border: 2px solid var(--fail); padding: 4px 16px 8px; margin-top: 30px; background: #fffaf3; }
section#cautions h2 { border: none; color: var(--fail); }
code { font-family: 'DejaVu Sans Mono', monospace; font-size: 13px; }
footer { margin-top: 34px; color: var(--muted); font-size: 13px; border-top: 1px solid var(--rule); padding-top: 8px; }
@media print {
  @page { margin: 14mm 12mm; }
  html, body { background: #fff !important; color: #000; }
  body { max-width: none; padding: 0; font-size: 11pt; }
  h2 { break-after: avoid; page-break-after: avoid; }
  h3 { break-after: avoid; page-break-after: avoid; }
  table, figure, tr, dl.facts, .overall, section#cautions { break-inside: avoid; page-break-inside: avoid; }
  figure img { max-height: 125mm; width: auto; }
  tbody tr:nth-child(even) td { background: #fff; }
  th { background: #eee !important; }
  tr.status-pass .badge, tr.status-fail .badge, tr.status-not-set .badge, .overall, section#cautions { background: #fff !important; }
  a { color: #000; text-decoration: none; }
}
`;

/**
 * The self-contained report of a run: the job, the scenario in brief, the verdicts, key figures,
 * warm-up times (warm-up studies), the days of a multi-day run, every chart, the model's assumptions and limits, warnings and
 * cautions.
 */
export function renderReportHtml(summary: Summary, inputs: ModelInputs, charts: readonly ReportChart[]): string {
  const title = `stackday report: ${summary.scenario.name}`;
  return `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="generator" content="${esc(`${summary.tool.name} ${summary.tool.version}`)}">
<title>${esc(title)}</title>
<style>${CSS}</style>
</head>
<body>
<header>
<h1>${esc(title)}</h1>
<p class="sub">${esc(summary.scenario.site)} &middot; first day ${esc(summary.scenario.first_day)} (${esc(summary.scenario.time_zone)}) &middot; ${summary.run.mode === 'warmup' ? 'warm-up study' : 'daily cycle study'} &middot; ${esc(summary.tool.name)} ${esc(summary.tool.version)}</p>
</header>
<main>
${jobSection()}
${scenarioSection(summary, inputs)}
${verdictSection(summary)}
${keyFiguresSection(summary)}
${sectorsSection(summary)}
${warmupSection(summary)}
${daysSection(summary)}${yearSection(summary)}
${chartsSection(charts)}
${assumptionsSection(summary)}
${listSection('warnings', 'Warnings from this run', summary.warnings, 'None.')}
${listSection('cautions', 'Cautions', summary.cautions, null)}
</main>
<footer>Generated by ${esc(summary.tool.name)} ${esc(summary.tool.version)}. Results inform engineering judgement; they do not certify a design.</footer>
</body>
</html>
`;
}
