import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { csvParse } from 'd3-dsv';
import { createNodeEnv, renderBrief } from './dist/chartwright.js';
const env = createNodeEnv();
const brief = parse(readFileSync('demo-data/hut-overnights.yaml', 'utf8')); delete brief.data;
const table = csvParse(readFileSync('demo-data/hut-overnights.csv', 'utf8'));
for (let i = 0; i < 100; i++) await renderBrief({ brief, rows: table }, env);
const xs = [];
for (let i = 0; i < 400; i++) { const t = performance.now(); await renderBrief({ brief, rows: table, clock: () => performance.now() }, env); xs.push(performance.now() - t); }
xs.sort((a, b) => a - b);
const r = await renderBrief({ brief, rows: table, clock: () => performance.now() }, env);
console.log('render median', xs[200].toFixed(3), JSON.stringify(r.timings.map(t => [t.stage, +t.ms.toFixed(3)])));
