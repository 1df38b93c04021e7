import { max, min } from 'd3-array';
import type { Aggregate } from '../brief/types.js';
import { diagnostic, failure, success, type Outcome } from '../diagnostics/diagnostic.js';
import type { FieldRef } from '../fields/types.js';
import type { Table } from '../table/types.js';
import { AGGREGATORS } from './aggregate.js';
import type { Grouped } from './group.js';
import { byOnset, insideOutOrder, onsetOf } from './stream-order.js';
import { streamBaseline } from './wiggle.js';

/** What a streamgraph shows: an ordered key (time), a series key and one value. */
export interface StreamQuery {
  time: FieldRef;
  series: FieldRef;
  value: FieldRef;
  aggregate: Aggregate;
}

/** One layer: a series' thickness at every key, in key order. */
export interface StreamLayer {
  name: string;
  values: number[];
  /** Index of the first key with a positive value. */
  onset: number;
  /** Rank by onset (0 = earliest), as the inside-out order sorted them. */
  rank: number;
}

/** The numbers a streamgraph draws: keys in order, layers bottom first, and the baseline at each key. */
export interface DerivedStream<Q extends StreamQuery = StreamQuery> {
  query: Q;
  /** Each key's label and position along the key (epoch ms, number, or level index). */
  keys: { label: string; at: number }[];
  layers: StreamLayer[];
  baseline: number[];
  /** [lowest baseline, highest top]: the extent the layers span. */
  extent: [number, number];
  /** How many (key, series) cells had no row and count as zero thickness. */
  emptyCells: number;
}

/** The keys in their own order, each with its label and position. */
function keysOf(grouped: Grouped): { label: string; at: number }[] {
  const at = new Map<string, number>();
  for (const g of grouped.groups) if (!at.has(g.labels[0]!)) at.set(g.labels[0]!, g.sortKeys[0]!);
  return [...at].map(([label, a]) => ({ label, at: a })).sort((a, b) => a.at - b.at);
}

/**
 * A streamgraph's layers from rows grouped by (key, series): values combined per cell, a cell with
 * no row counted as zero thickness, layers in the inside-out order, and the weighted-wiggle
 * baseline (Byron & Wattenberg 2008). Fewer than two keys is an error: a stream needs a course.
 */
export function deriveStream<Q extends StreamQuery>(table: Table, query: Q, grouped: Grouped): Outcome<DerivedStream<Q>> {
  const problems = [...grouped.diagnostics];
  const keys = keysOf(grouped);
  if (keys.length < 2) {
    problems.push(diagnostic('derive.stream-too-few-keys', `a streamgraph needs at least two values of \`${query.time.name}\` to flow between; the data have ${keys.length}`, {
      field: query.time.name, file: table.origin.file, found: String(keys.length), expected: 'two or more', hint: 'compare the series with bars (intent: compare) instead',
    }));
    return failure(problems);
  }
  const index = new Map(keys.map((k, i) => [k.label, i]));
  const cells = new Map<string, number[]>();
  const combine = AGGREGATORS[query.aggregate].combine;
  for (const g of grouped.groups) {
    const row = cells.get(g.labels[1]!) ?? new Array<number>(keys.length).fill(Number.NaN);
    row[index.get(g.labels[0]!)!] = combine(g.values);
    cells.set(g.labels[1]!, row);
  }
  let emptyCells = 0;
  const series = [...cells].map(([name, row]) => ({ name, values: row.map((v) => (Number.isNaN(v) ? (emptyCells++, 0) : v)) }));
  const ranked = insideOutOrder(series);
  const rank = new Map(byOnset(series).map((s, i) => [s, i]));
  const layers = ranked.map((s) => ({ ...s, onset: onsetOf(s.values), rank: rank.get(s)! }));
  const baseline = streamBaseline(layers.map((l) => l.values));
  const tops = baseline.map((b, k) => b + layers.reduce((a, l) => a + l.values[k]!, 0));
  const extent: [number, number] = [min(baseline)!, max(tops)!];
  return success({ query, keys, layers, baseline, extent, emptyCells }, problems);
}
