import { describe, expect, it } from 'vitest';
import { dumpScene, type SceneDump } from '../../src/scene/dump.js';
import { codes, renderRows } from '../helpers.js';
import { checkLineContracts, lines } from './line-contracts.js';

const months = (list: string[], series: Record<string, (i: number) => number | null>) =>
  Object.entries(series).flatMap(([route, value]) => list.map((month, i) => ({ month, route, riders: value(i) })));

async function dumpOf(brief: Record<string, unknown>, rows: Record<string, unknown>[]): Promise<SceneDump> {
  const r = await renderRows({ fields: { riders: { unit: 'riders' } }, ...brief }, rows);
  expect(r.ok, JSON.stringify(r.diagnostics)).toBe(true);
  return dumpScene(r.scene!);
}

describe('line chart contracts', () => {
  it('places points at their time-scale x: a 3-month gap is 3 times a 1-month gap, within 0.5 px', async () => {
    const dump = await dumpOf({ intent: 'trend', keys: 'month', values: 'riders' }, months(['2025-01', '2025-02', '2025-05', '2025-06', '2025-07'], { A: (i) => 10 + i }));
    const xs = lines(dump)[0]!.points!.map((p) => p.x);
    const month = xs[1]! - xs[0]!;
    expect(Math.abs(xs[2]! - xs[1]! - 3 * month)).toBeLessThanOrEqual(0.5);
    // February (28 days) takes as much room as January (31): months are the unit of monthly data.
    expect(Math.abs(xs[4]! - xs[3]! - month)).toBeLessThanOrEqual(0.5);
    checkLineContracts(dump);
  });

  it('draws points in key order whatever the row order, one line per series in the palette\'s colours', async () => {
    const rows = months(['2025-03', '2025-01', '2025-02', '2025-04'], { A: (i) => i * 3, B: (i) => 20 - i, C: (i) => 5 + i });
    const dump = await dumpOf({ intent: 'trend', keys: ['month', 'route'], values: 'riders' }, rows);
    expect(lines(dump).map((l) => l.series)).toEqual([{ route: 'A' }, { route: 'B' }, { route: 'C' }]);
    for (const l of lines(dump)) expect(l.points!.map((p) => p.datum!.month)).toEqual(['Jan 2025', 'Feb 2025', 'Mar 2025', 'Apr 2025']);
    expect(new Set(lines(dump).map((l) => l.stroke)).size).toBe(3);
    checkLineContracts(dump);
  });

  it('labels crowded line ends apart, each near its end or joined by a leader', async () => {
    const rows = months(['2025-01', '2025-02', '2025-03'], Object.fromEntries(['North', 'South', 'East', 'West', 'Harbour'].map((r, k) => [r, (i: number) => 100 + i + k * 0.1])));
    const dump = await dumpOf({ intent: 'trend', keys: ['month', 'route'], values: 'riders' }, rows);
    expect(dump.texts.filter((t) => t.role === 'label')).toHaveLength(5);
    expect(dump.marks.some((m) => m.role === 'leader')).toBe(true);
    expect(dump.legends).toEqual([]);
    checkLineContracts(dump);
  });

  it('falls back to a legend when the names cannot be stacked in the plot', async () => {
    const names = Array.from({ length: 8 }, (_, k) => `Route ${k}`);
    const rows = months(['2025-01', '2025-02'], Object.fromEntries(names.map((r, k) => [r, (i: number) => i + k])));
    const dump = await dumpOf({ intent: 'trend', keys: ['month', 'route'], values: 'riders', size: { width: 400, height: 160 } }, rows);
    expect(dump.legends[0]!.entries.map((e) => e.label)).toEqual(names);
    expect(dump.texts.filter((t) => t.role === 'label')).toEqual([]);
  });

  it('leaves a gap at a missing value and draws a point alone between gaps as a dot', async () => {
    const values = [5, 6, null, 8, null, 9, 10];
    const r = await renderRows({ intent: 'trend', keys: 'month', values: 'riders', fields: { riders: { unit: 'riders' } } }, months(['2025-01', '2025-02', '2025-03', '2025-04', '2025-05', '2025-06', '2025-07'], { A: (i) => values[i]! }));
    expect(r.ok).toBe(true);
    expect(r.diagnostics.find((d) => d.code === 'derive.missing-values')).toMatchObject({ rows: [3, 5] });
    const dump = dumpScene(r.scene!);
    const line = lines(dump)[0]!;
    // Two runs (Jan–Feb, Jun–Jul): two moves, and no point where the data has none.
    expect(line.d!.match(/M/g)).toHaveLength(2);
    expect(line.points!.map((p) => p.datum!.riders)).toEqual([5, 6, 9, 10]);
    const dots = dump.marks.filter((m) => m.role === 'point');
    expect(dots.map((d) => d.datum!.riders)).toEqual([8]);
    expect(r.rationale.some((d) => /gap/.test(d.decision))).toBe(true);
  });

  it('keeps zero on the value axis by default, and leaves it out for an arbitrary zero or baseline: fit, saying why', async () => {
    const rows = months(['2025-01', '2025-02', '2025-03'], { A: (i) => 50 + i });
    const axis = (d: SceneDump) => d.axes.find((a) => a.orient === 'left')!.domain as number[];
    expect(axis(await dumpOf({ intent: 'trend', keys: 'month', values: 'riders' }, rows))[0]).toBe(0);
    const arbitrary = await renderRows({ intent: 'trend', keys: 'month', values: 'riders', fields: { riders: { unit: '°C', zero: 'arbitrary' } } }, rows);
    expect(axis(dumpScene(arbitrary.scene!))[0]).toBeGreaterThan(0);
    expect(arbitrary.rationale.find((d) => /zero/.test(d.decision))!.rule).toMatch(/zero: arbitrary/);
    const fit = await renderRows({ intent: 'trend', keys: 'month', values: 'riders', baseline: 'fit', fields: { riders: { unit: 'riders' } } }, rows);
    expect(fit.ok).toBe(true);
    expect(axis(dumpScene(fit.scene!))[0]).toBeGreaterThan(0);
    expect(fit.rationale.find((d) => /zero/.test(d.decision))!.rule).toMatch(/baseline: fit.*position/);
  });

  it('labels a monthly axis at its grain ("Jan 2025", then months), never with days', async () => {
    const dump = await dumpOf({ intent: 'trend', keys: 'month', values: 'riders' }, months(['2025-01', '2025-02', '2025-03'], { A: (i) => i }));
    const ticks = dump.texts.filter((t) => t.role === 'tick' && /[A-Z][a-z]{2}/.test(t.text)).map((t) => t.text);
    expect(ticks).toEqual(['Jan 2025', 'Feb', 'Mar']);
    expect(codes(await renderRows({ intent: 'trend', keys: 'month', values: 'riders', fields: { riders: { unit: 'riders' } } }, months(['2025-01'], { A: () => 1 })))).not.toContain('render.internal');
  });
});

