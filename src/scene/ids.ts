/** Longest text an id fragment is made from; longer labels share their first part (ids stay unique through -2, -3). */
const SLUG_SOURCE = 200;

/** Turns text into an id fragment: lower-case ASCII letters, digits and single hyphens. */
export function slug(text: string): string {
  const head = text.length > SLUG_SOURCE ? text.slice(0, SLUG_SOURCE) : text;
  // Only non-ASCII text needs decomposing (é → e + accent, then the accent is dropped).
  const source = /^[\x00-\x7f]*$/.test(head) ? head : head.normalize('NFKD');
  let out = '';
  let gap = false;
  for (let i = 0; i < source.length; i++) {
    let c = source.charCodeAt(i);
    if (c >= 65 && c <= 90) c += 32;
    if ((c >= 97 && c <= 122) || (c >= 48 && c <= 57)) {
      if (gap && out) out += '-';
      out += String.fromCharCode(c);
      gap = false;
    } else if (c < 0x300 || c > 0x36f) gap = true;
  }
  return out || 'x';
}

/**
 * Makes ids unique within one chart: the first use of a slug keeps it, later ones get -2, -3, …
 * in the order the data gives them. Local to one chart, so ids never depend on other charts.
 */
export function idMaker(): (prefix: string, text: string) => string {
  const used = new Map<string, number>();
  // A chart asks for ids of one text under several prefixes (bar, label, tick): slugged once.
  const slugs = new Map<string, string>();
  const slugOf = (text: string) => {
    let s = slugs.get(text);
    if (s === undefined) slugs.set(text, (s = slug(text)));
    return s;
  };
  return (prefix, text) => {
    const base = `${prefix}-${slugOf(text)}`;
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
