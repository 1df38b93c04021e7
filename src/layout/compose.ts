import type { Diagnostic } from '../diagnostics/diagnostic.js';
import { diagnostic } from '../diagnostics/diagnostic.js';
import { idMaker } from '../scene/ids.js';
import type { Box, PanelInfo, Scene, SceneNode, TextNode } from '../scene/types.js';
import { allNodes } from '../scene/walk.js';
import type { ValueTicks } from './axis.js';
import { drawBottomBandAxis, drawLeftBandAxis, drawLinearAxis, drawTimeAxis, rule, type DrawnAxis } from './axes.js';
import { checkScene } from './checks.js';
import { layoutFrame } from './frame.js';
import type { LegendLayout, LegendSpec } from './legend.js';
import { layoutLegends } from './legends.js';
import { placeFormLabels } from './place-labels.js';
import { memoized, ticksFor, type CartesianDomains, type FormMarks, type FormWords, type LabelRoom, type LayoutContext, type LinearChannel, type PlotArea, type ScaleProbe } from './kit-types.js';
import { plotBox, tickCount, type PlotBox } from './plot-box.js';
import { bandScale, linearScale, type BandScale, type LinearScale, type Scale } from './scales.js';
import { timeScale } from './time-scale.js';
import type { FacetHooks } from './facet-types.js';
import { NO_ROOM, bottomRange, bottomTime } from './bottom-axis.js';
import { agree, count } from '../diagnostics/words.js';
import { missingGlyphsNote } from '../font/missing-report.js';

export { placeFormLabels };

/** What the composer needs of a form drawn on a left and a bottom axis. */
export interface CartesianForm<D> {
  name: string;
  words(derived: D, ctx: LayoutContext): FormWords;
  domains(derived: D, ctx: LayoutContext): CartesianDomains;
  /** Room the form's own labels need beyond its marks, measured against a first look at the scales. Default: none. */
  room?(derived: D, probe: ScaleProbe, ctx: LayoutContext): LabelRoom;
  layout(derived: D, area: PlotArea, ctx: LayoutContext): FormMarks;
  /** Present when the form can be drawn as small multiples (src/layout/facet-compose.ts). Default: none. */
  facets?: FacetHooks<D>;
}

/** The left axis's linear scale: its range shortened at either end by the room the form's labels take. */
function leftLinear(channel: LinearChannel, plot: Box, room: LabelRoom, ctx: LayoutContext): LinearScale {
  const [top, bottom] = [plot.y, plot.y + plot.height];
  const rangeBottom = bottom - (room.show ? room.low : 0);
  const rangeTop = top + (room.show ? room.high : 0);
  const vt = ticksFor(ctx, channel.extent[0], channel.extent[1], rangeBottom - rangeTop, 'vertical', channel);
  return linearScale(vt, [rangeBottom, rangeTop]);
}

/** The bottom axis's linear scale, inset so the end tick labels and the form's labels stay inside the plot's width. */
function bottomLinear(channel: LinearChannel, plot: Box, probeLabels: string[], room: LabelRoom, ctx: LayoutContext, clearCorner = false): LinearScale {
  let [rangeLeft, rangeRight] = bottomRange(plot, probeLabels, room, ctx);
  let vt = ticksFor(ctx, channel.extent[0], channel.extent[1], rangeRight - rangeLeft, 'horizontal', channel);
  // Under a linear left axis, whose lowest label sits at the corner, the first label drawn starts
  // no further left than the plot: the probe's first label may be narrower than the one drawn.
  const { tick } = ctx.style.text;
  for (let i = 0; clearCorner && i < 3; i++) {
    const start = rangeLeft - ctx.measure.width(vt.labels[0] ?? '', tick.size, tick.weight) / 2;
    if (start >= plot.x - 1e-9) break;
    rangeLeft += plot.x - start;
    vt = ticksFor(ctx, channel.extent[0], channel.extent[1], rangeRight - rangeLeft, 'horizontal', channel);
  }
  return linearScale(vt, [rangeLeft, rangeRight]);
}

