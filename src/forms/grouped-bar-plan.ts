import type { Decision } from '../choose/types.js';
import { diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import { AGGREGATORS } from '../derive/aggregate.js';
import type { GroupedBarQuery } from '../derive/grouped-bars.js';
import { groupRows } from '../derive/group.js';
import { compareText } from '../derive/order.js';
import { isOrdered, refOf, type Field } from '../fields/types.js';
import { planBar, type BarPlan } from './bar-plan.js';
import type { Planned, PlanInput } from './types.js';

/** Most groups side by side within a key before the bars stop reading as one group each (common practice: about 6). */
export const MAX_GROUPS = 6;

/** How grouped bars are laid out: the bar plan for the keys, the group field, its groups in one order, and a colour for each. */
export interface GroupedBarPlan extends BarPlan, GroupedBarQuery {
  /** One colour per group, from the style's categorical palette, in the groups' order. */
  colours: string[];
}

/** The groups in one order: the group field's own order when it has one, else by overall value, largest first (ties by label). */
function groupOrder(input: PlanInput, group: Field, value: Field | undefined): { groups: string[]; decision: Decision } {
  const { groups } = groupRows(input.table, { keys: [refOf(group)], value: value && refOf(value) });
  if (isOrdered(group.type)) {
    const order = new Map(groups.map((g) => [g.labels[0]!, g.sortKeys[0]!]));
    const sorted = [...order.keys()].sort((a, b) => order.get(a)! - order.get(b)! || compareText(a, b));
    return { groups: sorted, decision: { decision: `groups in the order of \`${group.name}\`, the same within every key`, rule: `compare.two-keys: the group is ${group.type}, so its order carries meaning; one order in every key lets each group be found in the same place` } };
  }
  const combine = AGGREGATORS[input.brief.aggregate].combine;
  const ranked = groups.map((g) => ({ label: g.labels[0]!, value: combine(g.values) })).sort((a, b) => b.value - a.value || compareText(a.label, b.label));
  return { groups: ranked.map((g) => g.label), decision: { decision: `groups ordered by their overall value, largest first, the same within every key`, rule: 'compare.two-keys: one order in every key lets each group be found in the same place, and the largest group stands first' } };
}

function tooManyGroups(group: Field, n: number): Diagnostic {
  return diagnostic('choice.too-many-groups', `\`${group.name}\` has ${n} groups; beyond about ${MAX_GROUPS} bars side by side, a group is hard to follow from key to key`, {
    path: '/keys', field: group.name, found: `${n} groups`, expected: `at most ${MAX_GROUPS}`, hint: `show one panel per group with \`facet: ${group.name}\` (small multiples), or combine the smallest groups`,
  });
}

/** The grouped bar form's plan: the bar plan for its first key (order, orientation, how rows combine), then the groups' one order and their colours, each decision with its rule. */
export function planGroupedBar(input: PlanInput): Outcome<Planned<GroupedBarPlan>> {
  if (input.fields.keys.length !== 2) {
    return failure([diagnostic('choice.no-key', `grouped bars need two keys, the bars' key and the groups' key; the brief gives ${input.fields.keys.length}`, {
      path: '/keys', found: `${input.fields.keys.length} key(s)`, expected: 'two key columns, e.g. `keys: [marina, kind]`', hint: 'add the column whose levels form the groups to `keys:`, or remove `form: grouped-bar` for plain bars',
    })]);
  }
  // The keys are planned as bars of their totals: a key's rows are its groups, not repeats to
  // warn about, and the frame stays the brief's.
  const bars = planBar(input, { totals: true });
  if (!bars.ok) return bars;
  // Totals per key are what the bar plan saw; a grouped chart's combinations are its own.
  const barPlan: BarPlan = { ...bars.value.plan, combined: undefined, noData: [] };
  const group = input.fields.keys[1]!;
  const problems: Diagnostic[] = [...bars.diagnostics];
  // The bar plan sorts bars; here it sorts keys, each by its value over all its groups.
  const decisions: Decision[] = bars.value.decisions.filter((d) => !d.decision.startsWith('rows with the same')).map((d) => (bars.value.plan.order === 'value' && d.decision.startsWith('bars sorted by value') ? { ...d, decision: 'keys sorted by their overall value, largest first; ties by label' } : d));
  const { groups, decision } = groupOrder(input, group, input.fields.values[0]);
  decisions.push(decision);
  decisions.push({ decision: `a legend names the ${groups.length} groups of \`${group.name}\``, rule: 'compare.two-keys: the groups are told apart by colour, so a key to the colours is needed; it lists them in the order they stand' });
  if (groups.length > MAX_GROUPS) problems.push(tooManyGroups(group, groups.length));
  const { categorical } = input.style.palette;
  const colours = groups.map((_, i) => categorical[i % categorical.length]!);
  return success({ plan: { ...barPlan, group: refOf(group), groups, colours }, decisions }, problems);
}
