import { describe, expect, it } from 'vitest';
import { MAX_GROWN_HEIGHT } from '../../src/forms/bar-plan.js';
import { dumpScene, type SceneDump } from '../../src/scene/dump.js';
import { codes, renderRows } from '../helpers.js';

const names = (n: number, stem: string) => Array.from({ length: n }, (_, i) => ({ k: `${stem} ${String(i).padStart(3, '0')}`, v: 1000 - i * 3 }));

/** Every bar drawn has its name printed on the key axis, and no name is printed twice. */
function expectEveryBarNamed(dump: SceneDump): string[] {
  const drawn = dump.marks.filter((m) => m.role === 'bar').map((m) => String(m.datum!.k));
  const band = dump.axes.find((a) => a.scale === 'band')!;
  expect(band.ticks).toEqual(band.domain);
  const printed = new Set(dump.texts.filter((t) => t.role === 'tick').map((t) => t.text));
  for (const name of drawn) if (!/^Others/.test(name)) expect(printed.has(name)).toBe(true);
  return drawn;
}

describe('category names never silently disappear', () => {
  it('15 products at the default size: every bar named, nothing thinned', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: 'loaves' } } }, names(15, 'Sourdough batch'));
    const dump = dumpScene(r.scene!);
    expect(expectEveryBarNamed(dump)).toHaveLength(15);
    expect(codes(r)).not.toContain('layout.labels-thinned');
  });

  it('60 stations with no height given: the frame grows so every bar gets a readable row', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: 'mm' } } }, names(60, 'Rain station'));
    const dump = dumpScene(r.scene!);
    expect(dump.height).toBeGreaterThan(440);
    expect(dump.height).toBeLessThanOrEqual(MAX_GROWN_HEIGHT);
    expect(expectEveryBarNamed(dump)).toHaveLength(60);
    expect(codes(r)).not.toContain('derive.others-folded');
    expect(r.rationale.some((d) => d.decision.startsWith('frame grown'))).toBe(true);
  });

  it('beyond the grown limit, the smallest fold with a warning, and every shown bar is named', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: 'orders' } } }, names(200, 'PC'));
    const dump = dumpScene(r.scene!);
    expect(dump.height).toBe(MAX_GROWN_HEIGHT);
    expect(codes(r)).toContain('derive.others-folded');
    expectEveryBarNamed(dump);
    expect(codes(r)).not.toContain('layout.labels-thinned');
  });

  it('a fixed height folds within it and the warning names the height that would show them all', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', size: { width: 720, height: 440 }, fields: { v: { unit: 'orders' } } }, names(120, 'PC'));
    const dump = dumpScene(r.scene!);
    expect(dump.height).toBe(440);
    const fold = r.diagnostics.find((d) => d.code === 'derive.others-folded')!;
    expect(fold.severity).toBe('warning');
    const height = Number(/a height of (\d+) px/.exec(fold.hint!)![1]);
    expect(height).toBeGreaterThan(440);
    expectEveryBarNamed(dump);
    // The height it names does show them all.
    const all = await renderRows({ intent: 'compare', keys: 'k', values: 'v', size: { width: 720, height }, fields: { v: { unit: 'orders' } } }, names(120, 'PC'));
    expect(codes(all)).not.toContain('derive.others-folded');
    expect(expectEveryBarNamed(dumpScene(all.scene!))).toHaveLength(120);
  });
});
