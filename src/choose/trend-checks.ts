import type { ResolvedBrief } from '../brief/types.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import type { Fields } from '../fields/types.js';
import { article } from '../diagnostics/words.js';

/**
 * Checks the brief's data shape against what a trend (or change) can show: one ordered key
 * along x, optionally a second key naming the series, and one numeric value (or a count).
 * Whether the key is ordered is the hard rule `ordered-key-for-lines`, checked with the form.
 */
export function checkTrendShape(fields: Fields, brief: ResolvedBrief): Diagnostic[] {
  const problems: Diagnostic[] = [];
  if (fields.keys.length === 0) {
    const candidate = fields.all.find((f) => f.type === 'temporal' || f.type === 'ordinal')?.name;
    problems.push(diagnostic('choice.no-key', `${article(brief.intent)} needs a key: the ordered column (time, numbers or ordered levels) along which the value changes`, {
      path: '/keys', expected: 'one column name, and optionally a second naming the series', hint: candidate ? `add \`keys: ${candidate}\`` : 'add `keys:` naming a date column',
    }));
  }
  if (fields.keys.length > 2) {
    problems.push(diagnostic('choice.too-many-keys', `${article(brief.intent)} takes at most two keys (the ordered key and the series), not ${fields.keys.length}`, {
      path: '/keys', found: fields.keys.map((k) => k.name).join(', '), expected: 'one or two key columns', hint: 'keep the ordered key and one series key, e.g. `keys: [week, route]`',
    }));
  }
  if (fields.values.length === 0 && brief.aggregate !== 'count') {
    const numeric = fields.all.filter((f) => f.type === 'quantitative' && !brief.keys.includes(f.name)).map((f) => f.name);
    problems.push(diagnostic('choice.no-value', `${article(brief.intent)} needs a value: the column whose change the line shows`, {
      path: '/values', expected: 'one numeric column', hint: numeric.length ? `add \`values: ${numeric[0]}\`` : 'add `values:`, or `aggregate: count` to count rows',
    }));
  }
  for (const value of fields.values) {
    if (value.type === 'quantitative') continue;
    problems.push(diagnostic('choice.value-not-quantitative', `the value \`${value.name}\` is ${value.type}, but a line's height needs numbers`, {
      path: '/values', field: value.name, found: value.type, expected: 'a quantitative column', hint: `set \`fields.${value.name}.type: quantitative\` if it holds numbers, or \`aggregate: count\` to count rows`,
    }));
  }
  return problems;
}
