/**
 * Test support: the hand-made fixture files (one invented January day in each format) and complete
 * typical years built from them — the fixture's header lines, then 8760 rows copied from the
 * fixture's first data row with the stamp set for each hour and chosen fields set by a formula.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { expect } from 'vitest';
import { WeatherFileError } from '../../../src/input/weather/csvFile.ts';

const dir = join(__dirname, 'fixtures');
export const TMY3_FIXTURE = readFileSync(join(dir, 'tmy3-first-day.csv'), 'utf8');
export const EPW_FIXTURE = readFileSync(join(dir, 'epw-first-day.epw'), 'utf8');

/** Month, day, hour ending of typical-year row k (built independently of the code under test). */
function stamp(k: number): [month: number, day: number, hour: number] {
  const monthDays = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
  let day = Math.floor((k % 8760) / 24); // past the year: January again
  let month = 0;
  while (day >= monthDays[month]) day -= monthDays[month++];
  return [month + 1, day + 1, (k % 24) + 1];
}

/** Values to write into row k, by column name (TMY3 header name or EPW field name); text as written. */
export type RowValues = (k: number) => Record<string, string | undefined>;

const p2 = (n: number) => String(n).padStart(2, '0');

/** A full TMY3 year from the fixture; `values(k)` overrides columns by header name. */
export function tmy3Year(values: RowValues, rowCount = 8760): string {
  const lines = TMY3_FIXTURE.trimEnd().split('\n');
  const header = lines[1].split(',');
  const template = lines[2].split(',');
  const out = [lines[0], lines[1]];
  for (let k = 0; k < rowCount; k++) {
    const [m, d, h] = stamp(k);
    const row = [...template];
    row[0] = `${p2(m)}/${p2(d)}/${m < 7 ? 1999 : 2004}`; // a typical year mixes years
    row[1] = `${p2(h)}:00`;
    for (const [name, v] of Object.entries(values(k))) if (v !== undefined) row[header.indexOf(name)] = v;
    out.push(row.join(','));
  }
  return out.join('\n') + '\n';
}

/** EPW field positions used by the tests (EPW data dictionary order). */
export const EPW_INDEX: Record<string, number> = {
  Year: 0,
  Month: 1,
  Day: 2,
  Hour: 3,
  Minute: 4,
  'Dry Bulb Temperature': 6,
  'Dew Point Temperature': 7,
  'Direct Normal Radiation': 14,
  'Diffuse Horizontal Radiation': 15,
  'Wind Speed': 21,
  'Total Sky Cover': 22,
};

/** A full EPW year from the fixture; `values(k)` overrides fields by EPW field name. */
export function epwYear(values: RowValues, rowCount = 8760): string {
  const lines = EPW_FIXTURE.trimEnd().split('\n');
  const template = lines[8].split(',');
  const out = lines.slice(0, 8);
  for (let k = 0; k < rowCount; k++) {
    const [m, d, h] = stamp(k);
    const row = [...template];
    row[0] = String(m < 7 ? 1997 : 2009);
    row[1] = String(m);
    row[2] = String(d);
    row[3] = String(h);
    for (const [name, v] of Object.entries(values(k))) if (v !== undefined) row[EPW_INDEX[name]] = v;
    out.push(row.join(','));
  }
  return out.join('\n') + '\n';
}

/** Replace data row `n` (1 = first data row) of a file with `headerLines` header lines, through `edit`. */
export function editRow(text: string, headerLines: number, n: number, edit: (cells: string[]) => string[]): string {
  const lines = text.split('\n');
  const i = headerLines + n - 1;
  lines[i] = edit(lines[i].split(',')).join(',');
  return lines.join('\n');
}

/** The WeatherFileError that `read` throws, or fail the test. */
export function weatherFileErrorOf(read: () => unknown): WeatherFileError {
  try {
    read();
  } catch (e) {
    expect(e).toBeInstanceOf(WeatherFileError);
    return e as WeatherFileError;
  }
  throw new Error('expected a WeatherFileError');
}
