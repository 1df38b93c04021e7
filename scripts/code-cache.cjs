// Writes dist/chartwright.code-cache: V8's compiled code for dist/chartwright.cjs, taken after
// one SVG and one PNG render of a demo brief so the functions a render needs are in it.
// Output is unaffected: the cache holds compiled code, not results.
const { readFileSync, writeFileSync } = require('node:fs');
const Module = require('node:module');
const { join } = require('node:path');
const vm = require('node:vm');

const file = join(__dirname, '..', 'dist', 'chartwright.cjs');
const script = new vm.Script(Module.wrap(readFileSync(file, 'utf8')), { filename: file });
const loaded = { exports: {} };
script.runInThisContext()(loaded.exports, Module.createRequire(file), loaded, file, join(__dirname, '..', 'dist'));
const cw = loaded.exports;

(async () => {
  const env = cw.createNodeEnv();
  const brief = join(__dirname, '..', 'demo-data', 'ferry-crossings.yaml');
  const result = await cw.renderBrief({ brief: readFileSync(brief, 'utf8'), file: brief }, env);
  cw.rasterize(cw.outlineSvg(result.scene, env), { scale: 1, fontFiles: [] });
  writeFileSync(join(__dirname, '..', 'dist', 'chartwright.code-cache'), script.createCachedData());
})();
