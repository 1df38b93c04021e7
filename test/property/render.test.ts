import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isMissingText } from '../../src/table/cells.js';
import { readTable } from '../../src/table/load.js';
import { dumpScene } from '../../src/scene/dump.js';
import { nodesOf } from '../../src/scene/walk.js';
import type { SceneNode } from '../../src/scene/types.js';
import { checkBarContracts } from '../contracts/bar-contracts.js';
import { expectFiniteAttributes, memoryFiles, parseXml, renderRows, runs } from '../helpers.js';

function coordinates(n: SceneNode): number[] {
  switch (n.kind) {
    case 'rect': return [n.x, n.y, n.x + n.width, n.y + n.height];
    case 'text': return [n.box.x, n.box.y, n.box.x + n.box.width, n.box.y + n.box.height];
    case 'path': return n.commands.flatMap((c) => (c.op === 'Z' ? [] : c.op === 'C' ? [c.x1, c.y1, c.x2, c.y2, c.x, c.y] : [c.x, c.y]));
    default: return [];
  }
}

const label = fc.oneof(fc.string({ minLength: 1, maxLength: 30 }), fc.constantFrom('<b>&amp;', '"quoted"', 'Ünïcødé', 'tab\there', 'a'.repeat(80), '港口'));

describe('property: any table renders or fails clearly', () => {
  it('reading arbitrary CSV text never throws: it gives a table or coded errors', async () => {
    await fc.assert(fc.asyncProperty(fc.string({ maxLength: 300 }), async (text) => {
      const r = await readTable({ kind: 'file', path: 't.csv' }, {}, 'b.yaml', memoryFiles({ 't.csv': text }));
      if (!r.ok) {
        expect(r.diagnostics.length).toBeGreaterThan(0);
        for (const d of r.diagnostics) expect(d.code).toMatch(/^table\./);
      } else expect(r.value.rowCount).toBeGreaterThan(0);
    }), { numRuns: runs(300) });
  });

  it('any 1–500 rows with finite values give well-formed SVG with every coordinate finite and on the canvas', async () => {
    const rows = fc.array(fc.record({ k: label, v: fc.double({ min: -1e9, max: 1e9, noNaN: true, noDefaultInfinity: true }) }), { minLength: 1, maxLength: 500 });
    await fc.assert(fc.asyncProperty(rows, fc.integer({ min: 160, max: 1600 }), fc.integer({ min: 160, max: 1200 }), async (data, width, height) => {
      const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', title: 'T <&>', size: { width, height } }, data);
      if (!r.ok) {
        // The acceptable refusals: a frame too small for its text, or no row with a key at all
        // (keys such as "" or "NA" read as missing); each must say so.
        const errors = r.diagnostics.filter((d) => d.severity === 'error').map((d) => d.code);
        if (data.every((row) => isMissingText(row.k))) expect(errors).toEqual(['derive.no-rows']);
        else expect(errors).toEqual(['layout.frame-too-small']);
        return;
      }
      parseXml(r.svg!);
      expectFiniteAttributes(r.svg!);
      // Every perceptual contract holds: lengths ∝ values, one zero baseline, titles, no overlaps.
      checkBarContracts(dumpScene(r.scene!), 'v', 'k');
      for (const node of nodesOf(r.scene!.root)) {
        for (const v of coordinates(node)) {
          expect(Number.isFinite(v)).toBe(true);
          expect(v).toBeGreaterThanOrEqual(-0.5);
          expect(v).toBeLessThanOrEqual(Math.max(width, height) + 0.5);
        }
      }
    }), { numRuns: runs(120) });
  });

  it('shuffling the input rows does not change a sorted chart', async () => {
    const rows = fc.uniqueArray(fc.record({ k: fc.string({ minLength: 1, maxLength: 12 }), v: fc.integer({ min: -1000, max: 1000 }) }), { minLength: 1, maxLength: 60, selector: (r) => r.k.trim() });
    await fc.assert(fc.asyncProperty(rows, fc.nat(), async (data, seed) => {
      const shuffled = [...data].sort((a, b) => ((a.k.length * 31 + seed) % 7) - ((b.k.length * 31 + seed) % 7) || (a.k < b.k ? 1 : -1));
      const a = await renderRows({ intent: 'compare', keys: 'k', values: 'v' }, data);
      const b = await renderRows({ intent: 'compare', keys: 'k', values: 'v' }, shuffled);
      expect(a.ok).toBe(b.ok);
      if (a.ok) expect(dumpScene(b.scene!)).toEqual(dumpScene(a.scene!));
    }), { numRuns: runs(60) });
  });
});
