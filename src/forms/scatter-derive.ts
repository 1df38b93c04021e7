import { extent, max } from 'd3-array';
import { diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import { densityBins, type DensityBin } from '../derive/density.js';
import type { LinearFit } from '../derive/fit.js';
import { countClasses } from '../derive/hexbin.js';
import { negativeAreaError, type ScatterPoint } from '../derive/scatter-points.js';
import type { LayoutContext } from '../layout/kit-types.js';
import type { Style } from '../style/types.js';
import type { Table } from '../table/types.js';
import { HEX_RADIUS, scatterExtents } from './scatter-geometry.js';
import { fitOf, maxAreaOf, pointsOf, type ScatterPlan } from './scatter-plan.js';

/** Most colour classes of a density legend (common practice: about seven steps of one hue can be told apart). */
const MAX_CLASSES = 7;

/** A class of bin counts, inclusive, and its colour. */
export interface CountClass { from: number; to: number; fill: string }

/** The numbers a scatter draws: its points (or their density), the spans of its axes and the fit. */
export interface DerivedScatter {
  plan: ScatterPlan;
  points: ScatterPoint[];
  spans: { x: [number, number]; y: [number, number] };
  maxArea: number;
  fit?: LinearFit;
  /** Rows left out for missing values. */
  leftOut: number;
  bins?: DensityBin[];
  classes?: CountClass[];
}

/** Count classes coloured from the style's sequential ramp, skipping its palest step (too faint on the page), darkest for the most. */
function classesOf(maxCount: number, style: Style): CountClass[] {
  const ramp = style.palette.sequential.slice(1);
  const classes = countClasses(maxCount, Math.min(MAX_CLASSES, ramp.length));
  const at = (k: number) => (classes.length === 1 ? ramp.length - 1 : Math.round((k * (ramp.length - 1)) / (classes.length - 1)));
  return classes.map((c, k) => ({ ...c, fill: ramp[at(k)]! }));
}

function fitProblem(n: number): Diagnostic {
  return diagnostic('derive.fit-not-possible', `no least-squares line is drawn: it needs at least 3 points and x and y that both vary (${n} point${n === 1 ? '' : 's'} here)`, {
    path: '/fit', hint: 'remove `fit: linear`, or chart more rows with varying values',
  });
}

/** The binned density of the points, and the spans widened to hold every hexagon whole. */
function binned(points: ScatterPoint[], plan: ScatterPlan, spans: DerivedScatter['spans'], style: Style): Pick<DerivedScatter, 'bins' | 'classes' | 'spans'> {
  const bins = densityBins(points, spans, plan.measured, HEX_RADIUS);
  const corners = bins.flatMap((b) => b.corners);
  const [xlo, xhi] = extent(corners, (c) => c.x) as [number, number];
  const [ylo, yhi] = extent(corners, (c) => c.y) as [number, number];
  return {
    bins, classes: classesOf(max(bins, (b) => b.count) ?? 1, style),
    spans: { x: [Math.min(spans.x[0], xlo), Math.max(spans.x[1], xhi)], y: [Math.min(spans.y[0], ylo), Math.max(spans.y[1], yhi)] },
  };
}

/**
 * The derive stage for a scatter: the points (rows missing a value left out, negative area values
 * refused, naming their rows), the fit, the spans of the axes, and, when planned, the density.
 */
export function deriveScatter(table: Table, plan: ScatterPlan, ctx: LayoutContext): Outcome<DerivedScatter> {
  const read = pointsOf(table, plan, ctx);
  const problems = [...read.diagnostics];
  if (read.negativeArea.length) return failure([...problems, negativeAreaError(read.negativeArea, plan.area!.name, table)]);
  const { points } = read;
  if (points.length === 0) {
    return failure([...problems, diagnostic('derive.no-rows', 'no row has both an x and a y value, so there is nothing to draw', {
      file: table.origin.file, hint: 'check that `values:` names the two numeric columns you meant', expected: 'at least one complete row',
    })]);
  }
  const fit = fitOf(points, plan.fit);
  if (plan.fit && !fit) problems.push(fitProblem(points.length));
  const reach = plan.mode === 'binned' ? HEX_RADIUS : plan.radius;
  const spans = scatterExtents(points, fit, plan.measured, reach);
  const leftOut = table.rowCount - points.length;
  const base = { plan, points, spans, maxArea: maxAreaOf(points), leftOut, ...(fit ? { fit } : {}) };
  return success(plan.mode === 'binned' ? { ...base, ...binned(points, plan, spans, ctx.style) } : base, problems);
}
