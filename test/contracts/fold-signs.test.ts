import { describe, expect, it } from 'vitest';
import { supportedIntents } from '../../src/choose/rules.js';
import { INTENTS } from '../../src/brief/types.js';
import { dumpScene } from '../../src/scene/dump.js';
import { codes, renderRows } from '../helpers.js';
import { bars, checkBarContracts } from './bar-contracts.js';

/** 150 keys, about half negative, spread widely (a deterministic stand-in for members gained and lost). */
const signed = Array.from({ length: 150 }, (_, i) => ({ k: `Branch ${String(i).padStart(3, '0')}`, v: (i % 2 ? -1 : 1) * (((i * 7919) % 220) + 1) }));

describe('folding values of both signs', () => {
  // Guards a defect found in a new-user trial: ranking by value folded away every large negative,
  // so a chart of gains and losses showed almost only gains.
  it('keeps the keys farthest from zero, so the largest losses stay drawn and the axis reaches them', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: 'members' } } }, signed);
    expect(r.ok).toBe(true);
    const dump = dumpScene(r.scene!);
    checkBarContracts(dump, 'v', 'k');
    const shown = bars(dump).map((b) => b.datum!.v as number);
    const smallestShown = Math.min(...shown.map(Math.abs));
    const folded = signed.filter((row) => !shown.includes(row.v) || Math.abs(row.v) < smallestShown);
    for (const row of folded) expect(Math.abs(row.v)).toBeLessThanOrEqual(smallestShown);
    expect(Math.min(...shown)).toBe(Math.min(...signed.map((row) => row.v)));
    expect((dump.axes[0]!.domain as number[])[0]).toBeLessThanOrEqual(Math.min(...signed.map((row) => row.v)));
  });

  it('states the range of what it left out instead of netting gains and losses into one bar', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: 'members' } } }, signed);
    const dump = dumpScene(r.scene!);
    expect(bars(dump).some((b) => String(b.datum!.k).startsWith('Others'))).toBe(false);
    const note = dump.texts.filter((t) => t.role === 'note').map((t) => t.text).join(' ');
    expect(note).toMatch(/closest to zero, from −\d+ to \d+; their positive and negative values are not netted into one bar/);
    expect(r.diagnostics.find((d) => d.code === 'derive.others-folded')!.message).toMatch(/closest to zero/);
  });

  it('with only negative values, says the folded keys are those closest to zero, not the smallest', async () => {
    const rows = signed.map((row) => ({ ...row, v: -Math.abs(row.v) }));
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: 'members' } } }, rows);
    const note = dumpScene(r.scene!).texts.filter((t) => t.role === 'note').map((t) => t.text).join(' ');
    expect(note).toContain('closest to zero');
    expect(note).not.toContain('smallest');
  });
});

describe('a frame too small for its words', () => {
  // Guards a trial finding: at 200 × 160 a misleading "folded" warning came before the real error.
  it('reports only that the frame is too small, not a fold to fit a plot with no room', async () => {
    const rows = ['Martens', 'Badgers', 'Stoats', 'Otters', 'Voles', 'Shrews', 'Hares'].map((k, i) => ({ k, v: i + 1 }));
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', title: 'Net points', source: 'Invented data', size: { width: 200, height: 160 }, fields: { v: { unit: 'points' } } }, rows);
    expect(codes(r)).toEqual(['layout.frame-too-small']);
  });
});

describe('hints offer only what is drawn', () => {
  const unsupported = INTENTS.filter((i) => !supportedIntents().includes(i));
  const offersUnsupported = (hint: string | undefined) => unsupported.some((i) => new RegExp(`intent:? ${i}\\b`).test(hint ?? ''));

  it.each([
    ['a fitted baseline', { baseline: 'fit' }, {}],
    ['a fitted baseline, lenient', { baseline: 'fit' }, { lenient: true }],
    ['two values', { values: ['v', 'w'] }, {}],
  ])('%s gets a hint that names no intent not answered yet', async (_, brief, opts) => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: 'u' } }, ...brief }, [{ k: 'a', v: 1, w: 2 }], opts);
    expect(r.diagnostics.length).toBeGreaterThan(0);
    for (const d of r.diagnostics) expect(offersUnsupported(d.hint)).toBe(false);
  });
});
