import { describe, expect, it } from 'vitest';
import { formatDate, inSentence, quarterName } from '../../src/fields/labels.js';
import { LOCALE_DEFS, monthName } from '../../src/fields/locales.js';
import { formatNumberIn, numberFormatIn, readNumber, tickFormatter, valueFormatter } from '../../src/layout/number-format.js';
import { timeLabels } from '../../src/layout/time-scale.js';

/**
 * The outside source is CLDR as the running Node's ICU carries it (Node 20: ICU 78, CLDR 48).
 * Intl serves here only as the reference to check our own table against; chartwright never
 * writes output through it. A Node built without full ICU has no German data: the checks
 * against it are then reported skipped, not passed.
 */
const hasGerman = new Intl.DateTimeFormat('de').resolvedOptions().locale.startsWith('de');
const utc = (y: number, m: number, d = 1) => Date.UTC(y, m, d);

/** The month as CLDR writes it beside a day (the "format" context, not the stand-alone one). */
function cldrMonth(locale: string, month: number, width: 'short' | 'long'): string {
  const parts = new Intl.DateTimeFormat(locale, { day: 'numeric', month: width, timeZone: 'UTC' }).formatToParts(utc(2026, month, 4));
  return parts.find((p) => p.type === 'month')!.value;
}

describe('the locale table against CLDR', () => {
  it.skipIf(!hasGerman)('German month names and abbreviations are CLDR 48\'s (de.xml, format context): Jan., Feb., März, …, Sept., Okt., Nov., Dez.', () => {
    for (let m = 0; m < 12; m++) {
      expect(LOCALE_DEFS.de.shortMonths[m]).toBe(cldrMonth('de', m, 'short'));
      expect(LOCALE_DEFS.de.months[m]).toBe(cldrMonth('de', m, 'long'));
    }
  });

  it.skipIf(!hasGerman)('weekday names, Sunday first, are CLDR 48\'s in both locales (So., Mo., …; Sun, Mon, …)', () => {
    // In the format context (beside a date), as a tick would write it. 1 March 2026 is a Sunday.
    const day = (locale: string, d: number, weekday: 'short' | 'long') => new Intl.DateTimeFormat(locale, { weekday, day: 'numeric', month: 'long', timeZone: 'UTC' })
      .formatToParts(utc(2026, 2, 1 + d)).find((p) => p.type === 'weekday')!.value;
    for (let d = 0; d < 7; d++) {
      expect(LOCALE_DEFS.de.shortDays[d]).toBe(day('de', d, 'short'));
      expect(LOCALE_DEFS.de.days[d]).toBe(day('de', d, 'long'));
      expect(LOCALE_DEFS.en.shortDays[d]).toBe(day('en-US', d, 'short'));
      expect(LOCALE_DEFS.en.days[d]).toBe(day('en-US', d, 'long'));
    }
  });

  it.skipIf(!hasGerman)('English month names are CLDR\'s en-US ones (Jan, Feb, …, Sep)', () => {
    for (let m = 0; m < 12; m++) {
      expect(LOCALE_DEFS.en.shortMonths[m]).toBe(cldrMonth('en-US', m, 'short'));
      expect(LOCALE_DEFS.en.months[m]).toBe(cldrMonth('en-US', m, 'long'));
    }
  });

  it.skipIf(!hasGerman)('German dates read as CLDR writes them: "1. März 2026", "Okt. 2026", "4. Okt."', () => {
    const de = (t: number, o: Intl.DateTimeFormatOptions) => new Intl.DateTimeFormat('de', { ...o, timeZone: 'UTC' }).format(t);
    for (let m = 0; m < 12; m++) {
      expect(formatDate(utc(2026, m, 1), 'day', 'de')).toBe(de(utc(2026, m, 1), { day: 'numeric', month: 'short', year: 'numeric' }));
      expect(formatDate(utc(2026, m), 'month', 'de')).toBe(de(utc(2026, m), { month: 'short', year: 'numeric' }));
      expect(timeLabels([utc(2026, m, 4)], 'day', 'de')).toEqual([de(utc(2026, m, 4), { day: 'numeric', month: 'short' })]);
    }
  });

  it.skipIf(!hasGerman)('German marks are CLDR\'s: "1.234,5", "12 %" (no-break space), "4,2 Mio.", "4,2 Mrd.", "4,2 Bio."', () => {
    const plain = new Intl.NumberFormat('de', { maximumFractionDigits: 2 });
    for (const n of [0.5, 12.25, 1234.5, 98765.43, 999999]) expect(formatNumberIn('de', n)).toBe(plain.format(n));
    expect(numberFormatIn('de', '.0%')(0.12)).toBe(new Intl.NumberFormat('de', { style: 'percent' }).format(0.12));
    const compact = new Intl.NumberFormat('de', { notation: 'compact', maximumSignificantDigits: 3 });
    for (const n of [4.2e6, 4.2e9, 4.2e12, 38.5e6]) expect(formatNumberIn('de', n)).toBe(compact.format(n));
  });
});

