import type { TextMeasurer } from '../font/measurer.js';
import type { Box, Role, TextNode } from '../scene/types.js';
import type { Style, TextStyle } from '../style/types.js';
import { capText, lineHeight, textNode, wrapText } from './text.js';

/** The words around a chart: header above, footer below. */
export interface FrameTexts {
  title: string | undefined;
  subtitle: string | undefined;
  source: string | undefined;
  /** Notes printed above the source line, e.g. what an "Others" bar holds. */
  notes: string[];
}

/** The header and footer text, and the box left for the plot and its axes. */
export interface FrameLayout {
  texts: TextNode[];
  body: Box;
}

function block(measure: TextMeasurer, role: Role, text: string, style: TextStyle, x: number, top: number, width: number, lh: number): TextNode[] {
  return wrapText(measure, capText(text), style, width).map((line, i) => textNode(measure, { id: `${role}-${i + 1}`, role, text: line, style, x, top: top + i * lh }));
}

/**
 * Lays out title and subtitle at the top and notes and source at the bottom, each wrapped to
 * the frame width by measured text; the rest of the frame is the body for plot and axes.
 */
export function layoutFrame(texts: FrameTexts, style: Style, size: { width: number; height: number }, measure: TextMeasurer): FrameLayout {
  const { padding, titleGap, blockGap, lineHeight: factor } = style.spacing;
  const x = padding;
  const width = size.width - 2 * padding;
  const nodes: TextNode[] = [];
  let top = padding;
  if (texts.title) {
    const lh = lineHeight(style.text.title, factor);
    const lines = block(measure, 'title', texts.title, style.text.title, x, top, width, lh);
    nodes.push(...lines);
    top += lines.length * lh + titleGap;
  }
  if (texts.subtitle) {
    const lh = lineHeight(style.text.subtitle, factor);
    const lines = block(measure, 'subtitle', texts.subtitle, style.text.subtitle, x, top, width, lh);
    nodes.push(...lines);
    top += lines.length * lh;
  }
  if (texts.title || texts.subtitle) top += blockGap;

  const footer: { role: Role; text: string; style: TextStyle }[] = [
    ...texts.notes.map((n) => ({ role: 'note' as const, text: n, style: style.text.note })),
    ...(texts.source ? [{ role: 'source' as const, text: texts.source, style: style.text.source }] : []),
  ];
  const footerLines = footer.flatMap((f) => wrapText(measure, capText(f.text), f.style, width).map((line) => ({ ...f, text: line })));
  let bottom = size.height - padding;
  const placed: TextNode[] = [];
  const counts = new Map<string, number>();
  for (const line of [...footerLines].reverse()) {
    const lh = lineHeight(line.style, factor);
    bottom -= lh;
    placed.unshift(textNode(measure, { id: '', role: line.role, text: line.text, style: line.style, x, top: bottom }));
  }
  for (const node of placed) {
    const n = (counts.get(node.role) ?? 0) + 1;
    counts.set(node.role, n);
    node.id = `${node.role}-${n}`;
  }
  nodes.push(...placed);
  if (footerLines.length) bottom -= blockGap;
  return { texts: nodes, body: { x, y: top, width, height: Math.max(0, bottom - top) } };
}
