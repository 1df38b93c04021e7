import pixelmatch from 'pixelmatch';
import { PNG } from 'pngjs';
import type { Browser, Page } from 'playwright-core';
import type { Box, Scene, TextNode } from '../../src/scene/types.js';
import { nodesOf } from '../../src/scene/walk.js';

/** An RGBA image, row by row. */
export interface Pixels {
  data: Uint8Array;
  width: number;
  height: number;
}

/** A screenshot compared with resvg's pixels: how many pixels differ, of how many, and the diff image. */
export interface PixelDiff {
  differing: number;
  total: number;
  share: number;
  diff: Pixels;
}

/** One text element as Chromium lays it out: its class (the scene role) and its box in CSS px. */
export interface DrawnText {
  role: string;
  box: Box;
}

/** A page to load one chart after another into, at a fixed device scale. */
export interface ChartPage {
  page: Page;
  /** Loads an SVG inline in a bare page sized to it, waits for its fonts, and screenshots it. */
  shoot(svg: string, width: number, height: number, head?: string): Promise<Pixels>;
  /** The boxes of the chart's text elements, in document order (the scene's order). */
  texts(): Promise<DrawnText[]>;
}

/** Opens one page at `scale` device pixels per CSS pixel. */
export async function openChartPage(browser: Browser, scale: number): Promise<ChartPage> {
  const context = await browser.newContext({ viewport: { width: 100, height: 100 }, deviceScaleFactor: scale, colorScheme: 'light' });
  const page = await context.newPage();
  const cdp = await context.newCDPSession(page);
  return {
    page,
    async shoot(svg, width, height, head = '') {
      // The viewport is the SVG's own size: a full-page screenshot of a bare SVG hangs in this Chromium.
      await page.setViewportSize({ width: Math.ceil(width), height: Math.ceil(height) });
      await page.setContent(`<!doctype html><html><head><meta charset="utf-8"><style>html,body{margin:0;padding:0;background:#fff}svg{display:block}</style>${head}</head><body>${svg}</body></html>`, { waitUntil: 'load' });
      await page.evaluate(() => document.fonts.ready.then(() => undefined));
      // CDP's own capture of the viewport, encoded for speed (decoding the PNG is most of a shot's
      // cost); without the clip's scale it comes out at one pixel per CSS pixel.
      const clip = { x: 0, y: 0, width: Math.ceil(width), height: Math.ceil(height), scale };
      const { data } = await cdp.send('Page.captureScreenshot', { format: 'png', optimizeForSpeed: true, captureBeyondViewport: false, clip });
      return PNG.sync.read(Buffer.from(data, 'base64'));
    },
    texts() {
      // Live text is a <text>; outlined text is the one group with a class and a transform (a
      // rotation wraps it in a group without a class).
      return page.evaluate(() => [...document.querySelectorAll('svg text, svg g[class][transform]')].map((el) => {
        const r = el.getBoundingClientRect();
        return { role: el.getAttribute('class') ?? '', box: { x: r.x, y: r.y, width: r.width, height: r.height } };
      }));
    },
  };
}

/** Pixels that differ between two images of one size, counting anti-aliased ones (pixelmatch's YIQ threshold 0.1, its default). */
export function pixelDiff(expected: Pixels, actual: Pixels): PixelDiff {
  if (expected.width !== actual.width || expected.height !== actual.height) {
    throw new Error(`sizes differ: resvg ${expected.width}×${expected.height}, Chromium ${actual.width}×${actual.height}`);
  }
  const { width, height } = expected;
  const diff = { data: new Uint8Array(width * height * 4), width, height };
  const differing = pixelmatch(expected.data, actual.data, diff.data, width, height, { threshold: 0.1, includeAA: true });
  return { differing, total: width * height, share: differing / (width * height), diff };
}

/** The scene's text nodes in drawing order (the SVG writer writes them in this order). */
function sceneTexts(scene: Scene): TextNode[] {
  return nodesOf(scene.root).filter((n): n is TextNode => n.kind === 'text');
}

/** How far a drawn box lies outside a scene box, on its worst side, in px (0 when inside). */
export function overhang(drawn: Box, box: Box): number {
  return Math.max(0, box.x - drawn.x, box.y - drawn.y, drawn.x + drawn.width - (box.x + box.width), drawn.y + drawn.height - (box.y + box.height));
}

/** The largest difference of any edge between two boxes, in px. */
export function edgeShift(a: Box, b: Box): number {
  return Math.max(Math.abs(a.x - b.x), Math.abs(a.y - b.y), Math.abs(a.x + a.width - b.x - b.width), Math.abs(a.y + a.height - b.y - b.height));
}

/** How far the browser moved the chart's text from the scene's boxes: the worst text, and how many left the canvas. */
export interface TextShift {
  px: number;
  text: string;
  offCanvas: number;
}

/**
 * Compares the browser's text boxes with the scene's, text by text in drawing order: ink boxes
 * (outlined text) must lie inside the scene's box, advance boxes (live text) must be it.
 */
export function textShift(scene: Scene, drawn: DrawnText[], boxes: 'ink' | 'advance'): TextShift {
  const texts = sceneTexts(scene);
  if (drawn.length !== texts.length) throw new Error(`the page has ${drawn.length} text elements, the scene ${texts.length} texts`);
  const canvas = { x: 0, y: 0, width: scene.width, height: scene.height };
  let worst: TextShift = { px: 0, text: '', offCanvas: 0 };
  let offCanvas = 0;
  texts.forEach((t, i) => {
    const { role, box } = drawn[i]!;
    if (role !== t.role) throw new Error(`text ${i} is a ${t.role} in the scene but a ${role} on the page`);
    const px = boxes === 'ink' ? overhang(box, t.box) : edgeShift(box, t.box);
    if (px > worst.px) worst = { px, text: t.text, offCanvas: 0 };
    // Half a pixel: a box on the canvas edge may round outside it.
    if (overhang(box, canvas) > 0.5) offCanvas++;
  });
  return { ...worst, offCanvas };
}