/** Both scales of a plot and the room taken for the form's labels. */
export interface FittedScales { x: Scale; y: Scale; room: LabelRoom }

/** Both scales over the plot box, with the given room taken for the form's labels. */
function scalesWith(domains: CartesianDomains, box: PlotBox, bottomProbe: ValueTicks | undefined, bottomBand: BandScale | undefined, room: LabelRoom, side: 'left' | 'bottom' | undefined, ctx: LayoutContext): FittedScales {
  const { plot, left } = box;
  const leftBand: BandScale | undefined = left.kind === 'band' ? left.band : undefined;
  const y = domains.left.kind === 'linear' ? leftLinear(domains.left, plot, side === 'left' ? room : NO_ROOM, ctx)
    : domains.left.kind === 'time' ? timeScale(domains.left.extent, [plot.y + plot.height, plot.y], tickCount(plot.height, 'vertical'), undefined, ctx.brief.locale) : leftBand!;
  const x = domains.bottom.kind === 'linear' ? bottomLinear(domains.bottom, plot, bottomProbe!.labels, side === 'bottom' ? room : NO_ROOM, ctx, domains.left.kind === 'linear')
    : domains.bottom.kind === 'time' ? bottomTime(domains.bottom, plot, ctx) : bottomBand!;
  return { x, y, room };
}

/** Whether a room measured on the drawn scale asks for nothing the scale was not already given. */
const holds = (given: LabelRoom, again: LabelRoom) => again.show === given.show && again.low <= given.low + 1e-9 && again.high <= given.high + 1e-9;

/**
 * Builds both scales from the forms' domains over the plot box, taking the room the form's labels
 * need. The room is measured on a first look at the scale, then again on the scale drawn (whose
 * ticks, and so domain, may differ), and widened until it holds, so a label never lands beyond
 * the plot on a scale it was not measured against.
 */
export function fitScales<D>(form: CartesianForm<D>, derived: D, domains: CartesianDomains, box: PlotBox, ctx: LayoutContext): FittedScales {
  const { plot, left } = box;
  const bottomBand = domains.bottom.kind === 'band' ? bandScale(domains.bottom.domain, [plot.x, plot.x + plot.width], ctx.style.spacing.bandPadding) : undefined;
  const leftBand: BandScale | undefined = left.kind === 'band' ? left.band : undefined;
  const bottomProbe = domains.bottom.kind === 'linear' ? ticksFor(ctx, domains.bottom.extent[0], domains.bottom.extent[1], plot.width, 'horizontal', domains.bottom) : undefined;
  const probe: ScaleProbe | undefined = left.kind === 'linear'
    ? { plot, side: 'left', band: bottomBand, linear: linearScale(left.probe, [plot.y + plot.height, plot.y]) }
    : bottomProbe ? { plot, side: 'bottom', band: leftBand, linear: linearScale(bottomProbe, [plot.x, plot.x + plot.width]) } : undefined;
  if (!probe || !form.room) return scalesWith(domains, box, bottomProbe, bottomBand, NO_ROOM, undefined, ctx);
  let room = form.room(derived, probe, ctx);
  for (let i = 0; ; i++) {
    const scales = scalesWith(domains, box, bottomProbe, bottomBand, room, probe.side, ctx);
    const drawn = probe.side === 'left' ? scales.y : scales.x;
    if (i === 3 || drawn.kind !== 'linear') return scales;
    const again = form.room(derived, { ...probe, linear: drawn }, ctx);
    if (holds(room, again)) return scales;
    room = { show: room.show && again.show, low: Math.max(room.low, again.low), high: Math.max(room.high, again.high) };
  }
}

