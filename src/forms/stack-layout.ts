import { max } from 'd3-array';
import type { Segment, Stack } from '../derive/stack.js';
import { plotFor } from '../layout/compose.js';
import { inkOn } from '../layout/ink.js';
import { memoized, ticksFor, type BandChannel, type CartesianDomains, type FormMarks, type LayoutContext, type LinearChannel, type PlotArea } from '../layout/kit-types.js';
import type { LegendSpec } from '../layout/legend.js';
import { labelStyle, valueFormatter } from '../layout/number-format.js';
import { asBand, asLinear, bandScale } from '../layout/scales.js';
import { textBoxHeight, textNode } from '../layout/text.js';
import type { Datum, RectNode, SceneNode, TextNode } from '../scene/types.js';
import { tooltipText } from './bar-text.js';
import { percentText, stackValueTitle, stackWords, type StackDerived } from './stack-text.js';

/** Room kept between a label inside a segment and the segment's edges, px. */
const INSET = 3;
/** A label must fit a segment measured on the planning probe with this much to spare, so it still fits on the scale drawn. */
const PROBE_MARGIN = 0.9;

/** Each part's fill: the categorical palette in stacking order; the folded "Other" part in the neutral grey. */
export function partFills(derived: StackDerived, ctx: LayoutContext): Map<string, string> {
  const { categorical, others } = ctx.style.palette;
  return new Map(derived.parts.map((p, i) => [p, derived.folded.length && p === derived.other ? others : categorical[i % categorical.length]!]));
}

function channels(derived: StackDerived): { group: BandChannel; value: LinearChannel } {
  const { query, stacks } = derived;
  const group: BandChannel = { kind: 'band', name: 'key', field: query.group.name, title: query.group.label, domain: stacks.map((s) => s.group) };
  const hi = query.normalized ? 1 : (max(stacks, (s) => s.total) ?? 0);
  const value: LinearChannel = { kind: 'linear', name: 'value', field: derived.valueName, title: stackValueTitle(derived), extent: [0, Math.max(0, hi)], format: query.normalized ? '.0%' : query.value?.format };
  return { group, value };
}

export function legendSpec(derived: StackDerived, ctx: LayoutContext): LegendSpec {
  const fills = partFills(derived, ctx);
  return { kind: 'categorical', field: derived.query.part.name, title: derived.query.part.label, entries: derived.parts.map((p) => ({ label: p, fill: fills.get(p)! })) };
}

export function domainsWith(derived: StackDerived, legend: LegendSpec | undefined): CartesianDomains {
  const { group, value } = channels(derived);
  const base = derived.query.orientation === 'vertical' ? { left: value, bottom: group, first: 'left' as const, zeroLine: 'left' as const } : { left: group, bottom: value, first: 'bottom' as const, zeroLine: 'bottom' as const };
  return legend ? { ...base, legend } : base;
}

/** The text of a segment's label: the part's name on absolute stacks, its percent on normalized ones. */
const labelText = (derived: StackDerived, seg: Segment) => (derived.query.normalized ? percentText(seg.share, derived.query.group.locale) : seg.part);

/** Whether a label fits inside a segment `length` px long (along the value axis) and `thickness` px across. */
function fits(derived: StackDerived, text: string, length: number, thickness: number, ctx: LayoutContext): boolean {
  const { label } = ctx.style.text;
  const [w, h] = [ctx.measure.width(text, label.size, label.weight), textBoxHeight(ctx.measure, label)];
  const vertical = derived.query.orientation === 'vertical';
  const [across, along] = vertical ? [w, h] : [h, w];
  return across <= thickness - 2 * INSET && along <= length - 2 * INSET;
}

/** Each part's largest segment: where its name is written on absolute stacks (once per part). */
function namedSegments(derived: StackDerived): Set<Segment> {
  const best = new Map<string, Segment>();
  for (const s of derived.stacks) for (const seg of s.segments) if (!best.has(seg.part) || seg.value > best.get(seg.part)!.value) best.set(seg.part, seg);
  return new Set(best.values());
}

/**
 * Whether absolute stacks need a legend: yes unless every part's name fits its largest segment
 * on a probe of the plot drawn without one (with PROBE_MARGIN to spare). Normalized bars always
 * have one: their segments carry percents.
 */
function needsLegend(derived: StackDerived, ctx: LayoutContext): boolean {
  if (derived.query.normalized) return true;
  return memoized(ctx, 'stack\u0000needs-legend', () => {
    const domains = domainsWith(derived, undefined);
    const { box } = plotFor(domains, stackWords(derived).notes, ctx);
    const vertical = derived.query.orientation === 'vertical';
    const length = vertical ? box.plot.height : box.plot.width;
    const { value, group } = channels(derived);
    const ticks = ticksFor(ctx, value.extent[0], value.extent[1], length, vertical ? 'vertical' : 'horizontal', value.format);
    const perUnit = (PROBE_MARGIN * length) / (ticks.domain[1] - ticks.domain[0] || 1);
    const thickness = PROBE_MARGIN * (box.left.kind === 'band' ? box.left.band.bandwidth : bandScale(group.domain, [box.plot.x, box.plot.x + box.plot.width], ctx.style.spacing.bandPadding).bandwidth);
    return [...namedSegments(derived)].some((seg) => !fits(derived, seg.part, seg.value * perUnit, thickness, ctx));
  });
}

