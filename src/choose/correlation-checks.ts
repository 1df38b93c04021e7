import type { ResolvedBrief } from '../brief/types.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import type { Field, Fields } from '../fields/types.js';

/** Most point shapes a reader tells apart at a glance (common practice: about five). */
export const MAX_SHAPES = 5;

const quantitativeColumns = (fields: Fields, brief: ResolvedBrief) => fields.all.filter((f) => f.type === 'quantitative' && !brief.keys.includes(f.name)).map((f) => f.name);

function checkValues(fields: Fields, brief: ResolvedBrief): Diagnostic[] {
  if (fields.values.length !== 2) {
    const numeric = quantitativeColumns(fields, brief);
    return [diagnostic('choice.needs-two-values', `a correlation needs two values, x and y; the brief gives ${fields.values.length}`, {
      path: '/values', found: fields.values.map((v) => v.name).join(', ') || 'none', expected: 'two numeric columns: `values: [x, y]`',
      hint: fields.values.length > 2
        ? `to see every pair of the ${fields.values.length} values, use \`intent: profile\` (a scatterplot matrix); or pick two: \`values: [${fields.values[0]!.name}, ${fields.values[1]!.name}]\``
        : numeric.length >= 2 ? `use \`values: [${numeric[0]}, ${numeric[1]}]\`` : 'name two numeric columns in `values: [x, y]`',
    })];
  }
  return fields.values.filter((v) => v.type !== 'quantitative').map((v) => diagnostic('choice.value-not-quantitative', `the value \`${v.name}\` is ${v.type}, but a scatter plot places points by numbers`, {
    path: '/values', field: v.name, found: v.type, expected: 'a quantitative column', hint: `set \`fields.${v.name}.type: quantitative\` if it holds numbers, or use intent compare for categories`,
  }));
}

/** The field an option names, once the fields stage found it. */
const named = (fields: Fields, name: string | undefined): Field | undefined => (name === undefined ? undefined : fields.all.find((f) => f.name === name));

function checkCodings(fields: Fields, brief: ResolvedBrief): Diagnostic[] {
  const problems: Diagnostic[] = [];
  const area = named(fields, brief.area);
  if (area && area.type !== 'quantitative') {
    problems.push(diagnostic('choice.value-not-quantitative', `\`area: ${area.name}\` is ${area.type}, but a circle's area shows an amount`, {
      path: '/area', field: area.name, found: area.type, expected: 'a quantitative column of amounts (zero or more)', hint: `code \`${area.name}\` by \`color:\` or \`shape:\` instead`,
    }));
  }
  for (const option of ['color', 'shape'] as const) {
    const field = named(fields, brief[option]);
    if (!field || field.levels.length > 0) continue;
    problems.push(diagnostic('choice.not-categorical', `\`${option}: ${field.name}\` is ${field.type}; ${option} tells a few categories apart, not amounts`, {
      path: `/${option}`, field: field.name, found: field.type, expected: 'a categorical column', hint: `use \`area: ${field.name}\` for amounts, or set \`fields.${field.name}.type: categorical\``,
    }));
  }
  const shape = named(fields, brief.shape);
  if (shape && shape.levels.length > MAX_SHAPES) {
    problems.push(diagnostic('choice.too-many-shapes', `\`${shape.name}\` has ${shape.levels.length} levels, more than the ${MAX_SHAPES} point shapes a reader tells apart at a glance`, {
      path: '/shape', field: shape.name, found: `${shape.levels.length} levels`, expected: `at most ${MAX_SHAPES}`, hint: `code \`${shape.name}\` by \`color:\` (up to 8 levels), or show one panel per level (small multiples)`,
    }));
  }
  return problems;
}

/** Checks the brief's data shape against what the correlation intent can show: two numbers per row, and codings that fit. */
export function checkCorrelationShape(fields: Fields, brief: ResolvedBrief): Diagnostic[] {
  const problems = [...checkValues(fields, brief), ...checkCodings(fields, brief)];
  if (fields.keys.length > 1) {
    problems.push(diagnostic('choice.too-many-keys', `a scatter plot takes at most one key (the name of each point); the brief gives ${fields.keys.length}`, {
      path: '/keys', found: fields.keys.map((k) => k.name).join(', '), expected: 'one key column, or none', hint: 'keep one key, or code the other by `color:` or `shape:`',
    }));
  }
  return problems;
}
