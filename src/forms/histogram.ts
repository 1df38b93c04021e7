import { max } from 'd3-array';
import { format } from 'd3-format';
import type { Binning } from '../derive/bins.js';
import { diagnostic, failure, success, type Diagnostic } from '../diagnostics/diagnostic.js';
import { axisTitle } from '../layout/axis.js';
import type { CartesianDomains, FormWords, LayoutContext } from '../layout/kit-types.js';
import { labelStyle, numberFormatIn, valueFormatter } from '../layout/number-format.js';
import { asLinear } from '../layout/scales.js';
import type { SceneNode } from '../scene/types.js';
import { histogramBins, histogramValues, planHistogram, type HistogramPlan } from './histogram-plan.js';
import { boxStats, type BoxStats } from '../derive/quantile.js';
import type { FormDef } from './types.js';
import { histogramAlt } from './distribution-alt.js';
import { inSentence } from '../fields/labels.js';

/** The numbers a histogram draws: its bins, how many values they hold, and how many were left out. */
export interface DerivedHistogram {
  query: HistogramPlan;
  bins: Binning;
  /** Values binned. */
  n: number;
  /** Rows with a missing or non-finite value, left out. */
  missing: number;
  /** Median and quartiles of the values binned (for the alt text). Default: none. */
  stats?: BoxStats;
}

const count = format(',d');

/** The count axis's title: what is counted, and in bins of what width and unit. */
export function countTitle(d: DerivedHistogram): string {
  const fmt = valueFormatter([d.bins.width, ...d.bins.edges], labelStyle(d.query.value));
  return `Number of rows (bins of ${fmt(d.bins.width)}${d.query.value.unit ? ` ${d.query.value.unit}` : ''})`;
}

function domainsOf(d: DerivedHistogram): CartesianDomains {
  const { edges, counts } = d.bins;
  const value = d.query.value;
  return {
    left: { kind: 'linear', name: 'count', field: 'count', title: countTitle(d), extent: [0, Math.max(1, max(counts) ?? 0)], format: ',d' },
    bottom: { kind: 'linear', name: 'value', field: value.name, title: axisTitle(value, value.label), extent: [edges[0]!, edges[edges.length - 1]!], format: value.format },
    first: 'left',
    zeroLine: 'left',
  };
}

/** The missing values' warning, with their count (the rows are named by groupRows). */
function missingWarnings(diagnostics: readonly Diagnostic[], missing: number, n: number): Diagnostic[] {
  return diagnostics.map((d) => (d.code === 'derive.missing-values' ? { ...d, message: `${count(missing)} of ${count(missing + n)} values are missing or not finite and not drawn: ${d.message}` } : d));
}

function words(d: DerivedHistogram): FormWords {
  const value = d.query.value;
  const label = inSentence(value.label);
  const fmt = valueFormatter([d.bins.width, ...d.bins.edges], labelStyle(value));
  const count = numberFormatIn(value.locale, ',d');
  const { edges, counts } = d.bins;
  const top = counts.indexOf(max(counts) ?? 0);
  const unit = value.unit ? ` ${value.unit}` : '';
  const notes = d.missing ? [`${count(d.missing)} row${d.missing === 1 ? '' : 's'} with a missing or non-finite ${label} ${d.missing === 1 ? 'is' : 'are'} not drawn.`] : [];
  return {
    title: `Distribution of ${label}`,
    description: `Histogram of ${label}: ${count(d.n)} values in ${counts.length} bins of ${fmt(d.bins.width)}${unit} from ${fmt(edges[0]!)} to ${fmt(edges[edges.length - 1]!)}; the fullest bin, ${fmt(edges[top]!)} to ${fmt(edges[top + 1]!)}, holds ${count(counts[top]!)}.`,
    notes,
  };
}

/**
 * The histogram: one bar per bin from a zero baseline, touching its neighbours, its height the
 * number of values from its left edge up to its right edge (the last bin closed).
 */
export const HISTOGRAM: FormDef<HistogramPlan, DerivedHistogram> = {
  name: 'histogram',
  noun: 'histogram',
  traits: { lengthCoded: true, connectsKey: false, radial: false, coloursCategories: false, axisPerValue: false },
  plan: planHistogram,
  derive(table, plan, ctx) {
    const { sorted, grouped } = histogramValues(table, plan.value, ctx);
    const missing = grouped.diagnostics.filter((d) => d.code === 'derive.missing-values').reduce((s, d) => s + (d.rows?.length ?? 0), 0);
    const diagnostics = missingWarnings(grouped.diagnostics, missing, sorted.length);
    if (sorted.length === 0) return failure([...diagnostics, diagnostic('derive.no-rows', `no row has a usable \`${plan.value.name}\`, so there is nothing to bin`, { field: plan.value.name, hint: 'check the column holds numbers' })]);
    const bins = histogramBins(table, plan, ctx);
    if (!bins) {
      return failure([...diagnostics, diagnostic('derive.cannot-bin', `the values of \`${plan.value.name}\` cannot be cut into bins: they span more than numbers can hold, or too little for distinct bin edges`, {
        field: plan.value.name, found: `${sorted[0]} to ${sorted[sorted.length - 1]}`, hint: 'rescale the values (e.g. to thousands, or as differences from a reference), or use `intent: compare` to show them one by one',
      })]);
    }
    return success({ query: plan, bins, n: sorted.length, missing, stats: boxStats(sorted) }, diagnostics);
  },
  domains: domainsOf,
  layout(d, area, ctx: LayoutContext) {
    const x = asLinear(area.x);
    const y = asLinear(area.y);
    const { edges, counts } = d.bins;
    const base = y.map(0);
    const marks: SceneNode[] = counts.map((c, i) => {
      const [left, right, top] = [x.map(edges[i]!), x.map(edges[i + 1]!), y.map(c)];
      // A hairline in the page colour separates bars without a gap: their edges still meet.
      return { kind: 'rect', id: ctx.id('bin', String(edges[i])), role: 'bin', datum: { x0: edges[i]!, x1: edges[i + 1]!, count: c }, x: left, y: top, width: right - left, height: base - top, fill: ctx.style.palette.primary, stroke: ctx.style.background, strokeWidth: 0.5 };
    });
    return { marks, labels: [], diagnostics: [] };
  },
  words,
  alt: histogramAlt,
};
