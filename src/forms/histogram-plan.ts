import type { Decision } from '../choose/types.js';
import { binValues, type Binning } from '../derive/bins.js';
import { groupRows, type Grouped } from '../derive/group.js';
import { refOf, type FieldRef } from '../fields/types.js';
import { memoized, type LayoutContext } from '../layout/kit-types.js';
import { valueFormatter } from '../layout/number-format.js';
import type { Table } from '../table/types.js';
import { failure, success, type Outcome } from '../diagnostics/diagnostic.js';
import { orderNotApplicable } from './distribution-plan.js';
import type { Planned, PlanInput } from './types.js';

/** The narrowest bin drawn, in px: more bins than fit at this width are merged by widening the bin width. */
export const MIN_BIN_PX = 4;
/** The most bins drawn whatever the width (common practice: beyond about 200 bars a histogram reads as noise). */
export const MAX_BINS = 200;

/** A histogram's plan: the value binned and the most bins the frame holds. */
export interface HistogramPlan {
  value: FieldRef;
  maxBins: number;
}

/** The values of a histogram, ascending, with what was left out: once per render (planning and deriving both need them). */
export function histogramValues(table: Table, value: FieldRef, ctx: Pick<LayoutContext, 'memo'>): { sorted: number[]; grouped: Grouped } {
  return memoized(ctx, `histogram\u0000values\u0000${value.name}`, () => {
    const grouped = groupRows(table, { keys: [], value });
    const sorted = (grouped.groups[0]?.values ?? []).slice().sort((a, b) => a - b);
    return { sorted, grouped };
  });
}

/** The bins of a histogram, once per render. */
export function histogramBins(table: Table, plan: HistogramPlan, ctx: Pick<LayoutContext, 'memo'>): Binning | undefined {
  return memoized(ctx, `histogram\u0000bins\u0000${plan.value.name}\u0000${plan.maxBins}`, () => {
    const { sorted } = histogramValues(table, plan.value, ctx);
    return sorted.length ? binValues(sorted, plan.maxBins) : undefined;
  });
}

/** The rule behind the bin width, in words. */
function widthDecision(b: Binning, n: number, fmt: (v: number) => string, unit: string): Decision {
  const raw = `${fmt(b.rawWidth)}${unit}`;
  if (b.rule === 'freedman-diaconis') return { decision: `bin width from the Freedman–Diaconis rule: ${raw}`, rule: `width = 2 · IQR · n^(−1/3) with n = ${n} (Freedman & Diaconis 1981): wide enough that counts are stable, narrow enough to show shape; robust to outliers because it uses the IQR` };
  if (b.rule === 'sturges') return { decision: `bin width from Sturges' rule: ${raw}`, rule: `the interquartile range is zero (at least half the values are equal), so the Freedman–Diaconis width would be zero; Sturges' rule divides the range into ⌈log₂ ${n}⌉ + 1 bins (Sturges 1926)` };
  return { decision: 'one bin around the single value', rule: 'every value is the same, so there is no spread to bin' };
}

/** The decisions of a histogram's bins: the width's rule, the nice edges, and any widening. */
export function binDecisions(b: Binning, n: number, value: FieldRef, maxBins: number): Decision[] {
  const fmt = valueFormatter([b.width, ...b.edges]);
  // Three significant digits say what the rule gave without the nice width's precision.
  const raw = (v: number) => String(Number(v.toPrecision(3)));
  const unit = value.unit ? ` ${value.unit}` : '';
  const width = `${fmt(b.width)}${unit}`;
  const rounded = b.rawWidth !== b.width && b.rule !== 'single-value';
  const edges: Decision = b.widened
    ? { decision: `bins ${width} wide, edges at multiples of ${fmt(b.width)}`, rule: `the rule's width would need more than ${maxBins} bins, the most the plot holds at ${MIN_BIN_PX} px each, so the width was widened to the next nice value that fits` }
    : { decision: `bin edges at multiples of ${fmt(b.width)}${rounded ? `: the width was rounded from ${raw(b.rawWidth)} to ${width}` : ''}`, rule: 'edges at nice values (1, 2 or 5 × a power of ten) can be read off the axis; rounding to the nearest nice width changes it by less than a factor of 1.6' };
  return [
    widthDecision(b, n, raw, unit),
    edges,
    { decision: 'bars touch; each bin counts values from its left edge up to (not including) its right edge, the last bin both', rule: 'the value axis is continuous, so bins share their edges and every value falls in exactly one bin' },
  ];
}

/** The histogram's plan: the bins the frame holds, each decision with its rule. */
export function planHistogram(input: PlanInput): Outcome<Planned<HistogramPlan>> {
  const { fields, brief, style } = input;
  const value = refOf(fields.values[0]!);
  const room = brief.size.width - 2 * style.spacing.padding;
  const maxBins = Math.max(1, Math.min(MAX_BINS, Math.floor(room / MIN_BIN_PX)));
  const plan: HistogramPlan = { value, maxBins };
  const bins = histogramBins(input.table, plan, input);
  const { sorted } = histogramValues(input.table, value, input);
  const problems = brief.order === 'auto' ? [] : [orderNotApplicable(brief.order, 'a histogram', 'its bins run in the order of their values')];
  if (problems.length) return failure(problems);
  return success({ plan, decisions: bins ? binDecisions(bins, sorted.length, value, maxBins) : [] });
}
