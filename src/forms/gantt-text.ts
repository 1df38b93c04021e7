import { ordinal } from '../diagnostics/words.js';
import { thinningStep } from '../layout/axis.js';
import { plotFor } from '../layout/compose.js';
import type { CartesianDomains, LayoutContext } from '../layout/kit-types.js';
import { textBoxHeight } from '../layout/text.js';

/** How many task names the left axis shows: every k-th, as drawLeftBandAxis thins them in this plot. */
function namingStep(domains: CartesianDomains, notes: string[], ctx: LayoutContext): number {
  const { left } = plotFor(domains, notes, ctx).box;
  if (left.kind !== 'band') return 1;
  return thinningStep(textBoxHeight(ctx.measure, ctx.style.text.tick), left.band.step, 1);
}

function note(k: number, n: number): string {
  const shown = Math.ceil(n / k);
  return `Only every ${ordinal(k)} task is named on the axis (${shown} of ${n}), for want of room; each bar carries its task's name as its title.`;
}

/**
 * The note a Gantt chart prints when its rows are too thin for every task's name: task names are
 * never left out silently. The note takes room from the plot, which may thin the names further,
 * so the step is measured again with the note in place until it holds.
 */
export function thinnedNames(domains: CartesianDomains, n: number, ctx: LayoutContext): string[] {
  let k = namingStep(domains, [], ctx);
  for (let i = 0; k > 1 && i < 3; i++) {
    const again = namingStep(domains, [note(k, n)], ctx);
    if (again === k) break;
    k = again;
  }
  return k > 1 ? [note(k, n)] : [];
}
