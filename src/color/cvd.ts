import { fromLinearRgb, toLinearRgb, type Rgb } from './srgb.js';

/** The colour-vision deficiencies simulated. */
export type Deficiency = 'protanopia' | 'deuteranopia' | 'tritanopia';

/**
 * Severity-1.0 matrices of G. M. Machado, M. M. Oliveira, L. A. F. Fernandes, "A
 * Physiologically-based Model for Simulation of Color Vision Deficiency", IEEE TVCG 15(6), 2009,
 * applied to linear RGB. culori ships the same matrices (filterDeficiency*), but applies them to
 * gamma-encoded sRGB without clamping, which does not reproduce the published check values
 * (#ff0000 → #6d5f00 under protanopia); so the project applies them itself.
 */
const MACHADO: Record<Deficiency, readonly (readonly [number, number, number])[]> = {
  protanopia: [[0.152286, 1.052583, -0.204868], [0.114503, 0.786281, 0.099216], [-0.003882, -0.048116, 1.051998]],
  deuteranopia: [[0.367322, 0.860646, -0.227968], [0.280085, 0.672501, 0.047413], [-0.01182, 0.04294, 0.968881]],
  tritanopia: [[1.255528, -0.076749, -0.178779], [-0.078411, 0.930809, 0.147602], [0.004733, 0.691367, 0.3039]],
};

/** How an sRGB colour looks with a deficiency: linearise, apply the matrix, clamp, re-encode. */
export function simulate(rgb: Rgb, deficiency: Deficiency): Rgb {
  const lin = toLinearRgb(rgb);
  const out = MACHADO[deficiency].map((row) => Math.min(1, Math.max(0, row[0] * lin[0] + row[1] * lin[1] + row[2] * lin[2])));
  return fromLinearRgb(out as Rgb);
}

export const DEFICIENCIES: readonly Deficiency[] = ['protanopia', 'deuteranopia', 'tritanopia'];

/** Normal vision or one of the simulated deficiencies. */
export type Vision = 'normal' | Deficiency;

/** Every vision the palettes and style checks are measured under, normal first. */
export const VISIONS: readonly Vision[] = ['normal', ...DEFICIENCIES];

/** An sRGB colour as a reader with the given vision sees it. */
export function seen(rgb: Rgb, vision: Vision): Rgb {
  return vision === 'normal' ? rgb : simulate(rgb, vision);
}
