import { max, min } from 'd3-array';
import type { Aggregate } from '../brief/types.js';

/** Combines the values of rows that share a key. `count` counts rows, whatever their values. */
export function aggregateValues(values: readonly number[], how: Aggregate): number {
  switch (how) {
    case 'sum': return values.reduce((a, b) => a + b, 0);
    case 'mean': return values.reduce((a, b) => a + b, 0) / values.length;
    case 'count': return values.length;
    // d3-array loops; spreading a long list into Math.max overflows the stack.
    case 'max': return max(values)!;
    case 'min': return min(values)!;
  }
}

/** Past tense for messages: "summed", "averaged", … */
export const AGGREGATE_VERB: Record<Aggregate, string> = {
  sum: 'summed', mean: 'averaged', count: 'counted', max: 'reduced to their maximum', min: 'reduced to their minimum',
};
