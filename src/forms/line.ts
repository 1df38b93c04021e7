import { deriveLines, type DerivedLines } from '../derive/lines.js';
import { lineChart } from './line-chart.js';
import { planLine, type LinePlan } from './line-plan.js';
import { lineValueTitle } from './line-text.js';
import type { FormDef } from './types.js';
import { lineAlt } from './line-alt.js';

/** The value extent a line's axis covers: the data's, widened to zero unless the plan leaves zero out. */
function valueExtent(derived: DerivedLines<LinePlan>): [number, number] {
  const [lo, hi] = derived.valueExtent;
  return derived.query.zero ? [Math.min(0, lo), Math.max(0, hi)] : [lo, hi];
}

/**
 * The line chart: one line per series over an ordered key drawn to scale, points in key order,
 * gaps where values are missing (a lone point as a dot), each series named at its end.
 * Position-coded, not length-coded: the value axis may leave zero out when the plan says why.
 * Colour only helps tell lines apart (each is named at its end), so the colour-count hard rule
 * does not bind; more than MAX_SERIES lines are drawn with a warning offering small multiples.
 */
export const LINE: FormDef<LinePlan, DerivedLines<LinePlan>> = {
  noun: 'line chart',
  traits: { lengthCoded: false, connectsKey: true, radial: false, coloursCategories: false, axisPerValue: false },
  plan: planLine,
  derive: (table, plan) => deriveLines(table, plan),
  alt: (d) => lineAlt(d, 'Line chart', lineValueTitle(d.query)),
  ...lineChart<DerivedLines<LinePlan>>('line', { noun: 'Line chart', valueTitle: (d) => lineValueTitle(d.query), valueExtent }),
  name: 'line',
};
