/**
 * Values with units at the edge of the program: a scenario value is either a plain number in the
 * unit its key documents, or a string with a unit ("115 mm", "4.5 in", "480 degF"), parsed by
 * js-quantities and converted to SI (kelvin for temperatures).
 */
import Qty from 'js-quantities';
import { KELVIN_OFFSET } from '../../physics/constants.ts';

export interface QuantityKind {
  /** What the value is, for messages: "a length". */
  readonly what: string;
  /** Unit of a plain number, as written for people. */
  readonly plainUnit: string;
  /** js-quantities unit that SI values are converted to. */
  readonly siUnit: string;
  /** Converts a plain number to SI. */
  readonly plainToSi: (v: number) => number;
  /** Whether the value is an absolute temperature (degC/degF strings mean temperatures, not differences). */
  readonly absoluteTemperature?: boolean;
}

export const QUANTITY_KINDS = {
  length: { what: 'a length', plainUnit: 'm', siUnit: 'm', plainToSi: (v) => v },
  temperature: { what: 'a temperature', plainUnit: '°C', siUnit: 'tempK', plainToSi: (v) => v + KELVIN_OFFSET, absoluteTemperature: true },
  temperatureDifference: { what: 'a temperature difference', plainUnit: 'K', siUnit: 'degK', plainToSi: (v) => v },
  speed: { what: 'a speed', plainUnit: 'm/s', siUnit: 'm/s', plainToSi: (v) => v },
  massFlow: { what: 'a mass flow', plainUnit: 'kg/s', siUnit: 'kg/s', plainToSi: (v) => v },
  /** Volume flow at normal conditions (0 °C, 101.325 kPa); SI m³/s. */
  volumeFlow: { what: 'a volume flow at normal conditions (0 °C, 101.325 kPa)', plainUnit: 'Nm³/h', siUnit: 'm^3/s', plainToSi: (v) => v / 3600 },
  filmCoefficient: { what: 'a film coefficient', plainUnit: 'W/(m²·K)', siUnit: 'W/m^2*degK', plainToSi: (v) => v },
  contactResistance: { what: 'a contact resistance', plainUnit: 'm²·K/W', siUnit: 'm^2*degK/W', plainToSi: (v) => v },
  stress: { what: 'a stress', plainUnit: 'MPa', siUnit: 'Pa', plainToSi: (v) => v * 1e6 },
  duration: { what: 'a duration', plainUnit: 'min', siUnit: 's', plainToSi: (v) => v * 60 },
  pressure: { what: 'a pressure', plainUnit: 'kPa', siUnit: 'Pa', plainToSi: (v) => v * 1000 },
  density: { what: 'a density', plainUnit: 'kg/m³', siUnit: 'kg/m^3', plainToSi: (v) => v },
  conductivity: { what: 'a thermal conductivity', plainUnit: 'W/(m·K)', siUnit: 'W/m*degK', plainToSi: (v) => v },
  specificHeat: { what: 'a specific heat', plainUnit: 'J/(kg·K)', siUnit: 'J/kg*degK', plainToSi: (v) => v },
  angle: { what: 'an angle', plainUnit: '°', siUnit: 'deg', plainToSi: (v) => v },
} as const satisfies Record<string, QuantityKind>;

export type QuantityKindName = keyof typeof QUANTITY_KINDS;

/**
 * Rewrite common engineering spellings into the grammar js-quantities reads:
 * `°C` → `degC`, a lone `K` → `degK`, `W/(m^2 K)` → `W/m^2*degK`, `W/m^2/K` → `W/m^2*degK`,
 * `m2` → `m^2`; for absolute temperatures `degC`/`degF`/`degK` → `tempC`/`tempF`/`tempK`.
 */
