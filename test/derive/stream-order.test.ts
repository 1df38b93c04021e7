import { describe, expect, it } from 'vitest';
import { insideOutOrder, onsetOf } from '../../src/derive/stream-order.js';

describe('inside-out layer order (Byron & Wattenberg 2008)', () => {
  it('the onset is the first key with a positive value', () => {
    expect(onsetOf([0, 0, 3, 1])).toBe(2);
    expect(onsetOf([0, 0])).toBe(Infinity);
  });

  it('the earliest series sits in the middle and later ones alternate above and below it', () => {
    const s = (name: string, onset: number) => ({ name, values: Array.from({ length: 6 }, (_, i) => (i >= onset ? 1 : 0)) });
    const order = insideOutOrder([s('e', 4), s('a', 0), s('c', 2), s('b', 1), s('d', 3)]).map((x) => x.name);
    // Sorted by onset a b c d e; a in the middle, b below, c above, d below b, e above c.
    expect(order).toEqual(['d', 'b', 'a', 'c', 'e']);
  });

  it('ties of onset go larger total first, then by name in code-point order', () => {
    const order = insideOutOrder([{ name: 'b', values: [1, 1] }, { name: 'a', values: [1, 1] }, { name: 'z', values: [5, 5] }]).map((x) => x.name);
    expect(order).toEqual(['a', 'z', 'b']);
  });
});
