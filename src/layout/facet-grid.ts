import type { Box } from '../scene/types.js';

/** How to divide a body into panels. */
export interface FacetGridOptions {
  /** Narrowest panel worth drawing, px (at least 1). */
  minPanelWidth: number;
  /** Lowest panel worth drawing, px (at least 1). */
  minPanelHeight: number;
  /** Space between neighbouring panels, px. */
  gap: number;
  /** Wanted panel width / height. Default: 4/3 (common practice for small multiples). */
  aspect?: number;
}

/** Panels in row-major order, all the same size, with `gap` between neighbours. */
export interface FacetGrid {
  columns: number;
  rows: number;
  panels: Box[];
  /**
   * How many panels of at least the minimum size the body can hold. When it is less than the
   * count asked for, only `fits` panels are laid out: the caller must say so (a warning that
   * names the facets left out), never drop them silently.
   */
  fits: number;
}

/** Panel size for a number of columns and rows in a body. */
function panelSize(body: Box, columns: number, rows: number, gap: number): { width: number; height: number } {
  return { width: (body.width - (columns - 1) * gap) / columns, height: (body.height - (rows - 1) * gap) / rows };
}

/** How many panels of at least `min` px fit along `length` px with `gap` between them. */
const capacity = (length: number, min: number, gap: number) => Math.max(0, Math.floor((length + gap) / (min + gap) + 1e-9));

/**
 * Chooses the number of columns for `n` panels: among the grids whose panels keep the minimum
 * size, the one whose panels come nearest the wanted aspect (by ratio), then the one with the
 * fewest empty cells, then the fewest columns. So a wide body gets more columns than a tall
 * one for the same count.
 */
function chooseColumns(body: Box, n: number, maxColumns: number, maxRows: number, gap: number, aspect: number): number {
  let best = 0;
  let bestKey: [number, number, number] = [Infinity, Infinity, Infinity];
  for (let c = 1; c <= Math.min(n, maxColumns); c++) {
    const r = Math.ceil(n / c);
    if (r > maxRows) continue;
    const { width, height } = panelSize(body, c, r, gap);
    const key: [number, number, number] = [Math.abs(Math.log(width / height / aspect)), c * r - n, c];
    // Aspect errors within 1e-9 are ties (float noise), decided by the later keys.
    const better = key[0] < bestKey[0] - 1e-9 || (Math.abs(key[0] - bestKey[0]) <= 1e-9 && (key[1] < bestKey[1] || (key[1] === bestKey[1] && key[2] < bestKey[2])));
    if (better) { best = c; bestKey = key; }
  }
  return best;
}

/**
 * Divides `body` into a grid of equal panels for `count` facets, in row-major order. The grid
 * holds min(count, fits) panels; none is smaller than the minimum size. A body too small for a
 * single panel gives no panels and `fits` 0.
 */
export function facetGrid(body: Box, count: number, options: FacetGridOptions): FacetGrid {
  const gap = Math.max(0, options.gap);
  const aspect = options.aspect !== undefined && options.aspect > 0 ? options.aspect : 4 / 3;
  const maxColumns = capacity(body.width, Math.max(1, options.minPanelWidth), gap);
  const maxRows = capacity(body.height, Math.max(1, options.minPanelHeight), gap);
  const fits = maxColumns * maxRows;
  const n = Math.min(Math.max(0, Math.floor(count)), fits);
  if (n === 0) return { columns: 0, rows: 0, panels: [], fits };
  const columns = chooseColumns(body, n, maxColumns, maxRows, gap, aspect);
  const rows = Math.ceil(n / columns);
  const { width, height } = panelSize(body, columns, rows, gap);
  const panels = Array.from({ length: n }, (_, i) => ({
    x: body.x + (i % columns) * (width + gap),
    y: body.y + Math.floor(i / columns) * (height + gap),
    width,
    height,
  }));
  return { columns, rows, panels, fits };
}

/** Which axes' tick labels a panel draws: only the outer panels carry them. */
export interface OuterSides {
  /** First column: draws the left (value) tick labels. */
  left: boolean;
  /** No panel below it (the last row, or above an empty cell of an unfinished last row): draws the bottom tick labels. */
  bottom: boolean;
}

/** For each panel of a grid, in order, whether it carries the left and the bottom tick labels. */
export function outerPanels(grid: Pick<FacetGrid, 'columns' | 'panels'>): OuterSides[] {
  const n = grid.panels.length;
  return grid.panels.map((_, i) => ({ left: i % grid.columns === 0, bottom: i + grid.columns >= n }));
}
