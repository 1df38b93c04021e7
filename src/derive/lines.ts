import type { Aggregate } from '../brief/types.js';
import { describeRows, diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import { formatDate, keyText } from '../fields/labels.js';
import type { FieldRef } from '../fields/types.js';
import { columnOf, type Column, type Table } from '../table/types.js';
import { AGGREGATORS } from './aggregate.js';
import type { Combined } from './group.js';
import { compareText } from './order.js';
import { breakSkippedPeriods, type SkippedPeriods } from './skipped-periods.js';
import { agree, count } from '../diagnostics/words.js';

/** What the line derivation needs from the plan. */
export interface LineQuery {
  /** The ordered key along x: temporal, quantitative, or ordinal with its levels in order. */
  key: FieldRef;
  /** The key that splits the rows into series (one line each); undefined for one line. */
  series: FieldRef | undefined;
  /** The value along y; undefined when rows are counted (`aggregate: count`). */
  value: FieldRef | undefined;
  aggregate: Aggregate;
  /**
   * Each series is drawn in a panel of its own (small multiples by the series key): the panel's
   * title names it, so no direct label or legend is drawn. Default: false.
   */
  onePerPanel?: boolean;
  /** Whether the brief states `aggregate:`; when it does not, the plan has already warned of rows combined. Default: stated. */
  aggregateStated?: boolean;
  /** Rows sharing a key (and series) that are combined, as the plan counted them, said in the note and the axis title. Default: none. */
  combined?: Combined;
}

/** One line's points in key order. */
export interface LineSeries {
  /** The series' label; undefined for a chart of one line. */
  label: string | undefined;
  /** Key positions, ascending: epoch ms for dates, the number, or the level's index for ordinal keys. */
  xs: number[];
  /** Values; NaN where the key's value is missing, which leaves a gap. */
  ys: number[];
  /** The first source row (table index) of each point, for its datum. */
  rows: number[];
}

/** The numbers a line chart draws. */
export interface DerivedLines<Q extends LineQuery = LineQuery> {
  query: Q;
  series: LineSeries[];
  /** The key column, to write a drawn point's key as the data has it. */
  keyColumn: Column;
  /** [first, last] key position over every series. */
  keyExtent: [number, number];
  /** [lowest, highest] value drawn. */
  valueExtent: [number, number];
  /** Name of the value in data terms: the value column, or "count". */
  valueName: string;
  /** Whether the key is monthly dates that all start quarters, three months apart somewhere: read as quarters ("Q1 2025"). */
  quarterly: boolean;
}

/** Whether monthly keys are quarters: every key starts a quarter, and some two are three months apart. */
function isQuarterly(series: readonly LineSeries[], keyColumn: Column): boolean {
  if (keyColumn.type !== 'date' || keyColumn.grain !== 'month') return false;
  let apart = false;
  for (const s of series) {
    for (let i = 0; i < s.xs.length; i++) {
      if (Number.isNaN(s.ys[i]!) && s.rows[i]! < 0) continue;
      const d = new Date(s.xs[i]!);
      if (d.getUTCMonth() % 3 !== 0) return false;
      if (i > 0 && s.rows[i - 1]! >= 0 && s.xs[i]! - s.xs[i - 1]! < 100 * 86_400_000) apart = true;
    }
  }
  return apart;
}

interface Bucket { xs: number[]; ys: number[]; rows: number[]; order: number }

/** The key's position along x: the number or time itself, or an ordinal level's index. */
function keyPosition(key: FieldRef, column: Column): (row: number) => number | null {
  if (column.type === 'number' || column.type === 'date') return (row) => (typeof column.values[row] === 'number' ? (column.values[row] as number) : null);
  const index = new Map(key.levels.map((level, i) => [level, i]));
  return (row) => (column.text[row] === null ? null : index.get(column.text[row]!) ?? null);
}

/** Rows read into one bucket per series, with the rows that had no key or no value. */
function bucketRows(table: Table, query: LineQuery): { buckets: Map<string, Bucket>; noKey: number[]; noValue: number[]; keyColumn: Column } {
  const keyColumn = columnOf(table, query.key.name)!;
  const seriesColumn = query.series ? columnOf(table, query.series.name)! : undefined;
  const valueColumn = query.value ? columnOf(table, query.value.name)! : undefined;
  const position = keyPosition(query.key, keyColumn);
  const seriesOrder = new Map((query.series?.levels ?? []).map((l, i) => [l, i]));
  const buckets = new Map<string, Bucket>();
  const noKey: number[] = [];
  const noValue: number[] = [];
  for (let i = 0; i < table.rowCount; i++) {
    const x = position(i);
    const label = seriesColumn ? keyText(seriesColumn, i) : '';
    if (x === null || label === null) { noKey.push(i); continue; }
    const raw = valueColumn ? valueColumn.values[i] : 1;
    const y = typeof raw === 'number' && Number.isFinite(raw) ? raw : Number.NaN;
    if (Number.isNaN(y)) noValue.push(i);
    let b = buckets.get(label);
    if (!b) { b = { xs: [], ys: [], rows: [], order: seriesOrder.get(label) ?? Number.MAX_SAFE_INTEGER }; buckets.set(label, b); }
    b.xs.push(x);
    b.ys.push(y);
    b.rows.push(i);
  }
  return { buckets, noKey, noValue, keyColumn };
}

/** The bucket's points in key order (stable: rows of one key keep their order); already sorted data is not sorted again. */
function inKeyOrder(b: Bucket): Bucket {
  let sorted = true;
  for (let i = 1; i < b.xs.length && sorted; i++) sorted = b.xs[i - 1]! <= b.xs[i]!;
  if (sorted) return b;
  const idx = b.xs.map((_, i) => i).sort((p, q) => b.xs[p]! - b.xs[q]! || p - q);
  return { xs: idx.map((i) => b.xs[i]!), ys: idx.map((i) => b.ys[i]!), rows: idx.map((i) => b.rows[i]!), order: b.order };
}

/** Points sharing a key combined by the aggregate (missing values left out; all missing stays a gap), with how many keys had several rows. */
function combineKeys(b: Bucket, aggregate: Aggregate): { series: Omit<LineSeries, 'label'>; combined: number } {
  let distinct = true;
  for (let i = 1; i < b.xs.length && distinct; i++) distinct = b.xs[i - 1] !== b.xs[i];
  // Most series have one row per key: nothing to combine, and a million points are not copied.
  if (distinct) return { series: { xs: b.xs, ys: b.ys, rows: b.rows }, combined: 0 };
  const { combine } = AGGREGATORS[aggregate];
  const out: Omit<LineSeries, 'label'> = { xs: [], ys: [], rows: [] };
  let combined = 0;
  for (let i = 0; i < b.xs.length;) {
    let j = i + 1;
    while (j < b.xs.length && b.xs[j] === b.xs[i]) j++;
    if (j - i === 1) out.ys.push(b.ys[i]!);
    else {
      combined++;
      const present = b.ys.slice(i, j).filter((y) => !Number.isNaN(y));
      out.ys.push(present.length ? combine(present) : Number.NaN);
    }
    out.xs.push(b.xs[i]!);
    out.rows.push(b.rows[i]!);
    i = j;
  }
  return { series: out, combined };
}

/** The warning for whole periods a regular series skips, naming the first. */
function skippedWarning(skipped: SkippedPeriods[], query: LineQuery, keyColumn: Column): Diagnostic {
  const first = skipped[0]!;
  const name = (t: number) => formatDate(t, keyColumn.grain ?? 'day');
  const who = first.series === undefined ? '' : ` in ${JSON.stringify(first.series)}`;
  return diagnostic('derive.uneven-dates', `the dates of \`${query.key.name}\` skip ${skipped.length === 1 ? 'a run of periods' : `${skipped.length} runs of periods`}, first${who} between ${name(first.after)} and ${name(first.before)}; the line leaves a gap there rather than join across values it does not have`, {
    field: query.key.name, hint: 'add rows for the missing periods (NA where there is no value), or aggregate to a coarser period',
  });
}

/** The warning for values that leave gaps, naming their rows and keys. */
function gapWarning(rows: number[], table: Table, query: LineQuery, keyColumn: Column): Diagnostic {
  const positions = rows.map((r) => table.rowPositions[r]!);
  const keys = [...new Set(rows.slice(0, 3).map((r) => keyText(keyColumn, r) ?? '?'))];
  const one = rows.length === 1;
  return diagnostic('derive.missing-values', `${describeRows(positions, table.positionNoun)} ha${one ? 's' : 've'} no usable \`${query.value?.name ?? 'value'}\` (at ${keys.join(', ')}${rows.length > 3 ? ', …' : ''}); the line leaves a gap there: not interpolated, not drawn as zero`, {
    file: table.origin.file, field: query.value?.name, rows: positions, hint: 'fill in the values, or remove those rows if the gap is not meant',
  });
}

function extentOf(series: readonly LineSeries[], pick: (s: LineSeries) => readonly number[]): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const s of series) for (const v of pick(s)) if (!Number.isNaN(v)) { if (v < lo) lo = v; if (v > hi) hi = v; }
  return lo <= hi ? [lo, hi] : [0, 1];
}

