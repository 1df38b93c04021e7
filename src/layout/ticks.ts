/**
 * Nice tick values by the extended Wilkinson algorithm: J. Talbot, S. Lin, P. Hanrahan, "An
 * Extension of Wilkinson's Algorithm for Positioning Tick Labels on Axes", IEEE TVCG 16(6), 2010.
 * The search, its pruning bounds and the scoring terms follow the first author's reference code
 * (R package `labeling`, function `extended`); legibility is scored 1 there, and here, because
 * label overlap is checked separately by the axis layout.
 */

/** Nice step mantissas, in order of preference. */
const Q = [1, 5, 2, 2.5, 4, 3];
/** Weights of simplicity, coverage, density and legibility. */
const W = [0.25, 0.2, 0.5, 0.05] as const;
const EPS = 2.220446049250313e-16 * 100;
/** Largest tick count and skip factor searched. */
const MAX_SEARCH = 50;

/** Floored modulo, as R's `%%` (the sign follows the divisor). */
function mod(a: number, b: number): number {
  return ((a % b) + b) % b;
}

function simplicity(i: number, j: number, lmin: number, lmax: number, lstep: number): number {
  const r = mod(lmin, lstep);
  const v = (r < EPS || lstep - r < EPS) && lmin <= 0 && lmax >= 0 ? 1 : 0;
  return 1 - i / (Q.length - 1) - j + v;
}

function simplicityMax(i: number, j: number): number {
  return 1 - i / (Q.length - 1) - j + 1;
}

function coverage(dmin: number, dmax: number, lmin: number, lmax: number): number {
  const range = dmax - dmin;
  return 1 - (0.5 * ((dmax - lmax) ** 2 + (dmin - lmin) ** 2)) / (0.1 * range) ** 2;
}

function coverageMax(dmin: number, dmax: number, span: number): number {
  const range = dmax - dmin;
  if (span <= range) return 1;
  const half = (span - range) / 2;
  return 1 - (0.5 * (2 * half ** 2)) / (0.1 * range) ** 2;
}

function density(k: number, m: number, dmin: number, dmax: number, lmin: number, lmax: number): number {
  const r = (k - 1) / (lmax - lmin);
  const rt = (m - 1) / (Math.max(lmax, dmax) - Math.min(dmin, lmin));
  return 2 - Math.max(r / rt, rt / r);
}

function densityMax(k: number, m: number): number {
  return k >= m ? 2 - (k - 1) / (m - 1) : 1;
}

/** A labelling: first and last tick, step, and its score. */
export interface Labelling {
  lmin: number;
  lmax: number;
  lstep: number;
  score: number;
}

/**
 * The best labelling of the data range [dmin, dmax] with about m ticks. With `onlyLoose` the
 * ticks cover the whole range (lmin ≤ dmin and lmax ≥ dmax), which a plot extent fitted to its
 * outer ticks needs. With `limit`, no tick lies farther than it from zero.
 */
export function extendedLabelling(dmin: number, dmax: number, m: number, onlyLoose = false, limit = Infinity): Labelling | undefined {
  if (!(dmax - dmin > EPS) || !Number.isFinite(dmin) || !Number.isFinite(dmax) || m < 2) return undefined;
  let best: Labelling | undefined;
  const bestScore = () => best?.score ?? -2;
  // The reference code loops until its bounds prune; when no labelling qualifies (only-loose
  // at the limit of float precision) they never do, so the search stops at 50 ticks and j = 50.
  for (let j = 1; j <= MAX_SEARCH; j++) {
    for (let i = 0; i < Q.length; i++) {
      const q = Q[i]!;
      const sm = simplicityMax(i, j);
      if (W[0] * sm + W[1] + W[2] + W[3] < bestScore()) return best;
      for (let k = 2; k <= MAX_SEARCH; k++) {
        const dm = densityMax(k, m);
        if (W[0] * sm + W[1] + W[2] * dm + W[3] < bestScore()) break;
        const delta = (dmax - dmin) / (k + 1) / j / q;
        for (let z = Math.ceil(Math.log10(delta)); z < 400; z++) {
          const step = j * q * 10 ** z;
          const cm = coverageMax(dmin, dmax, step * (k - 1));
          if (W[0] * sm + W[1] * cm + W[2] * dm + W[3] < bestScore()) break;
          const minStart = Math.floor(dmax / step) * j - (k - 1) * j;
          const maxStart = Math.ceil(dmin / step) * j;
          for (let start = minStart; start <= maxStart; start++) {
            const lmin = start * (step / j);
            const lmax = lmin + step * (k - 1);
            const score = W[0] * simplicity(i, j, lmin, lmax, step) + W[1] * coverage(dmin, dmax, lmin, lmax)
              + W[2] * density(k, m, dmin, dmax, lmin, lmax) + W[3];
            if (score > bestScore() && (!onlyLoose || (lmin <= dmin && lmax >= dmax)) && Math.abs(lmin) <= limit && Math.abs(lmax) <= limit) {
              best = { lmin, lmax, lstep: step, score };
            }
          }
        }
      }
    }
  }
  return best;
}

