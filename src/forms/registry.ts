import type { FormName } from '../brief/types.js';
import { BAR } from './bar.js';
import { BOX } from './box.js';
import { CHANGE_BAR } from './change-bar.js';
import { DENSE } from './dense.js';
import { DONUT } from './donut.js';
import { DOT } from './dot.js';
import { GANTT } from './gantt.js';
import { GROUPED_BAR } from './grouped-bar.js';
import { HEATMAP } from './heatmap.js';
import { HISTOGRAM } from './histogram.js';
import { INDEX_LINE } from './index-line.js';
import { LINE } from './line.js';
import { NORMALIZED_BAR } from './normalized-bar.js';
import { PARALLEL } from './parallel.js';
import { RADIAL_BAR } from './radial-bar.js';
import { SCATTER } from './scatter.js';
import { SCATTER_MATRIX } from './scatter-matrix.js';
import { SLOPE } from './slope.js';
import { STACKED_BAR } from './stacked-bar.js';
import { STREAM } from './stream.js';
import { STRIP } from './strip.js';
import type { AnyForm } from './types.js';

/** The forms chartwright draws: one entry per form file in src/forms/. */
export const FORMS: readonly AnyForm[] = [BAR, GROUPED_BAR, LINE, INDEX_LINE, CHANGE_BAR, SLOPE, GANTT, SCATTER, DOT, STACKED_BAR, NORMALIZED_BAR, DONUT, HISTOGRAM, STRIP, BOX, RADIAL_BAR, STREAM, PARALLEL, SCATTER_MATRIX, HEATMAP, DENSE];

/** The form of a name, if it is drawn. */
export function formNamed(name: FormName | string): AnyForm | undefined {
  return FORMS.find((f) => f.name === name);
}
