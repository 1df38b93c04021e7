import { execFileSync, spawn } from 'node:child_process';
import { mkdirSync, readFileSync, symlinkSync, utimesSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { open } from 'node:fs/promises';
import { describe, expect, it, vi } from 'vitest';
import { renderBatch } from '../../src/cli/batch.js';
import { ABANDONED_AFTER_MS, createCommitter, isStale, nodeOutputFs, TEMP_PATTERN, type OutputFs } from '../../src/cli/commit.js';
import { EXIT } from '../../src/cli/exit-codes.js';
import { runCli } from '../../src/cli/run.js';
import { env, root, tempDir } from '../helpers.js';
import { files, io, pierBrief, workspace } from './cli-helpers.js';

const world = { alive: () => true, now: () => Date.now() };
const batch = { png: true, scale: 1, strict: false, lenient: false, debug: false, outlineText: false, tempTag: '4242' };

/** The real file system, but the nth new file (only) fails as a full disk does, after writing half its bytes. */
function diskFullAt(n: number): OutputFs & { created: string[] } {
  const created: string[] = [];
  return {
    ...nodeOutputFs,
    created,
    async writeNew(path, data) {
      created.push(path);
      if (created.length !== n) return nodeOutputFs.writeNew(path, data);
      await nodeOutputFs.writeNew(path, data.slice(0, data.length / 2));
      throw Object.assign(new Error('ENOSPC: no space left on device, write'), { code: 'ENOSPC' });
    },
  };
}

describe('a brief\'s outputs are committed together or not at all (a past full disk left the SVG of a failed PNG)', () => {
  it('when the PNG cannot be written, no new SVG is left, the old one is untouched, and no temporary remains', async () => {
    const dir = workspace();
    writeFileSync(join(dir, 'piers.svg'), 'the old chart');
    const fs = diskFullAt(2);
    const [report] = await renderBatch([join(dir, 'piers.yaml')], env, { ...batch, fs }, dir);
    expect(report!.ok).toBe(false);
    expect(report!.written).toEqual([]);
    expect(report!.diagnostics.map((d) => d.code)).toEqual(['output.write-failed']);
    expect(fs.created).toHaveLength(2);
    expect(readFileSync(join(dir, 'piers.svg'), 'utf8')).toBe('the old chart');
    expect(files(dir)).toEqual(['gaps.csv', 'piers.csv', 'piers.svg', 'piers.yaml', 'typo.yaml', 'warn.yaml']);
  });

  it('a scene dump that cannot be written keeps the SVG and PNG from being committed too', async () => {
    const dir = workspace();
    const [report] = await renderBatch([join(dir, 'piers.yaml')], env, { ...batch, scene: join(dir, 'scene.json'), fs: diskFullAt(3) }, dir);
    expect(report!.ok).toBe(false);
    expect(files(dir).filter((f) => /\.(svg|png|json)$|\.tmp$/.test(f))).toEqual([]);
  });

  it('when a rename fails after another succeeded, the file already renamed is put back as it was', async () => {
    const dir = workspace();
    writeFileSync(join(dir, 'piers.svg'), 'the old chart');
    let renames = 0;
    const fs: OutputFs = { ...nodeOutputFs, rename: async (from, to) => {
      renames += 1;
      if (renames === 2 && to.endsWith('.png')) throw Object.assign(new Error('EACCES: permission denied, rename'), { code: 'EACCES' });
      return nodeOutputFs.rename(from, to);
    } };
    const [report] = await renderBatch([join(dir, 'piers.yaml')], env, { ...batch, fs }, dir);
    expect(report!.diagnostics.map((d) => d.code)).toEqual(['output.write-failed']);
    expect(readFileSync(join(dir, 'piers.svg'), 'utf8')).toBe('the old chart');
    expect(files(dir)).toEqual(['gaps.csv', 'piers.csv', 'piers.svg', 'piers.yaml', 'typo.yaml', 'warn.yaml']);
  });

  it('a folder in the way of one output (a --scene folder for one brief) fails before any file is renamed', async () => {
    const dir = workspace();
    mkdirSync(join(dir, 'scenes'));
    const t = io(dir);
    expect(await runCli(['render', 'piers.yaml', '--scene', 'scenes'], t.io)).toBe(EXIT.FAILED);
    expect(t.err()).toContain('error[output.write-failed]');
    expect(files(dir)).toEqual(['gaps.csv', 'piers.csv', 'piers.yaml', 'scenes', 'typo.yaml', 'warn.yaml']);
  });

  it('the CLI reports the failed brief and goes on with the next', async () => {
    const dir = workspace();
    writeFileSync(join(dir, 'second.yaml'), pierBrief());
    const t = io(dir);
    expect(await runCli(['render', 'piers.yaml', 'second.yaml'], t.io, { fs: diskFullAt(1) })).toBe(EXIT.FAILED);
    expect(t.err()).toContain('piers.yaml: error[output.write-failed]');
    expect(t.out()).toBe('second.svg\n');
  });
});

describe('temporary files (a past planted link at the predictable <out>.<pid>.tmp wrote outside the folder)', () => {
  it('are created exclusively: never over an existing file, a link, or a FIFO-like planted name', async () => {
    const dir = tempDir();
    const outside = join(tempDir(), 'victim.txt');
    writeFileSync(outside, 'keep me');
    symlinkSync(outside, join(dir, 'planted.tmp'));
    await expect(nodeOutputFs.writeNew(join(dir, 'planted.tmp'), 'x')).rejects.toMatchObject({ code: 'EEXIST' });
    writeFileSync(join(dir, 'plain.tmp'), 'there before');
    await expect(nodeOutputFs.writeNew(join(dir, 'plain.tmp'), 'x')).rejects.toMatchObject({ code: 'EEXIST' });
    expect(readFileSync(outside, 'utf8')).toBe('keep me');
    expect(readFileSync(join(dir, 'plain.tmp'), 'utf8')).toBe('there before');
  });

  it('are written, then synced to disk (so a rename never publishes unsynced bytes)', async () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'probe'), '');
    const probe = await open(join(dir, 'probe'), 'r');
    const handle = Object.getPrototypeOf(probe) as Record<'writeFile' | 'sync', (...a: unknown[]) => Promise<unknown>>;
    await probe.close();
    const calls: string[] = [];
    const spies = (['writeFile', 'sync'] as const).map((m) => {
      const real = handle[m];
      return vi.spyOn(handle, m).mockImplementation(function (this: unknown, ...a: unknown[]) { calls.push(m); return real.apply(this, a); });
    });
    try {
      await nodeOutputFs.writeNew(join(dir, 'new.tmp'), 'data');
    } finally {
      for (const s of spies) s.mockRestore();
    }
    expect(calls).toEqual(['writeFile', 'sync']);
    expect(readFileSync(join(dir, 'new.tmp'), 'utf8')).toBe('data');
  });

  it('have unpredictable names of chartwright\'s own pattern, and a link at the old predictable name is left alone', async () => {
    const dir = workspace();
    const outside = join(tempDir(), 'victim.txt');
    writeFileSync(outside, 'keep me');
    symlinkSync(outside, join(dir, 'piers.svg.4242.tmp'));
    const names: string[] = [];
    const spy: OutputFs = { ...nodeOutputFs, writeNew: (p, d) => { names.push(p.slice(dir.length + 1)); return nodeOutputFs.writeNew(p, d); } };
    const commit = createCommitter('4242', world, spy);
    await commit([{ path: join(dir, 'a.svg'), data: 'a' }]);
    await commit([{ path: join(dir, 'a.svg'), data: 'b' }]);
    expect(names).toHaveLength(2);
    expect(names[0]).not.toBe(names[1]);
    for (const n of names) expect(n).toMatch(TEMP_PATTERN);
    expect(readFileSync(outside, 'utf8')).toBe('keep me');
    expect(readFileSync(join(dir, 'a.svg'), 'utf8')).toBe('b');
  });

  it('a final name that is a link is replaced by the file, not written through', async () => {
    const dir = workspace();
    const outside = join(tempDir(), 'victim.svg');
    writeFileSync(outside, 'keep me');
    symlinkSync(outside, join(dir, 'piers.svg'));
    expect(await runCli(['render', 'piers.yaml'], io(dir).io)).toBe(EXIT.OK);
    expect(readFileSync(outside, 'utf8')).toBe('keep me');
    expect(readFileSync(join(dir, 'piers.svg'), 'utf8')).toMatch(/^<svg /);
  });
});

