import { describe, expect, it } from 'vitest';
import { contentHash, idMaker, slug } from '../../src/scene/ids.js';

describe('ids', () => {
  it('slugs text to lower-case ASCII words joined by single hyphens', () => {
    expect(slug('Old Town Children\'s Library')).toBe('old-town-children-s-library');
    expect(slug('  Café Über--Straße ')).toBe('cafe-uber-stra-e');
    expect(slug('港口')).toBe('x');
    expect(slug('Pier 10')).toBe('pier-10');
  });

  it('makes repeated slugs unique in data order, within one chart only', () => {
    const id = idMaker();
    expect([id('bar', 'A b'), id('bar', 'a-b'), id('bar', 'A B')]).toEqual(['bar-a-b', 'bar-a-b-2', 'bar-a-b-3']);
    expect(idMaker()('bar', 'A b')).toBe('bar-a-b');
  });

  it('hashes content to 8 hex digits, FNV-1a', () => {
    // FNV-1a 32-bit of the empty string is the offset basis 0x811c9dc5; of "a" it is 0xe40c292c
    // (published FNV test values; from memory, unverified).
    expect(contentHash('')).toBe('811c9dc5');
    expect(contentHash('a')).toBe('e40c292c');
  });
});

describe('ids from very long labels', () => {
  // Guards a trial finding: a 5 MB label spent seconds being turned into an id.
  it('are made from the first part of the text only, and stay unique', () => {
    const long = 'Grebe '.repeat(100_000);
    expect(slug(long).length).toBeLessThanOrEqual(200);
    const id = idMaker();
    expect(id('bar', long)).not.toBe(id('bar', `${long}x`));
  });
});

describe('ids under several prefixes', () => {
  it('count one id however its prefix and text divide it, so ids stay unique', () => {
    const id = idMaker();
    expect([id('tick-key', 'a'), id('tick', 'key a'), id('tick', 'Key-A')]).toEqual(['tick-key-a', 'tick-key-a-2', 'tick-key-a-3']);
  });

  it('slug one text alike under every prefix', () => {
    const id = idMaker();
    expect([id('bar', 'Café Über'), id('label', 'Café Über'), id('bar', 'Café Über')]).toEqual(['bar-cafe-uber', 'label-cafe-uber', 'bar-cafe-uber-2']);
  });
});
