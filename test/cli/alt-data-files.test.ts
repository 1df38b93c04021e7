import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { csvParse, csvParseRows } from 'd3-dsv';
import { describe, expect, it } from 'vitest';
import { csvCell, tableCsv } from '../../src/cli/data-csv.js';
import { EXIT } from '../../src/cli/exit-codes.js';
import { runCli } from '../../src/cli/run.js';
import { drawnData } from '../../src/scene/data-table.js';
import { dumpScene } from '../../src/scene/dump.js';
import { demoBriefs, renderDemo, tempDir } from '../helpers.js';
import { files, io, workspace } from './cli-helpers.js';

describe('--alt and --data', () => {
  it('write <output>.txt and <output>.csv beside the SVG, nothing else, and the run report lists them', async () => {
    const dir = workspace();
    const cli = io(dir);
    expect(await runCli(['render', 'piers.yaml', '-o', 'out', '--alt', '--data', '--report', 'run.json'], cli.io)).toBe(EXIT.OK);
    expect(files(join(dir, 'out'))).toEqual(['piers.data.csv', 'piers.svg', 'piers.txt']);
    expect(files(dir)).toEqual(['gaps.csv', 'out', 'piers.csv', 'piers.yaml', 'run.json', 'typo.yaml', 'warn.yaml']);
    expect(cli.out().trim().split('\n')).toEqual(['out/piers.svg', 'out/piers.txt', 'out/piers.data.csv']);
    const report = readFileSync(join(dir, 'run.json'), 'utf8');
    for (const f of ['piers.svg', 'piers.txt', 'piers.data.csv']) expect(report).toContain(join('out', f));
    const alt = readFileSync(join(dir, 'out', 'piers.txt'), 'utf8');
    expect(alt).toBe('Bar chart of crossings by pier, 3 bars: largest North (212), smallest South (64).\n');
    expect(readFileSync(join(dir, 'out', 'piers.svg'), 'utf8')).toContain(`>${alt.trim()}</desc>`);
    expect(readFileSync(join(dir, 'out', 'piers.data.csv'), 'utf8')).toBe('pier,crossings,rows_combined\r\nNorth,212,1\r\nEast,131,1\r\nSouth,64,1\r\n');
  });

  it('follow the brief\'s output names under -o, for every output, and only there', async () => {
    const dir = workspace();
    writeFileSync(join(dir, 'named.yaml'), 'data: piers.csv\nintent: compare\nkeys: pier\nvalues: crossings\nfields: { crossings: { unit: crossings } }\noutput: [figs/a.svg, figs/b.png]\n');
    const out = join(dir, 'out');
    mkdirSync(out);
    expect(await runCli(['render', 'named.yaml', '-o', 'out', '--alt', '--data'], io(dir).io)).toBe(EXIT.OK);
    expect(files(join(out, 'figs'))).toEqual(['a.data.csv', 'a.svg', 'a.txt', 'b.data.csv', 'b.png', 'b.svg', 'b.txt']);
    expect(files(dir)).not.toContain('named.txt');
  });

  it('are not written without the flags', async () => {
    const dir = workspace();
    expect(await runCli(['render', 'piers.yaml'], io(dir).io)).toBe(EXIT.OK);
    expect(files(dir).filter((f) => f.startsWith('piers.'))).toEqual(['piers.csv', 'piers.svg', 'piers.yaml']);
  });

  it('a --data file beside the brief never overwrites the brief\'s own data file of the same name (it is named .data.csv)', async () => {
    const dir = workspace();
    const cli = io(dir);
    expect(await runCli(['render', 'piers.yaml', '--data'], cli.io)).toBe(EXIT.OK);
    expect(readFileSync(join(dir, 'piers.csv'), 'utf8')).toBe('pier,crossings\nNorth,212\nSouth,64\nEast,131\n');
    expect(readFileSync(join(dir, 'piers.data.csv'), 'utf8')).toMatch(/^pier,crossings/);
  });

  it('a render not asked for its data keeps no data table on the scene (a million-cell heat map built one in a second on every render)', async () => {
    const heat = demoBriefs().find((f) => f.includes('marsh-birds.yaml'))!;
    expect((await renderDemo(heat)).result.scene!.data).toBeUndefined();
    expect((await renderDemo(heat, { data: true })).result.scene!.data!.rows.length).toBeGreaterThan(0);
  });

  it('explain --json carries the alt text', async () => {
    const dir = workspace();
    const cli = io(dir);
    await runCli(['explain', 'piers.yaml', '--json'], cli.io);
    expect((JSON.parse(cli.out()) as { alt: string }).alt).toMatch(/^Bar chart of crossings by pier, 3 bars/);
  });
});

