import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { patternReader, readDateText } from '../../src/table/date-format.js';
import { parsePeriod } from '../../src/table/periods.js';
import { runs } from '../helpers.js';

// Expected times are written with Date.UTC, independently of the parser (years ≥ 100 only).
const utc = (y: number, m: number, d = 1) => Date.UTC(y, m - 1, d);

describe('period spellings read as the UTC start of the period', () => {
  it('month-year in English names: "Jan 2025" and "March 2026" are month-grain dates', () => {
    expect(parsePeriod('Jan 2025')).toEqual({ time: utc(2025, 1), grain: 'month' });
    expect(parsePeriod('March 2026')).toEqual({ time: utc(2026, 3), grain: 'month' });
    expect(parsePeriod('dec 1999')).toEqual({ time: utc(1999, 12), grain: 'month' });
  });

  it('the abbreviation "Sept" is September', () => {
    expect(parsePeriod('Sept 2025')).toEqual({ time: utc(2025, 9), grain: 'month' });
    expect(parsePeriod('Sep 2025')).toEqual(parsePeriod('Sept 2025'));
  });

  it('quarters "2025-Q1", "2025 Q1" and "Q1 2026" start on the quarter\'s first month', () => {
    expect(parsePeriod('2025-Q1')).toEqual({ time: utc(2025, 1), grain: 'month', quarter: true });
    expect(parsePeriod('2025 Q3')).toEqual({ time: utc(2025, 7), grain: 'month', quarter: true });
    expect(parsePeriod('Q1 2026')).toEqual({ time: utc(2026, 1), grain: 'month', quarter: true });
    expect(parsePeriod('Q4 2026')).toEqual({ time: utc(2026, 10), grain: 'month', quarter: true });
    expect(parsePeriod('Q5 2026')).toBeUndefined();
  });

  it('ISO weeks "2026-W05" start on their Monday, week 1 holding 4 January', () => {
    // ISO 8601: 1 Jan 2026 is a Thursday, so week 1 starts Monday 29 Dec 2025 and W05 on 26 Jan 2026.
    expect(parsePeriod('2026-W05')).toEqual({ time: utc(2026, 1, 26), grain: 'day' });
    expect(parsePeriod('2026-W01')).toEqual({ time: utc(2025, 12, 29), grain: 'day' });
    // 2026 (starting on a Thursday) has 53 ISO weeks; 2025 (starting on a Wednesday) has 52.
    expect(parsePeriod('2026-W53')).toEqual({ time: utc(2026, 12, 28), grain: 'day' });
    expect(parsePeriod('2025-W53')).toBeUndefined();
    expect(parsePeriod('2026-W00')).toBeUndefined();
  });

  it('chartwright\'s own tick format "1 Mar 2026" reads back as that day', () => {
    expect(parsePeriod('1 Mar 2026')).toEqual({ time: utc(2026, 3, 1), grain: 'day' });
    expect(parsePeriod('29 Feb 2025')).toBeUndefined();
    expect(parsePeriod('29 Feb 2024')).toEqual({ time: utc(2024, 2, 29), grain: 'day' });
  });

  it('leaves words that are not months, and plain text, unread', () => {
    expect(['Mayo 2025', 'Foo 2025', 'Jan', '2025', 'Q1', 'North'].map(parsePeriod)).toEqual([undefined, undefined, undefined, undefined, undefined, undefined]);
  });

  it('reads the same text to the same epoch, through UTC APIs only (no dependence on the machine\'s zone)', () => {
    // Date.UTC and the parser agree for every month of a span of years; a local-time parse would be off by the zone.
    fc.assert(fc.property(fc.integer({ min: 1900, max: 2100 }), fc.integer({ min: 1, max: 12 }), (year, month) => {
      const name = new Date(utc(year, month)).toLocaleString('en', { month: 'long', timeZone: 'UTC' });
      expect(parsePeriod(`${name} ${year}`)!.time).toBe(utc(year, month));
      expect(parsePeriod(`${name.slice(0, 3)} ${year}`)!.time).toBe(utc(year, month));
    }), { numRuns: runs(200) });
  });
});

describe('a temporal field\'s format pattern', () => {
  it('reads "%d/%m/%Y" day first and "%m/%d/%Y" month first, in UTC', () => {
    expect(patternReader('%d/%m/%Y')('01/03/2026')).toEqual({ time: utc(2026, 3, 1), grain: 'day' });
    expect(patternReader('%m/%d/%Y')('01/03/2026')).toEqual({ time: utc(2026, 1, 3), grain: 'day' });
    expect(patternReader('%Y/%m/%d')('2026/03/01')).toEqual({ time: utc(2026, 3, 1), grain: 'day' });
  });

  it('reads month names in English whatever the default locale, and gives the pattern\'s grain', () => {
    expect(patternReader('%B %Y')('March 2026')).toEqual({ time: utc(2026, 3), grain: 'month' });
    expect(patternReader('%Y')('2026')).toEqual({ time: utc(2026, 1), grain: 'year' });
    expect(patternReader('%d.%m.%Y %H:%M')('04.10.2026 06:30')).toEqual({ time: Date.UTC(2026, 9, 4, 6, 30), grain: 'minute' });
  });

  it('leaves text that does not fit the pattern unread', () => {
    expect(patternReader('%d/%m/%Y')('2026-03-01')).toBeUndefined();
    expect(patternReader('%d/%m/%Y')('32/01/2026')).toBeUndefined();
  });

  it('the default reader takes ISO 8601 first, then the period spellings', () => {
    expect(readDateText('2025-03')).toEqual({ time: utc(2025, 3), grain: 'month' });
    expect(readDateText('Mar 2025')).toEqual({ time: utc(2025, 3), grain: 'month' });
  });
});
