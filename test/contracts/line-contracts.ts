import { expect } from 'vitest';
import { LEADER_FROM } from '../../src/forms/line-labels.js';
import type { DumpMark, DumpText, SceneDump } from '../../src/scene/dump.js';

/** The line marks of a dumped scene. */
export const lines = (dump: SceneDump): DumpMark[] => dump.marks.filter((m) => m.role === 'line');

/** Whether two boxes overlap by more than float noise. */
const overlap = (a: DumpText, b: DumpText) => a.x < b.x + b.width - 1e-6 && b.x < a.x + a.width - 1e-6 && a.y < b.y + b.height - 1e-6 && b.y < a.y + a.height - 1e-6;

/**
 * The rightmost drawn point of a series: the last point of its lines, or a lone point drawn as a
 * dot after a gap (regression: the contract once measured from the line before the gap).
 */
function seriesEnd(dump: SceneDump, name: string): { x: number; y: number } {
  const own = lines(dump).filter((l) => Object.values(l.series!)[0] === name);
  const field = Object.keys(own[0]!.series!)[0]!;
  const ends = own.map((l) => l.points![l.points!.length - 1]!);
  const dots = dump.marks.filter((m) => m.role === 'point' && m.datum?.[field] === name).map((m) => ({ x: m.cx!, y: m.cy! }));
  return [...ends, ...dots].reduce((a, b) => (b.x > a.x ? b : a));
}

/**
 * The contracts every line chart keeps: each line's points in key order, left to right, inside
 * the plot; no two direct labels overlap; each label sits within LEADER_FROM px (plus float
 * noise) of its line's last point, or a leader joins them.
 */
export function checkLineContracts(dump: SceneDump): void {
  const { plot } = dump;
  for (const line of lines(dump)) {
    const pts = line.points!;
    for (let i = 1; i < pts.length; i++) expect(pts[i]!.x).toBeGreaterThanOrEqual(pts[i - 1]!.x);
    for (const p of pts) {
      expect(p.x).toBeGreaterThanOrEqual(plot.x - 0.01);
      expect(p.x).toBeLessThanOrEqual(plot.x + plot.width + 0.01);
      expect(p.y).toBeGreaterThanOrEqual(plot.y - 0.01);
      expect(p.y).toBeLessThanOrEqual(plot.y + plot.height + 0.01);
    }
    expect(line.stroke).toMatch(/^#[0-9a-f]{6}$/);
  }
  const labels = dump.texts.filter((t) => t.role === 'label' && lines(dump).some((l) => l.series && Object.values(l.series)[0] === t.text));
  for (let i = 0; i < labels.length; i++) for (let j = i + 1; j < labels.length; j++) expect(overlap(labels[i]!, labels[j]!), `${labels[i]!.text} / ${labels[j]!.text}`).toBe(false);
  const leaders = dump.marks.filter((m) => m.role === 'leader');
  for (const label of labels) {
    const last = seriesEnd(dump, label.text);
    const centre = label.y + label.height / 2;
    const near = Math.abs(centre - last.y) <= LEADER_FROM + 1e-3 && label.x - last.x >= 0 && label.x - last.x <= 20;
    expect(near || leaders.length > 0, `label ${label.text}`).toBe(true);
  }
}
