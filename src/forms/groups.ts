import { extent } from 'd3-array';
import { format } from 'd3-format';
import { distributeGroups, type GroupDistribution } from '../derive/distribution.js';
import { groupRows } from '../derive/group.js';
import { diagnostic, failure, success, type Outcome } from '../diagnostics/diagnostic.js';
import { axisTitle } from '../layout/axis.js';
import type { CartesianDomains, FormWords, LayoutContext, PlotArea } from '../layout/kit-types.js';
import { labelStyle, numberFormatIn, valueFormatter } from '../layout/number-format.js';
import type { Table } from '../table/types.js';
import type { FormName } from '../brief/types.js';
import type { Decision } from '../choose/types.js';
import type { SceneNode } from '../scene/types.js';
import { planGroups, type GroupsPlan } from './distribution-plan.js';
import type { FormDef } from './types.js';
import { groupsAlt } from './distribution-alt.js';
import { inSentence } from '../fields/labels.js';

/** The numbers a strip or box chart draws: each group's sorted values and box numbers, in order. */
export interface DerivedGroups {
  query: GroupsPlan;
  groups: GroupDistribution[];
  /** Values drawn, over all groups. */
  n: number;
  /** Rows left out for a missing key or a missing or non-finite value. */
  missing: number;
}

const count = format(',d');

/** Groups the rows by key, orders the groups, and sums up what was left out (named, with rows, by groupRows). */
export function deriveGroups(table: Table, plan: GroupsPlan): Outcome<DerivedGroups> {
  const grouped = groupRows(table, { keys: [plan.key], value: plan.value });
  const missing = grouped.diagnostics.reduce((s, d) => s + (d.rows?.length ?? 0), 0);
  const groups = distributeGroups(grouped.groups, plan.order);
  const n = groups.reduce((s, g) => s + g.values.length, 0);
  const diagnostics = grouped.diagnostics.map((d) => (d.code === 'derive.missing-values' ? { ...d, message: `${count(d.rows?.length ?? 0)} of ${count(missing + n)} rows are not drawn: ${d.message}` } : d));
  if (n === 0) return failure([...diagnostics, diagnostic('derive.no-rows', `no row has both a \`${plan.key.name}\` and a usable \`${plan.value.name}\`, so there is nothing to draw`, { field: plan.value.name, hint: 'check the columns named in `keys:` and `values:`' })]);
  return success({ query: plan, groups, n, missing }, diagnostics);
}

/** The value extent of every group, widened around a single value so the axis has a span. */
function valueExtent(d: DerivedGroups): [number, number] {
  const [lo, hi] = extent(d.groups.flatMap((g) => [g.values[0]!, g.values[g.values.length - 1]!])) as [number, number];
  if (lo < hi) return [lo, hi];
  const pad = Math.abs(lo) / 10 || 1;
  return [lo - pad, hi + pad];
}

/** Groups down the left band axis, values along the bottom linear axis (no zero needed: position-coded). */
export function groupDomains(d: DerivedGroups): CartesianDomains {
  const { key, value } = d.query;
  return {
    left: { kind: 'band', name: 'key', field: key.name, title: key.label, domain: d.groups.map((g) => g.label) },
    bottom: { kind: 'linear', name: 'value', field: value.name, title: axisTitle(value, value.label), extent: valueExtent(d), format: value.format },
    first: 'bottom',
  };
}

/** Title, description and notes of a chart of a value by group; `how` says how to read the marks. */
export function groupWords(d: DerivedGroups, noun: string, how: string): FormWords {
  const { key, value } = d.query;
  const fmt = valueFormatter(d.groups.map((g) => g.stats.median), labelStyle(value));
  const count = numberFormatIn(value.locale, ',d');
  const unit = value.unit ? ` ${value.unit}` : '';
  const byMedian = [...d.groups].sort((a, b) => b.stats.median - a.stats.median);
  const [top, low] = [byMedian[0]!, byMedian[byMedian.length - 1]!];
  const what = `${noun} of ${inSentence(value.label)} by ${inSentence(key.label)}: ${d.groups.length} group${d.groups.length === 1 ? '' : 's'}, ${count(d.n)} values`;
  const extremes = top === low ? `median ${fmt(top.stats.median)}${unit}` : `highest median ${top.label} (${fmt(top.stats.median)}${unit}), lowest ${low.label} (${fmt(low.stats.median)}${unit})`;
  const notes = [how, ...(d.missing ? [`${count(d.missing)} row${d.missing === 1 ? '' : 's'} with a missing key or a missing or non-finite value ${d.missing === 1 ? 'is' : 'are'} not drawn.`] : [])];
  return { title: `${value.label} by ${inSentence(key.label)}`, description: `${what}; ${extremes}.`, notes };
}

/** What sets one chart of a value by group apart: its names, its marks per group, and how to read them. */
export interface GroupsFormSpec {
  name: FormName;
  noun: string;
  /** The form's words in the rationale's refusals ("a box plot") and the description ("Box plot"). */
  article: string;
  title: string;
  marksOf(d: DerivedGroups, g: GroupDistribution, area: PlotArea, ctx: LayoutContext): SceneNode[];
  /** The note saying how to read the marks. */
  how: string;
  /** The decisions about the marks, each with its rule. */
  decisions: Decision[];
}

/** A form showing one value by group in rows on a shared value axis (strips, boxes), position-coded. */
export function groupsForm(spec: GroupsFormSpec): FormDef<GroupsPlan, DerivedGroups> {
  return {
    name: spec.name,
    noun: spec.noun,
    traits: { lengthCoded: false, connectsKey: false, radial: false, coloursCategories: false, axisPerValue: false },
    plan: (input) => planGroups(input, spec.article, spec.decisions),
    derive: (table, plan) => deriveGroups(table, plan),
    domains: groupDomains,
    layout: (d, area, ctx) => ({ marks: d.groups.flatMap((g) => spec.marksOf(d, g, area, ctx)), labels: [], diagnostics: [] }),
    words: (d) => groupWords(d, spec.title, spec.how),
    alt: (d) => groupsAlt(d, spec.title),
  };
}
