import type { SlopeItem } from '../derive/slopes.js';
import type { LayoutContext } from '../layout/kit-types.js';
import { dodge1d } from '../layout/place-labels.js';
import { textBoxHeight, textNode, truncateText } from '../layout/text.js';
import type { Box, SceneNode, TextNode } from '../scene/types.js';
import { segment } from '../svg/path.js';

/** Room between an axis and its labels, in px: where a leader runs from a moved label to its point. */
export const LEADER_ROOM = 10;

/** One end of the chart: where its axis stands, which side its labels go, and each item's value and position there. */
export interface EndSpec {
  side: 'left' | 'right';
  axisX: number;
  /** The end's name, for ids. */
  name: string;
  y(item: SlopeItem): number;
  text(item: SlopeItem): string;
  value(item: SlopeItem): string;
}

/** The label of an item at one end: name and value, the name shortened to the room left (the full text kept). */
function endLabel(item: SlopeItem, end: EndSpec, top: number, plot: Box, ctx: LayoutContext): TextNode {
  const { measure, style } = ctx;
  const { label } = style.text;
  const room = end.side === 'left' ? end.axisX - LEADER_ROOM - plot.x : plot.x + plot.width - end.axisX - LEADER_ROOM;
  const value = end.value(item);
  const nameRoom = Math.max(0, room - measure.width(`${value} `, label.size, label.weight));
  const name = truncateText(measure, item.label, label, nameRoom);
  const text = end.side === 'left' ? `${name} ${value}` : `${value} ${name}`;
  const x = end.side === 'left' ? end.axisX - LEADER_ROOM : end.axisX + LEADER_ROOM;
  const node = textNode(measure, { id: ctx.id(`label-${end.side}`, item.label), role: 'label', text, style: label, x, top, anchor: end.side === 'left' ? 'end' : 'start' });
  return name === item.label ? node : { ...node, full: end.text(item) };
}

/**
 * The labels of one end, spread along the axis so that none overlap (dodge1d: order kept, least
 * total squared displacement), with a leader from each label moved more than half a line to its
 * point. When they cannot all fit, they stay at their points, and the composer leaves out those
 * that overlap (and says so in a note); no leader then points at a label that is not drawn.
 */
export function endLabels(items: readonly SlopeItem[], end: EndSpec, plot: Box, ctx: LayoutContext): { labels: TextNode[]; leaders: SceneNode[] } {
  const { measure, style } = ctx;
  const box = textBoxHeight(measure, style.text.label);
  const wanted = items.map((item) => ({ id: item.label, want: end.y(item), size: box }));
  const { placed, fits } = dodge1d(wanted, plot.y, plot.y + plot.height, 1, box / 2);
  const at = new Map(placed.map((p) => [p.id, p]));
  const labels: TextNode[] = [];
  const leaders: SceneNode[] = [];
  const sign = end.side === 'left' ? -1 : 1;
  for (const item of items) {
    const p = at.get(item.label)!;
    const centre = fits ? p.at : end.y(item);
    labels.push(endLabel(item, end, centre - box / 2, plot, ctx));
    if (!fits || !p.moved) continue;
    leaders.push({
      kind: 'path', id: ctx.id(`leader-${end.side}`, item.label), role: 'leader',
      commands: segment(end.axisX + sign * 2, end.y(item), end.axisX + sign * (LEADER_ROOM - 2), centre),
      stroke: style.text.tick.color, strokeWidth: 0.75,
    });
  }
  return { labels, leaders };
}
