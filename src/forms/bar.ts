import { scaleBand, scaleLinear } from 'd3-scale';
import type { BarDatum, DerivedBars } from '../derive/bars.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { thinningStep, valueTicks, type ValueTicks } from '../layout/axis.js';
import { layoutFrame } from '../layout/frame.js';
import { valueFormatter } from '../layout/number-format.js';
import { fitLabel, lineHeight, textBoxHeight, textNode } from '../layout/text.js';
import { idMaker } from '../scene/ids.js';
import type { AxisInfo, Box, Datum, Role, SceneNode, TextNode } from '../scene/types.js';
import { segment } from '../svg/path.js';
import type { Style } from '../style/types.js';
import { barDescription, barValueTitle, foldNote } from './bar-text.js';
import type { FormContext, FormResult } from './types.js';

/** A band scale over the bars' labels. */
type Band = ReturnType<typeof scaleBand<string>>;

/** Longest share of the plot the labels may take: key labels of lying bars (of the body width), value labels (of the plot's length). */
const MAX_LABEL_SHARE = 0.4;

interface Parts {
  nodes: SceneNode[];
  axes: AxisInfo[];
  plot: Box;
  diagnostics: Diagnostic[];
}

interface Common {
  derived: DerivedBars;
  ctx: FormContext;
  body: Box;
  valueTitle: string;
  keyTitle: string;
  /** Each bar's value as its label shows it, formatted once. */
  valueText: Map<BarDatum, string>;
  id: (prefix: string, text: string) => string;
}

function barFill(bar: BarDatum, style: Style): string {
  if (bar.folds !== undefined) return style.palette.others;
  return bar.value < 0 ? style.palette.negative : style.palette.primary;
}

function barDatum(c: Common, bar: BarDatum): Datum {
  const datum: Datum = { [c.derived.plan.key.name]: bar.label, [c.derived.valueName]: bar.value };
  if (bar.folds !== undefined) datum.folded = bar.folds;
  return datum;
}

function domainOf(bars: BarDatum[]): [number, number] {
  const values = bars.map((b) => b.value);
  return [Math.min(0, ...values), Math.max(0, ...values)];
}

/** A straight line as a path node. */
function line(id: string, role: Role, x1: number, y1: number, x2: number, y2: number, stroke: string, width: number): SceneNode {
  return { kind: 'path', id, role, commands: segment(x1, y1, x2, y2), stroke, strokeWidth: width };
}

function valueLabelsFit(c: Common, room: number, along: 'width' | 'height'): boolean {
  const { label } = c.ctx.style.text;
  if (along === 'height') return room >= textBoxHeight(c.ctx.measure, label);
  return c.derived.bars.every((b) => c.ctx.measure.width(c.valueText.get(b)!, label.size, label.weight) <= room);
}

/** Marks and texts collected by a layout; texts are drawn after marks. */
interface Marks {
  nodes: SceneNode[];
  texts: TextNode[];
}

/** A gridline across the plot at each value tick (zero gets the zero line instead), and each tick's label. */
function valueGrid(c: Common, vt: ValueTicks, pos: (v: number) => number, vertical: boolean, across: [number, number], out: Marks): void {
  const { style, measure } = c.ctx;
  const { tick } = style.text;
  const gap = style.spacing.tickGap;
  const tickBox = textBoxHeight(measure, tick);
  vt.ticks.forEach((t, i) => {
    const p = pos(t);
    const text = vt.labels[i]!;
    const [a, b] = across;
    if (t !== 0) out.nodes.push(vertical ? line(c.id('gridline', text), 'gridline', a, p, b, p, style.lines.grid, style.lines.gridWidth) : line(c.id('gridline', text), 'gridline', p, a, p, b, style.lines.grid, style.lines.gridWidth));
    const place = vertical ? { x: a - gap, top: p - tickBox / 2, anchor: 'end' as const } : { x: p, top: b + gap, anchor: 'middle' as const };
    if (vt.shown[i]) out.texts.push(textNode(measure, { id: c.id('tick-value', text), role: 'tick', text, style: tick, ...place }));
  });
}

