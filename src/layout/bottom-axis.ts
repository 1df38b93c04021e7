import type { Box } from '../scene/types.js';
import type { LabelRoom, LayoutContext, TimeChannel } from './kit-types.js';
import { tickCount } from './plot-box.js';
import { timeScale, type TimeGrain, type TimeScale } from './time-scale.js';

/** No room taken for a form's labels. */
export const NO_ROOM: LabelRoom = { low: 0, high: 0, show: false };

/**
 * The pixel range of a bottom axis inside the plot's width: inset at each end by half its end
 * tick label (a gap's worth less at the left, where the left axis's labels end) or by the room
 * the form's labels take there, whichever is more.
 */
export function bottomRange(plot: Box, probeLabels: readonly string[], room: LabelRoom, ctx: LayoutContext): [number, number] {
  const { tick } = ctx.style.text;
  const half = (i: number) => (probeLabels.length ? ctx.measure.width(probeLabels[i]!, tick.size, tick.weight) / 2 : 0);
  const rangeLeft = plot.x + Math.max(room.show ? room.low : 0, half(0) - ctx.style.spacing.tickGap);
  const rangeRight = plot.x + plot.width - Math.max(room.show ? room.high : 0, half(probeLabels.length - 1));
  return [rangeLeft, rangeRight];
}

/**
 * A bottom time axis, inset like a linear one so its end labels stay inside the plot's width
 * (the first may reach into the gap left of the plot, as a linear axis's may). The labels drawn
 * can be wider than the probe's ("Jan 2024" where the probe had "2024"): the range is moved in
 * until they fit, so the first never runs under the left axis's lowest label.
 */
export function bottomTime(channel: TimeChannel, plot: Box, ctx: LayoutContext): TimeScale {
  const finest = finestTick(channel);
  const probe = timeScale(channel.extent, [plot.x, plot.x + plot.width], tickCount(plot.width, 'horizontal'), finest, ctx.brief.locale);
  let [rangeLeft, rangeRight] = bottomRange(plot, probe.labels, NO_ROOM, ctx);
  const { tick } = ctx.style.text;
  const half = (l: string | undefined) => ctx.measure.width(l ?? '', tick.size, tick.weight) / 2;
  let scale = timeScale(channel.extent, [rangeLeft, rangeRight], tickCount(rangeRight - rangeLeft, 'horizontal'), finest, ctx.brief.locale);
  for (let i = 0; i < 3; i++) {
    const over = Math.max(0, plot.x - ctx.style.spacing.tickGap - (scale.map(scale.ticks[0] ?? 0) - half(scale.labels[0])));
    const end = scale.ticks.length - 1;
    const past = Math.max(0, scale.map(scale.ticks[end] ?? 0) + half(scale.labels[end]) - (plot.x + plot.width));
    if (over <= 1e-9 && past <= 1e-9) break;
    [rangeLeft, rangeRight] = [rangeLeft + over, rangeRight - past];
    scale = timeScale(channel.extent, [rangeLeft, rangeRight], tickCount(rangeRight - rangeLeft, 'horizontal'), finest, ctx.brief.locale);
  }
  return scale;
}

/** The finest tick grain for a time channel's data grain (seconds are ticked no finer than minutes). */
function finestTick(channel: TimeChannel): TimeGrain {
  return channel.grain === undefined || channel.grain === 'second' ? 'minute' : channel.grain;
}