/** One axis of a plot, drawn by the drawer for its channel and scale. */
export function drawAxis(side: 'left' | 'bottom', domains: CartesianDomains, scales: FittedScales, box: PlotBox, body: Box, ctx: LayoutContext): DrawnAxis {
  const channel = domains[side];
  const scale = side === 'left' ? scales.y : scales.x;
  if (channel.kind === 'linear' && scale.kind === 'linear') return drawLinearAxis(side, scale, channel, box.plot, body, ctx, domains.zeroLine === side);
  if (channel.kind === 'time' && scale.kind === 'time') return drawTimeAxis(side, scale, channel, box.plot, body, ctx);
  if (channel.kind === 'band' && side === 'bottom' && scale.kind === 'band') return drawBottomBandAxis(scale, channel, box.plot, body, ctx);
  if (channel.kind === 'band' && box.left.kind === 'band') return drawLeftBandAxis(box.left, channel, box.plot, body, ctx);
  throw new Error(`no axis drawer for a ${channel.kind} channel on the ${side}`);
}

/** The zero line across a plot, where the form asks for one. */
export function zeroLine(domains: CartesianDomains, scales: FittedScales, plot: Box, ctx: LayoutContext): SceneNode[] {
  const { lines } = ctx.style;
  if (domains.zeroLine === 'left' && scales.y.kind === 'linear') return [rule('zero-line', 'zero-line', plot.x, scales.y.map(0), plot.x + plot.width, scales.y.map(0), lines.zero, lines.zeroWidth)];
  if (domains.zeroLine === 'bottom' && scales.x.kind === 'linear') return [rule('zero-line', 'zero-line', scales.x.map(0), plot.y, scales.x.map(0), plot.y + plot.height, lines.zero, lines.zeroWidth)];
  return [];
}

/** Where a legend goes: in rows above the plot when that takes at most LEGEND_TOP_SHARE of the body, else in a column at the right. */
const LEGEND_TOP_SHARE = 0.25;
/** Widest share of the body a right-hand legend column may take. */
const LEGEND_RIGHT_SHARE = 0.3;

/** Lays out a form's legend and the body it leaves for the plot and axes. */
export function placeLegend(spec: LegendSpec | LegendSpec[] | undefined, body: Box, ctx: LayoutContext): { body: Box; legend?: LegendLayout } {
  const specs = spec === undefined ? [] : Array.isArray(spec) ? spec : [spec];
  if (specs.length === 0) return { body };
  const { style, measure } = ctx;
  const gap = style.spacing.blockGap;
  const top = layoutLegends(specs, { x: body.x, y: body.y, width: body.width, placement: 'top' }, style, measure);
  if (top.height <= body.height * LEGEND_TOP_SHARE) return { legend: top, body: { ...body, y: body.y + top.height + gap, height: Math.max(0, body.height - top.height - gap) } };
  const width = body.width * LEGEND_RIGHT_SHARE;
  const probe = layoutLegends(specs, { x: 0, y: body.y, width, placement: 'right' }, style, measure);
  const right = layoutLegends(specs, { x: body.x + body.width - probe.width, y: body.y, width: probe.width, placement: 'right' }, style, measure);
  return { legend: right, body: { ...body, width: Math.max(0, body.width - right.width - gap) } };
}

/** The frame, the legend and the plot box a chart of these domains and notes gets. */
export interface PlotLayout {
  frame: ReturnType<typeof layoutFrame>;
  /** The body left for plot and axes once the legend has its place. */
  body: Box;
  legend?: LegendLayout;
  box: PlotBox;
}

/**
 * The frame (title, subtitle, notes, source), the legend and the plot box for a form's domains:
 * the one sequence both planning (how many bars fit, which orientation) and drawing go through,
 * so what is planned is what is drawn.
 */
export function plotFor(domains: CartesianDomains, notes: string[], ctx: LayoutContext, minLeftWidth = 0): PlotLayout {
  const framed = frameFor(domains.legend, notes, ctx);
  return { ...framed, box: plotBox(framed.body, domains, ctx, minLeftWidth) };
}

