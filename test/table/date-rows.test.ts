import { describe, expect, it } from 'vitest';
import { runInNewContext } from 'node:vm';
import { readTable } from '../../src/table/load.js';
import { columnOf } from '../../src/table/types.js';
import { memoryFiles } from '../helpers.js';

async function readRows(rows: Record<string, unknown>[]) {
  const r = await readTable({ kind: 'rows', rows }, {}, undefined, memoryFiles({}));
  if (!r.ok) throw new Error(JSON.stringify(r.diagnostics));
  return r.value;
}

// Issue 6: `Date` objects handed to the library as rows were refused as nested objects.
describe('Date objects in library rows', () => {
  it('are read as dates in UTC at the day grain when they fall on midnight UTC', async () => {
    const t = await readRows([{ day: new Date(Date.UTC(2025, 0, 1)), n: 1 }, { day: new Date(Date.UTC(2025, 0, 2)), n: 2 }]);
    const day = columnOf(t, 'day')!;
    expect(day.type).toBe('date');
    expect(day.grain).toBe('day');
    expect(day.values).toEqual([Date.UTC(2025, 0, 1), Date.UTC(2025, 0, 2)]);
  });

  it('keep their time of day to the millisecond', async () => {
    const times = [Date.UTC(2025, 0, 1, 6, 30), Date.UTC(2025, 0, 1, 6, 30, 15, 250)];
    const t = await readRows(times.map((time) => ({ at: new Date(time) })));
    expect(columnOf(t, 'at')!.type).toBe('date');
    expect(columnOf(t, 'at')!.values).toEqual(times);
  });

  it('are read when made in another realm (a vm context), as a worker or test runner may', async () => {
    const foreign = runInNewContext('new Date(Date.UTC(2024, 1, 29))') as Date;
    const t = await readRows([{ day: foreign }]);
    expect(columnOf(t, 'day')!.values).toEqual([Date.UTC(2024, 1, 29)]);
  });

  it('count an invalid Date as a missing cell, as NaN is', async () => {
    const t = await readRows([{ day: new Date(Date.UTC(2025, 0, 1)) }, { day: new Date(Number.NaN) }]);
    expect(columnOf(t, 'day')!.values).toEqual([Date.UTC(2025, 0, 1), null]);
  });
});
