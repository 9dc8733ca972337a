/** Command-line option values shared by several commands, checked and converted; bad values are BadInput (exit code 2). */
import { BadInput } from './errors.ts';
import { printable } from '../input/text.ts';

/** Chart sizes, pixels: each side (a 4000 × 4000 chart is 64 MB of pixels). */
const CHART_SIDE = { min: 100, max: 4000 };

/** `--chart-size WIDTHxHEIGHT`, pixels, each side from CHART_SIDE.min to CHART_SIDE.max. */
export function parseChartSize(text: string): { width: number; height: number } {
  const m = /^\s*(\d{1,6})\s*x\s*(\d{1,6})\s*$/i.exec(text);
  const [width, height] = m ? [Number(m[1]), Number(m[2])] : [Number.NaN, Number.NaN];
  if (!(width >= CHART_SIDE.min && width <= CHART_SIDE.max && height >= CHART_SIDE.min && height <= CHART_SIDE.max))
    throw new BadInput(`--chart-size: found "${printable(text)}"; expected WIDTHxHEIGHT in pixels, each from ${CHART_SIDE.min} to ${CHART_SIDE.max}, e.g. 1200x700`);
  return { width, height };
}

/** Heights in m from `--chart-heights`, each from 0 to the stack height `stackHeightM`. */
export function parseHeights(text: string, stackHeightM: number): number[] {
  const parts = text.split(',').map((v) => v.trim());
  const values = parts.map((v) => (/^[+]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(v) ? Number(v) : Number.NaN));
  if (values.some((v) => !(v >= 0 && v <= stackHeightM)))
    throw new BadInput(`--chart-heights: found "${printable(text)}"; expected heights in m from 0 to the stack height (${stackHeightM} m), separated by commas, e.g. 5,20,40`);
  return values;
}

/** `--threads`: `auto` or a whole number from 1 (1 runs every case in this thread). */
export function parseThreads(text: string | undefined): number | 'auto' {
  if (text === undefined || text === 'auto') return 'auto';
  if (!/^\d+$/.test(text.trim()) || Number(text) < 1 || Number(text) > 256) throw new BadInput(`--threads: found "${printable(text)}"; expected auto or a whole number from 1 to 256`);
  return Number(text);
}
