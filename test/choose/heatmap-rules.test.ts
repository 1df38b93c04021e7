import { describe, expect, it } from 'vitest';
import type { HeatmapPlan } from '../../src/forms/heatmap-plan.js';
import { codes, renderRows } from '../helpers.js';
import { plantedBlocks } from '../contracts/heatmap-fixtures.js';

const matrix = (extra: Record<string, unknown> = {}) => ({ intent: 'matrix', keys: ['gene', 'sample'], values: 'level', fields: { level: { unit: 'reads' } }, ...extra });
const rows = plantedBlocks(2, 3, 2, 1);
const decisions = (r: { rationale: { decision: string; rule: string }[] }) => r.rationale.map((d) => `${d.decision} | ${d.rule}`).join('\n');

describe('rules for the matrix intent', () => {
  it('two keys and a value get a clustered heat map, average linkage by default, with the rule for each decision', async () => {
    const r = await renderRows(matrix(), rows);
    expect(r.choice).toMatchObject({ form: 'heatmap', rule: 'matrix.two-keys', plan: { order: 'cluster', cluster: { linkage: 'average', distance: 'euclidean', standardize: false } } });
    const text = decisions(r);
    expect(text).toMatch(/optimal leaf ordering \| .*Bar-Joseph, Gifford & Jaakkola 2001/);
    expect(text).toMatch(/^average linkage \| the default/m);
    expect(text).toMatch(/ties between equal distances broken by input position/);
    expect(text).toMatch(/sequential colours in \d+ (equal-interval|quantile) classes/);
  });

  it('linkage, distance and standardize are taken from the brief and stated', async () => {
    const r = await renderRows(matrix({ linkage: 'ward', distance: 'correlation', standardize: true }), rows);
    expect((r.choice!.plan as HeatmapPlan).cluster).toEqual({ linkage: 'ward', distance: 'correlation', standardize: true });
    expect(decisions(r)).toMatch(/correlation distance \| .*1 − Pearson r/);
    expect(decisions(r)).toMatch(/each row standardized/);
  });

  it('order: label turns clustering off, draws no dendrogram, and says what is lost', async () => {
    const r = await renderRows(matrix({ order: 'label' }), rows);
    expect((r.choice!.plan as HeatmapPlan).order).toBe('label');
    expect(decisions(r)).toMatch(/not clustered \| .*what is lost/);
    expect(r.scene!.root.children.some((n) => n.role === 'dendrogram')).toBe(false);
  });

  it('a key with an order of its own (months) keeps it: only the other side is clustered, with its dendrogram', async () => {
    const months = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun'];
    const data = ['North', 'South', 'East', 'West'].flatMap((site, i) => months.map((month, j) => ({ site, month, level: ((i * 7 + j * 3) % 11) + (i % 2) * 20 })));
    const r = await renderRows({ intent: 'matrix', keys: ['site', 'month'], values: 'level', fields: { level: { unit: 'reads' } } }, data);
    expect(decisions(r)).toMatch(/columns in the order of `month`, not clustered \| the key is cyclic/);
    expect(decisions(r)).toMatch(/^rows reordered by hierarchical clustering/m);
    expect(r.scene!.axes.find((a) => a.orient === 'bottom')!.domain).toEqual(months);
    const ids = JSON.stringify(r.scene!.root).match(/dendrogram-(row|column)/g) ?? [];
    expect(new Set(ids)).toEqual(new Set(['dendrogram-row']));
  });

  it('values either side of zero, or a declared midpoint, get diverging colours', async () => {
    const signed = rows.map((x) => ({ ...x, level: (x.level as number) - 30 }));
    expect((await renderRows(matrix(), signed)).choice!.plan).toMatchObject({ classes: { method: 'diverging', midpoint: 0 } });
    const r = await renderRows(matrix({ fields: { level: { unit: 'reads', midpoint: 20 } } }), rows);
    expect((r.choice!.plan as HeatmapPlan).classes).toMatchObject({ method: 'diverging', midpoint: 20 });
    expect(decisions(r)).toMatch(/`fields\.level\.midpoint` declares 20/);
  });

  it('refuses a matrix with one key, naming the missing column key', async () => {
    const r = await renderRows(matrix({ keys: 'gene' }), rows);
    expect(r.diagnostics).toMatchObject([{ code: 'choice.matrix-needs-two-keys', path: '/keys' }]);
    expect(r.diagnostics[0]!.hint).toMatch(/sample/);
  });

  it('refuses a matrix without a value, or with a text value', async () => {
    const { values: _, ...noValue } = matrix();
    expect(codes(await renderRows(noValue, rows))).toContain('choice.no-value');
    const r = await renderRows(matrix({ values: 'label' }), rows.map((x) => ({ ...x, label: 'x' })));
    expect(r.diagnostics).toMatchObject([{ code: 'choice.value-not-quantitative', path: '/values' }]);
  });

  it('refuses order: value for a heat map (no one value per row to sort by)', async () => {
    const r = await renderRows(matrix({ order: 'value' }), rows);
    expect(r.diagnostics).toMatchObject([{ code: 'choice.order-not-applicable', path: '/order' }]);
  });

  it('refuses linkage, distance and standardize for other intents', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'gene', values: 'level', linkage: 'single', distance: 'correlation', standardize: true }, rows);
    expect(r.diagnostics.filter((d) => d.code === 'brief.option-not-used').map((d) => d.path)).toEqual(['/linkage', '/distance', '/standardize']);
  });

  it('refuses an unknown linkage with the names it accepts', async () => {
    const r = await renderRows(matrix({ linkage: 'centroid' }), rows);
    expect(r.diagnostics[0]).toMatchObject({ code: 'brief.bad-value', path: '/linkage' });
  });
});
