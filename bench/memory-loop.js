// Peak RSS over a loop of N PNG renders (default 500) of the 40-bar chart, yielding to the
// event loop between renders as the CLI's batch does. Prints JSON.
import { readFileSync } from 'node:fs';
import { createNodeEnv, outlineSvg, rasterize, renderBrief } from '../dist/chartwright.js';

const n = Number(process.argv[2] ?? 500);
const file = new URL('../demo-data/hut-overnights.yaml', import.meta.url).pathname;
const env = createNodeEnv();
const text = readFileSync(file, 'utf8');
let peak = process.memoryUsage().rss;
const start = performance.now();
for (let i = 0; i < n; i++) {
  const r = await renderBrief({ brief: text, file }, env);
  rasterize(outlineSvg(r.scene, env), { scale: 2, fontFiles: [] });
  await new Promise((resolve) => setImmediate(resolve));
  peak = Math.max(peak, process.memoryUsage().rss);
}
console.log(JSON.stringify({ renders: n, peakRssMiB: peak / 2 ** 20, msPerPng: (performance.now() - start) / n }));
