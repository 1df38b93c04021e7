import { max } from 'd3-array';
import { deriveBars, type BarDatum, type DerivedBars } from '../derive/bars.js';
import { cycleAngles, radialBarRadius } from '../derive/radial.js';
import type { ValueTicks } from '../layout/axis.js';
import { memoized, ticksFor, type LayoutContext } from '../layout/kit-types.js';
import { labelStyle, valueFormatter } from '../layout/number-format.js';
import { polarPoint, ringCommands, sectorCommands } from '../layout/polar.js';
import { textBoxHeight, textNode } from '../layout/text.js';
import type { BodyMarks } from '../layout/chart.js';
import type { Box, SceneNode, TextNode } from '../scene/types.js';
import { barValueTitle, noDataNote, tooltipText } from './bar-text.js';
import { barGroups } from './bar-plan.js';
import { planRadialBar, type RadialBarPlan } from './radial-bar-plan.js';
import type { FormDef } from './types.js';
import { radialBarAlt } from './bar-alt.js';
import { inSentence } from '../fields/labels.js';

/** Inner ring radius as a share of the outer: keeps the narrow inner ends of short bars apart (common practice). */
export const INNER_RING_SHARE = 0.25;
/** Share of each key's sector left empty, half on either side of its bar. */
const SECTOR_PADDING = 0.2;

interface Circle { cx: number; cy: number; outer: number }

/** The circle the bars fill: centre and outer radius, leaving room for the key labels around it. */
function circleIn(body: Box, labels: readonly string[], ctx: LayoutContext): Circle {
  const { measure, style } = ctx;
  const { tick } = style.text;
  const widest = max(labels, (l) => measure.width(l, tick.size, tick.weight)) ?? 0;
  const room = style.spacing.labelGap;
  const outer = Math.max(0, Math.min(body.width / 2 - widest - room, body.height / 2 - textBoxHeight(measure, tick) - room));
  return { cx: body.x + body.width / 2, cy: body.y + body.height / 2, outer };
}

/** A key's label just outside the outer ring, anchored away from the circle at its angle. */
function keyLabel(text: string, angle: number, c: Circle, ctx: LayoutContext): TextNode {
  const { measure, style } = ctx;
  const h = textBoxHeight(measure, style.text.tick);
  const p = polarPoint(c.cx, c.cy, c.outer + style.spacing.labelGap, angle);
  const sin = Math.sin((angle * Math.PI) / 180);
  const cos = Math.cos((angle * Math.PI) / 180);
  const anchor = sin > 0.1 ? 'start' : sin < -0.1 ? 'end' : 'middle';
  // Above the point at 12 o'clock, below it at 6, centred on it at 3 and 9.
  return textNode(measure, { id: ctx.id('tick-key', text), role: 'tick', text, style: style.text.tick, x: p.x, top: p.y - h / 2 - (h / 2) * cos, anchor });
}

interface Sector { from: number; to: number; inner: number; outer: number }

/** Whether a point lies inside an annular sector (angles in degrees clockwise from 12 o'clock). */
function inSector(x: number, y: number, c: Circle, s: Sector): boolean {
  const r = Math.hypot(x - c.cx, y - c.cy);
  const a = ((Math.atan2(x - c.cx, c.cy - y) * 180) / Math.PI + 360) % 360;
  const from = ((s.from % 360) + 360) % 360;
  const turn = (a - from + 360) % 360;
  return r >= s.inner && r <= s.outer && turn <= s.to - s.from;
}

/** Whether a text box touches any bar: its corners, edge midpoints and centre tested (labels are far smaller than bars). */
function coversBar(box: Box, c: Circle, sectors: readonly Sector[]): boolean {
  const xs = [box.x, box.x + box.width / 2, box.x + box.width];
  const ys = [box.y, box.y + box.height / 2, box.y + box.height];
  return sectors.some((s) => xs.some((x) => ys.some((y) => inSector(x, y, c, s))));
}

/**
 * Rings at the value ticks (the inner ring is zero), and their labels along the seam between the
 * last key and the first; a label that would lie on a bar is left out (its ring stays, read from
 * the labelled ones).
 */
