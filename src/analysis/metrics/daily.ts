/**
 * Figures of every simulated day, gathered while the run goes (a sink of the simulation, so a year
 * needs no more memory than a day): the range of the shell (outer surface), of the lining (every
 * node of the flue-side layer) and of the inner surface over every column of the wall (each segment
 * and, with sectors, each sector), the lowest margins above the water and
 * acid dew points at any height, and the day's heat from its energy account.
 *
 * A day is the closed interval from its start to its end (see DaySplitter), the same instants the
 * summary's figures over the last day cover, so the last row agrees with them.
 */
import { kelvinToCelsius as c } from '../../physics/constants.ts';
import { DaySplitter, type InstantSink, type InstantView } from '../../model/sinks.ts';
import type { EnergyAccount, SeriesLayout } from '../../model/timeseries.ts';
import type { DayFigures } from '../summary.ts';
import { round } from '../rounding.ts';

const J_PER_KWH = 3.6e6;

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

/** Running extremes over one day, per run day; a sink of the simulation. */
export class DailyExtremes implements InstantSink {
  private layout: SeriesLayout | null = null;
  private readonly days: { runDay: number; date: string; x: DayExtremes }[] = [];
  private readonly splitter = new DaySplitter<DayExtremes>(
    () => ({ shellMin: Infinity, shellMax: -Infinity, liningMin: Infinity, liningMax: -Infinity, innerMin: Infinity, innerMax: -Infinity, waterMargin: Infinity, acidMargin: Infinity }),
    (x, view) => this.add(x, view),
    (x, runDay, date) => this.days.push({ runDay, date, x }),
  );

  start(layout: SeriesLayout): void {
    this.layout = layout;
  }

  instant(view: InstantView): void {
    this.splitter.instant(view);
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
        heat_loss_kwh: e ? round((e.convectionJ + e.radiationJ - e.sunJ) / J_PER_KWH) : null,
        gas_to_wall_kwh: e ? round(e.gasToWallJ / J_PER_KWH) : null,
      };
    });
  }
}
