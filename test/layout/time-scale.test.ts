import { utcDay, utcHour, utcMonday, utcMonth, utcYear } from 'd3-time';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { timeScale } from '../../src/layout/time-scale.js';
import { runs } from '../helpers.js';

const t = (iso: string) => Date.parse(iso);

/**
 * Labels as a reader takes them: a month without a year belongs to the year last printed,
 * a clock time to the day last printed.
 */
function inContext(labels: readonly string[]): string[] {
  let context = '';
  return labels.map((l) => {
    if (/\d{4}$/.test(l) || /^\d+ [A-Z][a-z]{2}$/.test(l)) { context = l; return l; }
    return `${l} (${context})`;
  });
}

describe('time scale', () => {
  it('labels years as the year alone', () => {
    const s = timeScale([t('2015-03-01T00:00Z'), t('2025-06-01T00:00Z')], [0, 500], 5);
    expect(s.grain).toBe('year');
    expect(s.labels).toEqual(['2016', '2018', '2020', '2022', '2024']);
  });

  it('labels quarters as "Q1 2025"', () => {
    const s = timeScale([t('2024-01-01T00:00Z'), t('2025-12-31T00:00Z')], [0, 800], 8);
    expect(s.grain).toBe('quarter');
    expect(s.labels).toEqual(['Q1 2024', 'Q2 2024', 'Q3 2024', 'Q4 2024', 'Q1 2025', 'Q2 2025', 'Q3 2025', 'Q4 2025']);
  });

  it('labels months with the year only on the first tick and where the year changes', () => {
    const s = timeScale([t('2024-11-15T00:00Z'), t('2025-10-20T00:00Z')], [0, 600], 11);
    expect(s.grain).toBe('month');
    expect(s.labels).toEqual(['Dec 2024', 'Jan 2025', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct']);
  });

  it('labels days as "4 Oct"', () => {
    const s = timeScale([t('2025-10-01T00:00Z'), t('2025-10-08T00:00Z')], [0, 600], 7);
    expect(s.grain).toBe('day');
    expect(s.labels).toEqual(['1 Oct', '2 Oct', '3 Oct', '4 Oct', '5 Oct', '6 Oct', '7 Oct', '8 Oct']);
  });

  it('labels hours as "06:00", and a tick at midnight with its day', () => {
    const s = timeScale([t('2025-10-04T00:00Z'), t('2025-10-04T23:59Z')], [0, 600], 4);
    expect(s.grain).toBe('hour');
    expect(s.labels).toEqual(['4 Oct', '06:00', '12:00', '18:00']);
  });

  it('maps the domain linearly onto the range, reversed ranges included', () => {
    const s = timeScale([t('2025-01-01T00:00Z'), t('2025-01-11T00:00Z')], [100, 0], 5);
    expect(s.map(t('2025-01-01T00:00Z'))).toBe(100);
    expect(s.map(t('2025-01-11T00:00Z'))).toBe(0);
    expect(s.map(t('2025-01-06T00:00Z'))).toBeCloseTo(50, 9);
    expect(s.kind).toBe('time');
  });

  it('gives a one-instant domain the middle of the range and a non-finite domain no ticks', () => {
    const d = t('2025-01-01T00:00Z');
    expect(timeScale([d, d], [0, 100], 5).map(d)).toBe(50);
    expect(timeScale([Number.NaN, d], [0, 100], 5).ticks).toEqual([]);
  });

  // External check: the ticks are exactly d3-time's own UTC interval ranges (d3-time 3.1,
  // interval.every(k).range(start, stop)), so the calendar arithmetic is d3-time's, not ours.
  it('ticks equal d3-time\'s UTC interval ranges', () => {
    const cases: [string, string, number, (a: Date, b: Date) => Date[]][] = [
      ['2015-03-01T00:00Z', '2025-06-01T00:00Z', 5, (a, b) => utcYear.every(2)!.range(a, b)],
      ['2024-01-01T00:00Z', '2025-12-31T00:00Z', 8, (a, b) => utcMonth.every(3)!.range(a, b)],
      ['2024-11-15T00:00Z', '2025-10-20T00:00Z', 11, (a, b) => utcMonth.range(a, b)],
      ['2024-01-10T00:00Z', '2025-01-10T00:00Z', 6, (a, b) => utcMonth.every(2)!.range(a, b)],
      ['2025-09-01T00:00Z', '2025-11-30T00:00Z', 12, (a, b) => utcMonday.range(a, b)],
      ['2025-10-01T00:00Z', '2025-10-08T00:00Z', 7, (a, b) => utcDay.range(a, b)],
      ['2025-10-04T00:00Z', '2025-10-04T23:59Z', 4, (a, b) => utcHour.every(6)!.range(a, b)],
    ];
    for (const [from, to, n, reference] of cases) {
      const s = timeScale([t(from), t(to)], [0, 100], n);
      expect(s.ticks, `${from}–${to}`).toEqual(reference(new Date(t(from)), new Date(t(to) + 1)).map((d) => d.getTime()));
      expect(s.ticks.length).toBeGreaterThan(1);
    }
  });

  // Regression guard for labels taken from local time: at UTC+14 and UTC−3:30 a local
  // formatter moves midnight UTC to another day, month or year.
  it('labels the same in any time zone', () => {
    const saved = process.env.TZ;
    const jan1 = Date.UTC(2025, 0, 1);
    const labelsIn = (zone: string) => {
      process.env.TZ = zone;
      // Proves the zone took effect in this process, so the comparison below can fail.
      const localDay = new Date(jan1).getDate();
      const scales = [
        timeScale([t('2024-11-15T00:00Z'), t('2025-10-20T00:00Z')], [0, 600], 11),
        timeScale([t('2025-10-01T00:00Z'), t('2025-10-08T00:00Z')], [0, 600], 7),
        timeScale([t('2025-10-04T00:00Z'), t('2025-10-04T23:59Z')], [0, 600], 4),
        timeScale([t('2024-01-01T00:00Z'), t('2025-12-31T00:00Z')], [0, 800], 8),
      ];
      return { localDay, labels: scales.map((s) => s.labels) };
    };
    try {
      const east = labelsIn('Pacific/Kiritimati');
      const west = labelsIn('America/St_Johns');
      expect([east.localDay, west.localDay]).toEqual([1, 31]);
      const expected = [
        ['Dec 2024', 'Jan 2025', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct'],
        ['1 Oct', '2 Oct', '3 Oct', '4 Oct', '5 Oct', '6 Oct', '7 Oct', '8 Oct'],
        ['4 Oct', '06:00', '12:00', '18:00'],
        ['Q1 2024', 'Q2 2024', 'Q3 2024', 'Q4 2024', 'Q1 2025', 'Q2 2025', 'Q3 2025', 'Q4 2025'],
      ];
      expect(east.labels).toEqual(expected);
      expect(west.labels).toEqual(expected);
    } finally {
      if (saved === undefined) delete process.env.TZ; else process.env.TZ = saved;
    }
  });

  it('ticks are ascending, inside the domain, distinctly labelled in context, and near the count asked for', () => {
    const start = Date.UTC(1990, 0, 1);
    const end = Date.UTC(2040, 0, 1);
    fc.assert(fc.property(
      fc.integer({ min: start, max: end }), fc.integer({ min: 2 * 3_600_000, max: 20 * 365 * 86_400_000 }), fc.integer({ min: 2, max: 12 }),
      (lo, span, n) => {
        const s = timeScale([lo, lo + span], [0, 500], n);
        expect(s.labels).toHaveLength(s.ticks.length);
        for (let i = 0; i < s.ticks.length; i++) {
          expect(s.ticks[i]!).toBeGreaterThanOrEqual(lo);
          expect(s.ticks[i]!).toBeLessThanOrEqual(lo + span);
          if (i > 0) expect(s.ticks[i]!).toBeGreaterThan(s.ticks[i - 1]!);
        }
        expect(new Set(inContext(s.labels)).size).toBe(s.labels.length);
        // The step is the calendar step nearest span / n, so the count stays within a factor of 3 of n.
        expect(s.ticks.length).toBeGreaterThanOrEqual(Math.floor(n / 3));
        expect(s.ticks.length).toBeLessThanOrEqual(3 * n + 1);
      },
    ), { numRuns: runs(300) });
  });
});
