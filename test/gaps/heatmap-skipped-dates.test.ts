import { describe, expect, it } from 'vitest';
import { dumpScene } from '../../src/scene/dump.js';
import { codes, renderRows } from '../helpers.js';

const notes = (r: Awaited<ReturnType<typeof renderRows>>) => dumpScene(r.scene!).texts.filter((t) => t.role === 'note').map((t) => t.text).join(' ');
const cells = (r: Awaited<ReturnType<typeof renderRows>>) => dumpScene(r.scene!).marks.filter((m) => m.role === 'cell');
const ROOMS = ['Hall', 'Loft', 'Cellar'];

/** Readings per day and room; `skip` days have no row at all. */
function readings(days: string[], skip: string[]) {
  return days.filter((d) => !skip.includes(d)).flatMap((day, i) => ROOMS.map((room, j) => ({ day, room, kwh: 3 + i + j })));
}
const JUNE = ['2025-06-02', '2025-06-03', '2025-06-04', '2025-06-05', '2025-06-06', '2025-06-07', '2025-06-08'];

describe('a heat map over dates keeps a date with no rows at all', () => {
  it('a skipped day is put back as a row of missing (hatched) cells in its place, warned about and named in the note', async () => {
    const r = await renderRows({ intent: 'matrix', keys: ['day', 'room'], values: 'kwh', order: 'label', fields: { kwh: { unit: 'kWh' } } }, readings(JUNE, ['2025-06-04']));
    expect(r.ok).toBe(true);
    expect(codes(r)).toContain('derive.uneven-dates');
    const days = [...new Set(cells(r).map((c) => c.datum!.day))];
    expect(days).toHaveLength(7);
    expect(days[2]).toBe('4 Jun 2025');
    const gap = cells(r).filter((c) => c.datum!.day === '4 Jun 2025');
    expect(gap).toHaveLength(3);
    for (const c of gap) expect(c.datum!.kwh).toBeNull();
    expect(notes(r)).toContain('No rows for 4 Jun 2025: drawn as a row of hatched cells.');
  });

  it('dates at a regular grain with no skipped period add no row and no warning', async () => {
    const r = await renderRows({ intent: 'matrix', keys: ['day', 'room'], values: 'kwh', order: 'label', fields: { kwh: { unit: 'kWh' } } }, readings(JUNE, []));
    expect(r.ok).toBe(true);
    expect(codes(r)).not.toContain('derive.uneven-dates');
    expect(notes(r)).not.toMatch(/No rows for/);
  });

  it('business days do not skip their weekends', async () => {
    const weekdays = ['2025-06-05', '2025-06-06', '2025-06-09', '2025-06-10', '2025-06-11', '2025-06-12', '2025-06-13', '2025-06-16'];
    const r = await renderRows({ intent: 'matrix', keys: ['day', 'room'], values: 'kwh', order: 'label', fields: { kwh: { unit: 'kWh' } } }, readings(weekdays, []));
    expect(codes(r)).not.toContain('derive.uneven-dates');
    expect(new Set(cells(r).map((c) => c.datum!.day)).size).toBe(8);
  });
});
