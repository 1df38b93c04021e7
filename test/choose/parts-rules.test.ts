import { describe, expect, it } from 'vitest';
import type { StackPlan } from '../../src/forms/stack-plan.js';
import type { NormalizedPlan } from '../../src/forms/normalized-bar.js';
import { codes, renderRows } from '../helpers.js';

const visits = [
  { site: 'North', kind: 'Walk-in', n: 40 }, { site: 'North', kind: 'Booked', n: 25 }, { site: 'North', kind: 'Group', n: 10 },
  { site: 'South', kind: 'Walk-in', n: 20 }, { site: 'South', kind: 'Booked', n: 45 }, { site: 'South', kind: 'Group', n: 5 },
];
const unit = { fields: { n: { unit: 'visits' } } };
const two = (intent: string, extra: Record<string, unknown> = {}) => ({ intent, keys: ['site', 'kind'], values: 'n', ...unit, ...extra });
const one = (extra: Record<string, unknown> = {}) => ({ intent: 'part-to-whole', keys: 'kind', values: 'n', ...unit, ...extra });
const kinds = (n: number) => Array.from({ length: n }, (_, i) => ({ kind: `Kind ${i + 1}`, n: 10 + i }));
const decisions = (r: { rationale: { decision: string; rule: string }[] }) => r.rationale.map((d) => d.decision);

describe('composition → stacked bars', () => {
  it('two keys get stacked bars sorted by total, and the rationale names the precise readings', async () => {
    const r = await renderRows(two('composition'), visits);
    expect(r.ok).toBe(true);
    expect(r.choice).toMatchObject({ form: 'stacked-bar', rule: 'composition.group-and-part', plan: { order: 'total', normalized: false } });
    expect(r.rationale.find((d) => d.decision === 'stacked bar chart')!.rule).toMatch(/totals and the baseline segment are the precise readings/);
    expect(decisions(r)).toContain('bars sorted by total, largest first; ties by label');
    expect(decisions(r).some((d) => d.includes('the largest overall ("Booked") on the baseline'))).toBe(true);
    expect(decisions(r)).toContain('the value axis starts at zero');
    expect(decisions(r)).toContain('colour tells the 3 levels of `kind` apart');
    expect(codes(r)).toEqual([]);
  });

  it('an ordered group key keeps its order', async () => {
    const rows = visits.map((v) => ({ ...v, site: v.site === 'North' ? 2025 : 2024 }));
    const r = await renderRows(two('composition'), rows);
    expect((r.choice!.plan as StackPlan).order).toBe('key');
  });

  it('long group labels lay the bars down, as for the bar chart', async () => {
    const rows = ['North', 'South', 'East', 'West', 'Upper', 'Lower'].flatMap((site) => visits.slice(0, 3).map((v) => ({ ...v, site: `${site} visitor centre and ranger station` })));
    expect((( await renderRows(two('composition'), rows)).choice!.plan as StackPlan).orientation).toBe('horizontal');
  });

  it('refuses a negative part with a coded error naming the rows and offering grouped bars', async () => {
    const r = await renderRows(two('composition'), [...visits, { site: 'East', kind: 'Group', n: -4 }]);
    expect(r.ok).toBe(false);
    expect(r.diagnostics).toMatchObject([{ code: 'derive.negative-part', path: '/values', rows: [7] }]);
    expect(r.diagnostics[0]!.hint).toMatch(/grouped bars/);
  });

  it('refuses a mean (or max, min): parts must add up to a whole', async () => {
    expect((await renderRows(two('composition', { aggregate: 'mean' }), visits)).diagnostics).toMatchObject([{ code: 'choice.aggregate-not-additive', path: '/aggregate' }]);
    expect((await renderRows(one({ aggregate: 'max' }), kinds(3))).diagnostics).toMatchObject([{ code: 'choice.aggregate-not-additive', path: '/aggregate' }]);
  });

  it('asks for the part key when only one key is given, and refuses a third key', async () => {
    expect(codes(await renderRows({ intent: 'composition', keys: 'site', values: 'n', ...unit }, visits))).toEqual(['choice.no-key']);
    const r = await renderRows({ intent: 'composition', keys: ['site', 'kind', 'n'], values: 'n', ...unit }, visits);
    expect(r.diagnostics).toMatchObject([{ code: 'choice.too-many-keys', path: '/keys' }]);
    expect(codes(await renderRows({ intent: 'composition', keys: ['site', 'kind'], ...unit }, visits))).toEqual(['choice.no-value']);
  });

  it('more groups than the plot holds at 3 px: the smallest totals are left out, warned and named in a note', async () => {
    const rows = Array.from({ length: 300 }, (_, i) => ['a', 'b'].map((kind) => ({ site: `S${i}`, kind, n: (i % 50) + 1 }))).flat();
    const r = await renderRows(two('composition'), rows);
    expect(r.ok).toBe(true);
    expect(codes(r)).toContain('derive.others-folded');
    const drawn = new Set(r.scene!.root.children.filter((n) => n.role === 'segment').map((n) => n.datum!.site));
    expect(drawn.size).toBe(Math.floor(r.scene!.plot.height / 3));
    expect(r.scene!.root.children.some((n) => n.kind === 'text' && n.role === 'note' && n.text.startsWith('Not drawn:'))).toBe(true);
  });

  it('refuses more parts than colour tells apart (hard rule), offering small multiples', async () => {
    const rows = Array.from({ length: 9 }, (_, i) => ({ site: 'A', kind: `K${i}`, n: 1 }));
    expect((await renderRows(two('composition'), rows)).diagnostics).toMatchObject([{ code: 'choice.too-many-colours' }]);
  });
});

