import { max, min } from 'd3-array';
import type { Aggregate } from '../brief/types.js';
import { diagnostic, failure, success, type Outcome } from '../diagnostics/diagnostic.js';
import type { FieldRef } from '../fields/types.js';
import { columnOf, type DateGrain, type Table } from '../table/types.js';
import { filledLabels } from './matrix-dates.js';
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
  /** The (series, key) cells with no usable value, drawn as zero thickness, in series then key order; periods with no row at all are in `skipped` instead. */
  empty: { series: string; key: string }[];
  /** Periods a regular date key skips (no row in any series), put back as keys of zero thickness. Default: none. */
  skipped: string[];
  /** The date key's grain, so its axis ticks no finer than the data. Default: none (not dates). */
  grain?: DateGrain;
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
  const filled = filledLabels(keys.map((k) => k.label), table, query.time);
  const skipped = filled?.inserted ?? [];
  if (filled) keys.splice(0, keys.length, ...filled.labels.map((label, i) => ({ label, at: filled.at[i]! })));
  if (skipped.length) {
    problems.push(diagnostic('derive.uneven-dates', `the dates of \`${query.time.name}\` skip ${skipped.length} period${skipped.length === 1 ? '' : 's'} (first ${skipped[0]}) with no rows in any series; the stream narrows to zero thickness there rather than flow across values it does not have`, {
      field: query.time.name, hint: 'add rows for the missing periods (0 where there truly is none), or aggregate to a coarser period',
    }));
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
  const gone = new Set(skipped);
  const empty: { series: string; key: string }[] = [];
  const series = [...cells].map(([name, row]) => ({ name, values: row.map((v, k) => {
    if (!Number.isNaN(v)) return v;
    emptyCells++;
    if (!gone.has(keys[k]!.label)) empty.push({ series: name, key: keys[k]!.label });
    return 0;
  }) }));
  const ranked = insideOutOrder(series);
  const rank = new Map(byOnset(series).map((s, i) => [s, i]));
  const layers = ranked.map((s) => ({ ...s, onset: onsetOf(s.values), rank: rank.get(s)! }));
  const baseline = streamBaseline(layers.map((l) => l.values));
  const tops = baseline.map((b, k) => b + layers.reduce((a, l) => a + l.values[k]!, 0));
  const extent: [number, number] = [min(baseline)!, max(tops)!];
  const column = columnOf(table, query.time.name);
  const grain = column?.type === 'date' ? column.grain : undefined;
  return success({ query, keys, layers, baseline, extent, emptyCells, empty, skipped, ...(grain ? { grain } : {}) }, problems);
}
