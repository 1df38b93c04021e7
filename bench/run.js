// chartwright benchmarks: medians of repeated runs, as ratios against plain routes measured in
// the same run. Not a test (there are no timed assertions anywhere): `npm run bench` prints a
// table for the README and writes it to bench/results.md.
import { execFileSync, spawnSync } from 'node:child_process';
import { cpus } from 'node:os';
import { join } from 'node:path';
import { writeFileSync } from 'node:fs';

const root = new URL('..', import.meta.url).pathname;
const brief = join(root, 'demo-data', 'hut-overnights.yaml');
const node = (args) => JSON.parse(execFileSync(process.execPath, args, { cwd: root }).toString());
const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/** Cold-process wall times, the commands interleaved run by run so machine drift hits all alike. */
function coldRuns(commands, runs) {
  const times = Object.fromEntries(Object.keys(commands).map((k) => [k, []]));
  for (let i = 0; i < runs + 2; i++) {
    for (const [name, args] of Object.entries(commands)) {
      const t = performance.now();
      const r = spawnSync(process.execPath, args, { cwd: root, stdio: 'pipe' });
      if (r.status !== 0) throw new Error(`${args.join(' ')}: ${r.stderr}`);
      if (i >= 2) times[name].push(performance.now() - t);
    }
  }
  return Object.fromEntries(Object.entries(times).map(([k, xs]) => [k, median(xs)]));
}

const svg = node(['bench/measure.js', 'svg']);
const png = node(['bench/measure.js', 'png']);
const cold = coldRuns({
  bare: ['-e', ''],
  renderSvg: ['bin/chartwright.js', 'render', brief, '-o', '/tmp/chartwright-bench'],
  renderSvgLive: ['bin/chartwright.js', 'render', brief, '-o', '/tmp/chartwright-bench', '--text', 'live'],
  renderPng: ['bin/chartwright.js', 'render', brief, '-o', '/tmp/chartwright-bench', '--png'],
  jsdomCold: ['bench/cold-jsdom.js'],
}, 15);
const memory = node(['bench/memory-loop.js', '500']);
const line = node(['bench/line.js']);
const mb = (bytes) => `${(bytes / 1e6).toFixed(2)} MB`;
const matrix = node(['bench/matrix.js']);
const embed = node(['bench/embed.js']);
const kb = (bytes) => `${(bytes / 1024).toFixed(1)} kB`;

