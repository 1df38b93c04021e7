import { max } from 'd3-array';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import type { Box } from '../scene/types.js';
import type { ValueTicks } from './axis.js';
import { memoized, ticksFor, type BandChannel, type CartesianDomains, type LayoutContext } from './kit-types.js';
import { bandScale, type BandScale } from './scales.js';
import { timeScale, type TimeScale } from './time-scale.js';
import { capText, fitLabel, lineHeight, textBoxHeight } from './text.js';

/** Longest share of the body the labels of a left band axis may take (wrapped, then shortened). */
export const MAX_LABEL_SHARE = 0.4;

/** A left band axis's labels, fitted to the label column. */
export interface FittedBandLabels {
  band: BandScale;
  /** Each category's label as lines (wrapped onto two where the band allows). */
  lines: string[][];
  /** Which labels were shortened with an ellipsis. */
  shortened: boolean[];
  /** Width of the widest line, in px. */
  widest: number;
  diagnostics: Diagnostic[];
}

/** How the left axis was measured: a probe of its ticks, or its fitted band labels. */
export type LeftFit = { kind: 'linear'; probe: ValueTicks } | { kind: 'time'; probe: TimeScale } | ({ kind: 'band' } & FittedBandLabels);

/** About how many ticks a continuous axis of this length gets (common practice: one per 50 px upright, 90 px across). */
export function tickCount(length: number, direction: 'vertical' | 'horizontal'): number {
  return Number.isFinite(length) ? Math.max(2, Math.round(length / (direction === 'vertical' ? 50 : 90)) + 1) : 2;
}

/** The plot box and what was measured to find it. */
export interface PlotBox {
  plot: Box;
  left: LeftFit;
}

/** Key labels of a left band axis, each fitted to the label column: wrapped onto two lines where the band allows. */
function fitBandLabels(channel: BandChannel, band: BandScale, body: Box, ctx: LayoutContext): FittedBandLabels {
  const { style, measure } = ctx;
  const { tick } = style.text;
  const maxLabel = body.width * MAX_LABEL_SHARE;
  const twoLines = band.step >= 2 * lineHeight(tick, style.spacing.lineHeight);
  // A long label wraps onto a second line where the band is tall enough, and is shortened only beyond that.
  const lines = twoLines ? 2 : 1;
  const fitted = channel.domain.map((label) => fitLabel(measure, capText(label), tick, maxLabel, lines));
  const truncated = fitted.filter((l) => l.shortened).length;
  const diagnostics = truncated ? [diagnostic('layout.label-truncated', `${truncated} key label${truncated === 1 ? ' is' : 's are'} longer than ${Math.round(maxLabel)} px${twoLines ? ' on two lines' : ''} and shortened with "…"; the full text stays in the SVG title of each bar`, { field: channel.field, hint: 'use shorter labels, or a wider chart with `size:`' })] : [];
  let widest = 0;
  for (const f of fitted) for (const line of f.lines) widest = Math.max(widest, measure.width(line, tick.size, tick.weight));
  return { band, lines: fitted.map((f) => f.lines), shortened: fitted.map((f) => f.shortened), widest, diagnostics };
}

/**
 * The plot box of a chart with a left and a bottom axis: the body less the room the axes need.
 * The only place the plot box is computed; planning (how many bars fit) and drawing both call it
 * (through `plotFor` in compose.ts). `minLeftWidth` widens the left label column when the ticks
 * finally drawn need more than the first measure.
 * The left axis's title sits above the plot, the bottom axis's title below its tick labels.
 */
export function plotBox(body: Box, domains: CartesianDomains, ctx: LayoutContext, minLeftWidth = 0): PlotBox {
  const { style, measure } = ctx;
  const { tick, axisTitle } = style.text;
  const { tickGap, lineHeight: factor } = style.spacing;
  const tickBox = textBoxHeight(measure, tick);
  // A linear left axis's top tick label is centred on the plot's top edge; a band label is centred in its band.
  const top = domains.left.kind === 'linear'
    ? body.y + lineHeight(axisTitle, factor) + tickGap + tickBox / 2
    : body.y + lineHeight(axisTitle, factor) + Math.max(tickGap, tickBox / 2);
  const bottom = body.y + body.height - (tickGap + lineHeight(tick, factor) + tickGap + lineHeight(axisTitle, factor));
  let left: LeftFit;
  let leftWidth: number;
  if (domains.left.kind === 'linear') {
    const [lo, hi] = domains.left.extent;
    const probe = ticksFor(ctx, lo, hi, bottom - top, 'vertical', domains.left);
    left = { kind: 'linear', probe };
    leftWidth = max(probe.labels, (l) => measure.width(l, tick.size, tick.weight)) ?? 0;
  } else if (domains.left.kind === 'time') {
    const probe = timeScale(domains.left.extent, [bottom, top], tickCount(bottom - top, 'vertical'), undefined, ctx.brief.locale);
    left = { kind: 'time', probe };
    leftWidth = max(probe.labels, (l) => measure.width(l, tick.size, tick.weight)) ?? 0;
  } else {
    const band = bandScale(domains.left.domain, [top, bottom], style.spacing.bandPadding);
    // Planning and drawing fit the same labels to the same column: once per render.
    const fitted = memoized(ctx, `band-labels\u0000${body.width}\u0000${top}\u0000${bottom}\u0000${domains.left.domain.join('\u0000')}`, () => fitBandLabels(domains.left as BandChannel, band, body, ctx));
    left = { kind: 'band', ...fitted };
    leftWidth = fitted.widest;
  }
  const x = body.x + Math.max(leftWidth, minLeftWidth) + tickGap;
  const right = body.x + body.width - Math.max(0, domains.rightGutter ?? 0);
  return { plot: { x, y: top, width: right - x, height: bottom - top }, left };
}
