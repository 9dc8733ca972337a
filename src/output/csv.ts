/**
 * The per-instant files of a run: timeseries.csv (tidy: time × height × radial position, the wall
 * temperatures) and segments.csv (tidy: time × height, the gas, outside and dew-point quantities).
 * Each is written by a sink of the simulation, row by row as the run goes, in one of four forms
 * (output.timeseries / output.segments in the scenario):
 *
 *   all             every output instant (or every `interval`), columns time,hours,<keys>,<values>
 *   last-day        the same rows for the last simulated day only (the day the summary covers)
 *   daily-extremes  per run day and row key, the lowest and highest of every value:
 *                   day,date,<keys>,min_<value>,max_<value>,…
 *   off             no file
 *
 * `hours` counts from the run's first reported instant. Numbers are written by toFixed (the same
 * in every locale). The same sinks make the text of a series held in memory (`timeseriesCsv`,
 * `segmentsCsv`), so a file written while the run goes and one written afterwards are the same bytes.
 */
import type { InstantSink, InstantView } from '../model/sinks.ts';
import { DaySplitter, replaySeries } from '../model/sinks.ts';
import type { SeriesLayout, TimeSeries } from '../model/timeseries.ts';
import type { ModelInputs, SeriesFileInput } from '../model/inputs.ts';
import { SECONDS_PER_DAY } from '../physics/constants.ts';
import { celsius, decimals } from './format.ts';
import { StringOut, type TextOut } from './textOut.ts';

/** A CSV cell: `digits` decimals, empty when the value is missing. */
const fmt = (v: number, digits: number): string => decimals(v, digits, '');

/** A value column: its header name and decimals. */
interface ValueColumn {
  readonly name: string;
  readonly digits: number;
}

/** The shape of a per-instant file: the cells that identify a row within an instant, and its values. */
interface SeriesTable {
  /** Header names of the key cells, e.g. height_m,position,radius_m. */
  keyHeader(layout: SeriesLayout): readonly string[];
  readonly valueColumns: readonly ValueColumn[];
  /** The key cells of each row of an instant, formatted and joined by commas. */
  rowKeys(layout: SeriesLayout): string[];
  /** The values of every row of an instant, row after row, into `out` (rows × value columns). */
  values(view: InstantView, layout: SeriesLayout, out: Float64Array): void;
}

/**
 * timeseries.csv: one row per segment × node, the temperature in °C; a wall cut into sectors has a
 * row per segment × sector × node, with the sector's outward azimuth (degrees clockwise from north).
 */
const TEMPERATURE_TABLE: SeriesTable = {
  keyHeader: (L) => (L.sectors > 1 ? ['height_m', 'azimuth_deg', 'position', 'radius_m'] : ['height_m', 'position', 'radius_m']),
  valueColumns: [{ name: 'temperature_c', digits: 3 }],
  rowKeys(L) {
    const keys: string[] = [];
    for (let s = 0; s < L.segments; s++)
      for (let j = 0; j < L.sectors; j++) {
        const azimuth = L.sectors > 1 ? `${fmt((360 * j) / L.sectors, 1)},` : '';
        for (let i = 0; i < L.nodes; i++) keys.push(`${fmt(L.heightM[s]!, 3)},${azimuth}${L.nodeLabel[i]},${fmt(L.nodeRadius[i]!, 5)}`);
      }
    return keys;
  },
  values(view, L, out) {
    const T = view.temperatureK;
    const n = L.segments * L.sectors * L.nodes;
    for (let r = 0; r < n; r++) out[r] = celsius(T[r]!);
  },
};

