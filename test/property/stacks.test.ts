import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dumpScene } from '../../src/scene/dump.js';
import { checkStackContracts } from '../contracts/stack-contracts.js';
import { expectFiniteAttributes, parseXml, renderRows, runs } from '../helpers.js';

const group = fc.constantFrom('North', 'South', 'East', 'West', 'Harbour master\'s office', 'Q', '港口');
const part = fc.constantFrom('a', 'b', 'c', 'd', 'e', 'f', 'g', 'h', 'i', 'j', 'k', 'l', 'm', 'n');
const rows = fc.array(fc.record({ g: group, p: part, v: fc.double({ min: 0, max: 1e9, noNaN: true, noDefaultInfinity: true }) }), { minLength: 1, maxLength: 120 });

describe('property: any non-negative table of groups and parts stacks honestly, or fails clearly', () => {
  for (const intent of ['composition', 'part-to-whole']) {
    it(`${intent}: every contract holds at any frame size, or the refusal is coded`, async () => {
      await fc.assert(fc.asyncProperty(rows, fc.integer({ min: 160, max: 1400 }), fc.integer({ min: 160, max: 1000 }), async (data, width, height) => {
        const r = await renderRows({ intent, keys: ['g', 'p'], values: 'v', fields: { v: { unit: 'units' } }, size: { width, height } }, data);
        if (!r.ok) {
          const errors = r.diagnostics.filter((d) => d.severity === 'error').map((d) => d.code);
          // The acceptable refusals: a frame too small for its words, more parts than colour tells
          // apart (absolute stacks do not fold), or a whole of zero.
          for (const code of errors) expect(['layout.frame-too-small', 'choice.too-many-colours', 'derive.whole-is-zero']).toContain(code);
          expect(errors.length).toBeGreaterThan(0);
          return;
        }
        parseXml(r.svg!);
        expectFiniteAttributes(r.svg!);
        // In a frame too small for its legend, text that reaches past the edge is reported (a
        // warning, layout.text-off-canvas); the marks' contracts hold all the same.
        const texts = !r.diagnostics.some((d) => d.code === 'layout.text-off-canvas');
        checkStackContracts(dumpScene(r.scene!), { group: 'g', part: 'p', value: 'v', normalized: intent === 'part-to-whole', texts });
      }), { numRuns: runs(25) });
    });
  }
});
