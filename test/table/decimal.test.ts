import { describe, expect, it } from 'vitest';
import { parseNumberText } from '../../src/table/cells.js';
import { readTable } from '../../src/table/load.js';
import { columnOf } from '../../src/table/types.js';
import { memoryFiles } from '../helpers.js';

async function read(text: string, fields = {}) {
  return readTable({ kind: 'file', path: 't.csv' }, fields, 'b.yaml', memoryFiles({ 't.csv': text }));
}
async function values(text: string, column = 'v') {
  const r = await read(text);
  if (!r.ok) throw new Error(JSON.stringify(r.diagnostics));
  return columnOf(r.value, column)!.values;
}

describe('decimal commas in semicolon-separated files', () => {
  it('reads 1,250 as 1.25 in a ; file, never as 1250 (a past 1000x misreading)', async () => {
    expect(await values('k;v\na;1,250\nb;2,500\nc;0,125\n')).toEqual([1.25, 2.5, 0.125]);
  });

  it('reads dot-grouped thousands with a decimal comma (1.250,5) in a ; file', async () => {
    expect(await values('k;v\na;1.250,5\nb;12.345.678\nc;7,25\n')).toEqual([1250.5, 12345678, 7.25]);
  });

  it('reads 1.250 as 1250 when the column writes decimals with a comma elsewhere', async () => {
    expect(await values('k;v\na;1.250\nb;3,5\n')).toEqual([1250, 3.5]);
  });

  it('reads decimal points in a ; file when the column has no decimal comma', async () => {
    expect(await values('k;v\na;1.5\nb;0.125\nc;1.250\n')).toEqual([1.5, 0.125, 1.25]);
  });

  it('refuses a ; column that mixes decimal commas and decimal points, naming the column', async () => {
    const r = await read('k;v\na;1,5\nb;2.5\n');
    expect(r.ok).toBe(false);
    expect(r.diagnostics).toMatchObject([{ code: 'table.ambiguous-decimal', field: 'v', file: 't.csv' }]);
    expect(r.diagnostics[0]!.hint).toBeTruthy();
  });

  it('refuses a ; column whose every number reads both as decimals and as grouped thousands', async () => {
    const r = await read('k;v\na;1.250\nb;2.500\n');
    expect(r.diagnostics).toMatchObject([{ code: 'table.ambiguous-decimal', field: 'v', found: '1.250' }]);
  });

  it('does not call a text column of a ; file ambiguous for one number-like label', async () => {
    const r = await read('k;v\nNorth;1\nSouth;2\n1.250;3\n');
    expect(r.ok).toBe(true);
    expect(columnOf(r.ok ? r.value : (undefined as never), 'k')!.type).toBe('text');
  });

  it('keeps grouping commas in comma-separated files', async () => {
    expect(await values('k,v\na,"1,250"\nb,"12,345.5"\n')).toEqual([1250, 12345.5]);
  });

  it('reads chartwright\'s own minus sign U+2212 back as a number, in either decimal mark', () => {
    expect(parseNumberText('\u22123.5')).toBe(-3.5);
    expect(parseNumberText('\u22121.234,5', ',')).toBe(-1234.5);
    expect(parseNumberText('\u2212inf')).toBe(-Infinity);
  });

  it('reads a column written with U+2212 minus signs as numbers', async () => {
    expect(await values('k,v\na,\u221212\nb,4\n')).toEqual([-12, 4]);
  });
});