/** One bar from the zero of the value scale to its value, across its band. */
function barRect(c: Common, bar: BarDatum, band: Band, pos: (v: number) => number, vertical: boolean): SceneNode {
  const [v0, v1] = [pos(0), pos(bar.value)];
  const [b0, thickness] = [band(bar.label)!, band.bandwidth()];
  const geometry = vertical
    ? { x: b0, y: Math.min(v0, v1), width: thickness, height: Math.abs(v1 - v0) }
    : { x: Math.min(v0, v1), y: b0, width: Math.abs(v1 - v0), height: thickness };
  return { kind: 'rect', id: c.id('bar', bar.label), role: 'bar', datum: barDatum(c, bar), ...geometry, fill: barFill(bar, c.ctx.style) };
}

/** A bar's value label just beyond its end: above or below upright bars, right or left of lying ones. */
function valueLabel(c: Common, bar: BarDatum, band: Band, pos: (v: number) => number, vertical: boolean): TextNode {
  const { measure, style } = c.ctx;
  const { label } = style.text;
  const gap = style.spacing.labelGap;
  const end = pos(bar.value);
  const middle = band(bar.label)! + band.bandwidth() / 2;
  const box = textBoxHeight(measure, label);
  const place = vertical
    ? { x: middle, top: bar.value >= 0 ? end - gap - box : end + gap, anchor: 'middle' as const }
    : { x: bar.value >= 0 ? end + gap : end - gap, top: middle - box / 2, anchor: bar.value >= 0 ? ('start' as const) : ('end' as const) };
  return textNode(measure, { id: c.id('label', bar.label), role: 'label', text: c.valueText.get(bar)!, style: label, ...place });
}

function vertical(c: Common): Parts {
  const { style, measure } = c.ctx;
  const { tick, axisTitle: titleStyle, label } = style.text;
  const { tickGap, labelGap, lineHeight: factor } = style.spacing;
  const bars = c.derived.bars;
  const tickBox = textBoxHeight(measure, tick);
  const labelRoom = textBoxHeight(measure, label) + labelGap;
  const top = c.body.y + lineHeight(titleStyle, factor) + tickGap + tickBox / 2;
  const bottom = c.body.y + c.body.height - (tickGap + lineHeight(tick, factor) + tickGap + lineHeight(titleStyle, factor));
  const [lo, hi] = domainOf(bars);
  const probe = valueTicks(lo, hi, bottom - top, 'vertical', tick, measure, c.derived.plan.value?.format);
  const left = c.body.x + Math.max(...probe.labels.map((l) => measure.width(l, tick.size, tick.weight))) + tickGap;
  const right = c.body.x + c.body.width;
  const band = scaleBand<string>().domain(bars.map((b) => b.label)).range([left, right]).paddingInner(style.spacing.bandPadding).paddingOuter(style.spacing.bandPadding / 2);
  // Room for the labels of the longest bars is taken from the plot only where they would not fit;
  // a zero bar's label sits on the positive side, as placed by valueLabel.
  const fitted = scaleLinear().domain(probe.domain).range([bottom, top]);
  const roomTop = bars.some((b) => b.value >= 0) && fitted(hi) - labelRoom < top - tickBox / 2 ? labelRoom : 0;
  const roomBottom = lo < 0 && fitted(lo) + labelRoom > bottom ? labelRoom : 0;
  // Value labels need their band's width, and may take at most MAX_LABEL_SHARE of the plot's height.
  const showLabels = valueLabelsFit(c, band.step() - 2, 'width') && roomTop + roomBottom <= (bottom - top) * MAX_LABEL_SHARE;
  const rangeTop = top + (showLabels ? roomTop : 0);
  const rangeBottom = bottom - (showLabels ? roomBottom : 0);
  const vt = valueTicks(lo, hi, rangeBottom - rangeTop, 'vertical', tick, measure, c.derived.plan.value?.format);
  const y = scaleLinear().domain(vt.domain).range([rangeBottom, rangeTop]);
  const out: Marks = { nodes: [], texts: [] };
  valueGrid(c, vt, y, true, [left, right], out);
  const tickMarks: SceneNode[] = [];
  const valueLabels: TextNode[] = [];
  for (const bar of bars) {
    out.nodes.push(barRect(c, bar, band, y, true));
    if (showLabels) valueLabels.push(valueLabel(c, bar, band, y, true));
  }
  out.nodes.push(line('zero-line', 'zero-line', left, y(0), right, y(0), style.lines.zero, style.lines.zeroWidth));
  const keyTop = bottom + tickGap;
  const { k, placed } = placeUprightLabels(bars.map((b) => b.label), band, left, right, (l) => measure.width(l, tick.size, tick.weight), tickGap);
  for (const p of placed) {
    out.texts.push(textNode(measure, { id: c.id('tick-key', p.label), role: 'tick', text: p.label, style: tick, x: p.x, top: keyTop, anchor: 'middle' }));
    // With labels thinned, a short tick ties each label to its bar (a clamped label may sit off-centre).
    const centre = band(p.label)! + band.bandwidth() / 2;
    if (k > 1) tickMarks.push(line(c.id('tick-mark', p.label), 'tick-mark', centre, bottom, centre, bottom + tickGap - 2, style.lines.axis, style.lines.axisWidth));
  }
  out.nodes.push(...tickMarks);
  out.texts.push(...valueLabels);
  out.texts.push(textNode(measure, { id: 'axis-title-value', role: 'axis-title', text: c.valueTitle, style: titleStyle, x: c.body.x, top: c.body.y }));
  out.texts.push(textNode(measure, { id: 'axis-title-key', role: 'axis-title', text: c.keyTitle, style: titleStyle, x: (left + right) / 2, top: keyTop + lineHeight(tick, factor) + tickGap, anchor: 'middle' }));
  const diagnostics = k > 1 ? [thinned(c, k, bars.length, placed.length)] : [];
  const plot = { x: left, y: top, width: right - left, height: bottom - top };
  return { nodes: [...out.nodes, ...out.texts], plot, diagnostics, axes: axes(c, vt, 'left', 'bottom', y, band, placed.map((p) => p.label), [rangeBottom, rangeTop], [left, right]) };
}

