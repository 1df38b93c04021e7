/**
 * Text keys whose order is in their spelling, though they are not dates: numeric bands
 * (`18-24`, `25–34`), open-ended bands (`65+`, `<18`, `under 5`, `over 80`) and fiscal years
 * (`FY2025`, `FY 2025/26`). Each is ordered by its lower bound (an open band below a number
 * comes before the band that starts at it).
 */

const NUMBER = String.raw`\d+(?:\.\d+)?`;
const BAND = new RegExp(String.raw`^(${NUMBER})\s*(?:-|–|—|to)\s*(${NUMBER})$`, 'i');
const PLUS = new RegExp(String.raw`^(${NUMBER})\s*\+$|^(${NUMBER})\s*(?:and|or)\s+(?:over|older|above|more)$`, 'i');
const BELOW = new RegExp(String.raw`^(?:<|≤|<=|under|below|less than)\s*(${NUMBER})$`, 'i');
const ABOVE = new RegExp(String.raw`^(?:>|≥|>=|over|above|more than)\s*(${NUMBER})$`, 'i');
const FISCAL = /^FY\s?'?(\d{2}|\d{4})(?:\s?[/-]\s?(\d{2}|\d{4}))?$/i;

/** Where a band starts; an open band "under 18" sorts just before 18, "over 80" just after 80. */
function bandStart(text: string): number | undefined {
  let m = BAND.exec(text);
  if (m) return Number(m[1]) <= Number(m[2]) ? Number(m[1]) : undefined;
  if ((m = PLUS.exec(text))) return Number(m[1] ?? m[2]);
  if ((m = BELOW.exec(text))) return Number(m[1]) - 0.5;
  if ((m = ABOVE.exec(text))) return Number(m[1]) + 0.5;
  return undefined;
}

/** The year a fiscal year is named by (its first year, "FY24" as 2024). */
function fiscalStart(text: string): number | undefined {
  const m = FISCAL.exec(text);
  if (!m) return undefined;
  return m[1]!.length === 2 ? 2000 + Number(m[1]) : Number(m[1]);
}

/** Texts in the order of the first reader that reads every one, or undefined; ties keep their first-appearance order. */
function orderBy(texts: readonly string[], read: (t: string) => number | undefined): string[] | undefined {
  const starts = texts.map(read);
  if (starts.some((s) => s === undefined)) return undefined;
  return texts.map((t, i) => ({ t, s: starts[i]!, i })).sort((a, b) => a.s - b.s || a.i - b.i).map((x) => x.t);
}

/**
 * The levels of a text key in their own order when every level (at least two) is a band or
 * every level a fiscal year, else undefined. `levels` are distinct, in first-appearance order.
 */
export function orderedTextLevels(levels: readonly string[]): { levels: string[]; kind: 'bands' | 'fiscal years' } | undefined {
  if (levels.length < 2) return undefined;
  const trimmed = levels.map((l) => l.trim());
  const bands = orderBy(trimmed, bandStart);
  if (bands) return { levels: bands.map((t) => levels[trimmed.indexOf(t)]!), kind: 'bands' };
  const fiscal = orderBy(trimmed, fiscalStart);
  return fiscal ? { levels: fiscal.map((t) => levels[trimmed.indexOf(t)]!), kind: 'fiscal years' } : undefined;
}

// Digit-led, after at most a comparison or currency sign: "10-19 kg", "3rd", "2+ rooms", "$10-20", "<5 km".
const DIGIT_LED = /^[<>≤≥~$€£¥]?\s*\d/;

/** Whether every level looks ordered (digit-led, ranges included) though no recognised spelling reads them all. */
export function looksOrdered(levels: readonly string[]): boolean {
  return levels.length >= 2 && levels.every((l) => DIGIT_LED.test(l));
}
