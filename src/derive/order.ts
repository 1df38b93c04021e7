/** Code-point string comparison: the same on every machine, unlike locale collation. */
export function compareText(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/**
 * Natural comparison: runs of digits compare as numbers, so "Pier 2" comes before "Pier 10".
 * Case is folded first; ties fall back to code points so the order is total.
 */
export function compareNatural(a: string, b: string): number {
  const split = (s: string) => s.toLowerCase().match(/\d+|\D+/g) ?? [];
  const pa = split(a);
  const pb = split(b);
  for (let i = 0; i < Math.min(pa.length, pb.length); i++) {
    const x = pa[i]!;
    const y = pb[i]!;
    if (x === y) continue;
    const nx = /^\d/.test(x) && /^\d/.test(y) ? Number(x) - Number(y) : 0;
    if (nx !== 0) return nx;
    const c = compareText(x, y);
    if (c !== 0) return c;
  }
  return pa.length - pb.length || compareText(a, b);
}
