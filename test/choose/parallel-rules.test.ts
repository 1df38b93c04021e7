import { describe, expect, it } from 'vitest';
import type { ParallelPlan } from '../../src/forms/parallel-plan.js';
import { dumpScene } from '../../src/scene/dump.js';
import { codes, renderRows } from '../helpers.js';

/** n items over `p` attributes a0…a(p−1): a(k) = k-th multiple of a base plus noise, so neighbours correlate. */
function table(n: number, p: number) {
  return Array.from({ length: n }, (_, i) => {
    const row: Record<string, unknown> = { item: `Item ${i}` };
    for (let k = 0; k < p; k++) row[`a${k}`] = ((i * (k + 3)) % 17) + (k % 2 ? i : -i) * 0.5;
    return row;
  });
}
const values = (p: number) => Array.from({ length: p }, (_, k) => `a${k}`);

describe('rules for the profile intent', () => {
  it('more than twelve values get parallel coordinates, with each neighbouring pair\'s r in the rationale data', async () => {
    const r = await renderRows({ intent: 'profile', keys: 'item', values: values(13) }, table(30, 13));
    expect(r.ok).toBe(true);
    expect(r.choice).toMatchObject({ form: 'parallel', rule: 'profile.many-values' });
    const plan = r.choice!.plan as ParallelPlan;
    const pairs = r.rationale.filter((d) => d.data?.r !== undefined);
    expect(pairs.map((d) => [d.data!.left, d.data!.right])).toEqual(plan.pairs.map((p) => [p.left, p.right]));
    expect(r.rationale.some((d) => /greedy ordering on \|Pearson r\|/.test(d.rule))).toBe(true);
    expect(r.rationale.some((d) => d.decision.startsWith('each axis its own scale'))).toBe(true);
  });

  it('`form: parallel` draws parallel coordinates for a few values too, the pin stated', async () => {
    const r = await renderRows({ intent: 'profile', form: 'parallel', keys: 'item', values: values(3) }, table(20, 3));
    expect(r.choice!.form).toBe('parallel');
    expect(r.rationale.some((d) => d.rule.includes('pins `form:`'))).toBe(true);
  });

  it('beyond a few hundred items: a warning, and the lines drawn translucent', async () => {
    const r = await renderRows({ intent: 'profile', form: 'parallel', values: values(3) }, table(400, 3));
    expect(codes(r)).toContain('choice.overplotting');
    const line = dumpScene(r.scene!).marks.find((m) => m.role === 'line')!;
    expect(line.opacity).toBeLessThan(0.5);
  });

  it('a few items are drawn opaque, with no warning', async () => {
    const r = await renderRows({ intent: 'profile', form: 'parallel', keys: 'item', values: values(3) }, table(12, 3));
    expect(codes(r)).not.toContain('choice.overplotting');
    expect(dumpScene(r.scene!).marks.find((m) => m.role === 'line')!.opacity).toBeUndefined();
  });

  it('a single value is refused: a profile needs several attributes', async () => {
    const r = await renderRows({ intent: 'profile', keys: 'item', values: 'a0' }, table(5, 2));
    expect(r.diagnostics).toMatchObject([{ code: 'choice.profile-too-few-values', path: '/values' }]);
  });

  it('a text attribute is refused', async () => {
    const r = await renderRows({ intent: 'profile', form: 'parallel', values: ['a0', 'item'] }, table(5, 2));
    expect(r.diagnostics).toMatchObject([{ code: 'choice.value-not-quantitative', path: '/values', field: 'item' }]);
  });

  it('rows missing an attribute are left out with a warning, never drawn as zero', async () => {
    const rows = table(10, 3).map((row, i) => (i === 2 ? { ...row, a1: null } : row));
    const r = await renderRows({ intent: 'profile', form: 'parallel', keys: 'item', values: values(3) }, rows);
    expect(codes(r)).toContain('derive.missing-values');
    expect(dumpScene(r.scene!).marks.filter((m) => m.role === 'line')).toHaveLength(9);
  });

  it('no row complete in every attribute is an error, not an empty chart', async () => {
    // Each attribute keeps numbers (so it types as quantitative), but every row lacks one of them.
    const rows = table(6, 3).map((row, i) => (i % 2 ? { ...row, a2: null } : { ...row, a1: null }));
    const r = await renderRows({ intent: 'profile', form: 'parallel', keys: 'item', values: values(3) }, rows);
    expect(r.ok).toBe(false);
    expect(codes(r)).toContain('derive.no-rows');
  });
});
