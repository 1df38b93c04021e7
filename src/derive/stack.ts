import { fsum } from 'd3-array';
import type { RowGroup } from './group.js';
import { compareNatural, compareText } from './order.js';

/** One group's value for one part: the rows of the table that share both keys, combined. */
export interface StackCell {
  group: string;
  part: string;
  value: number;
  /** Source positions of the rows combined. */
  rows: number[];
}

/** One segment of a stacked bar: its part, its value, its share of the bar, and where it runs along the value axis. */
export interface Segment {
  part: string;
  value: number;
  /** value / the bar's total (0 when the total is 0). */
  share: number;
  /** Where the segment starts and ends along the value axis: in value units, or in shares (0–1) once normalized. */
  start: number;
  end: number;
  rows: number[];
}

/** One stacked bar: the group it shows, its total, and its segments from the baseline up. */
export interface Stack {
  group: string;
  total: number;
  segments: Segment[];
}

/** Cells of a two-key grouping (labels [group, part]), each combined by `combine`. */
export function cellsOf(groups: readonly RowGroup[], combine: (values: readonly number[]) => number): StackCell[] {
  return groups.map((g) => ({ group: g.labels[0]!, part: g.labels[1]!, value: combine(g.values), rows: g.rows }));
}

/** Each part's total over every group, in first-appearance order. */
export function partTotals(cells: readonly StackCell[]): Map<string, number> {
  const values = new Map<string, number[]>();
  for (const c of cells) {
    const list = values.get(c.part);
    if (list) list.push(c.value); else values.set(c.part, [c.value]);
  }
  return new Map([...values].map(([part, v]) => [part, fsum(v)]));
}

/**
 * Parts in stacking order: the largest overall total (and so overall share) first, on the
 * baseline, where it is read most precisely; ties by label (code points). With `keyOf` (a part
 * key whose order carries meaning, such as a scale from low to high) the parts keep that order.
 */
export function partOrder(cells: readonly StackCell[], keyOf?: (part: string) => number): string[] {
  const totals = partTotals(cells);
  if (keyOf) return [...totals.keys()].sort((a, b) => keyOf(a) - keyOf(b) || compareText(a, b));
  return [...totals.keys()].sort((a, b) => totals.get(b)! - totals.get(a)! || compareText(a, b));
}

/**
 * One stack per group, in first-appearance order, with its segments in `parts` order laid end to
 * end from zero: each segment starts exactly where the one below it ends. A part a group lacks
 * gets no segment. Totals are compensated sums (d3-array's fsum).
 */
export function stackCells(cells: readonly StackCell[], parts: readonly string[]): Stack[] {
  const rank = new Map(parts.map((p, i) => [p, i]));
  const byGroup = new Map<string, StackCell[]>();
  for (const c of cells) {
    const list = byGroup.get(c.group);
    if (list) list.push(c); else byGroup.set(c.group, [c]);
  }
  return [...byGroup].map(([group, list]) => {
    const sorted = [...list].sort((a, b) => rank.get(a.part)! - rank.get(b.part)!);
    const total = fsum(sorted, (c) => c.value);
    const ends = prefixSums(sorted.map((c) => c.value));
    const segments = sorted.map((c, i) => ({ part: c.part, value: c.value, share: total === 0 ? 0 : c.value / total, start: ends[i]!, end: ends[i + 1]!, rows: c.rows }));
    return { group, total, segments };
  });
}

/** [0, v0, v0 + v1, …]: each a compensated sum, so a segment's end is the next one's start to the bit. */
function prefixSums(values: readonly number[]): number[] {
  const out = [0];
  for (let i = 1; i <= values.length; i++) out.push(fsum(values.slice(0, i)));
  return out;
}

/**
 * The stacks normalized to shares: each segment runs from its cumulative share below to the
 * one above, and the top segment ends at exactly 1, so every bar reaches the same full height.
 * A stack with a zero total cannot be normalized and is left to the caller to leave out.
 */
export function normalizeStacks(stacks: readonly Stack[]): Stack[] {
  return stacks.map((s) => {
    if (s.total === 0) return s;
    const n = s.segments.length;
    const segments = s.segments.map((seg, i) => ({ ...seg, start: seg.start / s.total, end: i === n - 1 ? 1 : seg.end / s.total }));
    return { ...s, segments };
  });
}

/** How groups are ordered: by total or by the baseline part's share (largest first), by label, as the data give them, or by the key's own order. */
export type GroupOrder = 'total' | 'baseline-share' | 'label' | 'data' | 'key';

/** The share of a stack's baseline part (the first of `parts`), 0 when the stack lacks it. */
function baselineShare(stack: Stack, baseline: string | undefined): number {
  return stack.segments.find((s) => s.part === baseline)?.share ?? 0;
}

/** Stacks in the chosen order; `keyOf` gives each group's place in its key's own order. Ties by label. */
export function orderStacks(stacks: readonly Stack[], order: GroupOrder, parts: readonly string[], keyOf: (group: string) => number): Stack[] {
  const byLabel = (a: Stack, b: Stack) => compareText(a.group, b.group);
  if (order === 'total') return [...stacks].sort((a, b) => b.total - a.total || byLabel(a, b));
  if (order === 'baseline-share') return [...stacks].sort((a, b) => baselineShare(b, parts[0]) - baselineShare(a, parts[0]) || byLabel(a, b));
  if (order === 'label') return [...stacks].sort((a, b) => compareNatural(a.group, b.group));
  if (order === 'key') return [...stacks].sort((a, b) => keyOf(a.group) - keyOf(b.group) || byLabel(a, b));
  return [...stacks];
}

/**
 * The `capacity` stacks with the largest totals, in their given order, and the groups left out
 * (smallest total first dropped; ties by label), for a plot that holds no more bars.
 */
export function keepLargest(stacks: readonly Stack[], capacity: number): { kept: Stack[]; dropped: string[] } {
  if (stacks.length <= capacity) return { kept: [...stacks], dropped: [] };
  const ranked = [...stacks].sort((a, b) => b.total - a.total || compareText(a.group, b.group));
  const keep = new Set(ranked.slice(0, Math.max(0, capacity)).map((s) => s.group));
  return { kept: stacks.filter((s) => keep.has(s.group)), dropped: ranked.slice(Math.max(0, capacity)).map((s) => s.group) };
}
