import { describe, expect, it } from 'vitest';
import { dumpScene, type SceneDump } from '../../src/scene/dump.js';
import { nodesOf } from '../../src/scene/walk.js';
import { codes, renderDemo, renderRows, root } from '../helpers.js';
import { checkFacetContracts } from './facet-contracts.js';

/** Rows of `n` facet levels (Site 1…), each with the keys a–d; site i's values scale with i, so its total ranks it. */
function sites(n: number, keys = ['a', 'b', 'c', 'd']) {
  return Array.from({ length: n }, (_, i) => keys.map((k, j) => ({ site: `Site ${i + 1}`, k, v: (i + 1) * (j + 2) }))).flat();
}

const brief = (extra: Record<string, unknown> = {}) => ({ intent: 'compare', keys: 'k', values: 'v', facet: 'site', fields: { v: { unit: 'units' } }, ...extra });

/** Bar marks within a panel's plot box. */
function barsIn(dump: SceneDump, p: SceneDump['panels'][number]) {
  return dump.marks.filter((m) => m.role === 'bar' && m.x! >= p.plot.x - 0.01 && m.x! + m.width! <= p.plot.x + p.plot.width + 0.01 && m.y! >= p.plot.y - 0.01 && m.y! + m.height! <= p.plot.y + p.plot.height + 0.01);
}

