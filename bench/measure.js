// One group of measurements, in a process of its own so groups cannot disturb each other
// (jsdom's documents, for one, leave a large heap behind). Prints JSON: medians in ms.
// Usage: node bench/measure.js svg|png
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { csvParse } from 'd3-dsv';
import { createNodeEnv, outlineSvg, rasterize, renderBrief } from '../dist/chartwright.js';
import { jsdomRoute, stringTemplateChart } from './routes.js';

const root = new URL('..', import.meta.url).pathname;
const briefFile = join(root, 'demo-data', 'hut-overnights.yaml');
const briefText = readFileSync(briefFile, 'utf8');
const table = csvParse(readFileSync(join(root, 'demo-data', 'hut-overnights.csv'), 'utf8'));
const rows = table.map((r) => ({ label: r.hut, value: Number(r.overnights) }));
const env = createNodeEnv();

const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
/** Median time of fn; between runs it yields to the event loop, which resvg's native memory needs. */
async function time(fn, runs) {
  const breathe = () => new Promise((r) => setImmediate(r));
  for (let i = 0; i < Math.ceil(runs / 5); i++) { await fn(); await breathe(); }
  const xs = [];
  for (let i = 0; i < runs; i++) { const t = performance.now(); await fn(); xs.push(performance.now() - t); await breathe(); }
  return median(xs);
}

const group = process.argv[2];
if (group === 'svg') {
  // The same chart from the same rows in memory, as the jsdom route gets them; and the whole
  // job from the brief file (YAML, CSV read and parsed, typed) as the CLI does it. The routes
  // are timed in interleaved rounds, so a machine that slows down mid-run slows all of them.
  const { parse } = await import('yaml');
  const brief = parse(briefText);
  delete brief.data;
  const jsdom = await jsdomRoute();
  const routes = {
    chartwrightFromRows: [() => renderBrief({ brief, rows: table }, env), 150],
    chartwrightFromFile: [() => renderBrief({ brief: briefText, file: briefFile }, env), 80],
    template: [() => stringTemplateChart(rows), 300],
    jsdomShared: [() => jsdom.sharedDocument(rows), 30],
    jsdomNew: [() => jsdom.newDocument(rows), 10],
  };
  const samples = Object.fromEntries(Object.keys(routes).map((k) => [k, []]));
  for (let round = 0; round < 10; round++) {
    for (const [name, [fn, runs]] of Object.entries(routes)) {
      for (let i = 0; i < Math.ceil(runs / 5); i++) await fn();
      for (let i = 0; i < runs; i++) { const t = performance.now(); await fn(); samples[name].push(performance.now() - t); }
    }
  }
  console.log(JSON.stringify(Object.fromEntries(Object.entries(samples).map(([k, xs]) => [k, median(xs)]))));
} else if (group === 'png') {
  const require = createRequire(import.meta.url);
  const { Resvg } = require('@resvg/resvg-js');
  const ttf = (f) => join(dirname(require.resolve('source-sans/package.json')), 'TTF', f);
  // The plain route is resvg drawing live text from the font files (no embedded fonts to parse).
  const r = await renderBrief({ brief: briefText, file: briefFile, textMode: 'live' }, env);
  const fontFiles = [ttf('SourceSans3-Regular.ttf'), ttf('SourceSans3-Semibold.ttf')];
  const opts = (font) => ({ fitTo: { mode: 'zoom', value: 2 }, font: { loadSystemFonts: false, defaultFontFamily: 'Source Sans 3', ...font } });
  console.log(JSON.stringify({
    plain: await time(() => new Resvg(r.svg, opts({ fontFiles })).render().asPng(), 40),
    chartwright: await time(() => rasterize(outlineSvg(r.scene, env), { scale: 2, fontFiles: [] }), 40),
    outlinesOnly: await time(() => new Resvg(outlineSvg(r.scene, env), opts({})).render().asPng(), 40),
    encoderOnly: await time(() => rasterize(r.svg, { scale: 2, fontFiles }), 40),
  }));
} else {
  throw new Error(`unknown group ${group}`);
}
