import type { Aggregate } from '../brief/types.js';
import type { Decision } from '../choose/types.js';
import { diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import type { ColourClasses } from '../derive/classes.js';
import { AGGREGATORS } from '../derive/aggregate.js';
import { groupRows } from '../derive/group.js';
import { isOrdered, refOf, type FieldRef } from '../fields/types.js';
import { memoized } from '../layout/kit-types.js';
import { columnOf, type Table } from '../table/types.js';
import { chooseClasses } from './colour-classes.js';
import type { Planned, PlanInput } from './types.js';

/** How a dense pixel layout is drawn: its items (one per key, or one per row without a key), their order and colour classes. */
export interface DensePlan {
  key: FieldRef | undefined;
  value: FieldRef;
  /** value: largest first; key: the key's own order; label: A→Z; data: as the rows give them. */
  order: 'value' | 'key' | 'label' | 'data';
  aggregate: Aggregate;
  classes: ColourClasses;
}

/** The items drawn: a value each, with a label when there is a key, in the order planned. */
export interface DenseItems {
  labels: string[] | undefined;
  values: Float64Array;
  diagnostics: Diagnostic[];
  /** What was left out for want of a value: the keys with none (with a key), or how many rows (without). */
  left: { keys: string[]; rows: number };
}

/** The items in source order (one per key, combined by `aggregate`; one per row with a usable value without a key), once per render. */
export function denseItems(ctx: Pick<PlanInput, 'memo'>, table: Table, plan: Pick<DensePlan, 'key' | 'value' | 'aggregate'>): DenseItems & { sortKeys: number[] | undefined } {
  return memoized(ctx, `dense\u0000items\u0000${plan.key?.name ?? ''}\u0000${plan.value.name}\u0000${plan.aggregate}`, () => {
    if (!plan.key) {
      const column = columnOf(table, plan.value.name)!;
      const values = Float64Array.from(column.values.filter((v): v is number => typeof v === 'number'));
      const missing = column.values.flatMap((v, i) => (typeof v === 'number' ? [] : [table.rowPositions[i]!]));
      const diagnostics = missing.length ? [diagnostic('derive.missing-values', `${missing.length} row${missing.length === 1 ? ' has' : 's have'} no usable \`${plan.value.name}\` and ${missing.length === 1 ? 'is' : 'are'} left out, not drawn as zero`, { file: table.origin.file, field: plan.value.name, rows: missing.slice(0, 20), hint: 'fill in the values, or remove those rows if they are not data' })] : [];
      return { labels: undefined, values, sortKeys: undefined, diagnostics, left: { keys: [], rows: missing.length } };
    }
    const grouped = groupRows(table, { keys: [plan.key], value: plan.value });
    const combine = AGGREGATORS[plan.aggregate].combine;
    return { labels: grouped.groups.map((g) => g.labels[0]!), values: Float64Array.from(grouped.groups, (g) => combine(g.values)), sortKeys: grouped.groups.map((g) => g.sortKeys[0]!), diagnostics: grouped.diagnostics, left: { keys: grouped.noValue, rows: 0 } };
  });
}

function chooseOrder(input: PlanInput, key: FieldRef | undefined, problems: Diagnostic[], decisions: Decision[]): DensePlan['order'] {
  const { order } = input.brief;
  if (order === 'cluster' || (order === 'label' && !key)) {
    problems.push(diagnostic(input.lenient ? 'choice.lenient-fallback' : 'choice.order-not-applicable', `\`order: ${order}\` does not apply to a dense layout${order === 'label' ? ' without a key' : ''}`, {
      path: '/order', found: order, expected: 'value or data', hint: 'remove `order:` to order the items by value, or use `order: data`',
    }));
  }
  if (order === 'data') {
    decisions.push({ decision: 'items in data order', rule: 'the brief asks for it (`order:`): runs and changes along the data show as bands' });
    return 'data';
  }
  if (order === 'label' && key && !isOrdered(key.type)) {
    decisions.push({ decision: 'items in label order (A→Z by code point)', rule: 'the brief asks for it (`order:`)' });
    return 'label';
  }
  if ((order === 'auto' || order === 'label') && key && isOrdered(key.type)) {
    decisions.push({ decision: `items in the order of \`${key.name}\``, rule: `the key is ${key.type}, so its order carries meaning` });
    return 'key';
  }
  decisions.push({ decision: 'items sorted by value, largest first, read left to right in rows from the top', rule: 'sorted, the colours run from dark to light, so the share of items in each class reads as the size of its band' });
  return 'value';
}

/** The dense layout's plan: items, order and colour classes, each decision with its rule. */
export function planDense(input: PlanInput): Outcome<Planned<DensePlan>> {
  const { fields, brief, table } = input;
  const key = fields.keys[0] && refOf(fields.keys[0]);
  const value = refOf(fields.values[0]!);
  const problems: Diagnostic[] = [];
  const decisions: Decision[] = [];
  const order = chooseOrder(input, key, problems, decisions);
  if (problems.some((p) => p.severity === 'error')) return failure(problems);
  const items = denseItems(input, table, { key, value, aggregate: brief.aggregate });
  decisions.push({ decision: `one square cell per ${key ? `\`${key.name}\`` : 'row'}, ${items.values.length} items, coloured by value, drawn as one embedded raster`, rule: 'more items than bars can show: a pixel-oriented layout shows every item at once, where bars would fold them (Keim 2000, IEEE TVCG 6(1)); one raster keeps the SVG small' });
  if (key && brief.aggregate !== 'sum') decisions.push({ decision: `rows with the same key combined by ${brief.aggregate}`, rule: 'the brief asks for it (`aggregate:`)' });
  const classes = chooseClasses(items.values, value, brief.fields[value.name]?.midpoint, input.style, decisions, order === 'value');
  return success({ plan: { key, value, order, aggregate: brief.aggregate, classes }, decisions }, problems);
}
