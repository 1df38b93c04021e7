import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import type { Box, PanelInfo, SceneNode, TextNode } from '../scene/types.js';
import { allNodes } from '../scene/walk.js';
import { axisTitleNode, type DrawnAxis } from './axes.js';
import { MIN_PLOT_PX, checkScene } from './checks.js';
import { drawAxis, fitScales, frameFor, placeFormLabels, sceneOf, withUnplacedNote, zeroLine, type CartesianForm, type Composed, type FittedScales } from './compose.js';
import { unionDomains, unionRooms } from './facet-domains.js';
import { outerPanels } from './facet-grid.js';
import { facetPanels, type FacetPanels } from './facet-panels.js';
import type { FacetHooks } from './facet-types.js';
import { facetWords, greyed, panelTitle, refusalNote } from './facet-words.js';
import type { CartesianDomains, LayoutContext } from './kit-types.js';
import { capText } from './text.js';

/** One panel to draw: its facet level, the form's numbers for its rows, and its own memory of measured results. */
export interface FacetPanel<D> {
  level: string;
  derived: D;
  /** The panel's memo: a form memoizes per render, and each panel is a render of its own rows. */
  memo: Map<string, unknown>;
}

/** The facet as layout needs it: the column, its readable name, and whether to draw grey context. */
export interface FacetSpec {
  field: string;
  label: string;
  context: boolean;
}

/** A form that can be drawn as small multiples. */
export type FacetForm<D> = CartesianForm<D> & { facets: FacetHooks<D> };

/**
 * The smallest plot a panel may have: MIN_PLOT_PX either way, every band at least as thick as
 * the form's marks need, and as wide as the widest label of a bottom band axis (labels can be
 * thinned, but one label wider than its panel would run into the next).
 */
function minimumPlot<D>(form: FacetForm<D>, panels: readonly FacetPanel<D>[], domains: CartesianDomains, ctx: LayoutContext): { width: number; height: number } {
  const band = Math.max(1, ...panels.map((p) => form.facets.minBand?.(p.derived) ?? 1));
  const along = (side: 'left' | 'bottom') => { const c = domains[side]; return c.kind === 'band' ? c.domain.length * band : 0; };
  const { tick } = ctx.style.text;
  const bottom = domains.bottom;
  const widest = bottom.kind === 'band' ? Math.max(0, ...bottom.domain.map((l) => ctx.measure.width(capText(l), tick.size, tick.weight))) : 0;
  return { width: Math.max(MIN_PLOT_PX, along('bottom'), widest), height: Math.max(MIN_PLOT_PX, along('left')) };
}

/** Scales for each panel, all over the same domains and plot size (so the same ticks), with room for every panel's labels. */
function panelScales<D>(form: FacetForm<D>, panels: readonly FacetPanel<D>[], domains: CartesianDomains, layout: FacetPanels, ctx: LayoutContext): FittedScales[] {
  const shared: CartesianForm<null> = {
    name: form.name, words: () => ({ title: '', description: '', notes: [] }), domains: () => domains, layout: () => ({ marks: [], labels: [], diagnostics: [] }),
    ...(form.room ? { room: (_: null, probe, c) => unionRooms(panels.map((p) => form.room!(p.derived, probe, { ...c, memo: p.memo }))) } : {}),
  };
  return layout.boxes.map((box) => fitScales(shared, null, domains, box, ctx));
}

/** Width the widest printed left tick label needs, with its gap. */
function leftLabelsNeed(scales: FittedScales | undefined, ctx: LayoutContext): number {
  if (!scales || scales.y.kind === 'band') return 0;
  const y = scales.y;
  const { tick } = ctx.style.text;
  const shown = y.kind === 'linear' ? y.shown : y.labels.map(() => true);
  return Math.max(0, ...y.labels.filter((_, i) => shown[i]).map((l) => ctx.measure.width(l, tick.size, tick.weight))) + ctx.style.spacing.tickGap;
}

/** The grid and the notes it needs: panels that do not fit are named in a note, which takes room, so settle until the note holds. */
function settleGrid<D>(form: FacetForm<D>, panels: readonly FacetPanel<D>[], domains: CartesianDomains, notes: string[], ctx: LayoutContext) {
  const minPlot = minimumPlot(form, panels, domains, ctx);
  let all = notes;
  for (let i = 0; ; i++) {
    const framed = frameFor(domains.legend, all, ctx);
    const layout = facetPanels(framed.body, domains, panels.length, minPlot, ctx);
    const shown = layout.grid.panels.length;
    const note = shown < panels.length ? [refusalNote(panels.slice(shown).map((p) => p.level), shown, panels.length)] : [];
    const next = [...notes, ...note];
    if (i === 3 || next.join('\u0000') === all.join('\u0000')) return { framed, layout, notes: all, minPlot };
    all = next;
  }
}

