/** Longest preview of a value shown in a diagnostic. */
const PREVIEW_LENGTH = 40;
/** Deepest nesting a preview looks into; deeper parts are shown as "…". */
const PREVIEW_DEPTH = 3;

function previewPart(value: unknown, depth: number, budget: { left: number }): string {
  if (budget.left <= 0) return '…';
  budget.left--;
  if (typeof value === 'string') return JSON.stringify(value.length > PREVIEW_LENGTH ? value.slice(0, PREVIEW_LENGTH) : value);
  if (typeof value === 'bigint') return `${value}n`;
  if (typeof value === 'function') return 'a function';
  if (typeof value === 'symbol') return 'a symbol';
  if (value === null || typeof value !== 'object') return String(value);
  if (depth >= PREVIEW_DEPTH) return Array.isArray(value) ? '[…]' : '{…}';
  if (Array.isArray(value)) {
    const shown = value.slice(0, 4).map((v) => previewPart(v, depth + 1, budget));
    return `[${shown.join(',')}${value.length > 4 ? ',…' : ''}]`;
  }
  const keys = Object.keys(value).slice(0, 4);
  const shown = keys.map((k) => `${JSON.stringify(k)}:${previewPart((value as Record<string, unknown>)[k], depth + 1, budget)}`);
  return `{${shown.join(',')}${Object.keys(value).length > 4 ? ',…' : ''}}`;
}

/**
 * A short JSON-like text of any value, for the `found` of a diagnostic. Unlike
 * `JSON.stringify` it never throws and does bounded work: BigInts, cycles, values nested
 * thousands deep and huge lists are all shown in at most about 40 characters.
 */
export function preview(value: unknown): string {
  let text: string;
  try {
    text = previewPart(value, 0, { left: 24 });
  } catch {
    text = 'a value that cannot be read'; // a getter or proxy that throws
  }
  return text.length > PREVIEW_LENGTH ? `${text.slice(0, PREVIEW_LENGTH - 3)}...` : text;
}