describe('stale temporaries of a killed run (kill -9 left 5 of 59) are removed by the next run writing there', () => {
  const old = (path: string, ms: number) => { const t = new Date(Date.now() - ms); utimesSync(path, t, t); };

  it('removes its own pattern when the owner is gone or it is abandoned, and nothing else', async () => {
    const dir = workspace();
    mkdirSync(join(dir, 'out'));
    const name = (owner: string, hex: string) => join(dir, 'out', `.chartwright-${owner}-${hex.repeat(16)}.tmp`);
    const keep = ['notes.tmp', '.chartwright-notes.tmp', `.chartwright-77-${'a'.repeat(16)}.tmp.bak`];
    for (const k of keep) { writeFileSync(join(dir, 'out', k), 'mine'); old(join(dir, 'out', k), 2 * ABANDONED_AFTER_MS); }
    writeFileSync(name('77', 'a'), 'killed'); old(name('77', 'a'), 5 * 60_000);
    writeFileSync(name('88', 'b'), 'running'); old(name('88', 'b'), 5 * 60_000);
    writeFileSync(name('88', 'c'), 'pid reused'); old(name('88', 'c'), 2 * ABANDONED_AFTER_MS);
    writeFileSync(name('77', 'd'), 'just written');
    const t = io(dir);
    t.io.alive = (pid) => pid === 88;
    expect(await runCli(['render', 'piers.yaml', '-o', 'out'], t.io)).toBe(EXIT.OK);
    expect(files(join(dir, 'out'))).toEqual([...keep, `.chartwright-77-${'d'.repeat(16)}.tmp`, `.chartwright-88-${'b'.repeat(16)}.tmp`, 'piers.svg'].sort());
  });

  it('the bin removes the temporary of a process killed with kill -9', async () => {
    const dir = workspace();
    mkdirSync(join(dir, 'out'));
    // A stand-in writer: creates a temporary of chartwright's pattern under its own pid, then hangs until killed.
    const script = "const fs = require('node:fs'); fs.writeFileSync(`out/.chartwright-${process.pid}-${'e'.repeat(16)}.tmp`, 'half'); console.log('ready'); setInterval(() => {}, 1000);";
    const child = spawn(process.execPath, ['-e', script], { cwd: dir, stdio: ['ignore', 'pipe', 'ignore'] });
    await new Promise((resolve) => child.stdout!.once('data', resolve));
    child.kill('SIGKILL');
    await new Promise((resolve) => child.once('exit', resolve));
    const temp = join(dir, 'out', `.chartwright-${child.pid}-${'e'.repeat(16)}.tmp`);
    old(temp, 20_000);
    execFileSync(process.execPath, [join(root, 'bin', 'chartwright.js'), 'render', 'piers.yaml', '-o', 'out'], { cwd: dir, stdio: 'pipe' });
    expect(files(join(dir, 'out'))).toEqual(['piers.svg']);
  });

  it('judges staleness by the documented rule', () => {
    const gone = { alive: () => false, now: () => 0 };
    const running = { alive: () => true, now: () => 0 };
    const tmp = `.chartwright-123-${'0'.repeat(16)}.tmp`;
    expect(isStale(tmp, 9_999, gone)).toBe(false);
    expect(isStale(tmp, 10_000, gone)).toBe(true);
    expect(isStale(tmp, 10_000, running)).toBe(false);
    expect(isStale(tmp, ABANDONED_AFTER_MS, running)).toBe(true);
    expect(isStale('piers.svg.123.tmp', ABANDONED_AFTER_MS, gone)).toBe(false);
  });
});
