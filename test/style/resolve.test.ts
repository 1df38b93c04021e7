import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { PaletteFile } from '../../src/color/palette.js';
import { PUBLISHED_PALETTES } from '../../src/color/published.js';
import { resolveStyle } from '../../src/style/resolve.js';
import { root } from '../helpers.js';

// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Doc = Record<string, any>;
const report = () => JSON.parse(readFileSync(join(root, 'templates', 'styles', 'report.json'), 'utf8')) as Doc;
const palettes: PaletteFile[] = [JSON.parse(readFileSync(join(root, 'templates', 'palettes', 'tidewater.json'), 'utf8'))];

describe('style files are checked by a schema with ranges', () => {
  it('the shipped report style resolves its palette references to the tidewater colours', () => {
    const r = resolveStyle(report(), 'report.json', palettes);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.palette.categorical).toEqual(palettes[0]!.categorical);
    expect(r.value.palette.sequential).toEqual(palettes[0]!.sequential.tide);
    expect(r.value.palette.diverging).toEqual(palettes[0]!.diverging['ember-tide']);
    expect(r.diagnostics).toEqual([]);
  });

  it.each([
    ['a band padding that would hide every bar', (s: Doc) => { s.spacing.bandPadding = 5; }, '/spacing/bandPadding'],
    ['a negative grid width', (s: Doc) => { s.lines.gridWidth = -5; }, '/lines/gridWidth'],
    ['a line height below the font\'s ascent and descent', (s: Doc) => { s.spacing.lineHeight = 1; }, '/spacing/lineHeight'],
    ['no font', (s: Doc) => { delete s.font; }, '/font'],
    ['no spacing', (s: Doc) => { delete s.spacing; }, '/spacing'],
    ['a size of the wrong type', (s: Doc) => { s.text.title.size = 'large'; }, '/text/title/size'],
    ['an unknown key', (s: Doc) => { s.colours = {}; }, '/colours'],
    ['a font family with control characters (it reaches an SVG attribute)', (s: Doc) => { s.font.family = 'Evil\u0007"><script>'; }, '/font/family'],
    ['a palette reference that names nothing', (s: Doc) => { s.palette.categorical = 'tidewatr'; }, '/palette/categorical'],
    ['a categorical list with a bad colour', (s: Doc) => { s.palette.categorical = ['#206c89', 'teal']; }, '/palette/categorical/1'],
  ])('refuses %s with brief.bad-style at its path', (_, change, path) => {
    const style = report();
    change(style);
    const r = resolveStyle(style, 'mine.json', palettes);
    expect(r.ok).toBe(false);
    expect(r.diagnostics.every((d) => d.code === 'brief.bad-style' && d.file === 'mine.json')).toBe(true);
    expect(r.diagnostics.map((d) => d.path)).toContain(path);
  });

  it('a misspelt palette gets a did-you-mean hint', () => {
    const style = report();
    style.palette.categorical = 'tidewatr';
    expect(resolveStyle(style, 'mine.json', palettes).diagnostics[0]!.hint).toBe('did you mean `tidewater`?');
  });

  it('offers a published palette by its published name (Okabe & Ito 2008, REFERENCES §4)', () => {
    const style = report();
    style.palette.categorical = 'okabe-ito';
    const r = resolveStyle(style, 'mine.json', palettes);
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.value.palette.categorical).toEqual([...PUBLISHED_PALETTES['okabe-ito']!]);
  });

  it('a style written before palettes had categories gets the default palette', () => {
    const style = report();
    delete style.palette.categorical;
    delete style.palette.sequential;
    delete style.palette.diverging;
    const r = resolveStyle(style, 'old.json', palettes);
    expect(r.ok && r.value.palette.categorical).toEqual(palettes[0]!.categorical);
  });

  it('warns when two categorical colours merge for some reader, naming the pair (Machado et al. 2009 simulation)', () => {
    const style = report();
    style.palette.categorical = ['#206c89', '#2a6f8a', '#b49101'];
    const r = resolveStyle(style, 'mine.json', palettes);
    expect(r.ok).toBe(true);
    expect(r.diagnostics).toMatchObject([{ code: 'brief.indistinct-colours', path: '/palette/categorical/1' }]);
  });
});
