import type { TextMeasurer } from '../font/measurer.js';
import { contentHash } from '../scene/ids.js';
import type { Datum, Paint, Scene, SceneNode, TextNode } from '../scene/types.js';
import type { EmbeddedFonts } from './embed.js';
import { escapeXml } from './escape.js';
import { fmt } from './fmt.js';
import { GlyphDefs, outlineText, type OutlineSet } from './glyphs.js';
import { pathData } from './path.js';

/**
 * How text is written: live `<text>` naming a family list (the reader's fonts draw it), live
 * `<text>` with the fonts it needs embedded (`embed`: drawn alike everywhere, still selectable),
 * or glyph outlines (no font needed to draw, not selectable).
 */
export type TextMode =
  | { kind: 'live'; family: string }
  | { kind: 'embed'; fonts: EmbeddedFonts }
  | { kind: 'outlines'; set: OutlineSet; measure: TextMeasurer };

/** Options of the SVG writer. */
export interface SvgOptions {
  /** Starts every id in the SVG (checked by the caller: `idPrefixProblem`). Default: `cw` and a hash of the chart's words and font. */
  idPrefix?: string;
}

const GENERIC_FAMILIES = new Set(['serif', 'sans-serif', 'monospace', 'cursive', 'fantasy', 'system-ui']);

/**
 * A CSS family list from comma-separated names: each quoted (quotes and markup dropped), ending
 * in a generic family (sans-serif unless the list names one), so a reader without the fonts
 * still gets a sans-serif face.
 */
