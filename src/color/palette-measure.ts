import { VISIONS, type Vision } from './cvd.js';
import { deltaE, minPairwiseDeltaE } from './distinct.js';
import { oklabLightness, rgbToOklch } from './oklab.js';
import type { PaletteMeasures, PerVision, RampMeasures } from './palette.js';
import { needsOutline } from './palette.js';
import { hexToRgb } from './srgb.js';
import { contrastRatio } from './wcag.js';

/** Rounds a measured figure to 4 decimals, so the palette file is stable and readable. */
export const round4 = (x: number): number => Math.round(x * 1e4) / 1e4;

function perVision(f: (v: Vision) => number): PerVision {
  return Object.fromEntries(VISIONS.map((v) => [v, round4(f(v))])) as PerVision;
}

/** Smallest ΔE00 between any colour of `a` and any colour of `b`, as `vision` sees them. */
function minBetween(a: readonly string[], b: readonly string[], vision: Vision): number {
  return Math.min(...a.flatMap((x) => b.map((y) => deltaE(x, y, vision))));
}

/** Measures a categorical palette: prefixes' minimum ΔE00, distance to reserved colours, contrast. */
export function measureCategorical(colours: readonly string[], reserved: readonly string[], background: string): PaletteMeasures['categorical'] {
  return {
    minDeltaE00ByPrefix: colours.slice(1).map((_, i) => ({ k: i + 2, ...perVision((v) => minPairwiseDeltaE(colours.slice(0, i + 2), v)) })),
    minDeltaE00ToReserved: perVision((v) => minBetween(colours, reserved, v)),
    contrast: colours.map((c) => round4(contrastRatio(c, background))),
    outline: colours.filter((c) => needsOutline(c, background)),
  };
}

/** Measures a ramp: lightness and contrast per step, the lightest against the background, neighbours. */
export function measureRamp(ramp: readonly string[], background: string): RampMeasures {
  const lightest = ramp.reduce((a, b) => (oklabLightness(hexToRgb(b)) > oklabLightness(hexToRgb(a)) ? b : a));
  return {
    oklabLightness: ramp.map((c) => round4(oklabLightness(hexToRgb(c)))),
    contrast: ramp.map((c) => round4(contrastRatio(c, background))),
    lightestDeltaE00FromBackground: round4(deltaE(lightest, background)),
    nearestDeltaE00FromBackground: round4(Math.min(...ramp.map((c) => deltaE(c, background)))),
    minAdjacentDeltaE00: perVision((v) => Math.min(...ramp.slice(1).map((c, i) => deltaE(ramp[i]!, c, v)))),
  };
}

/** Measures a diverging ramp: as a ramp, plus the midpoint's chroma and how far mirrored steps stay apart. */
export function measureDiverging(ramp: readonly string[], background: string): PaletteMeasures['diverging'][string] {
  const half = (ramp.length - 1) / 2;
  return {
    ...measureRamp(ramp, background),
    midpointChroma: round4(rgbToOklch(hexToRgb(ramp[half]!))[1]),
    minMirroredDeltaE00: perVision((v) => Math.min(...ramp.slice(0, half).map((c, i) => deltaE(c, ramp[ramp.length - 1 - i]!, v)))),
  };
}
