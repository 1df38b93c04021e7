import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dumpScene } from '../../src/scene/dump.js';
import { checkScatterContracts } from '../contracts/point-contracts.js';
import { expectFiniteAttributes, parseXml, renderRows, runs } from '../helpers.js';

const num = fc.oneof(fc.double({ min: -1e6, max: 1e6, noNaN: true, noDefaultInfinity: true }), fc.integer({ min: -5, max: 5 }), fc.constant(null));

describe('property: random scatter and dot data never throw', () => {
  it('any rows of x, y, area and a class render with the contracts kept, or fail with catalogued, hinted errors', async () => {
    const row = fc.record({ x: num, y: num, a: fc.oneof(fc.double({ min: -10, max: 1e4, noNaN: true }), fc.constant(null)), c: fc.constantFrom('p', 'q', 'r') });
    await fc.assert(fc.asyncProperty(fc.array(row, { minLength: 1, maxLength: 80 }), fc.boolean(), fc.boolean(), fc.integer({ min: 200, max: 1200 }), async (rows, area, fit, width) => {
      const r = await renderRows({ intent: 'correlation', values: ['x', 'y'], color: 'c', ...(area ? { area: 'a' } : {}), ...(fit ? { fit: 'linear' } : {}), size: { width, height: 400 } }, rows);
      if (!r.ok) {
        for (const d of r.diagnostics.filter((x) => x.severity === 'error')) {
          expect(['derive.no-rows', 'derive.negative-area', 'layout.frame-too-small', 'choice.value-not-quantitative', 'choice.not-categorical']).toContain(d.code);
          expect(d.hint).toBeTruthy();
        }
        return;
      }
      parseXml(r.svg!);
      expectFiniteAttributes(r.svg!);
      checkScatterContracts(dumpScene(r.scene!), 'x', 'y', area ? 'a' : undefined);
    }), { numRuns: runs(60) });
  });

  it('any keys with one or two values render a dot plot or fail with catalogued, hinted errors', async () => {
    const row = fc.record({ k: fc.string({ minLength: 1, maxLength: 8 }), p: num, q: num });
    await fc.assert(fc.asyncProperty(fc.array(row, { minLength: 1, maxLength: 40 }), fc.boolean(), async (rows, two) => {
      const r = await renderRows({ intent: 'compare', keys: 'k', values: two ? ['p', 'q'] : 'p', form: 'dot' }, rows);
      if (!r.ok) {
        for (const d of r.diagnostics.filter((x) => x.severity === 'error')) {
          expect(['derive.no-rows', 'derive.too-many-dots', 'layout.frame-too-small', 'choice.value-not-quantitative']).toContain(d.code);
          expect(d.hint).toBeTruthy();
        }
        return;
      }
      parseXml(r.svg!);
      expectFiniteAttributes(r.svg!);
    }), { numRuns: runs(60) });
  });
});
