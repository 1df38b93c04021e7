import type { TextMeasurer } from '../font/measurer.js';
import type { GlyphOutlines, PlacedGlyph } from '../font/metrics.js';
import type { TextNode } from '../scene/types.js';
import type { Weight } from '../style/types.js';
import { fmt, fmtPath } from './fmt.js';

/** Glyph outlines for each weight, and the .notdef outline drawn for characters the font lacks. */
export interface OutlineSet {
  /** The font family the outlines come from; part of the id prefix, since glyph ids name only weight and code point. */
  family: string;
  outlines: Record<Weight, GlyphOutlines>;
  notdef: Record<Weight, string>;
}

/** Collects glyph definitions as text is drawn, so each glyph is defined once per SVG. */
export class GlyphDefs {
  private readonly used = new Map<string, string>();
  constructor(private readonly prefix: string, private readonly set: OutlineSet) {}

  /**
   * The id of a glyph's definition, defining it on first use; undefined for blank glyphs
   * (spaces). A glyph of the bundled face is named by weight and code point; one of another
   * face by that face's key and its glyph id (keys differ per face and weight, so two faces in
   * one SVG never share an id).
   */
  ref(glyph: PlacedGlyph, weight: Weight): string | undefined {
    const { codePoint } = glyph;
    const id = glyph.face !== undefined ? `${this.prefix}-${glyph.face}-${glyph.glyph}` : `${this.prefix}-g${weight === 'regular' ? 'r' : 's'}${codePoint < 0 ? 'x' : codePoint.toString(16)}`;
    if (this.used.has(id)) return id;
    const d = glyph.face !== undefined ? glyph.d : codePoint < 0 ? this.set.notdef[weight] : this.set.outlines[weight][codePoint];
    if (!d) return undefined;
    this.used.set(id, d);
    return id;
  }

  /** The <defs> block, glyphs in first-use order (which the scene's node order fixes). */
  toSvg(): string {
    if (this.used.size === 0) return '';
    const paths = [...this.used].map(([id, d]) => `<path id="${id}" d="${fmtPath(d)}"/>`);
    return `<defs>${paths.join('')}</defs>`;
  }
}

/** Where the text run starts before any rotation: the box's left edge, which a turned text's box no longer gives. */
function startX(node: TextNode, measure: TextMeasurer): number {
  if (!node.rotate) return node.box.x;
  const width = measure.width(node.text, node.size, node.weight);
  return node.anchor === 'start' ? node.x : node.anchor === 'middle' ? node.x - width / 2 : node.x - width;
}

/** A text node drawn as glyph outlines: one group scaled from font units, a <use> per glyph. */
export function outlineText(node: TextNode, measure: TextMeasurer, defs: GlyphDefs, aria: string, rotation = '', title = ''): string {
  const { glyphs, unitsPerEm } = measure.run(node.text, node.weight);
  const scale = node.size / unitsPerEm;
  const uses = glyphs.flatMap((g) => {
    const id = defs.ref(g, node.weight);
    return id ? [`<use href="#${id}"${g.x ? ` x="${fmt(g.x)}"` : ''}${g.y ? ` y="${fmt(g.y)}"` : ''}/>`] : [];
  });
  const transform = `translate(${fmt(startX(node, measure))} ${fmt(node.y)}) scale(${Number(scale.toPrecision(6))} ${-Number(scale.toPrecision(6))})`;
  const glyphGroup = `<g${aria} fill="${node.fill}" transform="${transform}">${title}${uses.join('')}</g>`;
  return rotation ? `<g${rotation}>${glyphGroup}</g>` : glyphGroup;
}
