import { bin, extent } from 'd3-array';

/** One bin of a histogram: its bounds and how many values fall in it. */
export interface Bin {
  from: number;
  to: number;
  count: number;
}

/**
 * The histogram of a sample in about `count` bins on round boundaries (d3-array's bin with its
 * nice thresholds); a constant sample is one bin.
 */
export function histogram(values: readonly number[], count: number): Bin[] {
  const [lo, hi] = extent(values);
  if (lo === undefined || hi === undefined) return [];
  if (lo === hi) return [{ from: lo, to: hi, count: values.length }];
  return bin().domain([lo, hi]).thresholds(count)([...values]).map((b) => ({ from: b.x0!, to: b.x1!, count: b.length }));
}
