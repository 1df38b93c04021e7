import { describe, expect, it } from 'vitest';
import { MAX_LABEL_SHARE } from '../../src/layout/plot-box.js';
import type { TextNode } from '../../src/scene/types.js';
import { nodesOf } from '../../src/scene/walk.js';
import { codes, renderRows } from '../helpers.js';

/** Ten project names of 15 to 115 characters, as a new user's spending brief had them. */
const names = Array.from({ length: 10 }, (_, i) => `Project ${i + 1}: ${'renewal of the northern depot and its yards '.repeat(3)}`.slice(0, 15 + i * 11).trim());
const rows = names.map((project, i) => ({ project, spend: 120 + i * 37 }));
const brief = (width: number) => ({
  intent: 'compare', keys: 'project', values: 'spend', title: 'Committed spend by project', source: 'Source: invented figures',
  fields: { spend: { label: 'Committed spend', unit: '£ thousands' } }, size: { width, height: 440 },
});
const texts = (r: Awaited<ReturnType<typeof renderRows>>) => nodesOf(r.scene!.root).filter((n): n is TextNode => n.kind === 'text');
const inside = (t: TextNode, w: number, h: number) => t.box.x >= -0.01 && t.box.y >= -0.01 && t.box.x + t.box.width <= w + 0.01 && t.box.y + t.box.height <= h + 0.01;

describe('long labels in a narrow frame stay on the canvas', () => {
  it('ten long project names at 720 × 440 take at most 40 % of the width and the value-axis title is whole and on the canvas', async () => {
    expect(names[0]!.length).toBeGreaterThanOrEqual(15);
    expect(names[9]!.length).toBeGreaterThanOrEqual(100);
    const r = await renderRows(brief(720), rows);
    expect(r.ok).toBe(true);
    expect(codes(r)).not.toContain('layout.text-off-canvas');
    const body = 720 - 2 * 16;
    // The plot keeps at least the share the label column leaves it, less the tick gap (the defect squeezed it to 107 px).
    expect(r.scene!.plot.width).toBeGreaterThan(body * (1 - MAX_LABEL_SHARE) - 20);
    const title = texts(r).find((t) => t.role === 'axis-title' && t.text.startsWith('Committed'))!;
    expect(title.text).toBe('Committed spend (£ thousands)');
    expect(inside(title, 720, 440)).toBe(true);
    // Shortened names keep their full text in the SVG title of their bar.
    expect(codes(r)).toContain('layout.label-truncated');
    expect(r.svg).toMatch(new RegExp(`<title>[^<]*${names[9]!.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}`));
  });

  it('at 200 px wide the value-axis title stays on the canvas, shortened with its full text kept', async () => {
    const r = await renderRows(brief(200), rows);
    expect(codes(r)).not.toContain('layout.text-off-canvas');
    if (!r.ok) {
      expect(codes(r)).toContain('layout.frame-too-small');
      return;
    }
    for (const t of texts(r)) expect(inside(t, 200, 440), `${t.role} ${t.text}`).toBe(true);
    const title = texts(r).find((t) => t.role === 'axis-title' && (t.full ?? t.text).startsWith('Committed'))!;
    expect(title.full ?? title.text).toBe('Committed spend (£ thousands)');
  });

  it('a line series with a 120-character name keeps a plot: its direct label is shortened to the label column, full text kept', async () => {
    const long = `${'Westbound ferry crossings '.repeat(5)}`.slice(0, 120);
    const lines = [long, 'North'].flatMap((s) => Array.from({ length: 6 }, (_, i) => ({ d: `2024-0${i + 1}-01`, s, v: i * 3 + s.length })));
    const r = await renderRows({ intent: 'trend', keys: ['d', 's'], values: 'v', fields: { v: { unit: 'crossings' } }, size: { width: 480, height: 300 } }, lines);
    expect(r.ok).toBe(true);
    const label = texts(r).find((t) => t.role === 'label' && t.full === long.trim())!;
    expect(label.text.endsWith('…')).toBe(true);
    expect(label.box.width).toBeLessThanOrEqual(MAX_LABEL_SHARE * (480 - 32) + 0.01);
    for (const t of texts(r)) expect(inside(t, 480, 300), `${t.role} ${t.text}`).toBe(true);
  });
});
