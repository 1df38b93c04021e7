import type { ResolvedBrief } from '../brief/types.js';
import { inSentence } from '../fields/labels.js';
import { altSentences, capSentences } from '../forms/alt-words.js';
import type { AnyForm } from '../forms/types.js';
import type { LayoutContext } from '../layout/kit-types.js';
import type { Scene } from '../scene/types.js';

/** A form's alt sentences and the chart's own notes (what was folded, combined or left out), or undefined for a form without alt text. */
function sentencesOf(form: AnyForm, derived: unknown, ctx: LayoutContext): { head: string[]; notes: string[] } | undefined {
  if (!form.alt) return undefined;
  return { head: altSentences(form.alt(derived, ctx)), notes: form.words(derived, ctx).notes };
}

/** The scene with its alt text: the brief's `description` when it gives one (it replaces the generated screen-reader text), else the generated text. */
function withAlt(scene: Scene, alt: string | undefined, brief: ResolvedBrief): Scene {
  const text = brief.description ?? alt;
  return text === undefined ? scene : { ...scene, alt: text };
}

/** The alt text of a single chart (what it is, its main reading, and its notes, at most MAX_ALT_CHARS), and the form's own table of what it draws, if it gives one. */
export function chartAlt(scene: Scene, form: AnyForm, derived: unknown, ctx: LayoutContext, withData = false): Scene {
  const s = sentencesOf(form, derived, ctx);
  const data = withData ? form.data?.(derived) : undefined;
  return withAlt(data ? { ...scene, data } : scene, s && capSentences([...s.head, ...s.notes]), ctx.brief);
}

/** One panel of small multiples, as the alt text reads it. */
export interface AltPanel {
  level: string;
  derived: unknown;
  memo: Map<string, unknown>;
}

/**
 * The alt text of small multiples: the whole chart's sentence, how it is split, then one sentence
 * per drawn panel (its level and its reading), then the notes, at most MAX_ALT_CHARS; what does
 * not fit is counted at the end.
 */
export function facetAlt(scene: Scene, form: AnyForm, whole: unknown, panels: readonly AltPanel[], facet: { field: string; label: string }, ctx: LayoutContext): Scene {
  const s = sentencesOf(form, whole, ctx);
  if (!s || !form.alt) return withAlt(scene, undefined, ctx.brief);
  // The whole chart is named only: its panels give the readings.
  const what = `${form.alt(whole, ctx).what}.`;
  const drawn = new Set(scene.panels.map((p) => String(p.facet?.[facet.field] ?? '')));
  const shown = panels.filter((p) => drawn.has(p.level));
  const split = `Drawn as ${shown.length} panel${shown.length === 1 ? '' : 's'}, one per ${inSentence(facet.label)}${shown.length < panels.length ? ` (${panels.length - shown.length} more not drawn)` : ''}.`;
  const each = shown.map((p) => {
    const reading = form.alt!(p.derived, { ...ctx, memo: p.memo }).reading;
    return reading ? `${p.level}: ${reading}.` : `${p.level}.`;
  });
  return withAlt(scene, capSentences([what, split, ...each, ...s.notes]), ctx.brief);
}
