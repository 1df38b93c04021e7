// Builds dist/:
// - chartwright.js: one ESM bundle of src/, the library entry (a cold process then loads one
//   file instead of a few hundred modules: about 20 ms instead of about 300 ms);
// - chartwright.cjs + chartwright.code-cache: the same code as CommonJS, and V8's compiled code
//   for it taken after a warm-up render, which bin/ loads through vm.Script (about 15 ms less
//   per cold `render`; a rejected cache, e.g. after a Node upgrade, only costs that time back);
// - THIRD-PARTY-NOTICES.txt: the licences of the npm packages bundled into it (scripts/notices.js);
// - types/: declarations (skipped with --bundle-only, used by `npm test`, which type-checks);
// and schema/brief.schema.json, the brief's JSON Schema as the built code makes it, so editors
// can check YAML briefs against the installed version.
// Run by `npm ci`/`npm install` (the `prepare` script) and by `npm run build`.
import { build } from 'esbuild';
import { execFileSync } from 'node:child_process';
import { mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import { noticesText } from './notices.js';

const common = {
  entryPoints: ['src/index.ts'],
  bundle: true,
  platform: 'node',
  target: 'node20',
  // Loaded at run time, and only when needed: resvg for a PNG, subset-font for rare glyphs in embedded fonts, fontkit and bidi-js for labels the bundled face cannot draw.
  external: ['@resvg/resvg-js', 'subset-font', 'fontkit', 'bidi-js'],
  legalComments: 'linked',
  logLevel: 'warning',
};
rmSync('dist/chartwright.js', { force: true });
rmSync('dist/chartwright.cjs', { force: true });
rmSync('dist/chartwright.code-cache', { force: true });
const esm = await build({
  ...common,
  metafile: true,
  outfile: 'dist/chartwright.js',
  format: 'esm',
  // Bundled CommonJS dependencies (yaml) call require(); give the ESM bundle one.
  banner: { js: "import { createRequire as __cwCreateRequire } from 'node:module'; const require = __cwCreateRequire(import.meta.url);" },
});
await build({
  ...common,
  outfile: 'dist/chartwright.cjs',
  format: 'cjs',
  // src/ finds its package and resvg from import.meta.url; CommonJS has __filename instead.
  define: { 'import.meta.url': '__cwImportMetaUrl' },
  banner: { js: "const __cwImportMetaUrl = require('node:url').pathToFileURL(__filename).href;" },
});
writeFileSync('dist/THIRD-PARTY-NOTICES.txt', noticesText(esm.metafile));
const { BRIEF_SCHEMA } = await import(pathToFileURL('dist/chartwright.js').href);
mkdirSync('schema', { recursive: true });
writeFileSync('schema/brief.schema.json', `${JSON.stringify(BRIEF_SCHEMA, null, 2)}\n`);
execFileSync(process.execPath, ['scripts/code-cache.cjs'], { stdio: 'inherit' });
if (!process.argv.includes('--bundle-only')) {
  execFileSync(process.execPath, ['node_modules/typescript/bin/tsc', '-p', 'tsconfig.build.json'], { stdio: 'inherit' });
}
