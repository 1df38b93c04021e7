import { WIDTH_CACHE_MAX_TEXT, type TextMeasurer, type TextRuler } from '../font/measurer.js';
import type { Role, TextNode } from '../scene/types.js';
import type { TextStyle } from '../style/types.js';

/** Height of one line of text in a style, in px. */
export function lineHeight(style: TextStyle, lineHeightFactor: number): number {
  return style.size * lineHeightFactor;
}

/**
 * A text node with its measured box. `top` is the top of the line box; the baseline sits
 * at top + ascent, so boxes of consecutive lines stack without overlap.
 */
export function textNode(measure: TextMeasurer, spec: {
  id: string; role: Role; text: string; style: TextStyle; x: number; top: number; anchor?: TextNode['anchor'];
}): TextNode {
  const { style } = spec;
  const anchor = spec.anchor ?? 'start';
  // No text reaches the scene longer than MAX_LAYOUT_TEXT; the full text is kept as its title.
  const text = capText(spec.text);
  const width = measure.width(text, style.size, style.weight);
  const ascent = measure.ascent(style.size, style.weight);
  const descent = measure.descent(style.size, style.weight);
  const left = anchor === 'start' ? spec.x : anchor === 'middle' ? spec.x - width / 2 : spec.x - width;
  return {
    kind: 'text', id: spec.id, role: spec.role, text, x: spec.x, y: spec.top + ascent, anchor,
    size: style.size, weight: style.weight, fill: style.color,
    box: { x: left, y: spec.top, width, height: ascent + descent },
    ...(text !== spec.text ? { full: spec.text } : {}),
  };
}

/** Height of a text node's box in a style: ascent plus descent. */
export function textBoxHeight(measure: TextMeasurer, style: TextStyle): number {
  return measure.ascent(style.size, style.weight) + measure.descent(style.size, style.weight);
}

/** Longest text, in code points, that layout fits: far beyond any line a chart can show. */
export const MAX_LAYOUT_TEXT = 2000;

/**
 * A text cut to at most `limit` code points, the last an ellipsis, so no text makes layout
 * slow; the full text belongs in the SVG `<title>` and the datum.
 */
export function capText(text: string, limit = MAX_LAYOUT_TEXT): string {
  const max = Math.max(1, Math.floor(limit));
  if (text.length <= max) return text;
  let cut = 0;
  for (let i = 0, n = 0; i < text.length; i++, n++) {
    if (n === max - 1) cut = i;
    if (n === max) return `${text.slice(0, cut).trimEnd()}…`;
    if (text.codePointAt(i)! > 0xffff) i++;
  }
  return text;
}

/** Whether a code point is white space as `\s` (and so `trim`) reads it. */
export function isWhiteSpace(cp: number): boolean {
  if (cp <= 0x20) return cp === 0x20 || (cp >= 0x09 && cp <= 0x0d);
  return cp >= 0xa0 && /\s/.test(String.fromCodePoint(cp));
}

/**
 * The largest k in [lo, hi] for which `fits(k)` holds, or lo if none does. `fits` must hold up
 * to some k and fail beyond it: widths of longer prefixes never shrink, because no kerning
 * pair of the bundled faces outweighs its glyph's advance (test/font checks it). The search
 * gallops from lo, so a cut near the start of a long text costs the log of its own length.
 */