/**
 * Centres of the key labels under upright bars, every k-th shown: the smallest k at which no
 * two labels come closer than `gap`, after each is kept within the plot's width (so a wide
 * first or last label never runs under the value ticks).
 */
function placeUprightLabels(labels: string[], band: Band, left: number, right: number, width: (l: string) => number, gap: number) {
  const widest = Math.max(...labels.map(width));
  for (let k = thinningStep(widest, band.step(), gap); ; k++) {
    const placed = labels.flatMap((label, index) => {
      if (index % k !== 0) return [];
      const w = width(label);
      const centre = band(label)! + band.bandwidth() / 2;
      return [{ label, index, w, x: Math.min(Math.max(centre, left + w / 2), Math.max(left + w / 2, right - w / 2)) }];
    });
    const clear = placed.every((p, i) => i === 0 || p.x - p.w / 2 >= placed[i - 1]!.x + placed[i - 1]!.w / 2 + gap);
    if (clear || placed.length <= 1) return { k, placed };
  }
}

function thinned(c: Common, k: number, total: number, shown: number): Diagnostic {
  return diagnostic('layout.labels-thinned', `${total} key labels do not all fit; every ${k === 2 ? 'second' : `${k}th`} is shown (${shown} of ${total})`, {
    field: c.derived.plan.key.name, hint: 'make the chart larger with `size:`, or use shorter labels',
  });
}

function axes(c: Common, vt: ValueTicks, valueOrient: AxisInfo['orient'], keyOrient: AxisInfo['orient'], scale: (v: number) => number, band: Band, keyTicks: string[], valueRange: [number, number], keyRange: [number, number]): AxisInfo[] {
  return [
    { orient: valueOrient, scale: 'linear', field: c.derived.valueName, title: c.valueTitle, domain: vt.domain, ticks: vt.ticks, tickPositions: vt.ticks.map(scale), range: valueRange },
    { orient: keyOrient, scale: 'band', field: c.derived.plan.key.name, title: c.keyTitle, domain: band.domain(), ticks: keyTicks, tickPositions: keyTicks.map((k) => band(k)! + band.bandwidth() / 2), range: keyRange },
  ];
}

/** Key labels of lying bars, each fitted to the label column: wrapped onto two lines where the band allows. */
function fitKeyLabels(c: Common, band: Band): { labels: { lines: string[] }[]; width: number; diagnostics: Diagnostic[] } {
  const { style, measure } = c.ctx;
  const { tick } = style.text;
  const maxLabel = c.body.width * MAX_LABEL_SHARE;
  const twoLines = band.step() >= 2 * lineHeight(tick, style.spacing.lineHeight);
  // A long label wraps onto a second line where the band is tall enough, and is shortened only beyond that.
  const labels = c.derived.bars.map((b) => fitLabel(measure, b.label, tick, maxLabel, twoLines ? 2 : 1));
  const truncated = labels.filter((l) => l.shortened).length;
  const diagnostics = truncated ? [diagnostic('layout.label-truncated', `${truncated} key label${truncated === 1 ? ' is' : 's are'} longer than ${Math.round(maxLabel)} px${twoLines ? ' on two lines' : ''} and shortened with "…"; the full text stays in the SVG title of each bar`, { field: c.derived.plan.key.name, hint: 'use shorter labels, or a wider chart with `size:`' })] : [];
  const width = Math.max(...labels.flatMap((l) => l.lines.map((line) => measure.width(line, tick.size, tick.weight))));
  return { labels, width, diagnostics };
}

