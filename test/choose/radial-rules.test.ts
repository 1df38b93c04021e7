import type { RadialBarPlan } from '../../src/forms/radial-bar-plan.js';
import { describe, expect, it } from 'vitest';
import { codes, renderRows } from '../helpers.js';

const days = ['Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat', 'Sun'].map((d, i) => ({ day: d, stalls: 10 + i }));

describe('rules for the cycle intent', () => {
  it('a detected cyclic key gets radial bars, with the cycle, inner ring and "not for precise comparison" stated', async () => {
    const r = await renderRows({ intent: 'cycle', keys: 'day', values: 'stalls', fields: { stalls: { unit: 'stalls' } } }, days);
    expect(r.ok).toBe(true);
    expect(r.choice).toMatchObject({ form: 'radial-bar', rule: 'cycle.cyclic-key' });
    expect((r.choice!.plan as RadialBarPlan).order).toBe('key');
    const rules = r.rationale.map((d) => `${d.decision} | ${d.rule}`).join('\n');
    expect(rules).toMatch(/last next to the first/);
    expect(rules).toMatch(/inner ring/);
    expect(rules).toMatch(/not for precise comparison/);
    expect(rules).toMatch(/outer bar .* looks larger/);
  });

  it('a key declared `type: cyclic` gets radial bars in its given order', async () => {
    const rows = ['night', 'morning', 'noon', 'evening'].map((p, i) => ({ part: p, n: i + 1 }));
    const r = await renderRows({ intent: 'cycle', keys: 'part', values: 'n', fields: { part: { type: 'cyclic', order: ['morning', 'noon', 'evening', 'night'] }, n: { unit: 'calls' } } }, rows);
    expect(r.choice!.form).toBe('radial-bar');
    const { dumpScene } = await import('../../src/scene/dump.js');
    expect(dumpScene(r.scene!).marks.filter((m) => m.role === 'bar').map((b) => b.datum!.part)).toEqual(['morning', 'noon', 'evening', 'night']);
  });

  it('intent cycle on a key that is not cyclic is refused, naming the linear alternative', async () => {
    const rows = [{ pier: 'North', n: 5 }, { pier: 'South', n: 9 }, { pier: 'East', n: 2 }];
    const r = await renderRows({ intent: 'cycle', keys: 'pier', values: 'n' }, rows);
    expect(r.ok).toBe(false);
    expect(r.diagnostics).toMatchObject([{ code: 'choice.radial-not-cyclic', path: '/form' }]);
    expect(r.diagnostics[0]!.hint).toMatch(/linear form/);
  });

  it('`form: radial-bar` on a categorical key is refused with the same rule', async () => {
    const rows = [{ pier: 'North', n: 5 }, { pier: 'South', n: 9 }, { pier: 'East', n: 2 }];
    const r = await renderRows({ intent: 'compare', keys: 'pier', values: 'n', form: 'radial-bar' }, rows);
    expect(codes(r)).toContain('choice.radial-not-cyclic');
  });

  it('negative values are refused: a length from the inner ring cannot be negative', async () => {
    const rows = days.map((d, i) => ({ ...d, stalls: i === 3 ? -4 : d.stalls }));
    const r = await renderRows({ intent: 'cycle', keys: 'day', values: 'stalls', fields: { stalls: { unit: 'stalls' } } }, rows);
    expect(r.diagnostics).toMatchObject([{ code: 'choice.radial-negative', path: '/values', field: 'stalls' }]);
    expect(r.diagnostics[0]!.hint).toMatch(/bars in key order/);
  });
});
