import { extent, max } from 'd3-array';
import type { Aggregate } from '../brief/types.js';
import type { Decision } from '../choose/types.js';
import { diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import { AGGREGATORS } from '../derive/aggregate.js';
import { groupRows, type Combined, type Grouped } from '../derive/group.js';
import { isOrdered, refOf, type Field, type FieldRef } from '../fields/types.js';
import { plotFor } from '../layout/compose.js';
import { memoized, type LayoutContext } from '../layout/kit-types.js';
import { capText } from '../layout/text.js';
import { readableStep } from '../layout/axes.js';
import { idMaker } from '../scene/ids.js';
import type { Table } from '../table/types.js';
import { barNotes } from './bar-text.js';
import { checkCombining, combiningDecision, repeatsOf } from './combining.js';
import type { Planned, PlanInput } from './types.js';

/** How bars are laid out and ordered. */
export interface BarPlan {
  key: FieldRef;
  /** The value field; undefined when bars count rows (`aggregate: count` with no value). */
  value: FieldRef | undefined;
  orientation: 'vertical' | 'horizontal';
  /** value: largest first; label: A→Z; data: as the rows give them; key: the key's own order. */
  order: 'value' | 'label' | 'data' | 'key';
  aggregate: Aggregate;
  aggregateStated?: boolean;
  /** Rows sharing a key that are combined: how many keys have several rows and the most rows of one key. Default: none. */
  combined?: Combined;
  /** Keys with no usable value in any row, said in the chart's note. Default: none. */
  noData?: string[];
}

/** The table's rows grouped by the bars' key, once per render: planning and deriving both need them. */
export function barGroups(table: Table, key: FieldRef, value: FieldRef | undefined, ctx: Pick<LayoutContext, 'memo'>): Grouped {
  return memoized(ctx, `bar\u0000groups\u0000${key.name}\u0000${value?.name ?? ''}`, () => groupRows(table, { keys: [key], value }));
}

/** The bars' labels and the value extent they span, combined as they will be drawn. */
function barsOf(input: PlanInput, key: Field, value: Field | undefined): { labels: string[]; extent: [number, number] } {
  const { groups } = barGroups(input.table, refOf(key), value && refOf(value), input);
  const combine = AGGREGATORS[input.brief.aggregate].combine;
  // d3-array's extent loops; Math.min(...values) overflows the stack beyond about 120,000 keys.
  const [lo, hi] = extent(groups, (g) => combine(g.values));
  return { labels: groups.map((g) => g.labels[0]!), extent: lo === undefined || hi === undefined ? [0, 1] : [lo, hi] };
}

function chooseOrder(input: PlanInput, key: Field, problems: Diagnostic[], decisions: Decision[]): BarPlan['order'] {
  let order = input.brief.order;
  if (order === 'cluster') {
    problems.push(diagnostic(input.lenient ? 'choice.lenient-fallback' : 'choice.order-not-applicable', '`order: cluster` applies to heat maps, not to bars', {
      path: '/order', found: 'cluster', expected: 'auto, value, label or data', hint: 'remove `order:` to sort by value, or use `order: label`',
    }));
    order = 'auto';
  }
  if (order === 'auto') {
    if (isOrdered(key.type)) {
      decisions.push({ decision: `bars in the order of \`${key.name}\``, rule: `the key is ${key.type}, so its order carries meaning and the bars are not re-sorted` });
      return 'key';
    }
    decisions.push({ decision: 'bars sorted by value, largest first; ties by label', rule: 'sorted bars let the reader find rank and neighbours at a glance; a categorical key has no order of its own' });
    return 'value';
  }
  decisions.push({ decision: `bars in ${order} order`, rule: 'the brief asks for it (`order:`)' });
  return order;
}

/**
 * Upright or lying bars: upright when the key runs like time or numbers, or when every label fits
 * its band in the plot box that upright bars would get (measured by the composer's own plot box).
 */
function chooseOrientation(input: PlanInput, key: Field, value: Field | undefined): { vertical: boolean; decision: Decision } {
  const { brief, style, measure } = input;
  if (key.type === 'temporal' || key.type === 'quantitative') {
    return { vertical: true, decision: { decision: 'vertical bars', rule: `the key is ${key.type}, so it runs left to right as time and numbers do; labels are thinned if crowded` } };
  }
  const { labels, extent: [lo, hi] } = barsOf(input, key, value);
  const { tick } = style.text;
  const widest = max(labels, (l) => measure.width(capText(l), tick.size, tick.weight)) ?? 0;
  const bandNeeded = widest + 2 * style.spacing.tickGap;
  const n = Math.max(1, labels.length);
  const px = (v: number) => `${Math.round(v)} px`;
  const lying = (each: string) => ({ vertical: false, decision: { decision: 'horizontal bars', rule: `the widest label needs ${px(bandNeeded)} but ${labels.length} upright bands would have ${each}; rows give labels room to be read without tilting` } });
  // The plot is never wider than the frame inside its padding: past that bound, no need to measure it.
  const widthBound = brief.size.width - 2 * style.spacing.padding;
  if (bandNeeded * n > widthBound) return lying(`at most ${px(widthBound / n)} each`);
  const ctx: LayoutContext = { brief, style, measure, id: idMaker(), ...(input.memo ? { memo: input.memo } : {}) };
  const { plot } = plotFor({
    left: { kind: 'linear', name: 'value', field: value?.name ?? 'count', title: '', extent: [Math.min(0, lo), Math.max(0, hi)], format: value?.format, unit: value?.unit },
    bottom: { kind: 'band', name: 'key', field: key.name, title: '', domain: labels }, first: 'left',
  }, [], ctx).box;
  if (bandNeeded * n <= plot.width) return { vertical: true, decision: { decision: 'vertical bars', rule: `all ${labels.length} labels fit upright: the widest needs ${px(bandNeeded)} and each band has ${px(plot.width / n)}` } };
  return lying(`${px(plot.width / n)} each`);
}

/**
 * Tallest frame lying bars grow to when the brief leaves the height open: about 85 named rows
 * at the report style's type, two pages of a report column (common practice). Beyond it, bars fold.
 */
export const MAX_GROWN_HEIGHT = 1600;

/** A band in which a lying bar's name reads: the least step at which the left band axis prints every name. */
export const readableBand = readableStep;

/**
 * The frame lying bars need so that every bar gets a readable band, when the brief leaves the
 * height open: the height outside the plot (measured with the composer's plot box) plus one band
 * per bar, and one band of slack for a note. Never lower than the brief's, never above MAX_GROWN_HEIGHT.
 */
function grownFrame(input: PlanInput, key: Field, value: Field | undefined, notes: string[]): { size?: { width: number; height: number }; decision?: Decision } {
  const { brief } = input;
  if (brief.sizeFixed.height) return {};
  const { labels, extent: [lo, hi] } = barsOf(input, key, value);
  const ctx: LayoutContext = { brief, style: input.style, measure: input.measure, id: idMaker(), ...(input.memo ? { memo: input.memo } : {}) };
  const band = Math.ceil(readableBand(ctx));
  const { plot } = plotFor({
    left: { kind: 'band', name: 'key', field: key.name, title: '', domain: labels },
    bottom: { kind: 'linear', name: 'value', field: value?.name ?? 'count', title: '', extent: [Math.min(0, lo), Math.max(0, hi)], format: value?.format, unit: value?.unit }, first: 'bottom',
  }, notes, ctx).box;
  const needed = Math.ceil(brief.size.height - plot.height + (labels.length + 1) * band);
  if (needed <= brief.size.height) return {};
  const height = Math.min(needed, MAX_GROWN_HEIGHT);
  const all = height === needed;
  return {
    size: { width: brief.size.width, height },
    decision: {
      decision: `frame grown to ${height} px high`,
      rule: all
        ? `every one of the ${labels.length} bars gets a band of ${Math.round(band)} px in which its name reads; the brief sets no height`
        : `the brief sets no height, so the frame grows to its limit of ${MAX_GROWN_HEIGHT} px; ${labels.length} named bars would need ${needed} px, so the smallest are folded`,
    },
  };
}

/** The bar form's plan: its order, orientation and how rows combine, each decision with its rule. */
export function planBar(input: PlanInput, opts: { totals?: boolean } = {}): Outcome<Planned<BarPlan>> {
  const { fields, brief } = input;
  const key = fields.keys[0]!;
  const value = fields.values[0];
  const problems: Diagnostic[] = [];
  const decisions: Decision[] = [];
  const order = chooseOrder(input, key, problems, decisions);
  const grouped = barGroups(input.table, refOf(key), value && refOf(value), input);
  // Planned as the totals of another form's bars (stacks, groups): several rows per key are that
  // form's parts, not repeats, and the frame is the other form's to size.
  const combined = opts.totals ? undefined : repeatsOf(input, [key], value, grouped);
  problems.push(...checkCombining(input, key, value, combined));
  if (problems.some((p) => p.severity === 'error')) return failure(problems);
  const orientation = chooseOrientation(input, key, value);
  decisions.push(orientation.decision);
  const notes = barNotes({ key: refOf(key), value: value && refOf(value), order, aggregate: brief.aggregate, noData: grouped.noValue, ...(combined ? { combined } : {}) }, undefined, '', String);
  // Small multiples divide the frame among panels, which are measured by the facet layout.
  const grown = orientation.vertical || key.type === 'temporal' || key.type === 'quantitative' || brief.facet || opts.totals ? {} : grownFrame(input, key, value, notes);
  if (grown.decision) decisions.push(grown.decision);
  const combining = combiningDecision(key, value, brief.aggregate, brief.aggregateStated === true, combined);
  if (combining) decisions.push(combining);
  return success({
    plan: { key: refOf(key), value: value && refOf(value), orientation: orientation.vertical ? 'vertical' : 'horizontal', order, aggregate: brief.aggregate, aggregateStated: brief.aggregateStated, noData: grouped.noValue, ...(combined ? { combined } : {}) },
    decisions,
    ...(grown.size ? { size: grown.size } : {}),
  }, problems);
}
