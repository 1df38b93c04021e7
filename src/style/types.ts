/** Font weights chartwright draws with; each has its own metrics file. */
export type Weight = 'regular' | 'semibold';

/** How one kind of text is set. */
export interface TextStyle {
  size: number;
  weight: Weight;
  color: string;
}

/** A style preset: everything about the look that is not data. Loaded from templates/styles. */
export interface Style {
  name: string;
  description?: string;
  background: string;
  font: {
    family: string; regular: string; semibold: string;
    /** The style's own font files (TTF/OTF, relative to the style file), drawn instead of the bundled face. Default: none. */
    files?: { regular: string; bold?: string };
    /** Further faces for characters the first lacks, tried in order: font files, or packages from FALLBACK_PACKAGES. Default: none. */
    fallback?: string[];
  };
  text: Record<'title' | 'subtitle' | 'source' | 'tick' | 'axisTitle' | 'label' | 'note', TextStyle>;
  palette: {
    name: string;
    primary: string;
    negative: string;
    others: string;
    /** Colours for categories, in order (each prefix as distinct as the palette allows). */
    categorical: string[];
    /** A sequential ramp, low values first: the step nearest the page first (lightest on a light page, darkest on a dark one). */
    sequential: string[];
    /** A diverging ramp, low end first, with a neutral middle. */
    diverging: string[];
  };
  lines: { axis: string; grid: string; zero: string; axisWidth: number; gridWidth: number; zeroWidth: number };
  spacing: {
    /** Space between the frame edge and any content. */
    padding: number;
    /** Space between title and subtitle. */
    titleGap: number;
    /** Space between blocks: header, plot, footer. */
    blockGap: number;
    /** Space between a tick label and the plot. */
    tickGap: number;
    /** Space between a bar and its value label. */
    labelGap: number;
    /** Share of a band left empty between bars, 0–1. */
    bandPadding: number;
    /** Line height as a multiple of the font size; at least the font's ascent + descent (1.326 em for Source Sans 3), so text boxes never overlap. */
    lineHeight: number;
  };
  /** The frame size a brief gets when it sets none (each side the brief gives wins). Default: the brief's default, 720 × 440. */
  size?: { width: number; height: number };
  /** How the SVG writes its text (the command line's --text wins). Default: embed. */
  textMode?: TextModeName;
}

/** How an SVG writes its text: `embed` (live text, the fonts it needs inside), `outline` (glyph paths), `live` (live text in the style's family list). */
export type TextModeName = 'embed' | 'outline' | 'live';
