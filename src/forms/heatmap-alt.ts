import { clustersAtLargestGap, cutInto } from '../derive/cut-tree.js';
import { inSentence } from '../fields/labels.js';
import { axisTitle } from '../layout/axis.js';
import { labelStyle, valueFormatter } from '../layout/number-format.js';
import { count, extremesReading, someNames, type AltText } from './alt-words.js';
import type { DerivedHeatmap } from './heatmap-layout.js';
import type { DataTable } from '../scene/types.js';

/** The groups of rows named in the alt text, at most; the rest are counted. */
const GROUPS_NAMED = 3;

/** "3 clusters at the largest gap in the tree: Coot, Teal and Wigeon; Heron and Egret; …", the groups of several rows first, largest first. */
function clusterSentence(d: DerivedHeatmap): string | undefined {
  const tree = d.rowTree;
  if (!tree) return undefined;
  const k = clustersAtLargestGap(tree);
  if (k === undefined) return undefined;
  const ids = cutInto(tree, k);
  // Rows in drawing (leaf) order, so each group's names read as the chart shows them.
  const groups = Array.from({ length: k }, () => [] as string[]);
  for (const r of d.rowOrder) groups[ids[r]!]!.push(d.matrix.rows[r]!);
  const several = groups.filter((g) => g.length > 1).sort((a, b) => b.length - a.length);
  const alone = groups.length - several.length;
  const named = several.slice(0, GROUPS_NAMED).map((g) => someNames(g)).join('; ');
  const rest = several.length > GROUPS_NAMED ? `; ${count(several.length - GROUPS_NAMED, 'more group')}` : '';
  const singles = alone ? `; ${count(alone, 'row')} on ${alone === 1 ? 'its' : 'their'} own` : '';
  return `Cut at the largest gap in the tree, the ${inSentence(d.query.rows.label)} rows form ${count(k, 'cluster')}: ${named}${rest}${singles}.`;
}

/** Heat map: the highest and lowest cells, and the clusters of rows at the tree's largest gap. */
export function heatmapAlt(d: DerivedHeatmap): AltText {
  const value = axisTitle(d.query.value, d.query.value.label);
  const { rows, columns, cells } = d.matrix;
  const what = `Heat map of ${inSentence(value)}, ${count(rows.length, `${inSentence(d.query.rows.label)} row`)} by ${count(columns.length, `${inSentence(d.query.columns.label)} column`)}`;
  // The extreme cells found by index first: a raster heat map may hold a million cells.
  let [lo, hi] = [-1, -1];
  cells.forEach((v, i) => {
    if (Number.isNaN(v)) return;
    if (lo < 0 || v < cells[lo]!) lo = i;
    if (hi < 0 || v > cells[hi]!) hi = i;
  });
  const cell = (i: number) => ({ label: `${rows[Math.floor(i / columns.length)]} at ${columns[i % columns.length]}`, value: cells[i]! });
  // Every cell tied with an end, so that ties are named (or counted) as such.
  const ends = lo < 0 ? [] : [...cells.keys()].filter((i) => cells[i] === cells[hi] || cells[i] === cells[lo]);
  const labelled = ends.map(cell);
  const fmt = valueFormatter(labelled.map((c) => c.value), labelStyle(d.query.value));
  const clusters = clusterSentence(d);
  return { what, reading: extremesReading(labelled, fmt, ['highest', 'lowest']), more: clusters ? [clusters] : [] };
}

/** The cells drawn, row by row in drawing order: row key, column key, value (empty for a cell with no value). */
export function heatmapData(d: DerivedHeatmap): DataTable {
  const { rows, columns, cells } = d.matrix;
  const [r, c, v] = [d.query.rows.name, d.query.columns.name, d.query.value.name];
  const out = d.rowOrder.flatMap((i) => d.columnOrder.map((j) => {
    const value = cells[i * columns.length + j]!;
    return { [r]: rows[i]!, [c]: columns[j]!, [v]: Number.isNaN(value) ? null : value };
  }));
  return { columns: [r, c, v], rows: out };
}
