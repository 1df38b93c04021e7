import { utcDay } from 'd3-time';
import { describe, expect, it } from 'vitest';
import { resolveBrief } from '../../src/brief/resolve.js';
import { layoutCartesian, type CartesianForm } from '../../src/layout/compose.js';
import type { LayoutContext } from '../../src/layout/kit-types.js';
import { idMaker } from '../../src/scene/ids.js';
import { dumpScene } from '../../src/scene/dump.js';
import { polyline } from '../../src/svg/path.js';
import { textNode } from '../../src/layout/text.js';
import { env } from '../helpers.js';

/** A minimal form for the composer: points over time on a linear value axis, drawn as one line. */
const points = [Date.UTC(2025, 0, 1), Date.UTC(2025, 1, 1), Date.UTC(2025, 4, 1), Date.UTC(2025, 5, 1)].map((t, i) => ({ t, v: [3, 5, 4, 8][i]! }));
const TIME_FORM: CartesianForm<typeof points> = {
  name: 'test-time',
  words: () => ({ title: 't', description: 'd', notes: [] }),
  domains: (d) => ({
    left: { kind: 'linear', name: 'value', field: 'v', title: 'Value (u)', extent: [0, Math.max(...d.map((p) => p.v))] },
    bottom: { kind: 'time', name: 'time', field: 't', title: 'Month', extent: [d[0]!.t, d[d.length - 1]!.t] },
    first: 'left',
  }),
  layout: (d, area) => {
    const pts = d.map((p) => ({ x: area.x.kind === 'time' ? area.x.map(p.t) : 0, y: area.y.kind === 'linear' ? area.y.map(p.v) : 0 }));
    return { marks: [{ kind: 'path', id: 'line', role: 'line', commands: polyline(pts), points: pts, stroke: '#206c89', strokeWidth: 2 }], labels: [], diagnostics: [] };
  },
};

function context(): LayoutContext {
  const style = env.style('report', undefined);
  if (!style.ok) throw new Error('style');
  return { brief: resolveBrief({ intent: 'trend', rows: [] }), style: style.value, measure: env.measure, id: idMaker() };
}

describe('the composer with a time axis', () => {
  const { scene, diagnostics } = layoutCartesian(TIME_FORM, points, context());
  const dump = dumpScene(scene);
  const time = dump.axes.find((a) => a.scale === 'time')!;

  it('draws time to scale: a gap of three months is three times a gap of one (within 0.5 px)', () => {
    const x = dump.marks[dump.marks.length - 1]!.points!.map((p) => p.x);
    const oneMonth = x[1]! - x[0]!;
    const threeMonths = x[2]! - x[1]!;
    // Jan → Feb is 31 days, Feb → May is 89 days: to scale, the pixel gaps are in that ratio.
    expect(Math.abs(threeMonths - (oneMonth * 89) / 31)).toBeLessThanOrEqual(0.5);
  });

  it('puts calendar ticks on UTC day boundaries inside the data\'s span (d3-time is the reference)', () => {
    const ticks = time.ticks as number[];
    for (const t of ticks) expect(+utcDay.floor(new Date(t))).toBe(t);
    for (let i = 1; i < ticks.length; i++) expect(ticks[i]!).toBeGreaterThan(ticks[i - 1]!);
    expect(ticks[0]!).toBeGreaterThanOrEqual(points[0]!.t);
    expect(ticks[ticks.length - 1]!).toBeLessThanOrEqual(points[points.length - 1]!.t);
    expect(time.domain).toEqual([points[0]!.t, points[points.length - 1]!.t]);
  });

  // Guards a review finding: the gridline at 0 was dropped even where no zero line replaces it.
  it('draws a gridline at every value tick, zero included, when the form draws no zero line', () => {
    const value = dump.axes.find((a) => a.scale === 'linear')!;
    expect((value.ticks as number[]).includes(0)).toBe(true);
    const horizontal = dump.marks.filter((m) => m.role === 'gridline' && /^M[\d.]+ ([\d.]+)L[\d.]+ \1$/.test(m.d!));
    expect(horizontal.length).toBe(value.ticks.length);
  });

  it('keeps every text on the canvas and apart, with no diagnostic', () => {
    expect(diagnostics).toEqual([]);
    expect(dump.texts.filter((t) => t.role === 'tick').length).toBeGreaterThan(2);
  });
});

/** A minimal band × linear form with a categorical legend and one label per band, placed where the test says. */
function legendForm(labelAt: (band: string) => { x: number; top: number }, entries = 3): CartesianForm<string[]> {
  return {
    name: 'test-legend',
    words: () => ({ title: 't', description: 'd', notes: [] }),
    domains: (d) => ({
      left: { kind: 'linear', name: 'value', field: 'v', title: 'Value (u)', extent: [0, 10] },
      bottom: { kind: 'band', name: 'key', field: 'k', title: 'Key', domain: d },
      first: 'left',
      legend: { kind: 'categorical', field: 'g', title: 'Group', entries: Array.from({ length: entries }, (_, i) => ({ label: `Group ${i + 1}`, fill: ['#206c89', '#b49101', '#952632', '#8d84ff'][i % 4]! })) },
    }),
    layout: (d, area, ctx) => ({
      marks: [],
      labels: d.map((k) => textNode(ctx.measure, { id: ctx.id('label', k), role: 'label', text: `label ${k}`, style: ctx.style.text.label, ...labelAt(k) })),
      diagnostics: [],
    }),
  };
}

describe('the composer with a legend and form labels', () => {
  it('places a short legend in rows above the plot, inside the canvas and clear of every other text', () => {
    const { scene, diagnostics } = layoutCartesian(legendForm(() => ({ x: 300, top: 300 })), ['a'], context());
    const dump = dumpScene(scene);
    expect(dump.legends).toHaveLength(1);
    expect(dump.legends[0]).toMatchObject({ kind: 'categorical', field: 'g', title: 'Group' });
    expect(dump.legends[0]!.entries.map((e) => e.label)).toEqual(['Group 1', 'Group 2', 'Group 3']);
    const legend = dump.legends[0]!.box;
    expect(legend.y + legend.height).toBeLessThanOrEqual(dump.plot.y);
    expect(diagnostics.map((d) => d.code)).toEqual([]);
  });

  it('a label that would overlap other text is left out, and the chart says so in a note', () => {
    // The label for "a" is put right on the left axis title (top-left of the body).
    const { scene, diagnostics } = layoutCartesian(legendForm((k) => (k === 'a' ? { x: 16, top: 16 } : { x: 400, top: 250 })), ['a', 'b'], context());
    const dump = dumpScene(scene);
    expect(dump.texts.filter((t) => t.role === 'label').map((t) => t.text)).toEqual(['label b']);
    expect(dump.texts.some((t) => t.role === 'note' && t.text.includes('label a'))).toBe(true);
    expect(diagnostics.map((d) => d.code)).toEqual(['layout.labels-unplaced']);
  });
});

describe('room right of the plot for labels at the marks\' ends', () => {
  it('a form that asks for a gutter gets its plot that much narrower', () => {
    const form = TIME_FORM;
    const withGutter: CartesianForm<typeof points> = { ...form, domains: (d, c) => ({ ...form.domains(d, c), rightGutter: 120 }) };
    const plain = layoutCartesian(form, points, context()).scene.plot;
    const narrowed = layoutCartesian(withGutter, points, context()).scene.plot;
    expect(plain.x + plain.width - (narrowed.x + narrowed.width)).toBeCloseTo(120, 6);
  });
});
