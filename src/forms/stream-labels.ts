import type { DerivedStream } from '../derive/stream.js';
import { inkOn } from '../layout/ink.js';
import type { LayoutContext } from '../layout/kit-types.js';
import { textBoxHeight, textNode } from '../layout/text.js';
import type { Box, TextNode } from '../scene/types.js';
import { boundaryAt, type Boundary } from './stream-geometry.js';

/** Samples across a label's width at which it must lie inside its layer. */
const SAMPLES = 9;
/** Room kept between a label and its layer's edges, px. */
const PAD = 1;

/** Where a label of this width and height fits inside a layer centred near x: its centre y, or undefined. */
function fitAt(xs: readonly number[], lower: Boundary, upper: Boundary, x: number, w: number, h: number): number | undefined {
  let top = -Infinity;
  let bottom = Infinity;
  for (let s = 0; s < SAMPLES; s++) {
    const at = x - w / 2 + (w * s) / (SAMPLES - 1);
    top = Math.max(top, boundaryAt(xs, upper, at));
    bottom = Math.min(bottom, boundaryAt(xs, lower, at));
  }
  return bottom - top >= h + 2 * PAD ? (top + bottom) / 2 : undefined;
}

/**
 * Each layer's name inside it, at the widest key where the whole label fits between the layer's
 * edges (tried widest first), in the ink that contrasts more with the layer's fill; the count of
 * layers too thin for their name.
 */
export function layerLabels(derived: DerivedStream, xs: readonly number[], bounds: readonly Boundary[], fills: readonly string[], plot: Box, ctx: LayoutContext): { labels: TextNode[]; unlabelled: number } {
  const { measure, style } = ctx;
  const { label } = style.text;
  const h = textBoxHeight(measure, label);
  const [left, right] = [Math.max(plot.x, xs[0]!), Math.min(plot.x + plot.width, xs[xs.length - 1]!)];
  const labels: TextNode[] = [];
  derived.layers.forEach((layer, i) => {
    const [lower, upper] = [bounds[i]!, bounds[i + 1]!];
    const w = measure.width(layer.name, label.size, label.weight);
    if (right - left < w) return;
    const widest = xs.map((_, k) => k).sort((a, b) => lower.ys[b]! - upper.ys[b]! - (lower.ys[a]! - upper.ys[a]!) || a - b);
    for (const k of widest) {
      if (lower.ys[k]! - upper.ys[k]! < h + 2 * PAD) break;
      const x = Math.min(Math.max(xs[k]!, left + w / 2), right - w / 2);
      const cy = fitAt(xs, lower, upper, x, w, h);
      if (cy === undefined) continue;
      const node = textNode(measure, { id: ctx.id('label', layer.name), role: 'label', text: layer.name, style: label, x, top: cy - h / 2, anchor: 'middle' });
      labels.push({ ...node, fill: inkOn(fills[i]!, label.color, style.background) });
      return;
    }
  });
  return { labels, unlabelled: derived.layers.length - labels.length };
}
