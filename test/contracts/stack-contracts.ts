import { expect } from 'vitest';
import type { DumpMark, SceneDump } from '../../src/scene/dump.js';
import { checkTexts } from './bar-contracts.js';

export { checkTexts };

/** The segments of a stacked chart, grouped by bar (the group's label), in drawing order. */
export function segmentsByBar(dump: SceneDump, group: string): Map<string, DumpMark[]> {
  const out = new Map<string, DumpMark[]>();
  for (const m of dump.marks.filter((x) => x.role === 'segment')) {
    const key = String(m.datum![group]);
    out.set(key, [...(out.get(key) ?? []), m]);
  }
  return out;
}

/** The value axis: its orientation and a map from value to px. */
function valueAxis(dump: SceneDump) {
  const axis = dump.axes.find((a) => a.scale === 'linear')!;
  const [d0, d1] = axis.domain as number[];
  const [r0, r1] = axis.range;
  return { vertical: axis.orient === 'left', px: (v: number) => r0 + ((v - d0!) * (r1 - r0)) / (d1! - d0!), perUnit: Math.abs(r1 - r0) / (d1! - d0!) };
}

/** Where a segment starts and ends along the value axis (from the baseline outwards), in px from the zero. */
function extentAlong(m: DumpMark, vertical: boolean, zero: number): [number, number] {
  return vertical ? [zero - (m.y! + m.height!), zero - m.y!] : [m.x! - zero, m.x! + m.width! - zero];
}

const milli = (v: number) => Math.round(v * 1000);
const alongAxis = (a: [number, number], b: [number, number]) => milli(a[0]) - milli(b[0]) || a[1] - b[1];

/**
 * Perceptual contracts of a stacked or normalized bar chart, on its scene: each bar's segments
 * are contiguous from the zero baseline; its parts come in one order in every bar; the largest
 * part overall is on the baseline; stack heights are proportional to totals (absolute) or all
 * reach 100 % within 0.5 px with shares summing to 1 within 1e-9 (normalized); no text overlaps.
 */
export function checkStackContracts(dump: SceneDump, opts: { group: string; part: string; value: string; normalized: boolean; texts?: boolean; partOrder?: string[] }): void {
  const { vertical, px, perUnit } = valueAxis(dump);
  const zero = px(0);
  const bars = segmentsByBar(dump, opts.group);
  const partTotals = new Map<string, number>();
  const heights: number[] = [];
  for (const [, segs] of bars) {
    // By start (to the dump's 1/1000 px), then end: a sliver the dump rounds to 0 px long comes before the segment it sits under.
    const spans = segs.map((m) => extentAlong(m, vertical, zero)).sort(alongAxis);
    // Contiguous from the baseline: the first starts at zero, each next starts where the last
    // ended (the dump rounds each coordinate to 1/1000 px, so a shared edge may differ by that).
    expect(Math.abs(spans[0]![0])).toBeLessThanOrEqual(0.5);
    for (let i = 1; i < spans.length; i++) expect(Math.abs(spans[i]![0] - spans[i - 1]![1])).toBeLessThanOrEqual(0.0011);
    const height = spans[spans.length - 1]![1];
    heights.push(height);
    const total = segs.reduce((s, m) => s + (m.datum![opts.value] as number), 0);
    if (opts.normalized) {
      // Every bar reaches 100 %: the same full height within 0.5 px; its shares sum to 1 within 1e-9.
      expect(Math.abs(height - (px(1) - zero) * (vertical ? -1 : 1))).toBeLessThanOrEqual(0.5);
      expect(Math.abs(segs.reduce((s, m) => s + (m.datum!.share as number), 0) - 1)).toBeLessThanOrEqual(1e-9);
    } else {
      // Stack height ∝ total: the same px per unit for every bar, within 0.5 px.
      expect(Math.abs(height - total * perUnit)).toBeLessThanOrEqual(0.5);
    }
    // Parts come in one order in every bar: drawn from the baseline up in a consistent sequence.
    for (const m of segs) partTotals.set(String(m.datum![opts.part]), (partTotals.get(String(m.datum![opts.part])) ?? 0) + (m.datum![opts.value] as number));
  }
  // The one order: largest overall total first (ties by label), the folded "Other" last.
  const isOther = (p: string) => /^Other( \(\d+\))?$/.test(p);
  const order = opts.partOrder ?? [...partTotals].sort((a, b) => Number(isOther(a[0])) - Number(isOther(b[0])) || b[1] - a[1] || (a[0] < b[0] ? -1 : 1)).map(([p]) => p);
  for (const [, segs] of bars) {
    const drawn = segs.map((m) => ({ part: String(m.datum![opts.part]), at: extentAlong(m, vertical, zero) })).sort((a, b) => alongAxis(a.at, b.at)).map((s) => s.part);
    const ranks = drawn.map((p) => order.indexOf(p));
    expect(ranks).toEqual([...ranks].sort((a, b) => a - b));
  }
  // The largest part overall (or the first of an ordered part key) sits on the baseline of every bar that has it.
  const largest = order[0]!;
  for (const [, segs] of bars) {
    const base = segs.find((m) => Math.abs(extentAlong(m, vertical, zero)[0]) <= 0.5)!;
    if (segs.some((m) => m.datum![opts.part] === largest)) expect(base.datum![opts.part]).toBe(largest);
  }
  expect(heights.length).toBe(bars.size);
  if (opts.texts !== false) checkTexts(dump);
}
