import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MIN_BAND_PX } from '../../src/forms/bar.js';
import { nodesOf } from '../../src/scene/walk.js';
import { codes, renderRows, runs } from '../helpers.js';

const words = fc.array(fc.constantFrom('harbour', 'tide', 'North', 'a', 'crossings', 'per', 'day', 'Kittiwake'), { minLength: 1, maxLength: 14 }).map((w) => w.join(' '));

describe('property: planned bar capacity is the drawn capacity', () => {
  // Guards a past defect: the plan reserved room for a short note while the drawn frame held a
  // longer one, so 3,000 keys at 200 × 400 with a two-line title drew bars 1.87 px thick
  // against a promised 2.34 px.
  it('a folded chart draws exactly as many bars as fit at the narrowest band, and not one more would', async () => {
    await fc.assert(fc.asyncProperty(
      fc.integer({ min: 160, max: 900 }), fc.integer({ min: 160, max: 1200 }), fc.integer({ min: 40, max: 3000 }),
      fc.option(words), fc.option(words), fc.option(words),
      async (width, height, keys, title, subtitle, source) => {
        const rows = Array.from({ length: keys }, (_, i) => ({ k: `Key ${i}`, v: ((i * 7919) % 1000) + 1 }));
        const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', size: { width, height }, fields: { v: { unit: 'u' } }, ...(title ? { title } : {}), ...(subtitle ? { subtitle } : {}), ...(source ? { source } : {}) }, rows);
        if (!r.ok) {
          expect(codes(r)).toContain('layout.frame-too-small');
          return;
        }
        const bars = nodesOf(r.scene!.root).filter((n) => n.role === 'bar');
        if (!codes(r).includes('derive.others-folded')) return;
        // Lying bars get a readable row each (a tick label's box and a pixel); upright ones MIN_BAND_PX.
        const vertical = r.scene!.axes.some((a) => a.orient === 'bottom' && a.scale === 'band');
        const tick = nodesOf(r.scene!.root).find((n) => n.role === 'tick' && n.kind === 'text') as { box: { height: number } } | undefined;
        const band = vertical ? MIN_BAND_PX : Math.ceil(tick!.box.height + 1);
        const length = vertical ? r.scene!.plot.width : r.scene!.plot.height;
        expect(bars.length * band).toBeLessThanOrEqual(length + 1e-9);
        expect((bars.length + 1) * band).toBeGreaterThan(length);
      },
    ), { numRuns: runs(40) });
  });

  it('the case of the defect: 3,000 keys at 200 × 400 with a two-line title', async () => {
    const rows = Array.from({ length: 3000 }, (_, i) => ({ k: `Key ${i}`, v: ((i * 7919) % 1000) + 1 }));
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', size: { width: 200, height: 400 }, title: 'Crossings per day at every pier of the harbour', fields: { v: { unit: 'u' } } }, rows);
    expect(r.ok).toBe(true);
    const bars = nodesOf(r.scene!.root).filter((n) => n.role === 'bar');
    const thickness = Math.min(...bars.map((b) => (b.kind === 'rect' ? b.height : 0)));
    expect(thickness).toBeGreaterThanOrEqual(MIN_BAND_PX * (1 - 0.22) - 1e-9);
  });
});
