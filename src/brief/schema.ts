import { CATALOGUE } from '../diagnostics/catalogue.js';
import { AGGREGATES, DISTANCE_NAMES, FIELD_TYPES, LINKAGE_NAMES, LOCALES, NOTATIONS, ORDERS, type BriefVocabulary } from './types.js';

/** The codes a brief may accept: the warnings (errors cannot be accepted). */
const ACCEPTABLE_CODES = Object.entries(CATALOGUE).filter(([, severity]) => severity === 'warning').map(([code]) => code);

/** The subset of JSON Schema the brief schema uses, and `validateAgainstSchema` understands. */
export interface SchemaNode {
  type?: 'string' | 'number' | 'integer' | 'boolean' | 'object' | 'array' | 'null';
  description?: string;
  enum?: readonly (string | number)[];
  properties?: Record<string, SchemaNode>;
  additionalProperties?: boolean | SchemaNode;
  required?: readonly string[];
  items?: SchemaNode;
  minItems?: number;
  minimum?: number;
  maximum?: number;
  minLength?: number;
  anyOf?: readonly SchemaNode[];
  default?: unknown;
}

const columnList: SchemaNode = {
  anyOf: [
    { type: 'string', minLength: 1 },
    { type: 'array', items: { type: 'string', minLength: 1 }, minItems: 1 },
  ],
};

const fieldHint: SchemaNode = {
  type: 'object',
  description: 'Hints for one column.',
  additionalProperties: false,
  properties: {
    type: { type: 'string', enum: FIELD_TYPES, description: 'Measurement type; wins over inference.' },
    unit: { type: 'string', description: 'Unit shown in the axis title.' },
    format: { type: 'string', description: 'd3-format specifier for numbers, e.g. ",d".' },
    order: { type: 'array', items: { anyOf: [{ type: 'string' }, { type: 'number' }] }, description: 'Level order for ordinal or cyclic fields.' },
    label: { type: 'string', description: 'Readable name used in axis titles.' },
    decimal: { type: 'string', enum: [',', '.'], description: 'The column\'s decimal mark: "," reads "4,2" as 4.2 in any file. Default: "." (detected per column in semicolon-separated files).' },
    additive: { type: 'boolean', description: 'Whether values of this column may be added up (false for rates, shares, temperatures, pH). Default: false for the units %, ‰, °C, °F, K, pH and dB, true otherwise.' },
    zero: { type: 'string', enum: ['meaningful', 'arbitrary'], description: 'Whether zero means none or is an arbitrary point (e.g. °C); a line leaves an arbitrary zero out of its axis.' },
    midpoint: { type: 'number', description: 'A meaningful centre of the values: colour diverges from it.' },
  },
};

/** A brief's JSON Schema with its root metadata. */
export type BriefSchema = SchemaNode & { $schema: string; $id: string; title: string };

/**
 * The JSON Schema of a brief over a vocabulary of intents and forms (the ones chartwright can
 * answer and draw), as printed by `chartwright schema`.
 */