/**
 * The frame (title, subtitle, notes, source) and the legend, and the body they leave: the start
 * of every composition. The frame depends only on its notes within one render, so it is laid out
 * once for planning and drawing.
 */
export function frameFor(legendSpec: LegendSpec | LegendSpec[] | undefined, notes: string[], ctx: LayoutContext): Omit<PlotLayout, 'box'> {
  const { brief, style, measure } = ctx;
  const frame = memoized(ctx, `frame\u0000${brief.size.width}\u0000${brief.size.height}\u0000${notes.join('\u0000')}`, () => layoutFrame({ title: brief.title, subtitle: brief.subtitle, source: brief.source, notes }, style, brief.size, measure));
  const { body, legend } = placeLegend(legendSpec, frame.body, ctx);
  return { frame, body, ...(legend ? { legend } : {}) };
}

/** A finished scene: the chart's words and tree, its panels (the first gives `plot` and `axes`) and its legend. */
export function sceneOf(form: string, words: FormWords, children: SceneNode[], panels: PanelInfo[], legend: LegendLayout | undefined, ctx: LayoutContext): Scene {
  const { brief, style } = ctx;
  const first = panels[0]!;
  return {
    form, width: brief.size.width, height: brief.size.height, background: style.background,
    title: brief.title ?? words.title, description: brief.description ?? words.description,
    root: { kind: 'group', id: 'chart', role: 'chart', children }, axes: first.axes, plot: first.plot,
    panels, legends: legend ? legend.infos ?? [legend.info] : [],
  };
}

/** Widest label a left linear axis draws, when wider than the column its plot box left for it. */
function widerLeftLabels(scales: FittedScales, placed: PlotLayout, ctx: LayoutContext): number | undefined {
  if (scales.y.kind !== 'linear') return undefined;
  const { tick } = ctx.style.text;
  const y = scales.y;
  const widest = Math.max(0, ...y.labels.filter((_, i) => y.shown[i]).map((l) => ctx.measure.width(l, tick.size, tick.weight)));
  const column = placed.box.plot.x - placed.body.x - ctx.style.spacing.tickGap;
  return widest > column + 1e-9 ? widest : undefined;
}

/** A composed chart and the labels it left out. */
export interface Composed { scene: Scene; diagnostics: Diagnostic[]; dropped: TextNode[] }

function compose<D>(form: CartesianForm<D>, derived: D, ctx: LayoutContext, extraNotes: string[], drop: ReadonlySet<string> = new Set()): Composed {
  const { brief, measure } = ctx;
  const words = form.words(derived, ctx);
  const domains = form.domains(derived, ctx);
  const notes = [...words.notes, ...extraNotes];
  let placed = plotFor(domains, notes, ctx);
  let scales = fitScales(form, derived, domains, placed.box, ctx);
  // The ticks drawn can be wider than those the column was measured with: widen it, once.
  const wider = widerLeftLabels(scales, placed, ctx);
  if (wider !== undefined) {
    placed = plotFor(domains, notes, ctx, wider);
    scales = fitScales(form, derived, domains, placed.box, ctx);
  }
  const { frame, body, legend, box } = placed;
  const sides = domains.first === 'left' ? (['left', 'bottom'] as const) : (['bottom', 'left'] as const);
  const [one, two] = sides.map((side) => drawAxis(side, domains, scales, box, body, ctx)) as [DrawnAxis, DrawnAxis];
  const drawn = form.layout(derived, { plot: box.plot, x: scales.x, y: scales.y, room: scales.room }, ctx);
  const guides: SceneNode[] = [...one.labels, ...two.labels, one.title, two.title, ...allNodes(legend?.nodes ?? []), ...frame.texts];
  const { kept, dropped } = placeFormLabels(drawn.labels, guides, brief.size, drop);
  const children: SceneNode[] = [
    ...one.grid, ...two.grid, ...drawn.marks, ...zeroLine(domains, scales, box.plot, ctx), ...one.tickMarks, ...two.tickMarks,
    ...one.labels, ...two.labels, ...kept, one.title, two.title, ...(legend?.nodes ?? []), ...frame.texts,
  ];
  const info = [one.info, two.info];
  const checks = checkScene(allNodes(children), box.plot, brief.size, measure);
  // In a frame too small for its words, thinned or shortened labels are symptoms of that one error.
  const diagnostics = checks.some((d) => d.code === 'layout.frame-too-small') ? checks : [...one.diagnostics, ...two.diagnostics, ...drawn.diagnostics, ...checks];
  return {
    scene: sceneOf(form.name, words, children, [{ id: 'panel', plot: box.plot, axes: info }], legend, ctx),
    diagnostics,
    dropped,
  };
}

