// chartwright benchmarks: medians of repeated runs, reported as ratios against plain routes
// measured in the same run. Not a test (no timed assertions anywhere): run `npm run bench`
// and copy the table into the README. Writes bench/results.md.
import { execFileSync, spawnSync } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { csvParse } from 'd3-dsv';
import { createNodeEnv, outlineSvg, rasterize, renderBrief } from '../dist/chartwright.js';
import { jsdomRoute, stringTemplateChart } from './routes.js';

const root = new URL('..', import.meta.url).pathname;
const brief = join(root, 'demo-data', 'hut-overnights.brief.yaml');
const briefText = readFileSync(brief, 'utf8');
const rows = csvParse(readFileSync(join(root, 'demo-data', 'hut-overnights.csv'), 'utf8')).map((r) => ({ label: r.hut, value: Number(r.overnights) }));
const require = createRequire(import.meta.url);
const { Resvg } = require('@resvg/resvg-js');
const ttf = (f) => join(dirname(require.resolve('source-sans/package.json')), 'TTF', f);

const median = (xs) => { const s = [...xs].sort((a, b) => a - b); return s[Math.floor(s.length / 2)]; };
async function time(fn, runs, warmup = Math.ceil(runs / 10)) {
  for (let i = 0; i < warmup; i++) await fn();
  const xs = [];
  for (let i = 0; i < runs; i++) { const t = performance.now(); await fn(); xs.push(performance.now() - t); }
  return median(xs);
}
function cold(args, runs = 15) {
  const xs = [];
  for (let i = 0; i < runs + 2; i++) {
    const t = performance.now();
    const r = spawnSync(process.execPath, args, { cwd: root, stdio: 'pipe' });
    if (r.status !== 0) throw new Error(`${args.join(' ')}: ${r.stderr}`);
    if (i >= 2) xs.push(performance.now() - t);
  }
  return median(xs);
}

const env = createNodeEnv();
const rendered = await renderBrief({ brief: briefText, file: brief }, env);
const liveSvg = rendered.svg;
const scene = rendered.scene;
const jsdom = await jsdomRoute();
const bars = scene.root.children.filter((n) => n.role === 'bar').length;

const svg = {
  chartwright: await time(() => renderBrief({ brief: briefText, file: brief }, env), 300),
  template: await time(() => stringTemplateChart(rows), 2000),
  jsdomShared: await time(() => jsdom.sharedDocument(rows), 200),
  jsdomNew: await time(() => jsdom.newDocument(rows), 100),
};

const plainPng = () => new Resvg(liveSvg, { fitTo: { mode: 'zoom', value: 2 }, font: { loadSystemFonts: false, fontFiles: [ttf('SourceSans3-Regular.ttf'), ttf('SourceSans3-Semibold.ttf')], defaultFontFamily: 'Source Sans 3' } }).render().asPng();
const outlinesOnly = () => new Resvg(outlineSvg(scene, env), { fitTo: { mode: 'zoom', value: 2 }, font: { loadSystemFonts: false } }).render().asPng();
const png = {
  plain: await time(plainPng, 40),
  chartwright: await time(() => rasterize(outlineSvg(scene, env), { scale: 2, fontFiles: [] }), 40),
  outlinesWithResvgEncoder: await time(outlinesOnly, 40),
};

const coldRuns = {
  bare: cold(['-e', '']),
  renderSvg: cold(['bin/chartwright.js', 'render', brief, '-o', '/tmp/chartwright-bench']),
  renderPng: cold(['bin/chartwright.js', 'render', brief, '-o', '/tmp/chartwright-bench', '--png']),
  jsdomCold: cold(['bench/cold-jsdom.js'], 7),
};

const memory = JSON.parse(execFileSync(process.execPath, ['bench/memory-loop.js', '500'], { cwd: root }).toString());

const f = (ms) => (ms < 1 ? ms.toFixed(3) : ms < 10 ? ms.toFixed(2) : ms.toFixed(1));
const x = (a, b) => `${(a / b).toFixed(2)}×`;
const lines = [
  `Measured ${new Date().toISOString().slice(0, 10)} on ${process.platform}/${process.arch}, Node ${process.version}, ${(await import('node:os')).cpus().length} cores; medians. Chart: demo-data/hut-overnights (${bars} bars, 720×900).`,
  '',
  '| what | chartwright | plain route | ratio |',
  '|---|---|---|---|',
  `| SVG in process, per chart (brief + CSV + layout + SVG) | ${f(svg.chartwright)} ms | jsdom + d3-selection/d3-axis, shared document: ${f(svg.jsdomShared)} ms | ${x(svg.jsdomShared, svg.chartwright)} faster |`,
  `| | | jsdom, new document per chart: ${f(svg.jsdomNew)} ms | ${x(svg.jsdomNew, svg.chartwright)} faster |`,
  `| | | hand-written string template with d3-scale (the floor): ${f(svg.template)} ms | ${x(svg.chartwright, svg.template)} the floor |`,
  `| \`render\` from a cold process, SVG | ${f(coldRuns.renderSvg)} ms | bare \`node -e ''\`: ${f(coldRuns.bare)} ms | ${x(coldRuns.renderSvg, coldRuns.bare)} bare node |`,
  `| \`render --png\` from a cold process | ${f(coldRuns.renderPng)} ms | jsdom route, cold process, SVG only: ${f(coldRuns.jsdomCold)} ms | ${x(coldRuns.renderPng, coldRuns.jsdomCold)} of it |`,
  `| PNG at scale 2, per chart | ${f(png.chartwright)} ms | resvg alone on the live-text SVG with the font files: ${f(png.plain)} ms | ${x(png.chartwright, png.plain)} of it |`,
  `| of which: text as glyph outlines, resvg's encoder | ${f(png.outlinesWithResvgEncoder)} ms | | ${x(png.outlinesWithResvgEncoder, png.plain)} of plain |`,
  `| peak RSS over ${memory.renders} PNGs (scale 2) | ${memory.peakRssMiB.toFixed(0)} MiB | target ≤ 300 MiB | ${f(memory.msPerPng)} ms per brief → PNG |`,
];
const table = lines.join('\n');
writeFileSync(join(root, 'bench', 'results.md'), `${table}\n`);
console.log(table);
