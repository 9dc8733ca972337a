/**
 * Plant calendar: which day-schedule of firing points applies on each LOCAL DATE of a long run.
 *
 * A calendar names its day-schedules (`days`: name → points against local clock time, as in
 * firing.ts), sets the usual week (`week`: a day-schedule name per weekday), and lists dated
 * exceptions:
 * - `seasons`: periods with their own week and/or a `flowScale` that multiplies every scheduled
 *   mass flow of the day (inlet temperatures unchanged). A season is a layer on what would apply
 *   without it: the days its week leaves out keep that day-schedule, and without a flowScale of its
 *   own it keeps that scale (a flowScale it gives replaces the one below, it does not multiply it);
 * - `shutdowns`: periods with no firing, which use the day-schedule named by `shutdownDay` (every
 *   flow 0; its inlet temperatures are those of the cold plant, e.g. the boiler-house air).
 *
 * Weeks: `weekdays` names Monday–Friday, `weekend` Saturday and Sunday; a single day's own entry
 * (`monday` … `sunday`) overrides its group. The usual week must name all seven days.
 *
 * Periods are inclusive, `from` … `to`, either both `YYYY-MM-DD` (one-off: a real date, `from` not
 * after `to`) or both `MM-DD` (every year; `from` after `to` wraps over New Year, e.g. 10-01 … 04-30
 * is a heating season; 02-29 applies in leap years only).
 *
 * Precedence (the documented overlap rule): a shutdown wins over any season; a one-off (dated)
 * season lies on top of a yearly one (layered as above); seasons of the same kind (two yearly, or two one-off) may not
 * overlap — that is reported as an error. Shutdowns may overlap each other (both mean no firing).
 *
 * Dates are local calendar dates at the site. Run day `dayIndex` is the date `dayIndex` days after
 * the run's start date (see clock.ts); {@link localDayIndex} gives the index of the local date at a
 * run time, which differs from `SiteClock.dayIndex` in the hour after midnight that follows a
 * spring-forward change (a run day is 24 h of run time, a local day then only 23 h).
 */
import type { SiteClock } from './clock.ts';
import {
  DEFAULT_OFF_FLOW_FRACTION,
  largestMassFlow,
  makeFiringScheduleFromDays,
  validateDayPoints,
  validateFlowFloor,
  type FiringPoint,
  type FiringSchedule,
} from './firing.ts';

/** Days of the week, Monday first (ISO 8601 order). */
export const WEEKDAYS = ['monday', 'tuesday', 'wednesday', 'thursday', 'friday', 'saturday', 'sunday'] as const;
export type Weekday = (typeof WEEKDAYS)[number];

/** A week as names of day-schedules: groups `weekdays` (Mon–Fri) and `weekend` (Sat, Sun), single days override. */
export type WeekPattern = { readonly weekdays?: string; readonly weekend?: string } & { readonly [D in Weekday]?: string };

/** A named, inclusive date range: both `YYYY-MM-DD` (one-off) or both `MM-DD` (every year). */
export interface CalendarPeriod {
  readonly name: string;
  readonly from: string;
  readonly to: string;
}

/** A load season: its own week and/or a flow scale. */
export interface SeasonSpec extends CalendarPeriod {
  readonly week?: WeekPattern;
  /** Factor on every scheduled mass flow of the season's days (> 0); default 1. */
  readonly flowScale?: number;
}

export interface PlantCalendarSpec {
  /** Day-schedules by name. */
  readonly days: Readonly<Record<string, readonly FiringPoint[]>>;
  /** The usual week. */
  readonly week: WeekPattern;
  readonly seasons?: readonly SeasonSpec[];
  readonly shutdowns?: readonly CalendarPeriod[];
  /** Day-schedule used on shutdown days (every flow 0); required when there are shutdowns. */
  readonly shutdownDay?: string;
  /** Flow floor, kg/s; default 2 % of the largest flow any day can have (see firing.ts). */
  readonly offMassFlow?: number;
}

/** What applies on one local date. */
export interface ResolvedDay {
  /** Local date, `YYYY-MM-DD`. */
  readonly date: string;
  readonly weekday: Weekday;
  /** Name of the day-schedule used. */
  readonly dayName: string;
  /** Factor applied to its mass flows. */
  readonly flowScale: number;
  /** Which rule decided: the usual week, a season, or a shutdown (with its name). */
  readonly rule: { readonly kind: 'week' } | { readonly kind: 'season' | 'shutdown'; readonly name: string };
  /** The points of the day after scaling. */
  readonly points: readonly FiringPoint[];
}

