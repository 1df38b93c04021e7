import type { Decision } from '../choose/types.js';
import { success, type Outcome } from '../diagnostics/diagnostic.js';
import { translucency } from '../derive/translucency.js';
import { refOf, type FieldRef } from '../fields/types.js';
import { itemsOf } from './parallel-plan.js';
import type { Planned, PlanInput } from './types.js';

/** A scatterplot matrix's plan: the attributes in brief order, the items' key, an optional class coloured, and the points' opacity. */
export interface ScatterMatrixPlan {
  attributes: FieldRef[];
  key: FieldRef | undefined;
  color: FieldRef | undefined;
  opacity: number;
}

/** The scatterplot matrix's plan, each decision with its rule. */
export function planScatterMatrix(input: PlanInput): Outcome<Planned<ScatterMatrixPlan>> {
  const { fields, brief } = input;
  const attributes = fields.values.map(refOf);
  const key = fields.keys[0] ? refOf(fields.keys[0]) : undefined;
  const colorField = brief.color === undefined ? undefined : fields.all.find((f) => f.name === brief.color);
  const { items } = itemsOf(input.table, attributes, key, input);
  const opacity = translucency(items.length);
  const p = attributes.length;
  const decisions: Decision[] = [
    { decision: `the ${(p * (p - 1)) / 2} pairs of ${p} attributes in the lower triangle, each attribute named on the diagonal with its histogram`, rule: `a scatterplot matrix of p attributes has p(p − 1)/2 distinct pairs (REFERENCES §7); the upper triangle would repeat them mirrored` },
    { decision: 'every cell the same size, each attribute on one scale along its row and its column', rule: 'equal cells let shapes be compared across panels; a shared scale per attribute lines panels up like small multiples' },
    { decision: opacity < 1 ? `points translucent (opacity ${opacity.toFixed(2)}) for ${items.length} items` : `points opaque for ${items.length} items`, rule: 'opacity falls as 1/√n with the number of items so dense regions darken instead of merging (common practice)' },
  ];
  if (colorField) decisions.push({ decision: `points coloured by \`${colorField.name}\``, rule: 'the brief asks for it (`color:`); a class shown by colour is read across every panel at once' });
  return success({ plan: { attributes, key, color: colorField && refOf(colorField), opacity }, decisions });
}
