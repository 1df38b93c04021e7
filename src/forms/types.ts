import type { FormName } from '../brief/types.js';
import type { FormTraits, Planned, PlanInput } from '../choose/types.js';
import type { Outcome } from '../diagnostics/diagnostic.js';
import type { CartesianForm } from '../layout/compose.js';
import type { LayoutContext } from '../layout/kit-types.js';
import type { Table } from '../table/types.js';

/**
 * A chart form as a value: its traits, how it plans (from fields and brief), derives (the numbers
 * it draws), reports the domains of its channels and the room its labels need, draws its marks
 * into the plot box it is given, and says what it shows. It knows nothing of files, the CLI, PNG,
 * the frame, the axes or the panels: the composer (src/layout/compose.ts) does those.
 */
export interface FormDef<Plan, Derived> extends CartesianForm<Derived> {
  name: FormName;
  /** The decision's words when the rules choose it, e.g. "bar chart". */
  noun: string;
  traits: FormTraits;
  plan(input: PlanInput): Outcome<Planned<Plan>>;
  derive(table: Table, plan: Plan, ctx: LayoutContext): Outcome<Derived>;
}

/** A form of any plan and derived data, as the registry holds it. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type AnyForm = FormDef<any, any>;

export type { FormTraits, Planned, PlanInput };
