import type { ResolvedBrief } from '../brief/types.js';
import type { Diagnostic } from '../diagnostics/diagnostic.js';
import type { TextMeasurer } from '../font/measurer.js';
import type { Scene } from '../scene/types.js';
import type { Style } from '../style/types.js';

/** What every chart form's layout receives besides its derived data. */
export interface FormContext {
  brief: ResolvedBrief;
  style: Style;
  measure: TextMeasurer;
}

/** A laid-out chart and what the layout noticed (thinned or truncated labels, missing glyphs). */
export interface FormResult {
  scene: Scene;
  diagnostics: Diagnostic[];
}
