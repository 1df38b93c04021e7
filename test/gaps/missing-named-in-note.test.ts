import { describe, expect, it } from 'vitest';
import { dumpScene } from '../../src/scene/dump.js';
import { DENSE_ITEMS } from '../../src/choose/rules.js';
import { renderRows } from '../helpers.js';

const notes = (r: Awaited<ReturnType<typeof renderRows>>) => dumpScene(r.scene!).texts.filter((t) => t.role === 'note').map((t) => t.text).join(' ');
const points = (r: Awaited<ReturnType<typeof renderRows>>) => dumpScene(r.scene!).marks.filter((m) => m.role === 'point');

describe('what a chart leaves out for want of a value is named in its note', () => {
  it('grouped bars name each key and group with no bar ("No data: North / 2025")', async () => {
    const rows = [{ k: 'North', g: '2024', v: 3 }, { k: 'North', g: '2025', v: null }, { k: 'South', g: '2024', v: 4 }, { k: 'South', g: '2025', v: 6 }, { k: 'East', g: '2024', v: 2 }];
    const r = await renderRows({ intent: 'compare', keys: ['k', 'g'], values: 'v', fields: { v: { unit: 'boats' } } }, rows);
    expect(r.ok).toBe(true);
    expect(r.scene!.form).toBe('grouped-bar');
    expect(notes(r)).toMatch(/No data: (North \/ 2025, East \/ 2025|East \/ 2025, North \/ 2025)\./);
  });

  it('a dumbbell with one end missing keeps its known dot, no joining line, and the note says which end is missing', async () => {
    const towns = [{ town: 'Ash', jan: 2, jul: 18 }, { town: 'Bay', jan: 4, jul: null }, { town: 'Cove', jan: null, jul: 21 }, { town: 'Dell', jan: null, jul: null }];
    const r = await renderRows({ intent: 'compare', keys: 'town', values: ['jan', 'jul'], fields: { jan: { unit: '°C' }, jul: { unit: '°C' } } }, towns);
    expect(r.ok).toBe(true);
    const byTown = (t: string) => points(r).filter((p) => p.datum!.town === t);
    expect(byTown('Bay').map((p) => p.datum!.value)).toEqual(['jan']);
    expect(byTown('Cove').map((p) => p.datum!.value)).toEqual(['jul']);
    expect(byTown('Dell')).toHaveLength(0);
    const lines = dumpScene(r.scene!).marks.filter((m) => m.role === 'line').map((m) => m.datum!.town);
    expect(lines).toEqual(['Ash']);
    expect(notes(r)).toContain('No data: Dell.');
    expect(notes(r)).toMatch(/one value only: .*Bay \(no Jul\).*Cove \(no Jan\)|one value only: .*Cove \(no Jan\).*Bay \(no Jul\)/);
  });

  it('a slope chart names the items it leaves out for a value at only one end', async () => {
    const rows = [{ k: 'A', p: '2024', v: 3 }, { k: 'A', p: '2025', v: 5 }, { k: 'B', p: '2024', v: 7 }, { k: 'B', p: '2025', v: 4 }, { k: 'C', p: '2024', v: 6 }];
    const r = await renderRows({ intent: 'shift', keys: ['k', 'p'], values: 'v', fields: { v: { unit: 'points' } } }, rows);
    expect(r.ok).toBe(true);
    expect(r.scene!.form).toBe('slope');
    expect(notes(r)).toContain('Not drawn, with a value at only one of 2024 and 2025: C.');
  });

  it('a dense layout names keys with no value, shortened to a count when long, and counts keyless rows left out', async () => {
    // One meter in 100 has no reading: more than the six names a note lists.
    const meters = Array.from({ length: DENSE_ITEMS + 100 }, (_, i) => ({ meter: `M${i}`, litres: i % 100 === 7 ? null : (i * 37) % 101 }));
    const blank = meters.filter((m) => m.litres === null).length;
    const r = await renderRows({ intent: 'compare', keys: 'meter', values: 'litres', fields: { litres: { unit: 'litres' } } }, meters);
    expect(r.ok).toBe(true);
    expect(r.scene!.form).toBe('dense');
    expect(notes(r)).toContain(`No data: M7, M107, M207, M307, M407, M507 and ${blank - 6} more meter values.`);
    const keyless = await renderRows({ intent: 'distribution', values: 'litres', form: 'dense', fields: { litres: { unit: 'litres' } } }, meters);
    expect(keyless.ok).toBe(true);
    expect(notes(keyless)).toContain(`${blank} rows have no value and are not drawn.`);
  });
});
