import { childrenOf, type ClusterTree } from './hclust.js';

/** The sum of distances between neighbouring items of an order: what optimal leaf ordering minimizes. */
export function orderCost(order: readonly number[], d: Float64Array, n: number): number {
  let cost = 0;
  for (let i = 1; i < order.length; i++) cost += d[order[i - 1]! * n + order[i]!]!;
  return cost;
}

/** The tree with its items renumbered by their place in the tree's own order, so every subtree is a range [start, end) split at `split`. */
interface RangeTree {
  order: number[];
  start: Int32Array;
  split: Int32Array;
  end: Int32Array;
  children: ([number, number] | undefined)[];
}

function rangeTree(tree: ClusterTree): RangeTree {
  const children = childrenOf(tree);
  const size = children.length;
  const [start, split, end] = [new Int32Array(size), new Int32Array(size), new Int32Array(size)];
  const order: number[] = [];
  // Explicit stack: a chain from single linkage is n deep.
  const stack: [number, boolean][] = [[size - 1, false]];
  while (stack.length) {
    const [v, done] = stack.pop()!;
    const c = children[v];
    if (!c) { start[v] = split[v] = order.length; order.push(v); end[v] = order.length; continue; }
    if (done) { start[v] = start[c[0]]!; split[v] = start[c[1]]!; end[v] = end[c[1]]!; continue; }
    stack.push([v, true], [c[1], false], [c[0], false]);
  }
  return { order, start, split, end, children };
}

/** The items that may end child c next to position u (inside c): the other half of c, or u alone when c is an item. */
function otherHalf(t: RangeTree, c: number, u: number): [number, number] {
  if (!t.children[c]) return [u, u + 1];
  return u < t.split[c]! ? [t.split[c]!, t.end[c]!] : [t.start[c]!, t.split[c]!];
}

/**
 * Optimal leaf ordering (Bar-Joseph, Gifford & Jaakkola 2001, Bioinformatics 17 Suppl 1): of the
 * 2^(n−1) orders a tree allows by flipping its nodes, the one with the least sum of distances
 * between neighbours (their criterion with similarity = −distance). Dynamic programme over the
 * tree: M(u, w) is the cheapest order of the smallest subtree holding u and w that starts at u
 * and ends at w, so one n × n table holds every M. Items are renumbered so each subtree is a
 * range; for each u the best join into each k of the right child is found first, which makes it
 * O(n³) at worst and far less on balanced trees. Ties go to the first pair in the tree's order.
 */
export function optimalLeafOrder(tree: ClusterTree, dist: Float64Array): number[] {
  const { n } = tree;
  if (n <= 2) return Array.from({ length: n }, (_, i) => i);
  const t = rangeTree(tree);
  const d = new Float64Array(n * n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) d[i * n + j] = dist[t.order[i]! * n + t.order[j]!]!;
  const M = new Float64Array(n * n);
  const T = new Float64Array(n);
  for (let v = n; v < t.children.length; v++) {
    const [l, r] = t.children[v]!;
    const [s, c] = [t.split[v]!, t.end[v]!];
    for (let u = t.start[v]!; u < s; u++) {
      const [m0, m1] = otherHalf(t, l, u);
      for (let k = s; k < c; k++) {
        let best = Infinity;
        for (let m = m0; m < m1; m++) { const x = M[u * n + m]! + d[k * n + m]!; if (x < best) best = x; }
        T[k] = best;
      }
      for (let w = s; w < c; w++) {
        const [k0, k1] = otherHalf(t, r, w);
        let best = Infinity;
        for (let k = k0; k < k1; k++) { const x = T[k]! + M[w * n + k]!; if (x < best) best = x; }
        M[u * n + w] = M[w * n + u] = best;
      }
    }
  }
  return unwind(t, M, d, n).map((i) => t.order[i]!);
}

/** The order of the root's items (renumbered): the cheapest ends, then each node's halves joined at their best pair, top down. */
function unwind(t: RangeTree, M: Float64Array, d: Float64Array, n: number): number[] {
  const root = t.children.length - 1;
  let [bu, bw, best] = [-1, -1, Infinity];
  for (let u = 0; u < t.split[root]!; u++) for (let w = t.split[root]!; w < n; w++) if (M[u * n + w]! < best) [bu, bw, best] = [u, w, M[u * n + w]!];
  const order: number[] = [];
  const stack: [number, number, number][] = [[root, bu, bw]];
  while (stack.length) {
    const [v, u, w] = stack.pop()!;
    const kids = t.children[v];
    if (!kids) { order.push(u); continue; }
    // u's child comes first; w is in the other.
    const [a, b] = u < t.split[v]! ? kids : [kids[1], kids[0]];
    const [m0, m1] = otherHalf(t, a, u);
    const [k0, k1] = otherHalf(t, b, w);
    let [bm, bk, cost] = [-1, -1, Infinity];
    for (let m = m0; m < m1; m++) for (let k = k0; k < k1; k++) {
      const x = M[u * n + m]! + d[m * n + k]! + M[k * n + w]!;
      if (x < cost) [bm, bk, cost] = [m, k, x];
    }
    stack.push([b, bk, w], [a, u, bm]);
  }
  return order;
}
