import type { LegendSpec } from '../layout/legend.js';
import type { SceneNode } from '../scene/types.js';
import { deriveScatter, type DerivedScatter } from './scatter-derive.js';
import { pointLegends } from './scatter-geometry.js';
import { binMarks, fitMark, pointMarks } from './scatter-marks.js';
import { planScatter, scatterDomains, type ScatterPlan } from './scatter-plan.js';
import { scatterWords } from './scatter-text.js';
import type { FormDef } from './types.js';
import { scatterAlt } from './relation-alt.js';

/** The legends of a derived scatter: the density's count classes, or the points' colours, shapes and sizes. */
function legendsOf(derived: DerivedScatter, style: Parameters<typeof pointLegends>[1]): LegendSpec[] {
  const { plan } = derived;
  if (derived.classes) return [{ kind: 'binned', field: 'count', title: 'Points per hexagon', bins: derived.classes, ...(plan.x.locale ? { locale: plan.x.locale } : {}) }];
  return pointLegends({
    ...(plan.color ? { color: plan.color } : {}), ...(plan.shape ? { shape: plan.shape } : {}), ...(plan.area ? { area: plan.area } : {}),
    colorLevels: plan.color?.levels ?? [], shapeLevels: plan.shape?.levels ?? [], maxArea: derived.maxArea, maxRadius: plan.radius,
  }, style);
}

/**
 * The scatter plot: one point per row at its x and y, optionally coloured, shaped and sized
 * (area-true) by other columns, with a least-squares line on request; overplotting is measured
 * and answered with smaller, translucent points or, for tens of thousands, a binned density.
 */
export const SCATTER: FormDef<ScatterPlan, DerivedScatter> = {
  name: 'scatter',
  noun: 'scatter plot',
  // Each value has its own axis (x and y): two values are no mixing of scales on one axis.
  traits: { lengthCoded: false, connectsKey: false, radial: false, coloursCategories: true, axisPerValue: true },
  plan: planScatter,
  derive: deriveScatter,
  domains: (derived, ctx) => scatterDomains(derived.plan, derived.spans, legendsOf(derived, ctx.style)),
  layout(derived, area, ctx) {
    const marks: SceneNode[] = derived.bins ? binMarks(derived, area, ctx) : pointMarks(derived, area, ctx);
    return { marks: [...marks, ...fitMark(derived, area, ctx)], labels: [], diagnostics: [] };
  },
  words: scatterWords,
  alt: scatterAlt,
};
