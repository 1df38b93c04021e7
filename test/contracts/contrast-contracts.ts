import { contrastRatio } from '../../src/color/wcag.js';
import { hexToRgb, rgbToHex } from '../../src/color/srgb.js';
import type { Role, Scene, SceneNode, TextNode } from '../../src/scene/types.js';
import { polygon } from './path-geometry.js';

/** A filled shape painted before some text, as far as contrast needs it: where it covers, and its colour and opacity. */
interface Painted {
  covers(x: number, y: number): boolean;
  fill: string;
  opacity: number;
  role: Role;
}

/** Even-odd point-in-polygon over every ring (SVG's nonzero rule agrees for the simple outlines charts draw). */
function inside(rings: readonly [number, number][][], x: number, y: number): boolean {
  let odd = false;
  for (const ring of rings) {
    for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
      const [xi, yi] = ring[i]!;
      const [xj, yj] = ring[j]!;
      if ((yi > y) !== (yj > y) && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) odd = !odd;
    }
  }
  return odd;
}

function paintedOf(node: SceneNode): Painted | undefined {
  const opacity = 'opacity' in node ? (node.opacity ?? 1) : 1;
  if (node.kind === 'rect' && node.fill !== 'none') {
    return { role: node.role, fill: node.fill, opacity, covers: (x, y) => x >= node.x && x <= node.x + node.width && y >= node.y && y <= node.y + node.height };
  }
  if (node.kind === 'circle' && node.fill !== 'none') return { role: node.role, fill: node.fill, opacity, covers: (x, y) => (x - node.cx) ** 2 + (y - node.cy) ** 2 <= node.r ** 2 };
  if (node.kind === 'path' && node.fill && node.fill !== 'none') {
    const rings = polygon(node.commands);
    return { role: node.role, fill: node.fill, opacity, covers: (x, y) => inside(rings, x, y) };
  }
  return undefined;
}

/** `top` at `opacity` over `below`, per sRGB channel (as SVG composites). */
function over(top: string, opacity: number, below: string): string {
  if (opacity >= 1) return top;
  const [a, b] = [hexToRgb(top), hexToRgb(below)];
  return rgbToHex(a.map((v, i) => v * opacity + b[i]! * (1 - opacity)) as [number, number, number]);
}

/** The colour under a point, from the page up through every shape painted there, in drawing order. */
function colourAt(painted: readonly Painted[], background: string, x: number, y: number): { colour: string; on: Role | 'background' } {
  let colour = background;
  let on: Role | 'background' = 'background';
  for (const p of painted) {
    if (!p.covers(x, y)) continue;
    colour = over(p.fill, p.opacity, colour);
    on = p.role;
  }
  return { colour, on };
}

/** Where a text's glyphs are: along its middle, at a tenth, half and nine tenths of its width. */
function samples(t: TextNode): [number, number][] {
  const y = t.box.y + t.box.height * 0.55;
  return [0.1, 0.5, 0.9].map((f) => [t.box.x + t.box.width * f, y]);
}

/** One text's contrast against what it sits on, at its worst sample. */
export interface TextContrast {
  text: string;
  role: Role;
  fill: string;
  on: Role | 'background';
  under: string;
  ratio: number;
}

/**
 * Every text of a scene with the WCAG 2.x contrast of its colour against what it is drawn on:
 * the page, or the shapes painted before it at its place (opacity composited), taking the worst
 * of three points along the text.
 */
export function textContrasts(scene: Scene): TextContrast[] {
  const painted: Painted[] = [];
  const out: TextContrast[] = [];
  const visit = (node: SceneNode) => {
    if (node.kind === 'group') return node.children.forEach(visit);
    if (node.kind === 'text') {
      const worst = samples(node).map(([x, y]) => colourAt(painted, scene.background, x, y)).map((u) => ({ ...u, ratio: contrastRatio(node.fill, u.colour) }))
        .reduce((a, b) => (b.ratio < a.ratio ? b : a));
      out.push({ text: node.text, role: node.role, fill: node.fill, on: worst.on, under: worst.colour, ratio: worst.ratio });
      return;
    }
    const p = paintedOf(node);
    if (p) painted.push(p);
  };
  visit(scene.root);
  return out;
}

/** Roles of marks that carry data on their own against the page (not tiles of a colour scale, nor faint context). */
const STANDALONE_MARKS: ReadonlySet<Role> = new Set(['bar', 'line', 'point', 'task', 'bin', 'box', 'dependency', 'dendrogram', 'segment', 'legend-swatch']);

/** One data mark's contrast against the page: its fill or its solid outline, whichever stands out more. */
export interface MarkContrast {
  role: Role;
  colour: string;
  /** Below 1 for marks drawn translucent on purpose (overlapping marks read darker). */
  opacity: number;
  /** Contrast of the colour itself, as one mark alone at full strength would show it. */
  ratio: number;
  /** Contrast as drawn, the colour composited on the page at the mark's opacity. */
  drawnRatio: number;
}

/**
 * The WCAG 2.x contrast against the page of every standalone data mark (bars, lines, points,
 * tasks, bins, boxes, dendrograms, stacked segments, legend swatches), by its colour and as
 * drawn. Tiles of a colour scale (heat-map cells, density hexagons, stream layers, and the swatches
 * of a binned legend) are left out: they are read against each other and their legend, not the page.
 */
export function markContrasts(scene: Scene): MarkContrast[] {
  const binned = new Set(scene.legends.filter((l) => l.kind === 'binned').flatMap((l) => l.entries.map((e) => e.fill)));
  const out: MarkContrast[] = [];
  const visit = (node: SceneNode) => {
    if (node.kind === 'group') return node.children.forEach(visit);
    if (node.kind === 'text' || node.kind === 'image' || !STANDALONE_MARKS.has(node.role)) return;
    const fill = node.fill && node.fill !== 'none' && node.fill !== scene.background ? node.fill : undefined;
    // A mark with a solid outline is delineated by it: a light fill inside a dark outline (a box plot's box) reads as well as a dark fill.
    const stroke = node.stroke && node.stroke !== 'none' && (node.strokeWidth ?? 1) >= 1 ? node.stroke : undefined;
    const colour = fill && stroke ? (contrastRatio(stroke, scene.background) > contrastRatio(fill, scene.background) ? stroke : fill) : fill ?? stroke;
    if (!colour || (node.role === 'legend-swatch' && binned.has(colour))) return;
    const opacity = node.opacity ?? 1;
    out.push({ role: node.role, colour, opacity, ratio: contrastRatio(colour, scene.background), drawnRatio: contrastRatio(over(colour, opacity, scene.background), scene.background) });
  };
  visit(scene.root);
  return out;
}
