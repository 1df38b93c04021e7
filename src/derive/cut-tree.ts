import type { ClusterTree } from './hclust.js';

/** The most clusters a cut names (common practice: a reader holds a handful of groups, not dozens). */
export const MAX_CUT_CLUSTERS = 6;

/** Which cluster each item falls in when the tree is cut into k clusters: the first n − k merges applied (union–find), clusters numbered by their first item. */
export function cutInto(tree: ClusterTree, k: number): number[] {
  const { n, merges } = tree;
  const parent = Array.from({ length: 2 * n }, (_, i) => i);
  const find = (i: number): number => { while (parent[i] !== i) { parent[i] = parent[parent[i]!]!; i = parent[i]!; } return i; };
  for (let m = 0; m < n - k; m++) {
    const { a, b } = merges[m]!;
    parent[find(a)] = n + m;
    parent[find(b)] = n + m;
  }
  const ids = new Map<number, number>();
  return Array.from({ length: n }, (_, i) => {
    const root = find(i);
    if (!ids.has(root)) ids.set(root, ids.size);
    return ids.get(root)!;
  });
}

/**
 * The number of clusters to cut a tree into: where the gap between successive merge heights is
 * largest (the merges above it join groups that are far apart), from 2 to MAX_CUT_CLUSTERS;
 * ties to fewer clusters. Undefined for fewer than 3 items or a tree with no gap at all.
 */
export function clustersAtLargestGap(tree: ClusterTree): number | undefined {
  const { n, merges } = tree;
  if (n < 3) return undefined;
  let best: { k: number; gap: number } | undefined;
  for (let k = 2; k <= Math.min(MAX_CUT_CLUSTERS, n - 1); k++) {
    // Cutting into k clusters undoes the last k − 1 merges: the cut lies between merge n − k − 1 and n − k.
    const gap = merges[n - k]!.height - merges[n - k - 1]!.height;
    if (gap > 0 && (!best || gap > best.gap)) best = { k, gap };
  }
  return best?.k;
}
