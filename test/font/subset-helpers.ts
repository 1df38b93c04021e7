import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { FontMetrics } from '../../src/font/metrics.js';
import type { Weight } from '../../src/style/types.js';
import { root } from '../helpers.js';

const fonts = join(root, 'templates', 'fonts');

/** templates/fonts/subsets/index.json. */
export const subsetIndex = JSON.parse(readFileSync(join(fonts, 'subsets', 'index.json'), 'utf8')) as {
  family: string;
  blocks: Array<{ name: string; ranges: Array<[number, number]> }>;
  faces: Array<{ weight: Weight; base: string; blocks: Record<string, { file: string; glyphs: number }> }>;
};

const charsets = new Map<Weight, Set<number>>();

/** The code points the bundled face has, from its committed metrics (extracted from the TTF). */
export function bundledCharset(weight: Weight): Set<number> {
  if (!charsets.has(weight)) {
    const metrics = JSON.parse(readFileSync(join(fonts, `source-sans-3-${weight}.metrics.json`), 'utf8')) as FontMetrics;
    charsets.set(weight, new Set(metrics.advances.filter((_, i) => i % 2 === 0)));
  }
  return charsets.get(weight)!;
}

/** Whether a code point is in a block's ranges. */
export const inBlock = (cp: number, block: { ranges: Array<[number, number]> }) => block.ranges.some(([a, b]) => cp >= a && cp <= b);

/** The face's code points outside every prebuilt block (what a run-time subset cuts), in order. */
export function outsideBlocks(weight: Weight): number[] {
  return [...bundledCharset(weight)].filter((cp) => !subsetIndex.blocks.some((b) => inBlock(cp, b))).sort((a, b) => a - b);
}
