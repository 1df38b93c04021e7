/**
 * The opacity of each of n overlapping marks, so that dense regions darken instead of turning into
 * one solid blot: 1 for a handful, falling as 1/√n, never below `floor` (common practice; no
 * single source).
 */
export function translucency(n: number, scale = 4, floor = 0.05): number {
  if (!(n > 0)) return 1;
  return Math.min(1, Math.max(floor, scale / Math.sqrt(n)));
}
