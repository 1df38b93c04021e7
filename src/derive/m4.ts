/**
 * M4 decimation (Jugel, Jerzak, Hackenbroich & Markl, "M4: A Visualization-Oriented Time Series
 * Data Aggregation", PVLDB 7(10), 2014): split a polyline's points into groups by pixel column
 * and keep, in each group, the first, the last, the lowest and the highest point. A line drawn
 * through what is kept lights the same pixels as one through every point when the groups are
 * the rasteriser's columns (or a refinement of them), since within a column the line only
 * sweeps between its extremes, and it enters and leaves the column at its first and last points.
 *
 * `xs` and `ys` are pixel positions, `xs` non-decreasing; `columnsPerPx` is how many groups one
 * CSS pixel holds (group = ⌊x · columnsPerPx⌋, absolute, so groups line up with device pixels
 * at any scale that divides it). Returns the indexes kept, ascending, each once: at most 4 per
 * group. Points from `start` (inclusive) to `end` (exclusive).
 */
export function m4(xs: ArrayLike<number>, ys: ArrayLike<number>, columnsPerPx: number, start = 0, end = xs.length): number[] {
  const kept: number[] = [];
  let i = start;
  while (i < end) {
    const column = Math.floor(xs[i]! * columnsPerPx);
    let [lo, hi, last] = [i, i, i];
    let j = i + 1;
    for (; j < end && Math.floor(xs[j]! * columnsPerPx) === column; j++) {
      if (ys[j]! < ys[lo]!) lo = j;
      if (ys[j]! > ys[hi]!) hi = j;
      last = j;
    }
    // first, then the extremes in the order they come, then last; each index once.
    const [a, b] = lo < hi ? [lo, hi] : [hi, lo];
    kept.push(i);
    if (a !== i) kept.push(a);
    if (b !== a && b !== i) kept.push(b);
    if (last !== b && last !== a && last !== i) kept.push(last);
    i = j;
  }
  return kept;
}
