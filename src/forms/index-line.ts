import { indexLines, type DerivedIndex } from '../derive/index.js';
import { deriveLines } from '../derive/lines.js';
import { failure } from '../diagnostics/diagnostic.js';
import type { LayoutContext, PlotArea } from '../layout/kit-types.js';
import { rule } from '../layout/axes.js';
import { asLinear } from '../layout/scales.js';
import { textBoxHeight, textNode } from '../layout/text.js';
import { planIndex, type IndexPlan } from './index-plan.js';
import { lineChart } from './line-chart.js';
import { keyName, lastPresent } from './line-text.js';
import type { FormDef } from './types.js';
import { lineAlt } from './line-alt.js';

type Derived = DerivedIndex<IndexPlan>;

/** "Index, Jan 2024 = 100" or "% change since Jan 2024". */
export function indexTitle(derived: Derived): string {
  return derived.as === 'index' ? `Index, ${derived.baseLabel} = 100` : `% change since ${derived.baseLabel}`;
}

/** Whether most lines end above the reference: its label then goes below it, where the lines are not. */
function mostEndAbove(derived: Derived): boolean {
  let above = 0;
  for (const s of derived.series) {
    const last = lastPresent(s);
    if (last !== undefined && s.ys[last]! > derived.reference) above++;
  }
  return above * 2 >= derived.series.length;
}

/** The reference line at the base (100, or 0 %) across the plot, labelled with the base period at its right end, on the side the lines' ends leave free. */
function referenceLine(derived: Derived, area: PlotArea, ctx: LayoutContext) {
  const { style, measure } = ctx;
  const y = asLinear(area.y).map(derived.reference);
  const { plot } = area;
  const line = { ...rule(ctx.id('reference', derived.baseLabel), 'reference', plot.x, y, plot.x + plot.width, y, style.lines.zero, style.lines.zeroWidth), datum: { base: derived.baseLabel } };
  const h = textBoxHeight(measure, style.text.note);
  const gap = style.spacing.labelGap;
  const below = y + gap + h <= plot.y + plot.height && (mostEndAbove(derived) || y - gap - h < plot.y);
  const text = derived.as === 'index' ? `${derived.baseLabel} = 100` : `base: ${derived.baseLabel}`;
  const label = textNode(measure, { id: ctx.id('label', `reference ${derived.baseLabel}`), role: 'label', text, style: style.text.note, x: plot.x + plot.width - gap, top: below ? y + gap : y - gap - h, anchor: 'end' });
  return { marks: [line], labels: [label] };
}

/**
 * The index line chart (intent change): each series divided by its value at a common base and
 * drawn as base = 100 (or % change since the base), with a reference line at the base. The value
 * axis may leave zero out: an index is read against its base, and lines are position-coded.
 */
export const INDEX_LINE: FormDef<IndexPlan, Derived> = {
  noun: 'index line chart',
  traits: { lengthCoded: false, connectsKey: true, radial: false, coloursCategories: false, axisPerValue: false },
  plan: planIndex,
  derive(table, plan) {
    const lines = deriveLines(table, plan);
    if (!lines.ok) return lines;
    const indexed = indexLines(lines.value, table, plan.base, plan.as, (x) => keyName(lines.value, x));
    return indexed.ok ? { ...indexed, diagnostics: [...lines.diagnostics, ...indexed.diagnostics] } : failure([...lines.diagnostics, ...indexed.diagnostics]);
  },
  alt: (d) => lineAlt(d, 'Index line chart', indexTitle(d)),
  ...lineChart<Derived>('index-line', {
    noun: 'Index line chart',
    valueTitle: indexTitle,
    valueExtent: (d) => d.valueExtent,
    datumExtra: (d, si, i) => (d.query.value ? { [d.query.value.name]: d.raw[si]![i]! } : {}),
    guides: referenceLine,
  }),
  name: 'index-line',
};