const f = (ms) => (ms < 1 ? ms.toFixed(2) : ms < 10 ? ms.toFixed(1) : ms.toFixed(0));
const x = (a, b) => `${(a / b).toFixed(2)}×`;
const s = (t) => `${(t.wall / 1000).toFixed(2)} s (CPU ${(t.cpu / 1000).toFixed(2)} s)`;
const table = [
  `Measured ${new Date().toISOString().slice(0, 10)}: ${process.platform}/${process.arch}, Node ${process.version}, ${cpus().length} cores; medians. Chart: demo-data/hut-overnights (40 bars, 720 × 900).`,
  '',
  '| what | chartwright | plain route, same run | ratio |',
  '|---|---|---|---|',
  `| SVG in process, from rows in memory | ${f(svg.chartwrightFromRows)} ms | jsdom + d3-selection/d3-axis, shared document: ${f(svg.jsdomShared)} ms | ${x(svg.jsdomShared, svg.chartwrightFromRows)} faster |`,
  `| | | jsdom, a new document per chart: ${f(svg.jsdomNew)} ms | ${x(svg.jsdomNew, svg.chartwrightFromRows)} faster |`,
  `| | | string template with d3-scale alone (the floor): ${f(svg.template)} ms | ${x(svg.chartwrightFromRows, svg.template)} the floor |`,
  `| SVG in process, from the brief file (YAML, CSV, typing) | ${f(svg.chartwrightFromFile)} ms | jsdom, shared document: ${f(svg.jsdomShared)} ms | ${x(svg.jsdomShared, svg.chartwrightFromFile)} faster |`,
  `| \`render\` of one brief, cold process, SVG | ${f(cold.renderSvg)} ms | bare \`node -e ''\`: ${f(cold.bare)} ms | ${x(cold.renderSvg, cold.bare)} bare node |`,
  `| … with \`--text live\` (no fonts embedded) | ${f(cold.renderSvgLive)} ms | | embedding adds ${f(cold.renderSvg - cold.renderSvgLive)} ms |`,
  `| \`render --png\`, cold process | ${f(cold.renderPng)} ms | jsdom route, cold process, SVG only: ${f(cold.jsdomCold)} ms | ${x(cold.renderPng, cold.jsdomCold)} of it |`,
  `| PNG at scale 2, in process | ${f(png.chartwright)} ms | resvg alone, live-text SVG, font files loaded: ${f(png.plain)} ms | ${x(png.chartwright, png.plain)} of it |`,
  `| … text as glyph outlines only (resvg's encoder) | ${f(png.outlinesOnly)} ms | | ${x(png.outlinesOnly, png.plain)} of plain |`,
  `| … zlib encoder only (live text, font files) | ${f(png.encoderOnly)} ms | | ${x(png.encoderOnly, png.plain)} of plain |`,
  `| peak RSS over ${memory.renders} brief → PNG renders (scale 2) | ${memory.peakRssMiB.toFixed(0)} MiB | target ≤ 300 MiB | ${f(memory.msPerPng)} ms each |`,
  `| 1,000,000-point line from rows in memory to SVG, M4 (CPU time) | ${f(line.svgMs)} ms, ${mb(line.svgBytes)} | every point through a string template: ${f(line.plainSvgMs)} ms, ${mb(line.plainSvgBytes)} | ${x(line.svgMs, line.plainSvgMs)} its time, ${x(line.svgBytes, line.plainSvgBytes)} its bytes |`,
  `| … to PNG at scale 2 (CPU time) | ${f(line.pngMs)} ms | resvg on the every-point SVG: ${f(line.plainPngMs)} ms | ${x(line.pngMs, line.plainPngMs)} of it |`,
  `| clustering + optimal leaf order, 1,000 × 50 matrix (rows and columns) | ${s(matrix.clusterMs)} | target < 5 s | |`,
  `| heat map 1,000 × 1,000 from CSV to SVG (clustered, one raster) | ${s(matrix.heatMs)}, SVG ${mb(matrix.heatSvgBytes)} | target < 5 s, < 2 MB | CSV ${mb(matrix.heatCsvBytes)} |`,
  `| dense layout of 100,000 items from CSV to SVG | ${s(matrix.denseMs)}, SVG ${mb(matrix.denseSvgBytes)} | | |`,
  `| SVG text modes in process, ${embed.chart} (brief file → SVG): embed / outline / live | ${f(embed.times.embed)} / ${f(embed.times.outline)} / ${f(embed.times.live)} ms | SVG ${kb(embed.bytes.embed)} / ${kb(embed.bytes.outline)} / ${kb(embed.bytes.live)} | embed ${x(embed.times.embed, embed.times.live)} live's time |`,
  `| bytes embedding adds to an SVG, mean over the ${embed.galleryCharts} gallery charts | ${kb(embed.addedPerGallerySvg)} | prebuilt blocks only (no run-time subset) | |`,
  `| chart with glyphs outside the prebuilt blocks: first render (loads the subsetter) / a new glyph set / cached | ${f(embed.rare.firstMs)} / ${f(embed.rare.newSetMs)} / ${f(embed.rare.cachedMs)} ms | live text: ${f(embed.rare.liveMs)} ms | adds ${kb(embed.rare.addedBytes)} |`,
].join('\n');
writeFileSync(join(root, 'bench', 'results.md'), `${table}\n`);
console.log(table);
