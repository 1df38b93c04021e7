import { numberFormatIn } from '../layout/number-format.js';
import { diagnostic, failure, success, type Diagnostic } from '../diagnostics/diagnostic.js';
import { clusterMatrix } from '../derive/reorder.js';
import { isOrdered } from '../fields/types.js';
import { axisTitle } from '../layout/axis.js';
import { frameFor } from '../layout/compose.js';
import { memoized, type LayoutContext } from '../layout/kit-types.js';
import type { LegendSpec } from '../layout/legend.js';
import type { Box } from '../scene/types.js';
import type { Table } from '../table/types.js';
import { heatmapGuides } from './heatmap-guides.js';
import { heatmapGeometry, type DerivedHeatmap, type HeatmapGeometry } from './heatmap-layout.js';
import { dendrogramPaths, rasterCells, vectorCells } from './heatmap-marks.js';
import { matrixOf, planHeatmap, type HeatmapPlan } from './heatmap-plan.js';
import { classLegend } from './colour-classes.js';
import type { FormDef } from './types.js';
import { heatmapAlt, heatmapData } from './heatmap-alt.js';
import { inSentence } from '../fields/labels.js';

const byCodePoint = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/** Rows and columns in drawing order: clustered and leaf-ordered, A→Z (or the key's own order), or as the data give them. */
function deriveHeatmap(table: Table, plan: HeatmapPlan, ctx: LayoutContext) {
  const m = matrixOf(ctx, table, plan);
  if (m.rows.length === 0 || m.columns.length === 0) {
    return failure<DerivedHeatmap>([...m.diagnostics, diagnostic('derive.no-rows', 'no row has both keys and a value to draw', { field: plan.value.name, hint: 'check that the key and value columns are filled in' })]);
  }
  const problems: Diagnostic[] = [...m.diagnostics];
  if (m.missing > 0) {
    problems.push(diagnostic('derive.missing-cells', `${m.missing} of ${m.rows.length * m.columns.length} cells have no value; they are drawn hatched, not as zero${plan.order === 'cluster' ? ', and clustering compares rows and columns over the cells they share' : ''}`, {
      field: plan.value.name, found: `${m.missing} missing cells`, hint: 'add rows for the missing pairs if they have values (a true zero must be written as 0)',
    }));
  }
  const identity = (labels: string[]) => labels.map((_, i) => i);
  // Keys with an order of their own are already in it (and never clustered); categorical ones sort by code point for `label`.
  const sorted = (labels: string[], ordered: boolean) => (plan.order === 'label' && !ordered ? identity(labels).sort((a, b) => byCodePoint(labels[a]!, labels[b]!)) : identity(labels));
  const sides = { rows: plan.order === 'cluster' && !isOrdered(plan.rows.type), columns: plan.order === 'cluster' && !isOrdered(plan.columns.type) };
  const clustered = sides.rows || sides.columns ? clusterMatrix(m, plan.cluster, sides) : {};
  return success<DerivedHeatmap>({
    query: plan, matrix: m,
    rowOrder: clustered.rows?.order ?? sorted(m.rows, isOrdered(plan.rows.type)), columnOrder: clustered.columns?.order ?? sorted(m.columns, isOrdered(plan.columns.type)),
    rowTree: clustered.rows?.tree, columnTree: clustered.columns?.tree,
  }, problems);
}

const legendOf = (d: DerivedHeatmap): LegendSpec => classLegend(d.query.value, d.query.classes);

function missingNote(d: DerivedHeatmap): string[] {
  const n = d.matrix.missing;
  if (n === 0) return [];
  return [`${numberFormatIn(d.query.value.locale, ',')(n)} cell${n === 1 ? ' has' : 's have'} no value: drawn ${d.query.raster ? 'in grey' : 'hatched'}, not as zero.`];
}

const SKIPPED_NAMES = 4;

/** "No rows for 3 Jun 2025, 5 Jun 2025: drawn as rows of hatched cells." naming the dates put back, shortened to a count when long. */
function skippedNote(d: DerivedHeatmap): string[] {
  const { inserted } = d.matrix;
  if (!inserted) return [];
  const side = inserted.rows.length ? 'rows' : 'columns';
  const all = [...inserted.rows, ...inserted.columns];
  const shown = all.slice(0, SKIPPED_NAMES).join(', ');
  const more = all.length > SKIPPED_NAMES ? ` and ${all.length - SKIPPED_NAMES} more` : '';
  return [`No rows for ${shown}${more}: drawn as ${all.length === 1 ? `a ${side.slice(0, -1)}` : side} of ${d.query.raster ? 'grey' : 'hatched'} cells.`];
}

