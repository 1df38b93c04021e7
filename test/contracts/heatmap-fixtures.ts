import { inflateSync } from 'node:zlib';
import type { SceneDump } from '../../src/scene/dump.js';
import { seeded } from '../derive/cluster-fixtures.js';

/** Rows of a matrix with planted blocks: row group g and column group h share a high value when g = h. */
export function plantedBlocks(groups: number, rowsEach: number, columnsEach: number, seed: number): Record<string, unknown>[] {
  const random = seeded(seed);
  const rows: Record<string, unknown>[] = [];
  for (let g = 0; g < groups; g++) for (let r = 0; r < rowsEach; r++) {
    for (let h = 0; h < groups; h++) for (let c = 0; c < columnsEach; c++) {
      rows.push({ gene: `G${g}-${r}`, sample: `S${h}-${c}`, level: Math.round((g === h ? 50 : 5) + random() * 8) });
    }
  }
  // Shuffle rows (Fisher–Yates, seeded): the input order hides the blocks.
  for (let i = rows.length - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    [rows[i], rows[j]] = [rows[j]!, rows[i]!];
  }
  return rows;
}

/** The block of a label "G2-5" or "S2-1": its group number. */
export const groupOf = (label: string) => Number(label.slice(1, label.indexOf('-')));

/** True when the labels of each group sit in one run. */
export function contiguousGroups(labels: readonly string[]): boolean {
  const seen = new Set<number>();
  let last = -1;
  for (const l of labels) {
    const g = groupOf(l);
    if (g !== last && seen.has(g)) return false;
    seen.add(g);
    last = g;
  }
  return true;
}

/** The rows and columns of a heat map in drawing order, from its dump's axes (rows: right, columns: bottom). */
export function drawnOrder(dump: SceneDump): { rows: string[]; columns: string[] } {
  const rows = dump.axes.find((a) => a.orient === 'right')!.domain as string[];
  const columns = dump.axes.find((a) => a.orient === 'bottom')!.domain as string[];
  return { rows, columns };
}

/** Decodes an embedded indexed PNG (as encodeIndexedPng writes it: one IDAT, filter 0) to #rrggbb per pixel ("none" if transparent). */
export function decodeIndexedPng(href: string): { width: number; height: number; pixel: (x: number, y: number) => string } {
  const png = Buffer.from(href.slice(href.indexOf(',') + 1), 'base64');
  let at = 8;
  let [width, height] = [0, 0];
  let palette: string[] = [];
  let alpha: Buffer = Buffer.alloc(0);
  const idat: Buffer[] = [];
  while (at < png.length) {
    const length = png.readUInt32BE(at);
    const type = png.toString('ascii', at + 4, at + 8);
    const data = png.subarray(at + 8, at + 8 + length);
    if (type === 'IHDR') [width, height] = [data.readUInt32BE(0), data.readUInt32BE(4)];
    if (type === 'PLTE') palette = Array.from({ length: length / 3 }, (_, i) => `#${data.subarray(i * 3, i * 3 + 3).toString('hex')}`);
    if (type === 'tRNS') alpha = Buffer.from(data);
    if (type === 'IDAT') idat.push(Buffer.from(data));
    at += 12 + length;
  }
  const raw = inflateSync(Buffer.concat(idat));
  return { width, height, pixel: (x, y) => {
    const i = raw[y * (width + 1) + 1 + x]!;
    return alpha.length > i && alpha[i] === 0 ? 'none' : palette[i]!;
  } };
}