/** Problems with the key or value columns that stop or qualify the derivation. */
function rowProblems(table: Table, query: LineQuery, noKey: number[], noValue: number[], keyColumn: Column): Diagnostic[] {
  const problems: Diagnostic[] = [];
  if (noValue.length) problems.push(gapWarning(noValue, table, query, keyColumn));
  if (noKey.length) {
    const rows = noKey.map((r) => table.rowPositions[r]!);
    problems.push(diagnostic('derive.missing-values', `${describeRows(rows, table.positionNoun)} ${agree(rows.length, 'has', 'have')} no usable key and ${agree(rows.length, 'is', 'are')} left out`, {
      file: table.origin.file, field: query.key.name, rows, hint: 'give every row a key',
    }));
  }
  return problems;
}

/**
 * The derive stage for lines: rows → one series per level of the series key (one line when
 * there is none), each in key order, rows sharing a key combined by the aggregate. A missing
 * value stays in the series as NaN, a gap the line does not bridge, and is warned about by row.
 */
export function deriveLines<Q extends LineQuery>(table: Table, query: Q): Outcome<DerivedLines<Q>> {
  const { buckets, noKey, noValue, keyColumn } = bucketRows(table, query);
  const problems = rowProblems(table, query, noKey, noValue, keyColumn);
  const entries = [...buckets].sort((a, b) => a[1].order - b[1].order || (a[1].order === Number.MAX_SAFE_INTEGER ? compareText(a[0], b[0]) : 0));
  let combined = 0;
  const skipped: SkippedPeriods[] = [];
  const series: LineSeries[] = entries.map(([label, b]) => {
    const c = combineKeys(inKeyOrder(b), query.aggregate);
    combined += c.combined;
    const line = { label: query.series ? label : undefined, ...c.series };
    if (keyColumn.type !== 'date') return line;
    const broken = breakSkippedPeriods(line, keyColumn.grain ?? 'day');
    skipped.push(...broken.skipped);
    return broken.series;
  });
  if (skipped.length) problems.push(skippedWarning(skipped, query, keyColumn));
  if (!series.some((s) => s.ys.some((y) => !Number.isNaN(y)))) {
    problems.push(diagnostic('derive.no-rows', 'no row has both a key and a usable value, so there is nothing to draw', { file: table.origin.file, hint: 'check that the key and value columns are the ones you meant', expected: 'at least one complete row' }));
    return failure(problems);
  }
  if (combined && query.aggregateStated !== false) problems.push(diagnostic('derive.aggregated', `${count(combined, 'point')} had several rows; their values are ${AGGREGATORS[query.aggregate].verb} (aggregate: ${query.aggregate})`, { field: query.key.name, hint: 'set `aggregate:` to sum, mean, count, max or min' }));
  const overflow = series.find((s) => s.ys.some((y) => y === Infinity || y === -Infinity));
  if (overflow) {
    problems.push(diagnostic('derive.not-finite', `a combined \`${query.value?.name ?? 'count'}\`${overflow.label === undefined ? '' : ` of ${JSON.stringify(overflow.label)}`} is beyond the range of numbers`, { field: query.key.name, expected: 'a finite number', hint: 'rescale the values (e.g. to thousands or millions) before charting' }));
    return failure(problems);
  }
  return success({ query, series, keyColumn, keyExtent: extentOf(series, (s) => s.xs), valueExtent: extentOf(series, (s) => s.ys), valueName: query.value?.name ?? 'count', quarterly: isQuarterly(series, keyColumn) }, problems);
}
