import { inGamut, oklabLightness, oklchToRgb, rgbToOklch, type Oklch } from './oklab.js';
import { hexToRgb, rgbToHex } from './srgb.js';

/** A sequential ramp's recipe; recorded in the palette file. */
export interface SequentialInputs {
  /** The colour whose hue and chroma the ramp takes; it is one of the steps, unchanged. */
  anchor: string;
  /** Number of steps, lightest first. */
  steps: number;
  /** Which step (0 = lightest) is the anchor. */
  anchorStep: number;
  /** OKLab lightness of the lightest step. */
  lightest: number;
}

/** A diverging ramp's recipe; recorded in the palette file. */
export interface DivergingInputs {
  /** The colour whose hue and chroma the low arm takes. */
  low: string;
  /** The colour whose hue and chroma the high arm takes. */
  high: string;
  /** Number of steps (odd: the middle one is the neutral midpoint). */
  steps: number;
  /** OKLab lightness of the neutral midpoint. */
  middle: number;
  /** OKLab lightness of both ends. */
  ends: number;
}

/** The largest chroma at this lightness and hue that sRGB can show (bisection, 40 halvings). */
export function maxChroma(l: number, h: number): number {
  let [lo, hi] = [0, 0.5];
  for (let i = 0; i < 40; i++) {
    const mid = (lo + hi) / 2;
    if (inGamut(oklchToRgb([l, mid, h]))) lo = mid;
    else hi = mid;
  }
  return lo;
}

/**
 * The 8-bit colour nearest in OKLab lightness to an OKLCH target: the rounded colour and its
 * 26 neighbours (each channel ±1) are tried, so the lightness steps survive the rounding to
 * hex. Ties go to the first tried.
 */
export function snapToHex(target: Oklch): string {
  const base = hexToRgb(rgbToHex(oklchToRgb(target))).map((v) => Math.round(v * 255));
  let best = '';
  let bestError = Infinity;
  for (const dr of [0, -1, 1]) for (const dg of [0, -1, 1]) for (const db of [0, -1, 1]) {
    const rgb = [base[0]! + dr, base[1]! + dg, base[2]! + db];
    if (rgb.some((v) => v < 0 || v > 255)) continue;
    const hex = rgbToHex(rgb.map((v) => v / 255) as [number, number, number]);
    const error = Math.abs(oklabLightness(hexToRgb(hex)) - target[0]);
    if (error < bestError) [best, bestError] = [hex, error];
  }
  return best;
}

/** A step of an arm: the anchor's hue, its chroma where sRGB allows, less where it does not. */
function armStep(l: number, [, c, h]: Oklch): string {
  return snapToHex([l, Math.min(c, maxChroma(l, h)), h]);
}

/**
 * A sequential ramp, lightest first: OKLab lightness falls in equal steps from `lightest`
 * through the anchor's lightness at `anchorStep` and on, at the anchor's hue; chroma is the
 * anchor's, capped by what sRGB can show at each lightness.
 */
export function sequentialRampFrom(inputs: SequentialInputs): string[] {
  const anchor = rgbToOklch(hexToRgb(inputs.anchor));
  const step = (inputs.lightest - anchor[0]) / inputs.anchorStep;
  return Array.from({ length: inputs.steps }, (_, i) => (i === inputs.anchorStep ? inputs.anchor : armStep(inputs.lightest - i * step, anchor)));
}

/**
 * A diverging ramp, low end first: a grey midpoint (zero chroma) at `middle`, and two arms
 * whose OKLab lightness falls in the same equal steps to `ends`, each at its colour's hue.
 */
export function divergingRampFrom(inputs: DivergingInputs): string[] {
  const half = (inputs.steps - 1) / 2;
  const step = (inputs.middle - inputs.ends) / half;
  const low = rgbToOklch(hexToRgb(inputs.low));
  const high = rgbToOklch(hexToRgb(inputs.high));
  return Array.from({ length: inputs.steps }, (_, i) => {
    if (i === half) return snapGrey(inputs.middle);
    return armStep(inputs.middle - Math.abs(i - half) * step, i < half ? low : high);
  });
}

/** The 8-bit grey (r = g = b, so chroma exactly 0) nearest in OKLab lightness to `l`. */
function snapGrey(l: number): string {
  let best = '';
  let bestError = Infinity;
  for (let v = 0; v < 256; v++) {
    const hex = rgbToHex([v / 255, v / 255, v / 255]);
    const error = Math.abs(oklabLightness(hexToRgb(hex)) - l);
    if (error < bestError) [best, bestError] = [hex, error];
  }
  return best;
}
