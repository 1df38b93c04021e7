import { format } from 'd3-format';
import { diagnostic, failure, success } from '../diagnostics/diagnostic.js';
import { classOf } from '../derive/classes.js';
import { denseGrid, type DenseGrid } from '../derive/dense-grid.js';
import { axisTitle } from '../layout/axis.js';
import { frameFor } from '../layout/compose.js';
import type { LayoutContext } from '../layout/kit-types.js';
import type { LegendSpec } from '../layout/legend.js';
import { labelStyle, numberFormatIn, valueFormatter } from '../layout/number-format.js';
import { rasterNode } from '../layout/raster-image.js';
import type { Table } from '../table/types.js';
import { noDataNote } from './bar-text.js';
import { denseItems, planDense, type DenseItems, type DensePlan } from './dense-plan.js';
import { classLegend } from './colour-classes.js';
import type { FormDef } from './types.js';
import { denseAlt, denseData } from './point-alt.js';
import { inSentence } from '../fields/labels.js';

/** A dense layout's items in drawing order, and the grid they fill. */
export interface DerivedDense {
  query: DensePlan;
  labels: string[] | undefined;
  /** Values in drawing order. */
  values: Float64Array;
  grid: DenseGrid;
  /** What was left out for want of a value. */
  left: DenseItems['left'];
}

const legendOf = (d: Pick<DerivedDense, 'query'>): LegendSpec => classLegend(d.query.value, d.query.classes);

function countNote(plan: DensePlan, n: number): string {
  const what = plan.key ? `${inSentence(plan.key.label)} values` : 'rows';
  const order = plan.order === 'value' ? 'in value order, largest first' : plan.order === 'key' ? `in ${inSentence(plan.key!.label)} order` : plan.order === 'label' ? 'in label order' : 'in data order';
  return `${numberFormatIn(plan.value.locale, ',')(n)} ${what}, one square cell each, ${order}, read left to right in rows from the top.`;
}

/** The notes: how the items are laid out, then what was left out ("No data: …", or a count of rows). */
function denseNotes(plan: DensePlan, n: number, left: DenseItems['left']): string[] {
  const rows = left.rows ? [`${numberFormatIn(plan.value.locale, ',')(left.rows)} row${left.rows === 1 ? ' has' : 's have'} no value and ${left.rows === 1 ? 'is' : 'are'} not drawn.`] : [];
  return [countNote(plan, n), ...(plan.key ? noDataNote({ key: plan.key, noData: left.keys }) : []), ...rows];
}

/** The items in drawing order (stable: ties keep their source order), fitted to the body the frame and legend leave. */
function deriveDense(table: Table, plan: DensePlan, ctx: LayoutContext) {
  const items = denseItems(ctx, table, plan);
  const n = items.values.length;
  if (n === 0) return failure<DerivedDense>([...items.diagnostics, diagnostic('derive.no-rows', 'no row has a value to draw', { field: plan.value.name, hint: `check that \`${plan.value.name}\` is filled in` })]);
  const index = Array.from({ length: n }, (_, i) => i);
  if (plan.order === 'value') index.sort((a, b) => items.values[b]! - items.values[a]! || a - b);
  if (plan.order === 'key') index.sort((a, b) => items.sortKeys![a]! - items.sortKeys![b]! || a - b);
  if (plan.order === 'label') index.sort((a, b) => (items.labels![a]! < items.labels![b]! ? -1 : items.labels![a]! > items.labels![b]! ? 1 : a - b));
  const body = frameFor(legendOf({ query: plan }), denseNotes(plan, n, items.left), ctx).body;
  const grid = denseGrid(n, body.width, body.height);
  if (!grid) {
    return failure<DerivedDense>([...items.diagnostics, diagnostic('derive.too-many-items', `${format(',')(n)} items do not fit the ${Math.floor(body.width)} × ${Math.floor(body.height)} px plot even at one pixel each`, {
      field: plan.value.name, found: `${n} items`, expected: `at most ${Math.floor(body.width) * Math.floor(body.height)}`, hint: 'make the chart larger with `size:`, or combine items by a coarser key',
    })]);
  }
  return success<DerivedDense>({ query: plan, labels: items.labels && index.map((i) => items.labels![i]!), values: Float64Array.from(index, (i) => items.values[i]!), grid, left: items.left }, items.diagnostics);
}

/**
 * The dense pixel layout: one square cell per item, in rows from the top left, coloured by the
 * value's class, drawn as one embedded raster (one pixel per item, stretched to the cell size).
 */
export const DENSE: FormDef<DensePlan, DerivedDense> = {
  name: 'dense',
  noun: 'dense pixel layout',
  traits: { lengthCoded: false, connectsKey: false, radial: false, coloursCategories: false, axisPerValue: false },
  plan: planDense,
  derive: deriveDense,
  legend: legendOf,
  data: (d) => denseData(d.values, d.labels, d.query.key?.name ?? 'item', d.query.value.name),
  alt: (d) => denseAlt(d.values, d.labels, `Dense pixel layout of ${inSentence(axisTitle(d.query.value, d.query.value.label))}, one cell per item`, labelStyle(d.query.value)),
  words(d) {
    const value = axisTitle(d.query.value, d.query.value.label);
    const fmt = valueFormatter(Array.from(d.values), labelStyle(d.query.value));
    const n = d.values.length;
    let [lo, hi] = [0, 0];
    for (let i = 1; i < n; i++) { if (d.values[i]! < d.values[lo]!) lo = i; if (d.values[i]! > d.values[hi]!) hi = i; }
    return {
      title: `${value} of ${numberFormatIn(d.query.value.locale, ',')(n)} ${d.query.key ? inSentence(d.query.key.label) : 'items'}`,
      description: `Dense pixel layout of ${inSentence(value)} for ${numberFormatIn(d.query.value.locale, ',')(n)} items, one cell each, from ${fmt(d.values[lo]!)} to ${fmt(d.values[hi]!)}, coloured in ${d.query.classes.classes.length} classes.`,
      notes: denseNotes(d.query, n, d.left),
    };
  },
  layoutBody(d, body, ctx) {
    const { cell, columns, rows } = d.grid;
    const classes = d.query.classes.classes;
    const indices = new Uint8Array(columns * rows).fill(classes.length);
    d.values.forEach((v, i) => { indices[i] = classOf(classes, v); });
    const box = { x: body.x, y: body.y, width: columns * cell, height: rows * cell };
    const raster = rasterNode(ctx.id('raster', 'items'), box, { columns, rows }, indices, [...classes.map((c) => c.fill), 'none']);
    return { marks: [raster], labels: [], guides: [], panels: [{ id: 'panel', plot: box, axes: [] }], diagnostics: [] };
  },
};
