import type { FormName } from '../brief/types.js';
import { BAR } from './bar.js';
import { DENSE } from './dense.js';
import { HEATMAP } from './heatmap.js';
import type { AnyForm } from './types.js';

/** The forms chartwright draws: one entry per form file in src/forms/. */
export const FORMS: readonly AnyForm[] = [BAR, HEATMAP, DENSE];

/** The form of a name, if it is drawn. */
export function formNamed(name: FormName | string): AnyForm | undefined {
  return FORMS.find((f) => f.name === name);
}
