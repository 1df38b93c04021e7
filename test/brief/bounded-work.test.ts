import { describe, expect, it } from 'vitest';
import { readBrief } from '../../src/brief/resolve.js';
import { editDistance, MAX_SUGGEST_LENGTH, nearestName, type SuggestWork } from '../../src/diagnostics/suggest.js';
import { firstDuplicate } from '../../src/fields/infer.js';
import { codes, renderRows } from '../helpers.js';

/** An array that counts how many of its items are read. */
function counted<T>(items: T[]): { list: T[]; reads: () => number } {
  let reads = 0;
  const list = new Proxy(items, {
    get(target, key, receiver) {
      if (typeof key === 'string' && /^\d+$/.test(key)) reads++;
      return Reflect.get(target, key, receiver);
    },
  });
  return { list, reads: () => reads };
}

describe('did-you-mean does bounded work', () => {
  it('computes no edit distance for names longer than the cap (100,000 characters once took over a minute)', () => {
    const work: SuggestWork = { cells: 0 };
    expect(nearestName('x'.repeat(100_000), ['y'.repeat(100_000), 'pier', 'crossings'], work)).toBeUndefined();
    expect(work.cells).toBe(0);
  });

  it('skips candidates longer than the cap', () => {
    const work: SuggestWork = { cells: 0 };
    nearestName('pier', ['q'.repeat(100_000)], work);
    expect(work.cells).toBe(0);
  });

  it('stops an edit distance once it must exceed the limit', () => {
    const work: SuggestWork = { cells: 0 };
    expect(editDistance('a'.repeat(MAX_SUGGEST_LENGTH), 'b'.repeat(MAX_SUGGEST_LENGTH), 3, work)).toBe(4);
    // Row i of the table has minimum i here; a swap looks back two rows, so once rows 4 and 5
    // both exceed the limit of 3, row 5 is the last computed.
    expect(work.cells).toBe(5 * MAX_SUGGEST_LENGTH);
  });

  it('grows linearly with the number of candidates, not with their product', () => {
    const cellsFor = (n: number) => {
      const work: SuggestWork = { cells: 0 };
      const candidates = Array.from({ length: n }, (_, i) => `${'z'.repeat(MAX_SUGGEST_LENGTH - 4)}${String(i).padStart(4, '0')}`);
      nearestName('a'.repeat(MAX_SUGGEST_LENGTH), candidates, work);
      return work.cells;
    };
    expect(cellsFor(200)).toBeGreaterThan(0);
    expect(cellsFor(2000)).toBe(10 * cellsFor(200));
  });

  it('still finds near misses with the limit in place', () => {
    expect(editDistance('kitten', 'sitting', 3)).toBe(3); // textbook example: 3 edits
    expect(editDistance('kitten', 'sitting', 2)).toBe(3);
    expect(nearestName('crossngs', ['pier', 'crossings'])).toBe('crossings');
  });
});

describe('level orders do linear work', () => {
  it('finds a duplicate level by reading each level once (an order of 100,001 levels once took 30 s)', () => {
    const levels = Array.from({ length: 100_001 }, (_, i) => `L${i}`);
    levels.push('L77');
    const { list, reads } = counted(levels);
    expect(firstDuplicate(list)).toBe('L77');
    expect(reads()).toBe(levels.length);
  });

  it('reports a duplicated level in a long order with its path', async () => {
    const order = Array.from({ length: 100_001 }, (_, i) => `L${i}`);
    order.push('L5');
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', fields: { k: { type: 'ordinal', order } } }, [{ k: 'L1', v: 1 }]);
    expect(r.diagnostics).toMatchObject([{ code: 'fields.order-duplicate', path: '/fields/k/order', found: 'L5' }]);
  });
});

describe('duplicate keys in a brief', () => {
  it('are found in a long mapping, with the line of the second one', () => {
    const lines = Array.from({ length: 20_000 }, (_, i) => `  c${i}: {unit: x}`);
    lines.push('  c7: {unit: y}');
    const r = readBrief(`intent: compare\nfields:\n${lines.join('\n')}\n`);
    expect(r.diagnostics).toMatchObject([{ code: 'brief.parse-error', line: 20_003, found: 'c7' }]);
  });

  it('are found in nested mappings too', () => {
    expect(codes(readBrief('intent: compare\nsize: {width: 300, width: 400}\n'))).toEqual(['brief.parse-error']);
  });
});

describe('problems reported per brief, from any stage', () => {
  // The brief stage capped its own problems; 100,000 `fields:` entries naming unknown columns
  // still gave 100,000 diagnostics from the fields stage.
  it('a failing brief reports at most 50 problems and one line counting the rest', async () => {
    const { renderRows } = await import('../helpers.js');
    const fields = Object.fromEntries(Array.from({ length: 2_000 }, (_, i) => [`nope${i}`, { unit: 'u' }]));
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', fields }, [{ k: 'a', v: 1 }]);
    expect(r.ok).toBe(false);
    expect(r.diagnostics).toHaveLength(51);
    expect(r.diagnostics[50]).toMatchObject({ code: 'brief.too-many-problems', found: '2000 problems' });
  });
});
