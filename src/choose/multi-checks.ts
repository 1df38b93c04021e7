import type { ResolvedBrief } from '../brief/types.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import type { Fields } from '../fields/types.js';

/** A value that must hold numbers, refused otherwise (shared by the flow and profile shapes). */
function quantitativeValues(fields: Fields, what: string): Diagnostic[] {
  return fields.values.filter((v) => v.type !== 'quantitative').map((v) => diagnostic('choice.value-not-quantitative', `the value \`${v.name}\` is ${v.type}, but ${what} need numbers`, {
    path: '/values', field: v.name, found: v.type, expected: 'a quantitative column', hint: `set \`fields.${v.name}.type: quantitative\` if it holds numbers, or leave it out of \`values:\``,
  }));
}

/** The flow intent's data shape: an ordered key (time), a series key, and one numeric value. */
export function checkFlowShape(fields: Fields, _brief: ResolvedBrief): Diagnostic[] {
  const problems: Diagnostic[] = [];
  if (fields.keys.length < 2) {
    problems.push(diagnostic('choice.flow-needs-series', 'a flow needs two keys: the ordered key the layers run along (time) and the series each layer is', {
      path: '/keys', found: fields.keys.map((k) => k.name).join(', ') || 'none', expected: 'two column names, time first', hint: 'give `keys: [<time column>, <series column>]`',
    }));
  }
  if (fields.keys.length > 2) {
    problems.push(diagnostic('choice.too-many-keys', `a flow has one ordered key and one series key, not ${fields.keys.length} keys`, {
      path: '/keys', found: fields.keys.map((k) => k.name).join(', '), expected: 'two key columns', hint: 'sum the table over the extra key first, or write one brief per level of it',
    }));
  }
  if (fields.values.length === 0) {
    problems.push(diagnostic('choice.no-value', 'a flow needs a value: the column the layers\' thickness shows', { path: '/values', expected: 'one numeric column', hint: 'add `values:` naming a numeric column' }));
  }
  return [...problems, ...quantitativeValues(fields, 'layer thicknesses')];
}

/** The profile intent's data shape: at least two numeric values (the attributes), and at most one key (the items' names). */
export function checkProfileShape(fields: Fields, _brief: ResolvedBrief): Diagnostic[] {
  const problems: Diagnostic[] = [];
  if (fields.values.length < 2) {
    problems.push(diagnostic('choice.profile-too-few-values', `a profile compares items across several attributes; ${fields.values.length === 0 ? 'no value is' : 'one value is'} given`, {
      path: '/values', found: fields.values.map((v) => v.name).join(', ') || 'none', expected: 'two or more numeric columns', hint: 'list the attributes in `values:`, or compare one value with bars (intent: compare)',
    }));
  }
  if (fields.keys.length > 1) {
    problems.push(diagnostic('choice.too-many-keys', `a profile names its items with one key, not ${fields.keys.length}`, {
      path: '/keys', found: fields.keys.map((k) => k.name).join(', '), expected: 'at most one key column', hint: 'keep the column that names the items in `keys:`',
    }));
  }
  return [...problems, ...quantitativeValues(fields, 'axes')];
}
