import { notationDecision } from './notation.js';
import { localeDecision } from './locale.js';
import type { ResolvedBrief } from '../brief/types.js';
import { diagnostic, failure, hasErrors, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import type { Fields } from '../fields/types.js';
import type { TextMeasurer } from '../font/measurer.js';
import type { Style } from '../style/types.js';
import type { Table } from '../table/types.js';
import { checkBriefRules, checkPinnedForm, checkValueUnit, SHAPE_CHECKS } from './checks.js';
import { chooseFacet } from './facet.js';
import { applyHardRules } from './hard-rules.js';
import { matchRule } from './rules.js';
import type { Candidate, Choice, Decision } from './types.js';
import { count } from '../diagnostics/words.js';

/** What the rules may look at beyond fields and brief. */
export interface ChooseContext {
  style: Style;
  measure: TextMeasurer;
  /** Render the nearest honest form instead of failing on a broken hard rule. */
  lenient: boolean;
  /** The forms that can be drawn (the registry), passed in so the rules know no form by import. */
  forms: readonly Candidate[];
  /** The render's memory of measured results, handed to the form's plan. Default: none. */
  memo?: Map<string, unknown>;
}

/**
 * The choice stage: fields, brief and frame size → the chart form, its plan, and the rationale,
 * with each decision tied to the rule that made it: the rule row that chose the form, the hard
 * rules its traits bind it to, and the form's own planning decisions.
 */
export function choose(fields: Fields, brief: ResolvedBrief, ctx: ChooseContext, table: Table): Outcome<Choice> {
  const early = checkBriefRules(brief, ctx.forms, ctx.lenient);
  if (hasErrors(early.problems)) return failure(early.problems);
  const problems: Diagnostic[] = [...early.problems.filter((p) => p.code !== 'choice.lenient-fallback'), ...(SHAPE_CHECKS[brief.intent]?.(fields, brief) ?? [])];
  if (hasErrors(problems)) return failure(problems);
  const rule = matchRule(brief.intent, fields, brief.form, brief);
  const form = ctx.forms.find((f) => f.name === (brief.form ?? rule?.form));
  if (!form) {
    return failure([...problems, diagnostic('choice.no-rule', `no form is drawn for intent ${brief.intent} with this data`, {
      path: '/intent', found: `${count(fields.keys.length, 'key')}, ${count(fields.values.length, 'value')}`, hint: 'check `keys:` and `values:`, or choose another intent',
    })]);
  }
  const hard = applyHardRules({ traits: form.traits, form: form.noun, brief, fields, maxColours: ctx.style.palette.categorical.length }, ctx.lenient);
  problems.push(...hard.problems, ...checkPinnedForm(brief));
  if (hasErrors(problems)) return failure(problems);
  problems.push(...checkValueUnit(fields));
  // A pinned form is explained by its own rule row when one fits, never by another form's.
  const rationale: Decision[] = [rule ? { decision: form.noun, rule: `${rule.id}: ${rule.why}` } : { decision: form.noun, rule: 'the brief pins `form:`' }];
  if (brief.form) rationale.push({ decision: `form pinned to ${brief.form}`, rule: 'the brief pins `form:`; the hard rules still apply' });
  rationale.push(...hard.decisions);
  const planned = form.plan({ fields, table, brief, style: ctx.style, measure: ctx.measure, lenient: ctx.lenient, ...(ctx.memo ? { memo: ctx.memo } : {}) });
  problems.push(...planned.diagnostics);
  if (!planned.ok || hasErrors(problems)) return failure(problems);
  rationale.push(...planned.value.decisions);
  const numbers = notationDecision(fields);
  if (numbers) rationale.push(numbers);
  const locale = localeDecision(brief);
  if (locale) rationale.push(locale);
  const faceted = chooseFacet(fields, brief, form, planned.value.facet);
  problems.push(...faceted.problems);
  if (hasErrors(problems)) return failure(problems);
  rationale.push(...faceted.decisions);
  const { size } = planned.value;
  return success({ form: form.name, intent: brief.intent, rule: rule?.id ?? 'pinned', plan: planned.value.plan, rationale, ...(size ? { size } : {}), ...(faceted.facet ? { facet: faceted.facet } : {}) }, problems);
}