describe('part-to-whole → normalized bars', () => {
  it('two keys get normalized bars ordered by the baseline part\'s share', async () => {
    const r = await renderRows(two('part-to-whole'), visits);
    expect(r.choice).toMatchObject({ form: 'normalized-bar', rule: 'part-to-whole.group-and-part', plan: { kind: 'stacks', stacks: { order: 'baseline-share', normalized: true } } });
    expect(decisions(r)).toContain('each bar shows its group as 100 %');
    expect(decisions(r).some((d) => d.startsWith('bars sorted by the share of "Booked"'))).toBe(true);
  });

  it('`order: label` wins over the baseline share', async () => {
    const r = await renderRows(two('part-to-whole', { order: 'label' }), visits);
    expect(((r.choice!.plan as NormalizedPlan) as { stacks: StackPlan }).stacks.order).toBe('label');
    expect(decisions(r)).toContain('bars in label order');
  });

  it('beyond what colour tells apart, folds the smallest parts into "Other", warning how many and which', async () => {
    const rows = ['A', 'B'].flatMap((site) => Array.from({ length: 11 }, (_, i) => ({ site, kind: `Kind ${String(i + 1).padStart(2, '0')}`, n: 30 - i })));
    const r = await renderRows(two('part-to-whole'), rows);
    expect(r.ok).toBe(true);
    const fold = r.diagnostics.find((d) => d.code === 'derive.parts-folded')!;
    expect(fold).toMatchObject({ severity: 'warning', field: 'kind', found: '11 parts', expected: 'at most 9' });
    expect(fold.message).toContain('the 3 smallest overall ("Kind 09", "Kind 10", "Kind 11")');
    expect(decisions(r)).toContain('the 3 smallest of 11 parts folded into one "Other" part');
    expect(decisions(r)).toContain('colour tells the 8 largest levels of `kind` apart; the other 3 share one neutral "Other"');
  });

  it('refuses negative parts: a share of a whole cannot be negative', async () => {
    expect((await renderRows(two('part-to-whole'), [...visits, { site: 'East', kind: 'Group', n: -1 }])).diagnostics).toMatchObject([{ code: 'derive.negative-part', path: '/values' }]);
    expect((await renderRows(one(), [...kinds(3), { kind: 'Kind 9', n: -2 }])).diagnostics).toMatchObject([{ code: 'derive.negative-part', path: '/values', rows: [4] }]);
  });

  it('leaves out a group whose parts sum to zero, with a warning and a note', async () => {
    const r = await renderRows(two('part-to-whole'), [...visits, { site: 'East', kind: 'Group', n: 0 }]);
    expect(r.ok).toBe(true);
    expect(r.diagnostics).toMatchObject([{ code: 'derive.zero-total', field: 'site' }]);
    expect(r.scene!.root.children.some((n) => n.role === 'note' && n.kind === 'text' && n.text.includes('East'))).toBe(true);
  });

  it('refuses a whole of zero: nothing to share', async () => {
    expect(codes(await renderRows(two('part-to-whole'), visits.map((v) => ({ ...v, n: 0 }))))).toEqual(['derive.whole-is-zero']);
    expect(codes(await renderRows(one(), kinds(3).map((k) => ({ ...k, n: 0 }))))).toEqual(['derive.whole-is-zero']);
  });

  it('one key: bars of shares, sorted, with the reason stated', async () => {
    const r = await renderRows(one(), kinds(5));
    expect(r.choice).toMatchObject({ form: 'normalized-bar', rule: 'part-to-whole.one-key', plan: { kind: 'shares', shares: { order: 'value' } } });
    expect(r.rationale.find((d) => d.decision === 'normalized bar chart')!.rule).toMatch(/angles and areas of a pie/);
    expect(decisions(r)).toContain('bars of each key\'s share of the total, on a percent axis from 0');
  });

  it('without a key, asks for one; with three, refuses', async () => {
    expect(codes(await renderRows({ intent: 'part-to-whole', values: 'n', ...unit }, kinds(3)))).toEqual(['choice.no-key']);
    expect(codes(await renderRows({ intent: 'part-to-whole', keys: ['kind', 'n', 'kind'], values: 'n', ...unit }, kinds(3)))).toContain('choice.too-many-keys');
  });
});

