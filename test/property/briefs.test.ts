import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CATALOGUE } from '../../src/diagnostics/catalogue.js';
import { renderBrief } from '../../src/pipeline/render.js';
import { env, expectFiniteAttributes, memoryFiles, parseXml, runs } from '../helpers.js';

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
        expectFiniteAttributes(r.svg!);
      } else {
        expect(r.diagnostics.some((d) => d.severity === 'error')).toBe(true);
        expect(r.svg).toBeUndefined();
      }
    }), { numRuns: runs(400) });
  });
});

describe('property: any CSV text renders or fails clearly', () => {
  // Cells drawn from what real exports contain: numbers in several spellings, blanks, NA, dates, quotes, commas.
  const cell = fc.oneof(
    fc.integer({ min: -1e6, max: 1e6 }).map(String), fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e12, max: 1e12 }).map(String),
    fc.constantFrom('', 'NA', 'n/a', '-', '1,234', '1e5', '.5', '2026-10-04', 'true', 'Infinity', '"quoted, with comma"', '"say ""hi"""', 'x;y', ' spaced '),
    fc.string({ maxLength: 8 }),
  );
  const csv = fc.array(fc.tuple(cell, cell), { minLength: 0, maxLength: 60 }).map((rows) => ['k,v', ...rows.map(([k, v]) => `${k},${v}`)].join('\n'));

  it('never throws; succeeds with well-formed SVG, or fails with catalogued, hinted errors', async () => {
    await fc.assert(fc.asyncProperty(csv, async (text) => {
      const r = await renderBrief({ brief: { data: 't.csv', intent: 'compare', keys: 'k', values: 'v' }, file: 'b.yaml' }, { ...env, table: memoryFiles({ 't.csv': text }) });
      for (const d of r.diagnostics) {
        expect(Object.keys(CATALOGUE)).toContain(d.code);
        if (d.severity === 'error') expect(d.hint, d.code).toBeTruthy();
      }
      if (r.ok) {
        parseXml(r.svg!);
        expectFiniteAttributes(r.svg!);
      } else expect(r.diagnostics.some((d) => d.severity === 'error')).toBe(true);
    }), { numRuns: runs(300) });
  });
});