/** segments.csv's value columns: each with how it is read from an instant at segment `s`. */
const SEGMENT_COLUMNS: readonly (ValueColumn & { readonly of: (v: InstantView, s: number, L: SeriesLayout) => number })[] = [
  { name: 'air_temperature_c', digits: 2, of: (v) => celsius(v.instant.airTemperatureK) },
  { name: 'wind_speed_at_height_m_s', digits: 3, of: (v, s) => v.segment.windAtHeight[s]! },
  { name: 'sun_altitude_deg', digits: 3, of: (v) => v.instant.sunAltitudeDeg },
  { name: 'sun_azimuth_deg', digits: 3, of: (v) => v.instant.sunAzimuthDeg },
  { name: 'absorbed_sun_w_per_m', digits: 2, of: (v, s) => v.segment.sunPerMetre[s]! },
  { name: 'outside_film_w_m2_k', digits: 3, of: (v, s) => v.segment.outsideFilm[s]! },
  { name: 'sky_temperature_c', digits: 2, of: (v) => celsius(v.instant.skyTemperatureK) },
  { name: 'convection_loss_w_per_m', digits: 2, of: (v, s) => v.segment.convectionPerMetre[s]! },
  { name: 'radiation_loss_w_per_m', digits: 2, of: (v, s) => v.segment.radiationPerMetre[s]! },
  { name: 'gas_in_c', digits: 2, of: (v, s) => celsius(v.segment.gasInK[s]!) },
  { name: 'gas_out_c', digits: 2, of: (v, s) => celsius(v.segment.gasOutK[s]!) },
  { name: 'inside_film_w_m2_k', digits: 3, of: (v, s) => v.segment.insideFilm[s]! },
  { name: 'gas_to_wall_w_per_m', digits: 2, of: (v, s) => v.segment.gasToWallPerMetre[s]! },
  { name: 'water_dew_point_c', digits: 2, of: (_v, _s, L) => celsius(L.waterDewPointK) },
  { name: 'water_dew_margin_k', digits: 3, of: (v, s) => v.segment.waterDewMarginK[s]! },
  { name: 'acid_dew_point_c', digits: 2, of: (_v, _s, L) => (L.acidDewPointK === null ? Number.NaN : celsius(L.acidDewPointK)) },
  { name: 'acid_dew_margin_k', digits: 3, of: (v, s) => v.segment.acidDewMarginK[s]! },
  { name: 'inlet_gas_c', digits: 2, of: (v) => celsius(v.instant.inletTemperatureK) },
  { name: 'mass_flow_kg_s', digits: 4, of: (v) => v.instant.massFlow },
  { name: 'firing', digits: 0, of: (v) => (v.firing ? 1 : 0) },
  { name: 'draft_pa', digits: 2, of: (v) => v.instant.draftPa },
];

/** segments.csv: one row per segment. */
const SEGMENT_TABLE: SeriesTable = {
  keyHeader: () => ['height_m'],
  valueColumns: SEGMENT_COLUMNS,
  rowKeys: (L) => Array.from(L.heightM, (h) => fmt(h, 3)),
  values(view, L, out) {
    const C = SEGMENT_COLUMNS.length;
    for (let s = 0; s < L.segments; s++) for (let j = 0; j < C; j++) out[s * C + j] = SEGMENT_COLUMNS[j]!.of(view, s, L);
  },
};

/** Which instants a file in the `all` or `last-day` form writes. */
interface InstantFilter {
  /** Run day of the last simulated day; null when every instant the sink sees belongs to it (a periodic study's settled day). */
  readonly lastRunDay: number | null;
  readonly content: 'all' | 'last-day';
  readonly intervalS?: number;
}

/** Whether the instant at `t` (first instant at `tFirst`) is written. */
function writes(f: InstantFilter, view: InstantView, tFirst: number): boolean {
  if (f.content === 'last-day' && f.lastRunDay !== null && view.runDay < f.lastRunDay && !(view.dayEnd && view.runDay === f.lastRunDay - 1)) return false;
  if (f.intervalS === undefined) return true;
  const since = view.t - tFirst;
  return Math.abs(since - Math.round(since / f.intervalS) * f.intervalS) <= 1e-3;
}

