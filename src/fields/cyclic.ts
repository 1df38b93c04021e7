import { CYCLES } from './labels.js';

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

