import { describe, expect, it } from 'vitest';
import { contrastRatio } from '../../src/color/wcag.js';
import { dumpScene, type DumpMark, type SceneDump } from '../../src/scene/dump.js';
import type { ImageNode, PathNode } from '../../src/scene/types.js';
import { allNodes } from '../../src/scene/walk.js';
import { codes, renderRows } from '../helpers.js';
import { contiguousGroups, decodeIndexedPng, drawnOrder, plantedBlocks } from './heatmap-fixtures.js';

const brief = (extra: Record<string, unknown> = {}) => ({ intent: 'matrix', keys: ['gene', 'sample'], values: 'level', fields: { level: { unit: 'reads' } }, ...extra });

async function heatmap(rows: Record<string, unknown>[], extra: Record<string, unknown> = {}) {
  const result = await renderRows(brief(extra), rows);
  if (!result.ok || !result.scene) throw new Error(JSON.stringify(result.diagnostics));
  return { result, scene: result.scene, dump: dumpScene(result.scene) };
}

const cells = (dump: SceneDump): DumpMark[] => dump.marks.filter((m) => m.role === 'cell');
const centre = (m: DumpMark) => ({ x: m.x! + m.width! / 2, y: m.y! + m.height! / 2 });

/** The class fill of a value, read from the binned legend (from ≤ v < to; the last class includes its top). */
function legendFill(dump: SceneDump, v: number): string {
  const entries = dump.legends[0]!.entries;
  const k = entries.findIndex((e, i) => v >= e.from! && (v < e.to! || i === entries.length - 1));
  return entries[Math.max(0, k)]!.fill!;
}

