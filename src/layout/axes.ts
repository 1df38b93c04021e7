import { max } from 'd3-array';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { ordinal } from '../diagnostics/words.js';
import type { AxisInfo, Box, Role, SceneNode, TextNode } from '../scene/types.js';
import { segment } from '../svg/path.js';
import { thinningStep } from './axis.js';
import type { BandChannel, Channel, LayoutContext, LinearChannel, TimeChannel } from './kit-types.js';
import type { FittedBandLabels } from './plot-box.js';
import type { BandScale, LinearScale, TimeScale } from './scales.js';
import { capText, lineHeight, textBoxHeight, textNode, truncateText } from './text.js';

/** One axis, drawn: gridlines (under the marks), tick marks, tick labels and title (over them). */
export interface DrawnAxis {
  grid: SceneNode[];
  tickMarks: SceneNode[];
  labels: TextNode[];
  title: TextNode;
  info: AxisInfo;
  diagnostics: Diagnostic[];
}

/** A straight rule as a path node. */
export function rule(id: string, role: Role, x1: number, y1: number, x2: number, y2: number, stroke: string, width: number): SceneNode {
  return { kind: 'path', id, role, commands: segment(x1, y1, x2, y2), stroke, strokeWidth: width };
}

function thinned(field: string, k: number, total: number, shown: number): Diagnostic {
  return diagnostic('layout.labels-thinned', `${total} key labels do not all fit; every ${ordinal(k)} is shown (${shown} of ${total})`, {
    field, hint: 'make the chart larger with `size:`, or use shorter labels',
  });
}

/**
 * The title of a left axis sits above the plot at the body's left edge; a bottom axis's title is
 * centred under its tick labels, moved in to stay within the body. A title wider than the body is
 * shortened with "…" (the full text kept as the SVG title), so it never leaves the canvas.
 */
export function axisTitleNode(side: 'left' | 'bottom', channel: Channel, plot: Box, body: Box, ctx: LayoutContext): TextNode {
  const { style, measure } = ctx;
  const { tickGap, lineHeight: factor } = style.spacing;
  const { axisTitle } = style.text;
  const fitted = truncateText(measure, capText(channel.title), axisTitle, Math.max(0, body.width));
  const width = measure.width(fitted, axisTitle.size, axisTitle.weight);
  const node = (x: number, top: number, anchor: TextNode['anchor']) => {
    const n = textNode(measure, { id: `axis-title-${channel.name}`, role: 'axis-title', text: fitted, style: axisTitle, x, top, anchor });
    return fitted === channel.title ? n : { ...n, full: channel.title };
  };
  if (side === 'left') return node(body.x, body.y, 'start');
  const bottom = plot.y + plot.height;
  const centre = Math.min(Math.max(plot.x + plot.width / 2, body.x + width / 2), body.x + body.width - width / 2);
  return node(centre, bottom + tickGap + lineHeight(style.text.tick, factor) + tickGap, 'middle');
}

/** A linear axis: a gridline across the plot at each tick (but zero, where a zero line is drawn instead), and each shown tick's label. */
export function drawLinearAxis(side: 'left' | 'bottom', scale: LinearScale, channel: LinearChannel, plot: Box, body: Box, ctx: LayoutContext, zeroLine = false): DrawnAxis {
  const { style, measure, id } = ctx;
  const { tick } = style.text;
  const gap = style.spacing.tickGap;
  const tickBox = textBoxHeight(measure, tick);
  const vertical = side === 'left';
  const [a, b] = vertical ? [plot.x, plot.x + plot.width] : [plot.y, plot.y + plot.height];
  const grid: SceneNode[] = [];
  const labels: TextNode[] = [];
  scale.ticks.forEach((t, i) => {
    const p = scale.map(t);
    const text = scale.labels[i]!;
    if (t !== 0 || !zeroLine) grid.push(vertical ? rule(id('gridline', text), 'gridline', a, p, b, p, style.lines.grid, style.lines.gridWidth) : rule(id('gridline', text), 'gridline', p, a, p, b, style.lines.grid, style.lines.gridWidth));
    const place = vertical ? { x: a - gap, top: p - tickBox / 2, anchor: 'end' as const } : { x: p, top: b + gap, anchor: 'middle' as const };
    if (scale.shown[i]) labels.push(textNode(measure, { id: id(`tick-${channel.name}`, text), role: 'tick', text, style: tick, ...place }));
  });
  const info: AxisInfo = { orient: side, scale: 'linear', field: channel.field, title: channel.title, domain: scale.domain, ticks: scale.ticks, tickPositions: scale.ticks.map(scale.map), range: scale.range };
  return { grid, tickMarks: [], labels, title: axisTitleNode(side, channel, plot, body, ctx), info, diagnostics: [] };
}

