import { toLinear, type Rgb } from './srgb.js';

/** CIELAB coordinates, D65 white. */
export type Lab = [number, number, number];

/**
 * Linear sRGB → XYZ (D65), derived from the sRGB primaries and the D65 chromaticity
 * (0.3127, 0.3290) at full precision, as colorjs.io and culori do; the 7-digit matrix printed in
 * IEC 61966-2-1 moves L* by about 0.004.
 */
const M = [
  [0.41239079926595934, 0.357584339383878, 0.1804807884018343],
  [0.21263900587151027, 0.715168678767756, 0.07219231536073371],
  [0.01933081871559182, 0.11919477979462598, 0.9505321522496606],
] as const;
const WHITE = [0.3127 / 0.329, 1, (1 - 0.3127 - 0.329) / 0.329] as const;

function f(t: number): number {
  const d = 6 / 29;
  return t > d ** 3 ? Math.cbrt(t) : t / (3 * d * d) + 4 / 29;
}

/** sRGB channels in [0, 1] → CIELAB (D65). */
export function rgbToLab(rgb: Rgb): Lab {
  const lin = rgb.map(toLinear);
  const [x, y, z] = M.map((row, i) => (row[0] * lin[0]! + row[1] * lin[1]! + row[2] * lin[2]!) / WHITE[i]!) as [number, number, number];
  return [116 * f(y) - 16, 500 * (f(x) - f(y)), 200 * (f(y) - f(z))];
}
