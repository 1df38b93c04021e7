import { describe, expect, it } from 'vitest';
import { resolveBrief } from '../../src/brief/resolve.js';
import { deriveDotRows } from '../../src/derive/dots.js';
import { readPoints } from '../../src/derive/scatter-points.js';
import { inferFields } from '../../src/fields/infer.js';
import { refOf } from '../../src/fields/types.js';
import { readTable } from '../../src/table/load.js';
import { memoryFiles } from '../helpers.js';

async function tableOf(rows: Record<string, unknown>[], brief: Record<string, unknown>) {
  const resolved = resolveBrief({ rows, ...brief });
  const t = await readTable(resolved.data, resolved.fields, undefined, memoryFiles({}));
  if (!t.ok) throw new Error('table');
  const f = inferFields(t.value, resolved);
  if (!f.ok) throw new Error('fields');
  const field = (name: string) => refOf(f.value.all.find((x) => x.name === name)!);
  return { table: t.value, field };
}

describe('readPoints', () => {
  it('turns each complete row into a point with its codings and source row', async () => {
    const { table, field } = await tableOf([{ x: 1, y: 2, a: 3, c: 'p' }, { x: 4, y: 5, a: 6, c: 'q' }], { intent: 'correlation', values: ['x', 'y'] });
    const read = readPoints(table, { x: field('x'), y: field('y'), area: field('a'), color: field('c') });
    expect(read.points).toEqual([{ x: 1, y: 2, area: 3, color: 'p', row: 1 }, { x: 4, y: 5, area: 6, color: 'q', row: 2 }]);
    expect(read.diagnostics).toEqual([]);
  });

  it('leaves out rows missing x, y or area, one warning per column naming the rows; collects negative areas', async () => {
    const rows = [{ x: 1, y: 2, a: 1 }, { x: null, y: 2, a: 1 }, { x: 1, y: 2, a: null }, { x: 1, y: 2, a: -3 }, { x: 2, y: null, a: 1 }, { x: 3, y: 3, a: 0 }];
    const { table, field } = await tableOf(rows, { intent: 'correlation', values: ['x', 'y'] });
    const read = readPoints(table, { x: field('x'), y: field('y'), area: field('a') });
    expect(read.points.map((p) => p.row)).toEqual([1, 6]);
    expect(read.negativeArea).toEqual([4]);
    expect(read.diagnostics.map((d) => [d.code, d.field, d.rows])).toEqual([['derive.missing-values', 'x', [2]], ['derive.missing-values', 'a', [3]], ['derive.missing-values', 'y', [5]]]);
  });
});

describe('deriveDotRows', () => {
  const rows = [{ k: 'a', p: 3, q: 9 }, { k: 'b', p: 5, q: 4 }, { k: 'c', p: 1, q: 7 }, { k: 'a', p: 1, q: 1 }, { k: 'd', p: null, q: 2 }];

  it('one row per key, values combined by the aggregate, sorted by the last value, largest first', async () => {
    const { table, field } = await tableOf(rows, { intent: 'compare', keys: 'k', values: ['p', 'q'] });
    const r = deriveDotRows(table, { key: field('k'), values: [field('p'), field('q')], order: 'value', aggregate: 'mean' });
    expect(r.rows.map((x) => [x.label, ...x.values])).toEqual([['c', 1, 7], ['a', 2, 5], ['b', 5, 4], ['d', NaN, 2]]);
    // d has no p: its q dot is kept (sorted by the value it has), listed as partial, with the warning naming its row; a has two rows: combined, and said.
    expect(r.partial.map((x) => x.label)).toEqual(['d']);
    expect(r.diagnostics.map((d) => d.code).sort()).toEqual(['derive.aggregated', 'derive.missing-values']);
  });

  it('keeps label or data order when asked', async () => {
    const { table, field } = await tableOf(rows.slice(0, 3), { intent: 'compare', keys: 'k', values: 'p' });
    const q = { key: field('k'), values: [field('p')], aggregate: 'sum' as const };
    expect(deriveDotRows(table, { ...q, order: 'label' }).rows.map((r) => r.label)).toEqual(['a', 'b', 'c']);
    expect(deriveDotRows(table, { ...q, order: 'data' }).rows.map((r) => r.label)).toEqual(['a', 'b', 'c']);
    expect(deriveDotRows(table, { ...q, order: 'value' }).rows.map((r) => r.label)).toEqual(['b', 'a', 'c']);
  });
});
