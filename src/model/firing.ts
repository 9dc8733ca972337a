/**
 * Firing schedules: inlet gas temperature and mass flow against LOCAL CLOCK TIME (seconds after
 * local midnight), piecewise linear between the points of a day.
 *
 * Conventions:
 * - A ramp is two points at different times; values change linearly between them.
 * - A step is two points at the SAME time: the value jumps there; at the step time itself the later
 *   point applies. Three or more points at one time are an error.
 * - Before the first point of a day and after the last, the values HOLD CONSTANT at that point's
 *   values (they do not wrap to the previous or next day). Times beyond 86 400 s (a 25-hour day at a
 *   daylight-saving change) therefore hold the last point. If one day ends on values different from
 *   those the next day starts with, the inlet conditions step at midnight — write matching
 *   end/start points to avoid it.
 * - `daily`: the same points every day. `perDay`: a list of day-schedules used in turn; day i uses
 *   perDay[i mod n] (e.g. seven entries for a weekly cycle).
 * - Off state: a burner that is off still lets a small natural-draft flow through the flue. Any
 *   scheduled mass flow below the floor `offMassFlow` is raised to the floor. Default floor: 2 %
 *   of the largest scheduled flow (common practice: a few per cent of full-load flow passes through
 *   a stack with the burner off and its damper open). The inlet temperature in an off period is the
 *   one written at the off points (e.g. the boiler-house temperature, or the standby temperature of
 *   the boiler). `firing` is true while the scheduled flow exceeds the floor.
 */
import { GAS_CONSTANT, KELVIN_OFFSET, SECONDS_PER_DAY, STANDARD_PRESSURE } from '../physics/constants.ts';

/** One point of a day-schedule. */
export interface FiringPoint {
  /** Local clock time, seconds after local midnight, 0…86 400. */
  readonly clockS: number;
  /** Gas temperature at the flue inlet, K. */
  readonly inletTemperatureK: number;
  /** Flue gas mass flow, kg/s (0 for burner off; raised to the floor). */
  readonly massFlow: number;
}

interface FiringOptions {
  /** Floor on the mass flow (natural draft with the burner off), kg/s. Default 2 % of the largest scheduled flow. */
  readonly offMassFlow?: number;
}

/** Firing points for every day (`daily`) or in turn per day (`perDay`). */
export type DaySchedules = { readonly daily: readonly FiringPoint[] } | { readonly perDay: readonly (readonly FiringPoint[])[] };

export type FiringScheduleSpec = FiringOptions & DaySchedules;

/** Inlet conditions at one instant. */
export interface FiringState {
  readonly inletTemperatureK: number;
  /** Mass flow after the floor is applied, kg/s. */
  readonly massFlow: number;
  /** True while the scheduled flow is above the floor. */
  readonly firing: boolean;
}

export interface FiringSchedule {
  /**
   * Inlet conditions on the local date `dayIndex` days after the run's first local date, at local
   * clock time `clockS` (the drivers pass the local date, which after a daylight-saving change differs
   * from the run day in the hour after local midnight).
   */
  at(dayIndex: number, clockS: number): FiringState;
  /**
   * Clock times (s) on day `dayIndex` where the inlet conditions change slope or step: every point,
   * plus the instants where a ramp crosses the flow floor. Sorted, without repeats.
   */
  corners(dayIndex: number): number[];
  /** The flow floor in use, kg/s. */
  readonly offMassFlow: number;
}

/** Default floor as a fraction of the largest scheduled flow (common practice; see module note). */
export const DEFAULT_OFF_FLOW_FRACTION = 0.02;

/** Below this an inlet temperature is taken to be a °C value given by mistake (K expected). */
const LOWEST_PLAUSIBLE_INLET_K = 200;
/** Above this the flue-gas property fits are out of range. */
const HIGHEST_PLAUSIBLE_INLET_K = 3000;

function daysOf(spec: FiringScheduleSpec): { label: (d: number) => string; days: readonly (readonly FiringPoint[])[] } {
  if ('daily' in spec && spec.daily !== undefined) return { label: () => 'daily', days: [spec.daily] };
  return { label: (d) => `perDay[${d}]`, days: ('perDay' in spec ? spec.perDay : undefined) ?? [] };
}

/**
 * Everything wrong with one day's points, as messages that start with `where` and the point's
 * index (e.g. `daily[2]: …`); empty when the points are usable. Shared by the schedules here and
 * by the plant calendar.
 */
