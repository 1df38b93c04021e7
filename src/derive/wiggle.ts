import { fsum } from 'd3-array';

// Stacked-graph baselines after L. Byron & M. Wattenberg, "Stacked Graphs – Geometry &
// Aesthetics", IEEE TVCG 14(6), 2008. Layer i has thickness f_i; its boundaries are
// g_i = g0 + Σ_{j≤i} f_j. The baseline's slope g0′ is chosen to minimise the wiggle, the sum of
// squared slopes of the boundaries (or of the layers' midlines, weighted by their thickness).

/**
 * The baseline slope that minimises the unweighted wiggle Σ_{i=0..n} (g_i′)²:
 * g0′ = −(1/(n+1)) · Σ_{i=1..n} (n − i + 1) · f_i′.
 */
export function wiggleSlope(df: readonly number[]): number {
  const n = df.length;
  return -fsum(df, (d, i) => (n - i) * d) / (n + 1);
}

/** The unweighted wiggle Σ_{i=0..n} (g_i′)² of a baseline slope and the layers' slopes. */
export function wiggle(g0: number, df: readonly number[]): number {
  let g = g0;
  let sum = g * g;
  for (const d of df) {
    g += d;
    sum += g * g;
  }
  return sum;
}

/**
 * The baseline slope that minimises the thickness-weighted wiggle Σ_i f_i · (g_{i−1}′ + ½f_i′)²
 * (the streamgraph's): g0′ = −Σ_i f_i·(½f_i′ + Σ_{j<i} f_j′) / Σ_i f_i; zero where every layer is empty.
 */
export function weightedWiggleSlope(f: readonly number[], df: readonly number[]): number {
  const total = fsum(f);
  if (!(total > 0)) return 0;
  let below = 0;
  let sum = 0;
  f.forEach((fi, i) => {
    sum += fi * (df[i]! / 2 + below);
    below += df[i]!;
  });
  return -sum / total;
}

/** The thickness-weighted wiggle Σ_i f_i · (g_{i−1}′ + ½f_i′)² of a baseline slope. */
export function weightedWiggle(g0: number, f: readonly number[], df: readonly number[]): number {
  let g = g0;
  let sum = 0;
  f.forEach((fi, i) => {
    sum += fi * (g + df[i]! / 2) ** 2;
    g += df[i]!;
  });
  return sum;
}

/**
 * The streamgraph's baseline at each key for layers[i][k] (layer i's thickness at key k, bottom
 * layer first): the weighted-wiggle slope integrated from key to key (the slope uses the
 * differences from the previous key, so uneven key spacing cancels), then shifted so the whole
 * stream is centred on zero.
 */
export function streamBaseline(layers: readonly (readonly number[])[]): number[] {
  const keys = layers[0]?.length ?? 0;
  const g0: number[] = new Array<number>(keys).fill(0);
  for (let k = 1; k < keys; k++) {
    const f = layers.map((l) => l[k]!);
    const df = layers.map((l) => l[k]! - l[k - 1]!);
    g0[k] = g0[k - 1]! + weightedWiggleSlope(f, df);
  }
  let lo = Infinity;
  let hi = -Infinity;
  for (let k = 0; k < keys; k++) {
    const top = g0[k]! + fsum(layers, (l) => l[k]!);
    lo = Math.min(lo, g0[k]!);
    hi = Math.max(hi, top);
  }
  const shift = keys ? -(lo + hi) / 2 : 0;
  return g0.map((g) => g + shift);
}
