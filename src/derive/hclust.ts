/** How the distance between two clusters follows from the distances of their members. */
export type LinkageName = 'single' | 'complete' | 'average' | 'ward';

/**
 * One merge: the two nodes joined and the linkage distance at which they were. Nodes 0 … n−1 are
 * the items; merge k creates node n + k.
 */
export interface Merge {
  a: number;
  b: number;
  height: number;
  /** Items under the new node. */
  size: number;
}

/** A binary tree over n items, as its merges in the order they were made (heights never decrease for these linkages). */
export interface ClusterTree {
  n: number;
  merges: Merge[];
}

/**
 * A linkage as a Lance–Williams update: the distance from the union of clusters i and j to
 * cluster k, from d(k,i), d(k,j), d(i,j) and the sizes.
 */
type Update = (dki: number, dkj: number, dij: number, ni: number, nj: number, nk: number) => number;

/**
 * The linkages as values. Ward is Ward's minimum-variance criterion on Euclidean distances: the
 * update runs on squared distances and heights are their roots (R's `ward.D2`, ml-hclust's `ward2`).
 */
export const LINKAGES: Record<LinkageName, Update> = {
  single: (dki, dkj) => Math.min(dki, dkj),
  complete: (dki, dkj) => Math.max(dki, dkj),
  average: (dki, dkj, _dij, ni, nj) => (ni * dki + nj * dkj) / (ni + nj),
  ward: (dki, dkj, dij, ni, nj, nk) => Math.sqrt(Math.max(0, ((ni + nk) * dki * dki + (nj + nk) * dkj * dkj - nk * dij * dij) / (ni + nj + nk))),
};

/** The nearest other active slot of slot i: the smallest distance, ties to the lowest slot. */
function nearest(d: Float64Array, n: number, active: Uint8Array, i: number): { j: number; dist: number } {
  let j = -1, dist = Infinity;
  for (let k = 0; k < n; k++) {
    if (k === i || !active[k]) continue;
    const v = d[i * n + k]!;
    if (v < dist) { j = k; dist = v; }
  }
  return { j, dist };
}

/**
 * Agglomerative hierarchical clustering over a distance matrix (row-major n × n; it is copied,
 * not changed). Each step merges the closest pair of clusters; every nearest neighbour is kept
 * exact, so ties are broken the same way on every run: the lowest slot (items keep their input
 * position, a merged cluster takes the lower slot of its two) whose nearest neighbour is at the
 * smallest distance, with that neighbour (the lowest slot among equals). O(n²) memory; O(n²)
 * time in the usual case, O(n³) at worst.
 */
export function hclust(dist: Float64Array, n: number, linkage: LinkageName): ClusterTree {
  const d = Float64Array.from(dist);
  const update = LINKAGES[linkage];
  const active = new Uint8Array(n).fill(1);
  const node = Int32Array.from({ length: n }, (_, i) => i);
  const size = new Int32Array(n).fill(1);
  const nn = Array.from({ length: n }, (_, i) => nearest(d, n, active, i));
  const merges: Merge[] = [];
  for (let step = 0; step < n - 1; step++) {
    let i = -1;
    for (let k = 0; k < n; k++) if (active[k] && (i < 0 || nn[k]!.dist < nn[i]!.dist)) i = k;
    const j = nn[i]!.j;
    const [lo, hi] = i < j ? [i, j] : [j, i];
    const dij = d[lo * n + hi]!;
    merges.push({ a: node[lo]!, b: node[hi]!, height: dij, size: size[lo]! + size[hi]! });
    active[hi] = 0;
    for (let k = 0; k < n; k++) {
      if (!active[k] || k === lo) continue;
      const v = update(d[k * n + lo]!, d[k * n + hi]!, dij, size[lo]!, size[hi]!, size[k]!);
      d[k * n + lo] = d[lo * n + k] = v;
    }
    node[lo] = n + step;
    size[lo] = size[lo]! + size[hi]!;
    nn[lo] = nearest(d, n, active, lo);
    for (let k = 0; k < n; k++) {
      if (!active[k] || k === lo) continue;
      const cur = nn[k]!;
      if (cur.j === lo || cur.j === hi || d[k * n + lo]! <= cur.dist) nn[k] = nearest(d, n, active, k);
    }
  }
  return { n, merges };
}

/** The children of every node (items have none), indexed by node id. */
export function childrenOf(tree: ClusterTree): ([number, number] | undefined)[] {
  const out: ([number, number] | undefined)[] = new Array(tree.n).fill(undefined);
  for (const m of tree.merges) out.push([m.a, m.b]);
  return out;
}