describe('small multiples: perceptual contracts', () => {
  it('the gallery grid keeps every panel on identical scales, with tick labels only on the outer panels', async () => {
    const { dump } = await renderDemo(`${root}/demo-data/hut-season.yaml`);
    checkFacetContracts(dump, 'hut');
    expect(dump.panels).toHaveLength(6);
  });

  it('each panel draws only its own rows, with bar length proportional to value on the shared scale', async () => {
    const r = await renderRows(brief(), sites(5));
    const dump = dumpScene(r.scene!);
    checkFacetContracts(dump, 'site');
    // Every node of the scene has its own id (one zero line per panel, not one id five times).
    const ids = nodesOf(r.scene!.root).map((n) => n.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const p of dump.panels) {
      const axis = p.axes.find((a) => a.orient === 'left')!;
      const [d0, d1] = axis.domain as number[];
      const perUnit = Math.abs(axis.range[1] - axis.range[0]) / (d1! - d0!);
      const own = barsIn(dump, p);
      expect(own.length).toBe(4);
      for (const b of own) {
        expect(b.datum!.v).toBe(Number(String(p.facet!.site).split(' ')[1]) * (['a', 'b', 'c', 'd'].indexOf(String(b.datum!.k)) + 2));
        // Within 0.5 px, as for single bar charts.
        expect(Math.abs(b.height! - (b.datum!.v as number) * perUnit)).toBeLessThanOrEqual(0.5);
      }
    }
  });

  it('panels are ordered by their total, largest first, unless `order:` says otherwise', async () => {
    const byTotal = dumpScene((await renderRows(brief(), sites(4))).scene!);
    expect(byTotal.panels.map((p) => p.facet!.site)).toEqual(['Site 4', 'Site 3', 'Site 2', 'Site 1']);
    const byLabel = dumpScene((await renderRows(brief({ order: 'label' }), sites(4))).scene!);
    expect(byLabel.panels.map((p) => p.facet!.site)).toEqual(['Site 1', 'Site 2', 'Site 3', 'Site 4']);
  });

  it('an ordered facet (dates) keeps its own order', async () => {
    const rows = ['2026-03-01', '2026-01-01', '2026-02-01'].flatMap((d, i) => [{ day: d, k: 'a', v: 10 - i }, { day: d, k: 'b', v: 3 }]);
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', facet: 'day', fields: { v: { unit: 'units' } } }, rows);
    expect(dumpScene(r.scene!).panels.map((p) => p.facet!.day)).toEqual(['1 Jan 2026', '1 Feb 2026', '1 Mar 2026']);
    expect(r.rationale.some((d) => d.decision === 'panels in the order of `day`' && d.rule.startsWith('facet.order'))).toBe(true);
  });

  it('every facet level is drawn as a panel or named in the refusal warning and the note', async () => {
    const r = await renderRows(brief({ size: { width: 400, height: 300 } }), sites(14));
    expect(r.ok).toBe(true);
    const dump = dumpScene(r.scene!);
    checkFacetContracts(dump, 'site');
    const warning = r.diagnostics.find((d) => d.code === 'layout.panels-refused')!;
    expect(warning).toBeDefined();
    const drawn = dump.panels.map((p) => String(p.facet!.site));
    const refused = Array.from({ length: 14 }, (_, i) => `Site ${i + 1}`).filter((s) => !drawn.includes(s));
    expect(refused.length).toBeGreaterThan(0);
    expect(warning.found).toBe('14 panels');
    expect(warning.expected).toBe(`at most ${drawn.length}`);
    // The smallest totals are the ones left out, and the first of them are named.
    expect(refused).toEqual(Array.from({ length: refused.length }, (_, i) => `Site ${i + 1}`));
    const note = dump.texts.filter((t) => t.role === 'note').map((t) => t.text).join(' ');
    expect(note).toContain(`${drawn.length} of 14 panels are drawn`);
    for (const s of refused.slice(-3).reverse()) expect(warning.message + note).toContain(s);
    // No panel is smaller than the smallest readable plot.
    for (const p of dump.panels) expect(Math.min(p.plot.width, p.plot.height)).toBeGreaterThanOrEqual(40);
  });

  it('a panel left out does not stretch the scales of the panels drawn', async () => {
    // "Odd" totals 0.5, the smallest, so it is the first left out; its values span -99.5 to 100.
    const rows = [...sites(14), { site: 'Odd', k: 'a', v: 100 }, { site: 'Odd', k: 'b', v: -99.5 }];
    const r = await renderRows(brief({ size: { width: 400, height: 300 } }), rows);
    const dump = dumpScene(r.scene!);
    expect(dump.panels.map((p) => p.facet!.site)).not.toContain('Odd');
    const drawnMax = Math.max(...dump.marks.filter((m) => m.role === 'bar').map((m) => m.datum!.v as number));
    const [lo, hi] = dump.panels[0]!.axes.find((a) => a.orient === 'left')!.domain as number[];
    expect(lo).toBe(0);
    expect(hi).toBeLessThan(100);
    expect(hi).toBeGreaterThanOrEqual(drawnMax);
  });

  it('a bottom key label wider than a panel widens the panels (fewer fit), never running into the next (found by the property test)', async () => {
    const rows = ['A', 'B', 'C'].map((site, i) => ({ site, k: 'a'.repeat(60), v: i + 1 }));
    const r = await renderRows(brief({ size: { width: 794, height: 300 } }), rows);
    const dump = dumpScene(r.scene!);
    checkFacetContracts(dump, 'site');
    expect(codes(r)).not.toContain('layout.text-overlap');
    const label = dump.texts.find((t) => t.role === 'tick' && t.text.startsWith('aaa'))!;
    for (const p of dump.panels) expect(p.plot.width).toBeGreaterThanOrEqual(label.width);
    // 3 panels at 240 px would fit side by side; the label's 363 px allow only 2 per row.
    expect(new Set(dump.panels.map((p) => p.plot.x)).size).toBe(2);
    expect(dump.panels).toHaveLength(3);
  });

  it('with `context: true` each panel shows the other panels\' marks in grey, behind its own, with no datum', async () => {
    const r = await renderRows(brief({ facet: { by: 'site', context: true } }), sites(3));
    const dump = dumpScene(r.scene!);
    const context = dump.marks.filter((m) => m.role === 'context');
    expect(context).toHaveLength(3 * 2 * 4);
    for (const m of context) { expect(m.datum).toBeUndefined(); expect(m.opacity).toBeLessThan(1); }
    const order = dump.marks.map((m) => m.role);
    expect(order.lastIndexOf('context')).toBeLessThan(order.indexOf('bar'));
  });

  it('grouped bars split into panels keep one colour per group in every panel', async () => {
    const rows = ['Week 1', 'Week 2', 'Week 3'].flatMap((w, i) => ['N', 'S'].flatMap((k) => ['x', 'y'].map((g, j) => ({ w, k, g, v: i + j + 1 }))));
    const r = await renderRows({ intent: 'compare', keys: ['k', 'g'], values: 'v', facet: 'w', fields: { v: { unit: 'units' } } }, rows);
    const dump = dumpScene(r.scene!);
    checkFacetContracts(dump, 'w');
    const fills = new Map<string, Set<string>>();
    for (const b of dump.marks.filter((m) => m.role === 'bar')) fills.set(String(b.datum!.g), (fills.get(String(b.datum!.g)) ?? new Set()).add(b.fill!));
    expect([...fills.values()].map((s) => s.size)).toEqual([1, 1]);
    expect(codes(r)).not.toContain('layout.text-overlap');
  });

  it('a frame too small for even one panel is refused, not drawn', async () => {
    const r = await renderRows(brief({ size: { width: 160, height: 160 }, title: 'A title that takes two lines here', subtitle: 'And a subtitle that takes two more' }), sites(2));
    expect(r.ok).toBe(false);
    expect(codes(r)).toContain('layout.frame-too-small');
  });
});
