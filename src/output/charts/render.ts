/**
 * Drawing: a chart.js configuration (pure data, built by one module per chart) onto an
 * @napi-rs/canvas canvas, out as PNG bytes. No physics here.
 *
 * chart.js runs in Node without a DOM: with no `window` it picks its BasicPlatform, which draws on
 * whatever 2D context it is given, so no global shims are needed. Every chart is rendered with
 * `responsive: false`, `animation: false` and `devicePixelRatio: 1` forced, so the PNG has exactly
 * the requested size and the first frame is the final one.
 *
 * Three small plugins of our own are attached to every render and act only when the configuration
 * asks for them through `options.plugins.<id>` (pure data, so configurations stay inspectable):
 * - `stackdayBackground`: paints an opaque background (chart.js leaves the canvas transparent);
 * - `stackdayBands`: shaded, labelled vertical bands behind the data (the wall's layers);
 * - `stackdayCells`: a grid of filled cells with hatching and a bold boundary (the margin map).
 */
import { createCanvas } from '@napi-rs/canvas';
import { Chart, type ChartConfiguration, type ChartType, type Plugin } from 'chart.js/auto';

export interface ChartSize {
  readonly width: number;
  readonly height: number;
}

/** A vertical band between two x values, filled and labelled at the top of the plot area. */
export interface BandSpec {
  readonly from: number;
  readonly to: number;
  readonly label: string;
  readonly fill: string;
  /** Draw diagonal hatching over the band (e.g. for air gaps). */
  readonly hatch?: boolean;
}

export interface BandsOptions {
  readonly bands: readonly BandSpec[];
  readonly labelColor: string;
  readonly fontSize: number;
  readonly fontFamily: string;
}

/** Hatching of a cell: none, one diagonal set of lines, or crossed lines. */
export type CellHatch = 0 | 1 | 2;

/** A grid of cells in data coordinates: cell (i, j) spans xEdges[i]…xEdges[i+1] × yEdges[j]…yEdges[j+1]. */
export interface CellsOptions {
  readonly xEdges: readonly number[];
  readonly yEdges: readonly number[];
  /** Fill colour of cell (i, j) at index j · nx + i. */
  readonly colors: readonly string[];
  /** Hatching of cell (i, j) at index j · nx + i. */
  readonly hatch: readonly CellHatch[];
  /** Cells whose `flagged` value is true get a bold outline where they border unflagged cells. */
  readonly flagged: readonly boolean[];
  readonly hatchColors: { readonly diagonal: string; readonly cross: string };
  readonly boundaryColor: string;
}

export interface BackgroundOptions {
  readonly color: string;
}

declare module 'chart.js' {
  // eslint-disable-next-line @typescript-eslint/no-unused-vars
  interface PluginOptionsByType<TType extends ChartType> {
    stackdayBackground?: BackgroundOptions | false;
    stackdayBands?: BandsOptions | false;
    stackdayCells?: CellsOptions | false;
  }
}

type Options<T> = Partial<T> | undefined;

const backgroundPlugin: Plugin = {
  id: 'stackdayBackground',
  beforeDraw(chart, _args, options: Options<BackgroundOptions>) {
    const ctx = chart.ctx;
    ctx.save();
    ctx.fillStyle = options?.color ?? '#ffffff';
    ctx.fillRect(0, 0, chart.width, chart.height);
    ctx.restore();
  },
};

