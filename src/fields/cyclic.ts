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

/** How many of CYCLES' first entries are calendar cycles (months, weekdays), whose every place exists whether or not the data has it. */
const CALENDAR_CYCLES = 4;

/** A level written as the data writes its levels: upper case, lower case, or a capital first. */
function writtenAs(sample: readonly string[]): (name: string) => string {
  if (sample.every((l) => l === l.toUpperCase())) return (n) => n.toUpperCase();
  if (sample.every((l) => l === l.toLowerCase())) return (n) => n;
  return (n) => `${n.charAt(0).toUpperCase()}${n.slice(1)}`;
}

/**
 * The whole calendar cycle the levels belong to (12 months or 7 weekdays), written as the data
 * writes them, when the levels are months or weekdays; otherwise undefined (compass points and
 * other cycles have no fixed count of places: the data's own levels are the cycle).
 */
export function wholeCycle(levels: readonly string[]): string[] | undefined {
  if (levels.length < 3 || levels.some((l) => l.endsWith('.'))) return undefined;
  const lower = levels.map((l) => l.toLowerCase());
  const cycle = CYCLES.slice(0, CALENDAR_CYCLES).find((c) => lower.every((l) => c.includes(l)));
  if (!cycle) return undefined;
  const write = writtenAs(levels);
  const present = new Map(levels.map((l) => [l.toLowerCase(), l]));
  return cycle.map((name) => present.get(name) ?? write(name));
}
