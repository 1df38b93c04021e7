/** The storage type of a column, as inferred from its cells (or forced by a field hint). */
export type ColumnType = 'number' | 'date' | 'boolean' | 'text';

/** How finely a date column's values are given, used to label them. */
export type DateGrain = 'year' | 'month' | 'day' | 'minute' | 'second';

/** One column of a table, stored columnar. `null` marks a missing or unusable cell. */
export interface Column {
  name: string;
  type: ColumnType;
  /** Numbers for `number`, epoch milliseconds (UTC) for `date`, booleans, or strings. */
  values: (number | string | boolean | null)[];
  /** The cell as written in the source, trimmed; used for labels. `null` when absent. */
  text: (string | null)[];
  /** Row indexes (0-based) whose cell is missing or could not be read as the column's type. */
  missing: number[];
  /** For `number` columns: the currency or percent sign its cells are written with ("61.2%", "$640"), if any. */
  unit?: string;
  /** For `date` columns: the finest grain any value is given at. */
  grain?: DateGrain;
  /** For `date` columns whose every value is written as a quarter (`2025-Q1`, `Q1 2025`): named as quarters. */
  quarterly?: true;
}

/** Where a table came from, for messages. */
export interface TableOrigin {
  /** The data file as the brief names it, or "<stdin>" or "<rows>". */
  file: string;
  format: 'csv' | 'tsv' | 'json' | 'ndjson' | 'rows';
}

/** A columnar table. Every column has `rowCount` cells. */
export interface Table {
  origin: TableOrigin;
  columns: Column[];
  rowCount: number;
  /**
   * Where each row is in the source, for messages: 1-based line numbers for CSV, TSV and
   * NDJSON; 1-based item numbers for JSON arrays and inline rows.
   */
  rowPositions: number[];
  /** What `rowPositions` counts: "line" or "row". */
  positionNoun: 'line' | 'row';
}

/** Finds a column by name. */
export function columnOf(table: Table, name: string): Column | undefined {
  return table.columns.find((c) => c.name === name);
}
