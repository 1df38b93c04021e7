/** Items laid out as square cells in rows, left to right and top to bottom. */
export interface DenseGrid {
  /** Cell side, px (whole pixels, so the raster has one pixel per item stretched exactly). */
  cell: number;
  columns: number;
  rows: number;
}

/**
 * The largest whole-pixel square cell at which n items fit a width × height box in rows, and the
 * grid it gives; undefined when even 1 px cells do not hold them (n > width × height).
 */
export function denseGrid(n: number, width: number, height: number): DenseGrid | undefined {
  const [w, h] = [Math.floor(width), Math.floor(height)];
  if (n < 1 || w < 1 || h < 1 || n > w * h) return undefined;
  for (let cell = Math.max(1, Math.floor(Math.sqrt((w * h) / n))); cell >= 1; cell--) {
    const columns = Math.min(n, Math.floor(w / cell));
    const rows = Math.ceil(n / columns);
    if (rows * cell <= h) return { cell, columns, rows };
  }
  return undefined;
}