export interface PlantCalendar {
  /** The day-schedule of a local date `YYYY-MM-DD`. Throws a RangeError for a date that is not real. */
  dayOf(date: string): ResolvedDay;
  /** A firing schedule for a run starting on the local date `startDate` (run day i = startDate + i days). */
  firingSchedule(startDate: string): FiringSchedule;
  /** The flow floor in use, kg/s. */
  readonly offMassFlow: number;
}

const DATE_RE = /^(\d{4})-(\d{2})-(\d{2})$/;
const MONTH_DAY_RE = /^(\d{2})-(\d{2})$/;

/** True when y-m-d (month 1–12) is a date of the Gregorian calendar. */
function isRealDate(y: number, m: number, d: number): boolean {
  const t = new Date(Date.UTC(y, m - 1, d));
  return t.getUTCFullYear() === y && t.getUTCMonth() === m - 1 && t.getUTCDate() === d;
}

/** Days since 1970-01-01 of a real `YYYY-MM-DD`, or undefined. */
function epochDay(date: string): number | undefined {
  const m = DATE_RE.exec(date);
  if (!m) return undefined;
  const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
  return isRealDate(y, mo, d) ? Date.UTC(y, mo - 1, d) / 86_400_000 : undefined;
}

const pad = (n: number, w = 2) => String(n).padStart(w, '0');
function dateOfEpochDay(day: number): string {
  const t = new Date(day * 86_400_000);
  return `${pad(t.getUTCFullYear(), 4)}-${pad(t.getUTCMonth() + 1)}-${pad(t.getUTCDate())}`;
}

/** The local date `days` days after `date` (`YYYY-MM-DD`), by calendar arithmetic. Example: addDays('2026-02-27', 2) = '2026-03-01'. */
export function addDays(date: string, days: number): string {
  const e = epochDay(date);
  if (e === undefined) throw new RangeError(`"${date}" is not a calendar date YYYY-MM-DD`);
  return dateOfEpochDay(e + Math.floor(days));
}

/** Weekday of a real `YYYY-MM-DD`. Example: 2026-03-29 is a Sunday. */
export function weekdayOf(date: string): Weekday {
  const e = epochDay(date);
  if (e === undefined) throw new RangeError(`"${date}" is not a calendar date YYYY-MM-DD`);
  // 1970-01-01 was a Thursday (index 3 with Monday = 0)
  return WEEKDAYS[(((e + 3) % 7) + 7) % 7];
}

/**
 * Index of the LOCAL date at run time `t` counted from the run's start date (0 on the first local
 * date). Equal to `clock.dayIndex(t)` except after a daylight-saving change, where a run day of 24 h
 * no longer lines up with local midnight.
 */
export function localDayIndex(clock: SiteClock, t: number): number {
  const date = clock.isoLocal(t).slice(0, 10);
  return (epochDay(date) as number) - (epochDay(clock.startDate) as number);
}

type PeriodKind = 'dated' | 'yearly';
interface Period {
  readonly kind: PeriodKind;
  readonly name: string;
  readonly label: string;
  /** dated: epoch days; yearly: MM-DD strings */
  readonly from: string;
  readonly to: string;
}

/** Parse a period; push messages naming `label` on problems; undefined when unusable. */
function parsePeriod(p: CalendarPeriod, label: string, out: string[]): Period | undefined {
  const at = `${label} ("${p?.name ?? ''}")`;
  if (typeof p?.name !== 'string' || p.name.trim() === '') out.push(`${label}: needs a name`);
  const from = String(p?.from ?? '');
  const to = String(p?.to ?? '');
  const bothDated = DATE_RE.test(from) && DATE_RE.test(to);
  const bothYearly = MONTH_DAY_RE.test(from) && MONTH_DAY_RE.test(to);
  if (!bothDated && !bothYearly) {
    out.push(`${at}: from "${from}" and to "${to}" must both be dates YYYY-MM-DD (one-off) or both MM-DD (every year)`);
    return undefined;
  }
  let ok = true;
  for (const [field, v] of [['from', from], ['to', to]] as const) {
    const real = bothDated ? epochDay(v) !== undefined : isRealDate(2024, Number(v.slice(0, 2)), Number(v.slice(3))); // 2024: a leap year, so 02-29 is allowed
    if (!real) {
      out.push(`${at}: ${field} "${v}" is not a calendar date`);
      ok = false;
    }
  }
  if (!ok) return undefined;
  if (bothDated && from > to) {
    out.push(`${at}: from ${from} is after to ${to} (the range is reversed)`);
    return undefined;
  }
  return { kind: bothDated ? 'dated' : 'yearly', name: p.name, label: at, from, to };
}

/** Whether the local date `date` (`YYYY-MM-DD`) lies in the period. */
function contains(p: Period, date: string): boolean {
  if (p.kind === 'dated') return p.from <= date && date <= p.to;
  const md = date.slice(5);
  return p.from <= p.to ? p.from <= md && md <= p.to : md >= p.from || md <= p.to;
}

