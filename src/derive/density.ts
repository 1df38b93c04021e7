import { hexBins, hexCorners } from './hexbin.js';

/** One hexagon of a binned density, in data units: its centre, its corners and how many points it holds. */
export interface DensityBin {
  x: number;
  y: number;
  corners: { x: number; y: number }[];
  count: number;
}

/**
 * Points binned into hexagons that are regular on a plot of `size` px showing the spans `x` and
 * `y` (y upwards): the points are mapped to px, binned (hexBins, nearest centre), and each bin's
 * centre and corners mapped back to data units, so the axes' scales draw them. The lattice is
 * anchored at the top-left corner of the spans, so the same data give the same bins.
 */
export function densityBins(points: readonly { x: number; y: number }[], spans: { x: [number, number]; y: [number, number] }, size: { width: number; height: number }, radius: number): DensityBin[] {
  const [[x0, x1], [y0, y1]] = [spans.x, spans.y];
  const [kx, ky] = [size.width / (x1 - x0), size.height / (y1 - y0)];
  const px = points.map((p) => ({ x: (p.x - x0) * kx, y: (y1 - p.y) * ky }));
  const back = (p: { x: number; y: number }) => ({ x: x0 + p.x / kx, y: y1 - p.y / ky });
  return hexBins(px, radius).map((b) => ({ ...back({ x: b.cx, y: b.cy }), corners: hexCorners(b.cx, b.cy, radius).map(back), count: b.points.length }));
}
