import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { overlapShare, type Disc } from '../../src/derive/overlap.js';
import { runs } from '../helpers.js';

/** Every pair compared: the definition the grid must agree with. */
function bruteForce(discs: Disc[]): number {
  return discs.filter((a, i) => discs.some((b, j) => i !== j && (a.x - b.x) ** 2 + (a.y - b.y) ** 2 < (a.r + b.r) ** 2)).length;
}

describe('overlapShare', () => {
  it('counts the discs that overlap another; touching is not overlapping', () => {
    const discs = [{ x: 0, y: 0, r: 2 }, { x: 3, y: 0, r: 2 }, { x: 20, y: 0, r: 2 }, { x: 24, y: 0, r: 2 }];
    expect(overlapShare(discs)).toEqual({ overlapping: 2, share: 0.5 });
  });

  it('no discs or one disc overlap nothing', () => {
    expect(overlapShare([]).share).toBe(0);
    expect(overlapShare([{ x: 1, y: 1, r: 5 }]).share).toBe(0);
  });

  it('a small disc overlapping only a large one far from its cell is found', () => {
    expect(overlapShare([{ x: 0, y: 0, r: 30 }, { x: 40, y: 0, r: 1 }]).overlapping).toBe(0);
    expect(overlapShare([{ x: 0, y: 0, r: 30 }, { x: 30, y: 0, r: 1 }]).overlapping).toBe(2);
  });

  it('agrees with comparing every pair, on random discs of mixed sizes', () => {
    const disc = fc.record({ x: fc.double({ min: 0, max: 200, noNaN: true }), y: fc.double({ min: 0, max: 100, noNaN: true }), r: fc.double({ min: 0, max: 12, noNaN: true }) });
    fc.assert(fc.property(fc.array(disc, { maxLength: 80 }), (discs) => {
      expect(overlapShare(discs).overlapping).toBe(bruteForce(discs));
    }), { numRuns: runs(200) });
  });

  it('ten thousand discs piled on one spot take one pass, not every pair (all overlap)', () => {
    const discs = Array.from({ length: 10_000 }, (_, i) => ({ x: 50 + (i % 7) * 0.01, y: 50, r: 3 }));
    expect(overlapShare(discs).share).toBe(1);
  });
});
