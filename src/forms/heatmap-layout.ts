import { max } from 'd3-array';
import type { ClusterTree } from '../derive/hclust.js';
import type { ValueMatrix } from '../derive/matrix.js';
import { axisTitle, thinningStep } from '../layout/axis.js';
import type { LayoutContext } from '../layout/kit-types.js';
import { capText, textBoxHeight } from '../layout/text.js';
import type { Box } from '../scene/types.js';
import type { HeatmapPlan } from './heatmap-plan.js';

/** A heat map's numbers: the matrix, and its rows and columns in drawing order with their trees when clustered. */
export interface DerivedHeatmap {
  query: HeatmapPlan;
  matrix: ValueMatrix;
  rowOrder: number[];
  columnOrder: number[];
  rowTree: ClusterTree | undefined;
  columnTree: ClusterTree | undefined;
}

/** Where the parts of a heat map go inside the body. */
export interface HeatmapGeometry {
  matrix: Box;
  /** Dendrograms: beside the rows (left) and above the columns; absent when not clustered. */
  rowDendrogram: Box | undefined;
  columnDendrogram: Box | undefined;
  /** Left edge of the row labels, right of the matrix, and the width they may take. */
  rowLabelX: number;
  rowLabelWidth: number;
  /** Column labels: upright, or turned to read upwards; the top of their band and its height. */
  columnLabelsTurned: boolean;
  columnLabelTop: number;
  columnLabelHeight: number;
  /** Every k-th row and column label is drawn (1: all). */
  rowStep: number;
  columnStep: number;
}

/** Largest share of the body the row labels (width) or turned column labels (height) may take. */
const LABEL_SHARE = 0.3;
/** Dendrogram depth: a share of the body, within bounds in px (common practice: a fifth or less of the figure). */
const DENDROGRAM_SHARE = 0.14;
const DENDROGRAM_PX: [number, number] = [24, 56];

const clamp = (v: number, [lo, hi]: [number, number]) => Math.min(hi, Math.max(lo, v));

function widest(labels: readonly string[], ctx: LayoutContext): number {
  const { tick } = ctx.style.text;
  return max(labels, (l) => ctx.measure.width(capText(l), tick.size, tick.weight)) ?? 0;
}

/**
 * The heat map's geometry in a body: dendrograms left and above (for a side clustered), row labels at
 * the right (as wide as their title too), column labels below (turned when they do not fit their
 * columns upright), the column key's title under them and the row key's title above the row
 * labels; the matrix takes the rest.
 * Labels are thinned to every k-th when their rows or columns are thinner than a line.
 */
export function heatmapGeometry(derived: DerivedHeatmap, body: Box, ctx: LayoutContext): HeatmapGeometry {
  const { style, measure } = ctx;
  const gap = style.spacing.tickGap;
  const line = textBoxHeight(measure, style.text.tick);
  const titleLine = textBoxHeight(measure, style.text.axisTitle);
  const [nr, nc] = [derived.matrix.rows.length, derived.matrix.columns.length];
  const [byRows, byColumns] = [derived.rowTree !== undefined, derived.columnTree !== undefined];
  const dendroW = byRows ? clamp(body.width * DENDROGRAM_SHARE, DENDROGRAM_PX) : 0;
  const dendroH = byColumns ? clamp(body.height * DENDROGRAM_SHARE, DENDROGRAM_PX) : 0;
  const { axisTitle: ts } = style.text;
  const rowTitle = measure.width(capText(axisTitle(derived.query.rows, derived.query.rows.label)), ts.size, ts.weight);
  const rowLabelWidth = Math.min(Math.max(widest(derived.matrix.rows, ctx), rowTitle), body.width * LABEL_SHARE);
  // The row key's title sits half a label line above the matrix: the first row's label may reach that far up.
  const top = Math.max(dendroH, titleLine + line / 2) + gap;
  const left = byRows ? dendroW + gap : 0;
  const width = Math.max(1, body.width - left - gap - rowLabelWidth);
  const colWide = widest(derived.matrix.columns, ctx);
  const upright = colWide + 2 <= width / nc;
  const columnLabelHeight = upright ? line : Math.min(colWide, body.height * LABEL_SHARE);
  const height = Math.max(1, body.height - top - gap - columnLabelHeight - gap - titleLine);
  const matrix = { x: body.x + left, y: body.y + top, width, height };
  return {
    matrix,
    rowDendrogram: byRows ? { x: body.x, y: matrix.y, width: dendroW, height } : undefined,
    columnDendrogram: byColumns ? { x: matrix.x, y: body.y + top - gap - dendroH, width, height: dendroH } : undefined,
    rowLabelX: matrix.x + width + gap,
    rowLabelWidth,
    columnLabelsTurned: !upright,
    columnLabelTop: matrix.y + height + gap,
    columnLabelHeight,
    rowStep: thinningStep(line, height / nr, 1),
    columnStep: upright ? 1 : thinningStep(line, width / nc, 1),
  };
}
