/** What the reader must see; each intent leads to a family of chart forms. */
export const INTENTS = [
  'compare', 'part-to-whole', 'composition', 'trend', 'change', 'shift', 'schedule',
  'correlation', 'distribution', 'matrix', 'profile', 'flow', 'cycle',
] as const;
export type Intent = (typeof INTENTS)[number];

/**
 * The chart forms of chartwright's design, by name. Only those in the registry (src/forms/registry.ts)
 * are drawn, and only those are offered by the schema and in hints; a brief pinning one of the
 * others is told it is not drawn yet.
 */
export const FORM_NAMES = [
  'bar', 'grouped-bar', 'stacked-bar', 'normalized-bar', 'line', 'index-line', 'slope', 'gantt',
  'scatter', 'histogram', 'strip', 'box', 'heatmap', 'scatter-matrix', 'parallel', 'stream', 'radial-bar', 'donut',
  'change-bar',
  'dot',
  'dense',
] as const;
export type FormName = (typeof FORM_NAMES)[number];

/** Measurement types a field can have. */
export const FIELD_TYPES = ['categorical', 'ordinal', 'quantitative', 'temporal', 'cyclic'] as const;
export type FieldType = (typeof FIELD_TYPES)[number];

export const ORDERS = ['auto', 'value', 'label', 'data', 'cluster'] as const;
export type Order = (typeof ORDERS)[number];

/**
 * How large and small numbers are written: `words` divides by thousand, million, billion,
 * trillion (k, m, bn, tn; for money and counts), `si` joins an SI prefix to an SI unit
 * (3.5 GWh), `digits` writes every digit (2,000,000), and `auto` picks `si` for SI units and
 * `words` otherwise.
 */
export const NOTATIONS = ['auto', 'words', 'si', 'digits'] as const;
export type Notation = (typeof NOTATIONS)[number];

/** How the numbers and dates drawn on a chart are written: decimal and thousands marks, scale words, month names. */
export const LOCALES = ['en', 'de'] as const;
export type Locale = (typeof LOCALES)[number];

export const AGGREGATES = ['sum', 'mean', 'count', 'max', 'min'] as const;
export type Aggregate = (typeof AGGREGATES)[number];

/** Per-column hints from the brief's `fields:` section. */
export interface FieldHint {
  /** Measurement type; wins over inference. Default: inferred from the data. */
  type?: FieldType;
  /** Unit shown in the axis title, e.g. "crossings" or "€". Default: none. */
  unit?: string;
  /** d3-format specifier for numbers, e.g. ",d" or ".1%". Default: chosen from the tick step. */
  format?: string;
  /** Level order for ordinal and cyclic fields. Default: order of first appearance. */
  order?: (string | number)[];
  /** Human-readable name used in titles. Default: the column name made readable. */
  label?: string;
  /** The column's decimal mark: "," reads "4,2" as 4.2 (and "1.050,5" as 1050.5) in any file. Default: "." (in semicolon-separated files, detected per column). */
  decimal?: ',' | '.';
  /** Whether values may be added up; a sum of a non-additive value is refused. Default: false for the units %, ‰, °C, °F, K, pH and dB, true otherwise. */
  additive?: boolean;
  /** Whether the value's zero means "none" ('meaningful') or is an arbitrary point of its scale ('arbitrary', e.g. °C): a line's value axis leaves an arbitrary zero out. Default: 'meaningful'. */
  zero?: 'meaningful' | 'arbitrary';
  /** A meaningful centre of the values (a target, a neutral score): colour diverges from it. Default: none (0 when the data straddle it). */
  midpoint?: number;
}

export const LINKAGE_NAMES = ['single', 'complete', 'average', 'ward'] as const;
export type Linkage = (typeof LINKAGE_NAMES)[number];

export const DISTANCE_NAMES = ['euclidean', 'correlation'] as const;
export type Distance = (typeof DISTANCE_NAMES)[number];

/** Where the table comes from. */
export type DataSource =
  | { kind: 'file'; path: string }
  | { kind: 'stdin' }
  | { kind: 'rows'; rows: Record<string, unknown>[] };

/**
 * A brief with every option present and defaults applied. Downstream stages never ask
 * whether an option was set.
 */
