import { extent } from 'd3-array';
import { diagnostic, failure, success, type Outcome } from '../diagnostics/diagnostic.js';
import { deriveDotRows, type DotRow, type PartialRow } from '../derive/dots.js';
import { axisTitle } from '../layout/axis.js';
import { plotFor } from '../layout/compose.js';
import type { CartesianDomains, LayoutContext, PlotArea } from '../layout/kit-types.js';
import { labelStyle, valueFormatter } from '../layout/number-format.js';
import { asBand, asLinear } from '../layout/scales.js';
import type { Datum, SceneNode } from '../scene/types.js';
import type { Table } from '../table/types.js';
import { noDataNote } from './bar-text.js';
import { planDot, type DotPlan } from './dot-plan.js';
import type { FormDef } from './types.js';
import { dotAlt } from './point-alt.js';
import { inSentence } from '../fields/labels.js';

/** Radius of a dot, px (common practice for dot plots: a clear dot, well inside its row). */
export const DOT_RADIUS = 4;
/** The narrowest row a dot is drawn in, px: two radii and a little room. */
export const MIN_ROW_PX = 2 * DOT_RADIUS + 2;

/** The numbers a dot plot draws. */
export interface DerivedDots {
  plan: DotPlan;
  rows: DotRow[];
  /** Keys with no usable value at all: not drawn, named in the note. Default: none. */
  noData?: string[];
  /** Keys drawn with only some of their values (a dumbbell with one end), named in the note. Default: none. */
  partial?: PartialRow[];
}

/** The title of the value axis: the value's, or both values' names with their shared unit. */
function valueTitle(plan: DotPlan): string {
  const [a, b] = plan.values;
  if (!b) return axisTitle(a!, a!.label);
  const both = `${a!.label} and ${b.label}`;
  return a!.unit ? `${both} (${a!.unit})` : both;
}

/** The span of every value, widened by 5 % at each end so no dot sits on the plot's edge. */
function span(rows: readonly DotRow[]): [number, number] {
  const [lo, hi] = extent(rows.flatMap((r) => r.values.filter((v) => !Number.isNaN(v)))) as [number, number];
  const pad = hi > lo ? (hi - lo) * 0.05 : Math.abs(lo) * 0.1 || 1;
  return [lo - pad, hi + pad];
}

function domainsOf(derived: DerivedDots, ctx: LayoutContext): CartesianDomains {
  const { plan, rows } = derived;
  const fill = (i: number) => (plan.values.length === 1 ? ctx.style.palette.primary : ctx.style.palette.categorical[i]!);
  return {
    left: { kind: 'band', name: 'key', field: plan.key.name, title: plan.key.label, domain: rows.map((r) => r.label) },
    bottom: { kind: 'linear', name: 'value', field: plan.values.map((v) => v.name).join(','), title: valueTitle(plan), extent: span(rows), format: plan.values[0]!.format },
    first: 'bottom',
    ...(plan.values.length === 2 ? { legend: { kind: 'shape', field: plan.values.map((v) => v.name).join('-'), title: '', entries: plan.values.map((v, i) => ({ label: v.label, shape: 'circle' as const, fill: fill(i) })) } } : {}),
  };
}

function deriveDots(table: Table, plan: DotPlan, ctx: LayoutContext): Outcome<DerivedDots> {
  const { rows, diagnostics, noData, partial } = deriveDotRows(table, plan);
  if (rows.length === 0) return failure([...diagnostics, diagnostic('derive.no-rows', 'no row has both a key and a usable value, so there is nothing to draw', { file: table.origin.file, hint: 'check that the key and value columns are the ones you meant', expected: 'at least one complete row' })]);
  // A sum of temperatures or years means nothing: rows sharing a key are refused rather than summed.
  if (plan.arbitraryZero && plan.aggregate === 'sum' && diagnostics.some((d) => d.code === 'derive.aggregated')) {
    return failure([diagnostic('derive.sum-not-meaningful', `some keys of \`${plan.key.name}\` have several rows, and their values, whose zero is arbitrary, cannot be summed meaningfully`, {
      field: plan.key.name, path: '/aggregate', found: 'sum', expected: 'mean, max or min', hint: 'set `aggregate: mean` (or max or min), or give one row per key',
    })]);
  }
  const derived = { plan, rows, noData, partial };
  const { plot } = plotFor(domainsOf(derived, ctx), [], ctx).box;
  const fits = Math.floor(plot.height / MIN_ROW_PX);
  if (rows.length > fits && fits >= 1) {
    return failure([...diagnostics, diagnostic('derive.too-many-dots', `${rows.length} rows of dots do not fit: the plot holds ${fits} at ${MIN_ROW_PX} px each`, {
      field: plan.key.name, found: `${rows.length} keys`, expected: `at most ${fits}`, hint: 'make the chart taller with `size:`, or filter the table to the keys that matter',
    })]);
  }
  return success(derived, diagnostics);
}

