import type { Decision } from '../choose/types.js';
import { diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import type { TaskQuery } from '../derive/tasks.js';
import { refOf, type Field } from '../fields/types.js';
import type { Planned, PlanInput } from './types.js';

/** Tasks beyond which a Gantt chart's rows are too thin to read and label (common practice: "dozens of tasks"). */
export const MAX_GANTT_TASKS = 100;

/** How a Gantt chart is drawn: what it derives from, and whether its axis is calendar time or plain numbers. */
export interface GanttPlan {
  query: TaskQuery;
  time: 'calendar' | 'number';
}

function orderOf(input: PlanInput, problems: Diagnostic[], decisions: Decision[]): TaskQuery['order'] | undefined {
  const { order } = input.brief;
  if (order === 'cluster') {
    problems.push(diagnostic('choice.order-not-applicable', '`order: cluster` applies to heat maps, not to schedules', {
      path: '/order', found: 'cluster', expected: 'auto, value, label or data', hint: 'remove `order:` to sort tasks by start, or use `order: label` or `order: data`',
    }));
    return undefined;
  }
  if (order === 'label' || order === 'data') {
    decisions.push({ decision: `tasks in ${order} order`, rule: 'the brief asks for it (`order:`)' });
    return order;
  }
  const asked = order === 'value' ? '; `order: value` orders a schedule by its start times' : '';
  decisions.push({ decision: 'tasks sorted by start, top to bottom; ties by end, then name', rule: `a schedule is read in time order, so the first task to start is on top and the bars step down like the work (common practice for Gantt charts)${asked}` });
  return 'start';
}

function optionalDecisions(group: Field | undefined, after: Field | undefined): Decision[] {
  const decisions: Decision[] = [];
  if (group) decisions.push({ decision: `tasks coloured by \`${group.name}\`, with a legend`, rule: 'a second key groups the tasks; colour shows the group without moving any task out of time order' });
  if (after) decisions.push({ decision: `connectors from each predecessor's end to its successor's start (\`${after.name}\`)`, rule: 'finish-to-start links, the usual reading of "after" in project schedules (common practice); a successor starting before its predecessor ends is drawn as it is, dashed, and warned about' });
  return decisions;
}

function countTasks(task: Field, decisions: Decision[], problems: Diagnostic[]): void {
  let n = 0;
  for (const t of task.column.text) if (t !== null && t !== '') n++;
  if (n <= MAX_GANTT_TASKS) return;
  decisions.push({ decision: `${n} tasks drawn as ${n} rows`, rule: `more than about ${MAX_GANTT_TASKS} rows are too thin to read and to label; a schedule split by phase (one brief per group) reads better` });
  problems.push(diagnostic('choice.gantt-many-tasks', `${n} tasks is more than the about ${MAX_GANTT_TASKS} a Gantt chart shows legibly`, {
    found: `${n} tasks`, expected: `at most about ${MAX_GANTT_TASKS}`, hint: 'split the schedule by phase or team (one brief each), or filter to the tasks that matter',
  }));
}

/** The Gantt chart's plan: task order, time axis, colour by group and dependency links, each with its rule. */
export function planGantt(input: PlanInput): Outcome<Planned<GanttPlan>> {
  const { fields, brief } = input;
  const byName = (n: string | undefined) => (n === undefined ? undefined : fields.all.find((f) => f.name === n));
  const [task, group] = fields.keys as [Field | undefined, Field | undefined];
  const [start, end, after] = [byName(brief.start), byName(brief.end), byName(brief.after)];
  // A Gantt chart pinned (`form: gantt`) under another intent skips the schedule intent's shape check.
  if (!task || !start || !end) {
    return failure([diagnostic('choice.schedule-no-times', 'a Gantt chart needs a task key and the columns of each task\'s start and end', {
      path: start ? '/end' : '/start', expected: 'keys, start: and end:', hint: 'use `intent: schedule` with `keys: <task>`, `start: <column>` and `end: <column>`',
    })]);
  }
  const problems: Diagnostic[] = [];
  const decisions: Decision[] = [
    { decision: `one bar per task from \`${start.name}\` to \`${end.name}\``, rule: 'a Gantt chart: bars on one time axis show when each task runs, their length is its duration, and tasks running at once show as bars side by side in time' },
  ];
  const order = orderOf(input, problems, decisions);
  if (!order) return failure(problems);
  const time = start.type === 'temporal' ? 'calendar' : 'number';
  decisions.push(time === 'calendar'
    ? { decision: 'a calendar time axis, ticks in UTC', rule: 'dates are drawn to scale on calendar boundaries (days, weeks, months), in UTC so the chart is the same in every time zone' }
    : { decision: 'a numeric time axis from the first start to the last end', rule: 'tasks are placed in time, not measured from zero, so the axis spans the schedule (`baseline` does not apply)' });
  decisions.push(...optionalDecisions(group, after));
  countTasks(task, decisions, problems);
  const query: TaskQuery = { task: refOf(task), start: refOf(start), end: refOf(end), group: group && refOf(group), after: after && refOf(after), order };
  return success({ plan: { query, time }, decisions }, problems);
}