function lastFit(lo: number, hi: number, fits: (k: number) => boolean): number {
  let step = 1;
  for (; lo + step <= hi && fits(lo + step); step *= 2) lo += step;
  hi = Math.min(hi, lo + step - 1);
  while (lo < hi) {
    const mid = lo + Math.ceil((hi - lo) / 2);
    if (fits(mid)) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

/**
 * Greedy wrap of one paragraph whose words are joined by single spaces: calls `emit` with the
 * code point range of each line, and stops early when `emit` returns false. A word wider than
 * the width is broken at the last code point that fits (at least one per line).
 */
function wrapParagraph(r: TextRuler, maxWidth: number, emit: (start: number, end: number) => boolean): boolean {
  let start = 0;
  let end = 0;
  for (let ws = 0; ws < r.length;) {
    let we = ws;
    while (we < r.length && r.codePoint(we) !== 0x20) we++;
    const from = end > 0 ? start : ws;
    if (r.width(from, we) <= maxWidth) {
      start = from;
    } else {
      if (end > 0 && !emit(start, end)) return false;
      start = ws;
      while (we - start > 1 && r.width(start, we) > maxWidth) {
        const cut = lastFit(start + 1, we - 1, (k) => r.width(start, k) <= maxWidth);
        if (!emit(start, cut)) return false;
        start = cut;
      }
    }
    end = we;
    ws = we + 1;
  }
  return emit(start, end);
}

/**
 * Wraps up to `maxLines` lines; with `restAfter`, also the words left after that many lines,
 * joined by single spaces (what a last, shortened line must hold).
 */
function wrapLines(measure: TextMeasurer, text: string, style: TextStyle, maxWidth: number, maxLines: number, restAfter = -1): { lines: string[]; rest: string } {
  const paragraphs = text.split(/\r?\n/).map((p) => p.split(/\s+/).filter(Boolean).join(' '));
  const lines: string[] = [];
  const restFrom = (p: number, tail: string) => [tail, ...paragraphs.slice(p + 1)].filter(Boolean).join(' ');
  let rest = restAfter === 0 ? restFrom(-1, '') : '';
  for (let p = 0; p < paragraphs.length && lines.length < maxLines; p++) {
    // A short paragraph that fits is one line: its width comes from the cache (the ruler gives the
    // same width), and titles and notes mostly fit.
    if (paragraphs[p]!.length <= WIDTH_CACHE_MAX_TEXT && measure.width(paragraphs[p]!, style.size, style.weight) <= maxWidth) {
      lines.push(paragraphs[p]!);
      if (lines.length === restAfter) rest = restFrom(p, '');
      continue;
    }
    const r = measure.ruler(paragraphs[p]!, style.size, style.weight);
    wrapParagraph(r, maxWidth, (start, end) => {
      lines.push(r.slice(start, end));
      if (lines.length === restAfter) rest = restFrom(p, r.slice(end, r.length).trim());
      return lines.length < maxLines;
    });
  }
  return { lines, rest };
}

/**
 * Greedy word wrap to a width in px, by measured text: at most `maxLines` lines (default: all).
 * A word wider than the width on its own is broken at characters so no line overflows. Each
 * paragraph is measured once and every cut found by search, so time grows with the text's
 * length, not its square.
 */
export function wrapText(measure: TextMeasurer, text: string, style: TextStyle, maxWidth: number, maxLines = Infinity): string[] {
  return wrapLines(measure, text, style, maxWidth, maxLines).lines;
}

/** Shortens text with an ellipsis until it fits a width; returns it unchanged if it fits. */
export function truncateText(measure: TextMeasurer, text: string, style: TextStyle, maxWidth: number): string {
  const r = measure.ruler(text, style.size, style.weight);
  if (r.width(0, r.length) <= maxWidth) return text;
  // kept[n]: the first n code points without their trailing white space, as trimEnd leaves them.
  const kept = new Uint32Array(r.length + 1);
  for (let i = 1; i <= r.length; i++) kept[i] = isWhiteSpace(r.codePoint(i - 1)) ? kept[i - 1]! : i;
  // The ellipsis only adds width, so no cut beyond the last whose bare text fits can fit with
  // it; from there, step down to the longest that does (its kerning varies with the last letter).
  let n = lastFit(0, r.length - 1, (k) => r.width(0, kept[k]!) <= maxWidth);
  while (n > 0 && r.width(0, kept[n]!, '…') > maxWidth) n--;
  return n > 0 ? `${r.slice(0, kept[n]!)}…` : '…';
}

/**
 * Fits a label into at most `maxLines` lines of a width: wrapped at spaces by measured text,
 * and only the last line shortened with an ellipsis if the rest still does not fit. Wraps no
 * further than the lines it keeps.
 */
export function fitLabel(measure: TextMeasurer, text: string, style: TextStyle, maxWidth: number, maxLines: number): { lines: string[]; shortened: boolean } {
  if (measure.width(text, style.size, style.weight) <= maxWidth) return { lines: [text], shortened: false };
  const keep = Math.max(1, Math.floor(maxLines) || 1);
  const { lines, rest } = wrapLines(measure, text, style, maxWidth, keep + 1, keep - 1);
  if (lines.length <= keep) return { lines, shortened: false };
  return { lines: [...lines.slice(0, keep - 1), truncateText(measure, rest, style, maxWidth)], shortened: true };
}
