import type { FormName } from '../brief/types.js';
import type { DerivedBars } from '../derive/bars.js';
import { layoutBar } from './bar.js';
import type { FormContext, FormResult } from './types.js';

/** A chart form: lays out its derived data as a scene. */
export interface Form<D> {
  name: FormName;
  layout(derived: D, ctx: FormContext): FormResult;
}

/** The forms chartwright draws, by name: one entry per file in src/forms/. */
export const FORMS = {
  bar: { name: 'bar', layout: layoutBar } satisfies Form<DerivedBars>,
} as const;
