import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, openSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { nodeOutputFs } from '../../src/cli/commit.js';
import { EXIT } from '../../src/cli/exit-codes.js';
import { printable } from '../../src/cli/format.js';
import { runCli } from '../../src/cli/run.js';
import { env, root } from '../helpers.js';
import { files, io, pierBrief, workspace } from './cli-helpers.js';

/** An environment whose text measurer fails: every render hits a defect (render.internal). */
const broken = { ...env, measure: { ...env.measure, width: () => { throw new Error('a defect'); } } };

describe('exit codes (defects once exited 1, like bad input)', () => {
  it('a defect exits 3 from render, check and explain; bad input alone stays 1', async () => {
    const dir = workspace();
    expect(await runCli(['render', 'piers.yaml'], io(dir).io, { env: broken })).toBe(EXIT.INTERNAL);
    expect(await runCli(['check', 'piers.yaml'], io(dir).io, { env: broken })).toBe(EXIT.INTERNAL);
    expect(await runCli(['explain', 'piers.yaml'], io(dir).io, { env: broken })).toBe(EXIT.INTERNAL);
    expect(await runCli(['render', 'typo.yaml', 'piers.yaml'], io(dir).io, { env: broken })).toBe(EXIT.INTERNAL);
    expect(await runCli(['render', 'typo.yaml', 'piers.yaml'], io(dir).io)).toBe(EXIT.FAILED);
  });

  it.skipIf(!existsSync('/dev/full'))('--version > /dev/full (ENOSPC on stdout) says so in one line, without a stack trace', async () => {
    const child = spawn(process.execPath, [join(root, 'bin', 'chartwright.js'), '--version'], { stdio: ['ignore', openSync('/dev/full', 'w'), 'pipe'] });
    let stderr = '';
    child.stderr!.on('data', (d) => { stderr += String(d); });
    const code = await new Promise<number | null>((resolve) => child.on('exit', resolve));
    expect(code).toBe(EXIT.FAILED);
    expect(stderr).toBe('chartwright: cannot write to stdout (ENOSPC)\n');
  });
});

describe('briefs from folders: one bad path is one failed entry (an unreadable folder once aborted the batch with exit 3)', () => {
  it('an unreadable folder is reported with a coded error and the other briefs are rendered', async () => {
    const dir = workspace();
    mkdirSync(join(dir, 'locked'));
    writeFileSync(join(dir, 'locked', 'x.yaml'), pierBrief());
    const t = io(dir);
    const listDir = (d: string) => { throw Object.assign(new Error(`EACCES: permission denied, scandir '${d}'`), { code: 'EACCES' }); };
    expect(await runCli(['render', 'locked', 'piers.yaml'], t.io, { listDir })).toBe(EXIT.FAILED);
    expect(t.err()).toContain('locked: error[cli.folder-unreadable] the folder cannot be read (EACCES)');
    expect(t.out()).toBe('piers.svg\n');
  });

  it('a folder with no briefs is an error, not a silent success', async () => {
    const dir = workspace();
    mkdirSync(join(dir, 'empty'));
    const t = io(dir);
    expect(await runCli(['render', 'empty/'], t.io)).toBe(EXIT.FAILED);
    expect(t.err()).toContain('empty: error[cli.no-briefs]');
    const c = io(dir);
    expect(await runCli(['check', 'empty'], c.io)).toBe(EXIT.FAILED);
    expect(c.out()).toBe('FAILED empty\n');
  });
});

describe('--scale is checked against the pixels it makes (1e-300 once failed as a defect)', () => {
  it('a scale that makes a PNG under 1 px a side is a coded error, exit 1, nothing written', async () => {
    const dir = workspace();
    const t = io(dir);
    expect(await runCli(['render', 'piers.yaml', '--png', '--scale', '1e-300'], t.io)).toBe(EXIT.FAILED);
    expect(t.err()).toContain('error[output.png-too-small]');
    expect(t.err()).toContain('expected: a scale of at least 0.0023');
    expect(t.err()).not.toContain('render.internal');
    expect(existsSync(join(dir, 'piers.svg'))).toBe(false);
  });

  it('a PNG over 100 megapixels is a coded error naming the limit and the scale that fits', async () => {
    const dir = workspace();
    writeFileSync(join(dir, 'big.yaml'), pierBrief('size: { width: 4000, height: 4000 }\n'));
    const t = io(dir);
    expect(await runCli(['render', 'big.yaml', '--png', '--scale', '8'], t.io)).toBe(EXIT.FAILED);
    expect(t.err()).toContain('error[output.png-too-large]');
    expect(t.err()).toContain('100 megapixels');
    expect(t.err()).toContain('at most 2.5');
    // Without --png no PNG is drawn, so the scale does not matter.
    expect(await runCli(['render', 'big.yaml', '--scale', '8'], io(dir).io)).toBe(EXIT.OK);
  });
});

