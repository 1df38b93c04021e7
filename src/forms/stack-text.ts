import type { Locale } from '../brief/types.js';
import { localeDef } from '../fields/locales.js';
import type { DerivedStacks } from '../derive/stacks.js';
import { axisTitle } from '../layout/axis.js';
import type { FormWords } from '../layout/kit-types.js';
import { labelStyle, valueFormatter } from '../layout/number-format.js';
import type { StackPlan } from './stack-plan.js';
import { inSentence } from '../fields/labels.js';

/** The numbers a stacked or normalized bar chart draws, with its plan. */
export type StackDerived = DerivedStacks<StackPlan>;

/** The value axis title: the value (with its unit), or its share of each bar when normalized. */
export function stackValueTitle(derived: StackDerived): string {
  const { value } = derived.query;
  const title = value ? axisTitle(value, value.label) : 'Number of rows';
  if (!derived.query.normalized) return title;
  const name = value ? value.label : 'rows';
  return `Share of ${inSentence(name)} (%)`;
}

/** A share as a label: whole percents, "<1%" for a sliver that would round to nothing. */
export function percentText(share: number, locale?: Locale): string {
  const percent = localeDef(locale).percent;
  if (share > 0 && share < 0.005) return `<1${percent}`;
  return `${Math.round(share * 100)}${percent}`;
}

/** Notes under the chart: what "Other" holds, and which groups were left out. */
function stackNotes(derived: StackDerived): string[] {
  const notes: string[] = [];
  const { folded, other, empty } = derived;
  if (folded.length) {
    const shown = folded.slice(0, 6).join(', ');
    notes.push(`"${other}" holds the ${folded.length} smallest parts overall: ${shown}${folded.length > 6 ? ', …' : ''}.`);
  }
  const { dropped } = derived;
  if (dropped.length) notes.push(`Not drawn: the ${dropped.length} ${inSentence(derived.query.group.label)} value${dropped.length === 1 ? '' : 's'} with the smallest totals (${dropped.slice(0, 3).join(', ')}${dropped.length > 3 ? ', …' : ''}); the plot holds no more bars.`);
  if (empty.length) notes.push(`Not drawn: ${empty.length} ${inSentence(derived.query.group.label)} value${empty.length === 1 ? '' : 's'} whose parts sum to zero (${empty.slice(0, 3).join(', ')}${empty.length > 3 ? ', …' : ''}).`);
  return notes;
}

/** One sentence for screen readers: what is stacked, how many bars and parts, and the largest bar or baseline share. */
function stackDescription(derived: StackDerived): string {
  const { stacks, parts, query } = derived;
  const kind = query.normalized ? 'Normalized stacked bar chart' : 'Stacked bar chart';
  const what = `${kind} of ${inSentence(stackValueTitle(derived))} by ${inSentence(query.group.label)} and ${inSentence(query.part.label)}, ${stacks.length} bar${stacks.length === 1 ? '' : 's'} of ${parts.length} part${parts.length === 1 ? '' : 's'}`;
  const first = stacks[0];
  if (!first) return `${what}.`;
  if (query.normalized) {
    const base = first.segments.find((s) => s.part === parts[0]);
    return `${what}: ${parts[0]} is ${percentText(base?.share ?? 0, query.group.locale)} of ${first.group}.`;
  }
  const fmt = valueFormatter(stacks.map((s) => s.total), labelStyle(query.value, query.group));
  return `${what}: ${first.group} totals ${fmt(first.total)}.`;
}

/** The words of a stacked or normalized bar chart: default title, description, notes. */
export function stackWords(derived: StackDerived): FormWords {
  const { query } = derived;
  return {
    title: `${stackValueTitle(derived)} by ${inSentence(query.group.label)} and ${inSentence(query.part.label)}`,
    description: stackDescription(derived),
    notes: stackNotes(derived),
  };
}
