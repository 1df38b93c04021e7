// Builds dist/: one ESM bundle of src/ (a cold process then loads one file instead of a few
// hundred modules: about 80 ms instead of about 300 ms for `render`), and type declarations.
// Run by `npm ci`/`npm install` (the `prepare` script) and by `npm run build`.
import { build } from 'esbuild';
import { execFileSync } from 'node:child_process';
import { rmSync } from 'node:fs';

rmSync('dist/chartwright.js', { force: true });
await build({
  entryPoints: ['src/index.ts'],
  outfile: 'dist/chartwright.js',
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  external: ['@resvg/resvg-js'],
  // Bundled CommonJS dependencies (yaml) call require(); give the ESM bundle one.
  banner: { js: "import { createRequire as __cwCreateRequire } from 'node:module'; const require = __cwCreateRequire(import.meta.url);" },
  legalComments: 'linked',
  logLevel: 'warning',
});
// `--bundle-only` (used by `npm test`, which type-checks everything itself) skips the declarations.
if (!process.argv.includes('--bundle-only')) {
  execFileSync(process.execPath, ['node_modules/typescript/bin/tsc', '-p', 'tsconfig.build.json'], { stdio: 'inherit' });
}
