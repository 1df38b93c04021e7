import pixelmatch from 'pixelmatch';
import { PNG } from 'pngjs';
import { describe, expect, it } from 'vitest';
import type { LineSeries } from '../../src/derive/lines.js';
import { m4 } from '../../src/derive/m4.js';
import { M4_COLUMNS_PER_PX, seriesMarks } from '../../src/forms/line-marks.js';
import { rasterize } from '../../src/raster/rasterize.js';
import type { Scene, SceneNode } from '../../src/scene/types.js';
import { writeSvg } from '../../src/svg/write.js';

/** A seeded random walk with rare jumps (as REFERENCES §6a's recipe), n points. */
function walk(n: number, seed: number): LineSeries {
  let s = seed >>> 0;
  const rand = () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
  const xs = new Array<number>(n);
  const ys = new Array<number>(n);
  let v = 0;
  for (let i = 0; i < n; i++) {
    v += rand() - 0.5 + (rand() < 0.0005 ? (rand() - 0.5) * 200 : 0);
    xs[i] = i;
    ys[i] = v;
  }
  return { label: undefined, xs, ys, rows: xs };
}

const SIZE = { width: 720, height: 440 };
const PLOT = { x: 50.3, y: 40, width: 620, height: 360 };

/** A scene of the series' marks alone, on the line chart's plot, with or without M4. */
function sceneOf(series: LineSeries, decimate: boolean): Scene {
  let [lo, hi] = [Infinity, -Infinity];
  for (const y of series.ys) { lo = Math.min(lo, y); hi = Math.max(hi, y); }
  const n = series.xs.length;
  const toX = (x: number) => PLOT.x + (x / (n - 1)) * PLOT.width;
  const toY = (y: number) => PLOT.y + PLOT.height - ((y - lo) / (hi - lo)) * PLOT.height;
  const empty = {};
  const marks: SceneNode[] = seriesMarks(series, toX, toY, { id: 'line', stroke: '#206c89', series: undefined, datum: () => empty }, decimate);
  const root = { kind: 'group' as const, id: 'chart', role: 'chart' as const, children: marks };
  return { form: 'line', ...SIZE, background: '#ffffff', title: 'm4', description: 'm4', root, axes: [], plot: PLOT, panels: [], legends: [] };
}

const points = (scene: Scene) => (scene.root.children[0] as { points: unknown[] }).points.length;

describe('M4 decimation (Jugel et al. 2014)', () => {
  it('keeps first, last, lowest and highest of each group, in order, each once', () => {
    const xs = [0, 0.1, 0.2, 0.3, 1.0, 1.1, 2.5];
    const ys = [5, 1, 9, 4, 3, 3, 7];
    // Groups of 1 px: {0..3}: first 0, min 1, max 2, last 3; {4,5}: first 4 (also min and max), last 5; {6}.
    expect(m4(xs, ys, 1)).toEqual([0, 1, 2, 3, 4, 5, 6]);
    expect(m4([0, 0.1, 0.2, 0.3], [5, 9, 1, 4], 1)).toEqual([0, 1, 2, 3]);
    expect(m4([0, 0.1, 0.2, 0.3, 0.4], [5, 9, 6, 1, 4], 1)).toEqual([0, 1, 3, 4]);
  });

  // External check of the paper's claim (Jugel et al., PVLDB 7(10) 2014: M4 "preserves perfect
  // visualizations" for line rasterization with groups aligned to pixel columns): the PNG of a
  // 1,000,000-point line drawn through M4's points equals the PNG drawn through every point.
  it('draws a 1,000,000-point line pixel for pixel as the full line does (PNG, scale 2, pixelmatch threshold 0), from an SVG under 200 KB', () => {
    const series = walk(1_000_000, 20141001);
    const full = sceneOf(series, false);
    const reduced = sceneOf(series, true);
    expect(points(full)).toBe(1_000_000);
    // At most 4 points per group, one group per quarter pixel.
    expect(points(reduced)).toBeLessThanOrEqual(4 * (PLOT.width + 1) * M4_COLUMNS_PER_PX);
    const fullSvg = writeSvg(full, { kind: 'live', family: 'Source Sans 3' });
    const reducedSvg = writeSvg(reduced, { kind: 'live', family: 'Source Sans 3' });
    expect(fullSvg.length).toBeGreaterThan(10_000_000);
    expect(Buffer.byteLength(reducedSvg)).toBeLessThan(200_000);
    const a = PNG.sync.read(rasterize(fullSvg, { scale: 2, fontFiles: [] }));
    const b = PNG.sync.read(rasterize(reducedSvg, { scale: 2, fontFiles: [] }));
    // includeAA: anti-aliased edge pixels count too, so this is every byte of every pixel.
    const differ = pixelmatch(a.data, b.data, undefined, a.width, a.height, { threshold: 0, includeAA: true });
    // The comparison means something only if the line lights a fair share of the plot.
    let lit = 0;
    for (let i = 0; i < a.data.length; i += 4) if (a.data[i] !== 255 || a.data[i + 1] !== 255 || a.data[i + 2] !== 255) lit++;
    expect(lit).toBeGreaterThan(20_000);
    expect(differ).toBe(0);
    // Rasterising a million round-joined segments takes seconds on a busy machine: a generous limit, not a timed assertion.
  }, 180_000);
});
