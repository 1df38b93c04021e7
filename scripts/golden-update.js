// Rewrites golden/ from the demo gallery: <case>/<case>.svg (live text) and <case>/<case>.png
// (scale 2, outline text). Run only on purpose, then look at every changed PNG before committing.
// With case names (`npm run golden:update -- line-trend`), rewrites only those cases.
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import { createNodeEnv, outlineSvg, rasterize, renderBrief } from '../dist/chartwright.js';

const env = createNodeEnv();
const only = new Set(process.argv.slice(2));
const briefs = readdirSync('demo-data')
  .filter((f) => f.endsWith('.yaml') && (only.size === 0 || only.has(basename(f, '.yaml'))))
  .sort();
for (const name of briefs) {
  const file = join('demo-data', name);
  const result = await renderBrief({ brief: readFileSync(file, 'utf8'), file }, env);
  if (!result.ok) throw new Error(`${file} failed: ${JSON.stringify(result.diagnostics)}`);
  const id = basename(name, '.yaml');
  mkdirSync(join('golden', id), { recursive: true });
  writeFileSync(join('golden', id, `${id}.svg`), result.svg);
  writeFileSync(join('golden', id, `${id}.png`), rasterize(outlineSvg(result.scene, env, result.style), { scale: 2, fontFiles: [] }));
  console.log(`golden/${id}/${id}.svg, .png`);
}
