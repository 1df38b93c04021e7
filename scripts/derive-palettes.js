// Re-derives chartwright's own palettes and writes templates/palettes/tidewater.json:
//   node scripts/derive-palettes.js          write the file
//   node scripts/derive-palettes.js --check  exit 1 if the file differs from a fresh derivation
// The derivation is pure and seeded (src/color/palette-derive.ts); this script only bundles it
// with esbuild, runs it and writes the bytes. test/color/palette-file.test.ts re-runs it too.
import { build } from 'esbuild';
import { readFileSync, writeFileSync } from 'node:fs';

const out = 'templates/palettes/tidewater.json';
const bundle = await build({ entryPoints: ['src/color/palette-derive.ts'], bundle: true, platform: 'node', format: 'esm', write: false, logLevel: 'warning' });
const { derivePalettes, paletteJson, TIDEWATER_RECIPE } = await import(`data:text/javascript;base64,${Buffer.from(bundle.outputFiles[0].text).toString('base64')}`);
const started = performance.now();
const json = paletteJson(derivePalettes(TIDEWATER_RECIPE));
const ms = Math.round(performance.now() - started);
if (process.argv.includes('--check')) {
  const same = readFileSync(out, 'utf8') === json;
  console.log(same ? `${out} is up to date (derived in ${ms} ms)` : `${out} differs from a fresh derivation`);
  process.exit(same ? 0 : 1);
}
writeFileSync(out, json);
console.log(`${out} written (derived in ${ms} ms)`);