/**
 * The ticks of a labelling, as exact-looking numbers: each is rounded to two decimals below its
 * step (0.30000000000000004 → 0.3), which keeps them evenly spaced at any magnitude. `scale`
 * maps a labelling found on a rescaled range back to data units.
 */
export function ticksOf(l: Labelling, scale = 1): number[] {
  const count = Math.round((l.lmax - l.lmin) / l.lstep) + 1;
  const exp = Math.floor(Math.log10(l.lstep * scale)) - 2;
  // The tick is an integer k times 10^exp, read back from its decimal form: the double nearest
  // that decimal, so it prints as written (2.07, not 2.0700000000000003; 7.5e307, not
  // 7.499999999999999e307). Where 10^exp is exact (|exp| ≤ 22) k / 10^-exp and k * 10^exp give
  // the same double; toFixed would stop at 20 decimals.
  const round = (v: number) => Number(`${exp < 0 ? Math.round(v * 10 ** -exp) : Math.round(v / 10 ** exp)}e${exp}`);
  return Array.from({ length: count }, (_, i) => {
    const v = round((l.lmin + i * l.lstep) * scale);
    return Object.is(v, -0) ? 0 : v;
  });
}

/**
 * The power of ten the search for [lo, hi] runs at. Where the span overflows to Infinity
 * (data near ±1.8e308) it is taken from half the range, so the search still gets finite numbers.
 */
function searchScale(lo: number, hi: number): number {
  const span = hi - lo;
  return Number.isFinite(span) ? 10 ** Math.floor(Math.log10(span)) : 10 ** Math.floor(Math.log10(hi / 2 - lo / 2) + Math.log10(2));
}

/** A bound that is not a finite number (a defect upstream) read as the nearest finite one, so no tick is ever NaN. */
function finiteBound(v: number): number {
  return Number.isNaN(v) ? 0 : Math.max(-Number.MAX_VALUE, Math.min(Number.MAX_VALUE, v));
}

/**
 * Ticks for [dmin, dmax] with about m of them. A degenerate range (one value) is widened to
 * reach zero first, so a single bar still gets an axis. The search runs on the range scaled
 * by its power of ten, so micro- and mega-scale data get the same nice steps as unit data, and
 * no tick lies beyond the largest double: where no nice ticks fit there (data near ±1.8e308)
 * the axis is the data's own extent.
 */
export function niceTicks(dmin: number, dmax: number, m: number, onlyLoose = false): number[] {
  // Values this small are zero for any chart (they are below what a float can scale).
  const tiny = (v: number) => (Math.abs(v) < 1e-300 ? 0 : v);
  let lo = tiny(finiteBound(dmin));
  let hi = tiny(finiteBound(dmax));
  // A span below 1e-10 of its magnitude is one value as far as doubles can label it: the end
  // farther from zero, so the axis still reaches all the data.
  if (hi - lo <= 1e-10 * Math.max(Math.abs(lo), Math.abs(hi))) {
    const v = Math.abs(hi) >= Math.abs(lo) ? hi : lo;
    lo = v;
    hi = v;
  }
  if (!(hi > lo)) {
    if (lo === 0) hi = 1;
    else if (lo > 0) lo = 0;
    else hi = 0;
  }
  const scale = searchScale(lo, hi);
  const l = extendedLabelling(lo / scale, hi / scale, Math.max(2, m), onlyLoose, Number.MAX_VALUE / scale);
  const ticks = l ? ticksOf(l, scale) : [];
  return ticks.length >= 2 && ticks.every(Number.isFinite) ? ticks : [lo, hi];
}
