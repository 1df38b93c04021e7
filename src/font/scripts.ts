/**
 * The Unicode script of a character, from one table of ranges. Coarse on purpose: it names the
 * scripts a chart label is likely to hold, for the missing-glyph warning and the choice of a
 * fallback face. Ranges from Unicode's Scripts.txt (Unicode 15.1), merged where neighbouring
 * blocks belong to the same script; characters outside every range are "Common" (punctuation,
 * digits, symbols) and take the face of the text around them.
 */
export type ScriptName =
  | 'Latin' | 'Greek' | 'Cyrillic' | 'Armenian' | 'Hebrew' | 'Arabic' | 'Devanagari' | 'Bengali'
  | 'Thai' | 'Georgian' | 'Hangul' | 'Hiragana' | 'Katakana' | 'Han' | 'Bopomofo' | 'Ethiopic'
  | 'Emoji' | 'Common' | 'Inherited';

/** [first, last, script]: sorted, non-overlapping. */
const RANGES: ReadonlyArray<readonly [number, number, ScriptName]> = [
  [0x0041, 0x005a, 'Latin'], [0x0061, 0x007a, 'Latin'], [0x00aa, 0x00aa, 'Latin'], [0x00ba, 0x00ba, 'Latin'],
  [0x00c0, 0x00d6, 'Latin'], [0x00d8, 0x00f6, 'Latin'], [0x00f8, 0x024f, 'Latin'], [0x0250, 0x02af, 'Latin'],
  [0x0300, 0x036f, 'Inherited'], [0x0370, 0x03ff, 'Greek'], [0x0400, 0x052f, 'Cyrillic'], [0x0531, 0x058f, 'Armenian'],
  [0x0591, 0x05ff, 'Hebrew'], [0x0600, 0x06ff, 'Arabic'], [0x0750, 0x077f, 'Arabic'], [0x08a0, 0x08ff, 'Arabic'],
  [0x0900, 0x097f, 'Devanagari'], [0x0980, 0x09ff, 'Bengali'], [0x0e00, 0x0e7f, 'Thai'], [0x10a0, 0x10ff, 'Georgian'],
  [0x1100, 0x11ff, 'Hangul'], [0x1200, 0x139f, 'Ethiopic'], [0x1e00, 0x1eff, 'Latin'], [0x1f00, 0x1fff, 'Greek'],
  [0x200c, 0x200d, 'Inherited'], [0x2e80, 0x2fdf, 'Han'], [0x3005, 0x3005, 'Han'], [0x3007, 0x3007, 'Han'],
  [0x3021, 0x3029, 'Han'], [0x3038, 0x303b, 'Han'], [0x3041, 0x309f, 'Hiragana'], [0x30a0, 0x30ff, 'Katakana'],
  [0x3100, 0x312f, 'Bopomofo'], [0x3130, 0x318f, 'Hangul'], [0x31f0, 0x31ff, 'Katakana'], [0x3400, 0x4dbf, 'Han'],
  [0x4e00, 0x9fff, 'Han'], [0xa960, 0xa97f, 'Hangul'], [0xac00, 0xd7ff, 'Hangul'], [0xf900, 0xfaff, 'Han'],
  [0xfb1d, 0xfb4f, 'Hebrew'], [0xfb50, 0xfdff, 'Arabic'], [0xfe00, 0xfe0f, 'Inherited'], [0xfe70, 0xfeff, 'Arabic'],
  [0xff66, 0xff9f, 'Katakana'], [0xffa0, 0xffdc, 'Hangul'], [0x1f000, 0x1faff, 'Emoji'], [0x20000, 0x3134f, 'Han'],
];

/** The script of a code point (binary search of RANGES). */
export function scriptOf(cp: number): ScriptName {
  let lo = 0;
  let hi = RANGES.length - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    const [first, last, script] = RANGES[mid]!;
    if (cp < first) hi = mid - 1;
    else if (cp > last) lo = mid + 1;
    else return script;
  }
  // Pictographs outside the Emoji block (U+2600-27BF: Miscellaneous Symbols and Dingbats) read as emoji too.
  return cp >= 0x2600 && cp <= 0x27bf ? 'Emoji' : 'Common';
}

/** Whether a script names no letters of its own: its characters go with the text around them. */
export function isNeutral(script: ScriptName): boolean {
  return script === 'Common' || script === 'Inherited';
}

/** Whether the text holds a right-to-left letter (Hebrew or Arabic), so it needs the bidirectional algorithm. */
export function hasRightToLeft(text: string): boolean {
  return /[\u0590-\u08ff\ufb1d-\ufdff\ufe70-\ufeff]/.test(text);
}

/** The distinct scripts of some characters, in first-seen order. */
export function scriptsOf(chars: Iterable<string>): ScriptName[] {
  const seen = new Set<ScriptName>();
  for (const ch of chars) seen.add(scriptOf(ch.codePointAt(0)!));
  return [...seen];
}
