import { contrastRatio } from '../color/wcag.js';
import { classOf } from '../derive/classes.js';
import type { ClusterTree } from '../derive/hclust.js';
import { dendrogramNodes } from '../derive/reorder.js';
import type { LayoutContext } from '../layout/kit-types.js';
import { labelStyle, valueFormatter } from '../layout/number-format.js';
import { rasterNode } from '../layout/raster-image.js';
import { textBoxHeight, textNode } from '../layout/text.js';
import type { Box, Datum, PathCommand, SceneNode, TextNode } from '../scene/types.js';
import type { DerivedHeatmap, HeatmapGeometry } from './heatmap-layout.js';

/** Space kept between a cell's value text and its edges, px. */
const CELL_INSET = 2;

/** The datum of a cell: its row key, its column key and its value (null when missing). */
function cellDatum(d: DerivedHeatmap, r: number, c: number, v: number): Datum {
  const q = d.query;
  return { [q.rows.name]: d.matrix.rows[r]!, [q.columns.name]: d.matrix.columns[c]!, [q.value.name]: Number.isNaN(v) ? null : v };
}

/** A missing cell: the page colour, outlined and crossed by one diagonal hatch, so it never reads as a value. */
function missingCell(id: string, b: Box, datum: Datum, ctx: LayoutContext): SceneNode {
  const [x0, y0, x1, y1] = [b.x + 0.5, b.y + 0.5, b.x + b.width - 0.5, b.y + b.height - 0.5];
  const commands: PathCommand[] = [
    { op: 'M', x: x0, y: y0 }, { op: 'L', x: x1, y: y0 }, { op: 'L', x: x1, y: y1 }, { op: 'L', x: x0, y: y1 }, { op: 'Z' },
    { op: 'M', x: x0, y: y1 }, { op: 'L', x: x1, y: y0 },
  ];
  return { kind: 'path', id, role: 'cell', datum, commands, fill: ctx.style.background, stroke: ctx.style.palette.others, strokeWidth: 1 };
}

/** The ink for text on a fill: the style's label colour or the page colour, whichever contrasts more (WCAG 2.x ratio). */
export function inkOn(fill: string, ctx: LayoutContext): string {
  const [dark, light] = [ctx.style.text.label.color, ctx.style.background];
  return contrastRatio(fill, dark) >= contrastRatio(fill, light) ? dark : light;
}

/** One rect per cell (a hatched outline where missing), and each value written in the cells it fits. */
export function vectorCells(d: DerivedHeatmap, g: HeatmapGeometry, ctx: LayoutContext): { marks: SceneNode[]; labels: TextNode[] } {
  const { matrix: m, rowOrder, columnOrder } = d;
  const [cw, ch] = [g.matrix.width / columnOrder.length, g.matrix.height / rowOrder.length];
  const style = ctx.style.text.label;
  const box = textBoxHeight(ctx.measure, style);
  const fmt = valueFormatter(Array.from(m.cells).filter((v) => !Number.isNaN(v)), labelStyle(d.query.value));
  const marks: SceneNode[] = [];
  const labels: TextNode[] = [];
  rowOrder.forEach((r, i) => columnOrder.forEach((c, j) => {
    const v = m.cells[r * m.columns.length + c]!;
    const b = { x: g.matrix.x + j * cw, y: g.matrix.y + i * ch, width: cw, height: ch };
    const id = ctx.id('cell', `${m.rows[r]}-${m.columns[c]}`);
    const datum = cellDatum(d, r, c, v);
    if (Number.isNaN(v)) { marks.push(missingCell(id, b, datum, ctx)); return; }
    const fill = d.query.classes.classes[classOf(d.query.classes.classes, v)]!.fill;
    marks.push({ kind: 'rect', id, role: 'cell', datum, ...b, fill });
    const text = fmt(v);
    if (box > ch - 2 * CELL_INSET || ctx.measure.width(text, style.size, style.weight) > cw - 2 * CELL_INSET) return;
    labels.push({ ...textNode(ctx.measure, { id: ctx.id('value', `${m.rows[r]}-${m.columns[c]}`), role: 'label', text, style, x: b.x + cw / 2, top: b.y + (ch - box) / 2, anchor: 'middle' }), fill: inkOn(fill, ctx) });
  }));
  return { marks, labels };
}

/** Every cell as one pixel of an embedded raster, in drawing order: class colours, missing cells in the neutral grey. */
export function rasterCells(d: DerivedHeatmap, g: HeatmapGeometry, ctx: LayoutContext): SceneNode {
  const { matrix: m, rowOrder, columnOrder } = d;
  const classes = d.query.classes.classes;
  const missing = classes.length;
  const indices = new Uint8Array(rowOrder.length * columnOrder.length);
  rowOrder.forEach((r, i) => columnOrder.forEach((c, j) => {
    const v = m.cells[r * m.columns.length + c]!;
    indices[i * columnOrder.length + j] = Number.isNaN(v) ? missing : classOf(classes, v);
  }));
  return rasterNode(ctx.id('raster', 'cells'), g.matrix, { columns: columnOrder.length, rows: rowOrder.length }, indices, [...classes.map((k) => k.fill), ctx.style.palette.others]);
}

/**
 * A dendrogram as one elbow path per merge, leaves at the matrix edge, each merge at its
 * height to scale (the root at the far edge of `box`); `across` says whether leaves run along x
 * (columns, tree above) or along y (rows, tree to the left). Datum: the merge height and size.
 */
export function dendrogramPaths(tree: ClusterTree, order: number[], box: Box, across: boolean, ctx: LayoutContext, side: string): SceneNode[] {
  const nodes = dendrogramNodes({ tree, order });
  const top = tree.merges.at(-1)?.height || 1;
  const step = (across ? box.width : box.height) / order.length;
  const along = (p: number) => (across ? box.x : box.y) + (p + 0.5) * step;
  const depth = (h: number) => (across ? box.y + box.height - (h / top) * box.height : box.x + box.width - (h / top) * box.width);
  const at = (p: number, h: number): { x: number; y: number } => (across ? { x: along(p), y: depth(h) } : { x: depth(h), y: along(p) });
  const { lines } = ctx.style;
  return tree.merges.map((merge, k) => {
    const [a, b, v] = [nodes[merge.a]!, nodes[merge.b]!, nodes[tree.n + k]!];
    const commands: PathCommand[] = [
      { op: 'M', ...at(a.position, a.height) }, { op: 'L', ...at(a.position, v.height) },
      { op: 'L', ...at(b.position, v.height) }, { op: 'L', ...at(b.position, b.height) },
    ];
    return { kind: 'path', id: ctx.id(`dendrogram-${side}`, String(k + 1)), role: 'dendrogram', datum: { height: merge.height, size: merge.size }, commands, stroke: lines.axis, strokeWidth: 1 };
  });
}
