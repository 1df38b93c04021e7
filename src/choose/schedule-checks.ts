import type { ResolvedBrief } from '../brief/types.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import type { Fields } from '../fields/types.js';

/** The start and end fields must both be dates, or both be numbers. */
function timeProblems(fields: Fields, brief: ResolvedBrief): Diagnostic[] {
  const problems: Diagnostic[] = [];
  for (const option of ['start', 'end'] as const) {
    if (brief[option] !== undefined) continue;
    problems.push(diagnostic('choice.schedule-no-times', `a schedule needs \`${option}:\`, the column of each task's ${option}`, {
      path: `/${option}`, expected: 'a column of dates or numbers', hint: `add \`${option}: <column>\``,
    }));
  }
  if (problems.length) return problems;
  const [start, end] = [brief.start, brief.end].map((n) => fields.all.find((f) => f.name === n)!);
  for (const [option, field] of [['start', start!], ['end', end!]] as const) {
    if (field.type === 'temporal' || field.type === 'quantitative') continue;
    problems.push(diagnostic('choice.schedule-times-not-time', `\`${option}: ${field.name}\` is ${field.type}, but a task's ${option} is a date or a number`, {
      path: `/${option}`, field: field.name, found: field.type, expected: 'dates or numbers', hint: `write \`${field.name}\` as ISO dates (2026-03-01) or numbers, or set \`fields.${field.name}.type\``,
    }));
  }
  if (!problems.length && start!.type !== end!.type) {
    problems.push(diagnostic('choice.schedule-times-not-time', `\`start\` is ${start!.type} and \`end\` is ${end!.type}: both ends of a task must be on one time axis`, {
      path: '/end', field: end!.name, found: end!.type, expected: start!.type, hint: 'give start and end the same kind of value: both dates or both numbers',
    }));
  }
  return problems;
}

/** Checks the brief's data shape against what a Gantt chart (intent schedule) can show. */
export function checkScheduleShape(fields: Fields, brief: ResolvedBrief): Diagnostic[] {
  const problems: Diagnostic[] = [];
  if (fields.keys.length === 0) {
    problems.push(diagnostic('choice.no-key', 'a schedule needs a key: the column that names the tasks', { path: '/keys', expected: 'one column of task names', hint: 'add `keys: <task column>`' }));
  }
  if (fields.keys.length > 2) {
    problems.push(diagnostic('choice.too-many-keys', `a schedule takes a task key and at most a group key, not ${fields.keys.length} keys`, {
      path: '/keys', found: fields.keys.map((k) => k.name).join(', '), expected: 'keys: [task] or [task, group]', hint: 'keep the task key and one group key',
    }));
  }
  if (fields.values.length) {
    problems.push(diagnostic('brief.option-not-used', 'a schedule draws tasks from `start:` to `end:`; `values:` is not used', {
      path: '/values', found: fields.values.map((v) => v.name).join(', '), expected: 'no values', hint: 'remove `values:`, and name the columns in `start:` and `end:`',
    }));
  }
  return [...problems, ...timeProblems(fields, brief)];
}