/** The lines of one key label, right-aligned at `x` and centred as a block on `middle`. */
function keyLabelLines(c: Common, bar: BarDatum, lines: string[], x: number, middle: number): TextNode[] {
  const { style, measure } = c.ctx;
  const { tick } = style.text;
  const lh = lineHeight(tick, style.spacing.lineHeight);
  const box = textBoxHeight(measure, tick);
  return lines.map((text, j) => textNode(measure, { id: c.id('tick-key', bar.label), role: 'tick', text, style: tick, x, top: middle - (lines.length * lh) / 2 + j * lh + (lh - box) / 2, anchor: 'end' }));
}

function horizontal(c: Common): Parts {
  const { style, measure } = c.ctx;
  const { tick, axisTitle: titleStyle, label } = style.text;
  const { tickGap, labelGap, lineHeight: factor } = style.spacing;
  const bars = c.derived.bars;
  // Half a label clear of the key title: a label centred on a thin first band reaches above it.
  const top = c.body.y + lineHeight(titleStyle, factor) + Math.max(tickGap, textBoxHeight(measure, tick) / 2);
  const bottom = c.body.y + c.body.height - (tickGap + lineHeight(tick, factor) + tickGap + lineHeight(titleStyle, factor));
  const band = scaleBand<string>().domain(bars.map((b) => b.label)).range([top, bottom]).paddingInner(style.spacing.bandPadding).paddingOuter(style.spacing.bandPadding / 2);
  const keyLabels = fitKeyLabels(c, band);
  const [lo, hi] = domainOf(bars);
  // Room beyond the bar ends for value labels; a zero bar's label sits on the positive side, as placed by valueLabel.
  const room = (positive: boolean) => Math.max(0, ...bars.filter((b) => (b.value >= 0) === positive).map((b) => measure.width(c.valueText.get(b)!, label.size, label.weight) + labelGap));
  const left = c.body.x + keyLabels.width + tickGap;
  const right = c.body.x + c.body.width;
  // Value labels need the band's height, and may take at most MAX_LABEL_SHARE of the plot's width.
  const showLabels = valueLabelsFit(c, band.step(), 'height') && room(true) + room(false) <= (right - left) * MAX_LABEL_SHARE;
  const labelRoom = (positive: boolean) => (showLabels ? room(positive) : 0);
  const probe = valueTicks(lo, hi, right - left, 'horizontal', tick, measure, c.derived.plan.value?.format);
  const halfTick = (i: number) => measure.width(probe.labels[i]!, tick.size, tick.weight) / 2;
  const rangeLeft = left + Math.max(labelRoom(false), halfTick(0) - tickGap);
  const rangeRight = right - Math.max(labelRoom(true), halfTick(probe.labels.length - 1));
  const vt = valueTicks(lo, hi, rangeRight - rangeLeft, 'horizontal', tick, measure, c.derived.plan.value?.format);
  const x = scaleLinear().domain(vt.domain).range([rangeLeft, rangeRight]);
  const out: Marks = { nodes: [], texts: [] };
  valueGrid(c, vt, x, false, [top, bottom], out);
  const k = thinningStep(textBoxHeight(measure, tick), band.step(), 1);
  const tickMarks: SceneNode[] = [];
  const valueLabels: TextNode[] = [];
  bars.forEach((bar, i) => {
    out.nodes.push(barRect(c, bar, band, x, false));
    const middle = band(bar.label)! + band.bandwidth() / 2;
    if (i % k === 0) {
      out.texts.push(...keyLabelLines(c, bar, keyLabels.labels[i]!.lines, left - tickGap, middle));
      if (k > 1) tickMarks.push(line(c.id('tick-mark', bar.label), 'tick-mark', left - tickGap + 2, middle, left, middle, style.lines.axis, style.lines.axisWidth));
    }
    if (showLabels) valueLabels.push(valueLabel(c, bar, band, x, false));
  });
  out.nodes.push(line('zero-line', 'zero-line', x(0), top, x(0), bottom, style.lines.zero, style.lines.zeroWidth));
  out.nodes.push(...tickMarks);
  out.texts.push(...valueLabels);
  out.texts.push(textNode(measure, { id: 'axis-title-value', role: 'axis-title', text: c.valueTitle, style: titleStyle, x: (left + right) / 2, top: bottom + tickGap + lineHeight(tick, factor) + tickGap, anchor: 'middle' }));
  out.texts.push(textNode(measure, { id: 'axis-title-key', role: 'axis-title', text: c.keyTitle, style: titleStyle, x: c.body.x, top: c.body.y }));
  const shown = bars.filter((_, i) => i % k === 0).map((b) => b.label);
  const diagnostics = [...keyLabels.diagnostics, ...(k > 1 ? [thinned(c, k, bars.length, shown.length)] : [])];
  const plot = { x: left, y: top, width: right - left, height: bottom - top };
  return { nodes: [...out.nodes, ...out.texts], plot, diagnostics, axes: axes(c, vt, 'bottom', 'left', x, band, shown, [rangeLeft, rangeRight], [top, bottom]) };
}

