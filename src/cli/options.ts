/** Command-line option values shared by several commands, checked and converted; bad values are BadInput (exit code 2). */

/** Bad input given on the command line (an option's value): the command prints the message and exits with code 2. */
export class BadInput extends Error {}

export function parseChartSize(text: string): { width: number; height: number } {
  const m = /^(\d{3,4})x(\d{3,4})$/.exec(text);
  if (!m) throw new BadInput(`--chart-size: found "${text}"; expected WIDTHxHEIGHT in pixels, e.g. 1200x700 (100 to 9999)`);
  return { width: Number(m[1]), height: Number(m[2]) };
}

/** `--threads`: `auto` or a whole number from 1 (1 runs every case in this thread). */
export function parseThreads(text: string | undefined): number | 'auto' {
  if (text === undefined || text === 'auto') return 'auto';
  if (!/^\d+$/.test(text.trim()) || Number(text) < 1 || Number(text) > 256) throw new BadInput(`--threads: found "${text}"; expected auto or a whole number from 1 to 256`);
  return Number(text);
}
