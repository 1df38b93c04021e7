import type { ResolvedBrief } from '../brief/types.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import type { Fields } from '../fields/types.js';

/** Checks the brief's data shape against what the matrix intent can show: two keys (rows, columns) and one numeric value. */
export function checkMatrixShape(fields: Fields, _brief: ResolvedBrief): Diagnostic[] {
  const problems: Diagnostic[] = [];
  if (fields.keys.length !== 2) {
    const others = fields.all.filter((f) => f.role !== 'value' && f.type !== 'quantitative' && !fields.keys.includes(f)).map((f) => f.name);
    problems.push(diagnostic('choice.matrix-needs-two-keys', `a matrix needs two keys, one for its rows and one for its columns; the brief gives ${fields.keys.length}`, {
      path: '/keys', found: fields.keys.map((k) => k.name).join(', ') || 'none', expected: 'two key columns: rows, then columns',
      hint: fields.keys.length < 2 && others.length ? `add the column key: \`keys: [${[...fields.keys.map((k) => k.name), others[0]].join(', ')}]\`` : 'name two key columns, rows first: `keys: [row, column]`',
    }));
  }
  if (fields.values.length === 0) {
    problems.push(diagnostic('choice.no-value', 'a matrix needs a value: the column its cells are coloured by', { path: '/values', expected: 'one numeric column', hint: 'add `values:` naming a numeric column' }));
  }
  for (const value of fields.values) {
    if (value.type !== 'quantitative') {
      problems.push(diagnostic('choice.value-not-quantitative', `the value \`${value.name}\` is ${value.type}, but cell colours need numbers`, {
        path: '/values', field: value.name, found: value.type, expected: 'a quantitative column', hint: `set \`fields.${value.name}.type: quantitative\` if it holds numbers`,
      }));
    }
  }
  return problems;
}
