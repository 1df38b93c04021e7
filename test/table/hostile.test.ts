import { csvParseRows } from 'd3-dsv';
import { describe, expect, it } from 'vitest';
import { parseIsoDate } from '../../src/table/cells.js';
import { readTable } from '../../src/table/load.js';
import { recordStartLines } from '../../src/table/parse.js';
import { columnOf } from '../../src/table/types.js';
import { renderBrief } from '../../src/pipeline/render.js';
import { codes, env, memoryFiles, renderRows } from '../helpers.js';

async function readRows(rows: Record<string, unknown>[]) {
  return readTable({ kind: 'rows', rows }, {}, undefined, memoryFiles({}));
}
async function readCsv(text: string) {
  return readTable({ kind: 'file', path: 't.csv' }, {}, 'b.yaml', memoryFiles({ 't.csv': text }));
}

describe('dates of the first century', () => {
  it('reads years 0000–0099 as themselves, not as 1900–1999 (the Date.UTC quirk)', () => {
    const ref = new Date(0);
    ref.setUTCFullYear(45, 2, 15); // ECMAScript: setUTCFullYear takes the year as given
    expect(parseIsoDate('0045-03-15')!.time).toBe(ref.getTime());
    expect(new Date(parseIsoDate('0045-03-15')!.time).getUTCFullYear()).toBe(45);
    expect(new Date(parseIsoDate('0000-01-01T12:30Z')!.time).getUTCFullYear()).toBe(0);
  });

  it('knows 0000 is a leap year and 1900 is not (proleptic Gregorian calendar, ISO 8601)', () => {
    expect(parseIsoDate('0000-02-29')).toBeDefined();
    expect(parseIsoDate('1900-02-29')).toBeUndefined();
  });
});

describe('non-finite numbers in key columns', () => {
  it('treats NaN and Infinity keys (YAML .nan, .inf) as missing, never as labels "NaN" or "Infinity"', async () => {
    const r = await readRows([{ k: Number.NaN, v: 1 }, { k: Infinity, v: 2 }, { k: -Infinity, v: 3 }, { k: 'North', v: 4 }]);
    if (!r.ok) throw new Error(JSON.stringify(r.diagnostics));
    const k = columnOf(r.value, 'k')!;
    expect(k.values).toEqual([null, null, null, 'North']);
    expect(k.text).toEqual([null, null, null, 'North']);
    expect(k.missing).toEqual([0, 1, 2]);
  });
});

describe('hostile keys through the whole pipeline', () => {
  it('draws no bar named NaN or Infinity for YAML .nan and .inf keys, and warns that those rows have no key', async () => {
    const r = await renderBrief({ brief: 'intent: compare\nkeys: k\nvalues: v\nfields: {v: {unit: m}}\nrows: [{k: .nan, v: 1}, {k: .inf, v: 2}, {k: North, v: 3}]\n' }, env);
    expect(r.ok).toBe(true);
    expect(r.diagnostics).toMatchObject([{ code: 'derive.missing-values', field: 'k', rows: [1, 2] }]);
    expect(r.svg).not.toMatch(/NaN|Infinity/);
  });

  for (const name of ['constructor', 'toString', 'hasOwnProperty', '__proto__']) {
    it(`renders bars keyed by a column named ${name}, present in only some rows (it once threw)`, async () => {
      const rows = JSON.parse(`[{"${name}": "North", "v": 3}, {"v": 2}, {"${name}": "South", "v": 1}]`) as Record<string, unknown>[];
      const r = await renderRows({ intent: 'compare', keys: name, values: 'v', fields: { v: { unit: 'm' } } }, rows);
      expect(r.ok).toBe(true);
      expect(codes(r)).toEqual(['derive.missing-values']);
    });
  }
});

describe('line numbers in CSV with stray quotes', () => {
  it('does not shift later line numbers for a quote inside an unquoted cell (RFC 4180: quotes open only at a field start)', async () => {
    const r = await readCsv('k,v\nsay 5" pipe,1\nb,2\nc,3,4\n');
    expect(r.diagnostics).toMatchObject([{ code: 'table.ragged-row', line: 4, rows: [4] }]);
  });

  it('agrees with d3-dsv on where each record starts, across quotes, CRLF and lone CR', () => {
    const cases = ['a,b\r\n"x\r\ny",1\r\nz,2\r\n', 'a\rb\rc', 'a,"b""c"\nd,e"f\n"g\n"\n', '"a"x,b\nc,d', 'a,b\n\nc,d\n', '"unclosed\nrest,1\n'];
    for (const text of cases) {
      // d3-dsv is the CSV reader chartwright uses; its record count is the reference.
      expect(recordStartLines(text).length, JSON.stringify(text)).toBe(csvParseRows(text).length);
    }
    expect(recordStartLines('a,b\r\n"x\r\ny",1\r\nz,2\r\n')).toEqual([1, 2, 4]);
    expect(recordStartLines('a\rb\rc')).toEqual([1, 2, 3]);
  });

  it('counts a semicolon as the delimiter in semicolon files', () => {
    expect(recordStartLines('a;b\nx;"q\nr"\ny;z\n', ';')).toEqual([1, 2, 4]);
  });
});

