#!/usr/bin/env node
// The only file that touches `process`: it hands the CLI its streams and exits with its code.
let cli;
try {
  cli = await import('../dist/chartwright.js');
} catch (e) {
  if (e?.code !== 'ERR_MODULE_NOT_FOUND') throw e;
  process.stderr.write('chartwright: dist/ is missing; run `npm install` (or `npm run build`) in the chartwright folder first\n');
  process.exit(3);
}
// A reader that stops early (`chartwright render … | head`) closes the pipe: stop quietly.
for (const stream of [process.stdout, process.stderr]) {
  stream.on('error', (e) => {
    if (e.code === 'EPIPE') process.exit(process.exitCode ?? 0);
    throw e;
  });
}
process.exitCode = await cli.runCli(process.argv.slice(2), {
  stdout: (text) => process.stdout.write(text),
  stderr: (text) => process.stderr.write(text),
  cwd: process.cwd(),
  env: process.env,
  isTTY: Boolean(process.stderr.isTTY),
  pid: process.pid,
  clock: () => performance.now(),
});
