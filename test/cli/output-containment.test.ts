import { existsSync, mkdirSync, readFileSync, symlinkSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { EXIT } from '../../src/cli/exit-codes.js';
import { runCli } from '../../src/cli/run.js';
import { tempDir } from '../helpers.js';
import { files, io, pierBrief, workspace } from './cli-helpers.js';

/** Renders one brief with the given output line and returns the exit code, the run, and the JSON report. */
async function renderOutput(output: string, flags: string[] = []) {
  const dir = workspace();
  mkdirSync(join(dir, 'briefs'));
  writeFileSync(join(dir, 'briefs', 'piers.csv'), readFileSync(join(dir, 'piers.csv')));
  writeFileSync(join(dir, 'briefs', 'b.yaml'), pierBrief(`output: ${output}\n`));
  const t = io(dir);
  const code = await runCli(['render', 'briefs/b.yaml', '--report', 'run.json', ...flags], t.io);
  const run = JSON.parse(readFileSync(join(dir, 'run.json'), 'utf8'));
  return { dir, code, t, diagnostics: run.briefs[0].diagnostics as { code: string; path?: string; line?: number }[] };
}

describe('output names stay under the brief\'s folder or -o (a past escape: ../../x.svg)', () => {
  it('refuses ../../x.svg, which escaped both the brief\'s folder and -o', async () => {
    for (const flags of [[], ['-o', 'out']]) {
      const r = await renderOutput('../../x.svg', flags);
      expect(r.code).toBe(EXIT.FAILED);
      expect(r.diagnostics).toMatchObject([{ code: 'output.outside', path: '/output', line: 6 }]);
      expect(existsSync(join(r.dir, '..', 'x.svg'))).toBe(false);
      expect(existsSync(join(r.dir, 'x.svg'))).toBe(false);
    }
  });

  it('refuses an absolute path unless --allow-outside is given, and then writes it where it says (not re-rooted)', async () => {
    const target = join(tempDir(), 'abs.svg');
    const refused = await renderOutput(target);
    expect(refused.diagnostics).toMatchObject([{ code: 'output.outside', path: '/output' }]);
    expect(existsSync(target)).toBe(false);
    const allowed = await renderOutput(target, ['--allow-outside']);
    expect(allowed.code).toBe(EXIT.OK);
    expect(readFileSync(target, 'utf8')).toMatch(/^<svg /);
    expect(existsSync(join(allowed.dir, 'briefs', target))).toBe(false);
  });

  it('refuses a folder inside the brief\'s folder that is a link leading outside it', async () => {
    const dir = workspace();
    const elsewhere = tempDir();
    symlinkSync(elsewhere, join(dir, 'figures'));
    writeFileSync(join(dir, 'b.yaml'), pierBrief('output: figures/chart.svg\n'));
    const t = io(dir);
    expect(await runCli(['render', 'b.yaml'], t.io)).toBe(EXIT.FAILED);
    expect(t.err()).toContain('error[output.outside]');
    expect(files(elsewhere)).toEqual([]);
  });

  it('refuses ., .., empty names, and names ending in / as not file names', async () => {
    for (const name of ['"."', '".."', '"  "', 'figures/', 'figures/..']) {
      const r = await renderOutput(name);
      expect(r.code, name).toBe(EXIT.FAILED);
      expect(r.diagnostics.map((d) => [d.code, d.path]), name).toEqual([['output.bad-name', '/output']]);
    }
  });

  it('refuses an unsupported extension (chart.jpg once silently wrote chart.svg), listing .svg and .png', async () => {
    const r = await renderOutput('chart.jpg');
    expect(r.code).toBe(EXIT.FAILED);
    expect(r.diagnostics).toMatchObject([{ code: 'output.bad-extension', path: '/output', expected: '.svg, .png' }]);
    expect(files(join(r.dir, 'briefs'))).toEqual(['b.yaml', 'piers.csv']);
  });

  it('points at the item of an output list that is wrong', async () => {
    const r = await renderOutput('[a.svg, b.jpg]');
    expect(r.diagnostics.map((d) => [d.code, d.path])).toEqual([['output.bad-extension', '/output/1']]);
    expect(existsSync(join(r.dir, 'briefs', 'a.svg'))).toBe(false);
  });

  it('check reports output problems too, without writing', async () => {
    const dir = workspace();
    writeFileSync(join(dir, 'b.yaml'), pierBrief('output: chart.jpg\n'));
    const t = io(dir);
    expect(await runCli(['check', 'b.yaml'], t.io)).toBe(EXIT.FAILED);
    expect(t.err()).toContain('error[output.bad-extension]');
    expect(t.out()).toBe('FAILED b.yaml\n');
  });
});

describe('collisions are refused before anything is written', () => {
  it('two briefs writing the same output: both refused, nothing written, the others go on', async () => {
    const dir = workspace();
    writeFileSync(join(dir, 'a.yaml'), pierBrief('output: same.svg\n'));
    writeFileSync(join(dir, 'b.yaml'), pierBrief('output: same.svg\n'));
    const t = io(dir);
    expect(await runCli(['render', 'a.yaml', 'b.yaml', 'piers.yaml'], t.io)).toBe(EXIT.FAILED);
    expect(t.err().match(/error\[output\.collision\]/g)).toHaveLength(2);
    expect(existsSync(join(dir, 'same.svg'))).toBe(false);
    expect(t.out()).toBe('piers.svg\n');
  });

  it('a brief named twice (once directly, once by its folder) is rendered once, not refused as colliding with itself', async () => {
    const dir = workspace();
    const t = io(dir);
    expect(await runCli(['render', 'piers.yaml', './piers.yaml', '.'], t.io)).toBe(EXIT.FAILED);
    expect(t.out()).toBe('piers.svg\nwarn.svg\n');
    expect(t.err()).not.toContain('output.collision');
  });

  it('--report pointed at a brief or data file of the run, or at one of its outputs, is a usage error and writes nothing', async () => {
    for (const [target, code] of [['piers.yaml', 'output.overwrites-input'], ['piers.csv', 'output.overwrites-input'], ['piers.svg', 'output.collision']]) {
      const dir = workspace();
      const before = readFileSync(join(dir, 'piers.yaml'), 'utf8');
      const t = io(dir);
      expect(await runCli(['render', 'piers.yaml', '--report', target!], t.io), target).toBe(EXIT.USAGE);
      expect(t.err()).toContain(`error[${code}]`);
      expect(readFileSync(join(dir, 'piers.yaml'), 'utf8')).toBe(before);
      expect(files(dir)).toEqual(['gaps.csv', 'piers.csv', 'piers.yaml', 'typo.yaml', 'warn.yaml']);
    }
  });

  it('--scene pointed at the brief\'s data file is refused, and the data is untouched', async () => {
    const dir = workspace();
    const t = io(dir);
    expect(await runCli(['render', 'piers.yaml', '--scene', 'piers.csv'], t.io)).toBe(EXIT.FAILED);
    expect(t.err()).toContain('error[output.overwrites-input]');
    expect(readFileSync(join(dir, 'piers.csv'), 'utf8')).toBe('pier,crossings\nNorth,212\nSouth,64\nEast,131\n');
    expect(existsSync(join(dir, 'piers.svg'))).toBe(false);
  });

  it('two briefs of the same name in different folders sharing one --scene folder are refused', async () => {
    const dir = workspace();
    for (const sub of ['north', 'south']) {
      mkdirSync(join(dir, sub));
      writeFileSync(join(dir, sub, 'piers.csv'), readFileSync(join(dir, 'piers.csv')));
      writeFileSync(join(dir, sub, 'chart.yaml'), pierBrief());
    }
    const t = io(dir);
    expect(await runCli(['render', 'north/chart.yaml', 'south/chart.yaml', '--scene', 'scenes'], t.io)).toBe(EXIT.FAILED);
    expect(t.err().match(/error\[output\.collision\]/g)).toHaveLength(2);
    expect(existsSync(join(dir, 'scenes'))).toBe(false);
    expect(existsSync(join(dir, 'north', 'chart.svg'))).toBe(false);
  });
});
