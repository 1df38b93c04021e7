import { describe, expect, it } from 'vitest';
import { resolveBrief } from '../../src/brief/resolve.js';
import { layoutChart, type BodyForm } from '../../src/layout/chart.js';
import type { LayoutContext } from '../../src/layout/kit-types.js';
import { textNode } from '../../src/layout/text.js';
import { idMaker } from '../../src/scene/ids.js';
import { dumpScene } from '../../src/scene/dump.js';
import { env } from '../helpers.js';

/** A minimal form that lays out its own body: one dot per key around a circle, each labelled. */
const RING: BodyForm<string[]> = {
  name: 'test-ring',
  words: () => ({ title: 'Ring', description: 'd', notes: [] }),
  legend: () => ({ kind: 'categorical', field: 'g', title: 'Group', entries: [{ label: 'One', fill: '#206c89' }] }),
  layoutBody: (keys, body, ctx) => {
    const cx = body.x + body.width / 2;
    const cy = body.y + body.height / 2;
    const r = Math.min(body.width, body.height) / 3;
    const at = keys.map((k, i) => ({ k, x: cx + r * Math.sin((2 * Math.PI * i) / keys.length), y: cy - r * Math.cos((2 * Math.PI * i) / keys.length) }));
    return {
      guides: [{ kind: 'circle', id: 'ring', role: 'gridline', cx, cy, r, fill: 'none', stroke: '#e4e6e9', strokeWidth: 1 }],
      marks: at.map((p) => ({ kind: 'circle' as const, id: ctx.id('point', p.k), role: 'point' as const, cx: p.x, cy: p.y, r: 3, fill: '#206c89' })),
      // Every label at the same spot: all but the first would overlap.
      labels: at.map((p) => textNode(ctx.measure, { id: ctx.id('label', p.k), role: 'label', text: p.k, style: ctx.style.text.label, x: cx, top: cy })),
      panels: [{ id: 'panel', plot: body, axes: [] }],
      diagnostics: [],
    };
  },
};

function context(): LayoutContext {
  const style = env.style('report', undefined);
  if (!style.ok) throw new Error('style');
  return { brief: resolveBrief({ intent: 'cycle', rows: [], title: 'A ring of months' }), style: style.value, measure: env.measure, id: idMaker() };
}

describe('a form that lays out its own body', () => {
  const { scene, diagnostics } = layoutChart(RING, ['Jan', 'Feb', 'Mar', 'Apr'], context());
  const dump = dumpScene(scene);

  it('gets the frame and legend from the composer, and its own panel in the scene', () => {
    expect(dump.form).toBe('test-ring');
    expect(dump.texts.some((t) => t.role === 'title' && t.text === 'A ring of months')).toBe(true);
    expect(dump.legends.map((l) => l.title)).toEqual(['Group']);
    expect(dump.panels).toHaveLength(1);
    expect(dump.marks.filter((m) => m.role === 'point')).toHaveLength(4);
  });

  it('keeps the first of labels drawn on top of each other, leaves out the rest and says so in the chart', () => {
    expect(dump.texts.filter((t) => t.role === 'label').map((t) => t.text)).toEqual(['Jan']);
    expect(dump.texts.filter((t) => t.role === 'note').map((t) => t.text).join(' ')).toContain('3 labels are left out');
    expect(diagnostics.map((d) => d.code)).toEqual(['layout.labels-unplaced']);
  });
});
