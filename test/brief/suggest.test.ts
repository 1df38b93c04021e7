import { describe, expect, it } from 'vitest';
import { editDistance, nearestName } from '../../src/diagnostics/suggest.js';
import { readBrief } from '../../src/brief/resolve.js';

describe('near-miss suggestions', () => {
  const intents = ['compare', 'part-to-whole', 'composition', 'trend', 'change', 'distribution'];

  it('suggests names within a few edits', () => {
    expect(nearestName('compair', intents)).toBe('compare');
    expect(nearestName('crossing', ['pier', 'crossings'])).toBe('crossings');
  });

  it('suggests names that were extended or cut short', () => {
    expect(nearestName('comparison', intents)).toBe('compare');
    expect(nearestName('distrib', intents)).toBe('distribution');
  });

  it('matches regardless of case, spaces and underscores', () => {
    expect(nearestName('Balance M3', ['balance_m3'])).toBe('balance_m3');
  });

  it('suggests nothing for unrelated names', () => {
    expect(nearestName('weather', intents)).toBeUndefined();
    expect(nearestName('xy', ['pier', 'crossings'])).toBeUndefined();
  });

  it('counts edits as Levenshtein distance', () => {
    // Classic example: kitten → sitting takes 3 edits (common textbook example).
    expect(editDistance('kitten', 'sitting')).toBe(3);
  });
});

describe('typos of swapped letters', () => {
  // Found in a new-user trial: the README promises "did you mean" for misspelt names, but two
  // swapped letters counted as two edits, past the limit for short names.
  it('count one swap of neighbouring letters as one edit', () => {
    expect(editDistance('titel', 'title')).toBe(1);
    expect(editDistance('cuont', 'count')).toBe(1);
    expect(editDistance('ca', 'abc')).toBe(3); // optimal string alignment: no edit of a swapped pair twice
  });

  it('suggest the option or column a swap misspelt', () => {
    expect(nearestName('titel', ['title', 'subtitle', 'source'])).toBe('title');
    expect(nearestName('cuont', ['species', 'count'])).toBe('count');
  });
});

// Issue 6: unknown brief options, options of a field and enum values each get a did-you-mean.
describe('did-you-mean in a brief', () => {
  it.each([
    ['a top-level option', 'titel: x\n', '/titel', 'brief.unknown-option', '`title`'],
    ['an option of a field', 'fields:\n  crossings: { unti: trips }\n', '/fields/crossings/unti', 'brief.unknown-option', '`unit`'],
    ['an enum value', 'order: valeu\n', '/order', 'brief.bad-value', '`value`'],
    ['an enum value of a field', 'fields:\n  crossings: { type: quantitive }\n', '/fields/crossings/type', 'brief.bad-value', '`quantitative`'],
  ])('%s', (_, extra, path, code, near) => {
    const r = readBrief(`data: t.csv\nintent: compare\nkeys: pier\nvalues: crossings\n${extra}`);
    expect(r.ok).toBe(false);
    const d = r.diagnostics.find((x) => x.path === path);
    expect(d?.code).toBe(code);
    expect(d?.hint).toBe(`did you mean ${near}?`);
  });
});
