import type { ResolvedBrief } from '../brief/types.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import type { Field, Fields } from '../fields/types.js';

const TWO_POINTS_HINT = 'give two value columns (`values: [before, after]`), or a key of two periods (`keys: [item, period]`)';

/** The distinct values of a field's column, as written (dates and numbers by value). */
export function distinctValues(field: Field): string[] {
  const seen = new Set<string>();
  field.column.values.forEach((v, i) => { if (v !== null) seen.add(field.column.type === 'text' ? field.column.text[i] ?? String(v) : String(v)); });
  return [...seen];
}

function keyProblems(fields: Fields): Diagnostic[] {
  if (fields.keys.length === 0) {
    return [diagnostic('choice.no-key', 'a slope chart needs a key: the column whose values name the items', { path: '/keys', expected: 'one column of item names', hint: 'add `keys: <item column>`' })];
  }
  if (fields.keys.length > 2) {
    return [diagnostic('choice.too-many-keys', `a slope chart takes an item key and at most a period key, not ${fields.keys.length} keys`, {
      path: '/keys', found: fields.keys.map((k) => k.name).join(', '), expected: 'keys: [item] or [item, period]', hint: 'sum the table over the other keys first, or write one brief per level',
    })];
  }
  return [];
}

/** Two keys (item, period): one value and an optional width value, and exactly two periods. */
function periodProblems(fields: Fields): Diagnostic[] {
  const period = fields.keys[1]!;
  const problems: Diagnostic[] = [];
  if (fields.values.length < 1 || fields.values.length > 2) {
    problems.push(diagnostic('choice.slope-shape', `with a period key, a slope chart takes one value (and a second for line width), not ${fields.values.length}`, {
      path: '/values', found: fields.values.map((v) => v.name).join(', ') || 'none', expected: 'values: [value] or [value, width]', hint: 'name the measured value in `values:`; a line width value may follow it',
    }));
  }
  const periods = distinctValues(period);
  if (periods.length !== 2) {
    problems.push(diagnostic('choice.slope-periods', `a slope chart compares two points, but \`${period.name}\` has ${periods.length} (${periods.slice(0, 4).join(', ')}${periods.length > 4 ? ', …' : ''})`, {
      path: '/keys/1', field: period.name, found: `${periods.length} periods`, expected: 'exactly two periods',
      hint: periods.length > 2 ? 'keep only the two periods to compare (e.g. the first and the last) in the table' : 'add the rows of a second period, or give two value columns (`values: [before, after]`)',
    }));
  }
  return problems;
}

/** One key: two value columns on one shared scale (before, after), and an optional width value. */
function columnProblems(fields: Fields): Diagnostic[] {
  const { values } = fields;
  if (values.length < 2 || values.length > 3) {
    return [diagnostic('choice.slope-shape', `a slope chart needs each item measured at two points, but ${values.length === 0 ? 'no value is' : `${values.length} value${values.length === 1 ? ' is' : 's are'}`} given`, {
      path: '/values', found: values.map((v) => v.name).join(', ') || 'none', expected: 'values: [before, after] (and a width value)', hint: TWO_POINTS_HINT,
    })];
  }
  const [before, after] = values as [Field, Field];
  if ((before.unit ?? '') !== (after.unit ?? '')) {
    return [diagnostic('choice.slope-units-differ', `\`${before.name}\` is in ${before.unit ?? 'no unit'} and \`${after.name}\` in ${after.unit ?? 'no unit'}: the two ends of a slope share one scale, so they must measure the same thing`, {
      path: `/fields/${after.name}/unit`, field: after.name, found: after.unit ?? 'none', expected: before.unit ?? 'none', hint: 'give both columns the same unit (convert one if they differ)',
    })];
  }
  return [];
}

/** Checks the brief's data shape against what a slope chart (intent shift) can show. */
export function checkShiftShape(fields: Fields, _brief: ResolvedBrief): Diagnostic[] {
  const keys = keyProblems(fields);
  if (keys.length) return keys;
  const problems = fields.keys.length === 2 ? periodProblems(fields) : columnProblems(fields);
  for (const value of fields.values) {
    if (value.type === 'quantitative') continue;
    problems.push(diagnostic('choice.value-not-quantitative', `the value \`${value.name}\` is ${value.type}, but a slope's ends are placed by numbers`, {
      path: '/values', field: value.name, found: value.type, expected: 'a quantitative column', hint: `set \`fields.${value.name}.type: quantitative\` if it holds numbers`,
    }));
  }
  return problems;
}
