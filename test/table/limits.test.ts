import { execFileSync, spawn } from 'node:child_process';
import { openSync, writeFileSync } from 'node:fs';
import { writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { nodeTableEnv } from '../../src/io/node-env.js';
import { DEFAULT_MAX_DATA_BYTES, readTable, type TableEnv } from '../../src/table/load.js';
import { memoryFiles, root, tempDir } from '../helpers.js';

/** Wraps a table env to record how many bytes each read asked for. */
function recording(env: TableEnv, asked: number[]): TableEnv {
  return { ...env, readBytes: (p, limit) => { asked.push(limit); return env.readBytes(p, limit); }, readStdin: (limit) => { asked.push(limit); return env.readStdin(limit); } };
}

describe('size limits on data', () => {
  it('refuses a data file over the limit with a coded error naming the limit and how to raise it', async () => {
    const asked: number[] = [];
    const env = recording(memoryFiles({ 't.csv': 'k,v\na,1\nb,2\n' }, '', 10), asked);
    const r = await readTable({ kind: 'file', path: 't.csv' }, {}, 'b.yaml', env);
    expect(r.diagnostics).toMatchObject([{ code: 'table.too-large', path: '/data', file: 't.csv' }]);
    expect(r.diagnostics[0]!.message).toContain('10 bytes');
    expect(r.diagnostics[0]!.hint).toContain('CHARTWRIGHT_MAX_DATA_BYTES');
    // Only one byte more than the limit is ever read: enough to know the data is too large.
    expect(asked).toEqual([11]);
  });

  it('accepts data exactly at the limit', async () => {
    const text = 'k,v\na,1\n';
    const r = await readTable({ kind: 'file', path: 't.csv' }, {}, 'b.yaml', memoryFiles({ 't.csv': text }, '', text.length));
    expect(r.ok).toBe(true);
  });

  it('refuses stdin over the limit, reading at most one byte past it', async () => {
    const asked: number[] = [];
    const r = await readTable({ kind: 'stdin' }, {}, undefined, recording(memoryFiles({}, 'k,v\n' + 'a,1\n'.repeat(100), 64), asked));
    expect(r.diagnostics).toMatchObject([{ code: 'table.too-large', file: '<stdin>' }]);
    expect(asked).toEqual([65]);
  });

  it('reports stdin that cannot be read as a coded error, not an exception', async () => {
    const env: TableEnv = { readBytes: async () => new Uint8Array(), readStdin: async () => { throw Object.assign(new Error('resource temporarily unavailable'), { code: 'EAGAIN' }); } };
    const r = await readTable({ kind: 'stdin' }, {}, undefined, env);
    expect(r.diagnostics).toMatchObject([{ code: 'table.unreadable', path: '/data', found: '<stdin>' }]);
  });

  it('asks for the default limit, 256 MiB, plus one byte when none is set', async () => {
    const asked: number[] = [];
    await readTable({ kind: 'file', path: 't.csv' }, {}, 'b.yaml', recording(memoryFiles({ 't.csv': 'k,v\na,1\n' }), asked));
    expect(asked).toEqual([DEFAULT_MAX_DATA_BYTES + 1]);
  });

  it('stops reading an endless file such as /dev/zero at the limit asked for', async () => {
    const bytes = await nodeTableEnv().readBytes('/dev/zero', 100_001);
    expect(bytes.length).toBe(100_001);
  });

  it('reads a data file whole when it is under the limit', async () => {
    const file = join(tempDir(), 't.csv');
    writeFileSync(file, 'k,v\na,1\n');
    expect(new TextDecoder().decode(await nodeTableEnv().readBytes(file, 1000))).toBe('k,v\na,1\n');
  });

  it('reads no more than the limit of a regular file read directly', async () => {
    const file = join(tempDir(), 't.csv');
    writeFileSync(file, 'k,v\na,1\nb,2\n');
    expect(new TextDecoder().decode(await nodeTableEnv().readBytes(file, 6))).toBe('k,v\na,');
  });

  it('reads a data file larger than a direct read through the stream, up to the limit', async () => {
    const file = join(tempDir(), 'big.csv');
    writeFileSync(file, Buffer.alloc(3 * 1024 * 1024, 0x61));
    expect((await nodeTableEnv().readBytes(file, 2 * 1024 * 1024 + 1)).length).toBe(2 * 1024 * 1024 + 1);
  });

  it.skipIf(process.platform === 'win32')('reads a FIFO whose writer comes after the read began (its open does not block)', async () => {
    const fifo = join(tempDir(), 'rows.csv');
    execFileSync('mkfifo', [fifo]);
    const reading = nodeTableEnv().readBytes(fifo, 1000);
    await writeFile(fifo, 'k,v\na,1\n');
    expect(new TextDecoder().decode(await reading)).toBe('k,v\na,1\n');
  });

  it('the CLI stops reading stdin from /dev/zero and reports the limit (it once read 7.5 GiB)', async () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'b.yaml'), 'data: "-"\nintent: compare\nkeys: k\nvalues: v\n');
    const child = spawn(process.execPath, [join(root, 'bin', 'chartwright.js'), 'check', join(dir, 'b.yaml')], {
      stdio: [openSync('/dev/zero', 'r'), 'pipe', 'pipe'], env: { ...process.env, CHARTWRIGHT_MAX_DATA_BYTES: '1000000' },
    });
    let stderr = '';
    child.stderr!.on('data', (d) => { stderr += String(d); });
    const code = await new Promise<number | null>((resolve) => child.on('exit', resolve));
    expect(stderr).toContain('table.too-large');
    expect(stderr).toContain('1000000 bytes');
    expect(code).toBe(1);
  });
});
