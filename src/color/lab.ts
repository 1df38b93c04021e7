import { convertRgbToLab65, differenceCiede2000 } from 'culori/fn';
import type { Rgb } from './srgb.js';

/** CIELAB coordinates [L*, a*, b*], D65 white. */
export type Lab = [number, number, number];

/** sRGB channels in [0, 1] → CIELAB (D65), through culori's `lab65` conversion. */
export function rgbToLab([r, g, b]: Rgb): Lab {
  const c = convertRgbToLab65({ r, g, b });
  return [c.l, c.a, c.b];
}

// Built once: culori's difference functions are factories. Both colours are given in `lab65`,
// the space ΔE00 is computed in, so culori converts nothing (a `lab` colour would be D50 and
// be converted first, which moves Sharma pair 1 from 2.0425 to 1.8566).
const de00 = differenceCiede2000();

/**
 * CIEDE2000 colour difference with kL = kC = kH = 1 (CIE 142-2001; Sharma, Wu & Dalal, Color
 * Res. Appl. 30(1), 2005), computed by culori on CIELAB D65 coordinates.
 */
export function ciede2000([L1, a1, b1]: Lab, [L2, a2, b2]: Lab): number {
  return de00({ mode: 'lab65', l: L1, a: a1, b: b1 }, { mode: 'lab65', l: L2, a: a2, b: b2 });
}
