import { success, type Outcome } from '../diagnostics/diagnostic.js';
import { shareAlt, stackAlt } from './bar-alt.js';
import { deriveStacks } from '../derive/stacks.js';
import type { CartesianDomains, FormMarks, FormWords, LabelRoom, LayoutContext, PlotArea, ScaleProbe } from '../layout/kit-types.js';
import type { BarPlan } from './bar-plan.js';
import { BARS, deriveShares, layoutShares, planShares, type ShareBars } from './share-bars.js';
import { stackCapacity } from './stack-capacity.js';
import { layoutStacks, stackDomains } from './stack-layout.js';
import { planStacks, type StackPlan } from './stack-plan.js';
import { stackWords, type StackDerived } from './stack-text.js';
import type { FormDef, Planned, PlanInput } from './types.js';

/** A normalized bar chart's plan: stacks of parts per group (two keys), or one key's shares as bars. */
export type NormalizedPlan = { kind: 'stacks'; stacks: StackPlan } | { kind: 'shares'; shares: BarPlan };

/** What it draws: normalized stacks, or share bars (the bar chart's bars, with the original values kept). */
export type NormalizedDerived = { kind: 'stacks'; stacks: StackDerived } | { kind: 'shares'; shares: ShareBars };

function plan(input: PlanInput): Outcome<Planned<NormalizedPlan>> {
  if (input.fields.keys.length === 1) {
    const shares = planShares(input);
    return shares.ok ? success({ plan: { kind: 'shares', shares: shares.value.plan }, decisions: shares.value.decisions }, shares.diagnostics) : shares;
  }
  const stacks = planStacks(input, true);
  return stacks.ok ? success({ plan: { kind: 'stacks', stacks: stacks.value.plan }, decisions: stacks.value.decisions }, stacks.diagnostics) : stacks;
}

function derive(table: Parameters<typeof deriveStacks>[0], p: NormalizedPlan, ctx: LayoutContext): Outcome<NormalizedDerived> {
  if (p.kind === 'stacks') {
    const stacks = deriveStacks(table, p.stacks, stackCapacity(ctx));
    return stacks.ok ? success({ kind: 'stacks', stacks: stacks.value }, stacks.diagnostics) : stacks;
  }
  const shares = deriveShares(table, p.shares, ctx);
  return shares.ok ? success({ kind: 'shares', shares: shares.value }, shares.diagnostics) : shares;
}

const NO_ROOM: LabelRoom = { low: 0, high: 0, show: false };

/**
 * Normalized stacked bars: each group's bar reaches exactly 100 %, its parts in one order (the
 * largest overall share on the baseline), percent labels where they fit, parts beyond what
 * colour tells apart folded into "Other". With one key: bars of each key's share on a percent
 * axis, drawn by the bar form.
 */
export const NORMALIZED_BAR: FormDef<NormalizedPlan, NormalizedDerived> = {
  name: 'normalized-bar',
  noun: 'normalized bar chart',
  traits: { lengthCoded: true, connectsKey: false, radial: false, coloursCategories: true, axisPerValue: false, foldsColours: true },
  plan,
  derive,
  domains: (d, ctx): CartesianDomains => (d.kind === 'stacks' ? stackDomains(d.stacks, ctx) : BARS.domains(d.shares, ctx)),
  room: (d, probe: ScaleProbe, ctx) => (d.kind === 'stacks' ? NO_ROOM : BARS.room!(d.shares, probe, ctx)),
  layout: (d, area: PlotArea, ctx): FormMarks => (d.kind === 'stacks' ? layoutStacks(d.stacks, area, ctx) : layoutShares(d.shares, area, ctx)),
  alt: (d) => (d.kind === 'stacks' ? stackAlt(d.stacks) : shareAlt(d.shares, 'Bar chart of shares')),
  words: (d, ctx): FormWords => (d.kind === 'stacks' ? stackWords(d.stacks) : BARS.words(d.shares, ctx)),
};
