import type { StackCapacity } from '../derive/stack-fit.js';
import { plotFor } from '../layout/compose.js';
import type { LayoutContext } from '../layout/kit-types.js';
import { MIN_BAND_PX } from './bar.js';
import { domainsWith, legendSpec } from './stack-layout.js';
import type { StackPlan } from './stack-plan.js';
import { stackWords } from './stack-text.js';

/**
 * How many stacks the group axis holds at MIN_BAND_PX (the bar chart's narrowest band), measured
 * with the composer's own plot box, the stacks' notes and a legend (the legend is assumed, so the
 * count never exceeds what a chart with one holds).
 */
export function stackCapacity(ctx: LayoutContext): StackCapacity<StackPlan> {
  return (derived) => {
    const { plot } = plotFor(domainsWith(derived, legendSpec(derived, ctx)), stackWords(derived).notes, ctx).box;
    return Math.floor((derived.query.orientation === 'vertical' ? plot.width : plot.height) / MIN_BAND_PX);
  };
}
