import { max } from 'd3-array';
import type { TextMeasurer } from '../font/measurer.js';
import { layoutFrame, type FrameTexts } from '../layout/frame.js';
import { niceTicks } from '../layout/ticks.js';
import { tickFormatter } from '../layout/number-format.js';
import { lineHeight } from '../layout/text.js';
import type { Style } from '../style/types.js';

/** The narrowest bar band chartwright draws, in px; more bars than fit at this width are folded. */
export const MIN_BAND_PX = 3;

/** What the bar rule measures to choose orientation and capacity. */
export interface BarFit {
  /** Width of the plot for vertical bars, in px. */
  plotWidth: number;
  /** Height of the plot for horizontal bars, in px. */
  plotHeight: number;
  /** Widest key label, in px. */
  widestLabel: number;
  /** Width a vertical band needs to hold the widest label, in px. */
  bandNeeded: number;
  /** Whether every label fits its band when bars stand upright. */
  labelsFitUpright: boolean;
  verticalCapacity: number;
  horizontalCapacity: number;
}

/**
 * Measures whether bars with these labels fit upright in the frame, and how many bars each
 * orientation can hold at MIN_BAND_PX. The frame is measured with two note lines reserved, as
 * the note of a folded chart can wrap to two, so the capacity is never overestimated.
 */
export function measureBarFit(labels: readonly string[], valueExtent: [number, number], texts: FrameTexts, style: Style, size: { width: number; height: number }, measure: TextMeasurer): BarFit {
  const frame = layoutFrame({ ...texts, notes: [...texts.notes, 'Others', 'Others'] }, style, size, measure);
  const tick = style.text.tick;
  const factor = style.spacing.lineHeight;
  const ticks = niceTicks(Math.min(0, valueExtent[0]), Math.max(0, valueExtent[1]), 6, true);
  const fmt = tickFormatter(ticks);
  const tickWidth = Math.max(...ticks.map((t) => measure.width(fmt(t), tick.size, tick.weight)));
  const axisBlock = lineHeight(tick, factor) + style.spacing.tickGap + lineHeight(style.text.axisTitle, factor) + style.spacing.tickGap;
  const widestLabel = max(labels, (l) => measure.width(l, tick.size, tick.weight)) ?? 0;
  const plotWidth = frame.body.width - tickWidth - style.spacing.tickGap;
  const plotHeight = frame.body.height - axisBlock - lineHeight(style.text.axisTitle, factor) - style.spacing.tickGap;
  const bandNeeded = widestLabel + 2 * style.spacing.tickGap;
  const n = Math.max(1, labels.length);
  return {
    plotWidth, plotHeight, widestLabel, bandNeeded,
    labelsFitUpright: bandNeeded * n <= plotWidth,
    verticalCapacity: Math.max(1, Math.floor(plotWidth / MIN_BAND_PX)),
    horizontalCapacity: Math.max(1, Math.floor(plotHeight / MIN_BAND_PX)),
  };
}
