import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { facetGrid, outerPanels } from '../../src/layout/facet-grid.js';
import type { Box } from '../../src/scene/types.js';
import { runs } from '../helpers.js';

const EPS = 1e-6;

/** Most panels of at least `min` px along `length` px with `gap` between, counted one by one. */
function countAlong(length: number, min: number, gap: number): number {
  let k = 0;
  while ((k + 1) * min + k * gap <= length + EPS) k++;
  return k;
}

describe('facet grid', () => {
  it('follows the frame\'s shape: a wide body puts three panels side by side, a tall one stacks them', () => {
    const opts = { minPanelWidth: 50, minPanelHeight: 50, gap: 0, aspect: 1 };
    const wide = facetGrid({ x: 0, y: 0, width: 900, height: 300 }, 3, opts);
    expect([wide.columns, wide.rows]).toEqual([3, 1]);
    expect(wide.panels).toEqual([0, 300, 600].map((x) => ({ x, y: 0, width: 300, height: 300 })));
    const tall = facetGrid({ x: 0, y: 0, width: 300, height: 900 }, 3, opts);
    expect([tall.columns, tall.rows]).toEqual([1, 3]);
  });

  it('lays panels out row by row with the gap between them', () => {
    const g = facetGrid({ x: 10, y: 20, width: 410, height: 310 }, 4, { minPanelWidth: 50, minPanelHeight: 50, gap: 10, aspect: 4 / 3 });
    expect(g.panels).toEqual([
      { x: 10, y: 20, width: 200, height: 150 }, { x: 220, y: 20, width: 200, height: 150 },
      { x: 10, y: 180, width: 200, height: 150 }, { x: 220, y: 180, width: 200, height: 150 },
    ]);
  });

  it('reports how many panels fit and lays out only those', () => {
    // 2 columns (2 × 200 + 10 ≤ 500 < 3 × 200 + 20) by 2 rows (2 × 150 + 10 ≤ 400 < 3 × 150 + 20).
    const g = facetGrid({ x: 0, y: 0, width: 500, height: 400 }, 7, { minPanelWidth: 200, minPanelHeight: 150, gap: 10 });
    expect(g.fits).toBe(4);
    expect(g.panels).toHaveLength(4);
    expect([g.columns, g.rows]).toEqual([2, 2]);
  });

  it('gives no panels when not even one fits', () => {
    expect(facetGrid({ x: 0, y: 0, width: 100, height: 100 }, 3, { minPanelWidth: 120, minPanelHeight: 50, gap: 4 }))
      .toEqual({ columns: 0, rows: 0, panels: [], fits: 0 });
  });

  it('puts left tick labels on the first column and bottom ones where no panel is below', () => {
    const g = facetGrid({ x: 0, y: 0, width: 900, height: 400 }, 5, { minPanelWidth: 100, minPanelHeight: 100, gap: 8, aspect: 1.5 });
    expect(g.columns).toBe(3);
    expect(outerPanels(g)).toEqual([
      { left: true, bottom: false }, { left: false, bottom: false }, { left: false, bottom: true },
      { left: true, bottom: true }, { left: false, bottom: true },
    ]);
  });

  it('property: panels are inside the body, disjoint, equal, row-major, at least the minimum size, min(count, fits) of them', () => {
    const input = fc.record({
      width: fc.integer({ min: 20, max: 2000 }), height: fc.integer({ min: 20, max: 2000 }),
      count: fc.integer({ min: 0, max: 40 }), minW: fc.integer({ min: 20, max: 300 }), minH: fc.integer({ min: 20, max: 300 }),
      gap: fc.integer({ min: 0, max: 30 }), aspect: fc.option(fc.double({ min: 0.2, max: 5, noNaN: true }), { nil: undefined }),
    });
    fc.assert(fc.property(input, ({ width, height, count, minW, minH, gap, aspect }) => {
      const body: Box = { x: 5, y: 7, width, height };
      const g = facetGrid(body, count, { minPanelWidth: minW, minPanelHeight: minH, gap, ...(aspect ? { aspect } : {}) });
      expect(g.fits).toBe(countAlong(width, minW, gap) * countAlong(height, minH, gap));
      expect(g.panels).toHaveLength(Math.min(count, g.fits));
      if (g.panels.length) expect(g.columns * g.rows - g.panels.length).toBeLessThan(g.columns);
      const [first] = g.panels;
      g.panels.forEach((p, i) => {
        expect([p.width, p.height]).toEqual([first!.width, first!.height]);
        expect(p.width).toBeGreaterThanOrEqual(minW - EPS);
        expect(p.height).toBeGreaterThanOrEqual(minH - EPS);
        expect(p.x).toBeGreaterThanOrEqual(body.x - EPS);
        expect(p.y).toBeGreaterThanOrEqual(body.y - EPS);
        expect(p.x + p.width).toBeLessThanOrEqual(body.x + width + EPS);
        expect(p.y + p.height).toBeLessThanOrEqual(body.y + height + EPS);
        const prev = g.panels[i - 1];
        if (prev && i % g.columns !== 0) expect(p.x - (prev.x + prev.width)).toBeCloseTo(gap, 6);
        if (prev && i % g.columns === 0) expect(p.y - (prev.y + prev.height)).toBeCloseTo(gap, 6);
        for (const q of g.panels.slice(i + 1)) {
          const apart = q.x >= p.x + p.width - EPS || p.x >= q.x + q.width - EPS || q.y >= p.y + p.height - EPS || p.y >= q.y + q.height - EPS;
          expect(apart).toBe(true);
        }
      });
    }), { numRuns: runs(500) });
  });
});
