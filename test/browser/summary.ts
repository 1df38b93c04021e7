import { median } from 'd3-array';

/** One chart in one text mode: the share of pixels that differ from resvg's, and how far its text moved. */
export interface Measured {
  mode: string;
  id: string;
  share: number;
  /** The largest move of a text box, px. */
  shift: number;
  worstText: string;
  /** Texts whose box left the canvas. */
  offCanvas: number;
  /** The diff image, when written. */
  images?: string;
}

const percent = (share: number) => `${(share * 100).toFixed(3)} %`;

/** Per mode: the largest and median share, the worst charts, texts moved or off the canvas, then every chart. */
export function summarise(rows: Measured[]): string {
  const lines: string[] = [];
  for (const mode of [...new Set(rows.map((r) => r.mode))]) {
    const mine = rows.filter((r) => r.mode === mode).sort((a, b) => b.share - a.share || (a.id < b.id ? -1 : 1));
    const moved = [...mine].sort((a, b) => b.shift - a.shift)[0]!;
    const off = mine.filter((r) => r.offCanvas > 0);
    lines.push(`${mode}: ${mine.length} charts, differing pixels max ${percent(mine[0]!.share)} (${mine[0]!.id}), median ${percent(median(mine, (r) => r.share)!)}; text moved at most ${moved.shift.toFixed(2)} px (${moved.id}: "${moved.worstText}"); ${off.length} charts with text off the canvas${off.length ? ` (${off.map((r) => `${r.id}: ${r.offCanvas}`).join(', ')})` : ''}`);
    lines.push(`  worst: ${mine.slice(0, 5).map((r) => `${r.id} ${percent(r.share)}`).join(', ')}`);
    for (const r of mine) lines.push(`  ${r.id.padEnd(22)} ${percent(r.share).padStart(9)}  text ${r.shift.toFixed(2).padStart(7)} px${r.images ? `  ${r.images}` : ''}`);
  }
  return `${lines.join('\n')}\n`;
}
