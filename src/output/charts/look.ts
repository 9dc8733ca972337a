/**
 * How the charts look: colours, fonts, line looks and typography, shared by every chart.
 *
 * Colour scheme: every series differs from its neighbours in lightness AND in dash pattern and
 * point style, so the charts still read when printed in greyscale. Fonts scale with the chart
 * size; at the default 1000 × 600 px ticks are 14 px and axis titles 16 px.
 */
import type { PointStyle } from 'chart.js';

export const DEFAULT_CHART_WIDTH = 1000;
export const DEFAULT_CHART_HEIGHT = 600;

/** Text and frame colour. */
export const INK = '#1f2328';
/** Grid-line colour. */
export const GRID = '#dcdcdc';
export const FONT_FAMILY = "'DejaVu Sans', 'Liberation Sans', 'Helvetica Neue', Arial, sans-serif";

/** Font sizes for a chart of the given size: ≥ 13 px ticks and ≥ 15 px titles at 1000 × 600. */
export function chartTypography(width = DEFAULT_CHART_WIDTH, height = DEFAULT_CHART_HEIGHT) {
  const s = Math.max(0.6, Math.min(width / DEFAULT_CHART_WIDTH, height / DEFAULT_CHART_HEIGHT));
  const px = (v: number) => Math.round(v * s);
  return { scale: s, tick: px(14), axisTitle: px(16), title: px(19), legend: px(14), lineWidth: Math.max(1.5, 2.5 * s), pointRadius: Math.max(3, 5 * s) };
}
export type Typography = ReturnType<typeof chartTypography>;

/** Colour, dash pattern and marker of a line (false: no marker). */
export interface LineLook {
  readonly color: string;
  readonly dash: readonly number[];
  readonly point: PointStyle | false;
}

const RAMP_DASHES: readonly (readonly number[])[] = [[], [12, 5], [6, 4], [14, 4, 3, 4], [3, 3], [10, 3, 2, 3, 2, 3]];
const RAMP_POINTS: readonly PointStyle[] = ['circle', 'triangle', 'rect', 'rectRot', 'crossRot', 'star'];

const hsl = (h: number, s: number, l: number) => `hsl(${Math.round(h)}, ${Math.round(s)}%, ${Math.round(l)}%)`;

/** n looks along a colour ramp (f from 0 to 1), each with its own dash pattern and marker. */
function ramp(n: number, colorAt: (f: number) => string): LineLook[] {
  return Array.from({ length: n }, (_, j) => {
    const f = n === 1 ? 0 : j / (n - 1);
    return { color: colorAt(f), dash: RAMP_DASHES[j % RAMP_DASHES.length]!, point: RAMP_POINTS[j % RAMP_POINTS.length]! };
  });
}

/** Wall positions from the flue side outward: dark → light, warm hues, each with its own dash and marker. */
export function wallRamp(n: number): LineLook[] {
  return ramp(n, (f) => hsl(12 + 28 * f, 70 - 10 * f, 30 + 32 * f));
}

/** A sequence (e.g. instants through the day): dark blue → light amber, lightness rising monotonically. */
export function sequenceRamp(n: number): LineLook[] {
  return ramp(n, (f) => hsl(225 - 190 * f, 55 + 15 * f, 22 + 40 * f));
}

/** Fixed looks for reference lines (limits and dew points). */
export const LOOK = {
  gas: { color: '#2a0f05', dash: [], point: 'rectRounded' },
  air: { color: '#3b78a8', dash: [2, 4], point: 'crossRot' },
  shellTouch: { color: '#7a2e8e', dash: [9, 4], point: false },
  liningService: { color: '#8c1b1b', dash: [7, 3, 2, 3], point: false },
  acidDew: { color: '#4b2a84', dash: [5, 3], point: false },
  acidDewMargin: { color: '#9a86c4', dash: [2, 2], point: false },
  waterDew: { color: '#1d5c8a', dash: [6, 2, 2, 2], point: false },
  waterDewMargin: { color: '#86b3d6', dash: [1, 3], point: false },
  sun: { color: '#c98a00', dash: [10, 4], point: 'star' },
  convection: { color: '#1d4e7a', dash: [], point: 'circle' },
  radiation: { color: '#8a5a9e', dash: [3, 3], point: 'triangle' },
  net: { color: '#222222', dash: [14, 4, 3, 4], point: 'rect' },
  gasToWall: { color: '#a33b1a', dash: [6, 4], point: 'rectRot' },
  sunniest: { color: '#c45a12', dash: [], point: 'star' },
  shadiest: { color: '#2b5d8c', dash: [8, 4], point: 'circle' },
  roundMean: { color: '#555555', dash: [2, 3], point: false },
} as const;

