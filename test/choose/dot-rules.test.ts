import { describe, expect, it } from 'vitest';
import type { DotPlan } from '../../src/forms/dot-plan.js';
import { dumpScene } from '../../src/scene/dump.js';
import { renderRows } from '../helpers.js';

const towns = [{ town: 'Alder', jan: 2.5, jul: 17.1 }, { town: 'Birch', jan: -1.8, jul: 19.0 }, { town: 'Cedar', jan: 4.2, jul: 15.4 }];
const decisions = (r: { rationale: { decision: string; rule: string }[] }) => r.rationale.map((d) => `${d.decision} | ${d.rule}`).join('\n');

describe('rules for dot plots (compare)', () => {
  it('a value whose zero is arbitrary gets dots, sorted by value, on an axis that need not include zero', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'town', values: 'jul', fields: { jul: { unit: '°C', zero: 'arbitrary' } } }, towns);
    expect(r.choice!.form).toBe('dot');
    expect(r.rationale[0]!.rule).toMatch(/^compare\.arbitrary-zero/);
    expect(decisions(r)).toMatch(/need not include zero \| the zero of `jul` is arbitrary/);
    expect((r.choice!.plan as DotPlan).order).toBe('value');
    expect((r.scene!.axes.find((a) => a.orient === 'bottom')!.domain as number[])[0]).toBeGreaterThan(0);
  });

  it('`form: dot` is honoured for an ordinary value, and says why zero may be left out', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'town', values: 'jul', form: 'dot', fields: { jul: { unit: '°C' } } }, towns);
    expect(r.choice!.form).toBe('dot');
    expect(decisions(r)).toMatch(/form pinned to dot/);
    expect(decisions(r)).toMatch(/position on an aligned scale/);
  });

  it('two values per key give a dumbbell, explained', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'town', values: ['jan', 'jul'], fields: { jan: { unit: '°C' }, jul: { unit: '°C' } } }, towns);
    expect(r.ok).toBe(true);
    expect(r.rationale[0]!.rule).toMatch(/^compare\.paired-values/);
    expect(decisions(r)).toMatch(/a dumbbell per key: a line joins its `jan` and `jul` dots/);
  });

  it('refuses a dumbbell of two values in different units, offering aligned panels', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'town', values: ['jan', 'jul'], fields: { jan: { unit: '°C' }, jul: { unit: '°F' } } }, towns);
    expect(r.diagnostics[0]).toMatchObject({ code: 'choice.dumbbell-units-differ', path: '/values' });
    expect(r.diagnostics[0]!.hint).toMatch(/panels/);
  });

  it('refuses a dot plot with no value, and more keys than rows of dots fit', async () => {
    const none = await renderRows({ intent: 'compare', keys: 'town', form: 'dot', aggregate: 'count' }, towns);
    expect(none.diagnostics[0]).toMatchObject({ code: 'choice.no-value', path: '/values' });
    const many = Array.from({ length: 200 }, (_, i) => ({ town: `T${i}`, jul: i }));
    const r = await renderRows({ intent: 'compare', keys: 'town', values: 'jul', form: 'dot', fields: { jul: { unit: '°C' } } }, many);
    expect(r.diagnostics.find((d) => d.code === 'derive.too-many-dots')).toMatchObject({ field: 'town' });
  });

  it('`baseline: fit` is not refused for a value whose zero is arbitrary (dots need no zero), but still is for bars', async () => {
    const fields = { jul: { unit: '°C', zero: 'arbitrary' } };
    const dots = await renderRows({ intent: 'compare', keys: 'town', values: 'jul', baseline: 'fit', fields }, towns);
    expect(dots.ok).toBe(true);
    expect(dots.choice!.form).toBe('dot');
    const bars = await renderRows({ intent: 'compare', keys: 'town', values: 'jul', baseline: 'fit', fields: { jul: { unit: '°C' } } }, towns);
    expect(bars.diagnostics[0]).toMatchObject({ code: 'choice.baseline-fit-refused', path: '/baseline' });
  });

  it('refuses to sum several rows of a key whose values have an arbitrary zero, and averages them when asked', async () => {
    const twice = [...towns, { town: 'Alder', jan: 3.5, jul: 18.1 }];
    const fields = { jul: { unit: '°C', zero: 'arbitrary' } };
    const summed = await renderRows({ intent: 'compare', keys: 'town', values: 'jul', fields }, twice);
    expect(summed.diagnostics.find((d) => d.code === 'derive.sum-not-meaningful')).toMatchObject({ path: '/aggregate', field: 'town' });
    const mean = await renderRows({ intent: 'compare', keys: 'town', values: 'jul', fields, aggregate: 'mean' }, twice);
    expect(mean.ok).toBe(true);
    const alder = dumpScene(mean.scene!).marks.find((m) => m.role === 'point' && m.datum!.town === 'Alder')!;
    expect(alder.datum!.jul).toBeCloseTo(17.6, 12);
  });

  it('refuses `order: cluster`', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'town', values: 'jul', form: 'dot', order: 'cluster', fields: { jul: { unit: '°C' } } }, towns);
    expect(r.diagnostics[0]).toMatchObject({ code: 'choice.order-not-applicable', path: '/order' });
  });
});
