import { fsum } from 'd3-array';
import type { Decision } from '../choose/types.js';
import { diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import { AGGREGATORS } from '../derive/aggregate.js';
import type { DerivedBars } from '../derive/bars.js';
import type { CartesianForm } from '../layout/compose.js';
import type { FormMarks, LayoutContext, PlotArea } from '../layout/kit-types.js';
import type { Table } from '../table/types.js';
import { BAR } from './bar.js';
import type { BarPlan } from './bar-plan.js';
import type { FormCore, Planned, PlanInput } from './types.js';
import { inSentence } from '../fields/labels.js';

/** The bar form as drawn on a left and a bottom axis (what the share bars reuse). */
export const BARS: FormCore<BarPlan, DerivedBars<BarPlan>> & CartesianForm<DerivedBars<BarPlan>> = (() => {
  if (!('domains' in BAR)) throw new Error('the bar form is drawn on a left and a bottom axis');
  return BAR;
})();

/** Bars of each key's share of the whole: the bar chart's bars, with values as shares (0–1) and the original values kept. */
export type ShareBars = DerivedBars<BarPlan> & {
  /** Each bar's value before it became a share, by label. */
  originals: Map<string, number>;
  /** The name of the original value in data terms: the value column, or "count". */
  sourceName: string;
  total: number;
};

/** The plan of one-key shares: the bar form's plan, with why the bars show shares. */
export function planShares(input: PlanInput): Outcome<Planned<BarPlan>> {
  const { aggregate } = input.brief;
  if (!AGGREGATORS[aggregate].additive) {
    return failure([diagnostic('choice.aggregate-not-additive', `shares of a whole add up to 100 %, but \`aggregate: ${aggregate}\` gives values that do not add up`, {
      path: '/aggregate', found: aggregate, expected: 'sum or count', hint: `use \`aggregate: sum\` (or count), or compare the ${aggregate} values as bars (intent: compare)`,
    })]);
  }
  const planned = BARS.plan(input);
  if (!planned.ok) return planned;
  const why: Decision = { decision: 'bars of each key\'s share of the total, on a percent axis from 0', rule: 'part-to-whole with one key: shares as aligned lengths from a common baseline are read more accurately than the angles or areas of a pie (Cleveland & McGill 1984)' };
  return success({ ...planned.value, decisions: [why, ...planned.value.decisions] }, planned.diagnostics);
}

/** A share needs parts of zero or more: a negative value is refused, naming its rows. */
function negativeBars(bars: DerivedBars<BarPlan>): Diagnostic[] {
  const negative = bars.bars.filter((b) => b.value < 0);
  if (!negative.length) return [];
  const rows = negative.flatMap((b) => b.rows).sort((a, b) => a - b);
  return [diagnostic('derive.negative-part', `${negative.length} key${negative.length === 1 ? ' has' : 's have'} a negative value (first: ${JSON.stringify(negative[0]!.label)}, ${negative[0]!.value}); a share of a whole cannot be negative`, {
    path: '/values', field: bars.query.value?.name ?? 'count', rows, found: String(negative[0]!.value), expected: 'values of zero or more',
    hint: 'compare the values as bars from a zero line (intent: compare), which shows negative values honestly',
  })];
}

/**
 * The shares: the bar chart's bars (grouped, combined, sorted and folded by the bar form), each
 * divided by the total of all keys, those folded away included.
 */
export function deriveShares(table: Table, plan: BarPlan, ctx: LayoutContext): Outcome<ShareBars> {
  const derived = BARS.derive(table, plan, ctx);
  if (!derived.ok) return derived;
  const bars = derived.value;
  const refused = negativeBars(bars);
  if (refused.length) return failure([...derived.diagnostics, ...refused]);
  const total = fsum(bars.bars, (b) => b.value) + (bars.foldMode === 'stated' ? (bars.foldedTotal ?? 0) : 0);
  if (!(total > 0) || !Number.isFinite(total)) {
    return failure([...derived.diagnostics, diagnostic('derive.whole-is-zero', `the values sum to ${total}, so no share of the whole can be drawn`, { field: plan.value?.name ?? 'count', hint: 'check the value column' })]);
  }
  const value = plan.value ?? { name: 'count', label: 'Rows', type: 'quantitative' as const, unit: undefined, format: undefined, levels: [] };
  const name = inSentence(value.label);
  const query: BarPlan = { ...plan, value: { ...value, name: 'share', label: `Share of ${name}`, unit: '%', format: '.0%' } };
  return success({
    ...bars, query, valueName: 'share', total, sourceName: plan.value?.name ?? 'count',
    bars: bars.bars.map((b) => ({ ...b, value: b.value / total })),
    originals: new Map(bars.bars.map((b) => [b.label, b.value])),
  }, derived.diagnostics);
}

/** The bar chart's marks, each bar's datum carrying its original value beside its share. */
export function layoutShares(derived: ShareBars, area: PlotArea, ctx: LayoutContext): FormMarks {
  const drawn = BARS.layout(derived, area, ctx);
  const marks = drawn.marks.map((m) => {
    if (m.role !== 'bar' || !m.datum) return m;
    const key = m.datum[derived.query.key.name] as string;
    return { ...m, datum: { ...m.datum, [derived.sourceName]: derived.originals.get(key) ?? null } };
  });
  return { ...drawn, marks };
}
