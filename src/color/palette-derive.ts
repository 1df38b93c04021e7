import { searchCategorical } from './categorical-search.js';
import type { PaletteFile, PaletteRecipe } from './palette.js';
import { measureCategorical, measureDiverging, measureRamp } from './palette-measure.js';
import { divergingRampFrom, sequentialRampFrom } from './ramps.js';

const mapValues = <A, B>(record: Record<string, A>, f: (a: A) => B): Record<string, B> =>
  Object.fromEntries(Object.entries(record).map(([k, v]) => [k, f(v)]));

/**
 * chartwright's own default palette, "tidewater": its anchors are the report style's fills
 * (primary #206c89 first; the "others" grey kept apart from every categorical colour; the
 * negative #aa5830 as the warm hue). Everything else comes out of derivePalettes.
 */
export const TIDEWATER_RECIPE: PaletteRecipe = {
  name: 'tidewater',
  description: "chartwright's default palette, derived in OKLab/OKLCH from the report style's fills by scripts/derive-palettes.js.",
  background: '#ffffff',
  categorical: {
    anchor: '#206c89',
    reserved: ['#80878d', '#aa5830'],
    size: 8,
    minContrast: 3,
    lightness: [0.45, 0.85],
    chroma: [0.06, 0.19],
    seed: 1,
    starts: 16,
    iterations: 5000,
    softness: 1,
  },
  sequential: {
    tide: { anchor: '#206c89', steps: 9, anchorStep: 6, lightest: 0.96 },
    ember: { anchor: '#aa5830', steps: 9, anchorStep: 5, lightest: 0.96 },
  },
  diverging: {
    'ember-tide': { low: '#aa5830', high: '#206c89', steps: 11, middle: 0.96, ends: 0.42 },
  },
};

const OBJECTIVE = {
  categorical:
    'Maximize the smallest CIEDE2000 difference over every pair of colours (the anchor and the searched ones) and every colour-reserved pair, under normal vision, protanopia, deuteranopia and tritanopia; ties broken by a soft minimum with temperature `softness`. Constraints: sRGB gamut, OKLab lightness and OKLCH chroma within the ranges, WCAG contrast against the background at least minContrast. Search: seeded multi-start coordinate search in OKLCH (`starts` starts of `iterations` moves, the step shrinking geometrically to 2%), every candidate snapped to 8-bit hex before it is scored. Order: greedy from the anchor, each next colour the one farthest (smallest ΔE00 over the four visions) from those before it.',
  sequential:
    "OKLab lightness falls in equal steps from `lightest` through the anchor's lightness at `anchorStep`; hue and chroma are the anchor's, chroma capped by the sRGB gamut (largest displayable, by bisection); each step snapped to the 8-bit colour nearest in lightness.",
  diverging:
    "A grey midpoint (chroma 0) at OKLab lightness `middle`; both arms fall in the same equal lightness steps to `ends`, each at its anchor's hue and chroma (capped by the sRGB gamut), snapped to the 8-bit colour nearest in lightness.",
};

/** Derives a palette file from its recipe. Pure and deterministic: same recipe, same file. */
export function derivePalettes(recipe: PaletteRecipe): PaletteFile {
  const { background } = recipe;
  const categorical = searchCategorical({ ...recipe.categorical, background });
  const sequential = mapValues(recipe.sequential, sequentialRampFrom);
  const diverging = mapValues(recipe.diverging, divergingRampFrom);
  return {
    name: recipe.name,
    description: recipe.description,
    background,
    categorical,
    sequential,
    diverging,
    derivation: {
      generator: 'scripts/derive-palettes.js (derivePalettes in src/color/palette-derive.ts)',
      colourDifference: 'CIEDE2000 (kL = kC = kH = 1) on CIELAB D65, computed by culori 4.0.2',
      visionModel: 'Machado, Oliveira & Fernandes 2009, severity 1.0, applied to linear RGB',
      objective: OBJECTIVE,
      recipe,
      measured: {
        categorical: measureCategorical(categorical, recipe.categorical.reserved, background),
        sequential: mapValues(sequential, (ramp) => measureRamp(ramp, background)),
        diverging: mapValues(diverging, (ramp) => measureDiverging(ramp, background)),
      },
    },
  };
}

/** A palette file as written to templates/palettes: two-space JSON, one final newline. */
export function paletteJson(file: PaletteFile): string {
  return `${JSON.stringify(file, null, 2)}\n`;
}
