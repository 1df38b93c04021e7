import { describe, expect, it } from 'vitest';
import { firstUnevenStep } from '../../src/derive/dates.js';
import { codes, renderRows } from '../helpers.js';

const day = (y: number, m: number, d = 1) => Date.UTC(y, m - 1, d);
const firstOfMonths = (count: number, every: number) => Array.from({ length: count }, (_, i) => day(2025 + Math.floor((i * every) / 12), ((i * every) % 12) + 1));
const iso = (t: number) => new Date(t).toISOString().slice(0, 10);

describe('first-of-period dates step in calendar units', () => {
  it('monthly first-of-month days (28 to 31 days apart) are even', () => {
    expect(firstUnevenStep(firstOfMonths(14, 1), 'day')).toBeUndefined();
  });

  it('quarterly and yearly first-of-period days are even', () => {
    expect(firstUnevenStep(firstOfMonths(8, 3), 'day')).toBeUndefined();
    expect(firstUnevenStep([2019, 2020, 2021, 2022, 2023].map((y) => day(y, 1)), 'day')).toBeUndefined();
  });

  it('a month skipped in first-of-month days is still an uneven step, counted in months', () => {
    const times = firstOfMonths(8, 1).filter((_, i) => i !== 4);
    expect(firstUnevenStep(times, 'day')).toMatchObject({ after: day(2025, 4), step: 2, usual: 1, grain: 'month' });
  });

  it('days that are not all first of the month are still counted in days', () => {
    expect(firstUnevenStep([day(2025, 1, 1), day(2025, 1, 2), day(2025, 1, 3), day(2025, 1, 5)], 'day')).toMatchObject({ step: 2, usual: 1, grain: 'day' });
  });
});

describe('monthly data keyed by first-of-month days passes --strict', () => {
  const rows = (times: number[]) => times.map((t, i) => ({ month: iso(t), riders: 10 + (i % 4) }));
  const brief = { keys: 'month', values: 'riders', fields: { riders: { unit: 'riders' } } };

  it('a bar chart of twelve first-of-month days raises no uneven-dates warning', async () => {
    const r = await renderRows({ intent: 'compare', ...brief }, rows(firstOfMonths(12, 1)), { strict: true });
    expect(codes(r)).not.toContain('derive.uneven-dates');
    expect(r.scene).toBeDefined();
  });

  it('a line of twelve first-of-month days raises no uneven-dates warning and draws one unbroken line', async () => {
    const r = await renderRows({ intent: 'trend', ...brief }, rows(firstOfMonths(12, 1)), { strict: true });
    expect(codes(r)).not.toContain('derive.uneven-dates');
    expect(r.scene).toBeDefined();
  });

  it('a truly skipped month is still warned, in bars and in lines', async () => {
    const skipped = rows(firstOfMonths(12, 1).filter((_, i) => i !== 5));
    for (const intent of ['compare', 'trend']) {
      const r = await renderRows({ intent, ...brief }, skipped);
      expect(r.diagnostics.find((d) => d.code === 'derive.uneven-dates'), intent).toMatchObject({ field: 'month' });
    }
  });
});
