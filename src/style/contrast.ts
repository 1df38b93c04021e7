import { hexToRgb, toLinear } from '../color/srgb.js';

/**
 * Relative luminance and contrast ratio as WCAG 2.x defines them ("relative luminance",
 * "contrast ratio" in the WCAG 2.2 glossary). The linearisation threshold is 0.04045 (2.2);
 * 2.0/2.1 printed 0.03928, which gives identical results for every 8-bit value.
 */
export function relativeLuminance(hex: string): number {
  const [r, g, b] = hexToRgb(hex).map(toLinear) as [number, number, number];
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

/** WCAG 2.x contrast ratio of two #rrggbb colours, from 1 to 21. */
export function contrastRatio(a: string, b: string): number {
  const la = relativeLuminance(a);
  const lb = relativeLuminance(b);
  return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
}

/** WCAG 2.x SC 1.4.3: normal text needs 4.5:1. */
export const TEXT_CONTRAST = 4.5;
/** WCAG 2.1 SC 1.4.11: graphical objects needed to understand the content need 3:1. */
export const MARK_CONTRAST = 3;
