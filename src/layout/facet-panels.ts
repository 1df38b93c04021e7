import type { Box } from '../scene/types.js';
import { facetGrid, type FacetGrid } from './facet-grid.js';
import type { CartesianDomains, LayoutContext } from './kit-types.js';
import { plotBox, type PlotBox } from './plot-box.js';
import { textBoxHeight } from './text.js';

/** Where the panels of a small-multiples chart go. */
export interface FacetPanels {
  grid: FacetGrid;
  /** Each panel's plot box (under its title strip), with its left axis measured for it; all the same size. */
  boxes: PlotBox[];
  /** Each panel's cell: its title strip and its plot. */
  cells: Box[];
  /** The box the grid fills: the body less the outer tick labels and axis titles. */
  region: Box;
  /** Width of the column of left tick labels, px (the tick gap included). */
  leftColumn: number;
}

/** Height of a panel's title strip, px: one line of the axis-title style and a label gap. */
export function stripHeight(ctx: LayoutContext): number {
  return textBoxHeight(ctx.measure, ctx.style.text.axisTitle) + ctx.style.spacing.labelGap;
}

/**
 * A panel's plot box at `plot`: measured by plotBox itself on a body that puts its plot exactly
 * there, so the left axis (its ticks, or its fitted band labels) is the one a single chart of
 * this plot size would get. Returns the box and the label column it needs.
 */
function panelBox(plot: Box, body: Box, margins: { top: number; bottom: number }, domains: CartesianDomains, ctx: LayoutContext): { box: PlotBox; column: number } {
  const around = { x: body.x, y: plot.y - margins.top, width: body.width, height: plot.height + margins.top + margins.bottom };
  const measured = plotBox(around, domains, ctx);
  return { box: { plot, left: measured.left }, column: measured.plot.x - around.x };
}

/**
 * Lays out `count` panels in the body: one column of left tick labels and one row of bottom tick
 * labels and axis titles around a grid of equal cells (facetGrid), each a title strip over its
 * plot. The label column is widened until it holds the labels the panels' own axes draw (at
 * least `minLeft`). Only as many panels as keep `minPlot` are laid out.
 */
export function facetPanels(body: Box, domains: CartesianDomains, count: number, minPlot: { width: number; height: number }, ctx: LayoutContext, minLeft = 0): FacetPanels {
  const strip = stripHeight(ctx);
  const gap = ctx.style.spacing.blockGap;
  const whole = plotBox(body, domains, ctx);
  const margins = { top: whole.plot.y - body.y, bottom: body.y + body.height - (whole.plot.y + whole.plot.height) };
  const right = Math.max(0, domains.rightGutter ?? 0);
  let leftColumn = Math.max(whole.plot.x - body.x, minLeft);
  for (let i = 0; ; i++) {
    const region = { x: body.x + leftColumn, y: body.y + margins.top, width: Math.max(0, body.width - leftColumn - right), height: Math.max(0, body.height - margins.top - margins.bottom) };
    const grid = facetGrid(region, count, { minPanelWidth: minPlot.width, minPanelHeight: minPlot.height + strip, gap });
    const measured = grid.panels.map((cell) => panelBox({ x: cell.x, y: cell.y + strip, width: cell.width, height: cell.height - strip }, body, margins, domains, ctx));
    const need = Math.max(0, ...measured.map((m) => m.column));
    // A narrower plot can need a wider label column (band labels fitted to a thinner band); a few rounds settle it.
    if (need <= leftColumn + 1e-9 || i === 3) return { grid, boxes: measured.map((m) => m.box), cells: grid.panels, region, leftColumn };
    leftColumn = need;
  }
}
