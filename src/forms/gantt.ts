import { max, min } from 'd3-array';
import { deriveTasks, type DerivedTasks, type Task } from '../derive/tasks.js';
import { axisTitle } from '../layout/axis.js';
import type { CartesianDomains, LayoutContext, PlotArea } from '../layout/kit-types.js';
import type { LegendSpec } from '../layout/legend.js';
import { asBand, type Scale } from '../layout/scales.js';
import type { Datum, SceneNode } from '../scene/types.js';
import { polyline } from '../svg/path.js';
import { planGantt, type GanttPlan } from './gantt-plan.js';
import { thinnedNames } from './gantt-text.js';
import type { FormDef } from './types.js';
import { ganttAlt } from './change-alt.js';
import { withPlan } from './with-plan.js';

/** What a Gantt chart draws: its tasks in order, their dependencies, and its plan. */
export interface DerivedGantt extends DerivedTasks {
  plan: GanttPlan;
}

/** How far a connector runs out of its predecessor's end before turning, in px. */
const CONNECTOR_STUB = 5;

/** A time as the datum writes it: an ISO date (UTC), with the time of day only when it has one; numbers as they are. */
function timeText(plan: GanttPlan, t: number): string | number {
  if (plan.time === 'number') return t;
  const iso = new Date(t).toISOString();
  return iso.endsWith('T00:00:00.000Z') ? iso.slice(0, 10) : iso;
}

function groupColours(d: DerivedGantt, ctx: LayoutContext): Map<string, string> {
  const group = d.plan.query.group;
  if (!group) return new Map();
  const { categorical } = ctx.style.palette;
  const present = new Set(d.tasks.flatMap((t) => (t.group === undefined ? [] : [t.group])));
  return new Map(group.levels.filter((l) => present.has(l)).map((l, i) => [l, categorical[i % categorical.length]!]));
}

function legendOf(d: DerivedGantt, ctx: LayoutContext): LegendSpec | undefined {
  const group = d.plan.query.group;
  if (!group) return undefined;
  return { kind: 'categorical', field: group.name, title: group.label, entries: [...groupColours(d, ctx)].map(([label, fill]) => ({ label, fill })) };
}

function domainsOf(d: DerivedGantt, ctx: LayoutContext): CartesianDomains {
  const q = d.plan.query;
  const lo = min(d.tasks, (t) => t.start)!;
  const hi = max(d.tasks, (t) => t.end)!;
  const field = q.start.name;
  const bottom = d.plan.time === 'calendar'
    ? { kind: 'time' as const, name: 'time', field, title: 'Date (UTC)', extent: [lo, hi] as [number, number] }
    : { kind: 'linear' as const, name: 'time', field, title: axisTitle({ ...q.start, label: 'Time' }, 'Time'), extent: [lo, hi] as [number, number], format: q.start.format };
  const legend = legendOf(d, ctx);
  return {
    left: { kind: 'band', name: 'task', field: q.task.name, title: q.task.label, domain: d.tasks.map((t) => t.label) },
    bottom, first: 'left', ...(legend ? { legend } : {}),
  };
}

function taskDatum(d: DerivedGantt, t: Task): Datum {
  const q = d.plan.query;
  const datum: Datum = { [q.task.name]: t.label, [q.start.name]: timeText(d.plan, t.start), [q.end.name]: timeText(d.plan, t.end) };
  if (q.group && t.group !== undefined) datum[q.group.name] = t.group;
  if (q.after && t.after !== undefined) datum[q.after.name] = t.after;
  return datum;
}

/** A task's bar from its start to its end across its row; a task of no duration is also marked by a diamond, so it never vanishes. */
function taskMarks(d: DerivedGantt, t: Task, x: Scale & { map(v: number): number }, area: PlotArea, fill: string, ctx: LayoutContext): SceneNode[] {
  const band = asBand(area.y);
  const [x0, x1] = [x.map(t.start), x.map(t.end)];
  const datum = taskDatum(d, t);
  const bar: SceneNode = { kind: 'rect', id: ctx.id('task', t.label), role: 'task', datum, x: x0, y: band.start(t.label), width: x1 - x0, height: band.bandwidth, fill };
  if (t.end > t.start) return [bar];
  // Half the band, at most 6 px: a milestone marks an instant, so it stays small beside the bars.
  const [cy, r] = [band.center(t.label), Math.max(3, Math.min(6, band.bandwidth / 2))];
  const diamond = polyline([{ x: x0, y: cy - r }, { x: x0 + r, y: cy }, { x: x0, y: cy + r }, { x: x0 - r, y: cy }, { x: x0, y: cy - r }]);
  return [bar, { kind: 'path', id: ctx.id('milestone', t.label), role: 'point', commands: [...diamond, { op: 'Z' }], fill, datum }];
}

