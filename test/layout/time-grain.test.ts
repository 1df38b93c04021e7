import { utcMonth, utcYear } from 'd3-time';
import { describe, expect, it } from 'vitest';
import { monthUnits, timeScale } from '../../src/layout/time-scale.js';

const t = (iso: string) => Date.parse(iso);

describe('time scale at the data\'s grain', () => {
  // External check: with a month floor the ticks are d3-time's own utcMonth intervals
  // (d3-time 3.1, utcMonth.every(k).range), never days or weeks between the data's months.
  it('ticks monthly data on months only, as d3-time\'s utcMonth does, however few the months', () => {
    const s = timeScale([t('2025-01-01T00:00Z'), t('2025-03-01T00:00Z')], [0, 600], 7, 'month');
    expect(s.grain).toBe('month');
    expect(s.ticks).toEqual(utcMonth.range(new Date(t('2025-01-01T00:00Z')), new Date(t('2025-03-01T00:00Z') + 1)).map((d) => d.getTime()));
    expect(s.labels).toEqual(['Jan 2025', 'Feb', 'Mar']);
    const days = timeScale([t('2025-01-01T00:00Z'), t('2025-03-01T00:00Z')], [0, 600], 7);
    expect(days.grain).not.toBe('month');
  });

  // External check: yearly data gets d3-time's utcYear ticks (d3-time 3.1, utcYear.range).
  it('ticks yearly data on years only', () => {
    const s = timeScale([t('2019-01-01T00:00Z'), t('2022-01-01T00:00Z')], [0, 600], 12, 'year');
    expect(s.ticks).toEqual(utcYear.range(new Date(t('2019-01-01T00:00Z')), new Date(t('2022-01-01T00:00Z') + 1)).map((d) => d.getTime()));
    expect(s.labels).toEqual(['2019', '2020', '2021', '2022']);
  });

  it('gives every month the same width at month grain, and true time below it', () => {
    const s = timeScale([t('2025-01-01T00:00Z'), t('2025-12-01T00:00Z')], [0, 1100], 12, 'month');
    const starts = utcMonth.range(new Date(t('2025-01-01T00:00Z')), new Date(t('2025-12-01T00:00Z') + 1)).map((d) => s.map(d.getTime()));
    starts.forEach((x, i) => expect(x).toBeCloseTo(i * 100, 9));
    const days = timeScale([t('2025-01-01T00:00Z'), t('2025-03-01T00:00Z')], [0, 59], 5, 'day');
    // 31 days of January, 28 of February: true time.
    expect(days.map(t('2025-02-01T00:00Z'))).toBeCloseTo(31, 9);
  });

  it('counts months from year 0, with years below 100 read as written', () => {
    expect(monthUnits(Date.UTC(2025, 1, 1))).toBe(2025 * 12 + 1);
    expect(monthUnits(new Date(0).setUTCFullYear(50, 6, 1))).toBe(50 * 12 + 6);
    expect(monthUnits(Date.UTC(2025, 1, 15))).toBeCloseTo(2025 * 12 + 1 + 14 / 28, 12);
  });
});
