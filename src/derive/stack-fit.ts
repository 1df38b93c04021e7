import { diagnostic, failure, success, type Outcome } from '../diagnostics/diagnostic.js';
import { keepLargest } from './stack.js';
import type { DerivedStacks, StackQuery } from './stacks.js';

/** How many bars the plot holds for these stacks (their notes take room from it), measured by the form; a number in tests. */
export type StackCapacity<Q extends StackQuery> = (derived: DerivedStacks<Q>) => number;

/**
 * The stacks the plot holds at the narrowest band drawn: all of them when they fit; else, for a
 * categorical group key, the groups with the largest totals (in their order), the rest left out
 * and named in a note, settled so the plot still holds them once that note takes its room; an
 * ordered key is refused, since leaving groups out would break its order.
 */
export function fitStacks<Q extends StackQuery>(derived: DerivedStacks<Q>, capacityFor: StackCapacity<Q>): Outcome<DerivedStacks<Q>> {
  const { query, stacks } = derived;
  const fits = capacityFor(derived);
  // A plot with no room at all is a frame too small for its words, which layout reports.
  if (stacks.length <= fits || fits < 1) return success(derived);
  const field = query.group.name;
  if (query.order === 'key') {
    return failure([diagnostic('derive.too-many-ordered-bars', `${stacks.length} bars in key order do not fit: the plot holds ${fits} at 3 px each, and leaving groups out would break their order`, {
      field, found: `${stacks.length} bars`, expected: `at most ${fits}`, hint: 'aggregate to a coarser key (e.g. months instead of days), or make the chart larger with `size:`',
    })]);
  }
  let capacity = fits;
  let fitted = derived;
  for (;;) {
    const { kept, dropped } = keepLargest(stacks, capacity);
    fitted = { ...derived, stacks: kept, dropped };
    const room = capacityFor(fitted);
    if (room >= capacity || capacity <= 1) break;
    capacity = Math.max(1, room);
  }
  const n = fitted.dropped.length;
  return success(fitted, [diagnostic('derive.others-folded', `${stacks.length} bars do not fit at 3 px each; the ${n} with the smallest totals are left out and named in a note`, {
    field, found: `${stacks.length} bars`, expected: `at most ${capacity}`, hint: 'make the chart larger with `size:`, or filter the table to the groups that matter',
  })]);
}
