import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { agree, count } from '../diagnostics/words.js';
import { packagesFor } from './fallback-table.js';
import { scriptsOf } from './scripts.js';

/** Labels quoted in the warning at most; the rest are counted. */
const MAX_LABELS = 5;
/** Code points a quoted label keeps before it is cut with an ellipsis. */
const LABEL_CHARS = 24;
/** Code points listed at most. */
const MAX_CODE_POINTS = 8;

function shortened(text: string): string {
  const chars = [...text];
  return chars.length > LABEL_CHARS ? `${chars.slice(0, LABEL_CHARS - 1).join('')}…` : text;
}

function codePoint(ch: string): string {
  return `U+${ch.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')}`;
}

/** How the warning's `expected` names the scripts no face could draw. */
const FONTS_FOR = 'fonts for ';

/**
 * The note a figure carries when the missing-glyph warning is among its diagnostics: the
 * scripts whose characters are drawn as boxes (never the characters themselves: they would be
 * boxes too), so a reader of the PNG knows the boxes stand for text, not what the data holds.
 */
export function missingGlyphsNote(diagnostics: readonly Diagnostic[]): string | undefined {
  const d = diagnostics.find((x) => x.code === 'layout.missing-glyphs');
  if (!d?.expected?.startsWith(FONTS_FOR)) return undefined;
  const scripts = d.expected.slice(FONTS_FOR.length).split(', ');
  const named = scripts.length === 1 ? scripts[0]! : `${scripts.slice(0, -1).join(', ')} and ${scripts.at(-1)!}`;
  return `Empty boxes stand for ${named} characters: no font for them was installed where this chart was made.`;
}

/**
 * The warning for characters no face can draw: the labels affected (a few quoted, shortened),
 * the scripts of the characters (e.g. Han, Arabic) and their first code points, with the
 * fallback package to install for each script as the hint.
 */
export function missingGlyphsWarning(missingByText: ReadonlyArray<{ text: string; missing: readonly string[] }>): Diagnostic[] {
  const chars = new Set<string>();
  const labels: string[] = [];
  for (const { text, missing } of missingByText) {
    if (missing.length === 0) continue;
    for (const ch of missing) chars.add(ch);
    if (!labels.includes(text)) labels.push(text);
  }
  if (chars.size === 0) return [];
  const scripts = scriptsOf(chars);
  const quoted = labels.slice(0, MAX_LABELS).map((l) => `"${shortened(l)}"`).join(', ') + (labels.length > MAX_LABELS ? ` and ${count(labels.length - MAX_LABELS, 'more label')}` : '');
  const points = [...chars].slice(0, MAX_CODE_POINTS).map(codePoint).join(', ') + (chars.size > MAX_CODE_POINTS ? ', …' : '');
  const packages = [...new Set(scripts.flatMap((s) => packagesFor(s).slice(0, 1).map((p) => p.package)))];
  const install = packages.length ? `install the fallback font ${agree(packages.length, 'package', 'packages')} (npm install ${packages.join(' ')}), or ` : '';
  return [diagnostic('layout.missing-glyphs', `no font can draw ${count(chars.size, 'character')} (${scripts.join(', ')}: ${points}) in ${count(labels.length, 'label')}: ${quoted}; ${agree(chars.size, 'it is', 'they are')} drawn as empty boxes`, {
    found: labels.slice(0, MAX_LABELS).map(shortened).join(' | '), expected: `${FONTS_FOR}${scripts.join(', ')}`,
    hint: `${install}name a font file that has them in the style's font.fallback`,
  })];
}
