import { describe, expect, it } from 'vitest';
import { dumpScene } from '../../src/scene/dump.js';
import { codes, renderRows } from '../helpers.js';

const notes = (r: Awaited<ReturnType<typeof renderRows>>) => dumpScene(r.scene!).texts.filter((t) => t.role === 'note').map((t) => t.text).join(' ');
const valueTitle = (r: Awaited<ReturnType<typeof renderRows>>) => r.scene!.axes.find((a) => a.scale === 'linear')!.title;
// Two readings a day, at 7 and 19 o'clock, written with the day only: each date repeats.
const readings = ['2025-06-01', '2025-06-02', '2025-06-03', '2025-06-04'].flatMap((date, i) => [{ date, t: 9 + i }, { date, t: 11 + i }]);

describe('lines say in the figure how rows sharing a date were combined', () => {
  it('a sum of temperatures sharing a date is refused (choice.sum-not-additive), a mean offered', async () => {
    const r = await renderRows({ intent: 'trend', keys: 'date', values: 't', fields: { t: { unit: '°C', zero: 'arbitrary' } } }, readings);
    expect(r.ok).toBe(false);
    const d = r.diagnostics.find((x) => x.code === 'choice.sum-not-additive');
    expect(d).toMatchObject({ path: '/fields/t', field: 't' });
    expect(d!.hint).toMatch(/aggregate: mean/);
  });

  it('a sum of a value whose zero is arbitrary is refused even when its unit adds up', async () => {
    const r = await renderRows({ intent: 'trend', keys: 'date', values: 'level', aggregate: 'sum', fields: { level: { unit: 'm', zero: 'arbitrary' } } }, readings.map(({ date, t }) => ({ date, level: t })));
    expect(r.ok).toBe(false);
    expect(r.diagnostics.find((x) => x.code === 'choice.sum-not-additive')).toMatchObject({ path: '/aggregate' });
  });

  it('dates that repeat with no aggregate stated are summed with choice.keys-repeat, a note and a "Total" axis title', async () => {
    const r = await renderRows({ intent: 'trend', keys: 'date', values: 'n', fields: { n: { unit: 'parcels' } } }, readings.map(({ date, t }) => ({ date, n: t })));
    expect(r.ok).toBe(true);
    expect(codes(r)).toContain('choice.keys-repeat');
    expect(codes(r)).not.toContain('derive.aggregated');
    expect(notes(r)).toContain('2 rows per date were summed.');
    expect(valueTitle(r)).toMatch(/^Total /);
    // 9 + 11 on the first date: the drawn point is the sum.
    const line = dumpScene(r.scene!).marks.find((m) => m.role === 'line')!;
    expect(line.points![0]!.datum).toMatchObject({ n: 20 });
  });

  it('a stated mean of temperatures is drawn, said on the axis and in the note, without a warning', async () => {
    const r = await renderRows({ intent: 'trend', keys: 'date', values: 't', aggregate: 'mean', fields: { t: { unit: '°C', zero: 'arbitrary' } } }, readings);
    expect(r.ok).toBe(true);
    expect(codes(r)).not.toContain('choice.keys-repeat');
    expect(notes(r)).toContain('2 rows per date were averaged.');
    expect(valueTitle(r)).toMatch(/^Mean /);
    const line = dumpScene(r.scene!).marks.find((m) => m.role === 'line')!;
    expect(line.points![0]!.datum).toMatchObject({ t: 10 });
  });

  it('repeats are counted within a series: one row per date and series combines nothing', async () => {
    const rows = readings.map(({ date, t }, i) => ({ date, site: i % 2 ? 'Hill' : 'Vale', t }));
    const r = await renderRows({ intent: 'trend', keys: ['date', 'site'], values: 't', fields: { t: { unit: '°C', zero: 'arbitrary' } } }, rows);
    expect(r.ok).toBe(true);
    expect(codes(r)).not.toContain('choice.keys-repeat');
    expect(notes(r)).not.toMatch(/summed/);
  });

  it('an index chart of repeated dates is warned about and says the sum in its note', async () => {
    const rows = readings.map(({ date, t }) => ({ date, n: t }));
    const r = await renderRows({ intent: 'change', keys: 'date', values: 'n', fields: { n: { unit: 'parcels' } }, form: 'index-line' }, rows);
    expect(codes(r)).toContain('choice.keys-repeat');
    expect(r.ok).toBe(true);
    expect(r.scene!.form).toBe('index-line');
    expect(notes(r)).toContain('2 rows per date were summed.');
  });
});