/** The marks of one key: a dumbbell's joining line, then its dots (first value, then second), on the row's centre. */
function rowMarks(derived: DerivedDots, row: DotRow, area: PlotArea, ctx: LayoutContext): SceneNode[] {
  const { plan } = derived;
  const [band, x] = [asBand(area.y), asLinear(area.x)];
  const cy = band.center(row.label);
  const datum: Datum = { [plan.key.name]: row.label };
  plan.values.forEach((v, i) => { datum[v.name] = Number.isNaN(row.values[i]!) ? null : row.values[i]!; });
  const marks: SceneNode[] = [];
  if (row.values.length === 2 && !row.values.some(Number.isNaN)) {
    const [x0, x1] = row.values.map((v) => x.map(v)) as [number, number];
    marks.push({ kind: 'path', id: ctx.id('line', row.label), role: 'line', stroke: ctx.style.palette.others, strokeWidth: 2, datum, commands: [{ op: 'M', x: x0, y: cy }, { op: 'L', x: x1, y: cy }] });
  }
  row.values.forEach((v, i) => {
    // A missing end is not drawn: the known dot stands alone, and the note names what is missing.
    if (Number.isNaN(v)) return;
    const fill = row.values.length === 1 ? ctx.style.palette.primary : ctx.style.palette.categorical[i]!;
    marks.push({ kind: 'circle', id: ctx.id('point', `${row.label}-${plan.values[i]!.name}`), role: 'point', cx: x.map(v), cy, r: DOT_RADIUS, fill, shape: 'circle', datum: { ...datum, value: plan.values[i]!.name } });
  });
  return marks;
}

const PARTIAL_NAMES = 4;

/** "Only one value: North (no 2024), South (no 2025)." naming the keys drawn with a missing end, shortened to a count when long. */
function partialNote(partial: readonly PartialRow[]): string[] {
  if (partial.length === 0) return [];
  const shown = partial.slice(0, PARTIAL_NAMES).map((p) => `${p.label} (no ${p.missing.join(', no ')})`).join(', ');
  const more = partial.length > PARTIAL_NAMES ? ` and ${partial.length - PARTIAL_NAMES} more` : '';
  return [`Drawn with one value only: ${shown}${more}.`];
}

/**
 * The dot plot: one dot per key on an aligned value scale that need not include zero, keys down
 * the left sorted like bars; with two values per key, a dumbbell joining them.
 */
export const DOT: FormDef<DotPlan, DerivedDots> = {
  name: 'dot',
  noun: 'dot plot',
  // Two values share one axis only as a dumbbell's two ends of one measure (same unit, checked in the plan).
  traits: { lengthCoded: false, connectsKey: false, radial: false, coloursCategories: false, axisPerValue: false, sharedAxisValues: 2 },
  plan: planDot,
  derive: deriveDots,
  alt: (d) => dotAlt(d.rows, `${d.plan.values.length === 2 ? 'Dumbbell' : 'Dot'} plot of ${inSentence(valueTitle(d.plan))} by ${inSentence(d.plan.key.label)}, ${d.rows.length} key${d.rows.length === 1 ? '' : 's'}`, d.plan.values.map((v) => v.label), labelStyle(d.plan.values[0])),
  domains: domainsOf,
  layout: (derived, area, ctx) => ({ marks: derived.rows.flatMap((r) => rowMarks(derived, r, area, ctx)), labels: [], diagnostics: [] }),
  words(derived) {
    const { plan, rows } = derived;
    const known = (r: DotRow) => r.values.filter((v) => !Number.isNaN(v));
    const fmt = valueFormatter(rows.flatMap(known), labelStyle(plan.values[0]));
    const what = `${plan.values.length === 2 ? 'Dumbbell' : 'Dot'} plot of ${inSentence(valueTitle(plan))} by ${inSentence(plan.key.label)}, ${rows.length} key${rows.length === 1 ? '' : 's'}`;
    const top = rows[0]!;
    return {
      title: `${valueTitle(plan)} by ${inSentence(plan.key.label)}`,
      description: `${what}; first ${top.label} (${known(top).map(fmt).join(' to ')}).`,
      notes: [...noDataNote({ key: plan.key, noData: derived.noData ?? [] }), ...partialNote(derived.partial ?? [])],
    };
  },
};
