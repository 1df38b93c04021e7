import type { LayoutContext } from '../layout/kit-types.js';
import type { LinearScale } from '../layout/scales.js';
import { textBoxHeight, textNode } from '../layout/text.js';
import type { TextNode } from '../scene/types.js';

/** The tick labels of one cell's scale on the outer edge of the matrix: under the bottom row or left of the first column. */
export function tickRow(side: 'left' | 'bottom', field: string, scale: LinearScale, edge: number, ctx: LayoutContext): TextNode[] {
  const { measure, style } = ctx;
  const { tick } = style.text;
  const gap = style.spacing.tickGap;
  const h = textBoxHeight(measure, tick);
  return scale.ticks.flatMap((t, i) => {
    if (!scale.shown[i]) return [];
    const p = scale.map(t);
    const id = ctx.id(`tick-${field}`, scale.labels[i]!);
    return [side === 'bottom'
      ? textNode(measure, { id, role: 'tick', text: scale.labels[i]!, style: tick, x: p, top: edge + gap, anchor: 'middle' })
      : textNode(measure, { id, role: 'tick', text: scale.labels[i]!, style: tick, x: edge - gap, top: p - h / 2, anchor: 'end' })];
  });
}

/**
 * The labels along one edge that keep clear of each other, taken in order along the edge: a label
 * that would touch the one kept before it is left out, so labels of neighbouring cells never collide.
 */
export function clearAlong(side: 'left' | 'bottom', labels: readonly TextNode[], gap: number): TextNode[] {
  const at = (n: TextNode) => (side === 'bottom' ? n.box.x : n.box.y);
  const size = (n: TextNode) => (side === 'bottom' ? n.box.width : n.box.height);
  const out: TextNode[] = [];
  for (const n of [...labels].sort((a, b) => at(a) - at(b))) {
    const last = out.at(-1);
    if (!last || at(n) >= at(last) + size(last) + gap) out.push(n);
  }
  return out;
}