/** A sink writing every (chosen) instant of a table as rows `time,hours,<keys>,<values>`. */
function instantRowsSink(table: SeriesTable, filter: InstantFilter, out: TextOut): InstantSink {
  let layout: SeriesLayout;
  let keys: string[] = [];
  let values = new Float64Array(0);
  let tFirst = Number.NaN;
  const C = table.valueColumns.length;
  const digits = table.valueColumns.map((c) => c.digits);
  return {
    start(L) {
      layout = L;
      keys = table.rowKeys(L);
      values = new Float64Array(keys.length * C);
      out.write(`${['time', 'hours', ...table.keyHeader(layout), ...table.valueColumns.map((c) => c.name)].join(',')}\n`);
    },
    instant(view) {
      if (Number.isNaN(tFirst)) tFirst = view.t;
      if (!writes(filter, view, tFirst)) return;
      table.values(view, layout, values);
      const head = `${view.isoLocal},${fmt((view.t - tFirst) / 3600, 4)},`;
      let chunk = '';
      for (let r = 0; r < keys.length; r++) {
        chunk += `${head}${keys[r]}`;
        for (let j = 0; j < C; j++) chunk += `,${fmt(values[r * C + j]!, digits[j]!)}`;
        chunk += '\n';
      }
      out.write(chunk);
    },
  };
}

/** A sink writing, per run day and row, the lowest and highest of every value: `day,date,<keys>,min_<v>,max_<v>,…`. */
function dailyExtremesSink(table: SeriesTable, out: TextOut): InstantSink {
  let layout: SeriesLayout;
  let keys: string[] = [];
  let values = new Float64Array(0);
  const C = table.valueColumns.length;
  const digits = table.valueColumns.map((c) => c.digits);
  let splitter: DaySplitter<{ lo: Float64Array; hi: Float64Array }>;
  return {
    start(L) {
      layout = L;
      keys = table.rowKeys(L);
      values = new Float64Array(keys.length * C);
      const header = ['day', 'date', ...table.keyHeader(layout), ...table.valueColumns.flatMap((c) => [`min_${c.name}`, `max_${c.name}`])];
      out.write(`${header.join(',')}\n`);
      splitter = new DaySplitter<{ lo: Float64Array; hi: Float64Array }>(
        () => ({ lo: new Float64Array(values.length).fill(Infinity), hi: new Float64Array(values.length).fill(-Infinity) }),
        (acc, view) => {
          table.values(view, layout, values);
          for (let q = 0; q < values.length; q++) {
            // a missing value (NaN) stays missing: Math.min/max pass NaN on
            acc.lo[q] = Math.min(acc.lo[q]!, values[q]!);
            acc.hi[q] = Math.max(acc.hi[q]!, values[q]!);
          }
        },
        (acc, runDay, date) => {
          let chunk = '';
          for (let r = 0; r < keys.length; r++) {
            chunk += `${runDay + 1},${date},${keys[r]}`;
            for (let j = 0; j < C; j++) chunk += `,${fmt(acc.lo[r * C + j]!, digits[j]!)},${fmt(acc.hi[r * C + j]!, digits[j]!)}`;
            chunk += '\n';
          }
          out.write(chunk);
        },
      );
    },
    instant(view) {
      splitter.instant(view);
    },
  };
}

/** A file written from a run's instants as they are computed. */
export interface StreamedArtefact {
  /** Name in the run's folder. */
  readonly fileName: string;
  /** A sink that writes the file's text to `out`. */
  sink(out: TextOut): InstantSink;
  /** About how many bytes the file will take for this run, from what every instant shares. */
  estimateBytes(layout: SeriesLayout): number;
}

/** The form of each per-instant file when the scenario does not say. */
export const DEFAULT_SERIES_FILE: SeriesFileInput = { content: 'all' };

/** A run's plan as the files see it: days reported, output instants per day, the last run day. */
function runPlan(inputs: ModelInputs): { days: number; instantsPerDay: number; lastRunDay: number | null } {
  const run = inputs.run;
  const days = run.length.kind === 'days' ? run.length.days : 1;
  return { days, instantsPerDay: Math.ceil(SECONDS_PER_DAY / run.outputInterval), lastRunDay: run.length.kind === 'days' ? days - 1 : null };
}

/** Characters of a row, with every value taken as `100.` plus its decimals (an estimate). */
function rowChars(lead: number, key: string, columns: readonly ValueColumn[], valueCopies: number): number {
  return lead + key.length + columns.reduce((sum, c) => sum + valueCopies * (c.digits + 5), 0) + 1;
}

