import { axisTitle } from '../layout/axis.js';
import type { LayoutContext } from '../layout/kit-types.js';
import { textBoxHeight, textNode, truncateText } from '../layout/text.js';
import type { AxisInfo, TextNode } from '../scene/types.js';
import type { DerivedHeatmap, HeatmapGeometry } from './heatmap-layout.js';

/** The row labels right of the matrix, each centred on its row (every k-th when rows are thinner than a line). */
function rowLabels(d: DerivedHeatmap, g: HeatmapGeometry, ctx: LayoutContext): { nodes: TextNode[]; info: AxisInfo } {
  const { tick } = ctx.style.text;
  const step = g.matrix.height / d.rowOrder.length;
  const box = textBoxHeight(ctx.measure, tick);
  const nodes: TextNode[] = [];
  const shown: string[] = [];
  const positions: number[] = [];
  d.rowOrder.forEach((r, i) => {
    if (i % g.rowStep !== 0) return;
    const label = d.matrix.rows[r]!;
    const middle = g.matrix.y + (i + 0.5) * step;
    const text = truncateText(ctx.measure, label, tick, g.rowLabelWidth);
    nodes.push({ ...textNode(ctx.measure, { id: ctx.id('tick-row', label), role: 'tick', text, style: tick, x: g.rowLabelX, top: middle - box / 2 }), ...(text !== label ? { full: label } : {}) });
    shown.push(label);
    positions.push(middle);
  });
  const domain = d.rowOrder.map((r) => d.matrix.rows[r]!);
  return { nodes, info: { orient: 'right', scale: 'band', field: d.query.rows.name, title: axisTitle(d.query.rows, d.query.rows.label), domain, ticks: shown, tickPositions: positions, range: [g.matrix.y, g.matrix.y + g.matrix.height] } };
}

/** A column label turned to read upwards, its end just under the matrix, centred on its column. */
function turnedLabel(id: string, text: string, full: string, centre: number, top: number, ctx: LayoutContext): TextNode {
  const { tick } = ctx.style.text;
  const [ascent, descent] = [ctx.measure.ascent(tick.size, tick.weight), ctx.measure.descent(tick.size, tick.weight)];
  const width = ctx.measure.width(text, tick.size, tick.weight);
  // Rotated −90° about its anchor: the baseline runs up the page, the glyphs rise to its left.
  const x = centre + (ascent - descent) / 2;
  return {
    kind: 'text', id, role: 'tick', text, x, y: top, anchor: 'end', size: tick.size, weight: tick.weight, fill: tick.color, rotate: -90,
    box: { x: x - ascent, y: top, width: ascent + descent, height: width }, ...(text !== full ? { full } : {}),
  };
}

/** The column labels under the matrix: upright and centred, or turned (every k-th when columns are thinner than a line). */
function columnLabels(d: DerivedHeatmap, g: HeatmapGeometry, ctx: LayoutContext): { nodes: TextNode[]; info: AxisInfo } {
  const { tick } = ctx.style.text;
  const step = g.matrix.width / d.columnOrder.length;
  const nodes: TextNode[] = [];
  const shown: string[] = [];
  const positions: number[] = [];
  d.columnOrder.forEach((c, j) => {
    if (j % g.columnStep !== 0) return;
    const label = d.matrix.columns[c]!;
    const centre = g.matrix.x + (j + 0.5) * step;
    const id = ctx.id('tick-column', label);
    if (g.columnLabelsTurned) nodes.push(turnedLabel(id, truncateText(ctx.measure, label, tick, g.columnLabelHeight), label, centre, g.columnLabelTop, ctx));
    else nodes.push(textNode(ctx.measure, { id, role: 'tick', text: label, style: tick, x: centre, top: g.columnLabelTop, anchor: 'middle' }));
    shown.push(label);
    positions.push(centre);
  });
  const domain = d.columnOrder.map((c) => d.matrix.columns[c]!);
  return { nodes, info: { orient: 'bottom', scale: 'band', field: d.query.columns.name, title: axisTitle(d.query.columns, d.query.columns.label), domain, ticks: shown, tickPositions: positions, range: [g.matrix.x, g.matrix.x + g.matrix.width] } };
}

/**
 * The heat map's guides: row labels (right), column labels (below), the column key's title
 * centred under its labels and the row key's title above the row labels; and the two axes
 * for the scene dump.
 */
export function heatmapGuides(d: DerivedHeatmap, g: HeatmapGeometry, ctx: LayoutContext): { texts: TextNode[]; axes: AxisInfo[] } {
  const rows = rowLabels(d, g, ctx);
  const columns = columnLabels(d, g, ctx);
  const ts = ctx.style.text.axisTitle;
  const gap = ctx.style.spacing.tickGap;
  const titleBox = textBoxHeight(ctx.measure, ts);
  const columnTitle = textNode(ctx.measure, { id: 'axis-title-column', role: 'axis-title', text: columns.info.title, style: ts, x: g.matrix.x + g.matrix.width / 2, top: g.columnLabelTop + g.columnLabelHeight + gap, anchor: 'middle' });
  const rowTitle = textNode(ctx.measure, { id: 'axis-title-row', role: 'axis-title', text: truncateText(ctx.measure, rows.info.title, ts, g.rowLabelWidth), style: ts, x: g.rowLabelX, top: g.matrix.y - gap - titleBox - textBoxHeight(ctx.measure, ctx.style.text.tick) / 2 });
  return { texts: [...rows.nodes, ...columns.nodes, columnTitle, rowTitle], axes: [rows.info, columns.info] };
}
