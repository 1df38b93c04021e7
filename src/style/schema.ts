import type { SchemaNode } from '../brief/schema.js';

/** A colour; its #rrggbb form is checked by checkStyle. */
const colour: SchemaNode = { type: 'string', description: 'A colour as #rrggbb.' };

const textStyle: SchemaNode = {
  type: 'object', additionalProperties: false, required: ['size', 'weight', 'color'],
  properties: {
    size: { type: 'number', minimum: 4, maximum: 96, description: 'Font size in px.' },
    weight: { type: 'string', enum: ['regular', 'semibold'] },
    color: colour,
  },
};

const colourList: SchemaNode = { type: 'array', items: colour, minItems: 2 };

/** A palette reference: a palette file's name (categorical) or `<file>/<ramp>` (ramps), or the colours themselves. */
const paletteRef = (what: string): SchemaNode => ({ anyOf: [{ type: 'string', minLength: 1 }, colourList], description: what });

const width = (max: number): SchemaNode => ({ type: 'number', minimum: 0, maximum: max });

/**
 * The JSON Schema of a style file (templates/styles/*.json or a user's own), with ranges: a style
 * with a value out of range is refused with the path of the value, by the same validator and
 * diagnostics as briefs.
 */
export const STYLE_SCHEMA: SchemaNode = {
  type: 'object', additionalProperties: false,
  required: ['name', 'background', 'font', 'text', 'palette', 'lines', 'spacing'],
  properties: {
    name: { type: 'string', minLength: 1 },
    description: { type: 'string' },
    background: colour,
    font: {
      type: 'object', additionalProperties: false, required: ['family', 'regular', 'semibold'],
      properties: {
        family: { type: 'string', minLength: 1 }, regular: { type: 'string', minLength: 1 }, semibold: { type: 'string', minLength: 1 },
        files: {
          type: 'object', additionalProperties: false, required: ['regular'], description: 'Font files (TTF/OTF) drawn instead of the bundled face, relative to the style file.',
          properties: { regular: { type: 'string', minLength: 1 }, bold: { type: 'string', minLength: 1 } },
        },
        fallback: { type: 'array', items: { type: 'string', minLength: 1 }, description: 'Faces for characters the first lacks, in order: font files relative to the style file, or fallback package names.' },
      },
    },
    text: {
      type: 'object', additionalProperties: false, required: ['title', 'subtitle', 'source', 'tick', 'axisTitle', 'label', 'note'],
      properties: Object.fromEntries(['title', 'subtitle', 'source', 'tick', 'axisTitle', 'label', 'note'].map((k) => [k, textStyle])),
    },
    palette: {
      type: 'object', additionalProperties: false, required: ['name', 'primary', 'negative', 'others'],
      properties: {
        name: { type: 'string', minLength: 1 },
        primary: colour, negative: colour, others: colour,
        categorical: paletteRef('Colours for categories, in order: a palette name (e.g. "tidewater", "okabe-ito") or a list.'),
        sequential: paletteRef('A sequential ramp, lightest first: "<palette>/<ramp>" or a list.'),
        diverging: paletteRef('A diverging ramp with a neutral middle: "<palette>/<ramp>" or a list.'),
      },
    },
    lines: {
      type: 'object', additionalProperties: false, required: ['axis', 'grid', 'zero', 'axisWidth', 'gridWidth', 'zeroWidth'],
      properties: { axis: colour, grid: colour, zero: colour, axisWidth: width(8), gridWidth: width(8), zeroWidth: width(8) },
    },
    spacing: {
      type: 'object', additionalProperties: false, required: ['padding', 'titleGap', 'blockGap', 'tickGap', 'labelGap', 'bandPadding', 'lineHeight'],
      properties: {
        padding: width(200), titleGap: width(100), blockGap: width(100), tickGap: width(50), labelGap: width(50),
        bandPadding: { type: 'number', minimum: 0, maximum: 0.9, description: 'Share of a band left empty between bars.' },
        lineHeight: { type: 'number', minimum: 1.326, maximum: 3, description: 'At least the font\'s ascent + descent (1.326 em for Source Sans 3).' },
      },
    },
    size: {
      type: 'object', additionalProperties: false, required: ['width', 'height'],
      description: 'The frame size a brief gets when it sets none; a brief\'s `size:` wins, side by side.',
      properties: { width: { type: 'integer', minimum: 160, maximum: 4000 }, height: { type: 'integer', minimum: 160, maximum: 4000 } },
    },
    textMode: { type: 'string', enum: ['embed', 'outline', 'live'], description: 'How the SVG writes text: embed (the fonts used, inside the SVG), outline (glyph paths), live (the family list of font.family).' },
  },
};
