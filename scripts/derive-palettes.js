// Re-derives chartwright's own palettes and writes templates/palettes/<name>.json:
//   node scripts/derive-palettes.js          write the files (tidewater, nightwater)
//   node scripts/derive-palettes.js --check  exit 1 if a file differs from a fresh derivation
// The derivation is pure and seeded (src/color/palette-derive.ts); this script only bundles it
// with esbuild, runs it and writes the bytes. test/color/palette-file.test.ts and
// test/color/nightwater.test.ts re-run it too.
import { build } from 'esbuild';
import { readFileSync, writeFileSync } from 'node:fs';

const source = "export * from './src/color/palette-derive.ts'; export { NIGHTWATER_RECIPE } from './src/color/nightwater.ts';";
const bundle = await build({ stdin: { contents: source, resolveDir: '.', loader: 'ts' }, bundle: true, platform: 'node', format: 'esm', write: false, logLevel: 'warning' });
const { derivePalettes, paletteJson, TIDEWATER_RECIPE, NIGHTWATER_RECIPE } = await import(`data:text/javascript;base64,${Buffer.from(bundle.outputFiles[0].text).toString('base64')}`);
let stale = false;
for (const recipe of [TIDEWATER_RECIPE, NIGHTWATER_RECIPE]) {
  const out = `templates/palettes/${recipe.name}.json`;
  const started = performance.now();
  const json = paletteJson(derivePalettes(recipe));
  const ms = Math.round(performance.now() - started);
  if (!process.argv.includes('--check')) {
    writeFileSync(out, json);
    console.log(`${out} written (derived in ${ms} ms)`);
    continue;
  }
  let same = false;
  try { same = readFileSync(out, 'utf8') === json; } catch { same = false; }
  console.log(same ? `${out} is up to date (derived in ${ms} ms)` : `${out} differs from a fresh derivation`);
  stale ||= !same;
}
process.exit(stale ? 1 : 0);