/** A finish-to-start connector: out of the predecessor's end, down (or up) to the successor's row, into its start. */
function connector(d: DerivedGantt, dep: DerivedGantt['dependencies'][number], byName: Map<string, Task>, x: { map(v: number): number }, area: PlotArea, ctx: LayoutContext): SceneNode {
  const band = asBand(area.y);
  const [from, to] = [byName.get(dep.from)!, byName.get(dep.to)!];
  const p = { x: x.map(from.end), y: band.center(from.label) };
  const s = { x: x.map(to.start), y: band.center(to.label) };
  const turn = p.x + CONNECTOR_STUB;
  const q = d.plan.query;
  return {
    kind: 'path', id: ctx.id('dependency', `${dep.from} ${dep.to}`), role: 'dependency',
    commands: polyline([p, { x: turn, y: p.y }, { x: turn, y: s.y }, s]),
    stroke: ctx.style.text.tick.color, strokeWidth: 1, ...(dep.overlaps ? { dash: [3, 2] } : {}),
    points: [{ ...p, datum: { [q.task.name]: from.label, [q.end.name]: timeText(d.plan, from.end) } }, { ...s, datum: { [q.task.name]: to.label, [q.start.name]: timeText(d.plan, to.start) } }],
    datum: { from: dep.from, to: dep.to },
  };
}

function layoutGantt(d: DerivedGantt, area: PlotArea, ctx: LayoutContext) {
  const x = area.x as Scale & { map(v: number): number };
  if (x.kind === 'band') throw new Error('a Gantt chart needs a time or linear bottom scale');
  const colours = groupColours(d, ctx);
  const marks = d.tasks.flatMap((t) => taskMarks(d, t, x, area, (t.group !== undefined && colours.get(t.group)) || ctx.style.palette.primary, ctx));
  const byName = new Map(d.tasks.map((t) => [t.label, t]));
  marks.push(...d.dependencies.map((dep) => connector(d, dep, byName, x, area, ctx)));
  return { marks, labels: [], diagnostics: [] };
}

function words(d: DerivedGantt, ctx: LayoutContext) {
  const q = d.plan.query;
  const first = d.tasks.reduce((a, b) => (b.start < a.start ? b : a));
  const last = d.tasks.reduce((a, b) => (b.end > a.end ? b : a));
  const links = d.dependencies.length ? `, with ${d.dependencies.length} dependenc${d.dependencies.length === 1 ? 'y' : 'ies'}` : '';
  return {
    title: `${q.task.label} schedule`,
    description: `Gantt chart of ${d.tasks.length} tasks${links}, from ${timeText(d.plan, first.start)} (${first.label}) to ${timeText(d.plan, last.end)} (${last.label}).`,
    notes: thinnedNames(domainsOf(d, ctx), d.tasks.length, ctx),
  };
}

/**
 * The Gantt chart (intent schedule): one bar per task from its start to its end on a time axis
 * (calendar ticks in UTC, or numbers), one row per task in start order, tasks coloured by an
 * optional group key, and finish-to-start connectors for the predecessors an `after:` column names.
 */
export const GANTT: FormDef<GanttPlan, DerivedGantt> = {
  name: 'gantt',
  noun: 'Gantt chart',
  traits: { lengthCoded: false, connectsKey: false, radial: false, coloursCategories: true, axisPerValue: false },
  plan: planGantt,
  derive: (table, plan) => withPlan(plan, deriveTasks(table, plan.query)),
  domains: domainsOf,
  layout: layoutGantt,
  words,
  alt: (d) => ganttAlt(d.tasks, d.dependencies.length, d.plan.time === 'calendar', (t) => String(timeText(d.plan, t))),
};
