import { describe, expect, it } from 'vitest';
import { codes, renderRows } from '../helpers.js';

const fields = { riders: { unit: 'riders' } };
const monthly = (n: number, series: string[] = ['A'], value: (s: number, i: number) => number | null = (s, i) => 10 + s + i) =>
  series.flatMap((route, s) => Array.from({ length: n }, (_, i) => ({ month: `${2020 + Math.floor(i / 12)}-${String((i % 12) + 1).padStart(2, '0')}`, route, riders: value(s, i) })));

describe('rules for trend and change', () => {
  it('draws intent trend over a date key as a line, and names the rule', async () => {
    const r = await renderRows({ intent: 'trend', keys: 'month', values: 'riders', fields }, monthly(6));
    expect(r.ok).toBe(true);
    expect(r.choice!.form).toBe('line');
    expect(r.rationale[0]!.rule).toMatch(/^trend\.line:/);
    expect(r.rationale.some((d) => /hard rule: a line implies an order/.test(d.rule))).toBe(true);
  });

  it('refuses a line over a categorical key, explaining the order it would imply and offering bars', async () => {
    const r = await renderRows({ intent: 'trend', keys: 'pier', values: 'riders', fields }, [{ pier: 'North', riders: 3 }, { pier: 'South', riders: 4 }]);
    expect(r.ok).toBe(false);
    expect(r.diagnostics).toMatchObject([{ code: 'choice.line-on-categorical', path: '/keys' }]);
    expect(r.diagnostics[0]!.hint).toMatch(/bars \(intent: compare\)/);
    const pinned = await renderRows({ intent: 'compare', form: 'line', keys: 'pier', values: 'riders', fields }, [{ pier: 'North', riders: 3 }]);
    expect(codes(pinned)).toContain('choice.line-on-categorical');
  });

  it('draws more than 8 series as small multiples by the series key, with the decision stated and a warning that says so', async () => {
    const names = Array.from({ length: 9 }, (_, k) => `R${k}`);
    const r = await renderRows({ intent: 'trend', keys: ['month', 'route'], values: 'riders', fields, size: { width: 720, height: 600 } }, monthly(4, names));
    expect(r.ok).toBe(true);
    const warning = r.diagnostics.find((d) => d.code === 'choice.too-many-series')!;
    expect(warning).toMatchObject({ severity: 'warning', path: '/keys', field: 'route' });
    expect(warning.message).toMatch(/drawn as 9 panels/);
    expect(r.choice!.facet).toMatchObject({ field: { name: 'route' }, context: false, order: 'value' });
    expect(r.rationale.find((d) => d.rule.startsWith('facet.form:'))!.rule).toMatch(/route` has 9 series/);
    expect(r.scene!.panels.map((p) => p.facet!.route).sort()).toEqual(names);
  });

  it('keeps 8 series in one panel with direct labels (MAX_SERIES is the limit, not one less)', async () => {
    const r = await renderRows({ intent: 'trend', keys: ['month', 'route'], values: 'riders', fields, size: { width: 720, height: 600 } }, monthly(4, Array.from({ length: 8 }, (_, k) => `R${k}`)));
    expect(r.choice!.facet).toBeUndefined();
    expect(codes(r)).not.toContain('choice.too-many-series');
    expect(r.scene!.panels).toHaveLength(1);
  });

  it('`facet:` on the series key draws one panel per series without the warning; faceting by the ordered x key is still refused', async () => {
    const names = Array.from({ length: 10 }, (_, k) => `R${k}`);
    const r = await renderRows({ intent: 'trend', keys: ['month', 'route'], values: 'riders', facet: { by: 'route', context: true }, fields, size: { width: 900, height: 700 } }, monthly(4, names));
    expect(r.ok).toBe(true);
    expect(codes(r)).not.toContain('choice.too-many-series');
    expect(r.choice!.facet).toMatchObject({ field: { name: 'route' }, context: true });
    expect(r.rationale.some((d) => d.rule.startsWith('facet.brief'))).toBe(true);
    expect(r.scene!.panels).toHaveLength(10);
    const onKey = await renderRows({ intent: 'trend', keys: ['month', 'route'], values: 'riders', facet: 'month', fields }, monthly(4, ['A', 'B']));
    expect(onKey.diagnostics.map((d) => [d.code, d.path])).toEqual([['choice.facet-on-key', '/facet']]);
  });

  it('an index line chart of more than 8 series is drawn as panels too', async () => {
    const names = Array.from({ length: 9 }, (_, k) => `R${k}`);
    const r = await renderRows({ intent: 'change', keys: ['month', 'route'], values: 'riders', fields, size: { width: 900, height: 700 } }, monthly(4, names));
    expect(r.choice!.form).toBe('index-line');
    expect(r.choice!.facet).toMatchObject({ field: { name: 'route' } });
    expect(r.scene!.panels).toHaveLength(9);
  });

  it('checks the shape of a trend: a key, at most two keys, a numeric value', async () => {
    expect(codes(await renderRows({ intent: 'trend', values: 'riders', fields }, monthly(3)))).toEqual(['choice.no-key']);
    expect(codes(await renderRows({ intent: 'trend', keys: ['month', 'route', 'riders'], values: 'riders', fields }, monthly(3)))).toContain('choice.too-many-keys');
    expect(codes(await renderRows({ intent: 'trend', keys: 'month', fields }, monthly(3)))).toEqual(['choice.no-value']);
    expect(codes(await renderRows({ intent: 'trend', keys: 'month', values: 'route' }, monthly(3)))).toContain('choice.value-not-quantitative');
  });

  it('refuses index options on a trend: they belong to intent change', async () => {
    const r = await renderRows({ intent: 'trend', keys: 'month', values: 'riders', index: { as: 'percent' }, fields }, monthly(3));
    expect(r.diagnostics).toMatchObject([{ code: 'brief.option-not-used', path: '/index' }]);
  });

  it('indexes change to the first key by default, by the change.index-line rule', async () => {
    const r = await renderRows({ intent: 'change', keys: ['month', 'route'], values: 'riders', fields }, monthly(4, ['A', 'B']));
    expect(r.ok).toBe(true);
    expect(r.choice!.form).toBe('index-line');
    expect(r.rationale[0]!.rule).toMatch(/^change\.index-line:/);
    expect(r.rationale.some((d) => /no `index.base` given: the first key/.test(d.rule))).toBe(true);
  });

  it('refuses an index whose base is missing for a series, naming the series and the row', async () => {
    const rows = monthly(3, ['A', 'B'], (s, i) => (s === 1 && i === 1 ? null : 5 + i));
    const r = await renderRows({ intent: 'change', keys: ['month', 'route'], values: 'riders', index: { base: 'Feb 2020' }, fields }, rows);
    expect(r.ok).toBe(false);
    const d = r.diagnostics.find((x) => x.code === 'derive.index-base-missing')!;
    expect(d).toMatchObject({ path: '/index/base', rows: [5] });
    expect(d.message).toMatch(/"B"/);
  });

  it('refuses an index base that no key is, and one that is zero or negative', async () => {
    const none = await renderRows({ intent: 'change', keys: 'month', values: 'riders', index: { base: '1999-01' }, fields }, monthly(3));
    expect(none.diagnostics).toMatchObject([{ code: 'derive.index-base-missing', path: '/index/base' }]);
    const zero = await renderRows({ intent: 'change', keys: 'month', values: 'riders', fields }, monthly(3, ['A'], (_, i) => i - 1));
    expect(zero.diagnostics).toMatchObject([{ code: 'derive.index-base-not-positive', path: '/index/base', rows: [1] }]);
  });

  it('draws index.base previous as period-over-period bars around zero, refusing a fitted baseline and several series', async () => {
    const r = await renderRows({ intent: 'change', keys: 'month', values: 'riders', index: { base: 'previous' }, fields }, monthly(5));
    expect(r.ok).toBe(true);
    expect(r.choice!.form).toBe('change-bar');
    expect(r.rationale[0]!.rule).toMatch(/^change\.period-over-period:/);
    expect(r.rationale.some((d) => d.decision === 'the value axis starts at zero')).toBe(true);
    const fit = await renderRows({ intent: 'change', keys: 'month', values: 'riders', index: { base: 'previous' }, baseline: 'fit', fields }, monthly(5));
    expect(fit.diagnostics).toMatchObject([{ code: 'choice.baseline-fit-refused', path: '/baseline' }]);
    const two = await renderRows({ intent: 'change', keys: ['month', 'route'], values: 'riders', index: { base: 'previous' }, fields }, monthly(5, ['A', 'B']));
    expect(two.diagnostics).toMatchObject([{ code: 'choice.period-change-one-series', path: '/keys' }]);
  });

  it('refuses period-over-period bars from a zero previous value, and more periods than fit as bars', async () => {
    const zero = await renderRows({ intent: 'change', keys: 'month', values: 'riders', index: { base: 'previous' }, fields }, monthly(3, ['A'], (_, i) => i));
    expect(zero.diagnostics).toMatchObject([{ code: 'derive.index-base-not-positive', rows: [1] }]);
    const many = await renderRows({ intent: 'change', keys: 'month', values: 'riders', index: { base: 'previous' }, fields, size: { width: 200, height: 200 } }, monthly(80));
    expect(codes(many)).toContain('derive.too-many-ordered-bars');
  });
});
