import type { Outcome } from '../diagnostics/diagnostic.js';
import type { TextMeasurer } from '../font/measurer.js';
import type { Style } from '../style/types.js';
import type { EmbedFonts } from '../svg/embed.js';
import type { OutlineSet } from '../svg/glyphs.js';
import type { TableEnv } from '../table/load.js';

/** Everything environmental a render needs, passed in explicitly. */
export interface RenderEnv {
  /** The bundled face's measurer (with the fallback faces for characters it lacks). */
  measure: TextMeasurer;
  /** The measurer for a style: `measure`, unless the style names its own font files or fallbacks. */
  measureFor(style: Style): TextMeasurer;
  table: TableEnv;
  /** A style preset by name, or a style file relative to the brief. */
  style(name: string, briefFile: string | undefined): Outcome<Style>;
  /** Glyph outlines for the raster path (read on first use). */
  outlines(): OutlineSet;
  /** The TTF files, for SVG that still has live text ([] where the dev-only font package is not installed). */
  fontFiles(): string[];
  /** The fonts an `embed` SVG carries: faces, prebuilt subsets, run-time subsetting (set up on first use). */
  /** The fonts an embedded-text SVG carries, split by face as `measure` (the style's measurer; default: `measure`) laid the text out. */
  embedFonts(measure?: TextMeasurer): EmbedFonts;
}
