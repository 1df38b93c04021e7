import { FORM_NAMES, INTENTS } from '../../src/brief/types.js';
import { readBrief } from '../../src/brief/resolve.js';
import { supportedIntents } from '../../src/choose/rules.js';
import { FORMS } from '../../src/forms/registry.js';
import { nodesOf } from '../../src/scene/walk.js';
import type { BarPlan } from '../../src/forms/bar-plan.js';
import { describe, expect, it } from 'vitest';
import { codes, renderRows } from '../helpers.js';

const piers = [{ pier: 'North', n: 5 }, { pier: 'South', n: 9 }, { pier: 'East', n: 2 }];

describe('rules for the compare intent', () => {
  it('a categorical key gets bars sorted by value, and the rationale says why', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'pier', values: 'n' }, piers);
    expect(r.choice).toMatchObject({ form: 'bar', plan: { order: 'value' } });
    expect(r.rationale.map((d) => d.decision)).toContain('bar chart');
    expect(r.rationale.find((d) => d.decision === 'bar chart')!.rule).toMatch(/^compare\.categorical-key/);
    expect(r.rationale.some((d) => d.decision.startsWith('bars sorted by value'))).toBe(true);
    expect(r.rationale.some((d) => d.decision === 'the value axis starts at zero')).toBe(true);
  });

  it('a date key keeps its order and stands upright', async () => {
    const rows = [{ d: '2026-03-01', n: 1 }, { d: '2026-01-01', n: 9 }, { d: '2026-02-01', n: 4 }];
    const r = await renderRows({ intent: 'compare', keys: 'd', values: 'n' }, rows);
    expect((r.choice!.plan as BarPlan)).toMatchObject({ order: 'key', orientation: 'vertical' });
    expect(r.choice!.rationale.find((d) => d.decision === 'bar chart')!.rule).toMatch(/^compare\.ordered-key/);
  });

  it('an ordinal key with a given order keeps that order', async () => {
    const rows = [{ s: 'high', n: 1 }, { s: 'low', n: 9 }, { s: 'mid', n: 4 }];
    const r = await renderRows({ intent: 'compare', keys: 's', values: 'n', fields: { s: { type: 'ordinal', order: ['low', 'mid', 'high'] } } }, rows);
    expect((r.choice!.plan as BarPlan).order).toBe('key');
  });

  it('long labels turn the bars horizontal, and the rationale gives the measured widths', async () => {
    const rows = ['Central Library and Reading Rooms', 'Old Town Children\'s Library', 'Westfield Library and Archive', 'University Quarter Branch', 'Hillcrest Community Library', 'Mobile Library (north routes)', 'Mobile Library (south routes)'].map((b, i) => ({ b, n: i + 1 }));
    const r = await renderRows({ intent: 'compare', keys: 'b', values: 'n' }, rows);
    expect((r.choice!.plan as BarPlan).orientation).toBe('horizontal');
    expect(r.rationale.find((d) => d.decision === 'horizontal bars')!.rule).toMatch(/\d+ px/);
  });

  it('short labels in few bars stand upright', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'pier', values: 'n' }, piers);
    expect((r.choice!.plan as BarPlan).orientation).toBe('vertical');
  });

  it('more bars than fit upright turn horizontal even with short labels', async () => {
    const rows = Array.from({ length: 60 }, (_, i) => ({ k: `K${i}`, n: i }));
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'n' }, rows);
    expect((r.choice!.plan as BarPlan).orientation).toBe('horizontal');
  });

  it('many named bars beyond the readable capacity are folded into top N and "Others", with a warning', async () => {
    const rows = Array.from({ length: 300 }, (_, i) => ({ k: `Key ${i}`, n: i + 1 }));
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'n' }, rows);
    expect(r.ok).toBe(true);
    expect(codes(r)).toContain('derive.others-folded');
    // As many lying bars as the plot holds at one readable row each (a tick label's box and a pixel), not one more.
    const tick = nodesOf(r.scene!.root).find((n) => n.role === 'tick' && n.kind === 'text');
    const row = Math.ceil((tick as { box: { height: number } }).box.height + 1);
    const drawn = nodesOf(r.scene!.root).filter((n) => n.role === 'bar').length;
    expect(drawn).toBe(Math.floor(r.scene!.plot.height / row));
  });

  it('chooses for a table of 200,000 rows and 100,000 keys without overflowing the stack', async () => {
    const rows = Array.from({ length: 200_000 }, (_, i) => ({ k: `k${i % 100_000}`, v: i % 997 }));
    // Pinned to bars: unpinned, 10,000 keys or more get a dense layout.
    const r = await renderRows({ intent: 'compare', form: 'bar', keys: 'k', values: 'v', fields: { v: { unit: 'units' } } }, rows);
    expect(r.ok).toBe(true);
    expect(codes(r)).toContain('derive.others-folded');
  });

  it('refuses a fitted baseline for bars, and explains why', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'pier', values: 'n', baseline: 'fit' }, piers);
    expect(r.ok).toBe(false);
    expect(r.diagnostics).toMatchObject([{ code: 'choice.baseline-fit-refused', path: '/baseline' }]);
    expect(r.diagnostics[0]!.message).toMatch(/length/);
  });

  it('with lenient, draws from zero anyway and warns', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'pier', values: 'n', baseline: 'fit' }, piers, { lenient: true });
    expect(r.ok).toBe(true);
    expect(codes(r)).toContain('choice.lenient-fallback');
  });

  it('every intent of the design is answered by a rule row, and every form of the design is drawn', () => {
    expect(new Set(supportedIntents())).toEqual(new Set(INTENTS));
    expect(new Set(FORMS.map((f) => f.name))).toEqual(new Set(FORM_NAMES));
  });

  it('a vocabulary without an intent or form says it is not supported yet, rather than "not an option"', () => {
    const vocabulary = { intents: ['compare'] as const, forms: ['bar'] as const };
    const intent = readBrief('intent: trend\nkeys: k\nvalues: v\nrows: [{ k: a, v: 1 }]\n', undefined, vocabulary);
    expect(intent.diagnostics).toMatchObject([{ code: 'choice.intent-not-supported', path: '/intent' }]);
    const form = readBrief('intent: compare\nform: heatmap\nkeys: k\nvalues: v\nrows: [{ k: a, v: 1 }]\n', undefined, vocabulary);
    expect(form.diagnostics).toMatchObject([{ code: 'choice.form-not-supported', path: '/form' }]);
  });

  it('refuses two values on one bar axis, and three on any axis, and offers the alternatives', async () => {
    // Two values of one measure per key are a dumbbell (dot form); bars still take one value.
    const r = await renderRows({ intent: 'compare', keys: 'pier', values: ['n', 'm'], form: 'bar' }, piers.map((p) => ({ ...p, m: 1 })));
    expect(r.diagnostics[0]).toMatchObject({ code: 'choice.too-many-values' });
    expect(r.diagnostics[0]!.hint).toMatch(/panels/);
    const three = await renderRows({ intent: 'compare', keys: 'pier', values: ['n', 'm', 'k'] }, piers.map((p) => ({ ...p, m: 1, k: 2 })));
    expect(three.diagnostics[0]).toMatchObject({ code: 'choice.too-many-values' });
  });

  it('refuses a text value for bar lengths', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'pier', values: 'name' }, piers.map((p) => ({ ...p, name: 'x' })));
    expect(r.diagnostics[0]).toMatchObject({ code: 'choice.value-not-quantitative' });
  });

  it('asks for a key, or for a value, when one is missing', async () => {
    expect(codes(await renderRows({ intent: 'compare', values: 'n' }, piers))).toEqual(['choice.no-key']);
    expect(codes(await renderRows({ intent: 'compare', keys: 'pier' }, piers))).toEqual(['choice.no-value']);
  });

  it('refuses three keys: bars take one key, grouped bars two', async () => {
    const rows = piers.map((p) => ({ ...p, a: 'x', b: 'y' }));
    expect(codes(await renderRows({ intent: 'compare', keys: ['pier', 'a', 'b'], values: 'n' }, rows))).toContain('choice.too-many-keys');
  });

  it('honours a pinned bar form', async () => {
    expect((await renderRows({ intent: 'compare', keys: 'pier', values: 'n', form: 'bar' }, piers)).ok).toBe(true);
  });

  it('refuses cluster order for bars', async () => {
    expect(codes(await renderRows({ intent: 'compare', keys: 'pier', values: 'n', order: 'cluster', fields: { n: { unit: 'crossings' } } }, piers))).toEqual(['choice.order-not-applicable']);
  });

  it('warns when the value has no unit, since every axis title must carry one', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'pier', values: 'n' }, piers);
    expect(r.ok).toBe(true);
    expect(r.diagnostics).toMatchObject([{ code: 'choice.unit-missing', severity: 'warning', path: '/fields/n/unit' }]);
    expect(r.diagnostics[0]!.hint).toContain('fields: { n: { unit:');
  });

  it('takes a unit from the hint, or from brackets in the column name, without warning', async () => {
    expect(codes(await renderRows({ intent: 'compare', keys: 'pier', values: 'n', fields: { n: { unit: 'crossings' } } }, piers))).toEqual([]);
    const bracketed = piers.map((p) => ({ pier: p.pier, 'revenue (€)': p.n }));
    expect(codes(await renderRows({ intent: 'compare', keys: 'pier', values: 'revenue (€)' }, bracketed))).toEqual([]);
    expect(codes(await renderRows({ intent: 'compare', keys: 'pier', aggregate: 'count' }, piers))).toEqual([]);
  });

  it('counts rows when asked to, without a value column', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'pier', aggregate: 'count' }, [...piers, { pier: 'North', n: 1 }]);
    expect(r.ok).toBe(true);
    expect(r.scene!.axes[0]!.title).toBe('Number of rows');
  });
});

describe('the rationale states what is drawn', () => {
  // Guards a review finding: orientation was planned on the raw values (before rows were
  // combined), so the band width the rationale stated was not the one drawn.
  it('the band width in the orientation decision is the drawn band width', async () => {
    const rows = Array.from({ length: 9 * 400 }, (_, i) => ({ k: `Hut ${i % 9}`, v: 9.5 }));
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', size: { width: 692, height: 440 }, fields: { v: { unit: 'nights' } } }, rows);
    const decision = r.rationale.find((d) => d.decision === 'vertical bars')!;
    const stated = Number(/each band has (\d+) px/.exec(decision.rule)![1]);
    expect(stated).toBe(Math.round(r.scene!.plot.width / 9));
  });
});