/**
 * Which of a time axis's labels to print: every k-th, the smallest k at which no two printed
 * labels come closer than half the font size (labels of calendar ticks are not all equal, so
 * thinning keeps a regular rhythm rather than picking favourites).
 */
function thinTimeLabels(scale: TimeScale, vertical: boolean, ctx: LayoutContext): boolean[] {
  const { tick } = ctx.style.text;
  const gap = tick.size * 0.5;
  const extent = (l: string) => (vertical ? textBoxHeight(ctx.measure, tick) : ctx.measure.width(l, tick.size, tick.weight));
  for (let k = 1; k <= scale.ticks.length; k++) {
    const kept = scale.ticks.map((_, i) => i % k === 0);
    const idx = kept.flatMap((on, i) => (on ? [i] : []));
    const clear = idx.every((i, j) => j === 0 || Math.abs(scale.map(scale.ticks[i]!) - scale.map(scale.ticks[idx[j - 1]!]!)) >= (extent(scale.labels[i]!) + extent(scale.labels[idx[j - 1]!]!)) / 2 + gap);
    if (clear) return kept;
  }
  return scale.ticks.map((_, i) => i === 0);
}

/** A time axis: a gridline at each calendar tick and its label at the data's grain, thinned to every k-th when crowded. */
export function drawTimeAxis(side: 'left' | 'bottom', scale: TimeScale, channel: TimeChannel, plot: Box, body: Box, ctx: LayoutContext): DrawnAxis {
  const shown = thinTimeLabels(scale, side === 'left', ctx);
  const asLinear: LinearScale = { kind: 'linear', domain: scale.domain, range: scale.range, ticks: scale.ticks, labels: scale.labels, shown, map: scale.map };
  const drawn = drawLinearAxis(side, asLinear, { kind: 'linear', name: channel.name, field: channel.field, title: channel.title, extent: channel.extent }, plot, body, ctx);
  return { ...drawn, info: { ...drawn.info, scale: 'time', domain: scale.domain } };
}

/**
 * Centres of the labels under upright bands, every k-th shown: the smallest k at which no two
 * labels come closer than `gap`, after each is kept within the plot's width (so a wide first or
 * last label never runs under the left axis's ticks).
 */
function placeUprightLabels(labels: string[], band: BandScale, left: number, right: number, width: (l: string) => number, gap: number) {
  const widest = max(labels, width) ?? 0;
  for (let k = thinningStep(widest, band.step, gap); ; k++) {
    const placed = labels.flatMap((label, index) => {
      if (index % k !== 0) return [];
      const w = width(label);
      const centre = band.center(label);
      return [{ label, index, w, x: Math.min(Math.max(centre, left + w / 2), Math.max(left + w / 2, right - w / 2)) }];
    });
    const clear = placed.every((p, i) => i === 0 || p.x - p.w / 2 >= placed[i - 1]!.x + placed[i - 1]!.w / 2 + gap);
    if (clear || placed.length <= 1) return { k, placed };
  }
}

