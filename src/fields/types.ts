import type { FieldType, Locale, Notation } from '../brief/types.js';
import type { Column } from '../table/types.js';

/** The part a field plays in the chart. */
export type FieldRole = 'key' | 'value' | 'other';

/** A typed field: a column with its measurement type, role and presentation hints. */
export interface Field {
  name: string;
  /** Readable name for titles: the hint's label or the column name made readable. */
  label: string;
  type: FieldType;
  role: FieldRole;
  unit: string | undefined;
  format: string | undefined;
  /** Whether its values may be added up (the hint's `additive`, else false for units such as %, °C, pH). */
  additive: boolean;
  /** How its large and small numbers are written (the brief's `notation`). */
  notation: Notation;
  /** For categorical, ordinal and cyclic fields: the levels, in their meaningful order (first appearance for categorical). */
  levels: string[];
  column: Column;
  /** `arbitrary` when the brief says the field's zero means nothing (`fields.<col>.zero`). Default: absent. */
  zero?: 'arbitrary';
  /** How its numbers and dates are written on the chart (the brief's `locale`). Default: absent, English. */
  locale?: Locale;
}

/** A field as plans refer to it: its name and presentation, never its column of data. */
export type FieldRef = Pick<Field, 'name' | 'label' | 'type' | 'unit' | 'format' | 'levels'> & Partial<Pick<Field, 'notation' | 'additive' | 'locale'>>;

/** The reference to a field that a plan keeps. */
export function refOf(field: Field): FieldRef {
  return { name: field.name, label: field.label, type: field.type, unit: field.unit, format: field.format, notation: field.notation, additive: field.additive, levels: field.levels, ...(field.locale ? { locale: field.locale } : {}) };
}

/** The fields of a brief: its keys and values in brief order, then every other column. */
export interface Fields {
  keys: Field[];
  values: Field[];
  all: Field[];
}

/** True for types whose order means something (so bars keep key order and are not re-sorted). */
export function isOrdered(type: FieldType): boolean {
  return type === 'ordinal' || type === 'temporal' || type === 'cyclic' || type === 'quantitative';
}
