// Builds the fonts an embedded-text SVG carries (npm run font:subsets), from the Source Sans 3
// TTFs of the `source-sans` dev dependency:
// - templates/fonts/chartwright-sans-<weight>.ttf: the whole face renamed "chartwright sans"
//   (the OFL reserves the name "Source" for unmodified copies), hinting and unused layout
//   features dropped; what run-time subsets of rare glyphs are cut from, shipped in the package;
// - templates/fonts/subsets/<weight>-<block>.woff2: one WOFF2 per Unicode block group below,
//   holding the face's glyphs in it: most charts embed only these, with no subsetting at run time;
// - templates/fonts/subsets/index.json: the blocks' ranges and files, which the renderer reads.
// The output is committed. The bytes depend only on the inputs and the pinned subset-font
// (harfbuzz, brotli in wasm); test/font/subsets.test.ts checks the cmaps, `--check` compares a
// fresh build with the committed files byte for byte.
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import * as fontkit from 'fontkit';
import subsetFont from 'subset-font';
import { renameFont } from './sfnt-rename.js';
import { BLOCKS, SUBSET_OPTIONS } from './font-blocks.js';

const FACES = [
  { weight: 'regular', css: 400, style: 'Regular', file: 'node_modules/source-sans/TTF/SourceSans3-Regular.ttf' },
  { weight: 'semibold', css: 600, style: 'Semibold', file: 'node_modules/source-sans/TTF/SourceSans3-Semibold.ttf' },
];
const FAMILY = 'chartwright sans';
const OUT = 'templates/fonts';
const check = process.argv.includes('--check');

const inRanges = (cp, ranges) => ranges.some(([a, b]) => cp >= a && cp <= b);
const text = (cps) => String.fromCodePoint(...cps);

/** Writes a file, or with --check compares it with the committed one. */
function emit(path, bytes, drift) {
  if (!check) return writeFileSync(path, bytes);
  let old;
  try { old = readFileSync(path); } catch { old = Buffer.alloc(0); }
  if (!old.equals(Buffer.from(bytes))) drift.push(path);
}

async function buildFace(face, drift) {
  const original = readFileSync(face.file);
  const postscript = `chartwright-sans-${face.style}`;
  const renamed = renameFont(new Uint8Array(original), { family: FAMILY, style: face.style, postscript, derivedFrom: 'Source Sans 3 (Adobe), SIL OFL 1.1' });
  const charset = [...fontkit.create(Buffer.from(renamed)).characterSet].sort((a, b) => a - b);
  const base = await subsetFont(Buffer.from(renamed), text(charset), { ...SUBSET_OPTIONS, targetFormat: 'truetype' });
  const baseName = `chartwright-sans-${face.weight}.ttf`;
  emit(join(OUT, baseName), base, drift);
  const blocks = {};
  for (const block of BLOCKS) {
    const cps = charset.filter((cp) => inRanges(cp, block.ranges));
    if (!cps.length) continue;
    const file = `subsets/${face.weight}-${block.name}.woff2`;
    emit(join(OUT, file), await subsetFont(base, text(cps), { ...SUBSET_OPTIONS, targetFormat: 'woff2' }), drift);
    blocks[block.name] = { file, glyphs: cps.length };
  }
  return { weight: face.weight, css: face.css, base: baseName, blocks };
}

const drift = [];
mkdirSync(join(OUT, 'subsets'), { recursive: true });
const faces = [];
for (const face of FACES) faces.push(await buildFace(face, drift));
const index = { family: FAMILY.replace(' ', '-'), source: 'source-sans@3.52.0 (Adobe, SIL OFL 1.1)', subsetter: 'subset-font@2.9.0', options: SUBSET_OPTIONS, blocks: BLOCKS, faces };
emit(join(OUT, 'subsets', 'index.json'), `${JSON.stringify(index, null, 1)}\n`, drift);
if (drift.length) {
  console.error(`font subsets differ from a fresh build: ${drift.join(', ')}`);
  process.exit(1);
}
