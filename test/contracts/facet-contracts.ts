import { expect } from 'vitest';
import type { SceneDump } from '../../src/scene/dump.js';

/** The panels of a dump whose plot is directly below `p` (same column, lower row). */
const below = (dump: SceneDump, p: SceneDump['panels'][number]) => dump.panels.filter((q) => Math.abs(q.plot.x - p.plot.x) < 0.01 && q.plot.y > p.plot.y + 0.01);

/**
 * Perceptual contracts of small multiples: every panel on identical scales (same domain, same
 * tick values, same plot size); tick labels only on the outer panels (left column, and panels
 * with none below); each panel titled with its facet level.
 */
export function checkFacetContracts(dump: SceneDump, facet: string): void {
  const [first, ...rest] = dump.panels;
  expect(first).toBeDefined();
  for (const p of rest) {
    expect([p.plot.width, p.plot.height]).toEqual([first!.plot.width, first!.plot.height]);
    p.axes.forEach((a, i) => {
      expect(a.domain).toEqual(first!.axes[i]!.domain);
      expect(a.ticks).toEqual(first!.axes[i]!.ticks);
      expect(a.title).toBe(first!.axes[i]!.title);
    });
  }
  const minX = Math.min(...dump.panels.map((p) => p.plot.x));
  const ticks = dump.texts.filter((t) => t.role === 'tick');
  for (const t of ticks) {
    const left = t.x + t.width <= minX + 0.01;
    // A bottom tick label hangs under the panel its centre is over, which has no panel below it.
    const centre = t.x + t.width / 2;
    const under = dump.panels.find((p) => centre >= p.plot.x - 0.01 && centre <= p.plot.x + p.plot.width + 0.01 && t.y >= p.plot.y + p.plot.height - 0.01 && t.y < p.plot.y + p.plot.height + 40);
    expect(left || (under !== undefined && below(dump, under).length === 0)).toBe(true);
  }
  // Every outer panel does carry its labels: one left column per row, one bottom row per bottom-outer panel.
  for (const p of dump.panels) {
    if (Math.abs(p.plot.x - minX) < 0.01) expect(ticks.some((t) => t.x + t.width <= minX + 0.01 && t.y >= p.plot.y - 20 && t.y <= p.plot.y + p.plot.height)).toBe(true);
    if (below(dump, p).length === 0) expect(ticks.some((t) => t.y >= p.plot.y + p.plot.height && t.x + t.width / 2 >= p.plot.x - 0.01 && t.x + t.width / 2 <= p.plot.x + p.plot.width + 0.01)).toBe(true);
  }
  // One pair of axis titles for the whole grid; one title per panel, naming its level.
  expect(dump.texts.filter((t) => t.role === 'axis-title')).toHaveLength(2);
  const titles = dump.texts.filter((t) => t.role === 'panel-title').map((t) => t.text);
  expect(titles).toHaveLength(dump.panels.length);
  // Each names its level: in full, or shortened with "…" to its panel's width.
  dump.panels.forEach((p, i) => {
    const level = String(p.facet![facet]);
    const title = titles[i]!;
    expect(title === level || (title.endsWith('…') && level.startsWith(title.slice(0, -1).trimEnd()))).toBe(true);
  });
  // No text leaves the canvas, and no two texts overlap (tick labels, panel titles, axis titles, frame).
  for (const t of dump.texts) {
    expect(t.x).toBeGreaterThanOrEqual(-0.01);
    expect(t.y).toBeGreaterThanOrEqual(-0.01);
    expect(t.x + t.width).toBeLessThanOrEqual(dump.width + 0.01);
    expect(t.y + t.height).toBeLessThanOrEqual(dump.height + 0.01);
  }
  const eps = 0.01;
  dump.texts.forEach((a, i) => dump.texts.slice(i + 1).forEach((b) => {
    const overlap = a.x < b.x + b.width - eps && b.x < a.x + a.width - eps && a.y < b.y + b.height - eps && b.y < a.y + a.height - eps;
    if (overlap) throw new Error(`texts overlap: ${JSON.stringify(a.text)} (${a.role}) and ${JSON.stringify(b.text)} (${b.role})`);
  }));
}
