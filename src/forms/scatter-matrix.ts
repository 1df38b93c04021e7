import { extent, max } from 'd3-array';
import { success } from '../diagnostics/diagnostic.js';
import { histogram } from '../derive/histogram.js';
import type { ProfileItem } from '../derive/profile.js';
import { keyText } from '../fields/labels.js';
import { axisTitle } from '../layout/axis.js';
import type { BodyMarks } from '../layout/chart.js';
import { ticksFor, type LayoutContext } from '../layout/kit-types.js';
import type { LegendSpec } from '../layout/legend.js';
import { linearScale, type LinearScale } from '../layout/scales.js';
import { lineHeight, textBoxHeight, textNode, truncateText } from '../layout/text.js';
import type { AxisInfo, Box, PanelInfo, SceneNode, TextNode } from '../scene/types.js';
import { columnOf } from '../table/types.js';
import { completeItems } from './parallel-plan.js';
import { planScatterMatrix, type ScatterMatrixPlan } from './scatter-matrix-plan.js';
import { clearAlong, tickRow } from './scatter-matrix-ticks.js';
import type { FormDef } from './types.js';
import { scatterMatrixAlt } from './relation-alt.js';

/** The items, each one's class (when coloured), and each attribute's extent. */
export interface DerivedMatrix {
  plan: ScatterMatrixPlan;
  items: ProfileItem[];
  classes: (string | null)[];
  levels: string[];
  extents: [number, number][];
}

/** Space between cells, and inside a cell's frame around its points, px. */
const GAP = 8;
const PAD = 4;
const POINT_AREA = 16;

/**
 * Widest a cell may be against its height: cells take the width a wide frame gives (room for the
 * attribute names) without stretching the point clouds beyond recognition (common practice).
 */
const MAX_CELL_ASPECT = 1.5;

interface Grid { x0: number; y0: number; stepX: number; stepY: number; cellW: number; cellH: number; xs: LinearScale[]; ys: LinearScale[] }

/** One shared cell size for all p × p cells (up to MAX_CELL_ASPECT times wider than tall), with room at the left and bottom for the outer tick labels. */
function gridIn(derived: DerivedMatrix, body: Box, ctx: LayoutContext): Grid {
  const { measure, style } = ctx;
  const { tick } = style.text;
  const p = derived.plan.attributes.length;
  const probe = Math.min(body.width, body.height) / p - GAP;
  const widest = max(derived.extents.slice(1), ([lo, hi]) => max(ticksFor(ctx, lo, hi, probe, 'vertical', undefined).labels, (l) => measure.width(l, tick.size, tick.weight))) ?? 0;
  const left = widest + style.spacing.tickGap;
  const bottom = style.spacing.tickGap + lineHeight(tick, style.spacing.lineHeight);
  const stepY = Math.max(0, Math.min((body.width - left) / p, (body.height - bottom) / p));
  const stepX = Math.max(0, Math.min((body.width - left) / p, stepY * MAX_CELL_ASPECT));
  const [cellW, cellH] = [Math.max(0, stepX - GAP), Math.max(0, stepY - GAP)];
  // Centred across the body when the height is what limits the grid.
  const [x0, y0] = [body.x + left + Math.max(0, (body.width - left - p * stepX) / 2), body.y];
  const xs = derived.extents.map(([lo, hi], j) => linearScale(ticksFor(ctx, lo, hi, Math.max(1, cellW - 2 * PAD), 'horizontal', undefined), [x0 + j * stepX + PAD, x0 + j * stepX + cellW - PAD]));
  const ys = derived.extents.map(([lo, hi], i) => linearScale(ticksFor(ctx, lo, hi, Math.max(1, cellH - 2 * PAD), 'vertical', undefined), [y0 + i * stepY + cellH - PAD, y0 + i * stepY + PAD]));
  return { x0, y0, stepX, stepY, cellW, cellH, xs, ys };
}

const cellBox = (g: Grid, i: number, j: number): Box => ({ x: g.x0 + j * g.stepX, y: g.y0 + i * g.stepY, width: g.cellW, height: g.cellH });

function axisInfo(orient: 'left' | 'bottom', field: string, title: string, s: LinearScale): AxisInfo {
  return { orient, scale: 'linear', field, title, domain: s.domain, ticks: s.ticks, tickPositions: s.ticks.map(s.map), range: s.range };
}

/** A cell of the lower triangle: its frame (the panel, with its pair of fields) and one point per item. */
function pairCell(derived: DerivedMatrix, g: Grid, i: number, j: number, fills: Map<string | null, string>, ctx: LayoutContext): { nodes: SceneNode[]; panel: PanelInfo } {
  const [fx, fy] = [derived.plan.attributes[j]!, derived.plan.attributes[i]!];
  const box = cellBox(g, i, j);
  const key = derived.plan.key?.name ?? 'item';
  const nodes: SceneNode[] = [{ kind: 'rect', id: ctx.id('panel', `${fx.name} ${fy.name}`), role: 'panel', datum: { x: fx.name, y: fy.name }, ...box, fill: 'none', stroke: ctx.style.lines.grid, strokeWidth: 1 }];
  derived.items.forEach((item, n) => {
    const r = Math.sqrt(POINT_AREA / Math.PI);
    nodes.push({ kind: 'circle', id: ctx.id('point', `${fx.name} ${fy.name} ${item.label}`), role: 'point', cx: g.xs[j]!.map(item.values[j]!), cy: g.ys[i]!.map(item.values[i]!), r, fill: fills.get(derived.classes[n] ?? null)!, ...(derived.plan.opacity < 1 ? { opacity: derived.plan.opacity } : {}), datum: { [key]: item.label, [fx.name]: item.values[j]!, [fy.name]: item.values[i]! } });
  });
  return { nodes, panel: { id: `panel-${fy.name}-${fx.name}`, facet: { x: fx.name, y: fy.name }, plot: box, axes: [axisInfo('bottom', fx.name, axisTitle(fx, fx.label), g.xs[j]!), axisInfo('left', fy.name, axisTitle(fy, fy.label), g.ys[i]!)] } };
}

