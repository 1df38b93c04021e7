/** One hexagonal bin: its lattice position, its centre in px, and the points (by index) it holds. */
export interface HexBin {
  /** Column and row on the lattice. */
  i: number;
  j: number;
  cx: number;
  cy: number;
  /** Indexes of the points in the bin, ascending. */
  points: number[];
}

/**
 * The lattice of pointy-top hexagons of circumradius r with a centre at (0, 0): columns √3·r
 * apart, rows 1.5·r apart, odd rows shifted by half a column (Carr et al., JASA 1987; the same
 * lattice as d3-hexbin).
 */
function lattice(r: number) {
  const dx = Math.sqrt(3) * r;
  const dy = 1.5 * r;
  const centre = (i: number, j: number) => ({ x: i * dx + (j & 1 ? dx / 2 : 0), y: j * dy });
  return { dx, dy, centre };
}

/**
 * The nearest lattice centre of a point, exactly: it lies in one of the two rows around the
 * point (any other row is at least 1.5·r away, farther than the circumradius), at the column
 * nearest in that row. Ties go to the upper row, then the left column.
 */
export function nearestHex(x: number, y: number, r: number): { i: number; j: number } {
  const { dx, dy, centre } = lattice(r);
  const j0 = Math.floor(y / dy);
  let best = { i: 0, j: 0, d: Infinity };
  for (const j of [j0, j0 + 1]) {
    const i = Math.round((x - (j & 1 ? dx / 2 : 0)) / dx);
    const c = centre(i, j);
    const d = (x - c.x) ** 2 + (y - c.y) ** 2;
    if (d < best.d) best = { i, j, d };
  }
  return { i: best.i, j: best.j };
}

/**
 * Points binned into hexagons of circumradius r (px) on a lattice anchored at `origin`, each point
 * in the bin of its nearest centre (d3-hexbin breaks ties between rows by a non-Euclidean
 * distance and misplaces about 2 % of points, REFERENCES §10). Bins come row by row, left to
 * right; every point is in exactly one bin.
 */
export function hexBins(points: readonly { x: number; y: number }[], r: number, origin: { x: number; y: number } = { x: 0, y: 0 }): HexBin[] {
  const { centre } = lattice(r);
  const bins = new Map<string, HexBin>();
  points.forEach((p, index) => {
    const { i, j } = nearestHex(p.x - origin.x, p.y - origin.y, r);
    const key = `${i},${j}`;
    let bin = bins.get(key);
    if (!bin) {
      const c = centre(i, j);
      bin = { i, j, cx: origin.x + c.x, cy: origin.y + c.y, points: [] };
      bins.set(key, bin);
    }
    bin.points.push(index);
  });
  return [...bins.values()].sort((a, b) => a.j - b.j || a.i - b.i);
}

/** The six corners of a pointy-top hexagon of circumradius r around (cx, cy), from the top, clockwise. */
export function hexCorners(cx: number, cy: number, r: number): { x: number; y: number }[] {
  const h = (Math.sqrt(3) * r) / 2;
  return [[0, -r], [h, -r / 2], [h, r / 2], [0, r], [-h, r / 2], [-h, -r / 2]].map(([x, y]) => ({ x: cx + x!, y: cy + y! }));
}

/**
 * Classes for counts from 1 to `max`, as inclusive integer ranges: breaks at round values
 * (1, 2, 5 × 10ⁿ; else 1, 3 × 10ⁿ; else powers of ten), the finest series that gives at most
 * `most` classes. Counts of a density are skewed, so the classes grow geometrically (common
 * practice for binned densities). The last class ends at `max`.
 */
export function countClasses(max: number, most: number): { from: number; to: number }[] {
  const top = Math.max(1, Math.ceil(max));
  let classes: { from: number; to: number }[] = [];
  for (const mantissas of [[1, 2, 5], [1, 3], [1]]) {
    const breaks: number[] = [];
    for (let p = 1; p <= top; p *= 10) for (const m of mantissas) if (m * p <= top) breaks.push(m * p);
    classes = breaks.map((from, k) => ({ from, to: (breaks[k + 1] ?? top + 1) - 1 }));
    if (classes.length <= most) return classes;
  }
  return classes;
}
