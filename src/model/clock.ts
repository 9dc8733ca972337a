/**
 * Site clock: maps the run's time axis (seconds since local midnight of the first day, in the
 * site's IANA time zone) to UTC instants and to local clock time, through @date-fns/tz so that
 * daylight-saving changes are handled by the time-zone database, not by hand.
 *
 * The run's time axis is uniform: day n covers t ∈ [n·86400, (n+1)·86400) s. On a day when the
 * clocks change, local clock time and the run's time differ by the shift; `localSecondsOfDay`
 * always reports the true local clock reading.
 */
import { TZDate } from '@date-fns/tz';
import { SECONDS_PER_DAY } from '../physics/constants.ts';

export interface SiteClock {
  /** IANA time zone, e.g. `Europe/Oslo`. */
  readonly timeZone: string;
  /** First day of the run, `YYYY-MM-DD` (local). */
  readonly startDate: string;
  /** UTC instant (ms) of local midnight starting the first day. */
  readonly startUtcMs: number;
  /** UTC instant (ms) of run time `t` (s). */
  utcMs(t: number): number;
  /** Local clock reading at run time `t`, seconds after local midnight (0 ≤ s < 86400 except on DST days). */
  localSecondsOfDay(t: number): number;
  /** Whole days since the start at run time `t` (day index by run time, 0-based). */
  dayIndex(t: number): number;
  /** ISO 8601 local time with offset at run time `t`, e.g. `2026-07-14T13:00:00+02:00`. */
  isoLocal(t: number): string;
  /** Run time (s) of local clock time `secondsOfDay` on the local date `dayIndex` days after the start. */
  runTimeOfLocal(dayIndex: number, secondsOfDay: number): number;
}

const DATE_RE = /^(\d{4})-(\d{2})-(\d{2})$/;

/**
 * The dates a run may use (first day, weather-file times), inclusive. Meeus's low-precision solar
 * coordinates behind the sun position (physics/sun/position.ts) are accurate to about 0.01° within
 * a few centuries of J2000, and these years keep well inside that while covering every plant record
 * and design year; JavaScript's `Date.UTC` also reads years 0–99 as 1900–1999, which a lower bound
 * of 1900 makes harmless.
 */
export const EARLIEST_DATE = '1900-01-01';
export const LATEST_DATE = '2199-12-31';
/** Words for messages: `a calendar date "YYYY-MM-DD" from 1900-01-01 to 2199-12-31`. */
export const CALENDAR_DATE_WORDING = `a calendar date "YYYY-MM-DD" from ${EARLIEST_DATE} to ${LATEST_DATE}`;

/**
 * Year, month (1–12) and day of a date of the Gregorian calendar within EARLIEST_DATE…LATEST_DATE,
 * or null (2026-13-01, 2026-00-10, 0000-01-10 and 2026-02-30 are all null).
 */
export function calendarDate(year: number, month: number, day: number): { year: number; month: number; day: number } | null {
  if (![year, month, day].every(Number.isInteger) || year < 1900 || year > 2199 || month < 1 || month > 12 || day < 1) return null;
  const t = new Date(Date.UTC(year, month - 1, day));
  return t.getUTCFullYear() === year && t.getUTCMonth() === month - 1 && t.getUTCDate() === day ? { year, month, day } : null;
}

/** A `YYYY-MM-DD` text read by {@link calendarDate}, or null. Example: parseCalendarDate('2026-02-28') → { year: 2026, month: 2, day: 28 }. */
export function parseCalendarDate(text: string): { year: number; month: number; day: number } | null {
  const m = DATE_RE.exec(text);
  return m ? calendarDate(Number(m[1]), Number(m[2]), Number(m[3])) : null;
}

