import type { Decision } from '../choose/types.js';
import { diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import { axisFlips, greedyAxisOrder } from '../derive/axis-order.js';
import { correlationMatrix } from '../derive/correlation.js';
import { profileItems, type ProfileItem } from '../derive/profile.js';
import { translucency } from '../derive/translucency.js';
import { refOf, type FieldRef } from '../fields/types.js';
import { memoized, type LayoutContext } from '../layout/kit-types.js';
import type { Table } from '../table/types.js';
import type { Planned, PlanInput } from './types.js';

/** Beyond this many items, lines overlap into a mass: a warning, and translucency (common practice). */
export const MANY_LINES = 300;

/** A parallel-coordinates plan: the attributes in drawn order, which axes are reversed, and whether one scale is shared. */
export interface ParallelPlan {
  attributes: FieldRef[];
  flips: boolean[];
  shared: boolean;
  key: FieldRef | undefined;
  /** Each neighbouring pair's Pearson r, left to right. */
  pairs: { left: string; right: string; r: number }[];
  opacity: number;
}

/** The items of a profile, read once per render. */
export function itemsOf(table: Table, attributes: readonly FieldRef[], key: FieldRef | undefined, ctx: Pick<LayoutContext, 'memo'>): { items: ProfileItem[]; diagnostics: Diagnostic[] } {
  return memoized(ctx, `profile\u0000${attributes.map((a) => a.name).join('\u0000')}\u0000${key?.name ?? ''}`, () => profileItems(table, attributes, key));
}

/** The complete items a profile form draws; none at all is an error (nothing to draw). */
export function completeItems(table: Table, attributes: readonly FieldRef[], key: FieldRef | undefined, ctx: Pick<LayoutContext, 'memo'>): Outcome<ProfileItem[]> {
  const { items, diagnostics } = itemsOf(table, attributes, key, ctx);
  if (items.length > 0) return success(items, diagnostics);
  return failure([...diagnostics, diagnostic('derive.no-rows', 'no row has a value for every attribute, so there is nothing to draw', {
    file: table.origin.file, expected: 'at least one complete row', hint: 'fill in the missing values, or leave the sparse attributes out of `values:`',
  })]);
}

const fixed = (r: number) => (Number.isNaN(r) ? 'undefined (a constant attribute)' : r.toFixed(3));

function orderDecisions(plan: ParallelPlan, n: number): Decision[] {
  const out: Decision[] = [{
    decision: 'axes ordered so that neighbouring axes are the most strongly correlated pairs',
    rule: `parallel coordinates show only the p − 1 neighbouring pairs of p attributes (Inselberg 1985; Wegman 1990); greedy ordering on |Pearson r|: start from the strongest pair, then attach the attribute most strongly correlated with either end (not an exhaustive search)`,
  }];
  for (const p of plan.pairs) out.push({ decision: `\`${p.left}\` next to \`${p.right}\``, rule: `Pearson r = ${fixed(p.r)} over ${n} items`, data: { left: p.left, right: p.right, r: Number.isNaN(p.r) ? 'undefined' : p.r } });
  plan.attributes.forEach((a, k) => {
    if (plan.flips[k]) out.push({ decision: `\`${a.name}\` axis reversed (high values at the bottom), marked under the axis`, rule: 'its correlation with the axis to its left, as that axis is drawn, is negative; reversed, the pair reads as near-parallel lines instead of a knot of crossings' });
  });
  return out;
}

function scaleDecision(attributes: readonly FieldRef[], shared: boolean): Decision {
  if (shared) return { decision: 'one shared scale on every axis', rule: `every attribute is in ${attributes[0]!.unit}, so heights compare across axes` };
  return { decision: 'each axis its own scale, from its own lowest to highest value', rule: 'the attributes do not share one stated unit, so each spans its own range; heights compare only along one axis' };
}

/** The parallel-coordinates plan: axis order by correlation, flips, scales and translucency, each decision with its rule. */
export function planParallel(input: PlanInput): Outcome<Planned<ParallelPlan>> {
  const { fields } = input;
  const attrs = fields.values.map(refOf);
  const key = fields.keys[0] ? refOf(fields.keys[0]) : undefined;
  const { items } = itemsOf(input.table, attrs, key, input);
  const r = correlationMatrix(attrs.map((_, j) => items.map((it) => it.values[j]!)));
  const order = greedyAxisOrder(r);
  const flips = axisFlips(order, r);
  const units = new Set(attrs.map((a) => a.unit));
  const shared = units.size === 1 && attrs[0]!.unit !== undefined;
  const attributes = order.map((j) => attrs[j]!);
  const pairs = order.slice(1).map((j, k) => ({ left: attrs[order[k]!]!.name, right: attrs[j]!.name, r: r[order[k]!]![j]! }));
  const opacity = translucency(items.length);
  const plan: ParallelPlan = { attributes, flips, shared, key, pairs, opacity };
  const decisions = [...orderDecisions(plan, items.length), scaleDecision(attrs, shared)];
  const problems: Diagnostic[] = [];
  if (items.length > MANY_LINES) {
    decisions.push({ decision: `lines drawn translucent (opacity ${opacity.toFixed(2)})`, rule: `more than ${MANY_LINES} lines overlap; translucency lets dense bundles show darker than lone lines` });
    problems.push(diagnostic('choice.overplotting', `${items.length} lines overlap into a mass; they are drawn translucent, and single lines are hard to follow`, {
      found: `${items.length} items`, expected: `at most ${MANY_LINES} for lines that can be followed`, hint: 'filter or sample the rows, or show the attributes pair by pair',
    }));
  }
  return success({ plan, decisions }, problems);
}
