import type { Decision } from '../choose/types.js';
import { diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import type { DotQuery } from '../derive/dots.js';
import { isOrdered, refOf, type Field } from '../fields/types.js';
import type { Planned, PlanInput } from './types.js';

/** A dot plot's plan: its key, its one or two values (a dumbbell), their order and how rows combine. */
export interface DotPlan extends DotQuery {
  /** Whether a value's zero is arbitrary (°C, years): then sums of several rows mean nothing. */
  arbitraryZero: boolean;
}

function chooseOrder(input: PlanInput, key: Field, values: readonly Field[]): { order: DotPlan['order']; decision: Decision; problem?: Diagnostic } {
  const order = input.brief.order;
  if (order === 'cluster') {
    const problem = diagnostic('choice.order-not-applicable', '`order: cluster` applies to heat maps, not to dot plots', { path: '/order', found: 'cluster', expected: 'auto, value, label or data', hint: 'remove `order:` to sort by value, or use `order: label`' });
    return { order: 'value', decision: { decision: '', rule: '' }, problem };
  }
  if (order !== 'auto') return { order, decision: { decision: `keys in ${order} order`, rule: 'the brief asks for it (`order:`)' } };
  if (isOrdered(key.type)) return { order: 'key', decision: { decision: `keys in the order of \`${key.name}\``, rule: `the key is ${key.type}, so its order carries meaning and is kept` } };
  const by = values.length === 2 ? `\`${values[1]!.name}\` (the second value)` : 'value';
  return { order: 'value', decision: { decision: `keys sorted by ${by}, largest at the top; ties by label`, rule: 'sorted rows let the reader find rank and neighbours at a glance, as for bars; a categorical key has no order of its own' } };
}

/** A dumbbell's two values must be one measure: two different units on one axis would mix scales. */
function unitsDiffer(values: readonly Field[]): Diagnostic | undefined {
  const [a, b] = values;
  if (!a || !b || (a.unit ?? '') === (b.unit ?? '')) return undefined;
  return diagnostic('choice.dumbbell-units-differ', `\`${a.name}\` is in ${a.unit ?? 'no unit'} and \`${b.name}\` in ${b.unit ?? 'no unit'}: a dumbbell puts both on one axis, so they must be one measure`, {
    path: '/values', found: `${a.unit ?? 'none'}, ${b.unit ?? 'none'}`, expected: 'the same unit for both values',
    hint: `give both the same \`unit\` if they are one measure, or write one brief per value and show them as aligned panels`,
  });
}

/** The axis decision: why the value axis may leave zero out. */
function axisDecision(values: readonly Field[]): Decision {
  const arbitrary = values.find((v) => v.zero === 'arbitrary');
  if (arbitrary) return { decision: 'the value axis spans the data and need not include zero', rule: `the zero of \`${arbitrary.name}\` is arbitrary (\`zero: arbitrary\`), and dots show values by position, not by length from zero` };
  return { decision: 'the value axis spans the data and need not include zero', rule: 'dots show values by their position on an aligned scale, not by a length from zero (Cleveland 1985)' };
}

/** The dot form's plan: order, axis, and (for two values) the dumbbell, each decision with its rule. */
export function planDot(input: PlanInput): Outcome<Planned<DotPlan>> {
  const { fields, brief } = input;
  const key = fields.keys[0]!;
  const values = fields.values;
  if (values.length === 0) {
    return failure([diagnostic('choice.no-value', 'a dot plot needs a value: the column the dots\' positions show', { path: '/values', expected: 'one numeric column, or two for a dumbbell', hint: 'add `values:`, or remove `form: dot` to count rows with bars' })]);
  }
  const differ = unitsDiffer(values);
  const { order, decision, problem } = chooseOrder(input, key, values);
  const problems = [differ, problem].filter((p): p is Diagnostic => p !== undefined);
  if (problems.length) return failure(problems);
  const decisions: Decision[] = [
    axisDecision(values),
    { decision: 'keys down the left, one dot per key along the value axis', rule: 'labels stay horizontal and every dot is read against one aligned scale (Cleveland\'s dot plot)' },
    decision,
  ];
  if (values.length === 2) decisions.push({ decision: `a dumbbell per key: a line joins its \`${values[0]!.name}\` and \`${values[1]!.name}\` dots, told apart by colour`, rule: 'two values of one measure per key: both are read by position, and the line\'s length shows their difference' });
  if (brief.aggregate !== 'sum') decisions.push({ decision: `rows with the same key combined by ${brief.aggregate}`, rule: 'the brief asks for it (`aggregate:`)' });
  return success({ plan: { key: refOf(key), values: values.map(refOf), order, aggregate: brief.aggregate, arbitraryZero: values.some((v) => v.zero === 'arbitrary') }, decisions });
}
