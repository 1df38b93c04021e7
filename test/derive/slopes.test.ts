import { describe, expect, it } from 'vitest';
import { resolveBrief } from '../../src/brief/resolve.js';
import { deriveSlopes, direction, periodsInOrder, type SlopeQuery } from '../../src/derive/slopes.js';
import { inferFields } from '../../src/fields/infer.js';
import { refOf } from '../../src/fields/types.js';
import { readTable } from '../../src/table/load.js';
import { memoryFiles } from '../helpers.js';

async function derive(rows: Record<string, unknown>[], brief: Record<string, unknown>, aggregate: SlopeQuery['aggregate'] = 'sum') {
  const resolved = resolveBrief({ intent: 'shift', rows, ...brief });
  const t = await readTable(resolved.data, resolved.fields, undefined, memoryFiles({}));
  if (!t.ok) throw new Error('table');
  const f = inferFields(t.value, resolved);
  if (!f.ok) throw new Error('fields');
  const [item, period] = f.value.keys;
  const v = f.value.values.map(refOf);
  const query: SlopeQuery = period
    ? { item: refOf(item!), source: { kind: 'periods', period: refOf(period), value: v[0]! }, width: v[1], aggregate }
    : { item: refOf(item!), source: { kind: 'columns', before: v[0]!, after: v[1]! }, width: v[2], aggregate };
  return deriveSlopes(t.value, query);
}

describe('slope derivation', () => {
  it('direction is up, down or unchanged by exact comparison', () => {
    expect([direction(1, 2), direction(2, 1), direction(3, 3), direction(0, -0)]).toEqual(['up', 'down', 'unchanged', 'unchanged']);
  });

  it('periods come in their key order, not their order of appearance', () => {
    const g = (period: string, sortKey: number) => ({ labels: ['a', period], sortKeys: [0, sortKey], values: [1], rows: [1] });
    expect(periodsInOrder([g('2026', 2026), g('2019', 2019), g('2026', 2026)])).toEqual(['2019', '2026']);
  });

  it('pairs each item\'s two periods, in time order, sorted by item name', async () => {
    const rows = [{ i: 'b', y: 2026, v: 5 }, { i: 'a', y: 2026, v: 1 }, { i: 'b', y: 2019, v: 7 }, { i: 'a', y: 2019, v: 1 }];
    const r = await derive(rows, { keys: ['i', 'y'], values: 'v' });
    if (!r.ok) throw new Error('derive failed');
    expect(r.value.ends).toEqual(['2019', '2026']);
    expect(r.value.items.map((i) => [i.label, i.before, i.after, i.direction])).toEqual([['a', 1, 1, 'unchanged'], ['b', 7, 5, 'down']]);
  });

  it('two value columns give the two ends, named by their labels', async () => {
    const r = await derive([{ i: 'x', before: 2, after: 3 }], { keys: 'i', values: ['before', 'after'] });
    expect(r.ok && r.value.ends).toEqual(['Before', 'After']);
    expect(r.ok && r.value.items[0]!.direction).toBe('up');
  });

  it('an item with one point only is left out and named in a warning', async () => {
    const r = await derive([{ i: 'a', y: 1, v: 1 }, { i: 'a', y: 2, v: 2 }, { i: 'b', y: 2, v: 4 }], { keys: ['i', 'y'], values: 'v' });
    expect(r.ok && r.value.items.map((i) => i.label)).toEqual(['a']);
    expect(r.diagnostics.find((d) => d.code === 'derive.slope-incomplete')).toMatchObject({ field: 'i', found: 'b' });
  });

  it('rows repeating an item and period are combined by the aggregate, and said', async () => {
    const rows = [{ i: 'a', y: 1, v: 1 }, { i: 'a', y: 1, v: 3 }, { i: 'a', y: 2, v: 5 }];
    const r = await derive(rows, { keys: ['i', 'y'], values: 'v' }, 'mean');
    expect(r.ok && r.value.items[0]!.before).toBe(2);
    expect(r.diagnostics.map((d) => d.code)).toContain('derive.aggregated');
  });

  it('a width value is the mean of the item\'s rows; a negative one is an error naming its rows', async () => {
    const ok = await derive([{ i: 'a', y: 1, v: 1, w: 2 }, { i: 'a', y: 2, v: 2, w: 4 }], { keys: ['i', 'y'], values: ['v', 'w'] });
    expect(ok.ok && ok.value.items[0]!.width).toBe(3);
    const bad = await derive([{ i: 'a', y: 1, v: 1, w: -2 }, { i: 'a', y: 2, v: 2, w: 4 }], { keys: ['i', 'y'], values: ['v', 'w'] });
    expect(bad.ok).toBe(false);
    expect(bad.diagnostics.find((d) => d.code === 'derive.slope-width-negative')).toMatchObject({ field: 'w', rows: [1] });
  });

  it('no item with both points is an error, not an empty chart', async () => {
    const r = await derive([{ i: 'a', before: 1, after: null }], { keys: 'i', values: ['before', 'after'] });
    expect(r.ok).toBe(false);
    expect(r.diagnostics.map((d) => d.code)).toEqual(expect.arrayContaining(['derive.missing-values', 'derive.no-rows']));
  });
});
