/** A mark as a disc in pixels. */
export interface Disc {
  x: number;
  y: number;
  r: number;
}

/** Smallest grid cell used, px: below it, discs are specks and a finer grid only costs time. */
const MIN_CELL = 0.5;

/** Whether two discs overlap: closer than the sum of their radii (touching is not overlapping). */
function overlaps(a: Disc, b: Disc): boolean {
  const dx = a.x - b.x;
  const dy = a.y - b.y;
  const reach = a.r + b.r;
  return dx * dx + dy * dy < reach * reach;
}

/**
 * How many discs overlap at least one other, and that as a share of all: the measure of
 * overplotting. Discs go into a grid whose cell diagonal is at most twice the smallest radius,
 * so two discs in one cell always overlap; a disc alone in its cell is compared with the discs
 * in the cells within reach of the largest radius, stopping at the first overlap found.
 */
export function overlapShare(discs: readonly Disc[]): { overlapping: number; share: number } {
  if (discs.length < 2) return { overlapping: 0, share: 0 };
  let minR = Infinity;
  let maxR = 0;
  for (const d of discs) { minR = Math.min(minR, d.r); maxR = Math.max(maxR, d.r); }
  const cell = Math.max(MIN_CELL, minR * Math.SQRT2);
  const sameCellOverlaps = cell <= minR * Math.SQRT2;
  const grid = new Map<string, number[]>();
  const cellOf = (d: Disc) => [Math.floor(d.x / cell), Math.floor(d.y / cell)] as const;
  discs.forEach((d, i) => {
    const [cx, cy] = cellOf(d);
    const key = `${cx},${cy}`;
    const list = grid.get(key);
    if (list) list.push(i); else grid.set(key, [i]);
  });
  const reach = Math.ceil((2 * maxR) / cell);
  let overlapping = 0;
  discs.forEach((d, i) => {
    const [cx, cy] = cellOf(d);
    if (sameCellOverlaps && grid.get(`${cx},${cy}`)!.length > 1) { overlapping++; return; }
    for (let gx = cx - reach; gx <= cx + reach; gx++) {
      for (let gy = cy - reach; gy <= cy + reach; gy++) {
        const list = grid.get(`${gx},${gy}`);
        if (list && list.some((j) => j !== i && overlaps(d, discs[j]!))) { overlapping++; return; }
      }
    }
  });
  return { overlapping, share: overlapping / discs.length };
}
