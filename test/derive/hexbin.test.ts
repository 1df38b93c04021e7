import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { densityBins } from '../../src/derive/density.js';
import { countClasses, hexBins, hexCorners, nearestHex } from '../../src/derive/hexbin.js';
import { runs } from '../helpers.js';

const SQ3 = Math.sqrt(3);
const centre = (i: number, j: number, r: number) => ({ x: i * SQ3 * r + (j & 1 ? (SQ3 * r) / 2 : 0), y: j * 1.5 * r });

describe('hexagonal binning', () => {
  it('puts points in the bins of the worked example (REFERENCES §10, d3-hexbin 0.2.2 with r = 1)', () => {
    const bins = hexBins([[0, 0], [0.8, 0], [0, 0.76], [0.9, 0], [0.87, 0.5], [1.7, 0.1], [0.86, 0.74], [0, 1.4], [0.5, 1.2]].map(([x, y]) => ({ x: x!, y: y! })), 1);
    const at = (x: number, y: number) => bins.find((b) => Math.abs(b.cx - x) < 1e-6 && Math.abs(b.cy - y) < 1e-6)!.points;
    expect(at(0, 0)).toEqual([0, 1, 2]);
    expect(at(1.732051, 0)).toEqual([3, 4, 5]);
    expect(at(0.866025, 1.5)).toEqual([6, 7, 8]);
  });

  it('sends the point d3-hexbin misplaces to its nearest centre (REFERENCES §10: (6.0404, 0.5488) → (6.0622, 1.5))', () => {
    const { i, j } = nearestHex(6.0404, 0.5488, 1);
    expect(centre(i, j, 1).x).toBeCloseTo(6.0622, 4);
    expect(centre(i, j, 1).y).toBeCloseTo(1.5, 12);
  });

  it('every point goes to its nearest lattice centre (brute force) and counts are conserved', () => {
    const point = fc.record({ x: fc.double({ min: -50, max: 50, noNaN: true }), y: fc.double({ min: -50, max: 50, noNaN: true }) });
    fc.assert(fc.property(fc.array(point, { minLength: 1, maxLength: 60 }), fc.double({ min: 0.5, max: 8, noNaN: true }), (points, r) => {
      const bins = hexBins(points, r);
      expect(bins.reduce((s, b) => s + b.points.length, 0)).toBe(points.length);
      for (const b of bins) {
        for (const k of b.points) {
          const p = points[k]!;
          const d = Math.hypot(p.x - b.cx, p.y - b.cy);
          // No centre of the lattice near the point is closer.
          const [i0, j0] = [Math.round(p.x / (SQ3 * r)), Math.round(p.y / (1.5 * r))];
          for (let i = i0 - 2; i <= i0 + 2; i++) for (let j = j0 - 2; j <= j0 + 2; j++) {
            const c = centre(i, j, r);
            expect(d).toBeLessThanOrEqual(Math.hypot(p.x - c.x, p.y - c.y) + 1e-9);
          }
        }
      }
    }), { numRuns: runs(150) });
  });

  it('a hexagon has six corners at the circumradius, the first at the top (as d3-hexbin\'s hexagon())', () => {
    const corners = hexCorners(10, 20, 2);
    expect(corners).toHaveLength(6);
    expect(corners[0]).toEqual({ x: 10, y: 18 });
    for (const c of corners) expect(Math.hypot(c.x - 10, c.y - 20)).toBeCloseTo(2, 12);
  });

  it('density bins in data units hold every point and map back onto the spans', () => {
    const points = Array.from({ length: 500 }, (_, k) => ({ x: (k * 37) % 101, y: (k * 53) % 89 }));
    const bins = densityBins(points, { x: [0, 100], y: [0, 90] }, { width: 400, height: 300 }, 7);
    expect(bins.reduce((s, b) => s + b.count, 0)).toBe(500);
    // Corners are the circumradius away from the centre in px: 7 px is 7/4 x-units across, 7/(300/90) y-units down.
    const b = bins[0]!;
    expect(b.y - b.corners[0]!.y).toBeCloseTo(-7 * (90 / 300), 9);
  });
});

describe('count classes of a density', () => {
  it('break at round values, growing geometrically, ending at the largest count', () => {
    expect(countClasses(37, 7)).toEqual([{ from: 1, to: 1 }, { from: 2, to: 4 }, { from: 5, to: 9 }, { from: 10, to: 19 }, { from: 20, to: 37 }]);
    expect(countClasses(1, 7)).toEqual([{ from: 1, to: 1 }]);
  });

  it('fall back to coarser series to stay within the most classes asked for', () => {
    const classes = countClasses(5000, 7);
    expect(classes.length).toBeLessThanOrEqual(7);
    expect(classes[0]!.from).toBe(1);
    expect(classes.at(-1)!.to).toBe(5000);
    for (let k = 1; k < classes.length; k++) expect(classes[k]!.from).toBe(classes[k - 1]!.to + 1);
  });
});
