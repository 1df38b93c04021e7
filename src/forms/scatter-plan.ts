import { format } from 'd3-format';
import { max } from 'd3-array';
import type { Decision } from '../choose/types.js';
import { diagnostic, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import { leastSquares, type LinearFit } from '../derive/fit.js';
import { overlapShare } from '../derive/overlap.js';
import { areaRadius } from '../derive/point-size.js';
import { readPoints, type PointQuery, type PointsRead, type ScatterPoint } from '../derive/scatter-points.js';
import { refOf, type Fields } from '../fields/types.js';
import { axisTitle } from '../layout/axis.js';
import { plotFor } from '../layout/compose.js';
import { memoized, type CartesianDomains, type LayoutContext } from '../layout/kit-types.js';
import type { LegendSpec } from '../layout/legend.js';
import { idMaker } from '../scene/ids.js';
import type { Box } from '../scene/types.js';
import type { Table } from '../table/types.js';
import { maxAreaRadius, POINT_RADIUS, scatterExtents, SMALL_FACTOR, TRANSLUCENT, pointLegends } from './scatter-geometry.js';
import { scatterDecisions } from './scatter-rationale.js';
import type { Planned, PlanInput } from './types.js';

/** Share of points overlapping another above which points are drawn smaller and translucent (a threshold chosen here). */
export const OVERLAP_WARN = 0.25;
/** Share of points still overlapping when drawn small above which, with BIN_MIN_POINTS or more, the points are binned. */
export const BIN_SHARE = 0.5;
/** Fewest points binned into a density: below it, every point can still be drawn and found (tens of thousands; common practice). */
export const BIN_MIN_POINTS = 10_000;

/** How the points are drawn: as they are, smaller and translucent, or binned into a density. */
export type ScatterMode = 'points' | 'translucent' | 'binned';

/** A scatter's plan: the fields it reads, whether it fits a line, and how overplotting is handled. */
export interface ScatterPlan extends PointQuery {
  fit: boolean;
  mode: ScatterMode;
  /** The plot box the marks were measured in (overlap, and the lattice of density bins). */
  measured: Box;
  /** A plain point's radius, or the largest area circle's, as drawn, px. */
  radius: number;
  opacity: number;
  /** Share of points overlapping another at full size, and when drawn small. */
  overlap: number;
  overlapSmall: number;
}

/** The points of a table for a query, read once per render (plan and derive both need them). */
export function pointsOf(table: Table, query: PointQuery, ctx: Pick<LayoutContext, 'memo'>): PointsRead {
  const names = [query.x, query.y, query.area, query.color, query.shape, query.key].map((f) => f?.name ?? '').join('\u0000');
  return memoized(ctx, `scatter\u0000points\u0000${names}`, () => readPoints(table, query));
}

/** The fields a scatter reads, from the brief's values and codings. */
function queryOf(fields: Fields, brief: PlanInput['brief']): PointQuery {
  const ref = (name: string | undefined) => { const f = name === undefined ? undefined : fields.all.find((a) => a.name === name); return f && refOf(f); };
  const [area, color, shape, key] = [ref(brief.area), ref(brief.color), ref(brief.shape), fields.keys[0] && refOf(fields.keys[0])];
  return { x: refOf(fields.values[0]!), y: refOf(fields.values[1]!), ...(area ? { area } : {}), ...(color ? { color } : {}), ...(shape ? { shape } : {}), ...(key ? { key } : {}) };
}

/** The left (y) and bottom (x) channels of a scatter over these spans, with its legends. */
export function scatterDomains(query: PointQuery, spans: { x: [number, number]; y: [number, number] }, legends: LegendSpec[]): CartesianDomains {
  const channel = (f: PointQuery['x'], name: string, span: [number, number]) => ({ kind: 'linear' as const, name, field: f.name, title: axisTitle(f, f.label), extent: span, format: f.format });
  return { left: channel(query.y, 'y', spans.y), bottom: channel(query.x, 'x', spans.x), first: 'left', ...(legends.length ? { legend: legends } : {}) };
}

/** The largest area value among the points (0 when there is none). */
export const maxAreaOf = (points: readonly ScatterPoint[]) => max(points, (p) => p.area ?? 0) ?? 0;

/** The least-squares fit of the points, when the plan asks for one and it exists. */
export function fitOf(points: readonly ScatterPoint[], wanted: boolean): LinearFit | undefined {
  return wanted ? leastSquares(points.map((p) => p.x), points.map((p) => p.y)) : undefined;
}

/** The plot box a scatter of these points gets (legends included), measured twice: the spans depend on the box. */
function measurePlot(query: PointQuery, points: readonly ScatterPoint[], fit: LinearFit | undefined, input: PlanInput): { plot: Box; spans: ReturnType<typeof scatterExtents> } {
  const { brief, style, measure } = input;
  const ctx: LayoutContext = { brief, style, measure, id: idMaker(), ...(input.memo ? { memo: input.memo } : {}) };
  const levels = (f: PointQuery['color']) => f?.levels ?? [];
  const legendsAt = (plot: Box) => pointLegends({ ...query, colorLevels: levels(query.color), shapeLevels: levels(query.shape), maxArea: maxAreaOf(points), maxRadius: maxAreaRadius(plot) }, style);
  let plot: Box = { x: 0, y: 0, ...brief.size };
  for (let i = 0; i < 2; i++) {
    const reach = query.area ? maxAreaRadius(plot) : POINT_RADIUS;
    plot = plotFor(scatterDomains(query, scatterExtents(points, fit, plot, reach), legendsAt(plot)), [], ctx).box.plot;
  }
  return { plot, spans: scatterExtents(points, fit, plot, query.area ? maxAreaRadius(plot) : POINT_RADIUS) };
}

/** The share of points overlapping another, drawn at radius × `factor` in the measured plot. */
function shareAt(points: readonly ScatterPoint[], plot: Box, spans: ReturnType<typeof scatterExtents>, base: number, factor: number, maxArea: number): number {
  const [[x0, x1], [y0, y1]] = [spans.x, spans.y];
  return overlapShare(points.map((p) => ({
    x: plot.x + ((p.x - x0) / (x1 - x0)) * plot.width,
    y: plot.y + ((y1 - p.y) / (y1 - y0)) * plot.height,
    r: factor * (p.area === undefined ? base : areaRadius(p.area, maxArea, base)),
  }))).share;
}

/** The warning that points overlap so much they are drawn smaller and translucent, suggesting the binned form. */
function overplotted(plan: ScatterPlan, n: number): Diagnostic {
  return diagnostic('layout.overplotted', `${Math.round(plan.overlap * 100)} % of the ${n} points overlap others, so they are drawn smaller and translucent; piled-up points still hide one another`, {
    found: `${Math.round(plan.overlap * 100)} % overlapping`, expected: `at most ${OVERLAP_WARN * 100} %`,
    hint: `a binned density shows where points pile up (drawn from ${format(',d')(BIN_MIN_POINTS)} points): give more rows, or split the rows into one chart per group, or make the chart larger with \`size:\``,
  });
}

/**
 * The scatter's plan: its fields, the fit, and how overplotting is handled, measured in the
 * plot box the chart gets: points overlapping others are drawn smaller and translucent beyond
 * OVERLAP_WARN, and binned into a density when, with BIN_MIN_POINTS or more, half still overlap.
 */
export function planScatter(input: PlanInput): Outcome<Planned<ScatterPlan>> {
  const query = queryOf(input.fields, input.brief);
  const { points } = pointsOf(input.table, query, input);
  const wantsFit = input.brief.fit === 'linear';
  const { plot, spans } = measurePlot(query, points, fitOf(points, wantsFit), input);
  const base = query.area ? maxAreaRadius(plot) : POINT_RADIUS;
  const maxArea = maxAreaOf(points);
  const overlap = points.length ? shareAt(points, plot, spans, base, 1, maxArea) : 0;
  const overlapSmall = overlap > OVERLAP_WARN ? shareAt(points, plot, spans, base, SMALL_FACTOR, maxArea) : overlap;
  const mode: ScatterMode = overlap <= OVERLAP_WARN ? 'points' : points.length >= BIN_MIN_POINTS && overlapSmall > BIN_SHARE ? 'binned' : 'translucent';
  const plan: ScatterPlan = {
    ...query, fit: wantsFit, mode, measured: plot, overlap, overlapSmall,
    radius: mode === 'points' ? base : base * SMALL_FACTOR, opacity: mode === 'points' ? 1 : TRANSLUCENT,
  };
  const decisions: Decision[] = scatterDecisions(plan, points.length);
  return success({ plan, decisions }, mode === 'translucent' ? [overplotted(plan, points.length)] : []);
}
