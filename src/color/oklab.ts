import { convertLabToLch, convertLchToLab, convertOklabToRgb, convertRgbToOklab } from 'culori/fn';
import type { Rgb } from './srgb.js';

/** OKLCH coordinates [L, C, h°] (Ottosson 2020): L in [0, 1], chroma ≥ 0, hue in degrees. */
export type Oklch = [number, number, number];

/** sRGB channels in [0, 1] → OKLCH. An achromatic colour gets hue 0. */
export function rgbToOklch([r, g, b]: Rgb): Oklch {
  const c = convertLabToLch(convertRgbToOklab({ r, g, b }), 'oklch');
  return [c.l, c.c, c.h ?? 0];
}

/** OKLCH → sRGB channels, unclamped (a channel outside [0, 1] means out of gamut). */
export function oklchToRgb([l, c, h]: Oklch): Rgb {
  const rgb = convertOklabToRgb(convertLchToLab({ l, c, h }));
  return [rgb.r, rgb.g, rgb.b];
}

/** OKLab lightness of an sRGB colour. */
export function oklabLightness([r, g, b]: Rgb): number {
  return convertRgbToOklab({ r, g, b }).l;
}

/** Whether sRGB channels lie in [0, 1] (up to rounding noise), i.e. the colour is displayable. */
export function inGamut(rgb: Rgb): boolean {
  return rgb.every((v) => v >= -1e-9 && v <= 1 + 1e-9);
}
