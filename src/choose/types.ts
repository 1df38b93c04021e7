import type { FormName, Intent, ResolvedBrief } from '../brief/types.js';
import type { Outcome } from '../diagnostics/diagnostic.js';
import type { Fields } from '../fields/types.js';
import type { TextMeasurer } from '../font/measurer.js';
import type { Style } from '../style/types.js';
import type { Table } from '../table/types.js';

/** One choice made for the chart and the rule that made it. */
export interface Decision {
  decision: string;
  rule: string;
  /** Figures behind the decision, for `explain --json` (e.g. the r of two neighbouring axes). Default: none. */
  data?: Record<string, string | number>;
}

/**
 * What a form's marks do, declared once: the hard rules (hard-rules.ts) are checked against
 * these, so a new form inherits every rule by declaring its traits.
 */
export interface FormTraits {
  /** Marks encode values by length from a baseline (bars, areas): the value axis starts at zero. */
  lengthCoded: boolean;
  /** Marks connect consecutive keys (lines): the key must have an order of its own. */
  connectsKey: boolean;
  /** Marks are laid out around a circle: the key must be cyclic. */
  radial: boolean;
  /** Colour tells categories apart: no more of them than a reader can distinguish. */
  coloursCategories: boolean;
  /** Each value gets its own axis (scatterplot matrix, parallel coordinates), so several values are no mixing of scales. */
  axisPerValue: boolean;
}

/** What a form's plan may look at. */
export interface PlanInput {
  fields: Fields;
  /** The table, so a plan can measure what will be drawn (e.g. the combined values), not estimate it. */
  table: Table;
  brief: ResolvedBrief;
  style: Style;
  measure: TextMeasurer;
  lenient: boolean;
  /** The render's memory of measured results, shared with layout (see LayoutContext.memo). Default: none. */
  memo?: Map<string, unknown>;
}

/** A form's plan and the decisions (with their rules) it made. */
export interface Planned<Plan> {
  plan: Plan;
  decisions: Decision[];
}

/** What the choice stage needs of a form: its name, its traits, and its plan. The registry's forms are passed in. */
export interface Candidate {
  name: FormName;
  /** The decision's words when chosen, e.g. "bar chart". */
  noun: string;
  traits: FormTraits;
  plan(input: PlanInput): Outcome<Planned<unknown>>;
}

/** The chart form chosen for a brief, the rule that fired, its plan, and the reasons. */
export interface Choice<Plan = unknown> {
  form: FormName;
  intent: Intent;
  /** The id of the rule row that chose the form. */
  rule: string;
  plan: Plan;
  rationale: Decision[];
}
