/**
 * Numbers as people write them in spreadsheets and reports: with a currency sign before or
 * after ("$640", "€4.2", "4,2 €", "-$5", "$-5"), a percent sign after ("61.2%"), and thousands
 * grouped by spaces ("1 050", also no-break and narrow no-break spaces). The sign is read as the
 * number's unit; the number is read as written (61.2% is 61.2, with unit %).
 */

/** Currency signs read as a number's unit (Unicode block Currency Symbols and the common Latin-1 ones). */
const CURRENCY = '$€£¥₹₩₽₺₴₦₱฿₫₪₿';
const SIGN = '[+\\-\\u2212]';
const UNIT = `[%${CURRENCY}]`;
const AFFIXED = new RegExp(`^(${SIGN}?)\\s*([${CURRENCY}])?\\s*(${SIGN}?)\\s*([^%${CURRENCY}]*?)\\s*(${UNIT})?$`, 'u');
/** Thousands grouped by spaces: one to three digits, then groups of three, then decimals. */
const SPACE_GROUPED = /^\d{1,3}(?:[ \u00a0\u202f]\d{3})+(?:[.,]\d+)?$/;

/** A number cell's text without its unit sign and space grouping, and the unit sign if it had one. */
export interface Affixed {
  core: string;
  unit?: string;
}

/** A cell of digits, signs, points and commas only: no affix to split. */
const BARE = /^[+-]?[\d.,]*$/;

/** Splits a cell into its number text and its unit sign; a cell with two unit signs or two minus signs is left as it is. */
export function splitAffix(text: string): Affixed {
  const t = text.trim();
  // Digits, signs and marks alone carry no affix: the common cell skips the long pattern.
  if (BARE.test(t)) return { core: t };
  const m = AFFIXED.exec(t);
  if (!m) return { core: t };
  const [, before = '', lead, after = '', body = '', trail] = m;
  if ((before && after) || (lead && trail) || (!lead && !trail && !SPACE_GROUPED.test(body))) return { core: t };
  const digits = SPACE_GROUPED.test(body) ? body.replace(/[ \u00a0\u202f]/g, '') : body;
  const unit = lead ?? trail;
  return unit ? { core: `${before}${after}${digits}`, unit } : { core: `${before}${digits}` };
}
