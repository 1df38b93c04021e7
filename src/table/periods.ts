import type { DateGrain } from './types.js';

/** English month names, January first. */
export const MONTH_NAMES = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];

/** Month names, their three-letter abbreviations and "Sept", lower case, by month number (1–12). */
const MONTH_WORDS: ReadonlyMap<string, number> = new Map([
  ...MONTH_NAMES.flatMap((name, i) => [[name.toLowerCase(), i + 1], [name.slice(0, 3).toLowerCase(), i + 1]] as [string, number][]),
  ['sept', 9],
]);

const MONTH_YEAR = /^([A-Za-z]+)\.?[ -](\d{4})$/;
const DAY_MONTH_YEAR = /^(\d{1,2})[ -]([A-Za-z]+)\.?[ -](\d{4})$/;
const YEAR_QUARTER = /^(\d{4})[ -]?Q([1-4])$/i;
const QUARTER_YEAR = /^Q([1-4])[ -](\d{4})$/i;
const ISO_WEEK = /^(\d{4})-?W(\d{2})$/i;

const DAY = 86_400_000;

/** Epoch ms of a UTC date; setUTCFullYear, not Date.UTC, which reads years 0–99 as 1900–1999. */
function utcDate(year: number, month: number, day: number): number {
  return new Date(0).setUTCFullYear(year, month - 1, day);
}

function validDay(year: number, month: number, day: number): boolean {
  return day >= 1 && new Date(utcDate(year, month, day)).getUTCMonth() === month - 1;
}

/** The Monday starting ISO 8601 week 1 of a year: the week that holds 4 January. */
function isoWeekOne(year: number): number {
  const jan4 = utcDate(year, 1, 4);
  const weekday = (new Date(jan4).getUTCDay() + 6) % 7; // Monday 0 … Sunday 6
  return jan4 - weekday * DAY;
}

/** ISO 8601 week (`2026-W05`): its Monday; week 53 only in years that have one. */
function isoWeek(year: number, week: number): number | undefined {
  const start = isoWeekOne(year) + (week - 1) * 7 * DAY;
  return week >= 1 && start < isoWeekOne(year + 1) ? start : undefined;
}

/**
 * Reads the period spellings people write for dates, as the UTC start of the period:
 * month-year in English names or abbreviations (`Jan 2025`, `March 2026`, `Sept 2025`),
 * quarters (`2025-Q1`, `2025 Q1`, `Q1 2026`; month grain, three months apart), ISO 8601 weeks
 * (`2026-W05`, its Monday; day grain, seven days apart) and day-month-year (`1 Mar 2026`,
 * chartwright's own tick format). Undefined for anything else.
 */
export function parsePeriod(text: string): { time: number; grain: DateGrain; quarter?: true } | undefined {
  const t = text.trim();
  let m = MONTH_YEAR.exec(t);
  if (m) {
    const month = MONTH_WORDS.get(m[1]!.toLowerCase());
    return month === undefined ? undefined : { time: utcDate(Number(m[2]), month, 1), grain: 'month' };
  }
  if ((m = DAY_MONTH_YEAR.exec(t))) {
    const month = MONTH_WORDS.get(m[2]!.toLowerCase());
    const [year, day] = [Number(m[3]), Number(m[1])];
    return month === undefined || !validDay(year, month, day) ? undefined : { time: utcDate(year, month, day), grain: 'day' };
  }
  if ((m = YEAR_QUARTER.exec(t)) || (m = QUARTER_YEAR.exec(t))) {
    const [year, quarter] = m[1]!.length === 4 ? [Number(m[1]), Number(m[2])] : [Number(m[2]), Number(m[1])];
    return { time: utcDate(year, quarter * 3 - 2, 1), grain: 'month', quarter: true };
  }
  if ((m = ISO_WEEK.exec(t))) {
    const time = isoWeek(Number(m[1]), Number(m[2]));
    return time === undefined ? undefined : { time, grain: 'day' };
  }
  return undefined;
}
