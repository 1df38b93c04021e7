import { describe, expect, it } from 'vitest';
import { clustersAtLargestGap, cutInto } from '../../src/derive/cut-tree.js';
import { hclust } from '../../src/derive/hclust.js';

/** The distance matrix (row-major n × n, as hclust takes it) of points on a line. */
function lineDistances(xs: readonly number[]): Float64Array {
  const n = xs.length;
  const d = new Float64Array(n * n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) d[i * n + j] = Math.abs(xs[i]! - xs[j]!);
  return d;
}

describe('cutting a cluster tree', () => {
  it('finds the three groups of points far apart on a line, and which points form each', () => {
    // Three tight groups 20 apart: merges within them at 1 to 1.5, the first two groups join at 19.5 (average linkage), all three at about 30: the largest gap is below 19.5.
    const xs = [0, 20, 40, 1, 21, 41, 2, 42];
    const tree = hclust(lineDistances(xs), xs.length, 'average');
    const k = clustersAtLargestGap(tree);
    expect(k).toBe(3);
    const ids = cutInto(tree, k!);
    const groups = new Map<number, number[]>();
    ids.forEach((id, i) => groups.set(id, [...(groups.get(id) ?? []), xs[i]!]));
    expect([...groups.values()].map((g) => g.sort((a, b) => a - b))).toEqual([[0, 1, 2], [20, 21], [40, 41, 42]]);
  });

  it('cuts into one cluster per item at k = n and into one at k = 1', () => {
    const tree = hclust(lineDistances([0, 1, 5]), 3, 'single');
    expect(cutInto(tree, 3)).toEqual([0, 1, 2]);
    expect(cutInto(tree, 1)).toEqual([0, 0, 0]);
  });

  it('names no cut for two items or for equal distances throughout', () => {
    expect(clustersAtLargestGap(hclust(lineDistances([0, 1]), 2, 'average'))).toBeUndefined();
    expect(clustersAtLargestGap(hclust(Float64Array.from({ length: 16 }, (_, k) => (k % 5 === 0 ? 0 : 1)), 4, 'average'))).toBeUndefined();
  });
});
