/** Levenshtein edit distance between two strings (case-insensitive). */
export function editDistance(a: string, b: string): number {
  const s = a.toLowerCase();
  const t = b.toLowerCase();
  let prev = Array.from({ length: t.length + 1 }, (_, j) => j);
  for (let i = 1; i <= s.length; i++) {
    const row = [i];
    for (let j = 1; j <= t.length; j++) {
      const cost = s[i - 1] === t[j - 1] ? 0 : 1;
      row.push(Math.min(prev[j]! + 1, row[j - 1]! + 1, prev[j - 1]! + cost));
    }
    prev = row;
  }
  return prev[t.length]!;
}

/**
 * The closest candidate to a misspelt name, if it is close enough to be a likely typo:
 * within a third of the name's length in edits (at least 1, at most 3), or a case/spacing variant.
 */
export function nearestName(found: string, candidates: readonly string[]): string | undefined {
  const squash = (s: string) => s.toLowerCase().replace(/[\s_\-]+/g, '');
  const exactish = candidates.find((c) => squash(c) === squash(found));
  if (exactish !== undefined) return exactish;
  // A long shared start catches words that were extended or cut ("comparison" for "compare").
  const prefix = (a: string, b: string) => { let i = 0; while (i < a.length && i < b.length && a[i] === b[i]) i++; return i; };
  const byPrefix = candidates
    .map((c) => ({ c, n: prefix(squash(c), squash(found)) }))
    .filter(({ c, n }) => n >= 4 && n >= 0.75 * Math.min(squash(c).length, squash(found).length))
    .sort((a, b) => b.n - a.n || (a.c < b.c ? -1 : 1))[0];
  if (byPrefix) return byPrefix.c;
  const limit = Math.min(3, Math.max(1, Math.floor(found.length / 3)));
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const c of candidates) {
    const d = editDistance(found, c);
    if (d < bestDistance || (d === bestDistance && best !== undefined && c < best)) {
      best = c;
      bestDistance = d;
    }
  }
  return bestDistance <= limit ? best : undefined;
}

/** "did you mean `x`?" or a list of the allowed names. */
export function suggestionHint(found: string, candidates: readonly string[], what = 'column'): string {
  const near = nearestName(found, candidates);
  if (near !== undefined) return `did you mean \`${near}\`?`;
  const list = candidates.slice(0, 12).map((c) => `\`${c}\``).join(', ');
  return candidates.length ? `the ${what}s are ${list}${candidates.length > 12 ? ', …' : ''}` : `there are no ${what}s to choose from`;
}
