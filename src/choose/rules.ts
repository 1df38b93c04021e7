import type { FormName, Intent, ResolvedBrief } from '../brief/types.js';
import type { Fields } from '../fields/types.js';
import { isOrdered } from '../fields/types.js';
import { largestGroup, MAX_STRIP_POINTS } from './distribution-checks.js';

/** One row of the rule table: when it applies, the form it leads to, and why. */
export interface Rule {
  id: string;
  intent: Intent;
  form: FormName;
  applies(fields: Fields): boolean;
  /** What the rule asks of the brief beyond intent and data shape, if anything. Default: nothing. */
  when?(brief: ResolvedBrief): boolean;
  /** The reason, as a reader would accept it. */
  why: string;
  /** Whether a brief could match this row, judged from the brief alone (before the data is read). Default: always. */
  briefMay?(brief: ResolvedBrief): boolean;
}

/** Whether the brief marks one of its values `zero: arbitrary`, or gives two values: what may lead compare to dots. */
const mayBeDots = (b: ResolvedBrief) => b.values.length === 2 || b.values.some((v) => Object.hasOwn(b.fields, v) && b.fields[v]!.zero === 'arbitrary');
/** Items beyond which bars cannot show them all (they would fold): a dense pixel layout shows every one (common practice; the design's figure). */
export const DENSE_ITEMS = 10_000;

/** How many items a compare or distribution brief has: the key's levels, or the value's rows without a key (or with a key that is not categorical). */
function itemCount(f: Fields): number {
  const key = f.keys[0];
  return key && key.levels.length ? key.levels.length : (key ?? f.values[0])?.column.values.length ?? 0;
}

const manyItems = (f: Fields) => itemCount(f) >= DENSE_ITEMS;

/**
 * The rule table, as data: the first rule whose intent and data shape match chooses the form.
 * Adding a form means adding a row here, one file in src/forms/ and its registry line.
 */
