#!/usr/bin/env node
// The only file that touches `process`: it loads the CLI, hands it its streams, and exits with
// its code. The CLI is loaded from dist/chartwright.cjs with V8's code cache when the build
// made one (a faster cold start), else from the ESM bundle.
import { existsSync, readFileSync } from 'node:fs';
import Module, { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import vm from 'node:vm';

const dist = join(dirname(fileURLToPath(import.meta.url)), '..', 'dist');

async function loadCli() {
  const file = join(dist, 'chartwright.cjs');
  const cache = join(dist, 'chartwright.code-cache');
  // CHARTWRIGHT_ESM=1 takes the ESM bundle instead (for debugging, and for the test that both loaders agree).
  if (existsSync(file) && !process.env.CHARTWRIGHT_ESM) {
    const cachedData = existsSync(cache) ? readFileSync(cache) : undefined;
    const script = new vm.Script(Module.wrap(readFileSync(file, 'utf8')), { filename: file, cachedData });
    const loaded = { exports: {} };
    script.runInThisContext()(loaded.exports, createRequire(file), loaded, file, dist);
    return loaded.exports;
  }
  try {
    return await import('../dist/chartwright.js');
  } catch (e) {
    if (e?.code !== 'ERR_MODULE_NOT_FOUND') throw e;
    process.stderr.write('chartwright: dist/ is missing; run `npm install` (or `npm run build`) in the chartwright folder first\n');
    process.exit(3);
  }
}

const cli = await loadCli();
// A reader that stops early (`chartwright render … | head`) closes the pipe: stop quietly. Any
// other failure to write our own output (`--version > /dev/full`: ENOSPC; EIO) ends the run with
// one line on stderr and exit 1, never a stack trace.
for (const stream of [process.stdout, process.stderr]) {
  stream.on('error', (e) => {
    if (e.code === 'EPIPE') process.exit(process.exitCode ?? 0);
    if (stream === process.stdout) {
      try { process.stderr.write(`chartwright: cannot write to stdout (${e.code ?? e.message})\n`); } catch { /* stderr is gone too */ }
    }
    process.exit(1);
  });
}
/** Whether a process runs on this machine (EPERM: it does, under another user). */
function alive(pid) {
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return e.code === 'EPERM';
  }
}
process.exitCode = await cli.runCli(process.argv.slice(2), {
  stdout: (text) => process.stdout.write(text),
  stderr: (text) => process.stderr.write(text),
  cwd: process.cwd(),
  env: process.env,
  isTTY: Boolean(process.stderr.isTTY),
  pid: process.pid,
  clock: () => performance.now(),
  alive,
  now: () => Date.now(),
});