export function briefSchema({ intents: INTENTS, forms: FORM_NAMES }: BriefVocabulary): BriefSchema {
  return {
    $schema: 'https://json-schema.org/draft/2020-12/schema',
    $id: 'https://chartwright.invalid/brief.schema.json',
    title: 'chartwright brief',
    type: 'object',
    additionalProperties: false,
    required: ['intent'],
    properties: {
      data: { type: 'string', minLength: 1, description: 'Path to a CSV, TSV, JSON or NDJSON file, relative to the brief; "-" for stdin.' },
      rows: { type: 'array', items: { type: 'object' }, description: 'Inline rows, as objects keyed by column name.' },
      intent: { type: 'string', enum: INTENTS, description: 'What the reader must see.' },
      keys: { ...columnList, description: 'Key column(s).' },
      values: { ...columnList, description: 'Value column(s).' },
      title: { type: 'string', description: 'Chart title.' },
      subtitle: { type: 'string', description: 'Line under the title.' },
      source: { type: 'string', description: 'Source line at the foot of the chart.' },
      description: { type: 'string', description: 'Text for screen readers; replaces the generated summary.' },
      fields: { type: 'object', additionalProperties: fieldHint, description: 'Per-column hints, keyed by column name.' },
      form: { type: 'string', enum: FORM_NAMES, description: 'Pin a chart form; the hard rules still apply.' },
      order: { type: 'string', enum: ORDERS, default: 'auto', description: 'Order of bars or rows.' },
      baseline: { type: 'string', enum: ['zero', 'fit'], default: 'zero', description: 'Value-axis baseline; never fit for length-coded marks.' },
      accept: { type: 'array', items: { type: 'string', enum: ACCEPTABLE_CODES }, description: 'Warnings this brief expects (diagnostic codes, e.g. derive.missing-values): reported as info, so check --strict passes. Only warnings can be accepted.' },
      notation: { type: 'string', enum: [...NOTATIONS], default: 'auto', description: 'How large and small numbers are written: words (k, m, bn, tn), si (SI prefix joined to an SI unit, 3.5 GWh), digits (every digit), or auto (si for SI units, words otherwise).' },
      aggregate: { type: 'string', enum: AGGREGATES, default: 'sum', description: 'How rows sharing a key are combined.' },
      style: { type: 'string', minLength: 1, default: 'report', description: 'Style preset name or path to a style file.' },
      size: {
        type: 'object',
        additionalProperties: false,
        description: 'Frame size in CSS pixels.',
        properties: {
          width: { type: 'integer', minimum: 160, maximum: 4000 },
          // A bare chart (no title, subtitle, notes or source) of one key needs about 150 px at 160 wide
          // (test/layout/frame-minimum.test.ts); words need more, and layout.frame-too-small names the least frame.
          height: { type: 'integer', minimum: 160, maximum: 4000, description: 'At least 160: the least frame in which a bare chart draws a readable plot; a title and a source need about 100 px more.' },
        },
      },
      output: {
        description: 'Output file(s): .svg and/or .png, relative to the brief.',
        anyOf: [{ type: 'string', minLength: 1 }, { type: 'array', items: { type: 'string', minLength: 1 }, minItems: 1 }],
      },
      index: {
        type: 'object',
        additionalProperties: false,
        description: 'For intent change: the base of the index.',
        properties: {
          base: { anyOf: [{ type: 'string' }, { type: 'number' }], description: '"first", "previous" (period-over-period bars), or a key value.' },
          as: { type: 'string', enum: ['index', 'percent'], description: 'Shown as base = 100 (index) or as % change since the base. Default: index.' },
        },
      },
      start: { type: 'string', minLength: 1, description: 'For intent schedule: the start column.' },
      end: { type: 'string', minLength: 1, description: 'For intent schedule: the end column.' },
      color: { type: 'string', minLength: 1, description: 'For intent correlation: the column coded by colour.' },
      shape: { type: 'string', minLength: 1, description: 'For intent correlation: the column coded by shape.' },
      area: { type: 'string', minLength: 1, description: 'For intent correlation: the column whose value each circle\'s area shows (`size` is the frame).' },
      after: { type: 'string', minLength: 1, description: 'For intent schedule: the column naming each task\'s predecessor.' },
      fit: { type: 'string', enum: ['linear'], description: 'For intent correlation: draw a least-squares line through the points.' },
      facet: {
        description: 'Small multiples: one panel per level of this column, all on shared scales; `{ by, context: true }` also draws the other panels in grey behind each.',
        anyOf: [{ type: 'string', minLength: 1 }, { type: 'object', additionalProperties: false, required: ['by'], properties: { by: { type: 'string', minLength: 1 }, context: { type: 'boolean', default: false } } }],
      },
      linkage: { type: 'string', enum: LINKAGE_NAMES, description: 'For intent matrix: how clusters of rows and columns are joined (default average).' },
      distance: { type: 'string', enum: DISTANCE_NAMES, description: 'For intent matrix: how rows and columns are compared (default euclidean).' },
      standardize: { type: 'boolean', description: 'For intent matrix: scale each row to mean 0 and standard deviation 1 before clustering.' },
      locale: { type: 'string', enum: [...LOCALES], default: 'en', description: 'How the numbers and dates drawn on the chart are written: en (1,234.5; 4.2m; Oct 2026) or de (1.234,5; 4,2 Mio.; Okt. 2026). Sentences stay English; reading the data is set per column with fields.<col>.decimal.' },
    },
  };
}
