import { diagnostic } from '../diagnostics/diagnostic.js';
import { formatDate } from '../fields/labels.js';
import type { FieldRef } from '../fields/types.js';
import { columnOf, type DateGrain, type Table } from '../table/types.js';
import { units } from './dates.js';
import type { ValueMatrix } from './matrix.js';
import { onlyWeekend, regularStep } from './skipped-periods.js';

const DAY = 86_400_000;


/** The time at the start of a count of grain units (the inverse of `units`). */
function timeOf(unit: number, grain: DateGrain): number {
  if (grain === 'year') return Date.UTC(unit, 0, 1);
  if (grain === 'month') return Date.UTC(Math.floor(unit / 12), unit % 12, 1);
  return unit * DAY;
}

/** Each label of a date key with its time, read from the column (labels are the dates written at their grain). */
function timesOf(table: Table, key: FieldRef): { grain: DateGrain; time: Map<string, number> } | undefined {
  const column = columnOf(table, key.name);
  const grain = column?.grain;
  if (!column || column.type !== 'date' || (grain !== 'year' && grain !== 'month' && grain !== 'day')) return undefined;
  const time = new Map<string, number>();
  for (let i = 0; i < table.rowCount; i++) {
    const v = column.values[i];
    if (typeof v === 'number') time.set(formatDate(v, grain, key.locale), v);
  }
  return { grain, time };
}

/**
 * The labels of an ordered date key with the periods it skips put back, at a regular grain (at
 * least half the steps equal, as for lines); the weekends of business days are not skipped
 * periods. Undefined when nothing is skipped, the key is not dates, or the filled key would be
 * more than twice as long (then the gap is only warned about).
 */
export function filledLabels(labels: readonly string[], table: Table, key: FieldRef): { labels: string[]; at: number[]; inserted: string[] } | undefined {
  const dates = key.type === 'temporal' && labels.length >= 3 ? timesOf(table, key) : undefined;
  if (!dates) return undefined;
  const times = labels.map((l) => dates.time.get(l));
  if (times.some((t) => t === undefined)) return undefined;
  const u = (times as number[]).map((t) => units(t, dates.grain));
  const steps = u.slice(1).map((v, i) => v - u[i]!);
  const step = regularStep(steps);
  if (step === undefined) return undefined;
  const out: string[] = [];
  const at: number[] = [];
  const inserted: string[] = [];
  labels.forEach((label, i) => {
    out.push(label);
    at.push(times[i]!);
    const d = steps[i];
    if (d === undefined || d <= step || d % step !== 0) return;
    if (dates.grain === 'day' && step === 1 && onlyWeekend(times[i]!, times[i + 1]!)) return;
    for (let k = u[i]! + step; k < u[i + 1]!; k += step) {
      const t = timeOf(k, dates.grain);
      out.push(formatDate(t, dates.grain, key.locale));
      at.push(t);
      inserted.push(out[out.length - 1]!);
    }
  });
  return inserted.length && out.length <= 2 * labels.length ? { labels: out, at, inserted } : undefined;
}

/** The matrix's cells laid out for new row and column labels, NaN where a label is new. */
function relabel(m: ValueMatrix, rows: string[], columns: string[]): Float64Array {
  const [ri, ci] = [new Map(m.rows.map((l, i) => [l, i])), new Map(m.columns.map((l, i) => [l, i]))];
  const cells = new Float64Array(rows.length * columns.length).fill(NaN);
  rows.forEach((r, i) => {
    const from = ri.get(r);
    if (from === undefined) return;
    columns.forEach((c, j) => { const at = ci.get(c); if (at !== undefined) cells[i * columns.length + j] = m.cells[from * m.columns.length + at]!; });
  });
  return cells;
}

/**
 * A heat map over a date key that skips whole periods (a day with no rows at all) would close
 * up over them, hiding the gap. The skipped dates are put back as rows (or columns) of missing
 * cells, drawn hatched as any missing cell, and warned about (derive.uneven-dates).
 */
export function fillSkippedDates(m: ValueMatrix, table: Table, rows: FieldRef, columns: FieldRef): ValueMatrix {
  const r = filledLabels(m.rows, table, rows);
  const c = filledLabels(m.columns, table, columns);
  if (!r && !c) return m;
  const [nr, nc] = [r?.labels ?? m.rows, c?.labels ?? m.columns];
  const cells = relabel(m, nr, nc);
  let missing = 0;
  for (const v of cells) if (Number.isNaN(v)) missing++;
  const inserted = { rows: r?.inserted ?? [], columns: c?.inserted ?? [] };
  const all = [...inserted.rows, ...inserted.columns];
  const field = r ? rows.name : columns.name;
  const warning = diagnostic('derive.uneven-dates', `the dates of \`${field}\` skip ${all.length} period${all.length === 1 ? '' : 's'} (first ${all[0]}) with no rows at all; ${all.length === 1 ? 'it is' : 'they are'} drawn as ${r ? 'rows' : 'columns'} of hatched cells, not left out`, {
    field, hint: 'add rows for the missing periods if they have values, or aggregate to a coarser period',
  });
  return { ...m, rows: nr, columns: nc, cells, missing, diagnostics: [...m.diagnostics, warning], inserted };
}
