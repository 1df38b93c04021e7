import { readFileSync } from 'node:fs';
import { outlineSvg, type RenderResult } from '../../src/pipeline/render.js';
import { writeSvg } from '../../src/svg/write.js';
import { env } from '../helpers.js';

/** An SVG text mode as the parity test loads it: the SVG, what the page adds, and how its text boxes are read. */
export interface ParityMode {
  name: string;
  /** The chart's SVG in this mode. */
  svg(result: RenderResult): string;
  /** Markup for the page's <head> (fonts the page supplies). Default: none. */
  head?: () => string;
  /**
   * 'ink': text drawn as outlines, whose box in the browser is the glyphs' ink, which must lie
   * inside the scene's text box; 'advance': live text, whose box (advance × ascent + descent)
   * must be the scene's text box.
   */
  boxes: 'ink' | 'advance';
}

const family = () => env.outlines().family;

/** The bundled faces as @font-face rules, as a page whose site font is Source Sans 3 supplies them. */
function pageFonts(): string {
  const [regular, semibold] = env.fontFiles();
  const face = (file: string, weight: number) => `@font-face{font-family:'${family()}';font-weight:${weight};src:url(data:font/ttf;base64,${readFileSync(file).toString('base64')}) format('truetype')}`;
  return `<style>${face(regular!, 400)}${face(semibold!, 600)}</style>`;
}

/** The text modes the parity test knows. */
export const MODES = {
  /** The default SVG: live <text> with the glyphs it uses embedded as WOFF2 (`--text embed`). */
  embed: { name: 'embed', svg: (r) => r.svg!, boxes: 'advance' },
  /** Text as glyph outlines (`--outline-text`): no font needed anywhere. */
  outline: { name: 'outline', svg: (r) => outlineSvg(r.scene!, env), boxes: 'ink' },
  /** Live <text> naming Source Sans 3, in a browser that lacks it: the fallback face draws it. */
  live: { name: 'live', svg: (r) => writeSvg(r.scene!, { kind: 'live', family: family() }), boxes: 'advance' },
  /** Live <text> on a page that supplies Source Sans 3 itself: what embedding the font gives. */
  'live-font': { name: 'live-font', svg: (r) => writeSvg(r.scene!, { kind: 'live', family: family() }), head: pageFonts, boxes: 'advance' },
} satisfies Record<string, ParityMode>;