export function familyList(names: readonly string[]): string {
  const clean = names.map((n) => n.replace(/['"<>&]/g, '').trim()).filter((n) => n !== '');
  const quoted = clean.map((n) => (GENERIC_FAMILIES.has(n) ? n : `'${n}'`));
  return clean.some((n) => GENERIC_FAMILIES.has(n)) ? quoted.join(', ') : [...quoted, 'sans-serif'].join(', ');
}

function rootFamily(mode: TextMode): string {
  if (mode.kind === 'live') return familyList(mode.family.split(','));
  return mode.kind === 'embed' ? familyList(mode.fonts.families) : '';
}

const WEIGHT_NUMBER = { regular: 400, semibold: 600 } as const;

function datumTitle(datum: Datum | undefined, tooltip: string | undefined): string {
  if (tooltip !== undefined) return `<title>${escapeXml(tooltip)}</title>`;
  if (!datum) return '';
  let text = '';
  for (const key of Object.keys(datum)) text += `${text ? ', ' : ''}${key}: ${datum[key]}`;
  return `<title>${escapeXml(text)}</title>`;
}

/** Stroke, dash and opacity attributes, written only where set (fill is written by each node kind). */
function paintAttributes(p: Paint): string {
  let out = '';
  if (p.stroke) out += ` stroke="${p.stroke}" stroke-width="${fmt(p.strokeWidth ?? 1)}"`;
  if (p.stroke && p.dash?.length) out += ` stroke-dasharray="${p.dash.map(fmt).join(' ')}"`;
  if (p.stroke && p.round) out += ' stroke-linejoin="round" stroke-linecap="round"';
  if (p.opacity !== undefined && p.opacity < 1) out += ` opacity="${fmt(p.opacity)}"`;
  return out;
}

/** A rotation about the text's anchor point, when it has one. */
function rotation(node: TextNode): string {
  return node.rotate ? ` transform="rotate(${fmt(node.rotate)} ${fmt(node.x)} ${fmt(node.y)})"` : '';
}

/** The full text of a shortened label, as a tooltip. */
function fullTitle(node: TextNode): string {
  return node.full !== undefined ? `<title>${escapeXml(node.full)}</title>` : '';
}

function liveText(node: TextNode, cls: string): string {
  const anchor = node.anchor === 'start' ? '' : ` text-anchor="${node.anchor}"`;
  const weight = node.weight === 'regular' ? '' : ` font-weight="${WEIGHT_NUMBER[node.weight]}"`;
  return `<text${cls} x="${fmt(node.x)}" y="${fmt(node.y)}" font-size="${fmt(node.size)}"${weight}${anchor} fill="${node.fill}"${rotation(node)}>${fullTitle(node)}${escapeXml(node.text)}</text>`;
}

/** An element with its tooltip (or the datum it draws) as its title, or self-closed without one. */
function withDatum(open: string, tag: string, node: { datum?: Datum; tooltip?: string }): string {
  return node.datum || node.tooltip !== undefined ? `${open}>${datumTitle(node.datum, node.tooltip)}</${tag}>` : `${open}/>`;
}

function writeNodes(nodes: readonly SceneNode[], mode: TextMode, defs: GlyphDefs | undefined): string {
  let out = '';
  for (const node of nodes) out += writeNode(node, mode, defs);
  return out;
}

function writeNode(node: SceneNode, mode: TextMode, defs: GlyphDefs | undefined): string {
  const cls = ` class="${escapeXml(node.role)}"`;
  switch (node.kind) {
    case 'group':
      return `<g${cls}>${writeNodes(node.children, mode, defs)}</g>`;
    case 'rect':
      return withDatum(`<rect${cls} x="${fmt(node.x)}" y="${fmt(node.y)}" width="${fmt(node.width)}" height="${fmt(node.height)}" fill="${node.fill}"${paintAttributes(node)}`, 'rect', node);
    case 'path':
      return withDatum(`<path${cls} d="${pathData(node.commands)}" fill="${node.fill ?? 'none'}"${paintAttributes(node)}`, 'path', node);
    case 'circle':
      return withDatum(`<circle${cls} cx="${fmt(node.cx)}" cy="${fmt(node.cy)}" r="${fmt(node.r)}" fill="${node.fill}"${paintAttributes(node)}`, 'circle', node);
    case 'text':
      return mode.kind !== 'outlines' ? liveText(node, cls) : outlineText(node, mode.measure, defs!, cls, rotation(node), fullTitle(node));
    case 'image':
      // A data raster is drawn without smoothing: optimizeSpeed (SVG 1.1; CSS Images 3 treats it as crisp-edges) is what resvg honours, not `pixelated`.
      return `<image${cls} x="${fmt(node.x)}" y="${fmt(node.y)}" width="${fmt(node.width)}" height="${fmt(node.height)}" href="${escapeXml(node.href)}"${node.grid ? ' preserveAspectRatio="none" image-rendering="optimizeSpeed"' : ''}/>`;
  }
}

/**
 * Browsers draw a data raster unsmoothed only for CSS's `pixelated` (Chromium smooths an image
 * marked `optimizeSpeed`), which resvg 2.6 does not know and would draw smoothed. resvg skips
 * at-rules, so the rule inside `@supports` reaches browsers alone, and both draw sharp cells.
 */
const RASTER_STYLE = '<style>@supports (image-rendering:pixelated){image.raster{image-rendering:pixelated}}</style>';

const hasRaster = (node: SceneNode): boolean => (node.kind === 'image' ? node.grid !== undefined : node.kind === 'group' && node.children.some(hasRaster));

/**
 * The svg stage: scene → SVG text. Deterministic: numbers through `fmt`, nodes in scene order,
 * ids prefixed with a hash of the chart's title, description and font, so charts inlined in one
 * page never point at each other's different content and the same chart always gets the same ids.
 */
export function writeSvg(scene: Scene, mode: TextMode, options: SvgOptions = {}): string {
  const w = fmt(scene.width);
  const h = fmt(scene.height);
  const title = escapeXml(scene.title);
  const desc = escapeXml(scene.alt ?? scene.description);
  // The ids that elements refer to are the title, the description and (with outlines) glyphs,
  // whose ids name their weight and code point. Hashing those texts and the font family means
  // two charts whose prefixes collide point at identical content.
  const family = mode.kind === 'outlines' ? mode.set.family : rootFamily(mode);
  const prefix = options.idPrefix ?? `cw${contentHash(`${title}\n${desc}\n${mode.kind === 'live' ? mode.family : family}`)}`;
  const defs = mode.kind === 'outlines' ? new GlyphDefs(prefix, mode.set) : undefined;
  const body = writeNode(scene.root, mode, defs);
  const font = mode.kind === 'outlines' ? '' : ` font-family="${family}"`;
  // Embedded fonts need no id: their family names are ours, and identical rules from two charts on one page agree.
  const style = mode.kind === 'embed' && mode.fonts.css ? `<defs><style>${mode.fonts.css}</style></defs>` : '';
  const parts = [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${w}" height="${h}" viewBox="0 0 ${w} ${h}" role="img" aria-labelledby="${prefix}-title ${prefix}-desc"${font}>`,
    `<title id="${prefix}-title">${title}</title>`,
    `<desc id="${prefix}-desc">${desc}</desc>`,
    style,
    defs ? defs.toSvg() : '',
    hasRaster(scene.root) ? RASTER_STYLE : '',
    `<rect class="background" width="${w}" height="${h}" fill="${scene.background}"/>`,
    body,
    '</svg>',
  ].filter((part) => part !== '').join('\n');
  return `${parts}\n`;
}
