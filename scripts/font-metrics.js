// Extracts the metrics chartwright lays text out with from the bundled TTF files, once, so that
// no render needs fontkit (its import alone costs about 110 ms of a cold start). The output is
// committed; test/font/metrics.test.ts re-derives samples from the TTF and fails on any drift.
// Run: node scripts/font-metrics.js
import * as fontkit from 'fontkit';
import { writeFileSync } from 'node:fs';

const FACES = [
  { weight: 'regular', file: 'node_modules/source-sans/TTF/SourceSans3-Regular.ttf' },
  { weight: 'semibold', file: 'node_modules/source-sans/TTF/SourceSans3-Semibold.ttf' },
];

// Characters whose pairwise kerning is tabulated: printable ASCII, Latin-1, Latin Extended-A
// and the typographic punctuation that chart text uses. Pairs outside it are unkerned, which
// differs from the shaped width by well under 1 % on ordinary labels.
function kerningSet(font) {
  const cps = [];
  for (let c = 0x20; c < 0x7f; c++) cps.push(c);
  for (let c = 0xa0; c < 0x180; c++) cps.push(c);
  cps.push(0x2013, 0x2014, 0x2018, 0x2019, 0x201c, 0x201d, 0x2026, 0x2212, 0x20ac, 0x2009, 0x202f);
  return cps.filter((c) => font.hasGlyphForCodePoint(c));
}

function round(n) { return Math.round(n * 100) / 100; }

for (const face of FACES) {
  const font = fontkit.openSync(face.file);
  const advances = {};
  const outlines = {};
  for (const cp of [...font.characterSet].sort((a, b) => a - b)) {
    const glyph = font.glyphForCodePoint(cp);
    advances[cp] = glyph.advanceWidth;
    const d = glyph.path.toSVG();
    if (d) outlines[cp] = d;
  }
  // Flat numeric arrays ([cp, advance, …] and [a, b, adjustment, …]): they parse and load into
  // Maps about 7× faster than objects with string keys, which matters for a cold start.
  const kerning = [];
  const set = kerningSet(font);
  for (const a of set) {
    for (const b of set) {
      const run = font.layout(String.fromCodePoint(a, b), { kern: true, liga: false, calt: false });
      if (run.glyphs.length !== 2) continue;
      const width = run.positions[0].xAdvance + run.positions[1].xAdvance;
      const adjust = width - advances[a] - advances[b];
      if (adjust !== 0) kerning.push(a, b, round(adjust));
    }
  }
  const notdef = font.getGlyph(0);
  const metrics = {
    family: font.familyName,
    weight: face.weight,
    source: face.file.replace('node_modules/', ''),
    unitsPerEm: font.unitsPerEm,
    ascent: font.ascent,
    descent: font.descent,
    capHeight: font.capHeight,
    xHeight: font.xHeight,
    notdefAdvance: notdef.advanceWidth,
    notdefOutline: notdef.path.toSVG(),
    advances: Object.entries(advances).flatMap(([cp, adv]) => [Number(cp), adv]),
    kerning,
  };
  writeFileSync(`templates/fonts/source-sans-3-${face.weight}.metrics.json`, JSON.stringify(metrics) + '\n');
  writeFileSync(`templates/fonts/source-sans-3-${face.weight}.outlines.json`, JSON.stringify(outlines) + '\n');
  console.log(face.weight, Object.keys(advances).length, 'codepoints,', kerning.length / 3, 'kerning pairs');
}
