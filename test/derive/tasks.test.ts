import { describe, expect, it } from 'vitest';
import { resolveBrief } from '../../src/brief/resolve.js';
import { byStart, deriveTasks, sortTasks, type Task, type TaskQuery } from '../../src/derive/tasks.js';
import { inferFields } from '../../src/fields/infer.js';
import { refOf } from '../../src/fields/types.js';
import { readTable } from '../../src/table/load.js';
import { memoryFiles } from '../helpers.js';

async function derive(rows: Record<string, unknown>[], brief: Record<string, unknown> = {}, order: TaskQuery['order'] = 'start') {
  const resolved = resolveBrief({ intent: 'schedule', rows, keys: 't', start: 's', end: 'e', ...brief });
  const t = await readTable(resolved.data, resolved.fields, undefined, memoryFiles({}));
  if (!t.ok) throw new Error('table');
  const f = inferFields(t.value, resolved);
  if (!f.ok) throw new Error('fields');
  const field = (n: string | undefined) => (n === undefined ? undefined : refOf(f.value.all.find((x) => x.name === n)!));
  const query: TaskQuery = { task: refOf(f.value.keys[0]!), start: field('s')!, end: field('e')!, group: f.value.keys[1] && refOf(f.value.keys[1]), after: field(resolved.after), order };
  return deriveTasks(t.value, query);
}

const task = (label: string, start: number, end: number): Task => ({ label, start, end, row: 1 });

describe('task derivation', () => {
  it('sorts by start, then end, then name in code points', () => {
    const tasks = [task('b', 2, 5), task('a', 2, 5), task('c', 1, 9), task('d', 2, 3)];
    expect([...tasks].sort(byStart).map((t) => t.label)).toEqual(['c', 'd', 'a', 'b']);
    expect(sortTasks(tasks, 'data').map((t) => t.label)).toEqual(['b', 'a', 'c', 'd']);
    expect(sortTasks([task('T10', 0, 1), task('T2', 0, 1)], 'label').map((t) => t.label)).toEqual(['T2', 'T10']);
  });

  it('reads dates as epoch ms (UTC) and keeps each task\'s row', async () => {
    const r = await derive([{ t: 'b', s: '2026-03-02', e: '2026-03-05' }, { t: 'a', s: '2026-03-01', e: '2026-03-02' }]);
    if (!r.ok) throw new Error('derive failed');
    expect(r.value.tasks.map((t) => [t.label, t.start, t.end, t.row])).toEqual([['a', Date.UTC(2026, 2, 1), Date.UTC(2026, 2, 2), 2], ['b', Date.UTC(2026, 2, 2), Date.UTC(2026, 2, 5), 1]]);
  });

  it('an end before its start is an error naming the row', async () => {
    const r = await derive([{ t: 'a', s: 1, e: 2 }, { t: 'b', s: 5, e: 3 }]);
    expect(r.ok).toBe(false);
    expect(r.diagnostics.find((d) => d.code === 'derive.task-end-before-start')).toMatchObject({ rows: [2], field: 'e', found: 'b' });
  });

  it('a task named twice is an error naming the second row', async () => {
    const r = await derive([{ t: 'a', s: 1, e: 2 }, { t: 'a', s: 3, e: 4 }]);
    expect(r.diagnostics.find((d) => d.code === 'derive.task-duplicate')).toMatchObject({ rows: [2], found: 'a' });
  });

  it('a row with no start or end is left out and named', async () => {
    const r = await derive([{ t: 'a', s: 1, e: 2 }, { t: 'b', s: null, e: 4 }]);
    expect(r.ok && r.value.tasks.map((t) => t.label)).toEqual(['a']);
    expect(r.diagnostics.find((d) => d.code === 'derive.missing-values')).toMatchObject({ rows: [2] });
  });

  it('links each task to the predecessor it names, and flags a start before the predecessor ends', async () => {
    const rows = [{ t: 'a', s: 0, e: 5, p: '' }, { t: 'b', s: 5, e: 8, p: 'a' }, { t: 'c', s: 7, e: 9, p: 'b' }];
    const r = await derive(rows, { after: 'p' });
    expect(r.ok && r.value.dependencies).toEqual([{ from: 'a', to: 'b', overlaps: false }, { from: 'b', to: 'c', overlaps: true }]);
    expect(r.diagnostics.find((d) => d.code === 'derive.predecessor-overlap')).toMatchObject({ rows: [3], found: 'c', field: 'p' });
  });

  it('an unknown predecessor, or a task naming itself, is an error naming the row', async () => {
    const unknown = await derive([{ t: 'a', s: 0, e: 1, p: '' }, { t: 'b', s: 1, e: 2, p: 'z' }], { after: 'p' });
    expect(unknown.ok).toBe(false);
    expect(unknown.diagnostics.find((d) => d.code === 'derive.predecessor-unknown')).toMatchObject({ rows: [2], found: 'z', field: 'p' });
    const itself = await derive([{ t: 'a', s: 0, e: 1, p: 'a' }], { after: 'p' });
    expect(itself.diagnostics.find((d) => d.code === 'derive.predecessor-unknown')).toMatchObject({ rows: [1], found: 'a' });
  });

  it('a circle of predecessors is an error naming every task on it and their rows (regression: a circle was drawn as overlapping connectors)', async () => {
    const rows = [{ t: 'x', s: 0, e: 1, p: '' }, { t: 'a', s: 1, e: 2, p: 'c' }, { t: 'b', s: 2, e: 3, p: 'a' }, { t: 'c', s: 3, e: 4, p: 'b' }, { t: 'd', s: 4, e: 5, p: 'c' }];
    const r = await derive(rows, { after: 'p' });
    expect(r.ok).toBe(false);
    const d = r.diagnostics.find((x) => x.code === 'derive.predecessor-cycle');
    expect(d).toMatchObject({ field: 'p', severity: 'error' });
    expect(new Set(d!.rows)).toEqual(new Set([2, 3, 4]));
    expect(d!.found!.split(', ').sort()).toEqual(['a', 'b', 'c']);
    // A chain that only leads into the circle (d after c) is not part of it.
    expect(d!.found).not.toContain('d');
    const chain = await derive(rows.map((row) => (row.t === 'a' ? { ...row, p: 'x' } : row)), { after: 'p' });
    expect(chain.diagnostics.some((x) => x.code === 'derive.predecessor-cycle')).toBe(false);
  });

  it('dependencies come in the order of their successors, whatever the order of the rows (regression: shuffled rows drew connectors in another order)', async () => {
    const rows = [{ t: 'c', s: 2, e: 3, p: 'b' }, { t: 'a', s: 0, e: 1, p: '' }, { t: 'b', s: 1, e: 2, p: 'a' }];
    const r = await derive(rows, { after: 'p' });
    expect(r.ok && r.value.dependencies.map((d) => d.to)).toEqual(['b', 'c']);
  });
});