/** Lines of the shell round the circumference at a few heights, top first. */
export const ROUND_LOOKS: readonly LineLook[] = [
  { color: '#8c1b1b', dash: [], point: 'circle' },
  { color: '#d0792c', dash: [10, 4], point: 'triangle' },
  { color: '#2b5d8c', dash: [4, 3], point: 'rect' },
];

/** Map-cell classes, in order of margin (the key of the acid-margin map). */
export const MARGIN_CLASS_COLORS = {
  farBelow: '#5a0a1e',
  below: '#c63a2f',
  caution: '#f3c94f',
  safe: '#b5d4e9',
  wellAbove: '#2f6d9f',
} as const;

/** The wall profile's three instants: hottest lining, hottest shell, coldest inner surface. */
export const PROFILE_LOOKS: readonly LineLook[] = [
  { color: '#8c1b1b', dash: [], point: 'circle' },
  { color: '#d0792c', dash: [10, 4], point: 'triangle' },
  { color: '#2b5d8c', dash: [4, 3], point: 'rect' },
];

/** Fills of the layer bands behind the wall profile, in turn; air gaps are white and hatched. */
export const LAYER_BAND_FILLS: readonly string[] = ['#f1dfcf', '#e3ecf2', '#ececec', '#efe6d6', '#dfe9e0'];
export const GAP_BAND_FILL = '#ffffff';

/** The warm-up chart: inner-surface lines at the top and at the bottom, and the vertical marks where the top passes each dew point plus margin. */
export const WARMUP_LOOKS = {
  top: { color: '#7a1f0a', dash: [], point: 'circle' },
  bottom: { color: '#d98a4a', dash: [10, 4], point: 'triangle' },
  waterMark: { color: LOOK.waterDew.color, dash: [3, 1] },
  acidMark: { color: LOOK.acidDew.color, dash: [1, 1] },
} as const;

/** Hatching and outline of the margin map's cells. */
export const MARGIN_MAP_HATCH = { diagonal: 'rgba(60,40,0,0.55)', cross: 'rgba(255,255,255,0.8)' } as const;
export const MARGIN_MAP_BOUNDARY = '#000000';

/** Bars of the annual charts: hours below the acid and the water dew points (dark and light, so they read in greyscale), heat lost, and the month lines of the annual map. */
export const ANNUAL_LOOKS = {
  acidHours: { fill: LOOK.acidDew.color, border: INK },
  waterHours: { fill: LOOK.waterDewMargin.color, border: INK },
  heatLoss: { fill: LOOK.gasToWall.color, border: INK },
  monthLine: { color: 'rgba(31,35,40,0.55)', dash: [4, 3] },
} as const;

/**
 * Looks of the cases overlaid in one chart (variants, build-ups): a qualitative palette of eight
 * colours safe for colour-blind readers (Okabe and Ito, "Color Universal Design", 2002), each with
 * its own dash pattern and marker (the palette's yellow darkened to read on white); beyond eight, the
 * colours repeat with other dash and marker pairs.
 */
const CASE_COLORS: readonly string[] = ['#0072b2', '#d55e00', '#009e73', '#cc79a7', '#e69f00', '#56b4e9', '#000000', '#8a7a00'];
const CASE_POINTS: readonly PointStyle[] = ['circle', 'triangle', 'rect', 'rectRot', 'star', 'crossRot', 'cross', 'rectRounded'];
export function caseLooks(n: number): LineLook[] {
  return Array.from({ length: n }, (_, j) => ({
    color: CASE_COLORS[j % CASE_COLORS.length]!,
    dash: RAMP_DASHES[(j + Math.floor(j / CASE_COLORS.length)) % RAMP_DASHES.length]!,
    point: CASE_POINTS[(j + 3 * Math.floor(j / CASE_COLORS.length)) % CASE_POINTS.length]!,
  }));
}

/** Fills of a verdict in bar charts and pass/fail maps: lightness differs as well as hue, so they read in greyscale. */
export const VERDICT_COLORS = { pass: '#2f6d9f', fail: '#e8a09a', notRun: '#d9d9d9' } as const;
export const VERDICT_BORDERS = { pass: '#173a57', fail: '#8c1b1b', notRun: '#7a7a7a' } as const;
