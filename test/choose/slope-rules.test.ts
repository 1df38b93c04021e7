import { describe, expect, it } from 'vitest';
import type { SlopePlan } from '../../src/forms/slope-plan.js';
import { codes, renderRows } from '../helpers.js';

const brief = { intent: 'shift', keys: ['hut', 'year'], values: 'nights', fields: { nights: { unit: 'nights' } } };
const rows = [
  { hut: 'Alder', year: 2025, nights: 10 }, { hut: 'Alder', year: 2026, nights: 14 },
  { hut: 'Birch', year: 2025, nights: 9 }, { hut: 'Birch', year: 2026, nights: 6 },
];
const problem = (r: { diagnostics: { code: string; path?: string; hint?: string }[] }, code: string) => r.diagnostics.find((d) => d.code === code);

describe('rules for the shift intent', () => {
  it('an item key and a period key of two periods get a slope chart, with each decision and its rule', async () => {
    const r = await renderRows(brief, rows);
    expect(r.ok).toBe(true);
    expect(r.choice).toMatchObject({ form: 'slope', rule: 'shift.two-points' });
    const rule = (decision: string) => r.rationale.find((d) => d.decision.startsWith(decision))?.rule;
    expect(rule('slope chart')).toMatch(/^shift\.two-points/);
    expect(rule('lines coloured by direction')).toMatch(/redundant/);
    expect(rule('each item labelled at both ends')).toMatch(/isotonic/);
    expect(rule('the shared axis includes zero')).toMatch(/baseline/);
  });

  it('two value columns on one key also get a slope chart; `baseline: fit` leaves zero out', async () => {
    const r = await renderRows({ intent: 'shift', keys: 'hut', values: ['before', 'after'], baseline: 'fit' }, [{ hut: 'A', before: 50, after: 60 }, { hut: 'B', before: 55, after: 52 }]);
    expect(r.ok).toBe(true);
    expect((r.choice!.plan as SlopePlan).zero).toBe(false);
    expect(r.rationale.some((d) => d.decision === 'the shared axis spans the data, not zero')).toBe(true);
  });

  it('a third value sets the line width, and the rationale says it carries only the secondary value', async () => {
    const r = await renderRows({ ...brief, values: ['nights', 'beds'] }, rows.map((x) => ({ ...x, beds: 20 })));
    expect(r.rationale.find((d) => d.decision.startsWith('line width shows `beds`'))!.rule).toMatch(/secondary/);
  });

  it('one value on one key is refused with a coded error offering the two shapes', async () => {
    const r = await renderRows({ intent: 'shift', keys: 'hut', values: 'nights' }, rows);
    expect(problem(r, 'choice.slope-shape')).toMatchObject({ path: '/values' });
    expect(problem(r, 'choice.slope-shape')!.hint).toMatch(/values: \[before, after\]/);
  });

  it('three periods are refused with a coded error on the period key', async () => {
    const r = await renderRows(brief, [...rows, { hut: 'Alder', year: 2027, nights: 3 }]);
    expect(r.ok).toBe(false);
    expect(problem(r, 'choice.slope-periods')).toMatchObject({ path: '/keys/1', found: '3 periods' });
  });

  it('two value columns in different units are refused', async () => {
    const r = await renderRows({ intent: 'shift', keys: 'hut', values: ['a', 'b'], fields: { a: { unit: '€' }, b: { unit: '%' } } }, [{ hut: 'A', a: 1, b: 2 }]);
    expect(problem(r, 'choice.slope-units-differ')).toMatchObject({ path: '/fields/b/unit' });
  });

  it('no key, too many keys and a value that is not a number are each refused', async () => {
    expect(problem(await renderRows({ intent: 'shift', values: ['a', 'b'] }, [{ a: 1, b: 2 }]), 'choice.no-key')).toMatchObject({ path: '/keys' });
    expect(problem(await renderRows({ intent: 'shift', keys: ['a', 'b', 'c'], values: 'v' }, [{ a: 'x', b: 'y', c: 'z', v: 1 }]), 'choice.too-many-keys')).toMatchObject({ path: '/keys' });
    expect(problem(await renderRows({ intent: 'shift', keys: 'k', values: ['a', 'b'] }, [{ k: 'x', a: 'low', b: 'high' }]), 'choice.value-not-quantitative')).toMatchObject({ path: '/values' });
  });

  it('more than 40 items render with a warning, and the rationale offers another form', async () => {
    const many = Array.from({ length: 45 }, (_, i) => [{ hut: `H${i}`, year: 1, nights: i }, { hut: `H${i}`, year: 2, nights: 45 - i }]).flat();
    const r = await renderRows(brief, many, {});
    expect(r.ok).toBe(true);
    expect(codes(r)).toContain('choice.slope-many-items');
    expect(r.rationale.find((d) => d.decision === '45 items drawn as 45 lines')!.rule).toMatch(/intent compare/);
  });

  it('an item with one point is left out with a warning; a negative width is refused', async () => {
    const r = await renderRows(brief, [...rows, { hut: 'Cedar', year: 2026, nights: 4 }]);
    expect(r.ok).toBe(true);
    expect(codes(r)).toContain('derive.slope-incomplete');
    const w = await renderRows({ ...brief, values: ['nights', 'beds'] }, rows.map((x, i) => ({ ...x, beds: i === 2 ? -1 : 5 })));
    expect(w.ok).toBe(false);
    expect(problem(w, 'derive.slope-width-negative')).toMatchObject({ rows: [3] });
  });

  it('a slope chart pinned under another intent with one value is refused with a coded error, never a crash', async () => {
    const r = await renderRows({ intent: 'compare', form: 'slope', keys: 'hut', values: 'nights' }, rows);
    expect(codes(r)).not.toContain('render.internal');
    expect(problem(r, 'choice.form-not-for-intent')).toMatchObject({ path: '/form' });
    const shift = await renderRows({ intent: 'shift', form: 'slope', keys: 'hut', values: 'nights' }, rows);
    expect(problem(shift, 'choice.slope-shape')).toMatchObject({ path: '/values' });
  });

  it('`order:` is refused for a slope chart rather than silently ignored', async () => {
    const r = await renderRows({ ...brief, order: 'value' }, rows);
    expect(problem(r, 'choice.order-not-applicable')).toMatchObject({ path: '/order' });
  });
});
