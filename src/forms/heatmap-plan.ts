import { format } from 'd3-format';
import type { Aggregate } from '../brief/types.js';
import type { Decision } from '../choose/types.js';
import { diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import type { ColourClasses } from '../derive/classes.js';
import { buildMatrix, type ValueMatrix } from '../derive/matrix.js';
import { fillSkippedDates } from '../derive/matrix-dates.js';
import type { ClusterOptions } from '../derive/reorder.js';
import { isOrdered, refOf, type FieldRef } from '../fields/types.js';
import { memoized } from '../layout/kit-types.js';
import type { Table } from '../table/types.js';
import { chooseClasses } from './colour-classes.js';
import type { Planned, PlanInput } from './types.js';

/**
 * Above this many cells (200 × 200) a heat map is drawn as one embedded raster image, not one
 * rect per cell. Measured on golden/marsh-birds: a vector cell with its datum title takes about
 * 150 bytes of SVG, so 40,000 cells would be about 6 MB; the raster takes about a byte a cell
 * before deflate (a clustered 1,000 × 1,000 heat map's SVG is 0.6 MB, bench/matrix.js).
 */
export const RASTER_CELLS = 40_000;

/** How a heat map is drawn: its keys and value, how rows and columns are ordered, and its colour classes. */
export interface HeatmapPlan {
  rows: FieldRef;
  columns: FieldRef;
  value: FieldRef;
  /** cluster: hierarchical clustering and optimal leaf order; label: A→Z (or the key's own order); data: as the rows give them. */
  order: 'cluster' | 'label' | 'data';
  cluster: ClusterOptions;
  aggregate: Aggregate;
  classes: ColourClasses;
  raster: boolean;
}

/** The table as a matrix of the two keys, once per render (planning and deriving both need it). */
export function matrixOf(input: Pick<PlanInput, 'memo'>, table: Table, plan: Pick<HeatmapPlan, 'rows' | 'columns' | 'value' | 'aggregate'>): ValueMatrix {
  const ordered: [boolean, boolean] = [isOrdered(plan.rows.type), isOrdered(plan.columns.type)];
  return memoized(input, `heatmap\u0000matrix\u0000${plan.rows.name}\u0000${plan.columns.name}\u0000${plan.value.name}\u0000${plan.aggregate}`, () => fillSkippedDates(buildMatrix(table, plan.rows, plan.columns, plan.value, plan.aggregate, ordered), table, plan.rows, plan.columns));
}

function chooseOrder(input: PlanInput, problems: Diagnostic[], decisions: Decision[]): HeatmapPlan['order'] {
  const { order } = input.brief;
  if (order === 'value') {
    problems.push(diagnostic(input.lenient ? 'choice.lenient-fallback' : 'choice.order-not-applicable', '`order: value` does not apply to a heat map: its rows and columns have no one value to sort by', {
      path: '/order', found: 'value', expected: 'cluster, label or data', hint: 'remove `order:` to cluster rows and columns, or use `order: label`',
    }));
  }
  if (order === 'label' || order === 'data') {
    decisions.push({ decision: `rows and columns in ${order} order, not clustered`, rule: 'the brief asks for it (`order:`); what is lost: similar rows and columns are no longer side by side, so blocks of similar values may be scattered, and no dendrogram shows how they group' });
    return order;
  }
  return 'cluster';
}

/** Keys with an order of their own (time, numbers, levels, cycles) keep it; the other sides are clustered, each decision stated. */
function orderedSides(keys: [FieldRef, FieldRef], options: ClusterOptions, brief: PlanInput['brief'], decisions: Decision[]): void {
  const kept = keys.filter((k) => isOrdered(k.type));
  for (const k of kept) decisions.push({ decision: `${k === keys[0] ? 'rows' : 'columns'} in the order of \`${k.name}\`, not clustered`, rule: `the key is ${k.type}, so its order carries meaning; reordering it by similarity would hide that order` });
  if (kept.length < 2) clusterDecisions(options, brief, decisions, kept.length ? (kept[0] === keys[0] ? 'columns' : 'rows') : 'rows and columns');
}

function clusterDecisions(options: ClusterOptions, brief: PlanInput['brief'], decisions: Decision[], sides: string): void {
  decisions.push({ decision: `${sides} reordered by hierarchical clustering (${options.linkage} linkage, ${options.distance} distance), then by optimal leaf ordering`, rule: `similar ${sides} side by side let blocks of similar values show; of the orders the tree allows, the one with the least distance between neighbours is drawn (Bar-Joseph, Gifford & Jaakkola 2001); a dendrogram beside each clustered side shows the tree, branch heights to scale` });
  decisions.push(brief.linkage ? { decision: `${options.linkage} linkage`, rule: 'the brief asks for it (`linkage:`)' } : { decision: 'average linkage', rule: 'the default: the distance between two clusters is the mean distance between their members, neither chaining like single linkage nor ruled by the farthest pair like complete linkage' });
  if (brief.distance) decisions.push({ decision: `${options.distance} distance`, rule: options.distance === 'correlation' ? 'the brief asks for it (`distance:`): 1 − Pearson r, so rows that rise and fall together are close whatever their level' : 'the brief asks for it (`distance:`)' });
  if (options.standardize) decisions.push({ decision: 'each row standardized (mean 0, standard deviation 1) before clustering', rule: 'the brief asks for it (`standardize:`): rows are compared by their pattern, not their level; the colours still show the values as given' });
  decisions.push({ decision: 'ties between equal distances broken by input position', rule: 'the lowest row or column position wins, so the same table always gives the same order' });
}

/** The heat map's plan: rows, columns and value, order, clustering, colour classes, and raster or vector cells. */
export function planHeatmap(input: PlanInput): Outcome<Planned<HeatmapPlan>> {
  const { fields, brief, table } = input;
  const [rows, columns] = [refOf(fields.keys[0]!), refOf(fields.keys[1]!)];
  const value = refOf(fields.values[0]!);
  const problems: Diagnostic[] = [];
  const decisions: Decision[] = [];
  const order = chooseOrder(input, problems, decisions);
  if (problems.some((p) => p.severity === 'error')) return failure(problems);
  const cluster: ClusterOptions = { linkage: brief.linkage ?? 'average', distance: brief.distance ?? 'euclidean', standardize: brief.standardize ?? false };
  if (order === 'cluster') orderedSides([rows, columns], cluster, brief, decisions);
  const m = matrixOf(input, table, { rows, columns, value, aggregate: brief.aggregate });
  if (m.combined > 0) decisions.push({ decision: `rows sharing a row and column combined by ${brief.aggregate}`, rule: brief.aggregate === 'sum' ? 'a cell shows one value; rows of the same pair are summed unless `aggregate:` says otherwise' : 'the brief asks for it (`aggregate:`)' });
  const classes = chooseClasses(m.cells, value, brief.fields[value.name]?.midpoint, input.style, decisions);
  const cells = m.rows.length * m.columns.length;
  const raster = cells > RASTER_CELLS;
  if (raster) decisions.push({ decision: `cells drawn as one embedded raster image (${m.columns.length} × ${m.rows.length} pixels, one per cell)`, rule: `more than ${format(',')(RASTER_CELLS)} cells: one rect each would make the SVG many megabytes; the raster keeps every cell's colour exact` });
  if (m.missing > 0) decisions.push({ decision: 'cells with no value drawn outlined and hatched, never coloured', rule: `a missing value is not zero${order === 'cluster' ? '; clustering compares each pair of rows (or columns) over the cells both have (pairwise-complete distances, scaled up to the full length)' : ''}` });
  return success({ plan: { rows, columns, value, order, cluster, aggregate: brief.aggregate, classes, raster }, decisions }, problems);
}
