import type { FormName, Intent } from '../brief/types.js';
import type { Fields } from '../fields/types.js';
import { isOrdered } from '../fields/types.js';

/** One row of the rule table: when it applies, the form it leads to, and why. */
export interface Rule {
  id: string;
  intent: Intent;
  form: FormName;
  applies(fields: Fields): boolean;
  /** The reason, as a reader would accept it. */
  why: string;
}

/**
 * The rule table, as data: the first rule whose intent and data shape match chooses the form.
 * Adding a form means adding a row here, one file in src/forms/ and its registry line.
 */
export const RULES: readonly Rule[] = [
  {
    id: 'compare.categorical-key',
    intent: 'compare',
    form: 'bar',
    applies: (f) => f.keys.length === 1 && !isOrdered(f.keys[0]!.type),
    why: 'one categorical key and one value: bars compare values by length from a common baseline, read more accurately than angles, areas or colour (Cleveland & McGill 1984)',
  },
  {
    id: 'compare.ordered-key',
    intent: 'compare',
    form: 'bar',
    applies: (f) => f.keys.length === 1 && isOrdered(f.keys[0]!.type),
    why: 'one ordered key and one value: bars in key order, because the order of the key carries meaning',
  },
  {
    id: 'composition.group-and-part',
    intent: 'composition',
    form: 'stacked-bar',
    applies: (f) => f.keys.length === 2,
    why: 'two keys (group, part) and one value: one bar per group, its parts stacked; the totals and the baseline segment are the precise readings, the upper segments float',
  },
  {
    id: 'part-to-whole.group-and-part',
    intent: 'part-to-whole',
    form: 'normalized-bar',
    applies: (f) => f.keys.length === 2,
    why: 'two keys (group, part) and one value: each group as one bar of 100 %, so the shares of its parts compare across groups of any size',
  },
  {
    id: 'part-to-whole.one-key',
    intent: 'part-to-whole',
    form: 'normalized-bar',
    applies: (f) => f.keys.length === 1,
    why: 'one key and one value: each key\'s share of the whole as a bar on a percent axis; aligned lengths are read more accurately than the angles and areas of a pie (Cleveland & McGill 1984)',
  },
  {
    // After the one-key row, so it is reached only when the brief pins `form: donut`.
    id: 'part-to-whole.pinned-donut',
    intent: 'part-to-whole',
    form: 'donut',
    applies: (f) => f.keys.length === 1,
    why: 'the brief pins a donut: drawn for 2 or 3 parts only, whose few large angles are read well enough',
  },
];

/** The first rule that matches the intent and the fields (and leads to the pinned form, when one is pinned). */
export function matchRule(intent: Intent, fields: Fields, pinned?: FormName): Rule | undefined {
  return RULES.find((r) => r.intent === intent && (pinned === undefined || r.form === pinned) && r.applies(fields));
}

/** The intents the rule table answers, in table order. */
export function supportedIntents(): Intent[] {
  return [...new Set(RULES.map((r) => r.intent))];
}

/** The forms the rules may lead an intent to. */
export function formsForIntent(intent: Intent): FormName[] {
  return [...new Set(RULES.filter((r) => r.intent === intent).map((r) => r.form))];
}
