import { VISIONS } from './cvd.js';
import { deltaE } from './distinct.js';
import { rgbToLab } from './lab.js';
import { maxChroma, snapToHex } from './ramps.js';
import { hexToRgb } from './srgb.js';

/** What a greyscale-safe categorical palette is derived from; the print style records it. */
export interface GreyscaleInputs {
  /** Number of colours. */
  size: number;
  /** OKLab lightness of the darkest and the lightest colour; the others fall in equal steps between. */
  lightness: [number, number];
  /** OKLCH chroma wanted at every step (less where sRGB cannot show it). */
  chroma: number;
  /** Hues tried per step: every 360 / hues degrees, from 0. */
  hues: number;
  /** Colours drawn beside the palette (the "others" grey, the negative fill): each new colour is kept apart from them too. */
  reserved: string[];
}

/** CIELAB L* of a colour: its lightness once colour is gone (a photocopy, a greyscale print). */
export function greyLightness(hex: string): number {
  return rgbToLab(hexToRgb(hex))[0];
}

/** Lightness levels in the order that keeps every prefix spread: darkest, lightest, then each next the farthest from those taken. */
function spreadOrder(levels: readonly number[]): number[] {
  const order = [levels[0]!, levels[levels.length - 1]!];
  const rest = levels.slice(1, -1);
  while (rest.length) {
    let best = 0;
    let gap = -Infinity;
    rest.forEach((l, i) => {
      const g = Math.min(...order.map((o) => Math.abs(o - l)));
      if (g > gap) [best, gap] = [i, g];
    });
    order.push(rest.splice(best, 1)[0]!);
  }
  return order;
}

/**
 * A categorical palette whose colours differ in lightness, so they stay apart in greyscale: one
 * colour per equal OKLab lightness step, the steps ordered so that each prefix is as spread in
 * lightness as it can be, and at each step the hue (of `hues` tried) farthest, by the smallest
 * CIEDE2000 over normal vision and the three simulated deficiencies, from the colours already
 * taken and the reserved ones. No randomness: same inputs, same colours.
 */
export function greyscaleCategorical(inputs: GreyscaleInputs): string[] {
  const [lo, hi] = inputs.lightness;
  const levels = Array.from({ length: inputs.size }, (_, i) => lo + ((hi - lo) * i) / (inputs.size - 1));
  const taken: string[] = [];
  for (const l of spreadOrder(levels)) {
    let best = '';
    let bestGap = -Infinity;
    for (let k = 0; k < inputs.hues; k++) {
      const h = (360 * k) / inputs.hues;
      const hex = snapToHex([l, Math.min(inputs.chroma, maxChroma(l, h)), h]);
      const others = [...taken, ...inputs.reserved];
      const gap = others.length ? Math.min(...others.flatMap((o) => VISIONS.map((v) => deltaE(o, hex, v)))) : 0;
      if (gap > bestGap) [best, bestGap] = [hex, gap];
    }
    taken.push(best);
  }
  return taken;
}

/** The smallest difference in greyscale lightness (ΔL*) between any two of the colours. */
export function minGreyGap(colours: readonly string[]): number {
  const ls = colours.map(greyLightness).sort((a, b) => a - b);
  return Math.min(...ls.slice(1).map((l, i) => l - ls[i]!));
}

/**
 * The print style's categorical colours come from these inputs (test/color/greyscale-palette.test.ts
 * re-derives them and compares with templates/styles/print.json). The lightness range keeps every
 * colour at 3:1 or more on white (OKLab L 0.655 is about the lightest that does).
 */
export const PRINT_GREYSCALE: GreyscaleInputs = { size: 8, lightness: [0.3, 0.655], chroma: 0.2, hues: 72, reserved: ['#8a8a8a', '#9a4a1c'] };
