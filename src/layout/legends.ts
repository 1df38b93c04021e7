import type { TextMeasurer } from '../font/measurer.js';
import type { SceneNode } from '../scene/types.js';
import type { Style } from '../style/types.js';
import { layoutLegend, type LegendLayout, type LegendPlace, type LegendSpec } from './legend.js';

/**
 * Several legends at one place (a scatter's colours and its circle sizes): side by side in one
 * row above the plot when they fit the width, else one under another. One legend is laid out
 * exactly as `layoutLegend` lays it out. The layout's `info` is the first legend's; `infos` holds
 * every legend's, in order.
 */
export function layoutLegends(specs: readonly LegendSpec[], place: LegendPlace, style: Style, measure: TextMeasurer): LegendLayout {
  if (specs.length === 1) return layoutLegend(specs[0]!, place, style, measure);
  const gap = 1.6 * style.text.tick.size;
  const alone = specs.map((s) => layoutLegend(s, { ...place, x: 0 }, style, measure));
  const rowWidth = alone.reduce((sum, l) => sum + l.width, 0) + gap * (alone.length - 1);
  const inRow = place.placement === 'top' && rowWidth <= place.width;
  const parts: LegendLayout[] = [];
  let offset = 0;
  for (const spec of specs) {
    const at = inRow ? { ...place, x: place.x + offset } : { ...place, y: place.y + offset };
    const part = layoutLegend(spec, at, style, measure);
    parts.push(part);
    offset += (inRow ? part.width : part.height) + gap * (inRow ? 1 : 0.5);
  }
  const nodes: SceneNode[] = parts.flatMap((p) => p.nodes);
  const width = inRow ? rowWidth : Math.max(...parts.map((p) => p.width));
  const height = inRow ? Math.max(...parts.map((p) => p.height)) : offset - gap * 0.5;
  return { nodes, info: parts[0]!.info, infos: parts.map((p) => p.info), width, height };
}