const bandsPlugin: Plugin = {
  id: 'stackdayBands',
  beforeDatasetsDraw(chart, _args, options: Options<BandsOptions>) {
    if (!options?.bands) return;
    const { ctx, chartArea: area } = chart;
    const x = chart.scales['x']!;
    ctx.save();
    ctx.beginPath();
    ctx.rect(area.left, area.top, area.right - area.left, area.bottom - area.top);
    ctx.clip();
    for (const band of options.bands) {
      const x0 = x.getPixelForValue(band.from);
      const x1 = x.getPixelForValue(band.to);
      ctx.globalAlpha = 0.85;
      ctx.fillStyle = band.fill;
      ctx.fillRect(x0, area.top, x1 - x0, area.bottom - area.top);
      ctx.globalAlpha = 1;
      if (band.hatch) hatchRect(ctx, x0, area.top, x1 - x0, area.bottom - area.top, 1, 'rgba(0,0,0,0.25)', 10);
      // thin separators at the layer boundaries
      ctx.strokeStyle = 'rgba(0,0,0,0.35)';
      ctx.lineWidth = 1;
      for (const xb of [x0, x1]) {
        ctx.beginPath();
        ctx.moveTo(xb, area.top);
        ctx.lineTo(xb, area.bottom);
        ctx.stroke();
      }
    }
    ctx.restore();
  },
  afterDatasetsDraw(chart, _args, options: Options<BandsOptions>) {
    if (!options?.bands) return;
    const { ctx, chartArea: area } = chart;
    const x = chart.scales['x']!;
    const size = options.fontSize ?? 14;
    ctx.save();
    ctx.font = `bold ${size}px ${options.fontFamily ?? 'sans-serif'}`;
    ctx.fillStyle = options.labelColor ?? '#222222';
    for (const band of options.bands) {
      const x0 = x.getPixelForValue(band.from);
      const x1 = x.getPixelForValue(band.to);
      const width = x1 - x0;
      const text = band.label;
      const textWidth = ctx.measureText(text).width;
      if (textWidth + 8 <= width) {
        ctx.textAlign = 'center';
        ctx.textBaseline = 'top';
        ctx.fillText(text, (x0 + x1) / 2, area.top + 6);
      } else {
        // narrow layer: write the label upward along the band
        ctx.translate((x0 + x1) / 2, area.top + 6);
        ctx.rotate(Math.PI / 2);
        ctx.textAlign = 'left';
        ctx.textBaseline = 'middle';
        ctx.fillText(text, 0, 0);
        ctx.setTransform(1, 0, 0, 1, 0, 0);
      }
    }
    ctx.restore();
  },
};

const cellsPlugin: Plugin = {
  id: 'stackdayCells',
  beforeDatasetsDraw(chart, _args, options: Options<CellsOptions>) {
    if (!options?.xEdges || !options.yEdges || !options.colors) return;
    const { ctx, chartArea: area } = chart;
    const xs = chart.scales['x']!;
    const ys = chart.scales['y']!;
    const px = options.xEdges.map((v) => xs.getPixelForValue(v));
    const py = options.yEdges.map((v) => ys.getPixelForValue(v));
    const nx = px.length - 1;
    const ny = py.length - 1;
    const hatch = options.hatch ?? [];
    const flagged = options.flagged ?? [];
    ctx.save();
    ctx.beginPath();
    ctx.rect(area.left, area.top, area.right - area.left, area.bottom - area.top);
    ctx.clip();
    for (let j = 0; j < ny; j++) {
      for (let i = 0; i < nx; i++) {
        const n = j * nx + i;
        const x0 = Math.min(px[i]!, px[i + 1]!);
        const y0 = Math.min(py[j]!, py[j + 1]!);
        // overlap by half a pixel so no seams show between cells
        const w = Math.abs(px[i + 1]! - px[i]!) + 0.5;
        const h = Math.abs(py[j + 1]! - py[j]!) + 0.5;
        ctx.fillStyle = options.colors[n]!;
        ctx.fillRect(x0, y0, w, h);
      }
    }
    // hatching in one pass per kind over the union of cells, so the lines run continuously
    for (const kind of [1, 2] as const) {
      const color = kind === 1 ? options.hatchColors?.diagonal ?? '#333333' : options.hatchColors?.cross ?? '#ffffff';
      ctx.save();
      ctx.beginPath();
      let any = false;
      for (let j = 0; j < ny; j++)
        for (let i = 0; i < nx; i++)
          if (hatch[j * nx + i] === kind) {
            any = true;
            ctx.rect(Math.min(px[i]!, px[i + 1]!), Math.min(py[j]!, py[j + 1]!), Math.abs(px[i + 1]! - px[i]!) + 0.5, Math.abs(py[j + 1]! - py[j]!) + 0.5);
          }
      if (any) {
        ctx.clip();
        hatchRect(ctx, area.left, area.top, area.right - area.left, area.bottom - area.top, kind, color, 9);
      }
      ctx.restore();
    }
    // bold outline where a flagged cell borders an unflagged one (or the map's edge)
    ctx.strokeStyle = options.boundaryColor ?? '#000000';
    ctx.lineWidth = 3;
    ctx.lineCap = 'square';
    ctx.beginPath();
    const isFlagged = (i: number, j: number) => i >= 0 && j >= 0 && i < nx && j < ny && flagged[j * nx + i] === true;
    for (let j = 0; j < ny; j++)
      for (let i = 0; i < nx; i++) {
        if (!isFlagged(i, j)) continue;
        if (!isFlagged(i - 1, j)) line(ctx, px[i]!, py[j]!, px[i]!, py[j + 1]!);
        if (!isFlagged(i + 1, j)) line(ctx, px[i + 1]!, py[j]!, px[i + 1]!, py[j + 1]!);
        if (!isFlagged(i, j - 1)) line(ctx, px[i]!, py[j]!, px[i + 1]!, py[j]!);
        if (!isFlagged(i, j + 1)) line(ctx, px[i]!, py[j + 1]!, px[i + 1]!, py[j + 1]!);
      }
    ctx.stroke();
    ctx.restore();
  },
};

