import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { renderBatch } from '../../src/cli/batch.js';
import { renderBrief } from '../../src/pipeline/render.js';
import { createNodeEnv } from '../../src/io/node-env.js';
import { env, root, tempDir } from '../helpers.js';

const rows = [{ pier: 'North', n: 5 }, { pier: 'South', n: 3 }];
const brief = (extra: Record<string, unknown>) => ({ intent: 'compare', keys: 'pier', values: 'n', fields: { n: { unit: 'crossings' } }, rows, ...extra });

describe('styles', () => {
  it('names an unknown preset and suggests the nearest', async () => {
    const r = await renderBrief({ brief: brief({ style: 'reprot' }) }, env);
    expect(r.diagnostics).toMatchObject([{ code: 'brief.style-not-found', path: '/style', hint: 'did you mean `report`?' }]);
  });

  it('reports a style file that does not exist, relative to the brief', async () => {
    const dir = tempDir();
    const r = await renderBrief({ brief: brief({ style: 'styles/mine.json' }), file: join(dir, 'b.yaml') }, env);
    expect(r.diagnostics).toMatchObject([{ code: 'brief.style-not-found', found: join(dir, 'styles', 'mine.json') }]);
  });

  it('reports a style file missing the parts a render needs', async () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'half.json'), JSON.stringify({ background: '#fff' }));
    const r = await renderBrief({ brief: brief({ style: './half.json' }), file: join(dir, 'b.yaml') }, env);
    expect(r.ok).toBe(false);
    expect(new Set(r.diagnostics.map((d) => d.code))).toEqual(new Set(['brief.bad-style']));
    expect(r.diagnostics.map((d) => d.path)).toContain('/background');
  });

  it('renders with a complete style file and warns where its colours fall below WCAG contrast', async () => {
    const dir = tempDir();
    const report = JSON.parse(readFileSync(join(root, 'templates', 'styles', 'report.json'), 'utf8'));
    report.text.tick.color = '#aaaaaa';
    report.palette.primary = '#dddddd';
    writeFileSync(join(dir, 'pale.json'), JSON.stringify(report));
    const r = await renderBrief({ brief: brief({ style: './pale.json' }), file: join(dir, 'b.yaml') }, env);
    expect(r.ok).toBe(true);
    expect(r.diagnostics.filter((d) => d.code === 'brief.low-contrast').map((d) => d.path)).toEqual(['/text/tick/color', '/palette/primary']);
  });
});

describe('style colours for every reader', () => {
  it('warns when a custom style\'s positive and negative fills merge for a colour-blind reader', async () => {
    const dir = tempDir();
    const style = JSON.parse(readFileSync(join(root, 'templates', 'styles', 'report.json'), 'utf8'));
    // A red and a green of similar lightness: distinct for normal vision, close under deuteranopia.
    style.palette.primary = '#2e7d32';
    style.palette.negative = '#c62828';
    writeFileSync(join(dir, 'rg.json'), JSON.stringify(style));
    const r = await renderBrief({ brief: brief({ style: './rg.json' }), file: join(dir, 'b.yaml') }, env);
    expect(r.ok).toBe(true);
    const warnings = r.diagnostics.filter((d) => d.code === 'brief.indistinct-colours');
    expect(warnings.length).toBeGreaterThan(0);
    expect(warnings[0]!.message).toMatch(/protanopia|deuteranopia/);
  });

  // The presets are trusted at run time (not re-measured at every start), so this test is their check.
  it('raises no colour warnings for any shipped preset, measured as a user style would be', async () => {
    const { resolveStyle } = await import('../../src/style/resolve.js');
    const palettes = readdirSync(join(root, 'templates', 'palettes')).map((f) => JSON.parse(readFileSync(join(root, 'templates', 'palettes', f), 'utf8')));
    for (const preset of readdirSync(join(root, 'templates', 'styles'))) {
      const r = resolveStyle(JSON.parse(readFileSync(join(root, 'templates', 'styles', preset), 'utf8')), preset, palettes);
      expect(r.ok).toBe(true);
      expect(r.diagnostics).toEqual([]);
    }
    expect((await renderBrief({ brief: brief({}) }, env)).diagnostics).toEqual([]);
  });
});

