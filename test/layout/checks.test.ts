import { describe, expect, it } from 'vitest';
import { checkScene, overlappingTexts, textsOffCanvas } from '../../src/layout/checks.js';
import { textNode } from '../../src/layout/text.js';
import type { TextNode } from '../../src/scene/types.js';
import { codes, env, renderRows } from '../helpers.js';

const style = { size: 12, weight: 'regular' as const, color: '#000000' };
const text = (t: string, x: number, top: number): TextNode => textNode(env.measure, { id: t, role: 'label', text: t, style, x, top });
const plot = { x: 0, y: 0, width: 200, height: 200 };

describe('scene-wide checks', () => {
  it('find texts that reach past the canvas', () => {
    const inside = text('inside', 10, 10);
    const outside = text('outside', 190, 10);
    expect(textsOffCanvas([inside, outside], { width: 200, height: 200 })).toEqual([outside]);
    expect(codes({ diagnostics: checkScene([inside, outside], plot, { width: 200, height: 200 }, env.measure) })).toEqual(['layout.text-off-canvas']);
  });

  it('find overlapping texts, and only those', () => {
    const a = text('first label', 10, 10);
    const b = text('second label', 30, 15);
    const c = text('far away', 10, 100);
    expect(overlappingTexts([a, b, c])).toEqual([[a, b]]);
    expect(codes({ diagnostics: checkScene([a, b, c], plot, { width: 400, height: 400 }, env.measure) })).toEqual(['layout.text-overlap']);
  });

  it('touching boxes do not count as overlapping', () => {
    const a = text('ab', 10, 10);
    const b = text('cd', 10 + a.box.width, 10);
    expect(overlappingTexts([a, b])).toEqual([]);
  });
});

describe('derived numbers beyond the range of doubles', () => {
  it('a sum that overflows is a coded error naming the key, never an Infinity bar', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: 'u' } } }, [{ k: 'a', v: 1.7e308 }, { k: 'a', v: 1.7e308 }, { k: 'b', v: 1 }]);
    expect(r.ok).toBe(false);
    expect(r.diagnostics).toMatchObject([{ code: 'choice.keys-repeat' }, { code: 'derive.not-finite', field: 'k' }]);
    expect(r.diagnostics[1]!.message).toContain('"a"');
  });

  it('bars at both ends of the doubles (±1.7e308) are drawn, on a scale whose span overflows a double', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: 'u' } } }, [{ k: 'high', v: 1.7e308 }, { k: 'low', v: -1.7e308 }, { k: 'mid', v: 1 }]);
    expect(codes(r)).not.toContain('render.internal');
    expect(r.ok).toBe(true);
    const bars = r.scene!.root.children.filter((n) => n.role === 'bar');
    for (const b of bars) if (b.kind === 'rect') expect(Number.isFinite(b.width) && Number.isFinite(b.x)).toBe(true);
  });
});
