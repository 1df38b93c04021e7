/** Longest name compared by edit distance: longer names are no typos worth a suggestion, and the comparison is quadratic in length. */
export const MAX_SUGGEST_LENGTH = 64;

/** Counts the work of suggestions (edit-distance cells computed), for tests that bound it. */
export interface SuggestWork {
  cells: number;
}

/**
 * Edit distance between two strings (case-insensitive): insertions, deletions, substitutions
 * and swaps of two neighbouring letters each count 1 (the optimal string alignment distance,
 * Damerau–Levenshtein restricted to adjacent transpositions), so "titel" is one edit from
 * "title". With a `limit`, it stops as soon as the distance must exceed it and returns `limit + 1`.
 */
export function editDistance(a: string, b: string, limit = Infinity, work?: SuggestWork): number {
  const s = a.toLowerCase();
  const t = b.toLowerCase();
  // The distance is at least the difference in length.
  if (Math.abs(s.length - t.length) > limit) return limit + 1;
  let before: number[] = [];
  let prev = Array.from({ length: t.length + 1 }, (_, j) => j);
  let prevMin = 0;
  for (let i = 1; i <= s.length; i++) {
    const row = [i];
    let rowMin = i;
    for (let j = 1; j <= t.length; j++) {
      const cost = s[i - 1] === t[j - 1] ? 0 : 1;
      let d = Math.min(prev[j]! + 1, row[j - 1]! + 1, prev[j - 1]! + cost);
      if (i > 1 && j > 1 && s[i - 1] === t[j - 2] && s[i - 2] === t[j - 1]) d = Math.min(d, before[j - 2]! + 1);
      row.push(d);
      if (d < rowMin) rowMin = d;
    }
    if (work) work.cells += t.length;
    // A cell draws on the two rows above it, so once two rows in a row exceed the limit, all later ones do.
    if (rowMin > limit && prevMin > limit) return limit + 1;
    before = prev;
    prev = row;
    prevMin = rowMin;
  }
  const distance = prev[t.length]!;
  return distance > limit ? limit + 1 : distance;
}

const squash = (s: string) => s.toLowerCase().replace(/[\s_\-]+/g, '');

function sharedStart(a: string, b: string): number {
  let i = 0;
  while (i < a.length && i < b.length && a[i] === b[i]) i++;
  return i;
}

/**
 * The closest candidate to a misspelt name, if it is close enough to be a likely typo:
 * within a third of the name's length in edits (at least 1, at most 3), or a case/spacing
 * variant. Work is linear in the total length of the names: edit distances are computed only
 * for names up to `MAX_SUGGEST_LENGTH` characters, and stop early past the limit.
 */
export function nearestName(found: string, candidates: readonly string[], work?: SuggestWork): string | undefined {
  const target = squash(found);
  const squashed = candidates.map(squash);
  const exactish = squashed.indexOf(target);
  if (exactish >= 0) return candidates[exactish];
  // A long shared start catches words that were extended or cut ("comparison" for "compare").
  let byPrefix: { c: string; n: number } | undefined;
  candidates.forEach((c, i) => {
    const n = sharedStart(squashed[i]!, target);
    if (n < 4 || n < 0.75 * Math.min(squashed[i]!.length, target.length)) return;
    if (!byPrefix || n > byPrefix.n || (n === byPrefix.n && c < byPrefix.c)) byPrefix = { c, n };
  });
  if (byPrefix) return byPrefix.c;
  if (found.length > MAX_SUGGEST_LENGTH) return undefined;
  const limit = Math.min(3, Math.max(1, Math.floor(found.length / 3)));
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const c of candidates) {
    if (c.length > MAX_SUGGEST_LENGTH) continue;
    const d = editDistance(found, c, limit, work);
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
