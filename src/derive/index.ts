import { diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import { formatDate, keyText } from '../fields/labels.js';
import type { Table } from '../table/types.js';
import type { DerivedLines, LineQuery, LineSeries } from './lines.js';

/** What an index divides by: the first key of the chart, or the key the brief names. */
export type IndexBase = { kind: 'first' } | { kind: 'key'; value: string | number };

/** How an index is shown: base = 100, or % change since the base (base = 0). */
export type IndexAs = 'index' | 'percent';

/** Lines divided by their value at a common base. */
export interface DerivedIndex<Q extends LineQuery = LineQuery> extends DerivedLines<Q> {
  /** Each series' values as the data gives them (the datum's), by series. */
  raw: number[][];
  /** The base key position, and how a reader names it. */
  baseX: number;
  baseLabel: string;
  as: IndexAs;
  /** Where the reference line goes: 100 for an index, 0 for % change. */
  reference: number;
}

/**
 * A base written as an ISO date ("2024", "2024-04", "2024-04-01", or a time with its zone) in
 * UTC; anything else is NaN. Never Date.parse on free text, which reads it in local time.
 */
function isoTime(text: string): number {
  const m = /^(\d{4})(?:-(\d{2}))?(?:-(\d{2}))?$/.exec(text);
  if (m) return Date.parse(`${m[1]}-${m[2] ?? '01'}-${m[3] ?? '01'}T00:00Z`);
  return /^\d{4}-\d{2}-\d{2}T[\d:.]+(Z|[+-]\d{2}:?\d{2})$/.test(text) ? Date.parse(text) : Number.NaN;
}

/** The key position the base names, if any key of the data is it: by the label a reader sees, the text in the data, or the date or number it means. */
function findBase(derived: DerivedLines, base: IndexBase, name: (x: number) => string): number | undefined {
  if (base.kind === 'first') return derived.keyExtent[0];
  const wanted = String(base.value);
  const column = derived.keyColumn;
  const asDate = column.type === 'date' ? isoTime(wanted) : Number.NaN;
  for (const s of derived.series) {
    for (let i = 0; i < s.xs.length; i++) {
      const x = s.xs[i]!;
      if (s.rows[i]! < 0) continue;
      const dateName = column.type === 'date' ? formatDate(x, column.grain ?? 'day') : undefined;
      if (name(x) === wanted || dateName === wanted || keyText(column, s.rows[i]!) === wanted || x === asDate || (column.type === 'number' && x === Number(wanted))) return x;
    }
  }
  return undefined;
}

function seriesName(s: LineSeries): string {
  return s.label === undefined ? 'the line' : `series ${JSON.stringify(s.label)}`;
}

/** The base value of one series, or the error naming the series and the row that stops it. */
function baseValue(s: LineSeries, baseX: number, baseLabel: string, table: Table, field: string): number | Diagnostic {
  const i = s.xs.indexOf(baseX);
  const row = i >= 0 ? table.rowPositions[s.rows[i]!] : undefined;
  const at = row === undefined ? '' : ` (${table.positionNoun} ${row})`;
  if (i < 0 || Number.isNaN(s.ys[i]!)) {
    return diagnostic('derive.index-base-missing', `${seriesName(s)} has no value at the base ${baseLabel}${at}, so it cannot be indexed to it`, {
      path: '/index/base', field, ...(row === undefined ? {} : { rows: [row] }), found: baseLabel, hint: 'choose a base every series has a value at with `index: { base: <key value> }`, or fill in the value',
    });
  }
  if (!(s.ys[i]! > 0)) {
    return diagnostic('derive.index-base-not-positive', `${seriesName(s)} is ${s.ys[i]} at the base ${baseLabel}${at}; an index divides by its base, which must be above zero`, {
      path: '/index/base', field, rows: [row!], found: String(s.ys[i]), expected: 'a base value above zero', hint: 'choose another base period with `index: { base: <key value> }`, or show the values themselves with intent trend',
    });
  }
  return s.ys[i]!;
}

/**
 * Each series divided by its value at the base: as an index (base = 100) or as % change since
 * the base (base = 0). At the base every series is exactly 100 (or 0): v / v is exactly 1. A base
 * that is missing, zero or negative for any series is an error naming the series and the row.
 */
export function indexLines<Q extends LineQuery>(derived: DerivedLines<Q>, table: Table, base: IndexBase, as: IndexAs, name: (x: number) => string): Outcome<DerivedIndex<Q>> {
  const baseX = findBase(derived, base, name);
  const field = derived.query.key.name;
  if (baseX === undefined) {
    const some = derived.series[0]!.xs.slice(0, 3).map(name).join(', ');
    return failure([diagnostic('derive.index-base-missing', `no key of \`${field}\` is the base ${JSON.stringify(base.kind === 'key' ? base.value : 'first')}`, {
      path: '/index/base', field, found: String(base.kind === 'key' ? base.value : 'first'), expected: `a value of \`${field}\`, such as ${some}`, hint: '`index: { base: first }` indexes to the first key',
    })]);
  }
  const baseLabel = name(baseX);
  const problems: Diagnostic[] = [];
  const series: LineSeries[] = [];
  for (const s of derived.series) {
    const b = baseValue(s, baseX, baseLabel, table, field);
    if (typeof b !== 'number') { problems.push(b); continue; }
    series.push({ ...s, ys: s.ys.map((y) => (as === 'index' ? (y / b) * 100 : (y / b - 1) * 100)) });
  }
  const overflow = series.find((s) => s.ys.some((y) => y === Infinity || y === -Infinity));
  if (overflow) problems.push(diagnostic('derive.not-finite', `${seriesName(overflow)} divided by its base is beyond the range of numbers`, { field, hint: 'choose a larger base value with `index: { base: <key value> }`' }));
  if (problems.length) return failure(problems);
  let [lo, hi] = [Infinity, -Infinity];
  for (const s of series) for (const y of s.ys) if (!Number.isNaN(y)) { lo = Math.min(lo, y); hi = Math.max(hi, y); }
  const reference = as === 'index' ? 100 : 0;
  const valueName = as === 'index' ? 'index' : 'change_percent';
  return success({ ...derived, series, raw: derived.series.map((s) => s.ys), valueExtent: [Math.min(lo, reference), Math.max(hi, reference)], valueName, baseX, baseLabel, as, reference });
}
