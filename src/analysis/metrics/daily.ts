/**
 * Figures of every simulated day, gathered while the run goes (a sink of the simulation, so a year
 * needs no more memory than a day): the range of the shell (outer surface), of the lining (every
 * node of the flue-side layer) and of the inner surface over every column of the wall (each segment
 * and, with sectors, each sector), the lowest margins above the water and
 * acid dew points at any height, and the day's heat from its energy account.
 *
 * A day is the closed interval from its start to its end (see DaySplitter), the same instants the
 * summary's figures over the last day cover, so the last row agrees with them.
 *
 * Besides, the worst of the whole run with when and where (`runWorst`): the hottest shell and
 * lining, the largest difference across each layer, the lowest margins above the dew points. The
 * verdicts of a run of several days that is not periodic judge these (a year judged on its last
 * day, 31 December, would pass a shell that burns in June).
 */
import { kelvinToCelsius as c } from '../../physics/constants.ts';
import { DaySplitter, type InstantSink, type InstantView } from '../../model/sinks.ts';
import type { EnergyAccount, SeriesLayout } from '../../model/timeseries.ts';
import type { DayFigures } from '../summary.ts';
import { round } from '../rounding.ts';
import { heatLossJ, J_PER_KWH } from './energy.ts';


/** Running extremes of one day, K. */
interface DayExtremes {
  shellMin: number;
  shellMax: number;
  liningMin: number;
  liningMax: number;
  innerMin: number;
  innerMax: number;
  waterMargin: number;
  acidMargin: number;
}

/** A run-wide extreme: its value (K, or K of difference), when (ISO local time) and where (height, m). */
export interface TimedExtreme {
  value: number;
  time: string;
  height: number;
}

/** The worst of the whole run (see the module note). */
export interface RunWorst {
  readonly peakShell: TimedExtreme;
  readonly peakLining: TimedExtreme;
  /** Largest |difference| across each layer, inside → outside. */
  readonly layerMaxDeltaT: readonly TimedExtreme[];
  readonly lowestWaterMargin: TimedExtreme;
  /** Null without an acid dew point. */
  readonly lowestAcidMargin: TimedExtreme | null;
}

const unset = (value: number): TimedExtreme => ({ value, time: '', height: Number.NaN });

/** Running extremes over one day, per run day; a sink of the simulation. */
export class DailyExtremes implements InstantSink {
  private layout: SeriesLayout | null = null;
  private worst: RunWorst | null = null;
  private readonly days: { runDay: number; date: string; x: DayExtremes }[] = [];
  private readonly splitter = new DaySplitter<DayExtremes>(
    () => ({ shellMin: Infinity, shellMax: -Infinity, liningMin: Infinity, liningMax: -Infinity, innerMin: Infinity, innerMax: -Infinity, waterMargin: Infinity, acidMargin: Infinity }),
    (x, view) => this.add(x, view),
    (x, runDay, date) => this.days.push({ runDay, date, x }),
  );

  start(layout: SeriesLayout): void {
    this.layout = layout;
    this.worst = {
      peakShell: unset(-Infinity),
      peakLining: unset(-Infinity),
      layerMaxDeltaT: layout.layers.map(() => unset(-Infinity)),
      lowestWaterMargin: unset(Infinity),
      lowestAcidMargin: layout.acidDewPointK === null ? null : unset(Infinity),
    };
  }

  instant(view: InstantView): void {
    this.splitter.instant(view);
    this.addToRun(view);
  }

  /** The worst of every instant seen (null before the run starts). */
  runWorst(): RunWorst | null {
    return this.worst;
  }

  private addToRun(view: InstantView): void {
    const L = this.layout!;
    const w = this.worst!;
    const N = L.nodes;
    const T = view.temperatureK;
    const lining = L.layers[0]!;
    const note = (x: TimedExtreme, value: number, seg: number) => {
      x.value = value;
      x.time = view.isoLocal;
      x.height = L.heightM[seg]!;
    };
    for (let col = 0; col < L.segments * L.sectors; col++) {
      const base = col * N;
      const seg = Math.floor(col / L.sectors);
      if (T[base + N - 1]! > w.peakShell.value) note(w.peakShell, T[base + N - 1]!, seg);
      for (let i = lining.firstNode; i <= lining.lastNode; i++) if (T[base + i]! > w.peakLining.value) note(w.peakLining, T[base + i]!, seg);
      L.layers.forEach((layer, j) => {
        const d = Math.abs(T[base + layer.firstNode]! - T[base + layer.lastNode]!);
        if (d > w.layerMaxDeltaT[j]!.value) note(w.layerMaxDeltaT[j]!, d, seg);
      });
    }
    for (let s = 0; s < L.segments; s++) {
      if (view.segment.waterDewMarginK[s]! < w.lowestWaterMargin.value) note(w.lowestWaterMargin, view.segment.waterDewMarginK[s]!, s);
      if (w.lowestAcidMargin && view.segment.acidDewMarginK[s]! < w.lowestAcidMargin.value) note(w.lowestAcidMargin, view.segment.acidDewMarginK[s]!, s);
    }
  }

  private add(x: DayExtremes, view: InstantView): void {
    const L = this.layout!;
    const N = L.nodes;
    const lining = L.layers[0]!;
    const T = view.temperatureK;
    // every column of the wall: each segment and, with sectors, each sector
    for (let col = 0; col < L.segments * L.sectors; col++) {
      const base = col * N;
      const inner = T[base]!;
      const shell = T[base + N - 1]!;
      x.innerMin = Math.min(x.innerMin, inner);
      x.innerMax = Math.max(x.innerMax, inner);
      x.shellMin = Math.min(x.shellMin, shell);
      x.shellMax = Math.max(x.shellMax, shell);
      for (let i = lining.firstNode; i <= lining.lastNode; i++) {
        x.liningMin = Math.min(x.liningMin, T[base + i]!);
        x.liningMax = Math.max(x.liningMax, T[base + i]!);
      }
    }
    for (let s = 0; s < L.segments; s++) {
      x.waterMargin = Math.min(x.waterMargin, view.segment.waterDewMarginK[s]!);
      x.acidMargin = Math.min(x.acidMargin, view.segment.acidDewMarginK[s]!);
    }
  }

  /**
   * The figures of every complete day seen, first to last, as summary.json states them; `energyByDay`
   * (the run's energy account of each day, by run day) gives the heat.
   */
  figures(energyByDay: readonly EnergyAccount[]): DayFigures[] {
    const acid = this.layout?.acidDewPointK !== null;
    return this.days.map(({ runDay, date, x }) => {
      const e = energyByDay[runDay];
      return {
        day: runDay + 1,
        date,
        shell_min_c: round(c(x.shellMin)),
        shell_max_c: round(c(x.shellMax)),
        lining_min_c: round(c(x.liningMin)),
        lining_max_c: round(c(x.liningMax)),
        inner_surface_min_c: round(c(x.innerMin)),
        inner_surface_max_c: round(c(x.innerMax)),
        lowest_water_dew_margin_k: round(x.waterMargin),
        lowest_acid_dew_margin_k: acid ? round(x.acidMargin) : null,
        heat_loss_kwh: e ? round(heatLossJ(e) / J_PER_KWH) : null,
        gas_to_wall_kwh: e ? round(e.gasToWallJ / J_PER_KWH) : null,
      };
    });
  }
}