/** A diagonal cell: the attribute's name at the top and its histogram below, on the column's scale. */
function diagonalCell(derived: DerivedMatrix, g: Grid, i: number, ctx: LayoutContext): SceneNode[] {
  const { style, measure } = ctx;
  const a = derived.plan.attributes[i]!;
  const box = cellBox(g, i, i);
  const title = axisTitle(a, a.label);
  const st = style.text.axisTitle;
  const text = truncateText(measure, title, st, Math.max(0, g.cellW - 2 * PAD));
  const name: TextNode = textNode(measure, { id: ctx.id('panel-title', a.name), role: 'panel-title', text, style: st, x: box.x + box.width / 2, top: box.y + PAD, anchor: 'middle' });
  if (text !== title) name.full = title;
  const bins = histogram(derived.items.map((it) => it.values[i]!), 10);
  const most = max(bins, (b) => b.count) ?? 1;
  const top = box.y + PAD + textBoxHeight(measure, st) + PAD;
  const base = box.y + box.height - PAD;
  const x = g.xs[i]!;
  const bars: SceneNode[] = bins.map((b) => {
    const h = ((base - top) * b.count) / most;
    const [x1, x2] = [x.map(b.from), x.map(b.to)];
    return { kind: 'rect', id: ctx.id('bin', `${a.name} ${b.from}`), role: 'bin', datum: { field: a.name, from: b.from, to: b.to, count: b.count }, x: x1 + 0.5, y: base - h, width: Math.max(0, x2 - x1 - 1), height: h, fill: style.palette.primary };
  });
  return [{ kind: 'rect', id: ctx.id('panel', a.name), role: 'panel', datum: { field: a.name }, ...box, fill: 'none', stroke: style.lines.grid, strokeWidth: 1 }, ...bars, name];
}

/** Each class's fill (or the one primary fill). */
function fillsOf(derived: DerivedMatrix, ctx: LayoutContext): Map<string | null, string> {
  const { categorical, primary } = ctx.style.palette;
  return new Map<string | null, string>([[null, primary], ...derived.levels.map((l, k) => [l, categorical[k % categorical.length]!] as [string, string])]);
}

function layoutMatrix(derived: DerivedMatrix, body: Box, ctx: LayoutContext): BodyMarks {
  const g = gridIn(derived, body, ctx);
  const p = derived.plan.attributes.length;
  const fills = fillsOf(derived, ctx);
  const marks: SceneNode[] = [];
  const guides: SceneNode[] = [];
  const panels: PanelInfo[] = [];
  for (let i = 0; i < p; i++) {
    guides.push(...diagonalCell(derived, g, i, ctx));
    for (let j = 0; j < i; j++) {
      const c = pairCell(derived, g, i, j, fills, ctx);
      marks.push(...c.nodes);
      panels.push(c.panel);
    }
  }
  const bottom = g.y0 + (p - 1) * g.stepY + g.cellH;
  const gap = ctx.style.spacing.tickGap;
  guides.push(...clearAlong('bottom', derived.plan.attributes.flatMap((a, j) => tickRow('bottom', a.name, g.xs[j]!, bottom, ctx)), gap));
  guides.push(...clearAlong('left', derived.plan.attributes.slice(1).flatMap((a, i) => tickRow('left', a.name, g.ys[i + 1]!, g.x0, ctx)), gap / 2));
  return { marks, labels: [], guides, panels, diagnostics: [] };
}

/**
 * The scatterplot matrix: each pair of 3 to 12 attributes in the lower triangle of equal cells,
 * each attribute named on the diagonal with its histogram, points translucent as items grow.
 */
export const SCATTER_MATRIX: FormDef<ScatterMatrixPlan, DerivedMatrix> = {
  name: 'scatter-matrix',
  noun: 'scatterplot matrix',
  traits: { lengthCoded: false, connectsKey: false, radial: false, coloursCategories: true, axisPerValue: true },
  plan: planScatterMatrix,
  derive(table, plan, ctx) {
    const complete = completeItems(table, plan.attributes, plan.key, ctx);
    if (!complete.ok) return complete;
    const items = complete.value;
    const column = plan.color && columnOf(table, plan.color.name);
    const classes = items.map((it) => (column ? keyText(column, it.row) : null));
    const levels = plan.color ? plan.color.levels.filter((l) => classes.includes(l)) : [];
    const extents = plan.attributes.map((_, k) => extent(items, (it) => it.values[k]) as [number, number]);
    return success({ plan, items, classes, levels, extents }, complete.diagnostics);
  },
  legend(derived, ctx): LegendSpec | undefined {
    if (!derived.plan.color) return undefined;
    const fills = fillsOf(derived, ctx);
    return { kind: 'categorical', field: derived.plan.color.name, title: derived.plan.color.label, entries: derived.levels.map((l) => ({ label: l, fill: fills.get(l)! })) };
  },
  layoutBody: layoutMatrix,
  alt: (derived) => scatterMatrixAlt(derived.plan.attributes, derived.items),
  words(derived) {
    const p = derived.plan.attributes.length;
    return {
      title: `${p} attributes of ${derived.items.length} items, pair by pair`,
      description: `Scatterplot matrix of ${derived.items.length} items: ${(p * (p - 1)) / 2} panels, one for each pair of ${derived.plan.attributes.map((a) => a.label).join(', ')}.`,
      notes: [],
    };
  },
};
