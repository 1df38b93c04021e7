// Text modes: per-chart time of the SVG stage path in process (brief file → SVG) for embed,
// outline and live text, the bytes embedding adds, and a chart whose labels need glyphs outside
// the prebuilt blocks (a run-time subset: first in a fresh environment, then from the cache).
// Prints JSON: medians in ms, sizes in bytes. Usage: node bench/embed.js
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { createNodeEnv, renderBrief } from '../dist/chartwright.js';

const root = new URL('..', import.meta.url).pathname;
const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const env = createNodeEnv();
const demo = (name) => ({ brief: readFileSync(join(root, 'demo-data', `${name}.yaml`), 'utf8'), file: join(root, 'demo-data', `${name}.yaml`) });

async function svg(req, textMode, e = env) {
  const r = await renderBrief({ ...req, textMode }, e);
  if (!r.ok) throw new Error(JSON.stringify(r.diagnostics));
  return r.svg;
}

/** Median ms per render of each mode, interleaved round by round. */
async function perMode(req, runs) {
  const modes = ['embed', 'outline', 'live'];
  const samples = Object.fromEntries(modes.map((m) => [m, []]));
  for (let i = 0; i < 30; i++) for (const m of modes) await svg(req, m);
  for (let i = 0; i < runs; i++) {
    for (const m of modes) { const t = performance.now(); await svg(req, m); samples[m].push(performance.now() - t); }
  }
  return Object.fromEntries(modes.map((m) => [m, median(samples[m])]));
}

const bar = demo('ferry-crossings');
const times = await perMode(bar, 250);
const bytes = { embed: (await svg(bar, 'embed')).length, outline: (await svg(bar, 'outline')).length, live: (await svg(bar, 'live')).length };

// Every gallery chart: the bytes embedding adds over live text.
const names = readdirSync(join(root, 'demo-data')).filter((f) => f.endsWith('.yaml')).map((f) => f.slice(0, -5)).sort();
let added = 0;
for (const name of names) added += (await svg(demo(name), 'embed')).length - (await svg(demo(name), 'live')).length;

// A chart with glyphs outside the prebuilt blocks (U+1F10D, U+1F10E, U+A71C): the first render in
// a fresh environment loads the subsetter and cuts a WOFF2; later ones find it in the cache.
const rare = { brief: { intent: 'compare', keys: 'k', values: 'v', title: 'Rare glyphs \u{1F10D}', fields: { v: { unit: 'kg' } }, rows: [{ k: 'North \u{1F10E}', v: 3 }, { k: 'South \uA71C', v: 2 }, { k: 'East', v: 1 }] } };
const fresh = createNodeEnv();
let t = performance.now();
const rareSvg = await svg(rare, 'embed', fresh);
const rareFirst = performance.now() - t;
const cached = [];
for (let i = 0; i < 30; i++) { t = performance.now(); await svg(rare, 'embed', fresh); cached.push(performance.now() - t); }
const rareLive = (await svg(rare, 'live')).length;
// Another glyph set in the same environment: the subsetter is loaded, the subset is new.
const other = { brief: { ...rare.brief, title: 'Rare glyphs \u{1F10F}', rows: [{ k: 'North \u{1F12F}', v: 3 }, { k: 'South', v: 2 }] } };
t = performance.now();
await svg(other, 'embed', fresh);
const rareNewSet = performance.now() - t;

console.log(JSON.stringify({
  chart: 'ferry-crossings', times, bytes, addedPerGallerySvg: Math.round(added / names.length), galleryCharts: names.length,
  rare: { firstMs: rareFirst, newSetMs: rareNewSet, cachedMs: median(cached), liveMs: await perMode(rare, 100).then((x) => x.live), addedBytes: rareSvg.length - rareLive },
}));
