import { extent, max } from 'd3-array';
import { deriveSlopes, type Direction, type SlopeItem, type SlopeQuery } from '../derive/slopes.js';
import { axisTitle } from '../layout/axis.js';
import type { CartesianDomains, LayoutContext, PlotArea } from '../layout/kit-types.js';
import { labelStyle, valueFormatter } from '../layout/number-format.js';
import { asBand, asLinear } from '../layout/scales.js';
import type { Datum, SceneNode, TextNode } from '../scene/types.js';
import { segment } from '../svg/path.js';
import { endLabels, type EndSpec } from './slope-labels.js';
import { planSlope, type SlopePlan } from './slope-plan.js';
import type { FormDef } from './types.js';
import { slopeAlt } from './change-alt.js';
import { withPlan } from './with-plan.js';
import { inSentence } from '../fields/labels.js';

/** What a slope chart draws: its items, the names of its two ends, and its plan. */
export interface DerivedSlope {
  plan: SlopePlan;
  items: SlopeItem[];
  ends: [string, string];
  /** Items left out for a value at only one end. Default: none. */
  incomplete?: string[];
}

/** Line width without a width value, and the widest line with one, in px (common practice). */
const LINE_WIDTH = 2;
const MAX_LINE_WIDTH = 6;

const DIRECTION_WORDS: Record<Direction, string> = { up: 'up', down: 'down', unchanged: 'unchanged' };

function valueField(q: SlopeQuery) {
  return q.source.kind === 'periods' ? q.source.value : q.source.before;
}

/** The field (or word) the two ends are named by, for the datum and the bottom axis. */
function endField(q: SlopeQuery): string {
  return q.source.kind === 'periods' ? q.source.period.name : 'point';
}

function colourOf(direction: Direction, ctx: LayoutContext): string {
  const { palette } = ctx.style;
  return direction === 'up' ? palette.primary : direction === 'down' ? palette.negative : palette.others;
}

/** The shared axis's title: the value (period key), or both columns, with the unit they share. */
function valueTitle(q: SlopeQuery): string {
  const value = valueField(q);
  const label = q.source.kind === 'periods' ? value.label : `${q.source.before.label} and ${inSentence(q.source.after.label)}`;
  return axisTitle({ ...value, label }, label);
}

function domainsOf(d: DerivedSlope, ctx: LayoutContext): CartesianDomains {
  const q = d.plan.query;
  const [lo, hi] = extent(d.items.flatMap((i) => [i.before, i.after])) as [number, number];
  const value = valueField(q);
  const present = (['up', 'down', 'unchanged'] as const).filter((dir) => d.items.some((i) => i.direction === dir));
  return {
    left: { kind: 'linear', name: 'value', field: value.name, title: valueTitle(q), extent: d.plan.zero ? [Math.min(0, lo), Math.max(0, hi)] : [lo, hi], format: value.format },
    bottom: { kind: 'band', name: 'point', field: endField(q), title: q.source.kind === 'periods' ? q.source.period.label : 'Measured at', domain: [...d.ends] },
    first: 'left',
    legend: { kind: 'categorical', field: 'direction', title: 'Direction', entries: present.map((dir) => ({ label: DIRECTION_WORDS[dir], fill: colourOf(dir, ctx) })) },
  };
}

function widthOf(d: DerivedSlope): (item: SlopeItem) => number {
  if (!d.plan.query.width) return () => LINE_WIDTH;
  const top = max(d.items, (i) => i.width ?? 0) ?? 0;
  return (item) => (top > 0 ? Math.max(1, (MAX_LINE_WIDTH * (item.width ?? 0)) / top) : 1);
}

function lineDatum(d: DerivedSlope, item: SlopeItem): Datum {
  const q = d.plan.query;
  const datum: Datum = { [q.item.name]: item.label, [d.ends[0]]: item.before, [d.ends[1]]: item.after, direction: item.direction };
  if (q.width && item.width !== undefined) datum[q.width.name] = item.width;
  return datum;
}

/** Each item's line from its left point to its right point, and a dot at each end. */
function lineMarks(d: DerivedSlope, item: SlopeItem, xs: [number, number], y: (v: number) => number, ctx: LayoutContext): SceneNode[] {
  const q = d.plan.query;
  // Each point's value under its own column: the one value column, or the column of its end.
  const columns = q.source.kind === 'periods' ? [q.source.value.name, q.source.value.name] : [q.source.before.name, q.source.after.name];
  const colour = colourOf(item.direction, ctx);
  const ends = [[xs[0], item.before, d.ends[0], columns[0]!], [xs[1], item.after, d.ends[1], columns[1]!]] as const;
  const points = ends.map(([x, v, end, column]) => ({ x, y: y(v), datum: { [q.item.name]: item.label, [endField(q)]: end, [column]: v } }));
  const line: SceneNode = { kind: 'path', id: ctx.id('line', item.label), role: 'line', commands: segment(points[0]!.x, points[0]!.y, points[1]!.x, points[1]!.y), stroke: colour, strokeWidth: widthOf(d)(item), points, datum: lineDatum(d, item) };
  const dots = points.map((p, i): SceneNode => ({ kind: 'circle', id: ctx.id('point', `${item.label} ${i}`), role: 'point', cx: p.x, cy: p.y, r: 2.5, fill: colour, datum: p.datum }));
  return [line, ...dots];
}

