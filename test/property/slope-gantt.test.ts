import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dumpScene } from '../../src/scene/dump.js';
import { checkGanttContracts, checkSlopeContracts } from '../contracts/slope-gantt-contracts.js';
import { expectFiniteAttributes, parseXml, renderRows, runs } from '../helpers.js';

const name = fc.string({ minLength: 1, maxLength: 16 }).filter((s) => s.trim() !== '' && !/^(na|n\/a|null|nan|-)$/i.test(s.trim()));
const size = fc.record({ width: fc.integer({ min: 300, max: 1200 }), height: fc.integer({ min: 240, max: 900 }) });

/**
 * The contracts of a rendered chart, and the same SVG from the rows shuffled; a refusal may only
 * be a frame too small for its words.
 */
async function rendersStably(brief: Record<string, unknown>, rows: Record<string, unknown>[], seed: number, contracts: (dump: ReturnType<typeof dumpScene>) => void) {
  const r = await renderRows(brief, rows);
  if (!r.ok) {
    expect(r.diagnostics.filter((d) => d.severity === 'error').map((d) => d.code)).toEqual(['layout.frame-too-small']);
    return;
  }
  parseXml(r.svg!);
  expectFiniteAttributes(r.svg!);
  contracts(dumpScene(r.scene!));
  const again = await renderRows(brief, shuffle(rows, seed));
  expect(again.svg).toBe(r.svg);
}

/** A permutation of rows from a seed, without randomness of its own. */
const shuffle = <T>(rows: T[], seed: number) => rows.map((r, i) => ({ r, k: (i * 7919 + seed) % 104729 })).sort((a, b) => a.k - b.k).map((x) => x.r);

describe('property: slope charts', () => {
  it('any items at two points render with every slope contract kept, and shuffled rows give the same scene', async () => {
    const items = fc.uniqueArray(fc.record({ k: name, a: fc.integer({ min: -500, max: 500 }), b: fc.integer({ min: -500, max: 500 }) }), { minLength: 1, maxLength: 30, selector: (r) => r.k.trim() });
    await fc.assert(fc.asyncProperty(items, size, fc.nat(), async (data, frame, seed) => {
      const brief = { intent: 'shift', keys: 'k', values: ['a', 'b'], size: frame, fields: { a: { unit: 'u' }, b: { unit: 'u' } } };
      await rendersStably(brief, data, seed, (dump) => checkSlopeContracts(dump, ['a', 'b']));
    }), { numRuns: runs(40) });
  });
});

describe('property: Gantt charts', () => {
  it('any tasks render with every Gantt contract kept, and shuffled rows give the same scene', async () => {
    const tasks = fc.uniqueArray(fc.record({ task: name, start: fc.integer({ min: 0, max: 400 }), length: fc.integer({ min: 0, max: 60 }) }), { minLength: 1, maxLength: 40, selector: (r) => r.task.trim() });
    await fc.assert(fc.asyncProperty(tasks, size, fc.nat(), async (data, frame, seed) => {
      // Each task after the one before it in the data, so connectors and overlaps both occur.
      const rows = data.map((t, i) => ({ task: t.task, start: t.start, end: t.start + t.length, pre: i > 0 ? data[i - 1]!.task.trim() : '' }));
      const brief = { intent: 'schedule', keys: 'task', start: 'start', end: 'end', after: 'pre', size: frame };
      await rendersStably(brief, rows, seed, (dump) => checkGanttContracts(dump, { task: 'task', start: 'start', end: 'end' }));
    }), { numRuns: runs(40) });
  });
});
