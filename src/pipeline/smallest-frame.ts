import type { Diagnostic } from '../diagnostics/diagnostic.js';

/** A frame size in px. */
export interface FrameSize { width: number; height: number }

/** Largest frame the brief schema allows either way. */
const MAX_SIDE = 4000;
/** Growth of each side per step while looking for a frame that renders. */
const GROWTH = 1.5;
const MAX_GROWTH_STEPS = 8;

/** The least n in [lo, hi] for which `ok(n)` holds, given that it holds at hi (and, as sizes go, from some n on). */
function least(lo: number, hi: number, ok: (n: number) => boolean): number {
  while (lo < hi) {
    const mid = Math.floor((lo + hi) / 2);
    if (ok(mid)) hi = mid;
    else lo = mid + 1;
  }
  return hi;
}

/** The first frame grown from `from` (by GROWTH, up to MAX_SIDE) along the sides chosen that renders, if any. */
function grown(from: FrameSize, sides: { width: boolean; height: boolean }, renders: (size: FrameSize) => boolean): FrameSize | undefined {
  let size = from;
  for (let i = 0; !renders(size); i++) {
    const next = { width: sides.width ? Math.min(MAX_SIDE, Math.ceil(size.width * GROWTH)) : size.width, height: sides.height ? Math.min(MAX_SIDE, Math.ceil(size.height * GROWTH)) : size.height };
    if (i === MAX_GROWTH_STEPS || (next.width === size.width && next.height === size.height)) return undefined;
    size = next;
  }
  return size;
}

/**
 * The smallest frame, from `from` up, in which a chart renders: the height grown alone, else the
 * width alone, else both, until it does; then the height and the width each cut back to the
 * least that still renders. The extra title lines, notes and folded bars of another frame change
 * its layout, so the size is found by rendering, not by adding what the plot lacked. Undefined
 * when not even the largest frame does.
 */
export function smallestFrame(from: FrameSize, renders: (size: FrameSize) => boolean): FrameSize | undefined {
  const upper = grown(from, { width: false, height: true }, renders) ?? grown(from, { width: true, height: false }, renders) ?? grown(from, { width: true, height: true }, renders);
  if (!upper) return undefined;
  const height = least(from.height, upper.height, (h) => renders({ width: upper.width, height: h }));
  const width = least(from.width, upper.width, (w) => renders({ width: w, height }));
  return { width, height };
}

/** The frame-too-small error with its hint giving the smallest frame that renders the chart. */
export function withSmallestFrame(diagnostics: Diagnostic[], smallest: FrameSize | undefined): Diagnostic[] {
  if (!smallest) return diagnostics;
  return diagnostics.map((d) => (d.code === 'layout.frame-too-small'
    ? { ...d, hint: `make \`size:\` at least { width: ${smallest.width}, height: ${smallest.height} } (the smallest frame that draws this chart), or shorten the title and labels` }
    : d));
}
