import { describe, expect, it } from 'vitest';
import { readBrief } from '../../src/brief/resolve.js';
import { tableLike } from '../../src/brief/table-like.js';

function problem(text: string) {
  const r = readBrief(text);
  expect(r.ok).toBe(false);
  return r.diagnostics[0]!;
}

// Issue 6: a CSV passed where a brief was expected was told only "a brief must be a mapping".
describe('a table passed where a brief is expected', () => {
  it.each([
    ['CSV', 'pier,crossings\nNorth,212\nSouth,64\n'],
    ['TSV', 'pier\tcrossings\nNorth\t212\n'],
    ['semicolon CSV', 'pier;crossings\nNorth;212,5\n'],
    ['a JSON list of rows', '[{"pier": "North", "crossings": 212}, {"pier": "South", "crossings": 64}]'],
  ])('%s is refused with a hint to name it with `data:`', (_, text) => {
    const d = problem(text);
    expect(d.code).toBe('brief.not-an-object');
    expect(d.path).toBe('');
    expect(d.hint).toContain('data: <file>');
  });

  it.each([
    ['a sentence with a comma', 'compare sales, by region'],
    ['a list of names', '[a, b, c]'],
    ['a number', '42'],
  ])('%s is not taken for a table', (_, text) => {
    const d = problem(text);
    expect(d.code).toBe('brief.not-an-object');
    expect(d.hint).not.toContain('data: <file>');
  });

  it('tells CSV text from prose by a separator in the header and in a later row', () => {
    expect(tableLike('a,b 1,2')).toBe('delimited');
    expect(tableLike('a,b and more words')).toBeUndefined();
    expect(tableLike([{ a: 1 }, ['x']])).toBeUndefined();
  });
});
