/** Known cycles: a text column whose every value is one of these is cyclic, in this order. */
const CYCLES: string[][] = [
  ['january', 'february', 'march', 'april', 'may', 'june', 'july', 'august', 'september', 'october', 'november', 'december'],
  ['jan', 'feb', 'mar', 'apr', 'may', 'jun', 'jul', 'aug', 'sep', 'oct', 'nov', 'dec'],
  ['monday', 'tuesday', 'wednesday', 'thursday', 'friday', 'saturday', 'sunday'],
  ['mon', 'tue', 'wed', 'thu', 'fri', 'sat', 'sun'],
  ['n', 'nne', 'ne', 'ene', 'e', 'ese', 'se', 'sse', 's', 'ssw', 'sw', 'wsw', 'w', 'wnw', 'nw', 'nnw'],
];

/**
 * If every level names a place in a known cycle (months, weekdays, compass points), the levels
 * in cycle order; otherwise undefined. Needs at least three distinct levels, so that "S" and
 * "N" alone are not taken for compass points.
 */
export function cycleOrder(levels: readonly string[]): string[] | undefined {
  if (levels.length < 3) return undefined;
  const lower = levels.map((l) => l.toLowerCase().replace(/\.$/, ''));
  for (const cycle of CYCLES) {
    if (lower.every((l) => cycle.includes(l))) {
      return [...levels].sort((a, b) => cycle.indexOf(a.toLowerCase().replace(/\.$/, '')) - cycle.indexOf(b.toLowerCase().replace(/\.$/, '')));
    }
  }
  return undefined;
}
