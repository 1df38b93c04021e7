import type { TextMeasurer } from '../font/measurer.js';
import type { FieldRef } from '../fields/types.js';
import type { TextStyle } from '../style/types.js';
import { tickFormatter, type NumberStyle } from './number-format.js';
import { niceTicks } from './ticks.js';

/** Pixels per tick the value axis aims for, vertical and horizontal (common practice: about 1 tick per 50–100 px). */
const PX_PER_TICK = { vertical: 50, horizontal: 90 } as const;

/** The title of an axis: the field's readable name, with its unit in brackets unless the name already says it. */
export function axisTitle(field: FieldRef | undefined, fallback: string): string {
  if (!field) return fallback;
  const unit = field.unit?.trim();
  if (!unit || field.label.toLowerCase().includes(unit.toLowerCase())) return field.label;
  // "Crossings" with unit "crossings per day" reads best as the unit alone.
  if (unit.toLowerCase().startsWith(field.label.toLowerCase())) return unit.charAt(0).toUpperCase() + unit.slice(1);
  return `${field.label} (${unit})`;
}

/** Ticks of a value axis, their labels, and the domain they span. */
export interface ValueTicks {
  ticks: number[];
  labels: string[];
  /** Which tick labels are printed; in a cramped plot some ticks keep only their gridline. */
  shown: boolean[];
  domain: [number, number];
}

/** Extent of each label along the axis direction: its width lying, its box height upright. */
function extents(labels: string[], direction: 'vertical' | 'horizontal', style: TextStyle, measure: TextMeasurer): number[] {
  const height = measure.ascent(style.size, style.weight) + measure.descent(style.size, style.weight);
  return labels.map((l) => (direction === 'horizontal' ? measure.width(l, style.size, style.weight) : height));
}

/**
 * Which labels to print so no two come closer than half the font size: the tick farthest from
 * zero first, then zero, then the others in order, each kept only if it clears those kept.
 */
function labelsThatFit(ticks: number[], sizes: number[], length: number, gap: number): boolean[] {
  const spacing = length / Math.max(1, ticks.length - 1);
  const far = ticks.reduce((best, t, i) => (Math.abs(t) > Math.abs(ticks[best]!) ? i : best), 0);
  const order = [far, ...ticks.map((_, i) => i).filter((i) => i !== far).sort((a, b) => Number(ticks[b] === 0) - Number(ticks[a] === 0) || a - b)];
  const shown = ticks.map(() => false);
  for (const i of order) {
    const clear = shown.every((on, j) => !on || Math.abs(i - j) * spacing >= (sizes[i]! + sizes[j]!) / 2 + gap);
    if (clear) shown[i] = true;
  }
  return shown;
}

/** The d3-format specifier of a number style, or the specifier itself (a style may come as either). */
function formatOf(style: unknown): string {
  if (typeof style === 'string') return style;
  const format = typeof style === 'object' && style !== null ? (style as { format?: unknown }).format : undefined;
  return typeof format === 'string' ? format : '';
}

/**
 * Ticks for a value axis of `length` px that covers [lo, hi] (and zero, for bars). The domain
 * is fitted to the outer ticks. Fewer ticks are tried until no two labels overlap; where even
 * two do not fit, only the labels that clear each other are printed.
 */
export function valueTicks(lo: number, hi: number, length: number, direction: 'vertical' | 'horizontal', style: TextStyle, measure: TextMeasurer, specifier?: string | NumberStyle): ValueTicks {
  const gap = style.size * 0.5;
  // A non-finite length (a defect upstream) must not leave m as NaN, which never reaches 2.
  const wanted = Number.isFinite(length) ? Math.round(length / PX_PER_TICK[direction]) + 1 : 2;
  // A value written as whole numbers (d3-format type "d", e.g. counts) gets whole-number ticks: no "2.5 rows".
  const whole = /d$/.test(formatOf(specifier));
  for (let m = Math.max(2, Math.min(10, wanted)); ; m--) {
    const ticks = niceTicks(lo, hi, m, true);
    if (whole && m > 2 && !ticks.every(Number.isInteger)) continue;
    const labels = ticks.map(tickFormatter(ticks, specifier));
    const shown = labelsThatFit(ticks, extents(labels, direction, style, measure), length, gap);
    if (shown.every(Boolean) || m <= 2) return { ticks, labels, shown, domain: [ticks[0]!, ticks[ticks.length - 1]!] };
  }
}

/** Every k-th label fits: the smallest k such that the widest label plus a gap fits k bands. */
export function thinningStep(widest: number, step: number, gap: number): number {
  if (step <= 0) return Number.MAX_SAFE_INTEGER;
  return Math.max(1, Math.ceil((widest + gap) / step));
}
