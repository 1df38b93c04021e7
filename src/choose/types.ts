import type { Aggregate, FormName, Intent } from '../brief/types.js';
import type { Field } from '../fields/types.js';

/** One choice made for the chart and the rule that made it. */
export interface Decision {
  decision: string;
  rule: string;
}

/** How bars are laid out and ordered. */
export interface BarPlan {
  key: Field;
  /** The value field; undefined when bars count rows (`aggregate: count` with no value). */
  value: Field | undefined;
  orientation: 'vertical' | 'horizontal';
  /** value: largest first; label: A→Z; data: as the rows give them; key: the key's own order. */
  order: 'value' | 'label' | 'data' | 'key';
  aggregate: Aggregate;
  /** Most bars the plot can show at 3 px or more each; beyond it the rest is folded. */
  capacity: number;
}

/** The chart form chosen for a brief, with its parameters and the reasons. */
export interface Choice {
  form: FormName;
  intent: Intent;
  rationale: Decision[];
  bar: BarPlan;
}
