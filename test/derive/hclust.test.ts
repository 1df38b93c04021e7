import { agnes, type Cluster } from 'ml-hclust';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { distanceMatrix } from '../../src/derive/distance.js';
import { hclust, type ClusterTree, type LinkageName } from '../../src/derive/hclust.js';
import { runs } from '../helpers.js';
import { BACTERIA_DISTANCES, randomMatrix, seeded } from './cluster-fixtures.js';

const heights = (t: ClusterTree) => t.merges.map((m) => m.height);

/** Every internal height of an ml-hclust tree, ascending. */
function mlHeights(c: Cluster): number[] {
  const out: number[] = [];
  const walk = (node: Cluster) => { if (node.isLeaf) return; out.push(node.height); node.children.forEach(walk); };
  walk(c);
  return out.sort((a, b) => a - b);
}

/** Cophenetic distance of every pair: the height of the merge that first joins them. */
function cophenetic(t: ClusterTree): number[] {
  const members: number[][] = Array.from({ length: t.n }, (_, i) => [i]);
  const out = new Array<number>(t.n * t.n).fill(0);
  t.merges.forEach((m, k) => {
    for (const x of members[m.a]!) for (const y of members[m.b]!) out[x * t.n + y] = out[y * t.n + x] = m.height;
    members[t.n + k] = [...members[m.a]!, ...members[m.b]!];
  });
  return out;
}

describe('hierarchical clustering', () => {
  // REFERENCES §8: Wikipedia's worked example; merge heights from R 4.2.2 hclust, ml-hclust 4.0.0 and a naive O(n³) implementation.
  it.each([
    ['single', [17, 21, 21, 28]],
    ['complete', [17, 23, 28, 43]],
    ['average', [17, 22, 28, 33]],
  ] as const)('%s linkage merges the five bacteria at the published heights', (linkage, expected) => {
    expect(heights(hclust(BACTERIA_DISTANCES, 5, linkage))).toEqual(expected);
  });

  it('average linkage builds the published tree (((a,b),e),(c,d))', () => {
    const t = hclust(BACTERIA_DISTANCES, 5, 'average');
    // a=0, b=1, c=2, d=3, e=4; merges create nodes 5, 6, 7, 8.
    expect(t.merges.map((m) => [m.a, m.b])).toEqual([[0, 1], [5, 4], [2, 3], [6, 7]]);
  });

  it('breaks ties the same way whatever the run: single linkage joins c (slot 2) before e (slot 4) at 21', () => {
    const t = hclust(BACTERIA_DISTANCES, 5, 'single');
    expect(t.merges[1]).toMatchObject({ a: 5, b: 2, height: 21 });
    expect(hclust(BACTERIA_DISTANCES, 5, 'single')).toEqual(t);
  });

  it('leaves its input distance matrix unchanged', () => {
    const copy = Float64Array.from(BACTERIA_DISTANCES);
    hclust(copy, 5, 'ward');
    expect(copy).toEqual(BACTERIA_DISTANCES);
  });

  // External check against ml-hclust 4.0.0 (agnes; "ward2" is Ward's criterion on Euclidean distances, as R's ward.D2).
  const methods: Record<LinkageName, 'single' | 'complete' | 'average' | 'ward2'> = { single: 'single', complete: 'complete', average: 'average', ward: 'ward2' };
  it.each(Object.keys(methods) as LinkageName[])('%s linkage gives ml-hclust\'s merge heights and cophenetic distances on random matrices', (linkage) => {
    fc.assert(fc.property(fc.integer({ min: 2, max: 30 }), fc.integer({ min: 1, max: 6 }), fc.integer(), (rows, columns, seed) => {
      const m = randomMatrix(rows, columns, seeded(seed));
      const { d } = distanceMatrix(m, 'euclidean');
      const ours = hclust(d, rows, linkage);
      const theirs = agnes(m.map((r) => [...r]), { method: methods[linkage] });
      const expected = mlHeights(theirs);
      heights(ours).forEach((h, i) => expect(h).toBeCloseTo(expected[i]!, 9));
      // Cophenetic distances do not depend on the order of tied merges.
      const leafPairs = new Map<string, number>();
      const walk = (node: Cluster): number[] => {
        if (node.isLeaf) return [node.index];
        const parts = node.children.map(walk);
        for (const x of parts[0]!) for (const y of parts[1]!) leafPairs.set(`${Math.min(x, y)},${Math.max(x, y)}`, node.height);
        return parts.flat();
      };
      walk(theirs);
      const coph = cophenetic(ours);
      for (const [key, h] of leafPairs) {
        const [x, y] = key.split(',').map(Number) as [number, number];
        expect(coph[x * rows + y]).toBeCloseTo(h, 9);
      }
    }), { numRuns: runs(40) });
  });

  it('merge heights never decrease for the four linkages', () => {
    const m = randomMatrix(60, 5, seeded(7));
    const { d } = distanceMatrix(m, 'euclidean');
    for (const linkage of ['single', 'complete', 'average', 'ward'] as const) {
      const h = heights(hclust(d, 60, linkage));
      h.slice(1).forEach((x, i) => expect(x).toBeGreaterThanOrEqual(h[i]! - 1e-9));
    }
  });
});