describe('layout refusals and warnings', () => {
  it('refuses a frame too small for its words, pointing at size', async () => {
    const r = await renderBrief({ brief: brief({ size: { width: 160, height: 160 }, title: 'A title long enough to wrap over several lines here', subtitle: 'And a subtitle that wraps too', source: 'And a source line' }) }, env);
    expect(r.ok).toBe(false);
    expect(r.diagnostics).toMatchObject([{ code: 'layout.frame-too-small', path: '/size' }]);
  });

  it('warns about characters no font can draw, naming the labels, the script and the package to install', async () => {
    const bare = createNodeEnv(undefined, { findPackage: () => undefined });
    const r = await renderBrief({ brief: brief({ rows: [{ pier: '北埠头', n: 2 }, { pier: 'South', n: 3 }] }) }, bare);
    expect(r.ok).toBe(true);
    expect(r.diagnostics).toMatchObject([{ code: 'layout.missing-glyphs', severity: 'warning', found: '北埠头', expected: 'fonts for Han' }]);
    expect(r.diagnostics[0]!.message).toContain('U+5317');
    expect(r.diagnostics[0]!.hint).toContain('@embedpdf/fonts-jp');
  });
});

describe('output', () => {
  it('reports an output that cannot be written, and leaves no temporary file behind', async () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'd.csv'), 'pier,n\nNorth,5\n');
    writeFileSync(join(dir, 'b.yaml'), 'data: d.csv\nintent: compare\nkeys: pier\nvalues: n\nfields: { n: { unit: crossings } }\noutput: blocked/chart.svg\n');
    writeFileSync(join(dir, 'blocked'), 'a file where a folder should be');
    const [report] = await renderBatch([join(dir, 'b.yaml')], env, { png: false, scale: 1, strict: false, lenient: false, debug: false, outlineText: false, tempTag: 't' }, dir);
    expect(report!.ok).toBe(false);
    expect(report!.diagnostics.map((d) => d.code)).toEqual(['output.write-failed']);
    expect(readdirSync(dir).sort()).toEqual(['b.yaml', 'blocked', 'd.csv']);
  });

  it('writes nothing for a failing brief even when its output folder exists', async () => {
    const dir = tempDir();
    mkdirSync(join(dir, 'out'));
    writeFileSync(join(dir, 'b.yaml'), 'data: none.csv\nintent: compare\nkeys: pier\nvalues: n\n');
    const [report] = await renderBatch([join(dir, 'b.yaml')], env, { outDir: join(dir, 'out'), png: true, scale: 1, strict: false, lenient: false, debug: false, outlineText: false, tempTag: 't' }, dir);
    expect(report!.diagnostics.map((d) => d.code)).toEqual(['table.not-found']);
    expect(readdirSync(join(dir, 'out'))).toEqual([]);
  });
});

describe('defects', () => {
  it('a layout defect (non-finite coordinates) becomes render.internal, never a throw or a half-written SVG', async () => {
    const broken = { ...env, measure: { ...env.measure, width: () => Number.NaN } };
    const r = await renderBrief({ brief: brief({}) }, broken);
    expect(r.ok).toBe(false);
    expect(r.svg).toBeUndefined();
    expect(r.diagnostics.map((d) => d.code)).toContain('render.internal');
  });

  it('an exception inside the stages (a defect) becomes render.internal: renderBrief never throws', async () => {
    const broken = { ...env, measure: { ...env.measure, ascent: () => { throw new Error('font table missing'); } } };
    const r = await renderBrief({ brief: brief({}) }, broken);
    expect(r.ok).toBe(false);
    expect(r.diagnostics.map((d) => d.code)).toEqual(['render.internal']);
    expect(r.diagnostics[0]!.message).toContain('font table missing');
  });
});

describe('the diagnostic catalogue', () => {
  // Codes no input can trigger: a failure inside resvg itself.
  const untriggerable = new Set(['output.raster-failed']);

  it('every code a user can cause is exercised by some test', async () => {
    const { CATALOGUE } = await import('../../src/diagnostics/catalogue.js');
    const sources = (dir: string): string[] => readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? sources(join(dir, e.name)) : e.name.endsWith('.ts') ? [readFileSync(join(dir, e.name), 'utf8')] : []));
    const tests = sources(join(root, 'test')).join('\n');
    const untested = Object.keys(CATALOGUE).filter((code) => !untriggerable.has(code) && !tests.includes(code));
    expect(untested).toEqual([]);
  });
});
