import { describe, expect, it } from 'vitest';
import { resolveBrief } from '../../src/brief/resolve.js';
import { barGroups, type BarPlan } from '../../src/forms/bar-plan.js';
import { refOf } from '../../src/fields/types.js';
import { deriveBars } from '../../src/derive/bars.js';
import { compareNatural } from '../../src/derive/order.js';
import { inferFields } from '../../src/fields/infer.js';
import { readTable } from '../../src/table/load.js';
import { memoryFiles } from '../helpers.js';

async function derive(rows: Record<string, unknown>[], plan: Partial<BarPlan> & { capacity?: number }, brief: Record<string, unknown> = {}) {
  const resolved = resolveBrief({ intent: 'compare', rows, keys: 'k', values: 'v', ...brief });
  const t = await readTable(resolved.data, resolved.fields, undefined, memoryFiles({}));
  if (!t.ok) throw new Error('table');
  const f = inferFields(t.value, resolved);
  if (!f.ok) throw new Error('fields');
  const { capacity = 100, ...rest } = plan;
  const value = f.value.values[0];
  const full: BarPlan = { key: refOf(f.value.keys[0]!), value: value && refOf(value), orientation: 'vertical', order: 'value', aggregate: 'sum', ...rest };
  return deriveBars(t.value, full, () => capacity);
}
const bars = (r: Awaited<ReturnType<typeof derive>>) => (r.ok ? r.value.bars.map((b) => [b.label, b.value]) : r.diagnostics);