export const RULES: readonly Rule[] = [
  {
    id: 'compare.arbitrary-zero',
    intent: 'compare',
    form: 'dot',
    applies: (f) => f.keys.length === 1 && f.values.length >= 1 && f.values.length <= 2 && f.values.some((v) => v.zero === 'arbitrary'),
    briefMay: mayBeDots,
    why: 'the value\'s zero is arbitrary (`zero: arbitrary`), so a bar\'s length from zero would mean nothing: dots on an aligned scale compare positions, which need no zero (Cleveland 1985)',
  },
  {
    id: 'compare.paired-values',
    intent: 'compare',
    form: 'dot',
    applies: (f) => f.keys.length === 1 && f.values.length === 2,
    briefMay: mayBeDots,
    why: 'two values of one measure per key (e.g. before and after): a dumbbell joins each key\'s two dots on one aligned scale, so both the values and their difference are read by position (Cleveland 1985)',
  },
  {
    id: 'compare.categorical-key',
    intent: 'compare',
    form: 'bar',
    applies: (f) => f.keys.length === 1 && !isOrdered(f.keys[0]!.type) && !manyItems(f),
    why: 'one categorical key and one value: bars compare values by length from a common baseline, read more accurately than angles, areas or colour (Cleveland & McGill 1984)',
  },
  {
    id: 'compare.ordered-key',
    intent: 'compare',
    form: 'bar',
    applies: (f) => f.keys.length === 1 && isOrdered(f.keys[0]!.type) && !manyItems(f),
    why: 'one ordered key and one value: bars in key order, because the order of the key carries meaning',
  },
  {
    id: 'trend.line',
    intent: 'trend',
    form: 'line',
    applies: (f) => f.keys.length >= 1 && f.keys.length <= 2,
    why: 'a value over an ordered key (and optionally a series key): a line joins neighbouring keys so the eye follows the change, its slope read as the rate (Cleveland 1993, banking to 45°)',
  },
  {
    id: 'change.period-over-period',
    intent: 'change',
    form: 'change-bar',
    applies: (f) => f.keys.length >= 1 && f.keys.length <= 2,
    when: (b) => b.index?.base === 'previous',
    why: 'change from each period to the next (`index.base: previous`): bars around zero, because each change is a length from no change',
  },
  {
    id: 'change.index-line',
    intent: 'change',
    form: 'index-line',
    applies: (f) => f.keys.length >= 1 && f.keys.length <= 2,
    why: 'change over an ordered key: each line divided by its value at a common base, so series of different sizes show their growth on one scale',
  },
  {
    id: 'shift.two-points',
    intent: 'shift',
    form: 'slope',
    applies: (f) => f.keys.length >= 1,
    why: 'items measured at two points: a slope chart puts both ends on one shared scale, so each line\'s slope is the item\'s change and every change is compared at a glance',
  },
  {
    id: 'schedule.tasks',
    intent: 'schedule',
    form: 'gantt',
    applies: (f) => f.keys.length >= 1,
    why: 'tasks with a start and an end: a Gantt chart draws each as a bar on one time axis, so durations, order and overlaps are seen together',
  },
  {
    id: 'correlation.two-values',
    intent: 'correlation',
    form: 'scatter',
    applies: (f) => f.values.length === 2,
    why: 'two quantitative values: a scatter plot puts each row at its x and y positions, the most accurately read encoding for how two values go together (Cleveland & McGill 1984)',
  },
  {
    id: 'composition.group-and-part',
    intent: 'composition',
    form: 'stacked-bar',
    applies: (f) => f.keys.length === 2,
    why: 'two keys (group, part) and one value: one bar per group, its parts stacked; the totals and the baseline segment are the precise readings, the upper segments float',
  },
  {
    id: 'part-to-whole.group-and-part',
    intent: 'part-to-whole',
    form: 'normalized-bar',
    applies: (f) => f.keys.length === 2,
    why: 'two keys (group, part) and one value: each group as one bar of 100 %, so the shares of its parts compare across groups of any size',
  },
  {
    id: 'part-to-whole.one-key',
    intent: 'part-to-whole',
    form: 'normalized-bar',
    applies: (f) => f.keys.length === 1,
    why: 'one key and one value: each key\'s share of the whole as a bar on a percent axis; aligned lengths are read more accurately than the angles and areas of a pie (Cleveland & McGill 1984)',
  },
  {
    // After the one-key row, so it is reached only when the brief pins `form: donut`.
    id: 'part-to-whole.pinned-donut',
    intent: 'part-to-whole',
    form: 'donut',
    applies: (f) => f.keys.length === 1,
    why: 'the brief pins a donut: drawn for 2 or 3 parts only, whose few large angles are read well enough',
  },
  {
    id: 'distribution.one-value',
    intent: 'distribution',
    form: 'histogram',
    applies: (f) => f.keys.length === 0 && f.values.length === 1,
    why: 'one quantitative value and no groups: a histogram shows where values gather, spread and trail off, by counts in equal bins read from a common baseline',
  },
  {
    id: 'distribution.groups-few-points',
    intent: 'distribution',
    form: 'strip',
    applies: (f) => f.keys.length === 1 && largestGroup(f) <= MAX_STRIP_POINTS,
    why: `a value by group, at most ${MAX_STRIP_POINTS} values in any group: every value drawn as a jittered dot, so clusters, gaps and sample size stay visible (a summary would hide them)`,
  },
  {
    id: 'distribution.groups-many-points',
    intent: 'distribution',
    form: 'box',
    applies: (f) => f.keys.length === 1 && largestGroup(f) > MAX_STRIP_POINTS,
    why: `a value by group, more than ${MAX_STRIP_POINTS} values in the largest group: dots would pile into a smear, so each group is summarised by a box plot (quartiles, whiskers, outliers; Tukey 1977)`,
  },
  {
    id: 'compare.two-keys',
    intent: 'compare',
    form: 'grouped-bar',
    applies: (f) => f.keys.length === 2,
    why: 'two keys and one value: bars grouped by the first key, one bar per level of the second side by side in its own colour, so values compare by length within each key and each group can be followed across keys',
  },
  {
    id: 'cycle.cyclic-key',
    intent: 'cycle',
    form: 'radial-bar',
    applies: (f) => f.keys.length === 1,
    why: 'one cyclic key and one value: bars around a circle keep every key next to its neighbours, the last next to the first (a key that is not cyclic is refused by the radial hard rule)',
  },
  {
    id: 'flow.ordered-key-and-series',
    intent: 'flow',
    form: 'stream',
    applies: (f) => f.keys.length === 2,
    why: 'an ordered key, a series key and one value: a streamgraph shows how the total flows and how each series waxes and wanes along the key, its layers stacked so they bend as little as they can (Byron & Wattenberg 2008)',
  },
  {
    id: 'profile.many-values',
    intent: 'profile',
    form: 'parallel',
    applies: (f) => f.values.length > 12,
    why: 'more than twelve quantitative values: a scatterplot matrix would need too many small panels, so parallel coordinates give each value its own axis and each item one line across them',
  },
  {
    id: 'profile.few-values',
    intent: 'profile',
    form: 'scatter-matrix',
    applies: (f) => f.values.length >= 3 && f.values.length <= 12,
    why: 'three to twelve quantitative values: a scatterplot matrix shows every pair of them, each by position on common scales, where parallel coordinates would show only neighbouring pairs',
  },
  {
    id: 'matrix.two-keys',
    intent: 'matrix',
    form: 'heatmap',
    applies: (f) => f.keys.length === 2,
    why: 'two keys and one value: a heat map shows every row × column pair at once, colour standing for the value; clustering brings similar rows and columns together so blocks show',
  },
  {
    id: 'compare.many-items',
    intent: 'compare',
    form: 'dense',
    applies: (f) => f.keys.length === 1 && manyItems(f),
    why: '10,000 or more keys: more than bars can show without folding, so one small cell per key, coloured by value, shows them all',
  },
  {
    // After the histogram, strip and box rows: a distribution is binned or summarised by default,
    // so this row is reached only when the brief pins \`form: dense\`.
    id: 'distribution.many-items',
    intent: 'distribution',
    form: 'dense',
    applies: (f) => f.keys.length <= 1 && f.values.length === 1,
    why: 'the brief pins a dense layout: one small cell per item, coloured by value and sorted, shows the shape of the whole distribution item by item',
  },
];

/** The first rule that matches the intent and the fields (and leads to the pinned form, when one is pinned). */
export function matchRule(intent: Intent, fields: Fields, pinned?: FormName, brief?: ResolvedBrief): Rule | undefined {
  return RULES.find((r) => r.intent === intent && (pinned === undefined || r.form === pinned) && r.applies(fields) && (!r.when || (brief !== undefined && r.when(brief))));
}

/** The intents the rule table answers, in table order. */
export function supportedIntents(): Intent[] {
  return [...new Set(RULES.map((r) => r.intent))];
}

/** The forms the rules may lead an intent to (for this brief, when given, judged before the data is read). */
export function formsForIntent(intent: Intent, brief?: ResolvedBrief): FormName[] {
  return [...new Set(RULES.filter((r) => r.intent === intent && (!brief || !r.briefMay || r.briefMay(brief))).map((r) => r.form))];
}
