import { severityOf, type DiagnosticCode, type Severity } from './catalogue.js';

/**
 * A problem or note found while rendering, as data. Positions are structure; they are turned
 * into words in one place (`formatDiagnostic`).
 */
export interface Diagnostic {
  code: DiagnosticCode;
  severity: Severity;
  message: string;
  /** The file the problem is in (brief or data file), when there is one. */
  file?: string;
  /** JSON-pointer-like path into the brief, e.g. `/fields/month/type`. */
  path?: string;
  /** 1-based line (and column) in `file`. */
  line?: number;
  column?: number;
  /** Data rows concerned, as 1-based line numbers of the data file (or row indexes for inline rows). */
  rows?: number[];
  /** The column (field) concerned. */
  field?: string;
  expected?: string;
  found?: string;
  /** How to fix it. Every error a user can cause has one. */
  hint?: string;
}

/** The details a diagnostic may carry beyond its code and message. */
export type DiagnosticDetails = Omit<Diagnostic, 'code' | 'severity' | 'message'>;

/** Builds a diagnostic with the catalogued severity for its code. */
export function diagnostic(code: DiagnosticCode, message: string, details: DiagnosticDetails = {}): Diagnostic {
  const d: Diagnostic = { code, severity: severityOf(code), message };
  for (const [k, v] of Object.entries(details)) {
    if (v !== undefined) (d as unknown as Record<string, unknown>)[k] = v;
  }
  return d;
}

/** True when any diagnostic is an error. */
export function hasErrors(diagnostics: readonly Diagnostic[]): boolean {
  return diagnostics.some((d) => d.severity === 'error');
}

/** The result of a stage that can fail: a value, or none, and what was noticed on the way. */
export type Outcome<T> =
  | { ok: true; value: T; diagnostics: Diagnostic[] }
  | { ok: false; diagnostics: Diagnostic[] };

/** A successful outcome. */
export function success<T>(value: T, diagnostics: Diagnostic[] = []): Outcome<T> {
  return { ok: true, value, diagnostics };
}

/** A failed outcome; the diagnostics must contain at least one error. */
export function failure<T>(diagnostics: Diagnostic[]): Outcome<T> {
  return { ok: false, diagnostics };
}

/** Sets the file on diagnostics that do not name one yet. */
export function inFile(diagnostics: Diagnostic[], file: string | undefined): Diagnostic[] {
  if (!file) return diagnostics;
  return diagnostics.map((d) => (d.file ? d : { ...d, file }));
}

/** Summarises a list of data rows for a message: "lines 4, 9 and 12" or "lines 4, 9, 12 and 37 more". */
export function describeRows(rows: readonly number[], noun = 'line'): string {
  const shown = rows.slice(0, 5).map(String);
  const rest = rows.length - shown.length;
  const plural = rows.length === 1 ? noun : `${noun}s`;
  if (rest > 0) return `${plural} ${shown.join(', ')} and ${rest} more`;
  if (shown.length === 1) return `${plural} ${shown[0]}`;
  return `${plural} ${shown.slice(0, -1).join(', ')} and ${shown[shown.length - 1]}`;
}