describe('control characters never reach the terminal (ESC and BEL in a column name once retitled the window)', () => {
  it('printable shows C0, DEL and C1 controls as \\u escapes and keeps other text', () => {
    expect(printable('a\u001b]0;pwned\u0007b\u007f\u009b\tc\nd')).toBe('a\\u001b]0;pwned\\u0007b\\u007f\\u009b\\u0009c\\u000ad');
    expect(printable('line\nnext\r', true)).toBe('line\nnext\\u000d');
    expect(printable('Zürich – 北')).toBe('Zürich – 北');
  });

  it('column names, file names and written paths are escaped, while chartwright\'s own colours stay', async () => {
    const dir = workspace();
    writeFileSync(join(dir, 'evil.csv'), 'pier,cross\u001b]0;pwned\u0007ings\nNorth,1\n');
    writeFileSync(join(dir, 'evil.yaml'), 'data: evil.csv\nintent: compare\nkeys: pier\nvalues: crossings\n');
    writeFileSync(join(dir, 'bell\u0007.yaml'), pierBrief());
    const t = io(dir);
    t.io.isTTY = true;
    await runCli(['render', 'evil.yaml', 'bell\u0007.yaml', 'gone\u001b[2J.yaml'], t.io);
    expect(t.err()).toContain('cross\\u001b]0;pwned\\u0007ings');
    expect(t.err()).toContain('gone\\u001b[2J.yaml: \u001b[31merror\u001b[0m[brief.not-found]');
    expect(t.out()).toBe('bell\\u0007.svg\n');
    const raw = (t.out() + t.err()).replace(/\u001b\[(?:3[136]|0|K)m?|\r\u001b\[K/g, '');
    expect(raw).not.toMatch(/[\u0000-\u0009\u000b-\u001f\u007f-\u009f]/);
  });

  it('command-line errors echo the typed text escaped', async () => {
    const t = io(workspace());
    expect(await runCli(['render', 'piers.yaml', '--sc\u001b]0;x\u0007ale'], t.io)).toBe(EXIT.USAGE);
    expect(t.err()).toContain('--sc\\u001b]0;x\\u0007ale');
    expect(t.err()).not.toMatch(/[\u001b\u0007]/);
  });

  it('explain --json escapes DEL and C1 too, and stays JSON that reads back the same', async () => {
    const dir = workspace();
    writeFileSync(join(dir, 'c1.csv'), 'pier,n\u009b\u007f\nNorth,1\n');
    writeFileSync(join(dir, 'c1.yaml'), 'data: c1.csv\nintent: compare\nkeys: pier\nvalues: n\n');
    const t = io(dir);
    await runCli(['explain', 'c1.yaml', '--json'], t.io);
    expect(t.out()).not.toMatch(/[\u007f-\u009f]/);
    expect(JSON.stringify(JSON.parse(t.out()))).toContain('n\u009b\u007f');
  });
});

describe('results as each brief finishes, and -q/--quiet', () => {
  it('prints a brief\'s written paths before the next brief is written (a batch once printed nothing until the end)', async () => {
    const dir = workspace();
    writeFileSync(join(dir, 'second.yaml'), pierBrief());
    const t = io(dir);
    const seen: string[] = [];
    const fs = { ...nodeOutputFs, writeNew: (p: string, d: string | Buffer) => { seen.push(t.out()); return nodeOutputFs.writeNew(p, d); } };
    expect(await runCli(['render', 'piers.yaml', 'second.yaml'], t.io, { fs })).toBe(EXIT.OK);
    expect(seen).toEqual(['', 'piers.svg\n']);
  });

  it('-q leaves only errors on stderr: no warnings, progress or timings; stdout still lists the written paths', async () => {
    const dir = workspace();
    const t = io(dir);
    t.io.isTTY = true;
    expect(await runCli(['render', 'warn.yaml', 'typo.yaml', '-q', '--timings'], t.io)).toBe(EXIT.FAILED);
    expect(t.out()).toBe('warn.svg\n');
    expect(t.err()).toContain('typo.yaml: \u001b[31merror\u001b[0m[brief.unknown-column]');
    expect(t.err()).not.toContain('warning');
    expect(t.err()).not.toContain('[1/2]');
    expect(t.err()).not.toContain(' ms');
    const c = io(dir);
    expect(await runCli(['check', 'warn.yaml', '--quiet'], c.io)).toBe(EXIT.OK);
    expect(c.err()).toBe('');
    expect(files(dir)).toContain('warn.svg');
    expect(readFileSync(join(dir, 'warn.svg'), 'utf8')).toMatch(/^<svg /);
  });
});

describe('bidirectional controls in printed text', () => {
  // A file or column name with U+202E could print as another name ("Trojan Source" reordering).
  it('are escaped like other controls', () => {
    expect(printable('report\u202egpj.svg')).toBe('report\\u202egpj.svg');
    expect(printable('a\u2066b\u2069c')).toBe('a\\u2066b\\u2069c');
  });
});