type Ctx = Chart['ctx'];

function line(ctx: Ctx, x0: number, y0: number, x1: number, y1: number): void {
  ctx.moveTo(x0, y0);
  ctx.lineTo(x1, y1);
}

/** Diagonal (kind 1) or crossed (kind 2) lines over a rectangle, `spacing` px apart. */
function hatchRect(ctx: Ctx, x: number, y: number, w: number, h: number, kind: 1 | 2, color: string, spacing: number): void {
  ctx.save();
  ctx.beginPath();
  ctx.rect(x, y, w, h);
  ctx.clip();
  ctx.strokeStyle = color;
  ctx.lineWidth = 1.5;
  ctx.beginPath();
  for (let d = -h; d < w; d += spacing) {
    line(ctx, x + d, y + h, x + d + h, y);
    if (kind === 2) line(ctx, x + d, y, x + d + h, y + h);
  }
  ctx.stroke();
  ctx.restore();
}

/** The plugins attached to every render (each is inert unless its options are present). */
export const STACKDAY_PLUGINS: readonly Plugin[] = [backgroundPlugin, bandsPlugin, cellsPlugin];

/** A deep copy of plain objects and arrays (functions and class instances kept by reference). */
function clonePlain<T>(value: T): T {
  if (Array.isArray(value)) return value.map((v) => clonePlain(v)) as T;
  if (value !== null && typeof value === 'object' && Object.getPrototypeOf(value) === Object.prototype) {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) out[k] = clonePlain(v);
    return out as T;
  }
  return value;
}

/**
 * Render a chart.js configuration to PNG bytes of exactly `width` × `height` pixels.
 * The configuration is not modified (chart.js works on a copy).
 */
export function renderChartPng(config: ChartConfiguration, { width, height }: ChartSize): Buffer {
  if (!(Number.isInteger(width) && Number.isInteger(height) && width > 0 && height > 0)) throw new RangeError(`chart size must be positive whole pixels, got ${width} × ${height}`);
  const canvas = createCanvas(width, height);
  const ctx = canvas.getContext('2d');
  const copy = clonePlain(config) as ChartConfiguration;
  const options = (copy.options ?? {}) as Record<string, unknown>;
  const plugins = { ...((options['plugins'] as Record<string, unknown> | undefined) ?? {}) };
  if (plugins['stackdayBackground'] === undefined) plugins['stackdayBackground'] = { color: '#ffffff' };
  const prepared = {
    ...copy,
    options: { ...options, plugins, responsive: false, animation: false, devicePixelRatio: 1 },
    plugins: [...STACKDAY_PLUGINS, ...(copy.plugins ?? [])],
  } as ChartConfiguration;
  // chart.js takes a DOM context in its types; the napi-rs context implements the same drawing API
  const chart = new Chart(ctx as unknown as CanvasRenderingContext2D, prepared);
  try {
    return canvas.toBuffer('image/png');
  } finally {
    chart.destroy();
  }
}