/** A bottom band axis: upright labels centred on their bands, thinned (with tick marks) when crowded. */
export function drawBottomBandAxis(band: BandScale, channel: BandChannel, plot: Box, body: Box, ctx: LayoutContext): DrawnAxis {
  const { style, measure, id } = ctx;
  const { tick } = style.text;
  const gap = style.spacing.tickGap;
  const [left, right, bottom] = [plot.x, plot.x + plot.width, plot.y + plot.height];
  const { k, placed } = placeUprightLabels(channel.domain, band, left, right, (l) => measure.width(capText(l), tick.size, tick.weight), gap);
  const labels: TextNode[] = [];
  const tickMarks: SceneNode[] = [];
  for (const p of placed) {
    labels.push(textNode(measure, { id: id(`tick-${channel.name}`, p.label), role: 'tick', text: p.label, style: tick, x: p.x, top: bottom + gap, anchor: 'middle' }));
    // With labels thinned, a short tick ties each label to its band (a clamped label may sit off-centre).
    const centre = band.center(p.label);
    if (k > 1) tickMarks.push(rule(id('tick-mark', p.label), 'tick-mark', centre, bottom, centre, bottom + gap - 2, style.lines.axis, style.lines.axisWidth));
  }
  const shown = placed.map((p) => p.label);
  const info: AxisInfo = { orient: 'bottom', scale: 'band', field: channel.field, title: channel.title, domain: band.domain, ticks: shown, tickPositions: shown.map(band.center), range: [left, right] };
  return { grid: [], tickMarks, labels, title: axisTitleNode('bottom', channel, plot, body, ctx), info, diagnostics: k > 1 ? [thinned(channel.field, k, channel.domain.length, shown.length)] : [] };
}

/** The lines of one label, right-aligned at `x` and centred as a block on `middle`. */
function labelLines(ctx: LayoutContext, stem: string, category: string, lines: string[], x: number, middle: number): TextNode[] {
  const { style, measure, id } = ctx;
  const { tick } = style.text;
  const lh = lineHeight(tick, style.spacing.lineHeight);
  const box = textBoxHeight(measure, tick);
  return lines.map((text, j) => textNode(measure, { id: id(stem, category), role: 'tick', text, style: tick, x, top: middle - (lines.length * lh) / 2 + j * lh + (lh - box) / 2, anchor: 'end' }));
}

/** The least band step in which a left band axis prints every name: one line of tick text and a pixel between. */
export function readableStep(ctx: Pick<LayoutContext, 'style' | 'measure'>): number {
  return textBoxHeight(ctx.measure, ctx.style.text.tick) + 1;
}

/** A left band axis: the fitted (wrapped or shortened) labels right-aligned beside their bands, thinned when bands are thinner than a line. */
export function drawLeftBandAxis(fitted: FittedBandLabels, channel: BandChannel, plot: Box, body: Box, ctx: LayoutContext): DrawnAxis {
  const { style, id } = ctx;
  const gap = style.spacing.tickGap;
  const { band } = fitted;
  const left = plot.x;
  const k = thinningStep(readableStep(ctx) - 1, band.step, 1);
  const labels: TextNode[] = [];
  const tickMarks: SceneNode[] = [];
  channel.domain.forEach((category, i) => {
    if (i % k !== 0) return;
    const middle = band.center(category);
    labels.push(...labelLines(ctx, `tick-${channel.name}`, category, fitted.lines[i]!, left - gap, middle));
    if (k > 1) tickMarks.push(rule(id('tick-mark', category), 'tick-mark', left - gap + 2, middle, left, middle, style.lines.axis, style.lines.axisWidth));
  });
  const shown = channel.domain.filter((_, i) => i % k === 0);
  const info: AxisInfo = { orient: 'left', scale: 'band', field: channel.field, title: channel.title, domain: band.domain, ticks: shown, tickPositions: shown.map(band.center), range: [plot.y, plot.y + plot.height] };
  const diagnostics = [...fitted.diagnostics, ...(k > 1 ? [thinned(channel.field, k, channel.domain.length, shown.length)] : [])];
  return { grid: [], tickMarks, labels, title: axisTitleNode('left', channel, plot, body, ctx), info, diagnostics };
}