function rings(derived: DerivedBars<RadialBarPlan>, c: Circle, sectors: readonly Sector[], top: ValueTicks, ctx: LayoutContext): SceneNode[] {
  const { style, measure } = ctx;
  const inner = c.outer * INNER_RING_SHARE;
  const seam = -180 / Math.max(1, wheelPlaces(derived).places.length);
  const h = textBoxHeight(measure, style.text.tick);
  const guides: SceneNode[] = [];
  top.ticks.forEach((t, i) => {
    const r = radialBarRadius(t, top.domain[1], inner, c.outer);
    const text = top.labels[i]!;
    const zero = t === 0;
    guides.push({ kind: 'path', id: ctx.id(zero ? 'axis-line' : 'gridline', text), role: zero ? 'axis-line' : 'gridline', commands: ringCommands(c.cx, c.cy, r), stroke: zero ? style.lines.axis : style.lines.grid, strokeWidth: zero ? style.lines.axisWidth : style.lines.gridWidth });
    if (!top.shown[i] || zero) return;
    const p = polarPoint(c.cx, c.cy, r, seam);
    const label = textNode(measure, { id: ctx.id('tick-value', text), role: 'tick', text, style: style.text.tick, x: p.x, top: p.y - h / 2, anchor: 'middle' });
    if (!coversBar(label.box, c, sectors)) guides.push(label);
  });
  return guides;
}

/** Every place of the wheel in cycle order, with its bar (undefined where the data has none), and the places with no data. */
function wheelPlaces(derived: DerivedBars<RadialBarPlan>): { places: { label: string; bar: BarDatum | undefined }[]; missing: string[] } {
  const byLabel = new Map(derived.bars.map((b) => [b.label, b]));
  const wheel = derived.query.wheel ?? [];
  const onWheel = new Set(wheel);
  // A bar whose key is not on the wheel (never expected) is still drawn, after the wheel's places.
  const labels = [...wheel, ...derived.bars.map((b) => b.label).filter((l) => !onWheel.has(l))];
  const places = labels.map((label) => ({ label, bar: byLabel.get(label) }));
  return { places, missing: places.filter((p) => p.bar === undefined).map((p) => p.label) };
}

/** One place's sector at its angle, from the inner ring out to `value`'s radius. */
function sectorOf(places: number, value: number, angle: number, top: number, c: Circle): Sector {
  const inner = c.outer * INNER_RING_SHARE;
  const half = (180 / places) * (1 - SECTOR_PADDING);
  return { from: angle - half, to: angle + half, inner, outer: radialBarRadius(value, top, inner, c.outer) };
}

/** A place with no data: its whole sector outlined with a dash and left unfilled, so it reads as "nothing known", never as zero. */
function emptySector(derived: DerivedBars<RadialBarPlan>, label: string, angle: number, s: Sector, c: Circle, ctx: LayoutContext): SceneNode {
  return {
    kind: 'path', id: ctx.id('bar-missing', label), role: 'bar', datum: { [derived.query.key.name]: label, [derived.valueName]: null },
    commands: sectorCommands(c.cx, c.cy, s.inner, s.outer, s.from, s.to), fill: ctx.style.background, stroke: ctx.style.palette.others, strokeWidth: 1, dash: [3, 3], angle, radius: s.outer,
  };
}

/** A bar's tooltip: the key and value by their labels, the value in the chart's number format (formatter made once per chart). */
function radialTooltip(derived: DerivedBars<RadialBarPlan>, bar: BarDatum, ctx: LayoutContext): string {
  const fmt = memoized(ctx, 'radial-bar\u0000format', () => valueFormatter(derived.bars.map((b) => b.value), labelStyle(derived.query.value, derived.query.key)));
  return tooltipText([[derived.query.key.label, bar.label], [barValueTitle(derived.query), fmt(bar.value)]]);
}

function radialBar(derived: DerivedBars<RadialBarPlan>, bar: BarDatum, angle: number, s: Sector, c: Circle, ctx: LayoutContext): SceneNode {
  return {
    kind: 'path', id: ctx.id('bar', bar.label), role: 'bar', datum: { [derived.query.key.name]: bar.label, [derived.valueName]: bar.value }, tooltip: radialTooltip(derived, bar, ctx),
    commands: sectorCommands(c.cx, c.cy, s.inner, s.outer, s.from, s.to), fill: ctx.style.palette.primary, angle, radius: s.outer,
  };
}

