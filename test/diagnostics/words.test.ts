import { describe, expect, it } from 'vitest';
import { agree, article, count, ordinal } from '../../src/diagnostics/words.js';
import { readBrief } from '../../src/brief/resolve.js';
import { readTable } from '../../src/table/load.js';
import { memoryFiles } from '../helpers.js';

// Issue 6: messages said "a integer" and "1 cells".
describe('words of messages', () => {
  it('count a noun in the singular for exactly one, else in the plural', () => {
    expect(count(1, 'cell')).toBe('1 cell');
    expect(count(0, 'cell')).toBe('0 cells');
    expect(count(3, 'cell')).toBe('3 cells');
    expect(count(2, 'series', 'series')).toBe('2 series');
    expect(agree(1, 'has', 'have')).toBe('has');
    expect(agree(2, 'has', 'have')).toBe('have');
  });

  it('put "an" before a vowel sound and "a" before a consonant sound', () => {
    // The usual English rule goes by sound, not letter (common practice; e.g. "a unit", "an hour").
    expect(article('integer')).toBe('an integer');
    expect(article('object')).toBe('an object');
    expect(article('array')).toBe('an array');
    expect(article('index line chart')).toBe('an index line chart');
    expect(article('string')).toBe('a string');
    expect(article('unit')).toBe('a unit');
    expect(article('one-off')).toBe('a one-off');
    expect(article('hour')).toBe('an hour');
    expect(article('undefined')).toBe('an undefined');
  });
});

describe('counts and articles in diagnostics', () => {
  it('a ragged row of one cell is reported as "1 cell", not "1 cells"', async () => {
    const r = await readTable({ kind: 'file', path: 't.csv' }, {}, 'b.yaml', memoryFiles({ 't.csv': 'a,b\nx\n' }));
    expect(r.ok).toBe(false);
    expect(r.diagnostics[0]).toMatchObject({ code: 'table.ragged-row', found: '1 cell', expected: '2 cells, as in the header' });
  });

  it('a wrong type for an integer option expects "an integer"', () => {
    const r = readBrief('data: t.csv\nintent: compare\nkeys: a\nvalues: b\nsize: { width: wide }\n');
    expect(r.diagnostics.find((d) => d.path === '/size/width')).toMatchObject({ code: 'brief.wrong-type', expected: 'an integer' });
  });

  // Found drawing the Gantt gallery chart in the slide style: its note read "Only every 3th task".
  it('write "every third", never "every 3th": ordinals in English', () => {
    expect([2, 3, 4, 11, 12, 13, 21, 22, 23, 101, 111].map(ordinal)).toEqual(['second', 'third', '4th', '11th', '12th', '13th', '21st', '22nd', '23rd', '101st', '111th']);
  });
});
