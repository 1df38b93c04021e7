import type { LayoutContext } from '../layout/kit-types.js';
import { dodge1d } from '../layout/place-labels.js';
import { MAX_LABEL_SHARE } from '../layout/plot-box.js';
import { capText, textBoxHeight, textNode, truncateText } from '../layout/text.js';
import type { Box, SceneNode, TextNode } from '../scene/types.js';
import { segment } from '../svg/path.js';

/** Vertical space between two direct labels, px. */
export const LABEL_GAP = 2;
/** A label moved further than this from its line's end, px, is joined to it by a leader (common practice). */
export const LEADER_FROM = 4;
/** Horizontal run of a leader, px: room between a line's end and a label that had to move. */
export const LEADER_RUN = 14;

/** A line end to label: where the line ends and the label's text. */
export interface LineEnd {
  id: string;
  text: string;
  x: number;
  y: number;
  stroke: string;
}

/** Widest a direct label may be, px: the share of the frame's inner width a label column may take; longer names are shortened. */
function labelCap(ctx: LayoutContext): number {
  return Math.max(0, MAX_LABEL_SHARE * (ctx.brief.size.width - 2 * ctx.style.spacing.padding));
}

/** A series name as its direct label shows it: shortened with "…" to the label column's cap. */
function fittedName(text: string, ctx: LayoutContext): string {
  return truncateText(ctx.measure, capText(text), ctx.style.text.label, labelCap(ctx));
}

/** The room direct labels take right of the plot: the widest label (at most the cap), its gap, and a leader's run. */
export function labelGutter(texts: readonly string[], ctx: LayoutContext): number {
  const { label } = ctx.style.text;
  let widest = 0;
  for (const t of texts) widest = Math.max(widest, ctx.measure.width(fittedName(t, ctx), label.size, label.weight));
  return widest + ctx.style.spacing.labelGap + LEADER_RUN;
}

/** Whether `count` direct labels fit, stacked with their gaps, in a plot of this height. */
export function labelsFit(count: number, plotHeight: number, ctx: LayoutContext): boolean {
  const h = textBoxHeight(ctx.measure, ctx.style.text.label);
  return count * h + Math.max(0, count - 1) * LABEL_GAP <= plotHeight;
}

/**
 * Direct labels at the line ends: each at the height of its line's last point, spread apart
 * where they would overlap (dodge1d: order kept, least total movement, inside the plot's
 * height), and joined to its line by a leader where it had to move more than LEADER_FROM.
 */
export function directLabels(ends: readonly LineEnd[], plot: Box, ctx: LayoutContext): { labels: TextNode[]; leaders: SceneNode[]; fits: boolean } {
  const { style, measure } = ctx;
  const h = textBoxHeight(measure, style.text.label);
  // A label may reach half its height above the plot (the gutter's top is free; the value axis's title is at the left).
  const { placed, fits } = dodge1d(ends.map((e) => ({ id: e.id, want: e.y, size: h })), plot.y - h / 2, plot.y + plot.height, LABEL_GAP, LEADER_FROM);
  const byId = new Map(ends.map((e) => [e.id, e]));
  const labels: TextNode[] = [];
  const leaders: SceneNode[] = [];
  for (const p of placed) {
    const end = byId.get(p.id)!;
    const x = end.x + (p.moved ? LEADER_RUN : style.spacing.labelGap);
    const shown = fittedName(end.text, ctx);
    const node = textNode(measure, { id: ctx.id('label', end.text), role: 'label', text: shown, style: style.text.label, x, top: p.at - h / 2 });
    labels.push(shown === end.text ? node : { ...node, full: end.text });
    if (p.moved) {
      leaders.push({ kind: 'path', id: ctx.id('leader', end.text), role: 'leader', commands: segment(end.x + 2, end.y, x - 2, p.at), stroke: end.stroke, strokeWidth: 1 });
    }
  }
  return { labels, leaders, fits };
}
