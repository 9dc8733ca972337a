/**
 * The fastest forcing a scenario contains, on each face of the wall: the time scales the automatic
 * mesh must resolve (docs/model.md "Automatic mesh"; physics/wall/cells.ts applies them).
 *
 * Flue side: every change of the firing schedule (a ramp of duration d; a step, d = 0; a day that
 * ends on other values than the next one starts with, a step at midnight, when the run goes on past
 * it) and a wall that starts
 * away from the gas's conditions while the first day is reported (a warm-up firing, a cold or
 * uniform start) — each seen no sooner than one output interval after it starts, since the wall is
 * reported only at output instants: τ = max(d, Δt_out). Outside: the time step of a weather file
 * (values are interpolated linearly between rows, so they change that fast), again not below the
 * output interval; a design day is smooth at the daily scale. Without anything faster, the daily
 * wave's time scale P/π.
 */
import type { ModelInputs } from './inputs.ts';
import type { FiringPoint } from './firing.ts';
import { DAILY_TIME_SCALE_S } from '../physics/wall/cells.ts';

/** One face's time scale and, in words, what set it. */
export interface FaceTimeScale {
  readonly timeScaleS: number;
  readonly setBy: string;
}

export interface ForcingTimeScales {
  readonly flueSide: FaceTimeScale;
  readonly outside: FaceTimeScale;
}

const minutes = (s: number): string => `${Number((s / 60).toFixed(1))} min`;
const clock = (s: number): string => `${String(Math.floor(s / 3600)).padStart(2, '0')}:${String(Math.floor((s % 3600) / 60)).padStart(2, '0')}`;
const DAILY: FaceTimeScale = { timeScaleS: DAILY_TIME_SCALE_S, setBy: 'the daily wave (P/π)' };

/** Whether two firing points set the same inlet conditions. */
const sameConditions = (a: FiringPoint, b: FiringPoint): boolean => a.inletTemperatureK === b.inletTemperatureK && a.massFlow === b.massFlow;

/**
 * The shortest change of a list of day-schedules (used in turn, the last followed by the first),
 * with its words; a day that ends on other conditions than the next starts with counts only when
 * the run goes on past a midnight.
 */
function shortestScheduleChange(days: readonly (readonly FiringPoint[])[], pastMidnight: boolean): { durationS: number; setBy: string } | null {
  let best: { durationS: number; setBy: string } | null = null;
  const consider = (durationS: number, setBy: string) => {
    if (best === null || durationS < best.durationS) best = { durationS, setBy };
  };
  days.forEach((points, d) => {
    const which = days.length > 1 ? ` of day-schedule ${d + 1}` : '';
    for (let i = 1; i < points.length; i++) {
      const a = points[i - 1]!;
      const b = points[i]!;
      if (sameConditions(a, b)) continue;
      const duration = b.clockS - a.clockS;
      consider(duration, duration === 0 ? `the step at ${clock(a.clockS)}${which}` : `the ${minutes(duration)} ramp from ${clock(a.clockS)}${which}`);
    }
    const next = days[(d + 1) % days.length]!;
    if (pastMidnight && !sameConditions(points[points.length - 1]!, next[0]!)) consider(0, `the step at midnight after day-schedule ${d + 1}`);
  });
  return best;
}

/** Whether the run goes on past a midnight (more than one day, or a day that starts after midnight). */
function pastMidnight(inputs: ModelInputs): boolean {
  const { run } = inputs;
  return run.length.kind === 'until-periodic' || run.length.days > 1 || (run.mode === 'warmup' && (run.firingStartClockS ?? 0) > 0);
}

/** Whether the first simulated day is reported and the wall starts away from the gas's conditions (a step at the start). */
function startsWithStep(inputs: ModelInputs): boolean {
  const { run } = inputs;
  const uniformStart = run.initial === 'cold' || (typeof run.initial === 'object' && run.initial.kind === 'uniform');
  return run.mode === 'warmup' || (uniformStart && run.length.kind === 'days' && run.length.days === 1);
}

/** The forcing time scales of a scenario's two faces (module note). */
export function forcingTimeScales(inputs: ModelInputs): ForcingTimeScales {
  const outputS = inputs.run.outputInterval;
  const seen = (durationS: number, setBy: string): FaceTimeScale =>
    durationS >= DAILY_TIME_SCALE_S
      ? DAILY
      : durationS >= outputS
        ? { timeScaleS: durationS, setBy }
        : { timeScaleS: outputS, setBy: `${setBy}, seen at the ${minutes(outputS)} output interval` };

  const schedule = inputs.flue.schedule;
  const change = shortestScheduleChange('daily' in schedule ? [schedule.daily] : 'perDay' in schedule ? schedule.perDay : Object.values(schedule.calendar.days), pastMidnight(inputs));
  const candidates: FaceTimeScale[] = [];
  if (change) candidates.push(seen(change.durationS, change.setBy));
  if (startsWithStep(inputs)) candidates.push(seen(0, inputs.run.mode === 'warmup' ? 'the warm-up firing' : 'the uniform starting wall'));
  const flueSide = candidates.reduce((a, b) => (b.timeScaleS < a.timeScaleS ? b : a), DAILY);

  const step = inputs.weather.source.timeStepS;
  const outside = step === undefined ? DAILY : seen(step, `the weather's ${minutes(step)} time step`);
  return { flueSide, outside };
}
