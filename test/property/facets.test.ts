import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dumpScene } from '../../src/scene/dump.js';
import { checkFacetContracts } from '../contracts/facet-contracts.js';
import { expectFiniteAttributes, parseXml, renderRows, runs } from '../helpers.js';

const label = fc.oneof(fc.string({ minLength: 1, maxLength: 12 }), fc.constantFrom('<b>&amp;', 'Ünïcødé', 'a'.repeat(60), '港口'));

describe('property: small multiples render with their contracts or refuse clearly', () => {
  it('any facet of 1–40 levels, plain or grouped bars, at any frame size: shared scales, outer labels, every level drawn or named', async () => {
    const row = fc.record({ s: label, k: label, g: fc.constantFrom('x', 'y', 'z'), v: fc.integer({ min: -500, max: 5000 }) });
    await fc.assert(fc.asyncProperty(fc.array(row, { minLength: 1, maxLength: 200 }), fc.boolean(), fc.boolean(), fc.integer({ min: 160, max: 1400 }), fc.integer({ min: 160, max: 1000 }), async (data, grouped, context, width, height) => {
      const brief = { intent: 'compare', keys: grouped ? ['k', 'g'] : 'k', values: 'v', facet: { by: 's', context }, size: { width, height }, fields: { v: { unit: 'u' }, s: { type: 'categorical' }, k: { type: 'categorical' } } };
      const r = await renderRows(brief, data);
      if (!r.ok) {
        const errors = r.diagnostics.filter((d) => d.severity === 'error').map((d) => d.code);
        for (const code of errors) expect(['layout.frame-too-small', 'derive.no-rows', 'derive.too-many-grouped-bars', 'derive.too-many-ordered-bars']).toContain(code);
        expect(errors.length).toBeGreaterThan(0);
        return;
      }
      parseXml(r.svg!);
      expectFiniteAttributes(r.svg!);
      const dump = dumpScene(r.scene!);
      checkFacetContracts(dump, 's');
      const levels = new Set(r.scene!.panels.map((p) => String(p.facet!.s)));
      const refused = r.diagnostics.find((d) => d.code === 'layout.panels-refused');
      const total = new Set(data.map((d) => d.s.trim()).filter((s) => s !== '' && !/^(NA|N\/A|null|NaN|-|—)$/i.test(s))).size;
      if (refused) expect([refused.found, refused.expected]).toEqual([`${total} panels`, `at most ${levels.size}`]);
      else expect(levels.size).toBe(total);
    }), { numRuns: runs(60) });
  });
});
