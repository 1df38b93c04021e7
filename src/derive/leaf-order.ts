import { childrenOf, type ClusterTree } from './hclust.js';

/** The sum of distances between neighbouring items of an order: what optimal leaf ordering minimizes. */
export function orderCost(order: readonly number[], d: Float64Array, n: number): number {
  let cost = 0;
  for (let i = 1; i < order.length; i++) cost += d[order[i - 1]! * n + order[i]!]!;
  return cost;
}

/** Each node's items, in the tree's own (left, right) order, indexed by node id. */
function leavesOf(children: readonly ([number, number] | undefined)[], n: number): number[][] {
  const leaves: number[][] = [];
  children.forEach((c, v) => { leaves[v] = v < n ? [v] : [...leaves[c![0]]!, ...leaves[c![1]]!]; });
  return leaves;
}

/**
 * The items that may end node v's order next to u when u is at its other end: the items of
 * the child of v that does not hold u (side[] marked for v); an item alone is its own end.
 */
function outerOf(v: number, u: number, children: readonly ([number, number] | undefined)[], leaves: readonly number[][], side: Int32Array): readonly number[] {
  const c = children[v];
  if (!c) return [u];
  return side[u] === c[0] ? leaves[c[1]]! : leaves[c[0]]!;
}

/**
 * Optimal leaf ordering (Bar-Joseph, Gifford & Jaakkola 2001, Bioinformatics 17 Suppl 1): of the
 * 2^(n−1) orders a tree allows by flipping its nodes, the one with the least sum of distances
 * between neighbours (their criterion with similarity = −distance). Dynamic programme over the
 * tree: M(v, u, w) is the cheapest order of v's items from u to w, with u and w in different
 * children of v, so each pair of items has one M, stored in an n × n table. For each u, the best
 * join into each k of the right child is found first, which makes it O(n³) at worst and much
 * less on balanced trees. Ties go to the first pair found (lowest positions in the tree's order).
 */
export function optimalLeafOrder(tree: ClusterTree, d: Float64Array): number[] {
  const { n } = tree;
  if (n <= 2) return Array.from({ length: n }, (_, i) => i);
  const children = childrenOf(tree);
  const leaves = leavesOf(children, n);
  const M = new Float64Array(n * n);
  // side[u] while processing a node: the child of that node holding u.
  const side = new Int32Array(n);
  const T = new Float64Array(n);
  for (let v = n; v < children.length; v++) {
    const [l, r] = children[v]!;
    markSides(l, children, leaves, side);
    markSides(r, children, leaves, side);
    for (const u of leaves[l]!) {
      const ms = outerOf(l, u, children, leaves, side);
      for (const k of leaves[r]!) {
        let best = Infinity;
        for (const m of ms) { const c = M[u * n + m]! + d[m * n + k]!; if (c < best) best = c; }
        T[k] = best;
      }
      for (const w of leaves[r]!) {
        let best = Infinity;
        for (const k of outerOf(r, w, children, leaves, side)) { const c = T[k]! + M[k * n + w]!; if (c < best) best = c; }
        M[u * n + w] = M[w * n + u] = best;
      }
    }
  }
  return unwind(children.length - 1, children, leaves, M, d, n, side);
}

/** Records, for every item under node c, which child of c holds it (nothing for an item alone). */
function markSides(c: number, children: readonly ([number, number] | undefined)[], leaves: readonly number[][], side: Int32Array): void {
  const kids = children[c];
  if (!kids) return;
  for (const x of leaves[kids[0]]!) side[x] = kids[0];
  for (const x of leaves[kids[1]]!) side[x] = kids[1];
}

/** The order of the root's items: the cheapest ends, then each node's halves joined at their best pair, top down. */
function unwind(root: number, children: readonly ([number, number] | undefined)[], leaves: readonly number[][], M: Float64Array, d: Float64Array, n: number, side: Int32Array): number[] {
  const [l, r] = children[root]!;
  let [bu, bw, best] = [-1, -1, Infinity];
  for (const u of leaves[l]!) for (const w of leaves[r]!) if (M[u * n + w]! < best) [bu, bw, best] = [u, w, M[u * n + w]!];
  const order: number[] = [];
  // Explicit stack (deep trees from single linkage would overflow recursion): [node, first item, last item].
  const stack: [number, number, number][] = [[root, bu, bw]];
  while (stack.length) {
    const [v, u, w] = stack.pop()!;
    const kids = children[v];
    if (!kids) { order.push(u); continue; }
    const [a, b] = leaves[kids[0]]!.includes(u) ? kids : [kids[1], kids[0]];
    markSides(a, children, leaves, side);
    const ms = outerOf(a, u, children, leaves, side);
    markSides(b, children, leaves, side);
    const ks = outerOf(b, w, children, leaves, side);
    let [bm, bk, cost] = [-1, -1, Infinity];
    for (const m of ms) for (const k of ks) {
      const c = M[u * n + m]! + d[m * n + k]! + M[k * n + w]!;
      if (c < cost) [bm, bk, cost] = [m, k, c];
    }
    stack.push([b, bk, w], [a, u, bm]);
  }
  return order;
}
