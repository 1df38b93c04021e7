import { distanceMatrix, standardizeRows, type DistanceName } from './distance.js';
import { hclust, type ClusterTree, type LinkageName } from './hclust.js';
import { optimalLeafOrder } from './leaf-order.js';
import { vectorsOf, type ValueMatrix } from './matrix.js';

/** How one side of a matrix (its rows, or its columns) is clustered. */
export interface ClusterOptions {
  linkage: LinkageName;
  distance: DistanceName;
  /** Standardize each row of the matrix (mean 0, sd 1) before rows and columns are compared. */
  standardize: boolean;
}

/** One side of a matrix clustered: its tree, the order of its items, and what missing cells did. */
export interface ClusteredAxis {
  tree: ClusterTree;
  /** Item indexes in drawing order (the optimal leaf order). */
  order: number[];
  /** Pairs compared over fewer cells because of missing ones, and pairs with nothing to compare. */
  partialPairs: number;
  undefinedPairs: number;
}

/**
 * Clusters vectors (NaN = missing) and orders them: distances (pairwise-complete), agglomerative
 * clustering, then optimal leaf ordering of the tree, so similar neighbours sit side by side.
 */
export function clusterAxis(vectors: readonly Float64Array[], options: Omit<ClusterOptions, 'standardize'>): ClusteredAxis {
  const dm = distanceMatrix(vectors, options.distance);
  const tree = hclust(dm.d, dm.n, options.linkage);
  return { tree, order: optimalLeafOrder(tree, dm.d), partialPairs: dm.partialPairs, undefinedPairs: dm.undefinedPairs };
}

/**
 * Each node's position along the axis and height, for drawing a dendrogram: an item sits at its
 * place in `order` (0 … n−1), a merge midway between its two children, at its merge height.
 */
export function dendrogramNodes(axis: Pick<ClusteredAxis, 'tree' | 'order'>): { position: number; height: number }[] {
  const { tree, order } = axis;
  const nodes: { position: number; height: number }[] = new Array(tree.n);
  order.forEach((item, i) => { nodes[item] = { position: i, height: 0 }; });
  tree.merges.forEach((m, k) => { nodes[tree.n + k] = { position: (nodes[m.a]!.position + nodes[m.b]!.position) / 2, height: m.height }; });
  return nodes;
}

/**
 * The sides of a matrix asked for, clustered and ordered: its rows as vectors over the columns,
 * its columns as vectors over the rows (of the standardized rows, when asked; the cells keep
 * their values). A side not asked for is undefined.
 */
export function clusterMatrix(m: Pick<ValueMatrix, 'rows' | 'columns' | 'cells'>, options: ClusterOptions, sides = { rows: true, columns: true }): { rows?: ClusteredAxis; columns?: ClusteredAxis } {
  const rows = vectorsOf(m, false);
  const scaled = options.standardize ? standardizeRows(rows) : rows;
  let cells = m.cells;
  if (options.standardize) {
    cells = new Float64Array(m.cells.length);
    scaled.forEach((r, i) => cells.set(r, i * m.columns.length));
  }
  return {
    ...(sides.rows ? { rows: clusterAxis(scaled, options) } : {}),
    ...(sides.columns ? { columns: clusterAxis(vectorsOf({ ...m, cells }, true), options) } : {}),
  };
}
