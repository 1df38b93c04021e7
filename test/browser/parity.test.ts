import { mkdirSync, writeFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { outlineSvg } from '../../src/pipeline/render.js';
import { encodePng } from '../../src/raster/png-encode.js';
import { rasterPixels } from '../../src/raster/rasterize.js';
import { demoBriefs, env, renderDemo, root } from '../helpers.js';
import { launchChromium } from './chromium.js';
import { MODES, type ParityMode } from './modes.js';
import { openChartPage, pixelDiff, textShift, type ChartPage, type PixelDiff, type Pixels } from './parity.js';
import { summarise, type Measured } from './summary.js';

/** The SVG text mode held to resvg's PNG: `embed`, the default SVG (bounded by BOUNDS.embed). */
const TEXT_MODE: ParityMode = MODES.embed;
/**
 * Modes measured and reported, never asserted: text as outlines (`--text outline`), and live text
 * in the reader's fallback face (why a chart must not rely on the reader's fonts).
 */
const REPORTED: ParityMode[] = [MODES.outline, MODES.live];

/**
 * The most a chart may differ from resvg's PNG, as a share of its pixels (pixelmatch, YIQ
 * threshold 0.1, anti-aliased pixels counted), and the most a text box may move, in px.
 * outline: measured over the 30 gallery charts at scale 2, max 0.093 % (hut-occupancy-shift),
 * median 0.048 %, all of it anti-aliasing along edges; ink boxes overhang the scene's text boxes
 * by at most 0.33 px. Live text with the font supplied by the page (the embedded mode's case):
 * max 1.142 % (hut-occupancy-shift), median 0.668 %, boxes moved by at most 1.01 px, of which
 * up to 0.5 px is Chromium rounding the font's ascent and descent to whole pixels.
 */
const BOUNDS: Record<string, { share: number; box: number }> = {
  outline: { share: 0.002, box: 1 },
  embed: { share: 0.015, box: 1.5 },
};

const SCALE = 2;
const OUT = join(root, 'test-output', 'browser');
const measured: Measured[] = [];
let browser: Browser | undefined;
let page: ChartPage | undefined;
let skipped = '';

/** Writes resvg's PNG, Chromium's screenshot and their diff for one chart, and returns where. */
function saveImages(mode: string, id: string, resvg: Pixels, shot: Pixels, d: PixelDiff): string {
  const dir = join(OUT, mode);
  mkdirSync(dir, { recursive: true });
  const write = (name: string, image: Pixels) => writeFileSync(join(dir, `${id}-${name}.png`), encodePng(image.data, image.width, image.height));
  write('resvg', resvg);
  write('chromium', shot);
  write('diff', d.diff);
  return join(dir, `${id}-diff.png`);
}

// Every gallery chart loaded in headless Chromium (Debian's package, driven by playwright-core)
// at the PNG's scale and compared with resvg's PNG. Without Chromium every case is skipped with
// the reason, never passed.
describe('Chromium draws every gallery chart as resvg does', () => {
  beforeAll(async () => {
    const launched = await launchChromium();
    if ('reason' in launched) {
      skipped = launched.reason;
      console.warn(`browser parity: skipped, ${skipped}`);
      return;
    }
    browser = launched.browser;
    page = await openChartPage(browser, SCALE);
  }, 60_000);

  afterAll(async () => {
    await browser?.close();
    if (!measured.length) return;
    const text = summarise(measured);
    mkdirSync(OUT, { recursive: true });
    writeFileSync(join(OUT, 'summary.txt'), text);
    console.log(`browser parity (${join('test-output', 'browser', 'summary.txt')}):\n${text}`);
  });

  for (const file of demoBriefs()) {
    const id = basename(file, '.yaml');
    it(`${id}: ${TEXT_MODE.name} SVG in Chromium matches resvg's PNG, text boxes in place`, async (ctx) => {
      if (!page) return ctx.skip(skipped);
      const { result } = await renderDemo(file);
      const scene = result.scene!;
      const raster = rasterPixels(outlineSvg(scene, env), { scale: SCALE, fontFiles: [] });
      const resvg = { data: raster.pixels, width: raster.width, height: raster.height };
      const runs: Measured[] = [];
      for (const mode of [TEXT_MODE, ...REPORTED]) {
        const shot = await page.shoot(mode.svg(result), scene.width, scene.height, mode.head?.());
        const d = pixelDiff(resvg, shot);
        const shift = textShift(scene, await page.texts(), mode.boxes);
        const run: Measured = { mode: mode.name, id, share: d.share, shift: shift.px, worstText: shift.text, offCanvas: shift.offCanvas };
        const bound = BOUNDS[mode.name];
        const failed = bound !== undefined && (d.share > bound.share || shift.px > bound.box);
        if (failed || process.env.CHARTWRIGHT_BROWSER_IMAGES) run.images = saveImages(mode.name, id, resvg, shot, d);
        runs.push(run);
      }
      measured.push(...runs);
      const own = runs[0]!;
      const bound = BOUNDS[TEXT_MODE.name]!;
      expect(own.share, `${(own.share * 100).toFixed(3)} % of pixels differ; see ${own.images}`).toBeLessThanOrEqual(bound.share);
      expect(own.shift, `text "${own.worstText}" moved ${own.shift.toFixed(2)} px; see ${own.images}`).toBeLessThanOrEqual(bound.box);
    }, 60_000);
  }

  // The checks above can fail: a title moved by 3 px and bars in another colour are both caught.
  it('a text moved by 3 px and a recoloured bar exceed the bounds', async (ctx) => {
    if (!page) return ctx.skip(skipped);
    const { result } = await renderDemo(join(root, 'demo-data', 'ferry-crossings.yaml'));
    const scene = result.scene!;
    const svg = outlineSvg(scene, env);
    const moved = svg.replace(/(class="title" fill="[^"]*" transform="translate\()([\d.]+)/, (_, head: string, x: string) => `${head}${Number(x) + 3}`);
    expect(moved).not.toBe(svg);
    await page.shoot(moved, scene.width, scene.height);
    expect(textShift(scene, await page.texts(), 'ink').px).toBeGreaterThan(BOUNDS.outline!.box);
    const raster = rasterPixels(svg, { scale: SCALE, fontFiles: [] });
    const recoloured = svg.replace(/(<rect class="bar"[^>]*fill=")#[0-9a-f]{6}/, '$1#d04a02');
    expect(recoloured).not.toBe(svg);
    const shot = await page.shoot(recoloured, scene.width, scene.height);
    expect(pixelDiff({ data: raster.pixels, width: raster.width, height: raster.height }, shot).share).toBeGreaterThan(BOUNDS.outline!.share);
  }, 60_000);
});
