import { describe, expect, it } from 'vitest';
import type { ScatterPlan } from '../../src/forms/scatter-plan.js';
import { codes, renderRows } from '../helpers.js';

const rows = Array.from({ length: 12 }, (_, i) => ({ name: `P${i}`, h: 150 + i * 3, w: 50 + ((i * 7) % 11) * 2, pop: (i + 1) * 10, kind: i % 3 ? 'a' : 'b', grade: 'ABCDEFGHI'[i % 9] }));
const brief = { intent: 'correlation', values: ['h', 'w'], fields: { h: { unit: 'cm' }, w: { unit: 'kg' } } };
const decisions = (r: { rationale: { decision: string; rule: string }[] }) => r.rationale.map((d) => `${d.decision} | ${d.rule}`).join('\n');

/** Points on a deterministic spiral around one spot: dense enough that most overlap. */
const pile = (n: number) => Array.from({ length: n }, (_, i) => ({ h: 100 + Math.cos(i) * Math.sqrt(i) * 0.1, w: 50 + Math.sin(i) * Math.sqrt(i) * 0.1 }));

describe('rules for the correlation intent', () => {
  it('two quantitative values give a scatter plot, explained, with axes that need not include zero', async () => {
    const r = await renderRows(brief, rows);
    expect(r.ok).toBe(true);
    expect(r.choice!.form).toBe('scatter');
    expect(r.rationale[0]!.rule).toMatch(/^correlation\.two-values/);
    expect(decisions(r)).toMatch(/need not include zero \| points are read by their position/);
    expect(decisions(r)).toMatch(/overplotting measured: 0 %/);
    const [d0] = r.scene!.axes[0]!.domain as number[];
    expect(d0).toBeGreaterThan(0);
  });

  it('asks for exactly two values', async () => {
    const r = await renderRows({ ...brief, values: ['h'] }, rows);
    expect(r.diagnostics[0]).toMatchObject({ code: 'choice.needs-two-values', path: '/values' });
    expect(r.diagnostics[0]!.hint).toMatch(/values: \[/);
  });

  it('with three or more values, points to the scatterplot matrix (intent: profile) that shows every pair', async () => {
    const many = rows.map((row, i) => ({ ...row, extra: i * 3 }));
    const r = await renderRows({ ...brief, values: ['h', 'w', 'extra'] }, many);
    expect(r.diagnostics[0]).toMatchObject({ code: 'choice.needs-two-values', path: '/values' });
    expect(r.diagnostics[0]!.hint).toMatch(/intent: profile/);
  });

  it('refuses a text value, and a text area', async () => {
    expect((await renderRows({ ...brief, values: ['h', 'kind'] }, rows)).diagnostics[0]).toMatchObject({ code: 'choice.value-not-quantitative', path: '/values' });
    expect((await renderRows({ ...brief, area: 'kind' }, rows)).diagnostics[0]).toMatchObject({ code: 'choice.value-not-quantitative', path: '/area' });
  });

  it('refuses colour or shape by a quantitative column', async () => {
    expect((await renderRows({ ...brief, color: 'pop' }, rows)).diagnostics[0]).toMatchObject({ code: 'choice.not-categorical', path: '/color' });
    expect((await renderRows({ ...brief, shape: 'pop' }, rows)).diagnostics[0]).toMatchObject({ code: 'choice.not-categorical', path: '/shape' });
  });

  it('refuses more than 5 shapes and more than 8 colours, offering small multiples', async () => {
    const shapes = await renderRows({ ...brief, shape: 'grade' }, rows);
    expect(shapes.diagnostics[0]).toMatchObject({ code: 'choice.too-many-shapes', path: '/shape' });
    const colours = await renderRows({ ...brief, color: 'grade' }, rows);
    expect(colours.diagnostics[0]).toMatchObject({ code: 'choice.too-many-colours' });
    expect(colours.diagnostics[0]!.hint).toMatch(/small multiples/);
  });

  it('refuses more than one key', async () => {
    expect((await renderRows({ ...brief, keys: ['name', 'kind'] }, rows)).diagnostics[0]).toMatchObject({ code: 'choice.too-many-keys', path: '/keys' });
  });

  it('refuses negative area values, naming every such row', async () => {
    const r = await renderRows({ ...brief, area: 'pop' }, rows.map((x, i) => (i === 2 || i === 5 ? { ...x, pop: -1 } : x)));
    const error = r.diagnostics.find((d) => d.code === 'derive.negative-area')!;
    expect(error).toMatchObject({ field: 'pop', rows: [3, 6] });
    expect(error.hint).toBeTruthy();
  });

  it('leaves out rows missing an area value, with a warning naming them and a note in the chart', async () => {
    const r = await renderRows({ ...brief, area: 'pop' }, rows.map((x, i) => (i === 4 ? { ...x, pop: null } : x)));
    expect(r.ok).toBe(true);
    expect(r.diagnostics.find((d) => d.code === 'derive.missing-values')).toMatchObject({ field: 'pop', rows: [5] });
    expect(r.scene!.root.children.length).toBeGreaterThan(0);
    expect(JSON.stringify(r.scene)).toContain('1 row is left out for missing values.');
  });

  it('`fit: linear` states r and n in a note; with too few points it warns and draws no line', async () => {
    const r = await renderRows({ ...brief, fit: 'linear' }, rows);
    expect(decisions(r)).toMatch(/least-squares line of y on x, with Pearson's r and n stated in a note \| the brief asks for it \(`fit: linear`\)/);
    expect(JSON.stringify(r.scene)).toMatch(/Pearson r = [−]?0\.\d\d, n = 12\./);
    const few = await renderRows({ ...brief, fit: 'linear' }, rows.slice(0, 2));
    expect(few.diagnostics.find((d) => d.code === 'derive.fit-not-possible')).toMatchObject({ path: '/fit' });
  });

  it('refuses `fit:` for an intent that does not use it', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'name', values: 'h', fit: 'linear' }, rows);
    expect(r.diagnostics[0]).toMatchObject({ code: 'brief.option-not-used', path: '/fit' });
  });

  it('overlapping points are drawn smaller and translucent, with a warning suggesting the binned density', async () => {
    const r = await renderRows(brief, pile(2000));
    const warning = r.diagnostics.find((d) => d.code === 'layout.overplotted')!;
    expect(warning.hint).toMatch(/binned density/);
    expect((r.choice!.plan as ScatterPlan).mode).toBe('translucent');
    expect(decisions(r)).toMatch(/smaller and translucent \(50 %\) \| overplotting measured: \d+ % of the 2,000 points/);
  });

  it('tens of thousands of overlapping points become a binned density, and the rationale says so', async () => {
    const r = await renderRows({ ...brief, color: 'kind' }, pile(12_000).map((p, i) => ({ ...p, kind: i % 2 ? 'a' : 'b' })));
    expect(r.ok).toBe(true);
    expect((r.choice!.plan as ScatterPlan).mode).toBe('binned');
    expect(decisions(r)).toMatch(/binned density: hexagons coloured by how many points fall in each; colour not shown \| .*10,000 points or more.*Carr et al/);
    expect(codes(r)).not.toContain('layout.overplotted');
    expect(r.scene!.legends[0]).toMatchObject({ kind: 'binned', field: 'count' });
  });
});
