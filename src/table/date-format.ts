import type { FieldHint } from '../brief/types.js';
import { timeFormatLocale, type TimeLocaleDefinition } from 'd3-time-format';
import { parseIsoDate } from './cells.js';
import { MONTH_NAMES, parsePeriod } from './periods.js';
import type { DateGrain } from './types.js';

/** Reads a date cell's text as a UTC time at its grain, or undefined. */
export type DateReader = (text: string) => { time: number; grain: DateGrain; quarter?: true } | undefined;

/** The default date reader: ISO 8601, then the period spellings of periods.ts. */
export const readDateText: DateReader = (text) => parseIsoDate(text) ?? parsePeriod(text);

const DAY_NAMES = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'];

/** An English locale stated here, not d3-time-format's default, which is module state any library may replace. */
function englishLocale() {
  const short = (names: string[]) => names.map((n) => n.slice(0, 3));
  const days = [DAY_NAMES, short(DAY_NAMES)] as TimeLocaleDefinition['days'][];
  const months = [MONTH_NAMES, short(MONTH_NAMES)] as TimeLocaleDefinition['months'][];
  return timeFormatLocale({
    dateTime: '%a %e %b %Y %H:%M:%S', date: '%Y-%m-%d', time: '%H:%M:%S', periods: ['AM', 'PM'],
    days: days[0]!, shortDays: days[1]!, months: months[0]!, shortMonths: months[1]!,
  });
}

/** The grain a d3-time-format pattern gives its dates to: the finest unit it names. */
function patternGrain(pattern: string): DateGrain {
  if (/%[-_0]?[SsQLfc]/.test(pattern)) return 'second';
  if (/%[-_0]?[MHIpXr]/.test(pattern)) return 'minute';
  if (/%[-_0]?[dejaAwuxDUVW]/.test(pattern)) return 'day';
  if (/%[-_0]?[mbBq]/.test(pattern)) return 'month';
  return 'year';
}

/** The numbers written in a text, without leading zeros: "01/03/2026" and "1/3/2026" both give "1 3 2026". */
function numbersOf(text: string): string {
  return (text.match(/\d+/g) ?? []).map(Number).join(' ');
}

/**
 * A reader for a `fields.<col>.format` d3-time-format pattern ("%d/%m/%Y"), parsed in UTC
 * (utcParse, never the machine's zone) with English month and day names.
 */
export function patternReader(pattern: string): DateReader {
  const locale = englishLocale();
  const [parse, format] = [locale.utcParse(pattern), locale.utcFormat(pattern)];
  const grain = patternGrain(pattern);
  return (text) => {
    const d = parse(text.trim());
    // utcParse rolls over ("32/01" is 1 February): the numbers must survive writing the date back.
    return d === null || Number.isNaN(d.getTime()) || numbersOf(format(d)) !== numbersOf(text) ? undefined : { time: d.getTime(), grain };
  };
}

/** The date patterns of a brief's temporal fields, by own column name. */
export function datePatterns(fields: Record<string, FieldHint>): Map<string, string> {
  return new Map(Object.entries(fields).flatMap(([k, v]) => (v?.type === 'temporal' && typeof v.format === 'string' ? [[k, v.format] as [string, string]] : [])));
}

const SLASH_DATE = /^\d{1,4}[/.]\d{1,2}[/.]\d{1,4}$/;

/** Whether every present text looks like a slash (or dotted) date, whose day–month order only the brief can say. */
export function slashDates(texts: readonly (string | null)[]): boolean {
  const present = texts.filter((t): t is string => t !== null && t !== '');
  return present.length > 0 && present.every((t) => SLASH_DATE.test(t) && (t.includes('/') || /^\d{1,2}\.\d{1,2}\.\d{4}$/.test(t)));
}
