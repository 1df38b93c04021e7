import { diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import type { Table } from '../table/types.js';
import type { DerivedLines, LineQuery } from './lines.js';

/** One period's change from the period before, in %. */
export interface PeriodChange {
  /** The key position of the period, and how a reader names it. */
  x: number;
  label: string;
  /** % change from the previous period's value. */
  change: number;
  value: number;
  previous: number;
  /** Table index of the period's row. */
  row: number;
}

/**
 * Period-over-period change of a single line: each present value against the one before it,
 * as % change. The first period has no change; a missing value has no bar (its gap is warned
 * about when the rows are read); a previous value that is missing, zero or negative is an error
 * naming the row, since a change cannot be taken from it.
 */
export function periodChanges<Q extends LineQuery>(derived: DerivedLines<Q>, table: Table, name: (x: number) => string): Outcome<PeriodChange[]> {
  const s = derived.series[0]!;
  const field = derived.query.key.name;
  const out: PeriodChange[] = [];
  const problems: Diagnostic[] = [];
  for (let i = 1; i < s.xs.length; i++) {
    const [value, previous] = [s.ys[i]!, s.ys[i - 1]!];
    if (Number.isNaN(value)) continue;
    const row = table.rowPositions[s.rows[i - 1]!]!;
    if (Number.isNaN(previous)) {
      // A period the data skips has no row (rows -1); a missing value has its own.
      const where = s.rows[i - 1]! < 0 ? 'the period before it is absent from the data' : `${name(s.xs[i - 1]!)} (${table.positionNoun} ${row}) is missing`;
      problems.push(diagnostic('derive.index-base-missing', `the change at ${name(s.xs[i]!)} has no previous value: ${where}`, { path: '/index/base', field, ...(s.rows[i - 1]! < 0 ? {} : { rows: [row] }), hint: 'fill in the value, or chart the values themselves with intent trend' }));
    } else if (!(previous > 0)) {
      problems.push(diagnostic('derive.index-base-not-positive', `the change at ${name(s.xs[i]!)} would divide by ${previous}, the value at ${name(s.xs[i - 1]!)} (${table.positionNoun} ${row}); a change in % needs a previous value above zero`, { path: '/index/base', field, rows: [row], found: String(previous), expected: 'a value above zero', hint: 'chart the values themselves with intent trend' }));
    } else {
      out.push({ x: s.xs[i]!, label: name(s.xs[i]!), change: (value / previous - 1) * 100, value, previous, row: s.rows[i]! });
    }
  }
  if (problems.length) return failure(problems);
  if (out.some((c) => !Number.isFinite(c.change))) return failure([diagnostic('derive.not-finite', 'a change from the previous period is beyond the range of numbers', { field, hint: 'rescale the values before charting' })]);
  return success(out);
}
