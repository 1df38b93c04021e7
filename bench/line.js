// A 1,000,000-point line, in a process of its own: chartwright's render (M4 on dense runs) against
// the plain route that writes every point, each to SVG and to PNG at scale 2. Prints JSON: medians
// CPU time in ms, SVG sizes in bytes. Usage: node bench/line.js [points]
import { createRequire } from 'node:module';
import { scaleLinear } from 'd3-scale';
import { createNodeEnv, outlineSvg, rasterize, renderBrief } from '../dist/chartwright.js';

const n = Number(process.argv[2] ?? 1_000_000);
const env = createNodeEnv();
const require = createRequire(import.meta.url);
const { Resvg } = require('@resvg/resvg-js');

/** A seeded random walk, one reading per second (the same rows for both routes). */
const rows = new Array(n);
let seed = 7;
let level = 0;
for (let i = 0; i < n; i++) {
  seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0;
  level += seed / 2 ** 32 - 0.5;
  rows[i] = { second: i, level: Math.round(level * 100) / 100 };
}
const brief = { intent: 'trend', keys: 'second', values: 'level', title: 'A million readings', fields: { level: { unit: 'cm' } } };

/** The plain route: the same plot box and scales as a string template, a path through every point at 1/100 px. */
function everyPoint(plot) {
  const x = scaleLinear().domain([0, n - 1]).range([plot.x, plot.x + plot.width]);
  let [lo, hi] = [Infinity, -Infinity];
  for (const r of rows) { lo = Math.min(lo, r.level); hi = Math.max(hi, r.level); }
  const y = scaleLinear().domain([lo, hi]).range([plot.y + plot.height, plot.y]);
  const parts = [];
  for (let i = 0; i < n; i++) parts.push(`${i ? 'L' : 'M'}${Math.round(x(i) * 100) / 100} ${Math.round(y(rows[i].level) * 100) / 100}`);
  return `<svg xmlns="http://www.w3.org/2000/svg" width="720" height="440"><rect width="720" height="440" fill="#fff"/><path d="${parts.join('')}" fill="none" stroke="#206c89" stroke-width="2" stroke-linejoin="round" stroke-linecap="round"/></svg>`;
}

const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
/**
 * Median CPU time (user + system) of fn, in ms. CPU time, not wall time: on a machine shared with
 * other work, wall time measures the neighbours; this process's own CPU time does not.
 */
async function time(fn, runs) {
  const xs = [];
  for (let i = 0; i < runs; i++) {
    const t = process.cpuUsage();
    await fn();
    const d = process.cpuUsage(t);
    xs.push((d.user + d.system) / 1000);
    await new Promise((r) => setImmediate(r));
  }
  return median(xs);
}

const first = await renderBrief({ brief, rows }, env);
if (!first.ok) throw new Error(JSON.stringify(first.diagnostics));
const plainSvg = everyPoint(first.scene.plot);
const result = {
  points: n,
  svgMs: await time(() => renderBrief({ brief, rows }, env), 3),
  pngMs: await time(async () => { const r = await renderBrief({ brief, rows }, env); rasterize(outlineSvg(r.scene, env), { scale: 2, fontFiles: [] }); }, 3),
  svgBytes: Buffer.byteLength(first.svg),
  plainSvgMs: await time(() => everyPoint(first.scene.plot), 3),
  plainPngMs: await time(() => new Resvg(everyPoint(first.scene.plot), { fitTo: { mode: 'zoom', value: 2 }, font: { loadSystemFonts: false } }).render().asPng(), 3),
  plainSvgBytes: Buffer.byteLength(plainSvg),
};
console.log(JSON.stringify(result));
