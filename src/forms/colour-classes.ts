import { divergingClasses, sequentialClasses, type ColourClasses } from '../derive/classes.js';
import type { Decision } from '../choose/types.js';
import type { FieldRef } from '../fields/types.js';
import { axisTitle } from '../layout/axis.js';
import type { LegendSpec } from '../layout/legend.js';
import { labelStyle, valueFormatter } from '../layout/number-format.js';
import type { Style } from '../style/types.js';

/** Sequential classes (`equalOnly`: never quantiles), or diverging ones around a declared midpoint or zero when the data straddle it; each with its rule. */
export function chooseClasses(cells: Float64Array, value: FieldRef, midpoint: number | undefined, style: Style, decisions: Decision[], equalOnly = false): ColourClasses {
  const values = cells.filter((v) => !Number.isNaN(v)).sort();
  const [lo, hi] = values.length ? [values[0]!, values[values.length - 1]!] : [0, 0];
  const straddles = lo < 0 && hi > 0;
  if (midpoint !== undefined || straddles) {
    const centre = midpoint ?? 0;
    const classes = divergingClasses(lo, hi, centre, style.palette.diverging);
    decisions.push({ decision: `diverging colours around ${centre}, ${classes.classes.length} classes of equal width`, rule: midpoint !== undefined ? `\`fields.${value.name}.midpoint\` declares ${centre} a meaningful centre, so values are read as above or below it` : 'the values straddle zero, so they are read as above or below it; equal steps each side, the same lightness at the same distance' });
    return classes;
  }
  const classes = values.length ? sequentialClasses(values, style.palette.sequential, equalOnly) : { method: 'equal-interval' as const, classes: [] };
  const how = classes.method === 'quantile' ? 'quantile classes (about as many values in each)' : 'equal-interval classes with round boundaries';
  decisions.push({ decision: `sequential colours in ${classes.classes.length} ${how}`, rule: `a reader tells only about 10 steps of one colour apart, so values are binned and the legend states each class's bounds (common practice); ${classes.method === 'quantile' ? 'equal intervals would put more than half the values in one class' : equalOnly ? 'equal intervals, always here: with items in value order, each colour\'s band is the share of items in its class, which quantile classes would make all equal' : 'equal intervals keep equal value differences as equal colour steps'}` });
  return classes;
}


/** The binned legend of a value's colour classes: each class's colour and its bounds, formatted as the value is. */
export function classLegend(value: FieldRef, { classes }: ColourClasses): LegendSpec {
  return { kind: 'binned', field: value.name, title: axisTitle(value, value.label), bins: classes.map((c) => ({ from: c.from, to: c.to, fill: c.fill })), format: valueFormatter(classes.flatMap((c) => [c.from, c.to]), labelStyle(value)) };
}