describe('heat map contracts', () => {
  it('a planted block structure in a shuffled matrix comes back as contiguous blocks of rows and columns', async () => {
    for (const linkage of ['single', 'complete', 'average', 'ward']) {
      const { dump } = await heatmap(plantedBlocks(3, 5, 4, 42), { linkage });
      const { rows, columns } = drawnOrder(dump);
      expect(rows).toHaveLength(15);
      expect(contiguousGroups(rows)).toBe(true);
      expect(contiguousGroups(columns)).toBe(true);
    }
  });

  it('the shuffled input really hides the blocks (a check that cannot fail is no check)', () => {
    const first = [...new Set(plantedBlocks(3, 5, 4, 42).map((r) => r.gene as string))];
    expect(contiguousGroups(first)).toBe(false);
  });

  it('reordering never changes a cell\'s value: each cell\'s datum is its row and column\'s value in the data', async () => {
    const rows = plantedBlocks(3, 4, 3, 7);
    const given = new Map(rows.map((r) => [`${r.gene}|${r.sample}`, r.level]));
    for (const order of ['cluster', 'label', 'data']) {
      const { dump } = await heatmap(rows, { order });
      expect(cells(dump)).toHaveLength(given.size);
      for (const c of cells(dump)) expect(c.datum!.level).toBe(given.get(`${c.datum!.gene}|${c.datum!.sample}`));
      // And each cell sits in the row and column its datum names.
      const { rows: r, columns: k } = drawnOrder(dump);
      const axisRows = dump.axes.find((a) => a.orient === 'right')!;
      const step = (axisRows.range[1] - axisRows.range[0]) / r.length;
      for (const c of cells(dump)) expect(Math.floor((centre(c).y - axisRows.range[0]) / step)).toBe(r.indexOf(c.datum!.gene as string));
      expect(k.length).toBe(9);
    }
  });

  it('dendrogram leaves align with their rows and columns, and branch heights are to scale', async () => {
    const { scene, dump } = await heatmap(plantedBlocks(3, 4, 3, 11));
    const { rows, columns } = drawnOrder(dump);
    const paths = allNodes(scene.root.children).filter((n): n is PathNode => n.role === 'dendrogram');
    for (const [side, labels, along, depth] of [['column', columns, 'x', 'y'], ['row', rows, 'y', 'x']] as const) {
      const tree = paths.filter((p) => p.id.startsWith(`dendrogram-${side}`));
      expect(tree).toHaveLength(labels.length - 1);
      const ends = tree.flatMap((p) => [p.commands[0], p.commands[3]]) as { x: number; y: number }[];
      // Leaves are at the tree's matrix side: its largest y above the columns, its largest x left of the rows.
      const leafLevel = Math.max(...ends.map((e) => e[depth]));
      const leaves = ends.filter((e) => Math.abs(e[depth] - leafLevel) < 1e-9).map((e) => e[along]).sort((a, b) => a - b);
      const centres = cells(dump).map((c) => centre(c)[along]);
      const expected = [...new Set(centres.map((v) => Math.round(v * 100) / 100))].sort((a, b) => a - b);
      expect(leaves).toHaveLength(expected.length);
      leaves.forEach((v, i) => expect(v).toBeCloseTo(expected[i]!, 1));
      // To scale: a merge's distance from the leaves is its height over the root's, times the tree's depth.
      const root = tree.reduce((a, b) => (b.datum!.height! > a.datum!.height! ? b : a));
      const span = Math.abs((root.commands[1] as { x: number; y: number })[depth] - leafLevel);
      for (const p of tree) {
        const bar = p.commands[1] as { x: number; y: number };
        expect(Math.abs(bar[depth] - leafLevel)).toBeCloseTo((span * (p.datum!.height as number)) / (root.datum!.height as number), 6);
      }
    }
  });

  it('a missing cell is drawn outlined and hatched in the page colour, never coloured as a value, with a warning', async () => {
    const rows = plantedBlocks(2, 3, 3, 5).filter((r) => !(r.gene === 'G0-1' && r.sample === 'S1-2'));
    const { result, dump } = await heatmap(rows);
    expect(codes(result)).toContain('derive.missing-cells');
    const gap = cells(dump).find((c) => c.datum!.gene === 'G0-1' && c.datum!.sample === 'S1-2')!;
    expect(gap.datum!.level).toBeNull();
    expect(gap.fill).toBe(dump.background);
    expect(gap.stroke).toBeDefined();
    expect(dump.legends[0]!.entries.map((e) => e.fill)).not.toContain(gap.fill);
    expect(dump.texts.some((t) => t.role === 'note' && /no value/.test(t.text))).toBe(true);
  });

  it('each cell is filled with its value\'s class colour; cell text is written in the ink with the better contrast', async () => {
    const rows = plantedBlocks(2, 2, 2, 3);
    const { dump } = await heatmap(rows, { size: { width: 720, height: 600 } });
    for (const c of cells(dump)) expect(c.fill).toBe(legendFill(dump, c.datum!.level as number));
    const labels = dump.texts.filter((t) => t.role === 'label');
    expect(labels.length).toBe(cells(dump).length);
    for (const t of labels) {
      const cell = cells(dump).find((c) => t.x >= c.x! && t.x + t.width <= c.x! + c.width! && t.y >= c.y! && t.y + t.height <= c.y! + c.height!)!;
      const other = t.fill === dump.background ? '#1b2025' : dump.background;
      expect(contrastRatio(t.fill, cell.fill!)).toBeGreaterThanOrEqual(contrastRatio(other, cell.fill!));
    }
  });

  it('row labels that cannot all fit are thinned with a note saying so, never silently dropped', async () => {
    const { result, dump } = await heatmap(plantedBlocks(3, 30, 2, 9));
    const rowsAxis = dump.axes.find((a) => a.orient === 'right')!;
    expect(rowsAxis.ticks.length).toBeLessThan(rowsAxis.domain.length);
    expect(dump.texts.some((t) => t.role === 'note' && /every .* of 90 rows/.test(t.text))).toBe(true);
    expect(codes(result)).toContain('layout.labels-thinned');
  });

  it('beyond 40,000 cells the matrix is one raster whose pixels are exactly the cells\' class colours', async () => {
    const rows: Record<string, unknown>[] = [];
    for (let r = 0; r < 205; r++) for (let c = 0; c < 200; c++) rows.push({ gene: `G${r % 3}-${r}`, sample: `S${c % 2}-${c}`, level: ((r * 7 + c * 13) % 97) + (r % 3) * 40 });
    rows.splice(1234, 1);
    const { scene, dump } = await heatmap(rows);
    expect(cells(dump)).toHaveLength(0);
    const raster = allNodes(scene.root.children).find((n): n is ImageNode => n.role === 'raster')!;
    expect(raster.grid).toEqual({ columns: 200, rows: 205 });
    const png = decodeIndexedPng(raster.href);
    expect([png.width, png.height]).toEqual([200, 205]);
    const { rows: order, columns } = drawnOrder(dump);
    const given = new Map(rows.map((r) => [`${r.gene}|${r.sample}`, r.level as number]));
    const wrong: string[] = [];
    for (let i = 0; i < order.length; i++) for (let j = 0; j < columns.length; j++) {
      const v = given.get(`${order[i]}|${columns[j]}`);
      if (png.pixel(j, i) !== (v === undefined ? '#80878d' : legendFill(dump, v))) wrong.push(`${order[i]}|${columns[j]}`);
    }
    expect(wrong).toEqual([]);
    // The one missing cell (row 6, column 34 of the input) is the neutral grey, not a class colour.
    expect(png.pixel(columns.indexOf('S0-34'), order.indexOf('G0-6'))).toBe('#80878d');
  });
});
