import { describeRows, diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import { keyText } from '../fields/labels.js';
import type { FieldRef } from '../fields/types.js';
import { columnOf, type Table } from '../table/types.js';
import { compareNatural, compareText } from './order.js';
import { agree } from '../diagnostics/words.js';

/** One task of a schedule: its name, when it starts and ends (epoch ms or plain numbers), its group and predecessor. */
export interface Task {
  label: string;
  start: number;
  end: number;
  group?: string;
  /** The task named as this one's predecessor. */
  after?: string;
  /** The row's position in the source. */
  row: number;
}

/** A predecessor → successor link, and whether the successor starts before the predecessor ends. */
export interface Dependency {
  from: string;
  to: string;
  overlaps: boolean;
}

/** What a schedule derives from: the task key, its start and end, an optional group key and predecessor column, and the order. */
export interface TaskQuery {
  task: FieldRef;
  start: FieldRef;
  end: FieldRef;
  group: FieldRef | undefined;
  after: FieldRef | undefined;
  /** start: by start, then end, then name; label: by name; data: as the rows give them. */
  order: 'start' | 'label' | 'data';
}

/** The tasks in their order and the dependencies between them. */
export interface DerivedTasks {
  tasks: Task[];
  dependencies: Dependency[];
}

/** Tasks by start, then end, then name (code points): the usual reading order of a schedule. */
export function byStart(a: Task, b: Task): number {
  return a.start - b.start || a.end - b.end || compareText(a.label, b.label);
}

/** Tasks in the query's order. */
export function sortTasks(tasks: readonly Task[], order: TaskQuery['order']): Task[] {
  if (order === 'data') return [...tasks];
  return [...tasks].sort(order === 'label' ? (a, b) => compareNatural(a.label, b.label) : byStart);
}

function rowsProblem(code: 'derive.task-end-before-start' | 'derive.task-duplicate' | 'derive.predecessor-unknown' | 'derive.predecessor-overlap' | 'derive.predecessor-cycle', rows: number[], table: Table, what: string, details: { field: string; hint: string; found?: string }): Diagnostic {
  return diagnostic(code, `${describeRows(rows, table.positionNoun)}: ${what}`, { file: table.origin.file, rows, ...details });
}

/** Reads each row as a task; rows with no name, start or end are left out and named. */
function readTasks(table: Table, query: TaskQuery, problems: Diagnostic[]): Task[] {
  const col = (f: FieldRef) => columnOf(table, f.name)!;
  const [name, start, end] = [col(query.task), col(query.start), col(query.end)];
  const group = query.group && columnOf(table, query.group.name);
  const after = query.after && columnOf(table, query.after.name);
  const tasks: Task[] = [];
  const missing: number[] = [];
  for (let i = 0; i < table.rowCount; i++) {
    const [label, s, e] = [keyText(name, i), start.values[i], end.values[i]];
    const row = table.rowPositions[i]!;
    if (label === null || typeof s !== 'number' || typeof e !== 'number') { missing.push(row); continue; }
    const g = group ? keyText(group, i) : null;
    const a = after ? keyText(after, i) : null;
    tasks.push({ label, start: s, end: e, ...(g !== null ? { group: g } : {}), ...(a !== null && a !== '' ? { after: a } : {}), row });
  }
  if (missing.length) {
    problems.push(diagnostic('derive.missing-values', `${describeRows(missing, table.positionNoun)} ${agree(missing.length, 'has', 'have')} no task name, start or end and ${agree(missing.length, 'is', 'are')} left out`, {
      file: table.origin.file, field: query.task.name, rows: missing, hint: 'give every task a name, a start and an end',
    }));
  }
  return tasks;
}

/** Errors in the tasks themselves: an end before its start, a name used twice. */
function checkTasks(tasks: readonly Task[], table: Table, query: TaskQuery): Diagnostic[] {
  const problems: Diagnostic[] = [];
  const backwards = tasks.filter((t) => t.end < t.start);
  if (backwards.length) {
    problems.push(rowsProblem('derive.task-end-before-start', backwards.map((t) => t.row), table, `the task ${JSON.stringify(backwards[0]!.label)} ends before it starts`, {
      field: query.end.name, found: backwards[0]!.label, hint: `swap \`${query.start.name}\` and \`${query.end.name}\` in ${backwards.length === 1 ? 'that row' : 'those rows'}, or correct the dates`,
    }));
  }
  const seen = new Map<string, number>();
  const twice = tasks.filter((t) => seen.has(t.label) || !seen.set(t.label, t.row));
  if (twice.length) {
    problems.push(rowsProblem('derive.task-duplicate', twice.map((t) => t.row), table, `the task ${JSON.stringify(twice[0]!.label)} is named again (first at ${table.positionNoun} ${seen.get(twice[0]!.label)})`, {
      field: query.task.name, found: twice[0]!.label, hint: 'give each task its own name (a phase can be a second key)',
    }));
  }
  return problems;
}

/**
 * The first circle of predecessors, in the order they wait on each other, or undefined. Each
 * task names at most one predecessor, so following the names from any task either ends or comes
 * back to a task already on the path.
 */
function firstCycle(linked: readonly Task[], byName: ReadonlyMap<string, Task>): Task[] | undefined {
  const done = new Set<string>();
  for (const start of linked) {
    const path: Task[] = [];
    const onPath = new Map<string, number>();
    let t: Task | undefined = start;
    while (t && !done.has(t.label)) {
      if (onPath.has(t.label)) return path.slice(onPath.get(t.label)!);
      onPath.set(t.label, path.length);
      path.push(t);
      t = t.after === undefined ? undefined : byName.get(t.after);
    }
    for (const p of path) done.add(p.label);
  }
  return undefined;
}

/** The dependencies the predecessor column names: unknown names are errors, a start before the predecessor's end is warned. */
function linkTasks(tasks: readonly Task[], table: Table, query: TaskQuery, problems: Diagnostic[]): Dependency[] {
  if (!query.after) return [];
  const byName = new Map(tasks.map((t) => [t.label, t]));
  const linked = tasks.filter((t) => t.after !== undefined);
  const unknown = linked.filter((t) => !byName.has(t.after!) || t.after === t.label);
  if (unknown.length) {
    const first = unknown[0]!;
    problems.push(rowsProblem('derive.predecessor-unknown', unknown.map((t) => t.row), table, `the predecessor ${JSON.stringify(first.after)} of ${JSON.stringify(first.label)} ${first.after === first.label ? 'is the task itself' : 'is not a task of the table'}`, {
      field: query.after.name, found: first.after!, hint: `name a task of \`${query.task.name}\` in \`${query.after.name}\`, or leave the cell empty`,
    }));
    return [];
  }
  const cycle = firstCycle(linked, byName);
  if (cycle) {
    problems.push(rowsProblem('derive.predecessor-cycle', cycle.map((t) => t.row), table, `the predecessors go round in a circle: ${[...cycle, cycle[0]!].map((t) => JSON.stringify(t.label)).join(' after ')}`, {
      field: query.after.name, found: cycle.map((t) => t.label).join(', '), hint: `a task cannot wait for itself: clear the \`${query.after.name}\` cell of one task in the circle`,
    }));
    return [];
  }
  const dependencies = linked.map((t) => ({ from: t.after!, to: t.label, overlaps: t.start < byName.get(t.after!)!.end }));
  const early = dependencies.filter((d) => d.overlaps).map((d) => byName.get(d.to)!);
  if (early.length) {
    problems.push(rowsProblem('derive.predecessor-overlap', early.map((t) => t.row), table, `the task ${JSON.stringify(early[0]!.label)} starts before its predecessor ${JSON.stringify(early[0]!.after)} ends`, {
      field: query.after.name, found: early[0]!.label, hint: 'check the dates, or the predecessor named; the chart draws the overlap as it is',
    }));
  }
  return dependencies;
}

/**
 * The derive stage for schedules: rows → one task per row, in the query's order, with the
 * dependencies the predecessor column names. An end before its start, a task named twice and an
 * unknown predecessor are errors naming their rows; a task starting before its predecessor ends
 * is drawn as it is, with a warning.
 */
export function deriveTasks(table: Table, query: TaskQuery): Outcome<DerivedTasks> {
  const problems: Diagnostic[] = [];
  const read = readTasks(table, query, problems);
  problems.push(...checkTasks(read, table, query));
  const dependencies = linkTasks(read, table, query, problems);
  if (read.length === 0) {
    problems.push(diagnostic('derive.no-rows', 'no row has a task name, a start and an end, so there is nothing to draw', {
      file: table.origin.file, expected: 'at least one complete task', hint: 'check that `keys:`, `start:` and `end:` name the columns you meant',
    }));
  }
  if (problems.some((p) => p.severity === 'error')) return failure(problems);
  const tasks = sortTasks(read, query.order);
  // Connectors in the order of their successors, so the same schedule draws the same in any row order.
  const rank = new Map(tasks.map((t, i) => [t.label, i]));
  return success({ tasks, dependencies: dependencies.sort((a, b) => rank.get(a.to)! - rank.get(b.to)!) }, problems);
}
