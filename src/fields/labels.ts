import type { Locale } from '../brief/types.js';
import type { Column, DateGrain } from '../table/types.js';
import { LOCALE_DEFS, localeDef } from './locales.js';

/**
 * Writes a UTC time at a grain, in a locale's names (default English): "2026", "Oct 2026",
 * "4 Oct 2026", "4 Oct 2026 06:30"; in de "Okt. 2026", "4. Okt. 2026".
 */
export function formatDate(time: number, grain: DateGrain, locale?: Locale): string {
  const d = new Date(time);
  const def = localeDef(locale);
  const year = String(d.getUTCFullYear());
  const month = def.shortMonths[d.getUTCMonth()]!;
  const pad = (n: number) => String(n).padStart(2, '0');
  if (grain === 'year') return year;
  if (grain === 'month') return `${month} ${year}`;
  const day = def.date(d.getUTCDate(), d.getUTCMonth(), year);
  if (grain === 'day') return day;
  const clock = `${pad(d.getUTCHours())}:${pad(d.getUTCMinutes())}`;
  return grain === 'minute' ? `${day} ${clock}` : `${day} ${clock}:${pad(d.getUTCSeconds())}`;
}

/** Writes the quarter a UTC time falls in: "Q1 2025". */
export function quarterName(time: number, locale?: Locale): string {
  const d = new Date(time);
  return localeDef(locale).quarter(Math.floor(d.getUTCMonth() / 3) + 1, String(d.getUTCFullYear()));
}

/** The label of a key cell as a reader sees it: dates written out (in the locale's names), other values as in the data. */
export function keyText(column: Column, row: number, locale?: Locale): string | null {
  const value = column.values[row];
  if (value === null || value === undefined) return null;
  if (column.type === 'date' && column.quarterly) return quarterName(value as number, locale);
  if (column.type === 'date') return formatDate(value as number, column.grain ?? 'day', locale);
  return column.text[row] ?? String(value);
}

/**
 * Month and weekday names, lower case: the calendar cycles below (English) and the month names
 * of every locale's table, full and abbreviated ("Sept.", "Okt." without their point), so a date
 * label of `locale: de` keeps its capital too.
 */
let calendarWords: ReadonlySet<string> | undefined;

/** Whether a word is a month or weekday name written with its capital ("May", "Sept", "Mon", "Okt"), which keeps its capital inside a sentence. */
function calendarName(word: string): boolean {
  calendarWords ??= new Set([
    ...CYCLES.slice(0, CALENDAR_CYCLES).flat(),
    ...Object.values(LOCALE_DEFS).flatMap((d) => [...d.months, ...d.shortMonths]).map((m) => m.replace(/\.$/, '').toLowerCase()),
  ]);
  return /^\p{Lu}\p{Ll}+$/u.test(word) && calendarWords.has(word.toLowerCase());
}

/**
 * A label as it reads inside a sentence ("Bar chart of crossings per day"): only a first word
 * written with a capital and then lower-case letters ("Crossings") loses its capital; every
 * other letter keeps its case, so "pH", "GDP", "CO2", "Q1 2023", "°C" and "May" are kept.
 */
export function inSentence(label: string): string {
  const first = /^\p{L}+/u.exec(label)?.[0] ?? '';
  if (!/^\p{Lu}\p{Ll}+$/u.test(first) || calendarName(first)) return label;
  return `${first.charAt(0).toLowerCase()}${label.slice(1)}`;
}

/**
 * A column name as a reader sees it: underscores and dashes become spaces, camelCase is split
 * ("fuelPerDay" → "Fuel per day"), and no letter written in capitals is lowered ("GDP", "pH",
 * "CO2", "totalGDP" → "Total GDP"). The first word gets a capital when it is all lower-case
 * letters ("rain_mm" → "Rain mm"); a name of one short word of letters ("sku", "hut") is kept as
 * written, since it may be an abbreviation that a capital would mangle ("Sku").
 */
export function readableName(name: string): string {
  const spaced = name
    .replace(/[_\-]+/g, ' ')
    // A capital after two lower-case letters starts a camelCase word ("loanCount"), but not in "iPhone".
    .replace(/(?<=\p{Ll}{2})(\p{Lu}\p{Ll})/gu, (b: string) => ` ${b.toLowerCase()}`)
    .replace(/(\p{Ll})(\p{Lu}{2,})/gu, '$1 $2')
    .replace(/\s+/g, ' ')
    .trim();
  const capital = spaced.charAt(0).toUpperCase() + spaced.slice(1);
  // Month and weekday names ("jan", "mon") are names, not abbreviations to keep as written.
  if (/^\p{Ll}{1,3}$/u.test(spaced) && !calendarName(capital)) return spaced;
  const first = /^\S+/.exec(spaced)?.[0] ?? '';
  return /^\p{Ll}+$/u.test(first) ? spaced.charAt(0).toUpperCase() + spaced.slice(1) : spaced;
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
