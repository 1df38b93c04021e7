import type { TextMeasurer } from '../font/measurer.js';
import type { Field } from '../fields/types.js';
import type { TextStyle } from '../style/types.js';
import { tickFormatter } from './number-format.js';
import { niceTicks } from './ticks.js';

/** Pixels per tick the value axis aims for, vertical and horizontal (common practice: about 1 tick per 50–100 px). */
const PX_PER_TICK = { vertical: 50, horizontal: 90 } as const;

/** The title of an axis: the field's readable name, with its unit in brackets unless the name already says it. */
export function axisTitle(field: Field | undefined, fallback: string): string {
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
  domain: [number, number];
}

/**
 * Ticks for a value axis of `length` px that covers [lo, hi] (and zero, for bars). The domain
 * is fitted to the outer ticks. On a horizontal axis, fewer ticks are tried until no two
 * labels overlap.
 */
export function valueTicks(lo: number, hi: number, length: number, direction: 'vertical' | 'horizontal', style: TextStyle, measure: TextMeasurer, specifier?: string): ValueTicks {
  let m = Math.max(2, Math.min(10, Math.round(length / PX_PER_TICK[direction]) + 1));
  for (;;) {
    const ticks = niceTicks(lo, hi, m, true);
    const fmt = tickFormatter(ticks, specifier);
    const labels = ticks.map(fmt);
    const domain: [number, number] = [ticks[0]!, ticks[ticks.length - 1]!];
    if (direction === 'vertical' || m <= 2 || !overlaps(labels, length, style, measure)) return { ticks, labels, domain };
    m--;
  }
}

function overlaps(labels: string[], length: number, style: TextStyle, measure: TextMeasurer): boolean {
  const spacing = length / Math.max(1, labels.length - 1);
  const widths = labels.map((l) => measure.width(l, style.size, style.weight));
  return widths.some((w, i) => i > 0 && (w + widths[i - 1]!) / 2 + style.size * 0.5 > spacing);
}

/** Every k-th label fits: the smallest k such that the widest label plus a gap fits k bands. */
export function thinningStep(widest: number, step: number, gap: number): number {
  if (step <= 0) return Number.MAX_SAFE_INTEGER;
  return Math.max(1, Math.ceil((widest + gap) / step));
}
