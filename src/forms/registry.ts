import type { FormName } from '../brief/types.js';
import { BAR } from './bar.js';
import { RADIAL_BAR } from './radial-bar.js';
import { STREAM } from './stream.js';
import { PARALLEL } from './parallel.js';
import { SCATTER_MATRIX } from './scatter-matrix.js';
import type { AnyForm } from './types.js';

/** The forms chartwright draws: one entry per form file in src/forms/. */
export const FORMS: readonly AnyForm[] = [BAR, RADIAL_BAR, STREAM, PARALLEL, SCATTER_MATRIX];

/** The form of a name, if it is drawn. */
export function formNamed(name: FormName | string): AnyForm | undefined {
  return FORMS.find((f) => f.name === name);
}
