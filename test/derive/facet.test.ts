import { describe, expect, it } from 'vitest';
import { resolveBrief } from '../../src/brief/resolve.js';
import { orderPanels, splitTable } from '../../src/derive/facet.js';
import { deriveGroupedBars, type GroupedBarQuery } from '../../src/derive/grouped-bars.js';
import { inferFields } from '../../src/fields/infer.js';
import { refOf } from '../../src/fields/types.js';
import { readTable } from '../../src/table/load.js';
import { memoryFiles } from '../helpers.js';

async function load(rows: Record<string, unknown>[], brief: Record<string, unknown> = {}) {
  const resolved = resolveBrief({ intent: 'compare', rows, keys: 'k', values: 'v', ...brief });
  const t = await readTable(resolved.data, resolved.fields, undefined, memoryFiles({}));
  if (!t.ok) throw new Error('table');
  const f = inferFields(t.value, resolved);
  if (!f.ok) throw new Error('fields');
  return { table: t.value, fields: f.value };
}

describe('splitting a table by a facet', () => {
  it('gives one part per level in order of first appearance, each with only its rows and their source positions', async () => {
    const { table, fields } = await load([{ s: 'B', k: 'x', v: 1 }, { s: 'A', k: 'y', v: 2 }, { s: 'B', k: 'z', v: 3 }]);
    const { parts, diagnostics } = splitTable(table, refOf(fields.all.find((f) => f.name === 's')!));
    expect(diagnostics).toEqual([]);
    expect(parts.map((p) => p.label)).toEqual(['B', 'A']);
    expect(parts[0]!.table.rowCount).toBe(2);
    expect(parts[0]!.table.columns.find((c) => c.name === 'v')!.values).toEqual([1, 3]);
    expect(parts[0]!.table.rowPositions).toEqual([1, 3]);
  });

  it('leaves out rows with no facet level, naming them in a warning (never a panel of their own)', async () => {
    const { table, fields } = await load([{ s: 'B', k: 'x', v: 1 }, { s: null, k: 'y', v: 2 }]);
    const { parts, diagnostics } = splitTable(table, refOf(fields.all.find((f) => f.name === 's')!));
    expect(parts.map((p) => p.label)).toEqual(['B']);
    expect(diagnostics.map((d) => [d.code, d.rows])).toEqual([['derive.missing-values', [2]]]);
  });
});

describe('ordering panels', () => {
  const panels = [{ label: 'b', sortKey: 2, value: 5 }, { label: 'a10', sortKey: 0, value: 5 }, { label: 'a9', sortKey: 1, value: 9 }];
  it('by value, largest first, ties by label (code points)', () => expect(orderPanels(panels, 'value').map((p) => p.label)).toEqual(['a9', 'a10', 'b']));
  it('by label, in natural order', () => expect(orderPanels(panels, 'label').map((p) => p.label)).toEqual(['a9', 'a10', 'b']));
  it('in the facet\'s own order', () => expect(orderPanels(panels, 'key').map((p) => p.label)).toEqual(['a10', 'a9', 'b']));
  it('as the data gives them', () => expect(orderPanels(panels, 'data').map((p) => p.label)).toEqual(['b', 'a10', 'a9']));
});

describe('derive stage for grouped bars', () => {
  async function grouped(rows: Record<string, unknown>[], groups: string[], capacity = 100) {
    const { table, fields } = await load(rows, { keys: ['k', 'g'] });
    const query: GroupedBarQuery = { key: refOf(fields.keys[0]!), group: refOf(fields.keys[1]!), value: refOf(fields.values[0]!), order: 'value', aggregate: 'sum', groups };
    return deriveGroupedBars(table, query, () => capacity);
  }

  it('combines rows per key and group, keys by their total, bars in the given group order within each key', async () => {
    const r = await grouped([{ k: 'A', g: 'y', v: 1 }, { k: 'B', g: 'x', v: 4 }, { k: 'A', g: 'x', v: 2 }, { k: 'B', g: 'y', v: 3 }, { k: 'A', g: 'x', v: 2 }], ['y', 'x']);
    if (!r.ok) throw new Error('derive');
    expect(r.value.keys).toEqual(['B', 'A']);
    expect(r.value.bars.map((b) => [b.key, b.group, b.value])).toEqual([['B', 'y', 3], ['B', 'x', 4], ['A', 'y', 1], ['A', 'x', 4]]);
  });

  it('a combination with no rows has no bar (never a bar of 0)', async () => {
    const r = await grouped([{ k: 'A', g: 'x', v: 1 }, { k: 'B', g: 'y', v: 2 }], ['x', 'y']);
    if (!r.ok) throw new Error('derive');
    expect(r.value.bars.map((b) => `${b.key}${b.group}`)).toEqual(['By', 'Ax']);
  });

  it('more bars than the capacity is an error naming the facet way out', async () => {
    const r = await grouped([{ k: 'A', g: 'x', v: 1 }, { k: 'B', g: 'y', v: 2 }], ['x', 'y'], 3);
    expect(r.ok).toBe(false);
    expect(r.diagnostics.map((d) => d.code)).toContain('derive.too-many-grouped-bars');
  });
});
