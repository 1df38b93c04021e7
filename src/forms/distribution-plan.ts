import type { Order } from '../brief/types.js';
import type { Decision } from '../choose/types.js';
import { diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import type { GroupOrder } from '../derive/distribution.js';
import { isOrdered, refOf, type FieldRef } from '../fields/types.js';
import type { Planned, PlanInput } from './types.js';

/** A strip or box chart's plan: the value, the group key, and the order of the groups. */
export interface GroupsPlan {
  key: FieldRef;
  value: FieldRef;
  order: GroupOrder;
}

/** The refusal of an `order:` a form has no use for. */
export function orderNotApplicable(order: Order, form: string, why: string): Diagnostic {
  return diagnostic('choice.order-not-applicable', `\`order: ${order}\` does not apply to ${form}: ${why}`, {
    path: '/order', found: order, expected: 'auto', hint: 'remove `order:`',
  });
}

function chooseOrder(order: Order, key: FieldRef, form: string): { order: GroupOrder; decision: Decision } | Diagnostic {
  if (order === 'cluster') return orderNotApplicable(order, form, 'groups are ordered by median, label or data, not clustered');
  if (order === 'auto' && isOrdered(key.type)) return { order: 'key', decision: { decision: `groups in the order of \`${key.name}\``, rule: `the key is ${key.type}, so its order carries meaning and the groups are not re-sorted` } };
  if (order === 'auto' || order === 'value') return { order: 'median', decision: { decision: 'groups sorted by median, largest first; ties by label', rule: order === 'value' ? 'the brief asks for it (`order: value`); a group\'s value is its median' : 'sorted groups let the reader compare neighbours and find rank at a glance; a categorical key has no order of its own' } };
  return { order, decision: { decision: `groups in ${order} order`, rule: 'the brief asks for it (`order:`)' } };
}

/** The plan of a form that shows one value by group (strips, boxes): the group order and the value axis, each with its rule. */
export function planGroups(input: PlanInput, form: string, marks: readonly Decision[]): Outcome<Planned<GroupsPlan>> {
  const key = refOf(input.fields.keys[0]!);
  const value = refOf(input.fields.values[0]!);
  const chosen = chooseOrder(input.brief.order, key, form);
  if ('code' in chosen) return failure([chosen]);
  const decisions: Decision[] = [
    chosen.decision,
    { decision: 'groups as rows, values along a shared horizontal axis', rule: 'one common scale lets positions be compared across groups; rows give group labels room to be read without tilting' },
    { decision: 'the value axis spans the data and need not start at zero', rule: 'values are shown by position, not length, so zero is not needed for an honest reading' },
    ...marks,
  ];
  return success({ plan: { key, value, order: chosen.order }, decisions });
}
