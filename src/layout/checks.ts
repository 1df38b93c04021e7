import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import type { TextMeasurer } from '../font/measurer.js';
import type { Box, SceneNode, TextNode } from '../scene/types.js';
import { count } from '../diagnostics/words.js';
import { missingGlyphsWarning } from '../font/missing-report.js';

/** Smallest plot, in px either way, in which marks and ticks can still be read. */
export const MIN_PLOT_PX = 40;

/** A plot squeezed below MIN_PLOT_PX by titles, labels and axes is an error: nothing could be read in it. */
export function frameTooSmall(plot: Box, size: { width: number; height: number }): Diagnostic[] {
  if (plot.width >= MIN_PLOT_PX && plot.height >= MIN_PLOT_PX) return [];
  // The size that would leave the smallest readable plot, all else equal.
  const need = { width: Math.ceil(size.width + Math.max(0, MIN_PLOT_PX - plot.width)), height: Math.ceil(size.height + Math.max(0, MIN_PLOT_PX - plot.height)) };
  return [diagnostic('layout.frame-too-small', `the plot area is only ${Math.max(0, Math.round(plot.width))} × ${Math.max(0, Math.round(plot.height))} px after titles, labels and axes`, {
    path: '/size', found: `${size.width} × ${size.height}`, expected: `a plot area of at least ${MIN_PLOT_PX} × ${MIN_PLOT_PX} px`,
    hint: `make \`size:\` at least { width: ${need.width}, height: ${need.height} }, or shorten the title and labels`,
  })];
}

/** Characters of the chart's text that no font can draw (they would come out as empty boxes), with the labels and scripts. */
export function missingGlyphs(nodes: readonly SceneNode[], measure: TextMeasurer): Diagnostic[] {
  const found: { text: string; missing: string[] }[] = [];
  for (const n of nodes) if (n.kind === 'text') found.push({ text: n.full ?? n.text, missing: measure.missing(n.text, n.weight) });
  return missingGlyphsWarning(found);
}

/** Texts whose box leaves the canvas (a layout defect the reader would see as cut-off words). */
export function textsOffCanvas(texts: readonly TextNode[], size: { width: number; height: number }): TextNode[] {
  const eps = 0.01;
  return texts.filter((t) => t.box.x < -eps || t.box.y < -eps || t.box.x + t.box.width > size.width + eps || t.box.y + t.box.height > size.height + eps);
}

/** Pairs of things whose boxes overlap by more than float noise (boxes that only touch do not). */
function overlappingBy<T>(items: readonly T[], box: (t: T) => Box): [T, T][] {
  const eps = 0.01;
  const pairs: [T, T][] = [];
  // Sorted by left edge, each box is compared only with those that start before it ends. Each
  // box is looked up once: through the accessor in the sort and sweep it was most of the cost.
  const sorted = items.map((item) => ({ item, box: box(item) })).sort((a, b) => a.box.x - b.box.x);
  for (let i = 0; i < sorted.length; i++) {
    const a = sorted[i]!.box;
    for (let j = i + 1; j < sorted.length && sorted[j]!.box.x < a.x + a.width - eps; j++) {
      const b = sorted[j]!.box;
      if (a.y < b.y + b.height - eps && b.y < a.y + a.height - eps) pairs.push([sorted[i]!.item, sorted[j]!.item]);
    }
  }
  return pairs;
}

/** Pairs of texts whose boxes overlap (words drawn over words). */
export function overlappingTexts(texts: readonly TextNode[]): [TextNode, TextNode][] {
  return overlappingBy(texts, (t) => t.box);
}

/** Pairs of boxes that overlap. */
export function overlappingBoxes(boxes: readonly Box[]): [Box, Box][] {
  return overlappingBy(boxes, (b) => b);
}

/**
 * The checks run once on every finished scene: the plot is large enough, every character can be
 * drawn, no text leaves the canvas and no two texts overlap. The last two are defects of
 * layout, reported so that a figure is never silently cut or smudged.
 */
export function checkScene(nodes: readonly SceneNode[], plot: Box, size: { width: number; height: number }, measure: TextMeasurer): Diagnostic[] {
  const texts = nodes.filter((n): n is TextNode => n.kind === 'text');
  const tooSmall = frameTooSmall(plot, size);
  const problems = [...tooSmall, ...missingGlyphs(nodes, measure)];
  // In a frame too small for its words, every text is crowded: that error says it all.
  if (tooSmall.length) return problems;
  const off = textsOffCanvas(texts, size);
  if (off.length) {
    problems.push(diagnostic('layout.text-off-canvas', `${count(off.length, 'text')} would reach past the edge of the chart (first: ${JSON.stringify(off[0]!.text)})`, {
      found: off[0]!.text, hint: 'make `size:` larger, or shorten the title and labels',
    }));
  }
  const overlaps = overlappingTexts(texts);
  if (overlaps.length) {
    const [a, b] = overlaps[0]!;
    problems.push(diagnostic('layout.text-overlap', `${count(overlaps.length, 'pair')} of texts overlap (first: ${JSON.stringify(a.text)} and ${JSON.stringify(b.text)})`, {
      found: `${a.role} and ${b.role}`, hint: 'make `size:` larger, or shorten the labels',
    }));
  }
  return problems;
}
