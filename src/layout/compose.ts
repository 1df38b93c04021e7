import type { Diagnostic } from '../diagnostics/diagnostic.js';
import type { Box, Scene, SceneNode } from '../scene/types.js';
import { valueTicks } from './axis.js';
import { drawBottomBandAxis, drawLeftBandAxis, drawLinearAxis, rule, type DrawnAxis } from './axes.js';
import { checkScene } from './checks.js';
import { layoutFrame } from './frame.js';
import type { CartesianDomains, FormMarks, FormWords, LabelRoom, LayoutContext, LinearChannel, PlotArea, ScaleProbe } from './kit-types.js';
import { plotBox, type PlotBox } from './plot-box.js';
import { bandScale, linearScale, type BandScale, type LinearScale, type Scale } from './scales.js';

/** What the composer needs of a form drawn on a left and a bottom axis. */
export interface CartesianForm<D> {
  name: string;
  words(derived: D, ctx: LayoutContext): FormWords;
  domains(derived: D, ctx: LayoutContext): CartesianDomains;
  /** Room the form's own labels need beyond its marks, measured against a first look at the scales. Default: none. */
  room?(derived: D, probe: ScaleProbe, ctx: LayoutContext): LabelRoom;
  layout(derived: D, area: PlotArea, ctx: LayoutContext): FormMarks;
}

const NO_ROOM: LabelRoom = { low: 0, high: 0, show: false };

/** The left axis's linear scale: its range shortened at either end by the room the form's labels take. */
function leftLinear(channel: LinearChannel, plot: Box, room: LabelRoom, ctx: LayoutContext): LinearScale {
  const [top, bottom] = [plot.y, plot.y + plot.height];
  const rangeBottom = bottom - (room.show ? room.low : 0);
  const rangeTop = top + (room.show ? room.high : 0);
  const vt = valueTicks(channel.extent[0], channel.extent[1], rangeBottom - rangeTop, 'vertical', ctx.style.text.tick, ctx.measure, channel.format);
  return linearScale(vt, [rangeBottom, rangeTop]);
}

/** The bottom axis's linear scale: inset so the end tick labels and the form's labels stay inside the plot's width. */
function bottomLinear(channel: LinearChannel, plot: Box, probeLabels: string[], room: LabelRoom, ctx: LayoutContext): LinearScale {
  const { tick } = ctx.style.text;
  const [left, right] = [plot.x, plot.x + plot.width];
  const halfTick = (i: number) => ctx.measure.width(probeLabels[i]!, tick.size, tick.weight) / 2;
  const rangeLeft = left + Math.max(room.show ? room.low : 0, halfTick(0) - ctx.style.spacing.tickGap);
  const rangeRight = right - Math.max(room.show ? room.high : 0, halfTick(probeLabels.length - 1));
  const vt = valueTicks(channel.extent[0], channel.extent[1], rangeRight - rangeLeft, 'horizontal', tick, ctx.measure, channel.format);
  return linearScale(vt, [rangeLeft, rangeRight]);
}

interface FittedScales { x: Scale; y: Scale; room: LabelRoom }

/** Builds both scales from the forms' domains over the plot box, taking the room the form's labels need. */
function fitScales<D>(form: CartesianForm<D>, derived: D, domains: CartesianDomains, box: PlotBox, ctx: LayoutContext): FittedScales {
  const { plot, left } = box;
  const padding = ctx.style.spacing.bandPadding;
  const bottomBand = domains.bottom.kind === 'band' ? bandScale(domains.bottom.domain, [plot.x, plot.x + plot.width], padding) : undefined;
  const leftBand: BandScale | undefined = left.kind === 'band' ? left.band : undefined;
  // A first look at the linear scale over the whole plot, for the form to measure its labels against.
  const bottomProbe = domains.bottom.kind === 'linear' ? valueTicks(domains.bottom.extent[0], domains.bottom.extent[1], plot.width, 'horizontal', ctx.style.text.tick, ctx.measure, domains.bottom.format) : undefined;
  const probe: ScaleProbe | undefined = left.kind === 'linear'
    ? { plot, side: 'left', band: bottomBand, linear: linearScale(left.probe, [plot.y + plot.height, plot.y]) }
    : bottomProbe ? { plot, side: 'bottom', band: leftBand, linear: linearScale(bottomProbe, [plot.x, plot.x + plot.width]) } : undefined;
  const room = probe && form.room ? form.room(derived, probe, ctx) : NO_ROOM;
  const y = domains.left.kind === 'linear' ? leftLinear(domains.left, plot, probe?.side === 'left' ? room : NO_ROOM, ctx) : leftBand!;
  const x = domains.bottom.kind === 'linear' ? bottomLinear(domains.bottom, plot, bottomProbe!.labels, probe?.side === 'bottom' ? room : NO_ROOM, ctx) : bottomBand!;
  return { x, y, room };
}

