import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import * as fontkit from 'fontkit';
import { describe, expect, it } from 'vitest';
import { root } from '../helpers.js';
import { bundledCharset, inBlock, outsideBlocks, subsetIndex } from './subset-helpers.js';

const fonts = join(root, 'templates', 'fonts');
const open = (file: string) => fontkit.create(readFileSync(join(fonts, file))) as fontkit.Font;
// A format-4 cmap ends with a segment at U+FFFF mapped to .notdef (OpenType spec, cmap format 4:
// "the last segment's endCode must be 0xFFFF"); fontkit lists it as a character, but it is no glyph.
const cmapOf = (font: fontkit.Font) => font.characterSet.filter((cp) => cp !== 0xffff).sort((a, b) => a - b);

describe('the prebuilt font subsets', () => {
  for (const face of subsetIndex.faces) {
    it(`${face.weight}: each block's cmap holds exactly the face's characters in that block (read back with fontkit)`, () => {
      for (const block of subsetIndex.blocks) {
        const expected = [...bundledCharset(face.weight)].filter((cp) => inBlock(cp, block)).sort((a, b) => a - b);
        const entry = face.blocks[block.name];
        if (!expected.length) { expect(entry).toBeUndefined(); continue; }
        expect(cmapOf(open(entry!.file)), block.name).toEqual(expected);
      }
    });

    it(`${face.weight}: the shipped base font has every character of the face, and none of the blocks' ranges overlap`, () => {
      expect(new Set(cmapOf(open(face.base)))).toEqual(bundledCharset(face.weight));
      const ranges = subsetIndex.blocks.flatMap((b) => b.ranges).sort((a, b) => a[0] - b[0]);
      for (let i = 1; i < ranges.length; i++) expect(ranges[i]![0]).toBeGreaterThan(ranges[i - 1]![1]);
      // Some characters are left to run-time subsets: the path the embed tests exercise.
      expect(outsideBlocks(face.weight).length).toBeGreaterThan(0);
    });
  }

  it('carry our own family name, not the reserved "Source" (SIL OFL 1.1, Reserved Font Name), and keep the copyright and licence', () => {
    for (const face of subsetIndex.faces) {
      for (const file of [face.base, ...Object.values(face.blocks).map((b) => b.file)]) {
        const font = open(file);
        expect(`${font.familyName} ${font.fullName} ${font.postscriptName}`, file).not.toMatch(/source/i);
        expect(font.familyName).toMatch(/^chartwright sans/);
        expect(font.copyright).toContain('Adobe');
        expect(font.getName('licenseURL', 'en')).toMatch(/OFL/i);
      }
    }
  });

  it('are what a fresh build makes, byte for byte (scripts/font-subsets.js --check)', () => {
    expect(() => execFileSync(process.execPath, ['scripts/font-subsets.js', '--check'], { cwd: root, stdio: 'pipe' })).not.toThrow();
  });
});