describe('the data CSV', () => {
  it('round-trips: parsed with d3-dsv, every gallery chart\'s CSV holds the data of its drawn marks', async () => {
    for (const file of demoBriefs()) {
      const { result } = await renderDemo(file, { data: true });
      const scene = result.scene!;
      const text = tableCsv(drawnData(scene));
      const parsed = csvParse(text.replaceAll('\r\n', '\n'));
      expect(parsed.length, file).toBeGreaterThan(0);
      const drawn = dumpScene(scene).marks.filter((m) => m.role !== 'context' && ['bar', 'segment', 'point', 'line', 'layer', 'task', 'bin', 'cell'].includes(m.role));
      // Every drawn mark's datum (a line's: each point's, under its series) is a row of the CSV: numbers as written in full, text as is.
      const data = drawn.flatMap((m) => (m.datum ? [m.datum] : (m.points ?? []).flatMap((p) => (p.datum ? [{ ...m.series, ...p.datum }] : []))));
      expect(data.length + (scene.data ? 1 : 0), file).toBeGreaterThan(0);
      for (const datum of data) {
        const want = Object.entries(datum).filter(([, v]) => v !== null).map(([k, v]) => [k, csvCell(v).replace(/^"|"$/g, '')]);
        expect(parsed.some((r) => want.every(([k, v]) => r[k!] === v)), `${file}: ${JSON.stringify(datum)}`).toBe(true);
      }
    }
  });

  it('writes numbers plainly in full, quotes by RFC 4180, ends records with CRLF, and guards cells a spreadsheet would run', () => {
    const csv = tableCsv({ columns: ['name', 'value'], rows: [{ name: 'a, "b"', value: 0.1 + 0.2 }, { name: '=SUM(A1:A9)', value: -3 }, { name: '@cmd', value: 2840000000 }, { name: 'line\nbreak', value: null }] });
    // RFC 4180 §2: CRLF between records, fields with commas, quotes or line breaks quoted, quotes doubled.
    expect(csv.endsWith('\r\n')).toBe(true);
    const rows = csvParseRows(csv.replaceAll('\r\n', '\n').replace(/\n$/, ''));
    expect(rows).toEqual([['name', 'value'], ['a, "b"', '0.30000000000000004'], ["'=SUM(A1:A9)", '-3'], ["'@cmd", '2840000000'], ['line\nbreak', '']]);
    // OWASP CSV Injection: text starting with = + - @ (or tab, CR) gets a leading quote; numbers never do.
    expect(csvCell('+1')).toBe("'+1");
    expect(csvCell('-x')).toBe("'-x");
    expect(csvCell(-0)).toBe('0');
  });

  it('a folded bar chart says which bar folds how many keys, and how many rows each bar combines', async () => {
    const dir = tempDir();
    // 20 large keys and 380 of 1 each: the small ones fold into one "Others" bar, smaller than the largest.
    const rows = Array.from({ length: 400 }, (_, i) => `k${String(i).padStart(3, '0')},${i < 20 ? 1000 + i : 1}`).join('\n');
    writeFileSync(join(dir, 'many.csv'), `key,value\n${rows}\nk000,5\n`);
    writeFileSync(join(dir, 'many.yaml'), 'data: many.csv\nintent: compare\nkeys: key\nvalues: value\nfields: { value: { unit: things } }\naccept: [derive.others-folded]\n');
    const out = join(dir, 'out');
    const cli = io(dir);
    expect(await runCli(['render', 'many.yaml', '-o', 'out', '--data'], cli.io), cli.err()).toBe(EXIT.OK);
    const parsed = csvParse(readFileSync(join(out, 'many.data.csv'), 'utf8').replaceAll('\r\n', '\n'));
    expect(parsed.columns).toEqual(['key', 'value', 'rows_combined', 'folded_keys']);
    const others = parsed.filter((r) => r.folded_keys !== '');
    expect(others).toHaveLength(1);
    expect(Number(others[0]!.folded_keys) + parsed.length - 1).toBe(400);
    // 401 rows in all (k000 twice): each is combined into exactly one bar drawn.
    expect(parsed.reduce((s, r) => s + Number(r.rows_combined), 0)).toBe(401);
  });
});
