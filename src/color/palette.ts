import type { Vision } from './cvd.js';
import type { CategoricalInputs } from './categorical-search.js';
import type { DivergingInputs, SequentialInputs } from './ramps.js';
import { MARK_CONTRAST, contrastRatio } from './wcag.js';

/** A figure per vision, e.g. the smallest ΔE00 a reader with that vision sees. */
export type PerVision = Record<Vision, number>;

/** Everything a palette file's colours were derived from: re-running it gives the same file. */
export interface PaletteRecipe {
  name: string;
  description: string;
  background: string;
  categorical: Omit<CategoricalInputs, 'background'>;
  sequential: Record<string, SequentialInputs>;
  diverging: Record<string, DivergingInputs>;
}

/** What was measured on a derived palette's colours (rounded to 4 decimals). */
export interface PaletteMeasures {
  categorical: {
    /** Smallest pairwise ΔE00 among the first k colours, for k = 2 … size. */
    minDeltaE00ByPrefix: ({ k: number } & PerVision)[];
    /** Smallest ΔE00 between any palette colour and any reserved colour. */
    minDeltaE00ToReserved: PerVision;
    /** WCAG contrast of each colour against the background. */
    contrast: number[];
    /** Colours below 3:1 on the background, to be drawn with an outline. */
    outline: string[];
  };
  sequential: Record<string, RampMeasures>;
  diverging: Record<string, RampMeasures & { midpointChroma: number; minMirroredDeltaE00: PerVision }>;
}

/** Measures of a ramp. */
export interface RampMeasures {
  oklabLightness: number[];
  contrast: number[];
  /** ΔE00 between the lightest step and the background. */
  lightestDeltaE00FromBackground: number;
  /** ΔE00 between the step nearest the background and the background: how far the faint end stands off the page (on a dark page, the darkest step). */
  nearestDeltaE00FromBackground: number;
  /** Smallest ΔE00 between neighbouring steps. */
  minAdjacentDeltaE00: PerVision;
}

/** A palette file (templates/palettes/*.json): the colours and how they were derived. */
export interface PaletteFile {
  name: string;
  description: string;
  background: string;
  /** Categorical colours in order: the first k are the palette for k classes. */
  categorical: string[];
  /** Sequential ramps by name, lightest first. */
  sequential: Record<string, string[]>;
  /** Diverging ramps by name, low end first, neutral midpoint in the middle. */
  diverging: Record<string, string[]>;
  derivation: {
    generator: string;
    colourDifference: string;
    visionModel: string;
    objective: { categorical: string; sequential: string; diverging: string };
    recipe: PaletteRecipe;
    measured: PaletteMeasures;
  };
}

/** The most categorical colours a palette file offers. */
export function maxCategorical(file: PaletteFile): number {
  return file.categorical.length;
}

/**
 * The categorical palette for n classes: the file's first n colours (each prefix was ordered to
 * be as distinct as possible). Throws a RangeError past maxCategorical(file): callers refuse
 * such charts first (colour cannot carry that many classes).
 */
export function categoricalPalette(file: PaletteFile, n: number): string[] {
  if (!Number.isInteger(n) || n < 1 || n > file.categorical.length) throw new RangeError(`${file.name} has 1 to ${file.categorical.length} categorical colours, not ${n}`);
  return file.categorical.slice(0, n);
}

/** A named sequential ramp, lightest first; undefined if the file has none by that name. */
export function sequentialRamp(file: PaletteFile, name: string): string[] | undefined {
  return Object.hasOwn(file.sequential, name) ? file.sequential[name] : undefined;
}

/** A named diverging ramp, low end first; undefined if the file has none by that name. */
export function divergingRamp(file: PaletteFile, name: string): string[] | undefined {
  return Object.hasOwn(file.diverging, name) ? file.diverging[name] : undefined;
}

/** Whether a mark in this colour needs an outline on the background (below 3:1, WCAG 2.1 SC 1.4.11). */
export function needsOutline(colour: string, background: string): boolean {
  return contrastRatio(colour, background) < MARK_CONTRAST;
}
