import { fsum, max, min } from 'd3-array';
import { deriveBars, type BandNeed, type BarDatum, type CapacityFor, type DerivedBars } from '../derive/bars.js';
import type { Outcome } from '../diagnostics/diagnostic.js';
import type { Table } from '../table/types.js';
import { plotFor } from '../layout/compose.js';
import { memoized, type CartesianDomains, type LabelRoom, type LayoutContext, type PlotArea, type ScaleProbe } from '../layout/kit-types.js';
import { valueFormatter } from '../layout/number-format.js';
import { MAX_LABEL_SHARE } from '../layout/plot-box.js';
import { asBand, asLinear, type BandScale, type LinearScale } from '../layout/scales.js';
import { textBoxHeight, textNode } from '../layout/text.js';
import type { Datum, SceneNode, TextNode } from '../scene/types.js';
import { barDescription, barNotes, barValueTitle, foldOf, tooltipText } from './bar-text.js';
import { barGroups, planBar, readableBand, type BarPlan } from './bar-plan.js';
import type { FormDef } from './types.js';
import { barAlt, barData } from './bar-alt.js';
import { inSentence } from '../fields/labels.js';

/** The narrowest bar band drawn, in px; more bars than fit at this step are folded. */
export const MIN_BAND_PX = 3;

/** The value extent bars span, from zero (d3-array loops: spreading many values into Math.min overflows the stack). */
function domainOf(bars: readonly BarDatum[]): [number, number] {
  return [Math.min(0, min(bars, (b) => b.value) ?? 0), Math.max(0, max(bars, (b) => b.value) ?? 0)];
}

function domainsOf(derived: { query: BarPlan; bars: readonly BarDatum[]; valueName: string }, vertical: boolean): CartesianDomains {
  const key = { kind: 'band' as const, name: 'key', field: derived.query.key.name, title: derived.query.key.label, domain: derived.bars.map((b) => b.label) };
  const value = { kind: 'linear' as const, name: 'value', field: derived.valueName, title: barValueTitle(derived.query), extent: domainOf(derived.bars), format: derived.query.value?.format, unit: derived.query.value?.unit };
  return vertical ? { left: value, bottom: key, first: 'left', zeroLine: 'left' } : { left: key, bottom: value, first: 'bottom', zeroLine: 'bottom' };
}

/** Each bar's value as its label shows it (formatted once per render: the bars drawn are fixed once derived). */
function valueTexts(derived: DerivedBars<BarPlan>, ctx: LayoutContext): Map<BarDatum, string> {
  return memoized(ctx, 'bar\u0000value-texts', () => {
    const fmt = valueFormatter(derived.bars.map((b) => b.value), derived.query.value);
    return new Map(derived.bars.map((b) => [b, fmt(b.value)]));
  });
}

/**
 * The least band a bar gets: a readable row for lying bars, whose names must all be printed
 * (a categorical name is never thinned away), MIN_BAND_PX for upright bars (their labels were
 * measured to fit when the orientation was chosen, or their key is ordered and may thin).
 */
function bandNeed(plan: BarPlan, ctx: LayoutContext): BandNeed {
  if (plan.orientation === 'vertical') return { px: MIN_BAND_PX };
  const px = Math.ceil(readableBand(ctx));
  const plotHeight = plotFor(domainsOf({ query: plan, bars: [], valueName: plan.value?.name ?? 'count' }, false), [], ctx).box.plot.height;
  return { px, why: 'so that each name reads', heightForAll: (n) => Math.ceil(ctx.brief.size.height - plotHeight + (n + 1) * px) };
}

/**
 * How many bars the key axis holds at their least band, with the note a fold would print:
 * measured with the composer's own plot box, so the bars drawn are never thinner than planned.
 */
function capacityFor(plan: BarPlan, ctx: LayoutContext, px: number): CapacityFor {
  const valueTitle = barValueTitle(plan);
  return (fold, bars) => {
    const notes = barNotes(plan, fold, valueTitle, valueFormatter([fold?.total ?? 0, ...(fold?.range ?? [])], plan.value));
    const { plot } = plotFor(domainsOf({ query: plan, bars, valueName: plan.value?.name ?? 'count' }, plan.orientation === 'vertical'), notes, ctx).box;
    return Math.floor((plan.orientation === 'vertical' ? plot.width : plot.height) / px);
  };
}

function deriveBarChart(table: Table, plan: BarPlan, ctx: LayoutContext): Outcome<DerivedBars<BarPlan>> {
  const need = bandNeed(plan, ctx);
  return deriveBars(table, plan, capacityFor(plan, ctx, need.px), barGroups(table, plan.key, plan.value, ctx), need);
}

