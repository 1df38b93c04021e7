// Writes dist/chartwright.code-cache: V8's compiled code for dist/chartwright.cjs, taken after
// one SVG and one PNG render of a demo brief so the functions a render needs are in it.
// Output is unaffected: the cache holds compiled code, not results.
const { mkdtempSync, readFileSync, rmSync, writeFileSync } = require('node:fs');
const { tmpdir } = require('node:os');
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
  // The CLI's own path too (parsing flags, planning outputs, committing files): a cold `render`
  // otherwise compiles all of it lazily. It writes into a temporary folder, removed after.
  const out = mkdtempSync(join(tmpdir(), 'chartwright-code-cache-'));
  try {
    const quiet = () => {};
    await cw.runCli(['render', brief, '-o', out], { stdout: quiet, stderr: quiet, cwd: out, env: {}, isTTY: false, pid: process.pid, clock: () => 0, alive: () => true, now: () => Date.now() });
  } finally {
    rmSync(out, { recursive: true, force: true });
  }
  writeFileSync(join(__dirname, '..', 'dist', 'chartwright.code-cache'), script.createCachedData());
})();
