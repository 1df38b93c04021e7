/** WCAG 2.x contrast for styles; the maths lives with the other colour functions. */
export { contrastRatio, MARK_CONTRAST, relativeLuminance, TEXT_CONTRAST } from '../color/wcag.js';
