import { describe, expect, it } from 'vitest';
import type { GroupsPlan } from '../../src/forms/distribution-plan.js';
import { codes, renderRows } from '../helpers.js';

const unit = { fields: { v: { unit: 'min' } } };
const waits = Array.from({ length: 60 }, (_, i) => ({ v: (i * 7919) % 97 / 3 }));
const byGroup = (groups: string[], perGroup: number) => groups.flatMap((g, gi) => Array.from({ length: perGroup }, (_, i) => ({ g, v: gi * 10 + ((i * 37) % 23) })));
const decisionsOf = (r: { rationale: { decision: string; rule: string }[] }) => r.rationale.map((d) => `${d.decision} | ${d.rule}`).join('\n');

describe('rules for the distribution intent', () => {
  it('one value and no key gets a histogram, its bin width by Freedman–Diaconis, and the rationale says so', async () => {
    const r = await renderRows({ intent: 'distribution', values: 'v', ...unit }, waits);
    expect(r.ok).toBe(true);
    expect(r.choice).toMatchObject({ form: 'histogram', rule: 'distribution.one-value' });
    expect(decisionsOf(r)).toMatch(/Freedman–Diaconis/);
    expect(decisionsOf(r)).toMatch(/2 · IQR · n\^\(−1\/3\)/);
    expect(r.rationale.some((d) => d.decision === 'the value axis starts at zero')).toBe(true);
    expect(r.rationale.some((d) => /^bars touch/.test(d.decision))).toBe(true);
  });

  it('the rationale says when rounding the edges to nice values changed the width', async () => {
    const r = await renderRows({ intent: 'distribution', values: 'v', ...unit }, waits);
    expect(r.rationale.find((d) => d.decision.startsWith('bin edges at multiples'))!.decision).toMatch(/the width was rounded from [\d.]+ to [\d.]+ min/);
  });

  it('an IQR of zero falls back to Sturges, and the rationale says why', async () => {
    const rows = [...Array.from({ length: 20 }, () => ({ v: 5 })), { v: 1 }, { v: 9 }];
    const r = await renderRows({ intent: 'distribution', values: 'v', ...unit }, rows);
    expect(r.ok).toBe(true);
    expect(r.rationale.some((d) => d.decision.startsWith("bin width from Sturges' rule") && /interquartile range is zero/.test(d.rule))).toBe(true);
  });

  it('a long tail that would need more bins than the plot holds widens the width, and says so', async () => {
    const rows = [...Array.from({ length: 200 }, (_, i) => ({ v: i / 200 })), { v: 100000 }];
    const r = await renderRows({ intent: 'distribution', values: 'v', ...unit }, rows);
    expect(r.ok).toBe(true);
    expect(r.rationale.some((d) => /widened/.test(d.rule))).toBe(true);
  });

  it('a group key with few values per group gets strips; groups sorted by median, largest first', async () => {
    const r = await renderRows({ intent: 'distribution', keys: 'g', values: 'v', ...unit }, byGroup(['a', 'b', 'c'], 30));
    expect(r.choice).toMatchObject({ form: 'strip', rule: 'distribution.groups-few-points', plan: { order: 'median' } });
    expect(r.rationale.some((d) => d.decision.startsWith('groups sorted by median'))).toBe(true);
    expect(r.rationale.some((d) => /need not start at zero/.test(d.decision))).toBe(true);
  });

  it('more than 300 values in the largest group gets boxes; the rationale names type-7 quartiles and Tukey\'s fences', async () => {
    const r = await renderRows({ intent: 'distribution', keys: 'g', values: 'v', ...unit }, [...byGroup(['a'], 301), ...byGroup(['b'], 5)]);
    expect(r.choice).toMatchObject({ form: 'box', rule: 'distribution.groups-many-points' });
    expect(decisionsOf(r)).toMatch(/Hyndman & Fan \(1996\) definition 7/);
    expect(decisionsOf(r)).toMatch(/1\.5 IQR .*Tukey/);
  });

  it('strips say why their dots are jittered and seeded', async () => {
    const r = await renderRows({ intent: 'distribution', keys: 'g', values: 'v', ...unit }, byGroup(['a', 'b'], 10));
    expect(r.rationale.find((d) => d.decision.startsWith('each value one dot, jittered'))!.rule).toMatch(/seeded/);
  });

  it('exactly 300 values in the largest group still gets strips (the threshold is inclusive)', async () => {
    const r = await renderRows({ intent: 'distribution', keys: 'g', values: 'v', ...unit }, byGroup(['a'], 300));
    expect(r.choice!.form).toBe('strip');
  });

  it('`form:` pins a box or a strip whatever the group size', async () => {
    const box = await renderRows({ intent: 'distribution', keys: 'g', values: 'v', form: 'box', ...unit }, byGroup(['a', 'b'], 10));
    expect(box.ok).toBe(true);
    expect(box.choice!.form).toBe('box');
    const strip = await renderRows({ intent: 'distribution', keys: 'g', values: 'v', form: 'strip', ...unit }, byGroup(['a'], 400));
    expect(strip.ok).toBe(true);
    expect(strip.choice!.form).toBe('strip');
  });

  it('an ordinal group key keeps its order; order: label sorts A→Z', async () => {
    const rows = byGroup(['low', 'mid', 'high'], 5);
    const ordinal = await renderRows({ intent: 'distribution', keys: 'g', values: 'v', fields: { v: { unit: 'min' }, g: { type: 'ordinal', order: ['low', 'mid', 'high'] } } }, rows);
    expect((ordinal.choice!.plan as GroupsPlan).order).toBe('key');
    const label = await renderRows({ intent: 'distribution', keys: 'g', values: 'v', order: 'label', ...unit }, rows);
    expect((label.choice!.plan as GroupsPlan).order).toBe('label');
  });
});

