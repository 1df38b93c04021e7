import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { seen, VISIONS, type Vision } from '../color/cvd.js';
import { ciede2000, rgbToLab, type Lab } from '../color/lab.js';
import { hexToRgb } from '../color/srgb.js';
import { contrastRatio, MARK_CONTRAST, TEXT_CONTRAST } from './contrast.js';
import type { Style } from './types.js';

const HEX = /^#[0-9a-f]{6}$/;

/** Checks a style document has every part a render needs, with colours as #rrggbb; each problem names the value found. */
export function checkStyle(value: unknown, file: string): Diagnostic[] {
  const problems: Diagnostic[] = [];
  const s = value as Partial<Style> | null;
  const need = (ok: boolean, what: string, path: string, found?: unknown) => {
    if (!ok) problems.push(diagnostic('brief.bad-style', `the style file is missing or has a bad ${what}`, { file, path, expected: what, ...(found !== undefined ? { found: JSON.stringify(found)?.slice(0, 60) ?? String(found) } : {}), hint: 'start from templates/styles/report.json' }));
  };
  const colour = (c: unknown, what: string, path: string) => need(typeof c === 'string' && HEX.test(c), `${what} (a colour as #rrggbb, e.g. #206c89)`, path, c);
  need(!!s && typeof s === 'object', 'style object', '');
  if (!s || typeof s !== 'object') return problems;
  colour(s.background, 'background colour', '/background');
  for (const key of ['title', 'subtitle', 'source', 'tick', 'axisTitle', 'label', 'note'] as const) {
    const t = s.text?.[key];
    need(!!t && typeof t.size === 'number' && t.size > 0 && (t.weight === 'regular' || t.weight === 'semibold'), `text.${key} (size, weight)`, `/text/${key}`);
    if (t) colour(t.color, `text.${key}.color`, `/text/${key}/color`);
  }
  for (const key of ['primary', 'negative', 'others'] as const) colour(s.palette?.[key], `palette.${key}`, `/palette/${key}`);
  for (const key of ['categorical', 'sequential', 'diverging'] as const) {
    const list = s.palette?.[key];
    if (Array.isArray(list)) list.forEach((c, i) => colour(c, `palette.${key} colour`, `/palette/${key}/${i}`));
  }
  // The family is written into the SVG's font-family attribute: printable text only.
  need(typeof s.font?.family === 'string' && /^[^\u0000-\u001f\u007f-\u009f"'<>&;{}\\]{1,64}$/.test(s.font.family), 'font.family (printable, without quotes, <, >, &, ;, braces or backslashes; up to 64)', '/font/family', s.font?.family);
  for (const key of ['axis', 'grid', 'zero'] as const) colour(s.lines?.[key], `lines.${key}`, `/lines/${key}`);
  need(!!s.spacing && Object.values(s.spacing).every((v) => typeof v === 'number' && Number.isFinite(v) && v >= 0), 'spacing (non-negative numbers)', '/spacing');
  return problems;
}

/**
 * Warns where a complete style's colours fall short of WCAG 2.x against its background: text
 * below 4.5:1 (SC 1.4.3) and bar fills below 3:1 (SC 1.4.11).
 */
export function contrastWarnings(style: Style, file: string): Diagnostic[] {
  const problems: Diagnostic[] = [];
  for (const [key, t] of Object.entries(style.text)) {
    const ratio = contrastRatio(t.color, style.background);
    if (ratio < TEXT_CONTRAST) problems.push(diagnostic('brief.low-contrast', `text.${key} colour ${t.color} has contrast ${ratio.toFixed(2)}:1 on ${style.background}, below the 4.5:1 WCAG 2.x asks of text (SC 1.4.3)`, { file, path: `/text/${key}/color`, found: `${ratio.toFixed(2)}:1`, expected: 'at least 4.5:1', hint: 'darken the text colour or lighten the background' }));
  }
  for (const key of ['primary', 'negative', 'others'] as const) {
    const ratio = contrastRatio(style.palette[key], style.background);
    if (ratio < MARK_CONTRAST) problems.push(diagnostic('brief.low-contrast', `palette.${key} ${style.palette[key]} has contrast ${ratio.toFixed(2)}:1 on ${style.background}, below the 3:1 WCAG 2.1 asks of data marks (SC 1.4.11)`, { file, path: `/palette/${key}`, found: `${ratio.toFixed(2)}:1`, expected: 'at least 3:1', hint: 'use a darker fill, or outline the bars' }));
  }
  return problems;
}

/**
 * Smallest CIEDE2000 difference at which two bar fills count as told apart at a glance
 * (common practice for marks of chart size; no single published threshold).
 */
export const DISTINCT_DE00 = 10;

type Named = [name: string, colour: string];

/** Every pair of a list, in order. */
function pairsOf(list: readonly Named[]): [Named, Named][] {
  return list.flatMap((a, i) => list.slice(i + 1).map((b): [Named, Named] => [a, b]));
}

/**
 * Warns where two of a style's fills come closer than DISTINCT_DE00, for normal vision or under a
 * simulated colour-vision deficiency (Machado et al. 2009, severity 1.0): the bar fills (primary,
 * negative, others), the categorical colours among themselves, and each categorical colour
 * against the reserved negative and others fills. A derived palette whose file records that it
 * keeps those distances (`categoricalVerified`; test/color/palette-file.test.ts re-derives and
 * re-measures the file) is not measured again at every process start.
 */
export function distinctnessWarnings(style: Style, file: string, categoricalVerified = false): Diagnostic[] {
  const fills: Named[] = [['primary', style.palette.primary], ['negative', style.palette.negative], ['others', style.palette.others]];
  if (categoricalVerified) return pairWarnings(pairsOf(fills), file);
  const categorical: Named[] = style.palette.categorical.map((c, i) => [`categorical/${i}`, c]);
  const reserved = categorical.flatMap((c) => fills.slice(1).map((f): [Named, Named] => [f, c]));
  return pairWarnings([...pairsOf(fills), ...pairsOf(categorical), ...reserved], file);
}

/** One warning per pair closer than DISTINCT_DE00 for some reader (the first such vision named). */
function pairWarnings(pairs: readonly [Named, Named][], file: string): Diagnostic[] {
  // Each colour is converted once per vision, not once per pair (this runs at every process start).
  const labs = new Map<string, Lab>();
  const lab = (c: string, v: Vision) => {
    const key = `${c}${v}`;
    if (!labs.has(key)) labs.set(key, rgbToLab(seen(hexToRgb(c), v)));
    return labs.get(key)!;
  };
  const deltaE = (a: string, b: string, v: Vision) => ciede2000(lab(a, v), lab(b, v));
  return pairs.flatMap(([[na, a], [nb, b]]) => {
    const vision = VISIONS.find((v) => deltaE(a, b, v) < DISTINCT_DE00);
    if (vision === undefined) return [];
    const de = deltaE(a, b, vision);
    return [diagnostic('brief.indistinct-colours', `palette.${na} ${a} and palette.${nb} ${b} differ by only ΔE00 ${de.toFixed(1)}${vision === 'normal' ? '' : ` for a reader with ${vision}`}`, {
      file, path: `/palette/${nb}`, found: `ΔE00 ${de.toFixed(1)}`, expected: `at least ${DISTINCT_DE00}`, hint: 'change lightness as well as hue, so the fills differ for every reader',
    })];
  });
}
