import type { FormName, Intent, ResolvedBrief } from '../brief/types.js';
import type { Outcome } from '../diagnostics/diagnostic.js';
import type { FieldRef, Fields } from '../fields/types.js';
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
  /** How many values of one measure the marks may show on one shared axis (a dumbbell's before and after). Default: 1. */
  sharedAxisValues?: number;
  /** Colours beyond what the palette tells apart are folded into one neutral "Other" (normalized bars), so the colour rule is kept by folding. Default: false. */
  foldsColours?: boolean;
  /** Radial marks are the parts of one whole (a donut): the radial rule's one exception, for 2 or 3 parts pinned by the brief. Default: false. */
  partsOfWhole?: boolean;
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

/**
 * A form's plan and the decisions (with their rules) it made. `facet` is how a plan asks for
 * small multiples itself (e.g. a line chart with more series than direct labels can hold asks
 * for one panel per series): the column to split by, whether to draw the other panels as grey
 * context, and why (the rationale's rule). A brief's `facet:` wins over it. Default: none.
 */
export interface Planned<Plan> {
  plan: Plan;
  decisions: Decision[];
  /** The frame the form needs, when it grows a side the brief leaves open. Default: the brief's size. */
  size?: { width: number; height: number };
  facet?: FacetRequest;
}

/** A form's own request for small multiples (see Planned.facet). */
export interface FacetRequest {
  /** The column whose levels become panels. */
  by: string;
  /** Draw the other panels' marks in grey behind each panel's own. */
  context: boolean;
  /** Why the form asks for panels, as the rationale states it. */
  why: string;
}

/** How panels are ordered: by the form's facet value (largest first), by label, as the data gives them, or in the facet field's own order. */
export type FacetOrder = 'value' | 'label' | 'data' | 'key';

/** Small multiples as chosen: the field split by, the panel order, and whether grey context is drawn. */
export interface ChosenFacet {
  field: FieldRef;
  context: boolean;
  order: FacetOrder;
}

/** What the choice stage knows of a form's small multiples: what orders its panels, in words (e.g. "their total"). */
export interface FacetWords {
  /** What a panel is ranked by, e.g. "total" or "latest value". */
  noun: string;
  /** The position in `keys:` of the one key the form may split into panels (a line's series key). Default: none. */
  keyIndex?: number;
}

/** What the choice stage needs of a form: its name, its traits, and its plan. The registry's forms are passed in. */
export interface Candidate {
  name: FormName;
  /** The decision's words when chosen, e.g. "bar chart". */
  noun: string;
  traits: FormTraits;
  plan(input: PlanInput): Outcome<Planned<unknown>>;
  /** Present when the form can be drawn as small multiples. Default: none (a facet is refused). */
  facets?: FacetWords;
}

/** The chart form chosen for a brief, the rule that fired, its plan, and the reasons. */
export interface Choice<Plan = unknown> {
  form: FormName;
  intent: Intent;
  /** The id of the rule row that chose the form. */
  rule: string;
  plan: Plan;
  rationale: Decision[];
  /** The frame the chart is drawn in, when the form grew it beyond the brief's default. */
  size?: { width: number; height: number };
  /** Small multiples, asked for by the brief (`facet:`) or by the form's plan. Default: none. */
  facet?: ChosenFacet;
}
