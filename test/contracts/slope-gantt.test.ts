import { describe, expect, it } from 'vitest';
import { dumpScene } from '../../src/scene/dump.js';
import { renderDemo, renderRows, root } from '../helpers.js';
import { checkGanttContracts, checkSlopeContracts } from './slope-gantt-contracts.js';

describe('perceptual contracts of slope charts', () => {
  it('the gallery slope chart: lines end on both axes at their values, labelled at both ends, none overlapping', async () => {
    const { dump } = await renderDemo(`${root}/demo-data/hut-occupancy-shift.yaml`);
    checkSlopeContracts(dump, 'occupancy');
    const lines = dump.marks.filter((m) => m.role === 'line');
    expect(lines).toHaveLength(10);
    expect(dump.texts.filter((t) => t.role === 'label')).toHaveLength(20);
    // Line width ∝ the width value: the 60-bed lodge's line is 6 px, a 24-bed hut's 2.4 px.
    const width = (hut: string) => lines.find((l) => l.datum!.hut === hut)!.strokeWidth;
    expect(width('Dipper Lodge')).toBeCloseTo(6, 6);
    expect(width('Alder Hut')).toBeCloseTo(2.4, 6);
  });

  it('labels of items with nearly equal values are spread apart, and moved labels get leaders', async () => {
    const rows = Array.from({ length: 12 }, (_, i) => [{ k: `Item ${i}`, p: 'a', v: 50 + i * 0.1 }, { k: `Item ${i}`, p: 'b', v: i * 8 }]).flat();
    const r = await renderRows({ intent: 'shift', keys: ['k', 'p'], values: 'v', fields: { v: { unit: 'points' } } }, rows);
    const dump = dumpScene(r.scene!);
    checkSlopeContracts(dump, 'v');
    expect(dump.texts.filter((t) => t.role === 'label')).toHaveLength(24);
    expect(dump.marks.filter((m) => m.role === 'leader').length).toBeGreaterThan(0);
  });

  it('two value columns: the ends are the two columns, on one scale', async () => {
    const r = await renderRows({ intent: 'shift', keys: 'k', values: ['before', 'after'], baseline: 'fit' }, [{ k: 'A', before: 3, after: 9 }, { k: 'B', before: 7, after: 2 }, { k: 'C', before: 5, after: 5 }]);
    const dump = dumpScene(r.scene!);
    expect(dump.axes[1]!.domain).toEqual(['Before', 'After']);
    expect(dump.marks.filter((m) => m.role === 'line').map((l) => l.points!.map((p) => p.datum!.point))).toEqual([['Before', 'After'], ['Before', 'After'], ['Before', 'After']]);
    checkSlopeContracts(dump, ['before', 'after']);
    // Each point's value is under its own column (regression: both were under the first column).
    const byItem = Object.fromEntries(dump.marks.filter((m) => m.role === 'line').map((l) => [l.datum!.k, [l.points![0]!.datum!.before, l.points![1]!.datum!.after]]));
    expect(byItem).toEqual({ A: [3, 9], B: [7, 2], C: [5, 5] });
  });

  it('two value columns share one axis title naming both', async () => {
    const r = await renderRows({ intent: 'shift', keys: 'k', values: ['before', 'after'], fields: { before: { unit: '%' }, after: { unit: '%' } } }, [{ k: 'A', before: 3, after: 9 }]);
    expect(dumpScene(r.scene!).axes[0]!.title).toBe('Before and after (%)');
  });
});

describe('perceptual contracts of Gantt charts', () => {
  const names = { task: 'task', start: 'start', end: 'end' };

  it('the gallery Gantt chart: bar ends on start and end, sorted by start, connectors from end to start', async () => {
    const { dump } = await renderDemo(`${root}/demo-data/pier-refit.yaml`);
    checkGanttContracts(dump, names);
    expect(dump.marks.filter((m) => m.role === 'task')).toHaveLength(11);
    expect(dump.marks.filter((m) => m.role === 'dependency')).toHaveLength(10);
    // Every task's name is on the chart: none dropped.
    const ticks = dump.texts.filter((t) => t.role === 'tick').map((t) => t.text);
    for (const t of dump.marks.filter((m) => m.role === 'task')) expect(ticks).toContain(t.datum!.task);
  });

  it('numeric start and end: a linear axis, with the same contracts; a zero-length task is still marked', async () => {
    const rows = [{ task: 'dig', start: 0, end: 4 }, { task: 'pour', start: 4, end: 6, pre: 'dig' }, { task: 'sign off', start: 6, end: 6, pre: 'pour' }];
    const r = await renderRows({ intent: 'schedule', keys: 'task', start: 'start', end: 'end', after: 'pre', fields: { start: { unit: 'days' } } }, rows);
    const dump = dumpScene(r.scene!);
    checkGanttContracts(dump, names);
    expect(dump.axes.find((a) => a.orient === 'bottom')!.scale).toBe('linear');
    expect(dump.marks.filter((m) => m.role === 'point').map((m) => m.datum!.task)).toEqual(['sign off']);
  });

  it('long task names are shortened with the full name kept on the bar, never dropped', async () => {
    const long = 'Reinforce the south breakwater where the winter storms of the last three years undermined the old concrete blocks and washed out the gravel core beneath the lighthouse path';
    const r = await renderRows({ intent: 'schedule', keys: 'task', start: 's', end: 'e' }, [{ task: long, s: '2026-01-05', e: '2026-02-01' }, { task: 'Paint', s: '2026-02-02', e: '2026-02-10' }]);
    const dump = dumpScene(r.scene!);
    checkGanttContracts(dump, { task: 'task', start: 's', end: 'e' });
    expect(r.diagnostics.map((d) => d.code)).toContain('layout.label-truncated');
    expect(dump.marks.find((m) => m.role === 'task' && m.datum!.task === long)).toBeDefined();
    expect(dump.texts.filter((t) => t.role === 'tick').map((t) => t.text)).toEqual(expect.arrayContaining([expect.stringMatching(/^Reinforce the south/), expect.stringMatching(/…$/)]));
  });

  it('rows too thin for every name: the chart\'s note says how many are named, matching the axis, and every bar keeps its name', async () => {
    const rows = Array.from({ length: 150 }, (_, i) => ({ task: `Task ${i}`, start: i % 40, end: 40 + (i % 17) }));
    const r = await renderRows({ intent: 'schedule', keys: 'task', start: 'start', end: 'end' }, rows);
    const dump = dumpScene(r.scene!);
    checkGanttContracts(dump, names);
    const named = dump.texts.filter((t) => t.role === 'tick' && t.text.startsWith('Task ')).length;
    const note = dump.texts.find((t) => t.role === 'note' && t.text.includes('task is named'))!;
    expect(note.text).toContain(`(${named} of 150)`);
    expect(named).toBeLessThan(150);
    expect(new Set(dump.marks.filter((m) => m.role === 'task').map((m) => m.datum!.task)).size).toBe(150);
  });
});
