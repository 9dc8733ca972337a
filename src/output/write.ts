/**
 * Files out: summary.json, timeseries.csv (tidy: time × height × radial position), segments.csv
 * (tidy: time × height, the boundary quantities) and any extra artefacts (charts, report), all
 * written atomically: every file goes to a temporary name in the output folder and is renamed into
 * place only when all of them are complete, so a failure never leaves a half-written result.
 */
import { mkdirSync, writeFileSync, renameSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import type { TimeSeries } from '../model/timeseries.ts';
import type { Summary } from '../analysis/summary.ts';
import { celsius, decimals } from './format.ts';

/** A file to write: its name in the output folder and its content. */
export interface Artefact {
  readonly fileName: string;
  readonly content: string | Buffer;
}

/** A CSV cell: `digits` decimals, empty when the value is missing. */
const fmt = (v: number, digits: number): string => decimals(v, digits, '');

/** timeseries.csv: one row per output instant × segment × node. */
export function timeseriesCsv(series: TimeSeries): string {
  const { segments: S, nodes: N } = series;
  const t0 = series.t[0] ?? 0;
  const parts: string[] = ['time,hours,height_m,position,radius_m,temperature_c\n'];
  for (let k = 0; k < series.t.length; k++) {
    const head = `${series.isoLocal[k]},${fmt((series.t[k]! - t0) / 3600, 4)},`;
    for (let s = 0; s < S; s++) {
      const h = `${head}${fmt(series.heightM[s]!, 3)},`;
      let chunk = '';
      for (let i = 0; i < N; i++) {
        chunk += `${h}${series.nodeLabel[i]},${fmt(series.nodeRadius[i]!, 5)},${fmt(celsius(series.temperatureK[(k * S + s) * N + i]!), 3)}\n`;
      }
      parts.push(chunk);
    }
  }
  return parts.join('');
}

/** segments.csv: one row per output instant × segment with the gas, outside and dew-point quantities. */
export function segmentsCsv(series: TimeSeries): string {
  const { segments: S } = series;
  const t0 = series.t[0] ?? 0;
  const g = series.segment;
  const inst = series.instant;
  const rows: string[] = [
    'time,hours,height_m,air_temperature_c,wind_speed_at_height_m_s,sun_altitude_deg,sun_azimuth_deg,absorbed_sun_w_per_m,outside_film_w_m2_k,sky_temperature_c,convection_loss_w_per_m,radiation_loss_w_per_m,gas_in_c,gas_out_c,inside_film_w_m2_k,gas_to_wall_w_per_m,water_dew_point_c,water_dew_margin_k,acid_dew_point_c,acid_dew_margin_k,inlet_gas_c,mass_flow_kg_s,firing,draft_pa\n',
  ];
  for (let k = 0; k < series.t.length; k++) {
    const head = `${series.isoLocal[k]},${fmt((series.t[k]! - t0) / 3600, 4)},`;
    const tail = `${fmt(celsius(inst.inletTemperatureK[k]!), 2)},${fmt(inst.massFlow[k]!, 4)},${inst.firing[k] ? 1 : 0},${fmt(inst.draftPa[k]!, 2)}\n`;
    let chunk = '';
    for (let s = 0; s < S; s++) {
      const j = k * S + s;
      chunk +=
        head +
        [
          fmt(series.heightM[s]!, 3),
          fmt(celsius(inst.airTemperatureK[k]!), 2),
          fmt(g.windAtHeight[j]!, 3),
          fmt(inst.sunAltitudeDeg[k]!, 3),
          fmt(inst.sunAzimuthDeg[k]!, 3),
          fmt(g.sunPerMetre[j]!, 2),
          fmt(g.outsideFilm[j]!, 3),
          fmt(celsius(inst.skyTemperatureK[k]!), 2),
          fmt(g.convectionPerMetre[j]!, 2),
          fmt(g.radiationPerMetre[j]!, 2),
          fmt(celsius(g.gasInK[j]!), 2),
          fmt(celsius(g.gasOutK[j]!), 2),
          fmt(g.insideFilm[j]!, 3),
          fmt(g.gasToWallPerMetre[j]!, 2),
          fmt(celsius(series.waterDewPointK), 2),
          fmt(g.waterDewMarginK[j]!, 3),
          fmt(series.acidDewPointK === null ? Number.NaN : celsius(series.acidDewPointK), 2),
          fmt(g.acidDewMarginK[j]!, 3),
        ].join(',') +
        ',' +
        tail;
    }
    rows.push(chunk);
  }
  return rows.join('');
}

/** summary.json text (stable key order, 2-space indent; non-finite numbers become null). */
export function summaryJson(summary: Summary): string {
  return `${JSON.stringify(summary, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? null : v), 2)}\n`;
}

/**
 * Write every artefact into `dir` atomically: all go to temporary names first, then each is renamed
 * into place. On any failure the temporary files are removed and nothing is left behind.
 */
export function writeArtefactsAtomically(dir: string, artefacts: readonly Artefact[]): string[] {
  mkdirSync(dir, { recursive: true });
  const tag = `.stackday-tmp-${process.pid}-${Date.now()}`;
  const temps: string[] = [];
  try {
    for (const a of artefacts) {
      const tmp = join(dir, `${a.fileName}${tag}`);
      temps.push(tmp); // before writing: a write that fails half-way (disk full) leaves a file to remove
      writeFileSync(tmp, a.content);
    }
  } catch (e) {
    for (const t of temps) rmSync(t, { force: true });
    throw e;
  }
  const written: string[] = [];
  artefacts.forEach((a, i) => {
    const target = join(dir, a.fileName);
    renameSync(temps[i]!, target);
    written.push(target);
  });
  return written;
}
