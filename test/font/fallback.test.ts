import * as fontkit from 'fontkit';
import { execFileSync } from 'node:child_process';
import { copyFileSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { createNodeEnv } from '../../src/io/node-env.js';
import { outlineSvg, renderBrief } from '../../src/pipeline/render.js';
import { env, root, tempDir } from '../helpers.js';
import { dumpScene } from '../../src/scene/dump.js';

const arabicFile = join(root, 'node_modules', '@embedpdf', 'fonts-arabic', 'fonts', 'NotoNaskhArabic-Regular.ttf');
const hebrewFile = join(root, 'node_modules', '@embedpdf', 'fonts-hebrew', 'fonts', 'NotoSansHebrew-Regular.ttf');
const arabic = fontkit.openSync(arabicFile) as fontkit.Font;
const hebrew = fontkit.openSync(hebrewFile) as fontkit.Font;

/** The glyph ids of a line from one face, in visual (drawn) order, as the measurer places them. */
const drawnIds = (text: string, face: string) => env.measure.run(text, 'regular').glyphs.filter((g) => g.face === face).map((g) => g.glyph);
/** Glyph ids of code points in the font's own character map. */
const cmapIds = (font: fontkit.Font, cps: number[]) => cps.map((cp) => font.glyphForCodePoint(cp).id);

const cities = [{ city: '東京', n: 37 }, { city: 'القاهرة', n: 21 }, { city: 'São Paulo', n: 22 }, { city: 'ソウル', n: 10 }];
const multilingual = { intent: 'compare', keys: 'city', values: 'n', title: '世界の都市 — المدن الكبرى', fields: { n: { unit: 'million people' } }, rows: cities };

describe('fallback faces for other scripts', () => {
  it('draws CJK and Arabic labels, titles included, without a single .notdef glyph when the packages are installed', async () => {
    const r = await renderBrief({ brief: multilingual }, env);
    expect(r.ok).toBe(true);
    expect(r.diagnostics.map((d) => d.code)).not.toContain('layout.missing-glyphs');
    const svg = outlineSvg(r.scene!, env, r.style);
    // .notdef glyphs of the bundled face have ids ending -grx / -gsx (weight, then x for none).
    expect(svg).not.toMatch(/-g[rs]x"/);
    expect(svg).toMatch(/id="[^"]+-notosansjp-bold-\d+"/);
    expect(svg).toMatch(/id="[^"]+-notonaskharabic-regular-\d+"/);
  });

  it('reports which face draws which run of a label', () => {
    expect(env.measure.segments('Tokyo 東京', 'regular').map((s) => [s.face.family, s.text])).toEqual([['Source Sans 3', 'Tokyo '], ['Noto Sans JP', '東京']]);
    const [seg] = env.measure.segments('القاهرة', 'semibold');
    expect(seg!.face).toMatchObject({ family: 'Noto Naskh Arabic', weight: 'semibold', key: 'notonaskharabic-bold' });
    expect(seg!.face.file).toMatch(/NotoNaskhArabic-Bold\.ttf$/);
  });

  it('warns, naming the labels, scripts and packages, when the fallback packages are not installed', async () => {
    const bare = createNodeEnv(undefined, { findPackage: () => undefined });
    const r = await renderBrief({ brief: multilingual }, bare);
    expect(r.ok).toBe(true);
    const [warning] = r.diagnostics.filter((d) => d.code === 'layout.missing-glyphs');
    expect(warning).toMatchObject({ severity: 'warning', expected: 'fonts for Han, Arabic, Katakana, Hiragana' });
    for (const label of ['世界の都市 — المدن الكبرى', '東京', 'القاهرة', 'ソウル']) expect(warning!.message).toContain(`"${label}"`);
    expect(warning!.message).not.toContain('São Paulo');
    expect(warning!.hint).toContain('@embedpdf/fonts-jp');
    expect(warning!.hint).toContain('@embedpdf/fonts-arabic');
    // The figure says so too, in words its own font can draw (a PNG reader sees no terminal).
    const notes = dumpScene(r.scene!).texts.filter((t) => t.role === 'note').map((t) => t.text).join(' ');
    expect(notes).toContain('Empty boxes stand for Han, Arabic, Katakana and Hiragana characters');
    expect(bare.measure.missing(notes, 'regular')).toEqual([]);
  });

  it('puts no glyph note in a figure whose every character has a font', async () => {
    const r = await renderBrief({ brief: multilingual }, env);
    expect(dumpScene(r.scene!).texts.some((t) => t.role === 'note' && t.text.startsWith('Empty boxes'))).toBe(false);
  });
});

describe('right-to-left labels', () => {
  it('joins Arabic letters into their contextual forms', () => {
    // Expected forms from Unicode ArabicShaping.txt: SEEN, LAM, MEEM and BEH/YEH/TEH are
    // dual-joining (D), ALEF right-joining (R); LAM + ALEF is the mandatory ligature U+FEFC.
    // The font maps those presentation forms (Arabic Presentation Forms-B) to the very glyphs
    // its shaping makes, so the drawn ids must equal the cmap ids, right to left reversed.
    // سلام: seen initial, lam-alef final, meem isolated; drawn left to right: meem, lam-alef, seen.
    expect(drawnIds('سلام', 'notonaskharabic-regular')).toEqual(cmapIds(arabic, [0xfee1, 0xfefc, 0xfeb3]));
    // بيت: beh initial, yeh medial, teh final; drawn: teh, yeh, beh.
    expect(drawnIds('بيت', 'notonaskharabic-regular')).toEqual(cmapIds(arabic, [0xfe96, 0xfef4, 0xfe91]));
  });

  it('draws a Hebrew word in visual order, its first letter rightmost', () => {
    // שלום: shin, lamed, vav, final mem; read right to left, so drawn mem, vav, lamed, shin.
    expect(drawnIds('שלום', 'notosanshebrew-regular')).toEqual(cmapIds(hebrew, [0x05dd, 0x05d5, 0x05dc, 0x05e9]));
  });

  it('orders mixed runs by the bidirectional algorithm: digits after Arabic sit to its left, Latin before Arabic to its left', () => {
    // UAX #9: a line whose first strong letter is Arabic is a right-to-left paragraph, so the
    // number that follows the word is drawn to its left; in "Cairo القاهرة" (left-to-right) the Latin comes first.
    const glyphs = env.measure.run('دبي 2024', 'regular').glyphs;
    const digits = glyphs.filter((g) => g.face === undefined && g.codePoint >= 0x30 && g.codePoint <= 0x39);
    const letters = glyphs.filter((g) => g.face === 'notonaskharabic-regular');
    expect(digits.map((g) => g.codePoint)).toEqual([...'2024'].map((c) => c.codePointAt(0)));
    expect(Math.max(...digits.map((g) => g.x))).toBeLessThan(Math.min(...letters.map((g) => g.x)));
    const latin = env.measure.run('Cairo القاهرة', 'regular').glyphs;
    expect(latin[0]!.codePoint).toBe('C'.codePointAt(0));
    expect(latin.findIndex((g) => g.face !== undefined)).toBe(6);
  });

  it('measures a shaped line as wide as fontkit lays it out', () => {
    // fontkit is the outside reference here; Noto Naskh Arabic has 2048 units per em, the line's own units are Source Sans 3's 1000.
    const run = arabic.layout('القاهرة');
    const expected = (run.positions.reduce((s, p) => s + p.xAdvance, 0) * 12) / arabic.unitsPerEm;
    expect(env.measure.width('القاهرة', 12, 'regular')).toBeCloseTo(expected, 6);
  });
});

describe('a style naming its own font files', () => {
  const styleWith = (dir: string, font: Record<string, unknown>) => {
    const report = JSON.parse(readFileSync(join(root, 'templates', 'styles', 'report.json'), 'utf8'));
    writeFileSync(join(dir, 'mine.json'), JSON.stringify({ ...report, font: { ...report.font, ...font } }));
  };
  const chart = (dir: string) => ({ ...multilingual, rows: [{ city: 'שלום', n: 2 }, { city: 'North', n: 3 }], title: 'Harbour', style: './mine.json' });

  it('measures and draws text in the named face, by glyph id', async () => {
    const dir = tempDir();
    copyFileSync(hebrewFile, join(dir, 'hebrew.ttf'));
    styleWith(dir, { files: { regular: 'hebrew.ttf' } });
    const r = await renderBrief({ brief: chart(dir), file: join(dir, 'b.yaml') }, env);
    expect(r.ok).toBe(true);
    const measure = env.measureFor(r.style!);
    expect(measure.segments('שלום North', 'regular').map((s) => s.face.key)).toEqual(['hebrew']);
    const run = hebrew.layout('North');
    expect(measure.width('North', 10, 'regular')).toBeCloseTo((run.positions.reduce((s, p) => s + p.xAdvance, 0) * 10) / hebrew.unitsPerEm, 6);
    expect(outlineSvg(r.scene!, env, r.style)).toMatch(/id="[^"]+-hebrew-\d+"/);
  });

  it('refuses a font file that is missing or not a font, naming the path', async () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'broken.ttf'), 'not a font at all');
    styleWith(dir, { files: { regular: 'broken.ttf', bold: 'absent.otf' }, fallback: ['nowhere.ttf'] });
    const r = await renderBrief({ brief: chart(dir), file: join(dir, 'b.yaml') }, env);
    expect(r.ok).toBe(false);
    expect(r.diagnostics.map((d) => [d.code, d.path, d.found])).toEqual([
      ['brief.bad-font-file', '/font/files/regular', 'broken.ttf'],
      ['brief.bad-font-file', '/font/files/bold', 'absent.otf'],
      ['brief.bad-font-file', '/font/fallback/0', 'nowhere.ttf'],
    ]);
  });

  it('uses a fallback face listed in the style before the packages', async () => {
    const dir = tempDir();
    mkdirSync(join(dir, 'fonts'));
    copyFileSync(hebrewFile, join(dir, 'fonts', 'my-hebrew.ttf'));
    styleWith(dir, { fallback: ['fonts/my-hebrew.ttf'] });
    const r = await renderBrief({ brief: chart(dir), file: join(dir, 'b.yaml') }, env);
    expect(r.ok).toBe(true);
    expect(env.measureFor(r.style!).segments('North שלום', 'regular').map((s) => s.face.key)).toEqual(['source-sans-3-regular', 'my-hebrew']);
  });
});

describe('the default path stays light', () => {
  it('renders a Latin chart without loading fontkit or bidi-js', () => {
    // dist/ is built by `npm test` before the suite runs; a fresh process shows what a CLI run loads.
    const script = `import { render } from ${JSON.stringify(join(root, 'dist', 'chartwright.js'))};
      import { createRequire } from 'node:module';
      await render({ intent: 'compare', keys: 'pier', values: 'n', rows: [{ pier: 'North', n: 5 }, { pier: 'Süd', n: 3 }] }, undefined, { pngScale: 1 });
      const loaded = Object.keys(createRequire(import.meta.url).cache);
      console.log(JSON.stringify(loaded.filter((k) => /node_modules\\/(fontkit|bidi-js)\\//.test(k))));`;
    expect(JSON.parse(execFileSync(process.execPath, ['--input-type=module', '-e', script], { encoding: 'utf8' }))).toEqual([]);
  });
});
