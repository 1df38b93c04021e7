import { copyFileSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../src/cli/run.js';
import { renderBrief } from '../../src/pipeline/render.js';
import { env, root } from '../helpers.js';
import { io, pierBrief, workspace } from './cli-helpers.js';

const rows = [{ pier: 'North', n: 5 }, { pier: 'South', n: 3 }];
const brief = (extra: Record<string, unknown>) => ({ intent: 'compare', keys: 'pier', values: 'n', fields: { n: { unit: 'crossings' } }, rows, ...extra });

describe('--style and the presets', () => {
  it('--style on render replaces the brief\'s style: the dark page is drawn', async () => {
    const dir = workspace();
    writeFileSync(join(dir, 'styled.yaml'), pierBrief('style: print\n'));
    const cli = io(dir);
    expect(await runCli(['render', 'styled.yaml', '--style', 'dark'], cli.io)).toBe(0);
    expect(readFileSync(join(dir, 'styled.svg'), 'utf8')).toContain('class="background" width="720" height="440" fill="#16191d"');
  });

  it('--style takes a style file relative to the working folder, not the brief', async () => {
    const dir = workspace();
    mkdirSync(join(dir, 'looks'));
    copyFileSync(join(root, 'templates', 'styles', 'dark.json'), join(dir, 'looks', 'mine.json'));
    mkdirSync(join(dir, 'briefs'));
    copyFileSync(join(dir, 'piers.csv'), join(dir, 'briefs', 'piers.csv'));
    writeFileSync(join(dir, 'briefs', 'p.yaml'), pierBrief());
    const cli = io(dir);
    expect(await runCli(['check', 'briefs/p.yaml', '--style', 'looks/mine.json'], cli.io)).toBe(0);
  });

  it('a bad --style name is a coded error that lists the presets and suggests the nearest, on every command', async () => {
    const dir = workspace();
    for (const command of ['render', 'check', 'explain']) {
      const cli = io(dir);
      expect(await runCli([command, 'piers.yaml', '--style', 'drak'], cli.io)).toBe(1);
      const text = cli.err() + cli.out();
      expect(text).toContain('brief.style-not-found');
      expect(text).toContain('report, slide, print, dark');
      expect(text).toContain('did you mean `dark`?');
    }
  });

  it('a bad preset named by the library request is the same coded error, at /style', async () => {
    const r = await renderBrief({ brief: brief({}), style: 'slid' }, env);
    expect(r.diagnostics).toMatchObject([{ code: 'brief.style-not-found', path: '/style', hint: 'did you mean `slide`?' }]);
  });

  it('the slide style sets a 960 × 540 frame when the brief sets none, and each side the brief states wins', async () => {
    const none = await renderBrief({ brief: brief({ style: 'slide' }) }, env);
    expect([none.scene!.width, none.scene!.height]).toEqual([960, 540]);
    const width = await renderBrief({ brief: brief({ style: 'slide', size: { width: 640 } }) }, env);
    expect([width.scene!.width, width.scene!.height]).toEqual([640, 540]);
    const report = await renderBrief({ brief: brief({}) }, env);
    expect([report.scene!.width, report.scene!.height]).toEqual([720, 440]);
  });

  it('a style file\'s default size out of range is refused with its path', async () => {
    const dir = workspace();
    const style = JSON.parse(readFileSync(join(root, 'templates', 'styles', 'slide.json'), 'utf8'));
    style.size.width = 20;
    writeFileSync(join(dir, 'tiny.json'), JSON.stringify(style));
    const r = await renderBrief({ brief: brief({ style: './tiny.json' }), file: join(dir, 'b.yaml') }, env);
    expect(r.diagnostics).toMatchObject([{ code: 'brief.bad-style', path: '/size/width' }]);
  });
});
