import { encodeIndexedPng } from '../raster/png-encode.js';
import type { Box, ImageNode } from '../scene/types.js';

/**
 * A grid of data cells as one embedded raster image: one pixel per cell (row-major indices into
 * `palette`, #rrggbb or "none"), stretched over `box` and drawn without smoothing, so each cell
 * keeps its exact colour. Role `raster`, with the grid size.
 */
export function rasterNode(id: string, box: Box, grid: { columns: number; rows: number }, indices: Uint8Array, palette: readonly string[]): ImageNode {
  const png = encodeIndexedPng(indices, palette, grid.columns, grid.rows);
  return { kind: 'image', id, role: 'raster', ...box, href: `data:image/png;base64,${png.toString('base64')}`, grid };
}
