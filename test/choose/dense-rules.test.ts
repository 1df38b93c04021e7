import { describe, expect, it } from 'vitest';
import { DENSE_ITEMS } from '../../src/choose/rules.js';
import type { DensePlan } from '../../src/forms/dense-plan.js';
import { dumpScene } from '../../src/scene/dump.js';
import { renderRows } from '../helpers.js';

const items = (n: number) => Array.from({ length: n }, (_, i) => ({ meter: `M${i}`, litres: (i * 7919) % 1000 }));
const compare = { intent: 'compare', keys: 'meter', values: 'litres', fields: { litres: { unit: 'litres' } } };

describe('rules for the dense pixel layout', () => {
  it(`compare with ${DENSE_ITEMS} keys or more gets a dense layout, in value order, with the item count noted`, async () => {
    const r = await renderRows(compare, items(DENSE_ITEMS));
    expect(r.choice).toMatchObject({ form: 'dense', rule: 'compare.many-items', plan: { order: 'value' } });
    const dump = dumpScene(r.scene!);
    const rasters = dump.marks.filter((m) => m.role === 'raster');
    expect(rasters).toMatchObject([{ kind: 'image' }]);
    expect(rasters[0]!.grid!.columns * rasters[0]!.grid!.rows).toBeGreaterThanOrEqual(DENSE_ITEMS);
    expect(dump.texts.some((t) => t.role === 'note' && t.text.startsWith('10,000 meter values'))).toBe(true);
    expect(dump.legends[0]!.kind).toBe('binned');
    expect(r.rationale.map((d) => d.rule).join('\n')).toMatch(/Keim 2000/);
  });

  it('one key fewer than that stays a bar chart (the bar rows keep their choices)', async () => {
    const r = await renderRows(compare, items(DENSE_ITEMS - 1));
    expect(r.choice!.form).toBe('bar');
  });

  it('a distribution of that many rows is still binned, and gets a dense layout of the rows when pinned', async () => {
    const binned = await renderRows({ intent: 'distribution', values: 'litres', fields: { litres: { unit: 'litres' } } }, items(DENSE_ITEMS));
    expect(binned.choice).toMatchObject({ form: 'histogram' });
    const r = await renderRows({ intent: 'distribution', values: 'litres', form: 'dense', fields: { litres: { unit: 'litres' } } }, items(DENSE_ITEMS));
    expect(r.choice).toMatchObject({ form: 'dense', rule: 'distribution.many-items' });
    expect((r.choice!.plan as DensePlan).key).toBeUndefined();
  });

  it('form: dense draws a few thousand items too; order: data keeps their order and is stated', async () => {
    const r = await renderRows({ ...compare, form: 'dense', order: 'data' }, items(3000));
    expect(r.choice).toMatchObject({ form: 'dense', plan: { order: 'data' } });
    expect(r.rationale.some((d) => d.decision === 'items in data order')).toBe(true);
  });

  it('order: label puts the items A→Z', async () => {
    const r = await renderRows({ ...compare, form: 'dense', order: 'label' }, items(50));
    expect(r.choice).toMatchObject({ form: 'dense', plan: { order: 'label' } });
  });

  it('in value order the classes are equal intervals (quantiles would make every band equal)', async () => {
    const skewed = items(3000).map((x, i) => ({ ...x, litres: i < 2900 ? i % 50 : 5000 + i }));
    const r = await renderRows({ ...compare, form: 'dense' }, skewed);
    expect((r.choice!.plan as DensePlan).classes.method).toBe('equal-interval');
  });

  it('refuses order: cluster for a dense layout', async () => {
    const r = await renderRows({ ...compare, form: 'dense', order: 'cluster' }, items(50));
    expect(r.diagnostics).toMatchObject([{ code: 'choice.order-not-applicable', path: '/order' }]);
  });

  it('refuses more items than the plot has pixels, and says how to fit them', async () => {
    const r = await renderRows({ ...compare, form: 'dense', size: { width: 160, height: 160 } }, items(20_000));
    expect(r.diagnostics).toMatchObject([{ code: 'derive.too-many-items' }]);
    expect(r.diagnostics[0]!.hint).toMatch(/size:/);
  });
});
