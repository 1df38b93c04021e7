import { fsum, max, min } from 'd3-array';
import { deriveGroupedBars, type DerivedGroupedBars, type GroupedBar } from '../derive/grouped-bars.js';
import { plotFor } from '../layout/compose.js';
import type { CartesianDomains, LayoutContext, PlotArea } from '../layout/kit-types.js';
import { labelStyle, valueFormatter } from '../layout/number-format.js';
import { asBand, asLinear } from '../layout/scales.js';
import type { SceneNode } from '../scene/types.js';
import { MIN_BAND_PX } from './bar.js';
import { barValueTitle, noDataNote, tooltipText } from './bar-text.js';
import { planGroupedBar, type GroupedBarPlan } from './grouped-bar-plan.js';
import type { FormDef } from './types.js';
import { groupedBarAlt } from './bar-alt.js';
import { inSentence } from '../fields/labels.js';

type Derived = DerivedGroupedBars<GroupedBarPlan>;

/** The value extent the bars span, from zero. */
function extentOf(bars: readonly GroupedBar[]): [number, number] {
  return [Math.min(0, min(bars, (b) => b.value) ?? 0), Math.max(0, max(bars, (b) => b.value) ?? 0)];
}

/** The key and value channels, by orientation, and the legend of the groups' colours. */
function domainsOf(plan: GroupedBarPlan, keys: string[], extent: [number, number]): CartesianDomains {
  const key = { kind: 'band' as const, name: 'key', field: plan.key.name, title: plan.key.label, domain: keys };
  const value = { kind: 'linear' as const, name: 'value', field: plan.value?.name ?? 'count', title: barValueTitle(plan), extent, format: plan.value?.format };
  const legend = { kind: 'categorical' as const, field: plan.group.name, title: plan.group.label, entries: plan.groups.map((label, i) => ({ label, fill: plan.colours[i]! })) };
  return plan.orientation === 'vertical'
    ? { left: value, bottom: key, first: 'left', zeroLine: 'left', legend }
    : { left: key, bottom: value, first: 'bottom', zeroLine: 'bottom', legend };
}

/** How many bars the key axis holds at MIN_BAND_PX each, measured with the composer's own plot box. */
function capacity(plan: GroupedBarPlan, keys: string[], ctx: LayoutContext): number {
  const { plot } = plotFor(domainsOf(plan, keys, [0, 1]), [], ctx).box;
  return Math.floor((plan.orientation === 'vertical' ? plot.width : plot.height) / MIN_BAND_PX);
}

/** One bar from zero to its value, in its group's slot of its key's band. */
function barRect(derived: Derived, bar: GroupedBar, area: PlotArea, ctx: LayoutContext, fmt: (n: number) => string): SceneNode {
  const plan = derived.query;
  const vertical = plan.orientation === 'vertical';
  const [band, value] = vertical ? [asBand(area.x), asLinear(area.y)] : [asBand(area.y), asLinear(area.x)];
  const slot = plan.groups.indexOf(bar.group);
  const thickness = band.bandwidth / plan.groups.length;
  const b0 = band.start(bar.key) + slot * thickness;
  const [v0, v1] = [value.map(0), value.map(bar.value)];
  const [low, length] = [Math.min(v0, v1), Math.abs(v1 - v0)];
  const id = ctx.id('bar', `${bar.key} ${bar.group}`);
  const datum = { [plan.key.name]: bar.key, [plan.group.name]: bar.group, [derived.valueName]: bar.value };
  const fill = plan.colours[slot]!;
  const tooltip = tooltipText([[plan.key.label, bar.key], [plan.group.label, bar.group], [barValueTitle(plan), fmt(bar.value)]]);
  return vertical
    ? { kind: 'rect', id, role: 'bar', datum, tooltip, x: b0, y: low, width: thickness, height: length, fill }
    : { kind: 'rect', id, role: 'bar', datum, tooltip, x: low, y: b0, width: length, height: thickness, fill };
}

/** What a grouped bar chart compares: value, key and group, and how many keys and groups. */
function groupedWhat(derived: Derived): string {
  const plan = derived.query;
  return `Grouped bar chart of ${inSentence(barValueTitle(plan))} by ${inSentence(plan.key.label)} and ${inSentence(plan.group.label)}, ${derived.keys.length} keys × ${plan.groups.length} groups`;
}

/** One sentence for screen readers: what is compared, how many keys and groups, and the largest bar. */
function describe(derived: Derived): string {
  const plan = derived.query;
  const fmt = valueFormatter(derived.bars.map((b) => b.value), labelStyle(plan.value, plan.key));
  const what = groupedWhat(derived);
  const top = derived.bars.reduce<GroupedBar | undefined>((a, b) => (!a || b.value > a.value ? b : a), undefined);
  return top ? `${what}: largest ${top.key}, ${top.group} (${fmt(top.value)}).` : `${what}.`;
}

/**
 * Grouped bars: one band per key, in it one bar per group side by side from a shared zero, each
 * group in its own colour and in one order within every key, with a legend. Reuses the bar
 * chart's planning (order, orientation), value title and narrowest band.
 */
export const GROUPED_BAR: FormDef<GroupedBarPlan, Derived> = {
  name: 'grouped-bar',
  noun: 'grouped bar chart',
  traits: { lengthCoded: true, connectsKey: false, radial: false, coloursCategories: true, axisPerValue: false },
  plan: planGroupedBar,
  derive: (table, plan, ctx) => deriveGroupedBars(table, plan, (keys) => capacity(plan, keys, ctx)),
  alt: (derived) => groupedBarAlt(derived.bars, groupedWhat(derived), labelStyle(derived.query.value)),
  domains: (derived) => domainsOf(derived.query, derived.keys, extentOf(derived.bars)),
  facets: { noun: 'total', value: (derived) => fsum(derived.bars, (b) => b.value), minBand: (derived) => derived.query.groups.length * MIN_BAND_PX },
  layout(derived, area, ctx) {
    const fmt = valueFormatter(derived.bars.map((b) => b.value), labelStyle(derived.query.value, derived.query.key));
    return { marks: derived.bars.map((bar) => barRect(derived, bar, area, ctx, fmt)), labels: [], diagnostics: [] };
  },
  words(derived) {
    const plan = derived.query;
    return { title: `${barValueTitle(plan)} by ${inSentence(plan.key.label)} and ${inSentence(plan.group.label)}`, description: describe(derived), notes: noDataNote({ key: { ...plan.key, label: `${plan.key.label} and ${plan.group.label}` }, noData: derived.noData }) };
  },
};
