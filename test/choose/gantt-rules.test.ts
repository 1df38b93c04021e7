import { describe, expect, it } from 'vitest';
import type { GanttPlan } from '../../src/forms/gantt-plan.js';
import { codes, renderRows } from '../helpers.js';

const brief = { intent: 'schedule', keys: 'task', start: 'from', end: 'to' };
const rows = [
  { task: 'Survey', from: '2026-03-02', to: '2026-03-20', pre: '', team: 'Office' },
  { task: 'Permits', from: '2026-03-23', to: '2026-04-24', pre: 'Survey', team: 'Office' },
  { task: 'Piling', from: '2026-04-20', to: '2026-05-22', pre: 'Permits', team: 'Yard' },
];
const problem = (r: { diagnostics: { code: string; path?: string }[] }, code: string) => r.diagnostics.find((d) => d.code === code);

describe('rules for the schedule intent', () => {
  it('a task key with start and end dates gets a Gantt chart on a calendar axis, tasks by start', async () => {
    const r = await renderRows(brief, rows);
    expect(r.ok).toBe(true);
    expect(r.choice).toMatchObject({ form: 'gantt', rule: 'schedule.tasks', plan: { time: 'calendar', query: { order: 'start' } } });
    const rule = (decision: string) => r.rationale.find((d) => d.decision.startsWith(decision))?.rule;
    expect(rule('Gantt chart')).toMatch(/^schedule\.tasks/);
    expect(rule('tasks sorted by start')).toMatch(/time order/);
    expect(rule('a calendar time axis')).toMatch(/UTC/);
  });

  it('numbers for start and end give a numeric axis; `order: data` keeps the rows\' order', async () => {
    const r = await renderRows({ ...brief, order: 'data' }, [{ task: 'b', from: 3, to: 5 }, { task: 'a', from: 0, to: 2 }]);
    expect((r.choice!.plan as GanttPlan)).toMatchObject({ time: 'number', query: { order: 'data' } });
  });

  it('`after:` draws dependencies and warns when a task starts before its predecessor ends', async () => {
    const r = await renderRows({ ...brief, after: 'pre' }, rows);
    expect(r.ok).toBe(true);
    expect(r.rationale.some((d) => d.decision.startsWith('connectors from each predecessor'))).toBe(true);
    expect(problem(r, 'derive.predecessor-overlap')).toMatchObject({ rows: [3] });
  });

  it('a group key colours the tasks, with a legend', async () => {
    const r = await renderRows({ ...brief, keys: ['task', 'team'] }, rows);
    expect(r.rationale.some((d) => d.decision === 'tasks coloured by `team`, with a legend')).toBe(true);
    expect(r.scene!.legends[0]).toMatchObject({ kind: 'categorical', field: 'team' });
  });

  it('a missing start or end is refused, naming the option', async () => {
    const r = await renderRows({ intent: 'schedule', keys: 'task', end: 'to' }, rows);
    expect(problem(r, 'choice.schedule-no-times')).toMatchObject({ path: '/start' });
  });

  it('start or end columns that are not dates or numbers, or one of each, are refused', async () => {
    const text = await renderRows({ ...brief, start: 'team' }, rows);
    expect(problem(text, 'choice.schedule-times-not-time')).toMatchObject({ path: '/start' });
    const mixed = await renderRows(brief, [{ task: 'a', from: 1, to: '2026-01-01' }]);
    expect(problem(mixed, 'choice.schedule-times-not-time')).toMatchObject({ path: '/end' });
  });

  it('no key, `values:`, `order: cluster`, and `after:` on another intent are each refused', async () => {
    expect(problem(await renderRows({ intent: 'schedule', start: 'from', end: 'to' }, rows), 'choice.no-key')).toMatchObject({ path: '/keys' });
    expect(problem(await renderRows({ ...brief, keys: ['task', 'team', 'pre'] }, rows), 'choice.too-many-keys')).toMatchObject({ path: '/keys' });
    expect(problem(await renderRows({ ...brief, values: 'pre' }, rows), 'brief.option-not-used')).toMatchObject({ path: '/values' });
    expect(problem(await renderRows({ ...brief, order: 'cluster' }, rows), 'choice.order-not-applicable')).toMatchObject({ path: '/order' });
    expect(problem(await renderRows({ intent: 'compare', keys: 'task', values: 'x', after: 'pre' }, rows.map((x) => ({ ...x, x: 1 }))), 'brief.option-not-used')).toMatchObject({ path: '/after' });
    expect(problem(await renderRows({ ...brief, after: 'pred' }, rows), 'brief.unknown-column')).toMatchObject({ path: '/after' });
  });

  it('an end before its start and an unknown predecessor are errors naming the row', async () => {
    const back = await renderRows(brief, [...rows, { task: 'Oops', from: '2026-05-02', to: '2026-05-01', pre: '', team: 'Yard' }]);
    expect(problem(back, 'derive.task-end-before-start')).toMatchObject({ rows: [4] });
    const unknown = await renderRows({ ...brief, after: 'pre' }, [...rows, { task: 'X', from: '2026-05-02', to: '2026-05-03', pre: 'Nothing', team: 'Yard' }]);
    expect(problem(unknown, 'derive.predecessor-unknown')).toMatchObject({ rows: [4] });
    const twice = await renderRows(brief, [...rows, rows[0]!]);
    expect(problem(twice, 'derive.task-duplicate')).toMatchObject({ rows: [4] });
  });

  it('more than 100 tasks render with a warning, and the rationale suggests splitting the schedule', async () => {
    const many = Array.from({ length: 101 }, (_, i) => ({ task: `T${i}`, from: i, to: i + 3 }));
    const r = await renderRows({ ...brief, size: { width: 720, height: 900 } }, many);
    expect(codes(r)).toContain('choice.gantt-many-tasks');
    expect(r.rationale.find((d) => d.decision === '101 tasks drawn as 101 rows')!.rule).toMatch(/one brief per group/);
  });

  it('a Gantt chart pinned under another intent (no start or end) is refused with a coded error, never a crash', async () => {
    const r = await renderRows({ intent: 'compare', form: 'gantt', keys: 'task', values: 'x' }, rows.map((x) => ({ ...x, x: 1 })));
    expect(codes(r)).not.toContain('render.internal');
    expect(problem(r, 'choice.form-not-for-intent')).toMatchObject({ path: '/form' });
    expect(r.diagnostics.find((d) => d.code === 'choice.form-not-for-intent')!.hint).toMatch(/intent: schedule/);
  });

  it('a Gantt chart with no start or end is refused with the options it needs', async () => {
    const r = await renderRows({ intent: 'schedule', form: 'gantt', keys: 'task', values: 'x' }, rows.map((x) => ({ ...x, x: 1 })));
    expect(problem(r, 'choice.schedule-no-times')).toMatchObject({ path: '/start' });
  });
});
