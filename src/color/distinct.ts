import { seen, type Vision } from './cvd.js';
import { ciede2000, rgbToLab } from './lab.js';
import { hexToRgb } from './srgb.js';

/** CIEDE2000 difference of two #rrggbb colours as a reader with the given vision sees them. */
export function deltaE(a: string, b: string, vision: Vision = 'normal'): number {
  return ciede2000(rgbToLab(seen(hexToRgb(a), vision)), rgbToLab(seen(hexToRgb(b), vision)));
}

/**
 * The smallest CIEDE2000 difference between any two of the colours (#rrggbb) as a reader with
 * the given vision sees them; Infinity for fewer than two colours.
 */
export function minPairwiseDeltaE(colours: readonly string[], vision: Vision = 'normal'): number {
  const labs = colours.map((c) => rgbToLab(seen(hexToRgb(c), vision)));
  let min = Infinity;
  for (let i = 0; i < labs.length; i++) for (let j = i + 1; j < labs.length; j++) min = Math.min(min, ciede2000(labs[i]!, labs[j]!));
  return min;
}
