import type { Notation } from '../brief/types.js';

/** What a formatter needs to know of a field: the user's d3-format specifier, its unit, the notation. */
export interface NumberStyle {
  format?: string | undefined;
  unit?: string | undefined;
  notation?: Notation | undefined;
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
  return unit !== undefined && SI_UNITS.has(unit.trim());
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
