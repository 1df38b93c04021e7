// Heat map and dense layout benchmarks (not a test: nothing here is asserted). Prints JSON:
// medians in ms and SVG sizes in bytes. Usage: node bench/matrix.js
// Clustering is timed on its own (src/derive/reorder.ts bundled on the fly); the charts are
// rendered from brief files and CSV tables written to a temporary folder, as the CLI reads them.
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildSync } from 'esbuild';
import { createNodeEnv, renderBrief } from '../dist/chartwright.js';

const root = new URL('..', import.meta.url).pathname;
const dir = mkdtempSync(join(tmpdir(), 'chartwright-bench-matrix-'));
const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/** mulberry32: the same pseudo-random table on every run. */
function seeded(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = Math.imul(a ^ (a >>> 15), a | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A rows × columns matrix with 5 planted blocks of rows plus noise. */
function matrix(rows, columns, random) {
  return Array.from({ length: rows }, (_, r) => Float64Array.from({ length: columns }, (_, c) => ((r % 5) === (c % 5) ? 50 : 10) + random() * 20));
}

/** Median wall time and median CPU time (user + system) of fn over runs, in ms: on a shared machine the CPU time says what the work costs. */
async function time(fn, runs) {
  const [wall, cpu] = [[], []];
  for (let i = 0; i < runs; i++) {
    const [t, c] = [performance.now(), process.cpuUsage()];
    await fn();
    const used = process.cpuUsage(c);
    wall.push(performance.now() - t);
    cpu.push((used.user + used.system) / 1000);
  }
  return { wall: median(wall), cpu: median(cpu) };
}

// 1. Clustering plus optimal leaf ordering of a 1,000 × 50 matrix (rows and columns).
const bundle = join(dir, 'reorder.mjs');
buildSync({ entryPoints: [join(root, 'src/derive/reorder.ts')], bundle: true, format: 'esm', platform: 'node', outfile: bundle, logLevel: 'silent' });
const { clusterMatrix } = await import(bundle);
const m = matrix(1000, 50, seeded(1));
const cells = new Float64Array(50_000);
m.forEach((row, r) => cells.set(row, r * 50));
const labels = (n, p) => Array.from({ length: n }, (_, i) => `${p}${i}`);
const clusterMs = await time(() => clusterMatrix({ rows: labels(1000, 'r'), columns: labels(50, 'c'), cells }, { linkage: 'average', distance: 'euclidean', standardize: false }), 5);

// 2. A 1,000 × 1,000 heat map (clustered, drawn as one raster) to SVG, from a CSV file.
const env = createNodeEnv();
const big = matrix(1000, 1000, seeded(2));
let csv = 'row,column,value\n';
big.forEach((row, r) => row.forEach((v, c) => { csv += `r${r},c${c},${v.toFixed(2)}\n`; }));
writeFileSync(join(dir, 'big.csv'), csv);
const heatBrief = join(dir, 'big.yaml');
let heatSvg = '';
const heatText = 'data: big.csv\nintent: matrix\nkeys: [row, column]\nvalues: value\nfields: { value: { unit: units } }\nsize: { width: 900, height: 900 }\n';
writeFileSync(heatBrief, heatText);
const heatMs = await time(async () => { heatSvg = (await renderBrief({ brief: heatText, file: heatBrief }, env)).svg; }, 3);

// 3. A dense layout of 100,000 items (compare with 100,000 keys), from a CSV file.
const random = seeded(3);
let items = 'item,value\n';
for (let i = 0; i < 100_000; i++) items += `i${i},${Math.round(Math.exp(4 + random() * 2))}\n`;
writeFileSync(join(dir, 'items.csv'), items);
const denseBrief = join(dir, 'items.yaml');
const denseText = 'data: items.csv\nintent: compare\nkeys: item\nvalues: value\nfields: { value: { unit: units } }\n';
writeFileSync(denseBrief, denseText);
let denseSvg = '';
const denseMs = await time(async () => { denseSvg = (await renderBrief({ brief: denseText, file: denseBrief }, env)).svg; }, 3);

console.log(JSON.stringify({
  clusterMs, heatMs, heatSvgBytes: Buffer.byteLength(heatSvg ?? ''), heatCsvBytes: csv.length,
  denseMs, denseSvgBytes: Buffer.byteLength(denseSvg ?? ''),
}));