/** The channels of a stacked chart, and its legend where the parts cannot all be named inside. */
export function stackDomains(derived: StackDerived, ctx: LayoutContext): CartesianDomains {
  return domainsWith(derived, needsLegend(derived, ctx) ? legendSpec(derived, ctx) : undefined);
}

function segmentDatum(derived: StackDerived, stack: Stack, seg: Segment): Datum {
  const { query, valueName } = derived;
  const datum: Datum = { [query.group.name]: stack.group, [query.part.name]: seg.part, [valueName]: seg.value };
  if (query.normalized) datum.share = seg.share;
  if (derived.folded.length && seg.part === derived.other) datum.folded = derived.folded.length;
  return datum;
}

/** A segment's tooltip: its group and part by their labels, and its value as the chart prints it (a percent on normalized stacks). */
function segmentTooltip(derived: StackDerived): (stack: Stack, seg: Segment) => string {
  const { query } = derived;
  const fmt = valueFormatter(derived.stacks.flatMap((s) => s.segments.map((g) => g.value)), labelStyle(query.value, query.group));
  const title = stackValueTitle(derived);
  return (stack, seg) => tooltipText([[query.group.label, stack.group], [query.part.label, seg.part], [title, query.normalized ? percentText(seg.share, query.group.locale) : fmt(seg.value)]]);
}

/** One segment from its start to its end along the value scale, across its group's band. */
function segmentRect(derived: StackDerived, stack: Stack, seg: Segment, area: PlotArea, fill: string, ctx: LayoutContext, tooltip: string): RectNode {
  const vertical = derived.query.orientation === 'vertical';
  const [band, value] = vertical ? [asBand(area.x), asLinear(area.y)] : [asBand(area.y), asLinear(area.x)];
  const [a, b] = [value.map(seg.start), value.map(seg.end)];
  const [low, length] = [Math.min(a, b), Math.abs(b - a)];
  const id = ctx.id('segment', `${stack.group} ${seg.part}`);
  const datum = segmentDatum(derived, stack, seg);
  // No stroke between segments: a stroke in the page colour would eat into thin segments; neighbouring parts differ in colour.
  const paint = { fill };
  return vertical
    ? { kind: 'rect', id, role: 'segment', datum, tooltip, x: band.start(stack.group), y: low, width: band.bandwidth, height: length, ...paint }
    : { kind: 'rect', id, role: 'segment', datum, tooltip, x: low, y: band.start(stack.group), width: length, height: band.bandwidth, ...paint };
}

/** A label centred in its segment, in the ink that reads best on the segment's fill; none where it does not fit. */
function segmentLabel(derived: StackDerived, rect: RectNode, text: string, ctx: LayoutContext): TextNode | undefined {
  const vertical = derived.query.orientation === 'vertical';
  const [length, thickness] = vertical ? [rect.height, rect.width] : [rect.width, rect.height];
  if (!fits(derived, text, length, thickness, ctx)) return undefined;
  const { label } = ctx.style.text;
  const style = { ...label, color: inkOn(rect.fill, label.color, ctx.style.background) };
  const box = textBoxHeight(ctx.measure, label);
  return textNode(ctx.measure, { id: ctx.id('label', `${rect.id}`), role: 'label', text, style, x: rect.x + rect.width / 2, top: rect.y + (rect.height - box) / 2, anchor: 'middle' });
}

/** The segments of every stack, end to end from the baseline, and the labels that fit inside them. */
export function layoutStacks(derived: StackDerived, area: PlotArea, ctx: LayoutContext): FormMarks {
  const fills = partFills(derived, ctx);
  const named = derived.query.normalized ? undefined : namedSegments(derived);
  const marks: SceneNode[] = [];
  const labels: TextNode[] = [];
  const tooltip = segmentTooltip(derived);
  for (const stack of derived.stacks) {
    for (const seg of stack.segments) {
      if (seg.value === 0) continue;
      const rect = segmentRect(derived, stack, seg, area, fills.get(seg.part)!, ctx, tooltip(stack, seg));
      marks.push(rect);
      if (named && !named.has(seg)) continue;
      const label = segmentLabel(derived, rect, labelText(derived, seg), ctx);
      if (label) labels.push(label);
    }
  }
  return { marks, labels, diagnostics: [] };
}
