import { describe, expect, it } from 'vitest';
import { readTable } from '../../src/table/load.js';
import { columnOf, type Table } from '../../src/table/types.js';
import { memoryFiles } from '../helpers.js';

async function read(name: string, text: string, fields = {}) {
  return readTable({ kind: 'file', path: name }, fields, 'briefs/b.yaml', memoryFiles({ [name]: text }));
}
async function table(name: string, text: string, fields = {}): Promise<Table> {
  const r = await read(name, text, fields);
  if (!r.ok) throw new Error(JSON.stringify(r.diagnostics));
  return r.value;
}

describe('table stage: formats', () => {
  it('reads CSV with quoted commas, and types each column', async () => {
    const t = await table('t.csv', 'name,count,when,flag\n"Smith, J.",-1.5e3,2026-10-04,true\nLee,42,2026-10-05,false\n');
    expect(t.columns.map((c) => c.type)).toEqual(['text', 'number', 'date', 'boolean']);
    expect(columnOf(t, 'name')!.values).toEqual(['Smith, J.', 'Lee']);
    expect(columnOf(t, 'count')!.values).toEqual([-1500, 42]);
    expect(columnOf(t, 'when')!.values).toEqual([Date.UTC(2026, 9, 4), Date.UTC(2026, 9, 5)]);
    expect(t.rowPositions).toEqual([2, 3]);
  });

  it('reads semicolon-separated CSV, as spreadsheets with a decimal comma export it', async () => {
    const t = await table('t.csv', 'pier;crossings\n"North; upper";212\nSouth;64\n');
    expect(columnOf(t, 'pier')!.values).toEqual(['North; upper', 'South']);
    expect(columnOf(t, 'crossings')!.values).toEqual([212, 64]);
  });

  it('keeps commas as the separator when the header has any', async () => {
    const t = await table('t.csv', 'name,note\nA,"x; y"\n');
    expect(columnOf(t, 'note')!.values).toEqual(['x; y']);
  });

  it('reads TSV', async () => {
    const t = await table('t.tsv', 'a\tb\nx\t1\n');
    expect(columnOf(t, 'b')!.values).toEqual([1]);
  });

  it('reads a JSON array of objects, with the union of their keys', async () => {
    const t = await table('t.json', '[{"a": "x", "b": 1}, {"a": "y", "c": true}]');
    expect(t.columns.map((c) => c.name)).toEqual(['a', 'b', 'c']);
    expect(columnOf(t, 'b')!.values).toEqual([1, null]);
    expect(t.positionNoun).toBe('row');
  });

  it('reads NDJSON and skips blank lines, keeping line numbers', async () => {
    const t = await table('t.ndjson', '{"a": 1}\n\n{"a": 2}\n');
    expect(t.rowPositions).toEqual([1, 3]);
  });

  it('reads stdin and guesses its format', async () => {
    const r = await readTable({ kind: 'stdin' }, {}, undefined, memoryFiles({}, 'a\tb\nx\t2\n'));
    expect(r.ok && r.value.origin).toEqual({ file: '<stdin>', format: 'tsv' });
  });

  it('reads inline rows', async () => {
    const r = await readTable({ kind: 'rows', rows: [{ a: 'x', b: 2 }] }, {}, undefined, memoryFiles({}));
    expect(r.ok && columnOf(r.value, 'b')!.values).toEqual([2]);
  });

  it('ignores a byte-order mark and blank lines in CSV', async () => {
    const t = await table('t.csv', '\uFEFFa,b\n\nx,1\n\ny,2\n');
    expect(t.columns[0]!.name).toBe('a');
    expect(t.rowPositions).toEqual([3, 5]);
  });

  it('counts lines inside quoted cells that span lines', async () => {
    const r = await read('t.csv', 'a,b\n"two\nlines",1\nx,2,3\n');
    expect(r.diagnostics[0]).toMatchObject({ code: 'table.ragged-row', line: 4 });
  });
});

