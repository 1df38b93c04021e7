import { utcDay } from 'd3-time';
import { describe, expect, it } from 'vitest';
import { resolveBrief } from '../../src/brief/resolve.js';
import { layoutCartesian, type CartesianForm } from '../../src/layout/compose.js';
import type { LayoutContext } from '../../src/layout/kit-types.js';
import { idMaker } from '../../src/scene/ids.js';
import { dumpScene } from '../../src/scene/dump.js';
import { polyline } from '../../src/svg/path.js';
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

  it('keeps every text on the canvas and apart, with no diagnostic', () => {
    expect(diagnostics).toEqual([]);
    expect(dump.texts.filter((t) => t.role === 'tick').length).toBeGreaterThan(2);
  });
});
