import type { Locale, Notation } from '../brief/types.js';

/** What a formatter needs to know of a field: the user's d3-format specifier, its unit, the notation, the locale. */
export interface NumberStyle {
  format?: string | undefined;
  unit?: string | undefined;
  notation?: Notation | undefined;
  /** Whose marks and scale words it is written in. Default: English. */
  locale?: Locale | undefined;
}

/**
 * Units that take SI prefixes (BIPM, The International System of Units, 9th ed., 2019, tables
 * 2–4 and 8; B and bit by IEC 80000-13): base and derived units and the accepted non-SI ones
 * with which prefixes are used (Wh, L, t, eV).
 */
const SI_UNITS = new Set([
  'm', 'g', 's', 'A', 'K', 'mol', 'cd', 'Hz', 'N', 'Pa', 'J', 'W', 'C', 'V', 'F', 'Ω', 'S', 'Wb', 'T', 'H',
  'lm', 'lx', 'Bq', 'Gy', 'Sv', 'Wh', 'VA', 'eV', 'L', 't', 'B', 'bit', 'b', 'bps', 'B/s', 'bit/s',
]);

/** True when `unit` is one of the units SI prefixes are joined to. */
export function isSiUnit(unit: string | undefined): boolean {
  return siBase(unit) !== undefined;
}

/** SI prefixes a unit may already carry (BIPM SI Brochure, 9th ed., table 7; h for hPa, c for cm). */
const PREFIX_FACTORS: Record<string, number> = { P: 1e15, T: 1e12, G: 1e9, M: 1e6, k: 1e3, h: 1e2, c: 1e-2, m: 1e-3, 'µ': 1e-6, u: 1e-6, n: 1e-9, p: 1e-12 };

/**
 * An SI unit with the prefix it carries: km is m × 1e3, MW is W × 1e6, GB is B × 1e9. A bare
 * SI unit has factor 1; undefined for units that take no SI prefix (€, stays, "pH units").
 */
export function siBase(unit: string | undefined): { base: string; factor: number } | undefined {
  const u = unit?.trim();
  if (!u) return undefined;
  if (SI_UNITS.has(u)) return { base: u, factor: 1 };
  const prefix = u.charAt(0);
  const base = u.slice(1);
  return PREFIX_FACTORS[prefix] !== undefined && SI_UNITS.has(base) ? { base, factor: PREFIX_FACTORS[prefix] } : undefined;
}

/** The notation `auto` stands for with a unit: `si` for SI units, `words` for everything else. */
export function notationFor(style: NumberStyle): Exclude<Notation, 'auto'> {
  if (style.notation && style.notation !== 'auto') return style.notation;
  return isSiUnit(style.unit) ? 'si' : 'words';
}

/**
 * Units whose values do not add up: shares, ratios on a log scale, and temperatures on interval
 * scales (three labs' pH of 7 is not a pH of 21). Common practice.
 */
const NON_ADDITIVE_UNITS = new Set(['%', '‰', '°c', '°f', 'k', 'ph', 'db', 'percent', 'per cent']);

/** Whether values in this unit may be summed (true when there is no unit); "pH units" reads as pH. */
export function isAdditiveUnit(unit: string | undefined): boolean {
  return unit === undefined || !NON_ADDITIVE_UNITS.has(unit.trim().toLowerCase().replace(/\s+units?$/, ''));
}
