import type { ResolvedBrief } from '../brief/types.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import type { Fields } from '../fields/types.js';
import type { Decision } from './types.js';

/** The intents whose rules are written; the rest answer with `choice.intent-not-supported`. */
export const SUPPORTED_INTENTS = ['compare'] as const;

/** The forms that can be drawn today. */
export const SUPPORTED_FORMS = ['bar'] as const;

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
  if (fields.values.length > 1) {
    problems.push(diagnostic('choice.too-many-values', `${fields.values.length} values on one value axis: a chart shows one value per axis`, {
      path: '/values', found: fields.values.map((v) => v.name).join(', '), expected: 'one value column',
      hint: 'write one brief per value and show them as aligned panels, or index them to a common base (intent: change)',
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

/**
 * The hard rule on baselines: bars encode values by length, so their axis starts at zero. A
 * brief asking for `baseline: fit` is refused, or with `lenient` drawn at zero with a warning.
 */
export function checkBaseline(brief: ResolvedBrief, lenient: boolean): { problems: Diagnostic[]; decision: Decision } {
  const decision: Decision = {
    decision: 'the value axis starts at zero',
    rule: 'hard rule: length-coded marks start at zero; a bar read from a cut axis exaggerates differences (Correll, Bertini & Franconeri, CHI 2020)',
  };
  if (brief.baseline !== 'fit') return { problems: [], decision };
  const refusal = 'bars encode values by their length, so a bar axis that does not start at zero makes small differences look large';
  if (lenient) {
    return { problems: [diagnostic('choice.lenient-fallback', `\`baseline: fit\` was not honoured: ${refusal}; drawn from zero instead`, { path: '/baseline', found: 'fit', expected: 'zero', hint: 'remove `baseline: fit`, or use intent trend for a line that may leave zero out' })], decision };
  }
  return {
    problems: [diagnostic('choice.baseline-fit-refused', `\`baseline: fit\` is refused for bars: ${refusal}`, {
      path: '/baseline', found: 'fit', expected: 'zero', hint: 'remove `baseline: fit`; to show change over time from a non-zero base, use a line (intent: trend or change)',
    })],
    decision,
  };
}

/** A pinned form must be one chartwright can draw, and one that suits the intent. */
export function checkPinnedForm(brief: ResolvedBrief): Diagnostic[] {
  if (brief.form === undefined || (SUPPORTED_FORMS as readonly string[]).includes(brief.form)) return [];
  return [diagnostic('choice.form-not-supported', `the form \`${brief.form}\` is not drawn yet`, {
    path: '/form', found: brief.form, expected: SUPPORTED_FORMS.join(', '), hint: 'remove `form:` to let the rules choose, or pin `form: bar`',
  })];
}

/**
 * The rules that need only the brief: a supported intent, a drawable pinned form, an honest
 * baseline. Run before the data is read too, so one `check` reports them with data problems.
 */
export function checkBriefRules(brief: ResolvedBrief, lenient: boolean): { problems: Diagnostic[]; baseline: Decision } {
  const baseline = checkBaseline(brief, lenient);
  if (!(SUPPORTED_INTENTS as readonly string[]).includes(brief.intent)) {
    const problems = [diagnostic('choice.intent-not-supported', `the intent \`${brief.intent}\` is not supported yet`, {
      path: '/intent', found: brief.intent, expected: SUPPORTED_INTENTS.join(', '), hint: 'use `intent: compare` for bars of one value per key',
    })];
    return { problems, baseline: baseline.decision };
  }
  return { problems: [...checkPinnedForm(brief), ...baseline.problems], baseline: baseline.decision };
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
