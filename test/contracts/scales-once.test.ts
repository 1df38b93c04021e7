import { describe, expect, it } from 'vitest';
import { dumpScene } from '../../src/scene/dump.js';
import { codes, renderRows } from '../helpers.js';
import { checkBarContracts } from './bar-contracts.js';

// Regressions found in review: the scales were chosen twice (once to measure, once to draw),
// so labels measured against one set of ticks were drawn against another.
describe('the scales drawn are the scales measured', () => {
  it('a left value axis whose drawn ticks are wider than the first measure widens its label column', async () => {
    const rows = [1.65, 3.3, 4.95, 6.6].map((v, i) => ({ k: String(i + 1), v }));
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', size: { width: 400, height: 300 }, fields: { v: { unit: 'u' } } }, rows);
    expect(codes(r)).not.toContain('layout.text-off-canvas');
    const dump = dumpScene(r.scene!);
    checkBarContracts(dump, 'v', 'k');
    // Every value tick label sits within the frame's padding and left of the plot.
    for (const t of dump.texts.filter((x) => x.role === 'tick' && x.x < dump.plot.x)) {
      expect(t.x).toBeGreaterThanOrEqual(16 - 0.01);
      expect(t.x + t.width).toBeLessThanOrEqual(dump.plot.x + 0.01);
    }
  });

  it('micro-scale values over dates keep their tick labels on the canvas', async () => {
    const rows = ['2026-01-01', '2026-01-02', '2026-01-03', '2026-01-04', '2026-01-05'].map((d, i) => ({ d, v: (i + 1) * 2.1e-7 }));
    const r = await renderRows({ intent: 'compare', keys: 'd', values: 'v', order: 'data', size: { width: 1000, height: 240 }, fields: { v: { unit: 'mol' } } }, rows);
    expect(codes(r)).not.toContain('layout.text-off-canvas');
    checkBarContracts(dumpScene(r.scene!), 'v', 'd');
  });

  it('a value label measured on a first look at the scale still fits the scale drawn', async () => {
    const rows = [['2024-01-01', 23384141922], ['2024-02-01', -97826880217], ['2024-03-01', 110200393200]].map(([d, v]) => ({ d, v }));
    const r = await renderRows({ intent: 'compare', keys: 'd', values: 'v', size: { width: 1000, height: 440 }, fields: { v: { unit: '€' } } }, rows);
    expect(codes(r)).not.toContain('layout.labels-unplaced');
    expect(codes(r)).not.toContain('layout.text-overlap');
    const dump = dumpScene(r.scene!);
    checkBarContracts(dump, 'v', 'd');
    // A label may reach half a tick-label box above the plot (where the top tick's label sits), never below it.
    const halfTickBox = (12 * 1.326) / 2;
    for (const label of dump.texts.filter((t) => t.role === 'label')) {
      expect(label.y).toBeGreaterThanOrEqual(dump.plot.y - halfTickBox - 0.01);
      expect(label.y + label.height).toBeLessThanOrEqual(dump.plot.y + dump.plot.height + 0.01);
    }
  });
});