export function validateDayPoints(points: readonly FiringPoint[], where: string): string[] {
  const out: string[] = [];
  if (!Array.isArray(points) || points.length === 0) return [`${where}: needs at least one point`];
  points.forEach((p, i) => {
    const at = `${where}[${i}]`;
    if (!Number.isFinite(p.clockS) || p.clockS < 0 || p.clockS > SECONDS_PER_DAY)
      out.push(`${at}: clockS ${p.clockS} is outside 0…86400 s (0…24 h after local midnight)`);
    if (!Number.isFinite(p.massFlow) || p.massFlow < 0) out.push(`${at}: massFlow ${p.massFlow} kg/s must be ≥ 0`);
    if (!Number.isFinite(p.inletTemperatureK) || p.inletTemperatureK <= 0)
      out.push(`${at}: inletTemperatureK ${p.inletTemperatureK} is not a physical temperature (kelvin > 0)`);
    else if (p.inletTemperatureK < LOWEST_PLAUSIBLE_INLET_K)
      out.push(`${at}: inletTemperatureK ${p.inletTemperatureK} K is below ${LOWEST_PLAUSIBLE_INLET_K} K — was °C given where kelvin is expected (°C + ${KELVIN_OFFSET})?`);
    else if (p.inletTemperatureK > HIGHEST_PLAUSIBLE_INLET_K)
      out.push(`${at}: inletTemperatureK ${p.inletTemperatureK} K is above ${HIGHEST_PLAUSIBLE_INLET_K} K, beyond any flue gas`);
    if (i > 0) {
      const prev = points[i - 1].clockS;
      if (p.clockS < prev) out.push(`${at}: clockS ${p.clockS} goes back before the previous point's ${prev} (times must not decrease)`);
      else if (i > 1 && p.clockS === prev && points[i - 2].clockS === prev)
        out.push(`${at}: clockS ${p.clockS} is the third point at the same time (two points at one time make a step; more are ambiguous)`);
    }
  });
  return out;
}

/** Largest finite, non-negative scheduled flow among `days` (0 when none), kg/s. */
export function largestMassFlow(days: readonly (readonly FiringPoint[])[]): number {
  let largest = 0;
  for (const points of days) {
    if (!Array.isArray(points)) continue;
    for (const p of points) if (Number.isFinite(p.massFlow) && p.massFlow > largest) largest = p.massFlow;
  }
  return largest;
}

/**
 * Messages about the flow floor: a bad `offMassFlow`, or no flow at all with no floor to carry
 * the gas balance. `largest` is the largest scheduled flow; `otherProblems` says whether anything
 * else is already wrong (then an all-zero schedule is not reported twice).
 */
export function validateFlowFloor(offMassFlow: number | undefined, largest: number, otherProblems: boolean): string[] {
  if (offMassFlow !== undefined) {
    if (!Number.isFinite(offMassFlow) || offMassFlow < 0) return [`offMassFlow ${offMassFlow} kg/s must be ≥ 0`];
    if (offMassFlow === 0 && largest === 0) return ['every scheduled flow is 0 and offMassFlow is 0: the gas balance needs some flow'];
  } else if (largest === 0 && !otherProblems) {
    return ['every scheduled flow is 0: give offMassFlow (the natural-draft flow with the burner off)'];
  }
  return [];
}

/**
 * Everything wrong with a schedule, as messages naming the offending point and value; empty when
 * the schedule is usable.
 */
export function validateFiringSchedule(spec: FiringScheduleSpec): string[] {
  const out: string[] = [];
  const s = spec as { daily?: unknown; perDay?: unknown };
  if (s.daily !== undefined && s.perDay !== undefined) out.push('give either daily or perDay, not both');
  if (s.daily === undefined && s.perDay === undefined) return [...out, 'give daily (points for every day) or perDay (a list of day-schedules)'];
  if (s.perDay !== undefined && (!Array.isArray(s.perDay) || s.perDay.length === 0)) return [...out, 'perDay must list at least one day-schedule'];
  const { label, days } = daysOf(spec);
  days.forEach((points, d) => out.push(...validateDayPoints(points, label(d))));
  return [...out, ...validateFlowFloor(spec.offMassFlow, largestMassFlow(days), out.length > 0)];
}