function refused(levels: string[], shown: number, field: string): Diagnostic {
  const list = `${levels.slice(0, 5).join(', ')}${levels.length > 5 ? ', …' : ''}`;
  return diagnostic('layout.panels-refused', `${levels.length} of ${levels.length + shown} panels by \`${field}\` do not fit at a readable size; ${shown} fit, and these are not drawn: ${list}`, {
    field, found: `${levels.length + shown} panels`, expected: `at most ${shown}`, hint: 'make the chart larger with `size:`, or filter the table to the levels that matter',
  });
}

/** The axes of one panel: every gridline, the tick labels (and tick marks) only on the outer sides. */
function panelAxes(domains: CartesianDomains, scales: FittedScales, box: FacetPanels['boxes'][number], body: Box, outer: { left: boolean; bottom: boolean }, ctx: LayoutContext): DrawnAxis[] {
  const sides = domains.first === 'left' ? (['left', 'bottom'] as const) : (['bottom', 'left'] as const);
  return sides.map((side) => {
    const axis = drawAxis(side, domains, scales, box, body, ctx);
    return outer[side] ? axis : { ...axis, labels: [], tickMarks: [] };
  });
}

/** The layers of every panel drawn, in drawing order, with what the scene records of each panel. */
interface PanelLayers {
  grids: SceneNode[]; context: SceneNode[]; marks: SceneNode[]; over: SceneNode[];
  tickLabels: TextNode[]; titles: TextNode[]; labels: TextNode[]; infos: PanelInfo[]; diagnostics: Diagnostic[];
}

/** Draws each panel that fits: its gridlines, grey context, marks, zero line, outer tick labels and title. */
function drawPanels<D>(form: FacetForm<D>, shown: readonly FacetPanel<D>[], domains: CartesianDomains, layout: FacetPanels, scales: FittedScales[], body: Box, spec: FacetSpec, ctx: LayoutContext): PanelLayers {
  const out: PanelLayers = { grids: [], context: [], marks: [], over: [], tickLabels: [], titles: [], labels: [], infos: [], diagnostics: [] };
  const outer = outerPanels(layout.grid);
  shown.forEach((panel, i) => {
    const box = layout.boxes[i]!;
    const area = { plot: box.plot, x: scales[i]!.x, y: scales[i]!.y, room: scales[i]!.room };
    const axes = panelAxes(domains, scales[i]!, box, body, outer[i]!, ctx);
    out.grids.push(...axes.flatMap((a) => a.grid));
    if (spec.context) for (const other of shown) if (other !== panel) out.context.push(...greyed(form.layout(other.derived, area, { ...ctx, memo: other.memo }).marks, ctx));
    const drawn = form.layout(panel.derived, area, { ...ctx, memo: panel.memo });
    out.marks.push(...drawn.marks);
    // One zero line per panel, each with its own id.
    out.over.push(...zeroLine(domains, scales[i]!, box.plot, ctx).map((n) => ({ ...n, id: ctx.id('zero-line', panel.level) })), ...axes.flatMap((a) => a.tickMarks));
    out.tickLabels.push(...axes.flatMap((a) => a.labels));
    out.titles.push(panelTitle(panel.level, layout.cells[i]!, ctx));
    out.labels.push(...drawn.labels);
    // Every panel's axes are the same: their diagnostics (thinned labels) are said once.
    if (i === 0) out.diagnostics.push(...axes.flatMap((a) => a.diagnostics));
    out.diagnostics.push(...drawn.diagnostics);
    out.infos.push({ id: ctx.id('panel', panel.level), facet: { [spec.field]: panel.level }, plot: box.plot, axes: axes.map((a) => a.info) });
  });
  return out;
}

/**
 * The frame, the grid and each panel's scales: the grid settled with its note, the domains
 * narrowed to the panels drawn (a panel left out must not stretch the scales), and the label
 * column widened once if the ticks drawn need more than the first measure.
 */
