import type { Decision } from '../choose/types.js';
import { diagnostic, failure, success, type Outcome } from '../diagnostics/diagnostic.js';
import { AGGREGATORS } from '../derive/aggregate.js';
import { MAX_PARTS } from '../derive/fold-parts.js';
import { groupRows } from '../derive/group.js';
import { cellsOf, partOrder, type GroupOrder } from '../derive/stack.js';
import type { StackQuery } from '../derive/stacks.js';
import { isOrdered, refOf, type Field } from '../fields/types.js';
import { planBar, type BarPlan } from './bar-plan.js';
import type { Planned, PlanInput } from './types.js';
import { article } from '../diagnostics/words.js';

/** How a stacked or normalized bar chart is laid out: the stack query, and upright or lying bars. */
export interface StackPlan extends StackQuery {
  orientation: BarPlan['orientation'];
}

/** The most categorical colours there are (as the hard rule `distinguishable-colours` counts them). */
const MAX_COLOURS = 8;

/** Parts must add up to a whole: a mean, maximum or minimum of rows cannot be stacked. */
function additiveOnly(input: PlanInput, normalized: boolean) {
  const { aggregate } = input.brief;
  if (AGGREGATORS[aggregate].additive) return [];
  const form = normalized ? 'normalized bar' : 'stacked bar';
  return [diagnostic('choice.aggregate-not-additive', `${article(form)} adds its parts into a whole, but \`aggregate: ${aggregate}\` gives values that do not add up`, {
    path: '/aggregate', found: aggregate, expected: 'sum or count', hint: `use \`aggregate: sum\` (or count), or compare the ${aggregate} values as bars (intent: compare)`,
  })];
}

/** A stack needs a group and a part: a pinned form with another number of keys is refused. */
function twoKeys(n: number, normalized: boolean) {
  return diagnostic(n < 2 ? 'choice.no-key' : 'choice.too-many-keys', `a ${normalized ? 'normalized' : 'stacked'} bar chart needs two keys, the groups (one bar each) and the parts stacked in them, not ${n}`, {
    path: '/keys', found: `${n} key${n === 1 ? '' : 's'}`, expected: 'two key columns: [group, part]', hint: 'give `keys: [group, part]`, or remove `form:` to let the rules choose',
  });
}

/** The bars' order decision in the words of a stack: by total, or by the baseline part's share. */
function orderDecision(order: GroupOrder, barDecision: Decision, baseline: string | undefined): Decision {
  if (order === 'total') return { decision: 'bars sorted by total, largest first; ties by label', rule: 'sorted bars let the reader find rank at a glance, and a stack\'s total is one of its two precise readings; a categorical key has no order of its own' };
  if (order === 'baseline-share') return { decision: `bars sorted by the share of ${JSON.stringify(baseline ?? '')}, the baseline part, largest first; ties by label`, rule: 'every normalized bar has the same total, so it is ranked by the one part read against the common baseline; a categorical key has no order of its own' };
  return barDecision;
}

/** The order of the parts: the largest overall on the baseline, or an ordered part key's own order. */
function partDecision(parts: readonly string[], part: Field): Decision {
  const first = JSON.stringify(parts[0] ?? '');
  if (isOrdered(part.type)) {
    return { decision: `parts of \`${part.name}\` stacked in their own order in every bar, ${first} on the baseline`, rule: `the part key is ${part.type}, so its order carries meaning (a scale, a sequence) and is kept rather than sorted by size; only the baseline segment is read by aligned position (Cleveland & McGill 1984)` };
  }
  return {
    decision: `parts of \`${part.name}\` stacked in one order in every bar, the largest overall (${first}) on the baseline`,
    rule: 'only the segment on the common baseline is read by aligned position; the others float on those below (Cleveland & McGill 1984), so the largest part gets the precise reading and the order never changes between bars',
  };
}

/** What is stacked, in which order, and why; the rules of reading a stack stated once. */
function stackDecisions(parts: readonly string[], part: Field, normalized: boolean, limit: number): Decision[] {
  const decisions: Decision[] = [partDecision(parts, part)];
  if (normalized) {
    decisions.push({ decision: 'each bar shows its group as 100 %', rule: 'part-to-whole: shares of groups of different sizes compare on one scale; the baseline part and the part at the top (read from 100 %) are the precise readings' });
    decisions.push({ decision: 'percent labels inside the segments where they fit; parts named in a legend', rule: 'a label that does not fit its segment would cover its neighbours, so it is left out (common practice)' });
    if (parts.length > limit) decisions.push({ decision: `the ${parts.length - limit + 1} smallest of ${parts.length} parts folded into one "Other" part`, rule: `at most ${limit} parts: ${MAX_PARTS} is about the most a stack keeps readable (common practice), and colour tells at most ${limit - 1} parts apart, with "Other" in neutral grey` });
  } else {
    decisions.push({ decision: 'stacked bars of absolute values', rule: 'composition: the totals and the baseline segment are the precise readings; the upper segments float and are compared only roughly' });
    decisions.push({ decision: 'parts named inside their segments where the name fits; a legend when some part fits in none', rule: 'direct labels spare the reader matching colours to a legend (common practice); a label that does not fit its segment is left out' });
  }
  return decisions;
}

/**
 * The plan of a stacked (or normalized) bar chart: the first key groups the bars, the second
 * names the parts. Order and orientation are the bar form's (planned for the groups' totals);
 * the order by value becomes by total, or by the baseline part's share when normalized.
 */
export function planStacks(input: PlanInput, normalized: boolean): Outcome<Planned<StackPlan>> {
  const { fields, brief, style } = input;
  if (fields.keys.length !== 2) return failure([twoKeys(fields.keys.length, normalized)]);
  const [group, part] = [fields.keys[0]!, fields.keys[1]!];
  const value = fields.values[0];
  const refused = additiveOnly(input, normalized);
  if (refused.length) return failure(refused);
  // The groups are planned as bars of their totals: several rows per group are the parts, not
  // repeated keys to warn about, and the frame stays the brief's.
  const bars = planBar({ ...input, fields: { ...fields, keys: [group] } }, { totals: true });
  if (!bars.ok) return failure(bars.diagnostics);
  const { plan: bar, decisions: [barOrder, ...barAll] } = bars.value;
  const barRest = barAll.filter((d) => !d.decision.startsWith('rows with the same'));
  const grouped = groupRows(input.table, { keys: [refOf(group), refOf(part)], value: value && refOf(value) });
  const partKeys = new Map(grouped.groups.map((g) => [g.labels[1]!, g.sortKeys[1]!]));
  const byKey = isOrdered(part.type);
  const parts = partOrder(cellsOf(grouped.groups, AGGREGATORS[brief.aggregate].combine), byKey ? (p) => partKeys.get(p)! : undefined);
  const order: GroupOrder = bar.order === 'value' ? (normalized ? 'baseline-share' : 'total') : bar.order;
  const limit = Math.min(MAX_PARTS, Math.min(MAX_COLOURS, style.palette.categorical.length) + 1);
  const decisions = [orderDecision(order, barOrder!, parts[0]), ...barRest, ...stackDecisions(parts, part, normalized, limit)];
  return success({
    plan: { group: refOf(group), part: refOf(part), value: value && refOf(value), aggregate: brief.aggregate, order, normalized, partLimit: limit, partOrder: byKey ? 'key' : 'size', orientation: bar.orientation },
    decisions,
  }, bars.diagnostics);
}