function endSpecs(d: DerivedSlope, xs: [number, number], y: (v: number) => number): [EndSpec, EndSpec] {
  const fmt = valueFormatter(d.items.flatMap((i) => [i.before, i.after]), labelStyle(valueField(d.plan.query)));
  const spec = (side: 'left' | 'right', i: 0 | 1, v: (it: SlopeItem) => number): EndSpec => ({
    side, axisX: xs[i], name: d.ends[i], y: (it) => y(v(it)), value: (it) => fmt(v(it)),
    text: (it) => (side === 'left' ? `${it.label} ${fmt(v(it))}` : `${fmt(v(it))} ${it.label}`),
  });
  return [spec('left', 0, (it) => it.before), spec('right', 1, (it) => it.after)];
}

function layoutSlope(d: DerivedSlope, area: PlotArea, ctx: LayoutContext) {
  const band = asBand(area.x);
  const linear = asLinear(area.y);
  const { plot } = area;
  const { lines } = ctx.style;
  const xs: [number, number] = [band.center(d.ends[0]), band.center(d.ends[1])];
  const axes: SceneNode[] = xs.map((x, i) => ({ kind: 'path', id: ctx.id('axis-line', d.ends[i]!), role: 'axis-line', commands: segment(x, plot.y, x, plot.y + plot.height), stroke: lines.axis, strokeWidth: lines.axisWidth }));
  // The largest changes are labelled first, so they keep their labels if some must be left out.
  const ranked = [...d.items].sort((a, b) => Math.abs(b.after - b.before) - Math.abs(a.after - a.before));
  const marks = [...axes, ...d.items.flatMap((item) => lineMarks(d, item, xs, linear.map, ctx))];
  const labels: TextNode[] = [];
  for (const end of endSpecs(d, xs, linear.map)) {
    const placed = endLabels(ranked, end, plot, ctx);
    marks.push(...placed.leaders);
    labels.push(...placed.labels);
  }
  return { marks, labels, diagnostics: [] };
}

const INCOMPLETE_NAMES = 6;

/** "Not drawn, with a value at only one of 2024 and 2025: A, B." shortened to a count beyond a few names. */
function incompleteNote(d: DerivedSlope): string[] {
  const names = d.incomplete ?? [];
  if (names.length === 0) return [];
  const more = names.length - INCOMPLETE_NAMES;
  return [`Not drawn, with a value at only one of ${d.ends[0]} and ${d.ends[1]}: ${names.slice(0, INCOMPLETE_NAMES).join(', ')}${more > 0 ? ` and ${more} more` : ''}.`];
}

function words(d: DerivedSlope) {
  const q = d.plan.query;
  const count = (dir: Direction) => d.items.filter((i) => i.direction === dir).length;
  const notes: string[] = [];
  if (q.width) {
    const fmt = valueFormatter(d.items.map((i) => i.width ?? 0), labelStyle(q.width));
    const unit = q.width.unit ? ` ${q.width.unit}` : '';
    notes.push(`Line width shows ${inSentence(q.width.label)}: the thickest line is ${fmt(max(d.items, (i) => i.width ?? 0) ?? 0)}${unit}.`);
  }
  notes.push(...incompleteNote(d));
  return {
    title: `${valueTitle(q)}: ${d.ends[0]} and ${d.ends[1]}`,
    description: `Slope chart of ${d.items.length} items (${inSentence(q.item.label)}) from ${d.ends[0]} to ${d.ends[1]}: ${count('up')} went up, ${count('down')} went down and ${count('unchanged')} stayed the same.`,
    notes,
  };
}

/**
 * The slope chart (intent shift): each item's value at two points as a line between two aligned
 * vertical axes on one shared scale, coloured by direction (redundantly with the slope), labelled
 * at both ends with the labels spread apart so none overlap. Drawn on the composer's left value
 * axis and a bottom band axis of the two points, whose band centres are the two vertical axes.
 */
export const SLOPE: FormDef<SlopePlan, DerivedSlope> = {
  name: 'slope',
  noun: 'slope chart',
  // The two ends are one value measured twice, each on its own vertical axis at one shared scale:
  // several value columns here are not a mixing of scales (the shape check requires one unit).
  traits: { lengthCoded: false, connectsKey: false, radial: false, coloursCategories: false, axisPerValue: true },
  plan: planSlope,
  derive: (table, plan) => withPlan(plan, deriveSlopes(table, plan.query)),
  domains: domainsOf,
  layout: layoutSlope,
  words,
  alt: (d) => slopeAlt(d.items, d.ends, d.plan.query.item.label, valueTitle(d.plan.query), labelStyle(valueField(d.plan.query))),
};
