import RBush from 'rbush';
import { overlappingBoxes } from './checks.js';
import type { Box, SceneNode, TextNode } from '../scene/types.js';

/** A label to place along one axis: it wants its centre at `want` and spans `size` px. */
export interface DodgeItem {
  id: string;
  want: number;
  size: number;
}

/** Where a dodged label went, and whether it moved far enough to need a leader line. */
export interface Dodged {
  id: string;
  /** The label's centre. */
  at: number;
  /** |at − want|. */
  shift: number;
  /** True when shift > the threshold given: draw a leader from the label to its point. */
  moved: boolean;
}

/**
 * Places labels on one axis (line-end labels) without overlap, keeping their order by wanted
 * position (ties by id, in code points), each at least `gap` from the next and inside
 * [min, max], with the least total squared displacement.
 *
 * Subtracting each label's offset from the first turns "no overlap, same order" into "a
 * non-decreasing sequence", so the optimum is the isotonic regression of the wanted positions:
 * the pool-adjacent-violators algorithm, which merges overlapping clusters to their mean. Its
 * clamp to the bounds is still optimal because the bounds are the same for every element of
 * the transformed sequence. O(n log n) for the sort, O(n) after.
 *
 * `fits` is false when the labels with their gaps are longer than [min, max]: positions are
 * then clamped as far as they go and may overlap, and the caller should use a legend instead.
 */
export function dodge1d(items: readonly DodgeItem[], min: number, max: number, gap: number, threshold = 0): { placed: Dodged[]; fits: boolean } {
  const sorted = [...items].sort((a, b) => a.want - b.want || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
  const offsets: number[] = [];
  let offset = 0;
  sorted.forEach((it, i) => {
    if (i > 0) offset += (sorted[i - 1]!.size + it.size) / 2 + gap;
    offsets.push(offset);
  });
  const n = sorted.length;
  const lower = n ? min + sorted[0]!.size / 2 : min;
  const upper = n ? max - sorted[n - 1]!.size / 2 - offsets[n - 1]! : max;
  const fits = lower <= upper + 1e-9;
  const q = isotonic(sorted.map((it, i) => it.want - offsets[i]!));
  const placed = sorted.map((it, i) => {
    // When nothing fits, the lower bound wins: the first label stays inside.
    const at = Math.max(lower, Math.min(upper, q[i]!)) + offsets[i]!;
    const shift = Math.abs(at - it.want);
    return { id: it.id, at, shift, moved: shift > threshold };
  });
  return { placed, fits };
}

/** Least-squares non-decreasing fit (pool adjacent violators): equal weights, O(n). */
function isotonic(values: readonly number[]): number[] {
  const means: number[] = [];
  const counts: number[] = [];
  for (const v of values) {
    means.push(v);
    counts.push(1);
    while (means.length > 1 && means[means.length - 2]! > means[means.length - 1]!) {
      const m2 = means.pop()!, c2 = counts.pop()!;
      const m1 = means.pop()!, c1 = counts.pop()!;
      means.push((m1 * c1 + m2 * c2) / (c1 + c2));
      counts.push(c1 + c2);
    }
  }
  return means.flatMap((m, i) => Array<number>(counts[i]!).fill(m));
}

/** A scattered label and the boxes it may take, most wanted first. */
export interface LabelCandidate {
  id: string;
  boxes: Box[];
}

/** A placed label: the box it took and which of its candidates that was. */
export interface PlacedLabel {
  id: string;
  box: Box;
  candidate: number;
}

/**
 * The four usual places for a label of `width` × `height` beside a point, `offset` px
 * away: right, left, above, below (common practice for point labels).
 */
export function aroundPoint(x: number, y: number, width: number, height: number, offset: number): Box[] {
  return [
    { x: x + offset, y: y - height / 2, width, height },
    { x: x - offset - width, y: y - height / 2, width, height },
    { x: x - width / 2, y: y - offset - height, width, height },
    { x: x - width / 2, y: y + offset, width, height },
  ];
}

interface Entry { minX: number; minY: number; maxX: number; maxY: number }

// Boxes that only touch do not collide; this keeps float noise on a shared edge from counting.
const TOUCH = 1e-6;

const entry = (b: Box): Entry => ({ minX: b.x, minY: b.y, maxX: b.x + b.width, maxY: b.y + b.height });
const probe = (b: Box): Entry => ({ minX: b.x + TOUCH, minY: b.y + TOUCH, maxX: b.x + b.width - TOUCH, maxY: b.y + b.height - TOUCH });
const inside = (b: Box, bounds: Box) =>
  b.x >= bounds.x - TOUCH && b.y >= bounds.y - TOUCH
  && b.x + b.width <= bounds.x + bounds.width + TOUCH && b.y + b.height <= bounds.y + bounds.height + TOUCH;

/**
 * Greedy placement of scattered labels. In the order given (the caller's priority), each label
 * takes its first candidate box that lies inside `bounds` and overlaps no obstacle (marks,
 * axes, other text) and no label placed before it. Obstacles and placed labels live in an
 * R-tree (rbush), so each test costs about log n, not n. A label none of whose candidates is
 * free is returned in `unplaced`: the caller moves it to a legend or a note, never on top of
 * another. Deterministic: the same input gives the same output.
 */
export function placeLabels(candidates: readonly LabelCandidate[], obstacles: readonly Box[], bounds: Box): { placed: PlacedLabel[]; unplaced: string[] } {
  const tree = new RBush<Entry>();
  tree.load(obstacles.map(entry));
  const placed: PlacedLabel[] = [];
  const unplaced: string[] = [];
  for (const c of candidates) {
    const i = c.boxes.findIndex((b) => inside(b, bounds) && !tree.collides(probe(b)));
    if (i < 0) { unplaced.push(c.id); continue; }
    const box = c.boxes[i]!;
    tree.insert(entry(box));
    placed.push({ id: c.id, box, candidate: i });
  }
  return { placed, unplaced };
}

/**
 * The form's labels that overlap no other text, taken in the form's order (its priority); the
 * rest are left out, never drawn on top of another (common practice for chart labels).
 */
export function placeFormLabels(labels: readonly TextNode[], fixed: readonly SceneNode[], size: { width: number; height: number }, drop: ReadonlySet<string> = new Set()): { kept: TextNode[]; dropped: TextNode[] } {
  const obstacles = fixed.filter((n): n is TextNode => n.kind === 'text').map((n) => n.box);
  // Most forms place their labels clear of everything already: a sweep finds that without building an index.
  const inside = (b: Box) => b.x >= -1e-6 && b.y >= -1e-6 && b.x + b.width <= size.width + 1e-6 && b.y + b.height <= size.height + 1e-6;
  if (drop.size === 0 && labels.every((l) => inside(l.box)) && overlappingBoxes([...labels.map((l) => l.box), ...obstacles]).length === 0) return { kept: [...labels], dropped: [] };
  const { unplaced } = placeLabels(labels.filter((l) => !drop.has(l.id)).map((l) => ({ id: l.id, boxes: [l.box] })), obstacles, { x: 0, y: 0, ...size });
  const out = new Set([...unplaced, ...drop]);
  return { kept: labels.filter((l) => !out.has(l.id)), dropped: labels.filter((l) => out.has(l.id)) };
}
