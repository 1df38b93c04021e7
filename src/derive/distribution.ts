import { boxStats, type BoxStats } from './quantile.js';
import type { RowGroup } from './group.js';
import { compareText } from './order.js';

/** How groups of a distribution are ordered: by median (largest first), label, data order, or the key's own order. */
export type GroupOrder = 'median' | 'label' | 'data' | 'key';

/** One group's values, sorted ascending, with its box numbers. */
export interface GroupDistribution {
  label: string;
  /** The group's values, ascending. */
  values: number[];
  /** Source positions of the rows behind each value, in the same order. */
  rows: number[];
  stats: BoxStats;
}

/** Values ascending with their rows beside them (ties by row, so the order never depends on the sort's stability). */
function sortedWithRows(group: RowGroup): { values: number[]; rows: number[] } {
  const idx = group.values.map((_, i) => i).sort((a, b) => group.values[a]! - group.values[b]! || group.rows[a]! - group.rows[b]!);
  return { values: idx.map((i) => group.values[i]!), rows: idx.map((i) => group.rows[i]!) };
}

/**
 * Each group's sorted values and box numbers, the groups in the order asked: by median, largest
 * first (ties by label); by label (code points); as the data gives them; or by the key's own order.
 */
export function distributeGroups(groups: readonly RowGroup[], order: GroupOrder): GroupDistribution[] {
  const out = groups.map((g, i) => {
    const { values, rows } = sortedWithRows(g);
    return { at: i, sortKey: g.sortKeys[0] ?? 0, dist: { label: g.labels[0] ?? '', values, rows, stats: boxStats(values) } };
  });
  const byLabel = (a: (typeof out)[number], b: (typeof out)[number]) => compareText(a.dist.label, b.dist.label);
  if (order === 'median') out.sort((a, b) => b.dist.stats.median - a.dist.stats.median || byLabel(a, b));
  else if (order === 'label') out.sort(byLabel);
  else if (order === 'key') out.sort((a, b) => a.sortKey - b.sortKey || a.at - b.at);
  return out.map((o) => o.dist);
}
