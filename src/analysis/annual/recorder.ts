/**
 * The annual statistics of a run, gathered while it goes: a sink of the simulation (so a year needs
 * no more memory than a day) that feeds every reported instant to the monthly hours below the dew
 * points, the monthly and run-wide extremes of the wall, the rainflow counters of the thermal
 * cycles and the top's margin grid, and notes the local date of every run day (the days' heat is
 * booked to months by it). Instants are placed in months, dates and hours by their ISO local time.
 */
import type { AnnualInput } from '../../model/inputs.ts';
import { DaySplitter, type InstantSink, type InstantView } from '../../model/sinks.ts';
import type { SeriesLayout } from '../../model/timeseries.ts';
import { MonthlyDewHours } from './dewHours.ts';
import { WallExtremesByMonth } from './extremes.ts';
import { ThermalCycles } from './cycles.ts';
import { MarginGrid } from './marginGrid.ts';

/** Days since 1970-01-01 of `YYYY-MM-DD`. */
export function epochDayOf(date: string): number {
  return Date.UTC(Number(date.slice(0, 4)), Number(date.slice(5, 7)) - 1, Number(date.slice(8, 10))) / 86_400_000;
}

/** What the annual statistics are gathered for. */
export interface AnnualOptions {
  readonly annual: AnnualInput;
  /** Range above which thermal cycles are counted separately, K (null: none). */
  readonly cycleThresholdK: number | null;
}

/** The parts of the statistics, built once the layout is known. */
export interface AnnualParts {
  readonly layout: SeriesLayout;
  readonly dewHours: MonthlyDewHours;
  readonly extremes: WallExtremesByMonth;
  readonly cycles: ThermalCycles;
  readonly grid: MarginGrid;
  /** Local date `YYYY-MM-DD` of each complete run day, by run day. */
  readonly dayDates: readonly string[];
}

/** Annual statistics of a run; a sink of the simulation. */
export class AnnualRecorder implements InstantSink {
  private state: (AnnualParts & { dayDates: string[] }) | null = null;
  private readonly firstEpochDay: number;
  private lastDate = '';
  private lastDateIndex = 0;
  // (the splitter takes a null accumulator for "no day open": each day's is a plain marker)
  private readonly splitter = new DaySplitter<object>(
    () => ({}),
    () => {},
    (_acc, runDay, date) => {
      this.state!.dayDates[runDay] = date;
    },
  );

  constructor(readonly options: AnnualOptions) {
    this.firstEpochDay = epochDayOf(options.annual.firstDay);
  }

  start(layout: SeriesLayout): void {
    const days = epochDayOf(this.options.annual.lastDay) - this.firstEpochDay + 1;
    this.state = {
      layout,
      dewHours: new MonthlyDewHours(layout.segments, layout.acidDewPointK !== null),
      extremes: new WallExtremesByMonth(layout),
      cycles: new ThermalCycles(layout, this.options.cycleThresholdK),
      grid: new MarginGrid(days, layout.segments - 1, layout.acidDewPointK !== null),
      dayDates: [],
    };
  }

  instant(view: InstantView): void {
    const st = this.state!;
    const iso = view.isoLocal;
    const month = iso.slice(0, 7);
    const date = iso.slice(0, 10);
    if (date !== this.lastDate) {
      this.lastDate = date;
      this.lastDateIndex = epochDayOf(date) - this.firstEpochDay;
    }
    st.dewHours.add(view, month);
    st.extremes.add(view, month);
    st.cycles.add(view);
    st.grid.add(view, this.lastDateIndex, Number(iso.slice(11, 13)));
    this.splitter.instant(view);
  }

  finish(): void {
    this.state?.cycles.finish();
  }

  /** The statistics gathered (after the run). Throws when the run reported no instant. */
  parts(): AnnualParts {
    if (!this.state) throw new Error('annual statistics: the run reported no instant');
    this.state.cycles.finish();
    return this.state;
  }
}
