import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { aroundPoint, dodge1d, placeLabels, type DodgeItem } from '../../src/layout/place-labels.js';
import type { Box } from '../../src/scene/types.js';
import { runs } from '../helpers.js';

const EPS = 1e-6;
const overlaps = (a: Box, b: Box) =>
  a.x < b.x + b.width - EPS && b.x < a.x + a.width - EPS && a.y < b.y + b.height - EPS && b.y < a.y + a.height - EPS;
const within = (b: Box, o: Box) =>
  b.x >= o.x - EPS && b.y >= o.y - EPS && b.x + b.width <= o.x + o.width + EPS && b.y + b.height <= o.y + o.height + EPS;
const sumSquares = (items: readonly DodgeItem[], at: ReadonlyMap<string, number>) =>
  items.reduce((s, it) => s + (at.get(it.id)! - it.want) ** 2, 0);

/** A feasible layout by a different route: push down from the top, then back up from the bottom. */
function sweep(items: readonly DodgeItem[], min: number, max: number, gap: number): Map<string, number> {
  const sorted = [...items].sort((a, b) => a.want - b.want || (a.id < b.id ? -1 : 1));
  const at = sorted.map((it) => it.want);
  for (let i = 0; i < at.length; i++) {
    const floor = i === 0 ? min + sorted[0]!.size / 2 : at[i - 1]! + (sorted[i - 1]!.size + sorted[i]!.size) / 2 + gap;
    at[i] = Math.max(at[i]!, floor);
  }
  for (let i = at.length - 1; i >= 0; i--) {
    const ceil = i === at.length - 1 ? max - sorted[i]!.size / 2 : at[i + 1]! - (sorted[i + 1]!.size + sorted[i]!.size) / 2 - gap;
    at[i] = Math.min(at[i]!, ceil);
  }
  return new Map(sorted.map((it, i) => [it.id, at[i]!]));
}

// Tenths of a px, spread evenly: fc.double crowds its values near zero, where the bounds alone
// would separate the labels and hide a broken dodge.
const tenths = (min: number, max: number) => fc.integer({ min: min * 10, max: max * 10 }).map((v) => v / 10);
/**
 * The least-squares dodge by another route: the max–min formula for isotonic regression,
 * fit(i) = max over j ≤ i of min over k ≥ i of mean(y[j..k]) (Barlow, Bartholomew, Bremner &
 * Brunk 1972, Statistical Inference under Order Restrictions, ch. 1), O(n³), then clamped.
 */
function maxMinDodge(items: readonly DodgeItem[], min: number, max: number, gap: number): number[] {
  const sorted = [...items].sort((a, b) => a.want - b.want || (a.id < b.id ? -1 : 1));
  const offsets = sorted.map((_, i) => sorted.slice(1, i + 1).reduce((s, it, k) => s + (sorted[k]!.size + it.size) / 2 + gap, 0));
  const y = sorted.map((it, i) => it.want - offsets[i]!);
  const mean = (j: number, k: number) => y.slice(j, k + 1).reduce((s, v) => s + v, 0) / (k - j + 1);
  const lower = min + sorted[0]!.size / 2;
  const upper = max - sorted[sorted.length - 1]!.size / 2 - offsets[offsets.length - 1]!;
  return y.map((_, i) => {
    let best = -Infinity;
    for (let j = 0; j <= i; j++) {
      let low = Infinity;
      for (let k = i; k < y.length; k++) low = Math.min(low, mean(j, k));
      best = Math.max(best, low);
    }
    return Math.max(lower, Math.min(upper, best)) + offsets[i]!;
  });
}

const dodgeInput = fc.record({
  wants: fc.array(fc.record({ want: tenths(-50, 450), size: tenths(1, 30) }), { maxLength: 25 }),
  gap: tenths(0, 6),
}).map(({ wants, gap }) => ({ gap, items: wants.map((w, i) => ({ id: `s${i}`, ...w })) }));

