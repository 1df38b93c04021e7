import { contrastRatio } from '../color/wcag.js';

/**
 * The colour for text set on a filled mark: the style's dark text colour or the page colour,
 * whichever has the higher WCAG 2.x contrast ratio against the fill.
 */
export function inkOn(fill: string, dark: string, light: string): string {
  return contrastRatio(dark, fill) >= contrastRatio(light, fill) ? dark : light;
}
