import { fsum, max, min } from 'd3-array';
import type { Aggregate } from '../brief/types.js';

/** How rows that share a key are combined: the arithmetic, the word for messages, and whether results add up. */
export interface Aggregator {
  combine(values: readonly number[]): number;
  /** Past tense for messages: "summed", "averaged", … */
  verb: string;
  /** Whether combined values can be added again (into an "Others" bar, a stack, a total). */
  additive: boolean;
}

/**
 * The compensated sum of values. A single value is its own sum: most groups have one row, and
 * fsum allocates a 32-slot typed array per call, which dominated the derive stage.
 */
function exactSum(values: readonly number[], each: (v: number) => number = (v) => v): number {
  return values.length === 1 ? each(values[0]!) : fsum(values, each);
}

/**
 * The aggregators by name. Sums and means use compensated (Neumaier) summation through
 * d3-array's `fsum`, so a long column does not drift; `max` and `min` loop (spreading a long
 * list into Math.max overflows the stack).
 */
export const AGGREGATORS: Record<Aggregate, Aggregator> = {
  sum: { combine: (v) => exactSum(v), verb: 'summed', additive: true },
  // Each value is divided first, so the mean of values near the largest double stays finite.
  mean: { combine: (v) => exactSum(v, (x) => x / v.length), verb: 'averaged', additive: false },
  count: { combine: (v) => v.length, verb: 'counted', additive: true },
  max: { combine: (v) => max(v)!, verb: 'reduced to their maximum', additive: false },
  min: { combine: (v) => min(v)!, verb: 'reduced to their minimum', additive: false },
};
