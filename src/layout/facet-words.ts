import type { Box, SceneNode, TextNode } from '../scene/types.js';
import type { CartesianForm } from './compose.js';
import type { FormWords, LayoutContext } from './kit-types.js';
import { textNode, truncateText } from './text.js';
import { inSentence } from '../fields/labels.js';

/** How strongly the grey context of other panels shows (common practice: light enough to read as background). */
const CONTEXT_OPACITY = 0.35;

/** The note under a chart whose panels do not all fit: how many are drawn and which are not. */
export function refusalNote(levels: readonly string[], shown: number, total: number): string {
  const list = `${levels.slice(0, 3).join(', ')}${levels.length > 3 ? ', …' : ''}`;
  return `${shown} of ${total} panels are drawn; ${levels.length === 1 ? 'this one does' : `these ${levels.length} do`} not fit at a readable size: ${list}.`;
}

/**
 * The words of a small-multiples chart: the whole chart's title, a description that says how it
 * is split, and the panels' notes, each once.
 */
export function facetWords<D>(form: CartesianForm<D>, whole: D, panels: readonly { level: string; derived: D; memo: Map<string, unknown> }[], spec: { label: string }, ctx: LayoutContext): FormWords {
  const words = form.words(whole, ctx);
  const notes = [...new Set(panels.flatMap((p) => form.words(p.derived, { ...ctx, memo: p.memo }).notes))];
  const levels = panels.map((p) => p.level);
  const list = `${levels.slice(0, 6).join(', ')}${levels.length > 6 ? ', …' : ''}`;
  const description = `${words.description} Drawn as ${levels.length} panel${levels.length === 1 ? '' : 's'}, one per ${inSentence(spec.label)}: ${list}.`;
  return { title: words.title, description, notes };
}

/** A panel's title: its facet level, left-aligned on its cell's top edge, shortened with "…" to the cell's width. */
export function panelTitle(level: string, cell: Box, ctx: LayoutContext): TextNode {
  const style = ctx.style.text.axisTitle;
  const text = truncateText(ctx.measure, level, style, cell.width);
  const node = textNode(ctx.measure, { id: ctx.id('panel-title', level), role: 'panel-title', text, style, x: cell.x, top: cell.y, anchor: 'start' });
  return text === level ? node : { ...node, full: level };
}

/** Other panels' marks as grey context behind a panel's own: the same geometry, in the style's grey, faint, with no datum. */
export function greyed(nodes: readonly SceneNode[], ctx: LayoutContext): SceneNode[] {
  const grey = ctx.style.palette.others;
  return nodes.map((n) => {
    const { datum: _datum, ...rest } = n;
    const id = ctx.id('context', n.id);
    if (rest.kind === 'group') return { ...rest, id, role: 'context', children: greyed(rest.children, ctx) };
    if (rest.kind === 'path') return { ...rest, id, role: 'context', ...(rest.stroke ? { stroke: grey } : {}), ...(rest.fill ? { fill: grey } : {}), opacity: CONTEXT_OPACITY };
    if (rest.kind === 'rect' || rest.kind === 'circle') return { ...rest, id, role: 'context', fill: grey, ...(rest.stroke ? { stroke: grey } : {}), opacity: CONTEXT_OPACITY };
    return { ...rest, id, role: 'context' };
  });
}
