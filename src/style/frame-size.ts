import type { ResolvedBrief } from '../brief/types.js';
import type { Style } from './types.js';

/**
 * The brief with its style's default frame size on each side the brief leaves open: a style may
 * set the frame (a slide is wider), and what the brief states wins, side by side. The size stays
 * not fixed, so a form that grows its frame (bars lying down) still may.
 */
export function withStyleSize(brief: ResolvedBrief, style: Style): ResolvedBrief {
  if (!style.size || (brief.sizeFixed.width && brief.sizeFixed.height)) return brief;
  return {
    ...brief,
    size: { width: brief.sizeFixed.width ? brief.size.width : style.size.width, height: brief.sizeFixed.height ? brief.size.height : style.size.height },
  };
}
