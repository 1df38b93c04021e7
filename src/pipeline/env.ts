import type { Outcome } from '../diagnostics/diagnostic.js';
import type { TextMeasurer } from '../font/measurer.js';
import type { Style } from '../style/types.js';
import type { EmbedFonts } from '../svg/embed.js';
import type { OutlineSet } from '../svg/glyphs.js';
import type { TableEnv } from '../table/load.js';

/** Everything environmental a render needs, passed in explicitly. */
export interface RenderEnv {
  measure: TextMeasurer;
  table: TableEnv;
  /** A style preset by name, or a style file relative to the brief. */
  style(name: string, briefFile: string | undefined): Outcome<Style>;
  /** Glyph outlines for the raster path (read on first use). */
  outlines(): OutlineSet;
  /** The TTF files, for SVG that still has live text ([] where the dev-only font package is not installed). */
  fontFiles(): string[];
  /** The fonts an `embed` SVG carries: faces, prebuilt subsets, run-time subsetting (set up on first use). */
  embedFonts(): EmbedFonts;
}
