import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CATALOGUE } from '../../src/diagnostics/catalogue.js';
import { renderBrief } from '../../src/pipeline/render.js';
import { env, parseXml, runs } from '../helpers.js';

const rows = [{ pier: 'North', n: 5, day: '2026-01-01' }, { pier: 'South', n: -2, day: '2026-01-02' }, { pier: 'East <&>', n: null, day: '2026-01-03' }];

// Values a confused or careless brief might hold at any option.
const oddValue = fc.oneof(
  fc.constantFrom('pier', 'n', 'day', 'nope', '', 'compare', 'trend', 'bar', 'fit', 'zero', 'value', 'cluster', 'mean', 'report', 'x.svg'),
  fc.integer({ min: -5, max: 5000 }), fc.double(), fc.boolean(), fc.constant(null),
  fc.array(fc.constantFrom('pier', 'n', 'day', 'zz'), { maxLength: 3 }),
  fc.dictionary(fc.constantFrom('width', 'height', 'type', 'unit', 'order', 'base'), fc.oneof(fc.integer({ min: 0, max: 3000 }), fc.string(), fc.constantFrom('quantitative', 'ordinal'))),
);
const option = fc.constantFrom('intent', 'keys', 'values', 'title', 'subtitle', 'source', 'form', 'order', 'baseline', 'aggregate', 'style', 'size', 'output', 'fields', 'description', 'index', 'colour');

describe('property: every brief renders or fails clearly', () => {
  it('never throws; succeeds with well-formed SVG, or fails with catalogued, hinted errors', async () => {
    await fc.assert(fc.asyncProperty(fc.dictionary(option, oddValue, { maxKeys: 8 }), async (raw) => {
      const brief = { intent: 'compare', keys: 'pier', values: 'n', ...raw };
      const r = await renderBrief({ brief, rows }, env);
      for (const d of r.diagnostics) {
        expect(Object.keys(CATALOGUE)).toContain(d.code);
        expect(d.message).not.toBe('');
        if (d.severity === 'error') expect(d.hint, d.code).toBeTruthy();
      }
      if (r.ok) {
        parseXml(r.svg!);
        expect(r.svg).not.toMatch(/NaN|Infinity|undefined/);
      } else {
        expect(r.diagnostics.some((d) => d.severity === 'error')).toBe(true);
        expect(r.svg).toBeUndefined();
      }
    }), { numRuns: runs(400) });
  });
});
