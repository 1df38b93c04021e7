import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dumpScene } from '../../src/scene/dump.js';
import { expectFiniteAttributes, renderRows, runs } from '../helpers.js';

const value = fc.oneof(
  fc.double({ min: -1e9, max: 1e9, noNaN: true, noDefaultInfinity: true }),
  fc.integer({ min: -20, max: 20 }),
  fc.constantFrom(0, 1e-12, 1e12, null, ''),
);

describe('property: distributions of random samples', () => {
  it('a histogram of any sample renders or refuses with a code, never throws, and its counts sum to the values drawn', async () => {
    const rows = fc.array(fc.record({ v: value }), { minLength: 1, maxLength: 300 });
    await fc.assert(fc.asyncProperty(rows, fc.integer({ min: 200, max: 1400 }), async (data, width) => {
      const r = await renderRows({ intent: 'distribution', values: 'v', fields: { v: { type: 'quantitative', unit: 'u' } }, size: { width, height: 400 } }, data);
      expect(r.diagnostics.map((d) => d.code)).not.toContain('render.internal');
      if (!r.ok) {
        for (const d of r.diagnostics.filter((x) => x.severity === 'error')) expect(['derive.no-rows', 'derive.cannot-bin', 'layout.frame-too-small']).toContain(d.code);
        return;
      }
      expectFiniteAttributes(r.svg!);
      const finite = data.filter((row) => typeof row.v === 'number').length;
      const bins = dumpScene(r.scene!).marks.filter((m) => m.role === 'bin');
      expect(bins.reduce((s, b) => s + (b.datum!.count as number), 0)).toBe(finite);
    }), { numRuns: runs(80) });
  });

  it('strips and boxes of random groups render or refuse with a code, and draw every value (strips) or every group (boxes)', async () => {
    const rows = fc.array(fc.record({ g: fc.constantFrom('a', 'b', 'c', 'a long group name of many words'), v: value }), { minLength: 1, maxLength: 200 });
    await fc.assert(fc.asyncProperty(rows, fc.constantFrom('strip', 'box'), async (data, form) => {
      const r = await renderRows({ intent: 'distribution', keys: 'g', values: 'v', form, fields: { v: { type: 'quantitative', unit: 'u' } } }, data);
      expect(r.diagnostics.map((d) => d.code)).not.toContain('render.internal');
      if (!r.ok) {
        for (const d of r.diagnostics.filter((x) => x.severity === 'error')) expect(['derive.no-rows', 'layout.frame-too-small']).toContain(d.code);
        return;
      }
      expectFiniteAttributes(r.svg!);
      const usable = data.filter((row) => typeof row.v === 'number');
      const marks = dumpScene(r.scene!).marks;
      if (form === 'strip') expect(marks.filter((m) => m.role === 'point')).toHaveLength(usable.length);
      else expect(marks.filter((m) => m.role === 'box' && m.kind === 'rect').reduce((s, b) => s + (b.datum!.n as number), 0)).toBe(usable.length);
    }), { numRuns: runs(60) });
  });
});