function seriesArtefact(fileName: string, table: SeriesTable, file: SeriesFileInput, plan: ReturnType<typeof runPlan>): StreamedArtefact | null {
  if (file.content === 'off') return null;
  if (file.content === 'daily-extremes') {
    return {
      fileName,
      sink: (out) => dailyExtremesSink(table, out),
      estimateBytes: (L) => plan.days * table.rowKeys(L).reduce((sum, key) => sum + rowChars(16, key, table.valueColumns, 2), 0),
    };
  }
  const filter: InstantFilter = { lastRunDay: plan.lastRunDay, content: file.content, intervalS: file.intervalS };
  return {
    fileName,
    sink: (out) => instantRowsSink(table, filter, out),
    estimateBytes(L) {
      const days = file.content === 'last-day' ? 1 : plan.days;
      const perDay = file.intervalS === undefined ? plan.instantsPerDay : Math.ceil(SECONDS_PER_DAY / file.intervalS);
      // an ISO time (25 characters), the hours (up to 5 digits, 4 decimals) and their commas
      const perInstant = table.rowKeys(L).reduce((sum, key) => sum + rowChars(37, key, table.valueColumns, 1), 0);
      return days * perDay * perInstant;
    },
  };
}

/** The per-instant files of a run of `inputs`, as its output settings ask (files set to `off` are left out). */
export function seriesFileArtefacts(inputs: ModelInputs): StreamedArtefact[] {
  const plan = runPlan(inputs);
  const output = inputs.output ?? { timeseries: DEFAULT_SERIES_FILE, segments: DEFAULT_SERIES_FILE };
  return [seriesArtefact('timeseries.csv', TEMPERATURE_TABLE, output.timeseries, plan), seriesArtefact('segments.csv', SEGMENT_TABLE, output.segments, plan)].filter(
    (a): a is StreamedArtefact => a !== null,
  );
}

/** The text of a per-instant file of a series in memory, in the form `file` asks (the series' last run day is its last). */
function seriesText(series: TimeSeries, table: SeriesTable, file: SeriesFileInput): string {
  const lastRunDay = series.runDay.length > 0 ? series.runDay[series.runDay.length - 1]! : null;
  const artefact = seriesArtefact('', table, file, { days: 0, instantsPerDay: 0, lastRunDay });
  if (artefact === null) return '';
  const out = new StringOut();
  replaySeries(series, [artefact.sink(out)]);
  return out.text();
}

/** timeseries.csv of a series in memory: one row per output instant × segment × node (by default). */
export function timeseriesCsv(series: TimeSeries, file: SeriesFileInput = DEFAULT_SERIES_FILE): string {
  return seriesText(series, TEMPERATURE_TABLE, file);
}

/** segments.csv of a series in memory: one row per output instant × segment with the gas, outside and dew-point quantities (by default). */
export function segmentsCsv(series: TimeSeries, file: SeriesFileInput = DEFAULT_SERIES_FILE): string {
  return seriesText(series, SEGMENT_TABLE, file);
}

/** Estimated size of a run's files, bytes, above which the run says so before it starts. */
export const OUTPUT_SIZE_NOTICE_BYTES = 200e6;

/** A line for the user when the per-instant files will be large; null when they will not. */
export function sizeNotice(files: readonly StreamedArtefact[], layout: SeriesLayout): string | null {
  const sizes = files.map((f) => ({ name: f.fileName, bytes: f.estimateBytes(layout) }));
  const total = sizes.reduce((sum, f) => sum + f.bytes, 0);
  if (total <= OUTPUT_SIZE_NOTICE_BYTES) return null;
  const mb = (b: number) => `${Math.round(b / 1e6)} MB`;
  return `this run will write about ${mb(total)} (${sizes.map((f) => `${f.name} ${mb(f.bytes)}`).join(', ')}); to write less, set output.timeseries and output.segments to last-day, daily-extremes or off, or give output.timeseries_interval`;
}