describe('writing in a locale', () => {
  it('the API for sentences: formatNumberIn and monthName', () => {
    expect(formatNumberIn('en', 4_200_000)).toBe('4.2m');
    expect(formatNumberIn('de', 4_200_000)).toBe('4,2\u00a0Mio.');
    expect(formatNumberIn('de', -1234.5)).toBe('\u22121.234,5');
    expect(formatNumberIn('de', 3_500_000, { unit: 'Wh' })).toBe('3,5 MWh');
    expect(monthName('de', 8)).toBe('Sept.');
    expect(monthName('de', 2, 'long')).toBe('März');
    expect(monthName('en', 9)).toBe('Oct');
  });

  it('German ticks in words: millions and up take Mio., Mrd., Bio.; thousands are written in digits (CLDR has no thousand word)', () => {
    const ticks = [0, 500_000, 1_000_000, 1_500_000];
    expect(ticks.map(tickFormatter(ticks, { locale: 'de' }))).toEqual(['0', '500.000', '1\u00a0Mio.', '1,5\u00a0Mio.']);
    expect(ticks.map(tickFormatter(ticks, { locale: 'en' }))).toEqual(['0', '500k', '1m', '1.5m']);
  });

  it('rounding that reaches the next step moves to it in German too (999.999.999 reads 1 Mrd.)', () => {
    expect(valueFormatter([999_999_999, 5], { locale: 'de' })(999_999_999)).toBe('1\u00a0Mrd.');
  });

  it('a user\'s d3-format specifier keeps its meaning and takes the locale\'s marks ("$" stays "$")', () => {
    expect(valueFormatter([1], { format: ',.2f', locale: 'de' })(1234.5)).toBe('1.234,50');
    expect(valueFormatter([1], { format: '$,.0f', locale: 'de' })(1234)).toBe('$1.234');
  });

  it('readNumber reads a label back in its locale\'s marks', () => {
    expect(readNumber('de', '\u22121.234,5')).toBe(-1234.5);
    expect(readNumber('en', '1,234.5')).toBe(1234.5);
  });

  it('time ticks in German: "Jan. 2025" then "Feb.", quarters as "Q1 2025" (CLDR abbreviated quarter)', () => {
    expect(timeLabels([utc(2025, 0), utc(2025, 1), utc(2025, 8), utc(2026, 0)], 'month', 'de')).toEqual(['Jan. 2025', 'Feb.', 'Sept.', 'Jan. 2026']);
    expect(timeLabels([utc(2025, 0), utc(2025, 3)], 'quarter', 'de')).toEqual(['Q1 2025', 'Q2 2025']);
    expect(quarterName(utc(2025, 6), 'de')).toBe('Q3 2025');
    expect(timeLabels([utc(2025, 0), utc(2025, 1)], 'month')).toEqual(['Jan 2025', 'Feb']);
  });

  it('a German month name keeps its capital inside an English sentence ("Index, März 2026 = 100" stays as written)', () => {
    expect(inSentence('März 2026')).toBe('März 2026');
    expect(inSentence('Okt. 2026')).toBe('Okt. 2026');
    expect(inSentence('Crossings')).toBe('crossings');
  });
});
