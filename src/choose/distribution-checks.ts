import type { ResolvedBrief } from '../brief/types.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import type { Field, Fields } from '../fields/types.js';

/** Most points per group drawn as a strip of dots; beyond it, boxes (common practice: a few hundred dots still read as a strip). */
export const MAX_STRIP_POINTS = 300;

/** Most groups drawn as rows before a warning (common practice: beyond about 40 rows, labels thin out and groups cannot be compared one by one). */
export const MANY_GROUPS = 40;

/** The number of usable values in the largest group of a distribution by its (single) key; all values without a key. */
export function largestGroup(fields: Fields): number {
  const value = fields.values[0];
  if (!value) return 0;
  const key = fields.keys[0];
  const counts = new Map<string, number>();
  let most = 0;
  for (let i = 0; i < value.column.values.length; i++) {
    if (typeof value.column.values[i] !== 'number') continue;
    const label = key ? key.column.text[i] : '';
    if (label === null || label === undefined || label === '') continue;
    const n = (counts.get(label) ?? 0) + 1;
    counts.set(label, n);
    if (n > most) most = n;
  }
  return most;
}

function groupKeyProblem(key: Field): Diagnostic | undefined {
  if (key.type === 'categorical' || key.type === 'ordinal' || key.type === 'cyclic') return undefined;
  return diagnostic('choice.group-key-not-categorical', `the key \`${key.name}\` is ${key.type}; a distribution by group needs groups (categories or levels)`, {
    path: '/keys', field: key.name, found: key.type, expected: 'a categorical or ordinal key',
    hint: `declare \`fields.${key.name}.type: ordinal\` (or categorical) to treat its values as groups, or remove \`keys:\` for one histogram`,
  });
}

/** The group key's problems: more than one, not groups, or too many groups. */
function keyProblems(fields: Fields): Diagnostic[] {
  const problems: Diagnostic[] = [];
  if (fields.keys.length > 1) {
    problems.push(diagnostic('choice.too-many-keys', `a distribution is split by at most one group key, not ${fields.keys.length}`, {
      path: '/keys', found: fields.keys.map((k) => k.name).join(', '), expected: 'none (one histogram) or one group column',
      hint: 'keep one group key, or write one brief per level of the other key',
    }));
  }
  const keyProblem = fields.keys[0] && groupKeyProblem(fields.keys[0]);
  if (keyProblem) problems.push(keyProblem);
  const levels = fields.keys[0]?.levels.length ?? 0;
  if (!keyProblem && levels > MANY_GROUPS) {
    problems.push(diagnostic('choice.many-groups', `\`${fields.keys[0]!.name}\` has ${levels} groups, too many rows to label and compare one by one (more than ${MANY_GROUPS})`, {
      path: '/keys', field: fields.keys[0]!.name, found: `${levels} groups`, expected: `at most ${MANY_GROUPS}`,
      hint: 'combine the smallest groups before charting, or write one brief per subset of groups',
    }));
  }
  return problems;
}

/** Options the distribution forms have no use for, and a pinned form the keys do not fit. */
function formProblems(fields: Fields, brief: ResolvedBrief): Diagnostic[] {
  const problems: Diagnostic[] = [];
  if (brief.aggregate !== 'sum') {
    problems.push(diagnostic('brief.option-not-used', `\`aggregate: ${brief.aggregate}\` is not used by intent distribution: every row is drawn (or counted into a bin) as it is`, {
      path: '/aggregate', found: brief.aggregate, expected: 'no aggregate', hint: 'remove `aggregate:`, or use `intent: compare` to combine rows per key',
    }));
  }
  if (brief.form === 'histogram' && fields.keys.length > 0) {
    problems.push(diagnostic('choice.histogram-with-groups', `one histogram shows one distribution, but \`keys: ${fields.keys[0]!.name}\` splits the values into groups`, {
      path: '/form', found: 'histogram', expected: 'strip or box with a group key',
      hint: 'remove `form: histogram` to draw strips or boxes by group, or remove `keys:` for one histogram of all values',
    }));
  }
  if ((brief.form === 'strip' || brief.form === 'box') && fields.keys.length === 0) {
    problems.push(diagnostic('choice.no-group-key', `\`form: ${brief.form}\` draws one ${brief.form === 'box' ? 'box' : 'strip'} per group, and the brief names no group key`, {
      path: '/keys', expected: 'one categorical column', hint: 'add `keys:` naming the column of groups, or remove `form:` for a histogram of all values',
    }));
  }
  return problems;
}

/** Checks the brief's data shape against what the distribution intent can show: one quantitative value, at most one group key. */
export function checkDistributionShape(fields: Fields, brief: ResolvedBrief): Diagnostic[] {
  const problems: Diagnostic[] = [];
  if (fields.values.length === 0) {
    const numeric = fields.all.filter((f) => f.type === 'quantitative' && !brief.keys.includes(f.name)).map((f) => f.name);
    problems.push(diagnostic('choice.no-value', 'a distribution needs a value: the numeric column whose spread is shown', {
      path: '/values', expected: 'one numeric column', hint: numeric.length ? `add \`values: ${numeric[0]}\`` : 'add `values:` naming a numeric column',
    }));
  }
  for (const value of fields.values) {
    if (value.type === 'quantitative') continue;
    problems.push(diagnostic('choice.value-not-quantitative', `the value \`${value.name}\` is ${value.type}, but a distribution is drawn along a number scale`, {
      path: '/values', field: value.name, found: value.type, expected: 'a quantitative column',
      hint: `set \`fields.${value.name}.type: quantitative\` if it holds numbers (cells that are not numbers are then named by row), or choose a numeric column for \`values:\``,
    }));
  }
  return [...problems, ...keyProblems(fields), ...formProblems(fields, brief)];
}
