import { deriveStacks } from '../derive/stacks.js';
import { stackCapacity } from './stack-capacity.js';
import { layoutStacks, stackDomains } from './stack-layout.js';
import { planStacks, type StackPlan } from './stack-plan.js';
import { stackWords, type StackDerived } from './stack-text.js';
import type { FormDef } from './types.js';
import { stackAlt } from './bar-alt.js';

/**
 * Stacked bars of absolute values: one bar per group from a shared zero, its parts end to end
 * in one order in every bar (the largest overall on the baseline), coloured by part, named
 * inside their segments where the names fit and in a legend otherwise.
 */
export const STACKED_BAR: FormDef<StackPlan, StackDerived> = {
  name: 'stacked-bar',
  noun: 'stacked bar chart',
  traits: { lengthCoded: true, connectsKey: false, radial: false, coloursCategories: true, axisPerValue: false },
  plan: (input) => planStacks(input, false),
  derive: (table, plan, ctx) => deriveStacks(table, plan, stackCapacity(ctx)),
  domains: stackDomains,
  layout: layoutStacks,
  words: stackWords,
  alt: stackAlt,
};
