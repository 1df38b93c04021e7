import type { Intent, ResolvedBrief } from '../brief/types.js';
import { supportedIntents } from './rules.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { isOrdered, type Field, type Fields } from '../fields/types.js';
import type { Decision, FormTraits } from './types.js';
import { article, count } from '../diagnostics/words.js';

/** Most categories that colour alone may tell apart (the default categorical palette holds 8). */
export const MAX_CATEGORICAL_COLOURS = 8;

/** What a hard rule looks at: the form's traits, the brief and the fields. */
export interface RuleContext {
  traits: FormTraits;
  /** The form's words ("bar chart"), for messages. */
  form: string;
  /** How many categorical colours the style can tell apart. Default: MAX_CATEGORICAL_COLOURS. */
  maxColours?: number;
  brief: ResolvedBrief;
  /** Undefined before the data is read (brief-only checks). */
  fields: Fields | undefined;
}

/**
 * A hard rule: never broken, only explained. `binds` says whether it applies to a form; when
 * it does, its decision is stated in the rationale; `broken` finds a brief or data that would
 * break it, and `refusal` says why, with an alternative. With `lenient`, a rule that can be kept
 * by drawing differently (`lenientFix`) warns instead of failing.
 */
export interface HardRule {
  id: string;
  binds(c: RuleContext): boolean;
  /** The decision stated when the rule binds; none where stating it would only add noise. */
  decision?(c: RuleContext): Decision;
  broken(c: RuleContext): boolean;
  refusal(c: RuleContext): Diagnostic;
  /** How the lenient render keeps the rule instead of failing, if it can. */
  lenientFix?: { message: string; hint: () => string; path: string };
  /** Whether the rule can be checked from the brief alone. */
  briefOnly: boolean;
}

const firstKey = (c: RuleContext): Field | undefined => c.fields?.keys[0];

/** An alternative worth offering only once its intent is answered: the words, or nothing (hints never offer what is not drawn). */
function offer(intent: Intent, words: string): string {
  return supportedIntents().includes(intent) ? words : '';
}

/** The most categories colour may tell apart: the style's palette, never more than MAX_CATEGORICAL_COLOURS. */
const colours = (c: RuleContext) => Math.min(MAX_CATEGORICAL_COLOURS, c.maxColours ?? MAX_CATEGORICAL_COLOURS);

/** The categorical field coloured: the `color` field, or the second key (the series of grouped or stacked forms). */
function colouredField(c: RuleContext): Field | undefined {
  const name = c.brief.color ?? c.brief.keys[1];
  return name === undefined ? undefined : c.fields?.all.find((f) => f.name === name);
}

/** A donut's parts: at least two (one part is no comparison), at most three (common practice: beyond that, angles are compared poorly). */
const MIN_WHOLE_PARTS = 2;
const MAX_WHOLE_PARTS = 3;

const fewParts = (c: RuleContext) => firstKey(c)!.levels.length >= MIN_WHOLE_PARTS && firstKey(c)!.levels.length <= MAX_WHOLE_PARTS;

/** A donut of too many (or too few) parts, refused with the normalized bar offered. */
function tooManyParts(c: RuleContext): Diagnostic {
  const n = firstKey(c)!.levels.length;
  return diagnostic('choice.donut-too-many-parts', `a donut of ${count(n, 'part')} of \`${firstKey(c)!.name}\`: angles and areas are read less accurately than aligned lengths (Cleveland & McGill 1984), so a donut is drawn only for ${MIN_WHOLE_PARTS} or ${MAX_WHOLE_PARTS} parts`, {
    path: '/form', field: firstKey(c)!.name, found: count(n, 'part'), expected: `${MIN_WHOLE_PARTS} or ${MAX_WHOLE_PARTS} parts`,
    hint: 'remove `form: donut` to draw the shares as bars on a percent axis (form: normalized-bar)',
  });
}

