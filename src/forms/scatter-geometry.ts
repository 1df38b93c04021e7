import { extent } from 'd3-array';
import type { LinearFit } from '../derive/fit.js';
import type { ScatterPoint } from '../derive/scatter-points.js';
import { axisTitle } from '../layout/axis.js';
import type { LegendSpec } from '../layout/legend.js';
import { SHAPES, type ShapeName } from '../layout/symbols.js';
import type { Style } from '../style/types.js';
import type { FieldRef } from '../fields/types.js';

/** Radius of a plain point, px (common practice: 3–4 px reads as a dot, not a blob). */
export const POINT_RADIUS = 3.5;
/** Radii are scaled by this when overlapping points are drawn smaller, and drawn at this opacity. */
export const SMALL_FACTOR = 0.6;
export const TRANSLUCENT = 0.5;
/** Circumradius of a density hexagon, px. */
export const HEX_RADIUS = 7;

/** The largest circle of an area coding, px: a sixteenth of the plot's smaller side, within 8–24 px (common practice). */
export function maxAreaRadius(plot: { width: number; height: number }): number {
  return Math.max(8, Math.min(24, Math.min(plot.width, plot.height) / 16));
}

/** The span [lo, hi] of some values, widened by `pad` of its length at each end but not across zero (a lone value gets ±10 %, or ±1 at zero). */
function padded(values: Iterable<number>, pad: number): [number, number] {
  const [lo, hi] = extent(values) as [number | undefined, number | undefined];
  if (lo === undefined || hi === undefined) return [0, 1];
  if (hi === lo) { const d = Math.abs(lo) * 0.1 || 1; return [lo - d, hi + d]; }
  // Room for the marks never carries an axis across zero: all-positive values (a distance, a
  // count) get no negative ticks, all-negative ones no positive ticks.
  const [a, b] = [lo - (hi - lo) * pad, hi + (hi - lo) * pad];
  return [lo >= 0 ? Math.max(0, a) : a, hi <= 0 ? Math.min(0, b) : b];
}

/**
 * The x and y spans the axes must cover: every point, the ends of the fitted line, and room for
 * the largest mark (`reachPx`) at the edges of a plot of `plot` px. Zero is not forced in:
 * position, not length, shows the values.
 */
export function scatterExtents(points: readonly ScatterPoint[], fit: LinearFit | undefined, plot: { width: number; height: number }, reachPx: number): { x: [number, number]; y: [number, number] } {
  const x = padded(points.map((p) => p.x), reachPx / Math.max(1, plot.width - 2 * reachPx));
  const [xlo, xhi] = extent(points, (p) => p.x) as [number, number];
  const ends = fit ? [fit.intercept + fit.slope * xlo, fit.intercept + fit.slope * xhi] : [];
  const y = padded([...points.map((p) => p.y), ...ends], reachPx / Math.max(1, plot.height - 2 * reachPx));
  return { x, y };
}

/** What a scatter codes beyond position, as its legends need it. */
export interface Codings {
  color?: FieldRef;
  shape?: FieldRef;
  area?: FieldRef;
  colorLevels: string[];
  shapeLevels: string[];
  maxArea: number;
  maxRadius: number;
}

/** The colour of a colour level (the style's categorical palette in order), or the primary colour when none is coded. */
export function fillOf(level: string | undefined, levels: readonly string[], style: Style): string {
  if (level === undefined) return style.palette.primary;
  return style.palette.categorical[levels.indexOf(level) % style.palette.categorical.length]!;
}

/** The shape of a shape level (d3-shape's area-matched symbols in order), or a circle when none is coded. */
export function shapeOf(level: string | undefined, levels: readonly string[]): ShapeName {
  return level === undefined ? 'circle' : SHAPES[levels.indexOf(level) % SHAPES.length]!;
}

/** The legends a scatter of points needs: colour (merged with shape when both code one field), shape, circle size. */
export function pointLegends(c: Codings, style: Style): LegendSpec[] {
  const legends: LegendSpec[] = [];
  const sameField = c.color && c.shape && c.color.name === c.shape.name;
  if (c.color && !sameField) legends.push({ kind: 'categorical', field: c.color.name, title: c.color.label, entries: c.colorLevels.map((l) => ({ label: l, fill: fillOf(l, c.colorLevels, style) })) });
  if (c.shape) {
    const fill = (l: string) => (sameField ? fillOf(l, c.colorLevels, style) : style.palette.others);
    legends.push({ kind: 'shape', field: c.shape.name, title: c.shape.label, entries: c.shapeLevels.map((l) => ({ label: l, shape: shapeOf(l, c.shapeLevels), fill: fill(l) })) });
  }
  if (c.area && c.maxArea > 0) legends.push({ kind: 'size', field: c.area.name, title: axisTitle(c.area, c.area.label), maxValue: c.maxArea, maxRadius: c.maxRadius, fill: style.background, stroke: style.lines.axis, ...(c.area.locale ? { locale: c.area.locale } : {}) });
  return legends;
}
