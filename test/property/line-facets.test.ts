import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dumpScene } from '../../src/scene/dump.js';
import { checkFacetContracts } from '../contracts/facet-contracts.js';
import { expectFiniteAttributes, parseXml, renderRows, runs } from '../helpers.js';

const label = fc.oneof(fc.string({ minLength: 1, maxLength: 12 }), fc.constantFrom('<b>&amp;', 'Ünïcødé', 'a'.repeat(40), '港口'));

describe('property: lines as small multiples render with their contracts or refuse clearly', () => {
  it('1–20 series over months, by `facet:` (with or without context) or automatically beyond 8, at any frame size', async () => {
    const series = fc.uniqueArray(label, { minLength: 1, maxLength: 20, selector: (s) => s.trim() });
    const value = fc.option(fc.integer({ min: -500, max: 5000 }), { nil: null, freq: 8 });
    await fc.assert(fc.asyncProperty(series, fc.integer({ min: 1, max: 30 }), fc.array(value, { minLength: 600, maxLength: 600 }), fc.constantFrom('brief', 'context', 'auto'), fc.integer({ min: 160, max: 1400 }), fc.integer({ min: 160, max: 1000 }), async (names, months, values, how, width, height) => {
      const data = names.flatMap((s, i) => Array.from({ length: months }, (_, m) => ({ month: `${2020 + Math.floor(m / 12)}-${String((m % 12) + 1).padStart(2, '0')}`, s, v: values[(i * 30 + m) % 600]! })));
      const facet = how === 'auto' ? {} : { facet: { by: 's', context: how === 'context' } };
      const brief = { intent: 'trend', keys: ['month', 's'], values: 'v', ...facet, size: { width, height }, fields: { v: { unit: 'u' }, s: { type: 'categorical' } } };
      const r = await renderRows(brief, data);
      if (!r.ok) {
        const errors = r.diagnostics.filter((d) => d.severity === 'error').map((d) => d.code);
        // A value column with no number at all is refused as not quantitative (found at FC_SCALE=10).
        const allowed = data.some((d) => d.v !== null) ? ['layout.frame-too-small', 'derive.no-rows'] : ['layout.frame-too-small', 'derive.no-rows', 'choice.value-not-quantitative'];
        for (const code of errors) expect(allowed).toContain(code);
        expect(errors.length).toBeGreaterThan(0);
        return;
      }
      parseXml(r.svg!);
      expectFiniteAttributes(r.svg!);
      if (!r.choice!.facet) { expect(how).toBe('auto'); return; }
      // checkFacetContracts: no text off the canvas, no two texts overlapping, shared scales, outer ticks, panel titles.
      const dump = dumpScene(r.scene!);
      checkFacetContracts(dump, 's');
      expect(dump.texts.filter((t) => t.role === 'label' && names.includes(t.text))).toEqual([]);
    }), { numRuns: runs(40) });
  });
});