describe('pinned forms with the wrong keys are refused, never drawn from half the data', () => {
  it('stacked or normalized bars pinned with one key, and a donut pinned with two', async () => {
    expect((await renderRows({ ...one({ form: 'stacked-bar' }), intent: 'composition' }, kinds(3))).diagnostics).toMatchObject([{ code: 'choice.no-key', path: '/keys' }]);
    // Share bars answer part-to-whole; under compare the pin is refused, naming the intent it answers.
    expect((await renderRows({ intent: 'compare', keys: 'kind', values: 'n', ...unit, form: 'normalized-bar' }, kinds(3))).diagnostics).toMatchObject([{ code: 'choice.form-not-for-intent', path: '/form' }]);
    expect((await renderRows(two('part-to-whole', { form: 'donut' }), visits.slice(0, 2))).diagnostics).toMatchObject([{ code: 'choice.too-many-keys', path: '/keys' }]);
  });
});

describe('the donut, only when pinned, only for 2 or 3 parts', () => {
  it('is never chosen unless pinned', async () => {
    expect((await renderRows(one(), kinds(2))).choice!.form).toBe('normalized-bar');
  });

  it('is drawn for 3 parts when pinned, and the radial rule states its exception', async () => {
    const r = await renderRows(one({ form: 'donut' }), kinds(3));
    expect(r.ok).toBe(true);
    expect(r.choice).toMatchObject({ form: 'donut', rule: 'part-to-whole.pinned-donut' });
    expect(r.rationale.find((d) => d.decision === 'laid out around a circle: the parts of one whole')!.rule).toMatch(/except a donut the brief pins with 2 or 3 parts/);
  });

  it('refuses 4 parts (and 1) with a coded error that explains why and offers the normalized bar', async () => {
    for (const n of [4, 1]) {
      const r = await renderRows(one({ form: 'donut' }), kinds(n));
      expect(r.diagnostics).toMatchObject([{ code: 'choice.donut-too-many-parts', path: '/form', field: 'kind' }]);
      expect(r.diagnostics[0]!.message).toMatch(/angles and areas are read less accurately than aligned lengths/);
      expect(r.diagnostics[0]!.hint).toMatch(/normalized-bar/);
    }
  });

  it('refuses a cyclic key of many parts too: the exception is about parts, not cycles', async () => {
    const rows = ['Mon', 'Tue', 'Wed', 'Thu', 'Fri'].map((d, i) => ({ kind: d, n: i + 1 }));
    expect(codes(await renderRows(one({ form: 'donut', fields: { n: { unit: 'visits' }, kind: { type: 'cyclic', order: ['Mon', 'Tue', 'Wed', 'Thu', 'Fri'] } } }), rows))).toEqual(['choice.donut-too-many-parts']);
  });
});
