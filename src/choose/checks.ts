import type { Intent, ResolvedBrief } from '../brief/types.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import type { Fields } from '../fields/types.js';
import { applyHardRules } from './hard-rules.js';
import { checkMatrixShape } from './matrix-checks.js';
import { formsForIntent } from './rules.js';
import type { Candidate } from './types.js';

function columnsOfType(fields: Fields, types: string[]): string[] {
  return fields.all.filter((f) => types.includes(f.type)).map((f) => f.name);
}

/** Checks the brief's data shape against what the compare intent can show. */
export function checkCompareShape(fields: Fields, brief: ResolvedBrief): Diagnostic[] {
  const problems: Diagnostic[] = [];
  if (fields.keys.length === 0) {
    const candidates = columnsOfType(fields, ['categorical', 'ordinal', 'cyclic', 'temporal']);
    problems.push(diagnostic('choice.no-key', 'a comparison needs a key: the column whose values name the bars', {
      path: '/keys', expected: 'one column name', hint: candidates.length ? `add \`keys: ${candidates[0]}\`` : 'add `keys:` naming a column of labels',
    }));
  }
  if (fields.keys.length > 1) {
    problems.push(diagnostic('choice.too-many-keys', `compare with ${fields.keys.length} keys (grouped bars or a heat map) is not supported yet`, {
      path: '/keys', found: fields.keys.map((k) => k.name).join(', '), expected: 'one key column',
      hint: 'chart one key per brief for now, or sum the table over the other key first',
    }));
  }
  if (fields.values.length === 0 && brief.aggregate !== 'count') {
    const numeric = columnsOfType(fields, ['quantitative']).filter((n) => !brief.keys.includes(n));
    problems.push(diagnostic('choice.no-value', 'a comparison needs a value: the column the bar lengths show', {
      path: '/values', expected: 'one numeric column', hint: numeric.length ? `add \`values: ${numeric[0]}\`, or \`aggregate: count\` to count rows` : 'add `values:`, or `aggregate: count` to count rows',
    }));
  }
  for (const value of fields.values) {
    if (value.type !== 'quantitative') {
      problems.push(diagnostic('choice.value-not-quantitative', `the value \`${value.name}\` is ${value.type}, but bar lengths need numbers`, {
        path: '/values', field: value.name, found: value.type, expected: 'a quantitative column',
        hint: `use \`aggregate: count\` to count rows per key, or set \`fields.${value.name}.type: quantitative\` if it holds numbers`,
      }));
    }
  }
  return problems;
}

/** The data-shape check of each intent that has rules. */
export const SHAPE_CHECKS: Partial<Record<Intent, (fields: Fields, brief: ResolvedBrief) => Diagnostic[]>> = {
  compare: checkCompareShape,
  matrix: checkMatrixShape,
};

/** Brief options that belong to some intents only, and the intents that use them. */
export const INTENT_OPTIONS = {
  index: ['change'],
  start: ['schedule'],
  end: ['schedule'],
  color: ['correlation'],
  shape: ['correlation'],
  area: ['correlation'],
  linkage: ['matrix'],
  distance: ['matrix'],
  standardize: ['matrix'],
} as const satisfies Partial<Record<keyof ResolvedBrief, readonly Intent[]>>;

/** An intent-specific option given to an intent that does not use it is refused, not silently dropped. */
export function checkIntentOptions(brief: ResolvedBrief): Diagnostic[] {
  return Object.entries(INTENT_OPTIONS).flatMap(([option, intents]) => {
    if (brief[option as keyof typeof INTENT_OPTIONS] === undefined || (intents as readonly Intent[]).includes(brief.intent)) return [];
    return [diagnostic('brief.option-not-used', `\`${option}\` is not used by intent ${brief.intent}: it belongs to intent ${intents.join(' or ')}`, {
      path: `/${option}`, found: option, expected: `an option of intent ${brief.intent}`, hint: `remove \`${option}:\`, or use \`intent: ${intents[0]}\``,
    })];
  });
}

/**
 * The hard rule that every axis title carries its unit: a value with no `unit` hint, and no
 * unit in brackets in its name or label, is warned about (counts of rows need none).
 */
export function checkValueUnit(fields: Fields): Diagnostic[] {
  const value = fields.values[0];
  if (!value || value.unit || /[([].+[)\]]/.test(`${value.name} ${value.label}`)) return [];
  return [diagnostic('choice.unit-missing', `the value \`${value.name}\` has no unit, so its axis title cannot say what is counted or measured`, {
    path: `/fields/${value.name}/unit`, field: value.name, expected: 'a unit such as "crossings per day", "€" or "%"',
    hint: `add \`fields: { ${value.name}: { unit: … } }\``,
  })];
}

/**
 * The rules that need only the brief: intent options, and the hard rules every form the brief may
 * get would break (a pinned form, or every form the intent's rules lead to). Run before the data
 * is read too, so one `check` reports them with data problems.
 */
export function checkBriefRules(brief: ResolvedBrief, candidates: readonly Candidate[], lenient: boolean): { problems: Diagnostic[] } {
  const names = brief.form ? [brief.form] : formsForIntent(brief.intent);
  const forms = candidates.filter((c) => names.includes(c.name));
  const checked = forms.map((f) => applyHardRules({ traits: f.traits, form: f.noun, brief, fields: undefined }, lenient, (r) => r.briefOnly));
  // A brief-only rule is refused early only when every form the brief may get breaks it.
  const shared = checked.length ? checked[0]!.problems.filter((p) => checked.every((c) => c.problems.some((q) => q.code === p.code))) : [];
  return { problems: [...checkIntentOptions(brief), ...shared] };
}
