import { describe, expect, it } from 'vitest';
import { readTable } from '../../src/table/load.js';
import { columnOf } from '../../src/table/types.js';
import { memoryFiles, utf16Bytes } from '../helpers.js';

async function read(name: string, bytes: Uint8Array | string) {
  return readTable({ kind: 'file', path: name }, {}, 'briefs/b.yaml', memoryFiles({ [name]: bytes }));
}

describe('encodings of data files', () => {
  const csv = 'pier,crossings\nNörth,212\n港口,64\n';

  for (const bigEndian of [false, true]) {
    it(`reads UTF-16 ${bigEndian ? 'big' : 'little'}-endian text by its byte-order mark (once misread as ragged rows)`, async () => {
      const r = await read('t.csv', utf16Bytes(csv, bigEndian));
      expect(r.diagnostics).toEqual([]);
      expect(r.ok && columnOf(r.value, 'pier')!.values).toEqual(['Nörth', '港口']);
      expect(r.ok && r.value.rowPositions).toEqual([2, 3]);
    });
  }

  it('drops a UTF-8 byte-order mark from the first column name', async () => {
    const r = await read('t.csv', new Uint8Array([0xef, 0xbb, 0xbf, ...new TextEncoder().encode(csv)]));
    expect(r.ok && r.value.columns[0]!.name).toBe('pier');
  });

  it('drops a UTF-8 byte-order mark from JSON data', async () => {
    const r = await read('t.json', new Uint8Array([0xef, 0xbb, 0xbf, ...new TextEncoder().encode('[{"a": 1}]')]));
    expect(r.ok && r.value.columns[0]!.name).toBe('a');
  });

  it('reports bytes that are not UTF-8 with the file and line, never as U+FFFD', async () => {
    // "Gruß" in Latin-1: 0xDF is not valid UTF-8 on its own.
    const bytes = new Uint8Array([...new TextEncoder().encode('k,v\nNorth,1\n'), 0x47, 0x72, 0x75, 0xdf, ...new TextEncoder().encode(',2\nSouth,3\n')]);
    const r = await read('t.csv', bytes);
    expect(r.ok).toBe(false);
    expect(r.diagnostics).toMatchObject([{ code: 'table.bad-encoding', file: 'briefs/t.csv', line: 3 }]);
    expect(r.diagnostics[0]!.hint).toBeTruthy();
  });

  it('reports invalid UTF-8 on the last line when the file has no final newline', async () => {
    const r = await read('t.csv', new Uint8Array([...new TextEncoder().encode('k,v\na,1\n'), 0xc3]));
    expect(r.diagnostics).toMatchObject([{ code: 'table.bad-encoding', line: 3 }]);
  });

  it('reports UTF-16 with a broken surrogate pair as an encoding error', async () => {
    const bytes = utf16Bytes('k,v\na,1\n', false);
    const broken = new Uint8Array([...bytes, 0x00, 0xd8, 0x41, 0x00]); // a lone high surrogate, then "A"
    const r = await read('t.csv', broken);
    expect(r.diagnostics).toMatchObject([{ code: 'table.bad-encoding', line: 3 }]);
  });

  it('reads UTF-16 from stdin and still guesses its format', async () => {
    const r = await readTable({ kind: 'stdin' }, {}, undefined, memoryFiles({}, utf16Bytes('a\tb\nx\t2\n', false)));
    expect(r.ok && r.value.origin).toEqual({ file: '<stdin>', format: 'tsv' });
  });
});
