import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dumpScene } from '../../src/scene/dump.js';
import { expectFiniteAttributes, parseXml, renderRows, runs } from '../helpers.js';

const overlap = (a: { x: number; y: number; width: number; height: number }, b: typeof a) =>
  a.x < b.x + b.width - 0.01 && b.x < a.x + a.width - 0.01 && a.y < b.y + b.height - 0.01 && b.y < a.y + a.height - 0.01;

describe('property: heat maps of any shape', () => {
  it('any matrix (up to 40 × 40, cells missing, values of any sign) at any frame renders with no text overlapping and the marks inside the frame, or fails with a coded error', async () => {
    const cell = fc.option(fc.double({ min: -1e6, max: 1e6, noNaN: true, noDefaultInfinity: true }), { nil: undefined, freq: 6 });
    const shape = fc.record({ rows: fc.integer({ min: 1, max: 40 }), columns: fc.integer({ min: 1, max: 40 }), seed: fc.array(cell, { minLength: 1, maxLength: 50 }) });
    await fc.assert(fc.asyncProperty(shape, fc.integer({ min: 160, max: 1400 }), fc.integer({ min: 160, max: 1000 }), fc.constantFrom('average', 'single', 'ward'), async ({ rows, columns, seed }, width, height, linkage) => {
      const data: Record<string, unknown>[] = [];
      for (let r = 0; r < rows; r++) for (let c = 0; c < columns; c++) {
        const v = seed[(r * columns + c) % seed.length];
        if (v !== undefined) data.push({ row: `row ${r}`, column: `col ${c}`, v });
      }
      if (data.length === 0) return;
      const r = await renderRows({ intent: 'matrix', keys: ['row', 'column'], values: 'v', linkage, fields: { v: { unit: 'units' } }, size: { width, height } }, data);
      if (!r.ok) {
        expect(r.diagnostics.filter((d) => d.severity === 'error').map((d) => d.code)).toEqual(['layout.frame-too-small']);
        return;
      }
      parseXml(r.svg!);
      expectFiniteAttributes(r.svg!);
      const dump = dumpScene(r.scene!);
      const texts = dump.texts;
      for (let i = 0; i < texts.length; i++) for (let j = i + 1; j < texts.length; j++) expect(overlap(texts[i]!, texts[j]!), `${texts[i]!.text} / ${texts[j]!.text}`).toBe(false);
      for (const m of dump.marks.filter((k) => (k.role === 'cell' || k.role === 'raster') && k.kind !== 'path')) {
        expect(m.x! + (m.width ?? 0)).toBeLessThanOrEqual(width + 0.5);
        expect(m.y! + (m.height ?? 0)).toBeLessThanOrEqual(height + 0.5);
      }
    }), { numRuns: runs(30) });
  });
});
