import { describe, expect, it } from 'vitest';
import { dumpScene, type SceneDump } from '../../src/scene/dump.js';
import { nodesOf } from '../../src/scene/walk.js';
import { codes, renderDemo, renderRows, root } from '../helpers.js';
import { checkFacetContracts } from './facet-contracts.js';

const fields = { riders: { unit: 'riders' } };
/** `n` months of riders on each route; route s ends at 10 + s + (n - 1), so the later routes end highest. */
const monthly = (n: number, routes: string[]) =>
  routes.flatMap((route, s) => Array.from({ length: n }, (_, i) => ({ month: `2024-${String(i + 1).padStart(2, '0')}`, route, riders: 10 + s + i })));
const routes = (n: number) => Array.from({ length: n }, (_, k) => `Route ${k + 1}`);

/** The marks of a role whose every point lies within a panel's plot box. */
function linesIn(dump: SceneDump, p: SceneDump['panels'][number], role = 'line') {
  const inside = (q: { x: number; y: number }) => q.x >= p.plot.x - 0.01 && q.x <= p.plot.x + p.plot.width + 0.01 && q.y >= p.plot.y - 0.01 && q.y <= p.plot.y + p.plot.height + 0.01;
  return dump.marks.filter((m) => m.role === role && m.points!.length > 0 && m.points!.every(inside));
}

describe('small multiples of lines: perceptual contracts', () => {
  it('the gallery\'s dock panels keep shared scales, outer tick labels, one line each and grey context', async () => {
    const { dump } = await renderDemo(`${root}/demo-data/dock-rentals.yaml`);
    checkFacetContracts(dump, 'dock');
    expect(dump.panels).toHaveLength(10);
    for (const p of dump.panels) {
      expect(linesIn(dump, p).map((l) => l.series)).toEqual([{ dock: p.facet!.dock }]);
      expect(linesIn(dump, p, 'context')).toHaveLength(9);
    }
  });

  it('`facet:` on the series key draws one line per panel on shared scales, with outer tick labels, panel titles and no direct labels', async () => {
    const r = await renderRows({ intent: 'trend', keys: ['month', 'route'], values: 'riders', facet: 'route', fields, size: { width: 720, height: 480 } }, monthly(6, routes(4)));
    expect(r.ok).toBe(true);
    const dump = dumpScene(r.scene!);
    checkFacetContracts(dump, 'route');
    expect(dump.panels).toHaveLength(4);
    for (const p of dump.panels) {
      const own = linesIn(dump, p);
      expect(own).toHaveLength(1);
      // The panel's one line is its own series.
      expect(own[0]!.series).toEqual({ route: p.facet!.route });
    }
    // The panel's title names its series, so no direct label or legend repeats it.
    expect(dump.texts.filter((t) => t.role === 'label' || t.role === 'legend')).toEqual([]);
    expect(codes(r)).not.toContain('layout.text-overlap');
    const ids = nodesOf(r.scene!.root).map((n) => n.id);
    expect(new Set(ids).size).toBe(ids.length);
  });

  it('panels are ranked by their latest value, highest first', async () => {
    const r = await renderRows({ intent: 'trend', keys: ['month', 'route'], values: 'riders', facet: 'route', fields }, monthly(6, routes(4)));
    expect(dumpScene(r.scene!).panels.map((p) => p.facet!.route)).toEqual(['Route 4', 'Route 3', 'Route 2', 'Route 1']);
    expect(r.rationale.some((d) => d.decision === 'panels ordered by their latest value, largest first; ties by label')).toBe(true);
  });

  it('with `context: true` every other series is drawn in grey behind each panel\'s own line, with no datum', async () => {
    const r = await renderRows({ intent: 'trend', keys: ['month', 'route'], values: 'riders', facet: { by: 'route', context: true }, fields, size: { width: 720, height: 480 } }, monthly(6, routes(3)));
    const dump = dumpScene(r.scene!);
    checkFacetContracts(dump, 'route');
    const context = dump.marks.filter((m) => m.role === 'context');
    // 3 panels, each with the 2 other series.
    expect(context).toHaveLength(3 * 2);
    // One grey for all context, not the colour of any panel's own line.
    const greys = new Set(context.map((m) => m.stroke));
    expect(greys.size).toBe(1);
    for (const m of context) { expect(m.datum).toBeUndefined(); expect(m.opacity).toBeLessThan(1); }
    for (const p of dump.panels) {
      expect(linesIn(dump, p)).toHaveLength(1);
      expect(greys).not.toContain(linesIn(dump, p)[0]!.stroke);
      expect(linesIn(dump, p, 'context')).toHaveLength(2);
    }
    const order = dump.marks.map((m) => m.role);
    expect(order.lastIndexOf('context')).toBeLessThan(order.indexOf('line'));
  });
});
