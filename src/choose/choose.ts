import { extent } from 'd3-array';
import type { ResolvedBrief } from '../brief/types.js';
import { diagnostic, failure, hasErrors, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import type { TextMeasurer } from '../font/measurer.js';
import { keyText } from '../fields/labels.js';
import type { Field, Fields } from '../fields/types.js';
import { isOrdered } from '../fields/types.js';
import type { Style } from '../style/types.js';
import { measureBarFit } from './bar-fit.js';
import { checkBriefRules, checkCompareShape, checkValueUnit } from './checks.js';
import { matchRule } from './rules.js';
import type { BarPlan, Choice, Decision } from './types.js';

/** What the rules may look at beyond fields and brief. */
export interface ChooseContext {
  style: Style;
  measure: TextMeasurer;
  /** Render the nearest honest form instead of failing on a broken hard rule. */
  lenient: boolean;
}

function distinctLabels(key: Field): string[] {
  const seen = new Set<string>();
  key.column.values.forEach((_, i) => { const t = keyText(key.column, i); if (t !== null) seen.add(t); });
  return [...seen];
}

function valueExtent(value: Field | undefined, rows: number): [number, number] {
  if (!value) return [0, rows];
  const nums = value.column.values.filter((v): v is number => typeof v === 'number');
  // d3-array's extent loops; Math.min(...nums) overflows the stack beyond about 120,000 rows.
  const [lo, hi] = extent(nums);
  return lo === undefined || hi === undefined ? [0, 1] : [lo, hi];
}

function chooseOrder(brief: ResolvedBrief, key: Field, lenient: boolean, problems: Diagnostic[], rationale: Decision[]): BarPlan['order'] {
  let order = brief.order;
  if (order === 'cluster') {
    const d = diagnostic(lenient ? 'choice.lenient-fallback' : 'choice.order-not-applicable', '`order: cluster` applies to heat maps, not to bars', {
      path: '/order', found: 'cluster', expected: 'auto, value, label or data', hint: 'remove `order:` to sort by value, or use `order: label`',
    });
    problems.push(d);
    order = 'auto';
  }
  if (order === 'auto') {
    if (isOrdered(key.type)) {
      rationale.push({ decision: `bars in the order of \`${key.name}\``, rule: `the key is ${key.type}, so its order carries meaning and the bars are not re-sorted` });
      return 'key';
    }
    rationale.push({ decision: 'bars sorted by value, largest first; ties by label', rule: 'sorted bars let the reader find rank and neighbours at a glance; a categorical key has no order of its own' });
    return 'value';
  }
  rationale.push({ decision: `bars in ${order} order`, rule: 'the brief asks for it (`order:`)' });
  return order;
}

/**
 * The choice stage: fields, brief and frame size → the chart form, its parameters, and the
 * rationale, with each decision tied to the rule that made it.
 */
export function choose(fields: Fields, brief: ResolvedBrief, ctx: ChooseContext): Outcome<Choice> {
  const briefRules = checkBriefRules(brief, ctx.lenient);
  if (hasErrors(briefRules.problems)) return failure(briefRules.problems);
  const problems = [...briefRules.problems, ...checkCompareShape(fields, brief)];
  if (!hasErrors(problems)) problems.push(...checkValueUnit(fields));
  if (hasErrors(problems)) return failure(problems);
  const rule = matchRule(brief.intent, fields)!;
  const key = fields.keys[0]!;
  const value = fields.values[0];
  const rationale: Decision[] = [{ decision: 'bar chart', rule: `${rule.id}: ${rule.why}` }];
  if (brief.form) rationale.push({ decision: `form pinned to ${brief.form}`, rule: 'the brief pins `form:`; the hard rules still apply' });
  rationale.push(briefRules.baseline);
  const order = chooseOrder(brief, key, ctx.lenient, problems, rationale);
  if (hasErrors(problems)) return failure(problems);

  const labels = distinctLabels(key);
  const fit = measureBarFit(labels, valueExtent(value, key.column.values.length), { title: brief.title, subtitle: brief.subtitle, source: brief.source, notes: [] }, ctx.style, brief.size, ctx.measure);
  const timeLike = key.type === 'temporal' || key.type === 'quantitative';
  const vertical = timeLike || fit.labelsFitUpright;
  const px = (n: number) => `${Math.round(n)} px`;
  rationale.push(vertical
    ? { decision: 'vertical bars', rule: timeLike ? `the key is ${key.type}, so it runs left to right as time and numbers do; labels are thinned if crowded` : `all ${labels.length} labels fit upright: the widest needs ${px(fit.bandNeeded)} and each band has ${px(fit.plotWidth / Math.max(1, labels.length))}` }
    : { decision: 'horizontal bars', rule: `the widest label needs ${px(fit.bandNeeded)} but ${labels.length} upright bands would have ${px(fit.plotWidth / Math.max(1, labels.length))} each; rows give labels room to be read without tilting` });
  if (brief.aggregate !== 'sum' || !value) rationale.push({ decision: `rows with the same key combined by ${brief.aggregate}`, rule: 'the brief asks for it (`aggregate:`)' });
  const capacity = vertical ? fit.verticalCapacity : fit.horizontalCapacity;
  return success({
    form: 'bar', intent: brief.intent, rationale,
    bar: { key, value, orientation: vertical ? 'vertical' : 'horizontal', order, aggregate: brief.aggregate, capacity },
  }, problems);
}