/**
 * The composer for forms on a left and a bottom axis: frame (title, subtitle, notes, source) →
 * legend → the plot box the axes leave → scales from the form's domains → axes → the form's
 * marks → label placement → scene-wide checks. Layers are drawn in one order for every form:
 * gridlines, marks, zero line, tick marks; then tick labels, the form's labels, axis titles,
 * the legend and the frame's words. A form label that would overlap other text is left out,
 * and the chart says so in a note.
 */
export function layoutCartesian<D>(form: CartesianForm<D>, derived: D, ctx: LayoutContext): { scene: Scene; diagnostics: Diagnostic[] } {
  return withUnplacedNote((c, notes, drop) => compose(form, derived, c, notes, drop), ctx);
}

/** One composition of a chart: with extra notes, leaving out the labels of `drop` (by id). */
export type Composition = (ctx: LayoutContext, extraNotes: string[], drop: ReadonlySet<string>) => Composed;

/** The notes of a second composition: what the first left out, and why some text is boxes. */
function notesFor(dropped: readonly Composed['dropped'][number][], glyphs: string | undefined): string[] {
  const n = dropped.length;
  const left = n ? [`${n} label${n === 1 ? ' is' : 's are'} left out where ${n === 1 ? 'it' : 'they'} would overlap other text (${dropped.slice(0, 3).map((l) => l.text).join(', ')}${n > 3 ? ', …' : ''}).`] : [];
  return [...(glyphs ? [glyphs] : []), ...left];
}

/**
 * Runs a composition, and when it had to leave labels out, or drew characters no font has as
 * boxes, runs it again with notes that say so (a note takes room from the plot). A later run
 * starts its ids afresh (the same ids in the same order) and keeps the labels left out before,
 * so the note stays true; when only the glyph note made labels fall out, a third run names them.
 */
export function withUnplacedNote(composition: Composition, ctx: LayoutContext): { scene: Scene; diagnostics: Diagnostic[] } {
  const first = composition(ctx, [], new Set());
  const glyphs = missingGlyphsNote(first.diagnostics);
  // A frame too small for its words says so; a note would only crowd it more.
  if ((first.dropped.length === 0 && !glyphs) || first.diagnostics.some((d) => d.code === 'layout.frame-too-small')) return first;
  let dropped = first.dropped;
  let run = composition({ ...ctx, id: idMaker() }, notesFor(dropped, glyphs), new Set(dropped.map((l) => l.id)));
  if (dropped.length === 0 && run.dropped.length > 0) {
    dropped = run.dropped;
    run = composition({ ...ctx, id: idMaker() }, notesFor(dropped, glyphs), new Set(dropped.map((l) => l.id)));
  }
  if (dropped.length === 0) return run;
  const [n, m] = [dropped.length, run.dropped.length];
  const unplaced = diagnostic('layout.labels-unplaced', `${count(m, 'label')} would overlap other text and ${agree(m, 'is', 'are')} left out; the chart's note names ${n === m ? 'them' : `${n} of them`}`, {
    found: dropped[0]!.text, hint: 'make the chart larger with `size:`, or use fewer or shorter labels',
  });
  return { scene: run.scene, diagnostics: [...run.diagnostics, unplaced] };
}