describe('dodge1d (line-end labels)', () => {
  it('spreads two labels that want one spot symmetrically about it', () => {
    const { placed, fits } = dodge1d([{ id: 'a', want: 50, size: 10 }, { id: 'b', want: 50, size: 10 }], 0, 100, 2);
    expect(fits).toBe(true);
    expect(placed.map((p) => p.at)).toEqual([44, 56]);
  });

  it('keeps a label inside the bounds and flags a move beyond the threshold for a leader line', () => {
    const { placed } = dodge1d([{ id: 'low', want: 2, size: 10 }, { id: 'mid', want: 50, size: 10 }], 0, 100, 2, 2);
    expect(placed).toEqual([
      { id: 'low', at: 5, shift: 3, moved: true },
      { id: 'mid', at: 50, shift: 0, moved: false },
    ]);
  });

  it('says when the labels cannot fit at all', () => {
    const items = ['a', 'b', 'c'].map((id) => ({ id, want: 50, size: 40 }));
    expect(dodge1d(items, 0, 100, 0).fits).toBe(false);
  });

  it('property: keeps order, no overlaps, inside bounds, deterministic', () => {
    fc.assert(fc.property(dodgeInput, ({ items, gap }) => {
      const { placed, fits } = dodge1d(items, 0, 400, gap);
      expect(dodge1d(items, 0, 400, gap)).toEqual({ placed, fits });
      const size = new Map(items.map((it) => [it.id, it.size]));
      const want = new Map(items.map((it) => [it.id, it.want]));
      for (let i = 1; i < placed.length; i++) expect(want.get(placed[i]!.id)!).toBeGreaterThanOrEqual(want.get(placed[i - 1]!.id)!);
      if (!fits) return;
      for (const p of placed) {
        expect(p.at - size.get(p.id)! / 2).toBeGreaterThanOrEqual(-EPS);
        expect(p.at + size.get(p.id)! / 2).toBeLessThanOrEqual(400 + EPS);
      }
      for (let i = 1; i < placed.length; i++) {
        const [a, b] = [placed[i - 1]!, placed[i]!];
        expect(b.at - a.at).toBeGreaterThanOrEqual((size.get(a.id)! + size.get(b.id)!) / 2 + gap - EPS);
      }
    }), { numRuns: runs(500) });
  });

  it('property: matches the max–min formula for the least-squares fit', () => {
    fc.assert(fc.property(dodgeInput, ({ items, gap }) => {
      const { placed, fits } = dodge1d(items.slice(0, 10), 0, 400, gap);
      if (!fits || placed.length === 0) return;
      const reference = maxMinDodge(items.slice(0, 10), 0, 400, gap);
      placed.forEach((p, i) => expect(p.at).toBeCloseTo(reference[i]!, 6));
    }), { numRuns: runs(300) });
  });

  it('property: moves no label that is already clear, and displaces less than a push-down sweep', () => {
    fc.assert(fc.property(dodgeInput, ({ items, gap }) => {
      const { placed, fits } = dodge1d(items, 0, 400, gap);
      if (!fits) return;
      const at = new Map(placed.map((p) => [p.id, p.at]));
      expect(sumSquares(items, at)).toBeLessThanOrEqual(sumSquares(items, sweep(items, 0, 400, gap)) + 1e-6);
      // Already clear: the sweep leaves every label where it wants to be.
      const clear = [...sweep(items, 0, 400, gap)].every(([id, p]) => p === want(items, id));
      if (clear) for (const p of placed) expect(p.shift).toBeLessThan(1e-9);
    }), { numRuns: runs(500) });
  });
});

const want = (items: readonly DodgeItem[], id: string) => items.find((it) => it.id === id)!.want;

const bounds: Box = { x: 0, y: 0, width: 300, height: 200 };
const labelInput = fc.record({
  points: fc.array(fc.record({
    x: tenths(0, 300), y: tenths(0, 200), w: tenths(5, 60), h: tenths(6, 16),
  }), { maxLength: 60 }),
  obstacles: fc.array(fc.record({
    x: tenths(-20, 300), y: tenths(-20, 200), width: tenths(1, 60), height: tenths(1, 60),
  }), { maxLength: 8 }),
});

describe('placeLabels (scattered labels)', () => {
  it('takes the first free place: right, then left when the right is blocked', () => {
    const candidates = [{ id: 'p', boxes: aroundPoint(100, 100, 40, 10, 3) }];
    expect(placeLabels(candidates, [], bounds).placed[0]).toMatchObject({ candidate: 0, box: { x: 103, y: 95 } });
    const blocked = placeLabels(candidates, [{ x: 110, y: 90, width: 10, height: 20 }], bounds);
    expect(blocked.placed[0]).toMatchObject({ candidate: 1, box: { x: 57, y: 95 } });
  });

  it('returns a label with no free place as unplaced instead of drawing it over another', () => {
    const first = { id: 'first', boxes: [{ x: 10, y: 10, width: 50, height: 10 }] };
    const second = { id: 'second', boxes: [{ x: 30, y: 15, width: 50, height: 10 }, { x: 290, y: 15, width: 50, height: 10 }] };
    expect(placeLabels([first, second], [], bounds)).toEqual({ placed: [{ id: 'first', box: first.boxes[0], candidate: 0 }], unplaced: ['second'] });
  });

  it('lets labels that only touch share an edge', () => {
    const a = { id: 'a', boxes: [{ x: 0, y: 0, width: 50, height: 10 }] };
    const b = { id: 'b', boxes: [{ x: 50, y: 0, width: 50, height: 10 }] };
    expect(placeLabels([a, b], [], bounds).unplaced).toEqual([]);
  });

  it('property: placed labels overlap nothing, stay in bounds, and every unplaced one had no free place', () => {
    fc.assert(fc.property(labelInput, ({ points, obstacles }) => {
      const candidates = points.map((p, i) => ({ id: `l${i}`, boxes: aroundPoint(p.x, p.y, p.w, p.h, 3) }));
      const result = placeLabels(candidates, obstacles, bounds);
      expect(placeLabels(candidates, obstacles, bounds)).toEqual(result);
      expect(result.placed.length + result.unplaced.length).toBe(candidates.length);
      const boxes = result.placed.map((p) => p.box);
      for (const [i, b] of boxes.entries()) {
        expect(within(b, bounds)).toBe(true);
        expect(obstacles.some((o) => overlaps(b, o))).toBe(false);
        for (const c of boxes.slice(i + 1)) expect(overlaps(b, c)).toBe(false);
      }
      for (const id of result.unplaced) {
        for (const b of candidates.find((c) => c.id === id)!.boxes) {
          expect(!within(b, bounds) || obstacles.some((o) => overlaps(b, o)) || boxes.some((c) => overlaps(b, c))).toBe(true);
        }
      }
    }), { numRuns: runs(300) });
  });
});
