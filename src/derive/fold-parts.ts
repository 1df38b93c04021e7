import { fsum } from 'd3-array';
import { partOrder, type StackCell } from './stack.js';

/** The most parts a normalized bar shows; beyond it the smallest are folded into "Other" (common practice: about a dozen). */
export const MAX_PARTS = 12;

/** Cells with the smallest parts folded into one, the parts in stacking order, and what was folded. */
export interface FoldedParts {
  cells: StackCell[];
  /** The parts drawn, in stacking order (largest overall first), the folded part last. */
  parts: string[];
  /** The parts folded into `other`, largest first; empty when nothing was folded. */
  folded: string[];
  /** The folded part's label: "Other", or a variant when the data already has a part of that name. */
  other: string;
}

/** A label for the folded part that no kept part already has. */
function otherLabel(kept: readonly string[]): string {
  const taken = new Set(kept);
  let label = 'Other';
  for (let i = 2; taken.has(label); i++) label = `Other (${i})`;
  return label;
}

/**
 * Keeps at most `limit` parts: when there are more, the `limit − 1` largest overall stay and the
 * rest are folded into one "Other" part, whose value in each group is the sum of the folded
 * parts' values there (so every group's total is unchanged). The folded part goes last, at the
 * top of the stack: it is a remainder, not a part to compare on the baseline. With `keyOf`, the
 * parts kept stay in their key's order.
 */
export function foldParts(cells: readonly StackCell[], limit = MAX_PARTS, keyOf?: (part: string) => number): FoldedParts {
  const order = partOrder(cells);
  if (order.length <= limit) return { cells: [...cells], parts: keyOf ? partOrder(cells, keyOf) : order, folded: [], other: otherLabel(order) };
  const largest = order.slice(0, Math.max(1, limit - 1));
  // An ordered part key keeps its order among the parts kept.
  const kept = keyOf ? [...largest].sort((a, b) => keyOf(a) - keyOf(b)) : largest;
  const folded = order.slice(kept.length);
  const other = otherLabel(kept);
  const keep = new Set(kept);
  const rest = new Map<string, StackCell[]>();
  const out: StackCell[] = [];
  for (const c of cells) {
    if (keep.has(c.part)) { out.push(c); continue; }
    const list = rest.get(c.group);
    if (list) list.push(c); else rest.set(c.group, [c]);
  }
  for (const [group, list] of rest) {
    out.push({ group, part: other, value: fsum(list, (c) => c.value), rows: list.flatMap((c) => c.rows).sort((a, b) => a - b) });
  }
  return { cells: out, parts: [...kept, other], folded, other };
}
