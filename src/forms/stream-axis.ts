import type { DerivedStream } from '../derive/stream.js';
import { drawBottomBandAxis, drawLinearAxis, drawTimeAxis, type DrawnAxis } from '../layout/axes.js';
import { ticksFor, type LayoutContext } from '../layout/kit-types.js';
import { tickCount } from '../layout/plot-box.js';
import { bandScale, linearScale } from '../layout/scales.js';
import { lineHeight } from '../layout/text.js';
import { timeScale, timeStep, type TimeGrain } from '../layout/time-scale.js';
import type { Box } from '../scene/types.js';

/** The height a bottom axis takes under the plot: its tick labels and its title, with their gaps. */
export function bottomAxisHeight(ctx: LayoutContext): number {
  const { text, spacing } = ctx.style;
  return 2 * spacing.tickGap + lineHeight(text.tick, spacing.lineHeight) + lineHeight(text.axisTitle, spacing.lineHeight);
}

/** The range inside the plot's width that keeps the first and last tick labels inside it. */
function inset(plot: Box, labels: readonly string[], ctx: LayoutContext): [number, number] {
  const { tick } = ctx.style.text;
  const half = (i: number) => (labels.length ? ctx.measure.width(labels[i]!, tick.size, tick.weight) / 2 : 0);
  return [plot.x + half(0), plot.x + plot.width - half(labels.length - 1)];
}

const GRAINS: readonly TimeGrain[] = ['minute', 'hour', 'day', 'week', 'month', 'quarter', 'year'];

/**
 * The finest tick grain: the data's own when ticks picked freely would be finer than the data
 * (monthly data ticked "13 Jan, 27 Jan"), else free. Ticks already at the data's grain or coarser
 * keep their scale, so a chart whose ticks were right is drawn as before.
 */
function finestFor(derived: DerivedStream, extent: [number, number], width: number): TimeGrain {
  const grain = derived.grain === undefined || derived.grain === 'second' ? 'minute' : derived.grain;
  const free = timeStep(Math.min(...extent), Math.max(...extent), tickCount(width, 'horizontal')).grain;
  return GRAINS.indexOf(free) < GRAINS.indexOf(grain) ? grain : 'minute';
}

/**
 * The key axis under a streamgraph and each key's x: a time axis for dates, a linear one for
 * numbers, evenly spaced bands for ordered levels.
 */
export function streamAxis(derived: DerivedStream, plot: Box, body: Box, ctx: LayoutContext): { xs: number[]; axis: DrawnAxis } {
  const { time } = derived.query;
  const keys = derived.keys;
  const extent: [number, number] = [keys[0]!.at, keys[keys.length - 1]!.at];
  const base = { name: 'key', field: time.name, title: time.label };
  if (time.type === 'temporal') {
    const finest = finestFor(derived, extent, plot.width);
    const probe = timeScale(extent, [plot.x, plot.x + plot.width], tickCount(plot.width, 'horizontal'), finest, ctx.brief.locale);
    const [l, r] = inset(plot, probe.labels, ctx);
    const scale = timeScale(extent, [l, r], tickCount(r - l, 'horizontal'), finest, ctx.brief.locale);
    return { xs: keys.map((k) => scale.map(k.at)), axis: drawTimeAxis('bottom', scale, { kind: 'time', ...base, extent, ...(derived.grain ? { grain: derived.grain } : {}) }, plot, body, ctx) };
  }
  if (time.type === 'quantitative') {
    const channel = { kind: 'linear' as const, ...base, extent, format: time.format };
    const [l, r] = inset(plot, ticksFor(ctx, extent[0], extent[1], plot.width, 'horizontal', time.format).labels, ctx);
    const scale = linearScale(ticksFor(ctx, extent[0], extent[1], r - l, 'horizontal', time.format), [l, r]);
    return { xs: keys.map((k) => scale.map(k.at)), axis: drawLinearAxis('bottom', scale, channel, plot, body, ctx) };
  }
  const band = bandScale(keys.map((k) => k.label), [plot.x, plot.x + plot.width], ctx.style.spacing.bandPadding);
  return { xs: keys.map((k) => band.center(k.label)), axis: drawBottomBandAxis(band, { kind: 'band', ...base, domain: band.domain }, plot, body, ctx) };
}
