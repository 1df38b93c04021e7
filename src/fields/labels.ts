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

/** The label of a key cell as a reader sees it: dates written out, other values as in the data. */
export function keyText(column: Column, row: number): string | null {
  const value = column.values[row];
  if (value === null || value === undefined) return null;
  if (column.type === 'date') return formatDate(value as number, column.grain ?? 'day');
  return column.text[row] ?? String(value);
}

/** Known cycles: a text column whose every value is one of these is cyclic, in this order. */
export const CYCLES: string[][] = [
  ['january', 'february', 'march', 'april', 'may', 'june', 'july', 'august', 'september', 'october', 'november', 'december'],
  ['jan', 'feb', 'mar', 'apr', 'may', 'jun', 'jul', 'aug', 'sep', 'oct', 'nov', 'dec'],
  ['monday', 'tuesday', 'wednesday', 'thursday', 'friday', 'saturday', 'sunday'],
  ['mon', 'tue', 'wed', 'thu', 'fri', 'sat', 'sun'],
  ['n', 'nne', 'ne', 'ene', 'e', 'ese', 'se', 'sse', 's', 'ssw', 'sw', 'wsw', 'w', 'wnw', 'nw', 'nnw'],
];

/** How many of CYCLES' first entries are calendar cycles (months, weekdays), whose every place exists whether or not the data has it. */
const CALENDAR_CYCLES = 4;

/** A level written as the data writes its levels: upper case, lower case, or a capital first. */
function writtenAs(sample: readonly string[]): (name: string) => string {
  if (sample.every((l) => l === l.toUpperCase())) return (n) => n.toUpperCase();
  if (sample.every((l) => l === l.toLowerCase())) return (n) => n;
  return (n) => `${n.charAt(0).toUpperCase()}${n.slice(1)}`;
}

/**
 * The whole calendar cycle the levels belong to (12 months or 7 weekdays), written as the data
 * writes them, when the levels are months or weekdays; otherwise undefined (compass points and
 * other cycles have no fixed count of places: the data's own levels are the cycle).
 */
export function wholeCycle(levels: readonly string[]): string[] | undefined {
  if (levels.length < 3 || levels.some((l) => l.endsWith('.'))) return undefined;
  const lower = levels.map((l) => l.toLowerCase());
  const cycle = CYCLES.slice(0, CALENDAR_CYCLES).find((c) => lower.every((l) => c.includes(l)));
  if (!cycle) return undefined;
  const write = writtenAs(levels);
  const present = new Map(levels.map((l) => [l.toLowerCase(), l]));
  return cycle.map((name) => present.get(name) ?? write(name));
}
