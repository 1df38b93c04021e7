import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { distanceMatrix } from '../../src/derive/distance.js';
import { childrenOf, hclust, type ClusterTree } from '../../src/derive/hclust.js';
import { optimalLeafOrder, orderCost } from '../../src/derive/leaf-order.js';
import { runs } from '../helpers.js';
import { BACTERIA, BACTERIA_DISTANCES, randomMatrix, seeded } from './cluster-fixtures.js';

/** Every order the tree allows, by flipping each of its nodes (brute force, 2^(n−1) orders). */
function allFlips(tree: ClusterTree): number[][] {
  const children = childrenOf(tree);
  const orders = (v: number): number[][] => {
    const c = children[v];
    if (!c) return [[v]];
    const [ls, rs] = [orders(c[0]), orders(c[1])];
    return ls.flatMap((l) => rs.flatMap((r) => [[...l, ...r], [...r, ...l]]));
  };
  return orders(children.length - 1);
}

/** True when `inner` is a run of consecutive entries of `order`: a subtree's items stay together. */
const contiguous = (order: number[], inner: number[]) => {
  const at = inner.map((x) => order.indexOf(x)).sort((a, b) => a - b);
  return at[at.length - 1]! - at[0]! === inner.length - 1;
};

describe('optimal leaf ordering', () => {
  it('orders the five bacteria e b a c d (or its reverse), cost 87', () => {
    // REFERENCES §8: brute force over the 16 orders of the UPGMA tree; Bar-Joseph et al. 2001's criterion with similarity = −distance.
    const tree = hclust(BACTERIA_DISTANCES, 5, 'average');
    const order = optimalLeafOrder(tree, BACTERIA_DISTANCES);
    const names = order.map((i) => BACTERIA[i]).join(' ');
    expect(['e b a c d', 'd c a b e']).toContain(names);
    expect(orderCost(order, BACTERIA_DISTANCES, 5)).toBe(87);
  });

  it('finds the cheapest of all flips on random trees of up to 8 items (brute force)', () => {
    fc.assert(fc.property(fc.integer({ min: 1, max: 8 }), fc.integer({ min: 1, max: 4 }), fc.constantFrom('single', 'complete', 'average', 'ward' as const), fc.integer(), (n, columns, linkage, seed) => {
      const { d } = distanceMatrix(randomMatrix(n, columns, seeded(seed)), 'euclidean');
      const tree = hclust(d, n, linkage);
      const order = optimalLeafOrder(tree, d);
      const best = Math.min(...allFlips(tree).map((o) => orderCost(o, d, n)));
      expect(orderCost(order, d, n)).toBeCloseTo(best, 9);
      // The order is one the tree allows: a permutation whose every subtree is contiguous.
      expect([...order].sort((a, b) => a - b)).toEqual(Array.from({ length: n }, (_, i) => i));
      const children = childrenOf(tree);
      const under = (v: number): number[] => (children[v] ? [...under(children[v]![0]), ...under(children[v]![1])] : [v]);
      for (let v = n; v < children.length; v++) expect(contiguous(order, under(v))).toBe(true);
    }), { numRuns: runs(150) });
  });

  it('handles a chain 400 deep (single linkage on points on a line) without running out of stack', () => {
    const m = Array.from({ length: 400 }, (_, i) => Float64Array.of(i * i));
    const { d } = distanceMatrix(m, 'euclidean');
    const order = optimalLeafOrder(hclust(d, 400, 'single'), d);
    expect(order).toHaveLength(400);
    // Points on a line are best read in their own order: the cost is the span.
    expect(orderCost(order, d, 400)).toBeCloseTo(399 * 399, 6);
  });
});