/** Build the clock of a site. Throws a RangeError with a plain message for a bad zone or date. */
export function makeSiteClock(timeZone: string, startDate: string): SiteClock {
  const date = parseCalendarDate(startDate);
  if (!date) throw new RangeError(`start date "${startDate}" is not ${CALENDAR_DATE_WORDING}`);
  if (!isValidTimeZone(timeZone)) throw new RangeError(`time zone "${timeZone}" is not a known IANA zone (e.g. Europe/Oslo, America/Chicago, UTC)`);
  const [y, mo, d] = [date.year, date.month - 1, date.day];
  const start = new TZDate(y, mo, d, 0, 0, 0, timeZone);
  const startUtcMs = start.getTime();
  if (!Number.isFinite(startUtcMs) || start.getFullYear() !== y || start.getMonth() !== mo || start.getDate() !== d)
    throw new RangeError(`start date "${startDate}" is not ${CALENDAR_DATE_WORDING}`);

  // UTC offsets change only at whole quarter hours of UTC in every zone of the tz database, and at
  // most a few times a year. The time-zone lookup is costly, so: per UTC day, the offsets at its
  // start and at its end; when they agree (every day but the few with a change) that is the
  // offset for the whole day; otherwise the offset of each 15-minute block.
  const lookup = (utcMs: number) => -new TZDate(utcMs, timeZone).getTimezoneOffset() * 60_000;
  const dayCache = new Map<number, number>(); // day → offset, or NaN when it changes within the day
  const blockCache = new Map<number, number>();
  const offsetMs = (utcMs: number): number => {
    const day = Math.floor(utcMs / 86_400_000);
    let off = dayCache.get(day);
    if (off === undefined) {
      const first = lookup(day * 86_400_000);
      off = first === lookup((day + 1) * 86_400_000 - 900_000) ? first : Number.NaN;
      dayCache.set(day, off);
    }
    if (!Number.isNaN(off)) return off;
    const block = Math.floor(utcMs / 900_000);
    let blockOff = blockCache.get(block);
    if (blockOff === undefined) {
      blockOff = lookup(block * 900_000);
      blockCache.set(block, blockOff);
    }
    return blockOff;
  };
  return {
    timeZone,
    startDate,
    startUtcMs,
    utcMs: (t) => startUtcMs + t * 1000,
    localSecondsOfDay(t) {
      const utc = startUtcMs + t * 1000;
      const localMs = utc + offsetMs(utc);
      const s = (localMs / 1000) % SECONDS_PER_DAY;
      return s < 0 ? s + SECONDS_PER_DAY : s;
    },
    dayIndex: (t) => Math.floor(t / SECONDS_PER_DAY + 1e-9),
    isoLocal(t) {
      // local wall-clock fields from the UTC instant shifted by the zone's offset at that instant
      const utc = startUtcMs + Math.round(t) * 1000;
      const offMs = offsetMs(utc);
      const d = new Date(utc + offMs);
      const off = Math.round(offMs / 60_000);
      const sign = off >= 0 ? '+' : '-';
      const p2 = (n: number) => String(Math.trunc(Math.abs(n))).padStart(2, '0');
      return `${d.getUTCFullYear()}-${p2(d.getUTCMonth() + 1)}-${p2(d.getUTCDate())}T${p2(d.getUTCHours())}:${p2(d.getUTCMinutes())}:${p2(d.getUTCSeconds())}${sign}${p2(off / 60)}:${p2(off % 60)}`;
    },
    runTimeOfLocal(dayIndex, secondsOfDay) {
      const h = Math.floor(secondsOfDay / 3600);
      const rest = secondsOfDay - h * 3600;
      const mi = Math.floor(rest / 60);
      const s = rest - mi * 60;
      const dt = new TZDate(y, mo, d + dayIndex, h, mi, Math.floor(s), timeZone);
      return (dt.getTime() - startUtcMs) / 1000 + (s - Math.floor(s));
    },
  };
}

/** True when `timeZone` is an IANA zone known to this Node runtime. */
export function isValidTimeZone(timeZone: string): boolean {
  if (KNOWN_ZONES.has(timeZone)) return true;
  try {
    new Intl.DateTimeFormat('en-US', { timeZone });
    KNOWN_ZONES.add(timeZone);
    return true;
  } catch {
    return false;
  }
}

/** Zones already checked (constructing a formatter to check one is slow). */
const KNOWN_ZONES = new Set<string>();
