import type { Locale } from '../brief/types.js';

/**
 * How one locale writes the numbers and dates drawn on a chart: marks, scale words, month
 * names and date patterns. Our own table, never the machine's locale (Intl, toLocaleString):
 * the same brief must give the same bytes on every machine.
 */
export interface LocaleDef {
  name: Locale;
  /** The decimal mark. */
  decimal: string;
  /** The mark between groups of three digits. */
  thousands: string;
  /** What follows a number written as a percent (d3-format's `percent`): "%" or a no-break space and "%". */
  percent: string;
  /**
   * The scale words of `notation: words`, joined to the number as written: trillion, billion,
   * million and thousand, largest first; a step left out is written in digits.
   */
  steps: readonly { from: number; suffix: string }[];
  /** Month names, January first. */
  months: readonly string[];
  /** Month abbreviations as written beside a day or a year ("Oct 2026", "4. Okt."). */
  shortMonths: readonly string[];
  /** Weekday names and abbreviations, Sunday first (d3-time-format's order). */
  days: readonly string[];
  shortDays: readonly string[];
  /** d3-time-format patterns of the time axis: a tick at a day, a month with its year. */
  patterns: { day: string; monthYear: string };
  /** A date at day grain from its day, month (0-11) and year: "4 Oct 2026", "4. Okt. 2026". */
  date(day: number, month: number, year: string): string;
  /** A quarter and its year: "Q1 2025". */
  quarter(q: number, year: string): string;
}

/** No-break space: a number and its word or sign never part at a line end. */
const NBSP = '\u00a0';

const EN: LocaleDef = {
  name: 'en',
  decimal: '.',
  thousands: ',',
  percent: '%',
  steps: [{ from: 1e12, suffix: 'tn' }, { from: 1e9, suffix: 'bn' }, { from: 1e6, suffix: 'm' }, { from: 1e3, suffix: 'k' }],
  months: ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'],
  shortMonths: ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'],
  days: ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'],
  shortDays: ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'],
  patterns: { day: '%-d %b', monthYear: '%b %Y' },
  date: (d, m, y) => `${d} ${EN.shortMonths[m]} ${y}`,
  quarter: (q, y) => `Q${q} ${y}`,
};

/**
 * German, from CLDR 48 (de.xml, as in Node 20's ICU 78): decimal comma, thousands point,
 * "12 %" with a no-break space; months in the abbreviated format context ("Jan.", "März",
 * "Sept."), dates "d. MMM y" ("1. März 2026"), months with years "MMM y" ("Okt. 2026").
 * Scale words from CLDR's short compact decimals: "Mio.", "Mrd.", "Bio." (a German Billion is
 * 10¹², so "bn" would be misread, and "m" reads as metres); CLDR writes thousands in digits
 * ("4.200"), so there is no thousand step. Quarters as "Q1 2025" (CLDR's abbreviated quarter).
 * test/layout/locales.test.ts checks the names against the running Node's CLDR.
 */
const DE: LocaleDef = {
  name: 'de',
  decimal: ',',
  thousands: '.',
  percent: `${NBSP}%`,
  steps: [{ from: 1e12, suffix: `${NBSP}Bio.` }, { from: 1e9, suffix: `${NBSP}Mrd.` }, { from: 1e6, suffix: `${NBSP}Mio.` }],
  months: ['Januar', 'Februar', 'März', 'April', 'Mai', 'Juni', 'Juli', 'August', 'September', 'Oktober', 'November', 'Dezember'],
  shortMonths: ['Jan.', 'Feb.', 'März', 'Apr.', 'Mai', 'Juni', 'Juli', 'Aug.', 'Sept.', 'Okt.', 'Nov.', 'Dez.'],
  days: ['Sonntag', 'Montag', 'Dienstag', 'Mittwoch', 'Donnerstag', 'Freitag', 'Samstag'],
  shortDays: ['So.', 'Mo.', 'Di.', 'Mi.', 'Do.', 'Fr.', 'Sa.'],
  patterns: { day: '%-d. %b', monthYear: '%b %Y' },
  date: (d, m, y) => `${d}. ${DE.shortMonths[m]} ${y}`,
  quarter: (q, y) => `Q${q} ${y}`,
};

/** Every locale a brief may name, by name. */
export const LOCALE_DEFS: Readonly<Record<Locale, LocaleDef>> = { en: EN, de: DE };

/** The table of a locale; English when none is given. */
export function localeDef(locale: Locale | undefined): LocaleDef {
  return LOCALE_DEFS[locale ?? 'en'];
}

/** A month's name in a locale (month 0-11): its abbreviation by default, "Okt.", or its full name. */
export function monthName(locale: Locale | undefined, month: number, length: 'short' | 'long' = 'short'): string {
  const def = localeDef(locale);
  return (length === 'long' ? def.months : def.shortMonths)[month]!;
}
