import type { Diagnostic } from '../diagnostics/diagnostic.js';
import type { Box, PanelInfo, Scene, SceneNode } from '../scene/types.js';
import { allNodes } from '../scene/walk.js';
import { checkScene } from './checks.js';
import { frameFor, layoutCartesian, placeFormLabels, sceneOf, withUnplacedNote, type CartesianForm, type Composed } from './compose.js';
import type { FormMarks, FormWords, LayoutContext } from './kit-types.js';
import type { LegendSpec } from './legend.js';

/** A form's marks when it lays out its own body (its panels and any axes of its own). */
export interface BodyMarks extends FormMarks {
  /** The form's panels: each plot box and the axes drawn for it (at least one). */
  panels: PanelInfo[];
  /** Guides the form drew itself (axes, rings, gridlines): drawn under its marks. */
  guides: SceneNode[];
}

/**
 * What the composer needs of a form that is not drawn on one left and one bottom axis (radial
 * forms, a scatterplot matrix, parallel coordinates, a heat map with dendrograms): the frame and
 * the legend are the composer's; the body they leave is the form's, with the layout kit's pieces.
 */
export interface BodyForm<D> {
  name: string;
  words(derived: D, ctx: LayoutContext): FormWords;
  legend?(derived: D, ctx: LayoutContext): LegendSpec | undefined;
  layoutBody(derived: D, body: Box, ctx: LayoutContext): BodyMarks;
}

/** Either kind of form the composer can lay out. */
export type ChartForm<D> = CartesianForm<D> | BodyForm<D>;

function composeBody<D>(form: BodyForm<D>, derived: D, ctx: LayoutContext, extraNotes: string[], drop: ReadonlySet<string>): Composed {
  const { brief, measure } = ctx;
  const words = form.words(derived, ctx);
  const { frame, body, legend } = frameFor(form.legend?.(derived, ctx), [...words.notes, ...extraNotes], ctx);
  const drawn = form.layoutBody(derived, body, ctx);
  const fixed = [...allNodes(drawn.guides), ...allNodes(legend?.nodes ?? []), ...frame.texts];
  const { kept, dropped } = placeFormLabels(drawn.labels, fixed, brief.size, drop);
  const children: SceneNode[] = [...drawn.guides.filter((n) => n.kind !== 'text'), ...drawn.marks, ...drawn.guides.filter((n) => n.kind === 'text'), ...kept, ...(legend?.nodes ?? []), ...frame.texts];
  const first = drawn.panels[0]!;
  return {
    scene: sceneOf(form.name, words, children, drawn.panels, legend, ctx),
    diagnostics: [...drawn.diagnostics, ...checkScene(allNodes(children), first.plot, brief.size, measure)],
    dropped,
  };
}

/**
 * The composer for a form that lays out its own body: frame → legend → the form's body (its
 * marks, its own guides, its panels) → label placement → scene-wide checks, with the same
 * layering and the same rule for labels that would overlap as layoutCartesian.
 */
export function layoutBody<D>(form: BodyForm<D>, derived: D, ctx: LayoutContext): { scene: Scene; diagnostics: Diagnostic[] } {
  return withUnplacedNote((c, notes, drop) => composeBody(form, derived, c, notes, drop), ctx);
}

/** The composer: a form on a left and a bottom axis goes through layoutCartesian, any other lays out its own body. */
export function layoutChart<D>(form: ChartForm<D>, derived: D, ctx: LayoutContext): { scene: Scene; diagnostics: Diagnostic[] } {
  return 'domains' in form ? layoutCartesian(form, derived, ctx) : layoutBody(form, derived, ctx);
}