describe('derive stage for bars', () => {
  it('sorts by value, largest first, ties broken by label', async () => {
    const r = await derive([{ k: 'b', v: 2 }, { k: 'c', v: 5 }, { k: 'a', v: 2 }], {});
    expect(bars(r)).toEqual([['c', 5], ['a', 2], ['b', 2]]);
  });

  it('sums rows sharing a key by default, and notes it', async () => {
    const r = await derive([{ k: 'a', v: 2 }, { k: 'a', v: 3 }, { k: 'b', v: 1 }], {});
    expect(bars(r)).toEqual([['a', 5], ['b', 1]]);
    expect(r.diagnostics).toMatchObject([{ code: 'derive.aggregated', severity: 'info' }]);
  });

  it('applies mean, count, max and min', async () => {
    const rows = [{ k: 'a', v: 2 }, { k: 'a', v: 6 }, { k: 'a', v: 4 }];
    expect(bars(await derive(rows, { aggregate: 'mean' }))).toEqual([['a', 4]]);
    expect(bars(await derive(rows, { aggregate: 'count' }))).toEqual([['a', 3]]);
    expect(bars(await derive(rows, { aggregate: 'max' }))).toEqual([['a', 6]]);
    expect(bars(await derive(rows, { aggregate: 'min' }))).toEqual([['a', 2]]);
  });

  it('leaves out rows with missing values and names them, never drawing them as zero', async () => {
    const r = await derive([{ k: 'a', v: 2 }, { k: 'b', v: null }, { k: 'c', v: 'NA' }], {});
    expect(bars(r)).toEqual([['a', 2]]);
    expect(r.diagnostics).toMatchObject([{ code: 'derive.missing-values', severity: 'warning', rows: [2, 3] }]);
  });

  it('fails when no row is complete', async () => {
    const r = await derive([{ k: 'a', v: null }], {});
    expect(r.ok).toBe(false);
    expect(r.diagnostics.map((d) => d.code)).toContain('derive.no-rows');
  });

  it('orders by label naturally, and keeps data order when asked', async () => {
    const rows = [{ k: 'Pier 10', v: 1 }, { k: 'Pier 2', v: 3 }, { k: 'Pier 1', v: 2 }];
    expect(bars(await derive(rows, { order: 'label' })).map((b) => (b as string[])[0])).toEqual(['Pier 1', 'Pier 2', 'Pier 10']);
    expect(bars(await derive(rows, { order: 'data' })).map((b) => (b as string[])[0])).toEqual(['Pier 10', 'Pier 2', 'Pier 1']);
  });

  it('keeps the key order of an ordered key', async () => {
    const rows = [{ k: 'Mar', v: 1 }, { k: 'Jan', v: 3 }, { k: 'Feb', v: 2 }];
    expect(bars(await derive(rows, { order: 'key' }))).toEqual([['Jan', 3], ['Feb', 2], ['Mar', 1]]);
  });

  it('folds the smallest bars into "Others" carrying their total', async () => {
    const rows = [{ k: 'a', v: 100 }, { k: 'b', v: 90 }, { k: 'c', v: 80 }, ...Array.from({ length: 7 }, (_, i) => ({ k: `k${i}`, v: i + 1 }))];
    const r = await derive(rows, { capacity: 4 });
    expect(bars(r)).toEqual([['a', 100], ['b', 90], ['c', 80], ['Others (7)', 28]]);
    expect(r.diagnostics).toMatchObject([{ code: 'derive.others-folded', severity: 'warning' }]);
    expect(r.ok && r.value.bars[3]!.folds).toBe(7);
  });

  it('states the folded total instead of drawing an "Others" bar longer than every bar shown', async () => {
    // Found rendering 5,000 sensors: a 4.8M "Others" bar flattened bars of about 2,000 to nothing.
    const rows = Array.from({ length: 50 }, (_, i) => ({ k: `k${i}`, v: 10 + (i % 3) }));
    const r = await derive(rows, { capacity: 5 });
    expect(r.ok && r.value.foldMode).toBe('stated');
    expect(r.ok && r.value.bars.map((b) => b.label)).toEqual(['k11', 'k14', 'k17', 'k2', 'k20']);
    expect(r.ok && r.value.foldedTotal).toBe(rows.reduce((s, x) => s + x.v, 0) - 5 * 12);
    expect(r.diagnostics[0]!.message).toMatch(/stated in a note/);
  });

  it('leaves folded bars out, rather than adding means into "Others"', async () => {
    const rows = Array.from({ length: 6 }, (_, i) => ({ k: `k${i}`, v: i }));
    const r = await derive(rows, { capacity: 3, aggregate: 'mean' });
    expect(bars(r)).toEqual([['k5', 5], ['k4', 4], ['k3', 3]]);
    expect(r.ok && r.value.foldMode).toBe('dropped');
  });

  it('refuses to fold an ordered key, which would break its order', async () => {
    const rows = Array.from({ length: 6 }, (_, i) => ({ k: `2026-01-0${i + 1}`, v: i }));
    const r = await derive(rows, { capacity: 3, order: 'key' });
    expect(r.diagnostics.map((d) => d.code)).toEqual(['derive.too-many-ordered-bars']);
  });

  it('handles tables far beyond the argument limit of Math.max (a past crash above about 130,000 rows)', async () => {
    const rows = Array.from({ length: 200_000 }, (_, i) => ({ k: i % 2 ? 'a' : `key ${i}`, v: i }));
    const r = await derive(rows, { aggregate: 'max', capacity: 50 });
    expect(r.ok).toBe(true);
    expect(r.ok && r.value.bars[0]).toMatchObject({ label: 'a', value: 199_999 });
  });

  it('warns when date keys are unevenly spaced, since bars hide the gap', async () => {
    const rows = ['2026-01', '2026-02', '2026-03', '2026-06', '2026-07'].map((k, i) => ({ k, v: i + 1 }));
    const r = await derive(rows, { order: 'key' });
    expect(r.diagnostics).toMatchObject([{ code: 'derive.uneven-dates', severity: 'warning', field: 'k' }]);
    expect(r.diagnostics[0]!.message).toContain('after Mar 2026 comes a step of 3 months where the others are 1');
  });

  it('counts calendar months, so monthly data across February is even', async () => {
    const rows = ['2026-01-31', '2026-02-28', '2026-03-31'].map((k, i) => ({ k: k.slice(0, 7), v: i + 1 }));
    expect((await derive(rows, { order: 'key' })).diagnostics).toEqual([]);
    const days = ['2026-02-27', '2026-02-28', '2026-03-01', '2026-03-02'].map((k, i) => ({ k, v: i + 1 }));
    expect((await derive(days, { order: 'key' })).diagnostics).toEqual([]);
  });

  it('compares digits as numbers in natural order', () => {
    expect(['b2', 'b10', 'a', 'B1'].sort(compareNatural)).toEqual(['a', 'B1', 'b2', 'b10']);
  });
});

describe('bars derived from rows grouped once per render (the plan groups them first)', () => {
  it('are the bars and diagnostics of grouping afresh, however often the grouped rows are reused', async () => {
    const rows = [{ k: 'b', v: 2 }, { k: 'a', v: null }, { k: 'b', v: 3 }, { k: 'c', v: 1 }];
    const resolved = resolveBrief({ intent: 'compare', rows, keys: 'k', values: 'v' });
    const t = await readTable(resolved.data, resolved.fields, undefined, memoryFiles({}));
    const f = t.ok ? inferFields(t.value, resolved) : undefined;
    if (!t.ok || !f?.ok) throw new Error('table');
    const plan: BarPlan = { key: refOf(f.value.keys[0]!), value: refOf(f.value.values[0]!), orientation: 'vertical', order: 'value', aggregate: 'sum' };
    const memo = new Map<string, unknown>();
    const fresh = deriveBars(t.value, plan, () => 100);
    const first = deriveBars(t.value, plan, () => 100, barGroups(t.value, plan.key, plan.value, { memo }));
    const again = deriveBars(t.value, plan, () => 100, barGroups(t.value, plan.key, plan.value, { memo }));
    expect(memo.size).toBe(1);
    expect(first).toEqual(fresh);
    expect(again).toEqual(fresh);
    expect(fresh.diagnostics.map((d) => d.code)).toEqual(['derive.missing-values', 'derive.aggregated']);
  });
});
