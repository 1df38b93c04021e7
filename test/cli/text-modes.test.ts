import { execFileSync } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { EXIT } from '../../src/cli/exit-codes.js';
import { runCli } from '../../src/cli/run.js';
import { renderBrief } from '../../src/pipeline/render.js';
import { familyList } from '../../src/svg/write.js';
import { env, parseXml, root, tempDir } from '../helpers.js';
import { io, workspace } from './cli-helpers.js';

const svgOf = (dir: string) => readFileSync(join(dir, 'piers.svg'), 'utf8');

describe('--text', () => {
  it('embed is the default: live <text> and @font-face rules with WOFF2 data URIs in a <style>', async () => {
    const dir = workspace();
    expect(await runCli(['render', 'piers.yaml'], io(dir).io)).toBe(EXIT.OK);
    const doc = parseXml(svgOf(dir));
    expect(doc.getElementsByTagName('text').length).toBeGreaterThan(0);
    expect(doc.getElementsByTagName('style')[0]!.textContent).toMatch(/^@font-face\{font-family:"chartwright-sans";font-weight:400;src:url\(data:font\/woff2;base64,/);
    expect(doc.documentElement.getAttribute('font-family')).toBe("'chartwright-sans', sans-serif");
  });

  it('--text embed writes what no flag writes', async () => {
    const [a, b] = [workspace(), workspace()];
    await runCli(['render', 'piers.yaml'], io(a).io);
    await runCli(['render', 'piers.yaml', '--text', 'embed'], io(b).io);
    expect(svgOf(b)).toBe(svgOf(a));
  });

  it('--text outline writes glyph paths and no <text>, exactly as its alias --outline-text', async () => {
    const [a, b] = [workspace(), workspace()];
    expect(await runCli(['render', 'piers.yaml', '--text', 'outline'], io(a).io)).toBe(EXIT.OK);
    expect(await runCli(['render', 'piers.yaml', '--outline-text'], io(b).io)).toBe(EXIT.OK);
    expect(svgOf(a)).not.toContain('<text');
    expect(svgOf(a)).not.toContain('@font-face');
    expect(svgOf(a)).toContain('<use href="#cw');
    expect(svgOf(b)).toBe(svgOf(a));
  });

  it('--text live names the style\'s family with a generic fallback and embeds nothing', async () => {
    const dir = workspace();
    expect(await runCli(['render', 'piers.yaml', '--text', 'live'], io(dir).io)).toBe(EXIT.OK);
    expect(svgOf(dir)).not.toContain('<style');
    expect(parseXml(svgOf(dir)).documentElement.getAttribute('font-family')).toBe("'Source Sans 3', sans-serif");
  });

  it('refuses an unknown mode and a bad --id-prefix as usage errors', async () => {
    const dir = workspace();
    const bad = io(dir);
    expect(await runCli(['render', 'piers.yaml', '--text', 'paths'], bad.io)).toBe(EXIT.USAGE);
    expect(bad.err()).toContain('embed, outline, live');
    const prefix = io(dir);
    expect(await runCli(['render', 'piers.yaml', '--id-prefix', '9x'], prefix.io)).toBe(EXIT.USAGE);
    expect(prefix.err()).toContain('use e.g.');
  });

  it('--id-prefix starts every id of the SVG', async () => {
    const dir = workspace();
    expect(await runCli(['render', 'piers.yaml', '--text', 'outline', '--id-prefix', 'fig2'], io(dir).io)).toBe(EXIT.OK);
    const ids = [...svgOf(dir).matchAll(/\sid="([^"]+)"/g)].map((m) => m[1]!);
    expect(ids.length).toBeGreaterThan(3);
    expect(ids.every((id) => id.startsWith('fig2-'))).toBe(true);
  });
});

describe('the style\'s textMode', () => {
  it('chooses the text mode, and the request\'s mode wins over it', async () => {
    const dir = tempDir();
    const style = JSON.parse(readFileSync(join(root, 'templates', 'styles', 'report.json'), 'utf8'));
    writeFileSync(join(dir, 'live.json'), JSON.stringify({ ...style, textMode: 'live', font: { ...style.font, family: 'Inter, Helvetica Neue' } }));
    const brief = { intent: 'compare', keys: 'k', values: 'v', style: './live.json', rows: [{ k: 'a', v: 1 }] };
    const live = await renderBrief({ brief, file: join(dir, 'b.yaml') }, env);
    expect(parseXml(live.svg!).documentElement.getAttribute('font-family')).toBe("'Inter', 'Helvetica Neue', sans-serif");
    const embed = await renderBrief({ brief, file: join(dir, 'b.yaml'), textMode: 'embed' }, env);
    expect(embed.svg).toContain('@font-face');
  });

  it('is refused when it names no mode', async () => {
    const dir = tempDir();
    const style = JSON.parse(readFileSync(join(root, 'templates', 'styles', 'report.json'), 'utf8'));
    writeFileSync(join(dir, 'odd.json'), JSON.stringify({ ...style, textMode: 'paths' }));
    const r = await renderBrief({ brief: { intent: 'compare', keys: 'k', values: 'v', style: './odd.json', rows: [{ k: 'a', v: 1 }] }, file: join(dir, 'b.yaml') }, env);
    expect(r.diagnostics).toMatchObject([{ code: 'brief.bad-style', path: '/textMode' }]);
  });
});

describe('live family lists', () => {
  it('quote each family, keep a generic family the list names, and otherwise end in sans-serif', () => {
    // CSS Fonts 4, font-family: family names quoted as strings; generic families are keywords, never quoted.
    expect(familyList(['Source Sans 3'])).toBe("'Source Sans 3', sans-serif");
    expect(familyList(['Inter', ' Georgia', 'serif'])).toBe("'Inter', 'Georgia', serif");
    expect(familyList(['"Evil"<x>', ''])).toBe("'Evilx', sans-serif");
  });
});

describe('the installed command line', () => {
  it('embeds a run-time subset for a rare glyph (guards a defect: the CommonJS bundle bin/ runs in a vm.Script has no dynamic import, and the subsetter failed to load)', () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'r.csv'), 'k,v\nNorth \u{1F10D},3\nSouth,2\n');
    writeFileSync(join(dir, 'r.yaml'), 'data: r.csv\nintent: compare\nkeys: k\nvalues: v\nfields: { v: { unit: kg } }\n');
    execFileSync(process.execPath, [join(root, 'bin', 'chartwright.js'), 'render', join(dir, 'r.yaml')], { cwd: dir, stdio: 'pipe' });
    expect(readFileSync(join(dir, 'r.svg'), 'utf8')).toContain('unicode-range:U+1F10D}');
  });
});

describe('lazy font loading', () => {
  it('loads the subsetter only when a chart needs a glyph outside the prebuilt blocks', () => {
    // A fresh process over the bundle: what it has loaded is what require.cache holds.
    const script = `
      const { render } = await import('./dist/chartwright.js');
      const { createRequire } = await import('node:module');
      const cache = () => Object.keys(createRequire(import.meta.url).cache).some((k) => k.includes('subset-font'));
      const brief = (k) => ({ intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: 'kg' } }, rows: [{ k, v: 1 }, { k: 'B', v: 2 }] });
      await render(brief('Zoë αβγ Жд'));
      const before = cache();
      await render(brief('\\u{1F10D}'));
      console.log(JSON.stringify([before, cache()]));`;
    const out = execFileSync(process.execPath, ['--input-type=module', '-e', script], { cwd: root, encoding: 'utf8' });
    expect(JSON.parse(out)).toEqual([false, true]);
  });
});
