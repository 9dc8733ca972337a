import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { mkdtempSync, writeFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { chromium, type Browser, type Page } from 'playwright-core';
import type { ModelInputs } from '../../src/model/inputs.ts';
import type { Summary } from '../../src/analysis/summary.ts';
import { renderAllCharts, type RenderedChart } from '../../src/output/charts/index.ts';
import { escapeHtml, renderReportHtml } from '../../src/output/report.ts';

import { demoStudy as simulateDemo } from '../support/demoStudy.ts';
import { CHROMIUM_ARGS, findChromium } from '../support/chromium.ts';

interface Study {
  inputs: ModelInputs;
  summary: Summary;
  charts: RenderedChart[];
}

/** The demo study with its charts at a small size. */
function demoStudy(mode: 'cycle' | 'warmup'): Study {
  const { inputs, result, summary } = simulateDemo(mode);
  return { inputs, summary, charts: renderAllCharts(result.series, summary, inputs, { width: 500, height: 300 }) };
}

const studies: Partial<Record<'cycle' | 'warmup', Study>> = {};
/** Each study is simulated and charted once for the whole file. */
const study = (mode: 'cycle' | 'warmup'): Study => (studies[mode] ??= demoStudy(mode));

describe('report.html in a headless browser', () => {
  let browser: Browser | null = null;
  let page: Page;
  let dir: string;
  beforeAll(async () => {
    // No skip: a browser is always there (Debian's, a chosen one, or the one the dev dependency
    // @sparticuz/chromium ships); one that cannot be found or started must fail loudly.
    const found = await findChromium();
    try {
      browser = await chromium.launch({ executablePath: found.executablePath, args: CHROMIUM_ARGS });
    } catch (e) {
      throw new Error(`could not start Chromium (${found.source}, ${found.executablePath}): ${(e as Error).message}`);
    }
    page = await browser.newPage(); // one page for the file: opening a page costs about a second
    dir = mkdtempSync(join(tmpdir(), 'stackday-report-'));
  });
  afterAll(async () => {
    await browser?.close();
    if (dir) rmSync(dir, { recursive: true, force: true });
  });

  async function open(study: Study, name: string) {
    const html = renderReportHtml(study.summary, study.inputs, study.charts);
    const file = join(dir, `${name}.html`);
    writeFileSync(file, html);
    const requests: string[] = [];
    page.removeAllListeners('request');
    await page.emulateMedia({ media: 'screen' });
    page.on('request', (r) => requests.push(r.url()));
    await page.goto(pathToFileURL(file).href, { waitUntil: 'load' });
    return { requests, html };
  }

  for (const mode of ['cycle', 'warmup'] as const) {
    it(`shows the ${mode} study's verdicts as the summary has them, every chart loaded, and nothing fetched from the network`, async () => {
      const s = study(mode);
      const { requests } = await open(s, mode);
      const rows = await page.$$eval('tr[data-limit]', (trs) => trs.map((tr) => ({ limit: tr.getAttribute('data-limit'), status: tr.getAttribute('data-status'), text: (tr as HTMLElement).innerText })));
      expect(rows.map(({ limit, status }) => ({ limit, status }))).toEqual(s.summary.verdicts.map((v) => ({ limit: v.limit, status: v.status })));
      // status in words, not colour alone
      const word = { pass: 'PASS', fail: 'FAIL', 'not-set': 'NOT SET' } as const;
      rows.forEach((r, j) => expect(r.text).toContain(word[s.summary.verdicts[j]!.status]));
      const imgs = await page.$$eval('img', (els) => els.map((i) => ({ w: (i as HTMLImageElement).naturalWidth, h: (i as HTMLImageElement).naturalHeight, complete: (i as HTMLImageElement).complete, alt: i.getAttribute('alt') ?? '' })));
      expect(imgs).toHaveLength(s.charts.length);
      for (const img of imgs) {
        expect(img.complete).toBe(true);
        expect([img.w, img.h]).toEqual([500, 300]);
        expect(img.alt.length).toBeGreaterThan(8);
      }
      // only the page itself (file:) and its embedded images (data:) — no http(s), no other files
      for (const url of requests) expect(url.startsWith('data:') || url === pathToFileURL(join(dir, `${mode}.html`)).href, url).toBe(true);
      expect(await page.$$eval('figcaption', (f) => f.length)).toBe(s.charts.length);
      const sections = await page.$$eval('section[id]', (s) => s.map((e) => e.id));
      expect(sections).toEqual(expect.arrayContaining(['job', 'scenario', 'verdicts', 'figures', 'charts', 'assumptions', 'cautions']));
      expect(sections.includes('warmup')).toBe(mode === 'warmup');
      const cautions = await page.$$eval('#cautions li', (li) => li.map((e) => e.textContent));
      expect(cautions).toEqual([...s.summary.cautions]);
    });
  }

  it('prints on white with no table or figure split across pages', async () => {
    await open(study('cycle'), 'print');
    await page.emulateMedia({ media: 'print' });
    const style = await page.evaluate(() => {
      const bg = (sel: string) => getComputedStyle(document.querySelector(sel)!).backgroundColor;
      const brk = (sel: string) => getComputedStyle(document.querySelector(sel)!).breakInside;
      return { body: bg('body'), html: bg('html'), badge: bg('tr.status-fail .badge, tr.status-pass .badge'), table: brk('table'), figure: brk('figure') };
    });
    // transparent or white backgrounds only (rgba(0, 0, 0, 0) is CSS "transparent")
    for (const c of [style.body, style.html, style.badge]) expect(['rgb(255, 255, 255)', 'rgba(0, 0, 0, 0)']).toContain(c);
    expect(style.table).toBe('avoid');
    expect(style.figure).toBe('avoid');
  });

  it('shows scenario text with markup as text, never as markup', async () => {
    const base = study('cycle');
    const evil: Study = {
      ...base,
      summary: { ...base.summary, scenario: { ...base.summary.scenario, name: '<script>window.__pwned = 2</script>', description: 'Bad <script>window.__pwned = 1</script> & "quotes"', site: '<img src=x onerror="window.__pwned = 3">' } },
      inputs: { ...base.inputs, site: { ...base.inputs.site, name: '<img src=x onerror="window.__pwned = 4">' }, layers: base.inputs.layers.map((l, j) => (j === 0 ? { ...l, label: '<b>lining</b>' } : l)) },
    };
    const { html } = await open(evil, 'evil');
    expect(html).not.toContain('<script>');
    expect(html).not.toContain('<img src=x');
    expect(html).not.toContain('<b>lining</b>');
    expect(html).toContain('&lt;script&gt;window.__pwned = 1&lt;/script&gt; &amp; &quot;quotes&quot;');
    expect(await page.evaluate(() => (window as unknown as { __pwned?: number }).__pwned)).toBeUndefined();
    expect(await page.$$eval('script', (el) => el.length)).toBe(0);
    expect(await page.$$eval('img', (el) => el.filter((i) => i.getAttribute('src') === 'x').length)).toBe(0);
    expect(await page.textContent('h1')).toContain('<script>window.__pwned = 2</script>');
  });
});

describe('escapeHtml', () => {
  it('escapes the five characters that are special in HTML text and attributes', () => {
    // HTML Living Standard, "escaping a string" (&, <, >, " and ' for attribute safety)
    expect(escapeHtml(`<a href="x" title='y'>&</a>`)).toBe('&lt;a href=&quot;x&quot; title=&#39;y&#39;&gt;&amp;&lt;/a&gt;');
    expect(escapeHtml(null)).toBe('');
  });
});

describe('renderReportHtml without a browser', () => {
  it('is self-contained: inline styles, data: images, no external links or scripts', () => {
    const s = study('cycle');
    const html = renderReportHtml(s.summary, s.inputs, s.charts);
    expect(html).not.toMatch(/<link\b/i);
    expect(html).not.toMatch(/<script\b/i);
    expect(html).not.toMatch(/(src|href)\s*=\s*"(?!data:)/i);
    expect(html).not.toMatch(/url\(/i);
    expect(html.match(/<img src="data:image\/png;base64,/g)).toHaveLength(s.charts.length);
    expect(html).toContain('@media print');
  });
});