export interface ResolvedBrief {
  /** The data. Required: `data` or `rows`. */
  data: DataSource;
  /** What the reader must see. Required. */
  intent: Intent;
  /** Key columns. Default: [] (the rules then report what is missing). */
  keys: string[];
  /** Value columns. Default: []. */
  values: string[];
  /** Chart title. Default: none. */
  title: string | undefined;
  /** Line under the title. Default: none. */
  subtitle: string | undefined;
  /** Source line at the foot of the chart. Default: none. */
  source: string | undefined;
  /** Text for screen readers; replaces the generated summary. Default: generated. */
  description: string | undefined;
  /** Column hints. Default: {}. */
  fields: Record<string, FieldHint>;
  /** A pinned chart form. Default: undefined (the rules choose). */
  form: FormName | undefined;
  /** Bar or row order. Default: 'auto' (by value for categorical keys, key order otherwise). */
  order: Order;
  /** How large and small numbers are written (k, m, bn, tn; SI prefixes; every digit). Default: 'auto' (SI prefixes for SI units, words otherwise). */
  notation: Notation;
  /** Value-axis baseline. Default: 'zero'. 'fit' is refused for length-coded marks. */
  baseline: 'zero' | 'fit';
  /** How rows with the same key are combined. Default: 'sum'. */
  aggregate: Aggregate;
  /** Whether the brief states `aggregate:` (rows sharing a key are then combined without a warning). */
  aggregateStated: boolean;
  /** Style preset name (from templates/styles) or a path to a style file. Default: 'report'. */
  style: string;
  /**
   * Warnings the brief expects and accepts (diagnostic codes, e.g. `derive.missing-values` for a
   * chart that shows a known gap): reported as info, so `check --strict` passes. The figure's
   * notes still say what they say. Only warnings can be accepted. Default: [].
   */
  accept: string[];
  /** Frame size in CSS pixels. Default: { width: 720, height: 440 }. */
  size: { width: number; height: number };
  /** Which sides of the frame the brief sets; a form may grow a side the brief leaves open (lying bars grow in height to name every bar). */
  sizeFixed: { width: boolean; height: boolean };
  /** Output files, relative to the brief (or -o DIR). Default: [] (the brief's name with .svg). */
  output: string[];
  /** For intent change: the base of the index. Default: undefined. */
  index: { base?: string | number; as?: 'index' | 'percent' } | undefined;
  /** For intent schedule: the columns of each task's start and end. Default: undefined. */
  start: string | undefined;
  end: string | undefined;
  /** For intent correlation: the columns coded by colour, shape and circle area. Default: undefined. */
  color: string | undefined;
  shape: string | undefined;
  area: string | undefined;
  /** For intent schedule: the column naming each task's predecessor (drawn as a dependency). Default: undefined. */
  after: string | undefined;
  /** For intent correlation: a fitted line drawn through the points (`linear`: least squares). Default: undefined (none). */
  fit: 'linear' | undefined;
  /**
   * Small multiples: one panel per level of the column `by`, every panel on one shared x and y
   * scale; `context` draws the other panels' marks in light grey behind each panel's own. The
   * brief's short form `facet: <column>` is `{ by: <column>, context: false }`. Any intent.
   * Default: undefined (one plot).
   */
  facet: { by: string; context: boolean } | undefined;
  /** For intent matrix: how clusters of rows and columns are joined. Default: undefined (average linkage). */
  linkage: Linkage | undefined;
  /** For intent matrix: how rows (and columns) are compared. Default: undefined (Euclidean). */
  distance: Distance | undefined;
  /** For intent matrix: scale each row to mean 0 and standard deviation 1 before clustering rows. Default: undefined (not standardized). */
  standardize: boolean | undefined;
  /**
   * How the numbers and dates drawn on the chart are written: decimal and thousands marks,
   * scale words and month names (`de`: "1.234,5", "4,2 Mio.", "Okt. 2026"). Sentences stay
   * English. Reading the data is separate (`fields.<col>.decimal`). Default: 'en'.
   */
  locale: Locale;
}

/** The intents and forms a brief may name: those the rule table answers and the registry draws. */
export interface BriefVocabulary {
  intents: readonly Intent[];
  forms: readonly FormName[];
  /** The schema over this vocabulary, when it is built once ahead (it is rebuilt per brief otherwise). */
  schema?: import('./schema.js').BriefSchema;
}

/** Intent-specific options that name a column of the data. */
export const COLUMN_OPTIONS = ['start', 'end', 'color', 'shape', 'area', 'after'] as const;
