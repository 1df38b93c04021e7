import { seen, VISIONS } from './cvd.js';
import { ciede2000, rgbToLab, type Lab } from './lab.js';
import { inGamut, oklchToRgb, rgbToOklch, type Oklch } from './oklab.js';
import { seededRandom } from './random.js';
import { hexToRgb, rgbToHex } from './srgb.js';
import { contrastRatio } from './wcag.js';

/** What the categorical search starts from and must respect; recorded in the palette file. */
export interface CategoricalInputs {
  /** Background the colours are drawn on (#rrggbb). */
  background: string;
  /** The first colour, kept as it is. */
  anchor: string;
  /** Colours drawn beside the palette but not part of it (e.g. the grey of "others"). */
  reserved: string[];
  /** Number of colours. */
  size: number;
  /** Least WCAG contrast of every colour against the background. */
  minContrast: number;
  /** OKLab lightness range of the searched colours. */
  lightness: [number, number];
  /** OKLCH chroma range of the searched colours. */
  chroma: [number, number];
  /** Seed of the pseudo-random generator. */
  seed: number;
  /** Independent starts; the best result wins. */
  starts: number;
  /** Proposed moves per start. */
  iterations: number;
  /** Temperature (in ΔE00) of the soft minimum that breaks ties between equal minima. */
  softness: number;
}

/** A colour that passed every constraint, with how each vision sees it. */
interface Candidate {
  lch: Oklch;
  hex: string;
  labs: Lab[];
}

/** A scored set: the hard minimum ΔE00 first, the soft minimum to break ties. */
interface Score {
  min: number;
  soft: number;
}

function fromHex(hex: string): Candidate {
  const rgb = hexToRgb(hex);
  return { lch: rgbToOklch(rgb), hex, labs: VISIONS.map((v) => rgbToLab(seen(rgb, v))) };
}

/**
 * The candidate for an OKLCH point, snapped to 8-bit hex (so what is scored is what is
 * written), or null when it breaks a constraint: outside the box, out of gamut, too little
 * contrast.
 */
function candidate(lch: Oklch, inputs: CategoricalInputs): Candidate | null {
  const [l, c] = lch;
  if (l < inputs.lightness[0] || l > inputs.lightness[1] || c < inputs.chroma[0] || c > inputs.chroma[1]) return null;
  const rgb = oklchToRgb(lch);
  if (!inGamut(rgb)) return null;
  const hex = rgbToHex(rgb);
  if (contrastRatio(hex, inputs.background) < inputs.minContrast) return null;
  return { ...fromHex(hex), lch };
}

/** Smallest ΔE00 between a and b over every vision. */
function distance(a: Candidate, b: Candidate): number {
  let min = Infinity;
  for (let v = 0; v < a.labs.length; v++) min = Math.min(min, ciede2000(a.labs[v]!, b.labs[v]!));
  return min;
}

/** ΔE00 between every two colours of a set under every vision: [i][j][vision]. */
type Distances = number[][][];

function distancesTo(set: readonly Candidate[], c: Candidate): number[][] {
  return set.map((o) => o.labs.map((lab, v) => ciede2000(lab, c.labs[v]!)));
}

/**
 * Distances from `c` (to sit at `index`) to every other colour of the set, or null as soon as
 * one falls below `floor`: such a move cannot raise the set's minimum, so it is not finished.
 */
function distancesAbove(set: readonly Candidate[], index: number, c: Candidate, floor: number): number[][] | null {
  const row: number[][] = [];
  for (let j = 0; j < set.length; j++) {
    const d = j === index ? c.labs.map(() => 0) : set[j]!.labs.map((lab, v) => ciede2000(lab, c.labs[v]!));
    if (j !== index && d.some((x) => x < floor)) return null;
    row.push(d);
  }
  return row;
}

/** Puts colour `index` and its distances into the set and the table. */
function place(set: Candidate[], table: Distances, index: number, c: Candidate, row: number[][]): void {
  set[index] = c;
  row.forEach((d, j) => {
    table[index]![j] = d;
    table[j]![index] = d;
  });
}

/**
 * Scores a set from its distance table: every pair with at least one searched colour, every
 * vision. The first `fixed` colours (the anchor and the reserved ones) never move, so pairs
 * among them are left out.
 */
