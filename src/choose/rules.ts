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

/** Items beyond which bars cannot show them all (they would fold): a dense pixel layout shows every one (common practice; the design's figure). */
export const DENSE_ITEMS = 10_000;

/** How many items a compare or distribution brief has: the key's levels, or the value's rows without a key (or with a key that is not categorical). */
function itemCount(f: Fields): number {
  const key = f.keys[0];
  return key && key.levels.length ? key.levels.length : (key ?? f.values[0])?.column.values.length ?? 0;
}

const manyItems = (f: Fields) => itemCount(f) >= DENSE_ITEMS;

/**
 * The rule table, as data: the first rule whose intent and data shape match chooses the form.
 * Adding a form means adding a row here, one file in src/forms/ and its registry line.
 */
export const RULES: readonly Rule[] = [
  {
    id: 'compare.categorical-key',
    intent: 'compare',
    form: 'bar',
    applies: (f) => f.keys.length === 1 && !isOrdered(f.keys[0]!.type) && !manyItems(f),
    why: 'one categorical key and one value: bars compare values by length from a common baseline, read more accurately than angles, areas or colour (Cleveland & McGill 1984)',
  },
  {
    id: 'compare.ordered-key',
    intent: 'compare',
    form: 'bar',
    applies: (f) => f.keys.length === 1 && isOrdered(f.keys[0]!.type) && !manyItems(f),
    why: 'one ordered key and one value: bars in key order, because the order of the key carries meaning',
  },
  {
    id: 'matrix.two-keys',
    intent: 'matrix',
    form: 'heatmap',
    applies: (f) => f.keys.length === 2,
    why: 'two keys and one value: a heat map shows every row × column pair at once, colour standing for the value; clustering brings similar rows and columns together so blocks show',
  },
  {
    id: 'compare.many-items',
    intent: 'compare',
    form: 'dense',
    applies: (f) => f.keys.length === 1 && manyItems(f),
    why: '10,000 or more keys: more than bars can show without folding, so one small cell per key, coloured by value, shows them all',
  },
  {
    id: 'distribution.many-items',
    intent: 'distribution',
    form: 'dense',
    applies: (f) => f.keys.length <= 1 && f.values.length === 1 && manyItems(f),
    why: '10,000 or more items: one small cell per item, coloured by value and sorted, shows the shape of the whole distribution',
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
