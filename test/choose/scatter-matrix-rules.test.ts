import { describe, expect, it } from 'vitest';
import { codes, renderRows } from '../helpers.js';

const rows = Array.from({ length: 24 }, (_, i) => ({ id: `i${i}`, a: i % 5, b: (i * 3) % 7, c: (i * 5) % 11, d: i, kind: `k${i % 3}`, many: `m${i % 12}` }));
const fields = { a: { unit: 'u' }, b: { unit: 'u' }, c: { unit: 'u' }, d: { unit: 'u' } };

describe('rules for the profile intent with few values', () => {
  it('three to twelve values get a scatterplot matrix, its pair count and translucency stated', async () => {
    const r = await renderRows({ intent: 'profile', keys: 'id', values: ['a', 'b', 'c', 'd'], fields }, rows);
    expect(r.ok).toBe(true);
    expect(r.choice).toMatchObject({ form: 'scatter-matrix', rule: 'profile.few-values' });
    expect(r.rationale.some((d) => d.decision.startsWith('the 6 pairs of 4 attributes'))).toBe(true);
    expect(r.rationale.some((d) => /1\/√n/.test(d.rule))).toBe(true);
  });

  it('`color:` colours the points by a class, with the colour hard rule stated', async () => {
    const r = await renderRows({ intent: 'profile', keys: 'id', values: ['a', 'b', 'c'], color: 'kind', fields }, rows);
    expect(r.ok).toBe(true);
    expect(r.rationale.some((d) => d.decision === 'colour tells the 3 levels of `kind` apart')).toBe(true);
  });

  it('a class with more levels than colours a reader can tell apart is refused', async () => {
    const r = await renderRows({ intent: 'profile', keys: 'id', values: ['a', 'b', 'c'], color: 'many', fields }, rows);
    expect(codes(r)).toContain('choice.too-many-colours');
  });

  it('two values with no form pinned have no rule: a matrix of one pair says nothing a scatter would not', async () => {
    const r = await renderRows({ intent: 'profile', keys: 'id', values: ['a', 'b'], fields }, rows);
    expect(codes(r)).toContain('choice.no-rule');
  });

  it('no row complete in every attribute is an error, not an empty matrix', async () => {
    const sparse = rows.map((row, i) => (i % 2 ? { ...row, c: null } : { ...row, b: null }));
    const r = await renderRows({ intent: 'profile', keys: 'id', values: ['a', 'b', 'c'], fields }, sparse);
    expect(r.ok).toBe(false);
    expect(codes(r)).toContain('derive.no-rows');
  });
});
