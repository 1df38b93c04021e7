import type { PaletteRecipe } from './palette.js';

/**
 * "nightwater", tidewater's counterpart for a dark page (the dark style's #16191d): the same
 * derivation (derivePalettes) with the dark style's fills as anchors. Its colours are lighter
 * than the page, so every categorical colour keeps 3:1 against it; its ramps run from the page
 * outwards, faintest (nearest the page) first and lightest last, so that on the dark page, as on
 * white, more reads as further from the page.
 */
export const NIGHTWATER_RECIPE: PaletteRecipe = {
  name: 'nightwater',
  description: "chartwright's palette for dark pages, derived in OKLab/OKLCH from the dark style's fills by scripts/derive-palettes.js.",
  background: '#16191d',
  categorical: {
    anchor: '#6cb2d3',
    reserved: ['#80878d', '#e08a61'],
    size: 8,
    minContrast: 3,
    lightness: [0.6, 0.85],
    chroma: [0.05, 0.14],
    seed: 1,
    starts: 16,
    iterations: 5000,
    softness: 1,
  },
  sequential: {
    tide: { anchor: '#6cb2d3', steps: 9, anchorStep: 6, lightest: 0.3 },
    ember: { anchor: '#e08a61', steps: 9, anchorStep: 6, lightest: 0.3 },
  },
  diverging: {
    'ember-tide': { low: '#e08a61', high: '#6cb2d3', steps: 11, middle: 0.3, ends: 0.86 },
  },
};
