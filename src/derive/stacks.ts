import type { Aggregate } from '../brief/types.js';
import { describeRows, diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import type { FieldRef } from '../fields/types.js';
import type { Table } from '../table/types.js';
import { AGGREGATORS } from './aggregate.js';
import { foldParts } from './fold-parts.js';
import { fitStacks, type StackCapacity } from './stack-fit.js';
import { groupRows } from './group.js';
import { cellsOf, normalizeStacks, orderStacks, partOrder, stackCells, type GroupOrder, type Stack, type StackCell } from './stack.js';
import { agree, count } from '../diagnostics/words.js';

/** What the stack derivation needs from the plan. */
export interface StackQuery {
  group: FieldRef;
  part: FieldRef;
  /** The value field; undefined when segments count rows. */
  value: FieldRef | undefined;
  aggregate: Aggregate;
  order: GroupOrder;
  /** Normalized: each bar is its group's whole (100 %). */
  normalized: boolean;
  /** The most parts drawn; beyond it the smallest are folded into "Other" (normalized bars only). */
  partLimit: number;
  /** size: the largest part overall on the baseline; key: the part key's own order (it is ordered). */
  partOrder: 'size' | 'key';
}

/** The numbers a stacked or normalized bar chart draws. */
export interface DerivedStacks<Q extends StackQuery = StackQuery> {
  query: Q;
  /** The bars in drawing order, segments from the baseline up. */
  stacks: Stack[];
  /** The parts in stacking order (the baseline part first). */
  parts: string[];
  /** Parts folded into `other`, largest first. */
  folded: string[];
  other: string;
  /** Groups left out because their parts sum to zero (a normalized bar cannot show 0 as 100 %). */
  empty: string[];
  /** Groups left out because the plot holds no more bars (smallest totals first), named in a note. */
  dropped: string[];
  valueName: string;
}

/** A stack holds parts of a whole, so a negative part is refused: it would hang below the baseline and the segments above it would float on nothing. */
function negativeParts(cells: readonly StackCell[], query: StackQuery): Diagnostic[] {
  const negative = cells.filter((c) => c.value < 0);
  if (!negative.length) return [];
  const rows = negative.flatMap((c) => c.rows).sort((a, b) => a - b);
  const first = negative[0]!;
  const value = query.value?.name ?? 'count';
  const grouped = 'show the values side by side as grouped bars, each from zero (keys: [group, part], intent: compare), or one bar chart per part';
  return [diagnostic('derive.negative-part', `${negative.length} part${negative.length === 1 ? ' is' : 's are'} negative (first: ${JSON.stringify(first.part)} of ${JSON.stringify(first.group)}, ${first.value}) in ${describeRows(rows)}; a stack adds parts into a whole, and a negative part has no place in it`, {
    path: '/values', field: value, rows, found: String(first.value), expected: 'parts of zero or more',
    hint: query.normalized ? `shares of a whole need parts of zero or more: ${grouped}` : grouped,
  })];
}

/** A combined value or total beyond the range of doubles is refused, naming the group. */
function notFinite(stacks: readonly Stack[], query: StackQuery): Diagnostic[] {
  const bad = stacks.find((s) => !Number.isFinite(s.total));
  if (!bad) return [];
  return [diagnostic('derive.not-finite', `the total of ${JSON.stringify(bad.group)} is beyond the range of numbers (${bad.total})`, {
    field: query.group.name, found: String(bad.total), expected: 'a finite number (below about 1.8e308 in size)', hint: 'rescale the values (e.g. to thousands or millions) before charting',
  })];
}

/** The folding warning: how many parts, and which. */
function foldWarning(folded: readonly string[], other: string, query: StackQuery): Diagnostic[] {
  if (!folded.length) return [];
  const names = folded.map((p) => JSON.stringify(p)).join(', ');
  return [diagnostic('derive.parts-folded', `${folded.length + query.partLimit - 1} parts are more than the ${query.partLimit} a normalized bar keeps apart; the ${folded.length} smallest overall (${names}) are folded into one "${other}" part`, {
    field: query.part.name, found: `${folded.length + query.partLimit - 1} parts`, expected: `at most ${query.partLimit}`, hint: 'combine parts before charting, or filter the table to the parts that matter',
  })];
}

/** Groups whose parts sum to zero are left out of a normalized chart, with a warning naming them. */
function splitEmpty(stacks: Stack[], query: StackQuery): { kept: Stack[]; empty: string[]; diagnostics: Diagnostic[] } {
  if (!query.normalized) return { kept: stacks, empty: [], diagnostics: [] };
  const empty = stacks.filter((s) => s.total === 0).map((s) => s.group);
  if (!empty.length) return { kept: stacks, empty, diagnostics: [] };
  return {
    kept: stacks.filter((s) => s.total !== 0),
    empty,
    diagnostics: [diagnostic('derive.zero-total', `${count(empty.length, 'group')} (${empty.map((g) => JSON.stringify(g)).join(', ')}) ${agree(empty.length, 'has', 'have')} parts summing to zero, so no share can be drawn; left out`, {
      field: query.group.name, hint: 'check the values of those groups, or remove them from the table',
    })],
  };
}

/** Every group's parts sum to zero: nothing to normalize. */
function wholeIsZero(query: StackQuery): Diagnostic {
  return diagnostic('derive.whole-is-zero', 'every group\'s parts sum to zero, so no share of a whole can be drawn', {
    field: query.value?.name ?? 'count', hint: 'check the value column, or show the values as bars (intent: compare)',
  });
}

/**
 * The derive stage for stacked and normalized bars: rows → one cell per (group, part), combined
 * by the aggregate; negative parts refused; parts ordered by overall total (the largest on the
 * baseline) and, for normalized bars, folded beyond the part limit; stacks laid end to end,
 * normalized to shares, ordered, and fitted to the bars the plot holds (`capacityFor`).
 */
export function deriveStacks<Q extends StackQuery>(table: Table, query: Q, capacityFor: StackCapacity<Q> = () => Infinity): Outcome<DerivedStacks<Q>> {
  const grouped = groupRows(table, { keys: [query.group, query.part], value: query.value });
  const problems = [...grouped.diagnostics];
  if (grouped.groups.length === 0) {
    problems.push(diagnostic('derive.no-rows', 'no row has a group, a part and a usable value, so there is nothing to draw', {
      file: table.origin.file, hint: 'check that the key and value columns are the ones you meant', expected: 'at least one complete row',
    }));
    return failure(problems);
  }
  const cells = cellsOf(grouped.groups, AGGREGATORS[query.aggregate].combine);
  problems.push(...negativeParts(cells, query));
  if (problems.some((p) => p.severity === 'error')) return failure(problems);
  const partKeys = new Map(grouped.groups.map((g) => [g.labels[1]!, g.sortKeys[1]!]));
  const keyOf = query.partOrder === 'key' ? (p: string) => partKeys.get(p)! : undefined;
  const folded = query.normalized ? foldParts(cells, query.partLimit, keyOf) : { cells, parts: partOrder(cells, keyOf), folded: [], other: 'Other' };
  problems.push(...foldWarning(folded.folded, folded.other, query));
  const stacked = stackCells(folded.cells, folded.parts);
  problems.push(...notFinite(stacked, query));
  if (problems.some((p) => p.severity === 'error')) return failure(problems);
  const { kept, empty, diagnostics } = splitEmpty(stacked, query);
  if (!kept.length) return failure([...problems, wholeIsZero(query)]);
  problems.push(...diagnostics);
  const keyOrder = new Map(grouped.groups.map((g) => [g.labels[0]!, g.sortKeys[0]!]));
  const stacks = orderStacks(query.normalized ? normalizeStacks(kept) : kept, query.order, folded.parts, (g) => keyOrder.get(g)!);
  const fitted = fitStacks({ query, stacks, parts: folded.parts, folded: folded.folded, other: folded.other, empty, dropped: [], valueName: query.value?.name ?? 'count' }, capacityFor);
  return fitted.ok ? success(fitted.value, [...problems, ...fitted.diagnostics]) : failure([...problems, ...fitted.diagnostics]);
}
