import { areaRadius } from '../derive/point-size.js';
import type { ScatterPoint } from '../derive/scatter-points.js';
import type { LayoutContext, PlotArea } from '../layout/kit-types.js';
import { asLinear } from '../layout/scales.js';
import { symbolNode } from '../layout/symbols.js';
import type { Datum, SceneNode } from '../scene/types.js';
import { fillOf, shapeOf } from './scatter-geometry.js';
import type { DerivedScatter } from './scatter-derive.js';

/** A point's datum: its row's values under their column names. */
function pointDatum(derived: DerivedScatter, p: ScatterPoint): Datum {
  const { plan } = derived;
  const datum: Datum = { [plan.x.name]: p.x, [plan.y.name]: p.y };
  if (plan.area) datum[plan.area.name] = p.area ?? null;
  if (plan.color) datum[plan.color.name] = p.color ?? null;
  if (plan.shape) datum[plan.shape.name] = p.shape ?? null;
  if (plan.key) datum[plan.key.name] = p.key ?? null;
  return datum;
}

/** A point's radius as drawn: the plan's radius, or its area-true share of the largest circle's. */
export function pointRadius(derived: DerivedScatter, p: ScatterPoint): number {
  return p.area === undefined ? derived.plan.radius : areaRadius(p.area, derived.maxArea, derived.plan.radius);
}

/**
 * One mark per point at its x and y on the axes' scales, in its level's colour and shape (equal
 * areas), its area-true size where area is coded. The largest circles are drawn first, so small
 * ones are never hidden under them; otherwise in row order.
 */
export function pointMarks(derived: DerivedScatter, area: PlotArea, ctx: LayoutContext): SceneNode[] {
  const { plan } = derived;
  const [x, y] = [asLinear(area.x), asLinear(area.y)];
  const colors = plan.color?.levels ?? [];
  const shapes = plan.shape?.levels ?? [];
  const order = plan.area ? [...derived.points].sort((a, b) => (b.area ?? 0) - (a.area ?? 0) || a.row - b.row) : derived.points;
  const stroke = plan.area && plan.mode === 'points' ? { stroke: ctx.style.background, strokeWidth: 0.75 } : {};
  return order.map((p) => {
    const [cx, cy, r] = [x.map(p.x), y.map(p.y), pointRadius(derived, p)];
    const shape = shapeOf(p.shape, shapes);
    const paint = { fill: fillOf(p.color, colors, ctx.style), ...stroke, ...(plan.opacity < 1 ? { opacity: plan.opacity } : {}) };
    const node = symbolNode(shape, { id: ctx.id('point', String(p.row)), role: 'point', cx, cy, area: Math.PI * r * r, paint, datum: pointDatum(derived, p) });
    return node.kind === 'path' ? { ...node, shape, at: { cx, cy, r } } : { ...node, shape };
  });
}

/** One hexagon per non-empty bin, coloured by the class of its count. */
export function binMarks(derived: DerivedScatter, area: PlotArea, ctx: LayoutContext): SceneNode[] {
  const [x, y] = [asLinear(area.x), asLinear(area.y)];
  const { plan } = derived;
  const classes = derived.classes ?? [];
  return (derived.bins ?? []).map((b, i) => {
    const fill = (classes.find((c) => b.count <= c.to) ?? classes.at(-1))!.fill;
    const [first, ...rest] = b.corners.map((c) => ({ x: x.map(c.x), y: y.map(c.y) }));
    return {
      kind: 'path', id: ctx.id('bin', String(i + 1)), role: 'bin', fill,
      datum: { [plan.x.name]: b.x, [plan.y.name]: b.y, count: b.count },
      commands: [{ op: 'M', ...first! }, ...rest.map((c) => ({ op: 'L' as const, ...c })), { op: 'Z' }],
    };
  });
}

/** The least-squares line across the points' x range. */
export function fitMark(derived: DerivedScatter, area: PlotArea, ctx: LayoutContext): SceneNode[] {
  const { fit } = derived;
  if (!fit) return [];
  const [x, y] = [asLinear(area.x), asLinear(area.y)];
  let [lo, hi] = [Infinity, -Infinity];
  for (const p of derived.points) { lo = Math.min(lo, p.x); hi = Math.max(hi, p.x); }
  const at = (v: number) => ({ x: x.map(v), y: y.map(fit.intercept + fit.slope * v) });
  return [{
    kind: 'path', id: ctx.id('line', 'least-squares'), role: 'line', stroke: ctx.style.lines.zero, strokeWidth: 1.5,
    datum: { fit: 'least squares', intercept: fit.intercept, slope: fit.slope, r: fit.r, n: fit.n },
    commands: [{ op: 'M', ...at(lo) }, { op: 'L', ...at(hi) }],
  }];
}
