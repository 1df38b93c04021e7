import { extent, max } from 'd3-array';
import { success } from '../diagnostics/diagnostic.js';
import type { ProfileItem } from '../derive/profile.js';
import { rule } from '../layout/axes.js';
import { axisTitle } from '../layout/axis.js';
import type { BodyMarks } from '../layout/chart.js';
import { ticksFor, type LayoutContext } from '../layout/kit-types.js';
import { linearScale, type LinearScale } from '../layout/scales.js';
import { lineHeight, textBoxHeight, textNode, truncateText } from '../layout/text.js';
import type { AxisInfo, Box, SceneNode, TextNode } from '../scene/types.js';
import { polyline } from '../svg/path.js';
import { completeItems, planParallel, type ParallelPlan } from './parallel-plan.js';
import type { FormDef } from './types.js';
import { parallelAlt } from './relation-alt.js';

/** The items and each drawn axis's extent, attributes in drawn order. */
export interface DerivedParallel {
  plan: ParallelPlan;
  items: ProfileItem[];
  extents: [number, number][];
}

/** Most rows the axis titles are staggered over before they are shortened. */
const MAX_TITLE_ROWS = 3;

type Title = { text: string; full: string; width: number };

/** Each title shortened to `room` px. */
function shortened(full: readonly string[], room: number, ctx: LayoutContext): Title[] {
  const st = ctx.style.text.axisTitle;
  return full.map((f) => {
    const text = truncateText(ctx.measure, f, st, room);
    return { text, full: f, width: ctx.measure.width(text, st.size, st.weight) };
  });
}

/**
 * Each axis's title, in as few staggered rows (up to MAX_TITLE_ROWS) as let every title stand
 * whole between its row's neighbours `rows × spacing` apart; shortened only beyond that.
 */
function axisTitles(derived: DerivedParallel, spacing: number, body: Box, ctx: LayoutContext): { titles: Title[]; rows: number } {
  const { measure, style } = ctx;
  const st = style.text.axisTitle;
  const gap = style.spacing.tickGap;
  const full = derived.plan.attributes.map((a) => axisTitle(a, a.label));
  const widest = max(full, (t) => measure.width(t, st.size, st.weight)) ?? 0;
  let rows = 1;
  while (rows < MAX_TITLE_ROWS && widest > rows * spacing - gap) rows++;
  return { titles: shortened(full, Math.max(0, Math.min(body.width, rows * spacing - gap)), ctx), rows };
}

interface Frame { xs: number[]; top: number; bottom: number; titles: Title[]; rows: number; scales: LinearScale[] }

/** Where the axes stand: evenly spaced, inset so the first axis's tick labels and the end titles stay inside the body. */
function frameOf(derived: DerivedParallel, body: Box, ctx: LayoutContext): Frame {
  const { style, measure } = ctx;
  const { tick, axisTitle: at } = style.text;
  const n = derived.plan.attributes.length;
  const { titles, rows } = axisTitles(derived, body.width / Math.max(1, n - 1), body, ctx);
  const top = body.y + rows * lineHeight(at, style.spacing.lineHeight) + style.spacing.tickGap + textBoxHeight(measure, tick) / 2;
  const marker = derived.plan.flips.some(Boolean) ? lineHeight(tick, style.spacing.lineHeight) + style.spacing.tickGap : 0;
  const bottom = body.y + body.height - textBoxHeight(measure, tick) / 2 - marker;
  const ticks = derived.extents.map(([lo, hi]) => ticksFor(ctx, lo, hi, Math.max(1, bottom - top), 'vertical', undefined));
  const firstLabels = max(ticks[0]!.labels, (l) => measure.width(l, tick.size, tick.weight)) ?? 0;
  const left = body.x + Math.max(firstLabels + style.spacing.tickGap + 3, titles[0]!.width / 2);
  const right = body.x + body.width - titles[n - 1]!.width / 2;
  const xs = derived.plan.attributes.map((_, k) => (n === 1 ? (left + right) / 2 : left + ((right - left) * k) / (n - 1)));
  const scales = ticks.map((vt, k) => linearScale(vt, derived.plan.flips[k] ? [top, bottom] : [bottom, top]));
  // The axes stand closer than the first guess (the ends are inset), so the titles are fitted again to the spacing drawn.
  const drawn = n > 1 ? (right - left) / (n - 1) : body.width;
  const fitted = shortened(titles.map((t) => t.full), Math.max(0, Math.min(body.width, rows * drawn - style.spacing.tickGap)), ctx);
  return { xs, top, bottom, titles: fitted, rows, scales };
}

