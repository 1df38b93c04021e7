import { describe, expect, it } from 'vitest';
import { codes, renderRows } from '../helpers.js';

const rows = [{ k: 'a', v: 1 }, { k: 'b', v: null }, { k: 'c', v: 3 }];
const brief = { intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: 'boxes' } } };

describe('a brief accepts the warnings it expects', () => {
  it('an accepted warning is reported as info and no longer fails --strict; the figure still notes it', async () => {
    const strict = await renderRows(brief, rows, { strict: true });
    expect(strict.ok).toBe(false);
    const accepted = await renderRows({ ...brief, accept: ['derive.missing-values'] }, rows, { strict: true });
    expect(accepted.ok).toBe(true);
    expect(accepted.diagnostics.find((d) => d.code === 'derive.missing-values')!.severity).toBe('info');
    const { dumpScene } = await import('../../src/scene/dump.js');
    expect(dumpScene(accepted.scene!).texts.some((t) => t.role === 'note' && t.text.startsWith('No data: b'))).toBe(true);
  });

  it('only warnings can be accepted, and an unknown code is refused with its path', async () => {
    const error = await renderRows({ ...brief, accept: ['derive.no-rows'] }, rows);
    expect(error.diagnostics).toMatchObject([{ code: 'brief.bad-value', path: '/accept/0' }]);
    const typo = await renderRows({ ...brief, accept: ['derive.missing-value'] }, rows);
    expect(codes(typo)).toEqual(['brief.bad-value']);
    expect(typo.diagnostics[0]!.hint).toContain('derive.missing-values');
  });
});