describe('table stage: type inference', () => {
  it('reads negatives, decimals, exponents and grouped thousands as numbers', async () => {
    const t = await table('t.csv', 'v\n-3\n0.25\n1e-3\n"12,345"\n+7\n.5\n');
    expect(columnOf(t, 'v')!.values).toEqual([-3, 0.25, 0.001, 12345, 7, 0.5]);
  });

  it('treats NA, blanks and similar as missing, not as text', async () => {
    const t = await table('t.csv', 'k,v\na,1\nb,NA\nc,\nd,3\ne,n/a\n');
    const v = columnOf(t, 'v')!;
    expect(v.type).toBe('number');
    expect(v.missing).toEqual([1, 2, 4]);
  });

  it('keeps non-finite numbers out of the values and marks them missing', async () => {
    const t = await table('t.csv', 'v\n1\nInfinity\n-inf\n');
    expect(columnOf(t, 'v')!.values).toEqual([1, null, null]);
    const j = await table('t.json', '[{"v": 1e999}, {"v": 2}]');
    expect(columnOf(j, 'v')!.values).toEqual([null, 2]);
  });

  it('reads ISO 8601 dates and times as UTC, never local time', async () => {
    const t = await table('t.csv', 'd\n2026-10\n2026-10-04T06:30\n2026-10-04T06:30:00+02:00\n');
    const d = columnOf(t, 'd')!;
    expect(d.values).toEqual([Date.UTC(2026, 9, 1), Date.UTC(2026, 9, 4, 6, 30), Date.UTC(2026, 9, 4, 4, 30)]);
    expect(d.grain).toBe('second');
  });

  it('does not take impossible dates for dates', async () => {
    expect(columnOf(await table('t.csv', 'd\n2026-02-30\n2026-13-01\n'), 'd')!.type).toBe('text');
  });

  it('takes plain years for numbers', async () => {
    expect(columnOf(await table('t.csv', 'y\n2024\n2025\n'), 'y')!.type).toBe('number');
  });

  it('takes a column as numbers when exactly 80% of its present cells are, wherever the others sit', async () => {
    for (const cells of [['x', '1', '2', '3', '4'], ['1', '2', '3', '4', 'x'], ['x', 'NA', 'y', '1', '2', '3', '4', '5', '6', '7', '8']]) {
      const t = await table('t.csv', `v\n${cells.join('\n')}\n`);
      expect(columnOf(t, 'v')!.type).toBe('number');
    }
  });

  it('takes a column as text when under 80% of its present cells are numbers, wherever they sit', async () => {
    for (const cells of [['x', '1', '2', '3'], ['1', '2', '3', 'x'], ['x', 'y', '1', '2', '3', '4', '5', '6', '7', 'NA']]) {
      const t = await table('t.csv', `v\n${cells.join('\n')}\n`);
      expect(columnOf(t, 'v')!.type).toBe('text');
    }
  });

  it('warns about a mostly numeric column and names the rows that are not numbers', async () => {
    const r = await read('t.csv', 'v\n1\n2\n3\n4\nabout 5\n6\n7\n8\n9\n10\n');
    expect(r.ok).toBe(true);
    expect(r.diagnostics).toMatchObject([{ code: 'table.mixed-column', severity: 'warning', field: 'v', rows: [6], found: '"about 5"' }]);
    expect(r.ok && columnOf(r.value, 'v')!.values[4]).toBe(null);
  });

  it('reads a column with many texts as text, without warning', async () => {
    const r = await read('t.csv', 'v\n1\nx\ny\n');
    expect(r.ok && columnOf(r.value, 'v')!.type).toBe('text');
    expect(r.diagnostics).toEqual([]);
  });

  it('lets an explicit field type win over inference', async () => {
    const t = await table('t.csv', 'y\n2024\n2025\n', { y: { type: 'ordinal' } });
    expect(columnOf(t, 'y')!.type).toBe('text');
  });

  it('refuses a declared quantitative column with no numbers at all', async () => {
    const r = await read('t.csv', 'v\nx\ny\n', { v: { type: 'quantitative' } });
    expect(r.diagnostics).toMatchObject([{ code: 'table.type-mismatch', path: '/fields/v/type' }]);
  });
});

describe('table stage: coded errors name the file and line', () => {
  const cases: [string, string, string, Record<string, unknown>][] = [
    ['an empty file', 't.csv', '', { code: 'table.empty' }],
    ['a whitespace-only file', 't.csv', '  \n\n', { code: 'table.empty' }],
    ['a header-only file', 't.csv', 'a,b\n', { code: 'table.header-only', line: 1 }],
    ['duplicate column names', 't.csv', 'a,b,a\n1,2,3\n', { code: 'table.duplicate-column', line: 1, found: 'a' }],
    ['an empty column name', 't.csv', 'a,,c\n1,2,3\n', { code: 'table.empty-column-name' }],
    ['ragged rows', 't.csv', 'a,b\n1,2\n3\n4,5,6\n', { code: 'table.ragged-row', line: 3, rows: [3, 4] }],
    ['bad JSON', 't.json', '[{"a": 1},]', { code: 'table.bad-json' }],
    ['JSON that is not an array', 't.json', '{"a": 1}', { code: 'table.not-an-array' }],
    ['a JSON row that is not an object', 't.json', '[{"a": 1}, 2]', { code: 'table.row-not-an-object', rows: [2] }],
    ['a nested JSON value', 't.json', '[{"a": {"b": 1}}]', { code: 'table.nested-value', field: 'a' }],
    ['bad NDJSON', 't.ndjson', '{"a": 1}\n{"a": \n', { code: 'table.bad-json', line: 2 }],
    ['an empty JSON array', 't.json', '[]', { code: 'table.empty' }],
  ];
  for (const [what, name, text, expected] of cases) {
    it(`reports ${what}`, async () => {
      const r = await read(name, text);
      expect(r.ok).toBe(false);
      expect(r.diagnostics[0]).toMatchObject({ severity: 'error', file: `briefs/${name}`, ...expected });
      expect(r.diagnostics[0]!.hint).toBeTruthy();
    });
  }

  it('reports a missing file with the path it looked at', async () => {
    const r = await readTable({ kind: 'file', path: 'nope.csv' }, {}, 'briefs/b.yaml', memoryFiles({}));
    expect(r.diagnostics).toMatchObject([{ code: 'table.not-found', path: '/data', found: 'briefs/nope.csv' }]);
  });

  it('reports an unknown file extension', async () => {
    const r = await readTable({ kind: 'file', path: 'data.xlsx' }, {}, 'b.yaml', memoryFiles({ 'data.xlsx': '' }));
    expect(r.diagnostics).toMatchObject([{ code: 'table.unknown-format', found: '.xlsx' }]);
  });

  it('reports an unreadable file', async () => {
    const env = { readBytes: async () => { throw Object.assign(new Error('is a directory'), { code: 'EISDIR' }); }, readStdin: async () => new Uint8Array() };
    const r = await readTable({ kind: 'file', path: 'dir.csv' }, {}, 'b.yaml', env);
    expect(r.diagnostics).toMatchObject([{ code: 'table.unreadable' }]);
  });
});
