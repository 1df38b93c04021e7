/** Turns text into an id fragment: lower-case ASCII letters, digits and hyphens. */
export function slug(text: string): string {
  const s = text.normalize('NFKD').replace(/[\u0300-\u036f]/g, '').toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '');
  return s || 'x';
}

/**
 * Makes ids unique within one chart: the first use of a slug keeps it, later ones get -2, -3, …
 * in the order the data gives them. Local to one chart, so ids never depend on other charts.
 */
export function idMaker(): (prefix: string, text: string) => string {
  const used = new Map<string, number>();
  return (prefix, text) => {
    const base = `${prefix}-${slug(text)}`;
    const n = (used.get(base) ?? 0) + 1;
    used.set(base, n);
    return n === 1 ? base : `${base}-${n}`;
  };
}

/** FNV-1a 32-bit hash of a string, as 8 hex digits: a short content-derived id prefix. */
export function contentHash(text: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return (h >>> 0).toString(16).padStart(8, '0');
}