function missingGlyphs(nodes: SceneNode[], ctx: FormContext): Diagnostic[] {
  const missing = new Set<string>();
  for (const n of nodes) if (n.kind === 'text') for (const ch of ctx.measure.missing(n.text, n.weight)) missing.add(ch);
  if (missing.size === 0) return [];
  const list = [...missing].slice(0, 8).map((ch) => `U+${ch.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')}`).join(', ');
  return [diagnostic('layout.missing-glyphs', `the bundled font cannot draw ${missing.size} character${missing.size === 1 ? '' : 's'} in the chart's text (${list}); ${missing.size === 1 ? 'it is' : 'they are'} drawn as empty boxes`, {
    hint: 'use Latin, Greek or Cyrillic text, or transliterate those labels',
  })];
}

/**
 * The bar chart form: derived bars → a scene in pixels. Vertical or horizontal as the rules
 * chose; every bar starts at the zero of one shared value scale.
 */
export function layoutBar(derived: DerivedBars, ctx: FormContext): FormResult {
  const { brief, style, measure } = ctx;
  const valueTitle = barValueTitle(derived);
  const fmtValue = valueFormatter(derived.bars.map((b) => b.value), derived.plan.value?.format);
  const frame = layoutFrame({ title: brief.title, subtitle: brief.subtitle, source: brief.source, notes: foldNote(derived, valueTitle, valueFormatter([derived.foldedTotal ?? 0], derived.plan.value?.format)) }, style, brief.size, measure);
  const valueText = new Map(derived.bars.map((b) => [b, fmtValue(b.value)]));
  const common: Common = { derived, ctx, body: frame.body, valueTitle, keyTitle: derived.plan.key.label, valueText, id: idMaker() };
  const parts = derived.plan.orientation === 'vertical' ? vertical(common) : horizontal(common);
  const diagnostics = [...parts.diagnostics];
  if (parts.plot.width < 40 || parts.plot.height < 40) {
    diagnostics.push(diagnostic('layout.frame-too-small', `the plot area is only ${Math.round(parts.plot.width)} × ${Math.round(parts.plot.height)} px after titles, labels and axes`, {
      path: '/size', found: `${brief.size.width} × ${brief.size.height}`, expected: 'a plot area of at least 40 × 40 px', hint: 'make `size:` larger, or shorten the title and labels',
    }));
  }
  const children: SceneNode[] = [...parts.nodes, ...frame.texts];
  diagnostics.push(...missingGlyphs(children, ctx));
  return {
    scene: {
      form: 'bar', width: brief.size.width, height: brief.size.height, background: style.background,
      title: brief.title ?? `${valueTitle} by ${derived.plan.key.label.toLowerCase()}`,
      description: brief.description ?? barDescription(derived, valueTitle, fmtValue),
      root: { kind: 'group', id: 'chart', role: 'chart', children }, axes: parts.axes, plot: parts.plot,
      panels: [{ id: 'panel', plot: parts.plot, axes: parts.axes }], legends: [],
    },
    diagnostics,
  };
}
