import { describe, expect, it } from 'vitest';
import { resolveBrief } from '../../src/brief/resolve.js';
import { inferFields, readableName } from '../../src/fields/infer.js';
import { readTable } from '../../src/table/load.js';
import { memoryFiles } from '../helpers.js';

async function fields(rows: Record<string, unknown>[], brief: Record<string, unknown>) {
  const resolved = resolveBrief({ intent: 'compare', rows, ...brief });
  const t = await readTable(resolved.data, resolved.fields, undefined, memoryFiles({}));
  if (!t.ok) throw new Error('table');
  return inferFields(t.value, resolved);
}

describe('fields stage', () => {
  it('gives keys and values their roles and measurement types', async () => {
    const r = await fields([{ pier: 'North', n: 3, day: '2026-10-01', open: true }], { keys: 'pier', values: 'n' });
    expect(r.ok && r.value.all.map((f) => [f.name, f.type, f.role])).toEqual([
      ['pier', 'categorical', 'key'], ['n', 'quantitative', 'value'], ['day', 'temporal', 'other'], ['open', 'categorical', 'other'],
    ]);
  });

  it('recognises months and weekdays as cyclic and orders them by the calendar', async () => {
    const r = await fields([{ m: 'Mar' }, { m: 'Jan' }, { m: 'Feb' }], { keys: 'm' });
    expect(r.ok && r.value.keys[0]).toMatchObject({ type: 'cyclic', levels: ['Jan', 'Feb', 'Mar'] });
    const w = await fields([{ d: 'Sunday' }, { d: 'Monday' }, { d: 'Friday' }], { keys: 'd' });
    expect(w.ok && w.value.keys[0]!.levels).toEqual(['Monday', 'Friday', 'Sunday']);
  });

  it('does not take two compass letters for a cycle', async () => {
    const r = await fields([{ k: 'N' }, { k: 'S' }], { keys: 'k' });
    expect(r.ok && r.value.keys[0]!.type).toBe('categorical');
  });

  it('uses the order a brief gives an ordinal field', async () => {
    const r = await fields([{ s: 'high' }, { s: 'low' }, { s: 'mid' }], { keys: 's', fields: { s: { type: 'ordinal', order: ['low', 'mid', 'high'] } } });
    expect(r.ok && r.value.keys[0]).toMatchObject({ type: 'ordinal', levels: ['low', 'mid', 'high'] });
  });

  it('refuses an order that leaves out a level found in the data', async () => {
    const r = await fields([{ s: 'high' }, { s: 'hgh' }], { keys: 's', fields: { s: { type: 'ordinal', order: ['low', 'high'] } } });
    expect(r.diagnostics).toMatchObject([{ code: 'fields.order-incomplete', path: '/fields/s/order' }]);
  });

  it('refuses an order that lists a level twice', async () => {
    const r = await fields([{ s: 'a' }], { keys: 's', fields: { s: { type: 'ordinal', order: ['a', 'a'] } } });
    expect(r.diagnostics[0]!.code).toBe('fields.order-duplicate');
  });

  it('names an unknown column and suggests the nearest', async () => {
    const r = await fields([{ pier: 'North', crossings: 3 }], { keys: 'pier', values: 'crossing' });
    expect(r.diagnostics).toMatchObject([{ code: 'brief.unknown-column', path: '/values', found: 'crossing', hint: 'did you mean `crossings`?' }]);
  });

  it('points at the list item when several keys are given', async () => {
    const r = await fields([{ a: 'x', b: 'y' }], { keys: ['a', 'bb'] });
    expect(r.diagnostics[0]).toMatchObject({ code: 'brief.unknown-column', path: '/keys/1' });
  });

  it('checks the columns named under fields', async () => {
    const r = await fields([{ a: 'x' }], { keys: 'a', fields: { A: { unit: 'x' } } });
    expect(r.diagnostics[0]).toMatchObject({ code: 'brief.unknown-column', path: '/fields/A', hint: 'did you mean `a`?' });
  });

  it('makes column names readable for titles', () => {
    expect(readableName('crossings_per_day')).toBe('Crossings per day');
    expect(readableName('loanCount')).toBe('Loan count');
  });
});
