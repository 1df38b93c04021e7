import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CATALOGUE } from '../../src/diagnostics/catalogue.js';
import { dumpScene } from '../../src/scene/dump.js';
import { checkFacetContracts } from '../contracts/facet-contracts.js';
import { checkLineContracts } from '../contracts/line-contracts.js';
import { expectFiniteAttributes, parseXml, renderRows, runs } from '../helpers.js';

const DAY = 86_400_000;
/** An ordered key value of one kind: a date (ISO day), a number, or an ordinal level. */
const keyOf = (kind: number, k: number) => (kind === 0 ? new Date(Date.UTC(2020, 0, 1) + k * DAY).toISOString().slice(0, 10) : kind === 1 ? k * 0.5 - 3 : `L${k}`);
const value = fc.oneof({ weight: 8, arbitrary: fc.double({ min: -1e6, max: 1e6, noNaN: true, noDefaultInfinity: true }) }, { weight: 1, arbitrary: fc.constant(null) });

describe('property: a line over random ordered data never throws', () => {
  it('renders with every line contract kept, or fails with catalogued, hinted errors', async () => {
    const data = fc.record({
      kind: fc.integer({ min: 0, max: 2 }),
      keys: fc.uniqueArray(fc.integer({ min: 0, max: 400 }), { minLength: 1, maxLength: 60 }),
      series: fc.integer({ min: 1, max: 10 }),
      values: fc.array(value, { minLength: 600, maxLength: 600 }),
      intent: fc.constantFrom('trend', 'change'),
      base: fc.constantFrom(undefined, 'first', 'previous'),
      fit: fc.boolean(),
      width: fc.integer({ min: 160, max: 1400 }),
      height: fc.integer({ min: 160, max: 900 }),
    });
    await fc.assert(fc.asyncProperty(data, async (d) => {
      const levels = [...d.keys].sort((a, b) => a - b).map((k) => `L${k}`);
      const rows = Array.from({ length: d.series }, (_, s) => d.keys.map((k, i) => ({ key: keyOf(d.kind, k), route: `Route ${s}`, v: d.values[(s * 61 + i) % 600] }))).flat();
      const brief = {
        intent: d.intent, keys: d.series > 1 ? ['key', 'route'] : 'key', values: 'v', size: { width: d.width, height: d.height },
        fields: { v: { unit: 'u' }, ...(d.kind === 2 ? { key: { type: 'ordinal', order: levels } } : {}) },
        ...(d.intent === 'change' && d.base ? { index: { base: d.base } } : {}), ...(d.fit ? { baseline: 'fit' } : {}),
      };
      const r = await renderRows(brief, rows);
      for (const x of r.diagnostics) {
        expect(Object.keys(CATALOGUE)).toContain(x.code);
        expect(x.code).not.toBe('render.internal');
        if (x.severity === 'error') expect(x.hint, x.code).toBeTruthy();
      }
      if (!r.ok) return;
      expectFiniteAttributes(r.svg!);
      parseXml(r.svg!);
      // More than 8 series are drawn as panels: the small-multiples contracts hold instead.
      if (r.choice!.facet) checkFacetContracts(dumpScene(r.scene!), 'route');
      else if (r.choice!.form !== 'change-bar') checkLineContracts(dumpScene(r.scene!));
    }), { numRuns: runs(60) });
  });
});
