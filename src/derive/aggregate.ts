import type { Aggregate } from '../brief/types.js';

/** Combines the values of rows that share a key. `count` counts rows, whatever their values. */
export function aggregateValues(values: readonly number[], how: Aggregate): number {
  switch (how) {
    case 'sum': return values.reduce((a, b) => a + b, 0);
    case 'mean': return values.reduce((a, b) => a + b, 0) / values.length;
    case 'count': return values.length;
    case 'max': return Math.max(...values);
    case 'min': return Math.min(...values);
  }
}

/** Past tense for messages: "summed", "averaged", … */
export const AGGREGATE_VERB: Record<Aggregate, string> = {
  sum: 'summed', mean: 'averaged', count: 'counted', max: 'reduced to their maximum', min: 'reduced to their minimum',
};
