import type { Choice, Decision } from '../choose/types.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { orderPanels, splitTable } from '../derive/facet.js';
import type { AnyForm } from '../forms/types.js';
import { layoutFacets, type FacetForm, type FacetPanel } from '../layout/facet-compose.js';
import type { LayoutContext } from '../layout/kit-types.js';
import type { Scene } from '../scene/types.js';
import type { Table } from '../table/types.js';
import { PanelMemo } from './panel-memo.js';
import { facetAlt } from './alt.js';

/** A small-multiples render: its scene (when it could be drawn), diagnostics, and the decisions made while laying it out. */
export interface FacetedChart {
  scene?: Scene;
  diagnostics: Diagnostic[];
  decisions: Decision[];
}

/** Whether a form can be drawn as small multiples: on a left and a bottom axis, with facet hooks. */
function canFacet(form: AnyForm): form is AnyForm & FacetForm<unknown> {
  return 'domains' in form && form.facets !== undefined;
}

/** Diagnostics once each (code and message). */
function once(diagnostics: readonly Diagnostic[]): Diagnostic[] {
  const seen = new Set<string>();
  return diagnostics.filter((d) => { const k = `${d.code}\u0000${d.message}`; if (seen.has(k)) return false; seen.add(k); return true; });
}

/** The grid's shape and what it left out, as decisions with their rules. */
function gridDecisions(scene: Scene, total: number): Decision[] {
  const columns = new Set(scene.panels.map((p) => p.plot.x)).size;
  const rows = new Set(scene.panels.map((p) => p.plot.y)).size;
  const decisions: Decision[] = [{
    decision: `${scene.panels.length} panels in ${rows} row${rows === 1 ? '' : 's'} of ${columns}; tick labels only on the outer panels`,
    rule: 'facet.grid: columns chosen so the panels come nearest a 4:3 shape in this frame; every panel shares the same scales, so one set of tick labels serves each row and column',
  }];
  if (scene.panels.length < total) decisions.push({ decision: `${total - scene.panels.length} panels not drawn`, rule: 'facet.fit: a panel is never drawn smaller than its marks and labels need; a warning and the chart\'s note name those left out' });
  return decisions;
}

/**
 * Small multiples: the whole table derived once (for the order of categories and the words),
 * then split by the facet column and each part derived by the form with its own rows (each
 * with its own memo: a form memoizes what it measures per render, and each panel is its own);
 * panels ordered as chosen, then laid out on shared scales. Missing-value warnings come from the
 * whole table (one warning naming every row); the rest from the panels, each once.
 */
export function renderFacets(form: AnyForm, table: Table, choice: Choice, ctx: LayoutContext): FacetedChart {
  const facet = choice.facet!;
  if (!canFacet(form)) {
    return { decisions: [], diagnostics: [diagnostic('render.internal', `the ${form.noun} was chosen for small multiples but cannot be drawn in panels; this is a defect in chartwright`, { hint: 'please report it with the brief and data' })] };
  }
  const chartMemo = ctx.memo ?? new Map<string, unknown>();
  const whole = form.derive(table, choice.plan, { ...ctx, memo: new PanelMemo(chartMemo) });
  if (!whole.ok) return { decisions: [], diagnostics: whole.diagnostics };
  const split = splitTable(table, facet.field);
  const diagnostics: Diagnostic[] = [...whole.diagnostics.filter((d) => d.code === 'derive.missing-values'), ...split.diagnostics];
  const panels: (FacetPanel<unknown> & { label: string; sortKey: number; value: number })[] = [];
  for (const part of split.parts) {
    const memo = new PanelMemo(chartMemo);
    const derived = form.derive(part.table, choice.plan, { ...ctx, memo });
    diagnostics.push(...derived.diagnostics.filter((d) => d.code !== 'derive.missing-values'));
    if (!derived.ok) return { decisions: [], diagnostics: once(diagnostics) };
    panels.push({ level: part.label, label: part.label, sortKey: part.sortKey, value: form.facets.value(derived.value), derived: derived.value, memo });
  }
  const ordered = orderPanels(panels, facet.order);
  const laid = layoutFacets(form, whole.value, ordered, { field: facet.field.name, label: facet.field.label, context: facet.context }, ctx);
  const scene = facetAlt(laid.scene, form, whole.value, ordered, { field: facet.field.name, label: facet.field.label }, ctx);
  return { scene, diagnostics: once([...diagnostics, ...laid.diagnostics]), decisions: gridDecisions(laid.scene, ordered.length) };
}