/** Room for value labels beyond the bar ends, taken from the plot only where they would not fit; none when they do not fit their bands. */
function labelRoom(derived: DerivedBars<BarPlan>, probe: ScaleProbe, ctx: LayoutContext): LabelRoom {
  const { style, measure } = ctx;
  const { label, tick } = style.text;
  const gap = style.spacing.labelGap;
  const texts = valueTexts(derived, ctx);
  const band = probe.band!;
  const { plot } = probe;
  if (probe.side === 'left') {
    const [lo, hi] = domainOf(derived.bars);
    const room = textBoxHeight(measure, label) + gap;
    const [top, bottom] = [plot.y, plot.y + plot.height];
    // A zero bar's label sits on the positive side, as placed by valueLabel.
    const high = derived.bars.some((b) => b.value >= 0) && probe.linear.map(hi) - room < top - textBoxHeight(measure, tick) / 2 ? room : 0;
    const low = lo < 0 && probe.linear.map(lo) + room > bottom ? room : 0;
    const fit = derived.bars.every((b) => measure.width(texts.get(b)!, label.size, label.weight) <= band.step - 2);
    return { low, high, show: fit && low + high <= plot.height * MAX_LABEL_SHARE };
  }
  const side = (positive: boolean) => max([0, ...derived.bars.filter((b) => (b.value >= 0) === positive).map((b) => measure.width(texts.get(b)!, label.size, label.weight) + gap)]) ?? 0;
  const [low, high] = [side(false), side(true)];
  return { low, high, show: band.step >= textBoxHeight(measure, label) && high + low <= plot.width * MAX_LABEL_SHARE };
}

function barDatum(derived: DerivedBars<BarPlan>, bar: BarDatum): Datum {
  const datum: Datum = { [derived.query.key.name]: bar.label, [derived.valueName]: bar.value };
  if (bar.folds !== undefined) datum.folded = bar.folds;
  return datum;
}

/** The band (key) and value scales of a bar chart, by its orientation. */
function barScales(derived: DerivedBars<BarPlan>, area: PlotArea): { vertical: boolean; band: BandScale; value: LinearScale } {
  const vertical = derived.query.orientation === 'vertical';
  return vertical ? { vertical, band: asBand(area.x), value: asLinear(area.y) } : { vertical, band: asBand(area.y), value: asLinear(area.x) };
}

/** One bar from the zero of the value scale to its value, across its band. */
function barRect(derived: DerivedBars<BarPlan>, bar: BarDatum, area: PlotArea, ctx: LayoutContext): SceneNode {
  const { vertical, band, value } = barScales(derived, area);
  const [v0, v1] = [value.map(0), value.map(bar.value)];
  const [b0, thickness] = [band.start(bar.label), band.bandwidth];
  const [low, length] = [Math.min(v0, v1), Math.abs(v1 - v0)];
  const { palette } = ctx.style;
  const fill = bar.folds !== undefined ? palette.others : bar.value < 0 ? palette.negative : palette.primary;
  const id = ctx.id('bar', bar.label);
  const datum = barDatum(derived, bar);
  const tooltip = tooltipText([[derived.query.key.label, bar.label], [barValueTitle(derived.query), valueTexts(derived, ctx).get(bar)!]]);
  return vertical
    ? { kind: 'rect', id, role: 'bar', datum, tooltip, x: b0, y: low, width: thickness, height: length, fill }
    : { kind: 'rect', id, role: 'bar', datum, tooltip, x: low, y: b0, width: length, height: thickness, fill };
}

/** A bar's value label just beyond its end: above or below upright bars, right or left of lying ones. */
function valueLabel(derived: DerivedBars<BarPlan>, bar: BarDatum, text: string, area: PlotArea, ctx: LayoutContext): TextNode {
  const { measure, style } = ctx;
  const { label } = style.text;
  const gap = style.spacing.labelGap;
  const { vertical, band, value } = barScales(derived, area);
  const end = value.map(bar.value);
  const middle = band.center(bar.label);
  const box = textBoxHeight(measure, label);
  const id = ctx.id('label', bar.label);
  if (vertical) return textNode(measure, { id, role: 'label', text, style: label, x: middle, top: bar.value >= 0 ? end - gap - box : end + gap, anchor: 'middle' });
  return textNode(measure, { id, role: 'label', text, style: label, x: bar.value >= 0 ? end + gap : end - gap, top: middle - box / 2, anchor: bar.value >= 0 ? 'start' : 'end' });
}

/**
 * The bar chart: one bar per key from a shared zero, upright or lying as planned, folded to what
 * the plot holds at MIN_BAND_PX, each bar labelled with its value where the labels fit.
 */
export const BAR: FormDef<BarPlan, DerivedBars<BarPlan>> = {
  name: 'bar',
  noun: 'bar chart',
  traits: { lengthCoded: true, connectsKey: false, radial: false, coloursCategories: false, axisPerValue: false },
  plan: planBar,
  derive: deriveBarChart,
  alt: barAlt,
  data: barData,
  domains: (derived) => domainsOf(derived, derived.query.orientation === 'vertical'),
  room: labelRoom,
  facets: { noun: 'total', value: (derived) => fsum(derived.bars, (b) => b.value), minBand: () => MIN_BAND_PX },
  layout(derived, area, ctx) {
    const texts = valueTexts(derived, ctx);
    const marks: SceneNode[] = [];
    const labels: TextNode[] = [];
    for (const bar of derived.bars) {
      marks.push(barRect(derived, bar, area, ctx));
      if (area.room.show) labels.push(valueLabel(derived, bar, texts.get(bar)!, area, ctx));
    }
    return { marks, labels, diagnostics: [] };
  },
  words(derived) {
    const valueTitle = barValueTitle(derived.query);
    const fmt = valueFormatter(derived.bars.map((b) => b.value), derived.query.value);
    return {
      title: `${valueTitle} by ${inSentence(derived.query.key.label)}`,
      description: barDescription(derived, valueTitle, fmt),
      notes: barNotes(derived.query, foldOf(derived), valueTitle, valueFormatter([derived.foldedTotal ?? 0, ...(derived.foldedRange ?? [])], derived.query.value)),
    };
  },
};