describe('refusals and warnings of the distribution intent', () => {
  it('no value: choice.no-value at /values', async () => {
    const r = await renderRows({ intent: 'distribution', keys: 'g' }, byGroup(['a'], 3));
    expect(r.diagnostics.find((d) => d.code === 'choice.no-value')).toMatchObject({ path: '/values' });
  });

  it('a text value: choice.value-not-quantitative with a hint', async () => {
    const r = await renderRows({ intent: 'distribution', values: 'g' }, byGroup(['a', 'b'], 3));
    const d = r.diagnostics.find((x) => x.code === 'choice.value-not-quantitative')!;
    expect(d.path).toBe('/values');
    expect(d.hint).toMatch(/type: quantitative/);
  });

  it('two keys: choice.too-many-keys at /keys', async () => {
    const rows = byGroup(['a', 'b'], 3).map((x) => ({ ...x, h: 'x' }));
    const r = await renderRows({ intent: 'distribution', keys: ['g', 'h'], values: 'v', ...unit }, rows);
    expect(r.diagnostics.find((d) => d.code === 'choice.too-many-keys')).toMatchObject({ path: '/keys' });
  });

  it('a date or numeric group key: choice.group-key-not-categorical, offering a declared type', async () => {
    const rows = [{ d: '2026-01-01', v: 1 }, { d: '2026-01-02', v: 2 }];
    const r = await renderRows({ intent: 'distribution', keys: 'd', values: 'v', ...unit }, rows);
    const d = r.diagnostics.find((x) => x.code === 'choice.group-key-not-categorical')!;
    expect(d.path).toBe('/keys');
    expect(d.hint).toMatch(/type: ordinal/);
  });

  it('form: histogram with a group key: choice.histogram-with-groups at /form', async () => {
    const r = await renderRows({ intent: 'distribution', keys: 'g', values: 'v', form: 'histogram', ...unit }, byGroup(['a'], 3));
    expect(r.diagnostics.find((d) => d.code === 'choice.histogram-with-groups')).toMatchObject({ path: '/form' });
  });

  it('form: box with no group key: choice.no-group-key at /keys', async () => {
    const r = await renderRows({ intent: 'distribution', values: 'v', form: 'box', ...unit }, waits);
    expect(r.diagnostics.find((d) => d.code === 'choice.no-group-key')).toMatchObject({ path: '/keys' });
  });

  it('aggregate: on a distribution is refused (brief.option-not-used at /aggregate), never silently ignored', async () => {
    const r = await renderRows({ intent: 'distribution', values: 'v', aggregate: 'mean', ...unit }, waits);
    expect(r.diagnostics.find((d) => d.code === 'brief.option-not-used')).toMatchObject({ path: '/aggregate' });
  });

  it('baseline: fit on a histogram is refused (bar heights are lengths)', async () => {
    const r = await renderRows({ intent: 'distribution', values: 'v', baseline: 'fit', ...unit }, waits);
    expect(codes(r)).toContain('choice.baseline-fit-refused');
  });

  it('an order on a histogram, or order: cluster on strips: choice.order-not-applicable at /order', async () => {
    const h = await renderRows({ intent: 'distribution', values: 'v', order: 'value', ...unit }, waits);
    expect(h.diagnostics.find((d) => d.code === 'choice.order-not-applicable')).toMatchObject({ path: '/order' });
    const s = await renderRows({ intent: 'distribution', keys: 'g', values: 'v', order: 'cluster', ...unit }, byGroup(['a'], 3));
    expect(s.diagnostics.find((d) => d.code === 'choice.order-not-applicable')).toMatchObject({ path: '/order' });
  });

  it('missing and non-finite values are warned with their count and stated in a note, never dropped silently', async () => {
    const rows = [...waits, { v: null }, { v: '' }, { v: 'NaN' }];
    const r = await renderRows({ intent: 'distribution', values: 'v', ...unit }, rows as Record<string, unknown>[]);
    expect(r.ok).toBe(true);
    const d = r.diagnostics.find((x) => x.code === 'derive.missing-values')!;
    expect(d.severity).toBe('warning');
    expect(d.rows).toHaveLength(3);
    expect(d.message).toMatch(/^3 of 63 values/);
    const notes = r.scene!.root.children.filter((n) => n.role === 'note').map((n) => (n.kind === 'text' ? n.text : ''));
    expect(notes.join(' ')).toMatch(/^3 rows with a missing or non-finite v are not drawn/);
  });

  it('strips with rows lacking a group or a value say how many are left out, in a warning and a note', async () => {
    const rows = [...byGroup(['a', 'b'], 5), { g: null, v: 3 }, { g: 'a', v: null }] as Record<string, unknown>[];
    const r = await renderRows({ intent: 'distribution', keys: 'g', values: 'v', ...unit }, rows);
    expect(r.ok).toBe(true);
    expect(r.diagnostics.filter((d) => d.code === 'derive.missing-values')).toHaveLength(2);
    const notes = r.scene!.root.children.filter((n) => n.role === 'note').map((n) => (n.kind === 'text' ? n.text : '')).join(' ');
    expect(notes).toMatch(/2 rows with a missing key or a missing or non-finite value are not drawn/);
  });

  it('more than 40 groups: choice.many-groups warns at /keys, and the chart is still drawn', async () => {
    const r = await renderRows({ intent: 'distribution', keys: 'g', values: 'v', ...unit }, byGroup(Array.from({ length: 41 }, (_, i) => `G${i}`), 2));
    expect(r.ok).toBe(true);
    const d = r.diagnostics.find((x) => x.code === 'choice.many-groups')!;
    expect(d).toMatchObject({ path: '/keys', severity: 'warning' });
    const few = await renderRows({ intent: 'distribution', keys: 'g', values: 'v', ...unit }, byGroup(Array.from({ length: 40 }, (_, i) => `G${i}`), 2));
    expect(codes(few)).not.toContain('choice.many-groups');
  });

  it('no usable value at all: derive.no-rows', async () => {
    const r = await renderRows({ intent: 'distribution', values: 'v', fields: { v: { type: 'quantitative', unit: 'min' } } }, [{ v: null }, { v: '' }] as Record<string, unknown>[]);
    expect(codes(r)).toContain('derive.no-rows');
  });

  it('values too close together for distinct bin edges: derive.cannot-bin, with a hint', async () => {
    const r = await renderRows({ intent: 'distribution', values: 'v', ...unit }, [{ v: 0 }, { v: 5e-324 }]);
    const d = r.diagnostics.find((x) => x.code === 'derive.cannot-bin')!;
    expect(d.hint).toMatch(/rescale/);
  });
});