/** The rings' title (the value and its unit) at the body's top left, as a left axis's title sits; the circle gets the rest. */
function ringTitle(derived: DerivedBars<RadialBarPlan>, body: Box, ctx: LayoutContext): { title: TextNode; rest: Box } {
  const { style, measure } = ctx;
  const title = textNode(measure, { id: 'axis-title-value', role: 'axis-title', text: barValueTitle(derived.query), style: style.text.axisTitle, x: body.x, top: body.y, anchor: 'start' });
  const taken = title.box.height + style.spacing.tickGap;
  return { title, rest: { ...body, y: body.y + taken, height: Math.max(0, body.height - taken) } };
}

function layoutRadial(derived: DerivedBars<RadialBarPlan>, whole: Box, ctx: LayoutContext): BodyMarks {
  const { title, rest: body } = ringTitle(derived, whole, ctx);
  const { places } = wheelPlaces(derived);
  const c = circleIn(body, places.map((p) => p.label), ctx);
  const angles = cycleAngles(places.length);
  const inner = c.outer * INNER_RING_SHARE;
  const ticks = ticksFor(ctx, 0, max(derived.bars, (b) => b.value) ?? 0, c.outer - inner, 'vertical', derived.query.value?.format);
  const top = ticks.domain[1];
  const sectors = places.map((p, i) => sectorOf(places.length, p.bar ? p.bar.value : top, angles[i]!, top, c));
  const guides = rings(derived, c, sectors.filter((_, i) => places[i]!.bar !== undefined), ticks, ctx);
  const marks = places.map((p, i) => (p.bar ? radialBar(derived, p.bar, angles[i]!, sectors[i]!, c, ctx) : emptySector(derived, p.label, angles[i]!, sectors[i]!, c, ctx)));
  const labels = places.map((p, i) => keyLabel(p.label, angles[i]!, c, ctx));
  const plot = { x: c.cx - c.outer, y: c.cy - c.outer, width: 2 * c.outer, height: 2 * c.outer };
  return { marks, labels: [], guides: [...guides, ...labels, title], panels: [{ id: 'panel', plot, axes: [] }], diagnostics: [] };
}

/**
 * Radial bars for a cyclic key (months, weekdays, hours, directions): one bar per key around a
 * circle in cycle order, the last next to the first, each from an inner ring out to its value.
 */
export const RADIAL_BAR: FormDef<RadialBarPlan, DerivedBars<RadialBarPlan>> = {
  name: 'radial-bar',
  noun: 'radial bar chart',
  traits: { lengthCoded: true, connectsKey: false, radial: true, coloursCategories: false, axisPerValue: false },
  plan: planRadialBar,
  // A cycle is never folded: every key keeps its place around the circle.
  derive: (table, plan, ctx) => deriveBars(table, plan, () => Number.MAX_SAFE_INTEGER, barGroups(table, plan.key, plan.value, ctx)),
  layoutBody: layoutRadial,
  alt: radialBarAlt,
  words(derived) {
    const valueTitle = barValueTitle(derived.query);
    const fmt = valueFormatter(derived.bars.map((b) => b.value), labelStyle(derived.query.value, derived.query.key));
    const n = derived.bars.length;
    const what = `Radial bar chart of ${inSentence(valueTitle)} by ${inSentence(derived.query.key.label)}, ${n} bar${n === 1 ? '' : 's'} around a circle in cycle order`;
    const top = derived.bars.reduce<BarDatum | undefined>((a, b) => (a === undefined || b.value > a.value ? b : a), undefined);
    const low = derived.bars.reduce<BarDatum | undefined>((a, b) => (a === undefined || b.value < a.value ? b : a), undefined);
    const description = top && low && top !== low ? `${what}: largest ${top.label} (${fmt(top.value)}), smallest ${low.label} (${fmt(low.value)}).` : `${what}.`;
    const { missing } = wheelPlaces(derived);
    return { title: `${valueTitle} by ${inSentence(derived.query.key.label)}`, description, notes: noDataNote({ ...derived.query, noData: missing }) };
  },
};
