import { isMissingText, parseNumberText, type DecimalMark } from './cells.js';
import type { RawCell } from './parse.js';

/** How a column of a semicolon-separated file writes its decimals. */
export type DecimalReading =
  | { ok: true; mark: DecimalMark }
  | { ok: false; comma: string; point: string };

/** Reads a number cell with a decimal point and no grouping commas, as in semicolon-separated files. */
function pointOnly(text: string): number | undefined {
  return text.includes(',') ? undefined : parseNumberText(text, '.');
}

/** Reads the text of number cells. */
export type NumberReader = (text: string) => number | undefined;

/**
 * The number reader for a column: decimal point and grouping commas in comma- and
 * tab-separated files; in semicolon-separated files the column's own decimal mark, and never a
 * grouping comma.
 */
export function numberReader(separator: string | undefined, mark: DecimalMark): NumberReader {
  if (separator !== ';') return (t) => parseNumberText(t, '.');
  return mark === ',' ? (t) => parseNumberText(t, ',') : pointOnly;
}

/** Reads a number either way, to tell whether an ambiguous column is meant as numbers at all. */
export const eitherMark: NumberReader = (t) => parseNumberText(t, ',') ?? pointOnly(t);

/**
 * Decides the decimal mark of one column of a semicolon-separated file, where spreadsheets in
 * decimal-comma locales write "1,25" for 1.25 and "1.250" for 1250. A comma never groups
 * thousands there. A cell that reads only one way ("1,5", "1.250,5" or "0.125", "2.5") settles
 * the column; cells that read two ways ("1.250") follow it. When both kinds appear, or only
 * two-way cells do, the column is ambiguous: guessing could draw it 1000 times too large.
 */
export function decimalMarkOf(cells: readonly RawCell[]): DecimalReading {
  let comma: string | undefined;
  let point: string | undefined;
  let twoWay: string | undefined;
  for (const cell of cells) {
    if (typeof cell !== 'string' || isMissingText(cell)) continue;
    const asComma = parseNumberText(cell, ',');
    const asPoint = pointOnly(cell);
    if (asComma === undefined && asPoint === undefined) continue;
    if (asPoint === undefined) comma ??= cell.trim();
    else if (asComma === undefined) point ??= cell.trim();
    else if (!Object.is(asComma, asPoint)) twoWay ??= cell.trim();
  }
  if (comma !== undefined && point !== undefined) return { ok: false, comma, point };
  if (comma !== undefined) return { ok: true, mark: ',' };
  if (point !== undefined || twoWay === undefined) return { ok: true, mark: '.' };
  return { ok: false, comma: twoWay, point: twoWay };
}
