import type { LineSeries } from '../derive/lines.js';
import { m4 } from '../derive/m4.js';
import type { Scale } from '../layout/scales.js';
import type { Datum, PathCommand, PathPoint, SceneNode } from '../scene/types.js';

/** Stroke width of a data line, px (common practice: about twice a gridline, so data stands out from guides). */
export const LINE_WIDTH = 2;
/** Radius of the dot drawn for a point alone between two gaps, px: a little wider than the line, so it reads as a point of it. */
export const DOT_RADIUS = 2.5;
/**
 * Groups per CSS pixel for M4: four, so a group never straddles a device pixel column of a PNG
 * at scale 1, 2 or 4 (the default is 2), which is what makes M4's raster exact.
 */
export const M4_COLUMNS_PER_PX = 4;
/**
 * Points per M4 group above which a run of the line is decimated: M4 keeps at most four points
 * per group, so a run with fewer on average could hardly be shortened. bench/line.js measures
 * what it saves on a 1,000,000-point line (about 0.14 MB of SVG instead of about 14 MB).
 */
export const M4_MIN_POINTS_PER_GROUP = 4;

/** A function from a key position (time, number, or level index) to px along the scale. */
export function keyToPx(scale: Scale, levels: readonly string[]): (x: number) => number {
  if (scale.kind === 'band') return (x) => scale.center(levels[x]!);
  return scale.map;
}

/** The runs of a series between gaps: [start, end) index pairs of consecutive finite values. */
export function runsOf(ys: readonly number[]): [number, number][] {
  const runs: [number, number][] = [];
  let start = -1;
  for (let i = 0; i <= ys.length; i++) {
    const present = i < ys.length && !Number.isNaN(ys[i]!);
    if (present && start < 0) start = i;
    if (!present && start >= 0) { runs.push([start, i]); start = -1; }
  }
  return runs;
}

/**
 * The indexes of a run drawn. A run denser than M4_MIN_POINTS_PER_GROUP points per group is
 * dense: each of its points is placed at the middle of its group (within 1/8 px of its exact x,
 * finer than a pixel of the PNG), and then, unless `decimate` is false, reduced by M4. M4's
 * guarantee is for lines rasterised without anti-aliasing; with anti-aliasing, points spread
 * across a group would shift the stroke's edge by a fraction of a pixel. With each group's
 * points on one vertical, the line through every point and the line through M4's points cover
 * the same shape, so the PNG is the same pixel for pixel (test/external/m4.test.ts).
 * Snaps `px` in place.
 */
export function drawnIndexes(px: Float64Array, py: Float64Array, start: number, end: number, decimate: boolean): number[] {
  const groups = Math.floor(px[end - 1]! * M4_COLUMNS_PER_PX) - Math.floor(px[start]! * M4_COLUMNS_PER_PX) + 1;
  const dense = end - start > M4_MIN_POINTS_PER_GROUP * groups;
  if (dense) for (let i = start; i < end; i++) px[i] = (Math.floor(px[i]! * M4_COLUMNS_PER_PX) + 0.5) / M4_COLUMNS_PER_PX;
  if (dense && decimate) return m4(px, py, M4_COLUMNS_PER_PX, start, end);
  const all: number[] = [];
  for (let i = start; i < end; i++) all.push(i);
  return all;
}

/** What one series is drawn with. */
export interface SeriesPaint {
  id: string;
  stroke: string;
  /** The series as the scene dump names it ({ route: "A" }); undefined for a chart of one line. */
  series: Datum | undefined;
  /** The datum of a point by its index in the series. */
  datum(i: number): Datum;
}

/**
 * One series as scene marks: a path through each run of present values (moving, never drawing,
 * across a gap) and a dot for each point alone between gaps. Runs denser than the raster can
 * show are reduced by M4 unless `decimate` is false.
 */
export function seriesMarks(s: LineSeries, toX: (x: number) => number, toY: (y: number) => number, paint: SeriesPaint, decimate = true): SceneNode[] {
  const n = s.xs.length;
  const px = new Float64Array(n);
  const py = new Float64Array(n);
  for (let i = 0; i < n; i++) { px[i] = toX(s.xs[i]!); py[i] = Number.isNaN(s.ys[i]!) ? Number.NaN : toY(s.ys[i]!); }
  const commands: PathCommand[] = [];
  const points: PathPoint[] = [];
  const dots: SceneNode[] = [];
  for (const [start, end] of runsOf(s.ys)) {
    if (end - start === 1) {
      dots.push({ kind: 'circle', id: `${paint.id}-dot-${start}`, role: 'point', cx: px[start]!, cy: py[start]!, r: DOT_RADIUS, fill: paint.stroke, datum: paint.datum(start) });
      continue;
    }
    drawnIndexes(px, py, start, end, decimate).forEach((i, k) => {
      commands.push({ op: k === 0 ? 'M' : 'L', x: px[i]!, y: py[i]! });
      points.push({ x: px[i]!, y: py[i]!, datum: paint.datum(i) });
    });
  }
  const line: SceneNode[] = commands.length
    ? [{ kind: 'path', id: paint.id, role: 'line', commands, points, stroke: paint.stroke, strokeWidth: LINE_WIDTH, round: true, ...(paint.series ? { series: paint.series } : {}) }]
    : [];
  return [...line, ...dots];
}
