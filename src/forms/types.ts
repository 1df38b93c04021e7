import type { FormName } from '../brief/types.js';
import type { FormTraits, Planned, PlanInput } from '../choose/types.js';
import type { Outcome } from '../diagnostics/diagnostic.js';
import type { ChartForm } from '../layout/chart.js';
import type { LayoutContext } from '../layout/kit-types.js';
import type { Table } from '../table/types.js';
import type { AltText } from './alt-words.js';
import type { DataTable } from '../scene/types.js';

/** What every form has: its name, traits, plan and derivation. */
export interface FormCore<Plan, Derived> {
  name: FormName;
  /** The decision's words when the rules choose it, e.g. "bar chart". */
  noun: string;
  traits: FormTraits;
  plan(input: PlanInput): Outcome<Planned<Plan>>;
  derive(table: Table, plan: Plan, ctx: LayoutContext): Outcome<Derived>;
  /**
   * The chart's alt text: what it is and its main reading, numbers written as its labels write
   * them. Optional in the type so a form can be drafted without it; every registered form has one
   * (test/forms/alt-text.test.ts).
   */
  alt?(derived: Derived, ctx: LayoutContext): AltText;
  /** The numbers drawn, as a table, for a form whose marks may carry no datum (a raster). Default: read from the scene's marks. */
  data?(derived: Derived): DataTable;
}

/**
 * A chart form as a value: its traits, how it plans (from fields and brief), derives (the numbers
 * it draws), and how it is laid out, in one of two ways: on a left and a bottom axis (it reports
 * the domains of its channels and the room its labels need, and draws its marks into the plot box
 * it is given; the composer draws frame, legend and axes), or in the body the frame and legend
 * leave (radial and multi-axis forms, with the layout kit's pieces). Either way it says what it
 * shows (`words`), and knows nothing of files, the CLI or PNG.
 */
export type FormDef<Plan, Derived> = FormCore<Plan, Derived> & ChartForm<Derived>;

/** A form of any plan and derived data, as the registry holds it. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type AnyForm = FormDef<any, any>;

export type { FormTraits, Planned, PlanInput };
