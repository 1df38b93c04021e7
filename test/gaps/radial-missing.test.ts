import { describe, expect, it } from 'vitest';
import { dumpScene } from '../../src/scene/dump.js';
import { wholeCycle } from '../../src/fields/labels.js';
import { renderRows } from '../helpers.js';

const notes = (r: Awaited<ReturnType<typeof renderRows>>) => dumpScene(r.scene!).texts.filter((t) => t.role === 'note').map((t) => t.text).join(' ');
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];
const bars = (r: Awaited<ReturnType<typeof renderRows>>) => dumpScene(r.scene!).marks.filter((m) => m.role === 'bar');

describe('radial bars keep every place of the cycle', () => {
  // May has no row and March a blank value: both keep their place, 30° apart from their neighbours.
  const rows = MONTHS.filter((m) => m !== 'May').map((month, i) => ({ month, visits: month === 'Mar' ? null : 10 + i }));

  it('a month with no row or a blank value keeps its fixed angle: 12 places, 30° apart, Jan at 12 o\'clock', async () => {
    const r = await renderRows({ intent: 'cycle', keys: 'month', values: 'visits', fields: { visits: { unit: 'visits' } } }, rows);
    expect(r.ok).toBe(true);
    const marks = bars(r);
    expect(marks.map((m) => m.datum!.month)).toEqual(MONTHS);
    expect(marks.map((m) => m.angle)).toEqual(MONTHS.map((_, i) => i * 30));
  });

  it('a missing month is an empty, dashed sector with a null value, and the note names it ("No data: Mar, May.")', async () => {
    const r = await renderRows({ intent: 'cycle', keys: 'month', values: 'visits', fields: { visits: { unit: 'visits' } } }, rows);
    const empty = bars(r).filter((m) => m.datum!.visits === null);
    expect(empty.map((m) => m.datum!.month)).toEqual(['Mar', 'May']);
    for (const m of empty) {
      expect(m.fill).toBe(r.scene!.background);
      expect(m.dash?.length).toBeGreaterThan(0);
    }
    expect(notes(r)).toContain('No data: Mar, May.');
  });

  it('weekdays fill a week of 7 places; a declared order is kept whole', async () => {
    const week = await renderRows({ intent: 'cycle', keys: 'day', values: 'n', fields: { n: { unit: 'calls' } } }, ['Mon', 'Tue', 'Thu', 'Fri', 'Sat'].map((day, i) => ({ day, n: i + 1 })));
    expect(bars(week).map((m) => m.angle)).toHaveLength(7);
    expect(notes(week)).toContain('No data: Wed, Sun.');
    const shifts = ['early', 'day', 'late', 'night'];
    const declared = await renderRows({ intent: 'cycle', keys: 'shift', values: 'n', fields: { shift: { type: 'cyclic', order: shifts }, n: { unit: 'calls' } } }, [{ shift: 'early', n: 3 }, { shift: 'late', n: 4 }, { shift: 'night', n: 2 }]);
    expect(declared.ok).toBe(true);
    expect(bars(declared).map((m) => m.datum!.shift)).toEqual(shifts);
    expect(notes(declared)).toContain('No data: day.');
  });

  it('the whole cycle is written as the data writes it; compass points are not filled', () => {
    expect(wholeCycle(['MARCH', 'APRIL', 'JUNE'])).toHaveLength(12);
    expect(wholeCycle(['MARCH', 'APRIL', 'JUNE'])![0]).toBe('JANUARY');
    expect(wholeCycle(['mon', 'wed', 'fri'])).toEqual(['mon', 'tue', 'wed', 'thu', 'fri', 'sat', 'sun']);
    expect(wholeCycle(['N', 'E', 'S', 'W'])).toBeUndefined();
  });
});