export function normaliseUnitText(text: string, absoluteTemperature: boolean): string {
  const m = /^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*(.*?)\s*$/.exec(text);
  if (!m) return text;
  let unit = m[2]!;
  unit = unit.replace(/\bNm(?=[\^³23])/g, 'm').replace(/³/g, '^3').replace(/²/g, '^2');
  unit = unit.replace(/°\s*C\b/g, 'degC').replace(/°\s*F\b/g, 'degF').replace(/°\s*K\b/g, 'degK').replace(/\bcelsius\b/gi, 'degC');
  unit = unit.replace(/(^|[^A-Za-z])K(?![A-Za-z])/g, '$1degK');
  unit = unit.replace(/([A-Za-z])([23])(?![\d.])/g, '$1^$2');
  unit = unit.replace(/[()]/g, '');
  // after the first '/', every further '/' divides too: a/b/c = a/(b*c)
  const slash = unit.indexOf('/');
  if (slash >= 0) unit = unit.slice(0, slash + 1) + unit.slice(slash + 1).replace(/\//g, '*');
  unit = unit.replace(/\s*·\s*|\s*\*\s*/g, '*').replace(/([A-Za-z0-9^])\s+(?=[A-Za-z])/g, '$1*');
  if (absoluteTemperature) unit = unit.replace(/^deg([CFKR])$/, 'temp$1');
  return `${m[1]} ${unit}`.trim();
}

export type ParsedQuantity = { ok: true; value: number } | { ok: false; expected: string };

/**
 * Expected-value phrase for messages: `a length (a plain number in m, or a string with a unit such
 * as "115 mm")`; with `what` (the allowed range in words) the quantity is named too where `what`
 * does not: `a length: a height above 0 m and up to 500 m (a plain number in m, …)`.
 */
export function describeExpected(kind: QuantityKindName, what?: string): string {
  const k = QUANTITY_KINDS[kind];
  const noun = k.what.replace(/^an? /, '').replace(/ \(.*$/, '');
  const phrase = what === undefined ? k.what : what.includes(noun) ? what : `${k.what}: ${what}`;
  return `${phrase} (a plain number in ${k.plainUnit}, or a string with a unit${EXAMPLES[kind] ? ` such as "${EXAMPLES[kind]}"` : ''})`;
}

const EXAMPLES: Partial<Record<QuantityKindName, string>> = {
  length: '115 mm',
  temperature: '480 degF',
  temperatureDifference: '5 K',
  speed: '12 km/h',
  massFlow: '9000 kg/h',
  volumeFlow: '12000 Nm^3/h',
  filmCoefficient: '25 W/(m^2 K)',
  contactResistance: '0.002 m^2 K/W',
  stress: '4 MPa',
  duration: '10 min',
  pressure: '101.3 kPa',
};

/** Parse a plain number or a unit string into SI. */
export function parseQuantity(value: unknown, kind: QuantityKindName): ParsedQuantity {
  const k: QuantityKind = QUANTITY_KINDS[kind];
  if (typeof value === 'number') {
    return Number.isFinite(value) ? { ok: true, value: k.plainToSi(value) } : { ok: false, expected: describeExpected(kind) };
  }
  if (typeof value !== 'string') return { ok: false, expected: describeExpected(kind) };
  const trimmed = value.trim();
  if (trimmed.length > 60) return { ok: false, expected: describeExpected(kind) }; // no quantity is written that long
  if (/^[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?$/.test(trimmed)) return parseQuantity(Number(trimmed), kind);
  try {
    const q = Qty(normaliseUnitText(trimmed, k.absoluteTemperature === true));
    const si = q.to(k.siUnit).scalar;
    if (!Number.isFinite(si)) return { ok: false, expected: describeExpected(kind) };
    return { ok: true, value: si };
  } catch {
    return { ok: false, expected: describeExpected(kind) };
  }
}

/** Local clock time "HH:MM" or "HH:MM:SS" (00:00 – 24:00) to seconds after midnight, or null. */
export function parseClockTime(value: unknown): number | null {
  if (typeof value !== 'string') return null;
  const m = /^(\d{1,2}):(\d{2})(?::(\d{2}))?$/.exec(value.trim());
  if (!m) return null;
  const h = Number(m[1]);
  const mi = Number(m[2]);
  const s = m[3] ? Number(m[3]) : 0;
  if (mi > 59 || s > 59) return null;
  const total = h * 3600 + mi * 60 + s;
  return total <= 86400 ? total : null;
}
