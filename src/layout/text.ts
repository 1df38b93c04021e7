import type { TextMeasurer } from '../font/measurer.js';
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
  const width = measure.width(spec.text, style.size, style.weight);
  const ascent = measure.ascent(style.size, style.weight);
  const descent = measure.descent(style.size, style.weight);
  const left = anchor === 'start' ? spec.x : anchor === 'middle' ? spec.x - width / 2 : spec.x - width;
  return {
    kind: 'text', id: spec.id, role: spec.role, text: spec.text, x: spec.x, y: spec.top + ascent, anchor,
    size: style.size, weight: style.weight, fill: style.color,
    box: { x: left, y: spec.top, width, height: ascent + descent },
  };
}

/** Height of a text node's box in a style: ascent plus descent. */
export function textBoxHeight(measure: TextMeasurer, style: TextStyle): number {
  return measure.ascent(style.size, style.weight) + measure.descent(style.size, style.weight);
}

/**
 * Greedy word wrap to a width in px, by measured text. A word wider than the width on its
 * own is broken at characters so no line overflows.
 */
export function wrapText(measure: TextMeasurer, text: string, style: TextStyle, maxWidth: number): string[] {
  const fits = (s: string) => measure.width(s, style.size, style.weight) <= maxWidth;
  const lines: string[] = [];
  for (const paragraph of text.split(/\r?\n/)) {
    let line = '';
    for (const word of paragraph.split(/\s+/).filter(Boolean)) {
      const candidate = line ? `${line} ${word}` : word;
      if (fits(candidate)) { line = candidate; continue; }
      if (line) lines.push(line);
      line = word;
      // Break by code points, so a character outside the BMP is never split in two.
      let chars = [...line];
      while (!fits(line) && chars.length > 1) {
        let cut = chars.length - 1;
        while (cut > 1 && !fits(chars.slice(0, cut).join(''))) cut--;
        lines.push(chars.slice(0, cut).join(''));
        chars = chars.slice(cut);
        line = chars.join('');
      }
    }
    lines.push(line);
  }
  return lines;
}

/** Shortens text with an ellipsis until it fits a width; returns it unchanged if it fits. */
export function truncateText(measure: TextMeasurer, text: string, style: TextStyle, maxWidth: number): string {
  if (measure.width(text, style.size, style.weight) <= maxWidth) return text;
  const chars = [...text];
  let n = chars.length - 1;
  while (n > 0 && measure.width(`${chars.slice(0, n).join('').trimEnd()}…`, style.size, style.weight) > maxWidth) n--;
  return n > 0 ? `${chars.slice(0, n).join('').trimEnd()}…` : '…';
}

/**
 * Fits a label into at most `maxLines` lines of a width: wrapped at spaces by measured text,
 * and only the last line shortened with an ellipsis if the rest still does not fit.
 */
export function fitLabel(measure: TextMeasurer, text: string, style: TextStyle, maxWidth: number, maxLines: number): { lines: string[]; shortened: boolean } {
  if (measure.width(text, style.size, style.weight) <= maxWidth) return { lines: [text], shortened: false };
  const wrapped = maxLines > 1 ? wrapText(measure, text, style, maxWidth) : [text];
  if (wrapped.length <= maxLines) return { lines: wrapped, shortened: false };
  const kept = wrapped.slice(0, maxLines - 1);
  const rest = text.slice(kept.join(' ').length).trim();
  return { lines: [...kept, truncateText(measure, rest, style, maxWidth)], shortened: true };
}
