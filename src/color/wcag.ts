import { convertRgbToLrgb, wcagContrast, wcagLuminance } from 'culori/fn';
import { hexToRgb } from './srgb.js';

// culori's WCAG functions use the WCAG 2.x glossary's rounded coefficients (0.2126, 0.7152,
// 0.0722) and the 0.04045 linearisation threshold (WCAG 2.2; 2.0/2.1 printed 0.03928, which
// gives identical results for every 8-bit value). They get linear RGB, so culori needs no
// registered colour modes.
function linear(hex: string) {
  const [r, g, b] = hexToRgb(hex);
  return convertRgbToLrgb({ r, g, b });
}

/** Relative luminance of a #rrggbb colour as WCAG 2.x defines it ("relative luminance"). */
export function relativeLuminance(hex: string): number {
  return wcagLuminance(linear(hex));
}

/** WCAG 2.x contrast ratio of two #rrggbb colours, from 1 to 21 ("contrast ratio"). */
export function contrastRatio(a: string, b: string): number {
  return wcagContrast(linear(a), linear(b));
}

/** WCAG 2.x SC 1.4.3: normal text needs 4.5:1. */
export const TEXT_CONTRAST = 4.5;
/** WCAG 2.1 SC 1.4.11: graphical objects needed to understand the content need 3:1. */
export const MARK_CONTRAST = 3;
