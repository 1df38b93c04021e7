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
    id: 'matrix.two-keys',
    intent: 'matrix',
    form: 'heatmap',
    applies: (f) => f.keys.length === 2,
    why: 'two keys and one value: a heat map shows every row × column pair at once, colour standing for the value; clustering brings similar rows and columns together so blocks show',
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