function placePanels<D>(form: FacetForm<D>, whole: D, panels: readonly FacetPanel<D>[], notes: string[], ctx: LayoutContext) {
  const domainsOf = (of: readonly FacetPanel<D>[]) => unionDomains(form.domains(whole, ctx), of.map((p) => form.domains(p.derived, { ...ctx, memo: p.memo })));
  const settled = settleGrid(form, panels, domainsOf(panels), notes, ctx);
  const { body } = settled.framed;
  let layout = settled.layout;
  const fitted = layout.grid.panels.length;
  let domains = domainsOf(panels);
  if (fitted > 0 && fitted < panels.length) {
    const own = domainsOf(panels.slice(0, fitted));
    const again = facetPanels(body, own, fitted, settled.minPlot, ctx);
    if (again.grid.panels.length === fitted) { domains = own; layout = again; }
  }
  let scales = panelScales(form, panels.slice(0, fitted), domains, layout, ctx);
  const need = leftLabelsNeed(scales[0], ctx);
  if (need > layout.leftColumn + 1e-9) {
    const wider = facetPanels(body, domains, fitted, settled.minPlot, ctx, need);
    // Widening must not cost a panel that the note already counts as drawn.
    if (wider.grid.panels.length === fitted) { layout = wider; scales = panelScales(form, panels.slice(0, fitted), domains, layout, ctx); }
  }
  return { framed: settled.framed, layout, domains, scales };
}

function composeFacets<D>(form: FacetForm<D>, whole: D, panels: readonly FacetPanel<D>[], spec: FacetSpec, ctx: LayoutContext, extraNotes: string[], drop: ReadonlySet<string>): Composed {
  const { brief, measure } = ctx;
  const words = facetWords(form, whole, panels, spec, ctx);
  const { framed, layout, domains, scales } = placePanels(form, whole, panels, [...words.notes, ...extraNotes], ctx);
  const { frame, body, legend } = framed;
  const shown = panels.slice(0, layout.grid.panels.length);
  if (shown.length === 0) {
    return { scene: sceneOf(form.name, words, [...frame.texts], [{ id: 'panel', plot: layout.region, axes: [] }], legend, ctx), diagnostics: [noPanel(spec.field, brief.size)], dropped: [] };
  }
  const p = drawPanels(form, shown, domains, layout, scales, body, spec, ctx);
  const axisTitles = [axisTitleNode('left', domains.left, layout.region, body, ctx), axisTitleNode('bottom', domains.bottom, layout.region, body, ctx)];
  const fixed = [...p.tickLabels, ...p.titles, ...axisTitles, ...allNodes(legend?.nodes ?? []), ...frame.texts];
  const { kept, dropped } = placeFormLabels(p.labels, fixed, brief.size, drop);
  const children: SceneNode[] = [...p.grids, ...p.context, ...p.marks, ...p.over, ...p.tickLabels, ...kept, ...p.titles, ...axisTitles, ...(legend?.nodes ?? []), ...frame.texts];
  const checks = checkScene(allNodes(children), p.infos[0]!.plot, brief.size, measure);
  const hidden = panels.slice(shown.length).map((x) => x.level);
  const all = [...(hidden.length ? [refused(hidden, shown.length, spec.field)] : []), ...dedupe(p.diagnostics), ...checks];
  return { scene: sceneOf(form.name, words, children, p.infos, legend, ctx), diagnostics: all, dropped };
}

/** Diagnostics once each: every panel thins or shortens alike. */
function dedupe(diagnostics: readonly Diagnostic[]): Diagnostic[] {
  const seen = new Set<string>();
  return diagnostics.filter((d) => { const k = `${d.code}\u0000${d.message}`; if (seen.has(k)) return false; seen.add(k); return true; });
}

function noPanel(field: string, size: { width: number; height: number }): Diagnostic {
  return diagnostic('layout.frame-too-small', `not even one panel by \`${field}\` fits at a readable size (${MIN_PLOT_PX} × ${MIN_PLOT_PX} px at least)`, {
    path: '/size', found: `${size.width} × ${size.height}`, expected: 'room for at least one panel', hint: 'make `size:` larger, or remove `facet:`',
  });
}

/**
 * The composer for small multiples of a form on a left and a bottom axis: the frame and legend
 * once; a grid of equal panels (columns by the frame's shape and the panel count), each titled
 * with its facet level and drawn by the form from its own rows, all on one x and one y scale
 * over the union of the panels' domains; one pair of axis titles; tick labels only on the outer
 * panels. Panels beyond what fits at a readable size are named in a warning and a note, never
 * dropped silently. Labels that would overlap are left out and the chart says so.
 */
export function layoutFacets<D>(form: FacetForm<D>, whole: D, panels: readonly FacetPanel<D>[], spec: FacetSpec, ctx: LayoutContext) {
  return withUnplacedNote((c, notes, drop) => composeFacets(form, whole, panels, spec, c, notes, drop), ctx);
}
