import type { Column, DateGrain } from '../table/types.js';

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** Writes a UTC time at a grain: "2026", "Oct 2026", "4 Oct 2026", "4 Oct 2026 06:30". */
export function formatDate(time: number, grain: DateGrain): string {
  const d = new Date(time);
  const year = String(d.getUTCFullYear());
  const month = MONTHS[d.getUTCMonth()]!;
  const pad = (n: number) => String(n).padStart(2, '0');
  if (grain === 'year') return year;
  if (grain === 'month') return `${month} ${year}`;
  const day = `${d.getUTCDate()} ${month} ${year}`;
  if (grain === 'day') return day;
  const clock = `${pad(d.getUTCHours())}:${pad(d.getUTCMinutes())}`;
  return grain === 'minute' ? `${day} ${clock}` : `${day} ${clock}:${pad(d.getUTCSeconds())}`;
}

/** Writes the quarter a UTC time falls in: "Q1 2025". */
export function quarterName(time: number): string {
  const d = new Date(time);
  return `Q${Math.floor(d.getUTCMonth() / 3) + 1} ${d.getUTCFullYear()}`;
}

/** The label of a key cell as a reader sees it: dates written out, other values as in the data. */
export function keyText(column: Column, row: number): string | null {
  const value = column.values[row];
  if (value === null || value === undefined) return null;
  if (column.type === 'date' && column.quarterly) return quarterName(value as number);
  if (column.type === 'date') return formatDate(value as number, column.grain ?? 'day');
  return column.text[row] ?? String(value);
}
