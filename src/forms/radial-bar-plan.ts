import { min } from 'd3-array';
import type { Decision } from '../choose/types.js';
import { diagnostic, failure, success, type Outcome } from '../diagnostics/diagnostic.js';
import { AGGREGATORS } from '../derive/aggregate.js';
import { wholeCycle } from '../fields/labels.js';
import { refOf, type Field } from '../fields/types.js';
import type { BarQuery } from '../derive/bars.js';
import { barGroups } from './bar-plan.js';
import type { Planned, PlanInput } from './types.js';

/**
 * A radial bar chart's plan: the cyclic key, the value, and how rows combine (the key's cycle
 * order is always kept). `wheel` is every place of the cycle in order, present in the data or not.
 */
export type RadialBarPlan = BarQuery & { order: 'key'; wheel: string[] };

/**
 * Every place of the key's cycle, in order: the declared order when the brief gives one, the
 * whole calendar cycle for months and weekdays (12 and 7 places, whether or not each is in the
 * data), else the data's own levels. A place keeps its angle when its data is missing.
 */
export function wheelOf(input: PlanInput, key: Field): string[] {
  const hint = Object.hasOwn(input.brief.fields, key.name) ? input.brief.fields[key.name] : undefined;
  if (hint?.order !== undefined) return [...new Set(hint.order.map(String))];
  return wholeCycle(key.levels) ?? key.levels;
}

/** The decisions every radial bar chart states, each with its rule. */
function radialDecisions(key: string): Decision[] {
  return [
    { decision: `bars in the cycle order of \`${key}\`, the first centred at 12 o'clock and the last next to the first`, rule: 'a cyclic key has no first or last value; a circle keeps every neighbour next to its neighbour, the wrap-around included' },
    { decision: 'each bar\'s length runs from an inner ring, in proportion to its value', rule: 'length is read from a common baseline; the inner ring keeps short bars apart near the centre' },
    { decision: 'radial bars rather than upright ones', rule: 'chosen to show the cycle, not for precise comparison: an outer bar spans a wider arc, so it looks larger than its length alone says; for exact comparison use bars in key order (intent: compare)' },
  ];
}

/** The radial bar chart's plan; a negative combined value is refused (a length from the inner ring cannot be negative). */
export function planRadialBar(input: PlanInput): Outcome<Planned<RadialBarPlan>> {
  const { fields, brief } = input;
  const key = fields.keys[0]!;
  const value = fields.values[0];
  const { groups } = barGroups(input.table, refOf(key), value && refOf(value), input);
  const combine = AGGREGATORS[brief.aggregate].combine;
  const lowest = min(groups, (g) => combine(g.values)) ?? 0;
  if (lowest < 0) {
    return failure([diagnostic('choice.radial-negative', `\`${value?.name ?? 'the value'}\` has negative values (down to ${lowest}), and a radial bar's length from its inner ring cannot be negative`, {
      path: '/values', field: value?.name, found: String(lowest), expected: 'values of zero or more',
      hint: 'use bars in key order (intent: compare), which draw negative values on the other side of a zero line',
    })]);
  }
  const decisions = radialDecisions(key.name);
  const wheel = wheelOf(input, key);
  const missing = wheel.length - groups.length;
  if (missing > 0) decisions.push({ decision: `${wheel.length} places around the circle, ${missing} of them with no data: drawn as empty dashed sectors and named in the note`, rule: 'a place of the cycle keeps its angle when its data is missing, so the wheel never closes over a gap' });
  if (brief.aggregate !== 'sum' || !value) decisions.push({ decision: `rows with the same key combined by ${brief.aggregate}`, rule: 'the brief asks for it (`aggregate:`)' });
  return success({ plan: { key: refOf(key), value: value && refOf(value), order: 'key', aggregate: brief.aggregate, wheel }, decisions });
}