const ordinal = (k: number) => (k === 2 ? 'second' : `${k}th`);

function thinNote(g: HeatmapGeometry, d: DerivedHeatmap): string[] {
  const part = (k: number, n: number, what: string) => (k > 1 ? [`every ${ordinal(k)} of ${numberFormatIn(d.query.value.locale, ',')(n)} ${what}`] : []);
  const parts = [...part(g.rowStep, d.rowOrder.length, 'rows'), ...part(g.columnStep, d.columnOrder.length, 'columns')];
  return parts.length ? [`Too many to label each at this size: labelled are ${parts.join(' and ')}.`] : [];
}

/** The notes and the body they leave: a note on thinned labels is kept only when the body with it still needs thinning. */
function layoutOf(d: DerivedHeatmap, ctx: LayoutContext): { notes: string[]; geometry: (body: Box) => HeatmapGeometry } {
  return memoized(ctx, 'heatmap\u0000notes', () => {
    const base = [...skippedNote(d), ...missingNote(d)];
    const probe = (notes: string[]) => heatmapGeometry(d, frameFor(legendOf(d), notes, ctx).body, ctx);
    const withThin = [...base, ...thinNote(probe([...base, 'x']), d)];
    const notes = withThin.length > base.length ? [...base, ...thinNote(probe(withThin), d)] : base;
    return { notes, geometry: (body: Box) => heatmapGeometry(d, body, ctx) };
  });
}

/**
 * The heat map: a matrix of two keys, each cell coloured by its value's class; rows and
 * columns clustered and leaf-ordered with dendrograms beside and above (unless ordered by label
 * or data); beyond RASTER_CELLS cells, one embedded raster.
 */
export const HEATMAP: FormDef<HeatmapPlan, DerivedHeatmap> = {
  name: 'heatmap',
  noun: 'heat map',
  traits: { lengthCoded: false, connectsKey: false, radial: false, coloursCategories: false, axisPerValue: false },
  plan: planHeatmap,
  derive: deriveHeatmap,
  legend: legendOf,
  data: heatmapData,
  alt: heatmapAlt,
  words(d, ctx) {
    const value = axisTitle(d.query.value, d.query.value.label);
    const [nr, nc] = [d.matrix.rows.length, d.matrix.columns.length];
    const how = d.rowTree && d.columnTree ? 'rows and columns clustered by similarity' : d.rowTree ? 'rows clustered by similarity' : d.columnTree ? 'columns clustered by similarity' : `rows and columns in ${d.query.order === 'cluster' ? 'their keys\'' : d.query.order} order`;
    return {
      title: `${value} by ${inSentence(d.query.rows.label)} and ${inSentence(d.query.columns.label)}`,
      description: `Heat map of ${inSentence(value)}: ${nr} ${inSentence(d.query.rows.label)} rows by ${nc} ${inSentence(d.query.columns.label)} columns, ${how}, coloured in ${d.query.classes.classes.length} classes.`,
      notes: layoutOf(d, ctx).notes,
    };
  },
  layoutBody(d, body, ctx) {
    const g = layoutOf(d, ctx).geometry(body);
    const cells = d.query.raster ? { marks: [rasterCells(d, g, ctx)], labels: [] } : vectorCells(d, g, ctx);
    const trees = [
      ...(d.columnTree && g.columnDendrogram ? dendrogramPaths(d.columnTree, d.columnOrder, g.columnDendrogram, true, ctx, 'column') : []),
      ...(d.rowTree && g.rowDendrogram ? dendrogramPaths(d.rowTree, d.rowOrder, g.rowDendrogram, false, ctx, 'row') : []),
    ];
    const guides = heatmapGuides(d, g, ctx);
    const thinned = [[g.rowStep, d.query.rows.name, d.rowOrder.length], [g.columnStep, d.query.columns.name, d.columnOrder.length]] as const;
    const diagnostics = thinned.filter(([k]) => k > 1).map(([k, field, n]) => diagnostic('layout.labels-thinned', `${n} labels do not all fit; every ${ordinal(k)} is shown (the note says so)`, { field, hint: 'make the chart larger with `size:`' }));
    return { marks: [...cells.marks, ...trees], labels: cells.labels, guides: guides.texts, panels: [{ id: 'panel', plot: g.matrix, axes: guides.axes }], diagnostics };
  },
};