function drawAxis(side: 'left' | 'bottom', domains: CartesianDomains, scales: FittedScales, box: PlotBox, body: Box, ctx: LayoutContext): DrawnAxis {
  const channel = domains[side];
  const scale = side === 'left' ? scales.y : scales.x;
  if (channel.kind === 'linear' && scale.kind === 'linear') return drawLinearAxis(side, scale, channel, box.plot, body, ctx);
  if (channel.kind === 'band' && side === 'bottom' && scale.kind === 'band') return drawBottomBandAxis(scale, channel, box.plot, body, ctx);
  if (channel.kind === 'band' && box.left.kind === 'band') return drawLeftBandAxis(box.left, channel, box.plot, body, ctx);
  throw new Error(`no axis drawer for a ${channel.kind} channel on the ${side}`);
}

function zeroLine(domains: CartesianDomains, scales: FittedScales, plot: Box, ctx: LayoutContext): SceneNode[] {
  const { lines } = ctx.style;
  if (domains.zeroLine === 'left' && scales.y.kind === 'linear') return [rule('zero-line', 'zero-line', plot.x, scales.y.map(0), plot.x + plot.width, scales.y.map(0), lines.zero, lines.zeroWidth)];
  if (domains.zeroLine === 'bottom' && scales.x.kind === 'linear') return [rule('zero-line', 'zero-line', scales.x.map(0), plot.y, scales.x.map(0), plot.y + plot.height, lines.zero, lines.zeroWidth)];
  return [];
}

/**
 * The composer for forms on a left and a bottom axis: frame (title, subtitle, notes, source) →
 * the plot box the axes leave → scales from the form's domains → axes → the form's marks →
 * scene-wide checks. Layers are drawn in one order for every form: gridlines, marks, zero line,
 * tick marks; then tick labels, the form's labels, axis titles and the frame's words.
 */
export function layoutCartesian<D>(form: CartesianForm<D>, derived: D, ctx: LayoutContext): { scene: Scene; diagnostics: Diagnostic[] } {
  const { brief, style, measure } = ctx;
  const words = form.words(derived, ctx);
  const frame = layoutFrame({ title: brief.title, subtitle: brief.subtitle, source: brief.source, notes: words.notes }, style, brief.size, measure);
  const domains = form.domains(derived, ctx);
  const box = plotBox(frame.body, domains, ctx);
  const scales = fitScales(form, derived, domains, box, ctx);
  const sides = domains.first === 'left' ? (['left', 'bottom'] as const) : (['bottom', 'left'] as const);
  const axes = sides.map((side) => drawAxis(side, domains, scales, box, frame.body, ctx));
  const drawn = form.layout(derived, { plot: box.plot, x: scales.x, y: scales.y, room: scales.room }, ctx);
  const children: SceneNode[] = [
    ...axes.flatMap((a) => a.grid), ...drawn.marks, ...zeroLine(domains, scales, box.plot, ctx), ...axes.flatMap((a) => a.tickMarks),
    ...axes.flatMap((a) => a.labels), ...drawn.labels, ...axes.map((a) => a.title), ...frame.texts,
  ];
  const info = axes.map((a) => a.info);
  const diagnostics = [...axes.flatMap((a) => a.diagnostics), ...drawn.diagnostics, ...checkScene(children, box.plot, brief.size, measure)];
  return {
    scene: {
      form: form.name, width: brief.size.width, height: brief.size.height, background: style.background,
      title: brief.title ?? words.title, description: brief.description ?? words.description,
      root: { kind: 'group', id: 'chart', role: 'chart', children }, axes: info, plot: box.plot,
      panels: [{ id: 'panel', plot: box.plot, axes: info }], legends: [],
    },
    diagnostics,
  };
}
