/** How strongly two axes go together for ordering: |r|, or 0 where r is undefined (a constant attribute). */
const strength = (r: number) => (Number.isNaN(r) ? 0 : Math.abs(r));

/**
 * A greedy axis order for parallel coordinates that puts strongly correlated attributes side by
 * side: start with the pair of largest |r|, then attach, at whichever end gains more, the unused
 * attribute most strongly correlated with that end; ties go to the right end, then to the lower
 * index, so the order is deterministic. Returns attribute indices, left to right.
 */
export function greedyAxisOrder(r: readonly (readonly number[])[]): number[] {
  const n = r.length;
  if (n <= 2) return Array.from({ length: n }, (_, i) => i);
  let best: [number, number] = [0, 1];
  for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) if (strength(r[i]![j]!) > strength(r[best[0]]![best[1]]!)) best = [i, j];
  const order = [...best];
  const used = new Set(order);
  while (order.length < n) {
    let pick = { axis: -1, at: 'right' as 'left' | 'right', s: -1 };
    for (let c = 0; c < n; c++) {
      if (used.has(c)) continue;
      const [right, left] = [strength(r[order.at(-1)!]![c]!), strength(r[order[0]!]![c]!)];
      if (right > pick.s) pick = { axis: c, at: 'right', s: right };
      if (left > pick.s) pick = { axis: c, at: 'left', s: left };
    }
    if (pick.at === 'right') order.push(pick.axis); else order.unshift(pick.axis);
    used.add(pick.axis);
  }
  return order;
}

/**
 * Which axes to flip, left to right, so that each neighbouring pair reads as a positive
 * correlation: an axis is flipped when its r with the previous axis, taking that axis's own flip
 * into account, is negative. The first axis is never flipped.
 */
export function axisFlips(order: readonly number[], r: readonly (readonly number[])[]): boolean[] {
  const flips = order.map(() => false);
  for (let k = 1; k < order.length; k++) {
    const rk = r[order[k - 1]!]![order[k]!]!;
    flips[k] = !Number.isNaN(rk) && rk < 0 !== flips[k - 1];
  }
  return flips;
}

/** The sum of |r| over neighbouring axes: what the ordering maximises. */
export function neighbourStrength(order: readonly number[], r: readonly (readonly number[])[]): number {
  let sum = 0;
  for (let k = 1; k < order.length; k++) sum += strength(r[order[k - 1]!]![order[k]!]!);
  return sum;
}
