import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { FORM_NAMES, INTENTS } from '../../src/brief/types.js';
import { codes, renderRows, runs } from '../helpers.js';

/** Tables of the common shapes: keys of several types, one to four values, some cells missing. */
const table = fc.record({
  rows: fc.integer({ min: 1, max: 40 }),
  keys: fc.integer({ min: 0, max: 2 }),
  values: fc.integer({ min: 1, max: 4 }),
  dates: fc.boolean(),
  negative: fc.boolean(),
  holes: fc.boolean(),
});

function rowsOf(t: { rows: number; keys: number; values: number; dates: boolean; negative: boolean; holes: boolean }) {
  return Array.from({ length: t.rows }, (_, i) => {
    const row: Record<string, unknown> = {};
    if (t.keys >= 1) row.k1 = t.dates ? `2025-${String((i % 12) + 1).padStart(2, '0')}-01` : `Item ${i % 7}`;
    if (t.keys >= 2) row.k2 = `Group ${i % 3}`;
    for (let v = 0; v < t.values; v++) row[`v${v}`] = t.holes && (i + v) % 5 === 0 ? null : ((i * 37 + v * 11) % 23) * (t.negative && i % 4 === 0 ? -1 : 1);
    return row;
  });
}

describe('property: any intent with any pinned form, on any common table shape', () => {
  // Guards a past defect: a scatter plot pinned under intent compare crashed while drawing
  // (render.internal). Every combination must draw or be refused with a coded error.
  it('draws or refuses with a coded error, never an internal failure', async () => {
    let drawn = 0;
    await fc.assert(fc.asyncProperty(fc.constantFrom(...INTENTS), fc.oneof({ weight: 3, arbitrary: fc.constant(undefined) }, { weight: 2, arbitrary: fc.constantFrom(...FORM_NAMES) }), table, async (intent, form, t) => {
      const keys = ['k1', 'k2'].slice(0, t.keys);
      const values = Array.from({ length: t.values }, (_, v) => `v${v}`);
      const brief: Record<string, unknown> = { intent, keys, values, ...(form ? { form } : {}) };
      if (intent === 'schedule') Object.assign(brief, { values: [], start: 'v0', end: 'v1' });
      const r = await renderRows(brief, rowsOf(t));
      expect(codes(r)).not.toContain('render.internal');
      if (!r.ok) expect(r.diagnostics.some((d) => d.severity === 'error')).toBe(true);
      else drawn++;
    }), { numRuns: runs(300) });
    // The property is not met by refusing everything: a fair share of the combinations draw.
    expect(drawn).toBeGreaterThan(runs(300) / 40);
  });
});