/** First date (in a leap year for yearly periods) on which two periods of the same kind overlap, or undefined. */
function firstOverlap(a: Period, b: Period): string | undefined {
  if (a.kind === 'dated') {
    const from = a.from > b.from ? a.from : b.from;
    return from <= (a.to < b.to ? a.to : b.to) ? from : undefined;
  }
  const start = epochDay('2024-01-01') as number;
  for (let d = 0; d < 366; d++) {
    const date = dateOfEpochDay(start + d);
    if (contains(a, date) && contains(b, date)) return date.slice(5);
  }
  return undefined;
}

/** Resolve a week pattern to seven names; days it leaves out take `fallback` (or stay undefined). */
function resolveWeek(week: WeekPattern | undefined, fallback?: readonly (string | undefined)[]): (string | undefined)[] {
  return WEEKDAYS.map((d, i) => week?.[d] ?? (i < 5 ? week?.weekdays : week?.weekend) ?? fallback?.[i]);
}

const WEEK_KEYS = new Set<string>(['weekdays', 'weekend', ...WEEKDAYS]);

/**
 * Everything wrong with a calendar spec, as messages naming the offending entry (e.g.
 * `seasons[1] ("heating"): to "04-31" is not a calendar date`); empty when usable.
 */
export function validatePlantCalendar(spec: PlantCalendarSpec): string[] {
  const out: string[] = [];
  const days = spec?.days ?? {};
  const names = Object.keys(days);
  if (names.length === 0) out.push('days: name at least one day-schedule');
  for (const name of names) out.push(...validateDayPoints(days[name], `days.${name}`));

  const checkWeek = (week: WeekPattern | undefined, where: string, complete: boolean) => {
    if (week === undefined || typeof week !== 'object') {
      if (complete) out.push(`${where}: give the usual week (weekdays, weekend, or monday … sunday)`);
      return;
    }
    for (const key of Object.keys(week)) {
      if (!WEEK_KEYS.has(key)) out.push(`${where}.${key}: not a day of the week (use weekdays, weekend, monday … sunday)`);
      else if (!(week[key as keyof WeekPattern]! in days)) out.push(`${where}.${key}: no day-schedule named "${week[key as keyof WeekPattern]}" in days (have: ${names.join(', ')})`);
    }
    if (complete) {
      const missing = WEEKDAYS.filter((_, i) => resolveWeek(week)[i] === undefined);
      if (missing.length) out.push(`${where}: says nothing for ${missing.join(', ')} (every day needs a day-schedule)`);
    }
  };
  checkWeek(spec?.week, 'week', true);

  const seasons: Period[] = [];
  (spec?.seasons ?? []).forEach((s, i) => {
    const p = parsePeriod(s, `seasons[${i}]`, out);
    if (p) seasons.push(p);
    const at = `seasons[${i}] ("${s?.name ?? ''}")`;
    if (s?.week === undefined && s?.flowScale === undefined) out.push(`${at}: give a week, a flowScale, or both (else the season changes nothing)`);
    if (s?.week !== undefined) checkWeek(s.week, `${at}.week`, false);
    if (s?.flowScale !== undefined && !(Number.isFinite(s.flowScale) && s.flowScale > 0))
      out.push(`${at}: flowScale ${s.flowScale} must be a number > 0 (for no firing use a shutdown)`);
  });
  for (let i = 0; i < seasons.length; i++) {
    for (let j = 0; j < i; j++) {
      if (seasons[i].kind !== seasons[j].kind) continue; // a one-off season inside a yearly one wins: allowed
      const on = firstOverlap(seasons[i], seasons[j]);
      if (on !== undefined)
        out.push(`${seasons[i].label} overlaps ${seasons[j].label} on ${on} (two ${seasons[i].kind === 'dated' ? 'one-off' : 'yearly'} seasons may not overlap; a one-off season may lie inside a yearly one and then wins)`);
    }
  }

  const shutdowns = spec?.shutdowns ?? [];
  shutdowns.forEach((s, i) => parsePeriod(s, `shutdowns[${i}]`, out));
  if (shutdowns.length > 0 || spec?.shutdownDay !== undefined) {
    const off = spec?.shutdownDay;
    if (off === undefined) out.push('shutdownDay: name the day-schedule used on shutdown days (every flow 0)');
    else if (!(off in days)) out.push(`shutdownDay: no day-schedule named "${off}" in days (have: ${names.join(', ')})`);
    else if (Array.isArray(days[off]) && days[off].some((p) => p.massFlow !== 0))
      out.push(`shutdownDay: day-schedule "${off}" has a mass flow other than 0, but a shutdown has no firing`);
  }
  const otherProblems = out.length > 0;
  out.push(...validateFlowFloor(spec?.offMassFlow, otherProblems ? 0 : largestFlowOf(spec), otherProblems));
  return out;
}

