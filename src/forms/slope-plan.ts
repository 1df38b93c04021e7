import type { Decision } from '../choose/types.js';
import { diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import type { SlopeQuery } from '../derive/slopes.js';
import { isOrdered, refOf, type Field } from '../fields/types.js';
import type { Planned, PlanInput } from './types.js';
import { count } from '../diagnostics/words.js';

/** Items beyond which a slope chart becomes a tangle of crossing lines (common practice: "dozens at most"). */
export const MAX_SLOPE_ITEMS = 40;

/** How a slope chart is drawn: what it derives from, and whether the shared axis includes zero. */
export interface SlopePlan {
  query: SlopeQuery;
  zero: boolean;
}

function itemCount(item: Field): number {
  const seen = new Set<string>();
  for (const t of item.column.text) if (t !== null && t !== '') seen.add(t);
  return seen.size;
}

function endsDecision(input: PlanInput): Decision {
  const [item, period] = input.fields.keys;
  const [a, b] = input.fields.values;
  const shape = 'a slope chart: both ends on one shared scale, so each line\'s slope is its change and the changes of all items are compared on one footing (Tufte 1983, slopegraph)';
  if (!period) return { decision: `one line per \`${item!.name}\` from \`${a!.name}\` (left) to \`${b!.name}\` (right)`, rule: `${shape}; the columns are drawn in the order \`values:\` lists them` };
  const order = isOrdered(period.type) ? `the period key is ${period.type}, so the earlier is on the left` : `the periods keep the order of \`${period.name}\` (first appearance, or \`fields.${period.name}.order\`)`;
  return { decision: `one line per \`${item!.name}\` between the two periods of \`${period.name}\``, rule: `${shape}; ${order}` };
}

function widthDecision(input: PlanInput): Decision[] {
  const { fields } = input;
  const width = fields.values[fields.keys.length === 2 ? 1 : 2];
  if (!width) return [];
  return [{ decision: `line width shows \`${width.name}\` (mean of each item's rows)`, rule: 'a third value may ride on line width, ∝ value (at least 1 px so every line shows); width is read less accurately than position, so it carries only the secondary value' }];
}

function manyItems(n: number, decisions: Decision[], problems: Diagnostic[]): void {
  if (n <= MAX_SLOPE_ITEMS) return;
  const other = 'bars of the change per item (add a column of after − before and use intent compare)';
  decisions.push({ decision: `${n} items drawn as ${n} lines`, rule: `more than about ${MAX_SLOPE_ITEMS} slopes cross into a tangle whose labels crowd both axes; ${other} reads better` });
  problems.push(diagnostic('choice.slope-many-items', `${n} items is more than the about ${MAX_SLOPE_ITEMS} a slope chart shows legibly`, {
    found: `${n} items`, expected: `at most about ${MAX_SLOPE_ITEMS}`, hint: `filter to the items that matter, or show ${other}`,
  }));
}

/**
 * What a slope chart cannot draw: an order (items stand at their values), or a shape of another
 * intent (a pinned `form: slope` skips the shift intent's shape check), refused rather than
 * failing while drawing or silently ignored.
 */
function unfit(input: PlanInput): Diagnostic | undefined {
  const { keys, values } = input.fields;
  if (input.brief.order !== 'auto') {
    return diagnostic('choice.order-not-applicable', `\`order: ${input.brief.order}\` does not apply to a slope chart: each item stands at its own values on the shared scale`, {
      path: '/order', found: input.brief.order, expected: 'auto', hint: 'remove `order:`',
    });
  }
  const fits = keys.length === 2 ? values.length >= 1 && values.length <= 2 : keys.length === 1 && values.length >= 2 && values.length <= 3;
  if (fits) return undefined;
  return diagnostic('choice.slope-shape', `a slope chart needs items measured at two points, but the brief gives ${count(keys.length, 'key')} and ${count(values.length, 'value')}`, {
    path: '/values', found: `${count(keys.length, 'key')}, ${count(values.length, 'value')}`, expected: 'keys: [item, period] with one value, or keys: item with values: [before, after]',
    hint: 'use `intent: shift` with `keys: [item, period]`, or `values: [before, after]`',
  });
}

/** The slope chart's plan: where the two ends come from, the shared scale's baseline, colour, labels and width, each with its rule. */
export function planSlope(input: PlanInput): Outcome<Planned<SlopePlan>> {
  const refused = unfit(input);
  if (refused) return failure([refused]);
  const { fields, brief } = input;
  const [item, period] = fields.keys as [Field, Field | undefined];
  const values = fields.values;
  const source: SlopeQuery['source'] = period
    ? { kind: 'periods', period: refOf(period), value: refOf(values[0]!) }
    : { kind: 'columns', before: refOf(values[0]!), after: refOf(values[1]!) };
  const width = values[period ? 1 : 2];
  const zero = brief.baseline === 'zero';
  const decisions: Decision[] = [
    endsDecision(input),
    zero
      ? { decision: 'the shared axis includes zero', rule: 'the brief\'s baseline is zero (the default), so the lines\' heights also read as shares of the whole; `baseline: fit` zooms to the data, which a slope chart allows because it is read by position and slope, not length' }
      : { decision: 'the shared axis spans the data, not zero', rule: 'the brief asks for it (`baseline: fit`); slopes are read by position, not by length from a baseline, so zero may be left out' },
    { decision: 'lines coloured by direction: up, down, unchanged', rule: 'redundant coding: the colour repeats what the slope already shows, so a reader who cannot tell the colours apart loses nothing, and rises and falls are found at a glance' },
    { decision: 'each item labelled at both ends with its value, the labels spread apart so none overlap', rule: 'direct labels spare the eye a trip to a legend; labels are moved the least total distance that clears them (isotonic regression), with a leader line where one moved more than half a line' },
    ...widthDecision(input),
  ];
  if (brief.aggregate !== 'sum') decisions.push({ decision: `rows of the same item and point combined by ${brief.aggregate}`, rule: 'the brief asks for it (`aggregate:`)' });
  const problems: Diagnostic[] = [];
  manyItems(itemCount(item), decisions, problems);
  return success({ plan: { query: { item: refOf(item), source, width: width && refOf(width), aggregate: brief.aggregate }, zero }, decisions }, problems);
}
