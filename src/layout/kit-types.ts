import type { ResolvedBrief } from '../brief/types.js';
import type { Diagnostic } from '../diagnostics/diagnostic.js';
import type { TextMeasurer } from '../font/measurer.js';
import type { Box, SceneNode, TextNode } from '../scene/types.js';
import type { Style } from '../style/types.js';
import { valueTicks, type ValueTicks } from './axis.js';
import type { LegendSpec } from './legend.js';
import type { NumberStyle } from './number-format.js';
import type { BandScale, LinearScale, Scale } from './scales.js';

/** What every layout step receives: the brief, the style, the text measurer, and the chart's id maker. */
export interface LayoutContext {
  brief: ResolvedBrief;
  style: Style;
  measure: TextMeasurer;
  /** Unique ids within one chart, derived from text (see scene/ids.ts). */
  id: (prefix: string, text: string) => string;
  /**
   * Results of measuring within one render (fitted labels, laid-out frames), so planning and
   * drawing measure the same text once. Pure: a cache of deterministic results, never read
   * across renders. Default: none (nothing is remembered).
   */
  memo?: Map<string, unknown>;
}

/** A result computed once per render under `key` (or every time, without a memo). */
export function memoized<T>(ctx: Pick<LayoutContext, 'memo'>, key: string, compute: () => T): T {
  if (!ctx.memo) return compute();
  if (ctx.memo.has(key)) return ctx.memo.get(key) as T;
  const value = compute();
  ctx.memo.set(key, value);
  return value;
}

/** A continuous channel: the data extent its axis must cover. */
export interface LinearChannel {
  kind: 'linear';
  /** Stem of the axis's ids: `tick-<name>`, `axis-title-<name>`. */
  name: string;
  field: string;
  title: string;
  /** [lo, hi] the axis must cover (including zero where the form needs it). */
  extent: [number, number];
  /** The field's d3-format specifier, if any. */
  format?: string;
  /** The field's unit, if any: an SI unit takes SI prefixes in the tick labels (see number-format.ts). */
  unit?: string;
}

/** A categorical channel: one band per category, in order. */
export interface BandChannel {
  kind: 'band';
  name: string;
  field: string;
  title: string;
  domain: string[];
}

/** A time channel: the span of UTC times (epoch ms) its axis must cover, drawn to scale. */
export interface TimeChannel {
  kind: 'time';
  name: string;
  field: string;
  title: string;
  extent: [number, number];
  /** The finest calendar grain its ticks may take: the data's own (no ticks between monthly points). Default: any. */
  grain?: 'year' | 'quarter' | 'month' | 'day' | 'minute' | 'second';
}

/** What a channel of a form spans. */
export type Channel = LinearChannel | BandChannel | TimeChannel;

/** The channels of a chart with a left and a bottom axis, as a form reports them. */
export interface CartesianDomains {
  left: Channel;
  bottom: Channel;
  /** Which axis is listed (and layered) first in the scene. */
  first: 'left' | 'bottom';
  /** Draw a zero line across the plot at 0 of this side's linear scale (length-coded marks). */
  zeroLine?: 'left' | 'bottom';
  /** A legend (or several) the form's colours, shapes or sizes need (the composer places it above or beside the plot). */
  legend?: LegendSpec | LegendSpec[];
  /** Room to keep right of the plot, in px, for labels at the marks' ends (e.g. a line's name at its last point). */
  rightGutter?: number;
}

/**
 * Room a form's own labels need beyond the ends of its marks along a linear axis, in px, and
 * whether they are shown at all. `low` is the end of smaller values, `high` of larger ones.
 */
export interface LabelRoom {
  low: number;
  high: number;
  show: boolean;
}

/** A first look at the scales, before the form's label room is taken, for a form to measure against. */
export interface ScaleProbe {
  plot: Box;
  /** The linear scale over the whole plot. */
  linear: LinearScale;
  band: BandScale | undefined;
  /** Which side the linear scale is on. */
  side: 'left' | 'bottom';
}

/** Where a form draws: the plot box, its scales, and the room its labels were given. */
export interface PlotArea {
  plot: Box;
  /** The bottom axis's scale (horizontal position). */
  x: Scale;
  /** The left axis's scale (vertical position). */
  y: Scale;
  room: LabelRoom;
}

/** A form's marks and their labels; labels are drawn above every mark and guide. */
export interface FormMarks {
  marks: SceneNode[];
  labels: TextNode[];
  diagnostics: Diagnostic[];
}

/** The words a form contributes to the frame and to the accessible text. */
export interface FormWords {
  /** The title when the brief gives none. */
  title: string;
  /** One or two sentences for screen readers. */
  description: string;
  /** Notes printed under the chart: what was folded, combined or left out. */
  notes: string[];
}

/** The ticks of a value axis of this extent and length, chosen once per render (the tick search is the costly part of layout). */
export function ticksFor(ctx: LayoutContext, lo: number, hi: number, length: number, direction: 'vertical' | 'horizontal', number: string | NumberStyle | undefined): ValueTicks {
  const style = numberStyleIn(ctx, number);
  return memoized(ctx, `ticks\u0000${lo}\u0000${hi}\u0000${length}\u0000${direction}\u0000${style.format ?? ''}\u0000${style.unit ?? ''}\u0000${style.notation ?? ''}\u0000${style.locale ?? ''}`, () => valueTicks(lo, hi, length, direction, ctx.style.text.tick, ctx.measure, style));
}

/** How a channel's numbers are written in this chart: its format and unit, and the brief's notation and locale. */
export function numberStyleIn(ctx: Pick<LayoutContext, 'brief'>, number: string | NumberStyle | undefined): NumberStyle {
  const style = typeof number === 'object' ? number : { format: number };
  return { ...style, notation: style.notation ?? ctx.brief.notation, locale: style.locale ?? ctx.brief.locale };
}
