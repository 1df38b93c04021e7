/**
 * Whether a value read where a brief was expected is really a table: CSV or TSV text (which YAML
 * reads as one string) or a JSON list of row objects. Said so in the error, with the fix.
 */
export function tableLike(value: unknown): 'delimited' | 'rows' | undefined {
  if (Array.isArray(value)) {
    return value.length > 0 && value.every((row) => row !== null && typeof row === 'object' && !Array.isArray(row)) ? 'rows' : undefined;
  }
  if (typeof value !== 'string') return undefined;
  // YAML folds a plain multi-line scalar into one line, so the header and rows arrive joined by spaces.
  const words = value.split(/[\n ]+/, 1000);
  const separator = [',', '\t', ';'].find((s) => words[0]!.includes(s));
  return separator !== undefined && words.slice(1).some((w) => w.includes(separator)) ? 'delimited' : undefined;
}

/** The hint for a table passed as a brief. */
export const TABLE_AS_BRIEF_HINT = 'this looks like a table, not a brief: write a brief that names it with `data: <file>` (and `intent:`, `keys:`, `values:`), and pass the brief';
