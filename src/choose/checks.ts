import type { Intent, ResolvedBrief } from '../brief/types.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import type { Fields } from '../fields/types.js';
import { applyHardRules } from './hard-rules.js';
import { partsShapeChecks } from './parts-checks.js';
import { checkDistributionShape } from './distribution-checks.js';
import { checkFlowShape, checkProfileShape } from './multi-checks.js';
import { checkMatrixShape } from './matrix-checks.js';
import { formsForIntent, RULES } from './rules.js';
import { checkTrendShape } from './trend-checks.js';
import { checkScheduleShape } from './schedule-checks.js';
import { checkShiftShape } from './shift-checks.js';
import type { Candidate } from './types.js';
import { checkCorrelationShape } from './correlation-checks.js';

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
  if (fields.keys.length > 2) {
    problems.push(diagnostic('choice.too-many-keys', `compare with ${fields.keys.length} keys is not drawn: bars take one key, grouped bars two`, {
      path: '/keys', found: fields.keys.map((k) => k.name).join(', '), expected: 'one or two key columns',
      hint: 'sum the table over the extra keys first, or show one panel per level of one of them with `facet:`',
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
        hint: `set \`fields.${value.name}.type: quantitative\` to read it as numbers: the cells that are not numbers are then named by line (61.2%, 1,212, $640 and 1 050 all read as numbers)`,
      }));
    }
  }
  return problems;
}

/** The data-shape check of each intent that has rules. */
export const SHAPE_CHECKS: Partial<Record<Intent, (fields: Fields, brief: ResolvedBrief) => Diagnostic[]>> = {
  compare: checkCompareShape,
  trend: checkTrendShape,
  change: checkTrendShape,
  shift: checkShiftShape,
  schedule: checkScheduleShape,
  correlation: checkCorrelationShape,
  ...partsShapeChecks(checkCompareShape),
  distribution: checkDistributionShape,
  cycle: checkCompareShape,
  flow: checkFlowShape,
  profile: checkProfileShape,
  matrix: checkMatrixShape,
};

/** Brief options that belong to some intents only, and the intents that use them. */
export const INTENT_OPTIONS = {
  index: ['change'],
  start: ['schedule'],
  end: ['schedule'],
  color: ['correlation', 'profile'],
  shape: ['correlation'],
  area: ['correlation'],
  after: ['schedule'],
  fit: ['correlation'],
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
  if (value?.unit === '%') return checkPercentOfFractions(value);
  if (!value || value.unit || /[([].+[)\]]/.test(`${value.name} ${value.label}`) || isPercentFormat(value.format)) return [];
  return [diagnostic('choice.unit-missing', `the value \`${value.name}\` has no unit, so its axis title cannot say what is counted or measured`, {
    path: `/fields/${value.name}/unit`, field: value.name, expected: 'a unit such as "crossings per day", "€" or "%"',
    hint: `add \`fields: { ${value.name}: { unit: … } }\``,
  })];
}

/** True for a d3-format specifier that writes numbers as percentages (its numbers are fractions, the unit is in the labels). */
function isPercentFormat(format: string | undefined): boolean {
  return format !== undefined && /[%p]$/.test(format);
}

/**
 * A value in % whose numbers all lie within 0–1 (and are not all 0 or 1) is most likely a
 * fraction: 0.34 labelled under "(%)" reads as a third of a percent. Warned, with the two fixes.
 */
function checkPercentOfFractions(value: Fields['values'][number]): Diagnostic[] {
  const numbers = value.column.values.filter((v): v is number => typeof v === 'number');
  if (isPercentFormat(value.format) || numbers.length === 0 || numbers.some((v) => v < 0 || v > 1) || numbers.every((v) => v === 0 || v === 1)) return [];
  return [diagnostic('choice.percent-of-fractions', `the value \`${value.name}\` has unit % but every number lies between 0 and 1 (e.g. ${numbers.find((v) => v > 0 && v < 1)}), so it is probably a fraction and would be labelled as under one percent`, {
    path: `/fields/${value.name}/unit`, field: value.name, found: 'numbers between 0 and 1', expected: 'percentages from 0 to 100',
    hint: `write it as a percentage with \`fields: { ${value.name}: { format: ".0%" } }\` and remove \`unit: "%"\`, or multiply the column by 100`,
  })];
}

/**
 * A pinned form answers the brief's intent only if a rule row leads that intent to it: a scatter
 * plot pinned under `intent: compare` would be asked for data of another shape. Refused with the
 * intents the form answers and the forms the intent offers; checked after the hard rules, whose
 * refusals (a radial form on a key that is not cyclic) say more.
 */
export function checkPinnedForm(brief: ResolvedBrief): Diagnostic[] {
  if (brief.form === undefined || formsForIntent(brief.intent).includes(brief.form)) return [];
  const intents = RULES.filter((r) => r.form === brief.form).map((r) => r.intent).filter((i, n, all) => all.indexOf(i) === n);
  const offered = formsForIntent(brief.intent);
  return [diagnostic('choice.form-not-for-intent', `the form ${brief.form} does not answer intent ${brief.intent}${intents.length ? `: it answers ${intents.join(' or ')}` : ''}`, {
    path: '/form', found: brief.form, expected: offered.join(', '),
    hint: intents.length ? `use \`intent: ${intents[0]}\`, or pin one of the forms of intent ${brief.intent}: ${offered.join(', ')}` : `pin one of the forms of intent ${brief.intent}: ${offered.join(', ')}`,
  })];
}

/**
 * The rules that need only the brief: intent options, and the hard rules every form the brief may
 * get would break (a pinned form, or every form the intent's rules lead to). Run before the data
 * is read too, so one `check` reports them with data problems.
 */
export function checkBriefRules(brief: ResolvedBrief, candidates: readonly Candidate[], lenient: boolean): { problems: Diagnostic[] } {
  const names = brief.form ? [brief.form] : formsForIntent(brief.intent, brief);
  const forms = candidates.filter((c) => names.includes(c.name));
  const checked = forms.map((f) => applyHardRules({ traits: f.traits, form: f.noun, brief, fields: undefined }, lenient, (r) => r.briefOnly));
  // A brief-only rule is refused early only when every form the brief may get breaks it.
  const shared = checked.length ? checked[0]!.problems.filter((p) => checked.every((c) => c.problems.some((q) => q.code === p.code))) : [];
  return { problems: [...checkIntentOptions(brief), ...shared] };
}
