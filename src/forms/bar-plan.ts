import { extent, max } from 'd3-array';
import type { Aggregate } from '../brief/types.js';
import type { Decision } from '../choose/types.js';
import { diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import { AGGREGATORS } from '../derive/aggregate.js';
import { groupRows, type Grouped } from '../derive/group.js';
import { isOrdered, refOf, type Field, type FieldRef } from '../fields/types.js';
import { plotFor } from '../layout/compose.js';
import { memoized, type LayoutContext } from '../layout/kit-types.js';
import { capText } from '../layout/text.js';
import { idMaker } from '../scene/ids.js';
import type { Table } from '../table/types.js';
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
    left: { kind: 'linear', name: 'value', field: value?.name ?? 'count', title: '', extent: [Math.min(0, lo), Math.max(0, hi)], format: value?.format },
    bottom: { kind: 'band', name: 'key', field: key.name, title: '', domain: labels }, first: 'left',
  }, [], ctx).box;
  if (bandNeeded * n <= plot.width) return { vertical: true, decision: { decision: 'vertical bars', rule: `all ${labels.length} labels fit upright: the widest needs ${px(bandNeeded)} and each band has ${px(plot.width / n)}` } };
  return lying(`${px(plot.width / n)} each`);
}

/** The bar form's plan: its order, orientation and how rows combine, each decision with its rule. */
export function planBar(input: PlanInput): Outcome<Planned<BarPlan>> {
  const { fields, brief } = input;
  const key = fields.keys[0]!;
  const value = fields.values[0];
  const problems: Diagnostic[] = [];
  const decisions: Decision[] = [];
  const order = chooseOrder(input, key, problems, decisions);
  if (problems.some((p) => p.severity === 'error')) return failure(problems);
  const orientation = chooseOrientation(input, key, value);
  decisions.push(orientation.decision);
  if (brief.aggregate !== 'sum' || !value) decisions.push({ decision: `rows with the same key combined by ${brief.aggregate}`, rule: 'the brief asks for it (`aggregate:`)' });
  return success({
    plan: { key: refOf(key), value: value && refOf(value), orientation: orientation.vertical ? 'vertical' : 'horizontal', order, aggregate: brief.aggregate },
    decisions,
  }, problems);
}