function score(table: Distances, fixed: number, softness: number): Score {
  let min = Infinity;
  let sum = 0;
  for (let i = 0; i < table.length; i++) {
    for (let j = Math.max(i + 1, fixed); j < table.length; j++) {
      for (const d of table[i]![j]!) {
        min = Math.min(min, d);
        sum += Math.exp(-d / softness);
      }
    }
  }
  return { min, soft: -softness * Math.log(sum) };
}

const better = (a: Score, b: Score) => a.min > b.min || (a.min === b.min && a.soft > b.soft);

/** Step scale of one OKLCH coordinate at the start of a search: L, C, h°. */
const STEP = [0.1, 0.05, 45] as const;
/** The step shrinks geometrically to this share of its start over the iterations. */
const STEP_END = 0.02;

function randomCandidate(random: () => number, inputs: CategoricalInputs): Candidate {
  for (;;) {
    const [l0, l1] = inputs.lightness;
    const [c0, c1] = inputs.chroma;
    const found = candidate([l0 + random() * (l1 - l0), c0 + random() * (c1 - c0), random() * 360], inputs);
    if (found) return found;
  }
}

/** One start: random colours, then moves of one coordinate of one colour, kept if better. */
function searchOnce(random: () => number, fixed: readonly Candidate[], inputs: CategoricalInputs): { set: Candidate[]; score: Score } {
  const set = [...fixed];
  for (let i = 1; i < inputs.size; i++) set.push(randomCandidate(random, inputs));
  const table: Distances = set.map((c) => distancesTo(set, c));
  let current = score(table, fixed.length, inputs.softness);
  for (let t = 0; t < inputs.iterations; t++) {
    const scale = STEP_END ** (t / Math.max(1, inputs.iterations - 1));
    const index = fixed.length + Math.floor(random() * (inputs.size - 1));
    const coord = Math.floor(random() * 3) as 0 | 1 | 2;
    const lch = [...set[index]!.lch] as Oklch;
    lch[coord] += (random() < 0.5 ? -1 : 1) * STEP[coord] * scale * (0.5 + random());
    lch[2] = ((lch[2] % 360) + 360) % 360;
    const moved = candidate(lch, inputs);
    const row = moved && distancesAbove(set, index, moved, current.min);
    if (!moved || !row) continue;
    const previous = { colour: set[index]!, row: [...table[index]!] };
    place(set, table, index, moved, row);
    const next = score(table, fixed.length, inputs.softness);
    if (better(next, current)) current = next;
    else place(set, table, index, previous.colour, previous.row);
  }
  return { set, score: current };
}

/**
 * Orders colours greedily from the first: each next colour is the remaining one farthest (by
 * its smallest ΔE00 over every vision) from all colours before it, so every prefix of the list
 * is as distinct as this order can make it. Ties go to the earlier colour.
 */
function greedyOrder(colours: readonly Candidate[]): Candidate[] {
  const order = [colours[0]!];
  const rest = colours.slice(1);
  while (rest.length) {
    let best = 0;
    let bestGap = -Infinity;
    rest.forEach((c, i) => {
      const gap = Math.min(...order.map((o) => distance(o, c)));
      if (gap > bestGap) [best, bestGap] = [i, gap];
    });
    order.push(rest.splice(best, 1)[0]!);
  }
  return order;
}

/**
 * Searches for `size` colours, the anchor first, whose smallest CIEDE2000 difference (between
 * any two of them, and between any of them and a reserved colour) under normal vision and
 * the simulated deficiencies is as large as the seeded multi-start coordinate search finds.
 * Returns #rrggbb colours in greedy prefix order. Deterministic: same inputs, same colours.
 */
export function searchCategorical(inputs: CategoricalInputs): string[] {
  const random = seededRandom(inputs.seed);
  const anchor = fromHex(inputs.anchor);
  const fixed = [anchor, ...inputs.reserved.map(fromHex)];
  let best: { set: Candidate[]; score: Score } | undefined;
  for (let s = 0; s < inputs.starts; s++) {
    const run = searchOnce(random, fixed, inputs);
    if (!best || better(run.score, best.score)) best = run;
  }
  const palette = [anchor, ...best!.set.slice(fixed.length)];
  return greedyOrder(palette).map((c) => c.hex);
}