/** A day-schedule name with the scale on its flows. */
interface DayChoice {
  readonly dayName: string;
  readonly flowScale: number;
}

/** What a season makes of the choice `below` on weekday `wd`: its own day-schedule and scale where it gives them. */
function layer(season: SeasonSpec, wd: number, below: DayChoice): DayChoice {
  return { dayName: resolveWeek(season.week)[wd] ?? below.dayName, flowScale: season.flowScale ?? below.flowScale };
}

/**
 * Largest mass flow any date can have: the usual week, each yearly season on it, each one-off
 * season on either (and the shutdown day, whose flows are 0).
 */
function largestFlowOf(spec: PlantCalendarSpec): number {
  const base = resolveWeek(spec.week).map((dayName): DayChoice => ({ dayName: dayName as string, flowScale: 1 }));
  const seasons = spec.seasons ?? [];
  const isDated = (s: SeasonSpec) => DATE_RE.test(s.from);
  const yearly = seasons.filter((s) => !isDated(s)).flatMap((s) => base.map((c, wd) => layer(s, wd, c)));
  const below = [...base, ...yearly];
  const dated = seasons.filter(isDated).flatMap((s) => below.map((c, k) => layer(s, k % 7, c)));
  return Math.max(0, ...[...below, ...dated].map((c) => c.flowScale * largestMassFlow([spec.days[c.dayName]])));
}

/** Build a plant calendar; throws a RangeError listing every problem {@link validatePlantCalendar} finds. */
export function makePlantCalendar(spec: PlantCalendarSpec): PlantCalendar {
  const problems = validatePlantCalendar(spec);
  if (problems.length) throw new RangeError(`plant calendar: ${problems.join('; ')}`);
  const ignored: string[] = [];
  const base = resolveWeek(spec.week) as string[];
  const seasons = (spec.seasons ?? []).map((s, i) => ({ spec: s, period: parsePeriod(s, `seasons[${i}]`, ignored) as Period }));
  const yearly = seasons.filter((s) => s.period.kind === 'yearly');
  const dated = seasons.filter((s) => s.period.kind === 'dated');
  const shutdowns = (spec.shutdowns ?? []).map((s, i) => parsePeriod(s, `shutdowns[${i}]`, ignored) as Period);
  const floor = spec.offMassFlow ?? DEFAULT_OFF_FLOW_FRACTION * largestFlowOf(spec);

  // one points array per (day-schedule, scale), so that corner caches keyed by array identity work
  const scaled = new Map<string, readonly FiringPoint[]>();
  const pointsOf = (dayName: string, flowScale: number): readonly FiringPoint[] => {
    const key = `${dayName}|${flowScale}`;
    let pts = scaled.get(key);
    if (!pts) {
      const raw = spec.days[dayName];
      pts = flowScale === 1 ? raw : raw.map((p) => ({ ...p, massFlow: p.massFlow * flowScale }));
      scaled.set(key, pts);
    }
    return pts;
  };

  const dayOf = (date: string): ResolvedDay => {
    const weekday = weekdayOf(date);
    const wd = WEEKDAYS.indexOf(weekday);
    const shut = shutdowns.find((p) => contains(p, date));
    if (shut) {
      const dayName = spec.shutdownDay as string;
      return { date, weekday, dayName, flowScale: 1, rule: { kind: 'shutdown', name: shut.name }, points: pointsOf(dayName, 1) };
    }
    // layers: the usual week, then a yearly season, then a one-off season on top (see the module note)
    let choice: DayChoice = { dayName: base[wd], flowScale: 1 };
    let rule: ResolvedDay['rule'] = { kind: 'week' };
    for (const group of [yearly, dated]) {
      const season = group.find((s) => contains(s.period, date));
      if (season) {
        choice = layer(season.spec, wd, choice);
        rule = { kind: 'season', name: season.period.name };
      }
    }
    return { date, weekday, ...choice, rule, points: pointsOf(choice.dayName, choice.flowScale) };
  };

  return {
    offMassFlow: floor,
    dayOf,
    firingSchedule(startDate) {
      const start = epochDay(startDate);
      if (start === undefined) throw new RangeError(`start date "${startDate}" is not a calendar date YYYY-MM-DD`);
      const byDay = new Map<number, readonly FiringPoint[]>();
      return makeFiringScheduleFromDays((dayIndex) => {
        const i = Math.floor(dayIndex);
        let pts = byDay.get(i);
        if (!pts) {
          pts = dayOf(dateOfEpochDay(start + i)).points;
          byDay.set(i, pts);
        }
        return pts;
      }, floor);
    },
  };
}