describe('hostile inline rows give coded errors, never exceptions', () => {
  it('reports a cell nested 100,000 deep as a nested value', async () => {
    let deep: unknown = 1;
    for (let i = 0; i < 100_000; i++) deep = [deep];
    const r = await readRows([{ k: 'a', v: deep }]);
    expect(r.diagnostics).toMatchObject([{ code: 'table.nested-value', field: 'v', rows: [1] }]);
    expect(r.diagnostics[0]!.found!.length).toBeLessThanOrEqual(40);
  });

  it('reports a JSON data file cell nested 100,000 deep as a nested value', async () => {
    const deep = `${'['.repeat(100_000)}${']'.repeat(100_000)}`;
    const r = await readTable({ kind: 'file', path: 't.json' }, {}, 'b.yaml', memoryFiles({ 't.json': `[{"k": "a", "v": ${deep}}]` }));
    expect(r.diagnostics).toMatchObject([{ code: 'table.nested-value', field: 'v', rows: [1] }]);
  });

  it('reports a circular object as a nested value', async () => {
    const cyclic: Record<string, unknown> = { a: 1 };
    cyclic.self = cyclic;
    const r = await readRows([{ k: 'a', v: cyclic }]);
    expect(r.diagnostics).toMatchObject([{ code: 'table.nested-value', field: 'v' }]);
  });

  it('reports a circular row as a row, not as an exception', async () => {
    const row: Record<string, unknown> = { k: 'a' };
    row.v = [row];
    const r = await readRows([row]);
    expect(r.diagnostics).toMatchObject([{ code: 'table.nested-value', field: 'v' }]);
  });

  it('reads BigInt values as numbers, and a BigInt beyond the double range as missing', async () => {
    const r = await readRows([{ k: 'a', v: 12n }, { k: 'b', v: 10n ** 400n }, { k: 'c', v: -3n }]);
    if (!r.ok) throw new Error(JSON.stringify(r.diagnostics));
    expect(columnOf(r.value, 'v')!.values).toEqual([12, null, -3]);
  });

  for (const name of ['constructor', 'toString', 'hasOwnProperty', '__proto__']) {
    it(`reads a column named ${name} from own properties only, as missing where a row lacks it`, async () => {
      const rows = JSON.parse(`[{"k": "a"}, {"k": "b", "${name}": 5}]`) as Record<string, unknown>[];
      const r = await readRows(rows);
      if (!r.ok) throw new Error(JSON.stringify(r.diagnostics));
      const c = columnOf(r.value, name)!;
      expect(c.values).toEqual([null, 5]);
      expect(c.type).toBe('number');
    });

    it(`reads a CSV column named ${name} with a field hint on another column`, async () => {
      const r = await readTable({ kind: 'file', path: 't.csv' }, { v: { type: 'ordinal' } }, 'b.yaml', memoryFiles({ 't.csv': `${name},v\nx,1\ny,2\n` }));
      if (!r.ok) throw new Error(JSON.stringify(r.diagnostics));
      expect(columnOf(r.value, name)!.values).toEqual(['x', 'y']);
      expect(columnOf(r.value, 'v')!.type).toBe('text');
    });
  }
});

describe('line breaks inside cells', () => {
  it('a quoted CSV label with a line break, tab or control character is drawn on one line, not with a missing-glyph box (regression)', async () => {
    const t = await readCsv('region,v\n"North\r\nshore",3\n"South\tbay",4\n"East\u0007 end",5\n');
    expect(t.ok).toBe(true);
    const col = columnOf(t.ok ? t.value : (undefined as never), 'region')!;
    expect(col.values).toEqual(['North shore', 'South bay', 'East end']);
    const r = await renderRows({ intent: 'compare', keys: ['region'], values: 'v', fields: { v: { unit: 'boats' } } }, [{ region: 'North\nshore', v: 3 }, { region: 'South', v: 4 }]);
    expect(codes(r)).toEqual([]);
    expect(r.svg).toContain('North shore');
  });
});

describe('years written as numbers', () => {
  it('a column named year of whole numbers is read as years, ticked 1950 not 1,950, with an info saying so (regression)', async () => {
    const rows = Array.from({ length: 8 }, (_, i) => ({ year: 1950 + i * 10, catch: 10 + i }));
    const r = await renderRows({ intent: 'trend', keys: 'year', values: 'catch', fields: { catch: { unit: 't' } } }, rows);
    expect(r.ok).toBe(true);
    expect(r.diagnostics.find((d) => d.code === 'table.read-as-years')).toMatchObject({ severity: 'info', field: 'year' });
    const ticks = r.scene!.axes.find((a) => a.orient === 'bottom')!;
    expect(ticks.scale).toBe('time');
    expect(r.svg).toContain('>1950<');
    expect(r.svg).not.toMatch(/>1,9\d0</);
  });

  it('keeps a year-named column as numbers when a cell is not a whole four-digit year, or when the brief says quantitative', async () => {
    const t = await readRows([{ year: 1950 }, { year: 1960.5 }]);
    expect(t.ok && columnOf(t.value, 'year')!.type).toBe('number');
    const other = await readRows([{ weight: 1950 }, { weight: 1960 }]);
    expect(other.ok && columnOf(other.value, 'weight')!.type).toBe('number');
    const r = await renderRows({ intent: 'trend', keys: 'year', values: 'v', fields: { year: { type: 'quantitative' }, v: { unit: 't' } } }, [{ year: 1950, v: 1 }, { year: 1960, v: 2 }, { year: 1970, v: 3 }]);
    expect(r.diagnostics.map((d) => d.code)).not.toContain('table.read-as-years');
  });

  it('a column declared temporal reads four-digit years, as text or as numbers (ISO 8601 reduced precision: YYYY)', async () => {
    const r = await renderRows({ intent: 'trend', keys: 'y', values: 'v', fields: { y: { type: 'temporal' }, v: { unit: 't' } } }, [{ y: '2001', v: 1 }, { y: 2002, v: 2 }, { y: '2003', v: 3 }]);
    expect(r.ok).toBe(true);
    expect(r.scene!.axes.find((a) => a.orient === 'bottom')!.scale).toBe('time');
  });
});
