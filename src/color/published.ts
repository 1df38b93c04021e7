/**
 * Published categorical palettes, offered under their published names and in their published
 * order. Not chartwright's defaults (those are derived: see palette-derive.ts).
 */
export const PUBLISHED_PALETTES: Readonly<Record<string, readonly string[]>> = {
  /**
   * M. Okabe, K. Ito, "Color Universal Design (CUD)", J*Fly, 2002/2008, section 10; republished
   * by B. Wong, Nature Methods 8:441, 2011. Black, orange, sky blue, bluish green, yellow, blue,
   * vermillion, reddish purple. Orange, sky blue and yellow fall below 3:1 on white and need
   * an outline there (see needsOutline).
   */
  'okabe-ito': ['#000000', '#e69f00', '#56b4e9', '#009e73', '#f0e442', '#0072b2', '#d55e00', '#cc79a7'],
};

/** A published palette by its name; undefined for a name not in PUBLISHED_PALETTES. */
export function publishedPalette(name: string): readonly string[] | undefined {
  return Object.hasOwn(PUBLISHED_PALETTES, name) ? PUBLISHED_PALETTES[name] : undefined;
}