/** The hard rules, in the order they are checked and stated. */
export const HARD_RULES: readonly HardRule[] = [
  {
    id: 'zero-baseline',
    briefOnly: true,
    binds: (c) => c.traits.lengthCoded,
    decision: () => ({ decision: 'the value axis starts at zero', rule: 'hard rule: length-coded marks start at zero; a bar read from a cut axis exaggerates differences (Correll, Bertini & Franconeri, CHI 2020)' }),
    broken: (c) => c.brief.baseline === 'fit',
    refusal: (c) => diagnostic('choice.baseline-fit-refused', `\`baseline: fit\` is refused for ${article(c.form)}: its marks encode values by their length, so an axis that does not start at zero makes small differences look large`, {
      path: '/baseline', found: 'fit', expected: 'zero', hint: `remove \`baseline: fit\`${offer('trend', '; to show change over time from a non-zero base, use a line (intent: trend)')}`,
    }),
    lenientFix: { message: '`baseline: fit` was not honoured: length-coded marks encode values by their length, so they are drawn from zero instead', hint: () => `remove \`baseline: fit\`${offer('trend', ', or use intent trend for a line that may leave zero out')}`, path: '/baseline' },
  },
  {
    id: 'ordered-key-for-lines',
    briefOnly: false,
    binds: (c) => c.traits.connectsKey,
    decision: (c) => ({ decision: `points connected in the order of \`${firstKey(c)?.name ?? 'the key'}\``, rule: 'hard rule: a line implies an order between neighbouring keys, so only an ordered key (time, numbers, declared levels) is connected' }),
    broken: (c) => firstKey(c) !== undefined && !isOrdered(firstKey(c)!.type),
    refusal: (c) => diagnostic('choice.line-on-categorical', `the key \`${firstKey(c)!.name}\` is categorical, and a line across categories implies an order they do not have`, {
      path: '/keys', field: firstKey(c)!.name, found: 'categorical', expected: 'a temporal, numeric or ordinal key', hint: `compare the categories with bars (intent: compare), or declare an order with \`fields.${firstKey(c)!.name}.order\``,
    }),
  },
  {
    // One documented exception: a form whose radial marks are the parts of one whole (a donut)
    // may be drawn for 2 or 3 parts, which it reaches only when the brief pins it (the rule
    // table never chooses it). More parts are refused whatever the key's type.
    id: 'radial-only-for-cycles',
    briefOnly: false,
    binds: (c) => c.traits.radial,
    decision: (c) => (c.traits.partsOfWhole
      ? { decision: 'laid out around a circle: the parts of one whole', rule: `hard rule: a radial layout is used only for a cyclic key, except a donut the brief pins with ${MIN_WHOLE_PARTS} or ${MAX_WHOLE_PARTS} parts, whose few large angles are read well enough` }
      : { decision: 'laid out around a circle', rule: 'hard rule: a radial layout is used only for a cyclic key, whose last value is next to its first' }),
        // With other than one key the parts are not the key's levels: the donut's plan refuses that brief.
    broken: (c) => (c.traits.partsOfWhole ? c.fields?.keys.length === 1 && !fewParts(c) : firstKey(c) !== undefined && firstKey(c)!.type !== 'cyclic'),
    refusal: (c) => (c.traits.partsOfWhole ? tooManyParts(c) : diagnostic('choice.radial-not-cyclic', `the key \`${firstKey(c)!.name}\` is ${firstKey(c)!.type}, not cyclic, so a radial layout would join its ends that are not neighbours`, {
      path: '/form', field: firstKey(c)!.name, found: firstKey(c)!.type, expected: 'a cyclic key (months, weekdays, hours, directions)', hint: 'use the linear form (bars in key order), or declare the key `type: cyclic` if it really wraps around',
    })),
  },
  {
    id: 'one-value-per-axis',
    briefOnly: false,
    binds: (c) => !c.traits.axisPerValue,
    broken: (c) => (c.fields?.values.length ?? 0) > (c.traits.sharedAxisValues ?? 1),
    refusal: (c) => diagnostic('choice.too-many-values', `${c.fields!.values.length} values on one value axis: a chart shows one value per axis`, {
      path: '/values', found: c.fields!.values.map((v) => v.name).join(', '), expected: 'one value column',
      hint: `write one brief per value and show them as aligned panels${offer('change', ', or index them to a common base (intent: change)')}`,
    }),
  },
  {
    id: 'distinguishable-colours',
    briefOnly: false,
    binds: (c) => c.traits.coloursCategories && colouredField(c) !== undefined,
    decision: (c) => {
      const [n, name, k] = [colouredField(c)!.levels.length, colouredField(c)!.name, colours(c)];
      const rule = `hard rule: at most ${k} categorical colours, the most the style's palette keeps distinct for every reader`;
      if (c.traits.foldsColours && n > k) return { decision: `colour tells the ${k} largest levels of \`${name}\` apart; the other ${n - k} share one neutral "Other"`, rule };
      return { decision: `colour tells the ${n} levels of \`${name}\` apart`, rule };
    },
    // A form that folds the smallest categories into one neutral "Other" keeps the rule by folding.
    broken: (c) => !c.traits.foldsColours && colouredField(c)!.levels.length > colours(c),
    refusal: (c) => diagnostic('choice.too-many-colours', `\`${colouredField(c)!.name}\` has ${colouredField(c)!.levels.length} levels, more than the ${colours(c)} colours a reader can tell apart`, {
      field: colouredField(c)!.name, found: `${colouredField(c)!.levels.length} levels`, expected: `at most ${colours(c)}`, hint: 'show one panel per level (small multiples), or combine the smallest levels before charting',
    }),
  },
];

/**
 * Checks a form against every hard rule that binds it: the decisions to state, and a refusal
 * for each rule broken (a warning and the fix instead, with `lenient`, where the rule has one).
 */
export function applyHardRules(c: RuleContext, lenient: boolean, only?: (rule: HardRule) => boolean): { problems: Diagnostic[]; decisions: Decision[] } {
  const problems: Diagnostic[] = [];
  const decisions: Decision[] = [];
  for (const rule of HARD_RULES) {
    if ((only && !only(rule)) || !rule.binds(c)) continue;
    if (rule.decision) decisions.push(rule.decision(c));
    if (!rule.broken(c)) continue;
    if (lenient && rule.lenientFix) {
      const fix = rule.lenientFix;
      problems.push(diagnostic('choice.lenient-fallback', fix.message, { path: fix.path, hint: fix.hint() }));
    } else problems.push(rule.refusal(c));
  }
  return { problems, decisions };
}
