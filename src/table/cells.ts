import { splitAffix } from './affix.js';
import type { DateGrain } from './types.js';

/** Cell texts read as "no value" in any column (common practice in CSV exports from R, spreadsheets and databases). */
const MISSING_TOKENS = new Set(['', 'na', 'n/a', 'null', 'nan', 'none', '#n/a', '-']);

/** True for a cell that means "no value". */
export function isMissingText(text: string): boolean {
  // No token starts with a digit: the numbers of a large table skip the copying.
  const first = text.charCodeAt(0);
  if (first >= 48 && first <= 57) return false;
  return MISSING_TOKENS.has(text.trim().toLowerCase());
}

/**
 * A cell's text on one line: line breaks, tabs and other control characters become one space
 * each run, since a chart label is drawn on one line and a control character has no glyph.
 */
export function oneLine(text: string): string {
  // Tested first: a table of a million cells has almost none, and replace() would copy each.
  return CONTROL.test(text) ? text.replace(CONTROL_RUN, ' ').trim() : text.trim();
}
/** C0 and C1 controls and the Unicode line and paragraph separators. */
const CONTROLS = '[\\u0000-\\u001f\\u007f-\\u009f\\u2028\\u2029]';
const CONTROL = new RegExp(CONTROLS);
const CONTROL_RUN = new RegExp(` *${CONTROLS}+ *`, 'g');

/** The mark between a number's whole and fractional parts. */
export type DecimalMark = '.' | ',';

const PLAIN_NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;
const GROUPED_NUMBER = /^[+-]?\d{1,3}(,\d{3})+(\.\d+)?$/;
const COMMA_DECIMAL = /^[+-]?(\d+(,\d*)?|,\d+)([eE][+-]?\d+)?$/;
// A leading zero never starts a group: "0.125" is a decimal, not 125 grouped.
const DOT_GROUPED = /^[+-]?[1-9]\d{0,2}(\.\d{3})+(,\d+)?$/;
const INFINITE = /^[+-]?(inf|infinity)$/i;

/**
 * Reads a number cell: a finite number, `Infinity` for non-finite spellings, or undefined if not
 * a number. With a decimal point (the default) "1,234.5" groups thousands by commas; with a
 * decimal comma, as semicolon-separated files write numbers, "1.234,5" groups them by dots and
 * "1,25" is 1.25. A leading U+2212 minus sign (as chartwright writes it) reads as "-". A currency
 * or percent sign and thousands grouped by spaces are read past (see affix.ts).
 */
export function parseNumberText(text: string, decimal: DecimalMark = '.'): number | undefined {
  // Most cells of a large table are plain numbers: read them before the affix and grouping rules.
  if (decimal === '.' && PLAIN_NUMBER.test(text)) return Number(text);
  const t = splitAffix(text).core.replace(/^\u2212/, '-');
  if (decimal === '.') {
    if (PLAIN_NUMBER.test(t)) return Number(t);
    if (GROUPED_NUMBER.test(t)) return Number(t.replace(/,/g, ''));
  } else {
    if (COMMA_DECIMAL.test(t)) return Number(t.replace(',', '.'));
    if (DOT_GROUPED.test(t)) return Number(t.replace(/\./g, '').replace(',', '.'));
  }
  if (INFINITE.test(t)) return t.startsWith('-') ? -Infinity : Infinity;
  return undefined;
}

const ISO_DATE = /^(\d{4})-(\d{2})(?:-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(?:\.(\d{1,9}))?)?(Z|[+-]\d{2}:?\d{2})?)?)?$/;

/**
 * Epoch milliseconds of a UTC date-time. `Date.UTC` reads years 0–99 as 1900–1999, so the year
 * is set with `setUTCFullYear`, which takes it as given.
 */
function utcTime(year: number, month: number, day: number, hour = 0, minute = 0, second = 0, ms = 0): number {
  const d = new Date(0);
  d.setUTCFullYear(year, month - 1, day);
  d.setUTCHours(hour, minute, second, ms);
  return d.getTime();
}

function daysIn(year: number, month: number): number {
  return new Date(utcTime(year, month + 1, 0)).getUTCDate();
}

/**
 * Reads an ISO 8601 calendar date or date-time (`2026-10`, `2026-10-04`, `2026-10-04T06:30Z`).
 * A time without an offset is read as UTC, never as the machine's local time, so output does
 * not depend on where it is rendered.
 */
export function parseIsoDate(text: string): { time: number; grain: DateGrain } | undefined {
  const m = ISO_DATE.exec(text.trim());
  if (!m) return undefined;
  const [, y, mo, d, h, mi, s, frac, zone] = m;
  const year = Number(y);
  const month = Number(mo);
  const day = d === undefined ? 1 : Number(d);
  if (month < 1 || month > 12 || day < 1 || day > daysIn(year, month)) return undefined;
  const hour = h === undefined ? 0 : Number(h);
  const minute = mi === undefined ? 0 : Number(mi);
  const second = s === undefined ? 0 : Number(s);
  if (hour > 23 || minute > 59 || second > 59) return undefined;
  const ms = frac === undefined ? 0 : Math.round(Number(`0.${frac}`) * 1000);
  let time = utcTime(year, month, day, hour, minute, second, ms);
  if (zone && zone !== 'Z') {
    const sign = zone.startsWith('-') ? -1 : 1;
    const digits = zone.slice(1).replace(':', '');
    time -= sign * (Number(digits.slice(0, 2)) * 60 + Number(digits.slice(2))) * 60_000;
  }
  const grain: DateGrain = d === undefined ? 'month' : h === undefined ? 'day' : s === undefined ? 'minute' : 'second';
  return { time, grain };
}

/** Reads `true`/`false` in any case. */
export function parseBooleanText(text: string): boolean | undefined {
  const t = text.trim().toLowerCase();
  if (t === 'true') return true;
  if (t === 'false') return false;
  return undefined;
}