/** One axis: its line, tick marks and labels (only the ends where labels would crowd), title, and a mark when reversed. */
function drawAxis(derived: DerivedParallel, f: Frame, k: number, ctx: LayoutContext): { guides: SceneNode[]; info: AxisInfo } {
  const { style, measure, id } = ctx;
  const { tick } = style.text;
  const [x, scale, attr] = [f.xs[k]!, f.scales[k]!, derived.plan.attributes[k]!];
  const h = textBoxHeight(measure, tick);
  const spacing = f.xs.length > 1 ? f.xs[1]! - f.xs[0]! : Infinity;
  const crowded = (max(scale.labels, (l) => measure.width(l, tick.size, tick.weight)) ?? 0) > spacing - 2 * style.spacing.tickGap - 3;
  const guides: SceneNode[] = [rule(id('axis-line', attr.name), 'axis-line', x, f.top, x, f.bottom, style.lines.axis, style.lines.axisWidth)];
  scale.ticks.forEach((t, i) => {
    const y = scale.map(t);
    guides.push(rule(id('tick-mark', `${attr.name} ${t}`), 'tick-mark', x - 3, y, x, y, style.lines.axis, style.lines.axisWidth));
    const end = i === 0 || i === scale.ticks.length - 1;
    if (scale.shown[i] && (!crowded || end)) guides.push(textNode(measure, { id: id(`tick-${attr.name}`, scale.labels[i]!), role: 'tick', text: scale.labels[i]!, style: tick, x: x - 3 - style.spacing.tickGap / 2, top: y - h / 2, anchor: 'end' }));
  });
  const row = k % f.rows;
  const lh = lineHeight(style.text.axisTitle, style.spacing.lineHeight);
  const title: TextNode = { ...textNode(measure, { id: id('axis-title', attr.name), role: 'axis-title', text: f.titles[k]!.text, style: style.text.axisTitle, x, top: f.top - h / 2 - style.spacing.tickGap - (f.rows - row) * lh + (lh - textBoxHeight(measure, style.text.axisTitle)) / 2, anchor: 'middle' }) };
  if (title.text !== f.titles[k]!.full) title.full = f.titles[k]!.full;
  guides.push(title);
  if (derived.plan.flips[k]) guides.push(textNode(measure, { id: id('axis-reversed', attr.name), role: 'tick', text: 'reversed', style: tick, x, top: f.bottom + h / 2 + style.spacing.tickGap, anchor: 'middle' }));
  // Domain and range pair up end to end: a reversed axis lists its domain high to low, from the bottom up.
  const info: AxisInfo = { orient: 'left', scale: 'linear', field: attr.name, title: f.titles[k]!.full, domain: derived.plan.flips[k] ? [scale.domain[1], scale.domain[0]] : scale.domain, ticks: scale.ticks, tickPositions: scale.ticks.map(scale.map), range: [f.bottom, f.top], position: x };
  return { guides, info };
}

function layoutParallel(derived: DerivedParallel, body: Box, ctx: LayoutContext): BodyMarks {
  const f = frameOf(derived, body, ctx);
  const axes = derived.plan.attributes.map((_, k) => drawAxis(derived, f, k, ctx));
  const { plan } = derived;
  const keyName = plan.key?.name ?? 'item';
  const marks: SceneNode[] = derived.items.map((item) => {
    const points = item.values.map((v, k) => ({ x: f.xs[k]!, y: f.scales[k]!.map(v), datum: { [plan.attributes[k]!.name]: v } }));
    return { kind: 'path', id: ctx.id('line', item.label), role: 'line', commands: polyline(points), points, series: { [keyName]: item.label }, stroke: ctx.style.palette.primary, strokeWidth: 1, opacity: plan.opacity };
  });
  const plot = { x: f.xs[0]!, y: f.top, width: f.xs.at(-1)! - f.xs[0]!, height: f.bottom - f.top };
  return { marks, labels: [], guides: axes.flatMap((a) => a.guides), panels: [{ id: 'panel', plot, axes: axes.map((a) => a.info) }], diagnostics: [] };
}

/** Each drawn axis's extent: its own values, or all values when the scale is shared. */
function extentsOf(plan: ParallelPlan, items: readonly ProfileItem[]): [number, number][] {
  const own = plan.attributes.map((_, k) => extent(items, (it) => it.values[k]) as [number, number]);
  if (!plan.shared) return own;
  const all: [number, number] = [Math.min(...own.map((e) => e[0])), Math.max(...own.map((e) => e[1]))];
  return own.map(() => all);
}

/**
 * Parallel coordinates: one vertical axis per attribute, ordered so that strongly correlated
 * attributes stand side by side, and one polyline per item across them.
 */
export const PARALLEL: FormDef<ParallelPlan, DerivedParallel> = {
  name: 'parallel',
  noun: 'parallel coordinates',
  traits: { lengthCoded: false, connectsKey: false, radial: false, coloursCategories: false, axisPerValue: true },
  plan: planParallel,
  derive(table, plan, ctx) {
    const items = completeItems(table, plan.attributes, plan.key, ctx);
    return items.ok ? success({ plan, items: items.value, extents: extentsOf(plan, items.value) }, items.diagnostics) : items;
  },
  layoutBody: layoutParallel,
  alt: (derived) => parallelAlt(derived.plan.attributes, derived.plan.pairs, derived.items.length),
  words(derived) {
    const { plan, items } = derived;
    const strongest = plan.pairs.reduce<ParallelPlan['pairs'][number] | undefined>((a, p) => (a === undefined || Math.abs(p.r) > Math.abs(a.r) ? p : a), undefined);
    const most = strongest && !Number.isNaN(strongest.r) ? `; the strongest neighbouring pair is ${strongest.left} and ${strongest.right} (r = ${strongest.r.toFixed(2)})` : '';
    return {
      title: `${items.length} items across ${plan.attributes.length} attributes`,
      description: `Parallel coordinates of ${items.length} items over ${plan.attributes.length} attributes (${plan.attributes.map((a) => a.label).join(', ')})${most}.`,
      notes: [],
    };
  },
};