describe('periods a regular series skips', () => {
  it('leaves a gap where whole months have no rows, rather than joining across them, and warns', async () => {
    const r = await renderRows({ intent: 'trend', keys: 'month', values: 'riders', fields: { riders: { unit: 'riders' } } }, months(['2025-01', '2025-02', '2025-03', '2025-06', '2025-07'], { A: (i) => 10 + i }));
    expect(r.diagnostics.find((d) => d.code === 'derive.uneven-dates')).toMatchObject({ field: 'month' });
    expect(r.diagnostics.find((d) => d.code === 'derive.uneven-dates')!.message).toMatch(/Mar 2025 and Jun 2025/);
    const line = lines(dumpScene(r.scene!))[0]!;
    expect(line.d!.match(/M/g)).toHaveLength(2);
  });

  it('joins irregular dates that follow no regular step', async () => {
    const r = await renderRows({ intent: 'trend', keys: 'day', values: 'riders', fields: { riders: { unit: 'riders' } } }, ['2025-01-01', '2025-01-04', '2025-01-06', '2025-01-13', '2025-01-14'].map((day, i) => ({ day, riders: i })));
    expect(r.diagnostics.map((d) => d.code)).not.toContain('derive.uneven-dates');
    expect(lines(dumpScene(r.scene!))[0]!.d!.match(/M/g)).toHaveLength(1);
  });

  it('joins a series of business days across its weekends, and breaks it where a weekday is missing', async () => {
    // Mon 6 Jan to Fri 17 Jan 2025, without Wednesday 15 January.
    const days = ['06', '07', '08', '09', '10', '13', '14', '16', '17'].map((d) => `2025-01-${d}`);
    const r = await renderRows({ intent: 'trend', keys: 'day', values: 'riders', fields: { riders: { unit: 'riders' } } }, days.map((day, i) => ({ day, riders: i })));
    expect(r.diagnostics.find((d) => d.code === 'derive.uneven-dates')!.message).toMatch(/14 Jan 2025 and 16 Jan 2025/);
    expect(lines(dumpScene(r.scene!))[0]!.d!.match(/M/g)).toHaveLength(2);
  });
});
