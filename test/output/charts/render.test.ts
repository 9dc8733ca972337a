import { describe, it, expect, beforeAll } from 'vitest';
import { createCanvas, loadImage } from '@napi-rs/canvas';
import type { ChartConfiguration } from 'chart.js';
import { renderAllCharts, renderChartPng, MARGIN_CLASS_COLORS, type RenderedChart } from '../../../src/output/charts/index.ts';

import { demoStudy, type Study } from '../../support/demoStudy.ts';

/** Width and height from the IHDR chunk (PNG specification, ISO/IEC 15948:2004 §5.2 signature, §11.2.2 IHDR). */
function pngSize(png: Buffer): { width: number; height: number } {
  // signature 89 50 4E 47 0D 0A 1A 0A; IHDR is the first chunk: length(4) type(4) width(4) height(4)
  expect([...png.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  expect(png.subarray(12, 16).toString('latin1')).toBe('IHDR');
  return { width: png.readUInt32BE(16), height: png.readUInt32BE(20) };
}

/** Decode a PNG and count its distinct colours and the pixels that are not the white background. */
async function pixelStats(png: Buffer): Promise<{ distinct: number; nonWhiteFraction: number; colours: Set<number> }> {
  const img = await loadImage(png);
  const canvas = createCanvas(img.width, img.height);
  const ctx = canvas.getContext('2d');
  ctx.drawImage(img, 0, 0);
  const { data } = ctx.getImageData(0, 0, img.width, img.height);
  const colours = new Set<number>();
  let nonWhite = 0;
  for (let p = 0; p < data.length; p += 4) {
    const rgb = (data[p]! << 16) | (data[p + 1]! << 8) | data[p + 2]!;
    colours.add(rgb);
    if (rgb !== 0xffffff) nonWhite++;
  }
  return { distinct: colours.size, nonWhiteFraction: nonWhite / (img.width * img.height), colours };
}

const hexToRgb = (hex: string) => parseInt(hex.slice(1), 16);

describe('renderChartPng', () => {
  const config: ChartConfiguration = {
    type: 'line',
    data: { datasets: [{ label: 'a line (K)', data: [{ x: 0, y: 1 }, { x: 1, y: 3 }, { x: 2, y: 2 }], borderColor: '#aa3300' }] },
    options: { parsing: false, scales: { x: { type: 'linear', title: { display: true, text: 'x (m)' } }, y: { title: { display: true, text: 'y (K)' } } } },
  };

  it('draws a PNG of exactly the requested size with an opaque background and visible content', async () => {
    const png = renderChartPng(config, { width: 420, height: 260 });
    expect(pngSize(png)).toEqual({ width: 420, height: 260 });
    const stats = await pixelStats(png);
    // a white canvas with a red line, axes and text: well over a handful of colours (anti-aliasing)
    expect(stats.distinct).toBeGreaterThan(20);
    expect(stats.colours.has(0xffffff)).toBe(true); // the background plugin paints white
  });

  it('leaves the configuration it was given unchanged, so a second render gives the same picture', () => {
    const before = JSON.stringify(config);
    const first = renderChartPng(config, { width: 300, height: 200 });
    expect(JSON.stringify(config)).toBe(before);
    const second = renderChartPng(config, { width: 300, height: 200 });
    expect(second.equals(first)).toBe(true);
  });

  it('refuses sizes that are not positive whole pixels', () => {
    expect(() => renderChartPng(config, { width: 0, height: 200 })).toThrow(RangeError);
    expect(() => renderChartPng(config, { width: 300.5, height: 200 })).toThrow(RangeError);
  });
});

describe('renderAllCharts', () => {
  let cycle: Study;
  let warm: Study;
  let cycleCharts: RenderedChart[];
  let warmCharts: RenderedChart[];
  beforeAll(() => {
    cycle = demoStudy('cycle');
    warm = demoStudy('warmup');
    cycleCharts = renderAllCharts(cycle.result.series, cycle.summary, cycle.inputs);
    warmCharts = renderAllCharts(warm.result.series, warm.summary, warm.inputs, { width: 640, height: 400 });
  });

  it('renders the daily-cycle charts, and the warm-up chart only for a warm-up study', () => {
    expect(cycleCharts.map((c) => c.fileName)).toEqual(['temperatures-top.png', 'temperatures-bottom.png', 'wall-profile.png', 'acid-margin-map.png', 'gas-along-height.png', 'outside-heat-flows.png']);
    expect(warmCharts.map((c) => c.fileName)).toEqual([...cycleCharts.map((c) => c.fileName), 'warmup-inner-surface.png']);
    for (const c of [...cycleCharts, ...warmCharts]) {
      expect(c.fileName).toBe(`${c.name}.png`);
      expect(c.title.length).toBeGreaterThan(5);
    }
  });

  it('draws every chart at the requested size (default 1000 × 600) with pixels that are not blank', async () => {
    for (const [charts, size] of [[cycleCharts, { width: 1000, height: 600 }], [warmCharts, { width: 640, height: 400 }]] as const) {
      for (const c of charts) {
        expect(pngSize(c.png), c.fileName).toEqual(size);
        const stats = await pixelStats(c.png);
        // curves, text and grid on white: hundreds of colours with anti-aliasing; a blank or
        // single-colour image has 1. The thresholds only separate "drawn" from "blank".
        expect(stats.distinct, c.fileName).toBeGreaterThan(50);
        expect(stats.nonWhiteFraction, c.fileName).toBeGreaterThan(0.02);
      }
    }
  });

  it('paints the cells below the acid dew point in the unsafe colour when the demo has such cells', async () => {
    // the demo's settled summary reports a negative lowest acid margin (regression: the demo's own figures)
    expect(cycle.summary.lowest_acid_dew_margin_k).toBeLessThan(0);
    const map = cycleCharts.find((c) => c.name === 'acid-margin-map')!;
    const stats = await pixelStats(map.png);
    const unsafe = [MARGIN_CLASS_COLORS.below, MARGIN_CLASS_COLORS.farBelow].map(hexToRgb);
    expect(unsafe.some((rgb) => stats.colours.has(rgb))).toBe(true);
  });

  it('plots the temperature chart at the asked heights, nearest segment each', () => {
    const charts = renderAllCharts(cycle.result.series, cycle.summary, cycle.inputs, { width: 400, height: 300, heightsToPlot: [20] });
    const temps = charts.filter((c) => c.name.startsWith('temperatures-'));
    expect(temps).toHaveLength(1);
    // demo: 45 m in 12 segments of 3.75 m, mid-heights 1.875 + 3.75 s m: 16.875 m and 20.625 m straddle 20 m, 20.625 m is nearer
    expect(temps[0]!.title).toContain('20.6 m');
  });
});
