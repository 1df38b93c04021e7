import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { capSentences, percentChange, trendReading } from '../../src/forms/alt-words.js';
import { renderRows, runs } from '../helpers.js';

const months = (values: readonly number[]) => values.map((v, i) => ({ month: `2025-${String(i + 1).padStart(2, '0')}`, riders: v }));
const fields = { riders: { unit: 'riders' } };

describe('alt text readings', () => {
  it('a trend says rose or fell by the sign of last − first, whatever lies between (property)', async () => {
    const value = fc.integer({ min: 1, max: 100_000 });
    await fc.assert(fc.asyncProperty(fc.array(value, { minLength: 2, maxLength: 12 }), async (values) => {
      const r = await renderRows({ intent: 'trend', keys: 'month', values: 'riders', fields }, months(values));
      expect(r.ok).toBe(true);
      const [first, last] = [values[0]!, values[values.length - 1]!];
      const verb = last > first ? 'rose' : last < first ? 'fell' : 'was unchanged';
      expect(r.scene!.alt).toContain(`: ${verb} `);
      expect(r.scene!.alt).not.toMatch(last > first ? /: fell / : last < first ? /: rose / : /: (rose|fell) /);
    }), { numRuns: runs(25) });
  });

  it('period-over-period bars name the biggest rise and fall and the last change', async () => {
    // Changes by hand: 100 → 120 is +20 %, 120 → 90 is −25 %, 90 → 99 is +10 %.
    const r = await renderRows({ intent: 'change', keys: 'month', values: 'riders', index: { base: 'previous' }, fields }, months([100, 120, 90, 99]));
    expect(r.choice!.form).toBe('change-bar');
    expect(r.scene!.alt).toContain('biggest rise Feb 2025 (20 %), biggest fall Mar 2025 (\u221225 %)');
    expect(r.scene!.alt).toContain('The last, Apr 2025, rose 10 %.');
  });

  it('a value that is not zero never reads 0, in the chart\'s own number format', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'pier', values: 'crossings', fields: { crossings: { unit: 'crossings' } } }, [{ pier: 'North', crossings: 500 }, { pier: 'South', crossings: 0.001 }]);
    expect(r.scene!.alt).toContain('smallest South (0.001)');
    expect(r.scene!.alt).not.toMatch(/\(0\)/);
  });

  it('a schedule of hours reads its lengths in hours, never "0 days"', async () => {
    const r = await renderRows({ intent: 'schedule', keys: 'task', start: 'start', end: 'end' }, [{ task: 'A', start: '2026-01-01T08:00:00Z', end: '2026-01-01T10:00:00Z' }, { task: 'B', start: '2026-01-01T10:00:00Z', end: '2026-01-01T11:30:00Z' }]);
    // 08:00 to 11:30 is 3.5 hours; A, 08:00 to 10:00, is the longest at 2 hours.
    expect(r.scene!.alt).toContain('3.5 hours in all: the longest task is A (2 hours)');
    expect(r.scene!.alt).not.toContain('0 days');
  });

  it('the brief\'s description replaces the generated alt text, in the scene and the SVG', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'pier', values: 'crossings', description: 'Piers by crossings.', fields: { crossings: { unit: 'crossings' } } }, [{ pier: 'North', crossings: 5 }, { pier: 'South', crossings: 3 }]);
    expect(r.scene!.alt).toBe('Piers by crossings.');
    expect(r.svg).toContain('>Piers by crossings.</desc>');
  });

  it('missing values are said: the chart\'s note on keys with no data is part of the alt text', async () => {
    const r = await renderRows({ intent: 'compare', keys: 'pier', values: 'crossings', accept: ['derive.missing-values'], fields: { crossings: { unit: 'crossings' } } }, [{ pier: 'North', crossings: 5 }, { pier: 'South', crossings: 3 }, { pier: 'West', crossings: null }]);
    expect(r.scene!.alt).toMatch(/No data: West\./);
  });

  it('percent changes: whole percents from 100, two significant digits below, none from or across zero', () => {
    expect(percentChange(1200, 1704)).toBe('42%');
    expect(percentChange(100, 301.9)).toBe('202%');
    expect(percentChange(1000, 1000.4)).toBe('0.04%');
    expect(percentChange(0, 5)).toBeUndefined();
    expect(percentChange(-2, 5)).toBeUndefined();
  });

  it('a trend names its peak only when it lies above both ends', () => {
    const fmt = (n: number) => String(n);
    expect(trendReading({ value: 1200, at: 'Jan 2024' }, { value: 1704, at: 'Dec 2025' }, { value: 1910, at: 'Aug 2025' }, fmt)).toBe('rose 42% from 1200 in Jan 2024 to 1704 in Dec 2025, peaking at 1910 in Aug 2025');
    expect(trendReading({ value: 5, at: 'a' }, { value: 4, at: 'b' }, { value: 5, at: 'a' }, fmt)).toBe('fell 20% from 5 in a to 4 in b');
  });

  it('capped text keeps whole sentences and ends by counting those left out', () => {
    const sentences = Array.from({ length: 30 }, (_, i) => `Sentence number ${i} is here.`);
    const text = capSentences(sentences, 120);
    expect(text.length).toBeLessThanOrEqual(120);
    const kept = text.match(/Sentence number \d+ is here\./g)!.length;
    expect(text.endsWith(`(${30 - kept} more sentences left out.)`)).toBe(true);
    expect(capSentences(['Short.', 'Also short.'], 120)).toBe('Short. Also short.');
  });
});