/** Scheduled (un-floored) values at clock time `clockS` within one day's points. */
function interpolate(points: readonly FiringPoint[], clockS: number): { inletTemperatureK: number; massFlow: number } {
  const n = points.length;
  if (clockS < points[0].clockS) return points[0];
  // last point with time ≤ clockS (right-continuous at steps)
  let i = 0;
  while (i + 1 < n && points[i + 1].clockS <= clockS) i++;
  if (i === n - 1) return points[n - 1];
  const a = points[i];
  const b = points[i + 1];
  const f = (clockS - a.clockS) / (b.clockS - a.clockS);
  return {
    inletTemperatureK: a.inletTemperatureK + f * (b.inletTemperatureK - a.inletTemperatureK),
    massFlow: a.massFlow + f * (b.massFlow - a.massFlow),
  };
}

/**
 * Build a firing schedule; throws a RangeError listing every problem `validateFiringSchedule` finds.
 * Example: daily [{0 h, 300 K, 0}, {6 h, 300 K, 0}, {7 h, 500 K, 10}, {22 h, 500 K, 10}, {23 h, 300 K, 0}]
 * → at(0, 6.5 h) = { 400 K, 5 kg/s, firing }, at(0, 3 h) = { 300 K, 0.2 kg/s (floor), not firing }.
 */
export function makeFiringSchedule(spec: FiringScheduleSpec): FiringSchedule {
  const problems = validateFiringSchedule(spec);
  if (problems.length) throw new RangeError(`firing schedule: ${problems.join('; ')}`);
  const { days } = daysOf(spec);
  const floor = spec.offMassFlow ?? DEFAULT_OFF_FLOW_FRACTION * largestMassFlow(days);
  return makeFiringScheduleFromDays((dayIndex) => days[((Math.floor(dayIndex) % days.length) + days.length) % days.length], floor);
}

/**
 * A firing schedule whose points for day `dayIndex` come from `pointsForDay` (already validated,
 * e.g. by {@link validateDayPoints}), with the flow floor `offMassFlow` (kg/s). The interpolation
 * and corner rules are those of the module note. Corners are cached per points array, so
 * `pointsForDay` should hand back the same array object for the same day-schedule.
 */
export function makeFiringScheduleFromDays(pointsForDay: (dayIndex: number) => readonly FiringPoint[], offMassFlow: number): FiringSchedule {
  const floor = offMassFlow;
  const cornerCache = new WeakMap<readonly FiringPoint[], number[]>();
  const cornersOf = (points: readonly FiringPoint[]): number[] => {
    let cached = cornerCache.get(points);
    if (cached) return cached;
    const set = new Set<number>(points.map((p) => p.clockS));
    for (let i = 0; i + 1 < points.length; i++) {
      const a = points[i];
      const b = points[i + 1];
      if (b.clockS === a.clockS) continue;
      // a ramp crossing the floor: the floored flow has a kink there
      if ((a.massFlow - floor) * (b.massFlow - floor) < 0)
        set.add(a.clockS + ((floor - a.massFlow) / (b.massFlow - a.massFlow)) * (b.clockS - a.clockS));
    }
    cached = [...set].sort((x, y) => x - y);
    cornerCache.set(points, cached);
    return cached;
  };

  return {
    offMassFlow: floor,
    at(dayIndex, clockS) {
      const v = interpolate(pointsForDay(dayIndex), clockS);
      return {
        inletTemperatureK: v.inletTemperatureK,
        massFlow: Math.max(v.massFlow, floor),
        firing: v.massFlow > floor,
      };
    },
    corners(dayIndex) {
      return [...cornersOf(pointsForDay(dayIndex))];
    },
  };
}

/** Reference conditions of the normal cubic metre: 0 °C and 101 325 Pa (DIN 1343). */
export const NORMAL_TEMPERATURE_K = KELVIN_OFFSET;
export const NORMAL_PRESSURE_PA = STANDARD_PRESSURE;

/**
 * Mass flow, kg/s, from a volume flow at normal conditions (Nm³/h at 0 °C, 101 325 Pa), ideal gas:
 * ṁ = V̇_N/3600 · p_N M / (R T_N). `molarMass` in kg/mol.
 * Example: 10 000 Nm³/h of air (0.028964 kg/mol) → 2.778 m³/s × 1.2922 kg/m³ = 3.590 kg/s.
 */
export function massFlowFromNormalVolumeFlow(normalCubicMetresPerHour: number, molarMass: number): number {
  const normalDensity = (NORMAL_PRESSURE_PA * molarMass) / (GAS_CONSTANT * NORMAL_TEMPERATURE_K);
  return (normalCubicMetresPerHour / 3600) * normalDensity;
}
